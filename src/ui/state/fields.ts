/**
 * The joint form: which fields each step shows, what kind of value they take
 * and their accepted range (read from the zod schemas, the single source of truth).
 * Values are held in working units (mm, N, N·m, MPa); only the display converts.
 */
import * as z from 'zod';
import {JointInputSchema, type JointInputDraft} from '../../core/joint/input.js';
import {RepairInputSchema, type RepairInput} from '../../core/repair/input.js';
import {ScrewInputSchema, END_CONDITION_IDS, type ScrewInputDraft} from '../../core/screw/input.js';
import type {Dimension} from '../../core/units.js';
import type {Notes} from '../../store/schema.js';

export type RepairDraft = Partial<z.input<typeof RepairInputSchema>>;

export interface FormValues {
  joint: Partial<JointInputDraft>;
  hole: RepairDraft;
  /** Power-screw inputs (the workbench's power-screw mode). */
  screw?: Partial<ScrewInputDraft>;
  /** The preset's work-order notes (asset tag, location, work order, free text); not an input of any check. */
  notes?: Notes;
}

/** What the workbench works on: a threaded joint, or a power screw (lead screw and nut). */
export type Mode = 'joint' | 'screw';

export type StepId = 'thread' | 'parts' | 'engagement' | 'tightening' | 'hole' | 'screw-thread' | 'screw-nut' | 'screw-friction';

export const STEPS: readonly {id: StepId; title: string}[] = [
  {id: 'thread', title: 'Thread'},
  {id: 'parts', title: 'Parts'},
  {id: 'engagement', title: 'Engagement'},
  {id: 'tightening', title: 'Tightening'},
  {id: 'hole', title: 'Hole state'},
];

export const SCREW_STEPS: readonly {id: StepId; title: string}[] = [
  {id: 'screw-thread', title: 'Screw'},
  {id: 'screw-nut', title: 'Nut and load'},
  {id: 'screw-friction', title: 'Friction'},
];

export const stepsFor = (mode: Mode) => (mode === 'screw' ? SCREW_STEPS : STEPS);

export type FieldKind = 'quantity' | 'ratio' | 'range' | 'choice' | 'pick' | 'thread' | 'bool' | 'text';
export type PickSource = 'boltGrade' | 'parent' | 'nutClass' | 'screwThreadFriction' | 'screwCollarFriction';

export interface FieldDef {
  /** Key in FormValues.joint, or "hole.<key>" for FormValues.hole. */
  id: string;
  label: string;
  step: StepId;
  kind: FieldKind;
  dimension?: Dimension;
  choices?: readonly string[];
  pick?: PickSource;
  /** A published table whose rows can be picked for this number field (t on the field). */
  table?: PickSource;
  /** May be left empty (the core then uses its default or leaves it out). */
  optional: boolean;
  /** Whole numbers only (shown without decimals). */
  integer?: boolean;
  /** What applies when the field is empty, shown in its place ("from grade"). */
  empty?: string;
  /** One line shown under the fields when this one is selected. */
  help: string;
  isVisible?: (v: FormValues) => boolean;
}

const isNut = (v: FormValues) => v.joint.internal === 'nut';
const isTapped = (v: FormValues) => v.joint.internal !== 'nut';
const tighten = (m: string) => (v: FormValues) => (v.joint.tightening ?? 'utilisation') === m;

