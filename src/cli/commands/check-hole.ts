/**
 * `tapwright check --preset X` with the hole recorded in the preset (its repair
 * inputs): the hole-state flag of the core (holeStateFlags), the hole row of the
 * reports and, when the hole is recorded as stripped, the ranked repair plan in
 * the text and Markdown reports, as the workbench's Report screen carries them.
 */
import type {JointInput} from '../../core/joint/input.js';
import type {RepairInputDraft} from '../../core/repair/input.js';
import type {Flag} from '../../core/types.js';
import type {UnitSystem} from '../../core/units.js';
import {holeStateFlags} from '../../core/joint/hole-flags.js';
import {resolveHoleInput} from '../../app/resolve.js';
import type {HoleFacts} from '../../report/sections.js';
import {planSectionLines, planText, wrapText} from '../../report/index.js';
import type {CliIo} from '../io.js';

/** The repair the preset records as chosen (kind and label: its identity across re-ranks). */
export interface ChosenRepair {
  kind: string;
  label: string;
}

export interface HoleReport {
  hole: HoleFacts;
  flags: Flag[];
  /** Plain-text section (the repair plan) for a stripped hole. */
  text?: string;
  /** Markdown section ("## Repair plan") for a stripped hole. */
  markdown?: string;
}

/**
 * What the preset's hole adds to a check: undefined when the preset records no
 * hole state. `units` are the display units of the report; the flag for the JSON
 * is in SI (the caller asks with 'si').
 */
export async function holeReport(
  draft: Partial<RepairInputDraft> | undefined,
  chosen: ChosenRepair | undefined,
  joint: JointInput,
  units: UnitSystem,
  io: CliIo,
  ascii = false,
): Promise<HoleReport | undefined> {
  if (!draft || (draft.holeState !== 'stripped' && draft.holeState !== 'intact')) return undefined;
  const hole: HoleFacts = {state: draft.holeState, ...(typeof draft.strippedDepth === 'number' ? {strippedDepth: draft.strippedDepth} : {})};
  const flags = holeStateFlags(draft, units, ascii);
  if (draft.holeState !== 'stripped') return {hole, flags};
  const resolved = resolveHoleInput(draft, {units, joint});
  // A preset's hole state that does not resolve leaves the plan out and says why; the check itself stands.
  if (resolved.errors) {
    const why = `Repair plan left out: the preset's hole state does not resolve (${resolved.errors[0]!.label}: ${resolved.errors[0]!.message}).`;
    return {hole, flags, text: why, markdown: `## Repair plan\n\n${why}`};
  }
  const {planRepairs} = await import('../../core/repair/index.js');
  const {openPresetStore} = await import('../../store/presets.js');
  const {configDir} = await import('../../store/paths.js');
  const {defaultSolidTable} = await import('../../store/solid-tables.js');
  const store = openPresetStore(configDir(io.env));
  const plan = planRepairs(joint, resolved.input, defaultSolidTable(store), units);
  const option = chosen ? plan.options.find(o => o.kind === chosen.kind && o.label === chosen.label) : undefined;
  const note = !chosen
    ? 'No repair chosen yet: c on the Repairs screen of the workbench chooses one for the work order.'
    : !option
      ? `Repair chosen: ${chosen.label} is not offered for the joint as it stands now; choose again (c on the Repairs screen).`
      : !option.meetsMargin
        ? `Repair chosen: ${option.label} does not meet the required margin with the inputs as they stand now.`
        : undefined;
  const opt = option ? {chosen: option.rank} : {};
  const text = [planText(plan, units, 'REPAIR PLAN (ranked)', {cautions: false, ...opt}), ...(note ? [wrapText(note, '', '  ').join('\n')] : [])].join('\n');
  const markdown = ['## Repair plan', '', ...(note ? [`**${note}**`, ''] : []), ...planSectionLines(plan, units, {level: 3, ...opt})].join('\n');
  return {hole, flags, text, markdown};
}
