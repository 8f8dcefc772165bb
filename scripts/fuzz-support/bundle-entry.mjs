// Bundle the CLI entry (src/cli/entry.ts) or a store module with esbuild into a folder
// under node_modules/.cache, so child processes run the current source as the bin
// does, with its packages resolved from node_modules. Returns {file, cleanup}.
import {build} from 'esbuild';
import fs from 'node:fs';
import path from 'node:path';
import {fileURLToPath} from 'node:url';

export const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');

export async function bundle(entry = 'src/cli/entry.ts', name = 'entry') {
  // A clean install has no node_modules/.cache yet.
  const cache = path.join(root, 'node_modules', '.cache');
  fs.mkdirSync(cache, {recursive: true});
  const out = fs.mkdtempSync(path.join(cache, `tapwright-${name}-`));
  const file = path.join(out, `${name}.mjs`);
  await build({
    entryPoints: [path.join(root, entry)],
    outfile: file,
    bundle: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    packages: 'external',
    logLevel: 'error',
  });
  return {file, cleanup: () => fs.rmSync(out, {recursive: true, force: true})};
}
