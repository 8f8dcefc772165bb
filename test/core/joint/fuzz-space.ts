/**
 * The option space of `tapwright check` as fast-check arbitraries, and the invariant every
 * generated command must keep: no crash (exit 0, 2 or 3 only), no NaN or Infinity anywhere
 * in the output, and every rejection names its option. Shared by the CI test (1,000 runs)
 * and scripts/fuzz.mjs (100,000 runs).
 */
import fc from 'fast-check';
import {runCli} from '../../../src/cli/main.js';
import {memoryIo} from '../../../src/cli/io.js';
import {listDesignations} from '../../../src/core/threads/index.js';

const CHECK_OPTIONS = [
  '--thread', '--bolt', '--bolt-rm', '--bolt-rp', '--parent', '--parent-rm', '--parent-shear', '--nut', '--nut-height', '--nut-flats',
  '--engage', '--chamfer', '--hole-depth', '--torque', '--preload', '--utilisation', '--mu-thread', '--mu-head', '--nut-factor',
  '--bearing-diameter', '--service-load', '--scatter', '--margin', '--units', '--format', '--json', '--ascii', '--preset',
];

const garbage = fc.constantFrom('', ' ', 'abc', '-', '..', '1e999', 'NaN', 'Infinity', '-0', '0x10', '1,5', '½', '١٢', '-5');
/** A number string inside [min, max], sometimes exactly at a bound. */
const inside = (min: number, max: number): fc.Arbitrary<string> =>
  fc.oneof({weight: 8, arbitrary: fc.double({min, max, noNaN: true}).map(v => String(v))}, {weight: 1, arbitrary: fc.constantFrom(String(min), String(max))});
/** A number string outside [min, max]. */
const outside = (min: number, max: number): fc.Arbitrary<string> =>
  fc.oneof(fc.double({min: -1e6, max: min, noNaN: true, maxExcluded: true}), fc.double({min: max, max: 1e12, noNaN: true, minExcluded: true})).map(v => String(v));

interface Space {
  name: string;
  /** Chance the option appears in a generated command. */
  p: number;
  good: fc.Arbitrary<string>;
  bad: fc.Arbitrary<string>;
}
const q = (name: string, p: number, min: number, max: number, unit: string): Space => ({
  name,
  p,
  good: fc.oneof(inside(min, max), inside(min, max).map(v => `${v}${unit}`)),
  bad: fc.oneof(outside(min, max), garbage, inside(min, max).map(v => `${v}furlong`)),
});

const THREADS = fc.constantFrom(...listDesignations('metric'), ...listDesignations('unified'), 'M10x1.1', 'M10x1.5-4H/4h', 'M10x1.5-6G/6e', '#10-32 UNF-3A/3B');
const BAD_THREADS = fc.oneof(fc.constantFrom('Tr20x4', 'M', 'M0.5', 'M300x6', 'UNC', '1/4-36 UNS'), fc.string({maxLength: 12}));
const MATERIAL_IDS = ['S235', 'S355', 'C45', '42CrMo4-QT', 'EN-GJL-250', '6061-T6', 'AlSi9Cu3-DC', 'CuZn39Pb3', 'AZ91-DC'];
const GRADES = ['4.6', '5.8', '8.8', '10.9', '12.9', 'A2-70', 'A4-80', 'SAE-2', 'SAE-5', 'SAE-8', '9.8'];
const NUTS = ['5', '8', '10', '12', '04', 'SAE-5', 'SAE-8'];
const muGood = fc.oneof(inside(0.02, 0.6), fc.tuple(inside(0.02, 0.3), inside(0.3, 0.6)).map(([a, b]) => `${a}..${b}`));
const muBad = fc.oneof(outside(0.02, 0.6), fc.constant('0.3..0.1'), garbage);

