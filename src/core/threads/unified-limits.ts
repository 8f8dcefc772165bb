/**
 * Limits of size of unified inch threads, classes 1A/2A/3A and 1B/2B/3B,
 * computed from the ASME B1.1 tolerance formulas (inches, P = 1/n, D basic major
 * diameter, LE = D the standard length of engagement used by the tables):
 *
 *   Td2(2A) = 0.0015 D^(1/3) + 0.0015 sqrt(LE) + 0.015 P^(2/3)
 *   class factors on Td2(2A): 1A 1.5, 2A 1, 3A 0.75, 1B 1.95, 2B 1.3, 3B 0.975
 *   allowance es = 0.3 Td2(2A) for 1A and 2A, 0 for 3A; internal threads none
 *   major-diameter tolerance (external): 0.060 P^(2/3) (2A, 3A), 0.090 P^(2/3) (1A)
 *   minor-diameter tolerance (internal): 1B/2B, D >= 1/4 in: 0.25P - 0.40P^2;
 *     3B, and 1B/2B below 1/4 in: 0.05 P^(2/3) + 0.03 P/D - 0.002,
 *     kept between 0.120P and 0.394P
 *
 * The formulas are recalled, not read in the standard; with the rounding below
 * (the three terms of Td2(2A) to 0.000001 in; each allowance, tolerance and the
 * basic pitch diameter to 0.0001 in, then added; 2B minor diameters to 0.001 in)
 * they reproduce the ASME B1.1 table values checked in the tests.
 */
import type {ExternalLimits, InternalLimits} from '../types.js';
import type {UnifiedClass} from './tolerance-class.js';

const IN = 25.4;
const round = (x: number, dp: number): number => {
  const f = 10 ** dp;
  return Math.round(x * f + 1e-9) / f;
};

export interface UnifiedLimitsInches {
  external: ExternalLimits;
  internal: InternalLimits;
  allowance: number;
}

/** Class-2A pitch-diameter tolerance, inches (terms to 6 decimals, sum unrounded). */
export function td2Class2A(D: number, P: number): number {
  // Each term carried to 0.000001 in: with it the 2B pitch-diameter tolerance of
  // 1/4-20 (1.3 x 0.003731 = 0.00485) rounds to the table's 0.0049 in.
  return round(0.0015 * Math.cbrt(D), 6) + round(0.0015 * Math.sqrt(D), 6) + round(0.015 * P ** (2 / 3), 6);
}

const EXT_FACTOR = {1: 1.5, 2: 1, 3: 0.75} as const;
const INT_FACTOR = {1: 1.95, 2: 1.3, 3: 0.975} as const;

/** Internal minor-diameter tolerance, inches, unrounded. */
export function minorTolerance(D: number, P: number, grade: 1 | 2 | 3): number {
  if (grade !== 3 && D >= 0.25) return 0.25 * P - 0.4 * P * P;
  const t = 0.05 * P ** (2 / 3) + 0.03 * (P / D) - 0.002;
  return Math.min(Math.max(t, 0.12 * P), 0.394 * P);
}

/** Limits of size in inches, from the ASME B1.1 formulas and rounding stated at the top of this file. */
export function unifiedLimitsInches(D: number, tpi: number, ext: UnifiedClass, int: UnifiedClass): UnifiedLimitsInches {
  const P = 1 / tpi;
  const t2a = td2Class2A(D, P);
  const es = ext.grade === 3 ? 0 : round(0.3 * t2a, 4);
  const d2 = round(D - 0.649519 * P, 4);
  const majorMax = round(D - es, 4);
  const majorTol = round((ext.grade === 1 ? 0.09 : 0.06) * P ** (2 / 3), 4);
  const pitchMax = round(d2 - es, 4);
  const external: ExternalLimits = {
    majorMax,
    majorMin: round(majorMax - majorTol, 4),
    pitchMax,
    pitchMin: round(pitchMax - round(EXT_FACTOR[ext.grade] * t2a, 4), 4),
  };
  const D1 = D - 1.082532 * P;
  const minorDp = int.grade === 3 ? 4 : 3;
  const internal: InternalLimits = {
    minorMin: round(D1, 3),
    minorMax: round(D1 + minorTolerance(D, P, int.grade), minorDp),
    pitchMin: d2,
    pitchMax: round(d2 + round(INT_FACTOR[int.grade] * t2a, 4), 4),
    majorMin: D,
  };
  return {external, internal, allowance: es};
}

/** Limits of size in mm (inch values x 25.4). */
export function unifiedLimits(D: number, tpi: number, ext: UnifiedClass, int: UnifiedClass): {external: ExternalLimits; internal: InternalLimits; allowanceMm: number} {
  const r = unifiedLimitsInches(D, tpi, ext, int);
  const mm = <T extends object>(o: T): T =>
    Object.fromEntries(Object.entries(o).map(([k, v]) => [k, typeof v === 'number' ? round(v * IN, 6) : v])) as T;
  return {external: mm(r.external), internal: mm(r.internal), allowanceMm: round(r.allowance * IN, 6)};
}
