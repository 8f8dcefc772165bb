/**
 * Text in and out of the form fields: what a field shows, and what typed text
 * means. Typed units are converted by the core's unit parser; a bare number is
 * in the unit shown beside the field. Every error names the field and the range.
 */
import {parseQuantity, formatQuantity, formatNumber, displayUnit, toDisplay, type UnitSystem} from '../../core/units.js';
import {fieldBounds, type FieldDef} from './fields.js';

/** A number without trailing zeros, to 5 significant figures ("12", "0.472"). */
export function plain(x: number): string {
  return String(Number(x.toPrecision(5)));
}

export type FieldParse = {ok: true; value: unknown} | {ok: false; error: string};

/** The unit shown beside a field, e.g. "mm", "N·m"; empty for ratios and text. */
export function fieldUnit(f: FieldDef, units: UnitSystem, ascii: boolean): string {
  return f.dimension ? displayUnit(f.dimension, units, ascii) : '';
}

/** The accepted range in display units, e.g. "0.5 to 1000 mm". */
export function rangeText(f: FieldDef, units: UnitSystem, ascii: boolean): string {
  const b = fieldBounds(f.id);
  if (b.min === undefined && b.max === undefined) return '';
  const show = (x: number) => plain(f.dimension ? toDisplay(x, f.dimension, units) : x);
  const unit = fieldUnit(f, units, ascii);
  const lo = b.min !== undefined ? show(b.min) : undefined;
  const hi = b.max !== undefined ? show(b.max) : undefined;
  const span = lo !== undefined && hi !== undefined ? `${lo} to ${hi}` : lo !== undefined ? `at least ${lo}` : `at most ${hi}`;
  return unit ? `${span} ${unit}` : span;
}

/** Value shown in the field when not editing. */
export function formatField(f: FieldDef, value: unknown, units: UnitSystem, ascii: boolean): string {
  if (value === undefined || value === null || value === '') {
    const d = fieldBounds(f.id).default;
    if (d === undefined || d === null) return f.empty ?? (f.optional ? '-' : '(needed)');
    const shown = formatField(f, d, units, ascii);
    return shown.length <= 4 ? `${shown} (default)` : `${shown} (def.)`;
  }
  if (f.text) return f.text.format(value, units, ascii);
  switch (f.kind) {
    case 'quantity':
      return typeof value === 'number' ? formatQuantity(value, f.dimension ?? 'ratio', units, {ascii, significant: f.significant ?? 3}) : String(value);
    case 'ratio':
      return typeof value === 'number' ? (f.integer ? String(Math.round(value)) : formatNumber(value, 3)) : String(value);
    case 'range': {
      const r = typeof value === 'number' ? {min: value, max: value} : (value as {min: number; max: number});
      return r.min === r.max ? formatNumber(r.min, 2) : `${formatNumber(r.min, 2)}..${formatNumber(r.max, 2)}`;
    }
    case 'bool':
      return value ? 'yes' : 'no';
    default:
      return String(value);
  }
}

/** Text put in the edit buffer when editing starts (number without its unit). */
export function editText(f: FieldDef, value: unknown, units: UnitSystem): string {
  if (value === undefined || value === null) return '';
  if (f.text) return f.text.format(value, units, true);
  if (f.kind === 'quantity' && typeof value === 'number') return plain(toDisplay(value, f.dimension ?? 'ratio', units));
  if (f.kind === 'range' || f.kind === 'ratio' || f.kind === 'bool') return formatField(f, value, units, true);
  return String(value);
}

function checkBounds(f: FieldDef, v: number, typed: string, units: UnitSystem, ascii: boolean): string | undefined {
  const b = fieldBounds(f.id);
  if ((b.min !== undefined && v < b.min) || (b.max !== undefined && v > b.max)) {
    return `${f.label}: ${typed.trim()} is out of range; accepted ${rangeText(f, units, ascii)}`;
  }
  return undefined;
}

/**
 * Text that is not a number but a word the row's CLI reader takes ("all"): read
 * through that reader, so the workbench and the CLI accept the same words.
 */
