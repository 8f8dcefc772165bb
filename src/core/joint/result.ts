/**
 * The result of checking a joint. Its shape is the `check --json` contract
 * (keys may be added, never removed or renamed): SI working units throughout.
 */
import type {ServiceResult} from '../service/result.js';
import type {Flag, Provenance, ThreadGeometry} from '../types.js';
import type {LimitsUsedWord} from './measured.js';
import type {MeasurementItem} from './measured-items.js';

export interface PreloadRange {
  /** N */
  min: number;
  nominal: number;
  max: number;
}

export interface StressSet {
  /** Axial normal stress, MPa (tension +). */
  axial: number;
  /** Root bending stress, MPa. */
  bending: number;
  /** Tangential (transverse) shear from the thread torque, MPa. */
  shear: number;
  /** Body torsion, MPa. */
  torsion: number;
  /** Thread bearing (flank) stress, MPa (compressive, reported as a magnitude or signed as documented). */
  bearing: number;
  /** Full 3D von Mises equivalent, MPa. */
  vonMises: number;
}

/** The first thread's stresses: the profile-aware set plus the square-thread textbook values beside it. */
export interface FirstThreadStressSet extends StressSet {
  /** Square-thread cantilever 6 F1/(pi dr p) (Shigley 9th ed. Eq. 8-11), MPa: the textbook value, exact for square threads only (always set by checkJoint). */
  bendingSquareThread?: number;
  /** The von Mises built on bendingSquareThread, MPa (always set by checkJoint). */
  vonMisesSquareThread?: number;
}

export interface StrippingSide {
  /** Stripping force, N. */
  force: number;
  /** Shear area over the effective engagement, mm². */
  shearArea: number;
  /** Shear strength used, MPa. */
  shearStrength: number;
}

