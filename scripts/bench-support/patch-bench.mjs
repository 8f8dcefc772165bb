// npm run bench -- --patches: what each build patch to a third-party package saves.
// The one-file app is built with every patch on (A) and once with each patch off in
// turn (B: TAPWRIGHT_BUILD_SKIP_PATCH=name). Then, in rounds, every patch gets one
// A/B pair of starts in a pseudo-terminal at 80x24 (the order inside a pair alternates
// from round to round), and in the first rounds one more pair that types a few values
// before its memory is read. The figures are the medians
// over rounds of the paired differences B - A (what switching the patch off costs,
// which is what it saves), so a load burst from other work on the machine hits both
// halves of a pair; the spread is the lowest and highest paired difference.
//   main-thread CPU to the first full frame (Linux schedstat: less hit by other work
//   than the wall time), wall time to the first full frame, peak resident memory
//   after typing, and the size of the one-file build.
import {execFileSync, spawn} from 'node:child_process';
import {mkdtempSync, rmSync, statSync, readFileSync} from 'node:fs';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {PATCHES} from '../build-support/start-up-plugin.mjs';

const median = xs => {
  const s = [...xs].sort((a, b) => a - b);
  if (!s.length) return NaN;
  const m = (s.length - 1) / 2;
  return (s[Math.floor(m)] + s[Math.ceil(m)]) / 2;
};

const RIGHT = '\u001B[C';
const ESC = '\u001B';
/** Go to the Engagement step and type a few values (Esc between them). */
function typingSteps(values) {
  const steps = [{send: RIGHT}, {send: RIGHT}];
  for (const v of values) {
    for (const ch of v) steps.push({send: ch});
    steps.push({send: ESC});
  }
  return steps;
}

