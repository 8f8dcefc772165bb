import {describe, expect, it} from 'vitest';
import {blindHoleDepths, clearanceHole, minimumLigament, tapDrill} from '../../../src/core/repair/index.js';
import {wallProblem} from '../../../src/core/repair/holes.js';
import type {ThreadBasics} from '../../../src/core/repair/helical.js';
import {hexHeadBearing} from '../../../src/core/materials/index.js';

const m = (d: number, p: number): ThreadBasics => ({family: 'metric', nominal: d, pitch: p, sizeLabel: `M${d}`});

describe('tap drills for ordinary threads', () => {
  // ISO 965-1 limits of size, 6H internal minor diameter D1 min/max (mm).
  it.each([
    ['M6x1', m(6, 1), 4.917, 5.153],
    ['M8x1.25', m(8, 1.25), 6.647, 6.912],
    ['M10x1.5', m(10, 1.5), 8.376, 8.676],
    ['M12x1.75', m(12, 1.75), 10.106, 10.441],
  ])('the drill for %s lies inside the 6H minor-diameter limits %f..%f mm (ISO 965-1, 6H D1 limits)', (_n, t, min, max) => {
    const d = tapDrill(t);
    expect(d).toBeGreaterThanOrEqual(min);
    expect(d).toBeLessThanOrEqual(max);
  });

  it('common coarse tap drills M8 6.8, M10 8.5, M12 10.2 mm (ISO 2306 / DIN 336 values, from memory)', () => {
    expect(tapDrill(m(8, 1.25))).toBe(6.8);
    expect(tapDrill(m(10, 1.5))).toBe(8.5);
    expect(tapDrill(m(12, 1.75))).toBe(10.2);
  });

  it('other threads: D - P, kept inside the given minor limits (common practice, no source)', () => {
    expect(tapDrill(m(14, 1.5))).toBeCloseTo(12.5, 9);
    // 1/4-20 UNC-2B minor limits 0.196/0.207 in (ASME B1.1 class 2B): D - P = 0.200 in lies inside.
    const quarter: ThreadBasics = {family: 'unified', nominal: 6.35, pitch: 1.27, tpi: 20, sizeLabel: '1/4'};
    const drill = tapDrill(quarter, {min: 0.196 * 25.4, max: 0.207 * 25.4});
    expect(drill / 25.4).toBeGreaterThanOrEqual(0.196);
    expect(drill / 25.4).toBeLessThanOrEqual(0.207);
    expect(tapDrill(m(14, 1.5), {min: 12.7, max: 13})).toBeCloseTo(12.7, 9);
  });
});

describe('clearance holes (ISO 273 medium series)', () => {
  it('agree with the material library\'s ISO 273 medium holes for M6 to M24', () => {
    for (const d of [6, 8, 10, 12, 16, 20, 24]) {
      const h = hexHeadBearing(d);
      if (!h) continue;
      expect(clearanceHole(m(d, 1))).toBe(h.clearanceHole);
    }
  });
});

describe('blind-hole depths (common practice, no source)', () => {
  it('screw reach + 1P, + 4P plug-tap chamfer, + 118 deg point', () => {
    const d = blindHoleDepths(16, 1.5, 8.5);
    expect(d.tappedDepth).toBeCloseTo(17.5, 9);
    expect(d.drilledDepth).toBeCloseTo(23.5, 9);
    expect(d.holeDepth).toBeCloseTo(23.5 + 4.25 / Math.tan((59 * Math.PI) / 180), 9);
  });
});

describe('ligament rule (common practice, no source)', () => {
  it('needs a quarter of the new diameter, at least 1 mm, on both sides of the threshold', () => {
    expect(minimumLigament(12)).toBe(3);
    expect(minimumLigament(2)).toBe(1);
    expect(wallProblem(9, 12, 'the thread')).toBeNull(); // 9 - 6 = 3 mm left
    expect(wallProblem(8.99, 12, 'the thread')).toMatch(/leaves 2\.99 mm .* needs 3\.00 mm/);
    expect(wallProblem(undefined, 12, 'the thread')).toBeNull();
  });
});
