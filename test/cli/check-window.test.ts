/**
 * `check` and the tightening window (issue 18): the JSON contract (window.torque.{min,max} in
 * N·m, window.limits[] {name, preload}, window.empty; sensitivity[] {input, low, high}), the
 * acceptance runs at the window's ends and 2 % beyond, the new options and their bad input.
 * Method: VDI 2230 Part 1 torque-preload relation with ISO 16047 friction; limits from the
 * check (VDI 2230 Part 1 FM,zul; FED-STD-H28/2B stripping); lubricant ranges VDI 2230 Part 1
 * friction classes; prevailing torques ISO 2320:2008 (M10: 10.5 N·m first installation max).
 */
import {describe, expect, it} from 'vitest';
import {runCheck} from '../support/run-check.js';

const check = runCheck;

async function json(args: string[]) {
  const r = await check([...args, '--json']);
  expect(r.err).toBe('');
  return JSON.parse(r.out) as Record<string, any>;
}

const UPPER = ['preload-over-yield', 'strips-at-preload'];
const upperFlags = (j: Record<string, any>) => (j.flags as {code: string}[]).filter(f => UPPER.includes(f.code)).map(f => f.code);
const at = (joint: string[], torque: number) => json([...joint, '--torque', `${torque}Nm`]);

/** Demo joints: one whose band top is the yield utilisation limit, one whose top is thread stripping. */
const YIELD_TOP = ['--thread', 'M10', '--parent', 'S355', '--engage', '15'];
const STRIP_TOP = ['--thread', 'M10', '--bolt', '12.9', '--parent', 'AlSi9Cu3-DC', '--engage', '12'];

describe('check --json: the tightening window contract', () => {
  it('window.torque.{min,max} in N·m, window.limits[] {name, preload}, window.empty; sensitivity[] {input, low, high}', async () => {
    const j = await at(YIELD_TOP, 40);
    expect(j.window.empty).toBe(false);
    expect(typeof j.window.torque.min).toBe('number');
    expect(typeof j.window.torque.max).toBe('number');
    expect(j.window.torque.max).toBeGreaterThan(j.window.torque.min);
    for (const l of j.window.limits) {
      expect(typeof l.name).toBe('string');
      expect(typeof l.preload).toBe('number');
    }
    expect(j.window.limits.map((l: {name: string}) => l.name)).toEqual(expect.arrayContaining(['yield-utilisation', 'stripping', 'bolt-break']));
    expect(j.sensitivity.length).toBeGreaterThan(0);
    for (const s of j.sensitivity) for (const k of ['input', 'low', 'high']) expect(s).toHaveProperty(k);
    // Ranked by effect, largest first.
    const effects = j.sensitivity.map((s: {low: number; high: number}) => Math.abs(s.high - s.low));
    expect([...effects].sort((a, b) => b - a)).toEqual(effects);
  });

  it('an empty window: window.empty true and no window.torque', async () => {
    const j = await at(['--thread', 'M10', '--bolt', '12.9', '--parent', 'AlSi9Cu3-DC', '--engage', '9'], 20);
    expect(j.window.empty).toBe(true);
    expect(j.window.torque).toBeUndefined();
    expect(j.window.upperLimit).toBe('stripping');
  });
});

describe('check --json at the window ends and 2 % beyond (acceptance runs)', () => {
  for (const [name, joint, top] of [
    ['yield utilisation sets the top', YIELD_TOP, 'yield-utilisation'],
    ['thread stripping sets the top', STRIP_TOP, 'stripping'],
  ] as const) {
    it(`${name}: at torque.max no upper-limit flag, at 1.02 x one is raised`, async () => {
      const w = (await at(joint, 30)).window;
      expect(w.upperLimit).toBe(top);
      const atMax = await at(joint, w.torque.max);
      expect(upperFlags(atMax)).toEqual([]);
      expect(atMax.window.present.inside).toBe(true);
      const beyond = await at(joint, w.torque.max * 1.02);
      expect(upperFlags(beyond)).toHaveLength(1);
      expect(beyond.window.present.inside).toBe(false);
    });

    it(`${name}: at torque.min the lowest preload meets the lower limit, at 0.98 x it falls short`, async () => {
      const w = (await at(joint, 30)).window;
      const lower = w.limits.find((l: {name: string}) => l.name === w.lowerLimit);
      const atMin = await at(joint, w.torque.min);
      expect(atMin.tightening.preload.min).toBeGreaterThanOrEqual(lower.preload * (1 - 1e-9));
      expect(upperFlags(atMin)).toEqual([]);
      const below = await at(joint, w.torque.min * 0.98);
      expect(below.tightening.preload.min).toBeLessThan(lower.preload);
      expect(below.window.present.inside).toBe(false);
    });
  }
});