export async function benchPatches({root, runs, memRuns, only, values = ['12.5', '16']}) {
  const work = mkdtempSync(path.join(tmpdir(), 'tw-bench-patches-'));
  const drive = (file, steps, label, wait = 0) =>
    new Promise((resolve, reject) => {
      const cfg = {
        argv: [process.execPath, file],
        env: {TAPWRIGHT_CONFIG_DIR: path.join(work, `cfg-${label}`), TAPWRIGHT_CACHE_DIR: path.join(work, 'code-cache'), LANG: 'C.UTF-8', TERM: 'xterm-256color'},
        unset: ['CI', 'CONTINUOUS_INTEGRATION', 'NO_COLOR', 'FORCE_COLOR'],
        cols: 80,
        rows: 24,
        ready: 'quit',
        steps: wait ? [{wait}] : steps,
        gap: 0.05,
      };
      const p = spawn('python3', [path.join(root, 'scripts/bench-support/pty-drive.py'), JSON.stringify(cfg)]);
      let out = '';
      let err = '';
      p.stdout.on('data', d => (out += d));
      p.stderr.on('data', d => (err += d));
      p.on('close', code => {
        if (code !== 0) return reject(new Error(`pty driver failed: ${err}`));
        const r = JSON.parse(out);
        if (!r.firstFrame) return reject(new Error(`no first frame from ${file} (${label})`));
        resolve(r);
      });
    });

  try {
    const t0 = Date.now();
    for (const n of only ?? []) if (!(n in PATCHES)) throw new Error(`bench: unknown patch "${n}"; known: ${Object.keys(PATCHES).join(', ')}`);
    const names = only?.length ? only : Object.keys(PATCHES);
    const builds = {};
    for (const name of ['all', ...names]) {
      const dir = path.join(work, name);
      execFileSync(process.execPath, [path.join(root, 'scripts/build.mjs'), '--one-file', '--out', dir], {stdio: 'inherit', env: {...process.env, TAPWRIGHT_BUILD_SKIP_PATCH: name === 'all' ? '' : name}});
      builds[name] = path.join(dir, 'tapwright.mjs');
    }
    const size = name => statSync(builds[name]).size;
    const baseText = readFileSync(builds.all, 'utf8');
    const same = new Set(names.filter(n => readFileSync(builds[n], 'utf8') === baseText));
    const measured = names.filter(n => !same.has(n));
    console.log(`Built ${names.length + 1} variants of the one-file app (${((Date.now() - t0) / 1000).toFixed(0)} s).`);

    // The first start of each build compiles the workbench and writes its V8 code cache;
    // measured starts all use one, as a user's second start does.
    const warm = ['all', ...measured];
    for (let i = 0; i < warm.length; i += 3) await Promise.all(warm.slice(i, i + 3).map(n => drive(builds[n], [], `warm-${n}`, 2.5)));

    // Start-up: pairs of plain starts (first frame, then Ctrl-C). Memory: fewer pairs
    // that type a few values first (resident memory varies far less than time).
    const steps = typingSteps(values);
    const samples = Object.fromEntries(measured.map(n => [n, {start: [], mem: []}]));
    const m = x => ({cpu: x.firstFrameCpuMain * 1000, wall: x.firstFrame * 1000, hwm: (x.mem.VmHWM ?? NaN) / 2 ** 20});
    async function pair(n, round, kind) {
      const order = round % 2 === 0 ? ['all', n] : [n, 'all'];
      const r = {};
      for (const which of order) r[which] = m(await drive(builds[which], kind === 'mem' ? steps : [], `${which}-${kind}-${round}`));
      samples[n][kind].push({cpu: r[n].cpu - r.all.cpu, wall: r[n].wall - r.all.wall, hwm: r[n].hwm - r.all.hwm, a: r.all, b: r[n]});
    }
    console.log(`Measuring ${measured.length} patches: ${runs} A/B pairs of starts and ${memRuns} A/B pairs typing ${steps.length} keys each...`);
    for (let round = 0; round < Math.max(runs, memRuns); round++) {
      for (const n of measured) {
        if (round < runs) await pair(n, round, 'start');
        if (round < memRuns) await pair(n, round, 'mem');
      }
      process.stdout.write(`  round ${round + 1}/${Math.max(runs, memRuns)} (${((Date.now() - t0) / 1000).toFixed(0)} s)\n`);
    }

    const rows = [];
    const fmt = (xs, unit, digits) => {
      const f = x => (x >= 0 ? '+' : '') + x.toFixed(digits);
      return `${f(median(xs))} ${unit} [${f(Math.min(...xs))}..${f(Math.max(...xs))}]`;
    };
    const starts = measured.flatMap(n => samples[n].start.map(s => s.a));
    const typed = measured.flatMap(n => samples[n].mem.map(s => s.a));
    console.log(
      `\nWith every patch on: main-thread CPU to the first frame ${median(starts.map(a => a.cpu)).toFixed(1)} ms, wall ${median(starts.map(a => a.wall)).toFixed(1)} ms ` +
        `(medians of ${starts.length} starts); peak RSS after typing ${median(typed.map(a => a.hwm)).toFixed(1)} MB; one-file build ${size('all')} B.`,
    );
    console.log('What each patch saves = patch off minus all on: median of the paired differences [lowest..highest].');
    console.log('A patch pays when it saves at least 20 ms of main-thread CPU or 5 MB; the wall time is shown but on a shared machine it is too noisy to decide on.\n');
    for (const n of names) {
      if (same.has(n)) {
        rows.push([n, 'no change to the built file: saves nothing', '', '', '', 'drop']);
        continue;
      }
      const {start, mem} = samples[n];
      const cpu = median(start.map(x => x.cpu));
      const mb = median(mem.map(x => x.hwm));
      const d = size(n) - size('all');
      // Other work on the machine only ever adds time, so the fastest starts are a second,
      // less disturbed view: fastest with the patch off minus fastest with all on.
      const fastest = Math.min(...start.map(x => x.b.cpu)) - Math.min(...start.map(x => x.a.cpu));
      rows.push([n, `${fmt(start.map(x => x.cpu), 'ms', 1)}, fastest ${fastest >= 0 ? '+' : ''}${fastest.toFixed(1)}`, fmt(start.map(x => x.wall), 'ms', 0), fmt(mem.map(x => x.hwm), 'MB', 1), `${d >= 0 ? '+' : ''}${d} B`, cpu >= 20 || mb >= 5 ? 'pays' : 'under 20 ms and 5 MB']);
    }
    const head = ['patch off', 'CPU to first frame', 'wall to first frame', 'peak RSS after typing', 'file size', 'verdict'];
    const table = [head, ...rows];
    const w = head.map((_, i) => Math.max(...table.map(r => (r[i] ?? '').length)));
    for (const r of table) console.log(r.map((c, i) => (c ?? '').padEnd(w[i])).join('  ').trimEnd());
    console.log(`\nTotal ${((Date.now() - t0) / 1000).toFixed(0)} s. The await removal in cjs-plugin.mjs is not switchable: the CommonJS workbench cannot be built without it.`);
  } finally {
    rmSync(work, {recursive: true, force: true});
  }
}
