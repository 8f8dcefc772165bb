/**
 * The repair planner with its dependencies passed in (see context.ts); index.ts
 * wires the real core. Fast: a few dozen calls of the mechanics core.
 */
import type {JointInput} from '../joint/input.js';
import type {CheckResult} from '../joint/result.js';
import {JointInputError} from '../joint/errors.js';
import {withoutHole} from './measured-fit.js';
import type {UnitSystem} from '../units.js';
import {CAUTION_LINES} from '../cautions.js';
import {infeasible, len, skeleton, type PlanContext} from './common.js';
import type {RepairDeps} from './context.js';
import {plainDesignation, HELICAL_SOURCES, type ThreadBasics} from './helical.js';
import {HOLE_SOURCES} from './holes.js';
import {helicalOptions, solidOptions} from './inserts.js';
import type {RepairInput} from './input.js';
import {EFFORT_SCALE, rankOptions, REPAIR_RANKING_RULE} from './rank.js';
import {DEMO_TABLE_WARNING} from './solid-table.js';
import {oversizeOptions, throughBoltOption} from './resize.js';
import {longerEngagementOption, reuseOption} from './same-thread.js';
import {REPAIR_KINDS, type RepairOption, type RepairPlan} from './types.js';

/** Build the per-call context. Throws only when the joint itself is rejected by the mechanics core. */
export function planContext(deps: RepairDeps, given: JointInput, repair: RepairInput, units: UnitSystem = 'si'): PlanContext {
  const {joint, base, wornMinor} = asMeasuredBase(deps, given, repair);
  const spec = base.geometry.spec;
  const thread: ThreadBasics = {family: spec.family, nominal: base.geometry.nominal, pitch: base.geometry.pitch, tpi: spec.tpi, sizeLabel: spec.sizeLabel, series: spec.series};
  const stripped = repair.holeState === 'stripped';
  const reach = joint.engagement;
  const strippedDepth = stripped ? Math.min(repair.strippedDepth ?? reach, reach) : 0;
  // One pitch at the edge of the damage is lost when the thread is cleaned up (common practice, no source).
  const goodStart = stripped ? Math.max(joint.chamfer, strippedDepth + (strippedDepth > 0 ? thread.pitch : 0)) : joint.chamfer;
  return {
    deps, joint, repair, base, thread,
    plain: plainDesignation(thread),
    required: repair.margin ?? joint.requiredMargin,
    reach, goodStart, stripped, units,
    ...(wornMinor !== undefined ? {wornMinor} : {}),
  };
}

/**
 * The joint as checked: with its measurements; but a stripped hole whose measured minor or
 * pitch diameter leaves no thread (refused by the check) is checked without the hole's
 * measurements, keeping the measured minor for the drill clean-up test (measured-fit.ts).
 */
function asMeasuredBase(deps: RepairDeps, joint: JointInput, repair: RepairInput): {joint: JointInput; base: CheckResult; wornMinor?: number} {
  const wornMinor = joint.measured?.holeMinorDiameter;
  try {
    return {joint, base: deps.check(joint), ...(wornMinor !== undefined ? {wornMinor} : {})};
  } catch (e) {
    const holeField = e instanceof JointInputError && (e.field === 'measured.holeMinorDiameter' || e.field === 'measured.holePitchDiameter');
    if (!holeField || repair.holeState !== 'stripped') throw e;
    const dropped: JointInput = {...joint, measured: withoutHole(joint.measured)};
    return {joint: dropped, base: deps.check(dropped), ...(wornMinor !== undefined ? {wornMinor} : {})};
  }
}

/**
 * Every repair option for the joint and the state of its hole, ranked by
 * REPAIR_RANKING_RULE. Lengths mm, forces N, torque N·m; `units` only sets the
 * units the reasons and notes are written in (JSON: keep 'si'). Each option's margins
 * come from the mechanics core on a modified joint (see the option modules).
 */
export function planRepairsWith(deps: RepairDeps, joint: JointInput, repair: RepairInput, units: UnitSystem = 'si'): RepairPlan {
  const ctx = planContext(deps, joint, repair, units);
  let options: RepairOption[];
  if (joint.internal === 'nut') {
    // The planner repairs tapped holes; a nut joint is put right with a new nut (and bolt).
    options = REPAIR_KINDS.map(kind => infeasible(skeleton(ctx, kind, EFFORT_SCALE[kind].name), 'the joint uses a nut, not a tapped hole: fit a new nut and bolt and check it'));
  } else {
    const reuse = reuseOption(ctx);
    options = [
      reuse,
      longerEngagementOption(ctx, reuse),
      ...helicalOptions(ctx),
      ...solidOptions(ctx),
      ...oversizeOptions(ctx),
      throughBoltOption(ctx),
    ];
  }
  const notes: string[] = [];
  if (ctx.joint !== joint) notes.push('the measured hole diameters leave no thread in the stripped zone: the as-is figures use the bolt measurements only; the measured minor diameter decides which tap drills clean up the bore');
  if (ctx.stripped) notes.push(`stripped from the surface to ${len(ctx, Math.min(repair.strippedDepth ?? ctx.reach, ctx.reach))}; good thread assumed below ${len(ctx, ctx.goodStart, 1)}`);
  if (repair.depthAvailable === undefined) notes.push(repair.through ? 'part thickness not given: depths are not checked' : 'depth available not given: hole depths are not checked');
  if (deps.solidTable.provenance.kind === 'demo') notes.push(`solid insert sizes: ${DEMO_TABLE_WARNING}`);
  if (repair.wall === undefined) notes.push('edge distance not given: options that remove material are not checked against the wall');
  const base = ctx.base;
  return {
    thread: base.geometry.spec.designation,
    requiredMargin: ctx.required,
    hole: {
      state: repair.holeState,
      strippedDepth: ctx.stripped ? Math.min(repair.strippedDepth ?? ctx.reach, ctx.reach) : null,
      through: repair.through,
      depthAvailable: repair.depthAvailable ?? null,
      wall: repair.wall ?? null,
    },
    asIs: {margin: {stripping: base.margin.stripping, boltBreaksFirst: base.margin.boltBreaksFirst}, flags: base.flags},
    options: rankOptions(options),
    rankingRule: REPAIR_RANKING_RULE,
    notes,
    sources: [...Object.values(HELICAL_SOURCES), ...Object.values(HOLE_SOURCES), ...base.sources],
    cautions: CAUTION_LINES,
  };
}
