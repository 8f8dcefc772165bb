import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {parseThread} from '../../../src/core/threads/index.js';
import {
  bestWire,
  overWires,
  pitchDiameterFromWires,
  wireProfile,
  wireRange,
  type WireProfile,
} from '../../../src/core/threads/measure-wires.js';
import type {ThreadSpec} from '../../../src/core/types.js';

const IN = 25.4;

function spec(text: string): ThreadSpec {
  const p = parseThread(text);
  if (!p.ok) throw new Error(p.error);
  return p.value;
}

/** An inch 60-degree thread of the U.S. standard / unified basic form, in mm. */
function unifiedInch(d: number, tpi: number): WireProfile {
  const P = IN / tpi;
  return {halfAngle: 30, pitch: P, lead: P, major: d * IN, basicPitchDiameter: d * IN - 0.649519 * P, crestFlat: P / 8, profile: '60'};
}

describe('three-wire pitch diameter, 60-degree threads', () => {
  // Machinery's Handbook, 31st ed., p. 2130, table "Dimensions Over Wires of Given Diameter for
  // Checking Screw Threads of American National Form (US Standard) and the V-Form", US thread column:
  // the dimension over wires at the basic pitch diameter. The table is the simple formula (lead
  // angle neglected), so the simple pitch diameter must come back to the basic one within the
  // table's rounding (0.00005 in).
  const cases: Array<[string, number, number, number, number]> = [
    ['1/4-20', 0.25, 20, 0.035, 0.2792],
    ['3/8-16', 0.375, 16, 0.04, 0.4003],
    ['7/16-14', 0.4375, 14, 0.05, 0.4793],
    ['1/2-12', 0.5, 12, 0.05, 0.5237],
  ];
  for (const [name, d, tpi, w, m] of cases) {
    it(`${name}, wire ${w} in over ${m} in gives the basic pitch diameter (Machinery's Handbook 31st ed., p. 2130)`, () => {
      const p = unifiedInch(d, tpi);
      const r = pitchDiameterFromWires(p, m * IN, w * IN);
      expect(Math.abs(r.pitchDiameterSimple / IN - p.basicPitchDiameter / IN)).toBeLessThan(0.00006);
      // The lead-angle term makes the corrected value smaller (Machinery's Handbook 31st ed., p. 2129).
      expect(r.pitchDiameter).toBeLessThan(r.pitchDiameterSimple);
      expect(r.leadAngleInRange).toBe(true);
    });
  }

  it('1-1/2-6 U.S. standard with 0.140 in wires reads 1.6674 in at the basic size (F. D. Jones, Turning and Boring, Industrial Press, worked example of the wire method)', () => {
    const p = unifiedInch(1.5, 6);
    const r = pitchDiameterFromWires(p, 1.6674 * IN, 0.14 * IN);
    expect(Math.abs(r.pitchDiameterSimple / IN - 1.391747)).toBeLessThan(0.00005);
  });

  it('the constant of the simple formula is 0.866025P: 0.04330 in at 20 threads per inch (Machinery\'s Handbook 31st ed., p. 2129)', () => {
    const p = unifiedInch(0.25, 20);
    const w = 0.03 * IN;
    const r = pitchDiameterFromWires(p, 0.3 * IN, w);
    expect((r.pitchDiameterSimple - (0.3 * IN - 3 * w)) / IN).toBeCloseTo(0.0433, 4);
  });

  it('best wire 0.57735P: 0.02887 in at 20 threads per inch (Machinery\'s Handbook 31st ed., p. 2129 best-wire column)', () => {
    expect(bestWire(unifiedInch(0.25, 20)) / IN).toBeCloseTo(0.02887, 5);
    expect(bestWire(wireProfile(spec('M10x1.5'))) / 1.5).toBeCloseTo(0.57735, 5);
  });

  it('usable wires for 60 degrees run from 0.50518P to 1.01036P (profile geometry: wire tops at the major diameter; contact at the crest)', () => {
    const r = wireRange(wireProfile(spec('M10x1.5')));
    expect(r.min / 1.5).toBeCloseTo(0.505181, 5);
    expect(r.max / 1.5).toBeCloseTo(1.010363, 5);
  });
});

