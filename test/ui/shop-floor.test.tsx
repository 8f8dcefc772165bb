/**
 * What went wrong on the shop floor (issue 14): a burst of keys, the hole state
 * going back to intact, a preset's kind, loading over unsaved edits, and the
 * repair chosen kept by identity.
 */
import {afterEach, describe, expect, it} from 'vitest';
import {cleanup} from 'ink-testing-library';
import {startApp} from '../support/start-app.js';
import {FIXTURE_PLAN, FIXTURE_VALUES, fixtureServices} from '../support/fixture-services.js';
import {KEY} from '../support/keys.js';

afterEach(() => cleanup());

describe('a burst of keys in one chunk', () => {
  it('Ctrl-U then "25" in one chunk into a field holding 18 gives 25, not 1825', async () => {
    const app = startApp();
    await app.see('Designation');
    await app.press([KEY.right, KEY.right], '> Engaged length');
    await app.press(['1', '8', KEY.enter], /Engaged length\s+18\.0 mm/);
    await app.press(KEY.enter, '18_ mm');
    await app.press(`${KEY.ctrlU}25`, '25_ mm');
    await app.press(KEY.enter, /Engaged length\s+25\.0 mm/);
    app.unmount();
  });

  it('an arrow and Enter inside one chunk are keys, not text', async () => {
    const app = startApp();
    await app.see('Designation');
    await app.press(`${KEY.right}${KEY.right}`, '> Engaged length');
    await app.press(`${KEY.enter}${KEY.ctrlU}30${KEY.enter}${KEY.down}`, '> Chamfer');
    expect(app.frame()).toMatch(/Engaged length\s+30\.0 mm/);
    app.unmount();
  });
});

describe('the hole state back to intact', () => {
  it('clears the hidden stripped depth; the Repairs screen shows the plan and no internal name', async () => {
    const app = startApp({svc: fixtureServices({repairs: () => FIXTURE_PLAN})});
    await app.see('Designation');
    await app.press(KEY.left, '> Hole');
    await app.press(KEY.enter, /Hole\s+stripped/);
    await app.press(KEY.down, '> Stripped to depth');
    await app.press(['3', KEY.enter], /Stripped to depth\s+3\.00 mm/);
    await app.press(KEY.up, '> Hole');
    await app.press(KEY.enter, /Hole\s+intact/);
    await app.press('r', 'Repairs for: M10x1.5; hole intact');
    await app.see('Longer engagement');
    expect(app.frame()).not.toMatch(/strippedDepth|holeState/);
    expect(JSON.stringify(app.states.at(-1)!.values.hole)).not.toContain('strippedDepth');
    app.unmount();
  });
});

describe('a preset keeps its kind', () => {
  it('s in power-screw mode on a joint preset does not save it as a screw preset', async () => {
    const app = startApp({state: {preset: {name: 'mine', readOnly: false, saved: '{}', kind: 'joint'}} as never});
    await app.see('Preset: mine');
    await app.press('m', 'Power-screw mode');
    await app.press('s');
    expect(app.svc.store.kinds.get('mine')).not.toBe('screw');
    await app.see('"mine" is a joint preset');
    app.unmount();
  });

  it('the Repairs screen in power-screw mode says repairs are for threaded joints', async () => {
    const app = startApp({svc: fixtureServices({repairs: () => FIXTURE_PLAN})});
    await app.press('m', 'Power-screw mode');
    await app.press('r', 'Repairs are for threaded joints');
    expect(app.frame()).not.toContain('Longer engagement');
    app.unmount();
  });
});

