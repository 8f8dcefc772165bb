/** Import and export, including hostile files. */
import {describe, expect, it} from 'vitest';
import fs from 'node:fs';
import path from 'node:path';
import {openPresetStore} from '../../src/store/presets.js';
import {MAX_IMPORT_BYTES} from '../../src/store/guard.js';
import {DEFAULT_PRESET} from '../../src/store/shipped.js';
import {fixture, jointPreset, tempDir} from './helpers.js';

const savedNames = (s: ReturnType<typeof openPresetStore>) => s.list().filter(p => p.source === 'saved').map(p => p.name);

function withOne(): {dir: string; s: ReturnType<typeof openPresetStore>; before: string} {
  const dir = tempDir('transfer');
  const s = openPresetStore(dir);
  s.save(jointPreset('mine'));
  return {dir, s, before: fs.readFileSync(path.join(dir, 'presets.json'), 'utf8')};
}

describe('export', () => {
  it('writes all saved presets, or the named ones (shipped too), and re-imports them', () => {
    const {dir, s} = withOne();
    s.save(jointPreset('second'));
    const all = path.join(dir, 'all.json');
    s.exportTo(all);
    const doc = JSON.parse(fs.readFileSync(all, 'utf8'));
    expect(doc.schemaVersion).toBe(2);
    expect(doc.presets.map((p: {name: string}) => p.name)).toEqual(['mine', 'second']);
    const some = path.join(dir, 'some.json');
    s.exportTo(some, ['second', DEFAULT_PRESET, 'SECOND']);
    expect(JSON.parse(fs.readFileSync(some, 'utf8')).presets.map((p: {name: string}) => p.name)).toEqual(['second', DEFAULT_PRESET]);

    const other = openPresetStore(tempDir('other'));
    const r = other.importFile(some);
    expect(r).toMatchObject({added: ['second'], replaced: [], skipped: [{name: DEFAULT_PRESET}], fromVersion: 2});
    expect(other.get('second')?.joint).toEqual(s.get('second')?.joint);
  });

  it('never overwrites an existing file without force', () => {
    const {dir, s} = withOne();
    const out = path.join(dir, 'out.json');
    fs.writeFileSync(out, 'precious');
    expect(() => s.exportTo(out)).toThrow(/out\.json already exists; add --force to overwrite it/);
    expect(fs.readFileSync(out, 'utf8')).toBe('precious');
    s.exportTo(out, undefined, {force: true});
    expect(JSON.parse(fs.readFileSync(out, 'utf8')).presets).toHaveLength(1);
    expect(() => s.exportTo(dir)).toThrow(/it is a folder/);
    expect(() => s.exportTo(path.join(dir, 'no', 'such', 'x.json'))).toThrow(/cannot export to .*ENOENT/);
    expect(() => s.exportTo(path.join(dir, 'x.json'), ['ghost'])).toThrow(/no saved or shipped preset named "ghost"/);
    expect(() => openPresetStore(tempDir('empty')).exportTo(path.join(dir, 'y.json'))).toThrow(/no saved presets to export/);
  });
});

describe('import', () => {
  it('imports an export file, keeping savedAt and revision', () => {
    const {s} = withOne();
    const r = s.importFile(fixture('v2-export.json'));
    expect(r.added).toEqual(['demo-import-a', 'demo-import-b']);
    expect(s.get('demo-import-a')).toMatchObject({revision: 3, savedAt: '2026-05-30T10:00:00.000Z', demo: true});
    expect(s.get('demo-import-b')?.kind).toBe('screw');
  });

  it('refuses clashing names unless overwrite is given, and then replaces them', () => {
    const {s} = withOne();
    s.importFile(fixture('v2-export.json'));
    expect(() => s.importFile(fixture('v2-export.json'))).toThrow(/already saved: "demo-import-a", "demo-import-b"; nothing was imported\. Add --overwrite/);
    const r = s.importFile(fixture('v2-export.json'), {overwrite: true});
    expect(r.replaced).toEqual(['demo-import-a', 'demo-import-b']);
    expect(s.get('demo-import-a')?.revision).toBe(4);
  });

  it('imports a version-1 store and a single bare preset', () => {
    const {dir, s} = withOne();
    expect(s.importFile(fixture('v1-store.json'))).toMatchObject({fromVersion: 1, added: ['demo-v1-motor-flange', 'demo-v1-nut-joint', 'demo-v1-minimal']});
    const one = path.join(dir, 'one.json');
    fs.writeFileSync(one, JSON.stringify({...jointPreset('single'), savedAt: '2026-01-01T00:00:00Z', revision: 1}));
    expect(s.importFile(one).added).toEqual(['single']);
  });

  const hostile: Array<[string, string | (() => string), RegExp]> = [
    ['__proto__ key', fixture('hostile-proto.json'), /forbidden key at presets\[0\]\.joint\.__proto__/],
    ['constructor/prototype keys', fixture('hostile-constructor.json'), /forbidden key at presets\[0\]\.notes\.constructor/],
    ['unknown version', fixture('unknown-version.json'), /schemaVersion 99 is not one this tapwright reads \(versions 1 to 2\)/],
    ['wrong shape', fixture('wrong-shape.json'), /presets\[0\] \("demo-bad"\): joint\.engagement: .*0\.5/],
    ['not an object', fixture('not-presets.json'), /not a tapwright preset file/],
    ['no such file', '/nonexistent/presets.json', /ENOENT/],
    ['invalid JSON', () => '{"schemaVersion": 2, "presets": [', /not valid JSON/],
    ['empty file', () => '', /the file is empty/],
    ['no presets', () => '{"schemaVersion": 2, "presets": []}', /holds no presets/],
    ['presets not a list', () => '{"schemaVersion": 2, "presets": {"a": 1}}', /"presets" must be a list/],
    ['duplicate names', () => JSON.stringify({schemaVersion: 2, presets: [1, 2].map(() => ({...jointPreset('twin'), savedAt: '2026-01-01T00:00:00Z', revision: 1}))}), /appears twice/],
    ['deep nesting', () => `{"schemaVersion": 2, "presets": [], "x": ${'['.repeat(100000)}${']'.repeat(100000)}}`, /nesting is 100001 levels deep; the limit is 32/],
    ['over the size limit', () => `{"schemaVersion": 2, "presets": [], "pad": "${'x'.repeat(MAX_IMPORT_BYTES)}"}`, /bytes; the limit is 1 MiB \(1048576 bytes\)/],
    ['a directory', () => '<dir>', /it is a folder/],
  ];
  for (const [label, source, message] of hostile) {
    it(`refuses ${label} with a message, importing nothing`, () => {
      const {dir, s, before} = withOne();
      let f = typeof source === 'string' ? source : path.join(dir, 'in.json');
      if (typeof source === 'function') {
        const text = source();
        if (text === '<dir>') fs.mkdirSync((f = path.join(dir, 'folder')));
        else fs.writeFileSync(f, text);
      }
      let caught: unknown;
      try {
        s.importFile(f);
      } catch (e) {
        caught = e;
      }
      expect(caught).toBeInstanceOf(Error);
      expect((caught as Error).name).toBe('StoreError');
      expect((caught as Error).message).toMatch(message);
      expect((caught as Error).message).toMatch(/^cannot import .*; nothing was imported/);
      expect(fs.readFileSync(path.join(dir, 'presets.json'), 'utf8')).toBe(before);
      expect(savedNames(s)).toEqual(['mine']);
      expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    });
  }
});