const COMMON: Space[] = [
  {name: '--thread', p: 0.98, good: THREADS, bad: BAD_THREADS},
  {name: '--bolt', p: 0.3, good: fc.constantFrom(...GRADES), bad: fc.constantFrom('x', '8,8', '')},
  q('--bolt-rm', 0.05, 100, 2500, 'MPa'),
  q('--bolt-rp', 0.05, 50, 2400, 'MPa'),
  q('--engage', 0.95, 0.5, 1000, 'mm'),
  q('--chamfer', 0.2, 0, 100, 'mm'),
  {name: '--mu-thread', p: 0.3, good: muGood, bad: muBad},
  {name: '--mu-head', p: 0.3, good: muGood, bad: muBad},
  q('--nut-factor', 0.1, 0.05, 0.5, ''),
  q('--bearing-diameter', 0.1, 1, 2000, 'mm'),
  q('--service-load', 0.2, 0, 1e8, 'N'),
  q('--scatter', 0.15, 1, 4, ''),
  q('--margin', 0.15, 0.5, 5, ''),
  {name: '--units', p: 0.3, good: fc.constantFrom('si', 'us'), bad: fc.constantFrom('metric', '')},
];
const TAPPED: Space[] = [
  {name: '--parent', p: 0.9, good: fc.constantFrom(...MATERIAL_IDS), bad: fc.constantFrom('nope', '')},
  q('--parent-rm', 0.15, 20, 2500, 'MPa'),
  q('--parent-shear', 0.1, 10, 1500, 'MPa'),
  q('--hole-depth', 0.3, 0.5, 2000, 'mm'),
];
const NUT: Space[] = [
  {name: '--nut', p: 0.95, good: fc.constantFrom(...NUTS), bad: fc.constantFrom('q', '')},
  q('--nut-height', 0.3, 0.5, 500, 'mm'),
  q('--nut-flats', 0.3, 1, 1000, 'mm'),
];
const TIGHTEN: Space[] = [q('--torque', 1, 0.01, 100000, 'Nm'), q('--preload', 1, 1, 1e8, 'N'), q('--utilisation', 1, 0.1, 1, '')];
const OUTPUT: string[][] = [[], ['--json'], ['--json'], ['--format', 'json'], ['--format', 'text'], ['--format', 'markdown'], ['--json', '--ascii'], ['--format', 'text', '--ascii']];
const BAD_OUTPUT: string[][] = [['--format', 'html'], ['--json', '--format', 'text'], ['--units']];

/** 0..1 without fast-check's bias towards the ends, for "is this option present". */
const roll = fc.noBias(fc.integer({min: 0, max: 9999})).map(i => i / 10000);

function draw(space: Space[]): fc.Arbitrary<{name: string; roll: number; good: string; bad: string; p: number}[]> {
  return fc.tuple(...space.map(o => fc.record({roll, good: o.good, bad: o.bad}).map(r => ({...r, name: o.name, p: o.p}))));
}

/**
 * A generated argument list for `tapwright check`: a tapped hole or a nut (now and then both),
 * one way of tightening (now and then none or two), every option present with its chance and a
 * value from its accepted range, with or without a unit. In about a quarter of the commands one
 * option gets a bad value instead; cross-option conflicts also arise.
 */
export const checkArgs: fc.Arbitrary<string[]> = fc
  .record({
    common: draw(COMMON),
    tapped: draw(TAPPED),
    nut: draw(NUT),
    kind: fc.constantFrom('tapped', 'tapped', 'tapped', 'tapped', 'nut', 'nut', 'nut', 'both'),
    tighten: draw(TIGHTEN),
    tightenPick: fc.constantFrom(-1, -1, 0, 1, 2, 0, 1, 2, 0, 9),
    corrupt: fc.noBias(fc.integer({min: 0, max: 3})),
    output: fc.oneof({weight: 25, arbitrary: fc.constantFrom(...OUTPUT)}, {weight: 1, arbitrary: fc.constantFrom(...BAD_OUTPUT)}),
  })
  .chain(g => {
    const chosen = [
      ...g.common,
      ...(g.kind !== 'nut' ? g.tapped : []),
      ...(g.kind !== 'tapped' ? g.nut : []),
      ...g.tighten.filter((_, i) => i === g.tightenPick || (g.tightenPick === 9 && i < 2)).map(o => ({...o, roll: 0})),
    ].filter(o => o.roll < o.p);
    return fc.integer({min: 0, max: Math.max(0, chosen.length - 1)}).map(badIndex => {
      const args: string[] = [];
      chosen.forEach((o, i) => args.push(o.name, g.corrupt === 0 && i === badIndex ? o.bad : o.good));
      return [...args, ...g.output];
    });
  });

