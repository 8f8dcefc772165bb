/**
 * Insert options. Each insert is two threads in series, both evaluated by the
 * mechanics core (checkJoint):
 *  1. the bolt thread in the insert's internal thread (the insert material as
 *     the internal part): bolt-thread and insert-thread stripping, bolt break;
 *  2. the insert's outside in the parent: the parent sheared at the larger
 *     receiving (helical) or external (solid) thread, taken from the core's
 *     internal-thread stripping force for that thread size.
 * The weakest of the three forces gives the margins (composition only; the
 * stripping forces themselves are the core's).
 */
import type {CheckResult} from '../joint/result.js';
import {applyResult, infeasible, len, judge, newBoltVariant, roundUpHalf, safeCheck, safeCheckThread, skeleton, variant, type Checked, type PlanContext} from './common.js';
import {HELICAL_LENGTH_FACTORS, INSERT_WIRE, insertDepths, receivingThread, type ThreadBasics} from './helical.js';
import {blindHoleDepths, tapDrill, wallProblem} from './holes.js';
import {boltOnly, wornBoreCheck} from './measured-fit.js';
import {DEMO_TABLE_WARNING, type SolidInsertEntry} from './solid-table.js';
import type {RepairOption, StrengthPart} from './types.js';

function trim(x: number, decimals = 3): string {
  return Number(x.toFixed(decimals)).toString();
}

/** Designations to try for the receiving thread, in the order the thread parser is most likely to take them. */
function receivingDesignations(t: ThreadBasics, major: number): string[] {
  const metric = `M${trim(major)}x${trim(t.pitch, 4)}`;
  if (t.family === 'unified' && t.tpi !== undefined) return [`${trim(major / 25.4, 4)}-${trim(t.tpi)} UN`, metric];
  return [metric];
}

/** Flags of the inner pair that speak of its own stripping only; the combined margins replace them. */
const INNER_ONLY = new Set(['strips-at-preload', 'strips-before-break', 'engagement-below-required', 'engagement-beyond-useful']);

/** Combine the two checks of an insert into margins and flags; `outer` gives the parent's stripping force. */
function combine(o: RepairOption, inner: CheckResult, outer: CheckResult, names: {insert: string; parent: string}): void {
  const parentForce = outer.stripping.internal.force;
  const parts: StrengthPart[] = [
    {name: 'bolt thread in the insert', force: inner.stripping.external.force},
    {name: names.insert, force: inner.stripping.internal.force},
    {name: names.parent, force: parentForce},
  ];
  const innerWeaker = Math.min(inner.stripping.external.force, inner.stripping.internal.force);
  // Largest load the threads see, as the core defines it for the stripping margin.
  const load = innerWeaker / inner.margin.stripping;
  const weakest = parts.reduce((a, b) => (b.force < a.force ? b : a));
  o.strength = {parts, governs: weakest.name, boltBreakForce: inner.stripping.boltBreakForce};
  o.margin = {stripping: weakest.force / load, boltBreaksFirst: weakest.force / inner.stripping.boltBreakForce};
  applyResult(o, inner);
  o.flags = [
    ...inner.flags.filter(f => !INNER_ONLY.has(f.code)),
    ...outer.flags.filter(f => f.code === 'outside-model-range').map(f => ({...f, message: `Parent side: ${f.message}`})),
  ];
}

/**
 * One option per nominal length 1D..3D (ASME B18.29.1 / B18.29.2M): receiving thread, drill and
 * depths from helical.ts, strength as two checkJoint evaluations in series (see the module comment), mm/N.
 */
