/** Damaged files and stuck locks: nothing readable is lost, the user is told in one line. */
import {describe, expect, it} from 'vitest';
import {spawnSync} from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import {openPresetStore} from '../../src/store/presets.js';
import {MAX_STORE_READ_BYTES} from '../../src/store/store-file.js';
import {uniqueToken} from '../../src/store/file-ops.js';
import {jointPreset, tempDir} from './helpers.js';

const file = (dir: string) => path.join(dir, 'presets.json');
const savedNames = (s: ReturnType<typeof openPresetStore>) => s.list().filter(p => p.source === 'saved').map(p => p.name).sort();

function storeWith(names: string[]): string {
  const dir = tempDir('fault');
  const s = openPresetStore(dir);
  for (const n of names) s.save(jointPreset(n));
  return dir;
}

function asides(dir: string, mark: string): string[] {
  return fs.readdirSync(dir).filter(n => n.startsWith(`presets.json.${mark}`));
}

describe('damaged store file', () => {
  it('truncated: moved aside, every complete preset recovered, one-line warning', () => {
    const dir = storeWith(['a', 'b', 'c']);
    const text = fs.readFileSync(file(dir), 'utf8');
    const cut = text.lastIndexOf('"name": "c"') + 20; // in the middle of the third preset
    fs.writeFileSync(file(dir), text.slice(0, cut));
    fs.rmSync(`${file(dir)}.bak`, {force: true});
    const s = openPresetStore(dir);
    expect(savedNames(s)).toEqual(['a', 'b']);
    const w = s.warnings();
    expect(w).toHaveLength(1);
    expect(w[0]).toMatch(/^preset store was not valid JSON \(truncated or corrupt\); moved aside to .*presets\.json\.corrupt-\d{4}-\d\d-\d\dT.*; recovered 2 presets$/);
    expect(w[0]).not.toMatch(/\n/);
    const [aside] = asides(dir, 'corrupt-');
    expect(fs.readFileSync(path.join(dir, aside!), 'utf8')).toBe(text.slice(0, cut)); // kept byte for byte
    // The repaired store is valid and the next open is quiet.
    expect(openPresetStore(dir).warnings()).toEqual([]);
    expect(JSON.parse(fs.readFileSync(file(dir), 'utf8')).schemaVersion).toBe(2);
  });

  it('a stray byte in the middle: the presets around it are recovered', () => {
    const dir = storeWith(['a', 'b', 'c', 'd']);
    const text = fs.readFileSync(file(dir), 'utf8');
    const at = text.indexOf('"name": "b"');
    fs.writeFileSync(file(dir), `${text.slice(0, at)}\u0000${text.slice(at + 1)}`);
    fs.rmSync(`${file(dir)}.bak`, {force: true});
    const s = openPresetStore(dir);
    expect(savedNames(s)).toEqual(['a', 'c', 'd']);
    expect(s.warnings()[0]).toMatch(/recovered 3 presets/);
  });

  it('empty (0 bytes): moved aside, presets recovered from presets.json.bak', () => {
    const dir = storeWith(['a', 'b']);
    openPresetStore(dir).save(jointPreset('c')); // a new session: .bak holds a and b
    fs.writeFileSync(file(dir), '');
    const s = openPresetStore(dir);
    expect(savedNames(s)).toEqual(['a', 'b']);
    expect(s.warnings()[0]).toMatch(/^preset store was empty; moved aside to .*corrupt-.*; recovered 2 presets \(2 of them from presets\.json\.bak\)$/);
  });

  it('whitespace only, or JSON of the wrong layout, counts as damaged and is kept aside', () => {
    for (const content of ['  \n', '[1,2,3]', '{"schemaVersion": 2, "presets": 7}', '"text"']) {
      const dir = tempDir('layout');
      fs.writeFileSync(file(dir), content);
      const s = openPresetStore(dir);
      expect(savedNames(s)).toEqual([]);
      expect(s.warnings()[0]).toMatch(/moved aside to/);
      expect(fs.readFileSync(path.join(dir, asides(dir, 'corrupt-')[0]!), 'utf8')).toBe(content);
    }
  });

  it('a store file over the read limit is left untouched (not moved aside as damaged), with a message saying what to do', () => {
    const dir = storeWith(['a']);
    openPresetStore(dir).save(jointPreset('b'));
    fs.truncateSync(file(dir), MAX_STORE_READ_BYTES + 1); // sparse: quick to make
    const s = openPresetStore(dir);
    expect(s.warnings()[0]).toMatch(/presets\.json: it is 64\.0 MiB, more than the 64\.0 MiB tapwright reads; it is left untouched .*Move it away \(keep it\)/);
    expect(asides(dir, 'corrupt-')).toEqual([]);
    expect(fs.statSync(file(dir)).size).toBe(MAX_STORE_READ_BYTES + 1);
    expect(() => s.save(jointPreset('c'))).toThrow(/presets\.json: it is 64\.0 MiB.*left untouched/);
    expect(fs.statSync(file(dir)).size).toBe(MAX_STORE_READ_BYTES + 1);
  });

  it('an invalid preset is quarantined: kept verbatim, shown, never dropped by later saves', () => {
    const dir = tempDir('quarantine');
    const good = {...jointPreset('good'), savedAt: '2026-01-01T00:00:00.000Z', revision: 1};
    const bad = {...jointPreset('bad'), joint: {thread: 'M10', engagement: -1}, savedAt: '2026-01-01T00:00:00.000Z', revision: 1};
    const dup = {...good, notes: {text: 'second copy'}};
    fs.writeFileSync(file(dir), JSON.stringify({schemaVersion: 2, presets: [good, bad, dup, 42]}));
    const s = openPresetStore(dir);
    expect(savedNames(s)).toEqual(['good']);
    const q = s.quarantined();
    expect(q.map(x => x.name)).toEqual(['bad', 'good', undefined]);
    expect(q[0]!.reason).toMatch(/joint\.engagement/);
    expect(q[0]!.raw).toEqual(bad);
    expect(q[1]!.reason).toMatch(/a second preset named "good"/);
    s.save(jointPreset('bad')); // a valid preset may take the name; the broken one stays in quarantine
    s.save(jointPreset('more'));
    const again = openPresetStore(dir);
    expect(savedNames(again)).toEqual(['bad', 'good', 'more']);
    expect(again.quarantined().map(x => x.raw)).toEqual([bad, dup, 42]);
  });

  it('a quarantined item that reads as a valid preset again comes back, when its name is free', () => {
    const dir = tempDir('quarantine');
    const back = {...jointPreset('back'), savedAt: '2026-01-01T00:00:00.000Z', revision: 2};
    const taken = {...jointPreset('taken'), savedAt: '2026-01-01T00:00:00.000Z', revision: 1};
    const q = (raw: unknown) => ({name: (raw as {name: string}).name, reason: 'failed an older check', at: '2026-01-01T00:00:00.000Z', raw});
    fs.writeFileSync(file(dir), JSON.stringify({schemaVersion: 2, presets: [taken], quarantine: [q(back), q(taken)]}));
    const s = openPresetStore(dir);
    expect(savedNames(s)).toEqual(['back', 'taken']);
    expect(s.get('back')?.revision).toBe(2);
    expect(s.quarantined()).toEqual([q(taken)]);
  });

  it('a store written by a newer tapwright is not read and never changed', () => {
    const dir = tempDir('newer');
    const text = JSON.stringify({schemaVersion: 3, presets: [{anything: true}]});
    fs.writeFileSync(file(dir), text);
    const s = openPresetStore(dir);
    expect(s.warnings()[0]).toMatch(/schemaVersion 3 is not one this tapwright reads \(versions 1 to 2\); it was written by a newer tapwright/);
    expect(() => s.save(jointPreset('x'))).toThrow(/not changing it/);
    expect(fs.readFileSync(file(dir), 'utf8')).toBe(text);
    expect(s.list().every(p => p.source === 'shipped')).toBe(true);
  });

  it('a config folder that cannot be created gives a StoreError naming the folder, not a crash', () => {
    const base = tempDir('blocked');
    fs.writeFileSync(path.join(base, 'file'), 'x');
    const dir = path.join(base, 'file', 'tapwright');
    const s = openPresetStore(dir);
    expect(s.list().length).toBeGreaterThan(0);
    expect(() => s.save(jointPreset('x'))).toThrow(/cannot create the config folder .*file.tapwright: E(NOTDIR|EXIST)/);
  });
});

