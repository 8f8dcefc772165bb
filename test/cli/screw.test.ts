import {describe, expect, it} from 'vitest';
import {runCli} from '../../src/cli/main.js';
import {memoryIo} from '../../src/cli/io.js';
import {mkdtempSync, rmSync} from 'node:fs';
import {tmpdir} from 'node:os';
import path from 'node:path';

async function run(args: string[]) {
  const io = memoryIo();
  const code = await runCli(['screw', ...args], io);
  return {code, out: io.stdout(), err: io.stderr()};
}

// Shigley's Mechanical Engineering Design, 9th ed., Example 8-1 inputs (p. 419); the expected
// values are computed from the book's equations in test/core/screw/example-8-1.test.ts
// (book answers not confirmed here).
const EX81 = ['--thread', 'square 32x4', '--starts', '2', '--load', '6.4kN', '--mu-thread', '0.08', '--mu-collar', '0.08', '--collar-diameter', '40mm', '--nut-length', '48mm'];

describe('tapwright screw --json (contract keys, SI)', () => {
  it('has every contract key with the Example 8-1 values (Shigley 9th ed. Eqs. 8-1 to 8-12)', async () => {
    const {code, out} = await run([...EX81, '--json']);
    expect(code).toBe(0);
    const j = JSON.parse(out);
    expect(j.lead).toBeCloseTo(8, 9);
    expect(j.leadAngle).toBeCloseTo(4.8518, 3); // atan(8 / (pi 30)) in degrees
    expect(j.torque.raise).toBeCloseTo(26.17695, 4); // N·m
    expect(j.torque.lower).toBeCloseTo(9.77443, 4);
    expect(j.torque.collar).toBeCloseTo(10.24, 9);
    expect(j.efficiency).toBeCloseTo(0.311294, 5);
    expect(j.selfLocking).toBe(false);
    expect(j.stress.body.axial).toBeCloseTo(-10.39379, 4);
    expect(j.stress.body.torsion).toBeCloseTo(6.07317, 4);
    expect(j.stress.firstThread.bearing).toBeCloseTo(-12.90216, 4);
    expect(j.stress.firstThread.bending).toBeCloseTo(41.47123, 4);
    // shear: tangential, from 0.38 of the thread torque (the collar torque does not pass the flanks); transverseShear: Eq. 8-12
    expect(j.stress.firstThread.shear).toBeCloseTo(2.4588, 4); // thread torque only: 4 x 0.38 x 15 936.95/(pi 28^2 x 4), collar torque excluded
    expect(j.stress.firstThread.transverseShear).toBeCloseTo(20.73562, 4);
    expect(j.stress.firstThread.vonMises).toBeCloseTo(48.8643, 3); // Eq. 5-14 with tzx = 2.4588
    expect(j.stress.firstThread.vonMisesTextbook).toBeCloseTo(48.6784, 3);
    // p = 2F / (pi dm Le) = 12 800 / (pi 30 x 48) = 2.8294 MPa (Shigley 9th ed. Eq. 8-10, all turns)
    expect(j.nut.bearingPressure).toBeCloseTo(2.82942, 4);
    expect(j.buckling).toHaveProperty('criticalLoad');
    expect(Array.isArray(j.flags)).toBe(true);
    expect(j.flags.map((f: {code: string}) => f.code)).toContain('back-drives');
  });
  it('JSON stays SI with --units us; --format json equals --json', async () => {
    const a = JSON.parse((await run([...EX81, '--json', '--units', 'us'])).out);
    const b = JSON.parse((await run([...EX81, '--format', 'json'])).out);
    expect(a.torque.raise).toBeCloseTo(26.17695, 4);
    expect(b.torque.raise).toBe(a.torque.raise);
  });
  it('units on input: 1.5in length and lbf load are converted (NIST SP 811: 1 lbf = 4.448222 N)', async () => {
    const j = JSON.parse((await run(['--thread', 'Tr24x5', '--load', '1000lbf', '--nut-length', '1.5in', '--json'])).out);
    expect(j.input.load).toBeCloseTo(4448.222, 2);
    expect(j.input.nutLength).toBeCloseTo(38.1, 9);
  });
  it('buckling critical load is a number for a long screw in compression', async () => {
    const j = JSON.parse((await run(['--thread', 'Tr24x5', '--load', '5kN', '--nut-length', '40', '--length', '2000mm', '--ends', 'fixed-free', '--json'])).out);
    expect(j.buckling.criticalLoad).toBeGreaterThan(0);
    expect(j.buckling.method).toBe('euler');
  });
});

