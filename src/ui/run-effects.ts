/**
 * The one place the workbench's writes happen: runs the effects a reducer
 * returned through the injected services, in order, and settles each outcome
 * (state/effects.ts). The app calls `handleKeys` for every input event.
 */
import type {KeyEvent} from './keys.js';
import type {WorkbenchServices} from './services.js';
import {asStep, settle, type Effect, type Outcome, type Step} from './state/effects.js';
import {handleKey} from './state/handle-key.js';
import {loadPreset} from './screens/presets/reducer.js';
import {errText, type WorkbenchState} from './state/workbench.js';

type Runners = {[T in Effect['type']]: (e: Extract<Effect, {type: T}>, svc: WorkbenchServices) => Outcome};

const RUN = {
  savePreset: (e, svc) => (svc.presets.save(e.name, e.values, {overwrite: e.overwrite, kind: e.kind}), {ok: true}),
  removePreset: (e, svc) => (svc.presets.remove(e.name), {ok: true}),
  renamePreset: (e, svc) => (svc.presets.rename(e.from, e.to), {ok: true}),
  duplicatePreset: (e, svc) => (svc.presets.duplicate(e.from, e.to), {ok: true}),
  importPresets: (e, svc) => ({ok: true, imported: svc.presets.importFile(e.path)}),
  exportPresets: (e, svc) => (svc.presets.exportFile(e.path, e.preset, e.overwrite), {ok: true}),
  writeReport: (e, svc) => (svc.writeFile(e.path, e.text, e.overwrite), {ok: true}),
  clearDraft: (_e, svc) => (svc.draft.clear(), {ok: true}),
  keepDraft: (e, svc) => (e.draft ? svc.draft.save(e.draft) : svc.draft.clear(), {ok: true}),
} satisfies Runners;

/** Run one effect; a thrown error becomes a failed outcome with its message. */
export function runEffect(e: Effect, svc: WorkbenchServices): Outcome {
  try {
    return (RUN[e.type] as (e: Effect, svc: WorkbenchServices) => Outcome)(e, svc);
  } catch (err) {
    const code = (err as {code?: unknown} | null)?.code;
    return {ok: false, error: errText(err), ...(typeof code === 'string' ? {code} : {})};
  }
}

/** Run a step's effects, and those their outcomes ask for, in order. */
export function runStep(step: Step, svc: WorkbenchServices): WorkbenchState {
  let state = step.state;
  const queue = [...step.effects];
  for (let e = queue.shift(); e; e = queue.shift()) {
    const next = settle(state, e, runEffect(e, svc), svc, loadPreset);
    state = next.state;
    queue.push(...next.effects);
  }
  return state;
}

/** Apply every key of one input event in order, running each key's effects before the next key. */
export function handleKeys(s: WorkbenchState, events: readonly KeyEvent[], svc: WorkbenchServices): WorkbenchState {
  let out = s;
  for (const ev of events) {
    out = runStep(asStep(handleKey(out, ev, svc)), svc);
    if (out.quit) break;
  }
  return out;
}
