import {describe, expect, it} from 'vitest';
import {cliInTempStore} from '../support/cli-in-temp-store.js';
import {writeFileSync, readFileSync} from 'node:fs';
import path from 'node:path';
import {realServices} from '../../src/ui/real-services.js';
import {evaluate} from '../../src/ui/state/evaluate.js';
import {setValue} from '../../src/ui/state/fields.js';

// A parent material of the user's own, as from a material certificate. The
// numbers are invented for the test (demo data), not any real certificate.
const MINE = {
  id: 'GJS-600-test-heat', name: 'ductile iron, test heat (demo)', group: 'cast-iron',
  rm: 620, yield: 390, shear: 560, elasticModulus: 174000, source: 'demo certificate for a test',
};

const setup = () => cliInTempStore('tw-mymat');

describe('materials of the user\'s own', () => {
  it('are added to the store and used by check, repair and presets save by id', async () => {
    const {dir, run} = setup();
    const file = path.join(dir, 'mine.json');
    writeFileSync(file, JSON.stringify(MINE));
    expect((await run('check', '--thread', 'M10', '--parent', MINE.id, '--engage', '15')).err).toMatch(/unknown parent material|parent/i);
    const add = await run('materials', 'add', file);
    expect(add.code).toBe(0);
    expect((await run('materials', 'mine')).out).toContain(MINE.id);
    const r = await run('check', '--thread', 'M10', '--parent', MINE.id, '--engage', '15', '--json');
    expect(r.code === 0 || r.code === 3).toBe(true);
    const j = JSON.parse(r.out) as {materials: {internal: {id: string; rm: number; shear: number; provenance: {kind: string; source: string}}}};
    expect(j.materials.internal.id).toBe(MINE.id);
    expect(j.materials.internal.rm).toBe(620);
    expect(j.materials.internal.shear).toBeCloseTo(560, 9);
    expect(j.materials.internal.provenance.kind).toBe('user');
    expect(j.materials.internal.provenance.source).toContain('demo certificate for a test');
    expect((await run('repair', '--thread', 'M10', '--parent', MINE.id, '--engage', '15', '--json')).code).not.toBe(2);
    expect((await run('presets', 'save', 'pump with my iron', '--thread', 'M10', '--parent', MINE.id, '--engage', '15')).code).toBe(0);
    expect((await run('check', '--preset', 'pump with my iron', '--json')).code).not.toBe(2);
  });

  it('are offered in the workbench parent picker and used by its readout', async () => {
    const {dir, run} = setup();
    const file = path.join(dir, 'mine.json');
    writeFileSync(file, JSON.stringify([MINE]));
    await run('materials', 'add', file);
    const svc = realServices({configDir: dir, cwd: dir, now: () => new Date()});
    expect(svc.picks('parent', 'si').some(p => p.id === MINE.id && p.provenance.kind === 'user')).toBe(true);
    const demo = svc.presets.load(svc.defaultPreset);
    const ev = evaluate(setValue(demo.values, 'parent', MINE.id), svc, 'si', true);
    expect(ev.result?.materials.internal.id).toBe(MINE.id);
  });

  it('refuses bad entries, shipped ids and duplicates, and never loses the store', async () => {
    const {dir, run} = setup();
    const file = path.join(dir, 'bad.json');
    writeFileSync(file, JSON.stringify({...MINE, yield: 700}));
    const bad = await run('materials', 'add', file);
    expect(bad.code).toBe(2);
    expect(bad.err).toMatch(/yield must not exceed rm/);
    writeFileSync(file, JSON.stringify({...MINE, id: 'S355'}));
    expect((await run('materials', 'add', file)).err).toMatch(/shipped library/);
    writeFileSync(file, JSON.stringify(MINE));
    await run('materials', 'add', file);
    expect((await run('materials', 'add', file)).err).toMatch(/--overwrite/);
    expect((await run('materials', 'add', file, '--overwrite')).code).toBe(0);
    expect((await run('materials', 'remove', MINE.id)).err).toMatch(/--yes/);
    expect((await run('materials', 'remove', MINE.id, '--yes')).code).toBe(0);
    expect((await run('materials', 'remove', MINE.id, '--yes')).err).toMatch(/no material/);
    // The presets file is still valid JSON with its list intact.
    const doc = JSON.parse(readFileSync(path.join(dir, 'presets.json'), 'utf8')) as {materials: unknown[]};
    expect(doc.materials).toEqual([]);
  });
});