describe('tapwright screw text output', () => {
  it('fits 80 columns, has units, the flags with level words and the cautions', async () => {
    const {code, out} = await run(EX81);
    expect(code).toBe(0);
    for (const line of out.split('\n')) expect(line.length).toBeLessThanOrEqual(80);
    expect(out).toMatch(/raise 26\.2 N·m/);
    expect(out).toMatch(/WATCH\s+back-drives/);
    expect(out).toMatch(/qualified person/);
    expect(out).toMatch(/Shigley/);
  });
  it('us units show lbf, in, ft·lbf and ksi', async () => {
    const {out} = await run([...EX81, '--units', 'us']);
    expect(out).toMatch(/ft·lbf/);
    expect(out).toMatch(/ksi/);
    expect(out).toMatch(/ in\b/);
  });
  it('--help and --picks fit 80 columns', async () => {
    const io = memoryIo();
    expect(await runCli(['screw', '--help'], io)).toBe(0);
    const picks = await run(['--picks']);
    for (const line of (io.stdout() + picks.out).split('\n')) expect(line.length).toBeLessThanOrEqual(80);
    expect(io.stdout()).toMatch(/--nut-length/);
  });
  it('--picks lists the friction tables with their source', async () => {
    const {code, out} = await run(['--picks']);
    expect(code).toBe(0);
    expect(out).toMatch(/steel-oil\/bronze\s+0\.10\.\.0\.16/); // Shigley 9th ed. Table 8-5
    expect(out).toMatch(/hard-steel\/bronze\s+running 0\.06, starting 0\.08/); // Table 8-6
    expect(out).toMatch(/Table 8-5/);
  });
  it('friction picks set the values (Shigley 9th ed. Tables 8-5, 8-6)', async () => {
    const j = JSON.parse((await run(['--thread', 'Tr24x5', '--load', '10kN', '--nut-length', '40', '--mu-thread', 'steel-oil/bronze', '--mu-collar', 'soft-steel/bronze', '--collar-diameter', '40', '--json'])).out);
    expect(j.friction.thread).toEqual({min: 0.1, max: 0.16});
    expect(j.friction.collar).toBe(0.08);
    const st = JSON.parse((await run(['--thread', 'Tr24x5', '--load', '10kN', '--nut-length', '40', '--mu-collar', 'soft-steel/bronze:starting', '--collar-diameter', '40', '--json'])).out);
    expect(st.friction.collar).toBe(0.1); // Table 8-6 starting value
    expect((await run(['--thread', 'Tr24x5', '--load', '10kN', '--nut-length', '40', '--mu-collar', 'soft-steel/bronze:wet'])).err).toMatch(/--mu-collar.*running or starting/);
  });
});

