/**
 * Resolve a JointInput into numbers: thread geometry, the bolt and internal-thread
 * materials, the nut, and the bearing diameter, each with where it came from.
 * Throws JointInputError naming the input field for anything that cannot be resolved.
 */
import type {Provenance, ThreadGeometry} from '../types.js';
import {parseThread, threadGeometry} from '../threads/index.js';
import {boltGrade, boltGradeProblem, defaultNutClass, hexHeadBearing, nutClass, nutClassProblem, nutDimensions, nutMatchesBolt, parentMaterial, parentMaterialProblem} from '../materials/index.js';
import {countersinkThreadLoss} from '../materials/nut-countersink.js';
import type {JointInput} from './input.js';
import {JointInputError} from './errors.js';
import {toDisplay, type UnitSystem} from '../units.js';

export interface ResolvedBolt {
  id: string;
  name: string;
  rm: number;
  rp: number;
  shear: number;
  shearRatio: number;
  elasticModulus: number;
  provenance: Provenance;
}

export interface ResolvedInternal {
  id: string;
  name: string;
  rm: number;
  shear: number;
  /** Yield used for the first-thread check, MPa (Rm when no yield is known). */
  yield: number;
  elasticModulus: number;
  provenance: Provenance;
}

export interface ResolvedJoint {
  geometry: ThreadGeometry;
  bolt: ResolvedBolt;
  internal: ResolvedInternal;
  /**
   * Nut height and flats, mm (nut only); the thread length one countersunk face takes off, mm (0 when
   * the size has no tabulated countersink); the class used; whether it is the bolt's matching class
   * at standard height (ISO 898-2 design basis: the bolt breaks first).
   */
  nut?: {height: number; flats: number; countersink?: number; classId?: string; matchesBolt?: boolean};
  /** Effective bearing diameter DKm, mm, and how it was found. */
  bearingDiameter: number;
  bearingSource: 'input' | 'standard' | 'estimate';
  notes: string[];
}

/** Shear strength / Rm when a custom parent gives no shear strength: 0.6 (textbook assumption for steels, from memory). */
export const DEFAULT_SHEAR_RATIO = 0.6;
/** DKm / d for sizes without ISO 4014/ISO 273 data: about 1.27, the ratio of the tabulated defaults at M8 to M24 (approximation, common practice, no source). */
export const BEARING_RATIO_ESTIMATE = 1.27;

const USER: Provenance = {source: 'value given by the user', kind: 'user'};

export function resolveGeometry(thread: string): ThreadGeometry {
  const p = parseThread(thread);
  if (!p.ok) {
    const hint = p.suggestions && p.suggestions.length ? `; did you mean ${p.suggestions.slice(0, 4).join(', ')}?` : '';
    throw new JointInputError('thread', `${p.error}${hint}`);
  }
  if (p.value.family !== 'metric' && p.value.family !== 'unified') {
    throw new JointInputError('thread', `${p.value.designation} is a power-screw thread; check covers ISO metric and unified fastener threads (use tapwright screw)`);
  }
  try {
    return threadGeometry(p.value);
  } catch (e) {
    throw new JointInputError('thread', e instanceof Error ? e.message : String(e));
  }
}

