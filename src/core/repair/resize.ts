/**
 * Options that change the screw: an oversize thread (the next sizes up in the
 * ISO 261/262 or unified series, same or finer pitch) and a through-bolt with a
 * nut. Margins from the mechanics core (checkJoint).
 */
import {applyResult, infeasible, len, judge, newBoltVariant, safeCheck, skeleton, type PlanContext} from './common.js';
import type {SeriesThread} from './context.js';
import {blindHoleDepths, clearanceHole, tapDrill, wallProblem} from './holes.js';
import {boltOnly, wornBoreCheck} from './measured-fit.js';
import type {ThreadBasics} from './helical.js';
import type {RepairOption} from './types.js';

/** How many oversize candidates the planner offers. */
export const OVERSIZE_CANDIDATES = 2;

/**
 * Candidate sizes: larger nominal, pitch not coarser than the present one, and a
 * basic minor diameter D1 = D - 1.082532P (ISO 68-1 / ASME B1.1) at least the old
 * major diameter, so the new tap drill removes the old thread (common practice,
 * no source). Smallest first; at equal size the coarser allowed pitch first.
 */
export function oversizeCandidates(thread: ThreadBasics, series: readonly SeriesThread[]): SeriesThread[] {
  return series
    .filter(s => s.nominal > thread.nominal + 1e-9 && s.pitch <= thread.pitch + 1e-9 && s.nominal - 1.082532 * s.pitch >= thread.nominal - 1e-9)
    .sort((a, b) => a.nominal - b.nominal || b.pitch - a.pitch)
    .slice(0, OVERSIZE_CANDIDATES);
}

/** Oversize thread options (oversizeCandidates), each checked by checkJoint with the larger screw, mm/N/N·m. */
export function oversizeOptions(ctx: PlanContext): RepairOption[] {
  const {deps, repair, joint, base} = ctx;
  const series = deps.seriesAbove ? deps.seriesAbove(base.geometry.spec) : [];
  const candidates = oversizeCandidates(ctx.thread, series);
  if (candidates.length === 0) {
    const o = skeleton(ctx, 'oversize', 'oversize thread');
    return [infeasible(o, deps.seriesAbove ? `no larger series size with pitch ${ctx.thread.pitch} mm or finer clears the old thread` : 'thread series list not available')];
  }
  return candidates.map(c => {
    const o = skeleton(ctx, 'oversize', `oversize ${c.designation}`);
    o.tapThread = c.designation;
    o.boltThread = c.designation;
    o.changeSize = c.nominal;
    o.screwLengthChange = null;
    const chamfer = ctx.stripped ? Math.max(joint.chamfer, 0.5 * c.pitch) : joint.chamfer;
    const r = safeCheck(ctx, newBoltVariant(ctx, {thread: c.designation, engagement: ctx.reach, chamfer}));
    if (!r.ok) return infeasible(o, `not computed: ${r.error}`);
    const g = r.result.geometry;
    const basics: ThreadBasics = {family: g.spec.family, nominal: g.nominal, pitch: g.pitch, tpi: g.spec.tpi, sizeLabel: g.spec.sizeLabel, series: g.spec.series};
    o.drill = tapDrill(basics, {min: g.limits.internal.minorMin, max: g.limits.internal.minorMax});
    const worn = wornBoreCheck(ctx.wornMinor, o.drill, `the ${c.designation}`, ctx.units);
    if (worn && !worn.fit) return infeasible(o, worn.text);
    if (worn) o.notes.push(worn.text);
    applyResult(o, r.result);
    o.margin = {stripping: r.result.margin.stripping, boltBreaksFirst: r.result.margin.boltBreaksFirst};
    o.notes.push(`fit a ${c.designation} screw and open the clamped part's hole to suit; tightened by the utilisation rule (${joint.utilisation} of yield)`);
    const wall = wallProblem(repair.wall, c.nominal, `the ${c.designation} thread`, ctx.units);
    if (wall) return infeasible(o, wall);
    if (repair.through) {
      o.tappedDepth = ctx.reach;
    } else {
      const d = blindHoleDepths(ctx.reach, c.pitch, o.drill);
      Object.assign(o, {tappedDepth: d.tappedDepth, drilledDepth: d.drilledDepth, holeDepth: d.holeDepth});
      if (repair.depthAvailable !== undefined && d.holeDepth > repair.depthAvailable + 1e-9) {
        return infeasible(o, `needs a hole ${len(ctx, d.holeDepth, 1)} deep; ${len(ctx, repair.depthAvailable)} available`);
      }
    }
    return judge(ctx, o);
  });
}

/** Through-bolt with a nut (ISO 898-2 class, ISO 4032 dimensions from the material library), checked by checkJoint as a nut joint. */
export function throughBoltOption(ctx: PlanContext): RepairOption {
  const {deps, repair, joint, thread, base} = ctx;
  const o = skeleton(ctx, 'through-bolt', 'through-bolt and nut');
  o.drill = clearanceHole(thread);
  o.changeSize = o.drill;
  if (!repair.through) return infeasible(o, 'the hole is blind; a nut needs a hole through the part');
  if (!repair.boltLengthMayChange) return infeasible(o, 'needs a longer bolt to take a nut, and the screw length is fixed');
  const nutClass = repair.nutClass ?? deps.nutClassFor?.(joint.boltGrade, base.geometry.spec);
  if (nutClass === undefined) return infeasible(o, `no nut class matched to bolt grade ${joint.boltGrade}; give the nut class`);
  const dims = deps.nutDimensions?.(base.geometry.spec);
  const m = repair.nutHeight ?? dims?.m;
  const s = repair.nutFlats ?? dims?.s;
  if (m === undefined || s === undefined) return infeasible(o, `no tabulated nut for ${ctx.plain}; give the nut height and width across flats`);
  const wall = wallProblem(repair.wall, o.drill, 'the clearance hole', ctx.units);
  if (wall) return infeasible(o, wall);
  const r = safeCheck(ctx, {
    ...joint,
    internal: 'nut', parent: undefined, parentRm: undefined, parentShear: undefined, measured: boltOnly(joint.measured),
    nutClass, nutHeight: m, nutFlats: s, engagement: m, chamfer: 0, holeDepth: undefined,
  });
  if (!r.ok) return infeasible(o, `not computed: ${r.error}`);
  applyResult(o, r.result);
  o.margin = {stripping: r.result.margin.stripping, boltBreaksFirst: r.result.margin.boltBreaksFirst};
  if (repair.depthAvailable !== undefined) {
    // Bolt through the part and the nut, two pitches showing (common practice, no source).
    o.screwLengthChange = repair.depthAvailable - ctx.reach + m + 2 * thread.pitch;
  } else {
    o.screwLengthChange = null;
    o.notes.push('part thickness not given: the bolt must pass through it and the nut with 2 pitches showing');
  }
  o.notes.push(`nut class ${nutClass}, height ${len(ctx, m)}, ${len(ctx, s)} across flats; needs access to the far side, washer under the nut`);
  return judge(ctx, o);
}
