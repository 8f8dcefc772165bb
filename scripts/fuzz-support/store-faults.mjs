// The store under faults, with real processes: concurrent writers, kill -9 inside the
// lock and at random moments, a lock holder stopped (SIGSTOP) past the stale age, and
// damaged files of every kind in place of presets.json, settings.json, a draft and the
// lock. Shared by `npm run fuzz` (size "full") and test/store/fault-suite.test.ts ("small").
import {execFileSync, spawn} from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import {pathToFileURL} from 'node:url';
import {root} from './bundle-entry.mjs';
import {runOnce} from './cli-fuzz.mjs';

const WORKER = path.join(root, 'test/fixtures/store/worker.mjs');
export const SIZES = {
  small: {writers: 3, savesEach: 2, lockKills: 1, randomKills: 2, stops: 1},
  full: {writers: 100, savesEach: 3, lockKills: 50, randomKills: 200, stops: 5},
};

function worker(storeBundle, args, env = {}) {
  const child = spawn(process.execPath, [WORKER, storeBundle, ...args], {stdio: ['ignore', 'pipe', 'pipe'], env: {...process.env, ...env}});
  let out = '';
  let err = '';
  child.stdout.on('data', d => (out += d));
  child.stderr.on('data', d => (err += d));
  const done = new Promise(resolve => child.on('close', (code, signal) => resolve({code, signal, out, err})));
  const saw = text =>
    new Promise((resolve, reject) => {
      const t = setTimeout(() => reject(new Error(`worker did not print "${text}"`)), 60_000);
      const check = () => {
        if (out.includes(text)) {
          clearTimeout(t);
          resolve();
        }
      };
      child.stdout.on('data', check);
      check();
    });
  return {child, done, saw};
}

const sleep = ms => new Promise(r => setTimeout(r, ms));
const temp = label => fs.mkdtempSync(path.join(os.tmpdir(), `tapwright-faults-${label}-`));

