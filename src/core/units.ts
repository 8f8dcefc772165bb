/**
 * Units: parsing typed quantities ("40Nm", "30 ft-lbf", "12mm", "0.5in") into the
 * core's SI working units, and formatting results for SI or US display.
 *
 * Working units of the core: length mm, force N, torque N·m, stress MPa, speed m/s.
 * Conversion factors are exact by definition (1 in = 25.4 mm; 1 lbf = 4.4482216152605 N,
 * NIST SP 811 Appendix B).
 */
import type {Parsed} from './types.js';

export type Dimension = 'length' | 'force' | 'torque' | 'stress' | 'speed' | 'ratio';
export type UnitSystem = 'si' | 'us';

const LBF_N = 4.4482216152605;
const IN_MM = 25.4;

interface UnitDef {
  /** Factor from this unit to the working unit. */
  factor: number;
  /** Accepted spellings, lower-case, without spaces. */
  names: string[];
  /** How messages write the unit (default: the first name). */
  label?: string;
}

const UNITS: Record<Dimension, UnitDef[]> = {
  length: [
    {factor: 1, names: ['mm']},
    {factor: 10, names: ['cm']},
    {factor: 1000, names: ['m']},
    {factor: 0.001, names: ['um', 'µm', 'μm']},
    {factor: IN_MM, names: ['in', 'inch', 'inches', '"']},
    {factor: IN_MM * 12, names: ['ft', 'feet', "'"]},
    {factor: IN_MM / 1000, names: ['thou', 'mil']},
  ],
  force: [
    {factor: 1, names: ['n'], label: 'N'},
    {factor: 1000, names: ['kn'], label: 'kN'},
    {factor: 1e6, names: ['mn'], label: 'MN'},
    {factor: LBF_N, names: ['lbf', 'lb', 'lbs']},
    {factor: LBF_N * 1000, names: ['kip', 'kips', 'klbf']},
  ],
  torque: [
    {factor: 1, names: ['nm', 'n·m', 'n.m', 'n-m', 'n*m'], label: 'Nm'},
    {factor: 0.001, names: ['nmm', 'n·mm', 'n.mm', 'n-mm', 'n*mm'], label: 'Nmm'},
    {factor: 1000, names: ['knm', 'kn·m', 'kn.m', 'kn-m'], label: 'kNm'},
    {factor: LBF_N * IN_MM * 12 / 1000, names: ['ft-lbf', 'ftlbf', 'ft-lb', 'ftlb', 'ft-lbs', 'ftlbs', 'lbf-ft', 'lbfft', 'lb-ft', 'lbft', 'lbs-ft', 'lbsft', 'ft·lbf', 'lbf·ft']},
    {factor: LBF_N * IN_MM / 1000, names: ['in-lbf', 'inlbf', 'in-lb', 'inlb', 'in-lbs', 'inlbs', 'lbf-in', 'lbfin', 'lb-in', 'lbin', 'lbs-in', 'lbsin', 'in·lbf', 'lbf·in']},
  ],
  stress: [
    {factor: 1, names: ['mpa', 'n/mm2', 'n/mm^2', 'n/mm²'], label: 'MPa'},
    {factor: 1000, names: ['gpa'], label: 'GPa'},
    {factor: 0.001, names: ['kpa'], label: 'kPa'},
    {factor: LBF_N / (IN_MM * IN_MM), names: ['psi']},
    {factor: (LBF_N / (IN_MM * IN_MM)) * 1000, names: ['ksi']},
  ],
  speed: [
    {factor: 1, names: ['m/s']},
    {factor: 1 / 60, names: ['m/min']},
    {factor: 0.3048 / 60, names: ['fpm', 'ft/min']},
    {factor: 0.001, names: ['mm/s']},
  ],
  ratio: [
    {factor: 1, names: ['']},
    {factor: 0.01, names: ['%']},
  ],
};

/** Display unit for each dimension and system, with the factor from working units. */
const DISPLAY: Record<UnitSystem, Record<Dimension, {unit: string; ascii: string; factor: number}>> = {
  si: {
    length: {unit: 'mm', ascii: 'mm', factor: 1},
    force: {unit: 'kN', ascii: 'kN', factor: 1000},
    torque: {unit: 'N·m', ascii: 'N*m', factor: 1},
    stress: {unit: 'MPa', ascii: 'MPa', factor: 1},
    speed: {unit: 'm/s', ascii: 'm/s', factor: 1},
    ratio: {unit: '', ascii: '', factor: 1},
  },
  us: {
    length: {unit: 'in', ascii: 'in', factor: IN_MM},
    force: {unit: 'lbf', ascii: 'lbf', factor: LBF_N},
    torque: {unit: 'ft·lbf', ascii: 'ft*lbf', factor: LBF_N * IN_MM * 12 / 1000},
    stress: {unit: 'ksi', ascii: 'ksi', factor: (LBF_N / (IN_MM * IN_MM)) * 1000},
    speed: {unit: 'ft/min', ascii: 'ft/min', factor: 0.3048 / 60},
    ratio: {unit: '', ascii: '', factor: 1},
  },
};

/** Unit names accepted for a dimension, for messages. */
export function acceptedUnits(dimension: Dimension): string {
  return UNITS[dimension]
    .map(u => u.label ?? u.names[0])
    .filter(n => n !== undefined && n !== '')
    .join(', ');
}

