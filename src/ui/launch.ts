/**
 * `tapwright` with no command: start the interactive workbench (the bin checks
 * the options and the terminal first: src/cli/launch-plain.ts, which prints the
 * check report of the preset where there is no terminal).
 * Owns the terminal while the workbench runs: the alternate screen, raw mode
 * through Ink, and its restoration on quit, Ctrl-C, SIGTERM and SIGHUP, with
 * unsaved edits kept as a draft for the next start.
 */
import React from 'react';
import {render} from 'ink';
import type {CliIo} from '../app/io.js';
import {DEFAULT_PRESET} from '../store/shipped.js';
import type {SettingsHandle} from '../store/settings.js';
import {LaunchUsageError, parseLaunchArgs, wantsAscii, wantsColor, whyNoWorkbench, type TerminalEnv} from './terminal/env.js';
import {createFrameWriter} from './terminal/frame-writer.js';
import {yogaReady} from './terminal/yoga-ready.js';
import {configDir} from '../store/paths.js';
import {readSettingsFile} from '../store/settings-schema.js';
import {realServices} from './real-services.js';
import {openingPreset} from './opening-preset.js';
import {App} from './app.js';
import {initialState, isDirty, type Message, type WorkbenchState} from './state/workbench.js';
import {makeTheme} from './theme.js';
import type {FormValues} from './state/fields.js';

export interface LaunchTerminal {
  stdin: NodeJS.ReadStream;
  stdout: NodeJS.WriteStream;
}

const ENTER_ALT = '\u001B[?1049h\u001B[H';
const LEAVE_ALT = '\u001B[?1049l';
const SHOW_CURSOR = '\u001B[?25h';
const RESET_STYLE = '\u001B[0m';

