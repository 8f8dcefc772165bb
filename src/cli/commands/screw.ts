/**
 * `tapwright screw`: a power screw (lead screw and nut). Text fits 80 columns and
 * carries a unit on every number; JSON is always SI (mm, N, N·m, MPa, degrees).
 * Exit 0 ok, 3 computed with a fail flag, 2 bad input.
 */
import type {Command} from '../command.js';
import {EXIT, UsageError, type CliIo} from '../io.js';
import {formatOption, parseOptions, str, unitsOption} from '../args.js';
import {SCREW_ROWS} from '../../app/screw-fields.js';
import {coreFieldError, resolveScrewInput} from '../../app/resolve.js';
import {readRowOptions, rowHelp, rowOptions} from '../field-options.js';
import {usageErrorOf} from '../joint-options.js';
import {checkScrew, COLLAR_FRICTION, COLLAR_FRICTION_SOURCE, THREAD_FRICTION, THREAD_FRICTION_SOURCE, type ScrewInput} from '../../core/screw/index.js';
import type {UnitSystem} from '../../core/units.js';
import {CAUTION_LINES} from '../../core/cautions.js';
import {screwText} from '../../report/screw-text.js';
import {screwMarkdown} from '../../report/screw-markdown.js';
import {screwFlagsInUnits} from '../../core/screw/flags.js';
import {wrapText} from '../../report/wrap.js';
import type {WorkOrderNotes} from '../../report/work-order.js';
import {NOTE_OPTION_SPEC, NOTE_OPTIONS_HELP, noteOptionsGiven, workOrderNotes} from './check-notes.js';

const HELP = `tapwright screw - power screw (lead screw and nut): torque, efficiency,
self-locking, stresses, nut pressure and stripping, buckling

Usage:
  tapwright screw --thread T --load F --nut-length L [options]
  tapwright screw --preset NAME [options]   a saved or shipped screw preset;
                                            options given override it
  tapwright screw --picks          friction picks with their source

Options:
${rowHelp(SCREW_ROWS).join('\n')}
  --units U            si (default) or us: the text output, and the unit of a
                       bare number (N, mm, MPa, m/s or lbf, in, ksi, ft/min)
  --format F           text (default), markdown (the work-order report) or
                       json; --json is short for json (JSON is always SI)
  --help               this text
${NOTE_OPTIONS_HELP}

Torques: Shigley, Mechanical Engineering Design, 9th ed., Eqs. 8-1 to 8-6.
With a friction range the raise torque uses the max and lowering and
self-locking the min. Exit codes: 0 ok, 3 a check failed, 2 bad input.
`;

const OPTIONS = {
  ...rowOptions(SCREW_ROWS),
  units: {type: 'string'}, format: {type: 'string'}, json: {type: 'boolean'}, picks: {type: 'boolean'}, preset: {type: 'string'},
  ...NOTE_OPTION_SPEC,
} as const;

export type ScrewFormat = 'text' | 'markdown' | 'json';

export interface ScrewArgs {
  input: ScrewInput;
  units: UnitSystem;
  json: boolean;
  /** The output: text (default), the Markdown work-order report, or SI JSON. */
  format: ScrewFormat;
  picks: boolean;
  /** Name of the preset the inputs started from, if any. */
  preset?: string;
}

/**
 * Build the ScrewInput from the options, on top of a preset's screw inputs when
 * `base` is given, through the one resolver; every rejection names its option.
 * A bare number is in the --units system (N, mm, MPa, m/s or lbf, in, ksi, ft/min).
 */
