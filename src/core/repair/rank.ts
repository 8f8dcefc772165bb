/**
 * Ranking of repair options and the effort scale. The rule is written once here
 * so the README, the Help screen and the CLI show the same words.
 */
import type {Effort, RepairKind, RepairOption} from './types.js';

/**
 * Our own ordinal scale of shop work, least change to the part and the
 * hardware first.
 */
export const EFFORT_SCALE: Record<RepairKind, Effort> = {
  reuse: {grade: 1, name: 'chase', text: 'chase and clean the thread, re-use it'},
  'longer-engagement': {grade: 2, name: 'deepen', text: 'drill and tap deeper, fit a longer screw'},
  'helical-insert': {grade: 3, name: 'coil', text: 'drill and tap oversize, wind in a helical wire insert'},
  'solid-insert': {grade: 4, name: 'bush', text: 'drill and tap larger, fit a solid key-locked insert'},
  'through-bolt': {grade: 5, name: 'through', text: 'drill out to a clearance hole, fit a bolt and nut'},
  oversize: {grade: 6, name: 'resize', text: 'tap a larger thread, fit a larger screw, open the clamped part'},
};

/** The effort scale in words, one line a grade. */
export const EFFORT_SCALE_TEXT: string = Object.values(EFFORT_SCALE)
  .map(e => `E${e.grade} ${e.name}: ${e.text}`)
  .join('\n');

/** The ranking rule, as shown in the README, the Help screen and `repair --help`. */
export const REPAIR_RANKING_RULE =
  'Options that can be done and meet the required margin come first, least change to the part ' +
  'and the hardware first (effort grade E1 to E6, then the smaller change inside a grade), ' +
  'ties broken by the larger bolt-breaks-first margin. Then the options that can be done but ' +
  'fall short of the margin, larger margin first. Last the options that cannot be done here, ' +
  'each with the reason.';

function group(o: RepairOption): number {
  if (!o.feasible) return 2;
  return o.meetsMargin ? 0 : 1;
}

function marginOf(o: RepairOption): number {
  const m = o.margin.boltBreaksFirst;
  return m === null || !Number.isFinite(m) ? -Infinity : m;
}

/** Comparator implementing REPAIR_RANKING_RULE. */
export function compareOptions(a: RepairOption, b: RepairOption): number {
  const g = group(a) - group(b);
  if (g !== 0) return g;
  if (group(a) === 0) {
    const e = a.effort.grade - b.effort.grade;
    if (e !== 0) return e;
    const c = a.changeSize - b.changeSize;
    if (Math.abs(c) > 1e-9) return c;
    return marginOf(b) - marginOf(a);
  }
  if (group(a) === 1) {
    const m = marginOf(b) - marginOf(a);
    if (m !== 0) return m;
    return a.effort.grade - b.effort.grade;
  }
  const e = a.effort.grade - b.effort.grade;
  if (e !== 0) return e;
  return a.changeSize - b.changeSize;
}

/** Sort by REPAIR_RANKING_RULE and number the ranks from 1 (a stable sort; the input is not changed). */
export function rankOptions(options: readonly RepairOption[]): RepairOption[] {
  return options
    .map((o, i) => ({o, i}))
    .sort((x, y) => compareOptions(x.o, y.o) || x.i - y.i)
    .map(({o}, i) => ({...o, rank: i + 1}));
}
