/**
 * Plain-text check report for the terminal: every result with its unit, the
 * flags with their level word (never colour alone), the limits and sources,
 * and the cautions. Every line fits 80 columns. `ascii` keeps to 7-bit ASCII.
 */
import type {CheckResult} from '../core/joint/result.js';
import type {JointInput} from '../core/joint/input.js';
import type {UnitSystem} from '../core/units.js';
import {CAUTION_LINES} from '../core/cautions.js';
import {boltWords, displayFlags, displayNotes, inputRows, internalWords, levelWord, limitsLines, resultGroups, sourceLines, verdict, type Fmt, type Row} from './sections.js';

import {TEXT_WIDTH, wrapText} from './wrap.js';
import {signOffTextLines, workOrderTextLines, type WorkOrderMeta} from './work-order.js';
import type {HoleFacts} from './sections.js';
import {measurementsText} from './measurements.js';
import {serviceShown, serviceText} from './service-text.js';

export {TEXT_WIDTH, wrapText};
const LABEL = 36;


/**
 * A group title as a heading: the words before the first "(" in capitals, the
 * bracket as written, so units keep their case ("38 % of 32.8 kN", not "KN").
 */
export function headingCase(title: string): string {
  const i = title.indexOf('(');
  return i < 0 ? title.toUpperCase() : `${title.slice(0, i).toUpperCase()}${title.slice(i)}`;
}

type Wrap = (text: string, first: string, rest: string) => string[];

function rowLines(r: Row, wrap: Wrap): string[] {
  const label = `  ${r.label}`;
  const first = label.length + 2 > LABEL ? `${label}  ` : label.padEnd(LABEL);
  const out = wrap(r.value, first, ' '.repeat(LABEL));
  if (r.note) out.push(...wrap(`(${r.note})`, ' '.repeat(LABEL + 2), ' '.repeat(LABEL + 3)));
  return out;
}

// Written as escapes (middle dot, times, superscript 2 and 3, >=, <=, en and em dash,
// micro and mu, degree, quotes, ellipsis) so the bundle stays ASCII and V8 keeps its
// source as one byte a character.
const ASCII_MAP: [RegExp, string][] = [
  [/\u00b7/g, '*'],
  [/\u00d7/g, 'x'],
  [/\u00b2/g, '^2'],
  [/\u00b3/g, '^3'],
  [/\u2265/g, '>='],
  [/\u2264/g, '<='],
  [/[\u2013\u2014]/g, '-'],
  [/[\u00b5\u03bc]/g, 'u'],
  [/\u00b0/g, ' deg'],
  [/[\u2018\u2019]/g, "'"],
  [/[\u201c\u201d]/g, '"'],
  [/\u2026/g, '...'],
];

/** Replace the few non-ASCII symbols a report uses, and anything else left, with ASCII. */
export function toAscii(text: string): string {
  let t = text;
  for (const [re, to] of ASCII_MAP) t = t.replace(re, to);
  // Anything else non-ASCII (a name in a source, say): drop accents, else '?'.
  return t.normalize('NFKD').replace(/[\u0300-\u036f]/g, '').replace(/[^\x09\x0a\x0d\x20-\x7e]/g, '?');
}

/**
 * The text report of a checked joint, in the display units of `opts.units`.
 * Input and result values are in working units (mm, N, N·m, MPa).
 */
/**
 * `extraSections`: further plain-text blocks (e.g. the repair plan), placed before the cautions.
 * The work-order facts (date, preset, asset, location, work order, duty) and the sign-off
 * block are the same as in the Markdown report (work-order.ts).
 */
export interface TextReportOptions extends Partial<Omit<WorkOrderMeta, 'units'>> {
  units: UnitSystem;
  ascii?: boolean;
  extraSections?: string[];
  /** The hole as recorded for the repair planner (stripped or intact). */
  hole?: HoleFacts;
}

export function formatCheckText(result: CheckResult, input: JointInput, opts: TextReportOptions): string {
  const f: Fmt = {units: opts.units, ascii: opts.ascii ?? false};
  // Convert to ASCII before wrapping, so a symbol that grows ("²" -> "^2") cannot push a line past 80.
  const wrap: Wrap = (text, first, rest) => wrapText(f.ascii ? toAscii(text) : text, first, rest);
  const heavy = (f.ascii ? '=' : '═').repeat(TEXT_WIDTH);
  const light = (f.ascii ? '-' : '─').repeat(TEXT_WIDTH);
  const flags = displayFlags(result, input, f);
  const v = verdict(flags);
  const out: string[] = [];
  out.push(...wrap(`Joint check: ${result.geometry.spec.designation}, ${boltWords(result)}, ${internalWords(result, input)}`, '', '  '));
  out.push(...wrap(`${v.word}: ${v.text}`, 'RESULT ', '       '));
  out.push(heavy);

  out.push('', ...workOrderTextLines({...opts, duty: opts.duty ?? input.duty}, wrap, LABEL));

  out.push('', 'INPUTS');
  for (const r of inputRows(result, input, f, opts.hole)) out.push(...rowLines(r, wrap));

  for (const g of resultGroups(result, input, f)) {
    out.push('', ...wrap(headingCase(g.title), '', ''));
    for (const r of g.rows) out.push(...rowLines(r, wrap));
  }

  out.push('', 'FLAGS');
  if (flags.length === 0) out.push('  none');
  for (const flag of flags) {
    const word = levelWord(flag.level).padEnd(6);
    out.push(`  ${word} ${flag.code}`);
    out.push(...wrap(flag.message, '         ', '         '));
  }

  const notes = displayNotes(result, input, f);
  if (notes.length > 0) {
    out.push('', 'NOTES');
    for (const n of notes) out.push(...wrap(n, '  - ', '    '));
  }

  out.push('', 'LIMITS USED');
  for (const l of limitsLines(result, f)) out.push(...wrap(l, '  - ', '    '));

  const measured = measurementsText(result.stripping, f);
  if (measured.length > 0) out.push('', 'AS MEASURED', ...measured.slice(1));

  out.push('', 'SOURCES');
  for (const s of sourceLines(result)) out.push(...wrap(s, '  - ', '    '));

  if (result.service) out.push('', light, serviceText(serviceShown(result.service, flags), f));
  for (const section of opts.extraSections ?? []) out.push('', light, section.trimEnd());

  out.push('', light);
  for (const c of CAUTION_LINES) out.push(...wrap(c, '', '  '));
  out.push('', ...signOffTextLines(opts.duty ?? input.duty, wrap));

  const text = `${out.join('\n')}\n`;
  return f.ascii ? toAscii(text) : text; // labels and rules are ASCII already; this is a safety net
}
