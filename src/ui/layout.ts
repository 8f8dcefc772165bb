/** Frame arithmetic shared by the view and the scroll limits: never more than rows-1 lines. */
import {CAUTION_SHORT} from '../core/cautions.js';
import {wrap} from './theme.js';

export const MIN_COLUMNS = 80;
export const MIN_ROWS = 24;

export function cautionLines(columns: number): string[] {
  return wrap(CAUTION_SHORT, columns, 3, '...');
}

/** Lines left for a screen's body: rows-1, less header, preset line, message, caution and hints. */
export function bodyHeight(size: {columns: number; rows: number}): number {
  return size.rows - 1 - 3 - cautionLines(size.columns).length - 1;
}
