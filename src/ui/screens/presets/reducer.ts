/**
 * The presets screen's reducer (pure): the marked preset, loading one (asking
 * first over unsaved edits), and the name prompts. Saving, renaming, copying,
 * deleting, importing and exporting are returned as effects.
 */
import type {WorkbenchServices} from '../../services.js';
import type {Mode} from '../../state/fields.js';
import {withEffects, type Step} from '../../state/effects.js';
import {errText, fail, filteredPresets, info, isDirty, snapshot, type PromptState, type WorkbenchState} from '../../state/workbench.js';
import {saveEffect, saveOpen} from '../../state/save-commands.js';

export function markedPreset(s: WorkbenchState, svc: WorkbenchServices): string | undefined {
  return filteredPresets(s, svc)[s.presetList.index]?.name;
}

/** Load a preset (a read): its values, mode and kind; the screen goes back to the joint. */
export function loadPreset(s: WorkbenchState, svc: WorkbenchServices, name: string): WorkbenchState {
  try {
    const p = svc.presets.load(name);
    const mode: Mode = p.kind === 'screw' ? 'screw' : 'joint';
    if (mode === 'screw' && !svc.checkScrew) return {...s, message: fail(`"${p.name}" is a power-screw preset; the power-screw mode is not in this build (use tapwright screw --preset)`)};
    return {
      ...s,
      mode,
      values: p.values,
      preset: {name: p.name, readOnly: p.readOnly, saved: snapshot(p.values), kind: mode},
      screen: 'joint',
      step: 0,
      field: 0,
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
  if (command === 'preset.delete') return {...s, confirm: {kind: 'delete', question: `Delete preset "${name}"? This cannot be undone.`, target: name}};
  if (command === 'preset.rename') return {...s, prompt: {kind: 'rename', title: `Rename "${name}" to`, buffer: name, target: name}};
  if (command === 'preset.duplicate') return {...s, prompt: {kind: 'duplicate', title: `Copy "${name}" as`, buffer: `${name} copy`, target: name}};
  return {...s, prompt: {kind: 'export', title: `Export "${name}" to file`, buffer: `${slug(name)}.json`, target: name}};
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
