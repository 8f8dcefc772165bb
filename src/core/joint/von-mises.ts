/**
 * The von Mises equivalent stress of a general 3D stress state (distortion-energy
 * theory; Shigley, Mechanical Engineering Design, 9th ed., Eq. 5-14). Units: MPa in, MPa out.
 */

/** A symmetric 3D stress state, MPa. Normal stresses tension positive. */
export interface StressState {
  sx: number;
  sy: number;
  sz: number;
  txy: number;
  tyz: number;
  tzx: number;
}

/**
 * sigma' = sqrt( ((sx-sy)^2 + (sy-sz)^2 + (sz-sx)^2 + 6 (txy^2 + tyz^2 + tzx^2)) / 2 ), MPa.
 * Source: Shigley, Mechanical Engineering Design, 9th ed., Eq. 5-14.
 */
export function vonMises(s: StressState): number {
  const a = s.sx - s.sy;
  const b = s.sy - s.sz;
  const c = s.sz - s.sx;
  const shear = s.txy * s.txy + s.tyz * s.tyz + s.tzx * s.tzx;
  return Math.sqrt((a * a + b * b + c * c + 6 * shear) / 2);
}

/** Plane form sqrt(sigma^2 + 3 tau^2), MPa (Eq. 5-14 with one normal and one shear stress). */
export function vonMisesAxialShear(sigma: number, tau: number): number {
  return Math.sqrt(sigma * sigma + 3 * tau * tau);
}
