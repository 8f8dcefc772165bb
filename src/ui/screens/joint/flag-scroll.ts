/**
 * PgDn/PgUp on the full flag view (f): a page of flags at a time, within the
 * flags as the panel draws them (the same sizes as view.tsx and app.tsx).
 */
import {holeStateFlags} from '../../../core/joint/hole-flags.js';
import {bodyHeight} from '../../layout.js';
import {hintLines} from '../../keymap.js';
import {makeTheme} from '../../theme.js';
import type {WorkbenchServices} from '../../services.js';
import {evaluate, evaluateScrew} from '../../state/evaluate.js';
import {shownValues, type WorkbenchState} from '../../state/workbench.js';
import {clampFlagScroll, flagPanelLines, flagPanelRows} from '../../components/flags-panel.js';

/** The joint screen's panel sizes for a terminal size: the right column's width and the panel's height. */
export function flagPanelSize(size: {columns: number; rows: number}, ascii: boolean): {width: number; height: number} {
  const hintRows = hintLines(['joint', 'screens', 'any'], ascii, size.columns, new Set(['field-has-table'])).length;
  const height = bodyHeight(size, 'joint') - (hintRows - 1);
  const flagLines = Math.max(2, height - 1 - 14);
  const leftW = Math.max(34, Math.floor(size.columns * 0.42));
  return {width: size.columns - leftW - 1, height: height - 1 - flagLines};
}

export function scrollFlags(s: WorkbenchState, svc: WorkbenchServices, pages: number): WorkbenchState {
  if (!s.showFlags) return s;
  const v = shownValues(s);
  const flags = s.mode === 'screw' ? (evaluateScrew(v, svc, s.units, s.ascii).result?.flags ?? []) : [...holeStateFlags(v.hole, s.units, s.ascii), ...(evaluate(v, svc, s.units, s.ascii).result?.flags ?? [])];
  const {width, height} = flagPanelSize(s.size, s.ascii);
  const rows = flagPanelRows(height);
  const total = flagPanelLines(flags, width, makeTheme(false, s.ascii)).length;
  return {...s, flagScroll: clampFlagScroll((s.flagScroll ?? 0) + pages * rows, total, rows)};
}
