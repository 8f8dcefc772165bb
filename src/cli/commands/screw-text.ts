/**
 * Text output of `tapwright screw`: 80 columns, a unit on every number, flags with
 * their level word, the sources and the cautions.
 */
import type {ScrewResult} from '../../core/screw/index.js';
import {formatNumber, formatQuantity, type Dimension, type UnitSystem} from '../../core/units.js';
import {CAUTION_LINES} from '../../core/cautions.js';
import {wrapText} from '../../report/wrap.js';

const LABEL = 14;

function field(label: string, text: string): string[] {
  return wrapText(text, label.padEnd(LABEL), ' '.repeat(LABEL));
}

export function screwText(r: ScrewResult, units: UnitSystem, preset?: string): string {
  const q = (v: number, d: Dimension) => formatQuantity(v, d, units);
  const deg = (v: number) => `${formatNumber(v, 3)} deg`;
  const g = r.geometry;
  const out: string[] = ['tapwright screw - power screw check', ''];
  if (preset !== undefined) out.push(...field('Preset', preset));
  out.push(...field('Thread', `${r.thread.designation} (${r.thread.family}, ${r.geometry.starts} start${g.starts > 1 ? 's' : ''}); ${g.source}`));
  out.push(...field('Geometry', `d ${q(g.major, 'length')}, P ${q(g.pitch, 'length')}, dm ${q(g.meanDiameter, 'length')}, root ${q(g.rootDiameter, 'length')}, nut minor ${q(g.nutMinorDiameter, 'length')}, flank half-angle ${deg(g.flankAngle)}`));
  out.push(...field('Lead', `${q(r.lead, 'length')}, lead angle ${deg(r.leadAngle)}`));
  const mu = r.friction.thread;
  const muText = mu.min === mu.max ? formatNumber(mu.min, 3) : `${formatNumber(mu.min, 3)} to ${formatNumber(mu.max, 3)}`;
  const collar = r.friction.collar > 0 ? `collar ${formatNumber(r.friction.collar, 3)} on ${q(r.friction.collarDiameter, 'length')}` : 'no collar friction';
  out.push(...field('Friction', `thread ${muText}, ${collar}`));
  out.push(...field('Torque', `raise ${q(r.torque.raise, 'torque')} (thread ${q(r.torque.raiseThread, 'torque')} + collar ${q(r.torque.collar, 'torque')})`));
  out.push(...field('', `lower ${q(r.torque.lower, 'torque')} (thread ${q(r.torque.lowerThread, 'torque')} + collar ${q(r.torque.collar, 'torque')})`));
  out.push(...field('Efficiency', `${formatNumber(r.efficiency * 100, 3)} % raising with collar; thread alone ${formatNumber(r.threadEfficiency * 100, 3)} %`));
  out.push(...field('Self-locking', r.selfLocking
    ? `yes: the thread alone holds the load (it would back-drive below f = ${formatNumber(r.selfLockingFriction, 3)})`
    : `NO: the thread alone back-drives (needs f above ${formatNumber(r.selfLockingFriction, 3)})`));
  const b = r.stress.body;
  out.push(...field('Body', `axial ${q(b.axial, 'stress')}, torsion ${q(b.torsion, 'stress')}, von Mises ${q(b.vonMises, 'stress')}`));
  const t = r.stress.firstThread;
  out.push(...field('First thread', `share ${formatNumber(t.share, 2)} of the load and torque on 1 thread: bearing ${q(t.bearing, 'stress')}, root bending ${q(t.bending, 'stress')}, shear from the thread torque ${q(t.shear, 'stress')}, transverse shear at the root centre ${q(t.transverseShear, 'stress')} (not combined)`));
  out.push(...field('', `von Mises ${q(t.vonMises, 'stress')} with the thread-torque shear (screw yield ${q(r.screw.yield, 'stress')}), max shear ${q(t.maxShear, 'stress')}; Shigley p. 419 state without it ${q(t.vonMisesTextbook, 'stress')}, max shear ${q(t.maxShearTextbook, 'stress')}`));
  const n = r.nut;
  out.push(...field('Nut', `${n.materialName}, ${formatNumber(n.engagedThreads, 3)} threads engaged`));
  const allow = n.allowablePressure;
  out.push(...field('', `flank pressure ${q(n.bearingPressure, 'stress')}; ${allow ? `safe ${q(allow.min, 'stress')} to ${q(allow.max, 'stress')} (${allow.condition})` : 'no tabulated safe pressure'}`));
  const s = n.stripping;
  out.push(...field('', `strips at: nut threads ${q(s.nutForce, 'force')}, screw threads ${q(s.screwForce, 'force')}; ${s.weaker} weaker, ${formatNumber(s.margin, 3)} x load; nut threads strip at this load after ${q(s.wearToStrip, 'length')} more wear`));
  const c = r.buckling;
  out.push(...field('Column', c.checked && c.criticalLoad !== null
    ? `critical load ${q(c.criticalLoad, 'force')} (${c.method === 'euler' ? 'Euler' : 'J. B. Johnson'}, ${c.ends}, C = ${c.endConstant}, l/k ${formatNumber(c.slenderness ?? 0, 3)}), ${formatNumber(c.margin ?? 0, 3)} x load`
    : r.input.loadDirection === 'tension' ? 'not checked: the screw is in tension' : 'not checked: give --length for the unsupported length'));
  out.push('', 'Flags');
  if (r.flags.length === 0) out.push('  none');
  for (const f of r.flags) out.push(...wrapText(`${f.code}: ${f.message}`, `  ${f.level.toUpperCase().padEnd(6)}`, '        '));
  out.push('', 'Sources');
  for (const src of [...r.sources, `nut: ${n.materialSource}`, `screw: ${r.screw.materialSource}`]) out.push(...wrapText(src, '  - ', '    '));
  out.push('', 'Notes');
  for (const note of r.notes) out.push(...wrapText(note, '  - ', '    '));
  out.push('');
  for (const line of CAUTION_LINES) out.push(...wrapText(line, '', ''));
  return `${out.join('\n')}\n`;
}
