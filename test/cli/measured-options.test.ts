import {describe, expect, it} from 'vitest';
import {mkdtempSync} from 'node:fs';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {runCli} from '../../src/cli/main.js';
import {memoryIo} from '../../src/cli/io.js';

// Demo scenario (invented): a worn M10 tapped hole in a 6082-T6 conveyor gearbox cover, measured
// at the bench. Options of issue 17 on check and repair, read through the measured rows.
const CONFIG = mkdtempSync(path.join(tmpdir(), 'tw-measured-opts-'));
async function run(...args: string[]) {
  const io = memoryIo({env: {TAPWRIGHT_CONFIG_DIR: CONFIG}});
  const code = await runCli(args, io);
  return {code, out: io.stdout(), err: io.stderr()};
}
const COVER = ['--thread', 'M10x1.5-6H/6g', '--parent', '6082-T6', '--engage', '15', '--torque', '35Nm'];
const json = async (...a: string[]) => {
  const r = await run('check', ...COVER, ...a, '--json');
  expect(r.err).toBe('');
  return JSON.parse(r.out);
};

describe('check: measurements as options (JSON stripping.limitsUsed per thread)', () => {
  it('nothing measured: least-material on both threads', async () => {
    expect((await json()).stripping.limitsUsed).toEqual({external: 'least-material', internal: 'least-material'});
  });

  it('--hole-minor-diameter alone: the bolt thread (Kn with Es) is mixed, the internal thread stays at its limits', async () => {
    const j = await json('--hole-minor-diameter', '8.82');
    expect(j.input.measured).toEqual({holeMinorDiameter: 8.82});
    expect(j.stripping.limitsUsed).toEqual({external: 'mixed', internal: 'least-material'});
  });

  it('three wires through check (--over-wires --wire) with the hole minor diameter: bolt thread as measured', async () => {
    const j = await json('--over-wires', '10.15', '--wire', '0.866', '--hole-minor-diameter', '8.82');
    expect(j.input.measured.overWires).toEqual({measurement: 10.15, wire: 0.866});
    expect(j.stripping.limitsUsed).toEqual({external: 'measured', internal: 'least-material'});
    // E = M - 3W + 0.866025P (Machinery's Handbook 31st ed., p. 2130), less the small lead-angle term.
    expect(j.stripping.limits.esMin).toBeCloseTo(10.15 - 3 * 0.866 + 0.866025 * 1.5, 2);
  });

  it('every diameter measured: measured on both threads; the bolt pitch diameter by micrometer', async () => {
    const j = await json('--bolt-pitch-diameter', '8.95', '--bolt-major-diameter', '9.9', '--hole-minor-diameter', '8.82', '--hole-pitch-diameter', '9.1');
    expect(j.stripping.limitsUsed).toEqual({external: 'measured', internal: 'measured'});
    expect(j.input.measured).toEqual({boltPitchDiameter: 8.95, boltMajorDiameter: 9.9, holeMinorDiameter: 8.82, holePitchDiameter: 9.1});
  });

  it('a larger measured hole minor diameter lowers the bolt-thread stripping force (FED-STD-H28/2B area)', async () => {
    const a = await json('--hole-minor-diameter', '8.7');
    const b = await json('--hole-minor-diameter', '8.9');
    expect(b.stripping.external.force).toBeLessThan(a.stripping.external.force);
  });

  it('bare numbers follow --units us (inches)', async () => {
    const j = JSON.parse((await run('check', ...COVER, '--units', 'us', '--hole-minor-diameter', '0.3472', '--json')).out);
    expect(j.input.measured.holeMinorDiameter).toBeCloseTo(0.3472 * 25.4, 6);
  });

  it('gauge outcomes: --plug-nogo enters takes the limit as a bound and says so; --ring-go stops', async () => {
    const j = await json('--plug-nogo', 'enters', '--ring-go', 'stops', '--ring-nogo', 'stops', '--plug-go', 'enters');
    expect(j.input.measured.gauges).toEqual({holeNoGo: 'enters', boltGo: 'stops', boltNoGo: 'stops', holeGo: 'enters'});
    const text = (await run('check', ...COVER, '--plug-nogo', 'ENTERS')).out;
    expect(text).toMatch(/NO-GO plug gauge entered/);
  });

  it('the text report lists each measurement with its instrument', async () => {
    const r = await run('check', ...COVER, '--over-wires', '10.15', '--wire', '0.866', '--hole-minor-diameter', '8.82');
    expect(r.out).toMatch(/AS MEASURED/);
    expect(r.out).toMatch(/three wires/);
    expect(r.out).toMatch(/pin gauge or bore gauge/);
  });

  it('check --help lists every measurement option in its own section', async () => {
    const h = (await run('check', '--help')).out;
    expect(h).toMatch(/^As measured/m);
    for (const o of ['--bolt-pitch-diameter', '--over-wires M', '--wire W', '--bolt-major-diameter', '--hole-minor-diameter', '--hole-pitch-diameter', '--ring-go', '--ring-nogo', '--plug-go', '--plug-nogo']) {
      expect(h).toContain(o);
    }
  });
});

