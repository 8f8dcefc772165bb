/**
 * `tapwright repair`: ranked fixes for a weak or stripped tapped thread.
 * Takes the check options for the joint plus the state of the hole; prints a
 * ranked 80-column table with the cautions, or the plan as JSON (always SI).
 */
import {defaultScatter} from '../default-scatter.js';
import {withMyMaterial} from '../user-material-input.js';
import type {Command} from '../command.js';
import {EXIT, UsageError, type CliIo} from '../io.js';
import {formatOption, joinNegativeValues, parseOptions, quantity, str, unitsOption, type OptionSpec} from '../args.js';
import {JointInputError} from '../../core/joint/index.js';
import {resolveGeometry} from '../../core/joint/resolve.js';
import {nutClassProblem} from '../../core/materials/index.js';
import {formatQuantity} from '../../core/units.js';
import {planRepairs, RepairInputSchema, REPAIR_RANKING_RULE, EFFORT_SCALE_TEXT, type RepairInputDraft, type SolidInsertTable} from '../../core/repair/index.js';
import type {JointInput, JointInputDraft} from '../../core/joint/input.js';
import {CAUTION_LINES} from '../../core/cautions.js';
import type {UnitSystem} from '../../core/units.js';
import {JOINT_OPTIONS, JOINT_OPTIONS_HELP, jointFromOptions, optionFor} from '../joint-options.js';
import {lengthText, planText} from '../../report/repair-text.js';
import {wrapText} from '../../report/wrap.js';
import {readSolidTableFile} from '../solid-table-file.js';
import {planMarkdown} from '../../report/repair-markdown.js';

const OPTIONS: OptionSpec = {
  ...JOINT_OPTIONS,
  'stripped-depth': {type: 'string'},
  through: {type: 'boolean'},
  'depth-available': {type: 'string'},
  wall: {type: 'string'},
  'fixed-length': {type: 'boolean'},
  'through-nut': {type: 'string'},
  'through-nut-height': {type: 'string'},
  'through-nut-flats': {type: 'string'},
  'solid-table': {type: 'string'},
  preset: {type: 'string'},
  json: {type: 'boolean'},
  format: {type: 'string'},
  help: {type: 'boolean', short: 'h'},
};

const HELP = `tapwright repair - ranked fixes for a weak or stripped tapped thread

Usage:
  tapwright repair --thread T --parent ID --engage L [options]
  tapwright repair --preset NAME [options that change the preset]

The joint (the options of tapwright check; see tapwright check --help):
${JOINT_OPTIONS_HELP}
The hole and the repair:
  --stripped-depth L    stripped from the surface to L, good thread below it;
                        "all": the whole engaged length is gone
  --through             the hole goes through the part (a nut can be fitted)
  --depth-available L   depth to the bottom of a blind hole, or the thickness
  --wall L              edge distance: hole centre line to the nearest edge
  --margin M            required margin, 0.5 to 5 (default 1: bolt breaks first)
  --fixed-length        the screw length may not change
  --through-nut CLASS   nut class for the through-bolt option (default: matched
                        to the bolt grade); --through-nut-height L,
                        --through-nut-flats L (default: ISO 4032)
  --solid-table T       solid key-locked insert table: a name from tapwright
                        inserts list, or a JSON file; default: your first
                        stored table, else the shipped demo table (demo
                        values: use the insert maker's data)
  --preset NAME         joint and hole state from a saved or shipped preset
Output:
  --format text|markdown|json   markdown: the work-order report
  --json                the plan as JSON, always SI (same as --format json)
  --help                this text

Lengths take units (12mm, 0.5in); a bare number is in the --units system.
Exit codes: 0 at least one option meets the margin; 3 computed, but none
meets the margin; 2 bad input or usage.

${wrapText(REPAIR_RANKING_RULE, 'Ranking: ', '  ').join('\n')}

Effort grades:
${EFFORT_SCALE_TEXT.split('\n').map(l => `  ${l}`).join('\n')}

${CAUTION_LINES.join('\n')}
`;


/**
 * The solid-insert table: --solid-table names one of the user's stored tables
 * (or the shipped one) or a JSON file; without it, the user's first stored
 * table, else the shipped demo table.
 */
