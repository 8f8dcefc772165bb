import {describe, expect, it} from 'vitest';
import {mkdtempSync} from 'node:fs';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {runCli} from '../../src/cli/main.js';
import {memoryIo} from '../../src/cli/io.js';
import {CAUTION_LINES} from '../../src/core/cautions.js';

// Review findings on tapwright check; wording and layout only.
const CONFIG = mkdtempSync(path.join(tmpdir(), 'tw-check-review-'));
async function run(...args: string[]) {
  const io = memoryIo({env: {TAPWRIGHT_CONFIG_DIR: CONFIG}});
  const code = await runCli(['check', ...args], io);
  return {code, out: io.stdout(), err: io.stderr()};
}

describe('tapwright check: review findings', () => {
  it('--help fits 80 columns, apart from the one wording of the cautions (src/core/cautions.ts)', async () => {
    const r = await run('--help');
    expect(r.code).toBe(0);
    const wide = r.out.split('\n').filter(l => [...l].length > 80);
    expect(wide.every(l => CAUTION_LINES.includes(l)), wide.join('\n')).toBe(true);
    expect(r.out).toMatch(/--bearing-diameter LEN/);
  });

  it('--units us: a core input error is worded in inches (was the chamfer in mm with float noise)', async () => {
    const r = await run('--thread', '3/8-16', '--parent', '6061-T6', '--engage', '0.5', '--units', 'us', '--chamfer', '0.6');
    expect(r.code).toBe(2);
    expect(r.err).toBe('tapwright: --chamfer: the chamfer (0.600 in) must be shorter than the engaged length (0.500 in)\n');
    const si = await run('--thread', 'M10', '--parent', 'S355', '--engage', '12', '--chamfer', '15');
    expect(si.err).toBe('tapwright: --chamfer: the chamfer (15 mm) must be shorter than the engaged length (12 mm)\n');
  });
});
