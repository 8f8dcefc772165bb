import {afterEach, describe, expect, it} from 'vitest';
import {cleanup} from 'ink-testing-library';
import {startApp} from '../support/start-app.js';
import {FIXTURE_VALUES} from '../support/fixture-services.js';
import {KEY} from '../support/keys.js';

afterEach(() => cleanup());

describe('terminal size', () => {
  it('says so below 80x24, keeps the state, and comes back on resize', async () => {
    const app = startApp();
    await app.press([KEY.right, KEY.right, '3', '3', KEY.enter], /Engaged length\s+33\.0 mm/);
    app.stdout.resize(70, 20);
    await app.see('Terminal is 70x20; tapwright needs at least 80x24. Enlarge it, or\npress q to quit.');
    expect(app.frame().split('\n').length).toBeLessThanOrEqual(19);
    app.stdout.resize(100, 30);
    await app.see(/Engaged length\s+33\.0 mm/);
    const lines = app.frame().split('\n');
    expect(lines.length).toBeLessThanOrEqual(29);
    expect(Math.max(...lines.map(l => l.length))).toBeGreaterThan(80);
    app.unmount();
  });

  it('quits with q even when the terminal is too small', async () => {
    const app = startApp({columns: 60, rows: 15});
    await app.see('Terminal is 60x15');
    await app.press('q');
    expect(app.quits.map(s => s.quit)).toEqual(['quit']);
  });
});

describe('quitting and the draft', () => {
  it('Ctrl-C reaches the app as an interrupt (it keeps the draft and restores the terminal)', async () => {
    const app = startApp();
    await app.see('Preload');
    await app.press(KEY.ctrlC);
    expect(app.quits[0]?.quit).toBe('interrupt');
  });

  it('does not quit on q while typing a value: q is just a character there', async () => {
    const app = startApp();
    await app.press(KEY.enter, 'M10x1.5_');
    await app.press('q', 'M10x1.5q_');
    expect(app.quits).toHaveLength(0);
    app.unmount();
  });

  it('offers a draft at start; y restores it, n discards it', async () => {
    const draftValues = structuredClone(FIXTURE_VALUES);
    draftValues.joint.engagement = 21;
    const app = startApp({draft: {savedAt: '2026-02-03T04:05:06.000Z', presetName: 'demo-fixture', values: draftValues}});
    await app.see('Restore the unsaved edits from 2026-02-03 04:05? y/n (preset demo-fixture)');
    await app.press('j');
    expect(app.frame()).toContain('Restore the unsaved edits');
    await app.press('y', 'Restored the unsaved edits of 2026-02-03 04:05');
    expect(app.frame()).toContain('* unsaved changes');
    await app.press([KEY.right, KEY.right], /Engaged length\s+21\.0 mm/);
    app.unmount();

    const other = startApp({draft: {savedAt: '2026-02-03T04:05:06.000Z', presetName: 'mine', values: draftValues}});
    other.svc.store.saved.set('mine', {values: structuredClone(FIXTURE_VALUES), savedAt: '2026-01-01T10:00:00.000Z'});
    await other.press('y', 'Restored the unsaved edits');
    expect(other.frame()).toContain('Preset: mine  * unsaved changes');
    await other.press('s', 'Saved preset "mine".');
    other.unmount();

    const again = startApp({draft: {savedAt: '2026-02-03T04:05:06.000Z', presetName: 'demo-fixture', values: draftValues}});
    again.svc.store.draft = {savedAt: 'x', presetName: 'p', values: draftValues};
    await again.press('n', 'Draft discarded');
    expect(again.svc.store.draft).toBeUndefined();
    expect(again.frame()).toContain('  saved');
    again.unmount();
  });
});

describe('a screen that fails to draw', () => {
  it('says so and keeps the keys working', async () => {
    const {fixtureServices, fixtureResult} = await import('../support/fixture-services.js');
    const svc = fixtureServices({check: input => ({...fixtureResult(input), stripping: undefined as never})});
    const app = startApp({svc});
    await app.see('! This screen could not be drawn');
    expect(app.frame()).toContain('Estimates only.');
    await app.press('p', 'Presets: 1');
    app.unmount();
  });
});
