/**
 * The power-screw report: one list of result rows (screwRows), rendered as 80-column
 * text (`tapwright screw`) and as a Markdown work-order report (`--format markdown`),
 * both with the work-order facts, flags, sources, notes, cautions and sign-off.
 */
import type {ScrewResult} from '../core/screw/index.js';
import type {Flag} from '../core/types.js';
import {formatNumber, formatQuantity, type Dimension, type UnitSystem} from '../core/units.js';
import {CAUTION_LINES} from '../core/cautions.js';
import {wrapText} from './wrap.js';
import type {Row} from './sections.js';
import {signOffTextLines, workOrderTextLines, type WorkOrderMeta} from './work-order.js';

const LABEL = 14;

function field(label: string, text: string): string[] {
  return wrapText(text, label.padEnd(LABEL), ' '.repeat(LABEL));
}

/** Flag messages of a power screw in the display units (the core writes them in SI). */
export type FlagsInUnits = (r: ScrewResult, units: UnitSystem) => Flag[];

/** The results of a power-screw check as labelled rows, values with their units. */
export function screwRows(r: ScrewResult, units: UnitSystem): Row[] {
  const q = (v: number, d: Dimension) => formatQuantity(v, d, units);
  const deg = (v: number) => `${formatNumber(v, 3)} deg`;
  const g = r.geometry;
  const out: Row[] = [];
  const field = (label: string, value: string) => out.push({label, value});
  field('Thread', `${r.thread.designation} (${r.thread.family}, ${r.geometry.starts} start${g.starts > 1 ? 's' : ''}); ${g.source}`);
  field('Geometry', `d ${q(g.major, 'length')}, P ${q(g.pitch, 'length')}, dm ${q(g.meanDiameter, 'length')}, root ${q(g.rootDiameter, 'length')}, nut minor ${q(g.nutMinorDiameter, 'length')}, flank half-angle ${deg(g.flankAngle)}`);
  field('Lead', `${q(r.lead, 'length')}, lead angle ${deg(r.leadAngle)}`);
  const mu = r.friction.thread;
  const muText = mu.min === mu.max ? formatNumber(mu.min, 3) : `${formatNumber(mu.min, 3)} to ${formatNumber(mu.max, 3)}`;
  const collar = r.friction.collar > 0 ? `collar ${formatNumber(r.friction.collar, 3)} on ${q(r.friction.collarDiameter, 'length')}` : 'no collar friction';
  field('Friction', `thread ${muText}, ${collar}`);
  const ts = r.torqueSolve;
  if (ts) {
    field('Torque given', ts.solves === 'load'
      ? `${q(ts.torque, 'torque')} raises ${q(ts.load, 'force')} (load solved at thread friction ${formatNumber(ts.friction, 3)})`
      : `${q(ts.torque, 'torque')} at ${q(ts.load, 'force')} implies thread friction ${formatNumber(ts.friction, 3)}`);
  }
  field('Torque', `raise ${q(r.torque.raise, 'torque')} (thread ${q(r.torque.raiseThread, 'torque')} + collar ${q(r.torque.collar, 'torque')})`);
  field('', `lower ${q(r.torque.lower, 'torque')} (thread ${q(r.torque.lowerThread, 'torque')} + collar ${q(r.torque.collar, 'torque')})`);
  field('Efficiency', `${formatNumber(r.efficiency * 100, 3)} % raising with collar; thread alone ${formatNumber(r.threadEfficiency * 100, 3)} %`);
  field('Self-locking', r.selfLocking
    ? `yes: the thread alone holds the load (it would back-drive below f = ${formatNumber(r.selfLockingFriction, 3)})`
    : `NO: the thread alone back-drives (needs f above ${formatNumber(r.selfLockingFriction, 3)})`);
  const b = r.stress.body;
  field('Body', `axial ${q(b.axial, 'stress')}, torsion ${q(b.torsion, 'stress')}, von Mises ${q(b.vonMises, 'stress')}`);
  const t = r.stress.firstThread;
  field('First thread', `share ${formatNumber(t.share, 2)} of the load and torque on 1 thread: bearing ${q(t.bearing, 'stress')}, root bending ${q(t.bending, 'stress')}, shear from the thread torque ${q(t.shear, 'stress')}, transverse shear at the root centre ${q(t.transverseShear, 'stress')} (not combined)`);
  field('', `von Mises ${q(t.vonMises, 'stress')} with the thread-torque shear (screw yield ${q(r.screw.yield, 'stress')}), max shear ${q(t.maxShear, 'stress')}; Shigley p. 419 state without it ${q(t.vonMisesTextbook, 'stress')}, max shear ${q(t.maxShearTextbook, 'stress')}`);
  const n = r.nut;
  field('Nut', `${n.materialName}, ${formatNumber(n.engagedThreads, 3)} threads engaged`);
  const allow = n.allowablePressure;
  field('', `flank pressure ${q(n.bearingPressure, 'stress')}; ${allow ? `safe ${q(allow.min, 'stress')} to ${q(allow.max, 'stress')} (${allow.condition})` : 'no tabulated safe pressure'}`);
  const s = n.stripping;
  field('', `strips at: nut threads ${q(s.nutForce, 'force')}, screw threads ${q(s.screwForce, 'force')}; ${s.weaker} weaker, ${formatNumber(s.margin, 3)} x load; nut threads strip at this load after ${q(s.wearToStrip, 'length')} more wear`);
  out.push(...backlashRows(r, units));
  const c = r.buckling;
  field('Column', c.checked && c.criticalLoad !== null
    ? `critical load ${q(c.criticalLoad, 'force')} (${c.method === 'euler' ? 'Euler' : 'J. B. Johnson'}, ${c.ends}, C = ${c.endConstant}, l/k ${formatNumber(c.slenderness ?? 0, 3)}), ${formatNumber(c.margin ?? 0, 3)} x load`
    : r.input.loadDirection === 'tension' ? 'not checked: the screw is in tension' : 'not checked: give --length for the unsupported length');
  return out;
}

