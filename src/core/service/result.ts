/**
 * The service state of a joint: the `service` object of `check --json` (issue 16
 * contract; keys may be added, never removed or renamed). SI working units:
 * N, N/mm, MPa, mm, 1/K.
 */
import type {Flag, Provenance} from '../types.js';

export interface ServicePartOut {
  id: string;
  name: string;
  /** Thickness as given, and the part of it inside the (effective) grip, mm. */
  thickness: number;
  inGrip: number;
  /** MPa */
  modulus: number;
  modulusSource: Provenance;
  /** 1/K; absent when unknown. */
  expansion?: number;
}

export interface ServiceResult {
  /** 'shared': the clamped parts share the load; 'in-full': no --clamp, the bolt takes it all. */
  model: 'shared' | 'in-full';
  grip?: number;
  parts?: ServicePartOut[];
  stiffness?: {
    /** N/mm */
    bolt: number;
    members: number;
    /** One material only: the exponential fit (Shigley Eq. 8-23) beside the frusta, N/mm. */
    membersExponential?: number;
    boltLengths?: {unthreaded: number; threaded: number; threadLength?: number; rule: string};
  };
  jointConstant: number;
  /** External load per bolt, N: min and max (equal for a static load). */
  serviceLoad: {min: number; max: number; cyclic: boolean};
  /** Preload used, N: from the tightening range, or a fraction of the proof load. */
  preload: {min: number; nominal: number; max: number; source: string};
  proofLoad: number;
  /** N; absent without clamp input (the joint's stiffness is not known). */
  separationLoad?: number;
  /** Preload after embedding and at the worst temperature, before the service load, N. */
  preloadRetained: {min: number; max: number};
  /** Clamp load left under the largest service load with the minimum retained preload, N. */
  clampUnderLoad: number;
  embeddingLoss: number;
  embeddingAmount: number;
  embeddingSource: string;
  thermalChange: number;
  /** Bolt load at the largest service load with the largest preload, N. */
  boltLoadMax: number;
  /**
   * Load and separation factors are absent with no service load (nothing to divide by), the
   * separation factor also without clamp input. Every value of a ServiceResult is finite (json.ts).
   */
  factors: {yield: number; load?: number; separation?: number; fatigue?: number};
  fatigue?: {
    alternatingStress: number;
    meanStress: number;
    enduranceStrength: number;
    enduranceSource: string;
    goodman: number;
    yieldCheck: number;
    vdiEndurance: number;
    vdiFactor: number;
  };
  bearingPressure?: {
    head: number;
    /** MPa; absent when the part's limiting pressure is not known. */
    limit?: number;
    limitSource?: string;
    nut?: number;
    nutLimit?: number;
    bearingDiameter: number;
    holeDiameter: number;
    /** Washer outside diameter that keeps the pressure at the limit, mm (when exceeded). */
    washerDiameter?: number;
  };
  /** `factor` absent when no clamp load is needed (no transverse load). */
  slip?: {transverseLoad: number; friction: number; requiredClamp: number; availableClamp: number; factor?: number};
  flags: Flag[];
  notes: string[];
  sources: string[];
}
