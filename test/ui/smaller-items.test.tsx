/** The smaller workbench items of issue 14 item 15 (fixture presets and values, invented for the tests). */
import {afterEach, describe, expect, it} from 'vitest';
import {cleanup} from 'ink-testing-library';
import {startApp} from '../support/start-app.js';
import {FIXTURE_VALUES, fixtureServices} from '../support/fixture-services.js';
import {KEY} from '../support/keys.js';

afterEach(() => cleanup());

const withSaved = () => {
  const svc = fixtureServices();
  svc.store.saved.set('pump casing', {values: structuredClone(FIXTURE_VALUES), savedAt: '2026-01-01T10:00:00.000Z'});
  svc.store.saved.set('gear cover', {values: structuredClone(FIXTURE_VALUES), savedAt: '2026-01-01T10:00:00.000Z'});
  return svc;
};

describe('presets screen', () => {
  it('x on a shipped demo says it is read-only, and asks nothing', async () => {
    const app = startApp();
    await app.press('p', '> demo-fixture');
    await app.press('x', /cannot\s+be\s+deleted/);
    expect(app.frame().replace(/\s+/g, ' ')).toContain('"demo-fixture" is a shipped demo preset (read-only): it cannot be deleted');
    expect(app.frame()).not.toContain('cannot be undone');
    expect(app.states.at(-1)!.confirm).toBeUndefined();
    app.unmount();
  });

  it('the search filters the list as you type; Esc puts the search before back', async () => {
    const app = startApp({svc: withSaved()});
    await app.press('p', 'pump casing');
    await app.press(['/', 'p', 'u'], 'Search presets: pu');
    expect(app.frame()).toContain('pump casing');
    expect(app.frame()).not.toContain('gear cover');
    await app.press(KEY.escape, 'gear cover');
    app.unmount();
  });

  it('N starts a new blank joint; over unsaved edits it asks first, and s then asks for a name', async () => {
    const app = startApp();
    await app.press([KEY.right, KEY.right, '3', '3', KEY.enter], /Engaged length\s+33\.0 mm/);
    await app.press('N', 'Unsaved edits: s save, d discard, Esc cancel; then a new blank joint opens');
    await app.press('d', 'A new blank joint');
    expect(app.frame()).toContain('Preset: new joint');
    expect(app.states.at(-1)!.values.joint).toEqual({thread: 'M10', engagement: 10});
    await app.press('s', 'A new joint; save it as');
    app.unmount();
  });
});

describe('report preview of another preset', () => {
  it('starts at the top', async () => {
    const app = startApp({svc: withSaved()});
    await app.press('w', 'Report preview');
    await app.press([KEY.pageDown, KEY.pageDown], /lines [1-9]\d*-\d+ of/);
    expect(app.states.at(-1)!.report.scroll).toBeGreaterThan(0);
    await app.press(['p', KEY.down], '> gear cover');
    await app.press(KEY.enter, 'Loaded preset "gear cover"');
    await app.press('w', 'Report preview');
    expect(app.frame()).toContain('lines 1-');
    expect(app.states.at(-1)!.report.scroll).toBe(0);
    app.unmount();
  });
});

describe('the preset the workbench opens on', () => {
  it('is the last preset used (settings lastPreset), unless --preset names one; a gone one falls back to the default', async () => {
    const {openingPreset} = await import('../../src/ui/opening-preset.js');
    const svc = withSaved();
    expect(openingPreset(svc.presets, undefined, 'pump casing', 'demo-fixture').name).toBe('pump casing');
    expect(openingPreset(svc.presets, 'gear cover', 'pump casing', 'demo-fixture').name).toBe('gear cover');
    expect(openingPreset(svc.presets, undefined, 'deleted since', 'demo-fixture').name).toBe('demo-fixture');
    expect(openingPreset(svc.presets, undefined, undefined, 'demo-fixture').name).toBe('demo-fixture');
    expect(() => openingPreset(svc.presets, 'no such', undefined, 'demo-fixture')).toThrow(/no preset named "no such"/);
  });
});

describe('"Stripped to depth" takes "all", as the CLI option does', () => {
  it('all: the whole engaged length (the field empties, as --stripped-depth all leaves the depth out)', async () => {
    const app = startApp();
    await app.see('Designation');
    await app.press(KEY.left, '> Hole');
    await app.press(KEY.enter, /Hole\s+stripped/);
    await app.press(KEY.down, '> Stripped to depth');
    await app.press(['3', KEY.enter], /Stripped to depth\s+3\.00 mm/);
    await app.press([KEY.enter, KEY.ctrlU, ...'all', KEY.enter], /Stripped to depth\s+all\s/);
    expect(app.frame()).not.toMatch(/! /);
    expect(app.states.at(-1)!.values.hole.holeState).toBe('stripped');
    expect((app.states.at(-1)!.values.hole as {strippedDepth?: number}).strippedDepth).toBeUndefined();
    app.unmount();
  });
});

describe('typed units', () => {
  it('in US units a length field takes "1/2" (inches)', async () => {
    const app = startApp({state: {units: 'us'}});
    await app.see('Designation');
    await app.press([KEY.right, KEY.right], '> Engaged length');
    await app.press([KEY.enter, KEY.ctrlU, ...'1/2', KEY.enter], /Engaged length\s+0\.500 in/);
    expect(app.states.at(-1)!.values.joint.engagement).toBeCloseTo(12.7, 9);
    app.unmount();
  });
});
