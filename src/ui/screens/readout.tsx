/**
 * The live results beside the inputs: every number from the core's CheckResult,
 * with its unit, plus the margin gauge and the engagement scale.
 */
import React from 'react';
import {Box, Text} from 'ink';
import type {CheckResult} from '../../core/joint/result.js';
import type {JointInput} from '../../core/joint/input.js';
import {displayUnit, formatNumber, formatQuantity, toDisplay, type Dimension, type UnitSystem} from '../../core/units.js';
import {useTheme, pad, fit} from '../theme.js';
import {engagementScale, marginGauge} from '../components/pictures.js';

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
  const ns = (v: number) => formatNumber(toDisplay(v, 'stress', units), 3);
  if (!result || !input) {
    return (
      <Box flexDirection="column" width={width} height={height}>
        <Text bold>Results</Text>
        <Text color={t.tone('fail')}>{fit(`! ${problem ?? 'No result yet.'}`, width, t.sym.ellipsis)}</Text>
        <Text>{fit('The results come back as soon as the inputs are valid.', width, t.sym.ellipsis)}</Text>
      </Box>
    );
  }
  const {tightening: tg, stress, stripping: st, margin} = result;
  const ft = stress.firstThread;
  const L = (label: string) => pad(label, 11);
  // 13 lines below the title; a taller panel leaves the rest empty.
  const weakerName = st.weaker === 'external' ? 'bolt thread' : input.internal === 'nut' ? 'nut thread' : 'hole thread';
  const stripFail = result.flags.some(f => FAILING_STRIP.has(f.code) && f.level === 'fail');
  const need = input.requiredMargin;
  const gaugeWidth = Math.max(8, width - 26);
  const {scale} = engagementScale(
    st.effectiveEngagement,
    [
      {letter: 'F', at: st.requiredEngagement.fedStd},
      {letter: 'A', at: st.requiredEngagement.alexander},
    ],
    Math.max(8, width - 11),
    t,
  );
  const lines: React.ReactNode[] = [
    <Text key="h" bold>{pad(`Results (${units === 'si' ? 'SI' : 'US'})`, width)}</Text>,
    <Text key="p">{fit(`${L('Preload')}${q(tg.preload.min, 'force')} to ${q(tg.preload.max, 'force')}, nominal ${q(tg.preload.nominal, 'force')}`, width, t.sym.ellipsis)}</Text>,
    <Text key="t">{fit(`${L('Torque')}${q(tg.torque, 'torque')}   utilisation ${n(tg.utilisation)} of Rp0.2`, width, t.sym.ellipsis)}</Text>,
    <Text key="v">{fit(`${L('1st thread')}von Mises ${q(ft.vonMises, 'stress')}`, width, t.sym.ellipsis)}</Text>,
    <Text key="y">{fit(`${L('')}of yield: bolt ${n(margin.firstThreadYieldBolt)}, ${input.internal === 'nut' ? 'nut' : 'part'} ${n(margin.firstThreadYieldInternal)}`, width, t.sym.ellipsis)}</Text>,
    <Text key="c">{fit(`  ax ${ns(ft.axial)} bnd ${ns(ft.bending)} sh ${ns(ft.shear)} tor ${ns(ft.torsion)} brg ${ns(ft.bearing)} ${displayUnit('stress', units, t.ascii)}`, width, t.sym.ellipsis)}</Text>,
    <Text key="s">{fit(`${L('Shank')}von Mises ${q(stress.shank.vonMises, 'stress')} at max preload`, width, t.sym.ellipsis)}</Text>,
    <Text key="x">
      {fit(`${L('Stripping')}bolt thread ${q(st.external.force, 'force')}, ${input.internal === 'nut' ? 'nut' : 'hole'} ${q(st.internal.force, 'force')}`, width, t.sym.ellipsis)}
    </Text>,
    <Text key="w" color={stripFail ? t.tone('fail') : undefined}>
      {fit(`${L('')}weaker: ${weakerName}; bolt breaks at ${q(st.boltBreakForce, 'force')}`, width, t.sym.ellipsis)}
    </Text>,
    <Text key="m">{fit(`${L('Margins')}stripping ${n(margin.stripping)}  bolt-breaks-first ${n(margin.boltBreaksFirst)}`, width, t.sym.ellipsis)}</Text>,
    <Text key="g" color={stripFail ? t.tone('fail') : t.tone('ok')}>
      {fit(`${L('')}${marginGauge(margin.boltBreaksFirst, need, gaugeWidth, t)} ${t.sym.mark}=need ${n(need)}`, width, t.sym.ellipsis)}
    </Text>,
    <Text key="e">
      {fit(`${L('Engaged')}${q(st.effectiveEngagement, 'length')} effective, ${formatNumber(st.engagedThreads, 2)} threads (${st.limitsUsed})`, width, t.sym.ellipsis)}
    </Text>,
    <Text key="r">
      {fit(`${L('Required')}F FED-STD-H28 ${q(st.requiredEngagement.fedStd, 'length')}  A Alexander ${q(st.requiredEngagement.alexander, 'length')}`, width, t.sym.ellipsis)}
    </Text>,
    <Text key="sc">{fit(`${L('')}${scale}`, width, t.sym.ellipsis)}</Text>,
  ];
  return (
    <Box flexDirection="column" width={width} height={height}>
      {lines.slice(0, height)}
    </Box>
  );
}
