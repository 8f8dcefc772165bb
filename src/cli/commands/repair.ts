/**
 * `tapwright repair`: ranked fixes for a weak or stripped tapped thread.
 * Takes the check options for the joint plus the state of the hole; prints a
 * ranked 80-column table with the cautions, or the plan as JSON (always SI).
 */
import type {Command} from '../command.js';
import {EXIT, UsageError, type CliIo} from '../io.js';
import {formatOption, parseOptions, str, type OptionSpec} from '../args.js';
import {formatQuantity} from '../../core/units.js';
import {planRepairs, REPAIR_RANKING_RULE, EFFORT_SCALE_TEXT, type RepairInputDraft, type SolidInsertTable} from '../../core/repair/index.js';
import type {JointInput, JointInputDraft} from '../../core/joint/input.js';
import {CAUTION_LINES} from '../../core/cautions.js';
import type {UnitSystem} from '../../core/units.js';
import {JOINT_OPTIONS, JOINT_OPTIONS_HELP, jointFromOptions, jointUsageError, usageErrorOf} from '../joint-options.js';
import {HOLE_ROWS} from '../../app/hole-fields.js';
import {resolveHoleInput} from '../../app/resolve.js';
import {overDraft, readRowOptions, rowHelp, rowOptions} from '../field-options.js';
import {lengthText, planText} from '../../report/repair-text.js';
import {wrapText} from '../../report/wrap.js';
import {readSolidTableFile} from '../solid-table-file.js';
import {planMarkdown} from '../../report/repair-markdown.js';

const OPTIONS: OptionSpec = {
  ...JOINT_OPTIONS,
  ...rowOptions(HOLE_ROWS),
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
${rowHelp(HOLE_ROWS).join('\n')}
  --margin M           required margin, 0.5 to 5 (default 1: bolt breaks first)
  --solid-table T      solid key-locked insert table: a name from tapwright
                       inserts list, or a JSON file; default: your first
                       stored table, else the shipped demo table (demo
                       values: use the insert maker's data)
  --preset NAME        joint and hole state from a saved or shipped preset
Output:
  --format text|markdown|json   markdown: the work-order report
  --json               the plan as JSON, always SI (same as --format json)
  --help               this text

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
    const {values} = parseOptions(args, OPTIONS, false);
    if (values.help) {
      io.out(HELP);
      return EXIT.ok;
    }
    const format = formatOption(values, ['text', 'markdown', 'json'] as const, 'text');
    const presetName = str(values, 'preset');
    const preset = presetName === undefined ? {} : await loadPreset(presetName, io);
    const {input: joint, units} = await jointFromOptions(values, io, preset.joint);
    const draft: RepairInputDraft = overDraft(preset.repair, readRowOptions(HOLE_ROWS, values, units));
    // The plan's margin is the joint's --margin when given.
    if (str(values, 'margin') !== undefined) draft.margin = joint.requiredMargin;
    const table = await chooseTable(str(values, 'solid-table'), io);
    const resolved = resolveHoleInput(draft, {units, joint});
    if (resolved.errors) throw usageErrorOf(resolved.errors[0]!);
    const repair = {data: resolved.input};
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
      plan = planRepairs(joint, repair.data, table, format === 'json' ? 'si' : (units as UnitSystem));
    } catch (e) {
      throw jointUsageError(e, units);
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
