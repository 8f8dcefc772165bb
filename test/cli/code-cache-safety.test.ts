/**
 * The code cache in a folder others can reach: created exclusively under a name
 * nobody can guess, never through a link, and never loaded from a folder or file
 * that is not the user's own or that others can write.
 */
import {describe, expect, it} from 'vitest';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import {createRequire} from 'node:module';
import {cacheFileName, loadCachedBody} from '../../src/cli/code-cache.js';

const req = createRequire(import.meta.url);
let serial = 0;
const fresh = () => `module.exports.answer = 42; // cache safety ${++serial} ${Date.now()}\n`;
const temp = () => fs.mkdtempSync(path.join(os.tmpdir(), 'tw-cache-safe-'));
const HASH = 'c'.repeat(64);
const load = (cacheDir: string, source = fresh()) => loadCachedBody({source, hash: HASH, filename: '/opt/tapwright/tapwright.mjs', cacheDir, require: req});
const isRoot = process.getuid?.() === 0;

describe('code cache safety', () => {
  it('save never writes through a link planted at the old predictable temporary name, nor at the cache file', () => {
    const dir = temp();
    const victim = path.join(temp(), 'victim.txt');
    fs.writeFileSync(victim, 'precious');
    const file = path.join(dir, cacheFileName(HASH));
    fs.symlinkSync(victim, `${file}.${process.pid}.tmp`);
    const r = load(dir);
    expect(r.save()).toBe(true);
    expect(fs.readFileSync(victim, 'utf8')).toBe('precious');
    expect(fs.lstatSync(file).isFile()).toBe(true);
    expect(fs.statSync(file).mode & 0o777).toBe(0o600);
  });

  it('a link in place of the cache file is never loaded', () => {
    const dir = temp();
    const source = fresh();
    const good = load(temp(), source);
    expect(good.save()).toBe(true);
    const elsewhere = path.join(path.dirname(good.file!), cacheFileName(HASH));
    fs.symlinkSync(elsewhere, path.join(dir, cacheFileName(HASH)));
    const r = load(dir, source);
    expect(r.cache).toBe('refused');
    expect(r.refused).toMatch(/symbolic link/);
    expect(r.exports.answer).toBe(42);
    expect(r.save()).toBe(false);
  });

  it('a cache folder or file writable by others is neither loaded nor written', () => {
    const dir = temp();
    const source = fresh();
    expect(load(dir, source).save()).toBe(true);
    const file = path.join(dir, cacheFileName(HASH));
    fs.chmodSync(file, 0o666);
    expect(load(dir, source)).toMatchObject({cache: 'refused', refused: expect.stringMatching(/cache file is writable by others \(mode 666\)/)});
    fs.chmodSync(file, 0o600);
    fs.chmodSync(dir, 0o777);
    const r = load(dir, source);
    expect(r).toMatchObject({cache: 'refused', refused: expect.stringMatching(/cache folder is writable by others/)});
    expect(r.save()).toBe(false);
  });

  it.runIf(isRoot)('a cache folder or file of another user is not trusted', () => {
    const dir = temp();
    const source = fresh();
    expect(load(dir, source).save()).toBe(true);
    fs.chownSync(path.join(dir, cacheFileName(HASH)), 65534, 65534);
    expect(load(dir, source)).toMatchObject({cache: 'refused', refused: expect.stringMatching(/cache file belongs to another user \(uid 65534\)/)});
    fs.chownSync(dir, 65534, 65534);
    expect(load(dir, source)).toMatchObject({cache: 'refused', refused: expect.stringMatching(/cache folder belongs to another user/)});
  });
});
