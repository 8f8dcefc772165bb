/**
 * File primitives of the store: atomic write (temp file, fsync, rename, fsync
 * of the folder) and an O_EXCL lock file with stale-lock recovery. A lock held
 * by a live process on this host is never stale, however old.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import {StoreError} from './errors.js';
import {readRegularFile} from './plain-file.js';

export {kindOf, readPlain, readRegularFile, type PlainRead} from './plain-file.js';

const sleeper = new Int32Array(new SharedArrayBuffer(4));
/** Block the thread for `ms` milliseconds (the store API is synchronous). */
export function sleepMs(ms: number): void {
  Atomics.wait(sleeper, 0, 0, ms);
}

let tokens = 0;
/**
 * A token no other write or lock of this process or of another process is likely to
 * share: the pid goes beside it, a counter and random digits in it. (Not node:crypto,
 * which would cost every start a few milliseconds to load for a file name.)
 */
export function uniqueToken(): string {
  return `${(tokens++).toString(36)}${Math.random().toString(36).slice(2, 10)}`;
}

export function errCode(e: unknown): string {
  return (e as NodeJS.ErrnoException | undefined)?.code ?? '';
}

/** A one-line description of a file-system error: "EACCES (permission denied)". */
export function describeFsError(e: unknown): string {
  const code = errCode(e);
  const hint: Record<string, string> = {
    EACCES: 'permission denied',
    EPERM: 'not permitted',
    EROFS: 'read-only file system',
    ENOSPC: 'disk full',
    EDQUOT: 'disk quota exceeded',
    ENOENT: 'no such file or folder',
    EISDIR: 'is a folder',
    ENOTDIR: 'a part of the path is not a folder',
  };
  return code ? `${code}${hint[code] ? ` (${hint[code]})` : ''}` : e instanceof Error ? e.message : String(e);
}

export const TMP_MARK = '.tmp-';

/**
 * Write `data` to `file` atomically: readers see the old or the new content,
 * never a mix, even after kill -9 or power loss. Keeps the mode of an existing file.
 * With `exclusive`, fails with EEXIST instead of replacing an existing file.
 */
export function writeFileAtomic(
  file: string,
  data: string,
  opts: {exclusive?: boolean; mode?: number; beforeRename?: () => void} = {},
): void {
  const tmp = `${file}${TMP_MARK}${process.pid}-${uniqueToken()}`;
  let mode = opts.mode ?? 0o666;
  if (opts.mode === undefined) {
    try {
      mode = fs.statSync(file).mode & 0o777;
    } catch {
      /* new file: default mode, masked by the umask */
    }
  }
  const fd = fs.openSync(tmp, 'wx', mode);
  try {
    try {
      fs.writeFileSync(fd, data);
      fs.fsyncSync(fd);
      // The umask may have narrowed the mode asked for; a given mode is set exactly.
      if (opts.mode !== undefined && process.platform !== 'win32') fs.fchmodSync(fd, opts.mode);
    } finally {
      fs.closeSync(fd);
    }
    opts.beforeRename?.();
    if (opts.exclusive) {
      // link() fails with EEXIST when the target exists: no window between check and write.
      try {
        fs.linkSync(tmp, file);
      } catch (e) {
        if (errCode(e) === 'EEXIST') throw e;
        if (fs.existsSync(file)) throw Object.assign(new Error(`${file} exists`), {code: 'EEXIST'});
        fs.renameSync(tmp, file);
      }
    } else {
      fs.renameSync(tmp, file);
    }
  } finally {
    fs.rmSync(tmp, {force: true});
  }
  fsyncDir(path.dirname(file));
}

function fsyncDir(dir: string): void {
  if (process.platform === 'win32') return;
  try {
    const fd = fs.openSync(dir, 'r');
    try {
      fs.fsyncSync(fd);
    } finally {
      fs.closeSync(fd);
    }
  } catch {
    /* best effort: some file systems refuse fsync on a folder */
  }
}

export interface LockOptions {
  /** Give up after this long with "preset store busy" (default 5 s). */
  timeoutMs?: number;
  /**
   * A lock of another host (or one without a pid) older than this is stale (default 10 s,
   * or TAPWRIGHT_LOCK_STALE_MS for tests; a save holds the lock for milliseconds). A lock
   * of a live process on this host is never stale.
   */
  staleMs?: number;
}

/** Thrown inside withLock when the lock is no longer ours (it was broken while we were paused). */
export class LockLostError extends Error {
  constructor(lock: string) {
    super(`${lock} is no longer held by this process`);
    this.name = 'LockLostError';
  }
}

/** The default stale age: 10 s, or TAPWRIGHT_LOCK_STALE_MS (100 ms to 1 h) for tests. */
export function defaultStaleMs(env: Record<string, string | undefined> = process.env): number {
  const v = Number(env.TAPWRIGHT_LOCK_STALE_MS);
  return Number.isInteger(v) && v >= 100 && v <= 3_600_000 ? v : 10_000;
}

interface LockInfo {
  pid?: number;
  host?: string;
  at?: number;
}

