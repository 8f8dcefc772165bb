import {describe, expect, it} from 'vitest';
import {parsePowerThread, powerThreadGeometry} from '../../../src/core/screw/index.js';
import {ACME_ROWS, trapezoidalCrestClearance} from '../../../src/core/screw/series.js';

function geo(text: string, starts?: number) {
  const p = parsePowerThread(text, starts);
  if (!p.ok) throw new Error(p.error);
  return powerThreadGeometry(p.value);
}

describe('ISO 2904 trapezoidal basic dimensions', () => {
  // ISO 2904 basic dimensions, as tabulated in the ISO 2903 limits (7H/7e zero-deviation
  // values): Tr20x4 D1 16.000, D2 18.000, D4 20.5, d3 15.5; Tr32x6 D1 26, D2 29, D4 33, d3 25;
  // Tr16x4 D4 16.5; Tr55x14 D4 57.
  it('Tr20x4: D1 16, d2 = D2 18, D4 20.5, d3 15.5 (ac 0.25 mm for P 2 to 5)', () => {
    const g = geo('Tr20x4');
    expect(g.nutMinorDiameter).toBeCloseTo(16, 9);
    expect(g.meanDiameter).toBeCloseTo(18, 9);
    expect(g.nutMajorDiameter).toBeCloseTo(20.5, 9);
    expect(g.rootDiameter).toBeCloseTo(15.5, 9);
  });
  it('Tr32x6: D1 26, D2 29, D4 33, d3 25 (ac 0.5 mm for P 6 to 12)', () => {
    const g = geo('Tr32x6');
    expect(g.nutMinorDiameter).toBeCloseTo(26, 9);
    expect(g.meanDiameter).toBeCloseTo(29, 9);
    expect(g.nutMajorDiameter).toBeCloseTo(33, 9);
    expect(g.rootDiameter).toBeCloseTo(25, 9);
  });
  it('Tr16x4: D4 16.5; Tr55x14: D4 57 (ac 1 mm for P 14 to 44)', () => {
    expect(geo('Tr16x4').nutMajorDiameter).toBeCloseTo(16.5, 9);
    expect(geo('Tr55x14').nutMajorDiameter).toBeCloseTo(57, 9);
  });
  it('crest clearance ac by pitch (ISO 2904): 0.15 / 0.25 / 0.5 / 1 mm', () => {
    expect(trapezoidalCrestClearance(1.5)).toBe(0.15);
    expect(trapezoidalCrestClearance(2)).toBe(0.25);
    expect(trapezoidalCrestClearance(5)).toBe(0.25);
    expect(trapezoidalCrestClearance(6)).toBe(0.5);
    expect(trapezoidalCrestClearance(12)).toBe(0.5);
    expect(trapezoidalCrestClearance(14)).toBe(1);
    expect(trapezoidalCrestClearance(44)).toBe(1);
    expect(trapezoidalCrestClearance(1)).toBeUndefined();
  });
  it('multi-start Tr40x14(P7): lead 14, pitch 7, 2 starts (ISO 2904 designation)', () => {
    const g = geo('Tr40x14(P7)');
    expect(g.pitch).toBe(7);
    expect(g.lead).toBe(14);
    expect(g.starts).toBe(2);
    expect(g.meanDiameter).toBeCloseTo(36.5, 9); // d2 = 40 - 7/2
  });
  it('30 deg profile: thread thickness at D1 and d is P (0.5 + 0.5 tan 15 deg) = 0.63397 P (basic profile geometry)', () => {
    expect(geo('Tr24x5').shearWidthFactor).toBeCloseTo(0.5 + 0.5 * Math.tan(Math.PI / 12), 12);
    expect(geo('Tr24x5').flankAngle).toBe(15);
  });
});

describe("ASME B1.5 general-purpose Acme, Machinery's Handbook 27th ed. Table 3", () => {
  for (const row of ACME_ROWS) {
    it(`${row.size}-${row.tpi} ACME: D2 ${row.pitchDiameter}, D1 ${row.minorDiameter} in, lead angle ${row.leadAngle.deg} deg ${row.leadAngle.min} min`, () => {
      const g = geo(`${row.size}-${row.tpi} ACME-2G`);
      // The table gives 4 decimals of an inch: agree within half a unit of the last place.
      expect(Math.abs(g.meanDiameter / 25.4 - row.pitchDiameter)).toBeLessThanOrEqual(0.00005 + 1e-12);
      expect(Math.abs(g.nutMinorDiameter / 25.4 - row.minorDiameter)).toBeLessThanOrEqual(0.00005 + 1e-12);
      // Lead angle at the basic pitch diameter, tabulated to whole minutes.
      const lam = (Math.atan(g.lead / (Math.PI * g.meanDiameter)) * 180) / Math.PI;
      expect(Math.abs(lam * 60 - (row.leadAngle.deg * 60 + row.leadAngle.min))).toBeLessThanOrEqual(0.5);
      expect(g.flankAngle).toBe(14.5);
    });
  }
  it('crest flat 0.3707 P of the basic profile: P/2 - 2 (P/4) tan 14.5 deg (Table 3 formula)', () => {
    const g = geo('1-5 ACME-2G');
    const flat = g.pitch * (1 - g.shearWidthFactor);
    expect(flat / g.pitch).toBeCloseTo(0.3707, 4);
  });
});