async function chooseTable(given: string | undefined, io: CliIo): Promise<SolidInsertTable> {
  const {openPresetStore} = await import('../../store/presets.js');
  const {configDir} = await import('../../store/paths.js');
  const {defaultSolidTable, findSolidTable} = await import('../../store/solid-tables.js');
  const store = openPresetStore(configDir(io.env));
  for (const w of store.warnings()) io.err(`tapwright: ${w}\n`);
  if (given === undefined) return defaultSolidTable(store);
  if (given.trim() === '') throw new UsageError('--solid-table needs a table name or a file; see tapwright inserts list', '--solid-table');
  return findSolidTable(store, given) ?? (await readSolidTableFile(given, io, '--solid-table', '--solid-table'));
}

/** Nominal diameter of the joint's thread, mm (the joint is already validated, so it parses). */
function throughNominal(thread: string): number {
  return resolveGeometry(thread).nominal;
}

/** "bolt 8.8 in AlSi7Mg-T6", "bolt Rm 900 MPa given in parent Rm 230 MPa", "bolt 8.8 with a class 8 nut", in the display units. */
export function headingParts(joint: JointInput, units: UnitSystem): string {
  const stress = (v: number | undefined) => (v === undefined ? '-' : formatQuantity(v, 'stress', units));
  const custom = joint.boltRm !== undefined || joint.boltRp !== undefined;
  const given = [joint.boltRm !== undefined ? `Rm ${stress(joint.boltRm)}` : '', joint.boltRp !== undefined ? `Rp0.2 ${stress(joint.boltRp)}` : ''].filter(Boolean).join(', ');
  const bolt = custom ? `bolt ${given} given` : `bolt ${joint.boltGrade}`;
  if (joint.internal === 'nut') return `${bolt} with a class ${joint.nutClass ?? '-'} nut`;
  const parent = joint.parent ?? `parent Rm ${stress(joint.parentRm)}${joint.parentShear !== undefined ? `, shear ${stress(joint.parentShear)}` : ''}`;
  return `${bolt} in ${parent}`;
}

const REPAIR_FIELD_OPTION: Record<string, string> = {
  holeState: '--stripped-depth', strippedDepth: '--stripped-depth', depthAvailable: '--depth-available', wall: '--wall',
  margin: '--margin', nutClass: '--through-nut', nutHeight: '--through-nut-height', nutFlats: '--through-nut-flats',
};

async function loadPreset(name: string, io: CliIo): Promise<{joint?: JointInputDraft; repair?: RepairInputDraft}> {
  const {resolvePreset} = await import('../../store/resolve.js');
  const p = resolvePreset(name, io.env, 'joint', m => io.err(`tapwright: ${m}\n`));
  if (!p.joint) throw new UsageError(`--preset "${name}" holds no joint inputs`, '--preset');
  return {joint: p.joint, ...(p.repair ? {repair: p.repair} : {})};
}

