import {describe, expect, it} from 'vitest';
import {cls, geom, inches} from './unified-helpers.js';
import {td2Class2A, unifiedLimitsInches} from '../../../src/core/threads/unified-limits.js';


describe('unified limits of size, classes 2A/2B', () => {
  // The formulas themselves (unifiedLimitsInches), not threadGeometry: these sizes now have a 2B table row.
  const formulaInt = (D: number, n: number) => {
    const i = unifiedLimitsInches(D, n, cls('2A'), cls('2B')).internal;
    return [i.minorMin, i.minorMax, i.pitchMin, i.pitchMax, i.majorMin];
  };

  it('1/4-20 UNC-2B from the formulas matches the published UNC 2B internal-thread table (ASME B1.1 values)', () => {
    // ASME B1.1 limits of size for 1/4-20 UNC-2B, read in a published UNC 2B
    // internal-thread dimension table: minor 0.196/0.207, pitch 0.2175/0.2224 in
    expect(formulaInt(0.25, 20)).toEqual([0.196, 0.207, 0.2175, 0.2224, 0.25]);
    expect(inches(geom('1/4-20 UNC-2B')).int).toEqual([0.196, 0.207, 0.2175, 0.2224, 0.25]);
  });

  it('3/8-16 UNC-2B from the formulas matches the published UNC 2B internal-thread table (ASME B1.1 values)', () => {
    // ASME B1.1 limits of size (same published UNC 2B table), 3/8-16 UNC-2B: minor 0.307/0.321, pitch 0.3344/0.3401 in
    expect(formulaInt(0.375, 16)).toEqual([0.307, 0.321, 0.3344, 0.3401, 0.375]);
  });

  it('1/4-20 UNC-2A: allowance 0.0011, major 0.2489/0.2408, pitch 0.2164/0.2127 in', () => {
    // ASME B1.1 limits-of-size table, 1/4-20 UNC-2A (from memory of the table; the same values follow
    // from the ASME B1.1 allowance and tolerance formulas)
    const {ext} = inches(geom('1/4-20 UNC-2A'));
    expect(ext).toEqual([0.2489, 0.2408, 0.2164, 0.2127]);
    const r = unifiedLimitsInches(0.25, 20, cls('2A'), cls('2B'));
    expect(r.allowance).toBe(0.0011);
  });

  it('3/8-16 UNC-2A: allowance 0.0013, major 0.3737/0.3643, pitch 0.3331/0.3287 in', () => {
    // ASME B1.1 limits-of-size table, 3/8-16 UNC-2A (from memory of the table; formulas give the same)
    const {ext} = inches(geom('3/8-16 UNC-2A'));
    expect(ext).toEqual([0.3737, 0.3643, 0.3331, 0.3287]);
    expect(unifiedLimitsInches(0.375, 16, cls('2A'), cls('2B')).allowance).toBe(0.0013);
  });

  it.each([
    // ASME B1.1 limits-of-size table, from memory: [designation, major max, major min, PD max, PD min, PD min int, PD max int, minor min, minor max]
    ['1/2-13 UNC', 0.4985, 0.4876, 0.4485, 0.4435, 0.45, 0.4565, 0.417, 0.434],
    ['5/16-18 UNC', 0.3113, 0.3026, 0.2752, 0.2712, 0.2764, 0.2817, 0.252, 0.265],
    ['5/16-24 UNF', 0.3114, 0.3042, 0.2843, 0.2806, 0.2854, 0.2902, 0.267, 0.277],
    ['3/4-10 UNC', 0.7482, 0.7353, 0.6832, 0.6773, 0.685, 0.6927, 0.642, 0.663],
  ] as const)('%s-2A/2B agrees with the ASME B1.1 limits-of-size table (from memory)', (t, ...v) => {
    const {ext, int} = inches(geom(`${t}-2A/2B`));
    expect(ext).toEqual(v.slice(0, 4));
    expect([int[2], int[3], int[0], int[1]]).toEqual(v.slice(4, 8));
    // and the formulas alone, where the 2B side now comes from the table (5/16-18, 3/4-10)
    const g = geom(`${t}-2A/2B`).spec;
    const f = formulaInt(g.nominal / 25.4, g.tpi!);
    expect([f[2], f[3], f[0], f[1]]).toEqual(v.slice(4, 8));
  });

  it('#10-32 UNF-2B minor diameter 0.156/0.164 in (ASME B1.1 limits-of-size table, from memory)', () => {
    const {int} = inches(geom('#10-32 UNF-2B'));
    expect([int[0], int[1]]).toEqual([0.156, 0.164]);
  });
});

describe('unified classes 1A/3A/1B/3B', () => {
  it('class 3A has no allowance and 0.75 x the 2A pitch tolerance (ASME B1.1 class factors, from memory)', () => {
    const r2 = unifiedLimitsInches(0.5, 13, cls('2A'), cls('2B'));
    const r3 = unifiedLimitsInches(0.5, 13, cls('3A'), cls('3B'));
    expect(r3.allowance).toBe(0);
    expect(r3.external.majorMax).toBe(0.5);
    const t = td2Class2A(0.5, 1 / 13);
    expect(r3.external.pitchMax - r3.external.pitchMin).toBeCloseTo(Math.round(0.75 * t * 1e4) / 1e4, 10);
    // 3B pitch tolerance 0.975 x, 2B 1.3 x the 2A tolerance
    expect(r3.internal.pitchMax - r3.internal.pitchMin).toBeCloseTo(Math.round(0.975 * t * 1e4) / 1e4, 10);
    expect(r2.internal.pitchMax - r2.internal.pitchMin).toBeCloseTo(Math.round(1.3 * t * 1e4) / 1e4, 10);
  });

  it('class 1A has the 2A allowance and a wider pitch and major tolerance', () => {
    const r1 = unifiedLimitsInches(0.5, 13, cls('1A'), cls('1B'));
    const r2 = unifiedLimitsInches(0.5, 13, cls('2A'), cls('2B'));
    expect(r1.allowance).toBe(r2.allowance);
    expect(r1.external.pitchMin).toBeLessThan(r2.external.pitchMin);
    expect(r1.external.majorMin).toBeLessThan(r2.external.majorMin);
    expect(r1.internal.pitchMax).toBeGreaterThan(r2.internal.pitchMax);
  });

  it('provenance says the unified limits are computed from formulas', () => {
    // 5/16-24 UNF: no row in the table data
    const g = geom('5/16-24 UNF');
    expect(g.limitsProvenance.method).toBe('formula');
    expect(g.notes.join(' ')).toMatch(/not read from the ASME B1.1 tables/);
  });
});
