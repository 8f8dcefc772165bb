/**
 * The workbench state and what each command does to it. Keys are turned into
 * commands through the keymap; side effects (store, files) go only through the
 * injected services, so the whole behaviour is testable without a terminal.
 */
import type {UnitSystem} from '../../core/units.js';
import type {Draft, PickItem, PresetEntry, WorkbenchServices} from '../services.js';
import type {KeyEvent} from '../keys.js';
import {lookup, type Context} from '../keymap.js';
import {STEPS, fieldBounds, fieldById, getValue, setValue, stepsFor, visibleFields, type FieldDef, type FormValues, type Mode} from './fields.js';
import {editText, parseField} from './field-text.js';
import {evaluate, evaluateRepairs} from './evaluate.js';
import {bodyHeight} from '../layout.js';
import {wrapLines} from '../screens/scroll-view.js';
import {helpLines} from '../screens/help-screen.js';

export type Screen = 'joint' | 'repairs' | 'presets' | 'report' | 'help';

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
}

export type PromptKind = 'saveAs' | 'rename' | 'duplicate' | 'import' | 'export' | 'search' | 'reportPath';
export interface PromptState {
  kind: PromptKind;
  title: string;
  buffer: string;
  /** The preset the prompt acts on (rename, duplicate, export). */
  target?: string;
}

export type ConfirmKind = 'delete' | 'overwritePreset' | 'overwriteFile' | 'overwriteExport';
export interface ConfirmState {
  kind: ConfirmKind;
  question: string;
  target: string;
  text?: string;
  preset?: string;
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
  values: FormValues;
  edit?: EditState;
  picker?: PickerState;
  prompt?: PromptState;
  confirm?: ConfirmState;
  /** Values with the value being typed or marked in a list applied: what the readout shows. */
  preview?: FormValues;
  units: UnitSystem;
  ascii: boolean;
  showFlags: boolean;
  preset: {name: string; readOnly: boolean; saved: string};
  message?: Message;
  presetList: {query: string; index: number};
  report: {format: 'text' | 'markdown'; scroll: number};
  helpScroll: number;
  repairIndex: number;
  draftOffer?: Draft;
  size: {columns: number; rows: number};
  quit?: 'quit' | 'interrupt';
}

export const snapshot = (v: FormValues): string => JSON.stringify(v);
export const isDirty = (s: WorkbenchState): boolean => snapshot(s.values) !== s.preset.saved;
export const shownValues = (s: WorkbenchState): FormValues => s.preview ?? s.values;

export function initialState(opts: {
  name: string;
  readOnly: boolean;
  values: FormValues;
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
    preset: {name: opts.name, readOnly: opts.readOnly, saved: snapshot(opts.values)},
    presetList: {query: '', index: 0},
    report: {format: 'markdown', scroll: 0},
    helpScroll: 0,
    repairIndex: 0,
    draftOffer: opts.draft,
    message: opts.message,
    size: opts.size ?? {columns: 80, rows: 24},
  };
}