function readLock(file: string): {text: string; info: LockInfo; mtimeMs: number} | undefined {
  try {
    const st = fs.lstatSync(file);
    if (!st.isFile()) {
      throw new StoreError(
        `${file} is ${st.isDirectory() ? 'a folder' : 'not a plain file'}; it stands where tapwright keeps its lock file. Remove it when no tapwright is running.`,
      );
    }
    const text = readRegularFile(file, 4096, 'lock file') ?? '';
    const mtimeMs = st.mtimeMs;
    let info: LockInfo = {};
    try {
      const v = JSON.parse(text) as LockInfo;
      if (v && typeof v === 'object') info = v;
    } catch {
      /* empty or torn lock file: judged by its age */
    }
    return {text, info, mtimeMs};
  } catch (e) {
    if (errCode(e) === 'ENOENT') return undefined;
    throw e;
  }
}

function pidAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (e) {
    return errCode(e) === 'EPERM';
  }
}

/**
 * Why a lock is stale, or undefined when its holder may still be working. A process
 * of this host that is alive keeps its lock however long it is paused (SIGSTOP, a
 * slow disk, a suspended laptop); the age rule is for locks of other hosts only.
 */
function staleReason(info: LockInfo, mtimeMs: number, staleMs: number, now: number): string | undefined {
  if (info.host === os.hostname() && typeof info.pid === 'number' && info.pid !== process.pid) {
    return pidAlive(info.pid) ? undefined : `process ${info.pid} is not running`;
  }
  const at = typeof info.at === 'number' ? info.at : mtimeMs;
  if (now - at > staleMs) return `older than ${Math.round(staleMs / 1000)} s`;
  // A lock file without content: its writer died between create and write.
  if (info.pid === undefined && now - mtimeMs > 2000) return 'empty lock file';
  return undefined;
}

/**
 * Remove a stale lock, guarded by a second O_EXCL file so two processes that
 * both judged it stale cannot remove a fresh lock taken in between.
 */
function breakStaleLock(lock: string, staleText: string): void {
  const breaker = `${lock}.break`;
  let fd: number;
  try {
    fd = fs.openSync(breaker, 'wx');
  } catch (e) {
    if (errCode(e) !== 'EEXIST') throw e;
    // A breaker that died mid-way leaves this file; it is only ever held for microseconds.
    try {
      if (Date.now() - fs.statSync(breaker).mtimeMs > 5000) fs.rmSync(breaker, {force: true});
    } catch {
      /* gone already */
    }
    return;
  }
  try {
    const now = readLock(lock);
    if (now && now.text === staleText) fs.rmSync(lock, {force: true});
  } finally {
    fs.closeSync(fd);
    fs.rmSync(breaker, {force: true});
  }
}

/**
 * Run `fn` holding the lock file `lock` (created with O_EXCL). `fn` gets `stillHeld`,
 * which throws LockLostError when the lock is no longer this call's: call it just
 * before the step that makes a change visible (the rename).
 */
export function withLock<T>(lock: string, fn: (stillHeld: () => void) => T, opts: LockOptions = {}): T {
  const timeoutMs = opts.timeoutMs ?? 5000;
  const staleMs = opts.staleMs ?? defaultStaleMs();
  const start = Date.now();
  const token = `${process.pid}-${uniqueToken()}`;
  const content = JSON.stringify({pid: process.pid, host: os.hostname(), at: Date.now(), token});
  let fd: number | undefined;
  for (;;) {
    try {
      fd = fs.openSync(lock, 'wx');
      break;
    } catch (e) {
      if (errCode(e) !== 'EEXIST') throw e;
    }
    const held = readLock(lock);
    if (held) {
      const stale = staleReason(held.info, held.mtimeMs, staleMs, Date.now());
      if (stale) {
        breakStaleLock(lock, held.text);
        continue;
      }
    }
    if (Date.now() - start > timeoutMs) {
      const who = held?.info.pid ? ` by process ${held.info.pid}${held.info.host ? ` on ${held.info.host}` : ''}` : '';
      throw new StoreError(
        `preset store busy: ${lock} is held${who}; try again. If no tapwright is running, delete that lock file.`,
      );
    }
    sleepMs(5 + Math.floor(Math.random() * 11));
  }
  try {
    fs.writeSync(fd, content);
    fs.fsyncSync(fd);
  } catch (e) {
    fs.closeSync(fd);
    fs.rmSync(lock, {force: true}); // disk full or similar: leave no empty lock behind
    throw e;
  }
  fs.closeSync(fd);
  const stillHeld = () => {
    let now: string | undefined;
    try {
      now = readLock(lock)?.text;
    } catch {
      now = undefined;
    }
    if (now !== content) throw new LockLostError(lock);
  };
  try {
    return fn(stillHeld);
  } finally {
    // Remove only our own lock: if it was (wrongly) broken and retaken, leave the other one alone.
    const now = readLock(lock);
    if (now?.text === content) fs.rmSync(lock, {force: true});
  }
}

/**
 * Remove temp files left by a writer that was killed; call only while holding the lock.
 * The temp file of a live process (a writer paused while its lock was broken) is left alone.
 */
export function removeOrphanTemps(file: string): void {
  const dir = path.dirname(file);
  const base = path.basename(file);
  let names: string[];
  try {
    names = fs.readdirSync(dir);
  } catch {
    return;
  }
  for (const n of names) {
    // presets.json.tmp-*, presets.json.bak.tmp-*, presets.json.corrupt-<time>.tmp-*, ...
    if (n.startsWith(`${base}.`) && n.includes(TMP_MARK)) {
      const pid = Number(/\.tmp-(\d+)-/.exec(n)?.[1]);
      if (Number.isInteger(pid) && pid > 0 && pid !== process.pid && pidAlive(pid)) continue;
      fs.rmSync(path.join(dir, n), {force: true});
    }
  }
}

