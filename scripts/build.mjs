// Build: dist/lib (split ESM modules that resolve their packages from node_modules;
// the workbench chunk is loaded only when the workbench starts) and
// dist/tapwright.mjs (one self-contained file for a plant PC without a registry).
import {build} from 'esbuild';
import {rmSync, chmodSync} from 'node:fs';
import {fileURLToPath} from 'node:url';
import path from 'node:path';
import {startUpPlugin} from './build-support/start-up-plugin.mjs';

const root = path.dirname(path.dirname(fileURLToPath(import.meta.url)));
const at = p => path.join(root, p);
// `--out DIR` builds somewhere else (tests build into a temporary folder so they
// never race a running copy of dist/).
const outIndex = process.argv.indexOf('--out');
const outDir = outIndex > 0 ? path.resolve(process.argv[outIndex + 1]) : at('dist');
const out = p => path.join(outDir, p);
rmSync(outDir, {recursive: true, force: true});

const common = {
  platform: 'node',
  format: 'esm',
  target: 'node20',
  jsx: 'automatic',
  bundle: true,
  logLevel: 'warning',
  define: {'process.env.NODE_ENV': '"production"', 'process.env.DEV': '"false"'},
  plugins: [startUpPlugin],
};

await build({
  ...common,
  entryPoints: {entry: at('src/cli/entry.ts')},
  outdir: out('lib'),
  splitting: true,
  minify: true,
  legalComments: 'none',
  // Everything is bundled, so a command opens a handful of files instead of
  // hundreds of package modules; Ink and React sit in the workbench's own
  // chunks and load only when the workbench starts.
  chunkNames: 'chunks/[name]-[hash]',
  alias: {'react-devtools-core': at('scripts/build-support/devtools-stub.js')},
  banner: {
    js: "import {createRequire as __twCreateRequire} from 'node:module'; const require = __twCreateRequire(import.meta.url);",
  },
});

await build({
  ...common,
  entryPoints: [at('src/cli/entry.ts')],
  outfile: out('tapwright.mjs'),
  minify: true,
  legalComments: 'none',
  alias: {'react-devtools-core': at('scripts/build-support/devtools-stub.js')},
  banner: {
    js: "#!/usr/bin/env node\nimport {createRequire as __twCreateRequire} from 'node:module'; const require = __twCreateRequire(import.meta.url);",
  },
});
chmodSync(out('tapwright.mjs'), 0o755);
