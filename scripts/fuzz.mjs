// Fuzz `tapwright check` over its whole option space with fast-check:
// no crash, no NaN or Infinity in any output, every rejection names its option.
// `npm run fuzz` runs 100,000 generated joints; `--runs N` and `--seed S` change that.
// The generator and the invariant live in test/core/joint/fuzz-space.ts (the CI test runs 1,000).
import {build} from 'esbuild';
import {mkdirSync, rmSync} from 'node:fs';
import {fileURLToPath, pathToFileURL} from 'node:url';
import path from 'node:path';

const root = path.dirname(path.dirname(fileURLToPath(import.meta.url)));
const arg = name => {
  const i = process.argv.indexOf(name);
  return i > 0 ? process.argv[i + 1] : undefined;
};
const runs = Number(arg('--runs') ?? 100000);
const seed = arg('--seed') !== undefined ? Number(arg('--seed')) : Date.now() % 2147483647;
if (!Number.isInteger(runs) || runs < 1) {
  console.error('fuzz: --runs takes a whole number of 1 or more');
  process.exit(2);
}
if (!Number.isInteger(seed)) {
  console.error('fuzz: --seed takes a whole number');
  process.exit(2);
}

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
} catch (e) {
  console.error(`fuzz: FAILED (seed ${seed}, re-run with --seed ${seed})\n${e instanceof Error ? e.message : String(e)}`);
  process.exitCode = 1;
} finally {
  rmSync(outDir, {recursive: true, force: true});
}
