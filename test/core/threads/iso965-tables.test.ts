import {describe, expect, it} from 'vitest';
import {parseThread, threadGeometry} from '../../../src/core/threads/index.js';
import type {ThreadGeometry} from '../../../src/core/types.js';

function geom(text: string): ThreadGeometry {
  const p = parseThread(text);
  if (!p.ok) throw new Error(p.error);
  return threadGeometry(p.value);
}

/*
 * Oracle: ISO 965-2:1998, limits of size for general purpose bolt and nut
 * threads, tolerance classes 6H (internal) and 6g (external); the same values
 * are tabulated in DIN 13-20 (coarse) and DIN 13-21 (fine). Read in a
 * public copy of those limit tables. That copy gives every 6H
 * value and the 6g d3 min to 0.001 mm, but rounds the other 6g values of
 * sizes above M10 to 0.01 mm; those are checked at that resolution below.
 *
 * Columns: d max, d min, d2 max, d2 min, d3 min (6g) | D1 min, D1 max, D2 min, D2 max, D min (6H).
 */
type Row = [string, number, number, number, number, number, number, number, number, number, number];
const EXACT_6G: Row[] = [
  // ISO 965-2:1998 6g/6H table, coarse pitch (DIN 13-20)
  ['M1.6', 1.581, 1.496, 1.354, 1.291, 1.075, 1.221, 1.321, 1.373, 1.458, 1.6],
  ['M2', 1.981, 1.886, 1.721, 1.654, 1.408, 1.567, 1.679, 1.74, 1.83, 2],
  ['M2.5', 2.48, 2.38, 2.188, 2.117, 1.84, 2.013, 2.138, 2.208, 2.303, 2.5],
  ['M3', 2.98, 2.874, 2.655, 2.58, 2.272, 2.459, 2.599, 2.675, 2.775, 3],
  ['M3.5', 3.479, 3.354, 3.089, 3.004, 2.635, 2.85, 3.01, 3.11, 3.222, 3.5],
  ['M4', 3.978, 3.838, 3.523, 3.433, 3.002, 3.242, 3.422, 3.545, 3.663, 4],
  ['M5', 4.976, 4.826, 4.456, 4.361, 3.869, 4.134, 4.334, 4.48, 4.605, 5],
  ['M6', 5.974, 5.794, 5.324, 5.212, 4.596, 4.917, 5.153, 5.35, 5.5, 6],
  ['M8', 7.972, 7.76, 7.16, 7.042, 6.272, 6.647, 6.912, 7.188, 7.348, 8],
  ['M10', 9.968, 9.732, 8.994, 8.862, 7.938, 8.376, 8.676, 9.026, 9.206, 10],
  // ISO 965-2:1998 6g/6H table, fine pitch (DIN 13-21)
  ['M8x1', 7.974, 7.794, 7.324, 7.212, 6.596, 6.917, 7.153, 7.35, 7.5, 8],
  ['M10x1.25', 9.972, 9.76, 9.16, 9.042, 8.272, 8.647, 8.912, 9.188, 9.348, 10],
  ['M10x1', 9.974, 9.794, 9.324, 9.212, 8.596, 8.917, 9.153, 9.35, 9.5, 10],
  ['M6x0.75', 5.978, 5.838, 5.491, 5.391, 4.929, 5.188, 5.378, 5.513, 5.645, 6],
  ['M3x0.35', 2.981, 2.896, 2.754, 2.687, 2.471, 2.621, 2.721, 2.773, 2.863, 3],
  ['M5x0.5', 4.98, 4.874, 4.655, 4.58, 4.272, 4.459, 4.599, 4.675, 4.775, 5],
];
const ROUNDED_6G: Row[] = [
  // ISO 965-2:1998 6g/6H table (DIN 13-20 coarse); 6g d, d2 to 0.01 mm in the public copy
  ['M12', 11.97, 11.7, 10.83, 10.68, 9.601, 10.106, 10.441, 10.863, 11.063, 12],
  ['M16', 15.96, 15.68, 14.66, 14.5, 13.271, 13.835, 14.21, 14.701, 14.913, 16],
  ['M20', 19.96, 19.62, 18.33, 18.16, 16.624, 17.294, 17.744, 18.376, 18.6, 20],
  ['M24', 23.95, 23.58, 22, 21.8, 19.955, 20.752, 21.252, 22.051, 22.316, 24],
  ['M30', 29.95, 29.52, 27.67, 27.46, 25.306, 26.211, 26.771, 27.727, 28.007, 30],
  ['M36', 35.94, 35.47, 33.34, 33.12, 30.654, 31.67, 32.27, 33.402, 33.702, 36],
  ['M42', 41.94, 41.44, 39.01, 38.78, 36.006, 37.129, 37.799, 39.077, 39.392, 42],
  ['M48', 47.93, 47.4, 44.68, 44.43, 41.351, 42.587, 43.297, 44.752, 45.087, 48],
  ['M56', 55.93, 55.37, 52.35, 52.09, 48.7, 50.046, 50.796, 52.428, 52.783, 56],
  ['M64', 63.92, 63.32, 60.02, 59.74, 56.047, 57.505, 58.305, 60.103, 60.478, 64],
  // ISO 965-2:1998 6g/6H table (DIN 13-21 fine)
  ['M12x1.5', 11.97, 11.73, 10.99, 10.85, 9.93, 10.376, 10.676, 11.026, 11.216, 12],
  ['M12x1.25', 11.97, 11.76, 11.16, 11.03, 10.258, 10.647, 10.912, 11.188, 11.368, 12],
  ['M16x1.5', 15.97, 15.73, 14.99, 14.85, 13.93, 14.376, 14.676, 15.026, 15.216, 16],
  ['M20x1.5', 19.97, 19.73, 18.99, 18.85, 17.93, 18.376, 18.676, 19.026, 19.216, 20],
  ['M24x2', 23.96, 23.68, 22.66, 22.49, 21.261, 21.835, 22.21, 22.701, 22.925, 24],
  ['M48x3', 47.95, 47.58, 46, 45.79, 43.943, 44.752, 45.252, 46.051, 46.331, 48],
];

