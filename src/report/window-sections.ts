/**
 * The tightening window and the sensitivity list as report content, shared by the text and
 * Markdown renderers so the two say the same. Values arrive in working units (N, N·m) from
 * src/core/joint/window.ts and sensitivity.ts and are formatted here in the wrench's units.
 */
import type {TighteningWindow, WindowLimit, WindowLimitName} from '../core/joint/window.js';
import type {DecidingMargin, MarginName, SensitivityItem} from '../core/joint/sensitivity.js';
import {formatNumber, formatQuantity, type UnitSystem} from '../core/units.js';

export interface WindowFmt {
  units: UnitSystem;
  ascii: boolean;
}

export const LIMIT_WORDS: Record<WindowLimitName, string> = {
  'yield-utilisation': 'yield utilisation limit',
  stripping: 'thread stripping',
  'bolt-break': 'bolt break',
  'least-clamp': 'least clamp load of the service',
  'service-load': 'service load (no separation)',
  'preload-floor': 'preload floor',
};

export const MARGIN_WORDS: Record<MarginName, string> = {
  stripping: 'stripping margin',
  'bolt-breaks-first': 'bolt-breaks-first margin',
  'yield-reserve': 'yield reserve (utilisation limit / utilisation)',
};

const INPUT_WORDS: Record<SensitivityItem['input'], string> = {
  friction: 'friction',
  engagement: 'engagement',
  'parent-strength': 'parent strength',
  torque: 'torque',
};

const tq = (x: number, f: WindowFmt) => formatQuantity(x, 'torque', f.units, {ascii: f.ascii});
const fq = (x: number, f: WindowFmt) => formatQuantity(x, 'force', f.units, {ascii: f.ascii});

/** Label/value rows of the window: the band, what sets each end, the wrench setting, the present torque. */
export function windowRows(w: TighteningWindow, f: WindowFmt): {label: string; value: string}[] {
  const by = (n: WindowLimitName) => w.limits.find(l => l.name === n) as WindowLimit;
  const lo = by(w.lowerLimit);
  const hi = by(w.upperLimit);
  const rows: {label: string; value: string}[] = [];
  if (w.torque) {
    rows.push({label: 'Tightening torque band', value: `${tq(w.torque.min, f)} to ${tq(w.torque.max, f)} (middle ${tq(w.torque.middle, f)})`});
    if (w.wrench) {
      rows.push({label: 'Set on the wrench', value: `${tq(w.wrench.min, f)} to ${tq(w.wrench.max, f)}: the band plus ${tq(w.wrench.prevailing, f)} prevailing torque of the locking element`});
    }
    rows.push({label: 'Bottom set by', value: `${LIMIT_WORDS[lo.name]}: ${fq(lo.preload, f)}, reached by the lowest preload (highest friction)`});
    rows.push({label: 'Top set by', value: `${LIMIT_WORDS[hi.name]}: ${fq(hi.preload, f)}, reached by the largest preload (lowest friction)`});
  } else {
    rows.push({
      label: 'Tightening torque band',
      value:
        `none: the ${LIMIT_WORDS[lo.name]} (${fq(lo.preload, f)}) needs ${tq(lo.torque, f)} at the highest friction, ` +
        `but the ${LIMIT_WORDS[hi.name]} (${fq(hi.preload, f)}) is reached at ${tq(hi.torque, f)} at the lowest friction`,
    });
  }
  const where = w.empty ? 'no band' : w.present.inside ? 'inside the band' : w.torque && w.present.torque > w.torque.max ? 'above the band' : 'below the band';
  rows.push({label: 'Present torque', value: `${tq(w.present.torque, f)}: ${where}`});
  rows.push({label: 'Preload spread at one torque', value: `${formatNumber(w.spread.present, 3)} (largest / lowest preload)`});
  return rows;
}

/** One line per limit: name, preload, the torque where its line is met, and its source. */
export function limitLines(w: TighteningWindow, f: WindowFmt): string[] {
  return w.limits.map(
    l => `${LIMIT_WORDS[l.name]} (${l.kind}): ${fq(l.preload, f)}, met at ${tq(l.torque, f)} (${l.kind === 'upper' ? 'lowest' : 'highest'} friction). Source: ${l.source}`,
  );
}

/** The sensitivity list as sentences: "friction moves the stripping margin from 1.20 to 1.55 (ends ...)". */
export function sensitivityLines(items: readonly SensitivityItem[], f: WindowFmt): string[] {
  const n = (x: number) => formatNumber(x, 3);
  return items.map(i => `${INPUT_WORDS[i.input]} moves it from ${n(i.low)} to ${n(i.high)} (${unitText(i.lowSetting, f)} to ${unitText(i.highSetting, f)}; ${i.source})`);
}

/** The settings are written in SI working units by the core; show torques in the wrench's units. */
function unitText(setting: string, f: WindowFmt): string {
  const m = /^([0-9.]+) N\u00b7m$/.exec(setting);
  if (m) return formatQuantity(Number(m[1]), 'torque', f.units, {ascii: f.ascii});
  const mm = /^([0-9.]+) mm$/.exec(setting);
  if (mm && f.units === 'us') return formatQuantity(Number(mm[1]), 'length', 'us', {ascii: f.ascii});
  const rm = /^Rm ([0-9.]+) MPa$/.exec(setting);
  if (rm && f.units === 'us') return `Rm ${formatQuantity(Number(rm[1]), 'stress', 'us', {ascii: f.ascii})}`;
  return f.ascii ? setting.replace(/\u00b7/g, '*') : setting;
}

/** Bars for the ranked list: each effect as a share of the largest, `width` cells. */
export function effectBar(effect: number, largest: number, width: number, ascii: boolean): string {
  const full = largest > 0 ? Math.round((effect / largest) * width) : 0;
  return (ascii ? '#' : '\u2588').repeat(full) + (ascii ? '.' : '\u00b7').repeat(width - full);
}

export {INPUT_WORDS};

/** The heading of the sensitivity list, naming the deciding margin and its present value. */
export function sensitivityHeading(margin: DecidingMargin): string {
  return `What matters most: the ${MARGIN_WORDS[margin.name]}, now ${formatNumber(margin.value, 3)} (needs ${formatNumber(margin.required, 3)})`;
}
