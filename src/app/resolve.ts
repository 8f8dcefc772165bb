/**
 * The one resolver: from what a user typed (a draft, the same from the command
 * line, the workbench, a preset or an import) to the input the core receives.
 * It applies every default that is not the schema's own (the scatter of the
 * settings, the engaged length of a nut), checks what is needed, validates with
 * the zod schema and attaches the user's own parent material. Every problem
 * comes back as a FieldError naming the field, its option and its label.
 */
import {getPath} from './key-path.js';
import * as z from 'zod';
import type {JointInput, JointInputDraft, UserParentMaterial} from '../core/joint/input.js';
import {JointInputError} from '../core/joint/errors.js';
import {resolveGeometry, sizeWords} from '../core/joint/resolve.js';
import {nutClassProblem, nutDimensions, parentMaterial} from '../core/materials/index.js';
import type {RepairInput, RepairInputDraft} from '../core/repair/input.js';
import type {ScrewInput, ScrewInputDraft} from '../core/screw/input.js';
import {ScrewInputError} from '../core/screw/index.js';
import type {UnitSystem} from '../core/units.js';
import {withUserMaterial} from '../store/user-materials.js';
import {ALL_ROWS, boundsOf, fieldError, rowOf, SCHEMAS} from './field-table.js';
import type {FieldError, FormValues, InputGroup} from './fields-types.js';
import {lubricantSets} from './window-fields.js';

/** What the resolver needs beyond the draft. */
export interface ResolveContext {
  /** The user's settings: `scatterDefault` applies when the draft gives no scatter. */
  settings?: {scatterDefault?: number};
  /** The user's own parent materials (from the preset store). */
  userMaterials?: readonly UserParentMaterial[];
  /** Units of the ranges in the messages (the values are always SI). */
  units?: UnitSystem;
  /** Plain ASCII unit names in the messages (N*m for N·m). */
  ascii?: boolean;
}

export type Resolved<T> = {input: T; errors?: undefined} | {input?: undefined; errors: FieldError[]};

const empty = (v: unknown) => v === undefined || v === '';

/** Missing inputs of a group: visible rows that are needed and have no value and no schema default. */
function missing(group: InputGroup, values: FormValues, draft: Record<string, unknown>, units: UnitSystem, ascii: boolean): FieldError[] {
  const out: FieldError[] = [];
  for (const row of ALL_ROWS) {
    if (row.group !== group || (row.isVisible && !row.isVisible(values))) continue;
    if (!row.optional && empty(getPath(draft, row.key)) && boundsOf(group, row.key).default === undefined) out.push(fieldError(group, row.key, 'is needed', 'needed', units, ascii));
  }
  return out;
}

/** The row key of a dotted schema path: its own row, else the first row inside it (measured.overWires -> its measurement), else the top key. */
function keyOfPath(group: InputGroup, dotted: string, top: string): string {
  if (!dotted.includes('.')) return top;
  if (rowOf(group, dotted)) return dotted;
  return ALL_ROWS.find(r => r.group === group && r.key.startsWith(`${dotted}.`))?.key ?? top;
}

/** Every issue of a failed schema parse, on its field; a member missing from a given object (the wire of a three-wire reading) "is needed". */
function schemaErrors(group: InputGroup, error: z.ZodError, draft: unknown, units: UnitSystem, ascii: boolean): FieldError[] {
  const seen = new Set<string>();
  const out: FieldError[] = [];
  for (const issue of error.issues) {
    const dotted = issue.path.map(String).join('.');
    const key = keyOfPath(group, dotted, String(issue.path[0] ?? ''));
    if (seen.has(key)) continue;
    seen.add(key);
    const absent = issue.code === 'invalid_type' && key === dotted && key.includes('.') && getPath(draft, key) === undefined;
    out.push(absent ? fieldError(group, key, 'is needed', 'needed', units, ascii) : fieldError(group, key, issue.message, 'schema', units, ascii));
  }
  return out;
}

/**
 * A core error that names its field (JointInputError, ScrewInputError, or any
 * error carrying a `field` of the group's schema) as a FieldError; undefined
 * for an error that names none.
 */
export function coreFieldError(e: unknown, group: 'joint' | 'screw', units: UnitSystem = 'si'): FieldError | undefined {
  if (e instanceof JointInputError) return fieldError(group, e.field, e.messageIn(units), 'core', units);
  if (e instanceof ScrewInputError) return fieldError(group, e.field, e.message, 'core', units);
  const field = e instanceof Error ? (e as Error & {field?: unknown}).field : undefined;
  if (typeof field === 'string' && rowOf(group, field)) return fieldError(group, field, (e as Error).message, 'core', units);
  return undefined;
}

