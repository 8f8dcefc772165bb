/**
 * Thread stripping with what was measured: the diameters the FED-STD-H28/2B shear areas use
 * (Kn, Es for the bolt thread; Ds, En for the internal thread) are the measured values where
 * given and the least-material limits of size elsewhere. Also the physical-possibility checks
 * of the measurements and the GO / NO-GO gauge outcomes. Working units: mm.
 *
 * Geometry of the 60-degree basic profile (ISO 68-1 / ASME B1.1): H = 0.866025P; a crest can
 * be no higher than the sharp V, so a major diameter is at most pitch diameter + H and a minor
 * diameter at least pitch diameter - H; a crest lies above the pitch line (major > pitch
 * diameter > minor). The shear area of a thread stays positive only while the other thread's
 * crest diameter overlaps it (FED-STD-H28/2B area formulas).
 */
import type {ThreadGeometry} from '../types.js';
import {JointInputError} from './errors.js';
import type {MeasuredThread} from './measured-input.js';
import type {StrippingLimits} from './stripping.js';
import {pitchDiameterFromWires, wireProfile, wireRange} from '../threads/measure-wires.js';
import {measurementItems, type MeasurementItem} from './measured-items.js';

export type LimitsUsedWord = 'measured' | 'least-material' | 'mixed';

const IN = 25.4;

/** A length in both systems for messages: "8.862 mm" / "0.3489 in". */
export function measuredLength(x: number, units: 'si' | 'us'): string {
  return units === 'us' ? `${(x / IN).toFixed(4)} in` : `${x.toFixed(3)} mm`;
}

/** A measurement that cannot be physically right, naming the `measured` field at fault. */
export interface MeasuredProblem {
  /** JointInput path, e.g. "measured.holeMinorDiameter". */
  field: string;
  message: string;
  usMessage: string;
}

export interface MeasuredStripping {
  limits: StrippingLimits;
  /** Per thread: the bolt (external) thread uses Kn and Es, the internal thread Ds and En. */
  limitsUsed: {external: LimitsUsedWord; internal: LimitsUsedWord};
  /** The bolt pitch diameter used (measured, from wires, or the limit), mm. */
  boltPitchDiameter: number;
  /** Each measurement with its instrument and where it lies between the limits. */
  items: MeasurementItem[];
  /** Gauge findings and requests for a measurement, plain words (SI). */
  notes: string[];
  /** True where a NO-GO gauge entered and no number was measured: the force shown is an upper bound. */
  upperBound: {external: boolean; internal: boolean};
}

function word(measured: number): LimitsUsedWord {
  return measured === 2 ? 'measured' : measured === 0 ? 'least-material' : 'mixed';
}

/** The bolt pitch diameter given directly or by three wires, mm; undefined when neither. */
export function boltPitchFromInput(g: ThreadGeometry, m: MeasuredThread): number | undefined {
  if (m.boltPitchDiameter !== undefined) return m.boltPitchDiameter;
  if (m.overWires === undefined) return undefined;
  return pitchDiameterFromWires(wireProfile(g.spec), m.overWires.measurement, m.overWires.wire).pitchDiameter;
}

/**
 * Every physically impossible measurement, in order of the fields (empty when all can be).
 * Bounds from the 60-degree profile (file header): bolt pitch diameter between the basic
 * external minor d3 and the basic major d; bolt major above its pitch diameter and at most
 * pitch diameter + H; hole minor below the bolt major (or the class's largest major) and
 * above the basic d3; hole pitch diameter above the hole minor, at most hole minor + H, below d,
 * and not below a measured bolt pitch diameter; wires within the usable range.
 */
