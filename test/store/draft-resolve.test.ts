/** The workbench draft and --preset resolution. */
import {describe, expect, it} from 'vitest';
import fs from 'node:fs';
import path from 'node:path';
import {clearDraft, loadDraft, saveDraft, MAX_DRAFT_BYTES} from '../../src/store/draft.js';
import {resolvePreset} from '../../src/store/resolve.js';
import {openPresetStore} from '../../src/store/presets.js';
import {DEFAULT_PRESET} from '../../src/store/shipped.js';
import {UsageError} from '../../src/cli/io.js';
import {jointPreset, tempDir} from './helpers.js';

describe('draft', () => {
  const draft = {savedAt: '2026-03-01T12:00:00.000Z', presetName: DEFAULT_PRESET, values: {joint: {thread: 'M8', engagement: '1'}}};

  it('survives the process: save, load, clear', () => {
    const dir = tempDir('draft');
    expect(loadDraft(dir)).toBeUndefined();
    saveDraft(dir, draft);
    expect(loadDraft(dir)).toEqual(draft);
    saveDraft(dir, {...draft, values: {joint: {thread: 'M10'}}});
    expect(loadDraft<typeof draft>(dir)?.values).toEqual({joint: {thread: 'M10'}});
    clearDraft(dir);
    expect(loadDraft(dir)).toBeUndefined();
    clearDraft(dir); // clearing twice is fine
  });

  it('a damaged draft reads as no draft and is moved aside, never thrown', () => {
    for (const content of ['{"draftVersion": 1, "dra', '', '{"draftVersion": 9, "draft": {}}', '{"draftVersion": 1, "draft": {"__proto__": {}}}']) {
      const dir = tempDir('draft');
      fs.writeFileSync(path.join(dir, 'draft.json'), content);
      expect(loadDraft(dir)).toBeUndefined();
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
