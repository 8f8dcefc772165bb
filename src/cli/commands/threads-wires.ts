/**
 * The three-wire part of `tapwright threads DESIGNATION --over-wires M --wire W`: option
 * parsing with ranges that follow from the thread, the text lines and the JSON `measured`
 * object (always mm). The arithmetic is in src/core/threads/measure-wires.ts.
 */
import {UsageError} from '../io.js';
import {quantity} from '../args.js';
import type {ThreadGeometry, ThreadSpec} from '../../core/types.js';
import type {UnitSystem} from '../../core/units.js';
import {overWires, pitchDiameterFromWires, SIMPLE_METHOD_MAX_LEAD_ANGLE, wireProfile, wireRange, type WireProfile, type WireReading} from '../../core/threads/measure-wires.js';
import {limitPosition, type LimitPosition} from '../../core/joint/measured-items.js';
import {wrapText} from '../../report/wrap.js';

const IN = 25.4;

export interface WireMeasurement {
  profile: WireProfile;
  reading: WireReading;
  wireRange: {min: number; max: number};
  /** The external thread's pitch-diameter limits and class; absent for power threads (no limits shipped). */
  limits?: {min: number; max: number; cls: string};
  position?: LimitPosition;
}

function len(mm: number, units: UnitSystem, decimals = 3): string {
  return units === 'us' ? `${(mm / IN).toFixed(decimals + 1)} in` : `${mm.toFixed(decimals)} mm`;
}

/** Root of the external thread used as the smallest possible pitch diameter, mm (basic profiles). */
function rootDiameter(spec: ThreadSpec, g: ThreadGeometry | undefined): number {
  return g ? g.minorDiameterExternal : spec.nominal - spec.pitch;
}

/**
 * Read --over-wires and --wire (bare numbers in mm, or in with --units us). Both or neither;
 * the wire must sit on the flanks (wireRange) and M must give a pitch diameter between the
 * thread's root and its major diameter. Throws UsageError naming the option and its range.
 */
export function parseWireOptions(m: string | undefined, w: string | undefined, spec: ThreadSpec, g: ThreadGeometry | undefined, units: UnitSystem): WireMeasurement | undefined {
  if (m === undefined && w === undefined) return undefined;
  if (m === undefined) throw new UsageError('--wire needs --over-wires (the measurement over the wires)', '--over-wires');
  if (w === undefined) throw new UsageError('--over-wires needs --wire (the wire diameter)', '--wire');
  let profile: WireProfile;
  try {
    profile = wireProfile(spec);
  } catch (e) {
    throw new UsageError(`--over-wires: ${(e as Error).message}`, '--over-wires');
  }
  const bare = units === 'us' ? 'in' : 'mm';
  const range = wireRange(profile);
  const wire = quantity('--wire', w, 'length', {
    min: range.min,
    max: range.max,
    defaultUnit: bare,
    rangeText: `${len(range.min, units)} to ${len(range.max, units)} for a ${len(profile.pitch, units)} pitch (wires that sit on the flanks; best ${len(profile.pitch / (2 * Math.cos((profile.halfAngle * Math.PI) / 180)), units)})`,
  });
  const lo = overWires(profile, rootDiameter(spec, g), wire);
  const hi = overWires(profile, spec.nominal, wire);
  const measurement = quantity('--over-wires', m, 'length', {
    min: lo,
    max: hi,
    exclusiveMin: true,
    defaultUnit: bare,
    rangeText: `above ${len(lo, units)} and up to ${len(hi, units)} with ${len(wire, units)} wires (pitch diameter between the root and the major diameter of ${spec.designation})`,
  });
  const reading = pitchDiameterFromWires(profile, measurement, wire);
  if (!g) return {profile, reading, wireRange: range};
  const e = g.limits.external;
  const limits = {min: e.pitchMin, max: e.pitchMax, cls: spec.toleranceExternal};
  return {profile, reading, wireRange: range, limits, position: limitPosition(reading.pitchDiameter, e.pitchMin, e.pitchMax, 'bolt')};
}

/** Where the pitch diameter lies, in words: inside, worn past the minimum by x, above the maximum by x. */
export function positionWords(w: WireMeasurement, units: UnitSystem): string {
  if (!w.limits || !w.position) return 'no limits of size shipped for this power-screw class: compare with the drawing or the standard';
  const cls = w.limits.cls;
  const p = w.position;
  if (p.within) {
    const fromMin = w.reading.pitchDiameter - w.limits.min;
    return `inside the ${cls} limits (${len(fromMin, units)} above the minimum)`;
  }
  if (p.side === 'below-min') return `worn past the ${cls} minimum by ${len(p.by, units)}`;
  return `above the ${cls} maximum by ${len(p.by, units)} (oversize: a GO ring gauge will not enter)`;
}

/** The text lines of the three-wire section. */
export function wireLines(w: WireMeasurement, units: UnitSystem): string[] {
  const r = w.reading;
  const row = (label: string, value: string, note = '') => `  ${label.padEnd(28)}${value.padStart(14)}${note ? `  ${note}` : ''}`;
  const out = ['', `Three-wire measurement (${w.profile.profile})`];
  out.push(row('measurement over wires M', len(r.measurement, units, 4)));
  out.push(row('wire diameter W', len(r.wire, units, 4)));
  out.push(row('pitch diameter', len(r.pitchDiameter, units, 4), 'as measured'));
  out.push(row('  simple formula', len(r.pitchDiameterSimple, units, 4), 'lead angle neglected'));
  out.push(row('  lead-angle correction', len(r.leadCorrection, units, 4), `lead angle ${r.leadAngle.toFixed(2)} deg`));
  if (w.limits) out.push(`  ${`limits ${w.limits.cls} d2`.padEnd(28)}${len(w.limits.min, units, 4)} to ${len(w.limits.max, units, 4)}`);
  out.push(...wrapText(positionWords(w, units), '  ', '  '));
  out.push(row('best wire', len(r.bestWire, units, 4), `usable ${len(w.wireRange.min, units)} to ${len(w.wireRange.max, units)}`));
  if (!r.leadAngleInRange) {
    out.push(
      ...wrapText(
        `lead angle above ${SIMPLE_METHOD_MAX_LEAD_ANGLE} deg: the series correction is approximate here (about 0.001 in at 14 deg); for gauge accuracy use the large-lead-angle constants of Machinery's Handbook 31st ed., p. 2136.`,
        '  ',
        '  ',
      ),
    );
  }
  out.push(
    ...wrapText(
      "Method: E = M - W(1 + csc a) + (P/2) cot a (Machinery's Handbook 31st ed., pp. 2129-2135), less (W/2) tan^2(lead angle) cos a cot a (FED-STD-H28 / ASME B1.2 wire method; this form from memory).",
      '  ',
      '  ',
    ),
  );
  return out;
}

/** The JSON `measured` object, mm. `withinLimits` is null where no limits of size are shipped (power screws). */
export function wireJson(w: WireMeasurement): Record<string, unknown> {
  const r = w.reading;
  return {
    instrument: 'three wires and micrometer',
    overWires: r.measurement,
    wire: r.wire,
    pitchDiameter: r.pitchDiameter,
    pitchDiameterSimple: r.pitchDiameterSimple,
    leadCorrection: r.leadCorrection,
    leadAngle: r.leadAngle,
    leadAngleInRange: r.leadAngleInRange,
    bestWire: r.bestWire,
    wireRange: w.wireRange,
    withinLimits: w.position ? w.position.within : null,
    limits: w.limits ?? null,
    position: w.position ?? null,
  };
}
