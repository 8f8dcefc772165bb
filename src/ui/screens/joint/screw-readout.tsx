/** The live results of a power screw, every number from the core's ScrewResult. */
import React from 'react';
import type {ScrewResult} from '../../../core/screw/result.js';
import {displayUnit, formatNumber, formatQuantity, toDisplay, type Dimension, type UnitSystem} from '../../../core/units.js';
import {useTheme, pad, fit, wrap} from '../../theme.js';
import {Lines, type Line} from '../../components/lines.js';
import {marginGauge} from '../../components/pictures.js';

interface Props {
  result?: ScrewResult;
  units: UnitSystem;
  width: number;
  height: number;
  problem?: string;
}

export function ScrewReadout({result: r, units, width, height, problem}: Props) {
  const t = useTheme();
  if (!r) {
    const lines: Line[] = [
      ...wrap(`! ${problem ?? 'No result yet.'}`, width, Math.max(1, height - 3), t.sym.ellipsis).map(text => ({text, color: t.tone('fail')})),
      ...wrap('The results come back as soon as the inputs are valid.', width, 2, t.sym.ellipsis),
    ];
    return <Lines lines={lines} width={width} height={height} />;
  }
  const q = (v: number, d: Dimension, sig = 3) => formatQuantity(v, d, units, {ascii: t.ascii, significant: sig});
  const n = (v: number) => formatNumber(v, 3);
  const ns = (v: number) => formatNumber(toDisplay(v, 'stress', units), 3);
  const su = displayUnit('stress', units, t.ascii);
  const L = (label: string) => pad(label, 11);
  const row = (label: string, text: string, color?: string): Line => ({text: fit(`${L(label)}${text}`, width, t.sym.ellipsis), color});
  const ft = r.stress.firstThread;
  const allow = r.nut.allowablePressure;
  const b = r.buckling;
  const lines: Line[] = [
    row('Lead', `${q(r.lead, 'length')}, lead angle ${formatNumber(r.leadAngle, 3)} deg`),
    row('Torque', `raise ${q(r.torque.raise, 'torque')}, lower ${q(r.torque.lower, 'torque')}`),
    row('', r.torqueSolve ? `${r.torqueSolve.solves === 'load' ? `raises ${q(r.torqueSolve.load, 'force')}` : `implies f ${n(r.torqueSolve.friction)}`}; collar ${q(r.torque.collar, 'torque')}` : `of which collar ${q(r.torque.collar, 'torque')}`),
    row('Efficiency', `${formatNumber(r.efficiency * 100, 2)}% (thread alone ${formatNumber(r.threadEfficiency * 100, 2)}%)`),
    row('Self-lock', r.selfLocking ? `yes, locks for f above ${n(r.selfLockingFriction)}` : `NO, back-drives (needs f > ${n(r.selfLockingFriction)})`, r.selfLocking ? undefined : t.tone('fail')),
    row('Body', `axial ${ns(r.stress.body.axial)}, torsion ${ns(r.stress.body.torsion)} ${su}`),
    row('1st thread', `von Mises ${q(ft.vonMises, 'stress')} (${formatNumber(ft.share * 100, 2)}% share)`),
    fit(` bnd ${ns(ft.bending)} brg ${ns(ft.bearing)} sh ${ns(ft.shear)} ax ${ns(ft.axial)} ${su}`, width, t.sym.ellipsis),
    row('Nut', `${formatNumber(r.nut.engagedThreads, 2)} threads, pressure ${q(r.nut.bearingPressure, 'stress')}`),
    row('', allow ? `allowed ${q(allow.min, 'stress')} to ${q(allow.max, 'stress')}` : 'allowed: give a sliding speed'),
    row('Stripping', `nut ${q(r.nut.stripping.nutForce, 'force')}, screw ${q(r.nut.stripping.screwForce, 'force')}`),
    row('', `margin ${n(r.nut.stripping.margin)} (${r.nut.stripping.weaker} weaker)`),
    r.backlash
      ? row('Backlash', `nut wear ${q(r.backlash.axialWear, 'length')}; ${r.backlash.replaceBy === null ? 'no replace-by' : `replace at ${q(r.backlash.replaceBy, 'length')}${r.backlash.replaceNow ? ' NOW' : ''}`}`, r.backlash.replaceNow ? t.tone('watch') : undefined)
      : row(' margin', `${marginGauge(r.nut.stripping.margin, 1, Math.max(8, width - 25), t)} ${t.sym.mark} 1 = even`),
    row('Buckling', b.checked && b.criticalLoad !== null ? `${q(b.criticalLoad, 'force')} ${b.method}, margin ${b.margin === null ? '-' : n(b.margin)}` : r.input.loadDirection === 'tension' ? 'not checked: the screw is in tension' : 'not checked: give the free length'),
  ];
  return <Lines lines={lines} width={width} height={height} />;
}
