/**
 * Thread designation parser: ISO metric (ISO 965-1 designation), unified
 * (ASME B1.1), trapezoidal (ISO 2903/2904), Acme (ASME B1.5) and square threads.
 * Case-insensitive except where ISO 965-1 uses letter case (g external, G internal),
 * tolerant of spaces and of "×" for "x".
 */
import type {Parsed, ThreadSpec} from '../types.js';
import {metricRow} from './metric-series.js';
import {seriesOf, unifiedRow, type UnifiedSeries} from './unified-series.js';
import {parseMetricClass, parseUnifiedClass, type MetricClass, type UnifiedClass} from './tolerance-class.js';
import {nearestDesignations, trimNumber} from './designations.js';
import {IN, SIZE_RE, fail, inchSize, num} from './parse-common.js';
import {parseAcme, parseSquare, parseTrapezoidal} from './parse-power.js';

export const ACCEPTED_FORMS =
  'M10, M10x1.25, M10x1.5-6g, M10x1.5-6H/6g, 1/4-20 UNC-2A, #10-32 UNF-3B, 1/2-13 UNC-2A/2B, 0.250-28 UNF, Tr24x5, Tr40x14(P7), 1-5 ACME-2G, square 32x4';

/** Accepted ranges of a metric special thread (ISO 965-1 tolerance data cover 1 to 355 mm). */
const METRIC_D = {min: 1, max: 355};
const METRIC_P = {min: 0.2, max: 8};

/**
 * Parse a typed thread designation into a ThreadSpec (lengths in mm). Forms and
 * defaults: see ACCEPTED_FORMS; a failure names the field at fault, the accepted
 * values, and the nearest standard designations.
 */
