/**
 * Column buckling of a screw in compression (Shigley's Mechanical Engineering Design,
 * 9th ed., section 4-11/4-12): on the root area A = pi dr^2 / 4 with radius of
 * gyration k = dr / 4,
 *   Euler (Eqs. 4-42, 4-43):  Pcr = C pi^2 E A / (l/k)^2                  for l/k > (l/k)1
 *   J. B. Johnson (Eq. 8-9, p. 418): Pcr = A [Sy - (Sy l / (2 pi k))^2 / (C E)]  otherwise
 *   (l/k)1 = sqrt(2 pi^2 C E / Sy), where the two curves touch (section 4-12; the
 *   equation number is from memory).
 * End-condition constants C: Shigley 9th ed. Table 4-2 (read in a stored copy of the
 * book page). The table's conservative values are used, since the real end fixity of
 * a screw in a worn nut or bearing is seldom known; the theoretical values are shown.
 * Forces in N, lengths in mm, E and Sy in MPa.
 */

export type EndCondition = 'fixed-free' | 'pinned-pinned' | 'fixed-pinned' | 'fixed-fixed';

export const END_CONDITIONS: Readonly<Record<EndCondition, {conservative: number; theoretical: number; recommended: number; words: string}>> = {
  'fixed-free': {theoretical: 0.25, conservative: 0.25, recommended: 0.25, words: 'one end fixed, one free'},
  'pinned-pinned': {theoretical: 1, conservative: 1, recommended: 1, words: 'both ends pinned (rounded)'},
  'fixed-pinned': {theoretical: 2, conservative: 1, recommended: 1.2, words: 'one end fixed, one pinned'},
  'fixed-fixed': {theoretical: 4, conservative: 1, recommended: 1.2, words: 'both ends fixed'},
};

export const END_CONDITION_SOURCE = "Shigley's Mechanical Engineering Design, 9th ed., Table 4-2 (conservative values)";

export interface BucklingResult {
  /** Critical load, N. */
  criticalLoad: number;
  method: 'euler' | 'johnson';
  slenderness: number;
  transitionSlenderness: number;
  endConstant: number;
  /** Critical load / applied load, capped at 1e6. */
  margin: number;
}

/** Critical load of the screw as a column (formulas in the file header). */
export function buckling(load: number, rootDiameter: number, length: number, ends: EndCondition, yieldStrength: number, elasticModulus: number): BucklingResult {
  const C = END_CONDITIONS[ends].conservative;
  const A = (Math.PI * rootDiameter ** 2) / 4;
  const k = rootDiameter / 4;
  const slenderness = length / k;
  const transition = Math.sqrt((2 * Math.PI ** 2 * C * elasticModulus) / yieldStrength);
  let criticalLoad: number;
  let method: 'euler' | 'johnson';
  if (slenderness > transition) {
    method = 'euler';
    criticalLoad = (C * Math.PI ** 2 * elasticModulus * A) / slenderness ** 2;
  } else {
    method = 'johnson';
    criticalLoad = A * (yieldStrength - ((yieldStrength * length) / (2 * Math.PI * k)) ** 2 / (C * elasticModulus));
  }
  return {criticalLoad, method, slenderness, transitionSlenderness: transition, endConstant: C, margin: load > 0 ? Math.min(1e6, criticalLoad / load) : Infinity};
}
