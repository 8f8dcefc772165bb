// Every command through the real entry point in a child process, with random and
// hostile arguments. Invariants: exit code 0, 2 or 3 (never 1, never a signal or a
// hang); with --json and exit 0 or 3, stdout is valid JSON; stderr holds no stack
// trace and no raw control character (newline aside). Shared by `npm run fuzz`
// (full size) and test/cli/cli-fuzz.test.ts (a few runs in CI).
import {spawn} from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

const ESC = '\u001b';
/** Values an option may get: ordinary, odd, hostile. */
const VALUES = [
  'M10', 'M10x1.25', '1/4-20 UNC', '1/4-1e308 UNC', 'Tr20x4', 'M10\u001b[31mPASS', '8.8', '10.9', 'S355', 'EN-GJL-250', 'nope',
  '15', '15mm', '0.6in', '15/2', '1 1/2', '-5', '0', '0x2', '0b10', '1e308', 'NaN', 'Infinity', '', ' ', '40Nm', '30ft-lbf', '0.1..0.14',
  '0.2..0.1', 'si', 'us', 'text', 'json', 'markdown', '1', '2', '9', '1.6', `${ESC}]0;title\u0007`, 'a\u202eb', 'x'.repeat(5000),
  'demo-pump-casing-stud', 'demo-lifting-table-screw', '../../etc/passwd', '/dev/zero', '--', '-', '\u009b31m',
];
/** Options seen across the commands (some belong to none: those must be refused cleanly). */
const OPTIONS = [
  '--thread', '--bolt', '--parent', '--engage', '--torque', '--preload', '--mu-thread', '--mu-head', '--scatter', '--units', '--format',
  '--preset', '--nut', '--nut-class', '--service-load', '--stripped', '--starts', '--load', '--nut-wear', '--nut-length', '--kind',
  '--search', '--from', '--asset', '--location', '--work-order', '--note', '--solid-table', '--depth-available', '--wall', '--bogus',
];
const FLAGS = ['--json', '--json=x', '--overwrite', '--force', '--yes', '--picks', '--help', '-h', '--ascii'];
const COMMANDS = [
  ['check'], ['repair'], ['screw'], ['threads'], ['materials'], ['materials', 'mine'], ['materials', 'add'], ['inserts', 'list'],
  ['inserts', 'show'], ['inserts', 'import'], ['presets', 'list'], ['presets', 'show'], ['presets', 'save'], ['presets', 'import'],
  ['presets', 'export', '-'], ['presets', 'rename'], ['presets', 'delete'], ['settings'], ['settings', 'set', 'units'], ['bogus'], [],
  ['--version'], ['help'],
];

/** A small seeded generator (mulberry32). */
export function rng(seed) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export function randomArgs(r) {
  const pick = a => a[Math.floor(r() * a.length)];
  const args = [...pick(COMMANDS)];
  const n = Math.floor(r() * 6);
  for (let i = 0; i < n; i++) {
    const k = r();
    if (k < 0.55) args.push(pick(OPTIONS), pick(VALUES));
    else if (k < 0.75) args.push(pick(FLAGS));
    else args.push(pick(VALUES));
  }
  // A useful core often enough that commands compute, not only refuse.
  if (args[0] === 'check' || args[0] === 'repair') if (r() < 0.6) args.push('--thread', 'M10', '--parent', 'S355', '--engage', pick(['15', '12mm', '0.5in']));
  return args;
}

const STACK = /\n\s+at .+:\d+:\d+\)?/;
const RAW_CONTROL = /[\u0000-\u0009\u000b-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/;

/** One run of `entry` (a .mjs or bin) with `args`; resolves with what broke, or undefined. */
export function runOnce(entry, args, env, timeoutMs = 20_000) {
  return new Promise(resolve => {
    const child = spawn(process.execPath, [entry, ...args], {env, stdio: ['ignore', 'pipe', 'pipe']});
    let out = '';
    let err = '';
    child.stdout.on('data', d => (out += d));
    child.stderr.on('data', d => (err += d));
    const timer = setTimeout(() => child.kill('SIGKILL'), timeoutMs);
    child.on('close', (code, signal) => {
      clearTimeout(timer);
      const broke = [];
      if (signal) broke.push(`killed by ${signal}${signal === 'SIGKILL' ? ' (hang or time limit)' : ''}`);
      else if (![0, 2, 3].includes(code)) broke.push(`exit ${code}`);
      if (STACK.test(err)) broke.push('stack trace on stderr');
      if (RAW_CONTROL.test(err)) broke.push(`raw control character on stderr: ${JSON.stringify(err.slice(0, 300))}`);
      const json = args.includes('--json') && !args.includes('--help') && !args.includes('-h');
      if (json && (code === 0 || code === 3) && !(args[0] === 'presets' && args[1] === 'export')) {
        try {
          JSON.parse(out);
        } catch {
          broke.push(`stdout is not JSON: ${JSON.stringify(out.slice(0, 200))}`);
        }
      }
      resolve({code: signal ? -1 : code, broke: broke.length ? broke.join('; ') : undefined});
    });
  });
}

/** A config folder with a few presets, a material and a table, as a user would have. */
export function seedConfig(entry, dir, env) {
  const cfg = {...env, TAPWRIGHT_CONFIG_DIR: dir};
  return runOnce(entry, ['presets', 'save', 'fuzz-a', '--thread', 'M10', '--parent', 'S355', '--engage', '15', '--asset', 'FZ-1 (test data)'], cfg);
}

/**
 * `runs` random commands, `parallel` at a time. Returns the counts by exit code and
 * the failures (each with its arguments); never throws for a broken invariant.
 */
export async function fuzzCli({entry, runs, seed, parallel = 2}) {
  const r = rng(seed);
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'tapwright-cli-fuzz-'));
  fs.chmodSync(dir, 0o700);
  const env = {PATH: process.env.PATH ?? '', HOME: dir, TAPWRIGHT_CONFIG_DIR: path.join(dir, 'cfg'), TAPWRIGHT_CODE_CACHE: 'off', NO_COLOR: '1', LANG: 'C.UTF-8'};
  const byCode = {};
  const failures = [];
  try {
    await seedConfig(entry, env.TAPWRIGHT_CONFIG_DIR, env);
    const all = Array.from({length: runs}, () => randomArgs(r));
    let next = 0;
    const lane = async () => {
      while (next < all.length) {
        const args = all[next++];
        const res = await runOnce(entry, args, {...env});
        byCode[res.code] = (byCode[res.code] ?? 0) + 1;
        if (res.broke) failures.push({args, broke: res.broke});
      }
    };
    await Promise.all(Array.from({length: parallel}, lane));
  } finally {
    fs.rmSync(dir, {recursive: true, force: true});
  }
  return {runs, byCode, failures};
}
