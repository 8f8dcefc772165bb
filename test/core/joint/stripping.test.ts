import {describe, expect, it} from 'vitest';
import {
  alexander,
  boltThreadFactorC2,
  dilationFactorC1,
  externalShearAreaPerMm,
  fedStdEngagement,
  internalShearAreaPerMm,
  internalThreadFactorC3,
  type StrippingLimits,
} from '../../../src/core/joint/stripping.js';

const IN = 25.4;
// 1/4-20 UNC-2A/2B least-material limits: Kn max 0.207 and En max 0.2224 in (ASME B1.1 class 2B
// table); Es min 0.2127 and Ds min 0.2408 in (ASME B1.1 class 2A). At = 0.0318 in² (Shigley 9th ed. Table 8-2).
const quarter20: StrippingLimits = {knMax: 0.207 * IN, esMin: 0.2127 * IN, dsMin: 0.2408 * IN, enMax: 0.2224 * IN, pitch: IN / 20};
const AT_QUARTER = 0.0318 * IN * IN;
// M10x1.5-6g/6H: D1 max 8.676, d2 min 8.862, d min 9.732, D2 max 9.206 mm (ISO 965-2 limits of size);
// As 58.0 mm² (ISO 898-1).
const m10: StrippingLimits = {knMax: 8.676, esMin: 8.862, dsMin: 9.732, enMax: 9.206, pitch: 1.5};

describe('FED-STD-H28/2B shear areas and Formula 1 (also Machinery\'s Handbook, "length of engagement")', () => {
  it('1/4-20 UNC-2A/2B: ASs 0.36796 in²/in, ASn 0.53898 in²/in (FED-STD-H28/2B shear-area formulas)', () => {
    expect(externalShearAreaPerMm(quarter20) / IN).toBeCloseTo(0.36796, 4);
    expect(internalShearAreaPerMm(quarter20) / IN).toBeCloseTo(0.53898, 4);
  });
  it('1/4-20 UNC-2A/2B at Le = D: ASs 0.092, ASn 0.135 in² (ANSI inch thread shear-area table, 3 decimals)', () => {
    expect((externalShearAreaPerMm(quarter20) * 0.25 * IN) / (IN * IN)).toBeCloseTo(0.092, 3);
    expect((internalShearAreaPerMm(quarter20) * 0.25 * IN) / (IN * IN)).toBeCloseTo(0.135, 3);
  });
  it('1/4-20: Formula 1 Le = 0.1728 in; J = 0.683 x 120/45 = 1.820 and Q = 0.3147 in for a 120 ksi screw in 45 ksi material (FED-STD-H28/2B Formula 1 and J)', () => {
    const r = fedStdEngagement(quarter20, AT_QUARTER, 120, 45);
    expect(r.le / IN).toBeCloseTo(0.1728, 4);
    expect(r.j).toBeCloseTo(1.82, 2);
    expect(r.required / IN).toBeCloseTo(0.3147, 3);
  });
  it('M10x1.5-6g/6H: ASs\' 15.580 mm²/mm, ASn\' 21.477 mm²/mm, Le 7.45 mm (FED-STD-H28/2B formulas in metric use)', () => {
    expect(externalShearAreaPerMm(m10)).toBeCloseTo(15.58, 2);
    expect(internalShearAreaPerMm(m10)).toBeCloseTo(21.477, 2);
    const r = fedStdEngagement(m10, 58.0, 800, 800);
    expect(r.le).toBeCloseTo(7.45, 2);
    expect(r.j).toBeLessThan(1); // equal strengths: the external thread governs, Le stands
    expect(r.required).toBe(r.le);
  });
});

describe('Alexander (1977) / VDI 2230 Part 1 factors (from memory: polynomials recalled, not read)', () => {
  it('C1: 1 at s/d >= 1.9 and for tapped holes, 0.75 at 1.4, 0.91 at 1.6 (from memory; continuity check)', () => {
    expect(dilationFactorC1(undefined).value).toBe(1);
    expect(dilationFactorC1(1.9).value).toBeCloseTo(1, 3);
    expect(dilationFactorC1(1.4).value).toBeCloseTo(0.75, 3);
    expect(dilationFactorC1(1.6).value).toBeCloseTo(0.91, 3);
    expect(dilationFactorC1(1.3)).toEqual({value: dilationFactorC1(1.4).value, inRange: false});
  });
  it('C2 and C3 meet at 0.897 at RS = 1; C2(1.5) 1.104, C2(2.2) 1.187; C3(0.6) 1.027, C3(0.4) 1.055 (from memory)', () => {
    expect(boltThreadFactorC2(1).value).toBeCloseTo(0.897, 3);
    expect(boltThreadFactorC2(1 + 1e-9).value).toBeCloseTo(0.897, 3);
    expect(boltThreadFactorC2(1.5).value).toBeCloseTo(1.104, 3);
    expect(boltThreadFactorC2(2.2).value).toBeCloseTo(1.187, 3);
    expect(internalThreadFactorC3(1 - 1e-9).value).toBeCloseTo(0.897, 3);
    expect(internalThreadFactorC3(0.6).value).toBeCloseTo(1.027, 3);
    expect(internalThreadFactorC3(0.4 + 1e-9).value).toBeCloseTo(1.055, 3);
  });
  it('outside the published range the factors are held, not extrapolated, and say so', () => {
    expect(internalThreadFactorC3(0.3)).toEqual({value: internalThreadFactorC3(0.4).value, inRange: false});
    expect(internalThreadFactorC3(0.4).inRange).toBe(false); // RS <= 0.4 is outside
    expect(boltThreadFactorC2(2.5)).toEqual({value: boltThreadFactorC2(2.2).value, inRange: false});
  });
  it('required engagement solves tau A C1 C2|C3 meff = Rm As for each thread; the larger governs (VDI 2230 Part 1, from memory)', () => {
    // M10 8.8 (Rm 800 MPa, tau 0.65 Rm: VDI 2230 Part 1 tau/Rm table, from memory) in steel of Rm 510 MPa (tau 0.6 Rm, from memory).
    const a = alexander(m10, 520, 306, 800 * 58.0, undefined);
    expect(a.rs).toBeCloseTo((306 * internalShearAreaPerMm(m10)) / (520 * externalShearAreaPerMm(m10)), 12);
    expect(a.rs).toBeLessThan(1);
    expect(a.requiredInternal).toBeCloseTo((800 * 58.0) / (306 * internalShearAreaPerMm(m10) * a.c3), 9);
    expect(a.requiredExternal).toBeCloseTo((800 * 58.0) / (520 * externalShearAreaPerMm(m10) * 0.897), 9);
    expect(a.required).toBe(Math.max(a.requiredInternal, a.requiredExternal));
    expect(a.outOfRange).toEqual([]);
    const weak = alexander(m10, 520, 120, 800 * 58.0, 1.3);
    expect(weak.outOfRange.length).toBe(2);
  });
});
