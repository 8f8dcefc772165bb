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
export const OVERSIZE_CANDIDATES = 3;

/** A series size the planner considered and did not offer, with the reason in plain words. */
export interface LeftOutSize {
  designation: string;
  reason: string;
}

/** Basic minor diameter of the internal thread D1 = D - 1.082532 P, mm (ISO 68-1 / ASME B1.1). */
function basicMinor(s: SeriesThread): number {
  return s.nominal - 1.082532 * s.pitch;
}

/**
 * Candidate sizes: larger nominal with a basic minor diameter D1 = D - 1.082532P (ISO 68-1 /
 * ASME B1.1) at least the old major diameter, so the new tap drill removes the old thread (common
 * practice, no source). Smallest size first; at one size the coarse pitch (the largest in the
 * series, the usual choice: M8 -> M10x1.5, tap drill 8.5 mm) first, then the finer ones. The first
 * OVERSIZE_CANDIDATES are offered; the sizes up to the last offered one that were passed over are
 * returned with the reason (D1 does not clear the old thread, or the list is full).
 */
export function oversizeSelection(
  thread: ThreadBasics,
  series: readonly SeriesThread[],
  length: (mm: number) => string = mm => `${mm.toFixed(2)} mm`,
): {offered: SeriesThread[]; leftOut: LeftOutSize[]} {
  const larger = series.filter(s => s.nominal > thread.nominal + 1e-9).sort((a, b) => a.nominal - b.nominal || b.pitch - a.pitch);
  const offered: SeriesThread[] = [];
  const leftOut: LeftOutSize[] = [];
  for (const s of larger) {
    if (basicMinor(s) < thread.nominal - 1e-9) {
      leftOut.push({designation: s.designation, reason: `its minor diameter D1 ${length(basicMinor(s))} would leave the old ${length(thread.nominal)} thread in the hole`});
    } else if (offered.length < OVERSIZE_CANDIDATES) {
      offered.push(s);
    } else {
      leftOut.push({designation: s.designation, reason: `only the nearest ${OVERSIZE_CANDIDATES} sizes are offered`});
    }
  }
  const last = offered[offered.length - 1];
  return {offered, leftOut: last ? leftOut.filter(l => (larger.find(s => s.designation === l.designation)?.nominal ?? Infinity) <= last.nominal + 1e-9) : leftOut.slice(0, 3)};
}

/** The offered sizes of oversizeSelection. */
export function oversizeCandidates(thread: ThreadBasics, series: readonly SeriesThread[]): SeriesThread[] {
  return oversizeSelection(thread, series).offered;
}

/** Oversize thread options (oversizeCandidates), each checked by checkJoint with the larger screw, mm/N/N·m. */
export function oversizeOptions(ctx: PlanContext): RepairOption[] {
  const {deps, repair, joint, base} = ctx;
  const series = deps.seriesAbove ? deps.seriesAbove(base.geometry.spec) : [];
  const {offered: candidates, leftOut} = oversizeSelection(ctx.thread, series, mm => len(ctx, mm, 2));
  if (candidates.length === 0) {
    const o = skeleton(ctx, 'oversize', 'oversize thread');
    return [infeasible(o, deps.seriesAbove ? 'no larger series size has a minor diameter that clears the old thread' : 'thread series list not available')];
  }
  const leftOutNote = leftOut.length > 0 ? `left out: ${leftOut.map(l => `${l.designation} (${l.reason})`).join('; ')}` : undefined;
  return candidates.map((c, i) => {
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
    if (i === 0 && leftOutNote) o.notes.push(leftOutNote);
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
