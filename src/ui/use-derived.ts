/**
 * Everything the screens show that is computed from the values: the joint
 * check, the power screw, the flags, the repairs and the report. One hook, run
 * once per change (memoised on the values shown, the units and the screen),
 * never inside a view's render.
 */
import {useMemo} from 'react';
import {holeStateFlags} from '../core/joint/hole-flags.js';
import {screwFlagsInUnits} from '../core/screw/flags.js';
import type {WorkbenchServices} from './services.js';
import {evaluate, evaluateRepairs, evaluateScrew} from './state/evaluate.js';
import {shownValues, type WorkbenchState} from './state/workbench.js';
import {reportText} from './screens/report/reducer.js';
import {withLabels} from './labels.js';
import type {Derived} from './screens/types.js';
import {evaluateOutlook} from './state/outlook.js';
import {stepsFor} from './state/fields.js';

/** An evaluation with its messages in the form's words (no internal input names). */
function labelled<E extends {errors: Record<string, string>; error?: string}>(e: E): E {
  const errors = Object.fromEntries(Object.entries(e.errors).map(([k, v]) => [k, withLabels(v)]));
  return {...e, errors, ...(e.error !== undefined ? {error: withLabels(e.error)} : {})};
}

export function useDerived(state: WorkbenchState, svc: WorkbenchServices): Derived {
  const shown = shownValues(state);
  const {units, ascii, mode, screen} = state;
  const ev = useMemo(() => labelled(evaluate(shown, svc, units, ascii)), [shown, svc, units, ascii]);
  const sev = useMemo(() => (mode === 'screw' ? labelled(evaluateScrew(shown, svc, units, ascii)) : undefined), [shown, svc, units, ascii, mode]);
  const flags = useMemo(
    // Power-screw flags in the display units (the core writes them in SI).
    () => (mode === 'screw' ? (sev?.result && sev.input ? screwFlagsInUnits(sev.result, sev.input, units) : []) : [...holeStateFlags(shown.hole, units, ascii), ...(ev.result?.flags ?? [])]),
    [mode, sev, ev, shown.hole, units, ascii],
  );
  const withRepairs = (mode === 'joint' && screen === 'repairs') || screen === 'help';
  const rep = useMemo(() => (withRepairs ? evaluateRepairs(shown, svc, ev, units) : undefined), [withRepairs, shown, svc, ev, units]);
  const {values, prompt, report: rs, preset} = state;
  const report = useMemo(
    () => (screen === 'report' ? reportText(state, svc, ev) : undefined),
    // The report reads the values, the note being typed, the format, the preset name and the units.
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [screen, values, prompt, rs.format, preset.name, mode, units, ev, svc],
  );
  const onTightening = mode === 'joint' && screen === 'joint' && stepsFor(mode)[state.step]?.id === 'tightening';
  const outlook = useMemo(() => (onTightening ? evaluateOutlook(ev, units) : undefined), [onTightening, ev, units]);
  return {ev, ...(sev ? {sev} : {}), flags, ...(rep ? {rep} : {}), ...(report ? {report} : {}), ...(outlook ? {outlook} : {})};
}
