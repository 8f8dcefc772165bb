/**
 * One key to one command (looked up in the keymap table) to its handler: the
 * keys that work everywhere and in the overlays (prompt, question, unsaved
 * edits, draft) are here; each screen's own are in its folder and come through
 * the registry. Pure: writes come back as effects (effects.ts).
 */
import type {KeyEvent} from '../keys.js';
import type {WorkbenchServices} from '../services.js';
import {SCREEN_IDS, lookup, type CommandsOf, type Context, type Screen} from '../keymap.js';
import {SCREENS, screenRow, type KeyTables} from '../screens/registry.js';
import {go} from '../screens/navigation.js';
import {saveEffect} from './save-commands.js';
import {loadPreset, presetPrompt, unsavedCancel, unsavedDiscard, unsavedSave} from '../screens/presets/reducer.js';
import {writeReport} from '../screens/report/reducer.js';
import {acceptNote, cancelNotes, setNoteBuffer} from '../screens/report/notes.js';
import {quitWith, withEffects, type Handler, type Step} from './effects.js';
import {contextsOf, fail, info, type PromptKind, type WorkbenchState} from './workbench.js';

const goKeys = Object.fromEntries(
  SCREEN_IDS.map(id => [`go.${id}`, ((s: WorkbenchState) => (screenRow(id).enter ?? (x => x))(go(s, id))) as Handler]),
) as Record<`go.${Screen}`, Handler>;

const any = {
  'app.interrupt': (s, _ev, svc) => quitWith(s, 'interrupt', svc),
} satisfies Record<CommandsOf<'any'>, Handler>;

const screens = {
  ...goKeys,
  'app.quit': (s, _ev, svc) => quitWith(s, 'quit', svc),
  'units.toggle': s => {
    const units = s.units === 'si' ? 'us' : 'si';
    return {...s, units, message: info(units === 'si' ? 'Units: SI (mm, kN, N·m, MPa)' : 'Units: US customary (in, lbf, ft·lbf, ksi)')};
  },
} satisfies Record<CommandsOf<'screens'>, Handler>;

/** Enter in a prompt, by its kind. */
const PROMPTS: Record<PromptKind, (s: WorkbenchState, svc: WorkbenchServices, text: string) => WorkbenchState | Step> = {
  search: (s, _svc, text) => ({...s, prompt: undefined, presetList: {query: text, index: 0}}),
  note: s => acceptNote(s),
  reportPath: (s, svc, text) => writeReport({...s, prompt: undefined}, svc, text, false),
  saveAs: (s, svc, text) => presetPrompt(s, svc, s.prompt!, text),
  rename: (s, svc, text) => presetPrompt(s, svc, s.prompt!, text),
  duplicate: (s, svc, text) => presetPrompt(s, svc, s.prompt!, text),
  import: (s, svc, text) => presetPrompt(s, svc, s.prompt!, text),
  export: (s, svc, text) => presetPrompt(s, svc, s.prompt!, text),
};

const promptText = (change: (b: string, ch: string) => string): Handler => (s, ev) => {
  const b = s.prompt!.buffer;
  const buffer = change(b, ev.char ?? '');
  if (s.prompt!.kind === 'note') return setNoteBuffer(s, buffer);
  if (buffer.length > b.length && b.length >= 200) return s;
  // The preset search filters the list as you type.
  const list = s.prompt!.kind === 'search' ? {presetList: {query: buffer, index: 0}} : {};
  return {...s, ...list, message: undefined, prompt: {...s.prompt!, buffer}};
};

