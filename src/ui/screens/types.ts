/** What every screen's view gets: the state, what was derived from it once per change, and its box. */
import type {Flag} from '../../core/types.js';
import type {WorkbenchServices} from '../services.js';
import type {Evaluation, RepairEvaluation, ScrewEvaluation} from '../state/evaluate.js';
import type {OutlookEvaluation} from '../state/outlook.js';
import type {WorkbenchState} from '../state/workbench.js';

/** Computed once per change of the values (use-derived.ts), never inside a view. */
export interface Derived {
  /** The joint check of the values on screen. */
  ev: Evaluation;
  /** The power screw, in power-screw mode. */
  sev?: ScrewEvaluation;
  /** The flags to show: the hole-state flags from the core, then the check's. */
  flags: Flag[];
  /** The ranked repairs, on the screens that show them. */
  rep?: RepairEvaluation;
  /** The tightening window and sensitivity list, on the joint screen's Tightening step. */
  outlook?: OutlookEvaluation;
  /** The report text (or why there is none), on the report screen. */
  report?: {text?: string; why?: string};
}

export interface ScreenProps {
  state: WorkbenchState;
  derived: Derived;
  svc: WorkbenchServices;
  width: number;
  height: number;
}