describe('loading another preset over unsaved edits', () => {
  const withOther = () => {
    const svc = fixtureServices();
    svc.store.saved.set('other', {values: {...structuredClone(FIXTURE_VALUES), joint: {...FIXTURE_VALUES.joint, engagement: 20}}, savedAt: '2026-01-01T10:00:00.000Z'});
    return svc;
  };
  const edited = async (app: ReturnType<typeof startApp>) => {
    await app.see('Designation');
    await app.press([KEY.right, KEY.right], '> Engaged length');
    await app.press(['1', '6', KEY.enter], '* unsaved changes');
    await app.press('p', 'Presets: 2');
    await app.press(KEY.down);
    await app.press(KEY.enter, 'Unsaved edits: s save, d discard, Esc cancel; then "other" loads');
    expect(app.frame()).toContain('Preset: demo-fixture (shipped demo, read-only)  * unsaved changes');
  };

  it('asks first; Esc cancels and keeps the edits', async () => {
    const app = startApp({svc: withOther()});
    await edited(app);
    await app.press(KEY.escape, 'nothing loaded');
    expect(app.frame()).toContain('Preset: demo-fixture (shipped demo, read-only)  * unsaved changes');
    expect(app.states.at(-1)!.values.joint.engagement).toBe(16);
    app.unmount();
  });

  it('d discards the edits and loads the other preset', async () => {
    const app = startApp({svc: withOther()});
    await edited(app);
    await app.press('d', 'Loaded preset "other"');
    expect(app.states.at(-1)!.values.joint.engagement).toBe(20);
    app.unmount();
  });

  it('s saves first (a shipped demo asks for a name), then loads the other preset', async () => {
    const app = startApp({svc: withOther()});
    await edited(app);
    await app.press('s', 'save as: demo-fixture copy_');
    await app.press(KEY.enter, 'Loaded preset "other"');
    expect(app.svc.store.saved.get('demo-fixture copy')?.values.joint.engagement).toBe(16);
    app.unmount();
  });
});

describe('choosing a repair', () => {
  const base = FIXTURE_PLAN.options[0]!;
  const opt = (label: string, kind: typeof base.kind, rank: number, meetsMargin: boolean, extra: Partial<typeof base> = {}) => ({...base, label, kind, rank, meetsMargin, feasible: true, reason: meetsMargin ? null : 'short of the margin', ...extra});
  /** A planner whose ranking follows the engaged length: at 16 mm the longer engagement falls to the bottom, short of the margin. */
  const planFor = (engagement: number) => ({
    ...FIXTURE_PLAN,
    options:
      engagement > 12
        ? [opt('helical insert 1.5D', 'helical-insert', 1, true), opt('Re-use as it is', 'reuse', 2, true), opt('Longer engagement', 'longer-engagement', 3, false)]
        : [
            opt('Longer engagement', 'longer-engagement', 1, true),
            opt('helical insert 1.5D', 'helical-insert', 2, true),
            opt('Re-use as it is', 'reuse', 3, true, {flags: [{code: 'strips-before-break', level: 'fail', message: 'the parent thread strips at 18.0 kN, before the bolt breaks'}]}),
          ],
  });
  const svc = () =>
    fixtureServices({
      repairs: joint => planFor(joint.engagement),
      report: (_f, _r, _i, meta) => `REPORT chosen=${meta.repairs?.chosen ?? '-'} note=${meta.repairs?.chosenNote ?? '-'}\n${meta.repairs?.plan.options.map(o => `${o.rank} ${o.label}`).join('\n') ?? ''}`,
    });
  const toEngagement = async (app: ReturnType<typeof startApp>, mm: string) => {
    await app.press('j', 'Designation');
    await app.press([KEY.right, KEY.right], '> Engaged length');
    await app.press([...mm, KEY.enter], new RegExp(`Engaged length\\s+${mm}\\.0 mm`));
  };

  it('c marks the repair, not the row: the choice follows it when the list re-ranks, and the report names it', async () => {
    const app = startApp({svc: svc()});
    await app.press('r', '1 Longer engagement');
    expect(app.frame()).toContain('No repair chosen: c chooses the marked one');
    await app.press([KEY.down, 'c'], 'Repair chosen: helical insert 1.5D (rank 2, meets the required margin).');
    expect(app.states.at(-1)!.values.chosenRepair).toEqual({kind: 'helical-insert', label: 'helical insert 1.5D'});
    expect(app.frame()).toContain('* unsaved changes');
    await toEngagement(app, '16');
    await app.press('r', 'Repair chosen: helical insert 1.5D (rank 1, meets the required margin).');
    // The cursor stayed on row 2; the chosen repair, now first, carries the * mark.
    expect(app.frame()).toMatch(/\* 1 helical insert 1\.5D/);
    expect(app.frame()).toMatch(/> 2 Re-use as it is/);
    await app.press('w', 'REPORT chosen=1 note=-');
    app.unmount();
  });

  it('says so on Repairs and on the report when a change leaves the chosen repair short of the margin', async () => {
    const app = startApp({svc: svc()});
    await app.press(['r', 'c'], 'Repair chosen: Longer engagement (rank 1');
    await toEngagement(app, '16');
    await app.press('r', '! Repair chosen: Longer engagement no longer meets the required margin');
    await app.press('w', 'REPORT chosen=3 note=Repair chosen: Longer engagement no longer meets the');
    app.unmount();
  });

  it('warns when the repair chosen is flagged to strip; c again clears the choice', async () => {
    const app = startApp({svc: svc()});
    await app.press(['r', KEY.down, KEY.down, 'c'], '! Warning: the repair chosen, Re-use as it is, is flagged to strip');
    await app.press('c', 'No repair chosen now (was Re-use as it is)');
    expect(app.states.at(-1)!.values.chosenRepair).toBeUndefined();
    app.unmount();
  });

  it('is saved with the preset and comes back when it is loaded', async () => {
    const s = svc();
    const app = startApp({svc: s, state: {preset: {name: 'mine', readOnly: false, saved: '{}', kind: 'joint'}} as never});
    await app.press(['r', KEY.down, 'c'], 'Repair chosen: helical insert 1.5D');
    await app.press(['j', 's'], 'Saved preset "mine".');
    expect(s.store.saved.get('mine')?.values).toMatchObject({chosenRepair: {kind: 'helical-insert', label: 'helical insert 1.5D'}});
    app.unmount();
  });
});

