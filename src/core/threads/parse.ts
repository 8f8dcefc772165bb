/**
 * Thread designation parser: ISO metric (ISO 965-1 designation), unified
 * (ASME B1.1), trapezoidal (ISO 2903/2904), Acme (ASME B1.5) and square threads.
 * Case-insensitive except where ISO 965-1 uses letter case (g external, G internal),
 * tolerant of spaces and of "×" for "x".
 */
import type {Parsed, ThreadSpec} from '../types.js';
import {metricRow} from './metric-series.js';
import {seriesOf, unifiedRow, type UnifiedSeries} from './unified-series.js';
import {ACME_CLASSES, ACME_SERIES, TRAPEZOIDAL_SERIES, TR_CLASSES_EXTERNAL, TR_CLASSES_INTERNAL} from './power-series.js';
import {parseMetricClass, parseUnifiedClass, type MetricClass, type UnifiedClass} from './tolerance-class.js';
import {nearestDesignations, trimNumber} from './designations.js';

const IN = 25.4;

export const ACCEPTED_FORMS =
  'M10, M10x1.25, M10x1.5-6g, M10x1.5-6H/6g, 1/4-20 UNC-2A, #10-32 UNF-3B, 1/2-13 UNC-2A/2B, 0.250-28 UNF, Tr24x5, Tr40x14(P7), 1-5 ACME-2G, square 32x4';

/** Accepted ranges of a metric special thread (ISO 965-1 tolerance data cover 1 to 355 mm). */
const METRIC_D = {min: 1, max: 355};
const METRIC_P = {min: 0.2, max: 8};

type Fail = {ok: false; error: string; suggestions?: string[]};

function fail(error: string, text: string, suggestions?: string[]): Fail {
  const s = [...new Set(suggestions ?? nearestDesignations(text, 5))];
  return s.length ? {ok: false, error, suggestions: s} : {ok: false, error};
}

function num(s: string): number {
  return Number(s.replace(',', '.'));
}