function resolveBolt(input: JointInput, d: number): ResolvedBolt {
  const g = boltGrade(input.boltGrade, d);
  if (!g) throw new JointInputError('boltGrade', boltGradeProblem(input.boltGrade, d) ?? `unknown bolt grade "${input.boltGrade}"`);
  let rm = g.rmMin;
  let rp = g.rpMin;
  let provenance: Provenance = g.provenance;
  if (input.boltRm !== undefined && input.boltRp !== undefined) {
    rm = input.boltRm;
    rp = input.boltRp;
    provenance = USER;
  } else if (input.boltRm !== undefined) {
    rm = input.boltRm;
    rp = (g.rpMin / g.rmMin) * rm;
    provenance = {source: `Rm given by the user; Rp0.2 scaled with the yield ratio of grade ${g.id}`, kind: 'user'};
  } else if (input.boltRp !== undefined) {
    rp = input.boltRp;
    provenance = {source: `Rp0.2 given by the user; Rm of grade ${g.id}`, kind: 'user'};
  }
  if (rp >= rm) {
    const text = (u: UnitSystem) => `bolt yield Rp0.2 ${stressText(rp, u)} must be below the tensile strength Rm ${stressText(rm, u)}; give both --bolt-rm and --bolt-rp, or a grade`;
    throw new JointInputError('boltRp', text('si'), text('us'));
  }
  // Strengths given by the user: the bolt is no longer the grade, only its shear ratio and modulus (and a missing strength) are.
  const custom = input.boltRm !== undefined || input.boltRp !== undefined;
  const given = [input.boltRm !== undefined ? 'Rm' : '', input.boltRp !== undefined ? 'Rp0.2' : ''].filter(Boolean).join(' and ');
  const id = custom ? 'custom' : g.id;
  const name = custom ? `custom bolt (${given} given; otherwise as grade ${g.id})` : g.name;
  return {id, name, rm, rp, shear: g.shearRatio * rm, shearRatio: g.shearRatio, elasticModulus: g.elasticModulus, provenance};
}

/** The user's own material attached to the input, when `parent` names it. */
function userParent(input: JointInput) {
  const u = input.parentData;
  if (!u || (input.parent !== undefined && input.parent.trim().toLowerCase() !== u.id.toLowerCase())) return undefined;
  return {
    id: u.id,
    name: u.name,
    rm: u.rm,
    yield: u.yield,
    shearRatio: u.shear / u.rm,
    elasticModulus: u.elasticModulus,
    provenance: {source: `your material "${u.id}": ${u.source}`, kind: 'user' as const},
  };
}

function resolveParent(input: JointInput, bolt: ResolvedBolt): ResolvedInternal {
  const m = userParent(input) ?? (input.parent !== undefined ? parentMaterial(input.parent) : undefined);
  if (input.parent !== undefined && !m) {
    throw new JointInputError('parent', parentMaterialProblem(input.parent) ?? `unknown parent material "${input.parent}"`);
  }
  if (!m && input.parentRm === undefined && input.parentShear === undefined) {
    throw new JointInputError('parent', 'a tapped hole needs its material: give a parent material id, or its tensile strength Rm (and shear strength)');
  }
  if (!m) {
    const rm = input.parentRm ?? (input.parentShear as number) / DEFAULT_SHEAR_RATIO;
    const shear = input.parentShear ?? DEFAULT_SHEAR_RATIO * rm;
    return {
      id: 'custom',
      name: 'custom parent material',
      rm,
      shear,
      yield: rm,
      elasticModulus: bolt.elasticModulus,
      provenance: {
        source: `strengths given by the user${input.parentShear === undefined ? '; shear = 0.6 Rm, textbook assumption, from memory' : ''}${input.parentRm === undefined ? '; Rm = shear / 0.6, from memory' : ''}; no yield given, compared against Rm; elastic modulus taken as the bolt's`,
        kind: 'user',
      },
    };
  }
  const rm = input.parentRm ?? m.rm;
  const shear = input.parentShear ?? m.shearRatio * rm;
  const custom = input.parentRm !== undefined || input.parentShear !== undefined;
  return {
    id: m.id,
    name: m.name,
    rm,
    shear,
    yield: Math.min(rm, m.yield * (rm / m.rm)),
    elasticModulus: m.elasticModulus,
    provenance: custom ? {source: `${m.name} with strengths given by the user`, kind: 'user'} : m.provenance,
  };
}

