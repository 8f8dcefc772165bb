/**
 * The Tightening step's right-hand panel: the tightening window as a picture (window-picture.ts),
 * the torque to set on the wrench with a locking element's prevailing torque, and the ranked
 * "what matters most" list with bars where the height allows. It only lays out what
 * src/app/tightening.ts computed (through use-derived.ts).
 */
import React from 'react';
import {formatNumber, formatQuantity, toDisplay, type UnitSystem} from '../../core/units.js';
import {INPUT_WORDS, MARGIN_WORDS, effectBar} from '../../report/window-sections.js';
import type {OutlookEvaluation} from '../state/outlook.js';
import {fit, useTheme, wrap} from '../theme.js';
import {Lines, type Line} from './lines.js';
import {windowPicture} from './window-picture.js';

interface Props {
  ev: OutlookEvaluation;
  units: UnitSystem;
  width: number;
  height: number;
  /** Why the joint is not computed, when it is not. */
  problem?: string;
}

/** Short names of the deciding margins for the panel's narrow column. */
const SHORT_MARGIN: Record<keyof typeof MARGIN_WORDS, string> = {stripping: 'stripping', 'bolt-breaks-first': 'bolt-first', 'yield-reserve': 'yield reserve'};

export function WindowPanel({ev, units, width, height, problem}: Props) {
  const t = useTheme();
  const o = ev.outlook;
  if (!o) {
    const why = ev.error ?? problem ?? 'No result yet.';
    const lines: Line[] = wrap(`! ${why}`, width, Math.max(1, height - 1), t.sym.ellipsis).map(text => ({text, color: t.tone('fail')}));
    return <Lines lines={lines} width={width} height={height} />;
  }
  const w = o.window;
  const tq = (x: number) => formatQuantity(x, 'torque', units, {ascii: t.ascii, significant: 3});
  const n = (x: number) => formatNumber(x, 3);
  const extra: Line[] = [];
  const num = (x: number) => formatNumber(toDisplay(x, 'torque', units), 3);
  if (w.wrench) extra.push({text: fit(`Wrench ${num(w.wrench.min)} to ${tq(w.wrench.max)} (+${num(w.wrench.prevailing)} locking)`, width, t.sym.ellipsis), bold: true});
  else if (o.prevailing) extra.push({text: fit(`Prevailing torque ${tq(o.prevailing.torque)}: add on the wrench`, width, t.sym.ellipsis)});
  // The ranked list: a heading and up to four inputs, as far as the height leaves after a picture of 9 lines.
  const room = height - 9 - extra.length;
  const sens: Line[] = [];
  if (room >= 2 && o.sensitivity.length > 0) {
    const largest = Math.max(0, ...o.sensitivity.map(i => i.effect));
    sens.push({text: fit(`Matters most: ${SHORT_MARGIN[o.margin.name]} ${n(o.margin.value)}, needs ${n(o.margin.required)}`, width, t.sym.ellipsis), bold: true});
    const barW = Math.max(4, Math.min(10, width - 16 - 16));
    for (const i of o.sensitivity.slice(0, Math.min(4, room - 1))) {
      sens.push({text: fit(`${INPUT_WORDS[i.input].padEnd(15)} ${effectBar(i.effect, largest, barW, t.ascii)} ${n(i.low)} to ${n(i.high)}`, width, t.sym.ellipsis), color: i === o.sensitivity[0] ? undefined : t.tone('dim')});
    }
  }
  const pictureH = Math.max(5, height - extra.length - sens.length);
  const picture = windowPicture(w, width, pictureH, t.ascii, units).map((text): Line => (w.empty ? {text, color: t.tone('fail')} : text));
  return <Lines lines={[...picture, ...extra, ...sens]} width={width} height={height} />;
}
