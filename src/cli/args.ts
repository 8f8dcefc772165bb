/**
 * Option parsing shared by every command: node:util parseArgs in strict mode,
 * with its errors turned into UsageError messages that name the option.
 */
import {parseArgs, type ParseArgsConfig} from 'node:util';
import {parseQuantity, type Dimension, acceptedUnits} from '../core/units.js';
import type {Range} from '../core/types.js';
import {UsageError} from './io.js';

export type OptionSpec = NonNullable<ParseArgsConfig['options']>;

export interface ParsedOptions {
  values: Record<string, string | boolean | string[] | boolean[] | undefined>;
  positionals: string[];
}

export function parseOptions(args: string[], options: OptionSpec, allowPositionals = true): ParsedOptions {
  try {
    const r = parseArgs({args, options, strict: true, allowPositionals});
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
    const unexpected = /Unexpected argument '([^']+)'/.exec(msg);
    if (unexpected) throw new UsageError(`unexpected argument "${unexpected[1]}"; see --help`);
    throw new UsageError(msg.replace(/\. To specify.*$/s, ''));
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
    const units = dimension === 'ratio' ? '' : ` (units: ${acceptedUnits(dimension)})`;
    throw new UsageError(`${option} ${p.error}${range}${units}`, option);
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