/** Resolve everything the mechanics need; throws JointInputError naming the field at fault. */
export function resolveJoint(input: JointInput): ResolvedJoint {
  const geometry = resolveGeometry(input.thread);
  const d = geometry.nominal;
  const notes: string[] = [];
  const bolt = resolveBolt(input, d);
  let internal: ResolvedInternal;
  let nut: ResolvedJoint['nut'];
  if (input.internal === 'nut') {
    const inch = geometry.spec.family === 'unified';
    const nutId = input.nutClass ?? defaultNutClass(bolt.id === 'custom' ? input.boltGrade : bolt.id, d, inch);
    if (nutId === undefined) throw new JointInputError('nutClass', 'a nut needs its property class (ISO 898-2 "8", "10", ... or SAE J995 "SAE-5", "SAE-8")');
    const n = nutClass(nutId, d);
    if (!n) throw new JointInputError('nutClass', nutClassProblem(nutId, d) ?? `unknown nut class "${nutId}"`);
    const dims = nutDimensions(d, input.nutStyle ?? 'hex');
    const height = input.nutHeight ?? dims?.heightMin;
    const flats = input.nutFlats ?? dims?.flats;
    if (height === undefined) throw new JointInputError('nutHeight', `no tabulated nut height for ${sizeWords(geometry)}; give the nut height`);
    if (flats === undefined) throw new JointInputError('nutFlats', `no tabulated width across flats for ${sizeWords(geometry)}; give the nut's width across flats`);
    if (flats <= d) {
      const text = (u: UnitSystem) => `width across flats ${lengthText(flats, u)} must exceed the thread diameter ${lengthText(d, u)}`;
      throw new JointInputError('nutFlats', text('si'), text('us'));
    }
    // Countersink on each face (ISO 4032 da max / ASME B18.2.2 rule, 120 deg; see nut-countersink.ts).
    const countersink = dims?.countersinkMax !== undefined ? countersinkThreadLoss(dims.countersinkMax, d) : 0;
    // Matching class at full standard height: the bolt is designed to break first (ISO 898-2 basis).
    const fullHeight = dims !== undefined && height >= dims.heightMin - 1e-9;
    nut = {height, flats, countersink, classId: n.id, matchesBolt: fullHeight && nutMatchesBolt(n.id, bolt.id === 'custom' ? input.boltGrade : bolt.id)};
    internal = {id: n.id, name: n.name, rm: n.rm, shear: n.shearRatio * n.rm, yield: n.rm, elasticModulus: bolt.elasticModulus, provenance: n.provenance};
  } else {
    internal = resolveParent(input, bolt);
  }
  let bearingDiameter: number;
  let bearingSource: ResolvedJoint['bearingSource'];
  if (input.bearingDiameter !== undefined) {
    // DKm is the mean of the head's bearing face and the clearance hole, both larger than d (VDI 2230 Part 1 definition of DKm).
    if (input.bearingDiameter <= d) {
      const dk = input.bearingDiameter;
      const text = (u: UnitSystem) => `bearing diameter ${lengthText(dk, u)} must be larger than the thread diameter ${lengthText(d, u)}: it is the mean of the head's bearing face and the clearance hole`;
      throw new JointInputError('bearingDiameter', text('si'), text('us'));
    }
    bearingDiameter = input.bearingDiameter;
    bearingSource = 'input';
  } else {
    const family = geometry.spec.family;
    const h = family === 'metric' ? hexHeadBearing(d) : family === 'unified' ? hexHeadBearing(d, 'inch') : undefined;
    if (h) {
      bearingDiameter = (h.dwMin + h.clearanceHole) / 2;
      bearingSource = 'standard';
    } else {
      bearingDiameter = BEARING_RATIO_ESTIMATE * d;
      bearingSource = 'estimate';
    }
  }
  notes.push(...resolveNotes(input, geometry, 'si'));
  return {geometry, bolt, internal, ...(nut ? {nut} : {}), bearingDiameter, bearingSource, notes};
}

/**
 * The notes on the defaults taken from the hardware tables (nut height, bearing diameter),
 * with lengths in `units` (SI mm, US in). resolveJoint keeps the SI ones in the result;
 * a report in US units asks again with 'us'.
 */
