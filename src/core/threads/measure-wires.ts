/**
 * Three-wire measurement of the pitch diameter of an external thread. Working units: mm.
 *
 * Symmetric thread of flank half-angle a (30 deg ISO/unified, 14.5 deg Acme, 15 deg ISO
 * trapezoidal), pitch P, wire diameter W, measurement over the wires M:
 *   E_simple = M - W (1 + csc a) + (P/2) cot a
 * (for 60 deg: E = M - 3W + 0.86603P; Machinery's Handbook 31st ed., "Measuring Screw
 * Threads", constants 0.866025P on p. 2129, dimensions over wires on p. 2130; F. D. Jones,
 * Turning and Boring, Industrial Press, for the U.S. standard thread m = d - 1.5155p + 3w).
 * The general form with csc a and cot a reproduces those constants and the Acme ones (p. 2135).
 * Best wire, touching the flanks on the pitch line: W = P / (2 cos a) (0.57735P for 60 deg,
 * 0.51645P for Acme: Machinery's Handbook 31st ed., p. 2135).
 * Lead angle lambda, tan lambda = L / (pi E): the wire rests higher in the groove of a helix
 * than of an annular groove, so E_simple overstates E (Machinery's Handbook 31st ed., p. 2129).
 * Correction, first terms of the series of the wire method (FED-STD-H28 / ASME B1.2 wire-method
 * appendix; the form is from memory of those texts):
 *   E = E_simple - (W/2) tan^2(lambda) cos a cot a.
 * Its size agrees with the handbook's large-lead-angle constants to 0.0003 P at 5 deg
 * (Machinery's Handbook 31st ed., p. 2136, 1-start column; see the tests). The handbook gives the
 * simple method for lead angles under 5 deg (p. 2134); above 5 deg the result is marked approximate.
 */
import type {ThreadSpec} from '../types.js';

const DEG = Math.PI / 180;

/** The wire method's sources, for a result's source list. */
export const WIRE_METHOD_SOURCE =
  "Three-wire pitch diameter E = M - W(1 + csc a) + (P/2) cot a and best wire P/(2 cos a): Machinery's Handbook 31st ed., pp. 2129-2136; lead-angle term (W/2) tan^2(lambda) cos a cot a from memory of FED-STD-H28 / ASME B1.2";

/** The thread profile facts the wire method needs, mm and degrees. */
export interface WireProfile {
  /** Flank half-angle a, degrees. */
  halfAngle: number;
  /** Pitch P, mm. */
  pitch: number;
  /** Lead L = starts x P, mm. */
  lead: number;
  /** Basic major diameter d, mm. */
  major: number;
  /** Basic pitch diameter of the external thread, mm. */
  basicPitchDiameter: number;
  /** Width of the external thread's basic crest flat, mm. */
  crestFlat: number;
  /** Profile name in words, e.g. "60-degree (ISO metric / unified)". */
  profile: string;
}

/**
 * The wire-method profile of a parsed thread. Basic profiles: ISO 68-1 / ASME B1.1 (60 deg,
 * d2 = d - 0.649519P, crest flat P/8), ASME B1.5 Acme (29 deg, D2 = D - P/2, flat 0.3707P:
 * Machinery's Handbook 27th ed., Table 3), ISO 2904 trapezoidal (30 deg, d2 = d - P/2,
 * flat = P/2 - (P/2) tan 15 deg by its geometry). A square thread has no flanks for wires: throws.
 */
export function wireProfile(spec: ThreadSpec): WireProfile {
  const P = spec.pitch;
  const base = {pitch: P, lead: spec.lead, major: spec.nominal};
  switch (spec.family) {
    case 'metric':
    case 'unified':
      return {...base, halfAngle: 30, basicPitchDiameter: spec.nominal - 0.649519 * P, crestFlat: P / 8, profile: '60-degree (ISO metric / unified)'};
    case 'acme':
      return {...base, halfAngle: 14.5, basicPitchDiameter: spec.nominal - P / 2, crestFlat: 0.3707 * P, profile: '29-degree Acme'};
    case 'trapezoidal':
      return {...base, halfAngle: 15, basicPitchDiameter: spec.nominal - P / 2, crestFlat: P / 2 - (P / 2) * Math.tan(15 * DEG), profile: '30-degree trapezoidal'};
    case 'square':
      throw new Error('a square thread has no flanks for measuring wires to rest on: measure its pitch diameter another way');
  }
}

