/**
 * The drills a US shop has: fractional (1/64 in steps to 1 in), number (#1 to #80)
 * and letter (A to Z) sizes, and the name of the one that matches a size.
 * Decimal sizes as tabulated for twist drills (ASME B94.11M; the number and letter
 * sizes here are from memory of the common drill-size tables: verify against the
 * drill before use).
 */
import {CONVERSION} from './units.js';

/** Letter drills A..Z, inches. */
const LETTER: readonly number[] = [
  0.234, 0.238, 0.242, 0.246, 0.25, 0.257, 0.261, 0.266, 0.272, 0.277, 0.281, 0.29, 0.295,
  0.302, 0.316, 0.323, 0.332, 0.339, 0.348, 0.358, 0.368, 0.377, 0.386, 0.397, 0.404, 0.413,
];

/** Number drills #1..#80, inches. */
const NUMBER: readonly number[] = [
  0.228, 0.221, 0.213, 0.209, 0.2055, 0.204, 0.201, 0.199, 0.196, 0.1935,
  0.191, 0.189, 0.185, 0.182, 0.18, 0.177, 0.173, 0.1695, 0.166, 0.161,
  0.159, 0.157, 0.154, 0.152, 0.1495, 0.147, 0.144, 0.1405, 0.136, 0.1285,
  0.12, 0.116, 0.113, 0.111, 0.11, 0.1065, 0.104, 0.1015, 0.0995, 0.098,
  0.096, 0.0935, 0.089, 0.086, 0.082, 0.081, 0.0785, 0.076, 0.073, 0.07,
  0.067, 0.0635, 0.0595, 0.055, 0.052, 0.0465, 0.043, 0.042, 0.041, 0.04,
  0.039, 0.038, 0.037, 0.036, 0.035, 0.033, 0.032, 0.031, 0.0292, 0.028,
  0.026, 0.025, 0.024, 0.0225, 0.021, 0.02, 0.018, 0.016, 0.0145, 0.0135,
];

export interface InchDrill {
  /** "27/64", "Q", "#7". */
  name: string;
  /** Diameter, inches. */
  inches: number;
}

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/** Every drill of the three series, smallest first. */
export const INCH_DRILLS: readonly InchDrill[] = [
  ...Array.from({length: 64}, (_, i) => {
    const n = i + 1;
    const g = gcd(n, 64);
    return {name: n === 64 ? '1' : `${n / g}/${64 / g}`, inches: n / 64};
  }),
  ...LETTER.map((inches, i) => ({name: String.fromCharCode(65 + i), inches})),
  ...NUMBER.map((inches, i) => ({name: `#${i + 1}`, inches})),
].sort((a, b) => a.inches - b.inches);

/** How close a drill must be to count as that size: half a thousandth of an inch. */
const MATCH_IN = 0.0005;

/** The drill of the three series nearest to `mm`, and whether it matches within 0.0005 in. */
export function nearestInchDrill(mm: number): InchDrill & {exact: boolean} {
  const inches = mm / CONVERSION.IN_MM;
  let best = INCH_DRILLS[0] as InchDrill;
  for (const d of INCH_DRILLS) if (Math.abs(d.inches - inches) < Math.abs(best.inches - inches)) best = d;
  return {...best, exact: Math.abs(best.inches - inches) <= MATCH_IN};
}

/**
 * A drill size for a US shop: "27/64 (0.4219 in)" or "Q (0.3320 in)" when a standard
 * drill matches, else the decimal with the nearest drill: "0.4100 in (nearest Y 0.404)".
 */
export function inchDrillLabel(mm: number): string {
  const inches = mm / CONVERSION.IN_MM;
  const d = nearestInchDrill(mm);
  if (d.exact) return `${d.name} (${inches.toFixed(4)} in)`;
  return `${inches.toFixed(4)} in (nearest ${d.name} ${d.inches.toFixed(4).replace(/0$/, '')})`;
}

/**
 * An inch length as a fraction when it is a whole number of 64ths within 0.0001 in
 * ("3/4", "1 1/2"), else undefined.
 */
export function inchFraction(inches: number): string | undefined {
  const n = Math.round(inches * 64);
  if (n <= 0 || Math.abs(n / 64 - inches) > 1e-4) return undefined;
  const whole = Math.floor(n / 64);
  const rest = n % 64;
  if (rest === 0) return String(whole);
  const g = gcd(rest, 64);
  const frac = `${rest / g}/${64 / g}`;
  return whole > 0 ? `${whole} ${frac}` : frac;
}

/**
 * A size range of a material row in words, in the display units: "6.35 mm < d <= 19.05 mm",
 * "1/4 in < d <= 3/4 in", "d <= 16 mm". Empty when the row has no size limits. Row limits
 * are in mm; a limit within 0.02 mm of a 64th of an inch is shown as that fraction in US units.
 */
export function sizeRangeWords(r: {sizeMinMm?: number | undefined; sizeMaxMm?: number | undefined}, units: 'si' | 'us'): string {
  const len = (mm: number): string => {
    if (units === 'si') return `${Number(mm.toFixed(2))} mm`;
    const inches = mm / CONVERSION.IN_MM;
    const n = Math.round(inches * 64);
    const frac = Math.abs(n / 64 - inches) * CONVERSION.IN_MM <= 0.02 ? inchFraction(n / 64) : undefined;
    return `${frac ?? Number(inches.toFixed(3))} in`;
  };
  const lo = r.sizeMinMm !== undefined ? `${len(r.sizeMinMm)} < ` : '';
  const hi = r.sizeMaxMm !== undefined ? ` <= ${len(r.sizeMaxMm)}` : '';
  return lo === '' && hi === '' ? '' : `${lo}d${hi}`;
}
