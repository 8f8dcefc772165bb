/**
 * The one reading of a unit system typed by the user (--units of every command
 * and of the workbench): si or us, in any case, spaces around ignored.
 */
import type {UnitSystem} from '../core/units.js';
import {UsageError} from './errors.js';

/** "si", "US", " us " -> the unit system; undefined text -> `fallback`; anything else -> UsageError naming --units. */
export function parseUnitSystem(text: string | undefined, fallback: UnitSystem = 'si'): UnitSystem {
  if (text === undefined) return fallback;
  const u = text.trim().toLowerCase();
  if (u !== 'si' && u !== 'us') throw new UsageError(`--units is "${u}"; accepted: si, us`, '--units');
  return u;
}