/** Best wire diameter W = P / (2 cos a), mm: touches the flanks on the pitch line (source in the file header). */
export function bestWire(p: WireProfile): number {
  return p.pitch / (2 * Math.cos(p.halfAngle * DEG));
}

/**
 * Usable wire diameters, mm. Smallest: the wire tops reach the basic major diameter
 * (W = ((P/2) cot a + d - E) / (1 + csc a): 0.50518P for 60 deg, 0.48726P for Acme); largest:
 * the wire touches the flanks at the crest of the basic profile (W = (P - crest flat) / cos a:
 * 1.01036P for 60 deg, 0.65001P for Acme). Derived from the profile geometry; the Acme values
 * reproduce Machinery's Handbook 31st ed., p. 2135 (min 0.487263P, max 0.650013P).
 */
export function wireRange(p: WireProfile): {min: number; max: number} {
  const a = p.halfAngle * DEG;
  const min = ((p.pitch / 2) / Math.tan(a) + (p.major - p.basicPitchDiameter)) / (1 + 1 / Math.sin(a));
  const max = (p.pitch - p.crestFlat) / Math.cos(a);
  return {min, max};
}

/** Lead angle at a pitch diameter E, degrees: tan lambda = L / (pi E). */
export function leadAngle(p: WireProfile, pitchDiameter: number): number {
  return Math.atan(p.lead / (Math.PI * pitchDiameter)) / DEG;
}

/** Lead-angle correction (W/2) tan^2(lambda) cos a cot a at pitch diameter E, mm (source in the file header). */
export function leadCorrection(p: WireProfile, wire: number, pitchDiameter: number): number {
  const a = p.halfAngle * DEG;
  const t = Math.tan(leadAngle(p, pitchDiameter) * DEG);
  return (wire / 2) * t * t * Math.cos(a) / Math.tan(a);
}

/** Largest lead angle for which the handbook gives the simple wire method, degrees (Machinery's Handbook 31st ed., p. 2134). */
export const SIMPLE_METHOD_MAX_LEAD_ANGLE = 5;

export interface WireReading {
  /** Measurement over the wires M, mm. */
  measurement: number;
  /** Wire diameter W, mm. */
  wire: number;
  /** Pitch diameter with the lead-angle correction, mm. */
  pitchDiameter: number;
  /** Pitch diameter by the simple formula (lead angle neglected), mm. */
  pitchDiameterSimple: number;
  /** Lead-angle correction subtracted, mm. */
  leadCorrection: number;
  /** Lead angle at the pitch diameter, degrees. */
  leadAngle: number;
  /** False above 5 deg: outside the range the handbook gives the simple method for. */
  leadAngleInRange: boolean;
  /** Best wire for the pitch, mm. */
  bestWire: number;
}

/** Constant of the simple formula: M = E + K(W), K = W (1 + csc a) - (P/2) cot a, mm. */
function simpleConstant(p: WireProfile, wire: number): number {
  const a = p.halfAngle * DEG;
  return wire * (1 + 1 / Math.sin(a)) - (p.pitch / 2) / Math.tan(a);
}

/**
 * Measurement over the wires M for a pitch diameter E and wire W, mm:
 * M = E + W (1 + csc a) - (P/2) cot a + (W/2) tan^2(lambda) cos a cot a (file header).
 */
export function overWires(p: WireProfile, pitchDiameter: number, wire: number): number {
  return pitchDiameter + simpleConstant(p, wire) + leadCorrection(p, wire, pitchDiameter);
}

/**
 * Pitch diameter from a measurement over wires, mm: the inverse of `overWires`, found by
 * fixed-point iteration on the lead-angle term (it changes by far less than a micrometre
 * between passes after the second). Formula and sources in the file header.
 */
export function pitchDiameterFromWires(p: WireProfile, measurement: number, wire: number): WireReading {
  const simple = measurement - simpleConstant(p, wire);
  let e = simple;
  for (let i = 0; i < 30; i++) {
    const next = simple - leadCorrection(p, wire, Math.max(e, 1e-6));
    if (Math.abs(next - e) < 1e-12) {
      e = next;
      break;
    }
    e = next;
  }
  const angle = leadAngle(p, e);
  return {
    measurement,
    wire,
    pitchDiameter: e,
    pitchDiameterSimple: simple,
    leadCorrection: simple - e,
    leadAngle: angle,
    leadAngleInRange: angle <= SIMPLE_METHOD_MAX_LEAD_ANGLE + 1e-9,
    bestWire: bestWire(p),
  };
}
