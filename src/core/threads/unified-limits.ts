/**
 * Limits of size of unified inch threads, classes 1A/2A/3A and 1B/2B/3B.
 *
 * Where unified-table-data.ts holds the row (ASME B1.1 standard series limits
 * table), the limits are the table's. Otherwise they are computed from the
 * ASME B1.1 tolerance formulas (inches, P = 1/n, D basic major diameter,
 * LE = the smaller of D and 9P, the length of engagement used by the tables):
 *
 *   Td2(2A) = 0.0015 D^(1/3) + 0.0015 sqrt(LE) + 0.015 P^(2/3)
 *   class factors on Td2(2A): 1A 1.5, 2A 1, 3A 0.75, 1B 1.95, 2B 1.3, 3B 0.975
 *   allowance es = 0.3 Td2(2A) for 1A and 2A, 0 for 3A; internal threads none
 *   major-diameter tolerance (external): 0.060 P^(2/3) (2A, 3A), 0.090 P^(2/3) (1A)
 *   minor-diameter tolerance (internal): 1B/2B, D >= 1/4 in: 0.25P - 0.40P^2;
 *     3B, and 1B/2B below 1/4 in: 0.05 P^(2/3) + 0.03 P/D - 0.002,
 *     kept between 0.120P and 0.394P
 *
 * The formulas are recalled, not read in the standard (from memory, including
 * LE = min(D, 9P)); with the rounding below (the three terms of Td2(2A) to
 * 0.000001 in; each allowance, tolerance and the basic pitch diameter to
 * 0.0001 in, then added; 1B/2B minor diameters to 0.001 in from #6 (0.138 in)
 * up, below #6 D1 and the minor tolerance each to 0.0001 in, then added) they
 * reproduce every ASME B1.1 table value in unified-table-data.ts but one (the
 * #10-24 UNC-2B maximum minor diameter: table 0.156 in, formulas 0.155 in) and
 * the published values checked in the tests.
 */
import type {ExternalLimits, InternalLimits} from '../types.js';
import type {UnifiedClass} from './tolerance-class.js';
import {unifiedTableEntry} from './unified-table-data.js';

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

/** Class-2A pitch-diameter tolerance, inches (terms to 6 decimals, sum unrounded), LE = min(D, 9P). */
export function td2Class2A(D: number, P: number): number {
  // Each term carried to 0.000001 in: with it the 2B pitch-diameter tolerance of
  // 1/4-20 (1.3 x 0.003731 = 0.00485) rounds to the table's 0.0049 in.
  // LE = min(D, 9P) (from memory): with LE = D the 15/16-20 UNEF table row is
  // missed by up to 0.0006 in; with 9P it is matched exactly.
  const LE = Math.min(D, 9 * P);
  return round(0.0015 * Math.cbrt(D), 6) + round(0.0015 * Math.sqrt(LE), 6) + round(0.015 * P ** (2 / 3), 6);
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
  // Below #6 the table gives 1B/2B minor diameters to 0.0001 in (read for #0 to #2 in the
  // table copy; the cut-off at #6 as printed in a published class 2A/2B summary table).
  const fine = D < 0.138 - 1e-9;
  const minorMin = fine ? round(D1, 4) : round(D1, 3);
  const minorMax = fine
    ? round(minorMin + round(minorTolerance(D, P, int.grade), 4), 4)
    : round(D1 + minorTolerance(D, P, int.grade), int.grade === 3 ? 4 : 3);
  const internal: InternalLimits = {
    minorMin,
    minorMax,
    pitchMin: d2,
    pitchMax: round(d2 + round(INT_FACTOR[int.grade] * t2a, 4), 4),
    majorMin: D,
  };
  return {external, internal, allowance: es};
}

/** Where each side's limits came from. */
export interface UnifiedLimitsSource {
  external: 'table' | 'formula';
  internal: 'table' | 'formula';
}

/**
 * Limits of size in inches: the ASME B1.1 standard series limits table
 * (unified-table-data.ts) for each side it holds, the formulas above otherwise.
 */
export function unifiedLimitsTableOrFormula(D: number, tpi: number, ext: UnifiedClass, int: UnifiedClass): UnifiedLimitsInches & {source: UnifiedLimitsSource} {
  const f = unifiedLimitsInches(D, tpi, ext, int);
  const e = unifiedTableEntry(D, tpi);
  const te = e?.external[ext.text as '1A' | '2A' | '3A'];
  const ti = e?.internal[int.text as '1B' | '2B' | '3B'];
  return {
    external: te ? {majorMax: te[1], majorMin: te[2], pitchMax: te[3], pitchMin: te[4]} : f.external,
    internal: ti ? {minorMin: ti[0], minorMax: ti[1], pitchMin: ti[2], pitchMax: ti[3], majorMin: ti[4]} : f.internal,
    allowance: te ? te[0] : f.allowance,
    source: {external: te ? 'table' : 'formula', internal: ti ? 'table' : 'formula'},
  };
}

/** Limits of size in mm (inch values x 25.4), table where held, formulas otherwise. */
export function unifiedLimits(
  D: number,
  tpi: number,
  ext: UnifiedClass,
  int: UnifiedClass,
): {external: ExternalLimits; internal: InternalLimits; allowanceMm: number; source: UnifiedLimitsSource} {
  const r = unifiedLimitsTableOrFormula(D, tpi, ext, int);
  const mm = <T extends object>(o: T): T =>
    Object.fromEntries(Object.entries(o).map(([k, v]) => [k, typeof v === 'number' ? round(v * IN, 6) : v])) as T;
  return {external: mm(r.external), internal: mm(r.internal), allowanceMm: round(r.allowance * IN, 6), source: r.source};
}