export const FIELDS: readonly FieldDef[] = [
  {id: 'thread', label: 'Designation', step: 'thread', kind: 'thread', optional: false,
    help: 'Thread with tolerance class, e.g. M10x1.5-6H/6g or 1/4-20 UNC-2A; type to see matches.'},
  {id: 'boltGrade', label: 'Bolt grade', step: 'parts', kind: 'pick', pick: 'boltGrade', optional: false,
    help: 'Property class of the bolt or screw; Enter opens the list with sources.'},
  {id: 'boltRm', label: 'Bolt Rm', empty: 'from grade', step: 'parts', kind: 'quantity', dimension: 'stress', optional: true,
    help: 'Tensile strength from a certificate; leave empty to use the grade.'},
  {id: 'boltRp', label: 'Bolt Rp0.2', empty: 'from grade', step: 'parts', kind: 'quantity', dimension: 'stress', optional: true,
    help: 'Yield strength from a certificate; leave empty to use the grade.'},
  {id: 'internal', label: 'Internal thread', step: 'parts', kind: 'choice', choices: ['tapped', 'nut'], optional: false,
    help: 'tapped = a tapped hole in the part; nut = a nut. Enter switches.'},
  {id: 'parent', label: 'Parent material', empty: 'custom values', step: 'parts', kind: 'pick', pick: 'parent', optional: true, isVisible: isTapped,
    help: 'Material of the part with the tapped hole; Enter opens the list with sources.'},
  {id: 'parentRm', label: 'Parent Rm', empty: 'from material', step: 'parts', kind: 'quantity', dimension: 'stress', optional: true, isVisible: isTapped,
    help: 'Tensile strength of the part from a certificate; empty = material value.'},
  {id: 'parentShear', label: 'Parent shear', empty: 'from material', step: 'parts', kind: 'quantity', dimension: 'stress', optional: true, isVisible: isTapped,
    help: 'Shear strength of the part; empty = derived from the material.'},
  {id: 'nutClass', label: 'Nut class', empty: 'from bolt grade', step: 'parts', kind: 'pick', pick: 'nutClass', optional: true, isVisible: isNut,
    help: 'Property class of the nut; Enter opens the list with sources.'},
  {id: 'nutHeight', label: 'Nut height m', empty: 'standard nut', step: 'parts', kind: 'quantity', dimension: 'length', optional: true, isVisible: isNut,
    help: 'Height of the nut; empty = standard height for the size.'},
  {id: 'nutFlats', label: 'Nut flats s', empty: 'standard nut', step: 'parts', kind: 'quantity', dimension: 'length', optional: true, isVisible: isNut,
    help: 'Width across flats of the nut; empty = standard for the size.'},
  {id: 'engagement', label: 'Engaged length', step: 'engagement', kind: 'quantity', dimension: 'length', optional: false,
    help: 'From the loaded face, chamfer included. A unit may be typed: 12mm, 0.5in.'},
  {id: 'chamfer', label: 'Chamfer', step: 'engagement', kind: 'quantity', dimension: 'length', optional: true,
    help: 'Axial length at the loaded face without full thread.'},
  {id: 'holeDepth', label: 'Blind hole depth', empty: 'through hole', step: 'engagement', kind: 'quantity', dimension: 'length', optional: true, isVisible: isTapped,
    help: 'Drilled-and-tapped depth of a blind hole; empty for a through hole.'},
  {id: 'requiredMargin', label: 'Required margin', step: 'engagement', kind: 'ratio', optional: true,
    help: 'Stripping margin wanted on bolt break; 1.0 = the bolt must break first.'},
  {id: 'tightening', label: 'Tighten by', step: 'tightening', kind: 'choice', choices: ['utilisation', 'torque', 'preload'], optional: false,
    help: 'What you set: a yield utilisation, a torque, or a target preload. Enter switches.'},
  {id: 'utilisation', label: 'Utilisation', step: 'tightening', kind: 'ratio', optional: true, isVisible: tighten('utilisation'),
    help: 'Von Mises stress during tightening over yield; 0.9 is usual. 90% also accepted.'},
  {id: 'torque', label: 'Torque', step: 'tightening', kind: 'quantity', dimension: 'torque', optional: false, isVisible: tighten('torque'),
    help: 'Tightening torque; 40Nm or 30ft-lbf accepted.'},
  {id: 'preload', label: 'Target preload', step: 'tightening', kind: 'quantity', dimension: 'force', optional: false, isVisible: tighten('preload'),
    help: 'Wanted clamp force; 20kN or 4500lbf accepted.'},
  {id: 'muThread', label: 'Thread friction', step: 'tightening', kind: 'range', optional: true,
    help: 'muG as one value or min..max, e.g. 0.10..0.16.'},
  {id: 'muHead', label: 'Head friction', step: 'tightening', kind: 'range', optional: true,
    help: 'muK as one value or min..max, e.g. 0.10..0.16.'},
  {id: 'nutFactor', label: 'Nut factor K', empty: 'use friction', step: 'tightening', kind: 'ratio', optional: true,
    help: 'K of T = K F d; when given it replaces the two friction values. Empty = friction.'},
  {id: 'bearingDiameter', label: 'Head bearing dia', empty: 'standard head', step: 'tightening', kind: 'quantity', dimension: 'length', optional: true,
    help: 'Effective diameter under the head; empty = hexagon head, medium clearance hole.'},
  {id: 'scatter', label: 'Method scatter', step: 'tightening', kind: 'ratio', optional: true,
    help: 'Tightening-method scatter Fmax/Fmin beyond friction; 1 = friction range only.'},
  {id: 'serviceLoad', label: 'Service load', step: 'tightening', kind: 'quantity', dimension: 'force', optional: true,
    help: 'External axial load on the bolt in service; empty = none.'},
  {id: 'hole.holeState', label: 'Hole', step: 'hole', kind: 'choice', choices: ['intact', 'stripped'], optional: false,
    help: 'State of the tapped hole, for the repair planner. Enter switches.'},
  {id: 'hole.strippedDepth', label: 'Stripped to depth', empty: 'not given', step: 'hole', kind: 'quantity', dimension: 'length', optional: true,
    isVisible: v => v.hole.holeState === 'stripped',
    help: 'Thread is gone from the surface to this depth; good thread below.'},
  {id: 'hole.through', label: 'Through hole', step: 'hole', kind: 'bool', optional: false,
    help: 'yes = a nut can go on the far side. Enter switches.'},
  {id: 'hole.depthAvailable', label: 'Depth available', empty: 'not given', step: 'hole', kind: 'quantity', dimension: 'length', optional: true,
    help: 'To the bottom of a blind hole, or the through-thickness.'},
  {id: 'hole.wall', label: 'Wall/edge dist.', empty: 'not given', step: 'hole', kind: 'quantity', dimension: 'length', optional: true,
    help: 'From the hole centre line to the nearest edge; limits oversize repairs.'},
  {id: 'hole.boltLengthMayChange', label: 'Longer bolt OK', step: 'hole', kind: 'bool', optional: false,
    help: 'yes = a longer screw may be fitted. Enter switches.'},
  {id: 'screw.thread', label: 'Designation', step: 'screw-thread', kind: 'text', optional: false,
    help: 'Power thread: Tr24x5, Tr40x14(P7) (multi-start), 1-5 ACME-2G, or square 32x4.'},
  {id: 'screw.starts', label: 'Starts', step: 'screw-thread', kind: 'ratio', integer: true, optional: true,
    help: 'Number of thread starts; a multi-start designation sets it too.'},
  {id: 'screw.screwMaterial', label: 'Screw material', step: 'screw-thread', kind: 'text', optional: true, empty: 'steel',
    help: 'steel, alloy-steel, or a steel id of the material library; tapwright materials lists them.'},
  {id: 'screw.screwYield', label: 'Screw yield', step: 'screw-thread', kind: 'quantity', dimension: 'stress', optional: true, empty: 'from material',
    help: 'Yield strength of the screw from a certificate; empty = the material value.'},
  {id: 'screw.length', label: 'Free length', step: 'screw-thread', kind: 'quantity', dimension: 'length', optional: true,
    help: 'Unsupported length of screw in compression, for buckling; 0 = no column check.'},
  {id: 'screw.ends', label: 'End conditions', step: 'screw-thread', kind: 'choice', choices: END_CONDITION_IDS, optional: false,
    help: 'How the screw ends are held, for buckling. Enter switches.'},
  {id: 'screw.load', label: 'Axial load', step: 'screw-nut', kind: 'quantity', dimension: 'force', optional: false,
    help: 'Load the screw lifts or pushes; 20kN or 4500lbf accepted.'},
  {id: 'screw.loadDirection', label: 'Screw is in', step: 'screw-nut', kind: 'choice', choices: ['compression', 'tension'], optional: false,
    help: 'Whether the loaded length of the screw is pushed (compression) or pulled. Enter switches.'},
  {id: 'screw.nutLength', label: 'Nut length', step: 'screw-nut', kind: 'quantity', dimension: 'length', optional: false,
    help: 'Engaged length of the nut thread.'},
  {id: 'screw.nutMaterial', label: 'Nut material', step: 'screw-nut', kind: 'text', optional: true,
    help: 'bronze, cast-iron, steel, plastic, or a material id; tapwright screw --help lists them.'},
  {id: 'screw.nutWear', label: 'Nut wear', step: 'screw-nut', kind: 'quantity', dimension: 'length', optional: true,
    help: 'Loss of nut-thread thickness by wear; 0 for a new nut.'},
  {id: 'screw.speed', label: 'Sliding speed', step: 'screw-nut', kind: 'quantity', dimension: 'speed', optional: true, empty: 'not given',
    help: 'Sliding speed at the thread, for the allowable bearing pressure; 3m/min accepted.'},
  {id: 'screw.muThread', label: 'Thread friction', step: 'screw-friction', kind: 'range', optional: true, table: 'screwThreadFriction',
    help: 'Thread friction f as one value or min..max, e.g. 0.10..0.15; t picks a row of Shigley Table 8-5.'},
  {id: 'screw.muCollar', label: 'Collar friction', step: 'screw-friction', kind: 'ratio', optional: true, table: 'screwCollarFriction',
    help: 'Thrust-collar friction fc; 0 with a rolling thrust bearing; t picks a row of Shigley Table 8-6.'},
  {id: 'screw.collarDiameter', label: 'Collar mean dia', step: 'screw-friction', kind: 'quantity', dimension: 'length', optional: true,
    help: 'Mean diameter of the thrust collar; 0 = no collar friction.'},
];

