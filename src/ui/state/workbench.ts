/**
 * The workbench state: its shape, the start state, and what is live now (the
 * key contexts, the fields of the current step). Each screen's reducer
 * (src/ui/screens/<screen>/reducer.ts) changes it; writes (store, files) are
 * returned as effects (effects.ts) that the app runs, never done here.
 */
import type {UnitSystem} from '../../core/units.js';
import type {Notes} from '../../store/schema.js';
import type {Draft, PickItem, PresetEntry, WorkbenchServices} from '../services.js';
import type {Context, Screen} from '../keymap.js';
import type {RepairKind} from '../../core/repair/types.js';
import {fieldById, stepsFor, visibleFields, type FieldDef, type FormValues, type Mode} from './fields.js';

export type {Screen};

/** The repair chosen for the work order, by identity (kind and label, e.g. "helical insert 1.5D"), not by row. */
export interface RepairChoice {
  kind: RepairKind;
  label: string;
}

/** The form values and the repair chosen: what a preset saves and a draft keeps. */
export type Values = FormValues & {chosenRepair?: RepairChoice};

export interface EditState {
  fieldId: string;
  buffer: string;
  original: unknown;
  error?: string;
}

export interface PickerState {
  fieldId: string;
  filter: string;
  /** Marked entry; -1 = the text as typed (thread only). */
  index: number;
  original: unknown;
  /** Picking a row of the field's published table (FieldDef.table) for a number field. */
  table?: boolean;
}

export type PromptKind = 'saveAs' | 'rename' | 'duplicate' | 'import' | 'export' | 'search' | 'reportPath' | 'note';
export interface PromptState {
  kind: PromptKind;
  title: string;
  buffer: string;
  /** The preset the prompt acts on (rename, duplicate, export). */
  target?: string;
  /** The work-order note being typed (kind 'note'). */
  note?: 'asset' | 'location' | 'workOrder' | 'text';
  /** The notes as they were before the first note prompt: Esc puts them back. */
  notesBefore?: Notes;
  /** Saving over unsaved edits before loading this preset (save as, then load). */
  thenLoad?: string;
}

export type ConfirmKind = 'delete' | 'overwritePreset' | 'overwriteFile' | 'overwriteExport';
export interface ConfirmState {
  kind: ConfirmKind;
  question: string;
  target: string;
  text?: string;
  preset?: string;
  /** Replacing a preset to save unsaved edits before loading this one. */
  thenLoad?: string;
}

export interface Message {
  text: string;
  level: 'info' | 'error';
}

export interface WorkbenchState {
  /** Threaded joint or power screw. */
  mode: Mode;
  screen: Screen;
  backTo: Screen;
  step: number;
  field: number;
  values: Values;
  edit?: EditState;
  picker?: PickerState;
  prompt?: PromptState;
  confirm?: ConfirmState;
  /** Values with the value being typed or marked in a list applied: what the readout shows. */
  preview?: Values;
  units: UnitSystem;
  ascii: boolean;
  showFlags: boolean;
  /** The open preset; `kind` is what it was saved as (a joint preset stays a joint preset). */
  preset: {name: string; readOnly: boolean; saved: string; kind?: Mode; /** A new blank joint not saved yet: s asks for a name. */ unnamed?: boolean};
  /** Loading another preset while the open one has unsaved edits: save, discard or cancel. */
  unsaved?: {target: string};
  message?: Message;
  presetList: {query: string; index: number};
  report: {format: 'text' | 'markdown'; scroll: number};
  helpScroll: number;
  repairIndex: number;
  /** The folder of the last report written (kept in the settings): the report path prompt starts there. */
  reportDir?: string;
  /** The first line of the marked repair's detail on the Repairs screen (PgUp/PgDn). */
  repairDetailScroll: number;
  /** The first line of the full flag view (f) on the joint screen (PgUp/PgDn). */
  flagScroll: number;
  draftOffer?: Draft;
  size: {columns: number; rows: number};
  quit?: 'quit' | 'interrupt';
  /** Set when quitting kept the unsaved edits as a draft (the launcher says so after the exit). */
  draftKept?: boolean;
}

