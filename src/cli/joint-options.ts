/**
 * The joint on the command line (`check`, `repair`, `presets save`): its options
 * and --help lines generated from the field table (src/app/joint-fields.ts),
 * the checks between options (one way of tightening, a nut or a tapped hole),
 * and the one resolver (src/app/resolve.ts) with the user's settings and
 * materials, so every command reads a joint exactly as the workbench does.
 */
import {JOINT_ROWS, JOINT_SECTIONS} from '../app/joint-fields.js';
import {coreFieldError, resolveJointInput, wantsUserMaterials} from '../app/resolve.js';
import {optionMessage} from '../app/field-table.js';
import type {FieldError} from '../app/fields-types.js';
import type {JointInput, JointInputDraft, UserParentMaterial} from '../core/joint/input.js';
import type {UnitSystem} from '../core/units.js';
import {unitsOption, type OptionSpec, type ParsedOptions} from './args.js';
import {helpLine, overDraft, readRowOptions, rowHelp, rowOptions, rowSummary} from './field-options.js';
import {UsageError, type CliIo} from './io.js';
import {defaultScatter} from './default-scatter.js';

/** Every joint option of check, plus --units (how bare numbers are read). */
export const JOINT_OPTIONS: OptionSpec = {...rowOptions(JOINT_ROWS), units: {type: 'string'}};

const UNITS_HELP = helpLine('  --units si|us', 'display units; a bare number is read in these units (mm, N, N·m, MPa or in, lbf, ft·lbf, ksi); JSON is SI');

/** The joint options for `check --help`, by section, each with its line. */
export function jointHelp(): string {
  return JOINT_SECTIONS.map(s => [s.title, ...rowHelp(JOINT_ROWS.filter(r => r.section === s.id))].join('\n')).join('\n');
}

/** The joint options in a few lines, for commands that take a joint (ranges and defaults: check --help). */
export const JOINT_OPTIONS_HELP = [...rowSummary(JOINT_ROWS), ...UNITS_HELP, '  Ranges and defaults: tapwright check --help.'].join('\n');

export {UNITS_HELP};

/** The joint draft from the options over `base` (a preset's joint); throws UsageError for options that contradict. */
export function jointDraftFromOptions(values: ParsedOptions['values'], units: UnitSystem, base: Partial<JointInputDraft> | undefined): Partial<JointInputDraft> {
  const has = (o: string): boolean => values[o.slice(2)] !== undefined;
  const tight = ['--torque', '--preload', '--utilisation'].filter(has);
  if (tight.length > 1) throw new UsageError(`${tight.join(' and ')} contradict each other; give one way of tightening`, tight[1]);
  let d: Record<string, unknown> = overDraft(base, readRowOptions(JOINT_ROWS, values, units));
  if (tight[0]) d.tightening = tight[0].slice(2);

  const tappedOpts = ['--parent', '--parent-rm', '--parent-shear', '--hole-depth'].filter(has);
  const nutOpts = ['--nut', '--nut-style', '--nut-height', '--nut-flats'].filter(has);
  if (tappedOpts.length && nutOpts.length) {
    throw new UsageError(`${nutOpts[0]} is for a nut and ${tappedOpts[0]} for a tapped hole; give one kind of internal thread`, nutOpts[0]);
  }
  // The bolt's pitch diameter is given directly or by three wires: the one given replaces the other (a preset's).
  if (has('--bolt-pitch-diameter') && (has('--over-wires') || has('--wire'))) {
    throw new UsageError(`--bolt-pitch-diameter and ${has('--over-wires') ? '--over-wires' : '--wire'} contradict each other; give the pitch diameter or the three-wire reading`, '--bolt-pitch-diameter');
  }
  if (has('--bolt-pitch-diameter')) d = overDraft(d, {'measured.overWires': undefined});
  if (has('--over-wires') || has('--wire')) d = overDraft(d, {'measured.boltPitchDiameter': undefined});
  if (nutOpts.length) {
    if (!has('--nut') && d.internal !== 'nut') throw new UsageError(`${nutOpts[0]} applies to a nut; give --nut CLASS too`, nutOpts[0]);
    d.internal = 'nut';
    for (const k of ['parent', 'parentRm', 'parentShear', 'holeDepth', 'parentData']) delete d[k];
  } else if (tappedOpts.length) {
    d.internal = 'tapped';
    for (const k of ['nutClass', 'nutStyle', 'nutHeight', 'nutFlats']) delete d[k];
  }
  return d as Partial<JointInputDraft>;
}

/** A UsageError for a FieldError: its option and the message in the command line's words. */
export function usageErrorOf(e: FieldError): UsageError {
  return new UsageError(optionMessage(e), e.option);
}

/** Core errors that name a joint field become UsageErrors naming the option; anything else is rethrown as it is. */
export function jointUsageError(e: unknown, units: UnitSystem): unknown {
  const f = coreFieldError(e, 'joint', units);
  return f ? usageErrorOf(f) : e;
}

/** The user's own parent materials, read from the store only when the draft names a material the library lacks. */
async function userMaterialsFor(draft: Partial<JointInputDraft>, io: CliIo): Promise<readonly UserParentMaterial[]> {
  if (!wantsUserMaterials(draft)) return [];
  const {openPresetStore} = await import('../store/presets.js');
  const {configDir} = await import('../store/paths.js');
  const store = openPresetStore(configDir(io.env));
  for (const w of store.warnings()) io.err(`tapwright: ${w}\n`);
  return store.userMaterials();
}

/**
 * The JointInput from the options over `base`, through the one resolver with
 * the user's settings (scatter) and materials. Throws UsageError naming the
 * option and the accepted range.
 */
export async function jointFromOptions(
  values: ParsedOptions['values'],
  io: CliIo,
  base?: Partial<JointInputDraft>,
  opts: {settings?: boolean} = {},
): Promise<{input: JointInput; units: UnitSystem}> {
  const units = unitsOption(values);
  const draft = jointDraftFromOptions(values, units, base);
  const settings = opts.settings === false ? {} : {settings: {scatterDefault: defaultScatter(io)}};
  const r = resolveJointInput(draft, {units, ...settings, userMaterials: await userMaterialsFor(draft, io)});
  if (r.errors) throw usageErrorOf(r.errors[0]!);
  return {input: r.input, units};
}