/** Fields of a step that apply to the current values (nut fields only for a nut, ...). */
export function visibleFields(step: StepId, v: FormValues): FieldDef[] {
  return FIELDS.filter(f => f.step === step && (f.isVisible ? f.isVisible(v) : true));
}

export function fieldById(id: string): FieldDef {
  const f = FIELDS.find(x => x.id === id);
  if (!f) throw new Error(`no field ${id}`);
  return f;
}

export function getValue(v: FormValues, id: string): unknown {
  if (id.startsWith('hole.')) return (v.hole as Record<string, unknown>)[id.slice(5)];
  if (id.startsWith('screw.')) return ((v.screw ?? {}) as Record<string, unknown>)[id.slice(6)];
  return (v.joint as Record<string, unknown>)[id];
}

export function setValue(v: FormValues, id: string, value: unknown): FormValues {
  if (id.startsWith('screw.')) {
    const screw = {...(v.screw ?? {})} as Record<string, unknown>;
    if (value === undefined) delete screw[id.slice(6)];
    else screw[id.slice(6)] = value;
    return {...v, screw: screw as Partial<ScrewInputDraft>};
  }
  if (id.startsWith('hole.')) {
    const hole = {...v.hole} as Record<string, unknown>;
    if (value === undefined) delete hole[id.slice(5)];
    else hole[id.slice(5)] = value;
    return {...v, hole: hole as RepairDraft};
  }
  const joint = {...v.joint} as Record<string, unknown>;
  if (value === undefined) delete joint[id];
  else joint[id] = value;
  return {...v, joint: joint as Partial<JointInputDraft>};
}