/**
 * The engaged length of a nut given none: its height, given or tabulated
 * (ISO 4032 m min, the nut table of src/core/materials). Undefined when the
 * thread is not known yet; an error when the size has no tabulated nut.
 */
function nutEngagement(d: Partial<JointInputDraft>, units: UnitSystem): number | FieldError | undefined {
  if (d.nutHeight !== undefined) return d.nutHeight;
  if (typeof d.thread !== 'string' || d.thread.trim() === '') return undefined;
  try {
    const g = resolveGeometry(d.thread);
    const dims = nutDimensions(g.nominal, d.nutStyle ?? 'hex');
    if (dims) return dims.heightMin;
    return fieldError('joint', 'nutHeight', `is needed (or the engaged length): no tabulated nut height for ${sizeWords(g)}`, 'needed', units);
  } catch (e) {
    return coreFieldError(e, 'joint', units) ?? fieldError('joint', 'thread', e instanceof Error ? e.message : String(e), 'core', units);
  }
}

/**
 * The joint: settings scatter when the draft has none, a nut's engaged length
 * from its height, the needed inputs, the schema, the user's own material.
 */
export function resolveJointInput(draft: Partial<JointInputDraft>, ctx: ResolveContext = {}): Resolved<JointInput> {
  const units = ctx.units ?? 'si';
  const ascii = ctx.ascii ?? true;
  const d: Record<string, unknown> & Partial<JointInputDraft> = {...draft};
  if (d.scatter === undefined && ctx.settings?.scatterDefault !== undefined) d.scatter = ctx.settings.scatterDefault;
  // A cycling service load (service.serviceLoad): the thread and tightening checks take its largest value in full.
  const cyc = d.service?.serviceLoad;
  const cycMax = typeof cyc === 'number' ? cyc : cyc?.max;
  if (typeof cycMax === 'number' && !(typeof d.serviceLoad === 'number' && d.serviceLoad >= cycMax)) d.serviceLoad = cycMax;
  // A lubricant pick gives the friction ranges not typed (issue 18).
  for (const [k, v] of Object.entries(lubricantSets(d.window?.lubricant))) if (d[k] === undefined) d[k] = v;
  if (d.engagement === undefined && d.internal === 'nut') {
    const e = nutEngagement(d, units);
    if (typeof e === 'number') d.engagement = e;
    else if (e) return {errors: [e]};
  }
  const errors = missing('joint', {joint: d, hole: {}}, d, units, ascii);
  if (errors.length > 0) return {errors};
  const parsed = SCHEMAS.joint.safeParse(d);
  if (!parsed.success) return {errors: schemaErrors('joint', parsed.error, d, units, ascii)};
  return {input: withUserMaterial(parsed.data, ctx.userMaterials ?? [])};
}

/** Whether a joint draft names a parent material that is not in the shipped library (the user's own, maybe). */
export function wantsUserMaterials(draft: Partial<JointInputDraft>): boolean {
  return typeof draft.parent === 'string' && draft.parentData === undefined && !parentMaterial(draft.parent);
}

/** The state of the hole for the repair planner; with the joint, the through-bolt nut class is checked for its size. */
export function resolveHoleInput(draft: Partial<RepairInputDraft>, ctx: ResolveContext & {joint?: JointInput} = {}): Resolved<RepairInput> {
  const units = ctx.units ?? 'si';
  const ascii = ctx.ascii ?? true;
  if (draft.nutClass !== undefined && ctx.joint) {
    const problem = nutClassProblem(draft.nutClass, resolveGeometry(ctx.joint.thread).nominal);
    if (problem !== undefined) return {errors: [fieldError('hole', 'nutClass', problem, 'core', units)]};
  }
  const errors = missing('hole', {joint: {}, hole: draft}, draft, units, ascii);
  if (errors.length > 0) return {errors};
  const parsed = SCHEMAS.hole.safeParse(draft);
  if (!parsed.success) return {errors: schemaErrors('hole', parsed.error, draft, units, ascii)};
  return {input: parsed.data};
}

/** The power screw: the needed inputs and the schema. */
export function resolveScrewInput(draft: Partial<ScrewInputDraft>, ctx: ResolveContext = {}): Resolved<ScrewInput> {
  const units = ctx.units ?? 'si';
  const ascii = ctx.ascii ?? true;
  // A known torque that solves for the load replaces the load: none need be given (checkScrew sets it).
  if (draft.torque !== undefined && (draft.torqueSolves ?? 'load') === 'load' && draft.load === undefined) draft = {...draft, load: 0};
  const errors = missing('screw', {joint: {}, hole: {}, screw: draft}, draft, units, ascii);
  if (errors.length > 0) return {errors};
  const parsed = SCHEMAS.screw.safeParse(draft);
  if (!parsed.success) return {errors: schemaErrors('screw', parsed.error, draft, units, ascii)};
  return {input: parsed.data};
}
