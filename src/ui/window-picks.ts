/**
 * Picker entries for the tightening window's inputs: the fastener lubricant picks (VDI 2230
 * Part 1 friction classes, src/core/joint/friction-picks.ts), the prevailing-torque locking
 * elements (ISO 2320, src/core/joint/locking.ts), and the friction rows for the `t` table on
 * the thread and under-head friction fields. Every entry carries its source.
 */
import {FASTENER_FRICTION} from '../core/joint/friction-picks.js';
import {LOCKING_ELEMENTS} from '../core/joint/locking.js';
import {formatNumber} from '../core/units.js';
import type {PickSource} from '../app/fields-types.js';
import type {PickItem} from './services.js';

const range = (r: {min: number; max: number}) => `${formatNumber(r.min, 2)} to ${formatNumber(r.max, 2)}`;

/** The entries of a window pick source; undefined for any other source. */
export function windowPicks(source: PickSource): PickItem[] | undefined {
  if (source === 'fastenerLubricant') {
    return FASTENER_FRICTION.map(p => ({id: p.id, name: `${p.surface}, ${p.lubricant}`, detail: `muG ${range(p.thread)}, muK ${range(p.head)}`, provenance: p.provenance}));
  }
  if (source === 'fastenerThreadFriction' || source === 'fastenerHeadFriction') {
    const side = source === 'fastenerThreadFriction' ? 'thread' : 'head';
    return FASTENER_FRICTION.map(p => ({
      id: p.id,
      name: `${p.surface}, ${p.lubricant}`,
      detail: `${side === 'thread' ? 'muG' : 'muK'} ${range(p[side])}`,
      provenance: p.provenance,
      value: {...p[side]},
    }));
  }
  if (source === 'lockingElement') {
    return LOCKING_ELEMENTS.map(e => ({id: e.id, name: e.name, detail: 'ISO 2320 prevailing torque by size, added on the wrench', provenance: e.provenance}));
  }
  return undefined;
}