export function parseThread(text: string): Parsed<ThreadSpec> {
  const raw = (text ?? '').replace(/\u00d7/g, 'x').replace(/\s+/g, ' ').trim();
  if (raw === '') return {ok: false, error: `designation is empty; accepted forms: ${ACCEPTED_FORMS}`};
  if (/^tr\s*\d/i.test(raw)) return parseTrapezoidal(raw);
  if (/acme/i.test(raw)) return parseAcme(raw);
  if (/^(square|sq)\s*\d/i.test(raw)) return parseSquare(raw);
  if (/^m\s*\d/i.test(raw)) return parseMetric(raw);
  if (/^(#|no\.?\s*)?\s*\d/i.test(raw)) return parseUnified(raw);
  return fail(`designation "${raw}" is not recognised; accepted forms: ${ACCEPTED_FORMS}`, raw);
}

// ---------------------------------------------------------------- metric

function parseMetric(raw: string): Parsed<ThreadSpec> {
  // "M10x1.5 6g": a class after a space reads as if written with "-".
  const c = raw.replace(/(\d)\s+(?=\d[a-h](?:\d[a-h])?\s*(?:\/|$))/i, '$1-').replace(/\s+/g, '');
  const m = /^m(\d+(?:[.,]\d+)?)(?:x(\d*(?:[.,]\d+)?))?(?:-(.*))?$/i.exec(c);
  const withLength = /^m(\d+(?:[.,]\d+)?)x(\d+(?:[.,]\d+)?)x\d+(?:[.,]\d+)?$/i.exec(c);
  if (withLength) {
    const base = `M${withLength[1]}x${withLength[2]}`;
    return fail(`"${raw}" looks like a screw size with its length; the thread designation is ${base} (the length is not part of it)`, raw, [base]);
  }
  if (!m) {
    return fail(`metric designation "${raw}" is not understood; write M<diameter>[x<pitch>][-<class>], e.g. M10, M10x1.25, M10x1.5-6H/6g`, raw);
  }
  const d = num(m[1] ?? '');
  const pText = m[2];
  if (pText !== undefined && (pText === '' || !Number.isFinite(num(pText)))) {
    return fail(`metric designation "${raw}": the pitch after "x" is missing; e.g. M${trimNumber(d)}x1.5`, raw);
  }
  if (!(d >= METRIC_D.min && d <= METRIC_D.max)) {
    return fail(`metric diameter ${trimNumber(d)} mm is out of range; accepted: ${METRIC_D.min} to ${METRIC_D.max} mm`, raw);
  }
  const row = metricRow(d);
  let pitch: number;
  let series: string;
  let isStandardPitch: boolean;
  if (pText === undefined) {
    if (!row || row.coarse === undefined) {
      const fine = row ? ` (fine pitches listed: ${row.fine.map(trimNumber).join(', ')} mm)` : '';
      return fail(`M${trimNumber(d)} has no coarse pitch in ISO 261; give the pitch, e.g. M${trimNumber(d)}x${trimNumber(row?.fine[0] ?? 1)}${fine}`, raw);
    }
    pitch = row.coarse;
    series = 'coarse';
    isStandardPitch = true;
  } else {
    pitch = num(pText);
    if (!(pitch >= METRIC_P.min && pitch <= METRIC_P.max) || pitch > 0.4 * d) {
      return fail(
        `metric pitch ${trimNumber(pitch)} mm is out of range for M${trimNumber(d)}; accepted: ${METRIC_P.min} to ${METRIC_P.max} mm and at most 0.4 x diameter`,
        raw,
      );
    }
    if (row && row.coarse !== undefined && Math.abs(row.coarse - pitch) < 1e-9) {
      series = 'coarse';
      isStandardPitch = true;
    } else if (row && row.fine.some(p => Math.abs(p - pitch) < 1e-9)) {
      series = 'fine';
      isStandardPitch = true;
    } else {
      series = 'special';
      isStandardPitch = false;
    }
  }
  const base = `M${trimNumber(d)}x${trimNumber(pitch)}`;
  let ext: MetricClass | undefined;
  let int: MetricClass | undefined;
  const tol = m[3];
  if (tol !== undefined) {
    const parts = tol.split('/');
    const classSuggestions = [`${base}-6H/6g`, `${base}-6g`, `${base}-6H`];
    if (tol === '' || parts.length > 2 || parts.some(p => p === '')) {
      return fail(`metric designation "${raw}": tolerance class missing or malformed after "-"; accepted: grade 4 to 8 and position e, f, g, h or G, H, e.g. 6g, 6H, 6H/6g`, raw, classSuggestions);
    }
    if (parts.length === 2) {
      // Letter case says which is which ("6g/6H" is the same pair as "6H/6g"); when the
      // case does not tell (both upper or both lower case), the ISO order internal/external does.
      const a0 = parseMetricClass(parts[0] ?? '');
      const b0 = parseMetricClass(parts[1] ?? '');
      if (a0.ok && b0.ok && a0.value.side !== b0.value.side) {
        int = a0.value.side === 'internal' ? a0.value : b0.value;
        ext = a0.value.side === 'external' ? a0.value : b0.value;
      } else {
        const a = parseMetricClass(parts[0] ?? '', 'internal');
        if (!a.ok) return fail(`internal class (first of the pair): ${a.error}`, raw, classSuggestions);
        const b = parseMetricClass(parts[1] ?? '', 'external');
        if (!b.ok) return fail(`external class (second of the pair): ${b.error}`, raw, classSuggestions);
        int = a.value;
        ext = b.value;
      }
    } else {
      const a = parseMetricClass(parts[0] ?? '');
      if (!a.ok) return fail(a.error, raw, classSuggestions);
      if (a.value.side === 'internal') int = a.value;
      else ext = a.value;
    }
  }
  const toleranceExternal = ext?.text ?? '6g';
  const toleranceInternal = int?.text ?? '6H';
  return {
    ok: true,
    value: {
      family: 'metric',
      designation: `${base}-${toleranceInternal}/${toleranceExternal}`,
      sizeLabel: `M${trimNumber(d)}`,
      nominal: d,
      pitch,
      series,
      isStandardPitch,
      starts: 1,
      lead: pitch,
      toleranceExternal,
      toleranceInternal,
      toleranceDefaulted: !ext || !int,
    },
  };
}

// ---------------------------------------------------------------- unified

// The threads per inch is a plain decimal: "1e308" or "1.5.2" is not read as its first digits.
const UNIFIED_RE = new RegExp(String.raw`^${SIZE_RE}\s*-\s*(\d+(?:\.\d+)?)(?![.,\d]|e[+-]?\d)\s*(unef|unc|unf|un)?\s*(?:-\s*)?(.*)$`, 'i');

/** "1/4 UNC", "#10 UNF-3B": a size and a series without the threads per inch. */
const UNIFIED_NO_TPI_RE = new RegExp(String.raw`^${SIZE_RE}\s*-?\s*(unef|unc|unf)\b\s*(.*)$`, 'i');

function parseUnified(raw: string): Parsed<ThreadSpec> {
  const m = UNIFIED_RE.exec(raw);
  const bare = m ? null : UNIFIED_NO_TPI_RE.exec(raw);
  if (bare) {
    // The series gives the pitch, as "M10" gives the coarse pitch of ISO 261 (ASME B1.1 series tables).
    const size = inchSize(bare[1] ?? '');
    const series = (bare[2] ?? '').toUpperCase() as UnifiedSeries;
    const row = size ? unifiedRow(size.inches) : undefined;
    const tpi = row?.[series];
    if (!row || tpi === undefined) {
      return fail(`${row?.label ?? bare[1]} in has no ${series} pitch in ASME B1.1; give the threads per inch, e.g. ${row?.label ?? bare[1]}-8 UN`, raw);
    }
    const rest = (bare[3] ?? '').trim();
    return parseUnified(`${row.label}-${trimNumber(tpi)} ${series}${rest ? `-${rest.replace(/^-\s*/, '')}` : ''}`);
  }
  if (!m) {
    return fail(`designation "${raw}" is not understood; unified threads are written <size>-<threads per inch> <series>-<class>, e.g. 1/4-20 UNC-2A, #10-32 UNF-3B`, raw);
  }
  const size = inchSize(m[1] ?? '');
  const tpi = Number(m[2]);
  const seriesTyped = m[3]?.toUpperCase() as UnifiedSeries | 'UN' | undefined;
  const rest = (m[4] ?? '').trim();
  if (!size || !(size.inches > 0.05 && size.inches <= 6)) {
    return fail(`unified size "${m[1]}" is out of range; accepted: #0 to 6 in (e.g. #10, 1/4, 1-1/2, 0.250)`, raw);
  }
  if (!(tpi >= 2 && tpi <= 100)) return fail(`threads per inch ${m[2]} out of range; accepted: 2 to 100`, raw);
  const row = unifiedRow(size.inches);
  const label = row?.label ?? size.label;
  const inches = row?.inches ?? size.inches;
  const listed = row ? seriesOf(row, tpi) : undefined;
  let series: string;
  if (seriesTyped && seriesTyped !== 'UN') {
    const expected = row?.[seriesTyped];
    if (expected === undefined) {
      return fail(`${label} in is not a ${seriesTyped} size in ASME B1.1; use UN for a special thread (e.g. ${label}-${trimNumber(tpi)} UN) or a listed size`, raw);
    }
    if (expected !== tpi) {
      const other = listed ? ` (${label}-${trimNumber(tpi)} is ${listed})` : '';
      return fail(`${label} ${seriesTyped} has ${trimNumber(expected)} threads per inch, not ${trimNumber(tpi)}${other}`, raw, [
        `${label}-${trimNumber(expected)} ${seriesTyped}`,
        ...nearestDesignations(raw, 4),
      ]);
    }
    series = seriesTyped;
  } else {
    series = seriesTyped === 'UN' ? 'UN' : (listed ?? 'UN');
  }
  let ext: UnifiedClass | undefined;
  let int: UnifiedClass | undefined;
  if (rest !== '') {
    const parts = rest.split('/');
    const base = `${label}-${trimNumber(tpi)} ${series}`;
    const sugg = [`${base}-2A/2B`, `${base}-3A/3B`, `${base}-2A`];
    if (parts.length > 2) return fail(`class "${rest}" is not understood; accepted: 1A, 2A, 3A, 1B, 2B, 3B or a pair such as 2A/2B`, raw, sugg);
    for (const part of parts) {
      const c = parseUnifiedClass(part);
      if (!c.ok) return fail(c.error, raw, sugg);
      if (c.value.side === 'external') {
        if (ext) return fail(`class "${rest}" gives two external classes; write one A and one B class, e.g. 2A/2B`, raw, sugg);
        ext = c.value;
      } else {
        if (int) return fail(`class "${rest}" gives two internal classes; write one A and one B class, e.g. 2A/2B`, raw, sugg);
        int = c.value;
      }
    }
  }
  // A single class typed: the mate takes the same grade (3B goes with 3A); none typed: 2A/2B.
  const grade = ext?.grade ?? int?.grade ?? 2;
  const toleranceExternal = ext?.text ?? `${grade}A`;
  const toleranceInternal = int?.text ?? `${grade}B`;
  return {
    ok: true,
    value: {
      family: 'unified',
      designation: `${label}-${trimNumber(tpi)} ${series}-${toleranceExternal}/${toleranceInternal}`,
      sizeLabel: label,
      nominal: inches * IN,
      pitch: IN / tpi,
      tpi,
      series,
      isStandardPitch: listed !== undefined,
      starts: 1,
      lead: IN / tpi,
      toleranceExternal,
      toleranceInternal,
      toleranceDefaulted: !ext || !int,
    },
  };
}

