/**
 * `tapwright check`: compute one joint from options (or a preset) and print the
 * result as text, a Markdown work-order report, or SI JSON.
 * Exit 0 no fail flag, 3 computed with a fail flag, 2 bad input naming the option.
 * The options and the joint come from the field table and the resolver (src/app).
 */
import type {Command} from '../command.js';
import {EXIT, UsageError, type CliIo} from '../io.js';
import {formatOption, parseOptions, str, type OptionSpec} from '../args.js';
import {CAUTION_LINES} from '../../core/cautions.js';
import type {JointInputDraft} from '../../core/joint/input.js';
import {checkJoint} from '../../core/joint/index.js';
import {formatCheckMarkdown, formatCheckText, type WorkOrderNotes} from '../../report/index.js';
import {NOTE_OPTION_SPEC, NOTE_OPTIONS_HELP, noteOptionsGiven, workOrderNotes} from './check-notes.js';
import {holeReport, type ChosenRepair} from './check-hole.js';
import type {RepairInputDraft} from '../../core/repair/input.js';
import {JOINT_OPTIONS, UNITS_HELP, jointFromOptions, jointHelp, jointUsageError} from '../joint-options.js';
import {outlookJson, tighteningOutlook} from '../../app/tightening.js';
import {outlookMarkdown, outlookText} from '../../report/outlook-sections.js';

const OPTIONS: OptionSpec = {...JOINT_OPTIONS, format: {type: 'string'}, json: {type: 'boolean'}, ascii: {type: 'boolean'}, preset: {type: 'string'}, ...NOTE_OPTION_SPEC};

const HELP = `tapwright check - one threaded joint: preload, stresses, load share,
stripping, margins, flags

Usage:
  tapwright check --thread M10x1.5-6H/6g --bolt 8.8 --parent S355 --engage 15
  tapwright check --preset NAME [options that change the preset]

${jointHelp()}
Output
${UNITS_HELP.join('\n')}
  --format text|markdown|json   (--json is short for --format json)
  --ascii              plain ASCII text
${NOTE_OPTIONS_HELP}

Exit codes: 0 no failed check; 3 computed, but a check failed; 2 bad input
or usage.
Methods: VDI 2230 Part 1 tightening; Shigley, Mechanical Engineering Design
9th ed. section 8-2 thread stresses; spring-chain load share; FED-STD-H28/2B
stripping at the least-material limits or the measured diameters; Alexander
(1977) / VDI 2230 engagement. Service state (--clamp): Shigley 9th ed. Eqs.
8-17 to 8-51 and Marks' Calculations for Machine Design Ch. 8 (stiffness,
joint constant, factors, fatigue); VDI 2230 Part 1 (embedding, surface
pressure, slip).

${CAUTION_LINES.join('\n')}
`;

async function loadPreset(name: string, io: CliIo): Promise<{joint: JointInputDraft; notes: WorkOrderNotes; repair?: Partial<RepairInputDraft>; chosen?: ChosenRepair}> {
  const {resolvePreset} = await import('../../store/resolve.js');
  const p = resolvePreset(name, io.env, 'joint', m => io.err(`tapwright: ${m}\n`));
  if (!p.joint) throw new UsageError(`--preset "${name}" holds no joint inputs`, '--preset');
  return {joint: p.joint, notes: p.notes, ...(p.repair ? {repair: p.repair} : {}), ...(p.chosenRepair ? {chosen: p.chosenRepair} : {})};
}

export const command: Command = {
  name: 'check',
  summary: 'compute a joint: preload, stresses, stripping, margins, flags',
  help: HELP,
  async run(args, io) {
    const {values} = parseOptions(args, OPTIONS, false);
    const format = formatOption(values, ['text', 'markdown', 'json'] as const, 'text');
    const noteOptions = noteOptionsGiven(values);
    if (noteOptions.length > 0 && format === 'json') {
      throw new UsageError(`${noteOptions[0]} fills the work-order report; give --format text or markdown with it`, noteOptions[0]);
    }
    const presetName = str(values, 'preset');
    const preset = presetName !== undefined ? await loadPreset(presetName, io) : undefined;
    const notes = format === 'json' ? {} : await workOrderNotes(values, preset?.notes);
    const {input, units} = await jointFromOptions(values, io, preset?.joint);
    let result, outlook;
    try {
      result = checkJoint(input);
      outlook = tighteningOutlook(input, result);
    } catch (e) {
      throw jointUsageError(e, units);
    }
    // The preset's hole state: the core's hole-state flag first (as the workbench shows it), the plan for a stripped hole.
    const ascii = values.ascii === true;
    const fmt = {units, ascii};
    const hole = await holeReport(preset?.repair, preset?.chosen, input, format === 'json' ? 'si' : units, io, ascii);
    if (hole) result = {...result, flags: [...hole.flags, ...result.flags]};
    const meta = {date: io.now(), units, notes, ...(presetName !== undefined ? {presetName} : {}), ...(hole ? {hole: hole.hole} : {})};
    if (format === 'json') {
      io.out(`${JSON.stringify({...result, ...outlookJson(outlook), input, units: 'si', cautions: CAUTION_LINES}, null, 2)}\n`);
    } else if (format === 'markdown') {
      io.out(formatCheckMarkdown(result, input, {...meta, extraSections: [outlookMarkdown(outlook, fmt), ...(hole?.markdown ? [hole.markdown] : [])]}));
    } else {
      io.out(formatCheckText(result, input, {...meta, ascii, extraSections: [outlookText(outlook, fmt), ...(hole?.text ? [hole.text] : [])]}));
    }
    return result.flags.some(f => f.level === 'fail') ? EXIT.fail : EXIT.ok;
  },
};
