// Build:
//   dist/lib          split ESM modules for the commands (a command opens a handful
//                     of files), plus one chunk holding the workbench bundle as text
//   dist/tapwright.mjs one self-contained file for a plant PC without a registry
// The workbench (Ink, React, the screens, the core) is bundled once more as a
// CommonJS body and kept inside both builds as text: src/cli/workbench-loader-cached.ts
// runs it through a V8 code cache (src/cli/code-cache.ts), so a start after the
// first skips most of the parse and compile work. Commands never load it.
import {build} from 'esbuild';
import {createHash} from 'node:crypto';
import {rmSync, chmodSync, writeFileSync} from 'node:fs';
import {spawnSync} from 'node:child_process';
import {tmpdir} from 'node:os';
import {fileURLToPath} from 'node:url';
import path from 'node:path';
import {startUpPlugin, skippedPatches} from './build-support/start-up-plugin.mjs';
import {cjsPlugin} from './build-support/cjs-plugin.mjs';

const root = path.dirname(path.dirname(fileURLToPath(import.meta.url)));
const at = p => path.join(root, p);
// `--out DIR` builds somewhere else (tests build into a temporary folder so they
// never race a running copy of dist/).
const outIndex = process.argv.indexOf('--out');
const outDir = outIndex > 0 ? path.resolve(process.argv[outIndex + 1]) : at('dist');
const out = p => path.join(outDir, p);
// `--one-file` builds only dist/tapwright.mjs (the patch bench builds it a dozen times).
const oneFileOnly = process.argv.includes('--one-file');
// TAPWRIGHT_BUILD_SKIP_PATCH=name[,name] builds without those patches (start-up-plugin.mjs).
try {
  const skip = skippedPatches();
  if (skip.size) console.error(`build: without the patches ${[...skip].join(', ')}`);
} catch (e) {
  console.error(e.message);
  process.exit(2);
}
rmSync(outDir, {recursive: true, force: true});

// 0. The shipped data is checked here, once, so the bundle need not check it at
//    every start (src/core/materials/index.ts).
{
  const check = path.join(tmpdir(), `tapwright-check-data-${process.pid}.mjs`);
  await build({entryPoints: [at('scripts/build-support/check-shipped-data.ts')], bundle: true, platform: 'node', format: 'esm', outfile: check, logLevel: 'warning'});
  const r = spawnSync(process.execPath, [check], {stdio: 'inherit', cwd: root});
  rmSync(check, {force: true});
  if (r.status !== 0) process.exit(1);
}

const common = {
  platform: 'node',
  target: 'node20',
  jsx: 'automatic',
  bundle: true,
  // TAPWRIGHT_BUILD_READABLE=1 leaves the output unminified, with a comment naming
  // each source file: for reading a CPU profile of the built app.
  minify: process.env.TAPWRIGHT_BUILD_READABLE !== '1',
  legalComments: 'none',
  logLevel: 'warning',
  define: {'process.env.NODE_ENV': '"production"', 'process.env.DEV': '"false"', __TAPWRIGHT_DATA_CHECKED__: 'true'},
};

// 1. The workbench body: CommonJS, entry src/ui/launch.ts (module.exports.launch).
const body = await build({
  ...common,
  entryPoints: [at('src/ui/launch.ts')],
  format: 'cjs',
  write: false,
  outfile: 'workbench.cjs',
  plugins: [cjsPlugin, startUpPlugin],
  define: {...common.define, 'import.meta.url': '__twImportMetaUrl'},
  banner: {js: 'var __twImportMetaUrl = require("node:url").pathToFileURL(__filename).href;'},
});
const bodyText = body.outputFiles[0].text;
const bodyHash = createHash('sha256').update(bodyText).digest('hex');

// 2. The loader for that body replaces the source-mode loader (a dynamic import of
//    src/ui/launch.ts), and the body is a virtual module: text inside the one-file
//    build; a file beside its chunk in the split build (read, not parsed as a string).
const BODY_FILE = 'workbench-body.cjs';
const workbenchPlugin = embed => ({
  name: 'tapwright-workbench',
  setup(b) {
    b.onResolve({filter: /^\.\/workbench-loader\.js$/}, args => (path.resolve(args.resolveDir) === at('src/cli') ? {path: at('src/cli/workbench-loader-cached.ts')} : undefined));
    b.onResolve({filter: /^tapwright:workbench-body$/}, () => ({path: 'workbench-body', namespace: 'tapwright'}));
    b.onLoad({filter: /.*/, namespace: 'tapwright'}, () => ({
      contents: embed
        ? `const BODY = ${JSON.stringify(bodyText)};\nexport function readBody() { return BODY; }\nexport const BODY_FILE = undefined;\nexport const BODY_HASH = ${JSON.stringify(bodyHash)};\n`
        : `import {readFileSync} from 'node:fs';\nimport {fileURLToPath} from 'node:url';\nexport const BODY_FILE = fileURLToPath(new URL(${JSON.stringify(`./${BODY_FILE}`)}, import.meta.url));\nexport function readBody() { return readFileSync(BODY_FILE, 'utf8'); }\nexport const BODY_HASH = ${JSON.stringify(bodyHash)};\n`,
      loader: 'js',
    }));
  },
});
const requireBanner = "import {createRequire as __twCreateRequire} from 'node:module'; const require = __twCreateRequire(import.meta.url);";

if (!oneFileOnly) await buildSplit();
async function buildSplit() {
  const split = await build({
    ...common,
    entryPoints: {entry: at('src/cli/entry.ts')},
    format: 'esm',
    outdir: out('lib'),
    splitting: true,
    chunkNames: 'chunks/[name]-[hash]',
    metafile: true,
    plugins: [workbenchPlugin(false), startUpPlugin],
    banner: {js: requireBanner},
  });
  // The body file goes beside the chunk that reads it.
  const reader = Object.entries(split.metafile.outputs).find(([, o]) => Object.keys(o.inputs).some(i => i.includes('workbench-body')));
  if (!reader) throw new Error('build: the chunk that reads the workbench body was not found');
  writeFileSync(path.join(path.dirname(path.resolve(root, reader[0])), BODY_FILE), bodyText);
}

await build({
  ...common,
  entryPoints: [at('src/cli/entry.ts')],
  format: 'esm',
  outfile: out('tapwright.mjs'),
  plugins: [workbenchPlugin(true), startUpPlugin],
  banner: {js: `#!/usr/bin/env node\n${requireBanner}`},
});
chmodSync(out('tapwright.mjs'), 0o755);
