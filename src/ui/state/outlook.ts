/**
 * The tightening outlook of the joint on screen (src/app/tightening.ts: the window and the
 * sensitivity list), memoised per checked result so a re-render or a key never recomputes.
 */
import {tighteningOutlook, type TighteningOutlook} from '../../app/tightening.js';
import {coreFieldError} from '../../app/resolve.js';
import {labelMessage} from '../../app/field-table.js';
import type {UnitSystem} from '../../core/units.js';
import type {Evaluation} from './evaluate.js';

export interface OutlookEvaluation {
  outlook?: TighteningOutlook;
  /** Why there is none (a locking element on a size without a table value), in the form's words. */
  error?: string;
}

const cache = new WeakMap<object, OutlookEvaluation>();

/** The outlook of an evaluation; empty when the joint is not computed. */
export function evaluateOutlook(ev: Evaluation, units: UnitSystem = 'si'): OutlookEvaluation {
  const {input, result} = ev;
  if (!input || !result) return {};
  const hit = cache.get(result);
  if (hit) return hit;
  let out: OutlookEvaluation;
  try {
    out = {outlook: tighteningOutlook(input, result)};
  } catch (e) {
    const f = coreFieldError(e, 'joint', units);
    // The core names the command-line option; the workbench names its field.
    const msg = f ? labelMessage(f) : e instanceof Error ? e.message : String(e);
    out = {error: msg.replace('give --prevailing-torque', 'give a Prevailing torque')};
  }
  cache.set(result, out);
  return out;
}
