/**
 * Which solid key-locked insert table the repair planner uses: the user's own
 * tables kept in the preset store, else the shipped demo table (marked
 * "demo values: use the insert maker's data").
 */
import {DEMO_SOLID_INSERTS, type SolidInsertTable} from '../core/repair/index.js';
import type {PresetStore} from './store-types.js';

const key = (name: string) => name.trim().toLowerCase();

/** The user's tables, by name. */
export function storedSolidTables(store: PresetStore): SolidInsertTable[] {
  return store.insertTables().sort((a, b) => a.name.localeCompare(b.name));
}

/** Every table the planner can use: the user's first, then the shipped demo table. */
export function allSolidTables(store: PresetStore): Array<{table: SolidInsertTable; shipped: boolean}> {
  return [...storedSolidTables(store).map(table => ({table, shipped: false})), {table: DEMO_SOLID_INSERTS, shipped: true}];
}

/** A table by name (case-insensitive), the user's or the shipped one. */
export function findSolidTable(store: PresetStore, name: string): SolidInsertTable | undefined {
  return allSolidTables(store).find(t => key(t.table.name) === key(name))?.table;
}

/** The table used when none is named: the user's first table by name, else the shipped demo table. */
export function defaultSolidTable(store: PresetStore): SolidInsertTable {
  return storedSolidTables(store)[0] ?? DEMO_SOLID_INSERTS;
}