describe('locks', () => {
  const lock = (dir: string) => `${file(dir)}.lock`;
  const deadPid = (): number => spawnSync(process.execPath, ['-e', '0']).pid!;

  it('a lock left by a process that is no longer running is broken at once', () => {
    const dir = storeWith(['a']);
    fs.writeFileSync(lock(dir), JSON.stringify({pid: deadPid(), host: os.hostname(), at: Date.now()}));
    const t = Date.now();
    openPresetStore(dir, {lockTimeoutMs: 2000}).save(jointPreset('b'));
    expect(Date.now() - t).toBeLessThan(1500);
    expect(savedNames(openPresetStore(dir))).toEqual(['a', 'b']);
    expect(fs.existsSync(lock(dir))).toBe(false);
  });

  it('a lock older than the stale age is broken whoever holds it (another host, a reused pid)', () => {
    const dir = storeWith(['a']);
    fs.writeFileSync(lock(dir), JSON.stringify({pid: process.pid, host: 'other-host', at: Date.now() - 60_000}));
    openPresetStore(dir, {lockTimeoutMs: 2000}).save(jointPreset('b'));
    expect(savedNames(openPresetStore(dir))).toEqual(['a', 'b']);
  });

  it('an empty lock file (its writer died at once) is broken once it is a few seconds old', () => {
    const dir = storeWith(['a']);
    fs.writeFileSync(lock(dir), '');
    const old = new Date(Date.now() - 5000);
    fs.utimesSync(lock(dir), old, old);
    openPresetStore(dir, {lockTimeoutMs: 2000}).save(jointPreset('b'));
    expect(savedNames(openPresetStore(dir))).toEqual(['a', 'b']);
  });

  it('a live lock makes a save wait, then fail with "preset store busy" naming the lock, store unchanged', () => {
    const dir = storeWith(['a']);
    const before = fs.readFileSync(file(dir), 'utf8');
    fs.writeFileSync(lock(dir), JSON.stringify({pid: 12345, host: 'other-host', at: Date.now()}));
    const s = openPresetStore(dir, {lockTimeoutMs: 300});
    expect(() => s.save(jointPreset('b'))).toThrow(/^preset store busy: .*presets\.json\.lock is held by process 12345 on other-host; try again/);
    expect(fs.readFileSync(file(dir), 'utf8')).toBe(before);
    expect(fs.existsSync(lock(dir))).toBe(true); // someone else's live lock is left alone
  });

  it('leftover temp files of a killed writer are removed on the next save', () => {
    const dir = storeWith(['a']);
    fs.writeFileSync(`${file(dir)}.tmp-99999-deadbeef`, '{"half": ');
    fs.writeFileSync(`${file(dir)}.bak.tmp-99999-deadbeef`, '{"half": ');
    fs.writeFileSync(`${file(dir)}.corrupt-2026-01-01T00-00-00-000Z.tmp-99999-deadbeef`, '{"half": ');
    openPresetStore(dir).save(jointPreset('b'));
    expect(fs.readdirSync(dir).filter(n => n.includes('.tmp-'))).toEqual([]);
  });
});

describe('temp-file and lock tokens', () => {
  it('are distinct across many calls in one process (the pid tells processes apart)', () => {
    const seen = new Set(Array.from({length: 20_000}, () => uniqueToken()));
    expect(seen.size).toBe(20_000);
    for (const t of [...seen].slice(0, 50)) expect(t).toMatch(/^[0-9a-z]+$/);
  });
});
