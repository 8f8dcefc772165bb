/**
 * The Repairs screen's detail of the marked repair (pure): every line whole,
 * wrapped to the width, and the window of it that fits, scrolled with PgUp/PgDn.
 * Lengths and drills in the units on screen: in US units a drill is the
 * fractional, number or letter drill a US shop has, with the decimal beside.
 */
import type {RepairOption} from '../../../core/repair/types.js';
import {formatQuantity, type UnitSystem} from '../../../core/units.js';
import {inchDrillLabel, nearestInchDrill} from '../../../core/inch-drills.js';
import {CONVERSION} from '../../../core/units.js';
import {EFFORT_SCALE} from '../../../core/repair/rank.js';
import {levelWord} from '../../../report/sections.js';
import {wrap} from '../../theme.js';

/** The drill in the list's column: "8.50 mm"; US: "Q", "27/64" or "0.3346 in". */
export function drillCell(mm: number | null | undefined, units: UnitSystem, ascii: boolean): string {
  if (mm === undefined || mm === null) return '-';
  if (units === 'si') return formatQuantity(mm, 'length', units, {ascii, significant: 3});
  const d = nearestInchDrill(mm);
  return d.exact ? d.name : `${(mm / CONVERSION.IN_MM).toFixed(4)} in`;
}

/** The drill in the detail: "8.50 mm"; US: "27/64 (0.4219 in)" or "0.3346 in (nearest Q 0.332)". */
export function drillText(mm: number | null | undefined, units: UnitSystem, ascii: boolean): string {
  if (mm === undefined || mm === null) return '-';
  return units === 'si' ? formatQuantity(mm, 'length', units, {ascii, significant: 3}) : inchDrillLabel(mm);
}

/** The effort codes with their words, for the line under the list: "Effort: E1 chase, E2 deepen, ...". */
export const EFFORT_LEGEND = `Effort: ${Object.values(EFFORT_SCALE)
  .sort((a, b) => a.grade - b.grade)
  .map(e => `E${e.grade} ${e.name}`)
  .join(', ')}`;

/** Every line of the marked repair's detail, wrapped whole to `width` (continuations indented two spaces). */
export function detailLines(o: RepairOption, units: UnitSystem, width: number, ascii: boolean): string[] {
  const L = (v?: number | null) => (v === undefined || v === null ? '-' : formatQuantity(v, 'length', units, {ascii, significant: 3}));
  const items = [
    `${o.label}: ${!o.feasible ? 'cannot be done here' : o.meetsMargin ? 'meets the required margin' : 'can be done, short of the margin'}${o.reason ? `: ${o.reason}` : ''}`,
    `drill ${drillText(o.drill, units, ascii)}  tap ${o.tapThread ?? '-'}  hole depth ${L(o.holeDepth)}  torque ${o.torque === null ? '-' : formatQuantity(o.torque, 'torque', units, {ascii})}`,
    `Effort E${o.effort.grade} ${o.effort.name}: ${o.effort.text}`,
    ...(o.strength ? [`strength: ${o.strength.parts.map(p => `${p.name} ${formatQuantity(p.force, 'force', units, {ascii})}`).join(', ')}; governs: ${o.strength.governs}`] : []),
    ...o.flags.map(f => `${levelWord(f.level)} ${f.message}`),
    ...o.notes,
  ];
  return items.flatMap(text => wrap(text, width - 2, 1000, '').map((l, i) => (i ? `  ${l}` : l)));
}

/** The top line of the detail window: within the lines, so the last page is full. */
export function clampDetail(scroll: number, total: number, room: number): number {
  return Math.max(0, Math.min(scroll, total - room));
}

/**
 * The detail window: `room` lines from `scroll`; when the detail is longer, the
 * last line says where it is and that PgDn/PgUp move through it.
 */
export function detailWindow(lines: readonly string[], scroll: number, room: number, ascii: boolean): {lines: string[]; top: number} {
  if (room <= 0) return {lines: [], top: 0};
  if (lines.length <= room) return {lines: [...lines], top: 0};
  const shown = Math.max(1, room - 1);
  const top = clampDetail(scroll, lines.length, shown);
  const end = Math.min(lines.length, top + shown);
  const more = end < lines.length ? 'PgDn more' : 'end';
  const marker = `-- detail lines ${top + 1}-${end} of ${lines.length}; ${more}${top > 0 ? ', PgUp back' : ''} --`;
  return {lines: [...lines.slice(top, end), ascii ? marker : marker], top};
}

/** How the Repairs body splits: the list rows (at most half) and the lines left for the detail. */
export function repairsLayout(height: number, options: number): {listRows: number; room: number} {
  const listRows = Math.min(options, Math.max(3, Math.floor((height - 4) / 2)));
  // Title, column header, the effort legend and the repair-chosen line.
  return {listRows, room: Math.max(0, height - listRows - 4)};
}