/** The worn-nut rows of a screw checked with a measured backlash (none without one). */
export function backlashRows(r: ScrewResult, units: UnitSystem): Row[] {
  const b = r.backlash;
  if (!b) return [];
  const q = (v: number) => formatQuantity(v, 'length', units, {significant: 3});
  const replace = b.replaceBy === null
    ? `no replace-by backlash: ${b.reason ?? 'not found'}`
    : `replace the nut at a backlash of ${q(b.replaceBy)}${b.replaceNow ? ': REACHED, replace now' : ''}`;
  return [
    {label: 'Backlash', value: `measured ${q(b.measured)}, new ${q(b.new)}: nut wear ${q(b.axialWear)} axial (${q(b.flankWear)} normal to the flank), used as the nut wear`},
    {label: '', value: `stripping margin left ${formatNumber(b.marginLeft, 3)} x load (to keep: ${formatNumber(b.requiredMargin, 3)}); ${replace}`},
  ];
}

/** Sources of a power-screw result, with the two materials'. */
export function screwSources(r: ScrewResult): string[] {
  return [...r.sources, `nut: ${r.nut.materialSource}`, `screw: ${r.screw.materialSource}`];
}

/** The 80-column text report of `tapwright screw`. `meta` adds the work-order facts and the sign-off. */
export function screwText(r: ScrewResult, units: UnitSystem, preset?: string, meta?: Omit<WorkOrderMeta, 'units'>, flags: Flag[] = r.flags): string {
  const out: string[] = ['tapwright screw - power screw check', ''];
  const m: WorkOrderMeta = {units, ...(preset !== undefined ? {presetName: preset} : {}), ...meta, duty: meta?.duty ?? 'general'};
  out.push(...workOrderTextLines(m, wrapText, LABEL + 6), '');
  for (const row of screwRows(r, units)) out.push(...field(row.label, row.value));
  out.push('', 'Flags');
  if (flags.length === 0) out.push('  none');
  for (const f of flags) out.push(...wrapText(`${f.code}: ${f.message}`, `  ${f.level.toUpperCase().padEnd(6)}`, '        '));
  out.push('', 'Sources');
  for (const src of screwSources(r)) out.push(...wrapText(src, '  - ', '    '));
  out.push('', 'Notes');
  for (const note of r.notes) out.push(...wrapText(note, '  - ', '    '));
  out.push('');
  for (const line of CAUTION_LINES) out.push(...wrapText(line, '', ''));
  out.push('', ...signOffTextLines(m.duty, wrapText));
  return `${out.join('\n')}\n`;
}
