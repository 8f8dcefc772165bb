/** `tapwright presets`, in-process with memoryIo and a fresh config folder per test. */
import {afterAll, describe, expect, it} from 'vitest';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import {runCli} from '../../src/cli/main.js';
import {memoryIo} from '../../src/cli/io.js';
import {openPresetStore} from '../../src/store/presets.js';

const made: string[] = [];
afterAll(() => {
  for (const d of made.splice(0)) fs.rmSync(d, {recursive: true, force: true});
});

function setup() {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'tapwright-cli-presets-'));
  made.push(dir);
  const run = async (...args: string[]) => {
    const io = memoryIo({env: {TAPWRIGHT_CONFIG_DIR: dir}, cwd: dir, now: () => new Date('2026-04-01T09:30:00Z')});
    const code = await runCli(['presets', ...args], io);
    return {code, out: io.stdout(), err: io.stderr()};
  };
  return {dir, run};
}

const SAVE = ['--thread', 'M10', '--parent', 'EN-GJL-250', '--engage', '15mm', '--torque', '40Nm', '--asset', 'P-7', '--location', 'bay 2', '--work-order', 'WO-1', '--note', 'test data'];

describe('tapwright presets', () => {
  it('prints help with every action, the delete rule, the import limits and the file locations', async () => {
    const {run} = setup();
    const r = await run('--help');
    expect(r.code).toBe(0);
    for (const word of ['list', 'show', 'save', 'rename', 'delete', 'import', 'export', '--yes', '1 MiB', '__proto__', '--force', 'TAPWRIGHT_CONFIG_DIR', '--engage', '--work-order']) {
      expect(r.out).toContain(word);
    }
    expect(Math.max(...r.out.split('\n').map(l => l.length))).toBeLessThanOrEqual(80);
  });

  it('lists the shipped demo presets on an empty store, as text and JSON', async () => {
    const {run, dir} = setup();
    const text = await run('list');
    expect(text.code).toBe(0);
    expect(text.out).toMatch(/demo-gearbox-cover\s+joint\s+M8x1\.25-6H\/6g\s+shipped demo, read-only/);
    expect(text.out).toContain('0 saved, 5 shipped');
    expect(Math.max(...text.out.split('\n').filter(l => !l.includes('Store:')).map(l => l.length))).toBeLessThanOrEqual(80);
    const j = await run('list', '--json');
    const doc = JSON.parse(j.out);
    expect(doc.store).toBe(path.join(dir, 'presets.json'));
    expect(doc.presets).toHaveLength(5);
    expect(doc.presets[0]).toMatchObject({readOnly: true, demo: true, source: 'shipped'});
  });

  it('saves a joint from the check options with notes, and shows it', async () => {
    const {run, dir} = setup();
    const r = await run('save', 'pump-7', ...SAVE);
    expect(r).toMatchObject({code: 0, err: ''});
    expect(r.out).toContain('saved "pump-7" (revision 1)');
    const p = openPresetStore(dir).get('pump-7')!;
    expect(p.joint).toMatchObject({thread: 'M10', parent: 'EN-GJL-250', internal: 'tapped', engagement: 15, tightening: 'torque', torque: 40});
    expect(p.notes).toEqual({asset: 'P-7', location: 'bay 2', workOrder: 'WO-1', text: 'test data'});
    expect(p.savedAt).toBe('2026-04-01T09:30:00.000Z');
    const shown = await run('show', 'pump-7');
    expect(shown.out).toMatch(/engagement\s+15 mm/);
    expect(shown.out).toMatch(/torque\s+40 N·m/);
    const j = JSON.parse((await run('show', 'pump-7', '--json')).out);
    expect(j).toEqual(p);
    expect((await run('list', '--search', 'bay 2')).out).toContain('pump-7');
    expect((await run('list', '--search', 'nothing-like-it')).out).not.toContain('pump-7');
  });

  it('save takes every joint option of check, and check --preset computes the same joint as the options', async () => {
    const {command: check} = await import('../../src/cli/commands/check.js');
    const {JOINT_OPTIONS} = await import('../../src/cli/joint-options.js');
    const notJoint = new Set(['--format', '--json', '--ascii', '--preset', '--help', '--asset', '--location', '--work-order', '--note']); // the last four: work-order notes, as presets save's notes options
    const checkOptions = [...new Set(check.help.match(/--[a-z][a-z-]+/g))].filter(o => !notJoint.has(o));
    expect(checkOptions.length).toBeGreaterThanOrEqual(21);
    for (const o of checkOptions) expect(Object.keys(JOINT_OPTIONS), o).toContain(o.slice(2));

    const {run, dir} = setup();
    const opts = ['--thread', 'M12', '--bolt', '10.9', '--parent', 'C45', '--engage', '0.7', '--units', 'us', '--mu-thread', '0.1..0.14', '--scatter', '1.4', '--service-load', '1000'];
    expect((await run('save', 'same', ...opts)).code).toBe(0);
    expect(openPresetStore(dir).get('same')?.joint?.engagement).toBeCloseTo(17.78, 6); // 0.7 in, read in US units
    const viaCheck = async (...args: string[]) => {
      const io = memoryIo({env: {TAPWRIGHT_CONFIG_DIR: dir}, cwd: dir});
      const code = await runCli(['check', ...args, '--json'], io);
      return {code, out: io.stdout(), err: io.stderr()};
    };
    const a = await viaCheck(...opts);
    const b = await viaCheck('--preset', 'same');
    expect(a.err).toBe('');
    expect(b.err).toBe('');
    expect(JSON.parse(b.out)).toEqual(JSON.parse(a.out));
  });

  it('saves with units in the values and a nut instead of a tapped hole', async () => {
    const {run, dir} = setup();
    const r = await run('save', 'inch-nut', '--thread', '3/8-16 UNC', '--bolt', 'SAE-5', '--nut', 'SAE-5', '--nut-height', '21/64in', '--nut-flats', '9/16in', '--engage', '0.5in', '--preload', '2kN');
    expect(r.err).toBe('');
    expect(openPresetStore(dir).get('inch-nut')?.joint).toMatchObject({internal: 'nut', nutClass: 'SAE-5', engagement: 12.7, preload: 2000, tightening: 'preload'});
  });

  it('save --from starts from a shipped preset and changes only the options given; the copy stays marked demo', async () => {
    const {run, dir} = setup();
    const r = await run('save', 'my-cover', '--from', 'demo-gearbox-cover', '--engage', '14', '--work-order', 'WO-22');
    expect(r.code).toBe(0);
    const store = openPresetStore(dir);
    const p = store.get('my-cover')!;
    const base = store.get('demo-gearbox-cover')!;
    expect(p.joint).toEqual({...base.joint, engagement: 14});
    expect(p.notes).toEqual({...base.notes, workOrder: 'WO-22'});
    expect(p.demo).toBe(true);
  });

  it('refuses bad input with exit 2 and a message naming the option and the range, saving nothing', async () => {
    const {run, dir} = setup();
    const cases: Array<[string[], RegExp]> = [
      [['save', 'x', '--thread', 'M10', '--parent', 'S355', '--engage', '0.1'], /--engage .*accepted: 0\.5 mm to 1000 mm/],
      [['save', 'x', '--thread', 'M10', '--parent', 'S355', '--engage', '10', '--mu-thread', '0.9'], /--mu-thread .*0\.02 to 0\.6/],
      [['save', 'x', '--thread', 'M10', '--parent', 'S355', '--engage', '10', '--torque', '40', '--preload', '5kN'], /--torque.*--preload/],
      [['save', 'x', '--thread', 'M10', '--parent', 'S355', '--engage', '12furlong'], /--engage .*unit/],
      [['save', 'x', '--thread', 'M10', '--parent', 'unobtainium', '--engage', '10'], /--parent: unknown parent material "unobtainium"; accepted: /],
      [['save', 'x', '--thread', 'M10', '--bolt', '8.9', '--parent', 'S355', '--engage', '10'], /--bolt: unknown bolt grade "8\.9"/],
      [['save', 'x', '--thread', 'Q99', '--parent', 'S355', '--engage', '10'], /--thread/],
      [['save', 'x', '--parent', 'S355', '--engage', '10'], /--thread/],
      [['save', 'bad/name', '--thread', 'M10', '--parent', 'S355', '--engage', '10'], /preset name must be 1 to 64 characters/],
      [['save', 'x', '--from', 'ghost', '--engage', '10'], /--from "ghost": no saved or shipped preset/],
      [['save', 'x', '--colour', 'red'], /unknown option --colour/],
      [['save'], /missing argument; usage: tapwright presets save NAME/],
      [['show', 'ghost'], /no saved or shipped preset named "ghost"/],
      [['frob'], /unknown presets action "frob"; accepted: list, show/],
      [[], /say what to do/],
    ];
    for (const [args, message] of cases) {
      const r = await run(...args);
      expect(r.code, args.join(' ')).toBe(2);
      expect(r.err, args.join(' ')).toMatch(message);
      expect(r.err).not.toMatch(/\n\s+at /); // no stack trace
    }
    expect(fs.existsSync(path.join(dir, 'presets.json'))).toBe(false);
  });

  it('refuses to overwrite without --overwrite; with it the revision goes up', async () => {
    const {run, dir} = setup();
    await run('save', 'a', ...SAVE);
    const again = await run('save', 'a', ...SAVE);
    expect(again.code).toBe(2);
    expect(again.err).toMatch(/already exists.*--overwrite/);
    // (--engage once: a repeated option is refused, issue 15)
    const changed = SAVE.map((x, i) => (SAVE[i - 1] === '--engage' ? '20' : x));
    expect((await run('save', 'a', ...changed, '--overwrite')).code).toBe(0);
    expect(openPresetStore(dir).get('a')).toMatchObject({revision: 2, joint: {engagement: 20}});
  });

  it('renames and duplicates; shipped presets cannot be renamed or deleted', async () => {
    const {run, dir} = setup();
    await run('save', 'a', ...SAVE);
    expect((await run('rename', 'a', 'b')).out).toContain('renamed "a" to "b"');
    expect((await run('duplicate', 'demo-pump-casing-stud', 'pump-copy')).code).toBe(0);
    expect(openPresetStore(dir).get('pump-copy')?.repair?.holeState).toBe('stripped');
    const r = await run('rename', 'demo-gearbox-cover', 'x');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/shipped demo preset and read-only/);
    expect((await run('rename', 'b')).err).toMatch(/usage: tapwright presets rename OLD NEW/);
  });

  it('delete needs --yes, terminal or not, and says so', async () => {
    const {run, dir} = setup();
    await run('save', 'a', ...SAVE);
    const r = await run('delete', 'a');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/delete "a" needs --yes/);
    expect(openPresetStore(dir).get('a')).toBeDefined();
    expect((await run('delete', 'a', '--yes')).out).toContain('deleted "a"');
    expect(openPresetStore(dir).get('a')).toBeUndefined();
    expect((await run('delete', 'a', '--yes')).err).toMatch(/no saved preset named "a"/);
    expect((await run('delete', 'demo-gearbox-cover', '--yes')).err).toMatch(/read-only/);
  });

  it('exports to a file (never overwriting without --force) or stdout, and imports it back', async () => {
    const {run, dir} = setup();
    await run('save', 'a', ...SAVE);
    await run('save', 'b', ...SAVE);
    expect((await run('export', 'out.json')).out).toContain('exported 2 preset(s) to out.json');
    const again = await run('export', 'out.json', 'a');
    expect(again.code).toBe(2);
    expect(again.err).toMatch(/out\.json already exists; add --force/);
    expect((await run('export', 'out.json', 'a', '--force')).code).toBe(0);
    expect(JSON.parse(fs.readFileSync(path.join(dir, 'out.json'), 'utf8')).presets.map((p: {name: string}) => p.name)).toEqual(['a']);
    const stdout = await run('export', '-', 'demo-gearbox-cover');
    expect(JSON.parse(stdout.out).presets[0].name).toBe('demo-gearbox-cover');

    const clash = await run('import', 'out.json');
    expect(clash.code).toBe(2);
    expect(clash.err).toMatch(/already saved: "a"; nothing was imported/);
    const ok = await run('import', 'out.json', '--overwrite', '--json');
    expect(JSON.parse(ok.out)).toMatchObject({replaced: ['a'], added: []});
  });

  it('refuses a hostile import with exit 2 and keeps the store', async () => {
    const {run, dir} = setup();
    await run('save', 'a', ...SAVE);
    fs.writeFileSync(path.join(dir, 'evil.json'), '{"schemaVersion": 2, "presets": [{"__proto__": {"x": 1}}]}');
    const r = await run('import', 'evil.json');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/forbidden key at presets\[0\]\.__proto__/);
    expect(openPresetStore(dir).list().filter(p => !p.readOnly).map(p => p.name)).toEqual(['a']);
  });

  it('prints the store warnings (a damaged file was moved aside) on stderr, once, and carries on', async () => {
    const {run, dir} = setup();
    await run('save', 'a', ...SAVE);
    await run('save', 'b', ...SAVE);
    const file = path.join(dir, 'presets.json');
    const text = fs.readFileSync(file, 'utf8');
    fs.writeFileSync(file, text.slice(0, text.indexOf('"name": "b"') + 5)); // cut inside b
    const r = await run('list');
    expect(r.code).toBe(0);
    expect(r.err).toMatch(/^tapwright: warning: preset store was not valid JSON \(truncated or corrupt\); moved aside to .*presets\.json\.corrupt-2026-04-01T09-30-00-000Z; recovered 1 preset\n$/);
    expect(r.out).toMatch(/^a\s+joint\s+M10/m);
    expect(r.out).not.toMatch(/^b\s/m);
    expect((await run('list')).err).toBe('');
  });

  it('shows quarantined items: counted in the text list, kept verbatim in the JSON list', async () => {
    const {run, dir} = setup();
    const bad = {name: 'broken', kind: 'joint', joint: {thread: 'M10', engagement: -4}, notes: {}, savedAt: '2026-01-01T00:00:00Z', revision: 1};
    fs.writeFileSync(path.join(dir, 'presets.json'), JSON.stringify({schemaVersion: 2, presets: [bad]}));
    expect((await run('list')).out).toContain('1 unreadable item kept in quarantine (see presets list --json); nothing was deleted.');
    const doc = JSON.parse((await run('list', '--json')).out);
    expect(doc.quarantined).toEqual([{name: 'broken', reason: expect.stringMatching(/joint\.engagement/), at: expect.any(String), raw: bad}]);
  });
});