describe('check: bad measurements name the option and the accepted range (exit 2)', () => {
  const bad = async (...a: string[]) => {
    const r = await run('check', ...COVER, ...a);
    expect(r.code, a.join(' ')).toBe(2);
    expect(r.out).toBe('');
    expect(r.err).not.toMatch(/at .*\.ts:\d+/);
    return r.err;
  };
  it('a hole minor diameter not below the bolt major is physically impossible: names --hole-minor-diameter', async () => {
    expect(await bad('--hole-minor-diameter', '10.5')).toMatch(/^tapwright: --hole-minor-diameter: hole minor diameter 10\.500 mm is not below the bolt major diameter/);
    expect(await bad('--hole-minor-diameter', '7.5')).toMatch(/--hole-minor-diameter: hole minor diameter 7\.500 mm is not above the bolt's root/);
  });
  it('out of the schema range, not a number, a comma', async () => {
    expect(await bad('--hole-minor-diameter', '0.1')).toMatch(/--hole-minor-diameter.*accepted: 0\.5 mm to 2000 mm/);
    expect(await bad('--bolt-major-diameter', 'abc')).toMatch(/--bolt-major-diameter/);
    expect(await bad('--hole-pitch-diameter', '9,1')).toMatch(/--hole-pitch-diameter/);
    expect(await bad('--wire', '0.001', '--over-wires', '10.15')).toMatch(/--wire.*accepted: 0\.02 mm to 100 mm/);
  });
  it('the three-wire pair needs both; a pitch diameter and wires contradict', async () => {
    expect(await bad('--over-wires', '10.15')).toMatch(/^tapwright: --wire is needed, e\.g\. --wire /);
    expect(await bad('--wire', '0.866')).toMatch(/^tapwright: --over-wires is needed/);
    expect(await bad('--over-wires', '10.15', '--wire', '0.866', '--bolt-pitch-diameter', '8.9')).toMatch(/--bolt-pitch-diameter and --over-wires contradict each other/);
  });
  it('a wire that does not sit on the flanks, and a reading giving an impossible pitch diameter', async () => {
    expect(await bad('--over-wires', '10.15', '--wire', '3')).toMatch(/^tapwright: --wire: wire diameter 3\.000 mm does not sit on the flanks/);
    expect(await bad('--over-wires', '12.5', '--wire', '0.866')).toMatch(/^tapwright: --over-wires: bolt pitch diameter .* is outside what a M10x1\.5/);
  });
  it('bolt major and pitch diameters that cannot be', async () => {
    expect(await bad('--bolt-pitch-diameter', '10.2')).toMatch(/^tapwright: --bolt-pitch-diameter: /);
    expect(await bad('--bolt-pitch-diameter', '9', '--bolt-major-diameter', '8.9')).toMatch(/^tapwright: --bolt-major-diameter: bolt major diameter 8\.900 mm is not above the bolt pitch diameter/);
    expect(await bad('--hole-minor-diameter', '8.6', '--hole-pitch-diameter', '8.5')).toMatch(/^tapwright: --hole-pitch-diameter: /);
  });
  it('a gauge outcome other than enters or stops', async () => {
    expect(await bad('--ring-nogo', 'maybe')).toMatch(/--ring-nogo is "maybe"; accepted: enters, stops/);
    expect(await bad('--plug-go', '')).toMatch(/--plug-go/);
  });
  it('--json: the rejection is one JSON error document naming the option', async () => {
    const r = await run('check', ...COVER, '--hole-minor-diameter', '10.5', '--json');
    expect(r.code).toBe(2);
    expect(JSON.stringify(JSON.parse(r.out || r.err))).toMatch(/--hole-minor-diameter/);
  });
});

describe('repair: the same measurement options', () => {
  it('accepts them and plans with the measured state; refuses an impossible one naming the option', async () => {
    const ok = await run('repair', '--thread', 'M10x1.5', '--parent', '6082-T6', '--engage', '15', '--hole-minor-diameter', '8.82', '--over-wires', '10.15', '--wire', '0.866', '--json');
    expect(ok.err).toBe('');
    expect(JSON.parse(ok.out).options.length).toBeGreaterThan(0);
    const same = await run('repair', '--thread', 'M10x1.5', '--parent', '6082-T6', '--engage', '15', '--json');
    expect(ok.out).not.toBe(same.out);
    const bad = await run('repair', '--thread', 'M10x1.5', '--parent', '6082-T6', '--engage', '15', '--hole-pitch-diameter', '12');
    expect(bad.code).toBe(2);
    expect(bad.err).toMatch(/--hole-pitch-diameter/);
  });
});