export function screwInputFromArgs(args: string[], base?: Record<string, unknown>): ScrewArgs {
  const {values} = parseOptions(args, OPTIONS, false);
  const units = unitsOption(values);
  const format = formatOption(values, ['text', 'markdown', 'json'] as const, 'text');
  const json = format === 'json';
  if (values.picks === true) return {input: undefined as never, units, json, format, picks: true};
  const given = readRowOptions(SCREW_ROWS, values, units);
  // A multi-start thread typed over a preset brings its own starts.
  const merged = base && given.thread !== undefined && given.starts === undefined ? {...base, starts: undefined, ...given} : {...base, ...given};
  // A measured backlash given here replaces a preset's nut wear (the wear then comes from the backlash).
  if (given.backlash !== undefined && given.nutWear === undefined) delete merged.nutWear;
  const r = resolveScrewInput(merged, {units});
  if (r.errors) throw usageErrorOf(r.errors[0]!);
  return {input: r.input, units, json, format, picks: false};
}

function picksText(): string {
  const out = ['THREAD FRICTION f (--mu-thread pick: min..max)'];
  for (const p of THREAD_FRICTION) out.push(`  ${p.id.padEnd(22)} ${p.min.toFixed(2)}..${p.max.toFixed(2)}  ${p.screw} screw, ${p.nut} nut`);
  out.push(...wrapText(THREAD_FRICTION_SOURCE.source, '  source: ', '    '), '', 'COLLAR FRICTION fc (--mu-collar pick; add :starting for the starting value)');
  for (const p of COLLAR_FRICTION) out.push(`  ${p.id.padEnd(22)} running ${p.running.toFixed(2)}, starting ${p.starting.toFixed(2)}`);
  out.push(...wrapText(COLLAR_FRICTION_SOURCE.source, '  source: ', '    '), '');
  return out.join('\n');
}

export const command: Command = {
  name: 'screw',
  summary: 'power screws (lead screws and nuts): torque, efficiency, stresses, buckling',
  help: HELP,
  async run(args: string[], io: CliIo) {
    const {values} = parseOptions(args, OPTIONS, false);
    const presetName = str(values, 'preset');
    let base: Record<string, unknown> | undefined;
    let presetNotes: WorkOrderNotes | undefined;
    if (presetName !== undefined) {
      const {resolvePreset} = await import('../../store/resolve.js');
      const p = resolvePreset(presetName, io.env, 'screw', m => io.err(`tapwright: ${m}\n`));
      if (!p.screw) throw new UsageError(`--preset "${presetName}" has no power-screw inputs`, '--preset');
      base = {...p.screw};
      presetNotes = p.notes;
    }
    const {input, units, json, format, picks} = screwInputFromArgs(args, base);
    const noteOptions = noteOptionsGiven(values);
    if (noteOptions.length > 0 && format === 'json') {
      throw new UsageError(`${noteOptions[0]} fills the work-order report; give --format text or markdown with it`, noteOptions[0]);
    }
    if (picks) {
      io.out(json ? `${JSON.stringify({threadFriction: THREAD_FRICTION, threadFrictionSource: THREAD_FRICTION_SOURCE, collarFriction: COLLAR_FRICTION, collarFrictionSource: COLLAR_FRICTION_SOURCE}, null, 2)}\n` : `${picksText()}\n`);
      return EXIT.ok;
    }
    let result;
    try {
      result = checkScrew(input);
    } catch (e) {
      const f = coreFieldError(e, 'screw', units);
      throw f ? usageErrorOf(f) : e;
    }
    if (json) {
      io.out(`${JSON.stringify({...result, input: {...input, ...result.input}, preset: presetName ?? null, cautions: CAUTION_LINES}, null, 2)}\n`);
    } else {
      const notes = await workOrderNotes(values, presetNotes);
      const meta = {date: io.now(), notes, duty: input.duty, ...(presetName !== undefined ? {presetName} : {})};
      const flags = screwFlagsInUnits(result, input, units);
      io.out(format === 'markdown' ? screwMarkdown(result, input, {...meta, units}, flags) : screwText(result, units, presetName, meta, flags));
    }
    return result.flags.some(f => f.level === 'fail') ? EXIT.fail : EXIT.ok;
  },
};
