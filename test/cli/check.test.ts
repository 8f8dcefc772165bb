import {describe, expect, it} from 'vitest';
import {mkdtempSync, rmSync} from 'node:fs';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {runCli} from '../../src/cli/main.js';
import {memoryIo} from '../../src/cli/io.js';
import {runCheck} from '../support/run-check.js';

const check = runCheck;

async function json(args: string[]) {
  const r = await check([...args, '--json']);
  expect(r.err).toBe('');
  return {code: r.code, j: JSON.parse(r.out) as Record<string, any>};
}

const TAPPED = ['--thread', 'M10', '--parent', 'S355', '--engage', '15'];

describe('tapwright check: output', () => {
  it('text: every result with its unit, the flags and the cautions; exit 0', async () => {
    const r = await check([...TAPPED, '--torque', '40Nm']);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/kN/);
    expect(r.out).toMatch(/N·m/);
    expect(r.out).toMatch(/MPa/);
    expect(r.out).toMatch(/qualified person/);
  });

  it('JSON contract: the keys named in the issue exist, in SI', async () => {
    const {code, j} = await json([...TAPPED, '--torque', '40Nm']);
    expect(code).toBe(0);
    expect(j.geometry.nominal).toBe(10);
    for (const k of ['min', 'nominal', 'max']) expect(typeof j.tightening.preload[k]).toBe('number');
    expect(j.tightening.torque).toBeCloseTo(40, 9);
    expect(typeof j.tightening.utilisation).toBe('number');
    for (const k of ['axial', 'bending', 'shear', 'torsion', 'bearing', 'vonMises']) expect(typeof j.stress.firstThread[k]).toBe('number');
    expect(typeof j.stress.shank.vonMises).toBe('number');
    expect(Array.isArray(j.loadShare)).toBe(true);
    expect(typeof j.stripping.external.force).toBe('number');
    expect(typeof j.stripping.internal.force).toBe('number');
    expect(typeof j.stripping.boltBreakForce).toBe('number');
    expect(['external', 'internal']).toContain(j.stripping.weaker);
    expect(typeof j.stripping.requiredEngagement.fedStd).toBe('number');
    expect(typeof j.stripping.requiredEngagement.alexander).toBe('number');
    expect(typeof j.margin.stripping).toBe('number');
    expect(typeof j.margin.boltBreaksFirst).toBe('number');
    expect(Array.isArray(j.flags)).toBe(true);
  });

  it('JSON is SI whatever --units says; --format json equals --json', async () => {
    const si = await json([...TAPPED, '--torque', '40Nm']);
    const us = await json([...TAPPED, '--torque', '40Nm', '--units', 'us']);
    expect(us.j.tightening.preload).toEqual(si.j.tightening.preload);
    const f = await check([...TAPPED, '--torque', '40Nm', '--format', 'json']);
    expect(JSON.parse(f.out).tightening).toEqual(si.j.tightening);
  });

  it('numbers carry units: 0.5in = 12.7mm, 30ft-lbf, 10kN; bare numbers follow --units', async () => {
    const a = await json(['--thread', 'M10', '--parent', 'S355', '--engage', '0.5in']);
    const b = await json(['--thread', 'M10', '--parent', 'S355', '--engage', '12.7mm']);
    const c = await json(['--thread', 'M10', '--parent', 'S355', '--engage', '0.5', '--units', 'us']);
    expect(a.j.stripping.effectiveEngagement).toBeCloseTo(12.7, 9);
    expect(b.j.stripping.effectiveEngagement).toBeCloseTo(12.7, 9);
    expect(c.j.stripping.effectiveEngagement).toBeCloseTo(12.7, 9);
    // 1 ft·lbf = 1.3558179483 N·m (NIST SP 811 Appendix B).
    const t = await json([...TAPPED, '--torque', '30ft-lbf']);
    expect(t.j.tightening.torque).toBeCloseTo(30 * 1.3558179483, 6);
    const p = await json([...TAPPED, '--preload', '10kN']);
    expect(p.j.tightening.preload.nominal).toBeCloseTo(10000, 6);
  });

  it('a nut: engagement defaults to the nut height; --mu-head takes a range', async () => {
    const {j} = await json(['--thread', 'M10', '--nut', '8', '--mu-head', '0.08..0.14']);
    expect(j.input.internal).toBe('nut');
    expect(j.input.muHead).toEqual({min: 0.08, max: 0.14});
    expect(j.stripping.effectiveEngagement).toBeGreaterThan(7);
  });

  it('unified thread in a custom parent with the nut factor', async () => {
    const {code, j} = await json(['--thread', '1/4-20 UNC-2A/2B', '--bolt', 'SAE-5', '--parent-rm', '45ksi', '--engage', '0.4in', '--torque', '8ft-lbf', '--nut-factor', '0.2']);
    expect([0, 3]).toContain(code);
    expect(j.tightening.method).toBe('nut-factor');
    // T = K F d (Shigley 9th ed. Eq. 8-27): F = T/(K d).
    expect(j.tightening.preload.nominal).toBeCloseTo((8 * 1.3558179483 * 1000) / (0.2 * 6.35), 3);
  });

  it('exit 3 with a fail flag: a short engagement in a weak parent strips while tightening', async () => {
    const r = await check(['--thread', 'M10', '--bolt', '12.9', '--parent', 'AZ91-DC', '--engage', '4', '--json']);
    expect(r.code).toBe(3);
    const codes = (JSON.parse(r.out).flags as {code: string}[]).map(f => f.code);
    expect(codes).toContain('strips-at-preload');
  });

  it('markdown: the work-order report with the preset name and date', async () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'tw-check-'));
    try {
      const r = await check(['--preset', 'demo-gearbox-cover', '--format', 'markdown'], {TAPWRIGHT_CONFIG_DIR: dir});
      expect([0, 3]).toContain(r.code);
      expect(r.out).toMatch(/demo-gearbox-cover/);
      expect(r.out).toMatch(/2026-01-01/);
      const o = await check(['--preset', 'demo-gearbox-cover', '--torque', '20Nm', '--json'], {TAPWRIGHT_CONFIG_DIR: dir});
      expect(JSON.parse(o.out).tightening.torque).toBeCloseTo(20, 9);
    } finally {
      rmSync(dir, {recursive: true, force: true});
    }
  });

  it('markdown with --preset: the preset\'s work-order notes fill the report (asset, location, work order, note)', async () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'tw-check-'));
    try {
      const r = await check(['--preset', 'demo-gearbox-cover', '--format', 'markdown'], {TAPWRIGHT_CONFIG_DIR: dir});
      expect(r.err).toBe('');
      expect(r.out).toContain('| Asset | GB-DEMO-01 |');
      expect(r.out).toContain('| Location | demo plant, line 2, conveyor drive |');
      expect(r.out).toContain('| Work order | WO-DEMO-0001 |');
      expect(r.out).toMatch(/Demo scenario, invented for tapwright/);
    } finally {
      rmSync(dir, {recursive: true, force: true});
    }
  });

  it('markdown without a preset: --asset, --location, --work-order and --note fill the work-order fields', async () => {
    const r = await check([...TAPPED, '--format', 'markdown', '--asset', 'PUMP-DEMO-7', '--location', 'demo hall | bay 3', '--work-order', 'WO-DEMO-0042', '--note', 'Demo: re-tapped after a stripped thread.']);
    expect(r.err).toBe('');
    expect(r.out).toContain('| Preset | (none: entered by hand) |');
    expect(r.out).toContain('| Asset | PUMP-DEMO-7 |');
    expect(r.out).toContain('| Location | demo hall \\| bay 3 |'); // the table cell escapes the bar
    expect(r.out).toContain('| Work order | WO-DEMO-0042 |');
    expect(r.out).toContain('Demo: re-tapped after a stripped thread.');
  });

  it('markdown: an option replaces the preset\'s entry, the others stay, an empty value clears one', async () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'tw-check-'));
    try {
      const r = await check(['--preset', 'demo-gearbox-cover', '--format', 'markdown', '--work-order', 'WO-DEMO-0099', '--location', ''], {TAPWRIGHT_CONFIG_DIR: dir});
      expect(r.err).toBe('');
      expect(r.out).toContain('| Work order | WO-DEMO-0099 |');
      expect(r.out).not.toContain('WO-DEMO-0001');
      expect(r.out).toContain('| Asset | GB-DEMO-01 |');
      expect(r.out).toContain('| Location |  |');
      expect(r.out).toMatch(/Demo scenario, invented for tapwright/);
    } finally {
      rmSync(dir, {recursive: true, force: true});
    }
  });

  it('--help lists the work-order options', async () => {
    const io = memoryIo();
    expect(await runCli(['check', '--help'], io)).toBe(0);
    for (const o of ['--asset', '--location', '--work-order', '--note']) expect(io.stdout()).toContain(o);
  });

  it('--help lists the options', async () => {
    const io = memoryIo();
    expect(await runCli(['check', '--help'], io)).toBe(0);
    for (const o of ['--thread', '--bolt-rm', '--parent-shear', '--nut-flats', '--hole-depth', '--mu-head', '--nut-factor', '--bearing-diameter', '--service-load', '--format']) {
      expect(io.stdout()).toContain(o);
    }
  });
});