export const command: Command = {
  name: 'repair',
  summary: 'ranked repairs for a weak or stripped thread',
  help: HELP,
  async run(args, io) {
    const {values} = parseOptions(joinNegativeValues(args, OPTIONS), OPTIONS, false);
    if (values.help) {
      io.out(HELP);
      return EXIT.ok;
    }
    const format = formatOption(values, ['text', 'markdown', 'json'] as const, 'text');
    const units = unitsOption(values);
    const presetName = str(values, 'preset');
    const preset = presetName === undefined ? {} : await loadPreset(presetName, io);
    let joint = jointFromOptions(values, preset.joint);
    // The settings' default scatter applies when neither --scatter nor a preset gives one.
    if (values.scatter === undefined && presetName === undefined) {
      const d = defaultScatter(io);
      if (d !== 1) joint = {...joint, scatter: d};
    }

    const draft: RepairInputDraft = {...(preset.repair ?? {})};
    if (values.through === true) draft.through = true;
    if (values['fixed-length'] === true) draft.boltLengthMayChange = false;
    const bare = units === 'us' ? 'in' : 'mm';
    const range = (lo: number, hi: number) => (units === 'us' ? `${Number((lo / 25.4).toPrecision(3))} to ${Number((hi / 25.4).toPrecision(4))} in` : `${lo} to ${hi} mm`);
    const len = (option: string, min: number, max: number, extra = '') => {
      const v = str(values, option);
      return v === undefined ? undefined : quantity(`--${option}`, v, 'length', {min, max, defaultUnit: bare, rangeText: range(min, max) + extra});
    };
    const stripped = str(values, 'stripped-depth');
    if (stripped !== undefined) {
      draft.holeState = 'stripped';
      if (stripped.trim().toLowerCase() === 'all') delete draft.strippedDepth;
      else draft.strippedDepth = len('stripped-depth', 0, 2000, ', or "all"');
    }
    const depth = len('depth-available', 0.5, 5000);
    if (depth !== undefined) draft.depthAvailable = depth;
    const wall = len('wall', 0.1, 5000);
    if (wall !== undefined) draft.wall = wall;
    const nutHeight = len('through-nut-height', 0.5, 500);
    if (nutHeight !== undefined) draft.nutHeight = nutHeight;
    const nutFlats = len('through-nut-flats', 1, 1000);
    if (nutFlats !== undefined) draft.nutFlats = nutFlats;
    const nut = str(values, 'through-nut');
    if (nut !== undefined) {
      if (nut.trim() === '') throw new UsageError('--through-nut needs a value, e.g. --through-nut 8', '--through-nut');
      draft.nutClass = nut.trim();
      // An unknown class is bad input (exit 2), not a through-bolt option that "cannot be done".
      const problem = nutClassProblem(draft.nutClass, throughNominal(joint.thread));
      if (problem !== undefined) throw new UsageError(`--through-nut: ${problem}`, '--through-nut');
    }
    if (str(values, 'margin') !== undefined) draft.margin = joint.requiredMargin;
    const table = await chooseTable(str(values, 'solid-table'), io);
    const repair = RepairInputSchema.safeParse(draft);
    if (!repair.success) {
      const issue = repair.error.issues[0];
      const option = REPAIR_FIELD_OPTION[String(issue?.path[0] ?? '')] ?? String(issue?.path[0] ?? '');
      throw new UsageError(`${option}: ${issue?.message ?? 'invalid'}`, option);
    }
    const avail = repair.data.depthAvailable;
    if (avail !== undefined && joint.engagement > avail + 1e-9) {
      const u = units as UnitSystem;
      const what = repair.data.through ? 'the part thickness' : 'the depth to the bottom of the hole';
      throw new UsageError(`--engage ${lengthText(joint.engagement, u)} is more than --depth-available ${lengthText(avail, u)} (${what}); the screw cannot reach further than that`, '--engage');
    }
    if (repair.data.holeState === 'stripped' && repair.data.strippedDepth !== undefined && repair.data.strippedDepth > joint.engagement + 1e-9) {
      const u = units as UnitSystem;
      throw new UsageError(
        `--stripped-depth ${lengthText(repair.data.strippedDepth, u)} is beyond the engaged length (--engage ${lengthText(joint.engagement, u)}); use "all"`,
        '--stripped-depth',
      );
    }

    let plan;
    try {
      // Reasons and notes in the display units; the JSON stays SI throughout.
      plan = planRepairs(await withMyMaterial(joint, io), repair.data, table, format === 'json' ? 'si' : (units as UnitSystem));
    } catch (e) {
      if (e instanceof JointInputError) {
        const option = optionFor(e.field);
        throw new UsageError(`${option}: ${e.messageIn(units)}`, option);
      }
      throw e;
    }
    const anyMeets = plan.options.some(o => o.meetsMargin);
    if (format === 'json') {
      io.out(`${JSON.stringify(plan, null, 2)}\n`);
    } else if (format === 'markdown') {
      io.out(planMarkdown(plan, joint, {date: io.now(), units: units as UnitSystem, ...(presetName !== undefined ? {presetName} : {})}));
    } else {
      const heading = `tapwright repair - ${plan.thread}, ${headingParts(joint, units as UnitSystem)}, engaged ${lengthText(joint.engagement, units as UnitSystem)}`;
      io.out(planText(plan, units as UnitSystem, heading));
    }
    return anyMeets ? EXIT.ok : EXIT.fail;
  },
};
