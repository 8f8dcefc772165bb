import {describe, expect, it} from 'vitest';
import {boltGrade, boltGradeIds, boltGradeProblem, boltGradeRows, listBoltGrades, KSI_MPA} from '../../../src/core/materials/index.js';

const IN = 25.4;

describe('ISO 898-1 property classes', () => {
  // ISO 898-1:2013 Table 3: Rm,min / lower yield or proof strength min / Sp,nom, MPa.
  const table3: [cls: string, d: number, rm: number, rp: number, sp: number][] = [
    ['4.6', 10, 400, 240, 225],
    ['4.8', 10, 420, 340, 310],
    ['5.6', 10, 500, 300, 280],
    ['5.8', 10, 520, 420, 380],
    ['6.8', 10, 600, 480, 440],
    ['8.8', 10, 800, 640, 580], // d <= 16 mm
    ['8.8', 20, 830, 660, 600], // d > 16 mm
    ['9.8', 10, 900, 720, 650], // d <= 16 mm only
    ['10.9', 10, 1040, 940, 830],
    ['12.9', 10, 1220, 1100, 970],
  ];
  for (const [cls, d, rm, rp, sp] of table3) {
    it(`${cls} at M${d}: Rm ${rm}, yield ${rp}, Sp ${sp} MPa (ISO 898-1:2013 Table 3)`, () => {
      const g = boltGrade(cls, d);
      expect(g).toBeDefined();
      expect(g?.rmMin).toBe(rm);
      expect(g?.rpMin).toBe(rp);
      expect(g?.proofStress).toBe(sp);
      expect(g?.provenance.kind).toBe('standard');
      expect(g?.provenance.source).toContain('ISO 898-1');
    });
  }

  it('splits 8.8 at M16: M16 takes the d <= 16 row, M18 the d > 16 row (ISO 898-1:2013 Table 3)', () => {
    expect(boltGrade('8.8', 16)?.rmMin).toBe(800);
    expect(boltGrade('8.8', 16)?.rpMin).toBe(640);
    expect(boltGrade('8.8', 18)?.rmMin).toBe(830);
    expect(boltGrade('8.8', 18)?.rpMin).toBe(660);
    expect(boltGradeRows('8.8')).toHaveLength(2);
  });

  it('offers 9.8 only up to M16 (ISO 898-1:2013 Table 3, class 9.8 for d <= 16 mm)', () => {
    expect(boltGrade('9.8', 16)).toBeDefined();
    expect(boltGrade('9.8', 20)).toBeUndefined();
    expect(boltGradeProblem('9.8', 20)).toMatch(/9\.8 is not defined for 20 mm/);
  });

  // Loads = As x stress. As from ISO 898-1 (M10 58.0, M12 84.3, M20 245, M24 353 mm²).
  // Published loads from the ISO 898-1:2013 tables of minimum ultimate tensile loads and
  // proof loads (coarse thread), which ISO rounds to 3 significant figures.
  const loads: [cls: string, d: number, as: number, proof: number, ultimate: number][] = [
    ['8.8', 10, 58.0, 33_700, 46_400],
    ['10.9', 12, 84.3, 70_000, 87_700],
    ['8.8', 20, 245, 147_000, 203_000],
    ['12.9', 24, 353, 342_000, 431_000],
  ];
  for (const [cls, d, as, proof, ultimate] of loads) {
    it(`reproduces the ISO 898-1 proof and ultimate loads of M${d} ${cls} (ISO 898-1:2013 load tables)`, () => {
      const g = boltGrade(cls, d);
      expect(g).toBeDefined();
      if (!g?.proofStress) return;
      expect(Math.abs(as * g.proofStress - proof) / proof).toBeLessThan(0.005);
      expect(Math.abs(as * g.rmMin - ultimate) / ultimate).toBeLessThan(0.005);
    });
  }
});

