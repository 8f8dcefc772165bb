/**
 * Preset import reads a joint as every face does (src/app/resolve.ts): a joint
 * that names a way of tightening without its value is refused at import, with
 * the field named, instead of failing later in check and in the workbench.
 */
import {describe, expect, it} from 'vitest';
import {writeFileSync} from 'node:fs';
import path from 'node:path';
import {cliInTempStore} from '../support/cli-in-temp-store.js';

const preset = (joint: Record<string, unknown>) => ({
  schemaVersion: 2,
  presets: [{name: 'demo-import-test', kind: 'joint', revision: 1, savedAt: '2026-01-01T00:00:00.000Z', joint, notes: {text: 'demo, invented for this test'}}],
});

describe('presets import through the resolver', () => {
  it('refuses a joint tightened by torque with no torque, naming the field', async () => {
    const {dir, run} = cliInTempStore('tw-import-resolve');
    const file = path.join(dir, 'in.json');
    writeFileSync(file, JSON.stringify(preset({thread: 'M10', parent: 'S355', engagement: 15, tightening: 'torque'})));
    const r = await run('presets', 'import', file);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/joint\.torque: Torque is needed; accepted 0\.01 to 100000 N\*m; nothing was imported/);
    expect((await run('presets', 'list', '--json')).out).not.toContain('demo-import-test');
  });

  it('imports a complete joint', async () => {
    const {dir, run} = cliInTempStore('tw-import-resolve-ok');
    const file = path.join(dir, 'in.json');
    writeFileSync(file, JSON.stringify(preset({thread: 'M10', parent: 'S355', engagement: 15, tightening: 'torque', torque: 40})));
    expect((await run('presets', 'import', file)).code).toBe(0);
  });
});
