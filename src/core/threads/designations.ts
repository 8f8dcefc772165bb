/**
 * The standard designations, for type-ahead lists and for "did you mean"
 * suggestions on a parse error. Built from the series tables.
 */
import type {ThreadFamily} from '../types.js';
import {METRIC_SERIES} from './metric-series.js';
import {UNIFIED_SERIES} from './unified-series.js';
import {ACME_SERIES, TRAPEZOIDAL_SERIES} from './power-series.js';

/** Format a number without trailing zeros ("1.5", "10", "0.75"). */
export function trimNumber(n: number): string {
  return String(Math.round(n * 1e6) / 1e6);
}

function metricList(): string[] {
  const out: string[] = [];
  for (const r of METRIC_SERIES) {
    if (r.coarse !== undefined) out.push(`M${trimNumber(r.d)}`);
    for (const p of r.fine) out.push(`M${trimNumber(r.d)}x${trimNumber(p)}`);
  }
  return out;
}

function unifiedList(): string[] {
  const out: string[] = [];
  for (const r of UNIFIED_SERIES) {
    for (const s of ['UNC', 'UNF', 'UNEF'] as const) {
      const tpi = r[s];
      if (tpi !== undefined) out.push(`${r.label}-${trimNumber(tpi)} ${s}`);
    }
  }
  return out;
}

function trList(): string[] {
  return TRAPEZOIDAL_SERIES.flatMap(r => r.pitches.map(p => `Tr${trimNumber(r.d)}x${trimNumber(p)}`));
}

function acmeList(): string[] {
  return ACME_SERIES.map(r => `${r.label}-${r.tpi} ACME`);
}

const CACHE = new Map<string, readonly string[]>();

/**
 * Standard designations of a family (or of all families), in table order:
 * metric "M10", "M10x1.25"; unified "1/4-20 UNC"; trapezoidal "Tr24x5"; Acme "1-5 ACME".
 * Square threads have no published series and give an empty list.
 */
export function listDesignations(family?: ThreadFamily): readonly string[] {
  const key = family ?? 'all';
  const hit = CACHE.get(key);
  if (hit) return hit;
  let list: string[];
  switch (family) {
    case 'metric':
      list = metricList();
      break;
    case 'unified':
      list = unifiedList();
      break;
    case 'trapezoidal':
      list = trList();
      break;
    case 'acme':
      list = acmeList();
      break;
    case 'square':
      list = [];
      break;
    default:
      list = [...metricList(), ...unifiedList(), ...trList(), ...acmeList()];
  }
  CACHE.set(key, list);
  return list;
}

function normalize(s: string): string {
  return s.toLowerCase().replace(/\u00d7/g, 'x').replace(/\s+/g, '');
}

/** Drop a trailing tolerance class so "M10x1.6-6g" compares as "m10x1.6". */
function core(s: string): string {
  return s
    .replace(/-\d[a-z](\d[a-z])?(\/\d[a-z](\d[a-z])?)?$/, '')
    .replace(/(unc|unf|unef|un)-.*$/, '$1')
    .replace(/(acme)-.*$/, '$1');
}

function levenshtein(a: string, b: string): number {
  const prev = Array.from({length: b.length + 1}, (_, i) => i);
  for (let i = 1; i <= a.length; i++) {
    let diag = prev[0] ?? 0;
    prev[0] = i;
    for (let j = 1; j <= b.length; j++) {
      const up = prev[j] ?? 0;
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      prev[j] = Math.min(up + 1, (prev[j - 1] ?? 0) + 1, diag + cost);
      diag = up;
    }
  }
  return prev[b.length] ?? 0;
}

/** The type-ahead list plus the coarse metric sizes with the pitch written out ("M10x1.5"). */
function nearestPool(family: ThreadFamily | undefined): readonly string[] {
  const key = `near:${family ?? 'all'}`;
  const hit = CACHE.get(key);
  if (hit) return hit;
  const base = family ? listDesignations(family) : listDesignations();
  const explicit = family === undefined || family === 'metric'
    ? METRIC_SERIES.filter(r => r.coarse !== undefined).map(r => `M${trimNumber(r.d)}x${trimNumber(r.coarse ?? 0)}`)
    : [];
  const pool = [...base, ...explicit];
  CACHE.set(key, pool);
  return pool;
}

function guessFamily(s: string): ThreadFamily | undefined {
  if (/^tr/.test(s)) return 'trapezoidal';
  if (s.includes('acme')) return 'acme';
  if (/^m\d/.test(s)) return 'metric';
  if (/un/.test(s) || /^#/.test(s) || /^\d+\/\d+/.test(s)) return 'unified';
  return undefined;
}

/**
 * The n standard designations nearest to a typed text (edit distance on the
 * size-and-pitch part, within the family the text looks like when it is clear).
 */
export function nearestDesignations(text: string, n = 5): string[] {
  const t = core(normalize(text));
  if (t === '' || n <= 0) return [];
  const fam = guessFamily(t);
  const pool = fam ? nearestPool(fam) : nearestPool(undefined);
  return pool
    .map((d, i) => ({d, i, score: levenshtein(t, normalize(d))}))
    .sort((a, b) => a.score - b.score || a.i - b.i)
    .slice(0, n)
    .map(x => x.d);
}
