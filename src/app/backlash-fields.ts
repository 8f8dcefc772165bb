/**
 * The worn nut of a power screw as measured: the axial backlash now and when new, and the
 * margin the nut must keep for the replace-by backlash. One row per key of ScrewInputSchema
 * (src/core/screw/input.ts); the nut wear is worked out from the two backlash values
 * (src/core/screw/backlash.ts) and takes the place of the nut-wear input.
 */
import type {FieldRow} from './fields-types.js';

type ScrewRow = FieldRow & {group: 'screw'};

export const BACKLASH_ROWS: readonly ScrewRow[] = [
  {group: 'screw', key: 'backlash', label: 'Backlash now', step: 'screw-nut', kind: 'quantity', dimension: 'length', significant: 4, optional: true, empty: 'not measured',
    cli: {name: '--backlash', arg: 'B', help: 'axial backlash measured between screw and nut; with --backlash-new it gives the nut wear (replaces --nut-wear)'},
    help: 'Axial play measured now (dial gauge, load reversed); with the new-nut play it gives the nut wear.'},
  {group: 'screw', key: 'backlashNew', label: 'Backlash new', step: 'screw-nut', kind: 'quantity', dimension: 'length', significant: 4, optional: true, empty: 'not given',
    cli: {name: '--backlash-new', arg: 'B0', help: 'axial backlash of the nut when new (or from the class allowance); 0 counts all the play as wear'},
    help: 'Axial play of a new nut (records or class allowance); 0 = all play counted as wear.'},
  {group: 'screw', key: 'backlashMargin', label: 'Keep margin', kind: 'ratio', optional: true,
    cli: {name: '--backlash-margin', arg: 'M', help: 'stripping margin the worn nut must keep, for the replace-by backlash (default 2)'},
    help: 'Stripping margin the worn nut must keep; empty = 2.'},
];
