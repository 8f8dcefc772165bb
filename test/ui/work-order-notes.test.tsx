/**
 * Work-order notes (asset tag, location, work-order number, free text) edited
 * on the Report screen with n, one note after another in the text prompt.
 * The asset tags and places below are invented for the tests.
 */
import {mkdtempSync, rmSync} from 'node:fs';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {afterEach, describe, expect, it, onTestFinished} from 'vitest';
import {cleanup} from 'ink-testing-library';
import {startApp} from '../support/start-app.js';
import {FIXTURE_VALUES, fixtureServices} from '../support/fixture-services.js';
import {KEY} from '../support/keys.js';
import type {KeyEvent} from '../../src/ui/keys.js';
import type {WorkbenchServices} from '../../src/ui/services.js';
import {handleKeys} from '../../src/ui/run-effects.js';
import {initialState, isDirty, type WorkbenchState} from '../../src/ui/state/workbench.js';
import {NOTE_FIELDS} from '../../src/ui/screens/report/notes.js';
import {realServices} from '../../src/ui/real-services.js';
import {reportText} from '../../src/ui/screens/report/reducer.js';
import {evaluate} from '../../src/ui/state/evaluate.js';
import {NotesSchema} from '../../src/store/schema.js';

afterEach(() => cleanup());

/** A fixture report that prints the notes it is given, so the preview shows them. */
const notesReport: WorkbenchServices['report'] = (format, _result, input, meta) =>
  [
    format === 'markdown' ? '# Joint check report' : 'JOINT CHECK REPORT',
    `Preset: ${meta.presetName}`,
    `Thread: ${input.thread}`,
    `Asset: ${meta.notes?.asset ?? ''}`,
    `Location: ${meta.notes?.location ?? ''}`,
    `Work order: ${meta.notes?.workOrder ?? ''}`,
    `Text: ${meta.notes?.text ?? ''}`,
  ].join('\n');

const svcWithNotes = () => fixtureServices({report: notesReport});

