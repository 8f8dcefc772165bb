/**
 * The live results beside the inputs: every number from the core's CheckResult,
 * with its unit, plus the margin gauge and the engagement scale.
 */
import {limitsUsedText} from '../../../core/joint/measured.js';
import React from 'react';
import {Lines, type Line} from '../../components/lines.js';
import type {CheckResult} from '../../../core/joint/result.js';
import type {JointInput} from '../../../core/joint/input.js';
import {displayUnit, formatNumber, formatQuantity, toDisplay, type Dimension, type UnitSystem} from '../../../core/units.js';
import {useTheme, pad, fit, wrap} from '../../theme.js';
import {engagementScale, marginGauge} from '../../components/pictures.js';
import {serviceSummary} from '../../components/service-panel.js';

interface Props {
  result?: CheckResult;
  input?: JointInput;
  units: UnitSystem;
  width: number;
  height: number;
  /** Shown instead of the numbers when the joint cannot be computed. */
  problem?: string;
}

const FAILING_STRIP = new Set(['strips-at-preload', 'strips-before-break']);

export function Readout({result, input, units, width, height, problem}: Props) {
  const t = useTheme();
  const q = (v: number, d: Dimension, sig = 3) => formatQuantity(v, d, units, {ascii: t.ascii, significant: sig});
  const n = (v: number) => formatNumber(v, 3);
  // A margin far below 1 needs no third figure (and two keep the line inside the column).
  const marginText = (v: number) => formatNumber(v, Math.abs(v) < 0.1 ? 2 : 3);
  const num = (v: number, d: Dimension) => formatNumber(toDisplay(v, d, units), 3);
  if (!result || !input) {
    const lines: Line[] = [
      ...wrap(`! ${problem ?? 'No result yet.'}`, width, Math.max(1, height - 3), t.sym.ellipsis).map(text => ({text, color: t.tone('fail')})),
      ...wrap('The results come back as soon as the inputs are valid.', width, 2, t.sym.ellipsis),
    ];
    return <Lines lines={lines} width={width} height={height} />;
  }
  const {tightening: tg, stress, stripping: st, margin} = result;
  const ft = stress.firstThread;
  const L = (label: string) => pad(label, 11);
  const stripFail = result.flags.some(f => FAILING_STRIP.has(f.code) && f.level === 'fail');
  const need = input.requiredMargin;
  const gaugeWidth = Math.max(8, width - 11 - 14);
  const {scale, end} = engagementScale(
    st.effectiveEngagement,
    [
      {letter: 'F', at: st.requiredEngagement.fedStd},
      {letter: 'A', at: st.requiredEngagement.alexander},
    ],
    Math.max(8, width - 11 - 6),
    t,
  );
  const hole = input.internal === 'nut' ? 'nut' : 'hole';
  // The parts of the first-thread stress on one line, with three figures, or two when
  // three do not fit (ksi values carry a decimal more than MPa).
  const stressParts = (fallback: number) => {
    const text = (sig: number) => {
      const s = (v: number) => formatNumber(toDisplay(v, 'stress', units), sig);
      return `ax ${s(ft.axial)} bnd ${s(ft.bending)} sh ${s(ft.shear)} tor ${s(ft.torsion)} brg ${s(ft.bearing)} ${displayUnit('stress', units, t.ascii)}`;
    };
    const full = text(3);
    return Array.from(full).length <= width ? full : text(fallback);
  };
  const row = (_key: string, label: string, text: string, color?: string): Line => ({text: fit(`${L(label)}${text}`, width, t.sym.ellipsis), color});
  const lines: Line[] = [
    row('p', 'Preload', tg.preload.min === tg.preload.max ? `${q(tg.preload.nominal, 'force')} (no scatter)` : `${num(tg.preload.min, 'force')} to ${q(tg.preload.max, 'force')} (nom. ${num(tg.preload.nominal, 'force')})`),
    row('t', 'Torque', `${q(tg.torque, 'torque')}, stress ${formatNumber(tg.utilisation * 100, 2)}% of Rp0.2`),
    row('v', '1st thread', `von Mises ${q(ft.vonMises, 'stress')} (elastic peak)`),
    row('y', '', `= ${n(margin.firstThreadYieldBolt)}x bolt yield, ${n(margin.firstThreadYieldInternal)}x ${input.internal === 'nut' ? 'nut' : 'part'}`),
    fit(stressParts(2), width, t.sym.ellipsis),
    row('s', 'Shank', `von Mises ${q(stress.shank.vonMises, 'stress')}`),
    row('x', 'Stripping', `bolt ${q(st.external.force, 'force')}, ${hole} ${q(st.internal.force, 'force')}`),
    row('w', '', `weaker ${st.weaker === 'external' ? 'bolt' : hole}, ${limitsUsedText(st.limitsUsed)}`, stripFail ? t.tone('fail') : undefined),
    // Bolt-first compares with the upper strength Rm,max (as the margin below does); Rm,min beside it.
    row('b', 'Bolt break', st.boltBreakForceUpper !== undefined ? `${q(st.boltBreakForceUpper, 'force')} at Rm,max (${num(st.boltBreakForce, 'force')} at Rm,min)` : `${q(st.boltBreakForce, 'force')} (As x Rm)`),
    row('m', 'Margins', `stripping ${marginText(margin.stripping)}, bolt-first ${marginText(margin.boltBreaksFirst)}`),
    row('g', ' bolt-1st', `${marginGauge(margin.boltBreaksFirst, need, gaugeWidth, t)} ${t.sym.mark} ${n(need)} needed`, stripFail ? t.tone('fail') : t.tone('ok')),
    row('e', 'Engaged', `${q(st.effectiveEngagement, 'length')} full = ${formatNumber(st.engagedThreads, 2)} threads`),
    row('r', 'Needed', `F ${num(st.requiredEngagement.fedStd, 'length')} FED-STD, A ${num(st.requiredEngagement.alexander, 'length')} Alex. ${displayUnit('length', units, t.ascii)}`),
    row('sc', ` ${t.sym.barFull}=present`, `${scale} ${formatNumber(toDisplay(end, 'length', units), 2)}`),
  ];
  // The deciding service numbers (the Service step shows them all): below the rest, or in place of the last line shown.
  const service = serviceSummary(result.service, units, t.ascii);
  if (service !== undefined) lines.splice(Math.min(lines.length, height - 1), 1, row('sv', 'Service', service));
  return <Lines lines={lines} width={width} height={height} />;
}
