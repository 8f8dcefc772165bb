// npm run bench: the workbench's speed and size figures, measured on this machine.
//   cold start to the first full frame, as a ratio to bare `node -e ''` timed in the same run
//   keystroke to updated frame (median and p95), also as a ratio to bare node
//   bytes written to the terminal per digit typed at 80x24 (cell-diff writer, and full redraws)
//   resident memory of the running workbench
// The app is the one-file build (dist/tapwright.mjs), built into a temporary folder, and the
// split build through bin/tapwright.js when dist/ exists. It runs in a real pseudo-terminal
// (Python's pty module; node-pty is not a dependency).
import {execFileSync, spawnSync} from 'node:child_process';
import {mkdtempSync, rmSync, existsSync} from 'node:fs';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {fileURLToPath} from 'node:url';
import {StringDecoder} from 'node:string_decoder';
import {VirtualTerminal, changedCharacterBytes} from './bench-support/screen-model.mjs';

const root = path.dirname(path.dirname(fileURLToPath(import.meta.url)));
// npm run bench -- --patches [name,name]: what each build patch saves (bench-support/patch-bench.mjs).
const patchesAt = process.argv.indexOf('--patches');
if (patchesAt > 0) {
  const {benchPatches} = await import('./bench-support/patch-bench.mjs');
  const only = process.argv[patchesAt + 1]?.split(',').filter(Boolean);
  await benchPatches({root, runs: Number(process.env.BENCH_RUNS) || 7, memRuns: Number(process.env.BENCH_MEM_RUNS) || 3, only});
  process.exit(0);
}
const work = mkdtempSync(path.join(tmpdir(), 'tw-bench-'));
// Start-up times on a shared 2-core machine vary by a third from run to run: medians of 9.
const RUNS = Number(process.env.BENCH_RUNS) || 9;
const TARGET = {start: 3, keyMs: 16, bytes: 300, rssMb: 90};

const median = xs => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length ? s[Math.floor((s.length - 1) / 2)] : NaN;
};
const pct = (xs, p) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.ceil((p / 100) * s.length) - 1)];
};
const ms = s => `${(s * 1000).toFixed(1)} ms`;

if (spawnSync('python3', ['-c', 'import pty']).status !== 0) {
  console.error('bench: python3 with the pty module is needed to drive a pseudo-terminal; not found.');
  process.exit(2);
}

console.log('Building the one-file app into a temporary folder...');
execFileSync(process.execPath, [path.join(root, 'scripts/build.mjs'), '--out', path.join(work, 'dist')], {stdio: 'inherit'});
const oneFile = path.join(work, 'dist', 'tapwright.mjs');

// Bare node is timed between the app's starts too (bareSamples), so that both see
// the same state of the machine.
const bareSamples = [];
function bareOnce() {
  const s = process.hrtime.bigint();
  spawnSync(process.execPath, ['-e', '']);
  bareSamples.push(Number(process.hrtime.bigint() - s) / 1e9);
}
function bareNode() {
  for (let i = 0; i < RUNS; i++) bareOnce();
  return median(bareSamples);
}

const RIGHT = '\u001B[C';
const ESC = '\u001B';
/** Go to the Engagement step, then type values digit by digit (Esc between values). */
function typingSteps(rounds) {
  const steps = [{send: RIGHT}, {send: RIGHT}];
  const values = ['12.5', '16', '20.5', '9.5', '14'];
  for (let r = 0; r < rounds; r++) {
    [...values[r % values.length]].forEach((ch, i) => steps.push({send: ch, digit: /\d/.test(ch), first: i === 0}));
    steps.push({send: ESC});
  }
  return steps;
}

function drive(argv, extraEnv, steps, label, raw = false) {
  const cfg = {
    argv,
    env: {TAPWRIGHT_CONFIG_DIR: path.join(work, `cfg-${label}`), TAPWRIGHT_CACHE_DIR: path.join(work, 'code-cache'), LANG: 'C.UTF-8', TERM: 'xterm-256color', ...extraEnv},
    unset: ['CI', 'CONTINUOUS_INTEGRATION', 'NO_COLOR', 'FORCE_COLOR'],
    cols: 80,
    rows: 24,
    ready: 'quit',
    steps,
    gap: 0.12,
    raw,
  };
  const r = spawnSync('python3', [path.join(root, 'scripts/bench-support/pty-drive.py'), JSON.stringify(cfg)], {encoding: 'utf8', maxBuffer: 1 << 24});
  if (r.status !== 0) throw new Error(`pty driver failed: ${r.stderr}`);
  return JSON.parse(r.stdout);
}

let bare = bareNode();
console.log(`\nbare node -e '' (median of ${RUNS} before the app runs; ratios use the median of all bare runs, taken between the app's starts too): ${ms(bare)}`);

const report = [];
const apps = [['one-file build', [process.execPath, oneFile]]];
if (existsSync(path.join(root, 'dist', 'lib', 'entry.js'))) apps.push(['bin/tapwright.js (split build in dist/)', [process.execPath, path.join(root, 'bin', 'tapwright.js')]]);

