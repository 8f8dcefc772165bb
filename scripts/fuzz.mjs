// `npm run fuzz`: three suites, each reporting its counts.
//  1. check: `tapwright check` over its whole option space with fast-check, in-process:
//     no crash, no NaN or Infinity in any output, every rejection names its option
//     (100,000 joints; the generator lives in test/core/joint/fuzz-space.ts, CI runs 1,000).
//  2. cli: every command through the CLI entry in child processes with random and hostile
//     arguments (scripts/fuzz-support/cli-fuzz.mjs; 2,000 runs; CI runs a few).
//  3. store: the store fault suite at full size (scripts/fuzz-support/store-faults.mjs:
//     100 concurrent writers, 50 kill -9 inside the lock, 200 at random moments, 5 stopped
//     lock holders, 12 kinds of damaged file through 6 commands; CI runs it small).
// Options: --runs N (check), --cli-runs N, --seed S, --only check|cli|store.
import {build} from 'esbuild';
import {mkdirSync, rmSync} from 'node:fs';
import {fileURLToPath, pathToFileURL} from 'node:url';
import path from 'node:path';
import {bundle} from './fuzz-support/bundle-entry.mjs';
import {fuzzCli} from './fuzz-support/cli-fuzz.mjs';
import {storeFaults} from './fuzz-support/store-faults.mjs';

const root = path.dirname(path.dirname(fileURLToPath(import.meta.url)));
const arg = name => {
  const i = process.argv.indexOf(name);
  return i > 0 ? process.argv[i + 1] : undefined;
};
const runs = Number(arg('--runs') ?? 100000);
const cliRuns = Number(arg('--cli-runs') ?? 2000);
const only = arg('--only');
const seed = arg('--seed') !== undefined ? Number(arg('--seed')) : Date.now() % 2147483647;
if (!Number.isInteger(runs) || runs < 1 || !Number.isInteger(cliRuns) || cliRuns < 1) {
  console.error('fuzz: --runs and --cli-runs take a whole number of 1 or more');
  process.exit(2);
}
if (!Number.isInteger(seed)) {
  console.error('fuzz: --seed takes a whole number');
  process.exit(2);
}
if (only !== undefined && !['check', 'cli', 'store'].includes(only)) {
  console.error('fuzz: --only takes check, cli or store');
  process.exit(2);
}
const wanted = s => only === undefined || only === s;

async function checkSuite() {
  // Bundle the TypeScript generator next to node_modules so its packages resolve.
  const outDir = path.join(root, 'node_modules', '.cache', `tapwright-fuzz-${process.pid}`);
  mkdirSync(outDir, {recursive: true});
  const outfile = path.join(outDir, 'fuzz-space.mjs');
  try {
    await build({
      entryPoints: [path.join(root, 'test/core/joint/fuzz-space.ts')],
      outfile,
      bundle: true,
      platform: 'node',
      format: 'esm',
      target: 'node20',
      packages: 'external',
      logLevel: 'warning',
    });
    const {fuzzCheck} = await import(pathToFileURL(outfile).href);
    const started = Date.now();
    console.log(`fuzz: ${runs} generated joints through tapwright check (seed ${seed}) ...`);
    const r = await fuzzCheck(runs, seed);
    const total = Object.values(r.byCode).reduce((a, b) => a + b, 0);
    console.log(`fuzz: ${total} joints ran in ${((Date.now() - started) / 1000).toFixed(1)} s; by exit code ${JSON.stringify(r.byCode)}; no invariant broken`);
  } finally {
    rmSync(outDir, {recursive: true, force: true});
  }
}

async function cliSuite() {
  const entry = await bundle();
  try {
    const started = Date.now();
    console.log(`fuzz: ${cliRuns} random commands through the CLI entry (seed ${seed}) ...`);
    const r = await fuzzCli({entry: entry.file, runs: cliRuns, seed});
    console.log(`fuzz: ${r.runs} commands ran in ${((Date.now() - started) / 1000).toFixed(1)} s; by exit code ${JSON.stringify(r.byCode)}; ${r.failures.length} broke an invariant`);
    if (r.failures.length) throw new Error(r.failures.slice(0, 10).map(f => `${JSON.stringify(f.args).slice(0, 200)}: ${f.broke}`).join('\n'));
  } finally {
    entry.cleanup();
  }
}

async function storeSuite() {
  const entry = await bundle();
  const store = await bundle('src/store/index.ts', 'store');
  try {
    const started = Date.now();
    console.log('fuzz: store fault suite, full size ...');
    const r = await storeFaults({storeBundle: store.file, entry: entry.file, size: 'full', seed});
    console.log(`fuzz: store faults in ${((Date.now() - started) / 1000).toFixed(1)} s: ${JSON.stringify(r.counts)}; ${r.failures.length} failures`);
    if (r.failures.length) throw new Error(r.failures.slice(0, 10).join('\n'));
  } finally {
    entry.cleanup();
    store.cleanup();
  }
}

try {
  if (wanted('check')) await checkSuite();
  if (wanted('cli')) await cliSuite();
  if (wanted('store')) await storeSuite();
} catch (e) {
  console.error(`fuzz: FAILED (seed ${seed}, re-run with --seed ${seed})\n${e instanceof Error ? e.message : String(e)}`);
  process.exitCode = 1;
}
