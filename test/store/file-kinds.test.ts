/**
 * What stands in place of the store's files: a FIFO never blocks, a symbolic link
 * is never followed or replaced (one rule for presets.json, settings.json and the
 * drafts), a folder as the lock is named; the files are the user's only (0600 in
 * a 0700 folder); a settings change that was not saved says so.
 */
import {afterAll, beforeAll, describe, expect, it} from 'vitest';
import {execFileSync, spawnSync} from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import {openPresetStore} from '../../src/store/presets.js';
import {openSettings} from '../../src/store/settings.js';
import {readSettingsFile} from '../../src/store/settings-schema.js';
import {cliInTempStore} from '../support/cli-in-temp-store.js';
import {bundleStore} from './bundle.js';
import {jointPreset, tempDir} from './helpers.js';

const root = process.getuid?.() === 0;
let bundle: {file: string; cleanup: () => void};
beforeAll(async () => {
  bundle = await bundleStore('index');
});
afterAll(() => bundle?.cleanup());

/** Run `code` against the bundled store in a child with a time limit: a blocking read shows as a timeout, not a hung test. */
function inChild(code: string, dir: string): {status: number | null; out: string; err: string; timedOut: boolean} {
  const script = `import * as store from ${JSON.stringify(bundle.file)}; const dir = ${JSON.stringify(dir)}; ${code}`;
  const r = spawnSync(process.execPath, ['--input-type=module', '-e', script], {encoding: 'utf8', timeout: 10_000});
  return {status: r.status, out: r.stdout, err: r.stderr, timedOut: r.signal === 'SIGTERM'};
}

describe('a FIFO in place of a file never blocks', () => {
  it('presets.json: listed as the shipped presets with a message naming the file; a save fails with that message', () => {
    const dir = tempDir('fifo');
    execFileSync('mkfifo', [path.join(dir, 'presets.json')]);
    const r = inChild(
      `const s = store.openPresetStore(dir); console.log(JSON.stringify(s.warnings())); console.log(s.list().length);
       try { s.save({name: 'x', kind: 'joint', joint: {thread: 'M10', engagement: 12}}); } catch (e) { console.log('refused: ' + e.message); }`,
      dir,
    );
    expect(r.timedOut).toBe(false);
    expect(r.out).toMatch(/presets\.json is a named pipe \(FIFO\), not a plain file; tapwright reads a preset store only from a plain file: move it away/);
    expect(r.out).toMatch(/refused: .*presets\.json is a named pipe/);
  });

  it('settings.json: defaults with a message; the quick read too', () => {
    const dir = tempDir('fifo');
    execFileSync('mkfifo', [path.join(dir, 'settings.json')]);
    const r = inChild(
      `const s = store.openSettings(dir); console.log(s.get().units); console.log(JSON.stringify(s.warnings())); console.log(s.set({units: 'us'}));`,
      dir,
    );
    expect(r.timedOut).toBe(false);
    expect(r.out).toMatch(/^si\n.*settings\.json is a named pipe \(FIFO\).*using default settings.*\nfalse\n$/s);
    expect(readSettingsFile(dir)).toMatchObject({sound: false});
  });
});

describe('one rule for links: presets.json and settings.json are never followed nor replaced', () => {
  it('presets.json as a link: not read, not replaced; a save says why', () => {
    const dir = tempDir('link');
    const elsewhere = tempDir('link-target');
    openPresetStore(elsewhere).save(jointPreset('there'));
    fs.symlinkSync(path.join(elsewhere, 'presets.json'), path.join(dir, 'presets.json'));
    const s = openPresetStore(dir);
    expect(s.warnings().join('\n')).toMatch(/presets\.json is a symbolic link; tapwright does not follow links for its own files/);
    expect(() => s.save(jointPreset('here'))).toThrow(/presets\.json is a symbolic link/);
    expect(fs.lstatSync(path.join(dir, 'presets.json')).isSymbolicLink()).toBe(true);
  });

  it('settings.json as a link: not followed; set reports that nothing was saved', () => {
    const dir = tempDir('link');
    const target = path.join(tempDir('link-target'), 'real.json');
    fs.writeFileSync(target, JSON.stringify({units: 'us'}));
    fs.symlinkSync(target, path.join(dir, 'settings.json'));
    const s = openSettings(dir);
    expect(s.get().units).toBe('si');
    expect(s.warnings().join('\n')).toMatch(/settings\.json is a symbolic link/);
    expect(s.set({units: 'si'})).toBe(false);
    expect(JSON.parse(fs.readFileSync(target, 'utf8'))).toEqual({units: 'us'});
  });
});

describe('a folder in place of the lock', () => {
  it('the message names the lock file, not presets.json', () => {
    const dir = tempDir('lockdir');
    openPresetStore(dir).save(jointPreset('a'));
    fs.mkdirSync(path.join(dir, 'presets.json.lock'));
    expect(() => openPresetStore(dir, {lockTimeoutMs: 300}).save(jointPreset('b'))).toThrow(/presets\.json\.lock is a folder; it stands where tapwright keeps its lock file/);
  });
});

describe('permissions', () => {
  it('a new config folder is rwx------, the store, its backup and a damaged copy rw-------', () => {
    const dir = path.join(tempDir('perm'), 'cfg');
    const s = openPresetStore(dir);
    s.save(jointPreset('a'));
    s.save(jointPreset('b'));
    fs.writeFileSync(path.join(dir, 'presets.json'), '{"schemaVersion": 2, "presets": [');
    fs.chmodSync(path.join(dir, 'presets.json'), 0o644);
    openPresetStore(dir).save(jointPreset('c'));
    const mode = (n: string) => fs.statSync(path.join(dir, n)).mode & 0o777;
    expect(mode('.')).toBe(0o700);
    for (const n of fs.readdirSync(dir).filter(x => x.startsWith('presets.json'))) expect([n, mode(n)]).toEqual([n, 0o600]);
    expect(fs.readdirSync(dir).some(n => n.includes('.corrupt-'))).toBe(true);
  });

  it('settings.json is rw------- in a folder made rwx-------', () => {
    const dir = path.join(tempDir('perm'), 'cfg');
    expect(openSettings(dir).set({units: 'us'})).toBe(true);
    expect(fs.statSync(dir).mode & 0o777).toBe(0o700);
    expect(fs.statSync(path.join(dir, 'settings.json')).mode & 0o777).toBe(0o600);
  });
});

describe('settings set when nothing can be saved', () => {
  it('reports that nothing was saved and exits 2 (a read-only folder; as root, a folder where the lock goes)', async () => {
    const {dir, run} = cliInTempStore('ro-settings');
    expect((await run('settings', 'set', 'units', 'si')).code).toBe(0);
    if (root) fs.mkdirSync(path.join(dir, 'settings.json.lock'));
    else fs.chmodSync(dir, 0o500);
    try {
      const r = await run('settings', 'set', 'units', 'us');
      expect(r.err).toMatch(/units NOT set: cannot save settings to .*settings\.json \((EACCES|.*settings\.json\.lock is a folder).*; nothing was saved/);
      expect(r.code).toBe(2);
      expect(JSON.parse((await run('settings', '--json')).out).units).toBe('si');
    } finally {
      fs.chmodSync(dir, 0o700);
    }
  });
});
