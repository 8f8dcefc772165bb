/** The store writes only what it reads back, and keeps revisions within exact whole numbers. */
import {describe, expect, it} from 'vitest';
import fs from 'node:fs';
import path from 'node:path';
import {openPresetStore} from '../../src/store/presets.js';
import {MAX_STORE_BYTES} from '../../src/store/store-file.js';
import {MAX_REVISION} from '../../src/store/schema.js';
import {jointPreset, tempDir} from './helpers.js';

const file = (dir: string) => path.join(dir, 'presets.json');
const stored = (name: string, revision = 1) => ({...jointPreset(name), savedAt: '2026-01-01T00:00:00.000Z', revision});
const savedNames = (dir: string) => openPresetStore(dir).list().filter(p => p.source === 'saved').map(p => p.name).sort();

/** A store of `bytes` about that size: one preset and one big quarantined item. */
function bigStore(bytes: number, presets = [stored('a')]): string {
  const dir = tempDir('limits');
  const pad = 'x'.repeat(bytes - 2000);
  fs.writeFileSync(file(dir), JSON.stringify({schemaVersion: 2, presets, quarantine: [{reason: 'test padding', at: '2026-01-01T00:00:00.000Z', raw: pad}], materials: [], inserts: []}));
  return dir;
}

describe('store size', () => {
  it('a save that would grow the store past the write limit is refused with a message; the store is unchanged and still read', () => {
    const dir = bigStore(MAX_STORE_BYTES - 500);
    const before = fs.readFileSync(file(dir));
    expect(() => openPresetStore(dir).save(jointPreset('b', {notes: {text: 'y'.repeat(3000)}}))).toThrow(
      /not saved: the preset store would be 32\.0 MiB, more than the 32\.0 MiB tapwright keeps in .*presets\.json; nothing was changed/,
    );
    expect(fs.readFileSync(file(dir)).equals(before)).toBe(true);
    const s = openPresetStore(dir);
    expect(s.warnings()).toEqual([]);
    expect(s.get('a')?.name).toBe('a');
  }, 120_000); // 32 MiB read several times on a shared machine; not a timing test

  it('a store between the write and the read limit is read with every preset, and may shrink', () => {
    const dir = bigStore(MAX_STORE_BYTES + 4 * 1024 * 1024, [stored('a'), stored('b')]);
    const s = openPresetStore(dir);
    expect(s.warnings()).toEqual([]);
    expect(s.list().filter(p => p.source === 'saved').map(p => p.name)).toEqual(['a', 'b']);
    expect(() => s.save(jointPreset('c'))).toThrow(/not saved: the preset store would be/);
    s.remove('b');
    expect(s.get('b')).toBeUndefined();
    expect(s.get('a')?.name).toBe('a');
  }, 120_000);
});

describe('revisions', () => {
  it('import refuses a revision above the highest kept, naming it', () => {
    const dir = tempDir('rev');
    const f = path.join(dir, 'in.json');
    fs.writeFileSync(f, JSON.stringify({schemaVersion: 2, presets: [stored('big', Number.MAX_SAFE_INTEGER)]}));
    expect(() => openPresetStore(dir).importFile(f)).toThrow(/presets\[0\] \("big"\): revision 9007199254740991 is above the highest kept \(2147483647\); nothing was imported/);
    expect(savedNames(dir)).toEqual([]);
  });

  it('a preset at the highest revision is not saved over: a message, and it stays readable', () => {
    const dir = tempDir('rev');
    fs.writeFileSync(file(dir), JSON.stringify({schemaVersion: 2, presets: [stored('top', MAX_REVISION)]}));
    const s = openPresetStore(dir);
    expect(() => s.save(jointPreset('top'), {overwrite: true})).toThrow(/"top" is at revision 2147483647, the highest kept .*save it under another name/);
    expect(() => s.rename('top', 'other')).toThrow(/highest kept/);
    expect(openPresetStore(dir).get('top')?.revision).toBe(MAX_REVISION);
    expect(s.duplicate('top', 'top2').revision).toBe(1);
  });

  it('an old store holding a revision above the limit is still read (never quarantined)', () => {
    const dir = tempDir('rev');
    fs.writeFileSync(file(dir), JSON.stringify({schemaVersion: 2, presets: [stored('old', 2 ** 40)]}));
    expect(openPresetStore(dir).get('old')?.revision).toBe(2 ** 40);
    expect(openPresetStore(dir).quarantined()).toEqual([]);
  });
});