// The first start after a build compiles the workbench and writes its V8 code cache
// (src/cli/code-cache.ts, two seconds after the start); every later start uses it.
{
  const first = drive([process.execPath, oneFile], {}, [{wait: 2.5}], 'first');
  report.push({label: 'first start after a build (no code cache yet), one-file build', value: `${ms(first.firstFrame)} = ${(first.firstFrame / bare).toFixed(2)}x bare node`, ok: true, target: '(reference)'});
}

for (const [label, argv] of apps) {
  const starts = [];
  const cpu = [];
  for (let i = 0; i < RUNS; i++) {
    bareOnce();
    const r = drive(argv, {}, [], `start${i}`);
    if (r.firstFrame) starts.push(r.firstFrame);
    if (r.firstFrameCpuMain) cpu.push(r.firstFrameCpuMain);
  }
  const start = median(starts);
  bare = median(bareSamples);
  report.push({label: `cold start to first full frame (new process, code cache kept), ${label}`, value: `${ms(start)} = ${(start / bare).toFixed(2)}x bare node (fastest ${ms(Math.min(...starts))}; main-thread CPU ${ms(median(cpu))})`, ok: start / bare <= TARGET.start, target: `<= ${TARGET.start}x`});
}

const typed = drive([process.execPath, oneFile], {}, typingSteps(8), 'typing', true);
// Replay what the workbench wrote on a terminal model: for each key, the characters
// that differ on screen before and after it are the least any writer could send.
{
  const term = new VirtualTerminal(80, 24);
  const text = new StringDecoder('utf8');
  term.write(text.write(Buffer.from(typed.start, 'base64')));
  for (const s of typed.steps) {
    const before = term.snapshot();
    term.write(text.write(Buffer.from(s.data, 'base64')));
    s.least = changedCharacterBytes(before, term.snapshot());
  }
}
const digits = typed.steps.filter(s => s.digit);
const lat = digits.map(s => s.latency).filter(x => x !== null);
const bytes = digits.map(s => s.bytes);
const keyMed = median(lat);
report.push({label: 'keystroke to updated frame, median', value: `${ms(keyMed)} = ${(keyMed / bare).toFixed(3)}x bare node (p95 ${ms(pct(lat, 95))}, ${lat.length} digits)`, ok: keyMed * 1000 <= TARGET.keyMs, target: `<= ${TARGET.keyMs} ms`});
const bMed = median(bytes);
report.push({label: 'bytes written per digit typed, 80x24', value: `median ${bMed} B, mean ${Math.round(bytes.reduce((a, b) => a + b, 0) / bytes.length)} B, max ${Math.max(...bytes)} B`, ok: bMed <= TARGET.bytes, target: `<= ${TARGET.bytes} B`});
// The first digit of a new value (e.g. the "1" of "12.5") briefly makes a very different joint, so
// most of the readout changes; the digits after it change a few numbers.
const later = typed.steps.filter(s => s.digit && !s.first).map(s => s.bytes);
const first = typed.steps.filter(s => s.digit && s.first).map(s => s.bytes);
report.push({label: '  of which: first digit of a value / later digits', value: `median ${median(first)} B / ${median(later)} B`, ok: true, target: '(breakdown)'});
// The floor: only the changed characters, with no cursor moves, colours, erasing or sync marks.
const least = typed.steps.filter(s => s.digit);
const leastOf = f => median(least.filter(f).map(s => s.least));
report.push({
  label: '  least possible: bytes of the characters that change on screen',
  value: `median ${leastOf(() => true)} B (first digit ${leastOf(s => s.first)} B, later ${leastOf(s => !s.first)} B)`,
  ok: true,
  target: '(floor)',
});
const rss = typed.mem.VmRSS ?? NaN;
const hwm = typed.mem.VmHWM ?? NaN;
report.push({label: 'resident memory after typing', value: `${(rss / 2 ** 20).toFixed(1)} MB (peak ${(hwm / 2 ** 20).toFixed(1)} MB)`, ok: hwm / 2 ** 20 <= TARGET.rssMb, target: `<= ${TARGET.rssMb} MB`});

const lean = drive([process.execPath, '--max-semi-space-size=1', '--max-old-space-size=64', oneFile], {}, typingSteps(8), 'lean');
report.push({label: 'for comparison: memory with node --max-semi-space-size=1 --max-old-space-size=64', value: `${((lean.mem.VmHWM ?? NaN) / 2 ** 20).toFixed(1)} MB peak`, ok: true, target: '(reference)'});

const full = drive([process.execPath, oneFile], {TAPWRIGHT_FULL_REDRAW: '1'}, typingSteps(3), 'full');
const fullBytes = full.steps.filter(s => s.digit).map(s => s.bytes);
report.push({label: 'for comparison: bytes per digit with Ink full redraws', value: `median ${median(fullBytes)} B`, ok: true, target: '(reference)'});

report.unshift({label: `bare node -e '' (median of ${bareSamples.length} runs, between the starts)`, value: ms(median(bareSamples)), ok: true, target: '(reference)'});
console.log('');
const w = Math.max(...report.map(r => r.label.length));
for (const r of report) console.log(`${r.ok ? 'ok  ' : 'OVER'} ${r.label.padEnd(w)}  ${r.value}  [target ${r.target}]`);
console.log(`\nexit code of the workbench after Ctrl-C: ${typed.exitCode} (130 = interrupted, terminal restored)`);
rmSync(work, {recursive: true, force: true});
