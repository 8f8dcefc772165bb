/** Every preset-store operation, on a fresh folder per test. */
import {describe, expect, it} from 'vitest';
import fs from 'node:fs';
import path from 'node:path';
import {openPresetStore} from '../../src/store/presets.js';
import {StoreError} from '../../src/store/errors.js';
import {DEFAULT_PRESET, shippedPresets} from '../../src/store/shipped.js';
import {jointPreset, tempDir} from './helpers.js';

const clock = (iso = '2026-03-01T12:00:00.000Z') => () => new Date(iso);
const saved = (dir: string) => openPresetStore(dir).list().filter(p => p.source === 'saved').map(p => p.name);

describe('save and get', () => {
  it('saves a preset with savedAt and revision 1 and reads it back with defaults applied', () => {
    const dir = tempDir();
    const s = openPresetStore(dir, {now: clock()});
    const out = s.save(jointPreset('pump-7'));
    expect(out.revision).toBe(1);
    expect(out.savedAt).toBe('2026-03-01T12:00:00.000Z');
    const back = openPresetStore(dir).get('pump-7');
    expect(back?.joint?.engagement).toBe(12);
    expect(back?.joint?.muThread).toEqual({min: 0.1, max: 0.16}); // schema default
    expect(back?.notes.asset).toBe('TEST-1');
    expect(fs.existsSync(path.join(dir, 'presets.json'))).toBe(true);
  });

  it('finds a preset by name case-insensitively', () => {
    const dir = tempDir();
    openPresetStore(dir).save(jointPreset('Pump-7'));
    expect(openPresetStore(dir).get('pump-7')?.name).toBe('Pump-7');
  });

  it('refuses to replace a saved preset unless asked, then bumps the revision', () => {
    const dir = tempDir();
    const s = openPresetStore(dir);
    s.save(jointPreset('a'));
    expect(() => s.save(jointPreset('A'))).toThrow(/already exists.*--overwrite/);
    const next = s.save(jointPreset('a', {notes: {text: 'second'}}), {overwrite: true});
    expect(next.revision).toBe(2);
    expect(s.get('a')?.notes.text).toBe('second');
    expect(saved(dir)).toEqual(['a']);
  });

  it('refuses a save when another session saved since the caller loaded it', () => {
    const dir = tempDir();
    const mine = openPresetStore(dir);
    const theirs = openPresetStore(dir);
    const loaded = mine.save(jointPreset('shared'));
    theirs.save(jointPreset('shared', {notes: {text: 'theirs'}}), {overwrite: true});
    expect(() => mine.save(jointPreset('shared'), {overwrite: true, expectedRevision: loaded.revision})).toThrow(
      /changed by another session.*revision 1, now 2/,
    );
    expect(mine.get('shared')?.notes.text).toBe('theirs');
  });

  it('rejects an invalid preset with a message naming the field and range, and keeps the store', () => {
    const dir = tempDir();
    const s = openPresetStore(dir);
    s.save(jointPreset('good'));
    const bad = jointPreset('bad', {joint: {thread: 'M10', engagement: 0.1}});
    expect(() => s.save(bad)).toThrow(StoreError);
    expect(() => s.save(bad)).toThrow(/joint\.engagement: .*0\.5/);
    expect(() => s.save(jointPreset('no/slash'))).toThrow(/preset name must be 1 to 64 characters/);
    expect(() => s.save({name: 'x', kind: 'joint', notes: {}})).toThrow(/joint: a joint preset needs its joint inputs/);
    expect(saved(dir)).toEqual(['good']);
  });

  it('keeps fields it does not know (written by a newer tapwright) when other presets change', () => {
    const dir = tempDir();
    const future = {...jointPreset('future'), savedAt: '2026-01-01T00:00:00.000Z', revision: 4, colour: 'blue'};
    fs.writeFileSync(path.join(dir, 'presets.json'), JSON.stringify({schemaVersion: 2, presets: [future], extra: 1}));
    openPresetStore(dir).save(jointPreset('other'));
    const doc = JSON.parse(fs.readFileSync(path.join(dir, 'presets.json'), 'utf8'));
    expect(doc.presets.find((p: {name: string}) => p.name === 'future').colour).toBe('blue');
  });

  it('keeps the store as it was before the last change in presets.json.bak', () => {
    const dir = tempDir();
    openPresetStore(dir).save(jointPreset('one'));
    expect(fs.existsSync(path.join(dir, 'presets.json.bak'))).toBe(false); // nothing before the first save
    const s = openPresetStore(dir);
    s.save(jointPreset('two'));
    s.save(jointPreset('three'));
    const bak = JSON.parse(fs.readFileSync(path.join(dir, 'presets.json.bak'), 'utf8'));
    expect(bak.presets.map((p: {name: string}) => p.name)).toEqual(['one', 'two']);
  });
});

