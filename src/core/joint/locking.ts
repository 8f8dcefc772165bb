/**
 * Prevailing-torque locking elements: an all-metal lock nut, a polymer-insert lock nut or a
 * screw with a locking patch turns against a prevailing torque that makes no preload, so the
 * wrench must be set to the tightening torque plus the prevailing torque.
 *
 * Data: ISO 2320 (2008 edition, "Prevailing torque type steel nuts - Mechanical and performance
 * properties"), table of test torques: the maximum prevailing-on torque at the first installation
 * and the minimum prevailing-off torques at the first and fifth removal, N·m, coarse thread M3 to M39
 * (fine threads of the same diameter take the same values). Read in a secondary reproduction of the
 * table printed for property class 04; that the same values hold for the other property classes, and
 * for both the all-metal and the non-metallic insert types, is from memory. ISO 2320:2015 covers M5 to
 * M39 and moved M3/M4 to an annex; whether its values equal these was not checked.
 * Units: N·m, mm.
 */
import type {Provenance} from '../types.js';

export interface PrevailingTorqueRow {
  /** Nominal diameter d, mm. */
  d: number;
  /** Maximum prevailing-on torque at the first installation, N·m. */
  firstOnMax: number;
  /** Minimum prevailing-off torque at the first removal, N·m. */
  firstOffMin: number;
  /** Minimum prevailing-off torque at the fifth removal, N·m. */
  fifthOffMin: number;
}

export const ISO_2320_SOURCE: Provenance = {
  source:
    'ISO 2320:2008, table of prevailing torques (first installation max, first and fifth removal min), as reproduced for property class 04; use for other classes and both nut types from memory',
  kind: 'standard',
};

/** ISO 2320:2008 prevailing torques, N·m, by nominal diameter (see the file comment for the source). */
export const ISO_2320_PREVAILING: readonly PrevailingTorqueRow[] = [
  {d: 3, firstOnMax: 0.43, firstOffMin: 0.12, fifthOffMin: 0.08},
  {d: 4, firstOnMax: 0.9, firstOffMin: 0.18, fifthOffMin: 0.12},
  {d: 5, firstOnMax: 1.6, firstOffMin: 0.29, fifthOffMin: 0.2},
  {d: 6, firstOnMax: 3, firstOffMin: 0.45, fifthOffMin: 0.3},
  {d: 7, firstOnMax: 4.5, firstOffMin: 0.65, fifthOffMin: 0.45},
  {d: 8, firstOnMax: 6, firstOffMin: 0.85, fifthOffMin: 0.6},
  {d: 10, firstOnMax: 10.5, firstOffMin: 1.5, fifthOffMin: 1},
  {d: 12, firstOnMax: 15.5, firstOffMin: 2.3, fifthOffMin: 1.6},
  {d: 14, firstOnMax: 24, firstOffMin: 3.3, fifthOffMin: 2.3},
  {d: 16, firstOnMax: 32, firstOffMin: 4.5, fifthOffMin: 3},
  {d: 18, firstOnMax: 42, firstOffMin: 6, fifthOffMin: 4.2},
  {d: 20, firstOnMax: 54, firstOffMin: 7.5, fifthOffMin: 5.3},
  {d: 22, firstOnMax: 68, firstOffMin: 9.5, fifthOffMin: 6.5},
  {d: 24, firstOnMax: 80, firstOffMin: 11.5, fifthOffMin: 8},
  {d: 27, firstOnMax: 94, firstOffMin: 13.5, fifthOffMin: 10},
  {d: 30, firstOnMax: 108, firstOffMin: 16, fifthOffMin: 12},
  {d: 33, firstOnMax: 122, firstOffMin: 18, fifthOffMin: 14},
  {d: 36, firstOnMax: 136, firstOffMin: 21, fifthOffMin: 16},
  {d: 39, firstOnMax: 150, firstOffMin: 23, fifthOffMin: 18},
];

export type LockingElement = 'all-metal-nut' | 'polymer-insert-nut' | 'patch-screw';

export const LOCKING_ELEMENTS: readonly {id: LockingElement; name: string; provenance: Provenance}[] = [
  {id: 'all-metal-nut', name: 'all-metal prevailing-torque lock nut', provenance: ISO_2320_SOURCE},
  {id: 'polymer-insert-nut', name: 'polymer-insert (non-metallic insert) lock nut', provenance: ISO_2320_SOURCE},
  {
    id: 'patch-screw',
    name: 'screw with a locking patch',
    provenance: {
      source:
        'no patch-screw table in this program: the ISO 2320:2008 nut values are used as an estimate (common practice, no source; that patch screws are of the same order is from memory); use the maker\'s figure with --prevailing-torque',
      kind: 'memory',
    },
  },
];

export interface PrevailingTorque {
  element: LockingElement;
  /** Maximum prevailing torque at the first installation, N·m (the one to add to the wrench). */
  torque: number;
  /** Minimum prevailing-off torques at the first and fifth removal, N·m (a reused nut below these is worn out). */
  firstOffMin: number;
  fifthOffMin: number;
  provenance: Provenance;
}

/**
 * The first-installation maximum prevailing torque of a locking element on a metric thread of
 * nominal diameter d (mm), N·m, from ISO 2320:2008 (see ISO_2320_PREVAILING). Undefined when the
 * size is not in the table (inch threads and sizes between rows included): give the torque.
 */
export function prevailingTorque(element: LockingElement, nominalMm: number): PrevailingTorque | undefined {
  const row = ISO_2320_PREVAILING.find(r => Math.abs(r.d - nominalMm) < 0.01);
  const el = LOCKING_ELEMENTS.find(e => e.id === element);
  if (!row || !el) return undefined;
  return {element, torque: row.firstOnMax, firstOffMin: row.firstOffMin, fifthOffMin: row.fifthOffMin, provenance: el.provenance};
}

/** The locking element with this id ("polymer-insert-nut"), or undefined. */
export function lockingElement(id: string): LockingElement | undefined {
  const key = id.trim().toLowerCase().replace(/[\s_]+/g, '-');
  return LOCKING_ELEMENTS.find(e => e.id === key)?.id;
}

/**
 * The torque to set on the wrench, N·m: tightening torque + prevailing torque. The prevailing
 * torque turns the locking feature and makes no preload (ISO 2320 defines it as the torque to
 * turn the nut with no axial load), so it is added on top of the torque that makes the preload.
 */
export function wrenchTorque(tighteningTorque: number, prevailing: number): number {
  return tighteningTorque + prevailing;
}
