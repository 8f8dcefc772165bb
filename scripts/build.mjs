// Build: dist/lib (split ESM modules that resolve their packages from node_modules;
// the workbench chunk is loaded only when the workbench starts) and
// dist/tapwright.mjs (one self-contained file for a plant PC without a registry).
import {build} from 'esbuild';
import {rmSync, chmodSync} from 'node:fs';
import {fileURLToPath} from 'node:url';
import path from 'node:path';

const root = path.dirname(path.dirname(fileURLToPath(import.meta.url)));
const at = p => path.join(root, p);
rmSync(at('dist'), {recursive: true, force: true});

const common = {
  platform: 'node',
  format: 'esm',
  target: 'node20',
  jsx: 'automatic',
  bundle: true,
  logLevel: 'warning',
  define: {'process.env.NODE_ENV': '"production"', 'process.env.DEV': '"false"'},
};

await build({
  ...common,
  entryPoints: {entry: at('src/cli/entry.ts')},
  outdir: at('dist/lib'),
  splitting: true,
  packages: 'external',
  chunkNames: 'chunks/[name]-[hash]',
});

await build({
  ...common,
  entryPoints: [at('src/cli/entry.ts')],
  outfile: at('dist/tapwright.mjs'),
  minify: true,
  legalComments: 'none',
  alias: {'react-devtools-core': at('scripts/build-support/devtools-stub.js')},
  banner: {
    js: "#!/usr/bin/env node\nimport {createRequire as __twCreateRequire} from 'node:module'; const require = __twCreateRequire(import.meta.url);",
  },
});
chmodSync(at('dist/tapwright.mjs'), 0o755);
