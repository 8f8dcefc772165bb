/** Version-1 stores (the earlier flat layout) migrate to version 2 with nothing lost. */
import {describe, expect, it} from 'vitest';
import fs from 'node:fs';
import path from 'node:path';
import {openPresetStore} from '../../src/store/presets.js';
import {detectVersion, migrate} from '../../src/store/migrate.js';
import {PresetSchema} from '../../src/store/schema.js';
import {fixture, tempDir} from './helpers.js';

function withFixture(name: string): string {
  const dir = tempDir('migrate');
  fs.copyFileSync(fixture(name), path.join(dir, 'presets.json'));
  return dir;
}

describe('migration from version 1', () => {
  it('maps every flat field to the version-2 preset', () => {
    const dir = withFixture('v1-store.json');
    const s = openPresetStore(dir);
    const flange = s.get('demo-v1-motor-flange');
    expect(flange).toEqual({
      name: 'demo-v1-motor-flange',
      kind: 'joint',
      demo: true,
      revision: 1,
      savedAt: new Date(1764000000000).toISOString(),
      joint: PresetSchema.shape.joint.parse({
        thread: 'M10',
        boltGrade: '8.8',
        parent: 'EN-GJL-250',
        engagement: 15,
        chamfer: 1,
        holeDepth: 22,
        tightening: 'torque',
        torque: 40,
        muThread: {min: 0.12, max: 0.12},
        muHead: {min: 0.12, max: 0.12},
        serviceLoad: 5000,
      }),
      notes: {asset: 'M-DEMO-9', location: 'demo line 1', workOrder: 'WO-DEMO-9001', text: 'version-1 test fixture, invented data'},
    });
    expect(s.get('demo-v1-nut-joint')?.joint).toMatchObject({internal: 'nut', nutClass: '10', tightening: 'preload', preload: 40000, boltGrade: '10.9'});
    expect(s.get('demo-v1-minimal')?.joint).toMatchObject({thread: 'M6', engagement: 9, boltGrade: '8.8', tightening: 'utilisation'});
    expect(s.get('demo-v1-minimal')?.demo).toBeUndefined();
  });

  it('rewrites the file as version 2, keeps the version-1 file aside and says so once', () => {
    const dir = withFixture('v1-store.json');
    const original = fs.readFileSync(fixture('v1-store.json'), 'utf8');
    const s = openPresetStore(dir);
    expect(s.warnings()).toHaveLength(1);
    expect(s.warnings()[0]).toMatch(/^preset store upgraded from schema 1; the old file is kept as .*presets\.json\.schema1-/);
    const doc = JSON.parse(fs.readFileSync(path.join(dir, 'presets.json'), 'utf8'));
    expect(doc.schemaVersion).toBe(2);
    expect(doc.presets).toHaveLength(3);
    const kept = fs.readdirSync(dir).find(n => n.startsWith('presets.json.schema1-'))!;
    expect(fs.readFileSync(path.join(dir, kept), 'utf8')).toBe(original);
    expect(openPresetStore(dir).warnings()).toEqual([]);
  });

  it('quarantines version-1 items that are not valid presets', () => {
    const dir = withFixture('v1-with-invalid.json');
    const s = openPresetStore(dir);
    expect(s.list().filter(p => p.source === 'saved').map(p => p.name)).toEqual(['demo-v1-good']);
    const q = s.quarantined();
    expect(q.map(x => x.name).sort()).toEqual(['demo-v1-negative-engagement', 'demo-v1-not-an-object']);
    expect(q.find(x => x.name === 'demo-v1-not-an-object')?.raw).toBe('M8 into steel');
    expect(q.find(x => x.name === 'demo-v1-negative-engagement')?.reason).toMatch(/joint\.engagement/);
  });

  it('recovers the complete items of a truncated version-1 file', () => {
    const dir = withFixture('v1-truncated.json');
    const s = openPresetStore(dir);
    expect(s.list().filter(p => p.source === 'saved').map(p => p.name)).toEqual(['demo-v1-first', 'demo-v1-second']);
    expect(s.get('demo-v1-second')?.joint?.parent).toBe('C45');
    expect(s.warnings()[0]).toMatch(/recovered 2 presets/);
  });

  it('detects versions and refuses unknown ones', () => {
    expect(detectVersion({version: 1, items: {}})).toBe(1);
    expect(detectVersion({schemaVersion: 2, presets: []})).toBe(2);
    expect(detectVersion({presets: []})).toBeUndefined();
    expect(() => migrate({schemaVersion: 0})).toThrow(/versions 1 to 2/);
    expect(() => migrate({schemaVersion: 2.5})).toThrow(/versions 1 to 2/);
    expect(() => migrate({schemaVersion: '2'})).toThrow(/schemaVersion "2"/);
    expect(() => migrate({schemaVersion: 7})).toThrow(/written by a newer tapwright/);
  });
});
