/**
 * From form values to the checked joint, the repairs and the power screw: the
 * one resolver (src/app/resolve.ts) with the user's settings and materials,
 * then the core through the services. Every failure lands on the field it names.
 * Memoised per values object, so a re-render never recomputes.
 */
import type {JointInput} from '../../core/joint/input.js';
import type {CheckResult} from '../../core/joint/result.js';
import {flagsInUnits} from '../../core/joint/index.js';
import type {UnitSystem} from '../../core/units.js';
import type {ScrewInput} from '../../core/screw/input.js';
import type {ScrewResult} from '../../core/screw/result.js';
import {coreFieldError, resolveHoleInput, resolveJointInput, resolveScrewInput, type ResolveContext} from '../../app/resolve.js';
import {labelMessage, rowById} from '../../app/field-table.js';
import type {FieldError} from '../../app/fields-types.js';
import type {RepairPlan, WorkbenchServices} from '../services.js';
import type {FormValues} from './fields.js';

export interface Evaluation {
  input?: JointInput;
  result?: CheckResult;
  /** Field id to message. */
  errors: Record<string, string>;
  /** A failure not tied to one field. */
  error?: string;
}

/** Memoise `compute` per values object and key. */
function memo<T>(cache: WeakMap<FormValues, Map<string, T>>, values: FormValues, key: string, compute: () => T): T {
  let m = cache.get(values);
  const hit = m?.get(key);
  if (hit) return hit;
  const out = compute();
  if (!m) cache.set(values, (m = new Map()));
  m.set(key, out);
  return out;
}

const onFields = (errors: FieldError[]) => Object.fromEntries(errors.map(e => [e.field, labelMessage(e)]));
const context = (svc: WorkbenchServices, units: UnitSystem, ascii: boolean): ResolveContext => ({
  units,
  ascii,
  ...(svc.settings ? {settings: svc.settings()} : {}),
  ...(svc.userMaterials ? {userMaterials: svc.userMaterials()} : {}),
});

/** A core error on its field (when the workbench shows that field), else a message for the whole form. */
function coreError(e: unknown, group: 'joint' | 'screw', units: UnitSystem): {errors: Record<string, string>; error?: string} {
  const f = coreFieldError(e, group, units);
  if (f && rowById(f.field)?.step) return {errors: {[f.field]: labelMessage(f)}};
  const msg = f?.message ?? (e instanceof Error ? e.message : String(e));
  return {errors: {}, error: `Cannot compute this ${group === 'joint' ? 'joint' : 'power screw'}: ${msg}`};
}

const cache = new WeakMap<FormValues, Map<string, Evaluation>>();

export function evaluate(values: FormValues, svc: WorkbenchServices, units: UnitSystem, ascii: boolean): Evaluation {
  return memo(cache, values, `${units}${ascii ? 'a' : ''}`, () => {
    const r = resolveJointInput(values.joint, context(svc, units, ascii));
    if (r.errors) return {errors: onFields(r.errors)};
    try {
      const result = svc.check(r.input);
      // Flag messages in the units on screen (the core writes them in SI).
      return {input: r.input, result: units === 'si' ? result : {...result, flags: flagsInUnits(result, r.input, units)}, errors: {}};
    } catch (e) {
      return {input: r.input, ...coreError(e, 'joint', units)};
    }
  });
}

export interface RepairEvaluation {
  plan?: RepairPlan;
  error?: string;
  available: boolean;
}

const repairCache = new WeakMap<FormValues, Map<string, RepairEvaluation>>();

/** The ranked repairs for the current joint and hole state; reasons and notes in `units`. */
export function evaluateRepairs(values: FormValues, svc: WorkbenchServices, ev: Evaluation, units: UnitSystem = 'si'): RepairEvaluation {
  return memo(repairCache, values, units, () => {
    if (!svc.repairs) return {available: false};
    if (!ev.input) return {available: true, error: 'Fix the joint inputs first (see the joint screen).'};
    const hole = resolveHoleInput(values.hole, {units, joint: ev.input});
    if (hole.errors) return {available: true, error: `Hole state: ${labelMessage(hole.errors[0]!)}`};
    try {
      return {available: true, plan: svc.repairs(ev.input, hole.input, units)};
    } catch (e) {
      return {available: true, error: `Cannot plan repairs: ${e instanceof Error ? e.message : String(e)}`};
    }
  });
}

export interface ScrewEvaluation {
  input?: ScrewInput;
  result?: ScrewResult;
  errors: Record<string, string>;
  error?: string;
}

const screwCache = new WeakMap<FormValues, Map<string, ScrewEvaluation>>();

/** The power screw: the resolver, then the core's checkScrew; errors on their fields. */
export function evaluateScrew(values: FormValues, svc: WorkbenchServices, units: UnitSystem, ascii: boolean): ScrewEvaluation {
  return memo(screwCache, values, `${units}${ascii ? 'a' : ''}`, () => {
    if (!svc.checkScrew) return {errors: {}, error: 'The power-screw mode is not in this build.'};
    const r = resolveScrewInput(values.screw ?? {}, context(svc, units, ascii));
    if (r.errors) return {errors: onFields(r.errors)};
    try {
      return {input: r.input, result: svc.checkScrew(r.input), errors: {}};
    } catch (e) {
      return {input: r.input, ...coreError(e, 'screw', units)};
    }
  });
}