describe('what counts as flagged to strip', () => {
  it('a strips-* FAIL, or a WATCH saying a thread may strip first; not the WATCH that still puts the bolt first', async () => {
    const {chosenStatus} = await import('../../src/ui/screens/repairs/reducer.js');
    const o = FIXTURE_PLAN.options[0]!;
    const planWith = (flags: typeof o.flags) => ({...FIXTURE_PLAN, options: [{...o, flags}]});
    const c = {kind: o.kind, label: o.label};
    const watch = (message: string) => [{code: 'strips-before-break', level: 'watch' as const, message}];
    expect(chosenStatus(planWith(watch('Alexander calls for 20 mm of full thread; only 17 mm is engaged, so a thread may strip before the bolt breaks.')), c)!.ok).toBe(false);
    expect(chosenStatus(planWith(watch('FED-STD-H28 Formula 1 calls for 18 mm of full thread. The stripping forces still put the bolt first (ratio 1.69).')), c)!.ok).toBe(true);
    expect(chosenStatus(planWith([]), c)!.ok).toBe(true);
  });
});

describe('messages in the form words', () => {
  it('replaces internal input names with the field labels', async () => {
    const {withLabels} = await import('../../src/ui/labels.js');
    const text = withLabels('Hole state: strippedDepth a stripped depth was given but holeState is "intact"; set holeState to "stripped"; boltRm too low');
    expect(text).not.toMatch(/strippedDepth|holeState|boltRm/);
    expect(text).toContain('stripped to depth');
    expect(text).toContain('bolt rm too low');
  });
});

describe('quitting keeps the draft through an effect', () => {
  it('q with unsaved edits writes the draft (the reducer asks, the app writes); q with none clears it', async () => {
    const app = startApp();
    await app.see('Designation');
    await app.press([KEY.right, KEY.right], '> Engaged length');
    await app.press(['1', '4', KEY.enter], '* unsaved changes');
    await app.press('q');
    await new Promise(r => setTimeout(r, 50));
    expect(app.svc.store.draft?.values.joint.engagement).toBe(14);
    expect(app.svc.store.draft?.presetName).toBe('demo-fixture');
    expect(app.quits.at(-1)?.draftKept).toBe(true);
    app.unmount();
    const clean = startApp();
    clean.svc.store.draft = {savedAt: 'x', presetName: 'p', values: FIXTURE_VALUES};
    await clean.press('q');
    await new Promise(r => setTimeout(r, 50));
    expect(clean.svc.store.draft).toBeUndefined();
    clean.unmount();
  });
});
