/**
 * Bolt and member stiffness of a preloaded joint. Working units: mm, N, MPa, N/mm.
 *
 * Sources: Budynas and Nisbett, Shigley's Mechanical Engineering Design, 9th ed.:
 * Table 8-7 (grip, effective grip of a cap screw, thread length L_T, l_d and l_t),
 * Eq. 8-17 (two springs in series), Eq. 8-18 (members in series), Eq. 8-23 with
 * Table 8-8 (exponential fit of Wileman et al. 1991); Brown, Marks' Calculations
 * for Machine Design (2005), Eq. 8.20 (conical frustum, general half-angle) and
 * Eqs. 8.22-8.23 (half-angle 30 deg, washer face D = 1.5 d).
 */

/** Cone half-angle of the frusta: 30 deg ("current practice", Marks' Calculations for Machine Design, sec. 8.2). */
export const FRUSTUM_ANGLE_DEG = 30;
/** Washer-face (small end) diameter of the frusta as a multiple of d: 1.5 (Marks, Eqs. 8.22-8.23; Shigley Table 8-7 figures). */
export const WASHER_FACE_RATIO = 1.5;

/**
 * Stiffness of one conical frustum, N/mm (Marks' Calculations for Machine Design, Eq. 8.20):
 * k = pi tan(a) E d / ln{ [(2 t tan a + D - d)(D + d)] / [(2 t tan a + D + d)(D - d)] }.
 * E modulus MPa; d hole (bolt) diameter, D small-end diameter, t thickness, all mm; a half-angle.
 */
export function frustumStiffness(modulus: number, d: number, smallEnd: number, thickness: number, angleDeg = FRUSTUM_ANGLE_DEG): number {
  const ta = Math.tan((angleDeg * Math.PI) / 180);
  const D = smallEnd;
  const ratio = ((2 * thickness * ta + D - d) * (D + d)) / ((2 * thickness * ta + D + d) * (D - d));
  return (Math.PI * ta * modulus * d) / Math.log(ratio);
}

/** Springs in series, N/mm: 1/k = sum 1/k_i (Shigley 9th ed. Eq. 8-18). */
export function series(...k: number[]): number {
  return 1 / k.reduce((s, x) => s + 1 / x, 0);
}

/** A layer of the grip: thickness (mm) and modulus (MPa). */
export interface Layer {
  thickness: number;
  modulus: number;
}

/**
 * Grip length, mm (Shigley 9th ed. Table 8-7): with a nut, the sum of the clamped parts;
 * with a tapped hole, l = h + t2/2 when t2 < d, else h + d/2 (h = the parts above the
 * tapped one, t2 = the tapped part's thickness). Also returns the layers of that grip
 * (the tapped part cut to its effective share).
 */
export function effectiveGrip(layers: readonly Layer[], d: number, tapped: boolean): {grip: number; layers: Layer[]} {
  if (!tapped || layers.length === 0) return {grip: layers.reduce((s, l) => s + l.thickness, 0), layers: [...layers]};
  const last = layers[layers.length - 1] as Layer;
  const share = Math.min(last.thickness, d) / 2;
  const top = layers.slice(0, -1);
  const out = [...top, {thickness: share, modulus: last.modulus}];
  return {grip: out.reduce((s, l) => s + l.thickness, 0), layers: out};
}

/**
 * Member stiffness by conical frusta at 30 deg over any stack, N/mm. Two cones start at
 * the head and at the far end of the grip with D = 1.5 d and meet at mid-grip; each cone
 * is cut at every change of material, every piece is a frustum (Marks Eq. 8.20) starting
 * at the diameter the cone has reached, all in series (Shigley 9th ed. Eq. 8-18; the
 * method of Example 8-2(a)). Returns the pieces for the report as well.
 */
