/**
 * Hostile text: control characters and text-direction overrides are refused in
 * every stored text field, and escaped wherever text from a file or an argument
 * is printed, error messages included.
 */
import {describe, expect, it} from 'vitest';
import fs from 'node:fs';
import path from 'node:path';
import {execFileSync} from 'node:child_process';
import {openPresetStore} from '../../src/store/presets.js';
import {cliInTempStore} from '../support/cli-in-temp-store.js';
import {jointPreset} from './helpers.js';

const ESC = '\u001b';
const RAW = /[\u0000-\u0009\u000b-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/;
const stored = (over: Record<string, unknown> = {}) => ({...jointPreset('p1'), savedAt: '2026-01-01T00:00:00.000Z', revision: 1, ...over});
const MATERIAL = {id: 'mine-1', name: 'test alloy', group: 'other', rm: 400, yield: 250, shear: 240, elasticModulus: 70000, source: 'test data'};

describe('refused at the schema', () => {
  it('presets save refuses them in notes and in the joint ids', () => {
    const s = openPresetStore(cliInTempStore('hostile').dir);
    expect(() => s.save(jointPreset('a', {notes: {asset: `P-1${ESC}[2K`}}))).toThrow(/notes\.asset: U\+001B at position 4: control characters/);
    expect(() => s.save(jointPreset('b', {joint: {thread: `M10${ESC}[31m`, engagement: 12}}))).toThrow(/joint\.thread: U\+001B/);
    expect(() => s.save(jointPreset('c', {joint: {thread: 'M10', engagement: 12, parent: 'S355\u202e'}}))).toThrow(/joint\.parent: U\+202E/);
    expect(() => s.save(jointPreset('d', {notes: {text: 'two\nlines'}}))).toThrow(/notes\.text: U\+000A/);
  });

  it('import refuses a preset that save refuses (a thread id followed by an escape sequence); the message is escaped', async () => {
    const {dir, run} = cliInTempStore('hostile');
    const f = path.join(dir, 'in.json');
    fs.writeFileSync(f, JSON.stringify({schemaVersion: 2, presets: [stored({name: 'x', joint: {thread: `M10${ESC}[31mPASS`, engagement: 12}})]}));
    const r = await run('presets', 'import', f);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/cannot import .*presets\[0\] \("x"\): joint\.thread: U\+001B.*nothing was imported/);
    expect(r.err).not.toMatch(RAW);
    expect(openPresetStore(dir).list().filter(p => p.source === 'saved')).toEqual([]);
  });

  it('materials add refuses them in a material name or source; inserts import in a table name', async () => {
    const {dir, run} = cliInTempStore('hostile');
    const f = path.join(dir, 'm.json');
    fs.writeFileSync(f, JSON.stringify({...MATERIAL, name: `alloy${ESC}]0;title\u0007`}));
    const r = await run('materials', 'add', f);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/material: name: U\+001B/);
    const t = path.join(dir, 't.json');
    const table = JSON.parse((await run('inserts', 'export', 'demo solid key-locked inserts', '-')).out);
    fs.writeFileSync(t, JSON.stringify({...table, name: 'mine\u202egnp', provenance: {kind: 'user', source: 'test data'}}));
    const i = await run('inserts', 'import', t);
    expect(i.code).toBe(2);
    expect(i.err).toMatch(/U\+202E/);
    expect(i.err).not.toMatch(RAW);
  });
});

describe('escaped on output', () => {
  it('a hand-edited store with an escape sequence in a note: list and show never print it raw', async () => {
    const {dir, run} = cliInTempStore('hostile');
    fs.writeFileSync(path.join(dir, 'presets.json'), JSON.stringify({schemaVersion: 2, presets: [stored({name: 'p1', notes: {location: `hall${ESC}[2K${ESC}[31mPASS`}}), stored({name: 'p2', notes: {asset: 'P-1\u202eSSAP\u009b'}})]}));
    for (const args of [['presets', 'list'], ['presets', 'list', '--json'], ['presets', 'show', 'p1'], ['presets', 'show', `p1${ESC}[31m`]]) {
      const r = await run(...args);
      expect([args.join(' '), RAW.test(r.out), RAW.test(r.err)]).toEqual([args.join(' '), false, false]);
    }
  });

  it('error messages echo arguments escaped and cut: a 120 KB name comes back short', async () => {
    const {run} = cliInTempStore('hostile');
    const r = await run('presets', 'show', `${ESC}[31m${'A'.repeat(120_000)}`);
    expect(r.code).toBe(2);
    expect(r.err).not.toMatch(RAW);
    expect(r.err).toContain('\\e[31m');
    expect(r.err.length).toBeLessThan(400);
  });
});

describe('materials add with a list is all or nothing', () => {
  it('the second item is bad: nothing is stored, the message names the item', async () => {
    const {dir, run} = cliInTempStore('hostile');
    const f = path.join(dir, 'list.json');
    fs.writeFileSync(f, JSON.stringify([MATERIAL, {...MATERIAL, id: 'mine-2', rm: -1}]));
    const r = await run('materials', 'add', f);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/item 2 of 2: material: rm: .*nothing was stored/);
    expect((await run('materials', 'mine', '--json')).out).toContain('"userMaterials": []');
  });
});

describe('input files are checked before they are read', () => {
  it('a FIFO or a device is refused at once (materials add, inserts import, repair --solid-table); a big file by its size', async () => {
    const {dir, run} = cliInTempStore('hostile');
    const fifo = path.join(dir, 'pipe.json');
    execFileSync('mkfifo', [fifo]);
    for (const args of [['materials', 'add', fifo], ['inserts', 'import', fifo], ['materials', 'add', '/dev/zero']]) {
      const r = await run(...args);
      expect([args.join(' '), r.code]).toEqual([args.join(' '), 2]);
      expect(r.err).toMatch(/cannot read ".*": .*is (a named pipe \(FIFO\)|a device), not a plain file/);
    }
    const rep = await run('repair', '--thread', 'M10', '--parent', 'S355', '--engage', '15', '--solid-table', fifo);
    expect(rep.code).toBe(2);
    expect(rep.err).toMatch(/--solid-table.*named pipe/);
    const big = path.join(dir, 'big.json');
    fs.writeFileSync(big, ' '.repeat(2 * 1024 * 1024));
    expect((await run('materials', 'add', big)).err).toMatch(/"big\.json" is larger than 1 MiB \(1048576 bytes\); nothing was read|is larger than 1 MiB/);
  }, 30_000);
});
