import {describe, expect, it} from 'vitest';
import {
  listNutClasses,
  listParentMaterials,
  MEMORY_WORDING,
  nutClass,
  nutClassProblem,
  parentMaterial,
} from '../../../src/core/materials/index.js';

describe('parent materials', () => {
  it('covers every group the joint screen offers', () => {
    const groups = new Set(listParentMaterials().map(m => m.group));
    for (const g of ['steel', 'cast-iron', 'aluminium', 'copper-alloy', 'magnesium']) expect(groups.has(g as never)).toBe(true);
    for (const id of ['S235', 'S355', 'C45', '11SMn30', 'EN-GJL-250', 'EN-GJS-400-15', 'EN-GJS-500-7', '6061-T6', '6082-T6',
      '7075-T6', '5083-O', 'AlSi7Mg-T6', 'AlSi9Cu3-DC', 'CuZn39Pb3', 'CuSn12-C', 'CuAl10Fe5Ni5-C', 'AZ91-DC']) {
      expect(parentMaterial(id), id).toBeDefined();
    }
  });

  it('EN-GJS-400-15 400/250 and EN-GJS-500-7 500/320 MPa (EN 1563:1997, Rm min / Rp0.2 min, separately cast samples)', () => {
    expect(parentMaterial('EN-GJS-400-15')?.rm).toBe(400);
    expect(parentMaterial('EN-GJS-400-15')?.yield).toBe(250);
    expect(parentMaterial('EN-GJS-500-7')?.rm).toBe(500);
    expect(parentMaterial('EN-GJS-500-7')?.yield).toBe(320);
    expect(parentMaterial('EN-GJS-500-7')?.provenance.source).toContain('EN 1563');
  });

  it('EN-GJL-200/250/300 Rm 200/250/300 MPa (EN 1561 Table 1, separately cast samples); the proof stress is labelled from memory', () => {
    expect(['EN-GJL-200', 'EN-GJL-250', 'EN-GJL-300'].map(id => parentMaterial(id)?.rm)).toEqual([200, 250, 300]);
    const gjl = parentMaterial('en-gjl-250');
    expect(gjl?.provenance.source).toContain('EN 1561');
    expect(gjl?.yieldProvenance?.source).toContain('from memory');
  });

  it('labels every value not read in a standard with the exact memory wording', () => {
    for (const m of listParentMaterials()) {
      if (m.provenance.kind === 'memory') expect(m.provenance.source, m.id).toBe(MEMORY_WORDING);
      else expect(['standard', 'book']).toContain(m.provenance.kind);
      expect(m.shearRatioProvenance.source, m.id).toContain('from memory');
      expect(m.elasticModulusProvenance.source, m.id).toContain('from memory');
    }
  });

  it('keeps shear = shearRatio x Rm for every material', () => {
    for (const m of listParentMaterials()) expect(Math.abs(m.shear - m.shearRatio * m.rm), m.id).toBeLessThanOrEqual(0.5);
  });

  it('uses the recalled VDI 2230 ratios: grey iron 0.9 (low end of 0.9 to 1.1), nodular 0.9, aluminium 0.6 (low end of 0.6 to 0.7) (VDI 2230 Part 1, from memory)', () => {
    expect(parentMaterial('EN-GJL-250')?.shearRatio).toBe(0.9);
    expect(parentMaterial('EN-GJS-400-15')?.shearRatio).toBe(0.9);
    expect(parentMaterial('6082-T6')?.shearRatio).toBe(0.6);
  });

  it('keeps elastic moduli in the usual band of each group (common practice, no source)', () => {
    const band: Record<string, [number, number]> = {
      steel: [190_000, 215_000],
      'cast-iron': [75_000, 180_000],
      aluminium: [65_000, 75_000],
      'copper-alloy': [80_000, 130_000],
      magnesium: [40_000, 46_000],
      other: [20_000, 250_000],
    };
    for (const m of listParentMaterials()) {
      const [lo, hi] = band[m.group] ?? [0, 0];
      expect(m.elasticModulus, m.id).toBeGreaterThanOrEqual(lo);
      expect(m.elasticModulus, m.id).toBeLessThanOrEqual(hi);
    }
  });

  it('returns undefined for an unknown id', () => {
    expect(parentMaterial('unobtainium')).toBeUndefined();
  });
});

describe('nut classes', () => {
  it('has the ISO 898-2 classes 04, 05, 5, 6, 8, 9, 10, 12 (ISO 898-2:2012/2022 class list; class 6 from memory)', () => {
    const ids = new Set(listNutClasses().map(n => n.id));
    for (const id of ['04', '05', '5', '6', '8', '9', '10', '12']) expect(ids.has(id), id).toBe(true);
  });

  it('labels the nut strengths as from memory: the ISO 898-2 proof stresses were not read', () => {
    for (const n of listNutClasses()) {
      expect(n.provenance.kind).toBe('memory');
      expect(n.provenance.source).toContain(MEMORY_WORDING);
    }
  });

  it('takes class N as N x 100 MPa, the matching bolt class nominal Rm (ISO 898-2 matching rule, from memory)', () => {
    expect(nutClass('8', 10)?.rm).toBe(800);
    expect(nutClass('10', 12)?.rm).toBe(1000);
  });

  it('takes the thin nuts at their proof stress: 04 380 MPa, 05 500 MPa (ISO 898-2 thin nuts, from memory)', () => {
    expect(nutClass('04', 12)?.rm).toBe(380);
    expect(nutClass('05', 12)?.rm).toBe(500);
  });

  it('limits ISO nuts to M5..M39 and says so (ISO 898-2:2012 scope, from memory)', () => {
    expect(nutClass('8', 4)).toBeUndefined();
    expect(nutClassProblem('8', 4)).toMatch(/nut class 8 is not defined for 4 mm/);
    expect(nutClassProblem('7', 10)).toMatch(/unknown nut class "7"; accepted: 04, 05/);
  });

  it('resolves SAE J995 grade 5 by inch size: 120 ksi to 1 in, 105 ksi above (from memory)', () => {
    expect(nutClass('SAE-5', 25.4)?.rm).toBeCloseTo(120 * 6.894757293168361, 6);
    expect(nutClass('SAE-5', 1.25 * 25.4)?.rm).toBeCloseTo(105 * 6.894757293168361, 6);
  });
});
