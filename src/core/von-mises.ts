/**
 * The von Mises equivalent stress of a general 3D stress state and its principal stresses,
 * shared by the joint and the power-screw work. Units: MPa in, MPa out.
 * Source: Shigley, Mechanical Engineering Design, 9th ed. (Budynas & Nisbett), Eq. 5-14
 * (distortion-energy theory) and section 3-7 (principal stresses; the cubic's equation
 * number, Eq. 3-15, is from memory).
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

/** Plane form sqrt(sigma^2 + 3 tau^2), MPa (Shigley 9th ed. Eq. 5-14 with one normal and one shear stress). */
export function vonMisesAxialShear(sigma: number, tau: number): number {
  return Math.sqrt(sigma * sigma + 3 * tau * tau);
}

/**
 * Principal stresses, MPa, largest first: roots of the characteristic cubic
 * sigma^3 - I1 sigma^2 + I2 sigma - I3 = 0 (Shigley 9th ed. section 3-7; Eq. 3-15 from memory),
 * solved in the closed trigonometric form for a symmetric matrix.
 */
export function principalStresses(t: StressState): [number, number, number] {
  // Scale by the largest component so tiny or huge stresses neither underflow nor overflow.
  const m = Math.max(Math.abs(t.sx), Math.abs(t.sy), Math.abs(t.sz), Math.abs(t.txy), Math.abs(t.tyz), Math.abs(t.tzx));
  if (m === 0 || !Number.isFinite(m)) return [t.sx, t.sy, t.sz].sort((a, b) => b - a) as [number, number, number];
  const [a, b, c] = principalScaled({sx: t.sx / m, sy: t.sy / m, sz: t.sz / m, txy: t.txy / m, tyz: t.tyz / m, tzx: t.tzx / m});
  return [a * m, b * m, c * m];
}

function principalScaled(s: StressState): [number, number, number] {
  const p1 = s.txy ** 2 + s.tyz ** 2 + s.tzx ** 2;
  if (p1 === 0) {
    const v = [s.sx, s.sy, s.sz].sort((a, b) => b - a);
    return [v[0] ?? 0, v[1] ?? 0, v[2] ?? 0];
  }
  const q = (s.sx + s.sy + s.sz) / 3;
  const p2 = (s.sx - q) ** 2 + (s.sy - q) ** 2 + (s.sz - q) ** 2 + 2 * p1;
  const p = Math.sqrt(p2 / 6);
  const bx = (s.sx - q) / p;
  const by = (s.sy - q) / p;
  const bz = (s.sz - q) / p;
  const bxy = s.txy / p;
  const byz = s.tyz / p;
  const bzx = s.tzx / p;
  const detB = bx * (by * bz - byz * byz) - bxy * (bxy * bz - byz * bzx) + bzx * (bxy * byz - by * bzx);
  const r = Math.min(1, Math.max(-1, detB / 2));
  const phi = Math.acos(r) / 3;
  const e1 = q + 2 * p * Math.cos(phi);
  const e3 = q + 2 * p * Math.cos(phi + (2 * Math.PI) / 3);
  const e2 = 3 * q - e1 - e3;
  return [e1, e2, e3];
}
