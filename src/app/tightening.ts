/**
 * The tightening outlook of a checked joint, for every face (check, the workbench, the
 * report): the tightening window (src/core/joint/window.ts) with the least clamp load from
 * the service state (src/core/joint/window-clamp.ts) or as given, the prevailing torque of a
 * locking element (ISO 2320, src/core/joint/locking.ts) or as given, the lubricant pick that
 * set the friction (VDI 2230 Part 1 friction classes, friction-picks.ts), and the ranked
 * sensitivity of the deciding margin (src/core/joint/sensitivity.ts). Units: N, N·m.
 */
import type {JointInput} from '../core/joint/input.js';
import type {CheckResult} from '../core/joint/result.js';
import {JointInputError} from '../core/joint/errors.js';
import {fastenerFrictionPick, type FastenerFrictionPick} from '../core/joint/friction-picks.js';
import {LOCKING_ELEMENTS} from '../core/joint/locking.js';
import {decidingMargin, sensitivity, type DecidingMargin, type SensitivityItem} from '../core/joint/sensitivity.js';
import {leastClampAtAssembly, type LeastClampAtAssembly} from '../core/joint/window-clamp.js';
import {resolveWindowInput} from '../core/joint/window-options.js';
import {tighteningWindow, type TighteningWindow} from '../core/joint/window.js';
import type {Provenance} from '../core/types.js';

export interface TighteningOutlook {
  window: TighteningWindow;
  sensitivity: SensitivityItem[];
  margin: DecidingMargin;
  /** The lubricant pick named in the input, and whether the friction in use is still its range. */
  lubricant?: {pick: FastenerFrictionPick; frictionAsPick: boolean};
  /** The prevailing torque added on the wrench, N·m, with the element (when one is named) and the source. */
  prevailing?: {torque: number; element?: string; provenance: Provenance};
  /** The least clamp load used for the bottom of the band, N, and where it comes from. */
  leastClamp?: {value: number; from: 'service' | 'given'; detail?: LeastClampAtAssembly};
}

const sameRange = (a: {min: number; max: number}, b: {min: number; max: number}) => a.min === b.min && a.max === b.max;

/**
 * The window and the sensitivity list of `result` (checked from `input`). A least clamp load
 * given in the input wins over the one derived from `result.service`. Throws JointInputError
 * on `window.locking` when a locking element is named for a size ISO 2320 does not list and no
 * prevailing torque is given.
 */
export function tighteningOutlook(input: JointInput, result: CheckResult): TighteningOutlook {
  const w = input.window ?? {};
  const resolved = resolveWindowInput(w, result.geometry.nominal);
  if (!resolved.ok) throw new JointInputError(w.locking !== undefined && w.prevailingTorque === undefined ? 'window.locking' : 'window.lubricant', resolved.problem.message);
  const r = resolved.value;
  const fromService = result.service ? leastClampAtAssembly(result.service) : undefined;
  const leastClamp: TighteningOutlook['leastClamp'] =
    r.leastClamp !== undefined ? {value: r.leastClamp, from: 'given'} : fromService ? {value: fromService.value, from: 'service', detail: fromService} : undefined;
  const window = tighteningWindow(input, result, {
    ...(leastClamp ? {leastClamp: leastClamp.value} : {}),
    ...(r.prevailing ? {prevailingTorque: r.prevailing.torque} : {}),
  });
  if (leastClamp?.from === 'given' && fromService) window.notes.push('The least clamp load given (--least-clamp) is used instead of the one from the service state.');
  const out: TighteningOutlook = {
    window,
    sensitivity: sensitivity(input, result, r.wrenchAccuracy !== undefined ? {wrenchDeviation: r.wrenchAccuracy} : {}),
    margin: decidingMargin(input, result),
  };
  const pick = w.lubricant !== undefined ? fastenerFrictionPick(w.lubricant) : undefined;
  if (pick) out.lubricant = {pick, frictionAsPick: input.nutFactor === undefined && sameRange(input.muThread, pick.thread) && sameRange(input.muHead, pick.head)};
  if (r.prevailing) {
    const element = w.locking !== undefined ? LOCKING_ELEMENTS.find(e => e.id === w.locking)?.name : undefined;
    out.prevailing = {torque: r.prevailing.torque, ...(element !== undefined ? {element} : {}), provenance: r.prevailing.provenance};
  }
  if (leastClamp) out.leastClamp = leastClamp;
  return out;
}

/** The outlook's keys of `check --json` (SI): `window` (issue 18 contract: torque.{min,max}, limits[] {name, preload}, empty) and `sensitivity[]` {input, low, high}. */
export function outlookJson(o: TighteningOutlook): {window: Record<string, unknown>; sensitivity: SensitivityItem[]; decidingMargin: DecidingMargin} {
  return {
    window: {
      ...o.window,
      ...(o.lubricant ? {lubricant: {id: o.lubricant.pick.id, surface: o.lubricant.pick.surface, lubricant: o.lubricant.pick.lubricant, thread: o.lubricant.pick.thread, head: o.lubricant.pick.head, frictionAsPick: o.lubricant.frictionAsPick, source: o.lubricant.pick.provenance.source}} : {}),
      ...(o.prevailing ? {prevailing: {torque: o.prevailing.torque, ...(o.prevailing.element ? {element: o.prevailing.element} : {}), source: o.prevailing.provenance.source}} : {}),
      ...(o.leastClamp ? {leastClamp: {value: o.leastClamp.value, from: o.leastClamp.from, ...(o.leastClamp.detail ? {terms: o.leastClamp.detail} : {})}} : {}),
    },
    sensitivity: o.sensitivity,
    decidingMargin: o.margin,
  };
}