describe('tapwright screw exit codes and bad input', () => {
  it('exit 3 with a fail flag (the load runs down by itself)', async () => {
    const {code, out} = await run(['--thread', 'Tr24x10(P5)', '--load', '10kN', '--nut-length', '40', '--mu-thread', '0.05']);
    expect(code).toBe(3);
    expect(out).toMatch(/FAIL\s+back-drives/);
  });
  const bad: [string[], RegExp][] = [
    [['--load', '1kN', '--nut-length', '40'], /--thread is needed/],
    [['--thread', 'M10', '--load', '1kN', '--nut-length', '40'], /--thread.*fastener thread/],
    [['--thread', 'Tr24x5', '--nut-length', '40'], /--load is needed/],
    [['--thread', 'Tr24x5', '--load=-5kN', '--nut-length', '40'], /--load.*0 to 100 MN/],
    [['--thread', 'Tr24x5', '--load', '-5kN', '--nut-length', '40'], /--load/],
    [['--thread', 'Tr24x5', '--load', '5 kPa', '--nut-length', '40'], /--load.*not a force unit/],
    [['--thread', 'Tr24x5', '--load', '5kN'], /--nut-length is needed/],
    [['--thread', 'Tr24x5', '--load', '5kN', '--nut-length', '0.1'], /--nut-length.*0\.5 to 2000 mm/],
    [['--thread', 'Tr24x5', '--load', '5kN', '--nut-length', '40', '--starts', '9'], /--starts.*1 to 8/],
    [['--thread', 'Tr24x5', '--load', '5kN', '--nut-length', '40', '--starts', '1.5'], /--starts.*whole number/],
    [['--thread', 'Tr40x14(P7)', '--load', '5kN', '--nut-length', '40', '--starts', '3'], /--thread.*2 starts/],
    [['--thread', 'Tr24x5', '--load', '5kN', '--nut-length', '40', '--mu-thread', '0.9'], /--mu-thread.*0\.01 to 0\.6/],
    [['--thread', 'Tr24x5', '--load', '5kN', '--nut-length', '40', '--mu-thread', 'wet'], /--mu-thread.*steel-oil\/bronze/],
    [['--thread', 'Tr24x5', '--load', '5kN', '--nut-length', '40', '--mu-thread', '0.2..0.1'], /--mu-thread.*min must not exceed max/],
    [['--thread', 'Tr24x5', '--load', '5kN', '--nut-length', '40', '--mu-collar', '0.7'], /--mu-collar.*0 to 0\.6/],
    [['--thread', 'Tr24x5', '--load', '5kN', '--nut-length', '40', '--collar-diameter', '3m'], /--collar-diameter.*0 to 2000 mm/],
    [['--thread', 'Tr24x5', '--load', '5kN', '--nut-length', '40', '--nut-material', 'cheese'], /--nut-material.*bronze/],
    [['--thread', 'Tr24x5', '--load', '5kN', '--nut-length', '40', '--screw-material', 'EN-GJL-250'], /--screw-material.*steel/],
    [['--thread', 'Tr24x5', '--load', '5kN', '--nut-length', '40', '--ends', 'glued'], /--ends.*pinned-pinned/],
    [['--thread', 'Tr24x5', '--load', '5kN', '--nut-length', '40', '--direction', 'up'], /--direction.*compression, tension/],
    [['--thread', 'Tr24x5', '--load', '5kN', '--nut-length', '40', '--length', '30m'], /--length.*0 to 20 000 mm/],
    [['--thread', 'Tr24x5', '--load', '5kN', '--nut-length', '40', '--speed', '20m/s'], /--speed.*0 to 10 m\/s/],
    [['--thread', 'Tr24x5', '--load', '5kN', '--nut-length', '40', '--nut-wear', '60'], /--nut-wear.*0 to 50 mm/],
    [['--thread', 'Tr24x5', '--load', '5kN', '--nut-length', '40', '--screw-yield', '10'], /--screw-yield.*50 to 2500 MPa/],
    [['--thread', 'Tr24x5', '--load', '5kN', '--nut-length', '40', '--allowable-pressure', '0'], /--allowable-pressure.*0\.1 to 500 MPa/],
    [['--thread', 'Tr24x5', '--load', '5kN', '--nut-length', '40', '--units', 'imperial'], /--units.*si, us/],
    [['--thread', 'Tr24x5', '--load', '5kN', '--nut-length', '40', '--format', 'xml'], /--format.*text, markdown, json/],
    [['--thread', 'Tr24x5', '--load', '5kN', '--nut-length', '40', '--bogus'], /unknown option --bogus/],
  ];
  for (const [args, msg] of bad) {
    it(`exit 2: ${args.join(' ')}`, async () => {
      const {code, err, out} = await run(args);
      expect(code).toBe(2);
      expect(err).toMatch(msg);
      expect(err).not.toMatch(/at .*\.ts:\d+/); // no stack trace
      expect(out).toBe('');
    });
  }
});

describe('tapwright screw --preset (shipped demo preset)', () => {
  // No engineering source: the preset is invented demo data; this checks the plumbing.
  it('runs the shipped screw preset; options given override it; a joint preset is refused', async () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'tw-screw-'));
    try {
      const env = {TAPWRIGHT_CONFIG_DIR: dir};
      const go = async (args: string[]) => {
        const io = memoryIo({env});
        const code = await runCli(['screw', ...args], io);
        return {code, out: io.stdout(), err: io.stderr()};
      };
      const a = await go(['--preset', 'demo-lifting-table-screw', '--json']);
      expect(a.err).toBe('');
      const j = JSON.parse(a.out);
      expect(j.preset).toBe('demo-lifting-table-screw');
      expect(j.thread.designation).toMatch(/^Tr24x5/);
      const b = JSON.parse((await go(['--preset', 'demo-lifting-table-screw', '--load', '12kN', '--json'])).out);
      expect(b.input.load).toBe(12000);
      expect(b.input.nutLength).toBe(j.input.nutLength);
      const text = await go(['--preset', 'demo-lifting-table-screw']);
      expect(text.out).toMatch(/Preset\s+demo-lifting-table-screw/);
      const joint = await go(['--preset', 'demo-gearbox-cover']);
      expect(joint.code).toBe(2);
      expect(joint.err).toMatch(/--preset.*needs a screw preset/);
      const none = await go(['--preset', 'no-such-preset']);
      expect(none.code).toBe(2);
      expect(none.err).toMatch(/--preset/);
    } finally {
      rmSync(dir, {recursive: true, force: true});
    }
  });
});
