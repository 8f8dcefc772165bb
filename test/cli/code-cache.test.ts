/**
 * The workbench's V8 code cache (src/cli/code-cache.ts): used when it matches,
 * rejected and rewritten when it does not, never fatal, and kept per bundle,
 * Node version and architecture.
 */
import {describe, expect, it} from 'vitest';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import {createRequire} from 'node:module';
import {spawnSync} from 'node:child_process';
import {cacheFileName, codeCacheDir, loadCachedBody, wrapBody} from '../../src/cli/code-cache.js';

const req = createRequire(import.meta.url);
const SOURCE = `
  const path = require('node:path');
  function square(x) { return x * x; }
  module.exports.answer = square(6) + 6;
  module.exports.base = path.basename(__filename);
`;
let serial = 0;
/** Each test compiles its own source: V8's in-process compilation cache would otherwise answer for the file. */
const fresh = () => `${SOURCE}// test source ${++serial}\n`;
/** What a new process (no in-process compilation cache) makes of a cache file. */
const verdict = (source: string, file: string) =>
  spawnSync(process.execPath, ['-e', `const vm=require('vm'),fs=require('fs');const s=new vm.Script(${JSON.stringify(wrapBody(source))},{cachedData:fs.readFileSync(${JSON.stringify(file)})});process.stdout.write(s.cachedDataRejected?'rejected':'accepted')`], {encoding: 'utf8'}).stdout;
const temp = () => fs.mkdtempSync(path.join(os.tmpdir(), 'tw-code-cache-'));
const load = (cacheDir: string | undefined, source = fresh(), hash = 'a'.repeat(64)) =>
  loadCachedBody({source, hash, filename: '/opt/tapwright/tapwright.mjs', cacheDir, require: req});

describe('code cache', () => {
  it('runs the body without a cache, writes one on save, and a new process accepts it', () => {
    const dir = temp();
    const source = fresh();
    const first = load(dir, source);
    expect(first.exports).toEqual({answer: 42, base: 'tapwright.mjs'});
    expect(first.cache).toBe('absent');
    expect(first.save()).toBe(true);
    expect(first.save()).toBe(false); // once is enough
    expect(fs.readdirSync(dir)).toEqual([cacheFileName('a'.repeat(64))]);
    expect(verdict(source, path.join(dir, cacheFileName('a'.repeat(64))))).toBe('accepted');
    const second = load(dir, source);
    expect(second.cache).toBe('used');
    expect(second.exports.answer).toBe(42);
    expect(second.save()).toBe(false);
  });

  it('a damaged cache file is rejected, the body still runs, and save replaces it', () => {
    const dir = temp();
    const source = fresh();
    const file = path.join(dir, cacheFileName('b'.repeat(64)));
    fs.writeFileSync(file, Buffer.from('not a code cache at all, just bytes'));
    const r = load(dir, source, 'b'.repeat(64));
    expect(r.cache).toBe('rejected');
    expect(r.exports.answer).toBe(42);
    expect(r.save()).toBe(true);
    expect(verdict(source, file)).toBe('accepted');
  });

  it('a new build never reads the cache of another: the file is named by the bundle hash', () => {
    // V8 checks a cache against the length of the source, not its text: a cache made
    // for other source of another length is refused, but one of the same length would
    // be taken. The file name carries the build's sha256, so that never happens.
    const dir = temp();
    const source = fresh();
    load(dir, source, 'd'.repeat(64)).save();
    const file = path.join(dir, cacheFileName('d'.repeat(64)));
    expect(verdict(source, file)).toBe('accepted');
    expect(verdict(`${source} `, file)).toBe('rejected');
    expect(cacheFileName('e'.repeat(64))).not.toBe(cacheFileName('d'.repeat(64)));
    const other = load(dir, source.replace('+ 6', '+ 7'), 'e'.repeat(64));
    expect(other.cache).toBe('absent');
    expect(other.exports.answer).toBe(43);
  });

  it('an unwritable cache folder costs nothing but the cache', () => {
    const dir = temp();
    const blocker = path.join(dir, 'file');
    fs.writeFileSync(blocker, 'x');
    const r = load(path.join(blocker, 'cache'));
    expect(r.exports.answer).toBe(42);
    expect(r.cache).toBe('absent');
    expect(r.save()).toBe(false);
  });

  it('a new build removes the caches of earlier builds', () => {
    const dir = temp();
    load(dir, fresh(), '1'.repeat(64)).save();
    load(dir, fresh(), '2'.repeat(64)).save();
    expect(fs.readdirSync(dir)).toEqual([cacheFileName('2'.repeat(64))]);
  });

  it('names the Node version and architecture in the file', () => {
    expect(cacheFileName('c'.repeat(64))).toBe(`workbench-${'c'.repeat(16)}-${process.version}-${process.arch}.v8cache`);
  });

  it('lives in TAPWRIGHT_CACHE_DIR, else the platform cache folder; off when asked', () => {
    expect(codeCacheDir({TAPWRIGHT_CACHE_DIR: '/srv/tw-cache', HOME: '/home/a'}, 'linux')).toBe('/srv/tw-cache');
    expect(codeCacheDir({XDG_CACHE_HOME: '/x/cache', HOME: '/home/a'}, 'linux')).toBe('/x/cache/tapwright');
    expect(codeCacheDir({XDG_CACHE_HOME: 'relative', HOME: '/home/a'}, 'linux')).toBe('/home/a/.cache/tapwright');
    expect(codeCacheDir({HOME: '/Users/a'}, 'darwin')).toBe('/Users/a/Library/Caches/tapwright');
    expect(codeCacheDir({LOCALAPPDATA: 'C:\\Users\\a\\AppData\\Local'}, 'win32')).toMatch(/tapwright.Cache$/);
    expect(codeCacheDir({}, 'linux')).toBeUndefined();
    expect(codeCacheDir({TAPWRIGHT_CODE_CACHE: 'off', TAPWRIGHT_CACHE_DIR: '/srv/tw-cache'}, 'linux')).toBeUndefined();
    expect(load(undefined).cache).toBe('off');
  });
});
