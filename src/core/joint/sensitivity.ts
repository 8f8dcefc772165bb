/**
 * What matters most: the inputs that move the deciding margin of a checked joint the most over
 * their plausible range, ranked by effect. Each input is set to its low and its high end and the
 * joint is checked again (checkJoint), tightened by torque at the torque of the result: that is
 * the number the technician sets, so friction and engagement move the preload as they would on
 * the bench.
 *
 * The deciding margin is the one with the least reserve over its requirement:
 *   stripping           weaker stripping force / largest bolt load   (needs >= required margin)
 *   bolt-breaks-first   weaker stripping force / bolt break force    (needs >= required margin)
 *   yield-reserve       utilisation limit / assembly utilisation     (needs >= 1; VDI 2230 Part 1)
 * Plausible ranges:
 *   friction            the ends of the entered muG and muK ranges (ISO 16047 definitions)
 *   engagement          +- one pitch
 *   parent-strength     +- 10 % of the parent's Rm and shear strength (common practice, no source;
 *                       the material rows carry no spread)
 *   torque              +- the wrench's permissible deviation: 4 % above 10 N·m, 6 % at or below
 *                       (ISO 6789:2003, setting torque tools Type II class A, read in a secondary
 *                       reproduction)
 * Units: margins dimensionless; torque N·m.
 */
import type {JointInput} from './input.js';
import type {CheckResult} from './result.js';
import {checkJoint} from './index.js';

export type MarginName = 'stripping' | 'bolt-breaks-first' | 'yield-reserve';
export type SensitivityInput = 'friction' | 'engagement' | 'parent-strength' | 'torque';

export interface SensitivityItem {
  input: SensitivityInput;
  /** The deciding margin with the input at its low end, and at its high end. */
  low: number;
  high: number;
  /** The margin these values are of. */
  margin: MarginName;
  /** The input's low and high settings, in words with working units. */
  lowSetting: string;
  highSetting: string;
  /** |high - low|, the ranking key. */
  effect: number;
  source: string;
}

export interface DecidingMargin {
  name: MarginName;
  /** The margin's value (higher is better for all three). */
  value: number;
  /** What it needs to reach. */
  required: number;
}

/** Parent strength spread used without a material spread: +-10 % (common practice, no source). */
export const PARENT_SPREAD = 0.1;

/**
 * Permissible deviation of a setting hand torque wrench, fraction: 0.06 at or below 10 N·m, 0.04 above
 * (ISO 6789:2003, Type II class A; read in a secondary reproduction).
 */
export function wrenchDeviation(torqueNm: number): number {
  return torqueNm <= 10 ? 0.06 : 0.04;
}

/** The three margins of a result, each with its requirement (higher is better). Dimensionless. */
export function margins(input: JointInput, r: CheckResult): DecidingMargin[] {
  return [
    {name: 'stripping', value: r.margin.stripping, required: input.requiredMargin},
    {name: 'bolt-breaks-first', value: r.margin.boltBreaksFirst, required: input.requiredMargin},
    {name: 'yield-reserve', value: r.tightening.utilisation > 0 ? input.utilisation / r.tightening.utilisation : Infinity, required: 1},
  ];
}

/** The deciding margin: the least value / required of the three (see the file comment). */
export function decidingMargin(input: JointInput, r: CheckResult): DecidingMargin {
  return margins(input, r).reduce((m, x) => (x.value / x.required < m.value / m.required ? x : m));
}

function marginOf(name: MarginName, input: JointInput, r: CheckResult): number {
  return margins(input, r).find(m => m.name === name)!.value;
}

/**
 * The ranked sensitivity list for the deciding margin of `result` (see the file comment for the
 * ranges and their sources). An end that cannot be checked (it leaves the accepted range of an
 * input) keeps the present value. Ordered by effect, largest first.
 */
export function sensitivity(input: JointInput, result: CheckResult, opts: {wrenchDeviation?: number} = {}): SensitivityItem[] {
  const T = result.tightening.torque;
  const base: JointInput = {...input, tightening: 'torque', torque: T};
  const decide = decidingMargin(input, result);
  const present = marginOf(decide.name, base, checkJoint(base));
  const run = (change: Partial<JointInput>): number => {
    try {
      return marginOf(decide.name, base, checkJoint({...base, ...change}));
    } catch {
      return present;
    }
  };
  const items: SensitivityItem[] = [];
  const add = (input: SensitivityInput, lowSetting: string, highSetting: string, low: number, high: number, source: string): void => {
    items.push({input, low, high, margin: decide.name, lowSetting, highSetting, effect: Math.abs(high - low), source});
  };

  if (input.nutFactor === undefined) {
    const g = input.muThread;
    const k = input.muHead;
    add(
      'friction',
      `muG ${g.min}, muK ${k.min}`,
      `muG ${g.max}, muK ${k.max}`,
      run({muThread: {min: g.min, max: g.min}, muHead: {min: k.min, max: k.min}}),
      run({muThread: {min: g.max, max: g.max}, muHead: {min: k.max, max: k.max}}),
      'ends of the entered friction range (ISO 16047 definitions)',
    );
  }

  const P = result.geometry.pitch;
  const eLow = input.engagement - P;
  add(
    'engagement',
    `${round(eLow)} mm`,
    `${round(input.engagement + P)} mm`,
    eLow > input.chamfer && eLow >= 0.5 ? run({engagement: eLow}) : present,
    run({engagement: input.engagement + P}),
    'engaged length +- one pitch',
  );

  if (input.internal === 'tapped') {
    const m = result.materials.internal;
    const at = (f: number): Partial<JointInput> => ({parentRm: clamp(m.rm * f, 20, 2500), parentShear: clamp(m.shear * f, 10, 1500)});
    add(
      'parent-strength',
      `Rm ${round(m.rm * (1 - PARENT_SPREAD))} MPa`,
      `Rm ${round(m.rm * (1 + PARENT_SPREAD))} MPa`,
      run(at(1 - PARENT_SPREAD)),
      run(at(1 + PARENT_SPREAD)),
      `parent Rm and shear strength +-${PARENT_SPREAD * 100} % (common practice, no source)`,
    );
  }

  const dev = opts.wrenchDeviation ?? wrenchDeviation(T);
  add(
    'torque',
    `${round(T * (1 - dev))} N·m`,
    `${round(T * (1 + dev))} N·m`,
    run({torque: T * (1 - dev)}),
    run({torque: T * (1 + dev)}),
    opts.wrenchDeviation !== undefined ? `torque +-${round(dev * 100)} % (given)` : `torque +-${dev * 100} % (ISO 6789:2003, setting wrench Type II class A)`,
  );

  return items.sort((a, b) => b.effect - a.effect);
}

const round = (x: number): number => Math.round(x * 100) / 100;
const clamp = (x: number, lo: number, hi: number): number => Math.min(hi, Math.max(lo, x));
