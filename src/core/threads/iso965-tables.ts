/**
 * ISO 965-1 tolerance tables (placeholder until the table data land).
 */
import type {MetricClass} from './tolerance-class.js';

export interface TableLookup {
  complete: boolean;
  values: Partial<{es: number; Td: number; Td2: number; EI: number; TD1: number; TD2: number}>;
  source: string;
  /** What was not found, for the fallback note. */
  missing: string[];
}

export function tableTolerances(_d: number, _P: number, _ext: MetricClass, _int: MetricClass): TableLookup {
  return {complete: false, values: {}, source: '', missing: ['ISO 965-1 tables not yet shipped']};
}
