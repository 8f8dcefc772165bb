import {describe, expect, it} from 'vitest';
import {runCli} from '../../src/cli/main.js';
import {memoryIo} from '../../src/cli/io.js';

async function run(...args: string[]) {
  const io = memoryIo();
  const code = await runCli(['threads', ...args], io);
  return {code, out: io.stdout(), err: io.stderr()};
}
const IN = 25.4;

describe('tapwright threads --over-wires --wire', () => {
  it('JSON contract: measured.pitchDiameter, measured.bestWire (mm), measured.withinLimits', async () => {
    const r = await run('M10x1.5-6H/6g', '--over-wires', '10.28', '--wire', '0.866', '--json');
    expect(r.code).toBe(0);
    const m = JSON.parse(r.out).measured;
    // Simple formula E = M - 3W + 0.866025P (Machinery's Handbook 31st ed., p. 2129) = 8.98104 mm, less the lead term (about 2 um).
    expect(m.pitchDiameterSimple).toBeCloseTo(10.28 - 3 * 0.866 + 0.866025 * 1.5, 5);
    expect(m.pitchDiameter).toBeLessThan(m.pitchDiameterSimple);
    expect(m.pitchDiameterSimple - m.pitchDiameter).toBeLessThan(0.002);
    // Best wire 0.57735P (Machinery's Handbook 31st ed., p. 2129).
    expect(m.bestWire).toBeCloseTo(0.57735 * 1.5, 5);
    // 6g d2 8.862..8.994 mm (ISO 965-2:1998)
    expect(m.withinLimits).toBe(true);
  });

  it('the handbook reading for 1/4-20 at the basic size (0.2792 in over 0.035 in wires, Machinery\'s Handbook 31st ed., p. 2130) is above the 2A maximum 0.2164 in', async () => {
    const r = await run('1/4-20 UNC-2A', '--over-wires', '0.2792in', '--wire', '0.035in', '--json');
    expect(r.code).toBe(0);
    const m = JSON.parse(r.out).measured;
    expect(Math.abs(m.pitchDiameterSimple / IN - 0.2175)).toBeLessThan(0.00006);
    expect(m.withinLimits).toBe(false);
    expect(m.position.side).toBe('above-max');
  });

  it('bare numbers follow --units: inches with --units us, and the JSON stays in mm', async () => {
    const a = await run('1/4-20 UNC-2A', '--over-wires', '0.2792', '--wire', '0.035', '--units', 'us', '--json');
    const b = await run('1/4-20 UNC-2A', '--over-wires', '7.09168mm', '--wire', '0.889mm', '--json');
    expect(a.code).toBe(0);
    expect(JSON.parse(a.out).measured.pitchDiameter).toBeCloseTo(JSON.parse(b.out).measured.pitchDiameter, 6);
  });

  it('a worn bolt: the text says how far past the minimum', async () => {
    const r = await run('M10x1.5', '--over-wires', '10.15', '--wire', '0.866');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/worn past the 6g minimum by 0\.01\d mm/);
    expect(r.out).toMatch(/best wire\s+0\.8660 mm/);
    for (const line of r.out.split('\n')) expect(line.length).toBeLessThanOrEqual(80);
  });

  it('a power thread: pitch diameter and best wire, withinLimits null (no limits of size shipped), lead angle over 5 deg marked', async () => {
    const r = await run('Tr40x14(P7)', '--over-wires', '41.2', '--wire', '3.6', '--json');
    expect(r.code).toBe(0);
    const m = JSON.parse(r.out).measured;
    expect(m.withinLimits).toBeNull();
    expect(m.leadAngleInRange).toBe(false);
    // Best wire P / (2 cos 15 deg) = 0.517638P (from the general formula).
    expect(m.bestWire).toBeCloseTo(0.517638 * 7, 5);
  });
});

describe('bad input names the option and the accepted range (exit 2)', () => {
  const cases: Array<[string[], RegExp]> = [
    [['M10x1.5', '--over-wires', '10.28', '--wire', '0.4'], /--wire is 0\.4, out of range; accepted: 0\.758 mm to 1\.516 mm/],
    [['M10x1.5', '--over-wires', '10.28', '--wire', '2'], /--wire is 2, out of range; accepted: 0\.758 mm to 1\.516 mm/],
    [['M10x1.5', '--over-wires', '12', '--wire', '0.866'], /--over-wires is 12, out of range; accepted: above 9\.4\d\d mm and up to 11\.3\d\d mm/],
    [['M10x1.5', '--over-wires', '5', '--wire', '0.866'], /--over-wires is 5, out of range/],
    [['M10x1.5', '--over-wires', 'abc', '--wire', '0.866'], /--over-wires/],
    [['M10x1.5', '--over-wires', '10.28', '--wire', '-1'], /--wire/],
    [['M10x1.5', '--over-wires', '10.28', '--wire', '0.866kg'], /--wire/],
    [['M10x1.5', '--wire', '0.866'], /--wire needs --over-wires/],
    [['M10x1.5', '--over-wires', '10.28'], /--over-wires needs --wire/],
    [['square 32x4', '--over-wires', '30', '--wire', '2'], /--over-wires: a square thread has no flanks/],
  ];
  for (const [args, re] of cases) {
    it(args.join(' '), async () => {
      const r = await run(...args);
      expect(r.code).toBe(2);
      expect(r.err).toMatch(re);
      expect(r.err).not.toMatch(/at .*\.ts:\d+/);
    });
  }
});
