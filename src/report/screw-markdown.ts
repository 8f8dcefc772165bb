/**
 * The power-screw work-order report in Markdown: the same rows, flags, sources,
 * notes, cautions and sign-off as the text report (screw-text.ts), with the inputs
 * as given and the work-order fields.
 */
import type {ScrewInput} from '../core/screw/input.js';
import type {ScrewResult} from '../core/screw/index.js';
import type {Flag} from '../core/types.js';
import {CAUTION_LINES} from '../core/cautions.js';
import {formatQuantity, type UnitSystem} from '../core/units.js';
import {cell, signOffMarkdown} from './markdown.js';
import {levelWord, verdict} from './sections.js';
import {screwRows, screwSources} from './screw-text.js';
import {reportFacts, workOrderFields, type WorkOrderMeta} from './work-order.js';

function table(head: string[], rows: string[][]): string[] {
  return [`| ${head.map(cell).join(' | ')} |`, `|${head.map(() => '---').join('|')}|`, ...rows.map(r => `| ${r.map(cell).join(' | ')} |`)];
}

/** The inputs of a power screw as given (working units in, display units out). */
function inputRows(input: ScrewInput, units: UnitSystem): string[][] {
  const q = (v: number, d: 'length' | 'force' | 'stress' | 'speed') => formatQuantity(v, d, units);
  const mu = typeof input.muThread === 'number' ? String(input.muThread) : `${input.muThread.min}..${input.muThread.max}`;
  const rows: string[][] = [
    ['Thread', input.thread],
    ['Starts', String(input.starts)],
    ['Axial load', input.torque !== undefined && input.torqueSolves === 'load' ? `solved from the known torque, screw in ${input.loadDirection}` : `${q(input.load, 'force')}, screw in ${input.loadDirection}`],
    ['Nut', `${input.nutMaterial}, ${q(input.nutLength, 'length')} long, wear ${q(input.nutWear, 'length')}`],
    ['Screw material', input.screwMaterial ?? 'steel'],
    ['Thread friction', mu],
    ['Collar', input.muCollar > 0 ? `friction ${input.muCollar} on ${q(input.collarDiameter, 'length')}` : 'no collar friction'],
    ['Free length', input.length > 0 ? `${q(input.length, 'length')}, ends ${input.ends}` : 'not given: no column check'],
  ];
  if (input.backlash !== undefined) rows.push(['Backlash (measured, new)', `${q(input.backlash, 'length')}, ${input.backlashNew !== undefined ? q(input.backlashNew, 'length') : 'not given'}`]);
  if (input.torque !== undefined) rows.push(['Known torque', `${formatQuantity(input.torque, 'torque', units)}, solves the ${input.torqueSolves === 'load' ? 'load' : 'thread friction'}`]);
  if (input.screwYield !== undefined) rows.push(['Screw yield (given)', q(input.screwYield, 'stress')]);
  if (input.speed !== undefined) rows.push(['Sliding speed', q(input.speed, 'speed')]);
  if (input.allowablePressure !== undefined) rows.push(['Allowable flank pressure (given)', q(input.allowablePressure, 'stress')]);
  return rows;
}

/** The Markdown work-order report of `tapwright screw --format markdown` and the workbench's Report screen. */
export function screwMarkdown(r: ScrewResult, input: ScrewInput, meta: WorkOrderMeta, flags: Flag[] = r.flags): string {
  const duty = meta.duty ?? input.duty;
  const v = verdict(flags);
  const out: string[] = [`# Power screw check: ${cell(r.thread.designation)}`, ''];
  out.push(...table(['Report', ''], reportFacts({...meta, duty}).map(x => [x.label, x.value])), '');
  out.push('## Work order', '', ...table(['Field', 'Entry'], workOrderFields(meta.notes).map(x => [x.label, x.value])), '');
  const text = meta.notes?.text?.trim();
  if (text) out.push(cell(text), '');
  out.push('## Outcome', '', `**${v.word}**: ${v.text}.`, '');
  for (const f of flags.filter(x => x.level === 'fail')) out.push(`- **FAIL** ${cell(f.message)}`);
  if (flags.some(x => x.level === 'fail')) out.push('');
  out.push('## Inputs', '', ...table(['Input', 'Value'], inputRows(input, meta.units)), '');
  // Rows with an empty label continue the one above: join them into one cell.
  const rows: string[][] = [];
  for (const row of screwRows(r, meta.units)) {
    const last = rows.at(-1);
    if (row.label === '' && last) last[1] = `${last[1]}; ${row.value}`;
    else rows.push([row.label, row.value]);
  }
  out.push('## Results', '', ...table(['Quantity', 'Value'], rows), '');
  out.push('## Flags', '');
  if (flags.length === 0) out.push('No flags were raised.', '');
  else out.push(...table(['Level', 'Check', 'What it means'], flags.map(f => [levelWord(f.level), f.code, f.message])), '');
  out.push('## Notes', '', ...r.notes.map(n => `- ${cell(n)}`), '');
  out.push('## Sources', '', ...screwSources(r).map(s => `- ${cell(s)}`), '');
  out.push('## Cautions', '', ...CAUTION_LINES.map(c => `> ${c}  `), '');
  out.push(...signOffMarkdown(duty));
  return `${out.join('\n')}\n`;
}
