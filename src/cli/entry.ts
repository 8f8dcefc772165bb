/**
 * Process entry: wires the real process to runCli. The workbench is imported
 * only when it is about to start, so commands never load Ink or React.
 */
import {runCli} from './main.js';
import type {CliIo} from './io.js';
import {loadWorkbench} from './workbench-loader.js';
import {printableMessage} from '../core/text-safety.js';

const io: CliIo = {
  out: t => {
    process.stdout.write(t);
  },
  err: t => {
    process.stderr.write(t);
  },
  env: process.env,
  cwd: process.cwd(),
  stdinIsTTY: Boolean(process.stdin.isTTY),
  stdoutIsTTY: Boolean(process.stdout.isTTY),
  now: () => new Date(),
};

async function launchWorkbench(args: string[], cliIo: CliIo): Promise<number> {
  // Ink renders only the last frame when it believes it runs under CI (CI or
  // CONTINUOUS_INTEGRATION set). In a real terminal the workbench must draw
  // every frame, so the variables are neutralised before Ink is loaded.
  if (cliIo.stdinIsTTY && cliIo.stdoutIsTTY) {
    for (const key of ['CI', 'CONTINUOUS_INTEGRATION']) if (key in process.env) process.env[key] = 'false';
  }
  // A bad option or no terminal is answered here, without loading the workbench.
  const {startWorkbench} = await import('./launch-plain.js');
  return startWorkbench(args, cliIo, () => loadWorkbench(cliIo));
}

// A closed pipe (`tapwright threads M10 | head -1`) is not an error worth a stack trace.
process.stdout.on('error', (e: NodeJS.ErrnoException) => {
  if (e.code === 'EPIPE') process.exit(0);
});

runCli(process.argv.slice(2), io, launchWorkbench).then(
  code => {
    process.exitCode = code;
  },
  (e: unknown) => {
    process.stderr.write(`tapwright: internal error: ${printableMessage(String(e))}\n`);
    process.exitCode = 1;
  },
);
