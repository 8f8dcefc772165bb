/**
 * The build's workbench loader (scripts/build.mjs puts it in place of
 * workbench-loader.ts): the workbench bundle is kept as text and run through
 * a V8 code cache (code-cache.ts), so a start after the first skips most of the
 * parsing and compiling. The cache is written two seconds after the start, when
 * the code that draws the first frame has been compiled, or at the exit if that
 * comes first.
 */
import {createRequire} from 'node:module';
import v8 from 'node:v8';
import {fileURLToPath} from 'node:url';
import type {CliIo} from './io.js';
import {codeCacheDir, loadCachedBody} from './code-cache.js';
import type {LaunchWorkbench} from './workbench-loader.js';

export type {LaunchWorkbench} from './workbench-loader.js';

const SAVE_AFTER_MS = 2000;

export async function loadWorkbench(io: CliIo): Promise<LaunchWorkbench> {
  // V8 doubles its young generation whenever it fills quickly, up to 16 MB a half:
  // right for throughput, wasteful for a terminal tool that allocates about 1 MB a
  // keystroke. Held at its first size, the workbench stays some 10 MB smaller while
  // typing, for a scavenge of well under a millisecond more per key (npm run bench).
  // Set before the body is compiled: V8 keys its code cache to the flags.
  v8.setFlagsFromString('--semi-space-growth-factor=1');
  const {readBody, BODY_FILE, BODY_HASH} = await import('tapwright:workbench-body');
  // Stack traces and profiles name the body's own file, or the one-file build's file with #workbench.
  const filename = BODY_FILE ?? `${fileURLToPath(import.meta.url)}#workbench`;
  const body = loadCachedBody({source: readBody(), hash: BODY_HASH, filename, cacheDir: codeCacheDir(io.env), require: createRequire(import.meta.url)});
  if (io.env.TAPWRIGHT_DEBUG) process.once('exit', () => process.stderr.write(`tapwright: code cache ${body.cache}${body.file ? ` (${body.file})` : ''}\n`));
  if (body.cache === 'absent' || body.cache === 'rejected') {
    setTimeout(() => body.save(), SAVE_AFTER_MS).unref();
    process.once('exit', () => body.save());
  }
  return body.exports.launch as LaunchWorkbench;
}
