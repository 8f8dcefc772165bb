/**
 * The presets screen's reducer (pure): the marked preset, loading one (asking
 * first over unsaved edits), and the name prompts. Saving, renaming, copying,
 * deleting, importing and exporting are returned as effects.
 */
import type {WorkbenchServices} from '../../services.js';
import type {Mode} from '../../state/fields.js';
import {withEffects, type Step} from '../../state/effects.js';
import {errText, fail, filteredPresets, info, isDirty, snapshot, type PromptState, type Values, type WorkbenchState} from '../../state/workbench.js';
import {saveEffect, saveOpen} from '../../state/save-commands.js';

export function markedPreset(s: WorkbenchState, svc: WorkbenchServices): string | undefined {
  return filteredPresets(s, svc)[s.presetList.index]?.name;
}

/** The target of "new blank joint" in the unsaved-edits question (no preset name may hold '<'). */
export const NEW_JOINT = '<new blank joint>';

/** The values of a new blank joint: a thread to start from and nothing else; the fields say what is needed. */
export const BLANK_VALUES = (): Values => ({joint: {thread: 'M10', engagement: 10}, hole: {}, notes: {}}) as Values;

/** What a newly opened joint starts with: the views at their tops, nothing marked. */
const fresh = (s: WorkbenchState): Partial<WorkbenchState> => ({
  screen: 'joint', step: 0, field: 0, edit: undefined, picker: undefined, preview: undefined, showFlags: false,
  flagScroll: 0, repairIndex: 0, repairDetailScroll: 0, report: {...s.report, scroll: 0},
});

/** N: a new blank joint; over unsaved edits, ask first as loading a preset does. */
export function newJoint(s: WorkbenchState): WorkbenchState {
  if (isDirty(s)) return {...s, unsaved: {target: NEW_JOINT}, message: undefined};
  return openNew(s);
}

function openNew(s: WorkbenchState): WorkbenchState {
  const values = BLANK_VALUES();
  return {
    ...s,
    ...fresh(s),
    mode: 'joint',
    values,
    preset: {name: 'new joint', readOnly: false, saved: snapshot(values), kind: 'joint', unnamed: true},
    message: info('A new blank joint: fill in the fields; s saves it under a name.'),
  };
}

/** Load a preset (a read): its values, mode and kind; the screen goes back to the joint at the top of every view. */
export function loadPreset(s: WorkbenchState, svc: WorkbenchServices, name: string): WorkbenchState {
  if (name === NEW_JOINT) return openNew(s);
  try {
    const p = svc.presets.load(name);
    const mode: Mode = p.kind === 'screw' ? 'screw' : 'joint';
    if (mode === 'screw' && !svc.checkScrew) return {...s, message: fail(`"${p.name}" is a power-screw preset; the power-screw mode is not in this build (use tapwright screw --preset)`)};
    return {
      ...s,
      mode,
      values: p.values,
      ...fresh(s),
      preset: {name: p.name, readOnly: p.readOnly, saved: snapshot(p.values), kind: mode},
      message: info(`Loaded preset "${p.name}"${p.readOnly ? ' (shipped demo, read-only: save as to keep changes)' : ''}.`),
    };
  } catch (e) {
    return {...s, message: fail(`Could not load "${name}": ${errText(e)}`)};
  }
}

/** Enter on the list: load the marked preset; over unsaved edits, ask first (save / discard / cancel). */
export function loadMarked(s: WorkbenchState, svc: WorkbenchServices): WorkbenchState {
  const name = markedPreset(s, svc);
  if (!name) return {...s, message: fail('No preset marked; clear the search with / then Enter')};
  if (isDirty(s)) return {...s, unsaved: {target: name}, message: undefined};
  return loadPreset(s, svc, name);
}

/** The answers to "unsaved edits": save then load, discard and load, or stay. */
export function unsavedSave(s: WorkbenchState): WorkbenchState | Step {
  const target = s.unsaved!.target;
  return saveOpen({...s, unsaved: undefined}, target);
}
export function unsavedDiscard(s: WorkbenchState, svc: WorkbenchServices): WorkbenchState {
  return loadPreset({...s, unsaved: undefined}, svc, s.unsaved!.target);
}
export function unsavedCancel(s: WorkbenchState): WorkbenchState {
  return {...s, unsaved: undefined, message: info(`Kept the edits to "${s.preset.name}"; nothing loaded`)};
}

/** A preset command on the marked preset: the prompt or question it opens. */
export function onMarked(s: WorkbenchState, svc: WorkbenchServices, command: 'preset.rename' | 'preset.duplicate' | 'preset.export' | 'preset.delete'): WorkbenchState {
  const name = markedPreset(s, svc);
  if (!name) return {...s, message: fail('No preset marked')};
  if (command === 'preset.delete' && readOnlyPreset(svc, name)) return {...s, message: fail(`"${name}" is a shipped demo preset (read-only): it cannot be deleted`)};
  if (command === 'preset.delete') return {...s, confirm: {kind: 'delete', question: `Delete preset "${name}"? This cannot be undone.`, target: name}};
  if (command === 'preset.rename') return {...s, prompt: {kind: 'rename', title: `Rename "${name}" to`, buffer: name, target: name}};
  if (command === 'preset.duplicate') return {...s, prompt: {kind: 'duplicate', title: `Copy "${name}" as`, buffer: `${name} copy`, target: name}};
  return {...s, prompt: {kind: 'export', title: `Export "${name}" to file`, buffer: `${slug(name)}.json`, target: name}};
}

function readOnlyPreset(svc: WorkbenchServices, name: string): boolean {
  try {
    return svc.presets.list().some(p => p.name === name && p.readOnly);
  } catch {
    return false;
  }
}

/** Enter in a presets prompt (the text is not empty). */
export function presetPrompt(s: WorkbenchState, svc: WorkbenchServices, p: PromptState, text: string): WorkbenchState | Step {
  const base = {...s, prompt: undefined};
  switch (p.kind) {
    case 'saveAs': {
      let exists: boolean;
      try {
        exists = svc.presets.list().some(x => x.name === text);
      } catch (e) {
        return {...s, message: fail(errText(e))};
      }
      if (exists) return {...base, confirm: {kind: 'overwritePreset', question: `Preset "${text}" exists. Replace it?`, target: text, ...(p.thenLoad ? {thenLoad: p.thenLoad} : {})}};
      // On a refused name the prompt stays open with the typed text.
      return saveEffect(base, text, false, {prompt: p, ...(p.thenLoad ? {thenLoad: p.thenLoad} : {})});
    }
    case 'rename':
      return withEffects(base, {type: 'renamePreset', from: p.target!, to: text, prompt: p});
    case 'duplicate':
      return withEffects(base, {type: 'duplicatePreset', from: p.target!, to: text, prompt: p});
    case 'import':
      return withEffects(base, {type: 'importPresets', path: text, prompt: p});
    case 'export':
      return withEffects(base, {type: 'exportPresets', path: text, ...(p.target ? {preset: p.target} : {}), overwrite: false, prompt: p});
    default:
      return base;
  }
}

export function slug(name: string): string {
  return name.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '') || 'joint';
}
