/**
 * The command-line face of the field table (src/app): the option spec, the
 * --help lines and the reading of option text into a draft, generated from the
 * rows. A bare number is read in the --units system (mm, N, N·m, MPa, m/s or
 * in, lbf, ft·lbf, ksi, ft/min), whatever the command.
 */
import {bareFractionInSi} from '../core/number-text.js';
import {setPath} from '../app/key-path.js';
import {bareUnit, boundsOf, optionRangeText} from '../app/field-table.js';
import type {FieldRow} from '../app/fields-types.js';
import type {UnitSystem} from '../core/units.js';
import {UsageError} from '../app/errors.js';
import {quantity, range, str, type OptionSpec, type ParsedOptions} from './args.js';

/** The parseArgs spec of the rows' options: a flag is boolean, any other option takes a value. */
export function rowOptions(rows: readonly FieldRow[]): OptionSpec {
  const out: OptionSpec = {};
  for (const r of rows) if (r.cli) out[r.cli.name.slice(2)] = {type: r.cli.flag !== undefined ? 'boolean' : 'string'};
  return out;
}

const HELP_COLUMN = 23;

/** Wrap `text` after `head` at column 23, every line within `width` columns. */
export function helpLine(head: string, text: string, width = 80): string[] {
  const lines: string[] = [];
  const pad = ' '.repeat(HELP_COLUMN);
  let line = head.length + 2 <= HELP_COLUMN ? head.padEnd(HELP_COLUMN) : `${head}  `;
  let fresh = true;
  for (const w of text.split(/\s+/).filter(Boolean)) {
    if (!fresh && line.length + 1 + w.length > width) {
      lines.push(line.trimEnd());
      line = pad + w;
    } else line = fresh ? line + w : `${line} ${w}`;
    fresh = false;
  }
  lines.push(line.trimEnd());
  return lines;
}

/** --help lines of the rows' options, in row order. */
export function rowHelp(rows: readonly FieldRow[]): string[] {
  return rows.flatMap(r => (r.cli ? helpLine(`  ${r.cli.name}${r.cli.arg ? ` ${r.cli.arg}` : ''}`, r.cli.help) : []));
}

/** The rows' options in a few lines: "  --thread TEXT, --bolt ID, ..." (for commands that point to another's --help). */
export function rowSummary(rows: readonly FieldRow[], width = 80): string[] {
  const words = rows.flatMap(r => (r.cli ? [`${r.cli.name}${r.cli.arg ? ` ${r.cli.arg}` : ''}`] : []));
  const lines: string[] = [];
  let line = '';
  for (const [i, w] of words.entries()) {
    const piece = `${w}${i < words.length - 1 ? ',' : ''}`;
    if (line !== '' && line.length + 1 + piece.length > width) {
      lines.push(line);
      line = '';
    }
    line = line === '' ? `  ${piece}` : `${line} ${piece}`;
  }
  lines.push(line);
  return lines;
}

/**
 * The draft values set by the rows' options given in `values`: each option read
 * by its row (its own reader, or by kind: a word, a choice, a number with unit,
 * a value or min..max). A key set to undefined is to be removed from a base.
 * Throws UsageError naming the option and the accepted range.
 */
export function readRowOptions(rows: readonly FieldRow[], values: ParsedOptions['values'], units: UnitSystem): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const row of rows) {
    const cli = row.cli;
    if (!cli) continue;
    const name = cli.name.slice(2);
    if (cli.flag !== undefined) {
      if (values[name] === true) out[row.key] = cli.flag;
      continue;
    }
    const text = str(values, name);
    if (text === undefined) continue;
    const o = cli.name;
    const rule = () => {
      const b = boundsOfRow(row);
      const unit = bareUnit(row, units);
      return {...b, ...(unit ? {defaultUnit: unit} : {}), rangeText: optionRangeText(row, units)};
    };
    const q = (t: string) => {
      // A bare fraction is read as inches; in SI on the command line it is refused with both readings.
      const frac = row.dimension === 'length' ? bareFractionInSi(t, units) : undefined;
      if (frac) throw new UsageError(`${o} ${frac}`, o);
      return quantity(o, t, row.dimension ?? 'ratio', rule());
    };
    const r = (t: string) => range(o, t, rule());
    if (cli.read) {
      Object.assign(out, cli.read(text, {option: o, units, row, quantity: q, range: r, other: n => str(values, n)}));
      continue;
    }
    switch (row.kind) {
      case 'quantity':
      case 'ratio':
        out[row.key] = q(text);
        break;
      case 'range':
        out[row.key] = r(text);
        break;
      case 'choice': {
        const v = text.trim().toLowerCase();
        const hit = row.choices?.find(c => c === v);
        if (!hit) throw new UsageError(`${o} is "${text}"; accepted: ${row.choices?.join(', ')}`, o);
        out[row.key] = hit;
        break;
      }
      case 'bool':
        out[row.key] = true;
        break;
      default:
        if (text.trim() === '') throw new UsageError(`${o} needs a value`, o);
        out[row.key] = text.trim();
    }
  }
  return out;
}

function boundsOfRow(row: FieldRow): {min?: number; max?: number} {
  const b = boundsOf(row.group, row.key);
  return {...(b.min !== undefined ? {min: b.min} : {}), ...(b.max !== undefined ? {max: b.max} : {})};
}

/** Apply read option values over a base draft (undefined removes the key; a dotted key sets a member of an object). */
export function overDraft<T extends object>(base: T | undefined, given: Record<string, unknown>): T {
  let d = {...(base ?? {})} as T;
  for (const [k, v] of Object.entries(given)) d = setPath(d, k, v);
  return d;
}
