/**
 * Text output of `tapwright repair`: the ranked table (80 columns), the reasons
 * and notes, the ranking rule and the cautions.
 */
import type {RepairOption, RepairPlan} from '../core/repair/index.js';
import {EFFORT_SCALE_TEXT} from '../core/repair/index.js';
import {CAUTION_LINES} from '../core/cautions.js';
import {displayUnit, toDisplay, type UnitSystem} from '../core/units.js';
import {wrapText} from './wrap.js';
import {inchDrillLabel, nearestInchDrill} from '../core/inch-drills.js';


function fit(text: string, width: number): string {
  return text.length <= width ? text.padEnd(width) : `${text.slice(0, width - 1)}~`;
}

function right(text: string, width: number): string {
  return text.length <= width ? text.padStart(width) : text.slice(0, width);
}

function ratio(x: number | null): string {
  return x === null || !Number.isFinite(x) ? '-' : x >= 100 ? '>99' : x.toFixed(2);
}

function length(mm: number | null, units: UnitSystem): string {
  if (mm === null || !Number.isFinite(mm)) return '-';
  return units === 'us' ? toDisplay(mm, 'length', 'us').toFixed(3) : mm.toFixed(mm >= 100 ? 0 : 1);
}

function torque(nm: number | null, units: UnitSystem): string {
  if (nm === null || !Number.isFinite(nm)) return '-';
  const v = toDisplay(nm, 'torque', units);
  return v >= 1000 ? v.toFixed(0) : v.toFixed(1);
}

function drill(mm: number | null, units: UnitSystem): string {
  if (mm === null) return '-';
  // US: the drill a US shop has when one matches (27/64, Q, #7), else the decimal inch size.
  if (units === 'us') {
    const d = nearestInchDrill(mm);
    return d.exact ? d.name : toDisplay(mm, 'length', 'us').toFixed(3).replace(/^0\./, '.');
  }
  // One decimal at least, two when the size has them: 9.0, 8.5, 8.75 (a bare "9" read as a count).
  return mm.toFixed(2).replace(/(\.\d)0$/, '$1');
}

function status(o: RepairOption): string {
  return !o.feasible ? 'no' : o.meetsMargin ? 'yes' : 'short';
}

/** Columns: rank 2, option 24, ok 5, strip 5, break 5, drill 5, tap 15, depth 5, torque 6 (80 wide with spaces). */
function row(cells: string[]): string {
  const [rank = '', option = '', ok = '', strip = '', brk = '', dr = '', tap = '', depth = '', tq = ''] = cells;
  return [right(rank, 2), fit(option, 24), fit(ok, 5), right(strip, 5), right(brk, 5), right(dr, 5), fit(tap, 15), right(depth, 5), right(tq, 6)].join(' ').trimEnd();
}

/**
 * What to do for one option, in sentences: the reason, what governs, insert length and
 * set-down, screw, screw length, tap and drill depths, notes. The text and the Markdown
 * plan both use it, so they carry the same facts.
 */
export function optionDetail(o: RepairOption, units: UnitSystem): string {
  const L = displayUnit('length', units, true);
  const parts: string[] = [];
  if (o.reason) parts.push(o.reason + '.');
  if (units === 'us' && o.drill !== null && o.drill !== undefined) parts.push(`Drill ${inchDrillLabel(o.drill)}.`);
  if (o.strength) parts.push(`Governs: ${o.strength.governs}.`);
  if (o.insert) {
    const sd = o.insert.setDown;
    const set = Math.abs(sd.max - sd.min) < 1e-9 ? length(sd.min, units) : `${length(sd.min, units)}..${length(sd.max, units)}`;
    parts.push(`Insert ${length(o.insert.nominalLength, units)} ${L} long, set ${set} ${L} below the surface.`);
  }
  if (o.boltThread !== undefined && o.kind === 'oversize') parts.push(`Screw ${o.boltThread}.`);
  if (o.screwLengthChange !== null && o.screwLengthChange > 1e-9) parts.push(`Screw ${length(o.screwLengthChange, units)} ${L} longer.`);
  if (o.tappedDepth !== null && o.drilledDepth !== null) parts.push(`Tap ${length(o.tappedDepth, units)} ${L} deep (full thread), drill ${length(o.drilledDepth, units)} ${L} deep at full diameter.`);
  if (o.feasible) for (const n of o.notes) parts.push(`${n[0]?.toUpperCase() ?? ''}${n.slice(1)}.`);
  return parts.join(' ');
}

