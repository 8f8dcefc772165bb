/**
 * Options that keep the thread size: re-use the good thread that is left, or
 * deepen the hole for a longer engagement. Every margin comes from the
 * mechanics core (checkJoint) on a modified joint.
 */
import {applyResult, infeasible, len, judge, roundUpHalf, safeCheck, skeleton, variant, type Checked, type PlanContext} from './common.js';
import {blindHoleDepths, tapDrill} from './holes.js';
import type {RepairOption} from './types.js';
import {BLIND_HOLE_INCOMPLETE_PITCHES} from '../joint/flags.js';

/** Longest effective engagement the planner tries, as a multiple of D (beyond it more length adds nothing useful). */
export const MAX_ENGAGEMENT_FACTOR = 4;

/**
 * Check the joint with the screw reaching `reach` mm below the surface and good
 * thread from `goodStart` mm: the effective engagement is reach - goodStart.
 */
export function checkAtReach(ctx: PlanContext, reach: number, keepHoleDepth = false): Checked {
  const chamfer = Math.min(ctx.goodStart, reach - 0.5);
  if (chamfer < 0 || reach - chamfer < 0.5) return {ok: false, error: 'no good thread left to engage'};
  const input = variant(ctx, {engagement: reach, chamfer});
  if (keepHoleDepth) input.holeDepth = ctx.joint.holeDepth;
  return safeCheck(ctx, input);
}

/** Re-use the good thread left below the stripped zone (or the hole as it is); margins from checkJoint, mm/N/N·m. */
export function reuseOption(ctx: PlanContext): RepairOption {
  const o = skeleton(ctx, 'reuse', 'clean and re-use');
  o.tapThread = ctx.plain;
  o.notes.push(`chase the thread with a ${ctx.plain} tap, blow out the chips, check the screw runs in by hand`);
  const goodLength = ctx.reach - ctx.goodStart;
  if (ctx.stripped && goodLength < ctx.thread.pitch) {
    return infeasible(o, `no good thread left: stripped to ${len(ctx, ctx.repair.strippedDepth ?? ctx.reach)} of the ${len(ctx, ctx.reach)} the screw reaches`);
  }
  const c = ctx.stripped ? checkAtReach(ctx, ctx.reach, true) : {ok: true as const, result: ctx.base};
  if (!c.ok) return infeasible(o, `not computed: ${c.error}`);
  applyResult(o, c.result);
  o.margin = {stripping: c.result.margin.stripping, boltBreaksFirst: c.result.margin.boltBreaksFirst};
  o.requiredEngagement = {fedStd: c.result.stripping.requiredEngagement.fedStd, alexander: c.result.stripping.requiredEngagement.alexander};
  if (ctx.stripped) o.notes.push(`the first ${len(ctx, ctx.goodStart, 1)} carry nothing: stripped zone plus one pitch cleaned up (common practice, no source)`);
  return judge(ctx, o);
}

function meets(ctx: PlanContext, c: Checked): boolean {
  return c.ok && c.result.margin.boltBreaksFirst + 1e-9 >= ctx.required && c.result.margin.stripping + 1e-9 >= ctx.required;
}

/**
 * The shortest screw reach (mm, in 0.5 mm steps) whose engagement meets the
 * required margin, starting from the core's required engagement (the larger of
 * FED-STD-H28/2B Formula 1 and Alexander) scaled by the margin, then stepping
 * by one pitch until the core confirms it; capped at MAX_ENGAGEMENT_FACTOR x D.
 */
export function reachForMargin(ctx: PlanContext, start: Checked): {reach: number; check: Checked; capped: boolean} {
  const d = ctx.thread.nominal;
  const cap = ctx.goodStart + MAX_ENGAGEMENT_FACTOR * d;
  let reach = ctx.reach;
  if (start.ok) {
    const req = Math.max(start.result.stripping.requiredEngagement.fedStd, start.result.stripping.requiredEngagement.alexander);
    if (Number.isFinite(req) && req > 0) reach = Math.max(reach, ctx.goodStart + req * ctx.required);
  }
  reach = Math.min(roundUpHalf(reach), roundUpHalf(cap));
  let check = checkAtReach(ctx, reach);
  for (let i = 0; i < 60 && !meets(ctx, check) && reach < cap; i++) {
    reach = Math.min(roundUpHalf(reach + ctx.thread.pitch), roundUpHalf(cap));
    check = checkAtReach(ctx, reach);
  }
  return {reach, check, capped: !meets(ctx, check)};
}

