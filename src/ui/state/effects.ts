/**
 * Writes as data. A reducer never saves, deletes or writes a file itself: it
 * returns the state and a list of effects; the app (run-effects.ts) runs them
 * through the services and hands each outcome back to `settle`, which is pure
 * and says what the state becomes (a message, a question, the next effect).
 */
import type {KeyEvent} from '../keys.js';
import type {Draft, WorkbenchServices} from '../services.js';
import type {Mode} from './fields.js';
import {fail, info, isDirty, snapshot, type PromptState, type Values, type WorkbenchState} from './workbench.js';

export type Effect =
  | {type: 'savePreset'; name: string; values: Values; kind: Mode; overwrite: boolean; /** Refused: this prompt stays open. */ prompt?: PromptState; /** Saved: then load this preset. */ thenLoad?: string}
  | {type: 'removePreset'; name: string}
  | {type: 'renamePreset'; from: string; to: string; prompt: PromptState}
  | {type: 'duplicatePreset'; from: string; to: string; prompt: PromptState}
  | {type: 'importPresets'; path: string; prompt: PromptState}
  | {type: 'exportPresets'; path: string; preset?: string; overwrite: boolean; prompt?: PromptState}
  | {type: 'writeReport'; path: string; text: string; format: 'text' | 'markdown'; overwrite: boolean}
  | {type: 'clearDraft'}
  /** On quit: keep the unsaved edits as the draft for the next start (none to keep: clear it). */
  | {type: 'keepDraft'; draft?: Draft};

/** A failed outcome keeps the error's code (EEXIST, ENOENT, ...): decisions go by the code, not the words. */
export type Outcome = {ok: true; imported?: {imported: string[]; skipped: string[]}} | {ok: false; error: string; code?: string};

/** What a key handler gives back: the next state and the writes it asks for. */
export interface Step {
  state: WorkbenchState;
  effects: readonly Effect[];
}

export type Handler = (s: WorkbenchState, ev: KeyEvent, svc: WorkbenchServices) => WorkbenchState | Step;

export const withEffects = (state: WorkbenchState, ...effects: Effect[]): Step => ({state, effects});
export const asStep = (r: WorkbenchState | Step): Step => ('effects' in r && 'state' in r ? r : {state: r, effects: []});

/** q or Ctrl-C: quit, keeping unsaved edits as the draft (a draft still on offer is left as it is). */
export function quitWith(s: WorkbenchState, how: 'quit' | 'interrupt', svc: WorkbenchServices): WorkbenchState | Step {
  const state: WorkbenchState = {...s, quit: how};
  if (s.draftOffer) return state;
  if (!isDirty(s)) return withEffects(state, {type: 'keepDraft'});
  return withEffects(state, {type: 'keepDraft', draft: {savedAt: svc.now().toISOString(), presetName: s.preset.name, values: s.values, mode: s.mode}});
}

/**
 * Loading a preset after a save over unsaved edits: given by the presets
 * reducer, so this module does not import the screens.
 */
export type Loader = (s: WorkbenchState, svc: WorkbenchServices, name: string) => WorkbenchState;

/** The folder part of a path ("/a/b/r.md" -> "/a/b"); "." for a bare file name. */
export function folderOf(p: string): string {
  const i = Math.max(p.lastIndexOf('/'), p.lastIndexOf('\\'));
  return i < 0 ? '.' : i === 0 ? p.slice(0, 1) : p.slice(0, i);
}

/** The state after an effect ran (pure): its message, a question, or what follows. */
export function settle(s: WorkbenchState, e: Effect, o: Outcome, svc: WorkbenchServices, load: Loader): Step {
  switch (e.type) {
    case 'savePreset': {
      if (!o.ok) {
        const message = fail(`Could not save "${e.name}": ${o.error}`);
        return {state: e.prompt ? {...s, prompt: e.prompt, message} : {...s, message}, effects: []};
      }
      const saved: WorkbenchState = {...s, preset: {name: e.name, readOnly: false, saved: snapshot(e.values), kind: e.kind}, message: info(`Saved preset "${e.name}".`)};
      return withEffects(e.thenLoad ? load(saved, svc, e.thenLoad) : saved, {type: 'clearDraft'});
    }
    case 'removePreset':
      if (!o.ok) return {state: {...s, message: fail(o.error)}, effects: []};
      return {state: {...s, presetList: {...s.presetList, index: Math.max(0, s.presetList.index - 1)}, message: info(`Deleted preset "${e.name}".`)}, effects: []};
    case 'renamePreset':
      if (!o.ok) return {state: {...s, prompt: e.prompt, message: fail(o.error)}, effects: []};
      return {
        state: {...s, preset: s.preset.name === e.from ? {...s.preset, name: e.to} : s.preset, message: info(`Renamed "${e.from}" to "${e.to}".`)},
        effects: [],
      };
    case 'duplicatePreset':
      if (!o.ok) return {state: {...s, prompt: e.prompt, message: fail(o.error)}, effects: []};
      return {state: {...s, message: info(`Copied "${e.from}" to "${e.to}".`)}, effects: []};
    case 'importPresets': {
      if (!o.ok || !o.imported) return {state: {...s, prompt: e.prompt, message: fail(o.ok ? 'nothing imported' : o.error)}, effects: []};
      const r = o.imported;
      const skipped = r.skipped.length ? `; skipped ${r.skipped.join('; ')}` : '';
      return {state: {...s, message: info(`Imported ${r.imported.length} preset(s)${r.imported.length ? `: ${r.imported.join(', ')}` : ''}${skipped}`)}, effects: []};
    }
    case 'exportPresets':
      if (o.ok) return {state: {...s, message: info(`Exported ${e.preset ? `"${e.preset}"` : 'all presets'} to ${e.path}.`)}, effects: []};
      if (!e.overwrite && (o.code === 'EEXIST' || (o.code === undefined && /\bexists\b/i.test(o.error) && !/does not exist/i.test(o.error)))) {
        return {state: {...s, confirm: {kind: 'overwriteExport', question: `${e.path} exists. Replace it?`, target: e.path, ...(e.preset ? {preset: e.preset} : {})}}, effects: []};
      }
      return {state: e.prompt ? {...s, prompt: e.prompt, message: fail(o.error)} : {...s, message: fail(o.error)}, effects: []};
    case 'writeReport': {
      if (o.ok) return {state: {...s, ...(/[\\/]/.test(e.path) ? {reportDir: folderOf(e.path)} : {}), message: info(`Wrote the ${e.format === 'markdown' ? 'Markdown' : 'text'} report to ${e.path}`)}, effects: []};
      if (!e.overwrite && o.code === 'EEXIST') return {state: {...s, confirm: {kind: 'overwriteFile', question: `${e.path} exists. Replace it?`, target: e.path}}, effects: []};
      // Anything else (the folder does not exist, no permission): said plainly, and the path can be corrected.
      const again = {kind: 'reportPath' as const, title: 'Write the report to file', buffer: e.path};
      const why = o.code === 'ENOENT' ? `folder ${folderOf(e.path)} does not exist; create it or type another path` : o.error;
      return {state: {...s, prompt: again, message: fail(`Could not write ${e.path}: ${why}`)}, effects: []};
    }
    case 'clearDraft':
      // A draft that cannot be removed is offered again next time; nothing is lost.
      return {state: s, effects: []};
    case 'keepDraft':
      // The draft is a convenience; a failure to keep it must not stop the exit.
      return {state: o.ok && e.draft ? {...s, draftKept: true} : s, effects: []};
  }
}
