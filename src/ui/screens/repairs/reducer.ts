/**
 * The repairs screen's reducer (pure): the marked row, and the repair chosen
 * for the work order, kept by identity (kind and label) so a re-rank never
 * turns the choice into another repair.
 */
import type {RepairOption, RepairPlan} from '../../../core/repair/types.js';
import type {WorkbenchServices} from '../../services.js';
import {evaluate, evaluateRepairs, type RepairEvaluation} from '../../state/evaluate.js';
import {bodyHeight} from '../../layout.js';
import {hintLines} from '../../keymap.js';
import {clampDetail, detailLines, repairsLayout} from './detail.js';
import {fail, info, shownValues, type RepairChoice, type WorkbenchState} from '../../state/workbench.js';

/** The ranked repairs of the joint on screen (memoised by the evaluation). */
export function repairsOf(s: WorkbenchState, svc: WorkbenchServices): RepairEvaluation {
  const v = shownValues(s);
  return evaluateRepairs(v, svc, evaluate(v, svc, s.units, s.ascii), s.units);
}

export const sameRepair = (o: Pick<RepairOption, 'kind' | 'label'>, c: RepairChoice | undefined): boolean => c !== undefined && o.kind === c.kind && o.label === c.label;

/** The chosen repair in a plan, found by identity; undefined when none is chosen or it is no longer offered. */
export function chosenOption(plan: RepairPlan | undefined, c: RepairChoice | undefined): RepairOption | undefined {
  return plan?.options.find(o => sameRepair(o, c));
}

/**
 * A flag of the option that says a thread strips: the core's strips-* flags at
 * FAIL, or at WATCH when they say a thread may strip first (not the WATCH that
 * still puts the bolt first).
 */
const stripFlag = (o: RepairOption) => o.flags.find(f => (f.code.startsWith('strips-') || f.code === 'engagement-below-required') && (f.level === 'fail' || /\bmay strip\b/i.test(f.message)));

/**
 * One line on the chosen repair as the inputs stand now: ok, or why it no
 * longer serves (short of the margin, cannot be done, flagged to strip, not offered).
 */
export function chosenStatus(plan: RepairPlan | undefined, c: RepairChoice | undefined): {text: string; ok: boolean} | undefined {
  if (!c) return undefined;
  const o = chosenOption(plan, c);
  if (!o) return {ok: false, text: `Repair chosen: ${c.label} is not offered for the joint as it stands now; choose again (c on the Repairs screen).`};
  if (!o.feasible) return {ok: false, text: `Repair chosen: ${o.label} cannot be done with the inputs as they stand now${o.reason ? `: ${o.reason}` : ''}.`};
  const strip = stripFlag(o);
  if (strip) return {ok: false, text: `Warning: the repair chosen, ${o.label}, is flagged to strip: ${strip.message}`};
  if (!o.meetsMargin) return {ok: false, text: `Repair chosen: ${o.label} no longer meets the required margin with the inputs as they stand now${o.reason ? ` (${o.reason})` : ''}.`};
  return {ok: true, text: `Repair chosen: ${o.label} (rank ${o.rank}, meets the required margin).`};
}

export function moveRepair(s: WorkbenchState, svc: WorkbenchServices, d: number): WorkbenchState {
  if (s.mode !== 'joint') return s;
  const n = repairsOf(s, svc).plan?.options.length ?? 0;
  return {...s, repairIndex: Math.max(0, Math.min(n - 1, s.repairIndex + d)), repairDetailScroll: 0};
}

/** PgDn/PgUp: the marked repair's detail by a page (the window drawn by the view, less its marker line). */
export function scrollRepairDetail(s: WorkbenchState, svc: WorkbenchServices, pages: number): WorkbenchState {
  if (s.mode !== 'joint') return s;
  const plan = repairsOf(s, svc).plan;
  const marked = plan?.options[Math.min(s.repairIndex, plan.options.length - 1)];
  if (!plan || !marked) return s;
  const hintRows = hintLines(['repairs', 'screens', 'any'], s.ascii, s.size.columns, new Set(['field-has-table'])).length;
  const height = bodyHeight(s.size, 'repairs') - (hintRows - 1);
  const {room} = repairsLayout(height, plan.options.length);
  const total = detailLines(marked, s.units, s.size.columns, s.ascii).length;
  if (total <= room) return {...s, repairDetailScroll: 0};
  const shown = Math.max(1, room - 1);
  return {...s, repairDetailScroll: clampDetail((s.repairDetailScroll ?? 0) + pages * shown, total, shown)};
}

/** c: choose the marked repair (c on the chosen one clears it); a repair that will not serve is chosen with a warning. */
export function chooseRepair(s: WorkbenchState, svc: WorkbenchServices): WorkbenchState {
  if (s.mode !== 'joint') return {...s, message: fail('Repairs are for threaded joints; m switches back to the joint')};
  const plan = repairsOf(s, svc).plan;
  const marked = plan?.options[Math.min(s.repairIndex, plan.options.length - 1)];
  if (!plan || !marked) return {...s, message: fail('No repair to choose: the repair list is empty')};
  if (sameRepair(marked, s.values.chosenRepair)) {
    const {chosenRepair: _dropped, ...values} = s.values;
    return {...s, values, message: info(`No repair chosen now (was ${marked.label})`)};
  }
  const values = {...s.values, chosenRepair: {kind: marked.kind, label: marked.label}};
  const status = chosenStatus(plan, values.chosenRepair)!;
  return {...s, values, message: status.ok ? info(`${status.text} s saves it with the preset.`) : fail(status.text)};
}