export function helicalOptions(ctx: PlanContext): RepairOption[] {
  const {thread: t, repair, joint} = ctx;
  const rt = receivingThread(t);
  return HELICAL_LENGTH_FACTORS.map(k => {
    const o = skeleton(ctx, 'helical-insert', `helical insert ${k}D`);
    o.drill = rt.drill;
    o.tapThread = rt.tap;
    const worn = wornBoreCheck(ctx.wornMinor, rt.drill, `the ${rt.tap} receiving thread`, ctx.units);
    if (worn && !worn.fit) return infeasible(o, worn.text);
    if (worn) o.notes.push(worn.text);
    o.changeSize = k * t.nominal;
    let depths = insertDepths(t, k, rt.drill, 'plug');
    o.insert = {
      type: 'helical',
      nominalLength: depths.nominalLength,
      assembledLength: depths.assembled,
      setDown: depths.setDown,
      parentThread: {designation: rt.tap, major: rt.major, pitchDiameter: rt.pitchDiameter, minor: rt.minor, pitch: rt.pitch},
    };
    const wall = wallProblem(repair.wall, rt.major, 'the receiving thread', ctx.units);
    if (wall) return infeasible(o, wall);
    if (repair.through) {
      o.tappedDepth = depths.tappedDepth;
      if (repair.depthAvailable !== undefined && depths.tappedDepth > repair.depthAvailable + 1e-9) {
        return infeasible(o, `the part is ${len(ctx, repair.depthAvailable)} thick; a ${k}D insert needs ${len(ctx, depths.tappedDepth, 1)}`);
      }
    } else {
      if (repair.depthAvailable !== undefined && depths.holeDepth > repair.depthAvailable + 1e-9) {
        const bottoming = insertDepths(t, k, rt.drill, 'bottoming');
        if (bottoming.holeDepth > repair.depthAvailable + 1e-9) {
          return infeasible(o, `needs a hole ${len(ctx, depths.holeDepth, 1)} deep (${len(ctx, bottoming.holeDepth, 1)} with a bottoming tap); ${len(ctx, repair.depthAvailable)} available`);
        }
        depths = bottoming;
        o.notes.push('finish with a bottoming tap to fit the depth available');
      }
      o.tappedDepth = depths.tappedDepth;
      o.drilledDepth = depths.drilledDepth;
      o.holeDepth = depths.holeDepth;
    }
    // Screw engagement in the insert: the full assembled length when the screw may be longer.
    const fullReach = roundUpHalf(depths.setDown.max + depths.assembled.max);
    let engagement = depths.assembled.min;
    if (fullReach > ctx.reach + 1e-9 && !repair.boltLengthMayChange) {
      engagement = Math.min(engagement, ctx.reach - depths.setDown.max);
      if (engagement < t.pitch) return infeasible(o, `the screw reaches ${len(ctx, ctx.reach)}, too short to engage the insert set ${len(ctx, depths.setDown.max, 1)} down`);
      o.notes.push(`the screw engages only ${len(ctx, engagement, 1)} of the insert (screw length fixed)`);
    } else {
      o.screwLengthChange = Math.max(0, fullReach - ctx.reach);
    }
    if (!repair.through && o.drilledDepth !== null && ctx.reach > o.drilledDepth + 1e-9) {
      o.notes.push(`the present screw reaches ${len(ctx, ctx.reach)}, deeper than the ${len(ctx, o.drilledDepth)} drilled: fit a screw that stops short of the bottom`);
    }
    const inner = safeCheck(ctx, variant(ctx, {parent: undefined, parentRm: INSERT_WIRE.rm, parentShear: INSERT_WIRE.shear, engagement, chamfer: 0, measured: boltOnly(joint.measured)}));
    if (!inner.ok) return infeasible(o, `not computed (bolt in the insert): ${inner.error}`);
    let outer: Checked = {ok: false, error: 'no receiving-thread designation accepted'};
    for (const designation of receivingDesignations(t, rt.major)) {
      outer = safeCheckThread(ctx, newBoltVariant(ctx, {
        boltRm: INSERT_WIRE.rm, boltRp: INSERT_WIRE.rp, engagement, chamfer: 0,
        bearingDiameter: 1.5 * rt.major, serviceLoad: 0, internal: 'tapped', utilisation: joint.utilisation,
      }), designation);
      if (outer.ok) break;
    }
    if (!outer.ok) return infeasible(o, `not computed (parent at the receiving thread): ${outer.error}`);
    combine(o, inner.result, outer.result, {insert: 'insert wire thread', parent: 'parent at the receiving thread'});
    o.notes.push(`countersink 120 deg to about ${len(ctx, rt.major, 1)} before winding in the insert (common practice, no source)`);
    if (ctx.stripped) o.notes.push(`the receiving thread's minor diameter (${len(ctx, rt.minor, 2)}) is outside the old thread, so the torn thread is cut away`);
    return judge(ctx, o);
  });
}

function normalise(designation: string): string {
  return designation.toLowerCase().replace(/\s+/g, '').replace(/-\d[a-z](\/\d[a-z])?$/i, '');
}

/** Table entries for the thread: matched on "M10x1.5" / "1/4-20 UNC" (an "M10" entry means the coarse pitch). */
export function matchingEntries(ctx: PlanContext): SolidInsertEntry[] {
  const want = normalise(ctx.plain);
  const coarseShort = ctx.thread.family === 'metric' && ctx.thread.series === 'coarse' ? `m${trim(ctx.thread.nominal)}` : null;
  return ctx.deps.solidTable.entries.filter(e => {
    const n = normalise(e.internal);
    return n === want || (coarseShort !== null && n === coarseShort);
  });
}

