/**
 * Load share of the engaged threads: an elastic spring chain of the Sopwith (1948) /
 * Yamamoto (1980) type. Bolt and internal-thread bodies are axial springs between
 * neighbouring threads (bolt in tension, nut or tapped body in compression), each thread
 * is a shear spring. Compatibility gives the second-order recurrence
 *   Q(i+1) - (2 + beta) Q(i) + Q(i-1) = 0,   beta = kt (1/kb + 1/kn),
 * with the free-end condition Q(n-1) = (1 + beta) Q(n) and sum Q = F
 * (D. G. Sopwith, Proc. Inst. Mech. Eng. 159 (1948) 373-383; A. Yamamoto, The Theory and
 * Computation of Threads Connection, 1980: method as described, equations derived here).
 */

/** Elastic data of the chain; lengths mm, areas mm², moduli MPa. */
export interface ChainInput {
  /** Nominal diameter d, mm. */
  nominal: number;
  /** Pitch P, mm. */
  pitch: number;
  /** Bolt body area carrying the load between threads (As), mm². */
  boltArea: number;
  /** Cross-section of the nut or tapped body around the thread, mm². */
  internalArea: number;
  /** Elastic moduli, MPa. */
  boltModulus: number;
  internalModulus: number;
}

/**
 * What the chain is calibrated to, and what not: ONLY the first thread's 38 % share (Shigley,
 * Mechanical Engineering Design, 9th ed., section 8-2, p. 419). A one-parameter elastic chain decays
 * geometrically from the loaded face, so for the reference joint with 10 threads it gives about
 * 38 / 23.6 / 14.6 % for the first three threads, not the book's 38 / 25 / 18 % (measured shares,
 * with a slower tail than an elastic chain can give). The report therefore labels the per-thread row
 * "spring chain" and the first-thread stresses "Shigley's 0.38" (see firstThreadShare in checkJoint).
 *
 * Calibration (our model choice): for a long engagement the first thread's share tends to
 * 1 - 1/r, r = ((2 + beta) + sqrt(beta^2 + 4 beta))/2. Setting it to 0.38 (Shigley,
 * Mechanical Engineering Design, 9th ed., section 8-2, p. 419) gives beta = 0.2329 for the
 * reference joint below: a steel M10x1.5 bolt (As 58.0 mm², ISO 898-1) in a steel hexagon nut
 * of 16 mm across flats. The thread stiffness kt is taken proportional to d / (1/Eb + 1/En)
 * (both teeth in series, stiffness scaling with the thread circumference).
 */
export const CALIBRATION_FIRST_SHARE = 0.38;
// Equal moduli: E cancels out of beta for the reference joint, so its value (205 GPa, typical for steel, from memory) does not matter.
const REF = {nominal: 10, pitch: 1.5, boltArea: 58.0, internalArea: hexNutArea(16, 10), boltModulus: 205000, internalModulus: 205000};

/** Cross-section of a hexagon nut of width across flats s on a bolt of diameter d: (sqrt3/2) s² - pi d²/4, mm². */
export function hexNutArea(flats: number, nominal: number): number {
  return (Math.sqrt(3) / 2) * flats * flats - (Math.PI * nominal * nominal) / 4;
}

/** Body of a tapped hole in a large part: a ring from d to 3 d (model assumption, common practice, no source), mm². */
export function tappedBodyArea(nominal: number): number {
  return (Math.PI / 4) * (9 - 1) * nominal * nominal;
}

function rawBeta(c: ChainInput): number {
  const compliance = 1 / (c.boltModulus * c.boltArea) + 1 / (c.internalModulus * Math.max(c.internalArea, 1e-6));
  return (c.nominal * c.pitch * compliance) / (1 / c.boltModulus + 1 / c.internalModulus);
}

/** beta giving a long-engagement first share s: r = 1/(1-s), beta = r + 1/r - 2. */
export function betaForFirstShare(s: number): number {
  const r = 1 / (1 - s);
  return r + 1 / r - 2;
}

const KAPPA = betaForFirstShare(CALIBRATION_FIRST_SHARE) / rawBeta(REF);

/** First-thread share of a long engagement, 1 - 1/r with r = ((2 + beta) + sqrt(beta^2 + 4 beta))/2 (closed form of the recurrence). */
export function longEngagementFirstShare(beta: number): number {
  const r = (2 + beta + Math.sqrt(beta * beta + 4 * beta)) / 2;
  return 1 - 1 / r;
}

/** The chain parameter beta = kt (1/kb + 1/kn) for a joint (dimensionless). */
export function chainBeta(c: ChainInput): number {
  return KAPPA * rawBeta(c);
}

/**
 * Share of each of n engaged threads (first = loaded face), fractions summing to 1.
 * n < 1 is treated as 1 (a single thread carries everything).
 */
export function threadShares(n: number, beta: number): number[] {
  const count = Math.max(1, Math.floor(n));
  if (count === 1) return [1];
  // r[i] = Q(i)/Q(i+1), built from the free end so nothing overflows.
  const r = new Float64Array(count - 1);
  r[count - 2] = 1 + beta;
  for (let i = count - 3; i >= 0; i--) r[i] = 2 + beta - 1 / (r[i + 1] as number);
  const q = new Array<number>(count);
  q[0] = 1;
  let sum = 1;
  for (let i = 1; i < count; i++) {
    const v = (q[i - 1] as number) / (r[i - 1] as number);
    q[i] = v;
    sum += v;
  }
  for (let i = 0; i < count; i++) q[i] = (q[i] as number) / sum;
  return q;
}
