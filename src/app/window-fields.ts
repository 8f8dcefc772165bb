/**
 * The tightening window's inputs (issue 18), one row each, spread into JOINT_ROWS: the
 * fastener lubricant (sets both friction ranges from its pick), the prevailing-torque locking
 * element, the prevailing torque, the least clamp load and the wrench's accuracy. Their schema
 * is WindowInputSchema (src/core/joint/window-options.ts), the optional `window` object of
 * JointInputSchema, so the keys are dotted ("window.lubricant").
 */
import {fastenerFrictionPick, frictionFromPick} from '../core/joint/friction-picks.js';
import {lockingElement} from '../core/joint/locking.js';
import {lockingProblem, lubricantProblem} from '../core/joint/window-options.js';
import {UsageError} from './errors.js';
import type {JointRow} from './joint-fields.js';

/** The friction inputs a lubricant id sets (both ranges of its pick); none for an unknown id. */
export function lubricantSets(id: unknown): Record<string, unknown> {
  const p = typeof id === 'string' ? fastenerFrictionPick(id) : undefined;
  return p ? frictionFromPick(p) : {};
}

const LUBRICANT_HELP =
  'lubricant or coating of the fastener: sets thread and under-head friction from its published range (--mu-thread/--mu-head given as well win); see the list in the README';

/**
 * The lubricant row comes before the friction rows, so an explicit --mu-thread or --mu-head
 * read after it replaces the pick's range; the other rows follow the friction rows.
 */
export const LUBRICANT_ROWS: readonly JointRow[] = [
  {group: 'joint', key: 'window.lubricant', label: 'Lubricant', empty: 'as typed', step: 'tightening', kind: 'pick', pick: 'fastenerLubricant', optional: true, section: 'window',
    sets: lubricantSets,
    cli: {
      name: '--lubricant', arg: 'ID', help: LUBRICANT_HELP,
      read: (text, {option}) => {
        const problem = lubricantProblem(text);
        if (problem) throw new UsageError(`${option}: ${problem.message}`, option);
        const id = fastenerFrictionPick(text)!.id;
        return {'window.lubricant': id, ...lubricantSets(id)};
      },
    },
    help: 'Surface and lubricant; Enter opens the list with sources. Sets both friction ranges.'},
];

export const WINDOW_ROWS: readonly JointRow[] = [
  {group: 'joint', key: 'window.locking', label: 'Locking element', empty: 'none', step: 'tightening', kind: 'pick', pick: 'lockingElement', optional: true, section: 'window',
    cli: {
      name: '--locking', arg: 'ID', help: 'prevailing-torque locking element: all-metal-nut, polymer-insert-nut or patch-screw; its ISO 2320 prevailing torque is added on the wrench',
      read: (text, {option}) => {
        const problem = lockingProblem(text);
        if (problem) throw new UsageError(`${option}: ${problem.message}`, option);
        return {'window.locking': lockingElement(text)};
      },
    },
    help: 'Lock nut or patch screw; Enter opens the list. Its prevailing torque adds on the wrench.'},
  {group: 'joint', key: 'window.prevailingTorque', label: 'Prevailing torque', empty: 'ISO 2320/none', step: 'tightening', kind: 'quantity', dimension: 'torque', optional: true, section: 'window',
    cli: {name: '--prevailing-torque', arg: 'T', help: 'prevailing torque of the locking element (the maker\'s figure); replaces the ISO 2320 value'},
    help: 'Torque to turn the locking element with no preload; empty = ISO 2320 table value.'},
  {group: 'joint', key: 'window.leastClamp', label: 'Least clamp load', kind: 'quantity', dimension: 'force', optional: true, section: 'window',
    cli: {name: '--least-clamp', arg: 'F', help: 'least preload the service needs at assembly (default: from the service state, else none)'},
    help: 'Least preload the service needs at assembly.'},
  {group: 'joint', key: 'window.wrenchAccuracy', label: 'Wrench accuracy', kind: 'ratio', optional: true, section: 'window',
    cli: {name: '--wrench-accuracy', arg: 'X', help: 'permissible deviation of the torque wrench, 0.04 or 4% (default ISO 6789: 4 % above 10 N·m, 6 % at or below)'},
    help: 'Permissible deviation of the torque wrench.'},
];
