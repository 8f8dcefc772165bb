/**
 * Nominal stresses at the root of the first engaged thread and in the threaded body at that
 * thread: ONE implementation for the fastener joint (src/core/joint) and the power screw
 * (src/core/screw), so both report the same components with the same meaning.
 * Textbook method: Shigley, Mechanical Engineering Design, 9th ed. (Budynas & Nisbett),
 * section 8-2, Eqs. 8-7 to 8-12 and the stress state of p. 419; von Mises by Eq. 5-14.
 * Units: N, N·mm, mm, MPa.
 */
import {vonMises, type StressState} from './von-mises.js';
import type {ThreadFamily} from './types.js';

/**
 * Root width w of a thread tooth: its thickness at the root as a fraction of the pitch, for the
 * root-bending cantilever. External thread: root at the minor diameter; internal: at the major.
 * - ISO metric and Unified (60 deg): external 0.80, internal 0.88. R. L. Norton, Machine Design: An
 *   Integrated Approach (4th ed. 2011), chapter "Screws and Fasteners", table of area factors wi, wo
 *   (from memory). Cross-check on the ISO 68-1 basic profile: the external tooth is 0.75 P wide at D1
 *   and 0.833 P at d3, the internal tooth 0.875 P at D.
 * - Trapezoidal (ISO 2901, 30 deg): 0.5 + 2 x 0.25 x tan 15 deg = 0.634, both sides (basic profile:
 *   tooth 0.5 P thick at the pitch line, root 0.25 P from it).
 * - Acme (ASME B1.5, 29 deg): 0.5 + 2 x 0.25 x tan 14.5 deg = 0.629, both sides (the same basic-form
 *   construction; from memory). Norton's external 0.77 for Acme is not reproduced by the geometry and
 *   is not used.
 * - Square: 0.5 (tooth p/2 wide), both sides; with the load at the pitch line this is exactly
 *   Shigley's 6F/(pi dr nt p) (Shigley, Mechanical Engineering Design, 9th ed., Eq. 8-11).
 */
export function rootWidthFactor(family: ThreadFamily, side: 'external' | 'internal'): number {
  switch (family) {
    case 'metric':
    case 'unified':
      return side === 'external' ? 0.8 : 0.88;
    case 'trapezoidal':
      return 0.5 + 0.5 * Math.tan((15 * Math.PI) / 180);
    case 'acme':
      return 0.5 + 0.5 * Math.tan((14.5 * Math.PI) / 180);
    case 'square':
      return 0.5;
  }
}

/**
 * Root bending of a thread tooth as a cantilever, MPa: sigma_b = 6 F1 h / (pi Droot nt (w p)^2), the
 * tooth unwrapped to a beam of length pi Droot nt, thickness w p at the root, loaded by F1 (N) at the
 * pitch line, arm h (mm) from the root (R. L. Norton, Machine Design: An Integrated Approach, 4th ed.,
 * chapter "Screws and Fasteners", thread bending; from memory). w = 0.5 and h = p/4 give Shigley's
 * square-thread 6 F1/(pi dr nt p) (9th ed. Eq. 8-11). Lengths mm.
 */
export function cantileverRootBending(f1: number, rootDiameter: number, nt: number, pitch: number, width: number, arm: number): number {
  return (6 * f1 * arm) / (Math.PI * rootDiameter * nt * (width * pitch) ** 2);
}

/**
 * What the first-thread von Mises is, in shop words, for the reports and the workbench readout
 * (the reading of Shigley 9th ed. p. 419's nominal first-thread stresses; VDI 2230 Part 1 judges a
 * tightened bolt by its assembly utilisation and the stripping check, not by the thread-root peak).
 */
export const FIRST_THREAD_VON_MISES_NOTE =
  'Elastic peak estimate at the root of the first engaged thread. Local yielding there is normal in a tightened bolt and is not the failure criterion; the margins that decide are stripping, bolt-breaks-first and the tightening utilisation.';
/** The same in a few words, for one line beside the number (about 50 characters). */
export const FIRST_THREAD_VON_MISES_SHORT = 'elastic peak: local yield here is normal, not failure';
/** The power-screw form: the same reading, with the screw's deciding checks. */
export const SCREW_FIRST_THREAD_NOTE =
  'This is an elastic peak estimate at the root of the first engaged thread; local yielding there is not the failure criterion by itself (the load spreads to the next threads); the checks that decide are thread stripping, the nut bearing pressure and, in compression, buckling.';

/** Share of the load and the torque carried by the first thread when 6 or more threads are engaged
 *  (Shigley 9th ed., section 8-2, p. 419: 0.38 of the load on the first thread). */
export const FIRST_THREAD_SHARE_LONG = 0.38;
/** Engaged threads from which the fixed 0.38 share is used (Shigley p. 419: the seventh carries nothing). */
export const LONG_ENGAGEMENT_THREADS = 6;

export interface FirstThreadInput {
  /**
   * Axial force in the body at the first thread, N. Its sign is the load direction: tension +
   * (a bolt, a screw that pulls), compression - (a power screw that pushes, Shigley Eq. 8-8).
   */
  force: number;
  /** Torque carried by the body at the first thread, N·mm (and passed through the thread unless `threadTorque` is given). */
  torque: number;
  /** Torque passed through the thread flanks, N·mm, when it differs from the body torque (a power screw's collar torque does not pass the flanks); default `torque`. */
  threadTorque?: number;
  /** Root (minor) diameter dr, mm. */
  dr: number;
  /** Mean (pitch) diameter dm, mm. */
  dm: number;
  /** Pitch p, mm. */
  pitch: number;
  /** Share of force and torque on the thread considered (0..1; 0.38 for the first thread). */
  share: number;
  /** Number of threads the shared load is spread over (1 for the first-thread worst case). */
  nt: number;
  /**
   * Thread profile, for the profile-aware root bending (rootWidthFactor, load at the pitch line,
   * arm (dm - dr)/2). Without it the square-thread cantilever 6 F1/(pi dr nt p) is used.
   */
  family?: ThreadFamily;
}