/** Parse a typed thread designation. */
export function parseThread(text: string): Parsed<ThreadSpec> {
  const raw = (text ?? '').replace(/×/g, 'x').replace(/\s+/g, ' ').trim();
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

// ---------------------------------------------------------------- inch sizes

interface InchSize {
  label: string;
  inches: number;
}

const SIZE_RE = String.raw`(#\s*\d+|no\.?\s*\d+|\d+\s*[- ]\s*\d+\s*/\s*\d+|\d+\s*/\s*\d+|\d*\.\d+|\d+)`;

function inchSize(s: string): InchSize | undefined {
  const t = s.replace(/\s+/g, ' ').trim().toLowerCase();
  let m: RegExpExecArray | null;
  if ((m = /^(?:#|no\.?)\s*(\d+)$/.exec(t))) {
    const n = Number(m[1]);
    return {label: `#${n}`, inches: 0.06 + 0.013 * n};
  }
  if ((m = /^(\d+)\s*[- ]\s*(\d+)\s*\/\s*(\d+)$/.exec(t))) {
    const den = Number(m[3]);
    if (den === 0) return undefined;
    return {label: `${Number(m[1])}-${Number(m[2])}/${den}`, inches: Number(m[1]) + Number(m[2]) / den};
  }
  if ((m = /^(\d+)\s*\/\s*(\d+)$/.exec(t))) {
    const den = Number(m[2]);
    if (den === 0) return undefined;
    return {label: `${Number(m[1])}/${den}`, inches: Number(m[1]) / den};
  }
  const v = Number(t);
  if (!Number.isFinite(v)) return undefined;
  return {label: /\./.test(t) ? v.toFixed(4) : String(v), inches: v};
}

// ---------------------------------------------------------------- unified

const UNIFIED_RE = new RegExp(String.raw`^${SIZE_RE}\s*-\s*(\d+(?:\.\d+)?)\s*(unef|unc|unf|un)?\s*(?:-\s*)?(.*)$`, 'i');

function parseUnified(raw: string): Parsed<ThreadSpec> {
  const m = UNIFIED_RE.exec(raw);
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

// ---------------------------------------------------------------- power screws

function parseTrapezoidal(raw: string): Parsed<ThreadSpec> {
  const c = raw.replace(/\s+/g, '');
  const m = /^tr(\d+(?:[.,]\d+)?)x(\d+(?:[.,]\d+)?)(?:\(p(\d+(?:[.,]\d+)?)\))?(?:-(.*))?$/i.exec(c);
  if (!m) return fail(`trapezoidal designation "${raw}" is not understood; write Tr<diameter>x<pitch>, or Tr<diameter>x<lead>(P<pitch>) for a multi-start thread, e.g. Tr24x5, Tr40x14(P7)`, raw);
  const d = num(m[1] ?? '');
  const first = num(m[2] ?? '');
  const pitch = m[3] !== undefined ? num(m[3]) : first;
  const lead = first;
  if (!(d >= 8 && d <= 300)) return fail(`trapezoidal diameter ${trimNumber(d)} mm out of range; accepted: 8 to 300 mm`, raw);
  if (!(pitch >= 1.5 && pitch <= 44) || pitch > d / 2) return fail(`trapezoidal pitch ${trimNumber(pitch)} mm out of range; accepted: 1.5 to 44 mm and at most half the diameter`, raw);
  const starts = lead / pitch;
  if (!(Math.abs(starts - Math.round(starts)) < 1e-9) || Math.round(starts) < 1) {
    return fail(`trapezoidal lead ${trimNumber(lead)} mm is not a whole multiple of the pitch ${trimNumber(pitch)} mm; for Tr40x14(P7) the lead is 14 and the pitch 7 (2 starts)`, raw);
  }
  let ext = '7e';
  let int = '7H';
  let defaulted = true;
  if (m[4] !== undefined) {
    const parts = m[4].split('/');
    const help = `accepted: internal ${TR_CLASSES_INTERNAL.join(', ')}; external ${TR_CLASSES_EXTERNAL.join(', ')}; e.g. 7H/7e`;
    if (parts.length > 2) return fail(`trapezoidal class "${m[4]}" is not understood; ${help}`, raw);
    let gotExt = false;
    let gotInt = false;
    for (const p of parts) {
      const hit = (list: readonly string[]) => list.find(x => x.toLowerCase() === p.toLowerCase());
      const isInt = p === p.toUpperCase() || parts.length === 2 && p === parts[0];
      const i = hit(TR_CLASSES_INTERNAL);
      const e = hit(TR_CLASSES_EXTERNAL);
      if (i && (isInt || !e)) {
        int = i;
        gotInt = true;
      } else if (e) {
        ext = e;
        gotExt = true;
      } else return fail(`trapezoidal class "${p}" is not accepted; ${help}`, raw);
    }
    defaulted = !(gotExt && gotInt);
  }
  const row = TRAPEZOIDAL_SERIES.find(r => Math.abs(r.d - d) < 1e-9);
  const n = Math.round(starts);
  const sizeText = n > 1 ? `Tr${trimNumber(d)}x${trimNumber(lead)}(P${trimNumber(pitch)})` : `Tr${trimNumber(d)}x${trimNumber(pitch)}`;
  return {
    ok: true,
    value: {
      family: 'trapezoidal',
      designation: `${sizeText}-${int}/${ext}`,
      sizeLabel: `Tr${trimNumber(d)}`,
      nominal: d,
      pitch,
      isStandardPitch: !!row && row.pitches.some(p => Math.abs(p - pitch) < 1e-9),
      starts: n,
      lead,
      toleranceExternal: ext,
      toleranceInternal: int,
      toleranceDefaulted: defaulted,
    },
  };
}

const ACME_RE = new RegExp(String.raw`^${SIZE_RE}\s*-\s*(\d+(?:\.\d+)?)\s*-?\s*acme\s*(?:-\s*(.*))?$`, 'i');
const ACME_PL_RE = new RegExp(String.raw`^${SIZE_RE}\s*-\s*(\d*\.\d+)\s*p\s*-\s*(\d*\.\d+)\s*l\s*-?\s*acme\s*(?:-\s*(.*))?$`, 'i');

function parseAcme(raw: string): Parsed<ThreadSpec> {
  let sizeText: string;
  let pitchIn: number;
  let leadIn: number;
  let cls: string | undefined;
  const pl = ACME_PL_RE.exec(raw);
  const simple = pl ? null : ACME_RE.exec(raw);
  if (pl) {
    sizeText = pl[1] ?? '';
    pitchIn = Number(pl[2]);
    leadIn = Number(pl[3]);
    cls = pl[4];
  } else if (simple) {
    sizeText = simple[1] ?? '';
    const tpi = Number(simple[2]);
    if (!(tpi >= 1 && tpi <= 16)) return fail(`Acme threads per inch ${simple[2]} out of range; accepted: 1 to 16`, raw);
    pitchIn = 1 / tpi;
    leadIn = pitchIn;
    cls = simple[3];
  } else {
    return fail(`Acme designation "${raw}" is not understood; write <size>-<threads per inch> ACME-<class>, e.g. 1-5 ACME-2G, or 1.5-0.25P-0.5L-ACME-2G for multi-start`, raw);
  }
  const size = inchSize(sizeText);
  if (!size || !(size.inches >= 0.25 && size.inches <= 6)) return fail(`Acme size "${sizeText}" out of range; accepted: 1/4 to 6 in`, raw);
  const starts = leadIn / pitchIn;
  if (!(Math.abs(starts - Math.round(starts)) < 1e-6) || Math.round(starts) < 1) {
    return fail(`Acme lead ${leadIn} in is not a whole multiple of the pitch ${pitchIn} in`, raw);
  }
  let klass = '2G';
  if (cls !== undefined && cls.trim() !== '') {
    const hit = ACME_CLASSES.find(c => c.toLowerCase() === cls.trim().toLowerCase());
    if (!hit) return fail(`Acme class "${cls.trim()}" is not accepted; accepted: ${ACME_CLASSES.join(', ')}`, raw);
    klass = hit;
  }
  const row = ACME_SERIES.find(r => Math.abs(r.inches - size.inches) < 5e-4);
  const label = row?.label ?? size.label;
  const tpi = 1 / pitchIn;
  const n = Math.round(starts);
  const designation = n > 1
    ? `${label}-${trimNumber(pitchIn)}P-${trimNumber(leadIn)}L-ACME-${klass}`
    : `${label}-${trimNumber(tpi)} ACME-${klass}`;
  return {
    ok: true,
    value: {
      family: 'acme',
      designation,
      sizeLabel: label,
      nominal: size.inches * IN,
      pitch: pitchIn * IN,
      tpi,
      isStandardPitch: !!row && Math.abs(row.tpi - tpi) < 1e-6,
      starts: n,
      lead: leadIn * IN,
      toleranceExternal: klass,
      toleranceInternal: klass,
      toleranceDefaulted: cls === undefined || cls.trim() === '',
    },
  };
}

function parseSquare(raw: string): Parsed<ThreadSpec> {
  const m = /^(?:square|sq)\s*(\d+(?:[.,]\d+)?)\s*x\s*(\d+(?:[.,]\d+)?)\s*(?:\(\s*p\s*(\d+(?:[.,]\d+)?)\s*\))?$/i.exec(raw);
  if (!m) return fail(`square-thread designation "${raw}" is not understood; write square <diameter>x<pitch> in mm, e.g. square 32x4, or square 32x8(P4) for 2 starts`, raw, []);
  const d = num(m[1] ?? '');
  const first = num(m[2] ?? '');
  const pitch = m[3] !== undefined ? num(m[3]) : first;
  if (!(d >= 5 && d <= 300)) return fail(`square-thread diameter ${trimNumber(d)} mm out of range; accepted: 5 to 300 mm`, raw, []);
  if (!(pitch >= 1 && pitch <= d / 2)) return fail(`square-thread pitch ${trimNumber(pitch)} mm out of range; accepted: 1 mm to half the diameter`, raw, []);
  const starts = first / pitch;
  if (!(Math.abs(starts - Math.round(starts)) < 1e-9) || Math.round(starts) < 1) {
    return fail(`square-thread lead ${trimNumber(first)} mm is not a whole multiple of the pitch ${trimNumber(pitch)} mm`, raw, []);
  }
  const n = Math.round(starts);
  return {
    ok: true,
    value: {
      family: 'square',
      designation: n > 1 ? `square ${trimNumber(d)}x${trimNumber(first)}(P${trimNumber(pitch)})` : `square ${trimNumber(d)}x${trimNumber(pitch)}`,
      sizeLabel: `square ${trimNumber(d)}`,
      nominal: d,
      pitch,
      // No current published series for square threads: every pitch is a special one.
      isStandardPitch: false,
      starts: n,
      lead: first,
      toleranceExternal: '',
      toleranceInternal: '',
      toleranceDefaulted: true,
    },
  };
}