/** Start the workbench; resolves with the exit code. */
export async function launch(args: string[], io: CliIo, term: LaunchTerminal = {stdin: process.stdin, stdout: process.stdout}): Promise<number> {
  // The bin has checked the options and the terminal already (src/cli/launch-plain.ts); a direct caller gets the same refusals.
  let opts;
  try {
    opts = parseLaunchArgs(args);
  } catch (e) {
    if (!(e instanceof LaunchUsageError)) throw e;
    io.err(`tapwright: ${e.message}\n`);
    return 2;
  }
  const tenv: TerminalEnv = {env: io.env, stdinIsTTY: io.stdinIsTTY, stdoutIsTTY: io.stdoutIsTTY};
  const why = whyNoWorkbench(tenv);
  if (why) {
    io.err(`tapwright: the interactive workbench needs a terminal (${why}); see tapwright --help\n`);
    return 2;
  }
  const dir = configDir(io.env);
  const quick = readSettingsFile(dir);
  // conf (and the JSON-schema validator it brings) is loaded only when the settings
  // file needs repair, or at the exit to save the units: a plain read serves the start.
  const openHandle = async (): Promise<SettingsHandle | undefined> => {
    try {
      return (await import('../store/settings.js')).openSettings(dir);
    } catch {
      return undefined;
    }
  };
  let settings = quick.sound ? undefined : await openHandle();
  const saved = settings ? settings.get() : quick.settings;
  const ascii = wantsAscii(tenv, opts.ascii || saved.ascii === true);
  const presetName = opts.preset ?? DEFAULT_PRESET;
  await yogaReady();

  const svc = realServices({configDir: dir, cwd: io.cwd, now: io.now});
  const notes: string[] = [...svc.store.warnings(), ...(settings?.warnings() ?? [])];
  let name = presetName;
  let readOnly = true;
  let values: FormValues;
  let mode: 'joint' | 'screw' = 'joint';
  try {
    const p = openingPreset(svc.presets, opts.preset, saved.lastPreset);
    ({name, readOnly, values} = p);
    if (p.kind === 'screw') mode = 'screw';
  } catch (e) {
    if (opts.preset !== undefined) {
      io.err(`tapwright: --preset "${opts.preset}": ${e instanceof Error ? e.message : String(e)}; see tapwright presets list\n`);
      return 2;
    }
    notes.push(`the default preset could not be opened (${e instanceof Error ? e.message : String(e)}); starting empty`);
    values = {joint: {thread: 'M10', engagement: 10}, hole: {}};
    name = 'new joint';
    readOnly = false;
  }
  let draft;
  try {
    draft = svc.draft.load();
  } catch {
    draft = undefined;
  }
  const message: Message | undefined = notes.length ? {text: notes.join('; '), level: 'error'} : undefined;

  const {stdin, stdout} = term;
  // A 0x0 pty (script(1), some docker exec) reports no size: Ink would wrap at 0 columns.
  if (!stdout.columns || !stdout.rows) {
    stdout.columns = Number(io.env.COLUMNS) || 80;
    stdout.rows = Number(io.env.LINES) || 24;
  }
  const units = opts.units ?? saved.units ?? 'si';
  const initial = {
    ...initialState({name, readOnly, values, units, ascii, draft, message, mode, size: {columns: stdout.columns, rows: stdout.rows}}),
    ...(saved.lastReportDir ? {reportDir: saved.lastReportDir} : {}),
  };
  const theme = makeTheme(wantsColor(tenv, opts.color), ascii);

  let latest: WorkbenchState = initial;
  let restored = false;
  let draftKept = false;
  let draftError: string | undefined;
  const keepDraft = (s: WorkbenchState) => {
    try {
      if (isDirty(s) && !s.draftOffer) {
        svc.draft.save({savedAt: io.now().toISOString(), presetName: s.preset.name, values: s.values, mode: s.mode});
        draftKept = true;
      } else if (!s.draftOffer) svc.draft.clear();
    } catch (e) {
      // The draft is a convenience; a failure to keep it must not stop the exit, but is said after it.
      draftError = e instanceof Error ? e.message : String(e);
    }
  };
  const restore = () => {
    if (restored) return;
    restored = true;
    stdout.write(`${RESET_STYLE}${SHOW_CURSOR}${LEAVE_ALT}`);
  };

  // Nothing may print to the terminal while the workbench owns it (React reports errors caught
  // by a screen guard through console.error): keep such messages, show them after the exit
  // with TAPWRIGHT_DEBUG=1.
  const held: string[] = [];
  const consoleBefore = {log: console.log, warn: console.warn, error: console.error};
  const hold = (...a: unknown[]) => {
    if (held.length < 50) held.push(a.map(x => (x instanceof Error ? (x.stack ?? x.message) : String(x))).join(' '));
  };
  console.log = hold;
  console.warn = hold;
  console.error = hold;
  const releaseConsole = () => Object.assign(console, consoleBefore);
  stdout.write(ENTER_ALT);
  // TAPWRIGHT_FULL_REDRAW=1 hands Ink the terminal directly (full redraws), for a terminal that
  // misdraws the cell-by-cell updates.
  const writer = io.env.TAPWRIGHT_FULL_REDRAW === '1' ? stdout : createFrameWriter(stdout);
  const app = React.createElement(App, {
    initial,
    svc,
    theme,
    onState: s => {
      latest = s;
    },
    // Quitting keeps the draft through the reducer's keepDraft effect; a signal or a crash, below.
    onQuit: s => {
      latest = s;
      if (s.draftKept) draftKept = true;
    },
  });
  const instance = render(app, {stdout: writer as unknown as NodeJS.WriteStream, stdin, exitOnCtrlC: false, patchConsole: false, maxFps: 30});

  let signalCode: number | undefined;
  const onSignal = (signal: NodeJS.Signals, code: number) => () => {
    signalCode = code;
    keepDraft(latest);
    try {
      instance.unmount();
    } catch {
      // Already unmounting.
    }
    restore();
    if (signal === 'SIGHUP') {
      // The terminal is gone: nothing more can be written to it.
      process.exit(code);
    }
  };
  const handlers: [NodeJS.Signals, () => void][] = [
    ['SIGTERM', onSignal('SIGTERM', 143)],
    ['SIGHUP', onSignal('SIGHUP', 129)],
    ['SIGINT', onSignal('SIGINT', 130)],
    ['SIGQUIT', onSignal('SIGQUIT', 131)],
  ];
  for (const [sig, h] of handlers) process.on(sig, h);
  process.on('exit', restore);

  try {
    await instance.waitUntilExit();
  } catch (e) {
    keepDraft(latest);
    restore();
    io.err(`tapwright: the workbench stopped: ${e instanceof Error ? e.message : String(e)}\n`);
    return 1;
  } finally {
    for (const [sig, h] of handlers) process.off(sig, h);
    restore();
    process.off('exit', restore);
    releaseConsole();
    if (held.length > 0 && io.env.TAPWRIGHT_DEBUG) io.err(`${held.join('\n')}\n`);
  }
  try {
    settings ??= await openHandle();
    settings?.set({units: latest.units, lastPreset: latest.preset.name.slice(0, 64), ...(latest.reportDir ? {lastReportDir: latest.reportDir.slice(0, 1024)} : {})});
  } catch {
    // Settings are a convenience.
  }
  if (draftKept) io.err('tapwright: unsaved edits were kept as a draft; the next start offers to restore them.\n');
  if (draftError) io.err(`tapwright: unsaved edits were NOT kept: ${draftError}\n`);
  if (signalCode !== undefined) return signalCode;
  if (draftError) return 1;
  return latest.quit === 'interrupt' ? 130 : 0;
}
