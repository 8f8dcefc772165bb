import {describe, expect, it} from 'vitest';
import {mkdtempSync, writeFileSync, readdirSync, rmSync} from 'node:fs';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {runCli} from '../../src/cli/main.js';
import {memoryIo} from '../../src/cli/io.js';

// A damaged store found while a command resolves --preset is repaired by the
// store, and the one-line message about it must reach the user on stderr.
describe('--preset tells the user about a damaged store', () => {
  for (const [command, preset] of [
    ['check', 'demo-gearbox-cover'],
    ['repair', 'demo-gearbox-cover'],
    ['screw', 'demo-lifting-table-screw'],
  ] as const) {
    it(`${command} --preset`, async () => {
      const dir = mkdtempSync(path.join(tmpdir(), 'tw-warn-'));
      try {
        writeFileSync(path.join(dir, 'presets.json'), '{"schemaVersion": 2, "presets": [');
        const io = memoryIo({env: {TAPWRIGHT_CONFIG_DIR: dir}});
        const code = await runCli([command, '--preset', preset], io);
        expect([0, 3]).toContain(code);
        expect(io.stderr()).toMatch(/corrupt|damaged|moved aside/i);
        expect(readdirSync(dir).some(f => f.startsWith('presets.json.corrupt-'))).toBe(true);
      } finally {
        rmSync(dir, {recursive: true, force: true});
      }
    });
  }
});
