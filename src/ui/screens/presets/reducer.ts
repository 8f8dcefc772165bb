/** Preset and report commands: save, load, the name and path prompts, writing the report. */
import type {WorkbenchServices} from '../services.js';
import type {Mode} from './fields.js';
import {evaluate, evaluateRepairs, type Evaluation} from './evaluate.js';
import {acceptNote, shownNotes} from './note-commands.js';
import {errText, fail, filteredPresets, info, snapshot, type WorkbenchState} from './workbench.js';

export function markedPreset(s: WorkbenchState, svc: WorkbenchServices): string | undefined {
  return filteredPresets(s, svc)[s.presetList.index]?.name;
}

export function savePreset(s: WorkbenchState, svc: WorkbenchServices, name: string, overwrite: boolean): WorkbenchState {
  try {
    svc.presets.save(name, s.values, {overwrite, kind: s.mode});
    svc.draft.clear();
    return {...s, preset: {name, readOnly: false, saved: snapshot(s.values)}, message: info(`Saved preset "${name}".`)};
  } catch (e) {
    return {...s, message: fail(`Could not save "${name}": ${errText(e)}`)};
  }
}

export function loadPreset(s: WorkbenchState, svc: WorkbenchServices, name: string): WorkbenchState {
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


export function runPrompt(s: WorkbenchState, svc: WorkbenchServices): WorkbenchState {
  const p = s.prompt!;
  const text = p.buffer.trim();
  const base = {...s, prompt: undefined};
  if (p.kind === 'search') return {...base, presetList: {query: text, index: 0}};
  // A note may be empty: Enter on an empty line clears it.
  if (p.kind === 'note') return acceptNote(s);
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
        return {...base, message: info(`Exported ${p.target ? `"${p.target}"` : 'all presets'} to ${text}.`)};
      case 'reportPath':
        return writeReport(base, svc, text, false);
    }
  } catch (e) {
    return {...s, message: fail(errText(e))};
  }
  return base;
}

/**
 * The repair plan the report carries: when the hole is stripped or the check
 * failed, the ranked repairs with the one marked on the Repairs screen as the
 * repair chosen.
 */
function reportRepairs(s: WorkbenchState, svc: WorkbenchServices, ev: Evaluation): {plan: NonNullable<ReturnType<typeof evaluateRepairs>['plan']>; chosen?: number} | undefined {
  const stripped = (s.values.hole as {holeState?: unknown} | undefined)?.holeState === 'stripped';
  const failed = ev.result?.flags.some(f => f.level === 'fail') ?? false;
  if (!stripped && !failed) return undefined;
  const plan = evaluateRepairs(s.values, svc, ev, s.units).plan;
  if (!plan || plan.options.length === 0) return undefined;
  const marked = plan.options[Math.min(s.repairIndex, plan.options.length - 1)];
  return {plan, ...(marked ? {chosen: marked.rank} : {})};
}

/** The report text for the current joint, or a reason it cannot be made. */
export function reportText(s: WorkbenchState, svc: WorkbenchServices, ev: {input?: unknown; result?: unknown}): {text?: string; why?: string} {
  if (!svc.report) return {why: 'The report writer is not available in this workbench.'};
  if (s.mode === 'screw') return {why: 'The work-order report covers threaded joints; for this power screw save the preset and run tapwright screw --preset NAME.'};
  if (!ev.input || !ev.result) return {why: 'Fix the joint inputs first: the report needs a computed joint.'};
  try {
    const repairs = reportRepairs(s, svc, ev as Evaluation);
    return {
      text: svc.report(s.report.format, ev.result as never, ev.input as never, {
        presetName: s.preset.name,
        date: svc.now(),
        units: s.units,
        notes: shownNotes(s),
        ...(repairs ? {repairs} : {}),
      }),
    };
  } catch (e) {
    return {why: `Cannot build the report: ${errText(e)}`};
  }
}

export function writeReport(s: WorkbenchState, svc: WorkbenchServices, path: string, overwrite: boolean): WorkbenchState {
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

export function slug(name: string): string {
  return name.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '') || 'joint';
}

export function defaultReportPath(s: WorkbenchState, svc: WorkbenchServices): string {
  const d = svc.now().toISOString().slice(0, 10);
  return `tapwright-${slug(s.preset.name)}-${d}.${s.report.format === 'markdown' ? 'md' : 'txt'}`;
}
