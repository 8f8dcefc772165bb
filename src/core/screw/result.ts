/**
 * Result of a power-screw check. SI working units: mm, N, N·m, MPa, degrees.
 * The JSON contract of `tapwright screw --json` is this object.
 */
import type {Flag, ThreadSpec} from '../types.js';
import type {EndCondition} from './buckling.js';
import type {ThreadRootStresses} from './stresses.js';

export interface ScrewResult {
  thread: ThreadSpec;
  geometry: {
    major: number;
    pitch: number;
    starts: number;
    meanDiameter: number;
    rootDiameter: number;
    nutMinorDiameter: number;
    nutMajorDiameter: number;
    flankAngle: number;
    engagementDepth: number;
    source: string;
  };
  /** Lead, mm. */
  lead: number;
  /** Lead angle at the mean diameter, degrees. */
  leadAngle: number;
  friction: {thread: {min: number; max: number}; collar: number; collarDiameter: number};
  /** Torques, N·m. raise and lower include the collar. */
  torque: {
    raise: number;
    lower: number;
    collar: number;
    raiseThread: number;
    lowerThread: number;
  };
  /** Raising efficiency with the collar, F l / (2 pi T_raise). */
  efficiency: number;
  /** Raising efficiency of the thread alone. */
  threadEfficiency: number;
  /** Thread alone holds the load (lowering thread torque > 0 at the lowest friction). */
  selfLocking: boolean;
  /** Thread friction below which the thread alone back-drives: tan(lambda) cos(alpha). */
  selfLockingFriction: number;
  stress: {
    body: {axial: number; torsion: number; vonMises: number};
    /**
     * First-thread stresses, MPa: the same components with the same meaning as `tapwright check`
     * (src/core/thread-stress.ts). 0.38 F and 0.38 T on one thread from 6 threads engaged.
     */
    /** The components of ThreadRootStresses (src/core/screw/stresses.ts), and the load share used. */
    firstThread: ThreadRootStresses & {share: number};
  };
  nut: {
    material: string;
    materialName: string;
    materialSource: string;
    engagedThreads: number;
    bearingPressure: number;
    allowablePressure: {min: number; max: number; condition: string; source: string} | null;
    stripping: {nutForce: number; screwForce: number; nutArea: number; screwArea: number; weaker: 'nut' | 'screw'; margin: number; wearToStrip: number};
  };
  screw: {material: string; materialSource: string; yield: number; rm: number; elasticModulus: number};
  buckling: {
    checked: boolean;
    /** Critical load, N; null when not checked (tension, or no length given). */
    criticalLoad: number | null;
    method: 'euler' | 'johnson' | null;
    slenderness: number | null;
    transitionSlenderness: number | null;
    ends: EndCondition;
    endConstant: number;
    margin: number | null;
    source: string;
  };
  /** Load direction as computed. */
  input: {loadDirection: 'compression' | 'tension'; load: number; nutLength: number};
  /**
   * With a given raising torque: the torque (N·m), what it solved for, the load (N) and thread friction
   * used, and whether that friction lies outside the published pairs (Shigley 9th ed. Table 8-5).
   */
  torqueSolve?: {torque: number; solves: 'load' | 'friction'; load: number; friction: number; outsidePublished: boolean};
  /**
   * With a measured backlash: the nut wear worked out from it (it takes the place of the nut-wear
   * input), the stripping margin left and the replace-by backlash. Lengths mm.
   */
  backlash?: {
    /** Measured and new-nut axial backlash, mm. */
    measured: number;
    new: number;
    /** Axial nut-thread thickness lost (fed to the nut wear), mm; the same as a layer normal to the flank, mm. */
    axialWear: number;
    flankWear: number;
    /** Stripping margin left now (weaker thread / load) and the margin the nut must keep. */
    marginLeft: number;
    requiredMargin: number;
    /** Backlash at which the nut reaches the required margin, mm; null with `reason`. */
    replaceBy: number | null;
    /** True when the measured backlash is at or past the replace-by value. */
    replaceNow: boolean;
    reason?: string;
  };
  flags: Flag[];
  sources: string[];
  notes: string[];
}