describe('work-order notes on the Report screen', () => {
  it('n opens the four notes in turn; each shows in the preview as typed and is kept with Enter', async () => {
    const app = startApp({svc: svcWithNotes()});
    await app.press('w', 'Report preview (Markdown)');
    expect(app.frame()).toContain('n notes');
    await app.press('n', 'Asset tag (1/4, up to 80 chars): _');
    await app.press('P-101 (demo)', 'Asset: P-101 (demo)');
    await app.press(KEY.enter, 'Location (2/4, up to 120 chars): _');
    expect(app.frame()).toContain('Preset: demo-fixture (shipped demo, read-only)  * unsaved changes');
    await app.press('Pump house, bay 3', 'Location: Pump house, bay 3');
    await app.press(KEY.enter, 'Work-order number (3/4, up to 60 chars): _');
    await app.press('WO-2026-0042', 'Work order: WO-2026-0042');
    await app.press(KEY.enter, 'Notes text (4/4, up to 4000 chars): _');
    await app.press('Stripped cover thread, demo case', 'Text: Stripped cover thread, demo case');
    await app.press(KEY.enter, 'Work-order notes kept; s saves them with the preset');
    const f = app.frame();
    expect(f).toContain('Asset: P-101 (demo)');
    expect(f).toContain('Location: Pump house, bay 3');
    expect(f).toContain('Work order: WO-2026-0042');
    expect(f).toContain('Text: Stripped cover thread, demo case');
    expect(app.states.at(-1)!.values.notes).toEqual({asset: 'P-101 (demo)', location: 'Pump house, bay 3', workOrder: 'WO-2026-0042', text: 'Stripped cover thread, demo case'});
    app.unmount();
  });

  it('saves the notes with a new preset; loading it again brings them back into the report', async () => {
    const app = startApp({svc: svcWithNotes()});
    await app.press(['w', 'n'], 'Asset tag (1/4');
    await app.press('A-7', 'Asset: A-7');
    await app.press(KEY.enter, 'Location (2/4');
    await app.press([KEY.enter, KEY.enter], 'Notes text (4/4');
    await app.press('thread chased', 'Text: thread chased');
    await app.press(KEY.enter, 'Work-order notes kept');
    await app.press(['p', 'a'], 'Save the joint as: _');
    await app.press('cover A-7', 'Save the joint as: cover A-7_');
    await app.press(KEY.enter, 'Saved preset "cover A-7".');
    expect(app.frame()).toContain('Preset: cover A-7  saved');
    expect(app.svc.store.saved.get('cover A-7')!.values.notes).toEqual({asset: 'A-7', text: 'thread chased'});
    // Load the demo (no notes; the list is sorted, it is second), then the saved preset again.
    await app.press([KEY.down, KEY.enter], 'Loaded preset "demo-fixture"');
    await app.press('w', 'Thread: M10x1.5');
    expect(app.frame()).not.toContain('Asset: A-7');
    expect(app.states.at(-1)!.values.notes).toBeUndefined();
    await app.press(['p', KEY.up, KEY.enter], 'Loaded preset "cover A-7".');
    await app.press('w', 'Asset: A-7');
    expect(app.frame()).toContain('Text: thread chased');
    expect(app.frame()).toContain('Preset: cover A-7  saved');
    app.unmount();
  });

  it('refuses a note longer than the store takes, naming the note and the limit', async () => {
    const app = startApp({svc: svcWithNotes()});
    await app.press(['w', 'n'], 'Asset tag (1/4');
    await app.press('x'.repeat(81), '! Asset tag: 81 characters is too long; accepted: 0 to 80 characters');
    await app.press(KEY.enter);
    await app.see('! Asset tag: 81 characters is too long; accepted: 0 to 80 characters');
    expect(app.frame()).toContain('Asset tag (1/4, up to 80 chars): ');
    expect(app.states.at(-1)!.values.notes).toBeUndefined();
    await app.press(KEY.backspace);
    await waitGone(app, 'too long');
    await app.press(KEY.enter, 'Location (2/4');
    expect(app.states.at(-1)!.values.notes).toEqual({asset: 'x'.repeat(80)});
    app.unmount();
  });

  it('Esc puts every note back as it was before n, and the preset is unchanged again', async () => {
    const app = startApp({
      svc: svcWithNotes(),
      state: initialState({name: 'mine', readOnly: false, values: {...structuredClone(FIXTURE_VALUES), notes: {asset: 'B-2'}}, units: 'si', ascii: true}),
    });
    await app.press('w', 'Asset: B-2');
    expect(app.frame()).toContain('Preset: mine  saved');
    await app.press('n', 'Asset tag (1/4, up to 80 chars): B-2_');
    await app.press(KEY.enter, 'Location (2/4');
    await app.press('Bay 9', 'Location: Bay 9');
    await app.press(KEY.enter, 'Work-order number (3/4');
    expect(app.frame()).toContain('* unsaved changes');
    await app.press(KEY.escape, 'Work-order notes left as they were');
    expect(app.frame()).toContain('Asset: B-2');
    expect(app.frame()).not.toContain('Bay 9');
    expect(app.frame()).toContain('Preset: mine  saved');
    expect(app.states.at(-1)!.values.notes).toEqual({asset: 'B-2'});
    app.unmount();
  });

  it('Enter through the notes without a change leaves the preset unchanged; an emptied note is removed', async () => {
    const app = startApp({
      svc: svcWithNotes(),
      state: initialState({name: 'mine', readOnly: false, values: {...structuredClone(FIXTURE_VALUES), notes: {asset: 'B-2', location: 'Hall 1'}}, units: 'si', ascii: true}),
    });
    await app.press(['w', 'n', KEY.enter, KEY.enter, KEY.enter, KEY.enter], 'Work-order notes unchanged');
    expect(app.frame()).toContain('Preset: mine  saved');
    await app.press(['n', KEY.enter], 'Location (2/4, up to 120 chars): Hall 1_');
    await app.press([KEY.ctrlU, KEY.enter, KEY.enter, KEY.enter], 'Work-order notes kept');
    expect(app.states.at(-1)!.values.notes).toEqual({asset: 'B-2'});
    expect(app.frame()).toContain('* unsaved changes');
    app.unmount();
  });

  it('shows the notes where the report carries them: Markdown, scrolled to the work-order section', async () => {
    const long: WorkbenchServices['report'] = (format, _r, _i, meta) =>
      [format === 'markdown' ? '# Joint check report' : 'JOINT CHECK REPORT', ...Array.from({length: 30}, (_, i) => `filler ${i + 1}`), '## Work order', `Asset: ${meta.notes?.asset ?? ''}`, ...Array.from({length: 30}, (_, i) => `tail ${i + 1}`)].join('\n');
    const app = startApp({svc: fixtureServices({report: long})});
    await app.press(['w', 't'], 'Report preview (plain text)');
    await app.press('n', 'Asset tag (1/4');
    await app.see('Report preview (Markdown)');
    expect(app.frame()).toMatch(/filler 30\n## Work order\nAsset: *\n/);
    expect(app.frame()).not.toContain('filler 29');
    await app.press('D-4', 'Asset: D-4');
    app.unmount();
  });

  it('unsaved notes go into the draft on quit and come back when it is restored', async () => {
    const app = startApp({svc: svcWithNotes()});
    await app.press(['w', 'n'], 'Asset tag (1/4');
    await app.press(['C-3', KEY.enter, KEY.escape], 'Work-order notes left as they were');
    await app.press(['n', 'C-3', KEY.enter, KEY.enter, KEY.enter, KEY.enter], 'Work-order notes kept');
    await app.press('q');
    await waitFor(() => app.quits.length === 1);
    const quit = app.quits[0]!;
    expect(isDirty(quit)).toBe(true);
    expect(quit.values.notes).toEqual({asset: 'C-3'});
    app.unmount();
    cleanup();
    // The launcher keeps s.values as the draft; a restored draft brings the notes back.
    const again = startApp({svc: svcWithNotes(), draft: {savedAt: '2026-03-04T05:00:00.000Z', presetName: 'demo-fixture', values: quit.values}});
    await again.press('y', 'Restored the unsaved edits');
    await again.press('w', 'Asset: C-3');
    again.unmount();
  });
});

const keys = (text: string): KeyEvent[] => Array.from(text).map(ch => ({name: 'char', char: ch}));
const enter: KeyEvent = {name: 'enter'};

describe('work-order notes in the reducer', () => {
  const start = (): WorkbenchState =>
    ({...initialState({name: 'demo-fixture', readOnly: true, values: structuredClone(FIXTURE_VALUES), units: 'si', ascii: true}), screen: 'report'});

  it('takes the limits from the store schema', () => {
    for (const f of NOTE_FIELDS) {
      expect(NotesSchema.shape[f.key].safeParse('x'.repeat(f.max)).success, f.key).toBe(true);
      expect(NotesSchema.shape[f.key].safeParse('x'.repeat(f.max + 1)).success, f.key).toBe(false);
    }
  });

  it('refuses free text over 4000 characters and stops taking characters a little past the limit', () => {
    const svc = svcWithNotes();
    let s = handleKeys(start(), [{name: 'char', char: 'n'}, enter, enter, enter], svc);
    expect(s.prompt?.note).toBe('text');
    s = handleKeys(s, keys('y'.repeat(4001)), svc);
    expect(s.message?.text).toBe('Notes text: 4001 characters is too long; accepted: 0 to 4000 characters');
    s = handleKeys(s, [enter], svc);
    expect(s.prompt?.note).toBe('text');
    expect(s.values.notes).toBeUndefined();
    s = handleKeys(s, keys('y'.repeat(100)), svc);
    expect(s.prompt!.buffer.length).toBe(4020);
    expect(s.message?.text).toBe('Notes text: accepted: 0 to 4000 characters; Backspace to shorten it');
    s = handleKeys(s, Array.from({length: 20}, () => ({name: 'backspace'}) as KeyEvent), svc);
    expect(s.message).toBeUndefined();
    s = handleKeys(s, [enter], svc);
    expect(s.prompt).toBeUndefined();
    expect(s.values.notes?.text).toHaveLength(4000);
  });
});

describe('work-order notes with the real store and report', () => {
  it('are saved in the preset file, loaded again by a new session, kept in the draft and printed in the Markdown report', () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'tw-notes-'));
    onTestFinished(() => rmSync(dir, {recursive: true, force: true}));
    const now = () => new Date('2026-03-04T05:06:07Z');
    const svc = realServices({configDir: dir, cwd: dir, now});
    const demo = svc.presets.load(svc.defaultPreset);
    let s: WorkbenchState = {...initialState({name: demo.name, readOnly: demo.readOnly, values: demo.values, units: 'si', ascii: true}), screen: 'report'};
    // The shipped demo has notes of its own: each prompt starts with them; Ctrl-U empties it.
    expect(demo.values.notes?.asset).toBeTruthy();
    const clear: KeyEvent = {name: 'char', char: 'u', ctrl: true};
    s = handleKeys(s, [{name: 'char', char: 'n'}], svc);
    expect(s.prompt?.buffer).toBe(demo.values.notes?.asset);
    s = handleKeys(s, [clear, ...keys('P-55 (demo)'), enter, clear, ...keys('North yard'), enter, clear, ...keys('WO 1234'), enter, clear, ...keys('Insert fitted, demo'), enter], svc);
    expect(s.message?.text).toContain('Work-order notes kept');
    expect(isDirty(s)).toBe(true);
    svc.draft.save({savedAt: now().toISOString(), presetName: s.preset.name, values: s.values});
    expect(svc.draft.load()?.values.notes).toEqual({asset: 'P-55 (demo)', location: 'North yard', workOrder: 'WO 1234', text: 'Insert fitted, demo'});
    s = handleKeys(s, [{name: 'char', char: 'p'}, {name: 'char', char: 'a'}, ...keys('yard pump'), enter], svc);
    expect(s.message?.text).toBe('Saved preset "yard pump".');

    const later = realServices({configDir: dir, cwd: dir, now});
    const p = later.presets.load('yard pump');
    expect(p.values.notes).toEqual({asset: 'P-55 (demo)', location: 'North yard', workOrder: 'WO 1234', text: 'Insert fitted, demo'});
    expect(later.presets.list().find(x => x.name === 'yard pump')?.notes).toContain('P-55 (demo)');
    let t: WorkbenchState = {...initialState({name: p.name, readOnly: p.readOnly, values: p.values, units: 'si', ascii: true}), screen: 'report'};
    expect(isDirty(t)).toBe(false);
    // Through the notes unchanged: still saved.
    t = handleKeys(t, [{name: 'char', char: 'n'}, enter, enter, enter, enter], later);
    expect(isDirty(t)).toBe(false);
    const md = reportText(t, later, evaluate(t.values, later, 'si', true)).text ?? '';
    expect(md).toMatch(/\| Asset \| P-55 \(demo\) \|/);
    expect(md).toMatch(/\| Location \| North yard \|/);
    expect(md).toMatch(/\| Work order \| WO 1234 \|/);
    expect(md).toContain('Insert fitted, demo');
  });
});

async function waitFor(test: () => boolean, ms = 2000): Promise<void> {
  const end = Date.now() + ms;
  while (!test()) {
    if (Date.now() > end) throw new Error('timed out');
    await new Promise(r => setTimeout(r, 10));
  }
}

async function waitGone(app: ReturnType<typeof startApp>, text: string): Promise<void> {
  await waitFor(() => !app.frame().includes(text));
}
