/**
 * Nominal stresses at the root of the first engaged thread and in the threaded body.
 * Textbook method: Shigley, Mechanical Engineering Design, 9th ed., section 8-2,
 * Eqs. 8-7 to 8-12 (pp. 418-419). Units: N, N·mm, mm, MPa.
 */
import {vonMises, vonMisesAxialShear, type StressState} from './von-mises.js';

/** Share of the load and the torque carried by the first thread when 6 or more threads are engaged
 *  (Shigley 9th ed., section 8-2, p. 419: 0.38 of the load on the first thread). */
export const FIRST_THREAD_SHARE_LONG = 0.38;
/** Engaged threads from which the fixed 0.38 share is used (Shigley p. 419: the seventh carries nothing). */
export const LONG_ENGAGEMENT_THREADS = 6;

export interface RootStressInput {
  /** Axial force in the bolt body at the first thread, N (tension +, compression - for a power screw). */
  force: number;
  /** Thread torque carried through the thread, N·mm. */
  torque: number;
  /** Root (minor) diameter dr, mm. */
  dr: number;
  /** Mean (pitch) diameter dm, mm. */
  dm: number;
  /** Pitch p, mm. */
  pitch: number;
  /** Share of force and torque on the thread considered (0..1). */
  share: number;
  /** Number of threads the shared load is spread over (1 for the first-thread worst case). */
  nt: number;
}

export interface RootStresses {
  axial: number;
  bending: number;
  shear: number;
  torsion: number;
  bearing: number;
  vonMises: number;
  /** The full stress tensor used for von Mises (Shigley's axes: x radial, y axial, z tangential). */
  state: StressState;
}

/**
 * Stresses at the top of the root of the first engaged thread, MPa.
 * - axial (body)  4F/(pi dr^2)             Shigley Eq. 8-8 (sign: tension + for a bolt)
 * - torsion (body) 16T/(pi dr^3)           Shigley Eq. 8-7
 * - bearing       -2 F1/(pi dm nt p)       Shigley Eq. 8-10 (compressive, negative)
 * - root bending   6 F1/(pi dr nt p)       Shigley Eq. 8-11
 * - tangential shear from the thread torque 4 T1/(pi dr^2 nt p): the tangential thread force 2T1/dr
 *   on the root cylinder pi dr nt p with a peak factor 2 (common practice, no source).
 * F1 = share x F and T1 = share x T are the thread's part of the load; the body stresses carry
 * the full F and T, as in Shigley's Example 8-1. Combined by the full 3D von Mises expression
 * (Eq. 5-14) with sx = bending, sy = axial, sz = 0, txy = 0 (the transverse shear of Eq. 8-12 is zero
 * at the top of the root, p. 419), tyz = torsion, tzx = tangential shear. The flank bearing stress
 * acts on the flank, not at the root, and is reported but not combined (as in Shigley p. 419).
 */
export function rootStresses(i: RootStressInput): RootStresses {
  const f1 = i.force * i.share;
  const t1 = i.torque * i.share;
  const axial = (4 * i.force) / (Math.PI * i.dr * i.dr);
  const torsion = (16 * i.torque) / (Math.PI * i.dr ** 3);
  const bending = (6 * f1) / (Math.PI * i.dr * i.nt * i.pitch);
  const shear = (4 * t1) / (Math.PI * i.dr * i.dr * i.nt * i.pitch);
  const bearing = (-2 * f1) / (Math.PI * i.dm * i.nt * i.pitch);
  const state: StressState = {sx: bending, sy: axial, sz: 0, txy: 0, tyz: torsion, tzx: shear};
  return {axial, bending, shear, torsion, bearing, vonMises: vonMises(state), state};
}

/**
 * Root stress of the first internal-thread tooth, MPa: the same tooth formulas with the internal
 * thread's root at the major diameter D in place of dr (bending 6F1/(pi D p), tangential shear
 * 4T1/(pi D^2 p)), combined as sqrt(sigma^2 + 3 tau^2). Adaptation of Shigley Eqs. 8-11 to the nut
 * thread (common practice, no source).
 */
export function internalRootVonMises(force: number, torque: number, major: number, pitch: number, share: number): number {
  const bending = (6 * force * share) / (Math.PI * major * pitch);
  const shear = (4 * torque * share) / (Math.PI * major * major * pitch);
  return vonMisesAxialShear(bending, shear);
}

/**
 * Threaded-body stresses on the stress section d0 = (d2 + d3)/2, MPa: axial F/As, torsion
 * 16T/(pi d0^3), von Mises sqrt(sigma^2 + 3 tau^2) (elastic; Shigley Eq. 5-14, VDI 2230 Part 1 section A0/d0).
 */
export function shankStresses(force: number, torque: number, stressArea: number, d0: number): {axial: number; torsion: number; vonMises: number} {
  const axial = force / stressArea;
  const torsion = (16 * torque) / (Math.PI * d0 ** 3);
  return {axial, torsion, vonMises: vonMisesAxialShear(axial, torsion)};
}
