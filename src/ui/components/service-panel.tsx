/**
 * The Service step's panel beside the inputs: the joint diagram (bolt and member
 * force against elongation, src/ui/components/joint-diagram.ts) with its legend,
 * and the deciding service numbers: joint constant, clamp load kept after settling
 * and temperature, separation and fatigue factors, head pressure. Everything comes
 * from the core's ServiceResult; this only places text. Also the one-line service
 * summary the readout shows on the other steps.
 */
import React from 'react';
import type {CheckResult} from '../../core/joint/result.js';
import type {ServiceResult} from '../../core/service/result.js';
import {formatNumber, formatQuantity, toDisplay, type UnitSystem} from '../../core/units.js';
import {Lines, type Line} from './lines.js';
import {jointDiagram} from './joint-diagram.js';
import {fit, useTheme, wrap} from '../theme.js';

/** A factor; absent or infinite means there is no load to divide by. */
const factor = (x: number | undefined) => (x !== undefined && Number.isFinite(x) ? formatNumber(x, 2) : 'no load');

/** One line of the deciding service numbers for the readout ("C 0.45 kept 17.2 kN sep 5.3 fat 1.9"); undefined without clamped parts. */
export function serviceSummary(s: ServiceResult | undefined, units: UnitSystem, ascii: boolean): string | undefined {
  if (!s || s.model !== 'shared') return undefined;
  const F = (n: number) => formatQuantity(n, 'force', units, {ascii, significant: 3});
  return `C ${s.jointConstant.toFixed(2)} kept ${F(s.preloadRetained.min)} sep ${factor(s.factors.separation)}${s.factors.fatigue !== undefined ? ` fat ${factor(s.factors.fatigue)}` : ''}`;
}

interface Props {
  result?: CheckResult;
  units: UnitSystem;
  width: number;
  height: number;
  /** Shown when the joint cannot be computed. */
  problem?: string;
}

export function ServicePanel({result, units, width, height, problem}: Props) {
  const t = useTheme();
  const F = (n: number) => formatQuantity(n, 'force', units, {ascii: t.ascii, significant: 3});
  const S = (n: number) => formatQuantity(n, 'stress', units, {ascii: t.ascii, significant: 3});
  const N = (n: number) => formatNumber(toDisplay(n, 'force', units), 3);
  const say = (text: string, max: number) => wrap(text, width, max, t.sym.ellipsis);
  const s = result?.service;
  const title: Line = {text: fit('Service state', width, t.sym.ellipsis), bold: true};
  if (!result) return <Lines lines={[title, ...say(`! ${problem ?? 'No result yet.'}`, height - 1).map(text => ({text, color: t.tone('fail')}))]} width={width} height={height} />;
  if (!s) {
    const lines = [title, ...say('No service load and no clamped parts yet. Enter the service load, and the parts under the head in Clamped parts ("12 6082-T6, 20 S355"), to see the joint diagram, separation, settling and fatigue.', height - 1)];
    return <Lines lines={lines} width={width} height={height} />;
  }
  if (s.model !== 'shared') {
    const lines: Line[] = [
      title,
      ...say(`Service load ${F(s.serviceLoad.max)} taken in full by the bolt: no clamped parts given, so separation, settling and fatigue are not computed.`, 4),
      fit(`Yield (proof) factor ${factor(s.factors.yield)}, load factor ${factor(s.factors.load)}`, width, t.sym.ellipsis),
      ...say('Shigley 9th ed. Eqs. 8-28, 8-29 with C = 1.', 2).map(text => ({text, color: t.tone('dim')})),
    ];
    return <Lines lines={lines} width={width} height={height} />;
  }
  const open = s.clampUnderLoad <= 0;
  const numbers: Line[] = [
    fit(`C ${s.jointConstant.toFixed(2)}: the bolt takes ${Math.round(s.jointConstant * 100)} % of the load`, width, t.sym.ellipsis),
    fit(`Kept ${F(s.preloadRetained.min)} (settling -${N(s.embeddingLoss)}${s.thermalChange !== 0 ? `, temp ${s.thermalChange > 0 ? '+' : ''}${N(s.thermalChange)}` : ''})`, width, t.sym.ellipsis),
    {text: fit(`Opens at ${F(s.separationLoad ?? 0)}: separation factor ${factor(s.factors.separation)}`, width, t.sym.ellipsis), color: open ? t.tone('fail') : undefined, bold: open},
    fit(
      [s.factors.fatigue !== undefined ? `Fatigue ${factor(s.factors.fatigue)}` : 'Static load', `yield ${factor(s.factors.yield)}`, s.bearingPressure ? `head ${s.bearingPressure.limit !== undefined ? `${formatNumber(toDisplay(s.bearingPressure.head, 'stress', units), 3)}/${S(s.bearingPressure.limit)}` : S(s.bearingPressure.head)}` : ''].filter(Boolean).join(', '),
      width,
      t.sym.ellipsis,
    ),
  ];
  const legend: Line = {text: fit('/ bolt  \\ parts  O preload  * load  X opens', width, t.sym.ellipsis), color: t.tone('dim')};
  const diagramH = Math.max(1, Math.min(9, height - 2 - numbers.length));
  const diagram = jointDiagram(s, width, diagramH, t.ascii, units);
  return <Lines lines={[title, ...diagram, legend, ...numbers]} width={width} height={height} />;
}
