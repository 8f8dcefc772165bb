/**
 * Where each side's limits of size come from, one side at a time: a table of
 * the standard (ISO 965-1:1998 tables for metric threads, checked against the
 * ISO 965-2 limits for grade 6; the ASME B1.1 standard series limits table for
 * unified threads), or the formulas as a labelled fallback. Also the one plain
 * wording of that provenance used by the threads text, the workbench thread
 * panel and the reports.
 */
import type {LimitsSideProvenance, ThreadGeometry} from '../types.js';
import type {MetricClass, UnifiedClass} from './tolerance-class.js';
import {TABLE_SOURCE_MEMORY} from './iso965-tables.js';

const EXTERNAL_KEYS = ['es', 'Td', 'Td2'] as const;
const INTERNAL_KEYS = ['EI', 'TD1', 'TD2'] as const;

const list = (xs: readonly string[]): string =>
  xs.length <= 1 ? (xs[0] ?? '') : `${xs.slice(0, -1).join(', ')} and ${xs[xs.length - 1]}`;

/** True for the grade-6 g/h/H values, which agree with the ISO 965-2 limits of size. */
function metricChecked(c: MetricClass): boolean {
  const positionChecked = c.side === 'external' ? c.position === 'g' || c.position === 'h' : c.position === 'H';
  return c.pitchGrade === 6 && c.crestGrade === 6 && positionChecked;
}

/**
 * One side of a metric thread: `table` when its fundamental deviation and both
 * tolerances (es, Td, Td2 or EI, TD1, TD2) come from the shipped ISO 965-1
 * tables, `formula` when any of them comes from the generating formulas.
 */
export function metricSideProvenance(c: MetricClass, tableKeys: readonly string[]): LimitsSideProvenance {
  const keys = c.side === 'external' ? EXTERNAL_KEYS : INTERNAL_KEYS;
  const fromTable = keys.filter(k => tableKeys.includes(k));
  if (fromTable.length === keys.length) {
    return metricChecked(c)
      ? {
          method: 'table',
          kind: 'standard',
          source: `ISO 965-1:1998 tables of fundamental deviations and tolerances, class ${c.text} (grade-6 values agree with the ISO 965-2 limits of size)`,
        }
      : {method: 'table', kind: 'memory', source: TABLE_SOURCE_MEMORY.replace('tolerances;', `tolerances, class ${c.text};`)};
  }
  const fromFormula = keys.filter(k => !tableKeys.includes(k));
  const rest = fromTable.length > 0 ? `; ${list(fromTable)} from the ISO 965-1:1998 tables` : '';
  return {
    method: 'formula',
    kind: 'formula',
    source: `ISO 965-1 generating formulas (from memory of ISO 965-1), rounded to 1 µm, for ${list(fromFormula)} of class ${c.text}${rest}; labelled fallback, not table values`,
  };
}

const INTERNAL_FACTOR = {1: '1.95', 2: '1.3', 3: '0.975'} as const;

/**
 * One side of a unified thread: `table` when unified-table-data.ts holds the
 * row of that class, else the ASME B1.1 tolerance formulas of unified-limits.ts
 * (recalled, from memory), labelled as a fallback.
 */
export function unifiedSideProvenance(c: UnifiedClass, method: 'table' | 'formula'): LimitsSideProvenance {
  if (method === 'table') return {method, kind: 'standard', source: `ASME B1.1 standard series limits table, class ${c.text}`};
  const what =
    c.side === 'external'
      ? c.grade === 3
        ? 'pitch-diameter and major-diameter tolerances (no allowance for 3A)'
        : 'pitch-diameter tolerance, allowance and major-diameter tolerance'
      : `pitch-diameter tolerance (${INTERNAL_FACTOR[c.grade]} x that of 2A) and minor-diameter tolerance`;
  return {
    method,
    kind: 'formula',
    source: `ASME B1.1 tolerance formulas (from memory) for class ${c.text}: ${what}, rounded as in the ASME B1.1 tables; labelled fallback, not table values`,
  };
}

/** One side's provenance in display order, with its class text. */
export interface LimitsSide extends LimitsSideProvenance {
  side: 'internal' | 'external';
  /** Tolerance class of that side, e.g. "2B", "6g". */
  cls: string;
}

/** Both sides, internal first (the order of a class pair such as 6H/6g or 2B/2A). */
export function limitsSides(g: ThreadGeometry): LimitsSide[] {
  const {external: e, internal: i} = g.limits;
  return [
    {side: 'internal', cls: g.spec.toleranceInternal, method: i.method, kind: i.kind, source: i.source},
    {side: 'external', cls: g.spec.toleranceExternal, method: e.method, kind: e.kind, source: e.source},
  ];
}

/** Plain words for a method: "table" or "formulas (fallback)". */
export function methodWords(side: LimitsSideProvenance): string {
  if (side.method === 'formula') return 'formulas (fallback)';
  return side.kind === 'memory' ? 'table (from memory)' : 'table';
}

/** Plain words for where one side's values come from: "from the table", "from formulas (fallback)". */
export function fromWords(side: LimitsSideProvenance): string {
  if (side.method === 'formula') return 'from formulas (fallback)';
  return side.kind === 'memory' ? 'from the table (from memory)' : 'from the table';
}

/**
 * One short line, per side: "6H and 6g from the table",
 * "2B from the table, 2A from formulas (fallback)".
 */
export function limitsSummary(g: ThreadGeometry): string {
  const [i, e] = limitsSides(g) as [LimitsSide, LimitsSide];
  if (fromWords(i) === fromWords(e)) return `${i.cls} and ${e.cls} ${fromWords(i)}`;
  return `${i.cls} ${fromWords(i)}, ${e.cls} ${fromWords(e)}`;
}
