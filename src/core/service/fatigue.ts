/**
 * Fatigue of the bolt thread under a cyclic axial load. MPa, N, mm², mm.
 *
 * Sources: Shigley's Mechanical Engineering Design, 9th ed.: Eqs. 8-35, 8-36 (stresses),
 * p. 445 Eq. (c) (Goodman line meets the load line from the preload), Eq. 8-45 (the
 * repeated-load case), Eq. 8-51 (yield check); Table 8-17 (endurance strengths).
 * VDI 2230 Part 1 (2003) thread endurance limit sigma_ASV = 0.85 (150/d + 45), from memory.
 */
import type {Provenance} from '../types.js';
import {ENDURANCE_ROWS, ENDURANCE_TABLE_SOURCE} from '../materials/service-data.js';

export interface FatigueResult {
  /** MPa */
  alternatingStress: number;
  meanStress: number;
  /** Stress from the preload alone, F_i / A_t, MPa. */
  preloadStress: number;
  /** Fully corrected endurance strength S_e, MPa, and its source. */
  enduranceStrength: number;
  enduranceSource: Provenance;
  /** Goodman factor n_f = S_a / sigma_a. */
  goodman: number;
  /** Yield check n_p = S_p / (sigma_m + sigma_a). */
  yieldCheck: number;
  /** VDI 2230 thread endurance limit (rolled before heat treatment), MPa, and sigma_ASV / sigma_a. */
  vdiEndurance: number;
  vdiFactor: number;
}

/** VDI 2230 Part 1 (2003) endurance limit of a thread rolled before heat treatment, MPa: 0.85 (150/d + 45), d mm (from memory). */
export function vdiThreadEndurance(d: number): number {
  return 0.85 * (150 / d + 45);
}

/**
 * Fully corrected endurance strength of a grade with rolled threads, MPa (Shigley 9th ed.
 * Table 8-17), or undefined for a grade the table lacks. A class 8.8 bolt below M16 takes
 * the M16-M36 value (smaller threads endure more, so this is on the safe side: common
 * practice, no source); a size outside a row's range takes the nearest row and says so.
 */
export function enduranceStrength(gradeId: string, d: number): {value: number; source: Provenance} | undefined {
  const rows = ENDURANCE_ROWS.filter(r => r.grade.toUpperCase() === gradeId.toUpperCase());
  if (rows.length === 0) return undefined;
  const exact = rows.find(r => d >= r.sizeMin - 0.01 && d <= r.sizeMax + 0.01);
  if (exact) return {value: exact.se, source: ENDURANCE_TABLE_SOURCE};
  const nearest = [...rows].sort((a, b) => Math.min(Math.abs(d - a.sizeMin), Math.abs(d - a.sizeMax)) - Math.min(Math.abs(d - b.sizeMin), Math.abs(d - b.sizeMax)))[0];
  if (!nearest) return undefined;
  const note = gradeId === '8.8' && d < 16 ? 'the M16-M36 value used below M16, on the safe side (common practice, no source)' : 'the nearest size row used outside its size range (common practice, no source)';
  return {value: nearest.se, source: {source: `${ENDURANCE_TABLE_SOURCE.source}; ${note}`, kind: 'book'}};
}

/**
 * Stresses and factors of a bolt thread under a load cycling between Pmin and Pmax (N)
 * on a preload F_i (N): sigma_a = C (Pmax - Pmin) / (2 A_t) (Eq. 8-35),
 * sigma_m = C (Pmax + Pmin) / (2 A_t) + F_i/A_t (Eq. 8-36); Goodman
 * n_f = S_e (S_ut - sigma_i) / [S_ut sigma_a + S_e (sigma_m - sigma_i)] (p. 445 Eq. (c) over sigma_a,
 * Eq. 8-45 for a repeated load); n_p = S_p / (sigma_m + sigma_a) (Eq. 8-51).
 */
export function threadFatigue(o: {C: number; pMin: number; pMax: number; preload: number; stressArea: number; se: number; seSource: Provenance; sut: number; sp: number; d: number}): FatigueResult {
  const sa = (o.C * (o.pMax - o.pMin)) / (2 * o.stressArea);
  const si = o.preload / o.stressArea;
  const sm = (o.C * (o.pMax + o.pMin)) / (2 * o.stressArea) + si;
  const goodman = sa > 0 ? (o.se * (o.sut - si)) / (o.sut * sa + o.se * (sm - si)) : Infinity;
  const vdi = vdiThreadEndurance(o.d);
  return {
    alternatingStress: sa,
    meanStress: sm,
    preloadStress: si,
    enduranceStrength: o.se,
    enduranceSource: o.seSource,
    goodman,
    yieldCheck: o.sp / (sm + sa),
    vdiEndurance: vdi,
    vdiFactor: sa > 0 ? vdi / sa : Infinity,
  };
}
