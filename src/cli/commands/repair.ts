/**
 * `tapwright repair`: ranked fixes for a weak or stripped tapped thread.
 * Takes the check options for the joint plus the state of the hole; prints a
 * ranked 80-column table with the cautions, or the plan as JSON (always SI).
 */
import {readFile} from 'node:fs/promises';
import path from 'node:path';
import type {Command} from '../command.js';
import {EXIT, UsageError, type CliIo} from '../io.js';
import {parseOptions, quantity, str, type OptionSpec} from '../args.js';
import {JointInputError} from '../../core/joint/index.js';
import {parseSolidInsertTable, planRepairs, RepairInputSchema, REPAIR_RANKING_RULE, EFFORT_SCALE_TEXT, type RepairInputDraft, type SolidInsertTable} from '../../core/repair/index.js';
import {CAUTION_LINES} from '../../core/cautions.js';
import type {UnitSystem} from '../../core/units.js';
import {FIELD_OPTION, JOINT_OPTIONS, jointFromOptions} from './repair-joint.js';
import {lengthText, planText} from './repair-text.js';

const OPTIONS: OptionSpec = {
  ...JOINT_OPTIONS,
  'stripped-depth': {type: 'string'},
  through: {type: 'boolean'},
  'depth-available': {type: 'string'},
  wall: {type: 'string'},
  margin: {type: 'string'},
  'fixed-length': {type: 'boolean'},
  nut: {type: 'string'},
  'nut-height': {type: 'string'},
  'nut-flats': {type: 'string'},
  'solid-table': {type: 'string'},
  units: {type: 'string'},
  json: {type: 'boolean'},
  format: {type: 'string'},
  help: {type: 'boolean', short: 'h'},
};

const HELP = `tapwright repair - ranked fixes for a weak or stripped tapped thread

Usage:
  tapwright repair --thread T --engage L [joint options] [hole options]

Joint (as for tapwright check):
  --thread T            M10, M10x1.25-6H/6g, 1/4-20 UNC-2A/2B
  --bolt G              bolt grade id (default 8.8); --bolt-rm/--bolt-rp MPa
  --parent ID           parent material id; or --parent-rm/--parent-shear MPa
  --engage L            engaged length from the loaded face (the screw reach)
  --chamfer L           length lost to the countersink at the face
  --hole-depth L        drilled-and-tapped depth of the blind hole as it is
  --torque T | --preload F | --utilisation U   tightening (default U 0.9)
  --mu-thread, --mu-head  value or min..max;  --nut-factor K
  --bearing-diameter L, --service-load F, --scatter A
Hole and repair:
  --stripped-depth L    stripped from the surface to L (good thread below);
                        "all" for the whole engaged length
  --through             the hole goes through the part (a nut can be fitted)
  --depth-available L   depth to the bottom of a blind hole, or the thickness
  --wall L              edge distance: hole centre line to the nearest edge
  --margin M            required margin, 0.5 to 5 (default 1: bolt breaks first)
  --fixed-length        the screw length may not change
  --nut C               nut class for the through-bolt (default: matched to
                        the bolt grade); --nut-height L, --nut-flats L
  --solid-table FILE    your solid key-locked insert table (JSON); default:
                        the shipped demo table (demo values: use the insert
                        maker's data)
Output:
  --units si|us         text units (default si); JSON is always SI
  --json                the plan as JSON (same as --format json)
  --help                this text

Lengths take units (12mm, 0.5in); a bare number is mm. Torque: 40Nm, 30ft-lbf.
Exit codes: 0 at least one option meets the margin; 3 computed, none meets
the margin; 2 bad input.

Ranking: ${REPAIR_RANKING_RULE}

Effort grades:
${EFFORT_SCALE_TEXT.split('\n').map(l => `  ${l}`).join('\n')}

${CAUTION_LINES.join('\n')}
`;

async function loadTable(file: string, io: CliIo): Promise<SolidInsertTable> {
  let text: string;
  try {
    text = await readFile(path.resolve(io.cwd, file), 'utf8');
  } catch {
    throw new UsageError(`--solid-table: cannot read "${file}"`, '--solid-table');
  }
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch {
    throw new UsageError(`--solid-table: "${file}" is not JSON`, '--solid-table');
  }
  const t = parseSolidInsertTable(data);
  if (!t.ok) throw new UsageError(`--solid-table: ${t.error}`, '--solid-table');
  return t.value;
}

/** "--wall -3" -> "--wall=-3", so a negative number reaches the range check instead of the option parser. */
function joinNegativeValues(args: string[]): string[] {
  const out: string[] = [];
  for (let i = 0; i < args.length; i++) {
    const a = args[i] as string;
    const next = args[i + 1];
    const name = a.startsWith('--') && !a.includes('=') ? a.slice(2) : undefined;
    if (name !== undefined && OPTIONS[name]?.type === 'string' && next !== undefined && /^-[\d.]/.test(next)) {
      out.push(`${a}=${next}`);
      i++;
    } else {
      out.push(a);
    }
  }
  return out;
}