/** A length with its unit, for headings. */
export function lengthText(mm: number, units: UnitSystem): string {
  return `${length(mm, units)} ${displayUnit('length', units, true)}`;
}

/** The whole text report. */
/** The ranked plan as 80-column text; `cautions: false` leaves the cautions to the report it is part of. */
export function planText(plan: RepairPlan, units: UnitSystem, heading: string, opts: {cautions?: boolean; chosen?: number} = {}): string {
  const L = displayUnit('length', units, true);
  const T = displayUnit('torque', units, true);
  const out: string[] = [];
  out.push(...wrapText(heading, '', '  '));
  const chosen = opts.chosen !== undefined ? plan.options.find(o => o.rank === opts.chosen) : undefined;
  if (chosen) {
    const how = !chosen.feasible ? 'cannot be done here' : chosen.meetsMargin ? 'meets the required margin' : 'short of the required margin';
    out.push(...wrapText(`Repair chosen: ${chosen.rank} ${chosen.label} (${how}).`, '', '  '));
  }
  const h = plan.hole;
  const hole = [
    h.state === 'stripped' ? `stripped to ${length(h.strippedDepth, units)} ${L}` : 'intact',
    h.through ? 'through' : 'blind',
    h.depthAvailable !== null ? `${h.through ? 'thickness' : 'depth available'} ${length(h.depthAvailable, units)} ${L}` : null,
    h.wall !== null ? `edge distance ${length(h.wall, units)} ${L}` : null,
  ].filter(Boolean);
  out.push(...wrapText(`Hole: ${hole.join(', ')}. Required margin ${plan.requiredMargin.toFixed(2)}.`, '', '  '));
  if (plan.asIs) {
    const label = h.state === 'stripped' ? 'As designed, before the damage' : 'As is';
    out.push(...wrapText(`${label}: stripping margin ${ratio(plan.asIs.margin.stripping)}, bolt-breaks-first margin ${ratio(plan.asIs.margin.boltBreaksFirst)}.`, '', '  '));
  }
  out.push('');
  out.push(row(['#', 'option (effort)', 'ok', 'strip', 'break', `drill`, 'tap', 'depth', 'torque']));
  out.push(row(['', '', '', 'margn', 'first', L, '', L, T]));
  for (const o of plan.options) {
    out.push(row([String(o.rank), `E${o.effort.grade} ${o.label}`, status(o), ratio(o.margin.stripping), ratio(o.margin.boltBreaksFirst), drill(o.drill, units), o.tapThread ?? '-', length(o.holeDepth, units), torque(o.torque, units)]));
  }
  out.push('');
  out.push('ok: yes = meets the margin, short = can be done but falls short, no = cannot.');
  out.push(`depth: blind-hole depth with the drill point; torque: to use afterwards.`);
  out.push('');
  for (const o of plan.options) {
    const text = optionDetail(o, units);
    if (text) out.push(...wrapText(text, `${right(String(o.rank), 2)} ${o.label}: `, '     '));
  }
  if (plan.notes.length) {
    out.push('');
    for (const n of plan.notes) out.push(...wrapText(`${n}.`, 'Note: ', '      '));
  }
  out.push('');
  out.push(...wrapText(plan.rankingRule, 'Ranking: ', '  '));
  out.push('Effort grades:');
  for (const line of EFFORT_SCALE_TEXT.split('\n')) out.push(...wrapText(line, '  ', '     '));
  if (opts.cautions !== false) {
    out.push('');
    for (const c of CAUTION_LINES) out.push(...wrapText(c, '', '  '));
  }
  return out.join('\n') + '\n';
}
