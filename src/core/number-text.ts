/**
 * Number text rules for command-line values, kept apart from the quantity parser
 * (units.ts) so any option can use them. Pure: no fs, no process.
 * Source: common practice, no source (input hygiene, not an engineering rule).
 */

/**
 * A number written in decimal ("2", "-0.5", "1.5e3"), or undefined. JavaScript's
 * Number() also reads "0x2", "0b10", "0o7", "Infinity" and "" (as 0); none of
 * those is how a technician writes a count or a size. Unitless.
 */
export function parseDecimal(text: string): number | undefined {
  const t = text.trim();
  if (!/^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i.test(t)) return undefined;
  const v = Number(t);
  return Number.isFinite(v) ? v : undefined;
}

/**
 * The message for a bare fraction ("15/2", "1 1/2", no unit) typed while the display
 * units are SI, else undefined: a fraction is read as inches, which an SI user
 * rarely means (15/2 would be 190.5 mm). Writing the unit ("15/2in") is accepted.
 */
export function bareFractionInSi(text: string, units: 'si' | 'us'): string | undefined {
  if (units !== 'si') return undefined;
  const m = /^\s*(?:(\d+)\s*[- ]\s*)?(\d+)\s*\/\s*(\d+)\s*$/.exec(text);
  if (!m) return undefined;
  const value = Number(m[1] ?? 0) + Number(m[2]) / Number(m[3]);
  const decimal = Number.isFinite(value) ? String(Number(value.toPrecision(6))) : 'a decimal';
  return `${text.trim()}: a fraction is read as inches; write ${decimal} (mm) or ${text.trim().replace(/\s+/g, ' ')}in`;
}
