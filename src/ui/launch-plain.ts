/**
 * The part of `tapwright` with no command that runs before the workbench is
 * loaded: the options are checked, and where there is no terminal for the
 * workbench (piped, cron, CI, TERM=dumb) the check report of the preset is
 * printed with a pointer to the commands, exit 2. Nothing here loads Ink or
 * React, so the bin decides this before it loads the workbench bundle.
 */
import type {CliIo} from '../cli/io.js';
import {checkJoint} from '../core/joint/index.js';
import {formatCheckText} from '../report/index.js';
import {configDir} from '../store/paths.js';
import {DEFAULT_PRESET} from '../store/shipped.js';
import {resolvePreset} from '../store/resolve.js';
import {readSettingsFile, type Settings} from '../store/settings-schema.js';
import {LaunchUsageError, parseLaunchArgs, wantsAscii, whyNoWorkbench, type TerminalEnv} from './terminal/env.js';
import {presetValues} from './real-services.js';

export interface WorkbenchStart {
  opts: ReturnType<typeof parseLaunchArgs>;
  tenv: TerminalEnv;
  /** The config folder. */
  dir: string;
  /** The settings as read without conf, and whether the file is sound. */
  quick: {settings: Settings; sound: boolean};
}

/** An exit code when the workbench must not start (bad option, no terminal), else what it starts with. */
export function startWithoutWorkbench(args: string[], io: CliIo): number | WorkbenchStart {
  let opts;
  try {
    opts = parseLaunchArgs(args);
  } catch (e) {
    if (e instanceof LaunchUsageError) {
      io.err(`tapwright: ${e.message}\n`);
      return 2;
    }
    throw e;
  }
  const tenv: TerminalEnv = {env: io.env, stdinIsTTY: io.stdinIsTTY, stdoutIsTTY: io.stdoutIsTTY};
  const dir = configDir(io.env);
  const quick = readSettingsFile(dir);
  const why = whyNoWorkbench(tenv);
  if (why) return nonInteractive(why, opts.preset ?? DEFAULT_PRESET, io, wantsAscii(tenv, opts.ascii || quick.settings.ascii === true));
  return {opts, tenv, dir, quick};
}

function nonInteractive(why: string, presetName: string, io: CliIo, ascii: boolean): number {
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

