/**
 * The state of the tapped hole, for the repair planner: one row per key of
 * RepairInputSchema (src/core/repair/input.ts) with its `repair` option and
 * its workbench field (Hole state step). A row without a step is on the
 * command line only; a row without an option is in the workbench only.
 */
import type {FieldRow, OptionReader} from './fields-types.js';

/** --stripped-depth L | all: the hole is stripped to L, or over the whole engaged length. */
const strippedDepth: OptionReader = (text, {quantity}) =>
  text.trim().toLowerCase() === 'all' ? {holeState: 'stripped', strippedDepth: undefined} : {holeState: 'stripped', strippedDepth: quantity(text)};

type HoleRow = FieldRow & {group: 'hole'};

export const HOLE_ROWS: readonly HoleRow[] = [
  {group: 'hole', key: 'holeState', label: 'Hole', step: 'hole', kind: 'choice', choices: ['intact', 'stripped'], optional: false,
    help: 'State of the tapped hole, for the repair planner. Enter switches.'},
  {group: 'hole', key: 'strippedDepth', label: 'Stripped to depth', empty: 'all', step: 'hole', kind: 'quantity', dimension: 'length', optional: true,
    isVisible: v => v.hole.holeState === 'stripped',
    cli: {name: '--stripped-depth', arg: 'L', read: strippedDepth, rangeSuffix: ', or "all"',
      help: 'stripped from the surface to L, good thread below it; "all": the whole engaged length is gone'},
    help: 'Thread gone from the surface to this depth; good thread below. "all" or empty: all of it.'},
  {group: 'hole', key: 'through', label: 'Through hole', step: 'hole', kind: 'bool', optional: false,
    cli: {name: '--through', flag: true, help: 'the hole goes through the part (a nut can be fitted)'},
    help: 'yes = a nut can go on the far side. Enter switches.'},
  {group: 'hole', key: 'depthAvailable', label: 'Depth available', empty: 'not given', step: 'hole', kind: 'quantity', dimension: 'length', optional: true,
    cli: {name: '--depth-available', arg: 'L', help: 'depth to the bottom of a blind hole, or the thickness'},
    help: 'To the bottom of a blind hole, or the through-thickness.'},
  {group: 'hole', key: 'wall', label: 'Wall/edge dist.', empty: 'not given', step: 'hole', kind: 'quantity', dimension: 'length', optional: true,
    cli: {name: '--wall', arg: 'L', help: 'edge distance: hole centre line to the nearest edge'},
    help: 'From the hole centre line to the nearest edge; limits oversize repairs.'},
  {group: 'hole', key: 'boltLengthMayChange', label: 'Longer bolt OK', step: 'hole', kind: 'bool', optional: false,
    cli: {name: '--fixed-length', flag: false, help: 'the screw length may not change'},
    help: 'yes = a longer screw may be fitted. Enter switches.'},
  // The margin of the plan is the joint's --margin (requiredMargin); repair copies it when given.
  {group: 'hole', key: 'margin', label: 'Required margin', kind: 'ratio', optional: true,
    help: 'Margin the repairs must reach; empty = the joint\'s required margin.'},
  {group: 'hole', key: 'nutClass', label: 'Through-bolt nut', kind: 'text', optional: true,
    cli: {name: '--through-nut', arg: 'CLASS', help: 'nut class for the through-bolt option (default: matched to the bolt grade)'},
    help: 'Nut class for the through-bolt option.'},
  {group: 'hole', key: 'nutHeight', label: 'Through-bolt nut m', kind: 'quantity', dimension: 'length', optional: true,
    cli: {name: '--through-nut-height', arg: 'L', help: 'height of that nut (default: ISO 4032)'},
    help: 'Height of the through-bolt nut.'},
  {group: 'hole', key: 'nutFlats', label: 'Through-bolt nut s', kind: 'quantity', dimension: 'length', optional: true,
    cli: {name: '--through-nut-flats', arg: 'L', help: 'width across flats of that nut (default: ISO 4032)'},
    help: 'Width across flats of the through-bolt nut.'},
];