describe('list', () => {
  it('lists saved presets by name, then the shipped ones marked read-only and demo', () => {
    const dir = tempDir();
    const s = openPresetStore(dir);
    s.save(jointPreset('zeta'));
    s.save(jointPreset('alpha'));
    const all = s.list();
    expect(all.slice(0, 2).map(p => [p.name, p.readOnly, p.source])).toEqual([
      ['alpha', false, 'saved'],
      ['zeta', false, 'saved'],
    ]);
    const shipped = all.filter(p => p.source === 'shipped');
    expect(shipped.length).toBe(shippedPresets().length);
    expect(shipped.every(p => p.readOnly && p.demo && p.name.startsWith('demo-'))).toBe(true);
    expect(all[0]).toMatchObject({thread: 'M10', kind: 'joint', asset: 'TEST-1', revision: 1});
  });

  it('works on a folder that does not exist yet, without creating it', () => {
    const dir = path.join(tempDir(), 'not-yet');
    const s = openPresetStore(dir);
    expect(s.list().length).toBe(shippedPresets().length);
    expect(s.get(DEFAULT_PRESET)?.demo).toBe(true);
    expect(fs.existsSync(dir)).toBe(false);
  });
});

describe('shipped presets are read-only', () => {
  it('refuses save, rename and remove on a shipped name, and copies it with duplicate', () => {
    const dir = tempDir();
    const s = openPresetStore(dir, {now: clock()});
    const shippedName = DEFAULT_PRESET;
    expect(() => s.save(jointPreset(shippedName))).toThrow(/shipped demo preset and read-only/);
    expect(() => s.rename(shippedName, 'mine')).toThrow(/read-only/);
    expect(() => s.remove(shippedName)).toThrow(/read-only/);
    const copy = s.duplicate(shippedName, 'my-gearbox');
    expect(copy).toMatchObject({name: 'my-gearbox', revision: 1, demo: true, savedAt: '2026-03-01T12:00:00.000Z'});
    expect(s.get('my-gearbox')?.joint).toEqual(s.get(shippedName)?.joint);
    expect(s.list().find(p => p.name === 'my-gearbox')?.readOnly).toBe(false);
  });
});

describe('rename, duplicate, remove', () => {
  it('renames, keeping the content and bumping the revision', () => {
    const dir = tempDir();
    const s = openPresetStore(dir);
    s.save(jointPreset('old'));
    s.rename('old', 'new');
    expect(s.get('old')).toBeUndefined();
    expect(s.get('new')).toMatchObject({name: 'new', revision: 2, notes: {asset: 'TEST-1'}});
    s.rename('new', 'NEW'); // a change of case only is allowed
    expect(saved(dir)).toEqual(['NEW']);
  });

  it('refuses to rename onto an existing or shipped name, or from a missing one', () => {
    const dir = tempDir();
    const s = openPresetStore(dir);
    s.save(jointPreset('a'));
    s.save(jointPreset('b'));
    expect(() => s.rename('a', 'B')).toThrow(/"b" already exists/);
    expect(() => s.rename('a', DEFAULT_PRESET)).toThrow(/name of a shipped demo preset/);
    expect(() => s.rename('nope', 'c')).toThrow(/no saved preset named "nope"/);
    expect(() => s.rename('a', '')).toThrow(/preset name must be/);
    expect(saved(dir)).toEqual(['a', 'b']);
  });

  it('duplicates a saved preset under a free name only', () => {
    const dir = tempDir();
    const s = openPresetStore(dir);
    s.save(jointPreset('a'));
    s.save(jointPreset('a', {notes: {text: 'v2'}}), {overwrite: true});
    const copy = s.duplicate('a', 'a-copy');
    expect(copy.revision).toBe(1);
    expect(copy.notes.text).toBe('v2');
    expect(() => s.duplicate('a', 'a-copy')).toThrow(/already exists/);
    expect(() => s.duplicate('missing', 'x')).toThrow(/no saved or shipped preset named "missing"/);
  });

  it('removes a saved preset and says so when the name is unknown', () => {
    const dir = tempDir();
    const s = openPresetStore(dir);
    s.save(jointPreset('pump-a'));
    s.save(jointPreset('pump-b'));
    s.remove('pump-a');
    expect(saved(dir)).toEqual(['pump-b']);
    expect(() => s.remove('pump-a')).toThrow(/no saved preset named "pump-a"; did you mean "pump-b"/);
  });
});
