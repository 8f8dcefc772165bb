import {describe, expect, it} from 'vitest';
import {runCli} from '../../src/cli/main.js';
import {memoryIo} from '../../src/cli/io.js';

async function run(args: string[]) {
  const io = memoryIo();
  const code = await runCli(['screw', ...args], io);
  return {code, out: io.stdout(), err: io.stderr()};
}

// Demo: an invented lead screw, Tr24x5 (ISO 2904), bronze nut 40 mm, 1.5 m free length, pinned ends.
const DEMO = ['--thread', 'Tr24x5', '--nut-length', '40mm', '--length', '1500mm', '--ends', 'pinned-pinned'];

/** The load that gives a buckling margin of 1.03: the critical load does not depend on the load (Euler, Shigley 9th ed. Eq. 4-42). */
async function loadForMargin(margin: number): Promise<number> {
  const {out} = await run([...DEMO, '--load', '1kN', '--json']);
  const j = JSON.parse(out);
  return j.buckling.criticalLoad / margin;
}

describe('screw --duty (src/core/duty.ts: WATCH margins become FAIL)', () => {
  it('a buckling margin of about 1.03 is WATCH for general duty and FAIL with the reason for lifting', async () => {
    const load = `${(await loadForMargin(1.03)).toFixed(0)}N`;
    const general = await run([...DEMO, '--load', load, '--json']);
    const g = JSON.parse(general.out);
    expect(g.buckling.margin).toBeCloseTo(1.03, 2);
    expect(g.flags.find((f: {code: string}) => f.code === 'buckling').level).toBe('watch');
    expect(general.code).toBe(0);

    const lifting = await run([...DEMO, '--load', load, '--duty', 'lifting', '--json']);
    const l = JSON.parse(lifting.out);
    const b = l.flags.find((f: {code: string}) => f.code === 'buckling');
    expect(b.level).toBe('fail');
    expect(b.message).toMatch(/raised to FAIL: a WATCH margin is not accepted for lifting equipment/);
    expect(l.flags[0].code).toBe('qualified-sign-off');
    expect(l.input.duty).toBe('lifting');
    expect(lifting.code).toBe(3);
  });

  it('the text and Markdown reports carry the mandatory sign-off with the duty', async () => {
    const text = await run([...DEMO, '--load', '2kN', '--duty', 'lifting']);
    expect(text.out).toMatch(/Duty\s+lifting equipment/);
    expect(text.out).toMatch(/MANDATORY: Duty: lifting equipment\. This result needs a qualified person's\s+sign-off/);
    const md = await run([...DEMO, '--load', '2kN', '--duty', 'lifting', '--format', 'markdown']);
    expect(md.out).toMatch(/^# Power screw check: Tr24x5/);
    expect(md.out).toMatch(/\*\*MANDATORY: Duty: lifting equipment\./);
    expect(md.out).toContain('| Duty | lifting equipment |');
  });

  it('a bad --duty names the option and the choices', async () => {
    const r = await run([...DEMO, '--load', '2kN', '--duty', 'crane']);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/--duty is "crane"; accepted: general, lifting, pressure, critical/);
  });
});

describe('screw --format text|markdown with the work-order notes', () => {
  it('Markdown: date from the clock, the notes given, inputs, flags, cautions', async () => {
    const r = await run([...DEMO, '--load', '2kN', '--format', 'markdown', '--asset', 'LT-7 demo', '--location', 'Bay 2', '--work-order', 'WO-1', '--note', 'Demo: nut replaced']);
    expect(r.code).toBe(0);
    expect(r.out).toContain('| Date | 2026-01-01 |');
    expect(r.out).toContain('| Asset | LT-7 demo |');
    expect(r.out).toContain('| Location | Bay 2 |');
    expect(r.out).toContain('| Work order | WO-1 |');
    expect(r.out).toContain('Demo: nut replaced');
    expect(r.out).toContain('## Inputs');
    expect(r.out).toContain('## Cautions');
  });

  it('text: the work-order facts and notes, with the date', async () => {
    const r = await run([...DEMO, '--load', '2kN', '--asset', 'LT-7 demo', '--note', 'Demo note']);
    expect(r.out).toMatch(/WORK ORDER\n\s+Date\s+2026-01-01/);
    expect(r.out).toMatch(/Asset\s+LT-7 demo/);
    expect(r.out).toContain('Demo note');
  });

  it('the preset\'s notes, replaced field by field by the options', async () => {
    const md = await run(['--preset', 'demo-lifting-table-screw', '--format', 'markdown']);
    expect(md.out).toContain('| Preset | demo-lifting-table-screw |');
    expect(md.out).toMatch(/Demo scenario/);
    const over = await run(['--preset', 'demo-lifting-table-screw', '--format', 'markdown', '--note', '']);
    expect(over.out).not.toMatch(/Demo scenario, invented/);
  });

  it('note options with --json, a too-long note, a bad format: each names its option', async () => {
    const j = await run([...DEMO, '--load', '2kN', '--json', '--asset', 'X']);
    expect(j.code).toBe(2);
    expect(j.err).toMatch(/--asset fills the work-order report; give --format text or markdown/);
    expect(JSON.parse(j.out).error.option).toBe('--asset');
    const long = await run([...DEMO, '--load', '2kN', '--note', 'x'.repeat(5000)]);
    expect(long.code).toBe(2);
    expect(long.err).toMatch(/--note is 5000 characters long; accepted: at most \d+ characters/);
    const f = await run([...DEMO, '--load', '2kN', '--format', 'pdf']);
    expect(f.code).toBe(2);
    expect(f.err).toMatch(/--format/);
  });
});

describe('screw --torque and --torque-solves (Shigley 9th ed. Eqs. 8-1 and 8-6)', () => {
  it('--torque solves for the load it raises: the raise torque of that load is the torque given', async () => {
    const r = await run(['--thread', 'Tr24x5', '--nut-length', '40mm', '--torque', '12Nm', '--json']);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    expect(j.torqueSolve.solves).toBe('load');
    expect(j.torque.raise).toBeCloseTo(12, 6);
    expect(j.input.load).toBeGreaterThan(0);
  });

  it('--torque-solves friction: the friction that torque implies at the load', async () => {
    const r = await run(['--thread', 'Tr24x5', '--nut-length', '40mm', '--load', '5kN', '--torque', '15Nm', '--torque-solves', 'friction', '--json']);
    const j = JSON.parse(r.out);
    expect(j.torqueSolve.solves).toBe('friction');
    expect(j.torque.raise).toBeCloseTo(15, 6);
  });

  it('a torque in US units is read in ft·lbf; bad values name the option', async () => {
    const us = await run(['--thread', 'Tr24x5', '--nut-length', '40mm', '--torque', '10', '--units', 'us', '--json']);
    expect(JSON.parse(us.out).torque.raise).toBeCloseTo(10 * 1.3558179483314004, 5); // 1 ft·lbf = 1.3558 N·m (exact by definition of the pound and the foot)
    const bad = await run(['--thread', 'Tr24x5', '--nut-length', '40mm', '--torque', '-3Nm']);
    expect(bad.code).toBe(2);
    expect(bad.err).toMatch(/--torque/);
    const solves = await run(['--thread', 'Tr24x5', '--nut-length', '40mm', '--torque', '12Nm', '--torque-solves', 'speed']);
    expect(solves.code).toBe(2);
    expect(solves.err).toMatch(/--torque-solves is "speed"; accepted: load, friction/);
  });
});

describe('screw flags in the display units (issue 14 item 13)', () => {
  it('US text shows the flag numbers in ksi and lbf; the JSON stays SI', async () => {
    const args = ['--thread', 'Tr24x5', '--nut-length', '12mm', '--load', '20kN'];
    const si = await run([...args, '--json']);
    const pressure = JSON.parse(si.out).flags.find((f: {code: string}) => f.code === 'bearing-pressure-high');
    expect(pressure.message).toMatch(/[\d.]+ MPa/);
    const us = await run([...args, '--units', 'us']);
    const block = us.out.slice(us.out.indexOf('Flags'), us.out.indexOf('Sources'));
    expect(block).toMatch(/bearing-pressure-high: nut flank pressure [\d.]+ ksi/);
    expect(block).not.toMatch(/MPa|kN\b/);
    const md = await run([...args, '--units', 'us', '--format', 'markdown']);
    const flags = md.out.slice(md.out.indexOf('## Flags'), md.out.indexOf('## Notes'));
    expect(flags).not.toMatch(/MPa|kN\b/);
    expect(flags).toMatch(/lbf|ksi/);
  });
});

describe('screw reports with a known torque', () => {
  it('text and Markdown say what the torque solved', async () => {
    const text = await run(['--thread', 'Tr24x5', '--nut-length', '40mm', '--torque', '12Nm']);
    expect(text.out).toMatch(/Torque given\s+12\.0 N·m raises [\d.]+ kN \(load solved at thread friction 0\.150\)/);
    const md = await run(['--thread', 'Tr24x5', '--nut-length', '40mm', '--load', '5kN', '--torque', '15Nm', '--torque-solves', 'friction', '--format', 'markdown']);
    expect(md.out).toMatch(/\| Known torque \| 15\.0 N·m, solves the thread friction \|/);
    expect(md.out).toMatch(/15\.0 N·m at 5\.00 kN implies thread friction [\d.]+/);
  });
});
