/**
 * Stresses of the joint's threads. The first-thread root stresses and the body stresses at the
 * first thread are the shared implementation in src/core/thread-stress.ts (Shigley, Mechanical
 * Engineering Design, 9th ed., section 8-2, Eqs. 8-7 to 8-12, p. 419), the same one the power
 * screws use; this module adds the nut-thread tooth and the shank. Units: N, N·mm, mm, MPa.
 */
import {vonMisesAxialShear} from '../von-mises.js';
import {cantileverRootBending, firstThreadStresses, rootWidthFactor, type FirstThreadInput, type FirstThreadStresses} from '../thread-stress.js';
import type {ThreadFamily} from '../types.js';

export {FIRST_THREAD_SHARE_LONG, LONG_ENGAGEMENT_THREADS} from '../thread-stress.js';

/** Input of the first-thread stresses (force: tension + for a bolt). */
export type RootStressInput = FirstThreadInput;
/** First-thread stresses: axial, bending, shear (tangential, thread torque), torsion, bearing, von Mises. */
export type RootStresses = FirstThreadStresses;

/**
 * Stresses at the top of the root of the first engaged thread, MPa: the shared
 * `firstThreadStresses` (Shigley 9th ed. Eqs. 8-7, 8-8, 8-10, 8-11, p. 419 state, Eq. 5-14, plus the
 * tangential shear from the thread torque 4T1/(pi dr^2 nt p), common practice, no source).
 */
export const rootStresses: (i: RootStressInput) => RootStresses = firstThreadStresses;

/**
 * Root stress of the first internal-thread tooth, MPa: the tooth cantilever with the internal
 * thread's root at the major diameter D (bending 6 F1 h/(pi D (wo p)^2), wo from rootWidthFactor,
 * load at the pitch line, h = (D - d2)/2; R. L. Norton, Machine Design: An Integrated Approach, 4th ed.,
 * from memory), tangential shear 4T1/(pi D^2 p), combined as sqrt(sigma^2 + 3 tau^2). Without a
 * family the square-thread form 6F1/(pi D p) (adaptation of Shigley 9th ed. Eq. 8-11; common practice,
 * no source).
 */
export function internalRootVonMises(force: number, torque: number, major: number, pitch: number, share: number, family?: ThreadFamily, pitchDiameter?: number): number {
  const bending = family !== undefined && pitchDiameter !== undefined
    ? cantileverRootBending(force * share, major, 1, pitch, rootWidthFactor(family, 'internal'), (major - pitchDiameter) / 2)
    : (6 * force * share) / (Math.PI * major * pitch);
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