/**
 * Same thread, deeper: the shortest screw reach meeting the margin (reachForMargin), with the
 * blind-hole depths of holes.ts (tap chamfer and 118° point included), mm; margins from checkJoint.
 */
export function longerEngagementOption(ctx: PlanContext, reuse: RepairOption): RepairOption {
  const o = skeleton(ctx, 'longer-engagement', 'longer engagement');
  const {repair, thread} = ctx;
  const p = thread.pitch;
  o.tapThread = ctx.plain;
  o.drill = tapDrill(thread, {min: ctx.base.geometry.limits.internal.minorMin, max: ctx.base.geometry.limits.internal.minorMax});
  const start = ctx.stripped ? checkAtReach(ctx, Math.max(ctx.reach, ctx.goodStart + p)) : {ok: true as const, result: ctx.base};
  const found = reachForMargin(ctx, start);
  const newReach = found.reach;
  if (!found.check.ok) return infeasible(o, `not computed: ${found.check.error}`);
  applyResult(o, found.check.result);
  o.margin = {stripping: found.check.result.margin.stripping, boltBreaksFirst: found.check.result.margin.boltBreaksFirst};
  const req = found.check.result.stripping.requiredEngagement;
  o.requiredEngagement = {fedStd: req.fedStd, alexander: req.alexander};
  o.notes.push(`full thread needed for the bolt to break first: ${len(ctx, req.fedStd, 1)} by FED-STD-H28/2B, ${len(ctx, req.alexander, 1)} by Alexander / VDI 2230; the larger, times the margin ${ctx.required}, is used`);
  o.screwLengthChange = newReach - ctx.reach;
  o.changeSize = newReach - ctx.reach;
  o.notes.push(`screw reach ${len(ctx, newReach, 1)} below the surface (${len(ctx, o.screwLengthChange, 1)} more than now)`);
  if (found.capped) o.notes.push(`beyond ${MAX_ENGAGEMENT_FACTOR} x D of engagement more length is not tried: the first threads carry most of the load`);
  if (o.screwLengthChange <= 1e-9 && reuse.feasible && reuse.meetsMargin) {
    return infeasible(o, 'not needed: the present engagement already meets the margin');
  }
  if (o.screwLengthChange > 1e-9 && !repair.boltLengthMayChange) {
    return infeasible(o, `needs a screw ${len(ctx, o.screwLengthChange, 1)} longer, and the screw length is fixed`);
  }
  if (repair.through) {
    if (repair.depthAvailable !== undefined && newReach > repair.depthAvailable + 1e-9) {
      return infeasible(o, `needs ${len(ctx, newReach, 1)} of thread; the part is ${len(ctx, repair.depthAvailable)} thick`);
    }
    o.tappedDepth = newReach;
  } else {
    const depth = blindHoleDepths(newReach, p, o.drill);
    o.tappedDepth = depth.tappedDepth;
    o.drilledDepth = depth.drilledDepth;
    o.holeDepth = depth.holeDepth;
    if (repair.depthAvailable !== undefined && depth.holeDepth > repair.depthAvailable + 1e-9) {
      const bottoming = newReach + p + 2 * p + (depth.holeDepth - depth.drilledDepth);
      if (bottoming <= repair.depthAvailable + 1e-9) {
        o.drilledDepth = newReach + 3 * p;
        o.holeDepth = bottoming;
        o.notes.push('finish with a bottoming tap (2P chamfer) to fit the depth available');
      } else {
        return infeasible(o, `needs a hole ${len(ctx, depth.holeDepth, 1)} deep; ${len(ctx, repair.depthAvailable)} available`);
      }
    }
    if (repair.depthAvailable === undefined) o.notes.push(`depth available not given: check the part allows a ${len(ctx, depth.holeDepth, 1)} hole`);
    // Full thread of the present hole as the mechanics core counts it (the last pitches incomplete).
    const present = ctx.joint.holeDepth === undefined ? undefined : ctx.joint.holeDepth - BLIND_HOLE_INCOMPLETE_PITCHES * p;
    if (present !== undefined && present + 1e-9 >= newReach) {
      o.notes.push(`the present hole (${len(ctx, ctx.joint.holeDepth ?? 0)}) already has full thread to ${len(ctx, present)}: a longer screw is all it takes`);
    }
  }
  return judge(ctx, o);
}