function checkInternal(g: ThreadGeometry, r: Row): void {
  const i = g.limits.internal;
  expect([i.minorMin, i.minorMax, i.pitchMin, i.pitchMax, i.majorMin]).toEqual([r[6], r[7], r[8], r[9], r[10]]);
}

describe('ISO metric 6g/6H limits of size against ISO 965-2', () => {
  it.each(EXACT_6G)('%s-6H/6g matches ISO 965-2:1998 6g/6H limits (DIN 13-20/-21) to 0.001 mm', (name, ...v) => {
    const g = geom(`${name}-6H/6g`);
    const e = g.limits.external;
    expect([e.majorMax, e.majorMin, e.pitchMax, e.pitchMin, e.minorMin]).toEqual(v.slice(0, 5));
    checkInternal(g, [name, ...v]);
    expect(g.limitsProvenance.method).toBe('table');
    expect(g.limitsProvenance.kind).toBe('standard');
  });

  it.each(ROUNDED_6G)('%s-6H/6g matches ISO 965-2:1998 6H to 0.001 mm and 6g to the 0.01 mm of the public copy', (name, ...v) => {
    const g = geom(`${name}-6H/6g`);
    const e = g.limits.external;
    // 6g d and d2 are given to 0.01 mm in the public copy of ISO 965-2 (DIN 13-20/-21)
    for (const [got, want] of [[e.majorMax, v[0]], [e.majorMin, v[1]], [e.pitchMax, v[2]], [e.pitchMin, v[3]]] as const) {
      expect(Math.abs(got - want)).toBeLessThanOrEqual(0.005 + 1e-9);
    }
    // d3 min is given to 0.001 mm, and depends on d2 min: an exact check of es and Td2 as well
    expect(e.minorMin).toBe(v[4]);
    checkInternal(g, [name, ...v]);
  });

  it('M12x1.75-6g exact values (ISO 965-2:1998 6g table, read to 0.001 mm)', () => {
    // ISO 965-2:1998 6g: M12x1.75 d 11.966/11.701, d2 10.829/10.679
    const e = geom('M12x1.75-6g').limits.external;
    expect([e.majorMax, e.majorMin, e.pitchMax, e.pitchMin]).toEqual([11.966, 11.701, 10.829, 10.679]);
  });
});

describe('ISO 965-1 positions h and H', () => {
  it('position h has es = 0 and H has EI = 0 (ISO 965-1 definition of the positions)', () => {
    const g = geom('M10x1.5-6H/6h');
    expect(g.limits.external.majorMax).toBe(10);
    // d2 max = basic d2 = d - 0.649519P (ISO 724), rounded to 0.001 mm
    expect(g.limits.external.pitchMax).toBe(9.026);
    expect(g.limits.internal.minorMin).toBe(8.376);
  });

  it('a class the shipped tables lack falls back to the formulas for that value only, and says so', () => {
    // ISO 965-1 gives no grade-8 major-diameter tolerance for P 0.5 mm (grades 4 and 6 only below P 0.8)
    const g = geom('M3-8g');
    expect(g.limitsProvenance.method).toBe('formula');
    expect(g.notes.join(' ')).toMatch(/no Td grade 8 for P 0\.5 mm/);
    // es(g) still from the table: -20 µm for P 0.5 (ISO 965-2: M3 6g d max 2.980); the formula would give -21
    expect(g.limits.external.majorMax).toBe(2.98);
  });

  it('grades other than 6 use the shipped tables but say they are from memory', () => {
    const g = geom('M10x1.5-5H/4g6g');
    expect(g.limitsProvenance.method).toBe('table');
    expect(g.limitsProvenance.kind).toBe('memory');
    expect(g.notes.join(' ')).toMatch(/from memory/);
  });
});
