/**
 * The power screw's inputs, one row per key of ScrewInputSchema
 * (src/core/screw/input.ts), with the option of `tapwright screw` and the
 * workbench field of the power-screw mode. Friction may be given as a pick
 * of the published tables (the readers below).
 */
import {parseDecimal} from '../core/number-text.js';
import {
  collarFrictionPick,
  COLLAR_FRICTION,
  END_CONDITION_IDS,
  threadFrictionPick,
  THREAD_FRICTION,
  THREAD_EXAMPLES,
} from '../core/screw/index.js';
import {DUTY_IDS} from '../core/duty.js';
import {UsageError} from './errors.js';
import type {FieldRow, OptionReader} from './fields-types.js';
import {BACKLASH_ROWS} from './backlash-fields.js';

/** A value, a min..max range, or a row of the thread friction table (Shigley Table 8-5). */
const threadFriction: OptionReader = (text, {option, range}) => {
  const pick = threadFrictionPick(text);
  if (pick) return {muThread: {min: pick.min, max: pick.max}};
  if (/^[a-z]/i.test(text.trim())) {
    throw new UsageError(`${option} "${text}" is not a number or a pick; accepted: 0.01 to 0.6, min..max, or ${THREAD_FRICTION.map(p => p.id).join(', ')}`, option);
  }
  const r = range(text);
  return {muThread: r.min === r.max ? r.min : r};
};

/** A value, or a row of the collar friction table (Shigley Table 8-6), running or :starting. */
const collarFriction: OptionReader = (text, {option, quantity}) => {
  const [id = '', which = 'running'] = text.trim().split(':');
  const pick = collarFrictionPick(id);
  if (pick) {
    if (which !== 'running' && which !== 'starting') throw new UsageError(`${option} "${text}": after ":" write running or starting`, option);
    return {muCollar: which === 'starting' ? pick.starting : pick.running};
  }
  if (/^[a-z]/i.test(text.trim())) {
    throw new UsageError(`${option} "${text}" is not a number or a pick; accepted: 0 to 0.6 or ${COLLAR_FRICTION.map(p => p.id).join(', ')}`, option);
  }
  return {muCollar: quantity(text)};
};

/** A whole number of starts. */
const starts: OptionReader = (text, {option}) => {
  // Decimal digits only: Number() would also read 0x2 or 0b10.
  const n = parseDecimal(text) ?? Number.NaN;
  if (!Number.isInteger(n) || n < 1 || n > 8) throw new UsageError(`${option} is ${text}; accepted: a whole number 1 to 8`, option);
  return {starts: n};
};

type ScrewRow = FieldRow & {group: 'screw'};

