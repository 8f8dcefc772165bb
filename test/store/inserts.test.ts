/** The user's solid insert tables live in the preset store. */
import {describe, expect, it} from 'vitest';
import fs from 'node:fs';
import path from 'node:path';
import {openPresetStore} from '../../src/store/presets.js';
import {DEMO_SOLID_INSERTS} from '../../src/core/repair/index.js';
import {jointPreset, tempDir} from './helpers.js';

const mine = () => ({...structuredClone(DEMO_SOLID_INSERTS), name: 'test table', provenance: {kind: 'user' as const, source: 'test data, invented'}});

describe('solid insert tables in the store', () => {
  it('saves, lists, replaces and removes a table beside the presets', () => {
    const dir = tempDir('inserts');
    const s = openPresetStore(dir);
    s.save(jointPreset('a'));
    s.saveInsertTable(mine());
    expect(openPresetStore(dir).insertTables().map(t => t.name)).toEqual(['test table']);
    expect(() => s.saveInsertTable(mine())).toThrow(/already saved; overwrite it/);
    const changed = {...mine(), entries: mine().entries.slice(0, 1)};
    s.saveInsertTable(changed, {overwrite: true});
    expect(s.insertTables()[0]!.entries).toHaveLength(1);
    expect(s.get('a')).toBeDefined();
    s.removeInsertTable('TEST TABLE');
    expect(s.insertTables()).toEqual([]);
    expect(() => s.removeInsertTable('test table')).toThrow(/no saved solid insert table/);
  });

  it('refuses an invalid table naming the field, and keeps an invalid stored one visible', () => {
    const dir = tempDir('inserts');
    const s = openPresetStore(dir);
    expect(() => s.saveInsertTable({...mine(), entries: []})).toThrow(/solid insert table not saved: entries: /);
    const raw = {kind: 'solid-key-locked-inserts', version: 1, name: 'broken', entries: 'none'};
    fs.writeFileSync(path.join(dir, 'presets.json'), JSON.stringify({schemaVersion: 2, presets: [], inserts: [raw]}));
    const q = openPresetStore(dir).quarantined();
    expect(q).toHaveLength(1);
    expect(q[0]).toMatchObject({name: 'broken', raw});
    openPresetStore(dir).save(jointPreset('b'));
    expect(JSON.parse(fs.readFileSync(path.join(dir, 'presets.json'), 'utf8')).inserts).toEqual([raw]);
  });
});
