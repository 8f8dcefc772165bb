/**
 * The Service section of the text and Markdown reports (issue 16): every number of
 * the service state with its method and source, its flags and notes. formatCheckText
 * and formatCheckMarkdown add it whenever the result has a service part.
 */
import type {ServiceResult} from '../core/service/result.js';
import type {Flag} from '../core/types.js';
import type {UnitSystem} from '../core/units.js';
import {levelWord, type Fmt, type Row} from './sections.js';
import {serviceGroups} from './service-sections.js';
import {toAscii, headingCase} from './text.js';
import {wrapText} from './wrap.js';
import {cell} from './markdown.js';

const LABEL = 30;

/** The service state with its flags as the report shows them (in the report's units, raised by the duty): those of `shown` with a service code. */
export function serviceShown(s: ServiceResult, shown: readonly Flag[]): ServiceResult {
  const codes = new Set(s.flags.map(x => x.code));
  return {...s, flags: shown.filter(x => codes.has(x.code))};
}

function rowLines(r: Row, wrap: (t: string, a: string, b: string) => string[]): string[] {
  const label = `  ${r.label}`;
  const first = label.length + 2 > LABEL ? `${label}  ` : label.padEnd(LABEL);
  const out = wrap(r.value, first, ' '.repeat(LABEL));
  if (r.note) out.push(...wrap(`(${r.note})`, ' '.repeat(LABEL + 2), ' '.repeat(LABEL + 3)));
  return out;
}

/** The Service section as plain text (80 columns), headed "SERVICE STATE". */
export function serviceText(s: ServiceResult, opts: {units: UnitSystem; ascii?: boolean}): string {
  const f: Fmt = {units: opts.units, ascii: opts.ascii ?? false};
  const wrap = (t: string, a: string, b: string) => wrapText(f.ascii ? toAscii(t) : t, a, b);
  const out: string[] = ['SERVICE STATE'];
  for (const g of serviceGroups(s, f)) {
    out.push('', ...wrap(headingCase(g.title), '', ''));
    for (const r of g.rows) out.push(...rowLines(r, wrap));
  }
  if (s.flags.length > 0) {
    out.push('', 'SERVICE FLAGS');
    for (const x of s.flags) {
      out.push(`  ${levelWord(x.level).padEnd(6)} ${x.code}`);
      out.push(...wrap(x.message, '         ', '         '));
    }
  }
  if (s.notes.length > 0) {
    out.push('', 'SERVICE NOTES');
    for (const n of s.notes) out.push(...wrap(n, '  - ', '    '));
  }
  out.push('', 'SERVICE SOURCES');
  for (const x of s.sources) out.push(...wrap(x, '  - ', '    '));
  const text = out.join('\n');
  return f.ascii ? toAscii(text) : text;
}

function table(head: string[], rows: string[][]): string[] {
  return [`| ${head.map(cell).join(' | ')} |`, `|${head.map(() => '---').join('|')}|`, ...rows.map(r => `| ${r.map(cell).join(' | ')} |`)];
}

/** The Service section as Markdown, starting with "## Service state". */
export function serviceMarkdown(s: ServiceResult, opts: {units: UnitSystem}): string {
  const f: Fmt = {units: opts.units, ascii: false};
  const out: string[] = ['## Service state', ''];
  for (const g of serviceGroups(s, f)) {
    out.push(`### ${g.title}`, '');
    out.push(...table(['Quantity', 'Value', 'Method and source'], g.rows.map(r => [r.label, r.value, r.note ?? ''])), '');
  }
  out.push('### Service flags', '');
  if (s.flags.length === 0) out.push('No service flags were raised.', '');
  else out.push(...table(['Level', 'Check', 'What it means'], s.flags.map(x => [levelWord(x.level), x.code, x.message])), '');
  if (s.notes.length > 0) out.push('### Service notes', '', ...s.notes.map(n => `- ${cell(n)}`), '');
  out.push('### Service sources', '', ...s.sources.map(x => `- ${cell(x)}`), '');
  return out.join('\n');
}
