/**
 * Service flags on both sides of their thresholds, summaries short enough for a flag
 * line (68 characters), and the service data complete for every material row and grade.
 */
import {describe, expect, it} from 'vitest';
import {bearingPressureHigh, fatigueLow, jointSeparates, slips, FATIGUE_FAIL, FATIGUE_WATCH, SLIP_WATCH, type ServiceFlagContext} from '../../../src/core/service/flags.js';
import {listParentMaterials, boltGradeIds} from '../../../src/core/materials/index.js';
import {PARENT_SERVICE_DATA, boltExpansion} from '../../../src/core/materials/service-data.js';
import {enduranceStrength} from '../../../src/core/service/fatigue.js';

const base: ServiceFlagContext = {clampUnderLoad: 1000, separationLoad: 50_000, serviceLoadMax: 20_000, separationFactor: 2.5};
const MAX_SUMMARY = 68;

describe('service flags', () => {
  it('joint-separates at clamp load <= 0, not above (Shigley 9th ed. Eq. 8-30: n0 <= 1)', () => {
    expect(jointSeparates({...base, clampUnderLoad: 1})).toBeUndefined();
    const f = jointSeparates({...base, clampUnderLoad: 0, separationLoad: 18_000, separationFactor: 0.9});
    expect(f?.code).toBe('joint-separates');
    expect(f?.message).toContain('18.0 kN');
  });
  it('fatigue-low: fail below Goodman 1, watch below 1.2 (VDI 2230 S_D, from memory), none at 1.2', () => {
    const fat = (goodman: number, vdiFactor = 2) => fatigueLow({...base, fatigue: {goodman, alternatingStress: 40, enduranceStrength: 129, vdiFactor}});
    expect(fat(FATIGUE_FAIL - 0.01)?.level).toBe('fail');
    expect(fat(FATIGUE_FAIL + 0.01)?.level).toBe('watch');
    expect(fat(FATIGUE_WATCH)).toBeUndefined();
    expect(fat(2, 1.1)?.level).toBe('watch');
    expect(fat(0.8)?.message).toMatch(/crack at the first engaged thread/);
  });
  it('bearing-pressure-high above the limit only, with the washer size', () => {
    expect(bearingPressureHigh({...base, bearing: {where: 'head', pressure: 290, limit: 290, washer: 24}})).toBeUndefined();
    const f = bearingPressureHigh({...base, bearing: {where: 'head', pressure: 291, limit: 290, washer: 24}});
    expect(f?.message).toContain('291 MPa');
    expect(f?.message).toContain('24 mm');
  });
  it('slips: fail below 1, watch below 1.2 (VDI 2230, from memory)', () => {
    expect(slips({...base, slip: {available: 9_999, required: 10_000, factor: 0.9999}})?.level).toBe('fail');
    expect(slips({...base, slip: {available: 11_000, required: 10_000, factor: 1.1}})?.level).toBe('watch');
    expect(slips({...base, slip: {available: 12_000, required: 10_000, factor: SLIP_WATCH}})).toBeUndefined();
  });
  it(`every summary fits ${MAX_SUMMARY} characters, SI and US, with large numbers`, () => {
    for (const units of ['si', 'us'] as const) {
      const c: ServiceFlagContext = {units, clampUnderLoad: -1, separationLoad: 987_654, serviceLoadMax: 1_234_567, separationFactor: 0.5,
        fatigue: {goodman: 0.55, alternatingStress: 123, enduranceStrength: 129, vdiFactor: 0.45},
        bearing: {where: 'head', pressure: 1234, limit: 490, washer: 123},
        slip: {available: 123_456, required: 9_876_543, factor: 0.01}};
      for (const f of [jointSeparates(c), fatigueLow(c), bearingPressureHigh(c), slips(c)]) {
        expect(f).toBeDefined();
        expect(f!.summary!.length, f!.summary).toBeLessThanOrEqual(MAX_SUMMARY);
      }
    }
  });
});

describe('service data', () => {
  it('every parent material row has an expansion coefficient and a limiting pressure, each sourced', () => {
    for (const m of listParentMaterials()) {
      const d = PARENT_SERVICE_DATA[m.id];
      expect(d, m.id).toBeDefined();
      expect(d!.expansion).toBeGreaterThan(5e-6);
      expect(d!.expansion).toBeLessThan(30e-6);
      expect(d!.limitingPressure).toBeGreaterThan(100);
      for (const p of [d!.expansionProvenance, d!.limitingPressureProvenance]) {
        expect(p.source.length).toBeGreaterThan(10);
        if (p.kind === 'memory') expect(p.source).toMatch(/from memory|no source/);
      }
    }
  });
  it('every bolt grade has an expansion coefficient', () => {
    for (const id of boltGradeIds()) expect(boltExpansion(id).value).toBeGreaterThan(5e-6);
  });
  it("Shigley 9th ed. Table 8-17: 8.8 M16-M36 129 MPa, 10.9 162, 12.9 190, SAE 5 (1/4-1 in) 18.6 kpsi", () => {
    expect(enduranceStrength('8.8', 20)?.value).toBe(129);
    expect(enduranceStrength('10.9', 12)?.value).toBe(162);
    expect(enduranceStrength('12.9', 8)?.value).toBe(190);
    expect(enduranceStrength('SAE-5', 12.7)?.value).toBeCloseTo(18.6 * 6.894757, 3);
    expect(enduranceStrength('8.8', 10)?.source.source).toMatch(/safe side/);
    expect(enduranceStrength('A2-70', 10)).toBeUndefined();
  });
});
