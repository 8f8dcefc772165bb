/**
 * Shared pieces of the option builders: the per-call context, a guarded call
 * of the mechanics core, and an option skeleton.
 */
import type {JointInput} from '../joint/input.js';
import type {CheckResult} from '../joint/result.js';
import {flagsInUnits} from '../joint/index.js';
import type {RepairDeps} from './context.js';
import type {RepairInput} from './input.js';
import type {ThreadBasics} from './helical.js';
import {EFFORT_SCALE} from './rank.js';
import type {RepairKind, RepairOption} from './types.js';
import {toDisplay, type UnitSystem} from '../units.js';

export interface PlanContext {
  deps: RepairDeps;
  joint: JointInput;
  repair: RepairInput;
  /** The joint as given, checked. */
  base: CheckResult;
  thread: ThreadBasics;
  /** Nominal thread without tolerance, e.g. "M10x1.5". */
  plain: string;
  required: number;
  /** Screw reach below the surface (the joint's engaged length from the loaded face), mm. */
  reach: number;
  /** Depth below which the thread is good (after clean-up), mm; the chamfer for an intact hole. */
  goodStart: number;
  stripped: boolean;
  /** Units the reasons and notes are written in (values stay mm); default SI. */
  units?: UnitSystem;
  /** Measured minor diameter of the worn hole, mm (also when past the bolt major, thread gone). */
  wornMinor?: number;
}

export type Checked = {ok: true; result: CheckResult} | {ok: false; error: string};

/**
 * Call the mechanics core; a rejection becomes a message, never an exception.
 * The result's flag messages are written in the plan's units (an option carries
 * them to the screen); codes, levels and numbers stay those of the core.
 */
export function safeCheck(ctx: PlanContext, input: JointInput): Checked {
  try {
    const checked = ctx.deps.check(input);
    const result = ctx.units === 'us' ? {...checked, flags: flagsInUnits(checked, input, 'us')} : checked;
    const m = result.margin;
    if (!Number.isFinite(m.stripping) || !Number.isFinite(m.boltBreaksFirst)) {
      return {ok: false, error: 'the mechanics core returned no finite margin'};
    }
    return {ok: true, result};
  } catch (e) {
    return {ok: false, error: e instanceof Error ? e.message : String(e)};
  }
}

/** Check `input` with the thread geometry of `designation` (see RepairDeps.checkWithThread). */
export function safeCheckThread(ctx: PlanContext, input: JointInput, designation: string): Checked {
  const viaThread = ctx.deps.checkWithThread;
  if (!viaThread) return safeCheck(ctx, {...input, thread: designation});
  return safeCheck({...ctx, deps: {...ctx.deps, check: i => viaThread(i, designation)}}, input);
}

/** An option with every number unset; builders fill in what they know. */
export function skeleton(ctx: PlanContext, kind: RepairKind, label: string): RepairOption {
  return {
    kind,
    label,
    rank: 0,
    feasible: true,
    meetsMargin: false,
    reason: null,
    margin: {stripping: null, boltBreaksFirst: null},
    drill: null,
    tapThread: null,
    holeDepth: null,
    tappedDepth: null,
    drilledDepth: null,
    engagement: null,
    requiredEngagement: null,
    boltThread: ctx.plain,
    screwLengthChange: 0,
    torque: null,
    preload: null,
    effort: EFFORT_SCALE[kind],
    strength: null,
    insert: null,
    changeSize: 0,
    flags: [],
    notes: [],
  };
}

/** Copy the tightening and the core's flags of a result onto an option. */
export function applyResult(o: RepairOption, r: CheckResult): void {
  o.torque = r.tightening.torque;
  o.preload = {min: r.tightening.preload.min, max: r.tightening.preload.max};
  o.flags = r.flags;
  o.engagement = r.stripping.effectiveEngagement;
}

/** Mark an option infeasible with the reason (the first reason wins). */
export function infeasible(o: RepairOption, reason: string): RepairOption {
  if (o.feasible) {
    o.feasible = false;
    o.meetsMargin = false;
    o.reason = reason;
  }
  return o;
}

/** Set meetsMargin and, when short, the reason, from the option's margins. */
export function judge(ctx: PlanContext, o: RepairOption): RepairOption {
  if (!o.feasible) return o;
  const {stripping, boltBreaksFirst} = o.margin;
  if (stripping === null || boltBreaksFirst === null) {
    o.meetsMargin = false;
    o.reason = o.reason ?? 'margins not computed';
    return o;
  }
  const short: string[] = [];
  if (boltBreaksFirst + 1e-9 < ctx.required) short.push(`bolt-breaks-first margin ${boltBreaksFirst.toFixed(2)}`);
  if (stripping + 1e-9 < ctx.required) short.push(`stripping margin ${stripping.toFixed(2)}`);
  o.meetsMargin = short.length === 0;
  if (!o.meetsMargin) o.reason = `short of the required ${ctx.required}: ${short.join(', ')}`;
  return o;
}

/** A length for a message, mm: at most 2 decimals, no trailing zeros. */
export function mm(x: number): string {
  return Number(x.toFixed(2)).toString();
}

/**
 * A length with its unit for a reason or note: SI "12 mm" (`decimals` given:
 * fixed, else at most 2 and no trailing zeros), US "0.472 in" (3 decimals).
 */
export function lengthIn(units: UnitSystem | undefined, x: number, decimals?: number): string {
  if (units === 'us') return `${toDisplay(x, 'length', 'us').toFixed(3)} in`;
  return `${decimals === undefined ? mm(x) : x.toFixed(decimals)} mm`;
}

/** lengthIn in the context's units. */
export function len(ctx: PlanContext, x: number, decimals?: number): string {
  return lengthIn(ctx.units, x, decimals);
}

/** Round a length up to the next 0.5 mm (a length a technician can set). */
export function roundUpHalf(x: number): number {
  return Math.ceil(x * 2 - 1e-6) / 2;
}

/** Joint variant with the blind-hole depth and any torque or preload target left as they are. */
export function variant(ctx: PlanContext, changes: Partial<JointInput>): JointInput {
  return {...ctx.joint, holeDepth: undefined, ...changes};
}

/** Joint variant for a different screw size: tightened by the utilisation rule. */
export function newBoltVariant(ctx: PlanContext, changes: Partial<JointInput>): JointInput {
  return variant(ctx, {
    measured: undefined,
    tightening: 'utilisation',
    torque: undefined,
    preload: undefined,
    bearingDiameter: undefined,
    ...changes,
  });
}
