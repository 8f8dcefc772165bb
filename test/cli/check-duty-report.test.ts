import {describe, expect, it} from 'vitest';
import {mkdtempSync, rmSync} from 'node:fs';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {afterAll} from 'vitest';
import {runCli} from '../../src/cli/main.js';
import {memoryIo} from '../../src/cli/io.js';
import {CAUTION_LINES} from '../../src/core/cautions.js';

const dir = mkdtempSync(path.join(tmpdir(), 'tapwright-check-duty-'));
afterAll(() => rmSync(dir, {recursive: true, force: true}));

async function run(...args: string[]) {
  const io = memoryIo({env: {TAPWRIGHT_CONFIG_DIR: dir}, cwd: dir});
  const code = await runCli(['check', ...args], io);
  return {code, out: io.stdout(), err: io.stderr()};
}

// Demo joint: M10 8.8 in S355 steel, 15 mm engaged, tightened by 46 N·m. At the low end of the
// friction range that takes the assembly stress above the 90 % utilisation (VDI 2230 Part 1,
// R/M) but below yield: a WATCH preload-over-yield for general duty.
const JOINT = ['--thread', 'M10x1.5-6H/6g', '--bolt', '8.8', '--parent', 'S355', '--engage', '15', '--torque', '46Nm'];
type F = {code: string; level: string; message: string};

describe('check --duty (src/core/duty.ts)', () => {
  it('general duty: an assembly stress between 90 % and 100 % of yield is a WATCH, exit 0', async () => {
    const r = await run(...JOINT, '--json');
    const j = JSON.parse(r.out);
    expect(j.flags.find((f: F) => f.code === 'preload-over-yield').level).toBe('watch');
    expect(j.flags.some((f: F) => f.level === 'fail')).toBe(false);
    expect(r.code).toBe(0);
  });

  it('--duty lifting raises that WATCH to FAIL with the reason, adds the sign-off flag, exit 3', async () => {
    const r = await run(...JOINT, '--duty', 'lifting', '--json');
    const j = JSON.parse(r.out);
    const f = j.flags.find((x: F) => x.code === 'preload-over-yield');
    expect(f.level).toBe('fail');
    expect(f.message).toMatch(/raised to FAIL: a WATCH margin is not accepted for lifting equipment/);
    expect(j.flags.some((x: F) => x.code === 'qualified-sign-off')).toBe(true);
    expect(j.input.duty).toBe('lifting');
    expect(r.code).toBe(3);
  });

  it('the sign-off is mandatory text in the text and the Markdown reports', async () => {
    const text = await run(...JOINT, '--duty', 'pressure');
    expect(text.code).toBe(3);
    expect(text.out).toMatch(/MANDATORY: Duty: pressure boundary\. This result needs a qualified person's\s+sign-off/);
    expect(text.out).toMatch(/FAIL\s+preload-over-yield/);
    const md = await run(...JOINT, '--duty', 'critical', '--format', 'markdown');
    expect(md.out).toMatch(/\*\*MANDATORY: Duty: safety-critical joint\./);
    expect(md.out).toContain('| Duty | safety-critical joint |');
  });

  it('a bad --duty names the option and the choices', async () => {
    const r = await run(...JOINT, '--duty', 'heavy');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/--duty is "heavy"; accepted: general, lifting, pressure, critical/);
  });
});

describe('check --json carries the cautions', () => {
  it('key cautions, the same lines as screw', async () => {
    const j = JSON.parse((await run('--thread', 'M10', '--parent', 'S355', '--engage', '15', '--json')).out);
    expect(j.cautions).toEqual([...CAUTION_LINES]);
  });
});

describe('check --preset with a hole recorded as stripped (demo-pump-casing-stud)', () => {
  it('text: the hole row, the hole-stripped flag, the repair plan, the work-order facts', async () => {
    const r = await run('--preset', 'demo-pump-casing-stud');
    expect(r.out).toMatch(/WATCH\s+hole-stripped/);
    expect(r.out).toMatch(/recorded as stripped to 7(\.0+)? mm/);
    expect(r.out).toMatch(/REPAIR PLAN \(ranked\)/);
    expect(r.out).toMatch(/Preset\s+demo-pump-casing-stud/);
    expect(r.out).toMatch(/Date\s+2026-01-01/);
    expect(r.out).toMatch(/Hole\b.*stripped/i);
  });

  it('Markdown: the repair plan section and the hole state among the inputs', async () => {
    const r = await run('--preset', 'demo-pump-casing-stud', '--format', 'markdown');
    expect(r.out).toContain('## Repair plan');
    expect(r.out).toMatch(/\| WATCH \| hole-stripped \|/);
    expect(r.out).toMatch(/\| Hole[^|]*\|[^|]*stripped/i);
  });

  it('JSON: the hole-stripped flag (SI) and the cautions', async () => {
    const j = JSON.parse((await run('--preset', 'demo-pump-casing-stud', '--json')).out);
    const f = j.flags.find((x: F) => x.code === 'hole-stripped');
    expect(f.level).toBe('watch');
    expect(f.message).toMatch(/to 7(\.0+)? mm/);
    expect(j.cautions).toBeDefined();
  });

  it('US units: the hole flag is kept beside the flags rewritten in inches', async () => {
    const r = await run('--preset', 'demo-pump-casing-stud', '--units', 'us');
    expect(r.out).toMatch(/WATCH\s+hole-stripped/);
    expect(r.out).toMatch(/stripped to 0\.276 in/);
  });

  it('an intact or unrecorded hole adds no plan', async () => {
    const r = await run('--thread', 'M10', '--parent', 'S355', '--engage', '15');
    expect(r.out).not.toMatch(/REPAIR PLAN|hole-stripped/);
  });
});

describe('check: the text report carries the work-order notes as Markdown does', () => {
  it('--asset, --location, --work-order, --note in the text report', async () => {
    const r = await run('--thread', 'M10', '--parent', 'S355', '--engage', '15', '--asset', 'P-101 demo', '--work-order', 'WO-7', '--note', 'Demo note');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/Asset\s+P-101 demo/);
    expect(r.out).toMatch(/Work order\s+WO-7/);
    expect(r.out).toContain('Demo note');
    expect(r.out).toMatch(/Date\s+2026-01-01/);
  });

  it('note options with --json name the option', async () => {
    const r = await run('--thread', 'M10', '--parent', 'S355', '--engage', '15', '--json', '--location', 'Bay 1');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/--location fills the work-order report; give --format text or markdown/);
  });
});

describe('check --nut-style (ASME B18.2.2 inch nuts)', () => {
  it('heavy-hex takes the taller heavy hex nut; on a tapped hole the option is refused by name', async () => {
    const hex = JSON.parse((await run('--thread', '1/2-13 UNC', '--bolt', 'SAE-5', '--nut', 'SAE-5', '--json')).out);
    const heavy = JSON.parse((await run('--thread', '1/2-13 UNC', '--bolt', 'SAE-5', '--nut', 'SAE-5', '--nut-style', 'heavy-hex', '--json')).out);
    expect(heavy.input.engagement).toBeGreaterThan(hex.input.engagement);
    const tapped = await run('--thread', 'M10', '--parent', 'S355', '--engage', '15', '--nut-style', 'hex');
    expect(tapped.code).toBe(2);
    expect(tapped.err).toMatch(/--nut-style/);
    const bad = await run('--thread', '1/2-13 UNC', '--nut', 'SAE-5', '--nut-style', 'square');
    expect(bad.code).toBe(2);
    expect(bad.err).toMatch(/--nut-style is "square"; accepted: hex, heavy-hex/);
  });
});