/** Contexts whose keys are live now, most specific first. */
export function contextsOf(s: WorkbenchState): Context[] {
  if (s.draftOffer) return ['draft', 'any'];
  if (s.confirm) return ['confirm', 'any'];
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

const info = (text: string): Message => ({text, level: 'info'});
const fail = (text: string): Message => ({text, level: 'error'});
const errText = (e: unknown) => (e instanceof Error ? e.message : String(e));

/** Entries of a picker for the current filter. */
export function pickerItems(s: WorkbenchState, svc: WorkbenchServices): {label: string; value: string; item?: PickItem}[] {
  if (!s.picker) return [];
  const f = fieldById(s.picker.fieldId);
  if (f.kind === 'thread') return svc.designations(s.picker.filter, 8).map(d => ({label: d, value: d}));
  const q = s.picker.filter.toLowerCase();
  return svc
    .picks(f.pick!, s.units)
    .filter(p => q === '' || p.id.toLowerCase().includes(q) || p.name.toLowerCase().includes(q))
    .map(p => ({label: `${p.id}  ${p.name}`, value: p.id, item: p}));
}

function withPickerPreview(s: WorkbenchState, svc: WorkbenchServices): WorkbenchState {
  if (!s.picker) return s;
  const items = pickerItems(s, svc);
  const f = fieldById(s.picker.fieldId);
  const chosen = s.picker.index >= 0 ? items[s.picker.index]?.value : f.kind === 'thread' ? s.picker.filter.trim() : undefined;
  if (chosen === undefined || chosen === '') return {...s, preview: undefined};
  return {...s, preview: setValue(s.values, f.id, chosen)};
}

function withEditPreview(s: WorkbenchState): WorkbenchState {
  if (!s.edit) return s;
  const f = fieldById(s.edit.fieldId);
  const p = parseField(f, s.edit.buffer, s.units, s.ascii);
  if (!p.ok) return {...s, preview: undefined, edit: {...s.edit, error: p.error}};
  return {...s, preview: setValue(s.values, f.id, p.value), edit: {...s.edit, error: undefined}};
}

function startEdit(s: WorkbenchState, f: FieldDef, svc: WorkbenchServices, typed?: string): WorkbenchState {
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

function commitEdit(s: WorkbenchState): WorkbenchState {
  if (!s.edit) return s;
  const f = fieldById(s.edit.fieldId);
  const p = parseField(f, s.edit.buffer, s.units, s.ascii);
  if (!p.ok) return {...s, message: fail(p.error)};
  return {...s, values: setValue(s.values, f.id, p.value), edit: undefined, preview: undefined, message: undefined};
}

function moveField(s: WorkbenchState, delta: number): WorkbenchState {
  const n = currentFields(s).length;
  return {...s, field: Math.max(0, Math.min(n - 1, Math.min(s.field, n - 1) + delta))};
}

function moveStep(s: WorkbenchState, delta: number): WorkbenchState {
  const n = stepsFor(s.mode).length;
  const step = (s.step + delta + n) % n;
  return {...s, step, field: 0};
}

function go(s: WorkbenchState, screen: Screen): WorkbenchState {
  if (s.screen === screen) return s;
  return {...s, screen, backTo: s.screen === 'help' ? s.backTo : s.screen, message: undefined};
}

function markedPreset(s: WorkbenchState, svc: WorkbenchServices): string | undefined {
  return filteredPresets(s, svc)[s.presetList.index]?.name;
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

function savePreset(s: WorkbenchState, svc: WorkbenchServices, name: string, overwrite: boolean): WorkbenchState {
  try {
    svc.presets.save(name, s.values, {overwrite, kind: s.mode});
    svc.draft.clear();
    return {...s, preset: {name, readOnly: false, saved: snapshot(s.values)}, message: info(`Saved preset "${name}".`)};
  } catch (e) {
    return {...s, message: fail(`Could not save "${name}": ${errText(e)}`)};
  }
}

function loadPreset(s: WorkbenchState, svc: WorkbenchServices, name: string): WorkbenchState {
  try {
    const p = svc.presets.load(name);
    const mode: Mode = p.kind === 'screw' ? 'screw' : 'joint';
    if (mode === 'screw' && !svc.checkScrew) return {...s, message: fail(`"${p.name}" is a power-screw preset; the power-screw mode is not in this build (use tapwright screw --preset)`)};
    return {
      ...s,
      mode,
      values: p.values,
      preset: {name: p.name, readOnly: p.readOnly, saved: snapshot(p.values)},
      screen: 'joint',
      step: 0,
      field: 0,
      message: info(`Loaded preset "${p.name}"${p.readOnly ? ' (shipped demo, read-only: save as to keep changes)' : ''}.`),
    };
  } catch (e) {
    return {...s, message: fail(`Could not load "${name}": ${errText(e)}`)};
  }
}


function runPrompt(s: WorkbenchState, svc: WorkbenchServices): WorkbenchState {
  const p = s.prompt!;
  const text = p.buffer.trim();
  const base = {...s, prompt: undefined};
  if (p.kind === 'search') return {...base, presetList: {query: text, index: 0}};
  if (text === '') return {...s, message: fail(`${p.title}: type a value, or Esc to cancel`)};
  try {
    switch (p.kind) {
      case 'saveAs': {
        const exists = svc.presets.list().some(x => x.name === text);
        if (exists) return {...base, confirm: {kind: 'overwritePreset', question: `Preset "${text}" exists. Replace it?`, target: text}};
        const saved = savePreset(base, svc, text, false);
        // On a refused name the prompt stays open with the typed text.
        return saved.message?.level === 'error' ? {...s, message: saved.message} : saved;
      }
      case 'rename':
        svc.presets.rename(p.target!, text);
        return {
          ...base,
          preset: s.preset.name === p.target ? {...s.preset, name: text} : s.preset,
          message: info(`Renamed "${p.target}" to "${text}".`),
        };
      case 'duplicate':
        svc.presets.duplicate(p.target!, text);
        return {...base, message: info(`Copied "${p.target}" to "${text}".`)};
      case 'import': {
        const r = svc.presets.importFile(text);
        const skipped = r.skipped.length ? `; skipped ${r.skipped.join('; ')}` : '';
        return {...base, message: info(`Imported ${r.imported.length} preset(s)${r.imported.length ? `: ${r.imported.join(', ')}` : ''}${skipped}`)};
      }
      case 'export':
        try {
          svc.presets.exportFile(text, p.target, false);
        } catch (e) {
          if (/exist/i.test(errText(e))) {
            return {...base, confirm: {kind: 'overwriteExport', question: `${text} exists. Replace it?`, target: text, preset: p.target}};
          }
          throw e;
        }
        return {...base, message: info(`Exported "${p.target}" to ${text}.`)};
      case 'reportPath':
        return writeReport(base, svc, text, false);
    }
  } catch (e) {
    return {...s, message: fail(errText(e))};
  }
  return base;
}

/** The report text for the current joint, or a reason it cannot be made. */
export function reportText(s: WorkbenchState, svc: WorkbenchServices, ev: {input?: unknown; result?: unknown}): {text?: string; why?: string} {
  if (!svc.report) return {why: 'The report writer is not in this build yet.'};
  if (s.mode === 'screw') return {why: 'The work-order report covers threaded joints; for this power screw save the preset and run tapwright screw --preset NAME.'};
  if (!ev.input || !ev.result) return {why: 'Fix the joint inputs first: the report needs a computed joint.'};
  try {
    return {
      text: svc.report(s.report.format, ev.result as never, ev.input as never, {presetName: s.preset.name, date: svc.now(), units: s.units}),
    };
  } catch (e) {
    return {why: `Cannot build the report: ${errText(e)}`};
  }
}

function writeReport(s: WorkbenchState, svc: WorkbenchServices, path: string, overwrite: boolean): WorkbenchState {
  const r = reportText(s, svc, evaluate(s.values, svc, s.units, s.ascii));
  if (!r.text) return {...s, message: fail(r.why ?? 'No report')};
  try {
    svc.writeFile(path, r.text, overwrite);
    return {...s, message: info(`Wrote the ${s.report.format === 'markdown' ? 'Markdown' : 'text'} report to ${path}`)};
  } catch (e) {
    if (!overwrite && /exist/i.test(errText(e))) {
      return {...s, confirm: {kind: 'overwriteFile', question: `${path} exists. Replace it?`, target: path}};
    }
    return {...s, message: fail(`Could not write ${path}: ${errText(e)}`)};
  }
}

function slug(name: string): string {
  return name.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '') || 'joint';
}

function defaultReportPath(s: WorkbenchState, svc: WorkbenchServices): string {
  const d = svc.now().toISOString().slice(0, 10);
  return `tapwright-${slug(s.preset.name)}-${d}.${s.report.format === 'markdown' ? 'md' : 'txt'}`;
}

/** Apply one key to the state. */
export function handleKey(s0: WorkbenchState, ev: KeyEvent, svc: WorkbenchServices): WorkbenchState {
  const s = s0;
  const command = lookup(ev, contextsOf(s));
  if (!command) return s;
  const f = currentField(s);
  switch (command) {
    case 'app.interrupt':
      return {...s, quit: 'interrupt'};
    case 'app.quit':
      return {...s, quit: 'quit'};
    case 'go.joint':
      return go(s, 'joint');
    case 'go.repairs':
      return go(s, 'repairs');
    case 'go.presets':
      return go(s, 'presets');
    case 'go.report':
      return go(s, 'report');
    case 'go.help':
      return {...go(s, 'help'), helpScroll: 0};
    case 'screen.back':
      return {...s, screen: s.screen === 'help' ? s.backTo : 'joint', message: undefined};
    case 'units.toggle': {
      const units = s.units === 'si' ? 'us' : 'si';
      return {...s, units, message: info(units === 'si' ? 'Units: SI (mm, kN, N·m, MPa)' : 'Units: US customary (in, lbf, ft·lbf, ksi)')};
    }
    case 'field.prev':
      return moveField(s, -1);
    case 'field.next':
      return moveField(s, 1);
    case 'step.next':
      return moveStep(s, 1);
    case 'step.prev':
      return moveStep(s, -1);
    case 'field.edit':
      return f ? startEdit(s, f, svc) : s;
    case 'field.type':
      return f && (f.kind === 'quantity' || f.kind === 'ratio' || f.kind === 'range') ? startEdit(s, f, svc, ev.char) : s;
    case 'field.clear':
      if (!f) return s;
      if (!f.optional) return {...s, message: fail(`${f.label} cannot be empty; Enter to edit it`)};
      return {...s, values: setValue(s.values, f.id, undefined), message: info(`${f.label}: emptied, the default applies`)};
    case 'mode.toggle': {
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
    case 'panel.flags':
      return {...s, showFlags: !s.showFlags};
    case 'preset.save':
      if (s.preset.readOnly) {
        return {...s, prompt: {kind: 'saveAs', title: `"${s.preset.name}" is a shipped demo; save as`, buffer: `${s.preset.name} copy`}};
      }
      return savePreset(s, svc, s.preset.name, true);

    case 'edit.commit':
      return commitEdit(s);
    case 'edit.cancel':
      return {...s, edit: undefined, preview: undefined, message: info('Kept the old value')};
    case 'edit.erase':
      return withEditPreview({...s, edit: {...s.edit!, buffer: Array.from(s.edit!.buffer).slice(0, -1).join('')}});
    case 'edit.clear':
      return withEditPreview({...s, edit: {...s.edit!, buffer: ''}});
    case 'edit.commitPrev':
    case 'edit.commitNext': {
      const c = commitEdit(s);
      return c.edit ? c : moveField(c, command === 'edit.commitPrev' ? -1 : 1);
    }
    case 'edit.insert':
      if (s.edit!.buffer.length >= 60) return s;
      return withEditPreview({...s, edit: {...s.edit!, buffer: s.edit!.buffer + (ev.char ?? '')}});

    case 'pick.up':
    case 'pick.down': {
      const n = pickerItems(s, svc).length;
      const lo = fieldById(s.picker!.fieldId).kind === 'thread' ? -1 : 0;
      const index = Math.max(lo, Math.min(n - 1, s.picker!.index + (command === 'pick.up' ? -1 : 1)));
      return withPickerPreview({...s, picker: {...s.picker!, index}}, svc);
    }
    case 'pick.type':
    case 'pick.erase':
    case 'pick.clear': {
      const p = s.picker!;
      const filter = command === 'pick.type' ? p.filter + (ev.char ?? '') : command === 'pick.clear' ? '' : Array.from(p.filter).slice(0, -1).join('');
      const isThread = fieldById(p.fieldId).kind === 'thread';
      return withPickerPreview({...s, picker: {...p, filter: filter.slice(0, 60), index: isThread ? -1 : 0}}, svc);
    }
    case 'pick.take': {
      const p = s.picker!;
      const field = fieldById(p.fieldId);
      const items = pickerItems(s, svc);
      const value = p.index >= 0 ? items[p.index]?.value : p.filter.trim();
      if (!value) return {...s, message: fail(`${field.label}: nothing matches "${p.filter}"; Backspace to widen, Esc to keep the old value`)};
      return {...s, values: setValue(s.values, field.id, value), picker: undefined, preview: undefined, message: undefined};
    }
    case 'pick.cancel':
      return {...s, picker: undefined, preview: undefined, message: info('Kept the old value')};

    case 'list.up':
    case 'list.down': {
      const d = command === 'list.up' ? -1 : 1;
      if (s.screen === 'repairs') {
        const n = evaluateRepairs(shownValues(s), svc, evaluate(shownValues(s), svc, s.units, s.ascii)).plan?.options.length ?? 0;
        return {...s, repairIndex: Math.max(0, Math.min(n - 1, s.repairIndex + d))};
      }
      const n = filteredPresets(s, svc).length;
      return {...s, presetList: {...s.presetList, index: Math.max(0, Math.min(n - 1, s.presetList.index + d))}};
    }
    case 'preset.load': {
      const name = markedPreset(s, svc);
      return name ? loadPreset(s, svc, name) : {...s, message: fail('No preset marked; clear the search with / then Enter')};
    }
    case 'preset.search':
      return {...s, prompt: {kind: 'search', title: 'Search presets', buffer: s.presetList.query}};
    case 'preset.saveAs':
      return {...s, prompt: {kind: 'saveAs', title: 'Save the joint as', buffer: ''}};
    case 'preset.rename':
    case 'preset.duplicate':
    case 'preset.export':
    case 'preset.delete': {
      const name = markedPreset(s, svc);
      if (!name) return {...s, message: fail('No preset marked')};
      if (command === 'preset.delete') return {...s, confirm: {kind: 'delete', question: `Delete preset "${name}"? This cannot be undone.`, target: name}};
      if (command === 'preset.rename') return {...s, prompt: {kind: 'rename', title: `Rename "${name}" to`, buffer: name, target: name}};
      if (command === 'preset.duplicate') return {...s, prompt: {kind: 'duplicate', title: `Copy "${name}" as`, buffer: `${name} copy`, target: name}};
      return {...s, prompt: {kind: 'export', title: `Export "${name}" to file`, buffer: `${slug(name)}.json`, target: name}};
    }
    case 'preset.import':
      return {...s, prompt: {kind: 'import', title: 'Import presets from file', buffer: ''}};

    case 'scroll.up':
    case 'scroll.down':
    case 'scroll.pageUp':
    case 'scroll.pageDown': {
      const page = Math.max(1, s.size.rows - 6);
      const d = {'scroll.up': -1, 'scroll.down': 1, 'scroll.pageUp': -page, 'scroll.pageDown': page}[command];
      const rows = bodyHeight(s.size) - 1;
      const clamp = (x: number, lines: string[]) => Math.max(0, Math.min(x, wrapLines(lines, s.size.columns).length - rows));
      if (s.screen === 'help') {
        const ev = evaluate(shownValues(s), svc, s.units, s.ascii);
        const rule = evaluateRepairs(shownValues(s), svc, ev).plan?.rankingRule;
        return {...s, helpScroll: clamp(s.helpScroll + d, helpLines({ascii: s.ascii, sources: ev.result?.sources ?? [], rankingRule: rule}))};
      }
      const text = reportText(s, svc, evaluate(s.values, svc, s.units, s.ascii)).text ?? '';
      return {...s, report: {...s.report, scroll: clamp(s.report.scroll + d, text.split('\n'))}};
    }
    case 'report.format':
      return {...s, report: {format: s.report.format === 'markdown' ? 'text' : 'markdown', scroll: 0}};
    case 'report.write':
      return {...s, prompt: {kind: 'reportPath', title: 'Write the report to file', buffer: defaultReportPath(s, svc)}};
    case 'repair.hole':
      return {...s, screen: 'joint', mode: 'joint', step: STEPS.findIndex(x => x.id === 'hole'), field: 0};

    case 'prompt.ok':
      return runPrompt(s, svc);
    case 'prompt.cancel':
      return {...s, prompt: undefined, message: info('Cancelled')};
    case 'prompt.erase':
      return {...s, message: undefined, prompt: {...s.prompt!, buffer: Array.from(s.prompt!.buffer).slice(0, -1).join('')}};
    case 'prompt.clear':
      return {...s, message: undefined, prompt: {...s.prompt!, buffer: ''}};
    case 'prompt.type':
      return s.prompt!.buffer.length >= 200 ? s : {...s, message: undefined, prompt: {...s.prompt!, buffer: s.prompt!.buffer + (ev.char ?? '')}};

    case 'confirm.yes': {
      const c = s.confirm!;
      const base = {...s, confirm: undefined};
      try {
        if (c.kind === 'delete') {
          svc.presets.remove(c.target);
          return {...base, presetList: {...s.presetList, index: Math.max(0, s.presetList.index - 1)}, message: info(`Deleted preset "${c.target}".`)};
        }
        if (c.kind === 'overwritePreset') return savePreset(base, svc, c.target, true);
        if (c.kind === 'overwriteExport') {
          svc.presets.exportFile(c.target, c.preset, true);
          return {...base, message: info(`Exported "${c.preset}" to ${c.target}.`)};
        }
        return writeReport(base, svc, c.target, true);
      } catch (e) {
        return {...base, message: fail(errText(e))};
      }
    }
    case 'confirm.no':
      return {...s, confirm: undefined, message: info('Left as it was')};

    case 'draft.restore': {
      const d = s.draftOffer!;
      return {...s, draftOffer: undefined, values: d.values, mode: d.mode === 'screw' && svc.checkScrew ? 'screw' : s.mode, step: 0, field: 0, message: info(`Restored the unsaved edits of ${d.savedAt.slice(0, 16).replace('T', ' ')}`)};
    }
    case 'draft.discard':
      try {
        svc.draft.clear();
      } catch {
        // A draft that cannot be removed is offered again next time; nothing is lost.
      }
      return {...s, draftOffer: undefined, message: info('Draft discarded')};
  }
  return s;
}

/** Apply every key of one input event. */
export function handleKeys(s: WorkbenchState, events: KeyEvent[], svc: WorkbenchServices): WorkbenchState {
  let out = s;
  for (const ev of events) {
    out = handleKey(out, ev, svc);
    if (out.quit) break;
  }
  return out;
}
