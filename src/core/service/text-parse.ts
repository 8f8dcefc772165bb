/**
 * Parsers for the service options typed as text (shared by the CLI and the workbench):
 * `--service-load F` or `MIN..MAX`, and `--embedding LEN|auto`. Pure; a bare number is
 * in the display unit (kN for SI force, lbf for US; mm or in for lengths). Messages name
 * the option and the accepted form and range.
 */
import type {Parsed} from '../types.js';
import {parseQuantity, type UnitSystem} from '../units.js';

const FORCE_MAX = 1e8;

/** `F` (static) or `MIN..MAX` (cycling), N. */
export function parseServiceLoad(text: string, units: UnitSystem): Parsed<number | {min: number; max: number}> {
  const unit = units === 'us' ? 'lbf' : 'kN';
  const one = (t: string): Parsed<number> => {
    const r = parseQuantity(t, 'force', unit);
    if (!r.ok) return {ok: false, error: `--service-load: ${r.error}; expected a force or MIN..MAX (a bare number is in ${unit})`};
    if (!(r.value >= 0 && r.value <= FORCE_MAX)) return {ok: false, error: `--service-load: ${t.trim()} is outside 0 to 100 MN (0 to 22,480 kip)`};
    return r;
  };
  const parts = text.split('..');
  if (parts.length > 2) return {ok: false, error: `--service-load: "${text}" has more than one ".."; expected F or MIN..MAX`};
  if (parts.length === 1) return one(text);
  const lo = one(parts[0] ?? '');
  if (!lo.ok) return lo;
  const hi = one(parts[1] ?? '');
  if (!hi.ok) return hi;
  if (lo.value > hi.value) return {ok: false, error: `--service-load: MIN ${parts[0]?.trim()} is above MAX ${parts[1]?.trim()}; expected MIN..MAX with MIN <= MAX`};
  return {ok: true, value: {min: lo.value, max: hi.value}};
}

/** `auto` or an embedding length, mm (0 switches embedding off); at most 1 mm. */
export function parseEmbedding(text: string, units: UnitSystem): Parsed<number | 'auto'> {
  if (text.trim().toLowerCase() === 'auto') return {ok: true, value: 'auto'};
  const unit = units === 'us' ? 'in' : 'mm';
  const r = parseQuantity(text, 'length', unit);
  if (!r.ok) return {ok: false, error: `--embedding: ${r.error}; expected auto or a length such as 0.008mm or 8um (a bare number is in ${unit})`};
  if (!(r.value >= 0 && r.value <= 1)) return {ok: false, error: `--embedding: ${text.trim()} is outside 0 to 1 mm (0 to 0.039 in)`};
  return r;
}
