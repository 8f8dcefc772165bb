/**
 * Stresses in a power-screw thread, MPa, from forces in N, torques in N·mm, lengths in mm.
 * The first-thread and body stresses are the shared implementation of the fastener joint,
 * src/core/thread-stress.ts (Shigley's Mechanical Engineering Design, 9th ed., pp. 418-419):
 *
 *   body torsion        tau     = 16 T / (pi dr^3)                (Eq. 8-7)
 *   body axial          sigma   = -+ 4 F / (pi dr^2)              (Eq. 8-8; - in compression)
 *   thread bearing      sigmaB  = -2 F1 / (pi dm nt p)            (Eq. 8-10)
 *   root bending        sigmab  =  6 F1 / (pi dr nt p)            (Eq. 8-11, square thread; other profiles
 *                       use the root-width cantilever of thread-stress.ts, `bendingSquareThread` keeps this)
 *   transverse shear    tau     =  3 F1 / (pi dr nt p)            (Eq. 8-12, at the centre of the root)
 *   tangential shear    tau     =  4 T1 / (pi dr^2 nt p)          (thread torque; common practice, no source)
 *
 * First thread (p. 419): it carries about 0.38 of the load; F1 = 0.38 F, T1 = 0.38 T with nt = 1.
 * Two von Mises values (Eq. 5-14): `vonMises` of the full state (sx = bending, sy = body axial,
 * tyz = body torsion, tzx = tangential shear), used by the flags; `vonMisesTextbook` of the p. 419
 * state exactly (no tangential shear), the one Shigley's Example 8-1 works.
 */
import {principalStresses, vonMises, vonMisesAxialShear, type StressState} from '../von-mises.js';
import {bodyRootStresses, firstThreadStresses} from '../thread-stress.js';
import type {ThreadFamily} from '../types.js';

export {principalStresses};
/** The six stress components (same shape as the joint's StressState). */
export type StressTensor = StressState;
/** von Mises stress from the six components (Shigley 9th ed. Eq. 5-14); the shared implementation. */
export const vonMises3D: (s: StressTensor) => number = vonMises;

export interface BodyStresses {
  /** Axial stress on the root area, MPa; negative in compression. */
  axial: number;
  /** Torsional shear stress on the root section, MPa. */
  torsion: number;
  /** von Mises of the two, MPa. */
  vonMises: number;
}

/** Body stresses at the root diameter dr (Shigley 9th ed. Eqs. 8-7, 8-8; von Mises Eq. 5-14). */
export function bodyStresses(load: number, torque: number, rootDiameter: number, compression: boolean): BodyStresses {
  const r = bodyRootStresses(compression ? -load : load, torque, rootDiameter);
  return {axial: r.axial, torsion: r.torsion, vonMises: vonMisesAxialShear(r.axial, r.torsion)};
}

export interface ThreadRootInput {
  /** Total axial load F, N (magnitude; the direction is `compression`). */
  load: number;
  /** Torque in the screw body at the nut, N·mm. */
  torque: number;
  /** Torque passed through the thread flanks (the thread torque, without the collar), N·mm; default `torque`. */
  threadTorque?: number;
  rootDiameter: number;
  meanDiameter: number;
  pitch: number;
  /** Share of F and T on the thread considered (0.38 for the first thread). */
  share: number;
  /** Number of threads that share the `share` of the load (1 for the first thread). */
  threads: number;
  compression: boolean;
  /** Thread profile for the profile-aware root bending (square: Shigley's 6F/(pi dr nt p)). */
  family?: ThreadFamily;
}

export interface ThreadRootStresses {
  /** Flank bearing, MPa (negative, compressive). */
  bearing: number;
  /** Root bending, MPa (magnitude), profile-aware. */
  bending: number;
  /** Square-thread textbook bending 6 F1/(pi dr nt p), MPa (Shigley 9th ed. Eq. 8-11). */
  bendingSquareThread: number;
  /** Tangential shear at the root from the thread torque, MPa (the joint's `shear`). */
  shear: number;
  /** Transverse shear at the centre of the root section (Eq. 8-12), MPa. */
  transverseShear: number;
  /** Body axial at the root, MPa; negative in compression. */
  axial: number;
  /** Body torsion at the root, MPa. */
  torsion: number;
  /** Full 3D von Mises (with the tangential shear), MPa. */
  vonMises: number;
  principal: [number, number, number];
  /** Largest shear stress from the principal stresses, (s1 - s3) / 2. */
  maxShear: number;
  /** von Mises of Shigley's p. 419 state (no tangential shear), MPa. */
  vonMisesTextbook: number;
  principalTextbook: [number, number, number];
  maxShearTextbook: number;
}

/**
 * First-thread root stresses of a power screw: the joint's `firstThreadStresses` with the force
 * signed by the load direction (Shigley 9th ed. Eqs. 8-7 to 8-12, p. 419, Eq. 5-14), plus the
 * principal stresses and the largest shear of both the full and the p. 419 states (section 3-7).
 */
export function threadRootStresses(i: ThreadRootInput): ThreadRootStresses {
  const r = firstThreadStresses({
    force: i.compression ? -i.load : i.load, torque: i.torque, dr: i.rootDiameter, dm: i.meanDiameter,
    pitch: i.pitch, share: i.share, nt: i.threads, ...(i.family !== undefined ? {family: i.family} : {}),
    ...(i.threadTorque !== undefined ? {threadTorque: i.threadTorque} : {}),
  });
  const principal = principalStresses(r.state);
  const principalTextbook = principalStresses(r.textbookState);
  return {
    bearing: r.bearing,
    bending: r.bending,
    bendingSquareThread: r.bendingSquareThread,
    shear: r.shear,
    transverseShear: r.transverseShear,
    axial: r.axial,
    torsion: r.torsion,
    vonMises: r.vonMises,
    principal,
    maxShear: (principal[0] - principal[2]) / 2,
    vonMisesTextbook: r.vonMisesTextbook,
    principalTextbook,
    maxShearTextbook: (principalTextbook[0] - principalTextbook[2]) / 2,
  };
}
