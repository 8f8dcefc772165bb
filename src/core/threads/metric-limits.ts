/**
 * Limits of size of ISO metric threads (ISO 965-1 principles): from the
 * fundamental deviations and tolerances, which come from the shipped ISO 965-1
 * tables when the pitch and diameter are tabulated, and from the generating
 * formulas (labelled fallback) otherwise.
 *
 *   external: d max = d + es, d min = d max - Td, d2 max = d2 + es, d2 min = d2 max - Td2,
 *             d3 min = d2 min - 2(H/2 - 0.125P), d2 min unrounded (minimum root
 *             radius 0.125P; this reproduces the ISO 965-2 6g d3 min values M3 to M12)
 *   internal: D1 min = D1 + EI, D1 max = D1 min + TD1, D2 min = D2 + EI,
 *             D2 max = D2 min + TD2, D min = D + EI
 * All in mm; deviations and tolerances in µm.
 */
import type {ExternalLimits, InternalLimits, LimitsSideProvenance, Provenance} from '../types.js';
import type {MetricClass} from './tolerance-class.js';
import {formulaDeviation, formulaTd, formulaTD1, formulaTd2, formulaTD2} from './iso965-formulas.js';
import {tableTolerances} from './iso965-tables.js';
import {metricSideProvenance} from './limits-provenance.js';

export interface MetricTolerances {
  /** Upper deviation of the external thread, µm (<= 0). */
  es: number;
  Td: number;
  Td2: number;
  /** Lower deviation of the internal thread, µm (>= 0). */
  EI: number;
  TD1: number;
  TD2: number;
}

export interface MetricLimitsResult {
  external: ExternalLimits & LimitsSideProvenance;
  internal: InternalLimits & LimitsSideProvenance;
  tolerances: MetricTolerances;
  provenance: Provenance & {method: 'table' | 'formula'};
  notes: string[];
}

const r3 = (x: number): number => Math.round(x * 1000) / 1000;

/** Deviations and tolerances for a class pair: table when available, else formulas. */
export function metricTolerances(
  d: number,
  P: number,
  ext: MetricClass,
  int: MetricClass,
): {tol: MetricTolerances; method: 'table' | 'formula'; source: string; checked: boolean; missing: string[]; tableKeys: string[]} {
  const t = tableTolerances(d, P, ext, int);
  const tableKeys = Object.keys(t.values);
  if (t.complete) return {tol: t.values as MetricTolerances, method: 'table', source: t.source, checked: t.checked, missing: [], tableKeys};
  // Per value: the table where it has an entry, the generating formula where it has none.
  const v = t.values;
  const f: MetricTolerances = {
    es: v.es ?? formulaDeviation(ext.position, P),
    Td: v.Td ?? formulaTd(P, ext.crestGrade),
    Td2: v.Td2 ?? formulaTd2(d, P, ext.pitchGrade),
    EI: v.EI ?? formulaDeviation(int.position, P),
    TD1: v.TD1 ?? formulaTD1(P, int.crestGrade),
    TD2: v.TD2 ?? formulaTD2(d, P, int.pitchGrade),
  };
  const partial = Object.keys(v).length > 0;
  return {
    tol: f,
    method: 'formula',
    source: partial
      ? 'ISO 965-1 generating formulas (from memory of ISO 965-1), rounded to 1 µm, for the values the shipped ISO 965-1 tables lack; the rest from those tables'
      : 'ISO 965-1 generating formulas (from memory of ISO 965-1), rounded to 1 µm',
    checked: false,
    missing: t.missing,
    tableKeys,
  };
}

function summarise(missing: string[]): string {
  if (missing.length === 0) return 'entry';
  return missing.length <= 2 ? missing.join(' or ') : `${missing.slice(0, 2).join(', ')} and ${missing.length - 2} more`;
}

/** Limits of size, mm, for the metric thread d x P with the given classes. */
export function metricLimits(d: number, P: number, ext: MetricClass, int: MetricClass): MetricLimitsResult {
  const H = 0.8660254037844386 * P;
  const d2 = d - 0.649519052838329 * P;
  const D1 = d - 1.0825317547305482 * P;
  const {tol, method, source, checked, missing, tableKeys} = metricTolerances(d, P, ext, int);
  const es = tol.es / 1000;
  const EI = tol.EI / 1000;
  const pitchMax = r3(d2 + es);
  const pitchMinExact = d2 + es - tol.Td2 / 1000;
  const pitchMin = r3(pitchMinExact);
  const majorMax = r3(d + es);
  const external: ExternalLimits & LimitsSideProvenance = {
    majorMax,
    majorMin: r3(majorMax - tol.Td / 1000),
    pitchMax,
    pitchMin,
    minorMin: r3(pitchMinExact - 2 * (H / 2 - 0.125 * P)),
    ...metricSideProvenance(ext, tableKeys),
  };
  const minorMin = r3(D1 + EI);
  const pitchMinI = r3(d2 + EI);
  const internal: InternalLimits & LimitsSideProvenance = {
    minorMin,
    minorMax: r3(minorMin + tol.TD1 / 1000),
    pitchMin: pitchMinI,
    pitchMax: r3(pitchMinI + tol.TD2 / 1000),
    majorMin: r3(d + EI),
    ...metricSideProvenance(int, tableKeys),
  };
  const notes: string[] = [];
  if (method === 'formula') {
    notes.push(
      `Limits of size computed from the ISO 965-1 generating formulas (the shipped ISO 965-1 tables have no ${summarise(missing)}): ` +
        'the published tables round differently, so these may differ from ISO 965-2/-3 by a few µm. Check against the standard before gauging.',
    );
  }
  if (method === 'table' && !checked) {
    notes.push('Grades other than 6 and positions e, f, G come from memory of the ISO 965-1 tables: verify against the standard before gauging.');
  }
  notes.push('External minor diameter min assumes the minimum root radius 0.125P of ISO 965-1.');
  return {
    external,
    internal,
    tolerances: tol,
    provenance: {source, kind: method === 'formula' ? 'formula' : checked ? 'standard' : 'memory', method},
    notes,
  };
}