describe('check: lubricant, locking element, prevailing torque, wrench accuracy', () => {
  it('--lubricant sets both friction ranges from the pick and stays in the input; --mu-thread given as well wins', async () => {
    const j = await at([...YIELD_TOP, '--lubricant', 'mos2-paste'], 40);
    expect(j.input.window.lubricant).toBe('mos2-paste');
    // VDI 2230 Part 1 friction class A: 0.04 to 0.10.
    expect(j.input.muThread).toEqual({min: 0.04, max: 0.1});
    expect(j.input.muHead).toEqual({min: 0.04, max: 0.1});
    expect(j.window.lubricant.id).toBe('mos2-paste');
    const own = await at([...YIELD_TOP, '--lubricant', 'mos2-paste', '--mu-thread', '0.12'], 40);
    expect(own.input.muThread).toEqual({min: 0.12, max: 0.12});
    expect(own.input.muHead).toEqual({min: 0.04, max: 0.1});
    expect(own.window.lubricant.frictionAsPick).toBe(false);
  });

  it('--locking adds the ISO 2320 prevailing torque on the wrench (M10: 10.5 N·m); --prevailing-torque replaces it', async () => {
    const j = await at([...YIELD_TOP, '--locking', 'polymer-insert-nut'], 40);
    expect(j.input.window.locking).toBe('polymer-insert-nut');
    expect(j.window.wrench.prevailing).toBe(10.5);
    expect(j.window.wrench.min).toBeCloseTo(j.window.torque.min + 10.5, 9);
    const own = await at([...YIELD_TOP, '--locking', 'all-metal-nut', '--prevailing-torque', '4Nm'], 40);
    expect(own.window.wrench.prevailing).toBe(4);
  });

  it('--wrench-accuracy sets the torque end of the sensitivity list', async () => {
    const j = await at([...YIELD_TOP, '--wrench-accuracy', '10%'], 40);
    const torque = j.sensitivity.find((s: {input: string}) => s.input === 'torque');
    expect(torque.lowSetting).toBe('36 N·m');
  });

  it('--least-clamp sets the bottom of the band', async () => {
    const j = await at([...YIELD_TOP, '--least-clamp', '20kN'], 40);
    expect(j.window.lowerLimit).toBe('least-clamp');
    expect(j.window.limits.find((l: {name: string}) => l.name === 'least-clamp').preload).toBe(20000);
  });

  it('text names the band with the limit at each end, in ft·lbf with --units us; Markdown has the section', async () => {
    const t = await check([...YIELD_TOP, '--torque', '40Nm', '--locking', 'polymer-insert-nut', '--units', 'us']);
    expect(t.out).toMatch(/TIGHTENING WINDOW/);
    expect(t.out).toMatch(/Tightening torque band\s+[0-9.]+ ft·lbf to [0-9.]+ ft·lbf/);
    expect(t.out).toMatch(/Top set by\s+yield utilisation limit/);
    expect(t.out).toMatch(/Set on the wrench/);
    expect(t.out).toMatch(/WHAT MATTERS MOST/);
    const m = await check([...YIELD_TOP, '--torque', '40Nm', '--format', 'markdown']);
    expect(m.out).toMatch(/## Tightening window/);
    expect(m.out).toMatch(/## What matters most/);
  });
});

describe('check: bad input for the window options exits 2 naming the option and what it takes', () => {
  for (const [args, option, accepted] of [
    [['--lubricant', 'grease'], '--lubricant', /mos2-paste/],
    [['--locking', 'wire'], '--locking', /all-metal-nut, polymer-insert-nut, patch-screw/],
    [['--prevailing-torque', '-1'], '--prevailing-torque', /accepted: 0 N·m to 5000 N·m/],
    [['--wrench-accuracy', '2'], '--wrench-accuracy', /0\.005 to 0\.5/],
    [['--least-clamp', 'lots'], '--least-clamp', /accepted/],
  ] as const) {
    it(`${args.join(' ')}`, async () => {
      const r = await check([...YIELD_TOP, '--torque', '40Nm', ...args]);
      expect(r.code).toBe(2);
      expect(r.err).toContain(option);
      expect(r.err).toMatch(accepted);
      expect(r.err).not.toMatch(/\n\s+at /);
    });
  }

  it('a locking element on a size ISO 2320 does not list asks for --prevailing-torque', async () => {
    const r = await check(['--thread', '1/2-13 UNC', '--parent', 'S355', '--engage', '0.75in', '--torque', '40Nm', '--locking', 'all-metal-nut']);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/--prevailing-torque/);
  });
});
