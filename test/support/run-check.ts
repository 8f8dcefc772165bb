/** `tapwright check ARGS` in-process with captured output, for the CLI tests. */
import {runCli} from '../../src/cli/main.js';
import {memoryIo} from '../../src/cli/io.js';

export async function runCheck(args: string[], env: Record<string, string> = {}): Promise<{code: number; out: string; err: string}> {
  const io = memoryIo({env});
  const code = await runCli(['check', ...args], io);
  return {code, out: io.stdout(), err: io.stderr()};
}
