import {describe, expect, it} from 'vitest';
import {cliInTempStore} from '../support/cli-in-temp-store.js';
import {readFileSync, writeFileSync} from 'node:fs';
import path from 'node:path';
import {realServices} from '../../src/ui/real-services.js';

// Solid key-locked insert tables: the shipped one is demo data; a user's own
// table (here an invented one, marked as a test table) is stored, used by the
// repair planner and the workbench by default, and never loses the demo table.
const setup = () => cliInTempStore('tw-inserts');

async function ownTable(run: (...a: string[]) => Promise<{code: number; out: string}>, dir: string): Promise<string> {
  const demo = JSON.parse((await run('inserts', 'export', 'demo solid key-locked inserts', '-')).out) as Record<string, unknown> & {entries: Array<Record<string, unknown>>};
  const mine = {
    ...demo,
    name: 'shop stock (test table)',
    provenance: {kind: 'user', source: 'invented for a test, not any maker\'s data'},
    entries: [{internal: 'M8x1.25', type: 'thin-wall', external: 'M16x1.5', length: 14, keys: 4, bodyRm: 900, bodyShear: 540, setDown: 0.25}],
  };
  const file = path.join(dir, 'mine.json');
  writeFileSync(file, JSON.stringify(mine));
  return file;
}

describe('tapwright inserts', () => {
  it('lists the shipped demo table as the default when the user has none', async () => {
    const {run} = setup();
    const r = await run('inserts', 'list');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/\* demo solid key-locked inserts\s+\(shipped, read-only/);
    expect(r.out).toMatch(/demo values: use the insert maker's data/);
    const j = JSON.parse((await run('inserts', 'list', '--json')).out) as {tables: Array<{name: string; default: boolean}>};
    expect(j.tables).toHaveLength(1);
    expect(j.tables[0]?.default).toBe(true);
  });

  it('imports a table of the user\'s, which repair and the workbench then use by default', async () => {
    const {dir, run} = setup();
    const file = await ownTable(run, dir);
    const imp = await run('inserts', 'import', file);
    expect(imp.code).toBe(0);
    expect((await run('inserts', 'list')).out).toMatch(/\* shop stock \(test table\)\s+\(yours/);
    const plan = JSON.parse((await run('repair', '--thread', 'M8', '--parent', 'AlSi9Cu3-DC', '--engage', '10', '--json')).out) as {options: Array<{kind: string; tapThread: string | null}>};
    const solid = plan.options.filter(o => o.kind === 'solid-insert');
    expect(solid.map(o => o.tapThread)).toEqual(['M16x1.5']);
    // --solid-table by name picks the shipped one again.
    const demoPlan = JSON.parse((await run('repair', '--thread', 'M8', '--parent', 'AlSi9Cu3-DC', '--engage', '10', '--solid-table', 'demo solid key-locked inserts', '--json')).out) as {options: Array<{kind: string; tapThread: string | null}>};
    expect(demoPlan.options.filter(o => o.kind === 'solid-insert').map(o => o.tapThread).sort()).toEqual(['M12x1.5', 'M14x1.5']);
    // The workbench's planner uses the stored table too.
    const svc = realServices({configDir: dir, cwd: dir, now: () => new Date()});
    const demo = svc.presets.load(svc.defaultPreset);
    const {evaluate, evaluateRepairs} = await import('../../src/ui/state/evaluate.js');
    const e = evaluate(demo.values, svc, 'si', true);
    const p = evaluateRepairs(demo.values, svc, e).plan!;
    expect(p.options.filter(o => o.kind === 'solid-insert').map(o => o.tapThread)).toEqual(['M16x1.5']);
  });

  it('refuses bad tables and protects the shipped one', async () => {
    const {dir, run} = setup();
    const bad = path.join(dir, 'bad.json');
    writeFileSync(bad, JSON.stringify({kind: 'solid-key-locked-inserts', version: 1, name: 'x', provenance: {kind: 'user', source: 's'}, entries: [{internal: 'M8', type: 'thin-wall', external: 'M12x1.5', length: -1, bodyRm: 900, bodyShear: 540}]}));
    const r = await run('inserts', 'import', bad);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/entries\.0\.length/);
    writeFileSync(bad, '{not json');
    expect((await run('inserts', 'import', bad)).err).toMatch(/is not JSON/);
    expect((await run('inserts', 'delete', 'demo solid key-locked inserts', '--yes')).err).toMatch(/read-only/);
    const file = await ownTable(run, dir);
    await run('inserts', 'import', file);
    expect((await run('inserts', 'import', file)).code).toBe(2);
    expect((await run('inserts', 'import', file, '--overwrite')).code).toBe(0);
    expect((await run('inserts', 'delete', 'shop stock (test table)')).err).toMatch(/--yes/);
    expect((await run('inserts', 'delete', 'shop stock (test table)', '--yes')).code).toBe(0);
    expect((await run('inserts', 'show', 'nope')).err).toMatch(/no table "nope"/);
    const out = path.join(dir, 'out.json');
    expect((await run('inserts', 'export', 'demo solid key-locked inserts', out)).code).toBe(0);
    expect(JSON.parse(readFileSync(out, 'utf8')).name).toBe('demo solid key-locked inserts');
    expect((await run('inserts', 'export', 'demo solid key-locked inserts', out)).err).toMatch(/--force/);
  });
});
