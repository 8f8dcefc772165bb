/**
 * The work-order report in Markdown: header facts, work-order fields, the
 * outcome, inputs, results, flags, the limits and models used, sources,
 * cautions and a sign-off block. Same content as the text report (both come
 * from sections.ts); this one is meant to be printed or attached to a work order.
 */
import type {CheckResult} from '../core/joint/result.js';
import type {JointInput} from '../core/joint/input.js';
import type {UnitSystem} from '../core/units.js';
import {CAUTION_LINES} from '../core/cautions.js';
import {boltWords, displayFlags, displayNotes, inputRows, internalWords, levelWord, limitsLines, resultGroups, sourceLines, verdict, type Fmt, type HoleFacts} from './sections.js';
import {isoDate, reportFacts, signOff, workOrderFields, type WorkOrderNotes} from './work-order.js';
import type {Duty} from '../core/duty.js';
import {measurementsMarkdown} from './measurements.js';
import {serviceMarkdown, serviceShown} from './service-text.js';

export type {WorkOrderNotes};

export interface MarkdownMeta {
  presetName?: string;
  date: Date;
  notes?: WorkOrderNotes;
  units: UnitSystem;
  /** Further sections (Markdown, starting with a "## " heading), placed before the cautions. */
  extraSections?: string[];
  /** The hole as recorded for the repair planner (stripped or intact). */
  hole?: HoleFacts;
  /** Overrides the joint's duty (for reports of other things than a joint). */
  duty?: Duty;
}

/** Make text safe inside a Markdown table cell. */
export function cell(text: string): string {
  return text.replace(/\\/g, '\\\\').replace(/\|/g, '\\|').replace(/\r?\n/g, ' ').trim();
}

/** Make free text safe as a Markdown paragraph: no headings, lists or HTML taken from user input. */
function paragraph(text: string): string {
  return text
    .split(/\r?\n/)
    .map(l => l.replace(/</g, '&lt;').replace(/^(\s*)([#>*+-]|\d+\.)(\s)/, '$1\\$2$3'))
    .join('  \n');
}

function table(head: string[], rows: string[][]): string[] {
  return [`| ${head.map(cell).join(' | ')} |`, `|${head.map(() => '---').join('|')}|`, ...rows.map(r => `| ${r.map(cell).join(' | ')} |`)];
}

export {isoDate};

/**
 * The Markdown work-order report of a checked joint. Input and result values are in
 * working units (mm, N, N·m, MPa); the report shows them in `meta.units`.
 */
export function formatCheckMarkdown(result: CheckResult, input: JointInput, meta: MarkdownMeta): string {
  const f: Fmt = {units: meta.units, ascii: false};
  const flags = displayFlags(result, input, f);
  const v = verdict(flags);
  const notes = meta.notes ?? {};
  const out: string[] = [];

  out.push(`# Threaded joint check: ${cell(result.geometry.spec.designation)}`, '');
  const bolt = boltWords(result);
  out.push(`${bolt.charAt(0).toUpperCase()}${cell(bolt.slice(1))} in a ${cell(internalWords(result, input))}.`, '');
  const duty = meta.duty ?? input.duty;
  out.push(...table(['Report', ''], reportFacts({...meta, duty}).map(r => [r.label, r.value])), '');

  out.push('## Work order', '');
  out.push(...table(['Field', 'Entry'], workOrderFields(notes).map(r => [r.label, r.value])), '');
  if (notes.text && notes.text.trim() !== '') out.push(paragraph(notes.text.trim()), '');

  out.push('## Outcome', '');
  out.push(`**${v.word}**: ${v.text}.`, '');
  const fails = flags.filter(x => x.level === 'fail');
  for (const x of fails) out.push(`- **FAIL** ${cell(x.message)}`);
  if (fails.length) out.push('');

  out.push('## Inputs', '');
  out.push(...table(['Input', 'Value', 'Source or remark'], inputRows(result, input, f, meta.hole).map(r => [r.label, r.value, r.note ?? ''])), '');

  out.push('## Results', '');
  for (const g of resultGroups(result, input, f)) {
    out.push(`### ${g.title}`, '');
    out.push(...table(['Quantity', 'Value', 'Remark'], g.rows.map(r => [r.label, r.value, r.note ?? ''])), '');
  }

  out.push('## Flags', '');
  if (flags.length === 0) out.push('No flags were raised.', '');
  else out.push(...table(['Level', 'Check', 'What it means'], flags.map(x => [levelWord(x.level), x.code, x.message])), '');

  out.push('## Limits and models used', '');
  for (const l of limitsLines(result, f)) out.push(`- ${l}`);
  for (const n of displayNotes(result, input, f)) out.push(`- ${n}`);
  out.push('');

  out.push('## Sources', '');
  for (const s of sourceLines(result)) out.push(`- ${s}`);
  out.push('');

  const measured = measurementsMarkdown(result.stripping, {units: meta.units});
  if (measured.length > 0) out.push(...measured, '');
  if (result.service) out.push(serviceMarkdown(serviceShown(result.service, flags), f).trimEnd(), '');
  for (const section of meta.extraSections ?? []) out.push(section.trimEnd(), '');

  out.push('## Cautions', '');
  // Two trailing spaces: a hard line break, so each caution keeps its own line when rendered.
  for (const c of CAUTION_LINES) out.push(`> ${c}  `);
  out.push('');

  out.push(...signOffMarkdown(duty));
  return `${out.join('\n')}\n`;
}

/** The sign-off block in Markdown: the same words as the text report's (work-order.ts). */
export function signOffMarkdown(duty: Duty | undefined): string[] {
  const s = signOff(duty);
  const out = ['## Sign-off', '', s.mandatory ? `**${s.lead}**` : s.lead, ''];
  if (s.dutyNote) out.push(s.dutyNote, '');
  out.push(...table(['Role', 'Name', 'Signature', 'Date'], s.roles.map(r => [r, '', '', ''])), '');
  return out;
}
