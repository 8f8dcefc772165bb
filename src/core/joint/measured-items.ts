/**
 * The measurement list of a joint: each measurement with its instrument and where it lies
 * between the limits of size of its tolerance class (ISO 965-1 / ASME B1.1 limits from
 * src/core/threads). Pure; lengths in mm.
 */
import type {ThreadGeometry} from '../types.js';
import type {MeasuredThread} from './measured-input.js';

/** Where a measured diameter lies between its class limits, mm. */
export interface LimitPosition {
  within: boolean;
  side: 'inside' | 'below-min' | 'above-max';
  /** How far past the limit (0 inside), mm. */
  by: number;
  /** Whether past the limit means worn (less material: bolt below min, hole above max). */
  worn: boolean;
}

/**
 * Position of `value` between `min` and `max` (mm). `part` says which way is worn: for a bolt
 * (external thread) below the minimum is less material, for a hole (internal) above the maximum.
 */
export function limitPosition(value: number, min: number, max: number, part: 'bolt' | 'hole'): LimitPosition {
  const tol = 1e-9;
  if (value < min - tol) return {within: false, side: 'below-min', by: min - value, worn: part === 'bolt'};
  if (value > max + tol) return {within: false, side: 'above-max', by: value - max, worn: part === 'hole'};
  return {within: true, side: 'inside', by: 0, worn: false};
}

export type MeasurementKey =
  | 'boltPitchDiameter'
  | 'overWires'
  | 'boltMajorDiameter'
  | 'holeMinorDiameter'
  | 'holePitchDiameter'
  | 'boltGo'
  | 'boltNoGo'
  | 'holeGo'
  | 'holeNoGo';

/** One measurement as the report lists it. */
export interface MeasurementItem {
  key: MeasurementKey;
  /** What was measured, e.g. "bolt pitch diameter". */
  what: string;
  /** The instrument, e.g. "three wires and micrometer". */
  instrument: string;
  /** The diameter, mm (the pitch diameter worked out from the wires for `overWires`); absent for a gauge. */
  value?: number;
  /** Three-wire reading: measurement over the wires and wire diameter, mm. */
  reading?: {measurement: number; wire: number};
  /** Gauge outcome. */
  outcome?: 'enters' | 'stops';
  /** The class limits the value is compared with, and the class, mm. */
  limits?: {min: number; max: number; cls: string};
  position?: LimitPosition;
}

/** The measurement items of `m`, in a fixed order: bolt first, then the hole, then the gauges. */
export function measurementItems(g: ThreadGeometry, m: MeasuredThread, boltPitch: number | undefined): MeasurementItem[] {
  const e = g.limits.external;
  const i = g.limits.internal;
  const ce = g.spec.toleranceExternal;
  const ci = g.spec.toleranceInternal;
  const out: MeasurementItem[] = [];
  const diameter = (key: MeasurementKey, what: string, instrument: string, value: number, min: number, max: number, cls: string, part: 'bolt' | 'hole') =>
    out.push({key, what, instrument, value, limits: {min, max, cls}, position: limitPosition(value, min, max, part)});
  if (m.overWires !== undefined && boltPitch !== undefined) {
    diameter('overWires', 'bolt pitch diameter', 'three wires and micrometer', boltPitch, e.pitchMin, e.pitchMax, ce, 'bolt');
    const last = out[out.length - 1];
    if (last) last.reading = {measurement: m.overWires.measurement, wire: m.overWires.wire};
  } else if (m.boltPitchDiameter !== undefined) {
    diameter('boltPitchDiameter', 'bolt pitch diameter', 'thread micrometer (pitch-diameter anvils)', m.boltPitchDiameter, e.pitchMin, e.pitchMax, ce, 'bolt');
  }
  if (m.boltMajorDiameter !== undefined) diameter('boltMajorDiameter', 'bolt major diameter', 'micrometer', m.boltMajorDiameter, e.majorMin, e.majorMax, ce, 'bolt');
  if (m.holeMinorDiameter !== undefined) diameter('holeMinorDiameter', 'hole minor diameter', 'pin gauge or bore gauge', m.holeMinorDiameter, i.minorMin, i.minorMax, ci, 'hole');
  if (m.holePitchDiameter !== undefined) diameter('holePitchDiameter', 'hole pitch diameter', 'internal thread-measuring instrument', m.holePitchDiameter, i.pitchMin, i.pitchMax, ci, 'hole');
  const gauges = m.gauges ?? {};
  const gauge = (key: MeasurementKey, what: string, instrument: string, outcome: 'enters' | 'stops' | undefined) => {
    if (outcome !== undefined) out.push({key, what, instrument, outcome});
  };
  gauge('boltGo', `bolt, GO ${ce}`, 'GO thread ring gauge', gauges.boltGo);
  gauge('boltNoGo', `bolt, NO-GO ${ce}`, 'NO-GO thread ring gauge', gauges.boltNoGo);
  gauge('holeGo', `hole, GO ${ci}`, 'GO thread plug gauge', gauges.holeGo);
  gauge('holeNoGo', `hole, NO-GO ${ci}`, 'NO-GO thread plug gauge', gauges.holeNoGo);
  return out;
}
