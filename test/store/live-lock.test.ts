/**
 * A paused lock holder (SIGSTOP, a slow disk, a suspended laptop) keeps its lock:
 * a lock held by a live process on this host is never stale, and a writer checks
 * that it still holds the lock and that the file is the one it read before the rename.
 */
import {afterAll, beforeAll, describe, expect, it} from 'vitest';
import {spawn, type ChildProcess} from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import {openPresetStore} from '../../src/store/presets.js';
import {bundleStore, WORKER} from './bundle.js';
import {jointPreset, tempDir} from './helpers.js';

let bundle: {file: string; cleanup: () => void};
beforeAll(async () => {
  bundle = await bundleStore();
});
afterAll(() => bundle?.cleanup());

const savedNames = (dir: string) => openPresetStore(dir).list().filter(p => p.source === 'saved').map(p => p.name).sort();

function start(dir: string, name: string): {child: ChildProcess; stopped: Promise<void>; done: Promise<{code: number | null; err: string}>} {
  const child = spawn(process.execPath, [WORKER, bundle.file, dir, 'stop-in-write', name], {stdio: ['ignore', 'pipe', 'pipe']});
  let out = '';
  let err = '';
  child.stderr!.on('data', d => (err += d));
  const stopped = new Promise<void>((resolve, reject) => {
    const t = setTimeout(() => reject(new Error('worker did not stop')), 30_000);
    child.stdout!.on('data', d => {
      out += d;
      if (out.includes('stopping')) {
        clearTimeout(t);
        resolve();
      }
    });
  });
  const done = new Promise<{code: number | null; err: string}>(resolve => child.on('close', code => resolve({code, err})));
  return {child, stopped, done};
}

/** Wait until the child is really stopped (state T in /proc), so the test does not race its SIGSTOP. */
async function whenStopped(pid: number): Promise<void> {
  for (let i = 0; i < 200; i++) {
    try {
      const stat = fs.readFileSync(`/proc/${pid}/stat`, 'utf8');
      if (/\) T /.test(stat)) return;
    } catch {
      return; // no /proc: the 'stopping' line is close enough
    }
    await new Promise(r => setTimeout(r, 10));
  }
}

describe('a stopped lock holder', () => {
  it('keeps its lock past the stale age: another writer waits and fails with "busy", nothing is overwritten', async () => {
    const dir = tempDir('live-lock');
    openPresetStore(dir).save(jointPreset('a'));
    const a = start(dir, 'paused');
    await a.stopped;
    await whenStopped(a.child.pid!);
    // The stale age here is 200 ms; the holder stays stopped for longer than that.
    const b = openPresetStore(dir, {staleLockMs: 200, lockTimeoutMs: 800});
    expect(() => b.save(jointPreset('intruder'))).toThrow(/preset store busy: .*presets\.json\.lock is held by process \d+/);
    a.child.kill('SIGCONT');
    const r = await a.done;
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    openPresetStore(dir).save(jointPreset('intruder'));
    expect(savedNames(dir)).toEqual(['a', 'intruder', 'paused']);
  }, 40_000);

  it('a writer whose lock was broken while it was stopped does not overwrite the other save: it re-reads and keeps both', async () => {
    const dir = tempDir('live-lock');
    openPresetStore(dir).save(jointPreset('a'));
    const a = start(dir, 'paused');
    await a.stopped;
    await whenStopped(a.child.pid!);
    // Someone (another host, a person) removes the lock and saves meanwhile.
    fs.rmSync(path.join(dir, 'presets.json.lock'));
    openPresetStore(dir).save(jointPreset('intruder'));
    a.child.kill('SIGCONT');
    const r = await a.done;
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    expect(savedNames(dir)).toEqual(['a', 'intruder', 'paused']);
  }, 40_000);
});
