/**
 * The part of `tapwright` with no command that runs before the workbench is
 * loaded: the options are checked, and where there is no terminal for the
 * workbench (piped, cron, CI, TERM=dumb) the check report of the preset is
 * printed with a pointer to the commands, exit 2. The preset's joint goes
 * through the one resolver (src/app/resolve.ts) with the user's settings and
 * materials, as in `check --preset`. Nothing here loads Ink or React, and the
 * report's modules load only when the report is printed, so the bin decides
 * cheaply before it loads the workbench bundle.
 */
import type {CliIo} from '../app/io.js';
import {LaunchUsageError, parseLaunchArgs, whyNoWorkbench, type TerminalEnv} from '../ui/terminal/env.js';

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
  const [{checkJoint}, {formatCheckText}, {configDir}, {DEFAULT_PRESET}, {resolvePreset}, {readSettingsQuick}, {wantsAscii}, {resolveJointInput, wantsUserMaterials}, {labelMessage}] =
    await Promise.all([
      import('../core/joint/index.js'),
      import('../report/index.js'),
      import('../store/paths.js'),
      import('../store/shipped.js'),
      import('../store/resolve.js'),
      import('../store/settings-schema.js'),
      import('../ui/terminal/env.js'),
      import('../app/resolve.js'),
      import('../app/field-table.js'),
    ]);
  const presetName = opts.preset ?? DEFAULT_PRESET;
  const dir = configDir(io.env);
  const settings = readSettingsQuick(dir);
  const ascii = wantsAscii(tenv, opts.ascii || settings.ascii === true);
  const units = opts.units ?? settings.units ?? 'si';
  const hint =
    `tapwright: the interactive workbench needs a terminal (${why}).\n` +
    `For scripts and pipes use the commands: tapwright check --preset NAME (or --thread ... --engage ...),\n` +
    `tapwright repair, tapwright presets list; see tapwright --help.\n`;
  try {
    const p = resolvePreset(presetName, io.env, 'joint');
    const draft = p.joint ?? {};
    const userMaterials = wantsUserMaterials(draft) ? (await import('../store/presets.js')).openPresetStore(dir).userMaterials() : [];
    const r = resolveJointInput(draft, {settings, userMaterials, units});
    if (r.errors) throw new Error(r.errors.map(labelMessage).join('; '));
    const report = formatCheckText(checkJoint(r.input), r.input, {units, ascii});
    io.out(report.endsWith('\n') ? report : `${report}\n`);
    io.err(`${hint}Printed above: the check report of preset "${p.name}".\n`);
  } catch (e) {
    io.err(`${hint}(The check report of preset "${presetName}" could not be printed: ${e instanceof Error ? e.message : String(e)})\n`);
  }
  return 2;
}

/**
 * `tapwright` with no command: a bad option exits 2, no terminal prints the
 * report, otherwise `launch` (the workbench, loaded only now) runs.
 */
export async function startWorkbench(args: string[], io: CliIo, launch: () => Promise<(args: string[], io: CliIo) => Promise<number>>): Promise<number> {
  const start = checkStart(args, io);
  if ('code' in start) return start.code;
  if (start.why) return printWithoutTerminal(start.why, start.opts, start.tenv, io);
  return (await launch())(args, io);
}
