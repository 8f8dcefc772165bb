/** Frame arithmetic shared by the view and the scroll limits: never more than rows-1 lines. */
import {cautionLine, cautionText} from '../core/cautions.js';
import type {Screen} from './keymap.js';

export const MIN_COLUMNS = 80;
export const MIN_ROWS = 24;

/**
 * The caution under every screen: one line, the longest wording that fits (at 80
 * columns it names lifting equipment, pressure boundaries and the qualified
 * person's sign-off); on the Report screen the full caution lines, always.
 */
export function cautionLines(columns: number, screen?: Screen): string[] {
  if (screen === 'report') return cautionText(columns).split('\n');
  return [cautionLine(columns)];
}

/** Lines left for a screen's body: rows-1, less header, preset line, message, caution and hints. */
export function bodyHeight(size: {columns: number; rows: number}, screen?: Screen): number {
  return size.rows - 1 - 3 - cautionLines(size.columns, screen).length - 1;
}
