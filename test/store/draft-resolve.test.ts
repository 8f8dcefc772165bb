/** The workbench draft and --preset resolution. */
import {describe, expect, it} from 'vitest';
import fs from 'node:fs';
import path from 'node:path';
import {clearDraft, loadDraft, saveDraft, MAX_DRAFT_BYTES, type DraftSession} from '../../src/store/draft.js';
import {execFileSync, spawnSync} from 'node:child_process';
import os from 'node:os';
import {resolvePreset} from '../../src/store/resolve.js';
import {openPresetStore} from '../../src/store/presets.js';
import {DEFAULT_PRESET} from '../../src/store/shipped.js';
import {UsageError} from '../../src/cli/io.js';
import {jointPreset, tempDir} from './helpers.js';

describe('draft', () => {
  const draft = {savedAt: '2026-03-01T12:00:00.000Z', presetName: DEFAULT_PRESET, values: {joint: {thread: 'M8', engagement: '1'}}};

  // A session that has ended: its pid is of a process that ran and exited.
  const ended = (): DraftSession => ({pid: spawnSync(process.execPath, ['-e', '0']).pid!, host: os.hostname(), token: `e${Math.random().toString(36).slice(2, 8)}`});
  const live = (token: string): DraftSession => ({pid: process.pid, host: os.hostname(), token});
  const drafts = (dir: string) => fs.readdirSync(dir).filter(n => /^draft.*\.json$/.test(n)).sort();

  it('survives the process: a later session is offered it, restores or clears it', () => {
    const dir = tempDir('draft');
    const first = ended();
    const next = live('next');
    expect(loadDraft(dir, next)).toBeUndefined();
    saveDraft(dir, draft, first);
    saveDraft(dir, {...draft, values: {joint: {thread: 'M10'}}}, first);
    expect(loadDraft<typeof draft>(dir, next)?.values).toEqual({joint: {thread: 'M10'}});
    clearDraft(dir, next); // declined: the draft it was offered is removed
    expect(drafts(dir)).toEqual([]);
    expect(loadDraft(dir, next)).toBeUndefined();
    clearDraft(dir, next); // clearing twice is fine
  });

  it('two sessions on one config folder each keep their own draft; neither is offered nor deleted by the other', () => {
    const dir = tempDir('draft');
    const a = live('a');
    const b = live('b');
    saveDraft(dir, {...draft, presetName: 'A'}, a);
    expect(loadDraft(dir, b)).toBeUndefined(); // a's session is still running
    saveDraft(dir, {...draft, presetName: 'B'}, b);
    expect(drafts(dir)).toHaveLength(2);
    clearDraft(dir, b);
    expect(drafts(dir)).toHaveLength(1); // a's draft is untouched
    expect(JSON.parse(fs.readFileSync(path.join(dir, drafts(dir)[0]!), 'utf8')).draft.presetName).toBe('A');
  });

  it('a session that restored a draft and keeps its own replaces the one it took over', () => {
    const dir = tempDir('draft');
    saveDraft(dir, {...draft, presetName: 'old'}, ended());
    const s = live('s');
    expect(loadDraft<typeof draft>(dir, s)?.presetName).toBe('old');
    saveDraft(dir, {...draft, presetName: 'new'}, s);
    expect(drafts(dir)).toHaveLength(1);
    expect(loadDraft<typeof draft>(dir, live('t'))).toBeUndefined(); // s is running
  });

  it('the draft.json of an older tapwright is offered; a FIFO in a draft\'s place never blocks', () => {
    const dir = tempDir('draft');
    fs.writeFileSync(path.join(dir, 'draft.json'), JSON.stringify({draftVersion: 1, draft}));
    execFileSync('mkfifo', [path.join(dir, 'draft-1-fifo.json')]);
    expect(loadDraft<typeof draft>(dir, live('x'))?.presetName).toBe(draft.presetName);
  });

  it('a draft is written rw------- in a folder it creates rwx------; a folder it cannot write gives a StoreError naming the file', () => {
    const parent = tempDir('draft');
    const dir = path.join(parent, 'cfg');
    saveDraft(dir, draft, live('p'));
    expect(fs.statSync(dir).mode & 0o777).toBe(0o700);
    const [f] = drafts(dir);
    expect(fs.statSync(path.join(dir, f!)).mode & 0o777).toBe(0o600);
    if (process.getuid?.() !== 0) {
      fs.chmodSync(dir, 0o500);
      try {
        expect(() => saveDraft(dir, draft, live('q'))).toThrow(/^cannot keep the unsaved draft in .*draft-\d+-q\.json: EACCES/);
      } finally {
        fs.chmodSync(dir, 0o700);
      }
    }
  });

  it('a damaged draft reads as no draft and is moved aside, never thrown', () => {
    for (const content of ['{"draftVersion": 1, "dra', '', '{"draftVersion": 9, "draft": {}}', '{"draftVersion": 1, "draft": {"__proto__": {}}}']) {
      const dir = tempDir('draft');
      fs.writeFileSync(path.join(dir, 'draft.json'), content);
      expect(loadDraft(dir, live('y'))).toBeUndefined();
      expect(fs.readdirSync(dir).some(n => n.startsWith('draft.json.corrupt-'))).toBe(true);
    }
  });

  it('refuses a draft over the size limit with a StoreError', () => {
    expect(() => saveDraft(tempDir('draft'), {...draft, values: 'x'.repeat(MAX_DRAFT_BYTES)})).toThrow(/draft not kept: it is over 256 KiB/);
  });
});

describe('resolvePreset', () => {
  it('finds saved and shipped presets through TAPWRIGHT_CONFIG_DIR', () => {
    const dir = tempDir('resolve');
    openPresetStore(dir).save(jointPreset('line-3-pump'));
    const env = {TAPWRIGHT_CONFIG_DIR: dir};
    expect(resolvePreset('line-3-pump', env).joint?.thread).toBe('M10');
    expect(resolvePreset(DEFAULT_PRESET, env).demo).toBe(true);
  });

  it('passes the store warnings on (a damaged store is repaired while resolving)', () => {
    const dir = tempDir('resolve');
    openPresetStore(dir).save(jointPreset('kept'));
    fs.writeFileSync(path.join(dir, 'presets.json'), '');
    const seen: string[] = [];
    expect(() => resolvePreset('kept', {TAPWRIGHT_CONFIG_DIR: dir}, 'joint', m => seen.push(m))).toThrow(/no saved or shipped preset/);
    expect(seen).toEqual([expect.stringMatching(/^preset store was empty; moved aside to /)]);
  });

  it('names --preset and the known presets when the name is unknown, or of the wrong kind', () => {
    const env = {TAPWRIGHT_CONFIG_DIR: tempDir('resolve')};
    let e: unknown;
    try {
      resolvePreset('nope', env);
    } catch (x) {
      e = x;
    }
    expect(e).toBeInstanceOf(UsageError);
    expect((e as UsageError).option).toBe('--preset');
    expect((e as Error).message).toMatch(/^--preset "nope": no saved or shipped preset of that name \(5 known: demo-/);
    expect(() => resolvePreset('demo-lifting-table-screw', env, 'joint')).toThrow(/is a screw preset; this command needs a joint preset/);
    expect(() => resolvePreset(' ', env)).toThrow(/--preset needs a preset name/);
  });
});