export function memberStiffness(layers: readonly Layer[], d: number, angleDeg = FRUSTUM_ANGLE_DEG): {stiffness: number; pieces: {thickness: number; modulus: number; smallEnd: number; stiffness: number}[]} {
  const grip = layers.reduce((s, l) => s + l.thickness, 0);
  const half = grip / 2;
  const ta = Math.tan((angleDeg * Math.PI) / 180);
  const D0 = WASHER_FACE_RATIO * d;
  const pieces: {thickness: number; modulus: number; smallEnd: number; stiffness: number}[] = [];
  const walk = (stack: readonly Layer[]) => {
    let done = 0;
    for (const l of stack) {
      if (done >= half - 1e-12) break;
      const t = Math.min(l.thickness, half - done);
      const smallEnd = D0 + 2 * done * ta;
      pieces.push({thickness: t, modulus: l.modulus, smallEnd, stiffness: frustumStiffness(l.modulus, d, smallEnd, t, angleDeg)});
      done += t;
    }
  };
  walk(layers);
  walk([...layers].reverse());
  return {stiffness: series(...pieces.map(p => p.stiffness)), pieces};
}

/**
 * Member stiffness by the exponential fit for members of one material, N/mm
 * (Shigley 9th ed. Eq. 8-23, constants of Table 8-8): k_m = E d A exp(B d / l).
 */
export function exponentialMemberStiffness(modulus: number, d: number, grip: number, a: number, b: number): number {
  return modulus * d * a * Math.exp((b * d) / grip);
}

/**
 * Standard thread length L_T of a bolt, mm (Shigley 9th ed. Table 8-7): metric
 * 2d + 6 (L <= 125), 2d + 12 (125 < L <= 200), 2d + 25 (L > 200); inch series
 * 2d + 1/4 in (L <= 6 in), 2d + 1/2 in (L > 6 in).
 */
export function standardThreadLength(d: number, length: number, inch: boolean): number {
  if (inch) return 2 * d + (length <= 6 * 25.4 ? 0.25 : 0.5) * 25.4;
  if (length <= 125) return 2 * d + 6;
  if (length <= 200) return 2 * d + 12;
  return 2 * d + 25;
}

export interface BoltStiffness {
  /** N/mm */
  stiffness: number;
  /** Unthreaded and threaded lengths in the grip, mm. */
  unthreaded: number;
  threaded: number;
  /** Thread length used, mm, and whether it came from the standard rule. */
  threadLength?: number;
  threadLengthRule: 'given' | 'standard' | 'threaded-through-grip';
}

/**
 * Bolt stiffness, N/mm (Shigley 9th ed. Eq. 8-17, Table 8-7): k_b = A_d A_t E / (A_d l_t + A_t l_d),
 * l_d = L - L_T (cut to the grip), l_t = l - l_d. Without the bolt length the bolt is taken as
 * threaded through the grip: k_b = A_t E / l. d, lengths mm; A_t mm²; E MPa.
 */
export function boltStiffness(o: {d: number; stressArea: number; modulus: number; grip: number; boltLength?: number; threadLength?: number; inch: boolean}): BoltStiffness {
  const Ad = (Math.PI * o.d * o.d) / 4;
  if (o.boltLength === undefined) {
    return {stiffness: (o.stressArea * o.modulus) / o.grip, unthreaded: 0, threaded: o.grip, threadLengthRule: 'threaded-through-grip'};
  }
  const LT = o.threadLength ?? standardThreadLength(o.d, o.boltLength, o.inch);
  const ld = Math.min(o.grip, Math.max(0, o.boltLength - LT));
  const lt = o.grip - ld;
  const stiffness = (Ad * o.stressArea * o.modulus) / (Ad * lt + o.stressArea * ld);
  return {stiffness, unthreaded: ld, threaded: lt, threadLength: LT, threadLengthRule: o.threadLength !== undefined ? 'given' : 'standard'};
}

/** Joint constant C = k_b / (k_b + k_m) (Shigley 9th ed. Example 8-5; Marks Eq. 8.35). */
export function jointConstant(kb: number, km: number): number {
  return kb / (kb + km);
}