describe('tapwright check: bad input names the option (exit 2, no stack trace)', () => {
  const cases: [string, string[], RegExp][] = [
    ['--thread missing', ['--parent', 'S355', '--engage', '10'], /--thread/],
    ['--thread unknown', ['--thread', 'M10x7', '--parent', 'S355', '--engage', '10'], /--thread/],
    ['--thread power screw', ['--thread', 'Tr20x4', '--parent', 'S355', '--engage', '10'], /--thread.*screw/],
    ['--bolt unknown', [...TAPPED, '--bolt', '99.9'], /--bolt.*accepted/],
    ['--bolt-rm out of range', [...TAPPED, '--bolt-rm', '50'], /--bolt-rm.*accepted: 100 MPa to 2500 MPa/],
    ['--bolt-rm wrong unit', [...TAPPED, '--bolt-rm', '10mm'], /--bolt-rm.*stress unit/],
    ['--bolt-rp above Rm', [...TAPPED, '--bolt-rp', '900'], /--bolt-rp.*below/],
    ['--parent unknown', ['--thread', 'M10', '--parent', 'cheese', '--engage', '10'], /--parent.*accepted/],
    ['--parent missing', ['--thread', 'M10', '--engage', '10'], /--parent/],
    ['--parent-rm out of range', ['--thread', 'M10', '--parent-rm', '5', '--engage', '10'], /--parent-rm.*accepted/],
    ['--parent-shear out of range', ['--thread', 'M10', '--parent-shear', '2000', '--engage', '10'], /--parent-shear.*accepted/],
    ['--nut unknown', ['--thread', 'M10', '--nut', 'X'], /--nut.*accepted/],
    ['--nut-height out of range', ['--thread', 'M10', '--nut', '8', '--nut-height', '0.1'], /--nut-height.*accepted/],
    ['--nut-height without --nut', [...TAPPED.slice(0, 2), '--engage', '10', '--nut-height', '8'], /--nut-height/],
    ['--nut-flats smaller than d', ['--thread', 'M10', '--nut', '8', '--nut-flats', '9'], /--nut-flats.*exceed/],
    ['--nut-flats out of range', ['--thread', 'M10', '--nut', '8', '--nut-flats', '0.5'], /--nut-flats.*accepted/],
    ['--nut and --parent', [...TAPPED, '--nut', '8'], /--nut.*--parent/],
    ['--engage missing', ['--thread', 'M10', '--parent', 'S355'], /--engage/],
    ['--engage out of range', ['--thread', 'M10', '--parent', 'S355', '--engage', '0.1'], /--engage.*accepted: 0.5 mm to 1000 mm/],
    ['--engage not a number', ['--thread', 'M10', '--parent', 'S355', '--engage', 'deep'], /--engage.*not a number/],
    ['--chamfer longer than engagement', [...TAPPED, '--chamfer', '15'], /--chamfer.*shorter/],
    ['--chamfer out of range', [...TAPPED, '--chamfer', '-1'], /--chamfer.*accepted/],
    ['--hole-depth out of range', [...TAPPED, '--hole-depth', '0.1'], /--hole-depth.*accepted/],
    ['--hole-depth with a nut', ['--thread', 'M10', '--nut', '8', '--hole-depth', '20'], /--nut.*--hole-depth/],
    ['--torque out of range', [...TAPPED, '--torque', '0'], /--torque.*accepted/],
    ['--torque wrong unit', [...TAPPED, '--torque', '40mm'], /--torque.*torque unit/],
    ['--preload out of range', [...TAPPED, '--preload', '0.5'], /--preload.*accepted/],
    ['--utilisation out of range', [...TAPPED, '--utilisation', '1.5'], /--utilisation.*accepted: 0.1 to 1/],
    ['--torque and --preload', [...TAPPED, '--torque', '40', '--preload', '20kN'], /--torque and --preload/],
    ['--mu-thread out of range', [...TAPPED, '--mu-thread', '0.9'], /--mu-thread.*accepted/],
    ['--mu-thread reversed range', [...TAPPED, '--mu-thread', '0.2..0.1'], /--mu-thread.*min must not exceed max/],
    ['--mu-head bad text', [...TAPPED, '--mu-head', 'dry'], /--mu-head/],
    ['--nut-factor out of range', [...TAPPED, '--nut-factor', '0.9'], /--nut-factor.*accepted: 0.05 to 0.5/],
    ['--bearing-diameter out of range', [...TAPPED, '--bearing-diameter', '0'], /--bearing-diameter.*accepted/],
    ['--service-load out of range', [...TAPPED, '--service-load', '-5kN'], /--service-load.*accepted/],
    ['--scatter out of range', [...TAPPED, '--scatter', '0.5'], /--scatter.*accepted: 1 to 4/],
    ['--margin out of range', [...TAPPED, '--margin', '9'], /--margin.*accepted: 0.5 to 5/],
    ['--units unknown', [...TAPPED, '--units', 'imperial'], /--units.*si, us/],
    ['--format unknown', [...TAPPED, '--format', 'pdf'], /--format.*text, markdown, json/],
    ['--json with --format text', [...TAPPED, '--json', '--format', 'text'], /--json/],
    ['--note with --json', [...TAPPED, '--json', '--note', 'x'], /--note fills the work-order report; give --format text or markdown/],
    ['--asset too long in the text report', [...TAPPED, '--asset', 'A'.repeat(81)], /--asset.*at most 80 characters/],
    ['--work-order too long', [...TAPPED, '--format', 'markdown', '--work-order', 'W'.repeat(61)], /--work-order.*at most 60 characters/],
    ['--asset too long', [...TAPPED, '--format', 'markdown', '--asset', 'A'.repeat(81)], /--asset.*at most 80 characters/],
    ['unknown option', [...TAPPED, '--colour', 'red'], /unknown option --colour/],
    ['option without value', [...TAPPED, '--torque'], /--torque needs a value/],
  ];
  for (const [name, args, re] of cases) {
    it(name, async () => {
      const r = await check(args);
      expect(r.code).toBe(2);
      expect(r.err).toMatch(re);
      expect(r.err).not.toMatch(/\bat .*\.(ts|js):\d+/);
      // With --json the only stdout is one JSON error document (issue 14 item 7); otherwise nothing.
      if (args.includes('--json')) expect((JSON.parse(r.out) as {error: {exitCode: number}}).error.exitCode).toBe(2);
      else expect(r.out).toBe('');
    });
  }

  it('--preset unknown', async () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'tw-check-'));
    try {
      const r = await check(['--preset', 'no-such-preset'], {TAPWRIGHT_CONFIG_DIR: dir});
      expect(r.code).toBe(2);
      expect(r.err).toMatch(/--preset/);
    } finally {
      rmSync(dir, {recursive: true, force: true});
    }
  });
});