describe('square thread as set up in Shigley 9th ed. Example 8-1', () => {
  it('square 32x4: dm = d - p/2 = 30, dr = d - p = 28, thickness p/2 at any depth', () => {
    const g = geo('square 32x4', 2);
    expect(g.meanDiameter).toBe(30);
    expect(g.rootDiameter).toBe(28);
    expect(g.shearWidthFactor).toBe(0.5);
    expect(g.lead).toBe(8);
  });
});

describe('designations', () => {
  it('parses and labels the forms of the issue', () => {
    const tr = parsePowerThread('Tr24x5');
    expect(tr.ok && tr.value.family).toBe('trapezoidal');
    const acme = parsePowerThread('1-5 ACME-2G');
    expect(acme.ok && acme.value.nominal).toBeCloseTo(25.4, 9);
    expect(acme.ok && acme.value.pitch).toBeCloseTo(5.08, 9);
    const sq = parsePowerThread('square 32x4');
    expect(sq.ok && sq.value.family).toBe('square');
  });
  it('applies starts and refuses a contradiction', () => {
    const two = parsePowerThread('Tr24x5', 2);
    expect(two.ok && two.value.lead).toBe(10);
    expect(two.ok && two.value.designation).toBe('Tr24x10(P5)');
    const bad = parsePowerThread('Tr40x14(P7)', 3);
    expect(bad.ok).toBe(false);
    expect(!bad.ok && bad.error).toMatch(/2 starts/);
  });
  it('rejects fastener threads and nonsense with the accepted forms', () => {
    const m = parsePowerThread('M10x1.5');
    expect(!m.ok && m.error).toMatch(/fastener thread.*Tr24x5/);
    const x = parsePowerThread('banana');
    expect(!x.ok && x.error).toMatch(/not recognised.*Tr24x5.*square 32x4/);
    const lead = parsePowerThread('Tr40x15(P7)');
    expect(!lead.ok && lead.error).toMatch(/whole multiple/);
  });
  it('marks a pitch outside the ISO 2902 pitch list (ISO 2904) as not standard', () => {
    const p = parsePowerThread('Tr24x4.5');
    expect(p.ok && p.value.isStandardPitch).toBe(false);
  });
});

describe('preferred sizes are labelled', () => {
  it('Tr24x5 is the ISO 2904 / DIN 103 preferred pitch (from memory); Tr24x8 is listed but not preferred', () => {
    const a = parsePowerThread('Tr24x5');
    expect(a.ok && a.value.series).toBe('preferred');
    const b = parsePowerThread('Tr24x8');
    expect(b.ok && b.value.series).toBeUndefined();
  });
  it('1-5 ACME is a preferred Acme pitch (Shigley 9th ed. Table 8-3); multi-start Acme gets the P/L form of ASME B1.5', () => {
    const a = parsePowerThread('1-5 ACME-2G');
    expect(a.ok && a.value.series).toBe('preferred');
    const m = parsePowerThread('1-5 ACME-2G', 2);
    expect(m.ok && m.value.designation).toBe('1-0.2P-0.4L-ACME-2G');
    expect(m.ok && m.value.lead).toBeCloseTo(10.16, 9);
  });
});

describe("stripping area of the basic profile against Machinery's Handbook 27th ed. Table 3 (class 3G shear area)", () => {
  // The model shears the screw thread on the cylinder D1 with thickness (0.5 + 0.5 tan 14.5 deg) P:
  // area per inch = pi D1 x 0.62933. The tabulated class 3G area (with tolerances) must not exceed it,
  // and the basic value should be only a few per cent larger (here 4 to 6 %).
  for (const row of ACME_ROWS) {
    it(`${row.size}-${row.tpi}: basic ${(Math.PI * row.minorDiameter * 0.62933).toFixed(3)} vs tabulated ${row.shearArea3G} in²/in`, () => {
      const g = geo(`${row.size}-${row.tpi} ACME-3G`);
      const perInch = (Math.PI * g.nutMinorDiameter * 25.4 * g.shearWidthFactor) / 25.4 ** 2; // in²/in
      expect(perInch).toBeGreaterThanOrEqual(row.shearArea3G);
      expect(perInch / row.shearArea3G).toBeLessThan(1.07);
    });
  }
});
