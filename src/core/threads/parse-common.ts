/**
 * Helpers shared by the designation parsers: failure with suggestions, numbers
 * with a decimal comma, inch sizes ("#10", "1/4", "1-1/2", "0.250").
 */
import {nearestDesignations} from './designations.js';

export const IN = 25.4;

/** A failed parse. */
export type Fail = {ok: false; error: string; suggestions?: string[]};

/** A failed parse with the given or the nearest designations as suggestions (no duplicates). */
export function fail(error: string, text: string, suggestions?: string[]): Fail {
  const s = [...new Set(suggestions ?? nearestDesignations(text, 5))];
  return s.length ? {ok: false, error, suggestions: s} : {ok: false, error};
}

/** A number typed with a decimal point or comma. */
export function num(s: string): number {
  return Number(s.replace(',', '.'));
}

/** An inch size: trade label and diameter in inches. */
export interface InchSize {
  label: string;
  inches: number;
}

/** Regular-expression source of an inch size: #10, No. 10, 1-1/2, 1 1/2, 1/4, .250, 0.250, 1. */
export const SIZE_RE = String.raw`(#\s*\d+|no\.?\s*\d+|\d+\s*[- ]\s*\d+\s*/\s*\d+|\d+\s*/\s*\d+|\d*\.\d+|\d+)`;

/** Parse an inch size; numbered sizes D = 0.060 + 0.013N in (ASME B1.1). */
export function inchSize(s: string): InchSize | undefined {
  const t = s.replace(/\s+/g, ' ').trim().toLowerCase();
  let m: RegExpExecArray | null;
  if ((m = /^(?:#|no\.?)\s*(\d+)$/.exec(t))) {
    const n = Number(m[1]);
    return {label: `#${n}`, inches: 0.06 + 0.013 * n};
  }
  if ((m = /^(\d+)\s*[- ]\s*(\d+)\s*\/\s*(\d+)$/.exec(t))) {
    const den = Number(m[3]);
    if (den === 0) return undefined;
    return {label: `${Number(m[1])}-${Number(m[2])}/${den}`, inches: Number(m[1]) + Number(m[2]) / den};
  }
  if ((m = /^(\d+)\s*\/\s*(\d+)$/.exec(t))) {
    const den = Number(m[2]);
    if (den === 0) return undefined;
    return {label: `${Number(m[1])}/${den}`, inches: Number(m[1]) / den};
  }
  const v = Number(t);
  if (!Number.isFinite(v)) return undefined;
  return {label: /\./.test(t) ? v.toFixed(4) : String(v), inches: v};
}

