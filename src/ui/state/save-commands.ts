/**
 * Saving the open values (s on the joint and presets screens, and before
 * loading another preset over unsaved edits): as a savePreset effect, keeping
 * the preset's kind.
 */
import type {Mode} from './fields.js';
import {withEffects, type Step} from './effects.js';
import type {WorkbenchState} from './workbench.js';

const KIND_WORD: Record<Mode, string> = {joint: 'joint', screw: 'power-screw'};

/** The save effect for the open values, under `name`, as the kind on screen. */
export function saveEffect(s: WorkbenchState, name: string, overwrite: boolean, more: {prompt?: WorkbenchState['prompt']; thenLoad?: string} = {}): Step {
  return withEffects(s, {type: 'savePreset', name, values: s.values, kind: s.mode, overwrite, ...(more.prompt ? {prompt: more.prompt} : {}), ...(more.thenLoad ? {thenLoad: more.thenLoad} : {})});
}

/**
 * s: save into the open preset. A shipped demo asks for a new name; so does a
 * preset of the other kind (a joint preset is never turned into a screw preset).
 */
export function saveOpen(s: WorkbenchState, thenLoad?: string): WorkbenchState | Step {
  const name = s.preset.name;
  const kind = s.preset.kind ?? 'joint';
  const then = thenLoad ? {thenLoad} : {};
  if (s.preset.unnamed) return {...s, prompt: {kind: 'saveAs', title: 'A new joint; save it as', buffer: '', ...then}};
  if (s.preset.readOnly) return {...s, prompt: {kind: 'saveAs', title: `"${name}" is a shipped demo; save as`, buffer: `${name} copy`, ...then}};
  if (kind !== s.mode) {
    const what = s.mode === 'screw' ? 'power screw' : 'joint';
    return {...s, prompt: {kind: 'saveAs', title: `"${name}" is a ${KIND_WORD[kind]} preset; save this ${what} as`, buffer: `${name} ${s.mode}`, ...then}};
  }
  return saveEffect(s, name, true, then);
}

