/**
 * The joint screen's reducer (pure): start, preview, keep or drop a typed or
 * picked value; move between fields and steps; switch joint / power screw;
 * the hole-state flag of the joint on screen.
 */
import type {Flag} from '../../../core/types.js';
import {holeStateFlags} from '../../../core/joint/hole-flags.js';
import type {WorkbenchServices} from '../../services.js';
import {FIELDS, fieldBounds, fieldById, getValue, setValue, stepsFor, type FieldDef, type Mode, type StepId} from '../../state/fields.js';
import {editText, parseField} from '../../state/field-text.js';
import {setChosen} from '../../state/chosen.js';
import {currentFields, fail, info, pickerItems, shownValues, type Values, type WorkbenchState} from '../../state/workbench.js';

export function withPickerPreview(s: WorkbenchState, svc: WorkbenchServices): WorkbenchState {
  if (!s.picker) return s;
  const items = pickerItems(s, svc);
  const f = fieldById(s.picker.fieldId);
  const marked = s.picker.index >= 0 ? items[s.picker.index] : undefined;
  const chosen = marked ? (marked.item?.value ?? marked.value) : f.kind === 'thread' ? s.picker.filter.trim() : undefined;
  if (chosen === undefined || chosen === '') return {...s, preview: undefined};
  return {...s, preview: setChosen(s.values, f.id, chosen)};
}

export function withEditPreview(s: WorkbenchState): WorkbenchState {
  if (!s.edit) return s;
  const f = fieldById(s.edit.fieldId);
  const p = parseField(f, s.edit.buffer, s.units, s.ascii);
  if (!p.ok) return {...s, preview: undefined, edit: {...s.edit, error: p.error}};
  return {...s, preview: setValue(s.values, f.id, p.value), edit: {...s.edit, error: undefined}};
}

/**
 * Values without what the hole step now hides (the stripped depth of a hole set
 * back to intact), so no hidden value can stop the repair planner; with the
 * labels of the fields cleared.
 */
export function withoutHidden(v: Values, step: StepId): {values: Values; cleared: string[]} {
  let values = v;
  const cleared: string[] = [];
  for (const f of FIELDS) {
    if (f.step !== step || !f.isVisible || f.isVisible(values) || getValue(values, f.id) === undefined) continue;
    values = setValue(values, f.id, undefined);
    cleared.push(f.label.toLowerCase());
  }
  return {values, cleared};
}

export function startEdit(s: WorkbenchState, f: FieldDef, svc: WorkbenchServices, typed?: string): WorkbenchState {
  const value = getValue(s.values, f.id) ?? fieldBounds(f.id).default;
  if (f.kind === 'choice') {
    const choices = f.choices ?? [];
    // An optional choice (a gauge outcome) cycles through "not given" too.
    const cycle: readonly (string | undefined)[] = f.optional && fieldBounds(f.id).default === undefined ? [...choices, undefined] : choices;
    const next = cycle[(cycle.indexOf(value === undefined && cycle.includes(undefined) ? undefined : String(value ?? choices[0])) + 1) % cycle.length];
    const set = setValue(s.values, f.id, next);
    const {values, cleared} = f.step === 'hole' ? withoutHidden(set, 'hole') : {values: set, cleared: []};
    return {...s, values, message: info(`${f.label}: ${next ?? f.empty ?? 'not given'}${cleared.length ? `; ${cleared.join(', ')} cleared` : ''}`)};
  }
  if (f.kind === 'bool') {
    return {...s, values: setValue(s.values, f.id, !value), message: info(`${f.label}: ${value ? 'no' : 'yes'}`)};
  }
  if (f.kind === 'pick' || f.kind === 'thread') {
    const base: WorkbenchState = {...s, message: undefined, picker: {fieldId: f.id, filter: f.kind === 'thread' ? String(value ?? '') : '', index: -1, original: value}};
    if (f.kind === 'pick') {
      const idx = pickerItems(base, svc).findIndex(i => i.value === value);
      base.picker = {...base.picker!, index: Math.max(0, idx)};
    }
    return withPickerPreview(base, svc);
  }
  const buffer = typed ?? editText(f, value, s.units);
  return withEditPreview({...s, message: undefined, edit: {fieldId: f.id, buffer, original: value}});
}

/** Open the field's published table (t on a friction field of the power screw). */
export function startTablePick(s: WorkbenchState, f: FieldDef, svc: WorkbenchServices): WorkbenchState {
  if (!f.table) return {...s, message: info(`${f.label}: no published table to pick from; type a value`)};
  const value = getValue(s.values, f.id) ?? fieldBounds(f.id).default;
  return withPickerPreview({...s, message: undefined, picker: {fieldId: f.id, filter: '', index: 0, original: value, table: true}}, svc);
}

export function commitEdit(s: WorkbenchState): WorkbenchState {
  if (!s.edit) return s;
  const f = fieldById(s.edit.fieldId);
  const p = parseField(f, s.edit.buffer, s.units, s.ascii);
  if (!p.ok) return {...s, message: fail(p.error)};
  return {...s, values: setValue(s.values, f.id, p.value), edit: undefined, preview: undefined, message: undefined};
}

export function moveField(s: WorkbenchState, delta: number): WorkbenchState {
  const n = currentFields(s).length;
  return {...s, field: Math.max(0, Math.min(n - 1, Math.min(s.field, n - 1) + delta))};
}

export function moveStep(s: WorkbenchState, delta: number): WorkbenchState {
  const n = stepsFor(s.mode).length;
  const step = (s.step + delta + n) % n;
  return {...s, step, field: 0};
}

/** Empty an optional field (its default applies). */
export function clearField(s: WorkbenchState, f: FieldDef | undefined): WorkbenchState {
  if (!f) return s;
  if (!f.optional) return {...s, message: fail(`${f.label} cannot be empty; Enter to edit it`)};
  return {...s, values: setValue(s.values, f.id, undefined), message: info(`${f.label}: emptied, the default applies`)};
}

/** Threaded joint <-> power screw (the preset keeps its kind until saved as another). */
export function toggleMode(s: WorkbenchState, svc: WorkbenchServices): WorkbenchState {
  if (!svc.checkScrew) return {...s, message: fail('The power-screw mode is not in this build; use tapwright screw')};
  const mode: Mode = s.mode === 'joint' ? 'screw' : 'joint';
  const values = mode === 'screw' && !s.values.screw ? {...s.values, screw: {thread: 'Tr24x5', load: 10000, nutLength: 24}} : s.values;
  return {
    ...s,
    mode,
    values,
    step: 0,
    field: 0,
    message: info(mode === 'screw' ? 'Power-screw mode: lead screw and nut (m: back to the joint)' : 'Joint mode: bolt or screw in a tapped hole or nut'),
  };
}

/**
 * The hole-state flag of the joint on screen (the rule is the core's
 * holeStateFlags; the joint screen shows it above the check's flags).
 */
export function strippedHoleFlag(state: WorkbenchState, t: {ascii: boolean}): Flag | undefined {
  if (state.mode !== 'joint') return undefined;
  return holeStateFlags(shownValues(state).hole, state.units, t.ascii)[0];
}