const REPAIR_FIELD_OPTION: Record<string, string> = {
  strippedDepth: '--stripped-depth', depthAvailable: '--depth-available', wall: '--wall', margin: '--margin',
  nutClass: '--nut', nutHeight: '--nut-height', nutFlats: '--nut-flats',
};

export const command: Command = {
  name: 'repair',
  summary: 'ranked repairs for a weak or stripped thread',
  help: HELP,
  async run(args, io) {
    const {values} = parseOptions(joinNegativeValues(args), OPTIONS, false);
    if (values.help) {
      io.out(HELP);
      return EXIT.ok;
    }
    const format = values.json ? 'json' : (str(values, 'format') ?? 'text');
    if (format !== 'text' && format !== 'json') throw new UsageError(`--format is "${format}"; accepted: text, json`, '--format');
    const units = (str(values, 'units') ?? 'si').toLowerCase();
    if (units !== 'si' && units !== 'us') throw new UsageError(`--units is "${units}"; accepted: si, us`, '--units');
    const margin = str(values, 'margin');
    const marginValue = margin === undefined ? undefined : quantity('--margin', margin, 'ratio', {min: 0.5, max: 5, rangeText: '0.5 to 5'});
    const joint = jointFromOptions(values);
    if (marginValue !== undefined) joint.requiredMargin = marginValue;

    const draft: RepairInputDraft = {through: values.through === true, boltLengthMayChange: values['fixed-length'] !== true};
    const stripped = str(values, 'stripped-depth');
    if (stripped !== undefined) {
      draft.holeState = 'stripped';
      if (stripped.trim().toLowerCase() !== 'all') {
        draft.strippedDepth = quantity('--stripped-depth', stripped, 'length', {min: 0, max: 2000, defaultUnit: 'mm', rangeText: '0 to 2000 mm, or "all"'});
      }
    }
    const len = (option: string, min: number, max: number, text: string) => {
      const v = str(values, option);
      return v === undefined ? undefined : quantity(`--${option}`, v, 'length', {min, max, defaultUnit: 'mm', rangeText: text});
    };
    const depth = len('depth-available', 0.5, 5000, '0.5 to 5000 mm');
    if (depth !== undefined) draft.depthAvailable = depth;
    const wall = len('wall', 0.1, 5000, '0.1 to 5000 mm');
    if (wall !== undefined) draft.wall = wall;
    const nutHeight = len('nut-height', 0.5, 500, '0.5 to 500 mm');
    if (nutHeight !== undefined) draft.nutHeight = nutHeight;
    const nutFlats = len('nut-flats', 1, 1000, '1 to 1000 mm');
    if (nutFlats !== undefined) draft.nutFlats = nutFlats;
    const nut = str(values, 'nut');
    if (nut !== undefined) draft.nutClass = nut;
    if (marginValue !== undefined) draft.margin = marginValue;
    const tableFile = str(values, 'solid-table');
    const table = tableFile === undefined ? undefined : await loadTable(tableFile, io);
    const repair = RepairInputSchema.safeParse(draft);
    if (!repair.success) {
      const issue = repair.error.issues[0];
      const option = REPAIR_FIELD_OPTION[String(issue?.path[0] ?? '')] ?? String(issue?.path[0] ?? '');
      throw new UsageError(`${option}: ${issue?.message ?? 'invalid'}`, option);
    }
    if (repair.data.holeState === 'stripped' && repair.data.strippedDepth !== undefined && repair.data.strippedDepth > joint.engagement) {
      throw new UsageError(`--stripped-depth ${repair.data.strippedDepth} mm is beyond the engaged length (--engage ${joint.engagement} mm); use "all"`, '--stripped-depth');
    }

    let plan;
    try {
      plan = planRepairs(joint, repair.data, table);
    } catch (e) {
      if (e instanceof JointInputError) {
        const option = FIELD_OPTION[e.field] ?? e.field;
        throw new UsageError(`${option}: ${e.message}`, option);
      }
      throw e;
    }
    const anyMeets = plan.options.some(o => o.meetsMargin);
    if (format === 'json') {
      io.out(`${JSON.stringify(plan, null, 2)}\n`);
    } else {
      const materials = joint.parent ?? `parent Rm ${joint.parentRm ?? '-'} MPa`;
      const heading = `tapwright repair - ${plan.thread}, bolt ${joint.boltGrade} in ${materials}, engaged ${lengthText(joint.engagement, units as UnitSystem)}`;
      io.out(planText(plan, units as UnitSystem, heading));
    }
    return anyMeets ? EXIT.ok : EXIT.fail;
  },
};