export const snapshot = (v: Values): string => JSON.stringify(v);
export const isDirty = (s: WorkbenchState): boolean => snapshot(s.values) !== s.preset.saved;
export const shownValues = (s: WorkbenchState): Values => s.preview ?? s.values;

export function initialState(opts: {
  name: string;
  readOnly: boolean;
  values: Values;
  units: UnitSystem;
  ascii: boolean;
  draft?: Draft;
  message?: Message;
  size?: {columns: number; rows: number};
  mode?: Mode;
}): WorkbenchState {
  return {
    mode: opts.mode ?? 'joint',
    screen: 'joint',
    backTo: 'joint',
    step: 0,
    field: 0,
    values: opts.values,
    units: opts.units,
    ascii: opts.ascii,
    showFlags: false,
    preset: {name: opts.name, readOnly: opts.readOnly, saved: snapshot(opts.values), kind: opts.mode ?? 'joint'},
    presetList: {query: '', index: 0},
    report: {format: 'markdown', scroll: 0},
    helpScroll: 0,
    repairIndex: 0,
    repairDetailScroll: 0,
    flagScroll: 0,
    draftOffer: opts.draft,
    message: opts.message,
    size: opts.size ?? {columns: 80, rows: 24},
  };
}

/** Contexts whose keys are live now, most specific first. */
export function contextsOf(s: WorkbenchState): Context[] {
  if (s.draftOffer) return ['draft', 'any'];
  if (s.confirm) return ['confirm', 'any'];
  if (s.unsaved) return ['unsaved', 'any'];
  if (s.prompt) return ['prompt', 'any'];
  if (s.picker) return ['picker', 'any'];
  if (s.edit) return ['edit', 'any'];
  return [s.screen, 'screens', 'any'];
}

export function currentFields(s: WorkbenchState): FieldDef[] {
  const steps = stepsFor(s.mode);
  const step = steps[s.step] ?? steps[0]!;
  return visibleFields(step.id, s.values);
}

export function currentField(s: WorkbenchState): FieldDef | undefined {
  const fields = currentFields(s);
  return fields[Math.min(s.field, fields.length - 1)];
}

export const info = (text: string): Message => ({text, level: 'info'});
export const fail = (text: string): Message => ({text, level: 'error'});
export const errText = (e: unknown): string => (e instanceof Error ? e.message : String(e));

/** Entries of a picker for the current filter. */
export function pickerItems(s: WorkbenchState, svc: WorkbenchServices): {label: string; value: string; item?: PickItem}[] {
  if (!s.picker) return [];
  const f = fieldById(s.picker.fieldId);
  if (s.picker.table && f.table) {
    const q = s.picker.filter.toLowerCase();
    return svc
      .picks(f.table, s.units)
      .filter(p => q === '' || p.id.toLowerCase().includes(q) || p.name.toLowerCase().includes(q))
      .map(p => ({label: `${p.name}  ${p.detail}`, value: p.id, item: p}));
  }
  if (f.kind === 'thread') return svc.designations(s.picker.filter, 8).map(d => ({label: d, value: d}));
  const q = s.picker.filter.toLowerCase();
  return svc
    .picks(f.pick!, s.units)
    .filter(p => q === '' || p.id.toLowerCase().includes(q) || p.name.toLowerCase().includes(q))
    .map(p => ({label: `${p.id}  ${p.name}`, value: p.id, item: p}));
}

export function filteredPresets(s: WorkbenchState, svc: WorkbenchServices) {
  const q = s.presetList.query.toLowerCase();
  let list: PresetEntry[];
  try {
    list = svc.presets.list();
  } catch {
    list = [];
  }
  return list.filter(p => q === '' || p.name.toLowerCase().includes(q) || (p.notes ?? '').toLowerCase().includes(q));
}