/** Every number in a parsed JSON value is finite and nothing is null (JSON turns NaN and Infinity into null). */
export function nonFinitePath(v: unknown, at = '$'): string | undefined {
  if (v === null) return at;
  if (typeof v === 'number') return Number.isFinite(v) ? undefined : at;
  if (Array.isArray(v)) {
    for (let i = 0; i < v.length; i++) {
      const p = nonFinitePath(v[i], `${at}[${i}]`);
      if (p) return p;
    }
    return undefined;
  }
  if (typeof v === 'object') {
    for (const [k, x] of Object.entries(v as Record<string, unknown>)) {
      const p = nonFinitePath(x, `${at}.${k}`);
      if (p) return p;
    }
  }
  return undefined;
}

export interface FuzzOutcome {
  code: number;
  problem?: string;
}

/** Run one generated command and return what, if anything, broke the invariant. */
export async function runOne(args: string[]): Promise<FuzzOutcome> {
  const io = memoryIo({env: {TAPWRIGHT_CONFIG_DIR: '/nonexistent-tapwright-fuzz'}});
  const code = await runCli(['check', ...args], io);
  const out = io.stdout();
  const err = io.stderr();
  if (code === 2) {
    const named = /--[a-z][a-z-]*/.exec(err)?.[0];
    if (!named || !CHECK_OPTIONS.includes(named)) return {code, problem: `rejection names no option: ${err.trim()}`};
    // With JSON output a rejection prints one JSON error document (issue 14 item 7), never a result.
    const jsonRequested = args.includes('--json') || (args.includes('--format') && args[args.indexOf('--format') + 1] === 'json');
    if (out !== '') {
      if (!jsonRequested) return {code, problem: 'rejected but printed a result'};
      let doc: {error?: {option?: string}; flags?: unknown};
      try {
        doc = JSON.parse(out) as typeof doc;
      } catch {
        return {code, problem: 'rejected with JSON requested, but stdout is not JSON'};
      }
      if (!doc.error || doc.flags !== undefined) return {code, problem: 'rejected but printed a result'};
      const option = doc.error.option ?? '';
      if (!option.startsWith('--') || !err.includes(option)) return {code, problem: `JSON error names ${option}, not an option of the message`};
    }
    return {code};
  }
  if (code !== 0 && code !== 3) return {code, problem: `exit ${code}: ${err.trim()}`};
  const format = args.includes('--format') ? args[args.indexOf('--format') + 1] : undefined;
  const jsonOut = args.includes('--json') || format === 'json';
  if (jsonOut) {
    let parsed: {flags?: {level: string}[]};
    try {
      parsed = JSON.parse(out) as typeof parsed;
    } catch {
      return {code, problem: 'output is not JSON'};
    }
    const bad = nonFinitePath(parsed);
    if (bad) return {code, problem: `non-finite value at ${bad}`};
    const failed = (parsed.flags ?? []).some(f => f.level === 'fail');
    if (failed !== (code === 3)) return {code, problem: `exit ${code} does not match the fail flags`};
  } else if (/\bNaN\b|Infinity|undefined|\binf\b|n\/a/.test(out)) {
    return {code, problem: 'text output shows a non-finite value'};
  }
  return {code};
}

/** Run `runs` generated commands; resolves with the counts by exit code, rejects on the first broken invariant. */
export async function fuzzCheck(runs: number, seed?: number): Promise<{runs: number; byCode: Record<number, number>}> {
  const byCode: Record<number, number> = {};
  await fc.assert(
    fc.asyncProperty(checkArgs, async args => {
      const r = await runOne(args);
      byCode[r.code] = (byCode[r.code] ?? 0) + 1;
      if (r.problem) throw new Error(`${r.problem}\n  args: ${JSON.stringify(args)}`);
    }),
    {numRuns: runs, ...(seed !== undefined ? {seed} : {})},
  );
  return {runs, byCode};
}