export interface FirstThreadStresses {
  /** Body axial stress 4F/(pi dr^2), MPa, signed as the force: tension +, compression -. */
  axial: number;
  /** Root bending, profile-aware: 6 F1 h/(pi dr nt (w p)^2) with w from rootWidthFactor and h = (dm - dr)/2,
   *  MPa, magnitude (the fillet's sign is in `state.sx`). */
  bending: number;
  /** Square-thread textbook bending 6 F1/(pi dr nt p) (Shigley 9th ed. Eq. 8-11), MPa, whatever the profile. */
  bendingSquareThread: number;
  /** Tangential shear at the root from the thread torque 4 T1/(pi dr^2 nt p), MPa (sign of the torque). */
  shear: number;
  /** Body torsion 16T/(pi dr^3), MPa (sign of the torque). */
  torsion: number;
  /** Flank bearing -2 F1/(pi dm nt p), MPa: always compressive, whatever the load direction. */
  bearing: number;
  /** Transverse shear at the centre of the root section 3 F1/(pi dr nt p), MPa (Eq. 8-12); zero at the
   *  top of the root, so not combined. */
  transverseShear: number;
  /** Full 3D von Mises of `state`, MPa. */
  vonMises: number;
  /** Stress tensor combined (Shigley's axes: x radial, y axial, z tangential). */
  state: StressState;
  /** von Mises of Shigley's p. 419 state exactly (sx = bending, sy = axial, tyz = torsion; no tangential shear), MPa. */
  vonMisesTextbook: number;
  /** Shigley's p. 419 state, same fillet as `state`. */
  textbookState: StressState;
}

/**
 * Body stresses at the root diameter, MPa: axial 4F/(pi dr^2) signed as the force (tension +,
 * compression -) and torsion 16T/(pi dr^3) (Shigley 9th ed. Eqs. 8-8 and 8-7). F in N, T in N·mm, dr in mm.
 */
export function bodyRootStresses(force: number, torque: number, dr: number): {axial: number; torsion: number} {
  return {axial: (4 * force) / (Math.PI * dr * dr), torsion: (16 * torque) / (Math.PI * dr ** 3)};
}

/**
 * Stresses at the top of the root of the first engaged thread, MPa (Shigley 9th ed. section 8-2):
 * - axial (body)   4F/(pi dr^2)            Eq. 8-8 (tension + for a bolt, compression - for a power screw)
 * - torsion (body) 16T/(pi dr^3)           Eq. 8-7
 * - bearing        -2 F1/(pi dm nt p)      Eq. 8-10 (compressive, negative)
 * - root bending    6 F1 h/(pi dr nt (w p)^2), profile-aware (cantileverRootBending, rootWidthFactor);
 *                   for a square thread (w = 0.5, h = p/4) this is 6 F1/(pi dr nt p), Eq. 8-11, which is
 *                   also reported for every profile as `bendingSquareThread`
 * - transverse shear 3 F1/(pi dr nt p)     Eq. 8-12 (centre of the root; reported, not combined)
 * - tangential shear from the thread torque 4 T1/(pi dr^2 nt p): the tangential thread force 2T1/dr
 *   on the root cylinder pi dr nt p with a peak factor 2 (common practice, no source).
 * F1 = share x |F| and T1 = share x T are the thread's part of the load; the body stresses carry
 * the full F and T, as in Shigley's Example 8-1 (p. 419: 0.38F with nt = 1 for the first thread).
 *
 * Combined by the full 3D von Mises expression (Eq. 5-14) with sy = axial, sz = 0, txy = 0 (the
 * transverse shear is zero at the top of the root, p. 419), tyz = torsion, tzx = tangential shear,
 * and sx = root bending. Both fillets of the tooth root see the same body stresses and the bending
 * with opposite signs; sx takes the sign opposite to the body axial stress, the fillet with the larger
 * von Mises (choosing the worse fillet: common practice, no source). For a power screw in compression
 * this is Shigley's p. 419 state, sx = +bending. The flank bearing stress acts on the flank, not at
 * the root, and is reported but not combined (as on p. 419).
 */
export function firstThreadStresses(i: FirstThreadInput): FirstThreadStresses {
  const f1 = Math.abs(i.force) * i.share;
  const t1 = (i.threadTorque ?? i.torque) * i.share;
  const {axial, torsion} = bodyRootStresses(i.force, i.torque, i.dr);
  const tooth = Math.PI * i.dr * i.nt * i.pitch;
  const bendingSquareThread = (6 * f1) / tooth;
  const bending = i.family === undefined
    ? bendingSquareThread
    : cantileverRootBending(f1, i.dr, i.nt, i.pitch, rootWidthFactor(i.family, 'external'), (i.dm - i.dr) / 2);
  const transverseShear = (3 * f1) / tooth;
  const shear = (4 * t1) / (tooth * i.dr);
  const bearing = (-2 * f1) / (Math.PI * i.dm * i.nt * i.pitch);
  const sx = axial > 0 ? -bending : bending;
  const textbookState: StressState = {sx, sy: axial, sz: 0, txy: 0, tyz: torsion, tzx: 0};
  const state: StressState = {...textbookState, tzx: shear};
  return {
    axial, bending, bendingSquareThread, shear, torsion, bearing, transverseShear,
    vonMises: vonMises(state), state,
    vonMisesTextbook: vonMises(textbookState), textbookState,
  };
}
