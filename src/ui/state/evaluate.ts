/**
 * From form values to the checked joint: validate with the zod schema, call the
 * core's check, and turn every failure into a message on the field it concerns.
 * Memoised per values object, so a re-render never recomputes.
 */
import {JointInputSchema, type JointInput} from '../../core/joint/input.js';
import {RepairInputSchema, type RepairInput} from '../../core/repair/input.js';
import type {CheckResult} from '../../core/joint/result.js';
import {flagsInUnits} from '../../core/joint/index.js';
import {JointInputError} from '../../core/joint/errors.js';
import type {UnitSystem} from '../../core/units.js';
import type {RepairPlan, WorkbenchServices} from '../services.js';
import {FIELDS, SCREW_STEPS, STEPS, fieldBounds, fieldById, getValue, visibleFields, type FormValues} from './fields.js';
import {ScrewInputSchema, type ScrewInput} from '../../core/screw/input.js';
import type {ScrewResult} from '../../core/screw/result.js';
import {rangeText} from './field-text.js';

export interface Evaluation {
  input?: JointInput;
  result?: CheckResult;
  /** Field id to message. */
  errors: Record<string, string>;
  /** A failure not tied to one field. */
  error?: string;
}

/** Map the option names a core or CLI error may carry to our field ids. */
const OPTION_FIELDS: Record<string, string> = {
  '--thread': 'thread', '--bolt': 'boltGrade', '--bolt-rm': 'boltRm', '--bolt-rp': 'boltRp', '--parent': 'parent',
  '--parent-rm': 'parentRm', '--parent-shear': 'parentShear', '--nut': 'nutClass', '--nut-height': 'nutHeight',
  '--nut-flats': 'nutFlats', '--engage': 'engagement', '--chamfer': 'chamfer', '--hole-depth': 'holeDepth',
  '--torque': 'torque', '--preload': 'preload', '--utilisation': 'utilisation', '--mu-thread': 'muThread',
  '--mu-head': 'muHead', '--nut-factor': 'nutFactor', '--bearing-diameter': 'bearingDiameter', '--service-load': 'serviceLoad',
};

/** The field a thrown error is about: an explicit field/option/path property, else a word in the message. */
export function fieldOfError(e: unknown): string | undefined {
  if (e && typeof e === 'object') {
    const o = e as {field?: unknown; option?: unknown; path?: unknown};
    for (const cand of [o.field, o.option, Array.isArray(o.path) ? o.path[0] : o.path]) {
      if (typeof cand !== 'string') continue;
      if (FIELDS.some(f => f.id === cand)) return cand;
      if (OPTION_FIELDS[cand]) return OPTION_FIELDS[cand];
    }
  }
  const msg = e instanceof Error ? e.message.toLowerCase() : String(e).toLowerCase();
  if (/thread|designation|pitch|series/.test(msg) && !/friction/.test(msg)) return 'thread';
  if (/grade|bolt/.test(msg)) return 'boltGrade';
  if (/parent|material/.test(msg)) return 'parent';
  if (/nut class|nut/.test(msg)) return 'nutClass';
  if (/engage/.test(msg)) return 'engagement';
  return undefined;
}

const cache = new WeakMap<FormValues, Map<string, Evaluation>>();

export function evaluate(values: FormValues, svc: WorkbenchServices, units: UnitSystem, ascii: boolean): Evaluation {
  const key = `${units}${ascii ? 'a' : ''}`;
  let perValues = cache.get(values);
  const hit = perValues?.get(key);
  if (hit) return hit;
  const ev = compute(values, svc, units, ascii);
  if (!perValues) {
    perValues = new Map();
    cache.set(values, perValues);
  }
  perValues.set(key, ev);
  return ev;
}

function compute(values: FormValues, svc: WorkbenchServices, units: UnitSystem, ascii: boolean): Evaluation {
  const errors: Record<string, string> = {};
  for (const step of STEPS) {
    if (step.id === 'hole') continue;
    for (const f of visibleFields(step.id, values)) {
      if (!f.optional && (getValue(values, f.id) === undefined || getValue(values, f.id) === '')) {
        const r = rangeText(f, units, ascii);
        errors[f.id] = `${f.label} is needed${r ? `; accepted ${r}` : ''}`;
      }
    }
  }
  if (Object.keys(errors).length > 0) return {errors};
  const parsed = JointInputSchema.safeParse(values.joint);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const id = String(issue.path[0] ?? '');
      const f = FIELDS.find(x => x.id === id);
      const label = f ? f.label : id;
      const r = f ? rangeText(f, units, ascii) : '';
      errors[id] = `${label}: ${issue.message.toLowerCase()}${r ? `; accepted ${r}` : ''}`;
    }
    return {errors};
  }
  try {
    const result = svc.check(parsed.data);
    // Flag messages in the units on screen (the core writes them in SI).
    return {input: parsed.data, result: units === 'si' ? result : {...result, flags: flagsInUnits(result, parsed.data, units)}, errors};
  } catch (e) {
    const msg = e instanceof JointInputError ? e.messageIn(units) : e instanceof Error ? e.message : String(e);
    const id = fieldOfError(e);
    if (id) {
      const f = fieldById(id);
      return {input: parsed.data, errors: {[id]: msg.toLowerCase().startsWith(f.label.toLowerCase()) ? msg : `${f.label}: ${msg}`}};
    }
    return {input: parsed.data, errors, error: `Cannot compute this joint: ${msg}`};
  }
}

