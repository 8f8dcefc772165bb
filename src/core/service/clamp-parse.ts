/**
 * The `--clamp "T1 M1, T2 M2, ..."` text (shared by the CLI and the workbench):
 * clamped parts from under the head downward. T is a length (a bare number is in the
 * display unit: mm for SI, in for US); M is a material id (a parent material of the
 * library or a stiffness-table id such as `steel`) or an elastic modulus with its unit
 * (`110GPa`, `16Mpsi`, `200000MPa`). Pure: returns the parts or one message naming
 * `--clamp`, the entry and what was expected.
 */
import type {Parsed} from '../types.js';
import {parseQuantity, CONVERSION, type UnitSystem} from '../units.js';
import {didYouMean} from '../materials/suggest.js';
import type {ClampPart} from './input.js';
import {clampMaterialIds, findClampMaterial} from './materials.js';

/** 1 Mpsi in MPa (exact from the definitions of lbf and in). */
export const MPSI_MPA = CONVERSION.PSI_MPA * 1e6;
const MODULUS_MIN = 1000;
const MODULUS_MAX = 500_000;
const STRESS_UNIT_RE = /^(mpa|gpa|kpa|psi|ksi|mpsi|n\/mm2|n\/mm\^2)$/i;
const EXPECTED_M = 'a material id of tapwright materials (e.g. steel, S235, 6061-T6) or a modulus with its unit (110GPa, 16Mpsi)';

export interface ClampParseOptions {
  /** Unit of a bare thickness: mm (si) or in (us). */
  units: UnitSystem;
  /** The user's own material ids, accepted besides the library's. */
  extraIds?: readonly string[];
}

/** A modulus with its unit, MPa; undefined when the text is not a number with a stress unit. */
function parseModulus(text: string): Parsed<number> | undefined {
  const m = /^([+-]?\d*[.,]?\d+(?:e[+-]?\d+)?)\s*([a-z/^0-9]*)$/i.exec(text.trim());
  if (!m) return undefined;
  const unit = (m[2] ?? '').toLowerCase();
  if (unit === '') return {ok: false, error: `"${text}" has no unit; write the modulus with its unit (110GPa, 16Mpsi)`};
  if (!STRESS_UNIT_RE.test(unit)) return undefined;
  const value = unit === 'mpsi' ? Number((m[1] ?? '').replace(',', '.')) * MPSI_MPA : undefined;
  const parsed = value !== undefined ? {ok: true as const, value} : parseQuantity(text, 'stress');
  if (!parsed.ok) return parsed;
  if (!(parsed.value >= MODULUS_MIN && parsed.value <= MODULUS_MAX)) {
    return {ok: false, error: `modulus ${text} is outside 1 to 500 GPa (145 to 72,500 ksi)`};
  }
  return parsed;
}

function entryError(index: number, entry: string, what: string): {ok: false; error: string} {
  return {ok: false, error: `--clamp: entry ${index + 1} "${entry}": ${what}`};
}

/** Parse the clamp list. Thickness in mm in the result; modulus in MPa. */
export function parseClamp(text: string, opts: ClampParseOptions): Parsed<ClampPart[]> {
  if (text.trim() === '') return {ok: false, error: '--clamp is empty; expected "T1 M1, T2 M2, ..." (thickness and material of each clamped part, head side first)'};
  const entries = text.split(/[,;]/).map(e => e.trim());
  if (entries.length > 20) return {ok: false, error: `--clamp has ${entries.length} entries; at most 20 parts`};
  const parts: ClampPart[] = [];
  const defaultUnit = opts.units === 'us' ? 'in' : 'mm';
  for (const [i, entry] of entries.entries()) {
    if (entry === '') return entryError(i, entry, 'is empty; expected a thickness and a material, e.g. "12 steel"');
    let tokens = entry.split(/\s+/);
    // "110 GPa": a number and a stress unit written apart form one modulus token.
    const last = tokens[tokens.length - 1] ?? '';
    if (tokens.length >= 3 && STRESS_UNIT_RE.test(last) && /^[\d.,]+(e[+-]?\d+)?$/i.test(tokens[tokens.length - 2] ?? '')) {
      tokens = [...tokens.slice(0, -2), `${tokens[tokens.length - 2]}${last}`];
    }
    if (tokens.length < 2) return entryError(i, entry, `expected a thickness and a material, e.g. "12 steel" or "0.5 110GPa"; M is ${EXPECTED_M}`);
    const mText = tokens[tokens.length - 1] ?? '';
    const tText = tokens.slice(0, -1).join(' ');
    const t = parseQuantity(tText, 'length', defaultUnit);
    if (!t.ok) return entryError(i, entry, `thickness ${t.error}; expected a length (a bare number is in ${defaultUnit})`);
    if (!(t.value >= 0.05 && t.value <= 2000)) return entryError(i, entry, `thickness ${tText} is outside 0.05 to 2000 mm (0.002 to 78 in)`);
    const modulus = parseModulus(mText);
    if (modulus !== undefined) {
      if (!modulus.ok) return entryError(i, entry, modulus.error);
      parts.push({thickness: t.value, modulus: modulus.value});
      continue;
    }
    const extra = (opts.extraIds ?? []).find(id => id.toLowerCase() === mText.toLowerCase());
    const found = extra ?? findClampMaterial(mText)?.id;
    if (found === undefined) {
      const ids = [...clampMaterialIds(), ...(opts.extraIds ?? [])];
      return entryError(i, entry, `unknown material "${mText}"${didYouMean(mText, ids)}; expected ${EXPECTED_M}`);
    }
    parts.push({thickness: t.value, material: found});
  }
  return {ok: true, value: parts};
}
