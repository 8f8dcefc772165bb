/**
 * Bundles the store source into one plain .mjs (esbuild, a devDependency) so
 * child processes can use it with plain `node`, without a TypeScript loader.
 */
import {build} from 'esbuild';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import {fileURLToPath} from 'node:url';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');

/** Bundle src/store/<module>.ts (default: presets, the smallest bundle for the many-process tests). */
export async function bundleStore(module = 'presets'): Promise<{file: string; cleanup: () => void}> {
  const out = fs.mkdtempSync(path.join(os.tmpdir(), 'tapwright-bundle-'));
  const file = path.join(out, `${module}.mjs`);
  await build({
    entryPoints: [path.join(root, `src/store/${module}.ts`)],
    outfile: file,
    bundle: true,
    minify: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    logLevel: 'error',
  });
  return {file, cleanup: () => fs.rmSync(out, {recursive: true, force: true})};
}

export const WORKER = path.join(root, 'test/fixtures/store/worker.mjs');