describe('ISO 3506-1 austenitic stainless classes', () => {
  // ISO 3506-1, mechanical properties of austenitic grades: Rm min / Rp0.2 min, MPa
  // (class 50: 500/210, 70: 700/450, 80: 800/600), read in a secondary data sheet of an older edition.
  const rows: [string, number, number][] = [
    ['A2-50', 500, 210],
    ['A2-70', 700, 450],
    ['A2-80', 800, 600],
    ['A4-50', 500, 210],
    ['A4-70', 700, 450],
    ['A4-80', 800, 600],
  ];
  for (const [id, rm, rp] of rows) {
    it(`${id}: Rm ${rm}, Rp0.2 ${rp} MPa (ISO 3506-1 austenitic property table)`, () => {
      const g = boltGrade(id, 12);
      expect(g?.rmMin).toBe(rm);
      expect(g?.rpMin).toBe(rp);
      expect(g?.standard).toBe('ISO 3506-1');
    });
  }
  it('matches ids case-insensitively', () => {
    expect(boltGrade('a2-70', 10)?.id).toBe('A2-70');
  });
});

describe('SAE J429 grades', () => {
  // SAE J429 proof / yield / tensile minimums in ksi, as tabulated in Shigley & Mischke,
  // Mechanical Engineering Design, 5th ed., p. 341.
  const rows: [id: string, inches: number, proof: number, yld: number, tensile: number][] = [
    ['SAE-2', 0.25, 55, 57, 74],
    ['SAE-2', 0.75, 55, 57, 74],
    ['SAE-2', 0.875, 33, 36, 60], // over 3/4 to 1-1/2 in
    ['SAE-5', 0.5, 85, 92, 120],
    ['SAE-5', 1, 85, 92, 120],
    ['SAE-5', 1.125, 74, 81, 105], // over 1 to 1-1/2 in
    ['SAE-8', 0.25, 120, 130, 150],
    ['SAE-8', 1.5, 120, 130, 150],
  ];
  for (const [id, inches, proof, yld, tensile] of rows) {
    it(`${id} at ${inches} in: ${proof}/${yld}/${tensile} ksi (SAE J429 per Shigley & Mischke 5th ed. p. 341)`, () => {
      const g = boltGrade(id, inches * IN);
      expect(g).toBeDefined();
      expect(g?.proofStress).toBeCloseTo(proof * KSI_MPA, 9);
      expect(g?.rpMin).toBeCloseTo(yld * KSI_MPA, 9);
      expect(g?.rmMin).toBeCloseTo(tensile * KSI_MPA, 9);
    });
  }

  it('converts ksi exactly: 1 ksi = 6.894757293168361 MPa (NIST SP 811: 1 lbf = 4.4482216152605 N, 1 in = 25.4 mm)', () => {
    expect(KSI_MPA).toBeCloseTo(6.894757293168361, 12);
    expect(boltGrade('SAE-5', 12.7)?.rmMin).toBeCloseTo(827.3708751802, 6);
  });

  it('has no SAE J429 row below 1/4 in or above 1-1/2 in (SAE J429 size range per Shigley & Mischke 5th ed. p. 341)', () => {
    expect(boltGrade('SAE-5', 0.19 * IN)).toBeUndefined();
    expect(boltGrade('SAE-8', 1.75 * IN)).toBeUndefined();
  });
});

describe('bolt grade list', () => {
  it('lists every id the mechanics and the CLI rely on', () => {
    expect(boltGradeIds()).toEqual([
      '4.6', '4.8', '5.6', '5.8', '6.8', '8.8', '9.8', '10.9', '12.9',
      'A2-50', 'A2-70', 'A2-80', 'A4-50', 'A4-70', 'A4-80', 'SAE-2', 'SAE-5', 'SAE-8',
    ]);
    expect(listBoltGrades().length).toBeGreaterThanOrEqual(18);
  });

  it('names the accepted ids for an unknown grade', () => {
    expect(boltGradeProblem('8.9', 10)).toMatch(/unknown bolt grade "8.9"; accepted: 4\.6, .*SAE-8/);
    expect(boltGradeProblem('8.8', 10)).toBeUndefined();
  });

  it('labels the VDI 2230 shear ratios as recalled: 8.8 0.65, 10.9 0.62, 12.9 0.60 (VDI 2230 Part 1, from memory)', () => {
    expect(boltGrade('8.8', 10)?.shearRatio).toBe(0.65);
    expect(boltGrade('10.9', 10)?.shearRatio).toBe(0.62);
    expect(boltGrade('12.9', 10)?.shearRatio).toBe(0.6);
    for (const g of listBoltGrades()) {
      expect(g.shearRatioProvenance.kind).toBe('memory');
      expect(g.shearRatioProvenance.source).toContain('from memory');
    }
  });
});
