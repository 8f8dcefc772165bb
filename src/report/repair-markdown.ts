/**
 * The Markdown work-order report of `tapwright repair --format markdown`:
 * inputs, the ranked options, reasons and notes, the ranking rule, sources,
 * cautions, date and preset name.
 */
import type {JointInput} from '../core/joint/input.js';
import type {RepairOption, RepairPlan} from '../core/repair/index.js';
import {EFFORT_SCALE_TEXT} from '../core/repair/index.js';
import {CAUTION_LINES} from '../core/cautions.js';
import {formatQuantity, type UnitSystem} from '../core/units.js';
import {cell, isoDate} from './markdown.js';
import {optionDetail} from './repair-text.js';
import {inchDrillLabel} from '../core/inch-drills.js';

export interface RepairReportMeta {
  date: Date;
  presetName?: string;
  units: UnitSystem;
}

function q(v: number | null | undefined, dim: 'length' | 'torque', units: UnitSystem): string {
  return v === null || v === undefined || !Number.isFinite(v) ? '-' : formatQuantity(v, dim, units, {significant: 3});
}

/** A drill: mm in SI; in US the standard drill that matches (27/64, Q, #7) with the decimal. */
function drillSize(v: number | null | undefined, units: UnitSystem): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return '-';
  return units === 'us' ? inchDrillLabel(v) : q(v, 'length', units);
}

function stress(v: number | undefined, units: UnitSystem): string {
  return v === undefined ? '-' : formatQuantity(v, 'stress', units, {significant: 3});
}

/** "grade 8.8", or the strengths given for a custom bolt, in the report's units. */
function boltWords(joint: JointInput, units: UnitSystem): string {
  if (joint.boltRm === undefined && joint.boltRp === undefined) return `grade ${joint.boltGrade}`;
  const given = [joint.boltRm !== undefined ? `Rm ${stress(joint.boltRm, units)}` : '', joint.boltRp !== undefined ? `Rp0.2 ${stress(joint.boltRp, units)}` : ''].filter(Boolean);
  return `custom: ${given.join(', ')} given (otherwise as grade ${joint.boltGrade})`;
}

function ratio(x: number | null): string {
  return x === null || !Number.isFinite(x) ? '-' : x.toFixed(2);
}

function state(o: RepairOption): string {
  return !o.feasible ? 'no' : o.meetsMargin ? 'yes, meets the margin' : 'yes, short of the margin';
}

export function planMarkdown(plan: RepairPlan, joint: JointInput, meta: RepairReportMeta): string {
  const u = meta.units;
  const h = plan.hole;
  const out: string[] = [];
  out.push(`# Thread repair plan: ${cell(plan.thread)}`, '');
  out.push(`Date: ${isoDate(meta.date)}${meta.presetName ? `  \nPreset: ${cell(meta.presetName)}` : ''}  \nUnits: ${u === 'us' ? 'US customary' : 'SI'}`, '');
  out.push('## Joint and hole', '', '| Input | Value |', '|---|---|');
  const rows: Array<[string, string]> = [
    ['Thread', plan.thread],
    ['Bolt', boltWords(joint, u)],
    [joint.internal === 'nut' ? 'Nut class' : 'Parent material', joint.internal === 'nut' ? (joint.nutClass ?? '-') : (joint.parent ?? `custom, Rm ${stress(joint.parentRm, u)}`)],
    ['Engaged length (screw reach)', q(joint.engagement, 'length', u)],
    ['Hole', `${h.state === 'stripped' ? `stripped to ${q(h.strippedDepth, 'length', u)}` : 'intact'}, ${h.through ? 'through' : 'blind'}`],
    [h.through ? 'Part thickness' : 'Depth available', q(h.depthAvailable, 'length', u)],
    ['Edge distance (centre line to edge)', q(h.wall, 'length', u)],
    ['Required margin', plan.requiredMargin.toFixed(2)],
  ];
  for (const [k, v] of rows) out.push(`| ${cell(k)} | ${cell(v)} |`);
  if (!plan.asIs) out.push('');
  out.push(...planSectionLines(plan, u, {level: 2}));
  out.push('## Cautions', '', ...CAUTION_LINES.map(c => `- ${cell(c)}`), '');
  return out.join('\n');
}

/**
 * The ranked plan as Markdown lines: the state as it is, the ranked options,
 * reasons and notes, the ranking rule and the sources. `level` is the heading
 * level of its parts; `chosen` (a rank) is written as the repair chosen.
 */
export function planSectionLines(plan: RepairPlan, u: UnitSystem, opts: {level: number; chosen?: number}): string[] {
  const h = plan.hole;
  const hd = '#'.repeat(opts.level);
  const out: string[] = [];
  const chosen = opts.chosen !== undefined ? plan.options.find(o => o.rank === opts.chosen) : undefined;
  if (chosen) {
    const what = [
      chosen.drill !== null && chosen.drill !== undefined ? `drill ${drillSize(chosen.drill, u)}` : null,
      chosen.tapThread ? `tap ${chosen.tapThread}` : null,
      chosen.holeDepth !== null && chosen.holeDepth !== undefined ? `hole depth ${q(chosen.holeDepth, 'length', u)}` : null,
      chosen.torque !== null && chosen.torque !== undefined ? `tighten to ${q(chosen.torque, 'torque', u)}` : null,
    ].filter(Boolean);
    out.push(`**Repair chosen:** ${chosen.rank} ${cell(chosen.label)} (${state(chosen)}; stripping margin ${ratio(chosen.margin.stripping)}, bolt breaks first ${ratio(chosen.margin.boltBreaksFirst)})${what.length ? `: ${cell(what.join(', '))}` : ''}.`, '');
  }
  if (plan.asIs) {
    if (out.at(-1) !== '') out.push('');
    out.push(`${h.state === 'stripped' ? 'As designed, before the damage' : 'As is'}: stripping margin ${ratio(plan.asIs.margin.stripping)}, bolt-breaks-first margin ${ratio(plan.asIs.margin.boltBreaksFirst)}.`);
  }
  out.push('', `${hd} Ranked options`, '');
  out.push('| # | Option | Effort | Can be done | Stripping margin | Bolt breaks first | Drill | Tap | Hole depth | Torque |');
  out.push('|---|---|---|---|---|---|---|---|---|---|');
  for (const o of plan.options) {
    out.push(`| ${o.rank} | ${cell(o.label)} | E${o.effort.grade} ${cell(o.effort.name)} | ${state(o)} | ${ratio(o.margin.stripping)} | ${ratio(o.margin.boltBreaksFirst)} | ${drillSize(o.drill, u)} | ${cell(o.tapThread ?? '-')} | ${q(o.holeDepth, 'length', u)} | ${q(o.torque, 'torque', u)} |`);
  }
  out.push('', `${hd} Reasons and notes`, '');
  for (const o of plan.options) {
    const text = optionDetail(o, u);
    if (text) out.push(`- **${o.rank} ${cell(o.label)}**: ${cell(text)}`);
  }
  for (const n of plan.notes) out.push(`- ${cell(n)}`);
  out.push('', `${hd} Ranking`, '', cell(plan.rankingRule), '', ...EFFORT_SCALE_TEXT.split('\n').map(l => `- ${cell(l)}`));
  out.push('', `${hd} Sources`, '', ...plan.sources.map(s => `- ${cell(s)}`));
  out.push('');
  return out;
}
