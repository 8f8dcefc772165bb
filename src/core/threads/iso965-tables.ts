/**
 * Lookups in the shipped ISO 965-1 tables (iso965-data.ts): fundamental
 * deviations and tolerances, µm, for a metric thread and its classes.
 */
import type {MetricClass} from './tolerance-class.js';
import {DEVIATIONS, RANGES, TD1_MINOR, TD2_EXTERNAL, TD2_INTERNAL, TD_MAJOR} from './iso965-data.js';
import {trimNumber} from './designations.js';

export interface TableLookup {
  complete: boolean;
  values: Partial<{es: number; Td: number; Td2: number; EI: number; TD1: number; TD2: number}>;
  source: string;
  /** True when every value used is a grade-6 g/h/H value, which the ISO 965-2 limits confirm. */
  checked: boolean;
  /** What was not found, for the fallback note. */
  missing: string[];
}

const GRADE5 = {4: 0, 5: 1, 6: 2, 7: 3, 8: 4} as const;
const GRADE3 = {4: 0, 6: 1, 8: 2} as const;

/** Index into RANGES of the range "over lo up to and including hi" holding d, or -1. */
export function tableRange(d: number): number {
  return RANGES.findIndex(([lo, hi]) => d > lo && d <= hi);
}

function deviation(position: string, P: number): number | undefined {
  if (position === 'h' || position === 'H') return 0;
  const row = DEVIATIONS[trimNumber(P)];
  if (!row) return undefined;
  const v = {G: row[0], e: row[1], f: row[2], g: row[3]}[position as 'G' | 'e' | 'f' | 'g'];
  return v ?? undefined;
}

export const TABLE_SOURCE_CHECKED =
  'ISO 965-1:1998 tables of fundamental deviations and tolerances (6g/6H values agree with the ISO 965-2 limits of size)';
export const TABLE_SOURCE_MEMORY =
  'ISO 965-1:1998 tables of fundamental deviations and tolerances; grades other than 6 and positions e, f, G are from memory of those tables: verify against the standard';

/** Deviations and tolerances from the shipped tables; `complete` false when any is missing. */
export function tableTolerances(d: number, P: number, ext: MetricClass, int: MetricClass): TableLookup {
  const key = trimNumber(P);
  const r = tableRange(d);
  const missing: string[] = [];
  const values: TableLookup['values'] = {};
  const es = deviation(ext.position, P);
  if (es === undefined) missing.push(`es(${ext.position}) for P ${key} mm`);
  else values.es = es;
  const EI = deviation(int.position, P);
  if (EI === undefined) missing.push(`EI(${int.position}) for P ${key} mm`);
  else values.EI = EI;
  const td = TD_MAJOR[key]?.[GRADE3[ext.crestGrade as 4 | 6 | 8]];
  if (td == null) missing.push(`Td grade ${ext.crestGrade} for P ${key} mm`);
  else values.Td = td;
  const td1 = TD1_MINOR[key]?.[GRADE5[int.crestGrade as 4 | 5 | 6 | 7 | 8]];
  if (td1 == null) missing.push(`TD1 grade ${int.crestGrade} for P ${key} mm`);
  else values.TD1 = td1;
  const td2 = r < 0 ? undefined : TD2_EXTERNAL[r]?.[key]?.[GRADE5[ext.pitchGrade as 4 | 5 | 6 | 7 | 8]];
  if (td2 == null) missing.push(`Td2 grade ${ext.pitchGrade} for d ${trimNumber(d)} mm, P ${key} mm`);
  else values.Td2 = td2;
  const tD2 = r < 0 ? undefined : TD2_INTERNAL[r]?.[key]?.[GRADE5[int.pitchGrade as 4 | 5 | 6 | 7 | 8]];
  if (tD2 == null) missing.push(`TD2 grade ${int.pitchGrade} for d ${trimNumber(d)} mm, P ${key} mm`);
  else values.TD2 = tD2;
  const checked =
    ext.pitchGrade === 6 && ext.crestGrade === 6 && int.pitchGrade === 6 && int.crestGrade === 6 &&
    (ext.position === 'g' || ext.position === 'h') && int.position === 'H';
  return {
    complete: missing.length === 0,
    values,
    source: checked ? TABLE_SOURCE_CHECKED : TABLE_SOURCE_MEMORY,
    checked,
    missing,
  };
}
