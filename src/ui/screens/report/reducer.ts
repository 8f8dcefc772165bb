/**
 * The report screen's reducer (pure): the report text for the joint on screen
 * (with the ranked repairs and the repair chosen), its scroll and format, and
 * the write, returned as an effect.
 */
import type {Flag} from '../../../core/types.js';
import {holeStateFlags} from '../../../core/joint/hole-flags.js';
import type {WorkbenchServices} from '../../services.js';
import {bodyHeight} from '../../layout.js';
import {wrapLines} from '../../components/scroll-view.js';
import {evaluate, evaluateRepairs, evaluateScrew, type Evaluation} from '../../state/evaluate.js';
import {withEffects, type Step} from '../../state/effects.js';
import {errText, fail, type WorkbenchState} from '../../state/workbench.js';
import {chosenOption, chosenStatus} from '../repairs/reducer.js';
import {slug} from '../presets/reducer.js';
import {shownNotes, startNotes} from './notes.js';

/**
 * The repair plan the report carries: when the hole is stripped, the check
 * failed or a repair was chosen, the ranked repairs with the one chosen (by
 * identity) and a line when it no longer serves.
 */
function reportRepairs(s: WorkbenchState, svc: WorkbenchServices, ev: Evaluation) {
  const stripped = (s.values.hole as {holeState?: unknown} | undefined)?.holeState === 'stripped';
  const failed = ev.result?.flags.some(f => f.level === 'fail') ?? false;
  const choice = s.values.chosenRepair;
  if (!stripped && !failed && !choice) return undefined;
  const plan = evaluateRepairs(s.values, svc, ev, s.units).plan;
  if (!plan || plan.options.length === 0) return undefined;
  const chosen = chosenOption(plan, choice);
  const status = chosenStatus(plan, choice);
  const note = !choice ? 'No repair chosen yet: c on the Repairs screen of the workbench chooses one for the work order.' : status && !status.ok ? status.text : undefined;
  return {plan, ...(chosen ? {chosen: chosen.rank} : {}), ...(note ? {chosenNote: note} : {})};
}

/** The report text for the current joint, or a reason it cannot be made. */
export function reportText(s: WorkbenchState, svc: WorkbenchServices, ev: {input?: unknown; result?: unknown}): {text?: string; why?: string} {
  if (!svc.report) return {why: 'The report writer is not available in this workbench.'};
  if (s.mode === 'screw') return screwReportText(s, svc);
  if (!ev.input || !ev.result) return {why: 'Fix the joint inputs first: the report needs a computed joint.'};
  try {
    const repairs = reportRepairs(s, svc, ev as Evaluation);
    // The report carries the hole-state flags (the core's rule) before the check's, as the joint screen does.
    const checked = ev.result as Evaluation['result'] & {flags: Flag[]};
    const result = {...checked, flags: [...holeStateFlags(s.values.hole, s.units), ...checked.flags]};
    return {
      text: svc.report(s.report.format, result, ev.input as never, {
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

/** The power-screw work-order report (text or Markdown) with its notes, date and sign-off, as tapwright screw prints it. */
function screwReportText(s: WorkbenchState, svc: WorkbenchServices): {text?: string; why?: string} {
  if (!svc.screwReport) return {why: 'The power-screw report is not available in this workbench.'};
  const sev = evaluateScrew(s.values, svc, s.units, s.ascii);
  if (!sev.input || !sev.result) return {why: 'Fix the power-screw inputs first: the report needs a computed screw.'};
  try {
    return {text: svc.screwReport(s.report.format, sev.result, sev.input, {presetName: s.preset.name, date: svc.now(), units: s.units, notes: shownNotes(s)})};
  } catch (e) {
    return {why: `Cannot build the report: ${errText(e)}`};
  }
}

/** The report of the saved values (not a preview) as a write effect; the outcome is settled in effects.ts. */
export function writeReport(s: WorkbenchState, svc: WorkbenchServices, path: string, overwrite: boolean): WorkbenchState | Step {
  const r = reportText(s, svc, evaluate(s.values, svc, s.units, s.ascii));
  if (!r.text) return {...s, message: fail(r.why ?? 'No report')};
  // "~" and "~/" expanded and a relative path made full, so every message names the real file.
  const full = svc.resolvePath ? svc.resolvePath(path) : path;
  return withEffects(s, {type: 'writeReport', path: full, text: r.text, format: s.report.format, overwrite});
}

/**
 * The path the report prompt offers: the folder of the last report written (kept in
 * the settings), else the current folder, in full; then a file name of the preset and date.
 */
export function defaultReportPath(s: WorkbenchState, svc: WorkbenchServices): string {
  const d = svc.now().toISOString().slice(0, 10);
  const name = `tapwright-${slug(s.preset.name)}-${d}.${s.report.format === 'markdown' ? 'md' : 'txt'}`;
  const dir = s.reportDir ?? svc.cwd;
  if (!dir) return name;
  return `${dir.replace(/[\\/]+$/, '')}/${name}`;
}

/** Scroll the preview by d lines, within the report as drawn. */
export function scrollReport(s: WorkbenchState, svc: WorkbenchServices, d: number): WorkbenchState {
  const rows = bodyHeight(s.size, 'report') - 1;
  const lines = wrapLines((reportText(s, svc, evaluate(s.values, svc, s.units, s.ascii)).text ?? '').split('\n'), s.size.columns);
  return {...s, report: {...s.report, scroll: Math.max(0, Math.min(s.report.scroll + d, lines.length - rows))}};
}

/** n: the work-order notes, with the preview scrolled to its work-order section. */
export function openNotes(s: WorkbenchState, svc: WorkbenchServices): WorkbenchState {
  return startNotes(s, md => {
    const rows = bodyHeight(md.size, 'report') - 1;
    const lines = wrapLines((reportText(md, svc, evaluate(md.values, svc, md.units, md.ascii)).text ?? '').split('\n'), md.size.columns);
    const at = lines.findIndex(l => /^#+ *work order/i.test(l));
    return Math.max(0, Math.min(at - 1, lines.length - rows));
  });
}
