/**
 * The part of `tapwright` with no command that runs before the workbench is
 * loaded: the options are checked, and where there is no terminal for the
 * workbench (piped, cron, CI, TERM=dumb) the check report of the preset is
 * printed with a pointer to the commands, exit 2. Nothing here loads Ink or
 * React, and the report's modules load only when the report is printed, so the
 * bin decides cheaply before it loads the workbench bundle.
 */
import type {CliIo} from '../cli/io.js';
import {LaunchUsageError, parseLaunchArgs, whyNoWorkbench, type TerminalEnv} from './terminal/env.js';

export type LaunchOptions = ReturnType<typeof parseLaunchArgs>;

/** An exit code for a bad option; otherwise the options, and why there is no workbench (if so). */
export function checkStart(args: string[], io: CliIo): {code: number} | {opts: LaunchOptions; tenv: TerminalEnv; why: string | undefined} {
  let opts;
  try {
    opts = parseLaunchArgs(args);
  } catch (e) {
    if (e instanceof LaunchUsageError) {
      io.err(`tapwright: ${e.message}\n`);
      return {code: 2};
    }
    throw e;
  }
  const tenv: TerminalEnv = {env: io.env, stdinIsTTY: io.stdinIsTTY, stdoutIsTTY: io.stdoutIsTTY};
  return {opts, tenv, why: whyNoWorkbench(tenv)};
}

/** No terminal for the workbench: print the check report of the preset and point to the commands; exit 2. */
export async function printWithoutTerminal(why: string, opts: LaunchOptions, tenv: TerminalEnv, io: CliIo): Promise<number> {
  const [{checkJoint}, {formatCheckText}, {configDir}, {DEFAULT_PRESET}, {resolvePreset}, {readSettingsQuick}, {wantsAscii}, {presetValues}] = await Promise.all([
    import('../core/joint/index.js'),
    import('../report/index.js'),
    import('../store/paths.js'),
    import('../store/shipped.js'),
    import('../store/resolve.js'),
    import('../store/settings-schema.js'),
    import('./terminal/env.js'),
    import('./real-services.js'),
  ]);
  const presetName = opts.preset ?? DEFAULT_PRESET;
  const ascii = wantsAscii(tenv, opts.ascii || readSettingsQuick(configDir(io.env)).ascii === true);
  const hint =
    `tapwright: the interactive workbench needs a terminal (${why}).\n` +
    `For scripts and pipes use the commands: tapwright check --preset NAME (or --thread ... --engage ...),\n` +
    `tapwright repair, tapwright presets list; see tapwright --help.\n`;
  try {
    const p = resolvePreset(presetName, io.env, 'joint');
    const values = presetValues(p);
    const report = formatCheckText(checkJoint(values.joint as never), values.joint as never, {units: 'si', ascii});
    io.out(report.endsWith('\n') ? report : `${report}\n`);
    io.err(`${hint}Printed above: the check report of preset "${p.name}".\n`);
  } catch (e) {
    io.err(`${hint}(The check report of preset "${presetName}" could not be printed: ${e instanceof Error ? e.message : String(e)})\n`);
  }
  return 2;
}
