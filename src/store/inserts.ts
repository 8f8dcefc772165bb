/**
 * The user's own solid key-locked insert tables, kept in presets.json under
 * "inserts" beside the presets (same lock, same atomic write). Validated with
 * the repair planner's SolidInsertTableSchema; an invalid table is kept as it
 * is and reported, never dropped.
 */
import {SolidInsertTableSchema, type SolidInsertTable, type SolidInsertTableDraft} from '../core/repair/solid-table.js';
import {describeZodError} from './schema.js';
import {StoreError} from './errors.js';
import {isPlainObject} from './guard.js';
import {keyOf, type State} from './store-file.js';

export type {SolidInsertTable, SolidInsertTableDraft};

export interface InsertTables {
  valid: Array<{table: SolidInsertTable; index: number}>;
  invalid: Array<{name?: string; reason: string; raw: unknown}>;
}

export function readInsertTables(s: State): InsertTables {
  const out: InsertTables = {valid: [], invalid: []};
  s.inserts.forEach((raw, index) => {
    const r = SolidInsertTableSchema.safeParse(raw);
    const name = isPlainObject(raw) && typeof raw.name === 'string' ? raw.name : undefined;
    if (r.success) out.valid.push({table: r.data, index});
    else out.invalid.push({...(name !== undefined ? {name} : {}), reason: `solid insert table: ${describeZodError(r.error)}`, raw});
  });
  return out;
}

/** Add or replace (with overwrite) a table by name, inside a mutation. */
export function putInsertTable(s: State, draft: SolidInsertTableDraft, overwrite: boolean): SolidInsertTable {
  const r = SolidInsertTableSchema.safeParse(draft);
  if (!r.success) throw new StoreError(`solid insert table not saved: ${describeZodError(r.error)}`);
  const existing = readInsertTables(s).valid.find(v => keyOf(v.table.name) === keyOf(r.data.name));
  if (existing && !overwrite) throw new StoreError(`a solid insert table named "${existing.table.name}" is already saved; overwrite it or choose another name`);
  if (existing) s.inserts[existing.index] = r.data;
  else s.inserts.push(r.data);
  return r.data;
}

export function dropInsertTable(s: State, name: string): void {
  const existing = readInsertTables(s).valid.find(v => keyOf(v.table.name) === keyOf(name));
  if (!existing) throw new StoreError(`no saved solid insert table named "${name}"`);
  s.inserts.splice(existing.index, 1);
}