export const SCREW_ROWS: readonly ScrewRow[] = [
  {group: 'screw', key: 'thread', label: 'Designation', step: 'screw-thread', kind: 'text', optional: false, example: 'Tr24x5',
    cli: {name: '--thread', arg: 'T', help: THREAD_EXAMPLES},
    help: 'Power thread: Tr24x5, Tr40x14(P7) (multi-start), 1-5 ACME-2G, or square 32x4.'},
  {group: 'screw', key: 'starts', label: 'Starts', step: 'screw-thread', kind: 'ratio', integer: true, optional: true,
    cli: {name: '--starts', arg: 'N', read: starts, help: 'number of starts, 1 to 8 (default 1; Tr40x14(P7) has 2)'},
    help: 'Number of thread starts; a multi-start designation sets it too.'},
  {group: 'screw', key: 'screwMaterial', label: 'Screw material', step: 'screw-thread', kind: 'text', optional: true, empty: 'steel',
    cli: {name: '--screw-material', arg: 'M', help: 'steel (default, C45), alloy-steel, or a steel id'},
    help: 'steel, alloy-steel, or a steel id of the material library; tapwright materials lists them.'},
  {group: 'screw', key: 'screwYield', label: 'Screw yield', step: 'screw-thread', kind: 'quantity', dimension: 'stress', optional: true, empty: 'from material',
    cli: {name: '--screw-yield', arg: 'S', help: 'screw yield strength, 50 to 2500 MPa (overrides)'},
    help: 'Yield strength of the screw from a certificate; empty = the material value.'},
  {group: 'screw', key: 'length', label: 'Free length', step: 'screw-thread', kind: 'quantity', dimension: 'length', optional: true,
    cli: {name: '--length', arg: 'L', help: 'unsupported screw length in compression, 0 to 20 m', rangeText: '0 to 20 000 mm'},
    help: 'Unsupported length of screw in compression, for buckling; 0 = no column check.'},
  {group: 'screw', key: 'ends', label: 'End conditions', step: 'screw-thread', kind: 'choice', choices: END_CONDITION_IDS, optional: false,
    cli: {name: '--ends', arg: 'E', help: `${END_CONDITION_IDS.join(', ')} (default pinned-pinned)`},
    help: 'How the screw ends are held, for buckling. Enter switches.'},
  {group: 'screw', key: 'load', label: 'Axial load', step: 'screw-nut', kind: 'quantity', dimension: 'force', optional: false, example: '6.4kN',
    isVisible: v => v.screw?.torque === undefined || v.screw.torqueSolves === 'friction',
    cli: {name: '--load', arg: 'F', help: 'axial load, 0 to 100 MN (6.4kN, 1500lbf)', rangeText: '0 to 100 MN'},
    help: 'Load the screw lifts or pushes; 20kN or 4500lbf accepted.'},
  {group: 'screw', key: 'loadDirection', label: 'Screw is in', step: 'screw-nut', kind: 'choice', choices: ['compression', 'tension'], optional: false,
    cli: {name: '--direction', arg: 'D', help: 'compression (default) or tension in the loaded screw'},
    help: 'Whether the loaded length of the screw is pushed (compression) or pulled. Enter switches.'},
  {group: 'screw', key: 'nutLength', label: 'Nut length', step: 'screw-nut', kind: 'quantity', dimension: 'length', optional: false, example: '40mm',
    cli: {name: '--nut-length', arg: 'L', help: 'engaged nut length, 0.5 to 2000 mm'},
    help: 'Engaged length of the nut thread.'},
  {group: 'screw', key: 'nutMaterial', label: 'Nut material', step: 'screw-nut', kind: 'text', optional: true,
    cli: {name: '--nut-material', arg: 'M', help: 'bronze (default), cast-iron, steel, brass, plastic, or a material id of tapwright materials'},
    help: 'bronze, cast-iron, steel, plastic, or a material id; tapwright screw --help lists them.'},
  {group: 'screw', key: 'nutWear', label: 'Nut wear', step: 'screw-nut', kind: 'quantity', dimension: 'length', optional: true,
    cli: {name: '--nut-wear', arg: 'W', help: 'nut-thread thickness lost to wear, 0 to 50 mm'},
    help: 'Loss of nut-thread thickness by wear; 0 for a new nut; empty when the backlash gives it.'},
  ...BACKLASH_ROWS,
  {group: 'screw', key: 'speed', label: 'Sliding speed', step: 'screw-nut', kind: 'quantity', dimension: 'speed', optional: true, empty: 'not given',
    cli: {name: '--speed', arg: 'V', help: 'sliding speed at the thread, 0 to 10 m/s (0 = by hand)'},
    help: 'Sliding speed at the thread, for the allowable bearing pressure; 3m/min accepted.'},
  {group: 'screw', key: 'torque', label: 'Known torque', step: 'screw-nut', kind: 'quantity', dimension: 'torque', optional: true, empty: 'not given',
    cli: {name: '--torque', arg: 'T', help: 'known raising torque at the screw, thread and collar (a motor or handwheel torque, 12Nm, 9ft-lbf); solves for what --torque-solves says'},
    help: 'A known raising torque (motor, handwheel); empty = computed from the load.'},
  {group: 'screw', key: 'torqueSolves', label: 'Torque solves', step: 'screw-nut', kind: 'choice', choices: ['load', 'friction'], optional: false,
    isVisible: v => v.screw?.torque !== undefined,
    cli: {name: '--torque-solves', arg: 'W', help: 'with --torque: load (default; the load it raises, replacing --load) or friction (the thread friction it implies at --load)'},
    help: 'load = the load the torque raises; friction = the thread friction it implies. Enter switches.'},
  {group: 'screw', key: 'duty', label: 'Duty', step: 'screw-nut', kind: 'choice', choices: DUTY_IDS, optional: false,
    cli: {name: '--duty', arg: 'D', help: `${DUTY_IDS.join(', ')} (default general): any but general raises WATCH margins to FAIL (lifting: "self-locking only just" too) and asks for a qualified person's sign-off`},
    help: 'Stricter flags and sign-off unless general. Enter switches.'},
  {group: 'screw', key: 'allowablePressure', label: 'Allowable pressure', kind: 'quantity', dimension: 'stress', optional: true,
    cli: {name: '--allowable-pressure', arg: 'P', help: 'safe nut flank pressure, 0.1 to 500 MPa (overrides)'},
    help: 'Safe nut flank pressure; empty = the table value.'},
  {group: 'screw', key: 'muThread', label: 'Thread friction', step: 'screw-friction', kind: 'range', optional: true, table: 'screwThreadFriction',
    cli: {name: '--mu-thread', arg: 'F', read: threadFriction, rangeText: '0.01 to 0.6',
      help: 'thread friction 0.01 to 0.6, a range 0.10..0.16, or a pick such as steel-oil/bronze (default 0.15)'},
    help: 'Thread friction f as one value or min..max, e.g. 0.10..0.15; t picks a row of Shigley Table 8-5.'},
  {group: 'screw', key: 'muCollar', label: 'Collar friction', step: 'screw-friction', kind: 'ratio', optional: true, table: 'screwCollarFriction',
    cli: {name: '--mu-collar', arg: 'F', read: collarFriction,
      help: 'collar friction 0 to 0.6 or a pick such as hard-steel/bronze (running value) or hard-steel/bronze:starting (default 0: rolling bearing)'},
    help: 'Thrust-collar friction fc; 0 with a rolling thrust bearing; t picks a row of Shigley Table 8-6.'},
  {group: 'screw', key: 'collarDiameter', label: 'Collar mean dia', step: 'screw-friction', kind: 'quantity', dimension: 'length', optional: true,
    cli: {name: '--collar-diameter', arg: 'D', help: 'mean collar diameter, 0 to 2000 mm (default 0)'},
    help: 'Mean diameter of the thrust collar; 0 = no collar friction.'},
];