export interface CheckResult {
  geometry: ThreadGeometry;
  /** Resolved materials with their provenance, for display and the report. */
  materials: {
    /** rm is the minimum tensile strength; rmUpper the upper one used for bolt-breaks-first, with its source (always set by checkJoint). */
    bolt: {id: string; name: string; rm: number; rp: number; shear: number; provenance: Provenance; rmUpper?: number; rmUpperSource?: string};
    internal: {id: string; name: string; rm: number; shear: number; provenance: Provenance};
  };
  tightening: {
    preload: PreloadRange;
    /** Tightening torque, N·m (given, or computed from the target). */
    torque: number;
    /** Assembly von Mises stress / Rp0.2 at the max preload. */
    utilisation: number;
    /** Permissible preload and torque for the utilisation limit (VDI 2230 closed form), N and N·m. */
    permissiblePreload: number;
    permissibleTorque: number;
    /**
     * Assembly von Mises stress in the threaded section at max preload, MPa, on the VDI 2230
     * Part 1 convention behind FM,zul (torsion on pi d0^3/12), so utilisation = nu at FM,zul.
     */
    assemblyVonMises: number;
    method: 'friction' | 'nut-factor';
    /** Effective bearing diameter DKm used, mm, and where it came from. */
    bearingDiameter: number;
    bearingSource: 'input' | 'standard' | 'estimate';
    /** Thread torque at the largest preload, N·m. */
    threadTorque: number;
  };
  stress: {
    /** `bending` is profile-aware (root width per profile, src/core/thread-stress.ts); the von Mises is built on it. */
    firstThread: FirstThreadStressSet;
    /** What the first-thread von Mises means and what decides instead (FIRST_THREAD_VON_MISES_NOTE); always set by checkJoint. */
    firstThreadNote?: string;
    /** Threaded body on d0 = (d2 + d3)/2 at max preload + service load with the full thread torque,
     *  elastic torsion 16T/(pi d0^3): higher than assemblyVonMises, which uses VDI's plastic modulus. */
    shank: {axial: number; torsion: number; vonMises: number};
  };
  /** Fraction of the load carried by each engaged thread, first (loaded face) first. */
  loadShare: number[];
  /**
   * Share used for the first-thread stresses: 0.38 from 6 engaged threads (Shigley 9th ed. p. 419); below 6,
   * 0.38 x (chain first share at this count / the chain's long-engagement first share), which for the
   * calibration joint (steel bolt, steel nut) is the chain share itself. Also the chain parameter beta.
   */
  firstThreadShare: number;
  loadShareBeta: number;
  /** Largest axial load on the bolt used for the thread and shank stresses: max preload + service load, N. */
  boltLoad: number;
  stripping: {
    external: StrippingSide;
    internal: StrippingSide;
    /** Bolt break force at the minimum strength As x Rm,min, N. */
    boltBreakForce: number;
    /** Bolt break force at the upper strength As x Rm,max (materials.bolt.rmUpper), N: what bolt-breaks-first uses. */
    boltBreakForceUpper?: number;
    weaker: 'external' | 'internal';
    /** Required effective engagement so the bolt breaks first, mm. */
    requiredEngagement: {fedStd: number; alexander: number};
    /** The same as an engaged length to compare with the input engagement (adds the chamfer), mm;
     *  a blind hole also needs the incomplete threads at its bottom below this. */
    requiredEngagedLength?: {fedStd: number; alexander: number};
    /** Thread length lost at the faces, mm: the chamfer given, or a nut's standard countersinks (always set by checkJoint). */
    engagementLoss?: number;
    /** Effective (fully formed) engagement used, mm. */
    effectiveEngagement: number;
    /** Engaged full threads (effective engagement / pitch). */
    engagedThreads: number;
    /**
     * Per thread, what the shear-area diameters are: `measured` (every diameter of that thread's
     * area measured), `least-material` (the limits of size of the class), `mixed` (some of each).
     * The bolt (external) thread's area uses the hole minor and the bolt pitch diameter, the
     * internal thread's the bolt major and the hole pitch diameter (FED-STD-H28/2B).
     */
    limitsUsed: {external: LimitsUsedWord; internal: LimitsUsedWord};
    /** Present when measurements were given: each with its instrument, gauge findings, and where a NO-GO gauge makes a force an upper bound. */
    asMeasured?: {items: MeasurementItem[]; notes: string[]; upperBound: {external: boolean; internal: boolean}};
    /** The diameters the areas were computed at (measured or least-material limits), mm. */
    limits: {knMax: number; esMin: number; dsMin: number; enMax: number};
    /** FED-STD-H28/2B Formula 1 length Le (equal strengths) and the strength ratio J. */
    fedStd: {le: number; j: number};
    /** Alexander (1977) / VDI 2230 Part 1 factors and stripping forces at the effective engagement (from memory). */
    alexander: {
      rs: number;
      c1: number;
      c2: number;
      c3: number;
      externalForce: number;
      internalForce: number;
      /** Where a factor was held at the edge of its published range (the outside-model-range flags), plain words. */
      outOfRange?: string[];
    };
  };
  margin: {
    /** Weaker thread's stripping force / largest load it can see. */
    stripping: number;
    /** Weaker stripping force / bolt break force at the upper strength Rm,max (VDI 2230 Part 1, from memory). */
    boltBreaksFirst: number;
    /** The same at the minimum strength Rm,min (optional in the type; always set by checkJoint). */
    boltBreaksFirstMinStrength?: number;
    /** First-thread von Mises / yield, bolt and internal part. */
    firstThreadYieldBolt: number;
    firstThreadYieldInternal: number;
  };
  /** Nut only: a nut of the bolt's matching property class at standard height (ISO 898-2 design basis: the bolt breaks first). */
  nutMatchesBolt?: boolean;
  /**
   * The joint in service (src/core/service), present when the input describes the
   * clamped parts or the service state (input.service); its flags are among `flags` too.
   */
  service?: ServiceResult;
  flags: Flag[];
  /** Plain-language notes on defaults and data used. */
  notes: string[];
  /** Sources of every method used, for the report and the help screen. */
  sources: string[];
}