export function resolveNotes(input: JointInput, geometry: ThreadGeometry, units: UnitSystem): string[] {
  const d = geometry.nominal;
  const len = (x: number): string => (units === 'us' ? `${toDisplay(x, 'length', 'us').toFixed(3)} in` : `${round(x)} mm`);
  const num = (x: number): string => (units === 'us' ? toDisplay(x, 'length', 'us').toFixed(3) : round(x));
  const notes: string[] = [];
  if (input.internal === 'nut') {
    const dims = nutDimensions(d, input.nutStyle ?? 'hex');
    if (input.nutClass === undefined) {
      const id = defaultNutClass(input.boltGrade, d, geometry.spec.family === 'unified');
      if (id !== undefined) notes.push(`Nut class ${id} taken from the bolt grade ${input.boltGrade} (a nut of the matching class; give the nut class to change it).`);
    }
    if (input.nutHeight === undefined && dims) notes.push(`Nut height ${len(dims.heightMin)} (m min, ${dims.provenance.source}).`);
    if (dims?.countersinkMax !== undefined && input.chamfer === 0) {
      const loss = countersinkThreadLoss(dims.countersinkMax, d);
      const partial = countersinkThreadLoss(dims.countersinkMax, geometry.minorDiameterInternal) - loss;
      notes.push(`Nut countersink ${len(dims.countersinkMax)} diameter on each face (${geometry.spec.family === 'unified' ? 'ASME B18.2.2' : 'ISO 4032 da max'}; 120 deg, from memory) leaves no thread over ${len(loss)} per face, taken off the engagement; the thread is truncated over a further ${len(partial)} and counted.`);
    }
    const height = input.nutHeight ?? dims?.heightMin;
    if (height !== undefined && input.engagement > height + 1e-9) {
      notes.push(`Engaged length ${len(input.engagement)} is longer than the nut (${len(height)}): only the nut height is counted.`);
    }
  }
  if (input.bearingDiameter === undefined) {
    const family = geometry.spec.family;
    const h = family === 'metric' ? hexHeadBearing(d) : family === 'unified' ? hexHeadBearing(d, 'inch') : undefined;
    if (h) {
      const face = family === 'metric' ? 'dw,min' : 'bearing face';
      notes.push(`Bearing diameter ${len((h.dwMin + h.clearanceHole) / 2)} = (${face} ${num(h.dwMin)} + hole ${num(h.clearanceHole)})/2 (${h.provenance.source}).`);
    } else {
      notes.push(`Bearing diameter estimated as ${BEARING_RATIO_ESTIMATE} d = ${len(BEARING_RATIO_ESTIMATE * d)} (no hexagon-head table for this size).`);
    }
  }
  return notes;
}

/**
 * The size in a message: "M64", "#10", "2 in (the inch nut tables, ...)": the nut tables are
 * ISO 4032 (metric) and ASME B18.2.2 (inch, 1/4 to 1-1/2 in).
 */
export function sizeWords(geometry: ThreadGeometry): string {
  const label = geometry.spec.sizeLabel;
  if (geometry.spec.family !== 'unified') return label;
  return `${label.startsWith('#') ? label : `${label} in`} (the inch nut tables, ASME B18.2.2, cover 1/4 to 1-1/2 in)`;
}

/** A stress for a message: MPa (SI) or ksi (US), 4 significant figures, no float noise. */
export function stressText(x: number, units: UnitSystem): string {
  return units === 'us' ? `${Number(toDisplay(x, 'stress', 'us').toPrecision(4))} ksi` : `${Number(x.toPrecision(4))} MPa`;
}

/** A length for a message: mm (SI, at most 2 decimals) or in (US, 3 decimals). */
export function lengthText(x: number, units: UnitSystem): string {
  return units === 'us' ? `${toDisplay(x, 'length', 'us').toFixed(3)} in` : `${round(x)} mm`;
}

function round(x: number): string {
  return String(Math.round(x * 100) / 100);
}
