/**
 * The workbench's Tightening step (issue 18): the window picture whole at 80x24 in ASCII mode,
 * `b` to the band's middle (hint only with a band), the lubricant and locking-element lists with
 * their sources, a lubricant setting both friction fields, and `t` on a friction field.
 * Friction ranges: VDI 2230 Part 1 friction classes (class B 0.08..0.16, class A 0.04..0.10);
 * prevailing torque ISO 2320:2008 (M10 10.5 N·m). Joint values are a demo.
 */
import {afterEach, describe, expect, it} from 'vitest';
import {cleanup} from 'ink-testing-library';
import {checkJoint} from '../../src/core/joint/index.js';
import {windowPicks} from '../../src/ui/window-picks.js';
import {setChosen} from '../../src/ui/state/chosen.js';
import {windowPicture} from '../../src/ui/components/window-picture.js';
import {tighteningWindow} from '../../src/core/joint/window.js';
import {JointInputSchema} from '../../src/core/joint/input.js';
import {FASTENER_FRICTION} from '../../src/core/joint/friction-picks.js';
import {startApp} from '../support/start-app.js';
import {FIXTURE_VALUES, fixtureServices} from '../support/fixture-services.js';
import {KEY} from '../support/keys.js';
import type {PickSource} from '../../src/app/fields-types.js';

afterEach(() => cleanup());

/** Real checks and the window's real pick lists on the fixture services; a demo joint. */
const svc = () => {
  const base = fixtureServices();
  return fixtureServices({check: checkJoint, picks: (source: PickSource, units) => windowPicks(source) ?? base.picks(source, units)});
};
const values = {...FIXTURE_VALUES, joint: {thread: 'M10', boltGrade: '8.8', internal: 'tapped' as const, parent: 'S355', engagement: 15, tightening: 'torque' as const, torque: 40}};

describe('the Tightening step', () => {
  it('shows the window whole at 80x24 in ASCII; b sets the torque to the band middle', async () => {
    const app = startApp({svc: svc(), state: {values}});
    await app.see('Designation');
    await app.press([KEY.right, KEY.right, KEY.right], /band \d+\.\d N\*m to \d+\.\d N\*m/);
    const frame = app.frame();
    const lines = frame.split('\n');
    expect(lines.length).toBeLessThanOrEqual(23);
    for (const l of lines) {
      expect(l.length).toBeLessThanOrEqual(80);
      expect(/^[\x20-\x7e]*$/.test(l)).toBe(true);
    }
    expect(frame).toMatch(/Matters most/);
    expect(frame).toMatch(/b band middle/);
    await app.press('b', /Torque set to the band's middle/);
    const state = app.states.at(-1)!;
    const input = JointInputSchema.parse(state.values.joint);
    const w = tighteningWindow(input, checkJoint(input));
    expect(state.values.joint.torque).toBeGreaterThan(w.torque!.min);
    expect(state.values.joint.torque).toBeLessThan(w.torque!.max);
    expect(Math.abs(state.values.joint.torque! / w.torque!.middle - 1)).toBeLessThan(1e-3);
    app.unmount();
  });

  it('a lubricant from the list sets both friction fields; a locking element puts the wrench setting on screen', async () => {
    const app = startApp({svc: svc(), state: {values}});
    await app.see('Designation');
    await app.press([KEY.right, KEY.right, KEY.right], '> Tighten by');
    await app.press([KEY.down, KEY.down], '> Lubricant');
    await app.press(KEY.enter, /Source: from memory: VDI/);
    await app.press(['m', 'o', 's', '2', KEY.enter], /Thread friction\s+0\.040\.\.0\.10/);
    expect(app.frame()).toMatch(/Head friction\s+0\.040\.\.0\.10/);
    await app.press([KEY.down, KEY.down, KEY.down, KEY.down, KEY.down, KEY.down], '> Locking element');
    await app.press(KEY.enter, /ISO 2320:2008, table/);
    await app.press(['p', 'o', 'l', 'y', KEY.enter], /Wrench [0-9.]+ to [0-9.]+ N\*m \(\+10\.5 locking\)/);
    app.unmount();
  });

  it('t on Thread friction lists the fastener friction rows with sources and takes the range', async () => {
    const app = startApp({svc: svc(), state: {values}});
    await app.see('Designation');
    await app.press([KEY.right, KEY.right, KEY.right], '> Tighten by');
    await app.press([KEY.down, KEY.down, KEY.down], '> Thread friction');
    expect(app.frame()).toMatch(/t table/);
    await app.press('t', /Source: /);
    await app.press(['p', 'h', 'o', 's', KEY.enter], /Thread friction\s+0\.080\.\.0\.16/);
    app.unmount();
  });
});

describe('the window pieces of the workbench', () => {
  it('every lubricant entry names its source; the friction table rows carry the pick ranges', () => {
    const lub = windowPicks('fastenerLubricant')!;
    expect(lub).toHaveLength(FASTENER_FRICTION.length);
    for (const p of lub) expect(p.provenance.source).toMatch(/VDI 2230 Part 1|from memory/);
    const thread = windowPicks('fastenerThreadFriction')!;
    for (const [i, p] of FASTENER_FRICTION.entries()) expect(thread[i]!.value).toEqual(p.thread);
    for (const e of windowPicks('lockingElement')!) expect(e.provenance.source).toMatch(/ISO 2320/);
    expect(windowPicks('boltGrade')).toBeUndefined();
  });

  it('choosing a lubricant sets both friction ranges (VDI 2230 Part 1 class B for phosphated and oiled)', () => {
    const v = setChosen(values, 'window.lubricant', 'phosphate-oiled');
    expect(v.joint.window?.lubricant).toBe('phosphate-oiled');
    expect(v.joint.muThread).toEqual({min: 0.08, max: 0.16});
    expect(v.joint.muHead).toEqual({min: 0.08, max: 0.16});
  });

  it('the picture at the panel size (45 x 9) keeps its key in three lines, ASCII only', () => {
    const input = JointInputSchema.parse(values.joint);
    const lines = windowPicture(tighteningWindow(input, checkJoint(input)), 45, 9, true);
    expect(lines).toHaveLength(9);
    for (const l of lines) expect(l.length).toBeLessThanOrEqual(45);
    expect(lines[6]).toMatch(/^= band/);
    expect(lines[7]).toMatch(/Y yield/);
    expect(lines[8]).toMatch(/\/ low \. high friction {2}\^ now 40\.0 N\*m/);
  });
});

describe('a locking element on a size ISO 2320 does not list', () => {
  it('the panel says so and names the Prevailing torque field, not an option', async () => {
    const {evaluateOutlook} = await import('../../src/ui/state/outlook.js');
    const input = JointInputSchema.parse({thread: '1/2-13 UNC', parent: 'S355', engagement: 19, window: {locking: 'all-metal-nut'}});
    const o = evaluateOutlook({input, result: checkJoint(input), errors: {}});
    expect(o.outlook).toBeUndefined();
    expect(o.error).toMatch(/ISO 2320 lists no prevailing torque/);
    expect(o.error).toMatch(/give a Prevailing torque/);
  });
});
