import {describe, expect, it} from 'vitest';
import {boltGrade, hexHeadBearing, inchHexHead, nutDimensions} from '../../../src/core/materials/index.js';

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

  it('the metric table has no inch sizes and no untabulated metric sizes', () => {
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

describe('inch hex cap screw heads (ASME B18.2.1) and normal-fit clearance holes (ASME B18.2.8)', () => {
  // Width across flats F max/min, in: ASME B18.2.1 hex cap screw table (as reproduced by distributors).
  // Normal-fit clearance hole, in: ASME B18.2.8-1999 (a distributor table citing it; the 1/4 to 7/16
  // drills 9/32, 11/32, 13/32, 15/32 also in Machinery's Handbook 31st ed. Table 1a).
  const IN = 25.4;
  const rows: [size: string, d: number, fMax: number, fMin: number, hole: number][] = [
    ['1/4', 0.25, 0.438, 0.428, 0.281],
    ['5/16', 0.3125, 0.5, 0.489, 0.344],
    ['3/8', 0.375, 0.562, 0.551, 0.406],
    ['7/16', 0.4375, 0.625, 0.612, 0.469],
    ['1/2', 0.5, 0.75, 0.736, 0.562],
    ['5/8', 0.625, 0.938, 0.922, 0.688],
    ['3/4', 0.75, 1.125, 1.1, 0.812],
    ['7/8', 0.875, 1.312, 1.285, 0.938],
    ['1', 1, 1.5, 1.469, 1.094],
  ];
  for (const [size, d, fMax, fMin, hole] of rows) {
    it(`${size} in: F ${fMin} to ${fMax} in (ASME B18.2.1), normal hole ${hole} in (ASME B18.2.8)`, () => {
      const h = inchHexHead(d * IN);
      expect(h?.size).toBe(size);
      expect(h?.flatsMax).toBeCloseTo(fMax * IN, 9);
      expect(h?.flatsMin).toBeCloseTo(fMin * IN, 9);
      expect(h?.clearanceHole).toBeCloseTo(hole * IN, 9);
      const b = hexHeadBearing(d * IN, 'inch');
      expect(b?.clearanceHole).toBeCloseTo(hole * IN, 9);
      expect(b?.dwMin).toBeCloseTo(fMin * IN, 9);
    });
  }

  it('labels the bearing face (taken as F min) as from memory: the B18.2.1 washer-face minimum was not read', () => {
    const b = hexHeadBearing(0.5 * IN, 'inch');
    expect(b?.provenance.kind).toBe('memory');
    expect(b?.provenance.source).toContain('from memory');
    expect(b?.provenance.source).toContain('ASME B18.2.1');
    expect(b?.provenance.source).toContain('ASME B18.2.8');
  });

  it('no inch row below 1/4 or above 1 in, and no metric size in the inch table', () => {
    expect(inchHexHead(0.19 * IN)).toBeUndefined(); // #10
    expect(inchHexHead(1.125 * IN)).toBeUndefined();
    expect(hexHeadBearing(10, 'inch')).toBeUndefined();
  });
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