/** One option per matching entry of the solid key-locked insert table; strength as for helical inserts, mm/N. */
export function solidOptions(ctx: PlanContext): RepairOption[] {
  const {repair, deps} = ctx;
  const table = deps.solidTable;
  const entries = matchingEntries(ctx);
  if (entries.length === 0) {
    const o = skeleton(ctx, 'solid-insert', 'solid insert');
    return [infeasible(o, `no ${ctx.plain} entry in the solid insert table "${table.name}"`)];
  }
  return entries.map(e => {
    const o = skeleton(ctx, 'solid-insert', `solid ${e.type}`);
    o.tapThread = e.external;
    const setDown = {min: e.setDown, max: e.setDown};
    if (table.provenance.kind === 'demo') o.notes.push(`insert sizes: ${DEMO_TABLE_WARNING}`);
    const engagement = repair.boltLengthMayChange ? e.length : Math.min(e.length, ctx.reach - e.setDown);
    const fullReach = roundUpHalf(e.setDown + e.length);
    o.screwLengthChange = repair.boltLengthMayChange ? Math.max(0, fullReach - ctx.reach) : 0;
    if (engagement < ctx.thread.pitch) return infeasible(o, `the screw reaches ${len(ctx, ctx.reach)}, too short for the insert`);
    const outer = safeCheckThread(ctx, newBoltVariant(ctx, {
      boltRm: e.bodyRm, boltRp: 0.8 * e.bodyRm, engagement: e.length, chamfer: 0, serviceLoad: 0, internal: 'tapped',
    }), e.external);
    if (!outer.ok) return infeasible(o, `not computed (insert in the parent, ${e.external}): ${outer.error}`);
    const g = outer.result.geometry;
    const ext: ThreadBasics = {family: g.spec.family, nominal: g.nominal, pitch: g.pitch, tpi: g.spec.tpi, sizeLabel: g.spec.sizeLabel, series: g.spec.series};
    o.drill = e.drill ?? tapDrill(ext, {min: g.limits.internal.minorMin, max: g.limits.internal.minorMax});
    o.changeSize = g.nominal;
    o.insert = {type: e.type, nominalLength: e.length, setDown, parentThread: {designation: e.external, major: g.nominal, pitchDiameter: g.pitchDiameter, minor: g.minorDiameterInternal, pitch: g.pitch}, keys: e.keys, dataSource: table.provenance.source};
    const wall = wallProblem(repair.wall, g.nominal, `the insert's external thread`, ctx.units);
    if (wall) return infeasible(o, wall);
    if (repair.through) {
      o.tappedDepth = e.setDown + e.length;
      if (repair.depthAvailable !== undefined && o.tappedDepth > repair.depthAvailable + 1e-9) {
        return infeasible(o, `the part is ${len(ctx, repair.depthAvailable)} thick; the insert needs ${len(ctx, o.tappedDepth, 1)}`);
      }
    } else {
      const d = blindHoleDepths(e.setDown + e.length, g.pitch, o.drill);
      Object.assign(o, {tappedDepth: d.tappedDepth, drilledDepth: d.drilledDepth, holeDepth: d.holeDepth});
      if (repair.depthAvailable !== undefined && d.holeDepth > repair.depthAvailable + 1e-9) {
        return infeasible(o, `needs a hole ${len(ctx, d.holeDepth, 1)} deep; ${len(ctx, repair.depthAvailable)} available`);
      }
      if (ctx.reach > d.drilledDepth + 1e-9) o.notes.push(`the present screw reaches ${len(ctx, ctx.reach)}, deeper than the ${len(ctx, d.drilledDepth)} drilled: fit a screw that stops short of the bottom`);
    }
    const inner = safeCheck(ctx, variant(ctx, {parent: undefined, parentRm: e.bodyRm, parentShear: e.bodyShear, engagement, chamfer: 0, measured: boltOnly(ctx.joint.measured)}));
    if (!inner.ok) return infeasible(o, `not computed (bolt in the insert): ${inner.error}`);
    combine(o, inner.result, outer.result, {insert: 'insert internal thread', parent: `parent at the ${e.external} thread`});
    o.notes.push(`${e.keys} keys lock the insert against turning; check the maker's key and torque data`);
    return judge(ctx, o);
  });
}
