/**
 * Flags from the recorded state of the tapped hole (the repair input's
 * holeState and strippedDepth). The joint check computes a sound thread; a hole
 * recorded as stripped makes those results a statement about a thread that is
 * not there, so the flag says so and points to the repairs. Raised by the
 * workbench, and for `check` and the report by any caller that has the hole state.
 */
import type {Flag} from '../types.js';
import {formatQuantity, type UnitSystem} from '../units.js';

/** The part of the hole state the flags read; depth in mm. */
export interface HoleStateInput {
  holeState?: 'intact' | 'stripped' | string;
  strippedDepth?: number;
}

/**
 * Flags for a hole recorded as stripped: one WATCH `hole-stripped`, its depth
 * (mm, shown in `units`) when given; none for an intact or unrecorded hole.
 * No formula: it restates the input (common practice, no source: a check of a
 * sound thread says nothing of a stripped one).
 */
export function holeStateFlags(hole: HoleStateInput | undefined, units: UnitSystem = 'si', ascii = false): Flag[] {
  if (hole?.holeState !== 'stripped') return [];
  const depth = typeof hole.strippedDepth === 'number' ? ` to ${formatQuantity(hole.strippedDepth, 'length', units, {ascii, significant: 3})}` : '';
  return [
    {
      code: 'hole-stripped',
      level: 'watch',
      message: `The hole is recorded as stripped${depth}: the results are for a sound thread. The Repairs screen (r) ranks the fixes.`,
      summary: `Hole stripped${depth}: results assume a sound thread; r: repairs`,
    },
  ];
}
