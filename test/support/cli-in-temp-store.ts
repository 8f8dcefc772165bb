/**
 * Run the CLI in-process against a store folder of its own (TAPWRIGHT_CONFIG_DIR
 * set to a temporary folder, removed when the test finishes).
 */
import {mkdtempSync, rmSync} from 'node:fs';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {onTestFinished} from 'vitest';
import {runCli} from '../../src/cli/main.js';
import {memoryIo} from '../../src/cli/io.js';

export function cliInTempStore(prefix: string) {
  const dir = mkdtempSync(path.join(tmpdir(), `${prefix}-`));
  onTestFinished(() => rmSync(dir, {recursive: true, force: true}));
  const run = async (...args: string[]) => {
    const io = memoryIo({env: {TAPWRIGHT_CONFIG_DIR: dir}, cwd: dir});
    const code = await runCli(args, io);
    return {code, out: io.stdout(), err: io.stderr()};
  };
  return {dir, run};
}