function ownWords(f: FieldDef, t: string, units: UnitSystem): FieldParse | undefined {
  const read = f.row.cli?.read;
  if (!read || /^[-+.\d]/.test(t)) return undefined;
  try {
    const out = read(t, {
      option: f.row.cli?.name ?? f.label,
      units,
      row: f.row,
      quantity: () => {
        throw new Error('not a word');
      },
      range: () => {
        throw new Error('not a word');
      },
    });
    return Object.hasOwn(out, f.row.key) ? {ok: true, value: out[f.row.key]} : undefined;
  } catch {
    return undefined;
  }
}

/** Parse typed text for a field into a working-unit value (undefined = empty). */
export function parseField(f: FieldDef, text: string, units: UnitSystem, ascii: boolean): FieldParse {
  const t = text.trim();
  if (t === '' || t === '-') {
    if (f.optional) return {ok: true, value: undefined};
    const r = rangeText(f, units, ascii);
    return {ok: false, error: `${f.label} is needed${r ? `; accepted ${r}` : ''}`};
  }
  if (f.text) {
    const p = f.text.parse(t, units);
    if (!p.ok) return {ok: false, error: `${f.label}: ${p.error}`};
    const bad = typeof p.value === 'number' ? checkBounds(f, p.value, t, units, ascii) : undefined;
    return bad ? {ok: false, error: bad} : p;
  }
  switch (f.kind) {
    case 'quantity': {
      const dim = f.dimension ?? 'ratio';
      // Words the row's own reader takes (the same as its CLI option: "all" for the stripped depth).
      const own = ownWords(f, t, units);
      if (own) return own;
      const p = parseQuantity(t, dim, displayUnit(dim, units, false));
      if (!p.ok) return {ok: false, error: `${f.label} ${p.error}; accepted ${rangeText(f, units, ascii)}`};
      const bad = checkBounds(f, p.value, t, units, ascii);
      return bad ? {ok: false, error: bad} : {ok: true, value: p.value};
    }
    case 'ratio': {
      const p = parseQuantity(t, 'ratio');
      if (!p.ok) return {ok: false, error: `${f.label} ${p.error}; accepted ${rangeText(f, units, ascii)}`};
      const bad = checkBounds(f, p.value, t, units, ascii);
      return bad ? {ok: false, error: bad} : {ok: true, value: p.value};
    }
    case 'range': {
      const parts = t.split('..');
      const nums = parts.map(s => parseQuantity(s, 'ratio'));
      const accepted = `accepted one value or min..max, each ${rangeText(f, units, ascii)}`;
      if (parts.length > 2 || nums.some(n => !n.ok)) return {ok: false, error: `${f.label}: "${t}" is not a value or min..max; ${accepted}`};
      const [lo, hi] = nums.map(n => (n.ok ? n.value : NaN)) as [number, number?];
      const max = hi ?? lo;
      for (const v of [lo, max]) {
        const bad = checkBounds(f, v, String(v), units, ascii);
        if (bad) return {ok: false, error: `${bad}`};
      }
      if (max < lo) return {ok: false, error: `${f.label}: min ${lo} is above max ${max}; write min..max`};
      return {ok: true, value: {min: lo, max}};
    }
    case 'bool': {
      if (/^(y|yes|1|true)$/i.test(t)) return {ok: true, value: true};
      if (/^(n|no|0|false)$/i.test(t)) return {ok: true, value: false};
      return {ok: false, error: `${f.label}: "${t}"; accepted yes or no`};
    }
    case 'choice': {
      const c = f.choices?.find(x => x.startsWith(t.toLowerCase()));
      return c ? {ok: true, value: c} : {ok: false, error: `${f.label}: "${t}"; accepted ${f.choices?.join(', ')}`};
    }
    default:
      if (t.length > 60) return {ok: false, error: `${f.label} is ${t.length} characters; accepted 1 to 60`};
      return {ok: true, value: t};
  }
}
