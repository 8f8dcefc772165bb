/**
 * Basic geometry of power threads, mm.
 *
 * ISO 2904 trapezoidal (ISO 2901 basic profile, 30 deg): H1 = 0.5P, d2 = D2 = d - 0.5P,
 *   D1 = d - P, d3 = d - P - 2ac, D4 = d + 2ac, ac by pitch (see series.ts).
 * ASME B1.5 general-purpose Acme (29 deg), basic: D2 = D - P/2, D1 = D - P, h = P/2,
 *   crest flat 0.3707P (Machinery's Handbook 27th ed., Table 3). The screw minor
 *   diameter and nut major diameter clear the basic profile by 0.020 in (10 tpi and
 *   coarser) or 0.010 in (finer): from memory; used so root stresses are not understated.
 * Square thread as set up in Shigley's Mechanical Engineering Design 9th ed., Example 8-1:
 *   depth = width = p/2, dm = d - p/2, dr = d - p.
 */
import type {ThreadSpec} from '../types.js';
import {trapezoidalCrestClearance} from './series.js';

const IN_MM = 25.4;

export interface PowerThreadGeometry {
  spec: ThreadSpec;
  /** Major (nominal) diameter of the screw d, mm. */
  major: number;
  /** Pitch P, mm. */
  pitch: number;
  /** Lead l = starts x P, mm. */
  lead: number;
  starts: number;
  /** Flank half-angle alpha, degrees (0 square, 14.5 Acme, 15 trapezoidal). */
  flankAngle: number;
  /** Basic depth of engagement (overlap of the flanks) H1, mm. */
  engagementDepth: number;
  /** Mean (pitch) diameter dm = d2, mm. */
  meanDiameter: number;
  /** Root (minor) diameter of the screw used for body and root stresses dr, mm. */
  rootDiameter: number;
  /** Minor diameter of the nut D1, mm. */
  nutMinorDiameter: number;
  /** Major diameter of the nut D4, mm. */
  nutMajorDiameter: number;
  /** Radial clearance at the crests (ac for Tr), mm. */
  crestClearance: number;
  /**
   * Thread thickness at the shear cylinders (screw thread at D1, nut thread at d) as a
   * fraction of the pitch: 0.5 + 0.5 tan(alpha) for the basic profile (depth P/2 about
   * the pitch line, P/4 either side of it); 0.5 for a square thread.
   */
  shearWidthFactor: number;
  /** Where the numbers come from. */
  source: string;
  notes: string[];
}

/** Geometry of a parsed power thread. Lengths in mm; the formulas are in the file header. */
export function powerThreadGeometry(spec: ThreadSpec): PowerThreadGeometry {
  const d = spec.nominal;
  const P = spec.pitch;
  const notes: string[] = [];
  let flankAngle = 0;
  let clearance = 0;
  let source = '';
  if (spec.family === 'trapezoidal') {
    flankAngle = 15;
    clearance = trapezoidalCrestClearance(P) ?? 0.25;
    source = 'ISO 2904 basic dimensions (ISO 2901 profile)';
  } else if (spec.family === 'acme') {
    flankAngle = 14.5;
    const tpi = spec.tpi ?? IN_MM / P;
    // Radial clearance: half the diametral 0.020 in / 0.010 in allowance.
    clearance = (tpi <= 10 ? 0.01 : 0.005) * IN_MM;
    source = "ASME B1.5 basic dimensions (Machinery's Handbook 27th ed., Table 3)";
    notes.push(
      `screw minor diameter taken ${(clearance * 2 / IN_MM).toFixed(3)} in below the basic D1 (B1.5 clearance, from memory)`,
    );
  } else if (spec.family === 'square') {
    source = "square thread: depth p/2, dm = d - p/2, dr = d - p (Shigley 9th ed., Example 8-1 setup)";
    notes.push('square thread: no standard designation or tolerance; basic proportions used');
  } else {
    throw new Error(`not a power thread: ${spec.family}`);
  }
  const shearWidthFactor = 0.5 + 0.5 * Math.tan((flankAngle * Math.PI) / 180);
  const lead = spec.starts * P;
  return {
    spec,
    major: d,
    pitch: P,
    lead,
    starts: spec.starts,
    flankAngle,
    engagementDepth: P / 2,
    meanDiameter: d - P / 2,
    rootDiameter: d - P - 2 * clearance,
    nutMinorDiameter: d - P,
    nutMajorDiameter: d + 2 * clearance,
    crestClearance: clearance,
    shearWidthFactor,
    source,
    notes,
  };
}