export async function storeFaults({storeBundle, entry, size = 'small', seed = 1}) {
  const n = SIZES[size];
  const store = await import(pathToFileURL(storeBundle).href);
  const failures = [];
  const counts = {writers: 0, saves: 0, lockKills: 0, randomKills: 0, stops: 0, damagedFiles: 0, cliRuns: 0};
  let s = seed >>> 0;
  const rand = () => ((s = (Math.imul(s, 1103515245) + 12345) >>> 0) / 4294967296);
  const names = dir => store.openPresetStore(dir).list().filter(p => p.source === 'saved').map(p => p.name);
  const dirs = [];
  const dir = label => {
    const d = temp(label);
    dirs.push(d);
    return d;
  };
  try {
    // Concurrent writers: every save kept.
    {
      const d = dir('writers');
      const startAt = Date.now() + 1500;
      // 100 writers queue on one lock: on a loaded 2-core machine the last waits a minute or more;
      // a writer that gives up says "busy" (nothing lost), but the suite wants every save kept.
      const wait = {TAPWRIGHT_WORKER_LOCK_TIMEOUT_MS: String(Math.max(15_000, n.writers * n.savesEach * 1000))};
      const runs = Array.from({length: n.writers}, (_, i) => worker(storeBundle, [d, 'save', `w${i}`, String(startAt), String(n.savesEach)], wait));
      const res = await Promise.all(runs.map(w => w.done));
      res.forEach((r, i) => r.code !== 0 && failures.push(`writer ${i}: exit ${r.code}: ${r.err.slice(0, 200)}`));
      const kept = names(d).length;
      counts.writers = n.writers;
      counts.saves = n.writers * n.savesEach;
      if (kept !== counts.saves) failures.push(`concurrent writers: ${kept} of ${counts.saves} presets kept`);
    }
    // kill -9 while holding the lock (at the rename): the store stays readable, the next save works.
    {
      const d = dir('lock-kill');
      store.openPresetStore(d).save({name: 'base', kind: 'joint', joint: {thread: 'M10', engagement: 12}});
      for (let i = 0; i < n.lockKills; i++) {
        const w = worker(storeBundle, [d, 'hang-rename', `k${i}`]);
        await w.saw('hanging');
        w.child.kill('SIGKILL');
        await w.done;
        try {
          store.openPresetStore(d, {lockTimeoutMs: 15_000}).save({name: `after${i}`, kind: 'joint', joint: {thread: 'M10', engagement: 12}});
        } catch (e) {
          failures.push(`save after kill -9 in the lock: ${e.message}`);
        }
        counts.lockKills++;
      }
      const kept = names(d);
      if (!kept.includes('base') || kept.filter(x => x.startsWith('after')).length !== n.lockKills) failures.push(`kill -9 in the lock: kept ${kept.join(', ')}`);
    }
    // kill -9 at random moments of a writer saving in a loop.
    {
      const d = dir('random-kill');
      for (let i = 0; i < n.randomKills; i++) {
        const w = worker(storeBundle, [d, 'loop', `r${i}`]);
        await w.saw('looping');
        await sleep(Math.floor(rand() * 60));
        w.child.kill('SIGKILL');
        await w.done;
        const st = store.openPresetStore(d);
        if (st.warnings().some(m => /moved aside|cannot read/.test(m))) failures.push(`random kill ${i}: ${st.warnings().join('; ')}`);
        counts.randomKills++;
      }
    }
    // A lock holder stopped past the stale age keeps its lock; nothing is overwritten.
    {
      const d = dir('stopped');
      for (let i = 0; i < n.stops; i++) {
        const a = worker(storeBundle, [d, 'stop-in-write', `paused${i}`]);
        await a.saw('stopping');
        await sleep(300);
        const b = worker(storeBundle, [d, 'save', `intruder${i}`, '0', '1'], {TAPWRIGHT_LOCK_STALE_MS: '200'});
        await sleep(1200); // b waits: the lock's holder is alive, however old its lock
        a.child.kill('SIGCONT');
        const [ra, rb] = await Promise.all([a.done, b.done]);
        if (ra.code !== 0 || rb.code !== 0) failures.push(`stopped holder ${i}: exits ${ra.code}/${rb.code} ${ra.err}${rb.err}`.slice(0, 300));
        const kept = names(d);
        if (!kept.includes(`paused${i}`) || !kept.includes(`intruder${i}-0`)) failures.push(`stopped holder ${i}: kept ${kept.join(', ')}`);
        counts.stops++;
      }
    }
    // Damaged files of every kind: never a hang, a crash or a stack trace.
    {
      const kinds = {
        'presets.json truncated': d => fs.writeFileSync(path.join(d, 'presets.json'), '{"schemaVersion": 2, "presets": [{"name": "a", "ki'),
        'presets.json garbage': d => fs.writeFileSync(path.join(d, 'presets.json'), Buffer.from([0xff, 0xfe, 0, 1, 2, 0x1b, 0x5b])),
        'presets.json empty': d => fs.writeFileSync(path.join(d, 'presets.json'), ''),
        'presets.json FIFO': d => execFileSync('mkfifo', [path.join(d, 'presets.json')]),
        'presets.json link': d => fs.symlinkSync('/etc/hostname', path.join(d, 'presets.json')),
        'presets.json folder': d => fs.mkdirSync(path.join(d, 'presets.json')),
        'presets.json over the read limit': d => {
          fs.writeFileSync(path.join(d, 'presets.json'), '');
          fs.truncateSync(path.join(d, 'presets.json'), 64 * 1024 * 1024 + 1);
        },
        'presets.json.lock folder': d => fs.mkdirSync(path.join(d, 'presets.json.lock')),
        'settings.json FIFO': d => execFileSync('mkfifo', [path.join(d, 'settings.json')]),
        'settings.json link': d => fs.symlinkSync('/etc/hostname', path.join(d, 'settings.json')),
        'settings.json garbage': d => fs.writeFileSync(path.join(d, 'settings.json'), '{"units": '),
        'draft FIFO': d => execFileSync('mkfifo', [path.join(d, 'draft.json')]),
      };
      const commands = size === 'full'
        ? [['presets', 'list'], ['presets', 'save', 'x', '--thread', 'M10', '--engage', '12'], ['settings'], ['settings', 'set', 'units', 'us'], ['check', '--preset', 'demo-pump-casing-stud'], ['materials', 'mine']]
        : undefined;
      for (const [kind, make] of Object.entries(kinds)) {
        // Small: one command per kind, the one that reads that file.
        const small = kind.startsWith('settings') ? [['settings', 'set', 'units', 'us']] : kind.startsWith('draft') ? [['presets', 'list']] : [['presets', 'save', 'x', '--thread', 'M10', '--engage', '12']];
        for (const args of commands ?? small) {
          const d = dir('damaged');
          make(d);
          const env = {PATH: process.env.PATH ?? '', HOME: d, TAPWRIGHT_CONFIG_DIR: d, TAPWRIGHT_CODE_CACHE: 'off', NO_COLOR: '1'};
          const r = await runOnce(entry, args, env, 30_000);
          counts.cliRuns++;
          if (r.broke || ![0, 2].includes(r.code)) failures.push(`${kind}: tapwright ${args.join(' ')}: ${r.broke ?? `exit ${r.code}`}`);
        }
        counts.damagedFiles++;
      }
    }
  } finally {
    for (const d of dirs) fs.rmSync(d, {recursive: true, force: true});
  }
  return {counts, failures};
}