export function measuredProblems(g: ThreadGeometry, m: MeasuredThread): MeasuredProblem[] {
  const out: MeasuredProblem[] = [];
  const P = g.pitch;
  const H = g.fundamentalHeight;
  const add = (field: string, text: (u: 'si' | 'us') => string) => out.push({field: `measured.${field}`, message: text('si'), usMessage: text('us')});
  const L = measuredLength;
  if (m.overWires !== undefined) {
    const r = wireRange(wireProfile(g.spec));
    const w = m.overWires.wire;
    if (w < r.min - 1e-9 || w > r.max + 1e-9) {
      add('overWires.wire', u => `wire diameter ${L(w, u)} does not sit on the flanks of a ${P} mm pitch thread; usable ${L(r.min, u)} to ${L(r.max, u)}`);
      return out;
    }
  }
  const e = boltPitchFromInput(g, m);
  const eField = m.overWires !== undefined ? 'overWires.measurement' : 'boltPitchDiameter';
  const d3 = g.minorDiameterExternal;
  if (e !== undefined && (e <= d3 || e >= g.nominal)) {
    add(eField, u => `bolt pitch diameter ${L(e, u)} is outside what a ${g.spec.designation} bolt can have (between its root ${L(d3, u)} and its major ${L(g.nominal, u)})`);
  }
  const ds = m.boltMajorDiameter;
  const eRef = e ?? g.limits.external.pitchMax;
  if (ds !== undefined) {
    if (e !== undefined && ds <= e) add('boltMajorDiameter', u => `bolt major diameter ${L(ds, u)} is not above the bolt pitch diameter ${L(e, u)}: a crest lies above the pitch line`);
    else if (ds > eRef + H + 1e-9) add('boltMajorDiameter', u => `bolt major diameter ${L(ds, u)} is above the sharp-V crest ${L(eRef + H, u)} of a ${P} mm pitch thread with pitch diameter ${L(eRef, u)}`);
    else if (e === undefined && ds <= d3) add('boltMajorDiameter', u => `bolt major diameter ${L(ds, u)} is not above the bolt's root ${L(d3, u)}`);
  }
  const kn = m.holeMinorDiameter;
  const dsRef = ds ?? g.limits.external.majorMax;
  if (kn !== undefined) {
    if (kn >= dsRef) {
      add('holeMinorDiameter', u => `hole minor diameter ${L(kn, u)} is not below the bolt major diameter ${L(dsRef, u)}${ds === undefined ? ' (largest of the class)' : ''}: the threads would not engage`);
    } else if (kn <= d3) {
      add('holeMinorDiameter', u => `hole minor diameter ${L(kn, u)} is not above the bolt's root ${L(d3, u)}: the bolt could not enter`);
    }
  }
  const en = m.holePitchDiameter;
  if (en !== undefined) {
    if (kn !== undefined && en <= kn) add('holePitchDiameter', u => `hole pitch diameter ${L(en, u)} is not above the hole minor diameter ${L(kn, u)}: a crest lies below the pitch line`);
    else if (kn !== undefined && en > kn + H + 1e-9) add('holePitchDiameter', u => `hole pitch diameter ${L(en, u)} is above the sharp-V root ${L(kn + H, u)} of a ${P} mm pitch thread with minor diameter ${L(kn, u)}`);
    else if (en >= g.nominal) add('holePitchDiameter', u => `hole pitch diameter ${L(en, u)} is not below the major diameter ${L(g.nominal, u)}: no flank left to engage`);
    else if (e !== undefined && en < e) add('holePitchDiameter', u => `hole pitch diameter ${L(en, u)} is below the bolt pitch diameter ${L(e, u)}: the bolt could not enter`);
  }
  return out;
}

/** Throw the first physically impossible measurement as a JointInputError naming its field. */
export function assertMeasuredPossible(g: ThreadGeometry, m: MeasuredThread): void {
  const p = measuredProblems(g, m)[0];
  if (p) throw new JointInputError(p.field, p.message, p.usMessage);
}

/**
 * The diameters for the FED-STD-H28/2B stripping areas, mm: measured where given, else the
 * least-material limit (Kn max, Es min, Ds min, En max of the classes). A NO-GO gauge that
 * entered leaves the limit in place as a bound and asks for a measurement. Throws
 * JointInputError (field `measured.*`) for a measurement that is not physically possible.
 */
