/**
 * The measurement list of a joint for the reports: each measurement with its instrument,
 * where it lies between the class limits, the gauge findings, and which diameters the
 * stripping areas used per thread. Pure: built from `CheckResult.stripping`; text lines fit
 * 80 columns (wrapText), Markdown as a table. Values arrive in mm and are shown in `units`.
 * Every word and unit here is ASCII, so the text needs no ASCII conversion.
 */
import type {CheckResult} from '../core/joint/result.js';
import type {MeasurementItem} from '../core/joint/measured-items.js';
import type {UnitSystem} from '../core/units.js';
import {wrapText} from './wrap.js';

type Stripping = Pick<CheckResult['stripping'], 'limitsUsed' | 'asMeasured'>;

const IN = 25.4;

/** Text safe inside a Markdown table cell (the same rule as markdown.ts). */
function cell(text: string): string {
  return text.replace(/\\/g, '\\\\').replace(/\|/g, '\\|').replace(/\r?\n/g, ' ').trim();
}

function len(mm: number, units: UnitSystem): string {
  return units === 'us' ? `${(mm / IN).toFixed(4)} in` : `${mm.toFixed(3)} mm`;
}

/** The measured value in words: "8.979 mm (M 10.280 mm over 0.866 mm wires)" or "enters". */
export function valueWords(i: MeasurementItem, units: UnitSystem): string {
  if (i.outcome !== undefined) return i.outcome;
  const v = i.value === undefined ? '-' : len(i.value, units);
  return i.reading ? `${v} (M ${len(i.reading.measurement, units)} over ${len(i.reading.wire, units)} wires)` : v;
}

/** Where the value lies: "inside 6g 8.862 to 8.994 mm", "worn past the 6H maximum by 0.120 mm". */
export function positionText(i: MeasurementItem, units: UnitSystem): string {
  if (!i.limits || !i.position) return '';
  const {cls, min, max} = i.limits;
  const p = i.position;
  if (p.within) return `inside ${cls} (${len(min, units)} to ${len(max, units)})`;
  const which = p.side === 'below-min' ? 'minimum' : 'maximum';
  const limit = p.side === 'below-min' ? min : max;
  return p.worn
    ? `worn past the ${cls} ${which} ${len(limit, units)} by ${len(p.by, units)}`
    : `past the ${cls} ${which} ${len(limit, units)} by ${len(p.by, units)} (more material than the class allows)`;
}

const USED_WORDS = {measured: 'as measured', 'least-material': 'least-material limits', mixed: 'measured and least-material limits'} as const;

/** One line per thread: which diameters its stripping area used. */
export function limitsUsedLines(st: Stripping): string[] {
  const ub = st.asMeasured?.upperBound;
  const bound = (b: boolean | undefined) => (b ? '; NO-GO gauge entered: the force is an upper bound' : '');
  return [
    `Bolt-thread stripping area: ${USED_WORDS[st.limitsUsed.external]}${bound(ub?.external)}.`,
    `Internal-thread stripping area: ${USED_WORDS[st.limitsUsed.internal]}${bound(ub?.internal)}.`,
  ];
}

/** The "As measured" block as 80-column text lines (ASCII); empty when nothing was measured. */
export function measurementsText(st: Stripping, opts: {units: UnitSystem}): string[] {
  const m = st.asMeasured;
  if (!m) return [];
  const fix = (t: string) => t;
  const out: string[] = ['As measured'];
  for (const i of m.items) {
    out.push(...wrapText(fix(`${i.what}: ${valueWords(i, opts.units)}, ${i.instrument}`), '  ', '    '));
    const where = positionText(i, opts.units);
    if (where) out.push(...wrapText(fix(where), '    ', '    '));
  }
  for (const l of limitsUsedLines(st)) out.push(...wrapText(fix(l), '  ', '    '));
  for (const n of m.notes) out.push(...wrapText(fix(n), '  - ', '    '));
  return out;
}

/** The same block as Markdown: a table of the measurements, then the per-thread lines and notes. */
export function measurementsMarkdown(st: Stripping, opts: {units: UnitSystem}): string[] {
  const m = st.asMeasured;
  if (!m) return [];
  const out = ['## As measured', '', '| Measurement | Value | Instrument | Against the class limits |', '|---|---|---|---|'];
  for (const i of m.items) {
    out.push(`| ${cell(i.what)} | ${cell(valueWords(i, opts.units))} | ${cell(i.instrument)} | ${cell(positionText(i, opts.units) || '-')} |`);
  }
  out.push('');
  for (const l of limitsUsedLines(st)) out.push(`- ${cell(l)}`);
  for (const n of m.notes) out.push(`- ${cell(n)}`);
  return out;
}
