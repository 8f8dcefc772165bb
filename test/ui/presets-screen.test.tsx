import {afterEach, describe, expect, it} from 'vitest';
import {cleanup} from 'ink-testing-library';
import {startApp} from '../support/start-app.js';
import {KEY} from '../support/keys.js';

afterEach(() => cleanup());

const type = async (app: ReturnType<typeof startApp>, text: string) => {
  for (const ch of text) await app.press(ch);
};

describe('presets screen', () => {
  it('lists presets; a shipped demo asks for a new name on save', async () => {
    const app = startApp();
    await app.press('p', 'Presets: 1');
    expect(app.frame()).toMatch(/demo-fixture \(open\)\s+joint, demo\s+M10x1\.5\s+shipped/);
    expect(app.frame()).toContain('i import  e export');
    await app.press('s', '"demo-fixture" is a shipped demo; save as: demo-fixture copy_');
    await app.press(KEY.ctrlU, 'save as: _');
    await type(app, 'pump 7');
    await app.press(KEY.enter, 'Saved preset "pump 7".');
    expect(app.frame()).toContain('Preset: pump 7  saved');
    expect(app.svc.store.saved.has('pump 7')).toBe(true);
    app.unmount();
  });

  it('shows unsaved changes and saves into the current preset', async () => {
    const app = startApp({state: {preset: {name: 'mine', readOnly: false, saved: '{}'}}});
    await app.see('Preset: mine  * unsaved changes');
    await app.press('s', 'Saved preset "mine".');
    expect(app.frame()).toContain('Preset: mine  saved');
    app.unmount();
  });

  it('saves as, searches, renames, duplicates, deletes with confirmation', async () => {
    const app = startApp();
    await app.press(['p', 'a'], 'Save the joint as: _');
    await type(app, 'a/b');
    await app.press(KEY.enter, '! Could not save "a/b": preset name must be 1 to 64 characters');
    expect(app.frame()).toContain('Save the joint as: a/b_');
    await app.press(KEY.ctrlU, 'Save the joint as: _');
    expect(app.frame()).not.toContain('Could not save');
    await type(app, 'alpha');
    await app.press(KEY.enter, 'Saved preset "alpha".');
    await app.press('a');
    await type(app, 'alpha');
    await app.press(KEY.enter, 'Preset "alpha" exists. Replace it? (y/n)');
    await app.press('n', 'Left as it was');
    await app.press('/', 'Search presets: _');
    await type(app, 'alp');
    await app.press(KEY.enter, 'Presets: 1 matching "alp"');
    await app.press('n', 'Rename "alpha" to: alpha_');
    await type(app, '-2');
    await app.press(KEY.enter, 'Renamed "alpha" to "alpha-2".');
    expect(app.frame()).toContain('Preset: alpha-2');
    await app.press(['/', KEY.ctrlU]);
    for (let i = 0; i < 5; i++) await app.press(KEY.backspace);
    await app.press(KEY.enter, 'Presets: 2');
    await app.press('d', 'Copy "alpha-2" as: alpha-2 copy_');
    await app.press(KEY.enter, 'Copied "alpha-2" to "alpha-2 copy".');
    await app.see('Presets: 3');
    await app.press('x', 'Delete preset "alpha-2"? This cannot be undone. (y/n)');
    await app.press('y', 'Deleted preset "alpha-2".');
    await app.see('Presets: 2');
    expect([...app.svc.store.saved.keys()].sort()).toEqual(['alpha-2 copy']);
    app.unmount();
  });

  it('imports and exports, naming the file in each message', async () => {
    const app = startApp();
    await app.press(['p', 'i'], 'Import presets from file: _');
    await type(app, 'missing.json');
    await app.press(KEY.enter, '! cannot read missing.json: no such file');
    expect(app.frame()).toContain('Import presets from file: missing.json');
    await app.press(KEY.escape, 'Cancelled');
    app.svc.store.files.set('in.json', '{}');
    await app.press('i');
    await type(app, 'in.json');
    await app.press(KEY.enter, 'Imported 1 preset(s): imported-one');
    await app.press([KEY.down, KEY.down]);
    await app.press('e', 'to file: ');
    await app.press(KEY.enter, /Exported ".+" to .+\.json\./);
    await app.press('E', 'Export all saved presets to file: tapwright-presets.json_');
    await app.press(KEY.enter, 'Exported all presets to tapwright-presets.json.');
    await app.press(['E', KEY.enter], 'tapwright-presets.json exists. Replace it? (y/n)');
    await app.press('y', 'Exported all presets to tapwright-presets.json.');
    app.unmount();
  });

  it('loads the marked preset into the joint screen; Esc goes back', async () => {
    const app = startApp();
    app.svc.store.saved.set('other', {values: {joint: {thread: 'M12', engagement: 18}, hole: {}}, savedAt: '2026-01-01T10:00:00.000Z'});
    await app.press('p', 'other');
    await app.press([KEY.down, KEY.enter], 'Loaded preset "other".');
    expect(app.frame()).toMatch(/Designation\s+M12/);
    await app.press('p', 'Presets: 2');
    await app.press(KEY.escape, '> Designation');
    app.unmount();
  });
});
