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

/** `refused`: the cache folder or file failed the safety checks (see checkFolder, readCacheFile); nothing is read or written. */
export type CacheState = 'used' | 'rejected' | 'absent' | 'off' | 'refused';

export interface LoadedBody {
  /** module.exports of the body. */
  exports: Record<string, unknown>;
  /** What became of the cache at load. */
  cache: CacheState;
  /** The cache file (undefined when caching is off). */
  file: string | undefined;
  /** Why the cache was refused, when it was. */
  refused?: string;
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

/**
 * Why a cache folder or file may not be trusted, or undefined when it may: it must be
 * what it should be (a folder, a plain file: never a link), owned by this user, and
 * not writable by the group or others. (Windows: no owner and mode bits to check.)
 */
function untrusted(st: fs.Stats, what: 'folder' | 'file'): string | undefined {
  if (st.isSymbolicLink()) return `the cache ${what} is a symbolic link`;
  if (what === 'folder' ? !st.isDirectory() : !st.isFile()) return `the cache ${what} is not a ${what === 'folder' ? 'folder' : 'plain file'}`;
  if (process.platform === 'win32' || typeof process.getuid !== 'function') return undefined;
  if (st.uid !== process.getuid()) return `the cache ${what} belongs to another user (uid ${st.uid})`;
  if ((st.mode & 0o022) !== 0) return `the cache ${what} is writable by others (mode ${(st.mode & 0o777).toString(8)})`;
  return undefined;
}

/**
 * Create the cache folder rwx------ if needed. Returns the reason it may not be
 * trusted, null when it cannot be made (then there is simply no cache), or undefined.
 */
function checkFolder(dir: string): string | null | undefined {
  try {
    fs.mkdirSync(dir, {recursive: true, mode: 0o700});
  } catch {
    return null;
  }
  try {
    return untrusted(fs.lstatSync(dir), 'folder');
  } catch {
    return null;
  }
}

/** The cache file's bytes, undefined when absent; a reason string when it is refused. Never follows a link. */
function readCacheFile(file: string): Buffer | string | undefined {
  const c = fs.constants;
  let fd: number;
  try {
    fd = fs.openSync(file, c.O_RDONLY | (c.O_NOFOLLOW ?? 0) | (c.O_NONBLOCK ?? 0));
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    if (code === 'ENOENT') return undefined;
    return code === 'ELOOP' ? 'the cache file is a symbolic link' : `the cache file cannot be read (${code ?? String(e)})`;
  }
  try {
    const st = fs.fstatSync(fd);
    const why = untrusted(st, 'file');
    if (why) return why;
    if (st.size > 256 * 1024 * 1024) return 'the cache file is too big';
    return fs.readFileSync(fd);
  } catch (e) {
    return `the cache file cannot be read (${(e as NodeJS.ErrnoException).code ?? String(e)})`;
  } finally {
    fs.closeSync(fd);
  }
}

export function loadCachedBody(o: BodyOptions): LoadedBody {
  const file = o.cacheDir ? path.join(o.cacheDir, cacheFileName(o.hash)) : undefined;
  let cachedData: Buffer | undefined;
  const folder = o.cacheDir ? checkFolder(o.cacheDir) : undefined;
  let refused = folder ?? undefined;
  if (file && folder === undefined) {
    const r = readCacheFile(file);
    if (typeof r === 'string') refused = r;
    else cachedData = r;
  }
  const script = new vm.Script(wrapBody(o.source), {filename: o.filename, ...(cachedData ? {cachedData} : {})});
  const cache: CacheState = !file ? 'off' : refused ? 'refused' : !cachedData ? 'absent' : script.cachedDataRejected ? 'rejected' : 'used';
  const module = {exports: {} as Record<string, unknown>};
  const run = script.runInThisContext() as (e: unknown, r: NodeJS.Require, m: unknown, f: string, d: string) => void;
  run(module.exports, o.require, module, o.filename, path.dirname(o.filename));
  let done = cache === 'used' || cache === 'off' || cache === 'refused';
  return {
    exports: module.exports,
    cache,
    file,
    ...(refused ? {refused} : {}),
    save() {
      if (done || !file) return false;
      done = true;
      const dir = path.dirname(file);
      // Checked again: the folder may have changed since the start.
      if (checkFolder(dir) !== undefined) return false;
      // A temporary name nobody can guess, created exclusively (O_EXCL, never through a link),
      // rw------- ; then renamed over the cache file (a rename replaces a link, never follows it).
      const tmp = `${file}.${process.pid}-${Math.random().toString(36).slice(2)}${Date.now().toString(36)}.tmp`;
      try {
        const data = script.createCachedData();
        const fd = fs.openSync(tmp, fs.constants.O_WRONLY | fs.constants.O_CREAT | fs.constants.O_EXCL | (fs.constants.O_NOFOLLOW ?? 0), 0o600);
        try {
          fs.writeFileSync(fd, data);
        } finally {
          fs.closeSync(fd);
        }
        fs.renameSync(tmp, file);
        // Caches of earlier builds or other Node versions are of no more use.
        for (const name of fs.readdirSync(dir)) {
          if (name.startsWith(PREFIX) && name.endsWith(SUFFIX) && name !== path.basename(file)) {
            try {
              fs.unlinkSync(path.join(dir, name));
            } catch {
              // Another process may have removed it.
            }
          }
        }
        return true;
      } catch {
        try {
          fs.rmSync(tmp, {force: true});
        } catch {
          // Nothing to tidy.
        }
        return false;
      }
    },
  };
}
