/**
 * Run a bundled CommonJS body through V8 with a code cache kept on disk.
 *
 * The workbench bundle (Ink, React, the screens and the core: about 1 MB) takes
 * V8 roughly 150 ms to parse and to compile the functions that draw the first
 * frame. V8 can hand back the compiled code as a "code cache" and accept it on
 * the next start (vm.Script `cachedData`); Node 20 has no built-in module compile
 * cache (module.enableCompileCache arrived in Node 22). The cache is one file per
 * bundle, Node version and architecture. V8 rejects a cache made by another V8
 * version or with other flags, or for a source of another length; it does not
 * compare the text itself, so the file name carries the sha256 of the bundle made
 * at build time and a new build never reads an old build's cache. A rejected cache
 * costs a normal compile, and the cache is written again. Nothing here ever stops the program: a missing, damaged or
 * unwritable cache only costs the compile time.
 */
import fs from 'node:fs';
import path from 'node:path';
import vm from 'node:vm';

export type CacheState = 'used' | 'rejected' | 'absent' | 'off';

export interface LoadedBody {
  /** module.exports of the body. */
  exports: Record<string, unknown>;
  /** What became of the cache at load. */
  cache: CacheState;
  /** The cache file (undefined when caching is off). */
  file: string | undefined;
  /** Write the compiled code to the cache file when it was not used; true when written. Never throws. */
  save(): boolean;
}

export interface BodyOptions {
  /** The CommonJS source of the bundle. */
  source: string;
  /** A hash of the source, made at build time (names the cache file). */
  hash: string;
  /** Shown in stack traces; also the body's __filename. */
  filename: string;
  /** The folder for the cache file, or undefined for no cache. */
  cacheDir: string | undefined;
  require: NodeJS.Require;
}

/**
 * Where the code cache lives: TAPWRIGHT_CACHE_DIR, else the platform's cache
 * folder (XDG_CACHE_HOME or ~/.cache on Linux, ~/Library/Caches on macOS,
 * %LOCALAPPDATA% on Windows) under tapwright/. TAPWRIGHT_CODE_CACHE=off turns it off.
 */
export function codeCacheDir(env: Record<string, string | undefined>, platform: string = process.platform): string | undefined {
  if ((env.TAPWRIGHT_CODE_CACHE ?? '').toLowerCase() === 'off') return undefined;
  const own = env.TAPWRIGHT_CACHE_DIR?.trim();
  if (own) return own;
  const home = env.HOME?.trim() || env.USERPROFILE?.trim();
  if (platform === 'win32') {
    const local = env.LOCALAPPDATA?.trim();
    return local ? path.join(local, 'tapwright', 'Cache') : home ? path.join(home, 'AppData', 'Local', 'tapwright', 'Cache') : undefined;
  }
  if (platform === 'darwin') return home ? path.join(home, 'Library', 'Caches', 'tapwright') : undefined;
  const xdg = env.XDG_CACHE_HOME?.trim();
  if (xdg && path.isAbsolute(xdg)) return path.join(xdg, 'tapwright');
  return home ? path.join(home, '.cache', 'tapwright') : undefined;
}

const PREFIX = 'workbench-';
const SUFFIX = '.v8cache';

export function cacheFileName(hash: string): string {
  return `${PREFIX}${hash.slice(0, 16)}-${process.version}-${process.arch}${SUFFIX}`;
}

/** The body inside a CommonJS-style function, as V8 compiles it (and as its cache is made). */
export function wrapBody(source: string): string {
  return `(function (exports, require, module, __filename, __dirname) {${source}\n})`;
}

export function loadCachedBody(o: BodyOptions): LoadedBody {
  const file = o.cacheDir ? path.join(o.cacheDir, cacheFileName(o.hash)) : undefined;
  let cachedData: Buffer | undefined;
  if (file) {
    try {
      cachedData = fs.readFileSync(file);
    } catch {
      cachedData = undefined;
    }
  }
  const script = new vm.Script(wrapBody(o.source), {filename: o.filename, ...(cachedData ? {cachedData} : {})});
  const cache: CacheState = !file ? 'off' : !cachedData ? 'absent' : script.cachedDataRejected ? 'rejected' : 'used';
  const module = {exports: {} as Record<string, unknown>};
  const run = script.runInThisContext() as (e: unknown, r: NodeJS.Require, m: unknown, f: string, d: string) => void;
  run(module.exports, o.require, module, o.filename, path.dirname(o.filename));
  let done = cache === 'used' || cache === 'off';
  return {
    exports: module.exports,
    cache,
    file,
    save() {
      if (done || !file) return false;
      done = true;
      try {
        const data = script.createCachedData();
        fs.mkdirSync(path.dirname(file), {recursive: true, mode: 0o700});
        const tmp = `${file}.${process.pid}.tmp`;
        fs.writeFileSync(tmp, data);
        fs.renameSync(tmp, file);
        // Caches of earlier builds or other Node versions are of no more use.
        for (const name of fs.readdirSync(path.dirname(file))) {
          if (name.startsWith(PREFIX) && name.endsWith(SUFFIX) && name !== path.basename(file)) {
            try {
              fs.unlinkSync(path.join(path.dirname(file), name));
            } catch {
              // Another process may have removed it.
            }
          }
        }
        return true;
      } catch {
        return false;
      }
    },
  };
}