export function measuredStrippingLimits(g: ThreadGeometry, m: MeasuredThread | undefined): MeasuredStripping {
  const lm: StrippingLimits = {
    knMax: g.limits.internal.minorMax,
    esMin: g.limits.external.pitchMin,
    dsMin: g.limits.external.majorMin,
    enMax: g.limits.internal.pitchMax,
    pitch: g.pitch,
  };
  if (m === undefined) {
    return {limits: lm, limitsUsed: {external: 'least-material', internal: 'least-material'}, boltPitchDiameter: lm.esMin, items: [], notes: [], upperBound: {external: false, internal: false}};
  }
  assertMeasuredPossible(g, m);
  const e = boltPitchFromInput(g, m);
  const limits: StrippingLimits = {
    knMax: m.holeMinorDiameter ?? lm.knMax,
    esMin: e ?? lm.esMin,
    dsMin: m.boltMajorDiameter ?? lm.dsMin,
    enMax: m.holePitchDiameter ?? lm.enMax,
    pitch: g.pitch,
  };
  const ext = (m.holeMinorDiameter !== undefined ? 1 : 0) + (e !== undefined ? 1 : 0);
  const int = (m.boltMajorDiameter !== undefined ? 1 : 0) + (m.holePitchDiameter !== undefined ? 1 : 0);
  const notes: string[] = [];
  const gauges = m.gauges ?? {};
  const L = (x: number) => measuredLength(x, 'si');
  const boltBound = gauges.boltNoGo === 'enters' && e === undefined;
  const holeBound = gauges.holeNoGo === 'enters' && m.holePitchDiameter === undefined;
  if (boltBound) {
    notes.push(`NO-GO ring gauge entered: the bolt pitch diameter is below its ${g.spec.toleranceExternal} minimum ${L(lm.esMin)}; the bolt-thread stripping force is at most the figure shown (limit taken as the bound). Measure the pitch diameter (three wires) for a number.`);
  }
  if (holeBound) {
    notes.push(`NO-GO plug gauge entered: the hole pitch diameter is above its ${g.spec.toleranceInternal} maximum ${L(lm.enMax)}; the internal-thread stripping force is at most the figure shown (limit taken as the bound). Measure the pitch diameter for a number.`);
  }
  if (gauges.boltNoGo === 'enters' && e !== undefined && e >= lm.esMin) notes.push(`NO-GO ring gauge entered, but the measured bolt pitch diameter ${L(e)} is not below the minimum ${L(lm.esMin)}: measure again.`);
  if (gauges.holeNoGo === 'enters' && m.holePitchDiameter !== undefined && m.holePitchDiameter <= lm.enMax) notes.push(`NO-GO plug gauge entered, but the measured hole pitch diameter ${L(m.holePitchDiameter)} is not above the maximum ${L(lm.enMax)}: measure again.`);
  if (gauges.boltGo === 'stops') notes.push('GO ring gauge does not enter: the bolt is above its maximum-material size or damaged (burrs, bent, dirt); clean and gauge again before using it.');
  if (gauges.holeGo === 'stops') notes.push('GO plug gauge does not enter: the hole is below its maximum-material size or damaged (burrs, chips, dirt); clean and gauge again before using it.');
  return {
    limits,
    limitsUsed: {external: word(ext), internal: word(int)},
    boltPitchDiameter: limits.esMin,
    items: measurementItems(g, m, e),
    notes,
    upperBound: {external: boltBound, internal: holeBound},
  };
}

/** Short words for a result's limitsUsed: "least-material limits", "as measured" or "partly measured". */
export function limitsUsedText(used: {external: LimitsUsedWord; internal: LimitsUsedWord}): string {
  if (used.external === 'least-material' && used.internal === 'least-material') return 'least-material limits';
  if (used.external === 'measured' && used.internal === 'measured') return 'as measured';
  return 'partly measured';
}
