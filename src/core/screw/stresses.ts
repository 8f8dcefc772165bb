/**
 * Stresses in a screw thread, MPa, from forces in N, torques in N·mm, lengths in mm.
 * Textbook method of Shigley's Mechanical Engineering Design, 9th ed., pp. 418-419:
 *
 *   body torsion        tau     = 16 T / (pi dr^3)                (Eq. 8-7)
 *   body axial          sigma   = -+ 4 F / (pi dr^2)              (Eq. 8-8; - in compression)
 *   thread bearing      sigmaB  = -2 F / (pi dm nt p)             (Eq. 8-10)
 *   root bending        sigmab  =  6 F / (pi dr nt p)             (Eq. 8-11)
 *   transverse shear    tau     =  3 F / (pi dr nt p)             (Eq. 8-12, at the centre of the root)
 *
 * Stress state at the top of the root (p. 419): sigma_x = sigmab, sigma_y = body axial,
 * tau_yz = body torsion, others zero; combined by the 3D von Mises formula (Eq. 5-14).
 * First thread (p. 419): it carries about 0.38 of the load; use 0.38 F with nt = 1.
 *
 * These functions do not depend on the screw work and could move to a shared module.
 */

export interface StressTensor {
  sx: number;
  sy: number;
  sz: number;
  txy: number;
  tyz: number;
  tzx: number;
}

/** von Mises stress from the six components (Shigley 9th ed. Eq. 5-14). */
export function vonMises3D(s: StressTensor): number {
  const a = (s.sx - s.sy) ** 2 + (s.sy - s.sz) ** 2 + (s.sz - s.sx) ** 2;
  const b = 6 * (s.txy ** 2 + s.tyz ** 2 + s.tzx ** 2);
  return Math.sqrt((a + b) / 2);
}

/**
 * Principal stresses, largest first: roots of the characteristic cubic
 * sigma^3 - I1 sigma^2 + I2 sigma - I3 = 0 (Shigley 9th ed. section 3-7; Eq. 3-15 from memory), solved in the
 * closed trigonometric form for a symmetric matrix.
 */
export function principalStresses(t: StressTensor): [number, number, number] {
  // Scale by the largest component so tiny or huge stresses neither underflow nor overflow.
  const m = Math.max(Math.abs(t.sx), Math.abs(t.sy), Math.abs(t.sz), Math.abs(t.txy), Math.abs(t.tyz), Math.abs(t.tzx));
  if (m === 0 || !Number.isFinite(m)) return [t.sx, t.sy, t.sz].sort((a, b) => b - a) as [number, number, number];
  const [a, b, c] = principalScaled({sx: t.sx / m, sy: t.sy / m, sz: t.sz / m, txy: t.txy / m, tyz: t.tyz / m, tzx: t.tzx / m});
  return [a * m, b * m, c * m];
}

function principalScaled(s: StressTensor): [number, number, number] {
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

export interface BodyStresses {
  /** Axial stress on the root area, MPa; negative in compression. */
  axial: number;
  /** Torsional shear stress on the root section, MPa. */
  torsion: number;
  /** von Mises of the two, MPa. */
  vonMises: number;
}

/** Body stresses at the root diameter dr (Shigley 9th ed. Eqs. 8-7, 8-8). */
export function bodyStresses(load: number, torque: number, rootDiameter: number, compression: boolean): BodyStresses {
  const dr = rootDiameter;
  const axial = ((compression ? -4 : 4) * load) / (Math.PI * dr * dr);
  const torsion = (16 * torque) / (Math.PI * dr ** 3);
  return {axial, torsion, vonMises: Math.sqrt(axial * axial + 3 * torsion * torsion)};
}

export interface ThreadRootInput {
  /** Total axial load F, N. */
  load: number;
  /** Torque in the screw body at the nut, N·mm. */
  torque: number;
  rootDiameter: number;
  meanDiameter: number;
  pitch: number;
  /** Share of F on the thread considered (0.38 for the first thread). */
  share: number;
  /** Number of threads that share the `share` of the load (1 for the first thread). */
  threads: number;
  compression: boolean;
}

export interface ThreadRootStresses {
  bearing: number;
  bending: number;
  /** Transverse shear at the centre of the root section (Eq. 8-12). */
  shear: number;
  axial: number;
  torsion: number;
  vonMises: number;
  principal: [number, number, number];
  /** Largest shear stress from the principal stresses, (s1 - s3) / 2. */
  maxShear: number;
}

/**
 * Thread-root stresses and their 3D von Mises at the top of the root (Shigley 9th ed.
 * Eqs. 8-7 to 8-12, stress state of p. 419, Eq. 5-14). The bending stress is taken with
 * either sign and the larger von Mises kept, so a screw in tension is not understated.
 */
export function threadRootStresses(i: ThreadRootInput): ThreadRootStresses {
  const Fi = i.share * i.load;
  const nt = i.threads;
  const bearing = (-2 * Fi) / (Math.PI * i.meanDiameter * nt * i.pitch);
  const bending = (6 * Fi) / (Math.PI * i.rootDiameter * nt * i.pitch);
  const shear = (3 * Fi) / (Math.PI * i.rootDiameter * nt * i.pitch);
  const body = bodyStresses(i.load, i.torque, i.rootDiameter, i.compression);
  const candidates = [bending, -bending].map(sx => {
    const t: StressTensor = {sx, sy: body.axial, sz: 0, txy: 0, tyz: body.torsion, tzx: 0};
    return {t, vm: vonMises3D(t)};
  });
  const worst = (candidates[1]?.vm ?? 0) > (candidates[0]?.vm ?? 0) ? candidates[1] : candidates[0];
  const tensor = worst?.t ?? {sx: bending, sy: body.axial, sz: 0, txy: 0, tyz: body.torsion, tzx: 0};
  const principal = principalStresses(tensor);
  return {
    bearing,
    bending,
    shear,
    axial: body.axial,
    torsion: body.torsion,
    vonMises: vonMises3D(tensor),
    principal,
    maxShear: (principal[0] - principal[2]) / 2,
  };
}