interface Bounds {
  min?: number;
  max?: number;
  /** The schema's default, applied by the core when the field is empty. */
  default?: unknown;
}

interface ZodDefLike {
  type: string;
  innerType?: z.ZodType;
  defaultValue?: unknown;
  shape?: Record<string, z.ZodType>;
  in?: z.ZodType;
  options?: z.ZodType[];
}

/** Read min, max and default off a zod field, through optional/default wrappers. */
function readBounds(schema: z.ZodType): Bounds {
  const out: Bounds = {};
  let cur: z.ZodType | undefined = schema;
  for (let depth = 0; cur && depth < 6; depth++) {
    const def: ZodDefLike = (cur as unknown as {def: ZodDefLike}).def;
    if (def.type === 'default' && out.default === undefined) out.default = typeof def.defaultValue === 'function' ? (def.defaultValue as () => unknown)() : def.defaultValue;
    if (def.type === 'number') {
      const n = cur as unknown as {minValue: number | null; maxValue: number | null};
      if (n.minValue !== null && Number.isFinite(n.minValue)) out.min = n.minValue;
      if (n.maxValue !== null && Number.isFinite(n.maxValue)) out.max = n.maxValue;
      return out;
    }
    if (def.type === 'object' && def.shape?.min) return {...readBounds(def.shape.min), default: out.default};
    cur = def.innerType ?? def.in ?? def.options?.[0];
  }
  return out;
}

let boundsCache: Map<string, Bounds> | undefined;

/** Accepted range and default of a field in working units, read from the zod schema. */
export function fieldBounds(id: string): Bounds {
  if (!boundsCache) {
    boundsCache = new Map();
    for (const [k, v] of Object.entries(JointInputSchema.shape)) boundsCache.set(k, readBounds(v as z.ZodType));
    for (const [k, v] of Object.entries(RepairInputSchema.shape)) boundsCache.set(`hole.${k}`, readBounds(v as z.ZodType));
    for (const [k, v] of Object.entries(ScrewInputSchema.shape)) boundsCache.set(`screw.${k}`, readBounds(v as z.ZodType));
  }
  return boundsCache.get(id) ?? {};
}

export type {RepairInput};
