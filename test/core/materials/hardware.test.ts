import {describe, expect, it} from 'vitest';
import {boltGrade, hexHeadBearing, nutDimensions} from '../../../src/core/materials/index.js';

describe('hexagon head bearing face and clearance hole', () => {
  // dw,min of ISO 4014/4017 product grade A and the ISO 273 medium-series clearance hole, mm,
  // read from the standards' dimension tables as reproduced in a distributor catalogue.
  const rows: [d: number, dw: number, dh: number][] = [
    [8, 11.63, 9],
    [10, 14.63, 11],
    [12, 16.63, 13.5],
    [14, 19.64, 15.5],
    [16, 22.49, 17.5],
    [18, 25.34, 20],
    [20, 28.19, 22],
    [22, 31.71, 24],
    [24, 33.61, 26],
  ];
  for (const [d, dw, dh] of rows) {
    it(`M${d}: dw,min ${dw}, medium hole ${dh} mm (ISO 4014/4017 dimension table; ISO 273 medium series)`, () => {
      const h = hexHeadBearing(d);
      expect(h?.dwMin).toBe(dw);
      expect(h?.clearanceHole).toBe(dh);
      expect(h?.provenance.kind).toBe('standard');
    });
  }

  it('M3 to M6 clearance holes 3.4, 4.5, 5.5, 6.6 mm (ISO 273 table, medium series); dw,min labelled from memory', () => {
    expect([3, 4, 5, 6].map(d => hexHeadBearing(d)?.clearanceHole)).toEqual([3.4, 4.5, 5.5, 6.6]);
    expect(hexHeadBearing(6)?.provenance.source).toContain('from memory');
  });

  it('offers no default for inch sizes or untabulated metric sizes (no source at hand)', () => {
    expect(hexHeadBearing(12.7)).toBeUndefined();
    expect(hexHeadBearing(7)).toBeUndefined();
  });

  // With DKm = (dw,min + dh)/2, mu_K = mu_G and 90 % utilisation of Rp0.2,min, the VDI 2230
  // Part 1 formulas FM,zul = As nu Rp / sqrt(1 + 3 [1.5 (d2/d0)(P/(pi d2) + 1.155 mu)]^2) and
  // MA = FM (0.16 P + 0.58 d2 mu + mu DKm/2) reproduce the published fine-thread table based on
  // VDI 2230 (2001 edition), 8.8, mu 0.12: M8x1 20.2 kN / 26.1 N·m, M10x1.25 31.6 kN / 51 N·m.
  const vdi: [d: number, p: number, fm: number, ma: number][] = [
    [8, 1, 20.2, 26.1],
    [10, 1.25, 31.6, 51],
  ];
  for (const [d, p, fm, ma] of vdi) {
    it(`bearing data and 8.8 Rp reproduce M${d}x${p} ${fm} kN / ${ma} N·m (VDI 2230-based fine-thread table, 2001 ed., mu 0.12)`, () => {
      const mu = 0.12;
      const d2 = d - 0.649519 * p; // ISO 68-1
      const d3 = d - 1.226869 * p; // ISO 68-1 / ISO 898-1
      const d0 = (d2 + d3) / 2;
      const as = (Math.PI / 4) * d0 * d0; // ISO 898-1 stress area
      const rp = boltGrade('8.8', d)?.rpMin ?? NaN;
      const bearing = hexHeadBearing(d);
      const dkm = bearing ? (bearing.dwMin + bearing.clearanceHole) / 2 : NaN;
      const f = (as * 0.9 * rp) / Math.sqrt(1 + 3 * (1.5 * (d2 / d0) * (p / (Math.PI * d2) + 1.155 * mu)) ** 2);
      const t = (f * (0.16 * p + 0.58 * d2 * mu + (mu * dkm) / 2)) / 1000;
      expect(f / 1000).toBeCloseTo(fm, 1);
      expect(Math.abs(t - ma)).toBeLessThan(0.5);
    });
  }
});

describe('ISO 4032 style 1 hexagon nuts', () => {
  // BS EN ISO 4032:2001 Table 1 (preferred sizes): m max, m min, s, mm.
  const rows: [d: number, mMax: number, mMin: number, s: number][] = [
    [3, 2.4, 2.15, 5.5],
    [5, 4.7, 4.4, 8],
    [6, 5.2, 4.9, 10],
    [8, 6.8, 6.44, 13],
    [10, 8.4, 8.04, 16],
    [12, 10.8, 10.37, 18],
    [16, 14.8, 14.1, 24],
    [20, 18, 16.9, 30],
    [24, 21.5, 20.2, 36],
    [30, 25.6, 24.3, 46],
    [36, 31, 29.4, 55],
  ];
  for (const [d, mMax, mMin, s] of rows) {
    it(`M${d}: m ${mMin} to ${mMax}, s ${s} mm (ISO 4032:2001 Table 1)`, () => {
      const n = nutDimensions(d);
      expect(n?.heightMax).toBe(mMax);
      expect(n?.heightMin).toBe(mMin);
      expect(n?.flats).toBe(s);
      expect(n?.provenance.kind).toBe('standard');
    });
  }

  it('labels the non-preferred sizes (ISO 4032 Table 2) as from memory', () => {
    for (const d of [14, 18, 22, 27, 33]) {
      expect(nutDimensions(d)?.provenance.source).toContain('from memory');
    }
  });
});