export interface RepairEvaluation {
  plan?: RepairPlan;
  error?: string;
  available: boolean;
}

const repairCache = new WeakMap<FormValues, Map<UnitSystem, RepairEvaluation>>();

/** The ranked repairs for the current joint and hole state; reasons and notes in `units`. */
export function evaluateRepairs(values: FormValues, svc: WorkbenchServices, ev: Evaluation, units: UnitSystem = 'si'): RepairEvaluation {
  let perUnits = repairCache.get(values);
  if (!perUnits) {
    perUnits = new Map();
    repairCache.set(values, perUnits);
  }
  const hit = perUnits.get(units);
  if (hit) return hit;
  let out: RepairEvaluation;
  if (!svc.repairs) out = {available: false};
  else if (!ev.input) out = {available: true, error: 'Fix the joint inputs first (see the joint screen).'};
  else {
    const hole = RepairInputSchema.safeParse(values.hole);
    if (!hole.success) {
      const issue = hole.error.issues[0];
      out = {available: true, error: `Hole state: ${String(issue?.path[0] ?? '')} ${issue?.message ?? ''}`};
    } else {
      try {
        out = {available: true, plan: svc.repairs(ev.input, hole.data as RepairInput, units)};
      } catch (e) {
        out = {available: true, error: `Cannot plan repairs: ${e instanceof Error ? e.message : String(e)}`};
      }
    }
  }
  perUnits.set(units, out);
  return out;
}

export interface ScrewEvaluation {
  input?: ScrewInput;
  result?: ScrewResult;
  errors: Record<string, string>;
  error?: string;
}

const screwCache = new WeakMap<FormValues, Map<string, ScrewEvaluation>>();

/** The power screw: validate with the zod schema, call the core's checkScrew, errors on their fields. */
export function evaluateScrew(values: FormValues, svc: WorkbenchServices, units: UnitSystem, ascii: boolean): ScrewEvaluation {
  const key = `${units}${ascii ? 'a' : ''}`;
  const hit = screwCache.get(values)?.get(key);
  if (hit) return hit;
  const out = computeScrew(values, svc, units, ascii);
  const m = screwCache.get(values) ?? new Map<string, ScrewEvaluation>();
  m.set(key, out);
  screwCache.set(values, m);
  return out;
}

function computeScrew(values: FormValues, svc: WorkbenchServices, units: UnitSystem, ascii: boolean): ScrewEvaluation {
  if (!svc.checkScrew) return {errors: {}, error: 'The power-screw mode is not in this build.'};
  const errors: Record<string, string> = {};
  for (const step of SCREW_STEPS) {
    for (const f of visibleFields(step.id, values)) {
      const v = getValue(values, f.id);
      if (!f.optional && (v === undefined || v === '') && fieldBounds(f.id).default === undefined) {
        const r = rangeText(f, units, ascii);
        errors[f.id] = `${f.label} is needed${r ? `; accepted ${r}` : ''}`;
      }
    }
  }
  if (Object.keys(errors).length > 0) return {errors};
  const parsed = ScrewInputSchema.safeParse(values.screw ?? {});
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const id = `screw.${String(issue.path[0] ?? '')}`;
      const f = FIELDS.find(x => x.id === id);
      const r = f ? rangeText(f, units, ascii) : '';
      errors[id] = `${f ? f.label : id}: ${issue.message.toLowerCase()}${r ? `; accepted ${r}` : ''}`;
    }
    return {errors};
  }
  try {
    return {input: parsed.data, result: svc.checkScrew(parsed.data), errors};
  } catch (e) {
    const msg = e instanceof Error ? e.message : String(e);
    const field = e && typeof e === 'object' && typeof (e as {field?: unknown}).field === 'string' ? `screw.${(e as {field: string}).field}` : undefined;
    if (field && FIELDS.some(f => f.id === field)) return {input: parsed.data, errors: {[field]: `${fieldById(field).label}: ${msg}`}};
    return {input: parsed.data, errors, error: `Cannot compute this power screw: ${msg}`};
  }
}