describe('three-wire method, Acme and trapezoidal', () => {
  it('Acme best wire 0.51645P, min 0.487263P, max 0.650013P; 5 threads per inch: 0.10329 in (Machinery\'s Handbook 31st ed., p. 2135)', () => {
    const p = wireProfile(spec('1-5 ACME-2G'));
    expect(bestWire(p) / IN).toBeCloseTo(0.10329, 5);
    const r = wireRange(p);
    expect(r.min / p.pitch).toBeCloseTo(0.487263, 4);
    expect(r.max / p.pitch).toBeCloseTo(0.650013, 4);
  });

  it('Acme constant at 5.0 deg lead angle, 1-start: (C + c) = 0.64311 for 1 in pitch, within 0.0003 (Machinery\'s Handbook 31st ed., p. 2136, large-lead-angle table)', () => {
    const p: WireProfile = {halfAngle: 14.5, pitch: IN, lead: IN, major: 10 * IN, basicPitchDiameter: 9.5 * IN, crestFlat: 0.3707 * IN, profile: 'acme'};
    const e = p.lead / (Math.PI * Math.tan((5 * Math.PI) / 180));
    const w = 0.5145 * IN;
    expect(Math.abs((overWires(p, e, w) - e) / IN - 0.64311)).toBeLessThan(0.0003);
  });

  it('above 5 deg the result is marked outside the simple method and stays within 0.001 in of the handbook example: 5 tpi 4-start Acme, 0.10024 in wires, M = 1.1498 in, E = 1.0250 in (Machinery\'s Handbook 31st ed., p. 2134)', () => {
    const P = IN / 5;
    const p: WireProfile = {halfAngle: 14.5, pitch: P, lead: 4 * P, major: 1.125 * IN, basicPitchDiameter: 1.025 * IN, crestFlat: 0.3707 * P, profile: 'acme'};
    const r = pitchDiameterFromWires(p, 1.1498 * IN, 0.10024 * IN);
    expect(r.leadAngleInRange).toBe(false);
    expect(r.leadAngle).toBeCloseTo(13.95, 1);
    expect(Math.abs(r.pitchDiameter / IN - 1.025)).toBeLessThan(0.001);
  });

  it('30-degree trapezoidal constants 1 + csc 15 = 4.863703 and (1/2) cot 15 = 1.866025, best wire 0.517638P (computed from the general symmetric formula, which reproduces the 60-degree and Acme constants of the handbook, Machinery\'s Handbook 31st ed., pp. 2129 and 2135; no trapezoidal table value read)', () => {
    const p = wireProfile(spec('Tr24x5'));
    expect(bestWire(p) / 5).toBeCloseTo(0.517638, 6);
    const r = pitchDiameterFromWires(p, 30, 2);
    expect(r.pitchDiameterSimple).toBeCloseTo(30 - 4.863703 * 2 + 1.866025 * 5, 5);
  });

  it('a square thread has no flanks for wires', () => {
    expect(() => wireProfile(spec('square 32x4'))).toThrow(/square thread/);
  });
});

describe('round trips: basic pitch diameter to M and back', () => {
  for (const t of ['M10x1.5', 'M6x1', '1/4-20 UNC', '1/2-13 UNC', 'Tr24x5', 'Tr40x14(P7)', '1-5 ACME-2G']) {
    it(`${t}: the basic pitch diameter gives M and M gives it back`, () => {
      const p = wireProfile(spec(t));
      const w = bestWire(p);
      const m = overWires(p, p.basicPitchDiameter, w);
      expect(pitchDiameterFromWires(p, m, w).pitchDiameter).toBeCloseTo(p.basicPitchDiameter, 9);
    });
  }

  it('M10x1.5 with the best wire: M = 9.026 + 3 x 0.866 - 1.299 = 10.325 mm plus a lead term under 2 um (simple formula with the 0.866025P constant, Machinery\'s Handbook 31st ed., p. 2129)', () => {
    const p = wireProfile(spec('M10x1.5'));
    const m = overWires(p, p.basicPitchDiameter, bestWire(p));
    expect(m).toBeGreaterThan(10.325);
    expect(m - 10.325038).toBeLessThan(0.002);
  });

  it('property: any pitch diameter and usable wire come back through M (fast-check)', () => {
    const threads = ['M10x1.5', 'M3x0.5', 'M36x4', '3/8-16 UNC', 'Tr40x7', '2-4 ACME-2G'].map(t => wireProfile(spec(t)));
    fc.assert(
      fc.property(fc.integer({min: 0, max: threads.length - 1}), fc.double({min: 0, max: 1, noNaN: true}), fc.double({min: -0.2, max: 0.05, noNaN: true}), (i, wf, de) => {
        const p = threads[i] as WireProfile;
        const r = wireRange(p);
        const w = r.min + wf * (r.max - r.min);
        const e = p.basicPitchDiameter + de * p.pitch;
        const back = pitchDiameterFromWires(p, overWires(p, e, w), w).pitchDiameter;
        return Math.abs(back - e) < 1e-9;
      }),
    );
  });
});
