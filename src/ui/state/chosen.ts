/**
 * Setting a chosen value in the workbench: the field itself and the inputs its row says it
 * sets too (FieldRow.sets; a lubricant sets both friction ranges from its pick).
 */
import {rowById} from '../../app/field-table.js';
import {setValue} from './fields.js';
import type {Values} from './workbench.js';

/** `values` with the field set to `value` and the inputs its row sets with it. */
export function setChosen(values: Values, fieldId: string, value: unknown): Values {
  let v = setValue(values, fieldId, value) as Values;
  const row = rowById(fieldId);
  if (row?.sets && value !== undefined) for (const [k, x] of Object.entries(row.sets(value))) v = setValue(v, row.group === 'joint' ? k : `${row.group}.${k}`, x) as Values;
  return v;
}
