/** Editing commands: start, preview, keep or drop a typed or picked value; move between fields and steps. */
import type {WorkbenchServices} from '../services.js';
import {fieldBounds, fieldById, getValue, setValue, stepsFor, type FieldDef} from './fields.js';
import {editText, parseField} from './field-text.js';
import {currentFields, fail, info, pickerItems, type Screen, type WorkbenchState} from './workbench.js';

export function withPickerPreview(s: WorkbenchState, svc: WorkbenchServices): WorkbenchState {
  if (!s.picker) return s;
  const items = pickerItems(s, svc);
  const f = fieldById(s.picker.fieldId);
  const marked = s.picker.index >= 0 ? items[s.picker.index] : undefined;
  const chosen = marked ? (marked.item?.value ?? marked.value) : f.kind === 'thread' ? s.picker.filter.trim() : undefined;
  if (chosen === undefined || chosen === '') return {...s, preview: undefined};
  return {...s, preview: setValue(s.values, f.id, chosen)};
}

export function withEditPreview(s: WorkbenchState): WorkbenchState {
  if (!s.edit) return s;
  const f = fieldById(s.edit.fieldId);
  const p = parseField(f, s.edit.buffer, s.units, s.ascii);
  if (!p.ok) return {...s, preview: undefined, edit: {...s.edit, error: p.error}};
  return {...s, preview: setValue(s.values, f.id, p.value), edit: {...s.edit, error: undefined}};
}

export function startEdit(s: WorkbenchState, f: FieldDef, svc: WorkbenchServices, typed?: string): WorkbenchState {
  const value = getValue(s.values, f.id) ?? fieldBounds(f.id).default;
  if (f.kind === 'choice') {
    const choices = f.choices ?? [];
    const next = choices[(choices.indexOf(String(value ?? choices[0])) + 1) % choices.length];
    return {...s, values: setValue(s.values, f.id, next), message: info(`${f.label}: ${next}`)};
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

export function go(s: WorkbenchState, screen: Screen): WorkbenchState {
  if (s.screen === screen) return s;
  return {...s, screen, backTo: s.screen === 'help' ? s.backTo : s.screen, message: undefined};
}