const prompt = {
  'prompt.ok': (s, _ev, svc) => {
    const p = s.prompt!;
    const text = p.buffer.trim();
    // A note may be empty: Enter on an empty line clears it.
    if (text === '' && p.kind !== 'search' && p.kind !== 'note') return {...s, message: fail(`${p.title}: type a value, or Esc to cancel`)};
    return PROMPTS[p.kind](s, svc, text);
  },
  'prompt.cancel': s =>
    s.prompt!.kind === 'note'
      ? cancelNotes(s)
      : s.prompt!.kind === 'search'
        ? {...s, prompt: undefined, presetList: {query: s.prompt!.target ?? '', index: 0}, message: info('Search as before')}
        : {...s, prompt: undefined, message: info('Cancelled')},
  'prompt.erase': promptText(b => Array.from(b).slice(0, -1).join('')),
  'prompt.clear': promptText(() => ''),
  'prompt.type': promptText((b, ch) => b + ch),
} satisfies Record<CommandsOf<'prompt'>, Handler>;

const confirm = {
  'confirm.yes': (s, _ev, svc) => {
    const c = s.confirm!;
    const base = {...s, confirm: undefined};
    switch (c.kind) {
      case 'delete':
        return withEffects(base, {type: 'removePreset', name: c.target});
      case 'overwritePreset':
        return saveEffect(base, c.target, true, c.thenLoad ? {thenLoad: c.thenLoad} : {});
      case 'overwriteExport':
        return withEffects(base, {type: 'exportPresets', path: c.target, ...(c.preset ? {preset: c.preset} : {}), overwrite: true});
      case 'overwriteFile':
        return writeReport(base, svc, c.target, true);
    }
  },
  'confirm.no': s => ({...s, confirm: undefined, message: info('Left as it was')}),
} satisfies Record<CommandsOf<'confirm'>, Handler>;

const unsaved = {
  'unsaved.save': s => unsavedSave(s),
  'unsaved.discard': (s, _ev, svc) => unsavedDiscard(s, svc),
  'unsaved.cancel': s => unsavedCancel(s),
} satisfies Record<CommandsOf<'unsaved'>, Handler>;

const draft = {
  'draft.restore': (s, _ev, svc) => {
    const d = s.draftOffer!;
    // Back on the preset the edits were made to, so s saves into it.
    let preset = s.preset;
    if (d.presetName && d.presetName !== s.preset.name) {
      const loaded = loadPreset(s, svc, d.presetName);
      // A preset that is gone leaves the edits on the open one.
      if (loaded.preset.name === d.presetName) preset = loaded.preset;
    }
    const mode = d.mode === 'screw' && svc.checkScrew ? 'screw' : s.mode;
    return {...s, preset, draftOffer: undefined, values: d.values, mode, step: 0, field: 0, message: info(`Restored the unsaved edits of ${d.savedAt.slice(0, 16).replace('T', ' ')}`)};
  },
  'draft.discard': s => withEffects({...s, draftOffer: undefined, message: info('Draft discarded')}, {type: 'clearDraft'}),
} satisfies Record<CommandsOf<'draft'>, Handler>;

const GLOBAL_KEYS = {any, screens, prompt, confirm, unsaved, draft} satisfies KeyTables<'any' | 'screens' | 'prompt' | 'confirm' | 'unsaved' | 'draft'>;

/** Every context's handlers: the global ones and each screen's (its own context and the overlays it opens). */
const HANDLERS = Object.assign({}, GLOBAL_KEYS, ...SCREENS.map(r => r.keys)) as KeyTables<Context>;

// A context with no handler table is a compile error here.
type RowContexts<R> = R extends {keys: infer K} ? keyof K : never;
type Covered = keyof typeof GLOBAL_KEYS | RowContexts<(typeof SCREENS)[number]>;
export const EVERY_CONTEXT_HANDLED: [Exclude<Context, Covered>] extends [never] ? true : Exclude<Context, Covered> = true;

/** The handler of a command in a context (undefined: not bound there). */
export function handlerFor(context: Context, command: string): Handler | undefined {
  return (HANDLERS[context] as Record<string, Handler> | undefined)?.[command];
}

/** Apply one key to the state: the next state, and the writes it asks for. */
export function handleKey(s: WorkbenchState, ev: KeyEvent, svc: WorkbenchServices): WorkbenchState | Step {
  const hit = lookup(ev, contextsOf(s));
  const handler = hit && handlerFor(hit.context, hit.command);
  return handler ? handler(s, ev, svc) : s;
}

