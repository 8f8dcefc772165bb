/**
 * Option parsing shared by every command: node:util parseArgs in strict mode,
 * with its errors turned into UsageError messages that name the option.
 */
import {parseArgs, type ParseArgsConfig} from 'node:util';
import {parseQuantity, type Dimension, acceptedUnits} from '../core/units.js';
import type {Range} from '../core/types.js';
import {UsageError} from './io.js';
import {parseUnitSystem} from '../app/units-option.js';
import {refuseOptionShapes} from './repeated-options.js';

export type OptionSpec = NonNullable<ParseArgsConfig['options']>;

export interface ParsedOptions {
  values: Record<string, string | boolean | string[] | boolean[] | undefined>;
  positionals: string[];
}

/**
 * "--load -5" -> "--load=-5" for an option that takes a value, so a negative
 * number reaches the option's range check (and its message naming the range)
 * instead of the parser's "argument is ambiguous".
 */
export function joinNegativeValues(args: string[], options: OptionSpec): string[] {
  const out: string[] = [];
  for (let i = 0; i < args.length; i++) {
    const a = args[i] as string;
    const next = args[i + 1];
    const name = a.startsWith('--') && !a.includes('=') ? a.slice(2) : undefined;
    if (name !== undefined && options[name]?.type === 'string' && next !== undefined && /^-[\d.]/.test(next)) {
      out.push(`${a}=${next}`);
      i++;
    } else out.push(a);
  }
  return out;
}

export function parseOptions(args: string[], options: OptionSpec, allowPositionals = true): ParsedOptions {
  refuseOptionShapes(args, options);
  try {
    const r = parseArgs({args: joinNegativeValues(args, options), options, strict: true, allowPositionals});
    return {values: r.values as ParsedOptions['values'], positionals: r.positionals};
  } catch (e) {
    const msg = e instanceof Error ? e.message : String(e);
    const unknown = /Unknown option '([^']+)'/.exec(msg);
    if (unknown) throw new UsageError(`unknown option ${unknown[1]}; see --help for the options`, unknown[1]);
    const needsValue = /Option '([^']+?)(?: <value>)?' argument missing/.exec(msg);
    if (needsValue) {
      const name = needsValue[1]?.split(',').pop()?.trim() ?? '';
      throw new UsageError(`${name} needs a value`, name);
    }
    const ambiguous = /Option '([^']+?)(?: <value>)?' argument is ambiguous/.exec(msg);
    if (ambiguous) {
      const name = ambiguous[1]?.split(',').pop()?.trim() ?? '';
      throw new UsageError(`${name} needs a value; a value starting with "-" is written ${name}=-VALUE`, name);
    }
    const unexpected = /Unexpected argument '([^']+)'/.exec(msg);
    if (unexpected) throw new UsageError(`unexpected argument "${unexpected[1]}"; see --help`);
    throw new UsageError(msg.replace(/\.?\s*(Did you forget|To specify).*$/s, ''));
  }
}

/** The string value of an option, or undefined. */
export function str(values: ParsedOptions['values'], name: string): string | undefined {
  const v = values[name];
  if (v === undefined || typeof v === 'boolean') return undefined;
  if (Array.isArray(v)) {
    const last = v[v.length - 1];
    return typeof last === 'string' ? last : undefined;
  }
  return v;
}

export interface QuantityRule {
  /** Smallest accepted value in working units (inclusive unless exclusiveMin). */
  min?: number;
  max?: number;
  exclusiveMin?: boolean;
  /** Unit assumed for a bare number, e.g. "mm", "Nm", "MPa". */
  defaultUnit?: string;
  /** How to print the range in the message, e.g. "0.5 to 500 mm". */
  rangeText?: string;
}

/** Parse an option carrying a quantity with an optional unit; throws UsageError naming the option. */
export function quantity(option: string, text: string, dimension: Dimension, rule: QuantityRule = {}): number {
  const p = parseQuantity(text, dimension, rule.defaultUnit);
  const range = rule.rangeText ? `; accepted: ${rule.rangeText}` : '';
  if (!p.ok) {
    // The parser's message may list the units already ("... (accepted: mm, in, ...)"): say them once.
    const error = p.error.replace('(accepted: ', '(units: ');
    const units = dimension === 'ratio' || error.includes('(units: ') ? '' : ` (units: ${acceptedUnits(dimension)})`;
    throw new UsageError(`${option} ${error}${range}${units}`, option);
  }
  const v = p.value;
  const belowMin = rule.min !== undefined && (rule.exclusiveMin ? v <= rule.min : v < rule.min);
  const aboveMax = rule.max !== undefined && v > rule.max;
  if (belowMin || aboveMax) throw new UsageError(`${option} is ${text.trim()}, out of range${range || ''}`, option);
  return v;
}

/** Parse "0.12" or "0.10..0.16" (also "0.10-0.16" is not accepted: ambiguous with negatives). */
export function range(option: string, text: string, rule: QuantityRule = {}): Range {
  const parts = text.split('..');
  if (parts.length > 2) throw new UsageError(`${option} takes a value or min..max, got "${text}"`, option);
  const min = quantity(option, parts[0] ?? '', 'ratio', rule);
  const max = parts.length === 2 ? quantity(option, parts[1] ?? '', 'ratio', rule) : min;
  if (max < min) throw new UsageError(`${option} range ${text}: min must not exceed max`, option);
  return {min, max};
}

/** --units si|us, the same check and wording in every command (src/app/units-option.ts); `si` when not given. */
export function unitsOption(values: ParsedOptions['values']): 'si' | 'us' {
  return parseUnitSystem(str(values, 'units'));
}

/**
 * --format F with --json as its short form, the same wording in every command:
 * F must be one of `accepted`; --json with another --format is a contradiction.
 */
export function formatOption<F extends string>(values: ParsedOptions['values'], accepted: readonly F[], fallback: F): F | 'json' {
  const f = str(values, 'format')?.trim().toLowerCase();
  if (f !== undefined && !(accepted as readonly string[]).includes(f)) throw new UsageError(`--format is "${f}"; accepted: ${accepted.join(', ')}`, '--format');
  if (values.json === true) {
    if (f !== undefined && f !== 'json') throw new UsageError(`--json and --format ${f} contradict each other; give one`, '--json');
    return 'json';
  }
  return (f as F | undefined) ?? fallback;
}
