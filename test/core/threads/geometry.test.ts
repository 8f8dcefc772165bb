import {describe, expect, it} from 'vitest';
import {basicProfile, parseThread, threadGeometry} from '../../../src/core/threads/index.js';
import type {ThreadGeometry} from '../../../src/core/types.js';

function geom(text: string): ThreadGeometry {
  const p = parseThread(text);
  if (!p.ok) throw new Error(p.error);
  return threadGeometry(p.value);
}

const IN2 = 25.4 * 25.4;

describe('basic profile, ISO 68-1 / ISO 724', () => {
  it('M10x1.5: H, d2, D1 and d3 from the ISO 68-1 profile', () => {
    // ISO 68-1 basic profile: H = 0.866025P, d2 = d - 0.649519P, D1 = d - 1.082532P,
    // d3 = d - 1.226869P (ISO 724 / ISO 898-1 definition of d3 for As)
    const g = geom('M10');
    expect(g.fundamentalHeight).toBeCloseTo(1.299038, 6);
    expect(g.pitchDiameter).toBeCloseTo(9.026, 3); // ISO 724 table: M10 d2 = 9.026
    expect(g.minorDiameterInternal).toBeCloseTo(8.376, 3); // ISO 724 table: M10 D1 = 8.376
    expect(g.minorDiameterExternal).toBeCloseTo(8.160, 3);
    expect(g.minorArea).toBeCloseTo((Math.PI / 4) * 8.159697 ** 2, 3);
  });

  it('M6, M8, M12 basic d2 and D1 agree with the ISO 724 dimensions', () => {
    // ISO 724:1993 basic dimensions (also the 6H D2 min / D1 min of ISO 965-2):
    // M6 5.350 / 4.917, M8 7.188 / 6.647, M12 10.863 / 10.106
    for (const [t, d2, d1] of [['M6', 5.35, 4.917], ['M8', 7.188, 6.647], ['M12', 10.863, 10.106]] as const) {
      const g = geom(t);
      expect(+g.pitchDiameter.toFixed(3)).toBe(d2);
      expect(+g.minorDiameterInternal.toFixed(3)).toBe(d1);
    }
  });

  it('unified profile uses d3 = D - 1.299038P (Shigley 9th ed. Table 8-2 footnote)', () => {
    const b = basicProfile(25.4, 25.4 / 8, 'unified');
    expect(b.d3).toBeCloseTo(25.4 - 1.299038 * (25.4 / 8), 5);
    expect(b.d2).toBeCloseTo(25.4 - 0.649519 * (25.4 / 8), 5);
  });
});

describe('tensile stress area', () => {
  // ISO 898-1:2013, table of minimum ultimate tensile loads, coarse thread: As,nom column (mm²)
  const ISO898: Array<[string, number]> = [
    ['M3', 5.03], ['M4', 8.78], ['M5', 14.2], ['M6', 20.1], ['M8', 36.6], ['M10', 58.0],
    ['M12', 84.3], ['M14', 115], ['M16', 157], ['M18', 192], ['M20', 245], ['M22', 303],
    ['M24', 353], ['M27', 459], ['M30', 561], ['M33', 694], ['M36', 817],
  ];
  it.each(ISO898)('%s As matches ISO 898-1:2013 As,nom (ultimate-load table) to 3 figures', (t, as) => {
    const g = geom(t);
    expect(Number(g.stressArea.toPrecision(3))).toBe(as);
  });

  // Shigley's Mechanical Engineering Design, 9th ed., Table 8-2: tensile-stress area At (in²),
  // with the number of decimals printed there. The book's last digit is not always the
  // rounded formula value (1/2-20: formula 0.15995, table 0.1599; #4-40: 0.006033 vs 0.00604),
  // so the check is agreement within one unit of the last printed digit.
  const SHIGLEY: Array<[string, number, number]> = [
    ['#4-40 UNC', 0.00604, 5], ['#10-24 UNC', 0.0175, 4], ['#10-32 UNF', 0.0200, 4],
    ['1/4-20 UNC', 0.0318, 4], ['1/4-28 UNF', 0.0364, 4], ['5/16-18 UNC', 0.0524, 4],
    ['3/8-16 UNC', 0.0775, 4], ['3/8-24 UNF', 0.0878, 4], ['1/2-13 UNC', 0.1419, 4],
    ['1/2-20 UNF', 0.1599, 4], ['5/8-11 UNC', 0.226, 3], ['3/4-10 UNC', 0.334, 3],
    ['1-8 UNC', 0.606, 3], ['1-1/2-6 UNC', 1.405, 3],
  ];
  it.each(SHIGLEY)('%s At agrees with Shigley 9th ed. Table 8-2 (%s in²)', (t, at, decimals) => {
    const inches = geom(t).stressArea / IN2;
    expect(Math.abs(inches - at)).toBeLessThanOrEqual(10 ** -decimals + 1e-12);
  });

  it('1/4-20 and 3/8-16 At to the 4 decimals of Shigley 9th ed. Table 8-2', () => {
    // Shigley 9th ed. Table 8-2: 1/4-20 UNC 0.0318 in², 3/8-16 UNC 0.0775 in²
    expect((geom('1/4-20 UNC').stressArea / IN2).toFixed(4)).toBe('0.0318');
    expect((geom('3/8-16 UNC').stressArea / IN2).toFixed(4)).toBe('0.0775');
  });
});

describe('power-screw threads', () => {
  it('threadGeometry refuses Tr, Acme and square threads with a plain message', () => {
    for (const t of ['Tr24x5', '1-5 ACME-2G', 'square 32x4']) {
      const p = parseThread(t);
      expect(p.ok).toBe(true);
      if (p.ok) expect(() => threadGeometry(p.value)).toThrow(/power-screw thread.*tapwright screw/);
    }
  });
});