const NUMBER_RE = /^([+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?)\s*(.*)$/i;

/**
 * The message for a number written with a comma, or undefined when there is none. A comma
 * between digits is either a digit group ("5,000" = 5000) or a decimal comma ("5,000" = 5.0);
 * the two readings differ a thousandfold, so neither is guessed: the message names the field
 * (when given) and shows both readings. ISO 80000-1:2009 clause 7.3.2 and NIST SP 811 (2008)
 * section 10.5.3 group digits with a space, never a comma (from memory).
 */
export function commaNumberError(raw: string, field?: string): string | undefined {
  if (!raw.includes(',')) return undefined;
  const num = /^[+-]?[\d.,]*\d/.exec(raw)?.[0] ?? raw;
  const grouped = num.replace(/,/g, '');
  const first = num.indexOf(',');
  const decimalText = num.slice(0, first) + '.' + num.slice(first + 1).replace(/[,.]/g, '');
  const decimalValue = Number(decimalText);
  const decimal = Number.isFinite(decimalValue) ? (Number.isInteger(decimalValue) ? decimalValue.toFixed(1) : String(decimalValue)) : decimalText;
  const readings = grouped.includes('.') || (num.match(/,/g) ?? []).length > 1 ? `write ${grouped}` : `write ${grouped} or ${decimal}`;
  const who = field ? `${field}: ` : '';
  return `${who}${num} has a comma, which may group digits or mark decimals: ${readings} (no commas in numbers)`;
}

/**
 * Parse a typed quantity into working units.
 * A bare number takes `defaultUnit` (a name from the table), or the working unit when omitted.
 * Fractions of an inch are accepted for lengths ("1/2in", "5/16"). A comma is never read as a
 * decimal point or a digit group: the result is an error naming `field` (see commaNumberError).
 */
export function parseQuantity(text: string, dimension: Dimension, defaultUnit?: string, field?: string): Parsed<number> {
  const raw = text.trim();
  if (raw === '') return {ok: false, error: 'is empty; type a number'};
  const comma = commaNumberError(raw, field);
  if (comma !== undefined) return {ok: false, error: comma};
  let value: number;
  let unitText: string;
  const fraction = /^(\d+)\s*\/\s*(\d+)\s*(.*)$/.exec(raw);
  const mixed = /^(\d+)[-\s]+(\d+)\s*\/\s*(\d+)\s*(.*)$/.exec(raw);
  if (mixed && dimension === 'length') {
    value = Number(mixed[1]) + Number(mixed[2]) / Number(mixed[3]);
    unitText = mixed[4] ?? '';
    if (unitText.trim() === '') unitText = 'in';
  } else if (fraction && dimension === 'length') {
    value = Number(fraction[1]) / Number(fraction[2]);
    unitText = fraction[3] ?? '';
    if (unitText.trim() === '') unitText = 'in';
  } else {
    const m = NUMBER_RE.exec(raw);
    if (!m) return {ok: false, error: `"${raw}" is not a number`};
    value = Number(m[1] ?? '');
    unitText = m[2] ?? '';
  }
  if (!Number.isFinite(value)) return {ok: false, error: `"${raw}" is not a finite number`};
  const unitKey = unitText.trim().toLowerCase().replace(/\s+/g, '');
  const wanted = unitKey === '' ? (defaultUnit ?? '').toLowerCase() : unitKey;
  if (wanted === '') return {ok: true, value};
  const def = UNITS[dimension].find(u => u.names.includes(wanted));
  if (!def) {
    return {ok: false, error: `unit "${unitText.trim()}" is not a ${dimension} unit (accepted: ${acceptedUnits(dimension)})`};
  }
  return {ok: true, value: value * def.factor};
}

/** Convert a working-unit value to the display unit of a system. */
export function toDisplay(value: number, dimension: Dimension, system: UnitSystem): number {
  return value / DISPLAY[system][dimension].factor;
}

/** Convert a display-unit value of a system back to working units. */
export function fromDisplay(value: number, dimension: Dimension, system: UnitSystem): number {
  return value * DISPLAY[system][dimension].factor;
}

/** The display unit symbol. */
export function displayUnit(dimension: Dimension, system: UnitSystem, ascii = false): string {
  const d = DISPLAY[system][dimension];
  return ascii ? d.ascii : d.unit;
}

/**
 * Round to a sensible number of significant figures for display (default 3, at least
 * the integer part), without exponent notation for the ranges this tool meets.
 */
export function formatNumber(value: number, significant = 3): string {
  if (!Number.isFinite(value)) return value > 0 ? 'inf' : value < 0 ? '-inf' : 'n/a';
  if (value === 0) return '0';
  const magnitude = Math.floor(Math.log10(Math.abs(value)));
  const decimals = Math.max(0, significant - 1 - magnitude);
  return value.toFixed(Math.min(decimals, 6));
}

/** Format a working-unit value for display: number and unit. */
export function formatQuantity(
  value: number,
  dimension: Dimension,
  system: UnitSystem,
  options: {significant?: number; ascii?: boolean; decimals?: number} = {},
): string {
  const shown = toDisplay(value, dimension, system);
  const text = options.decimals !== undefined ? shown.toFixed(options.decimals) : formatNumber(shown, options.significant ?? 3);
  const unit = displayUnit(dimension, system, options.ascii ?? false);
  return unit === '' ? text : `${text} ${unit}`;
}

/** Exact conversion constants, exported for tests and data tables. */
export const CONVERSION = {LBF_N, IN_MM, PSI_MPA: LBF_N / (IN_MM * IN_MM)} as const;
