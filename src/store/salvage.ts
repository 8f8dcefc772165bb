/**
 * Recovery of presets from a damaged store file (truncated, a stray byte, a
 * bad edit): every complete JSON object in the text that looks like a preset
 * or a quarantine entry is taken back, whatever happened around it.
 */
import {isPlainObject} from './guard.js';
import {presetFromV1} from './migrate.js';

export interface Salvaged {
  presets: unknown[];
  quarantine: unknown[];
}

interface Found {
  start: number;
  end: number;
  key: string | undefined;
  value: Record<string, unknown>;
  what: 'preset' | 'quarantine' | 'v1';
}

/**
 * Every `{` that opens an object with keys is tried as a start, each with a
 * fresh scan to its matching `}`: a stray quote or byte spoils at most the
 * object it sits in, not everything after it.
 */
export function salvage(text: string): Salvaged {
  const v1 = !text.includes('"schemaVersion"') && /"version"\s*:\s*1\b/.test(text);
  const found: Found[] = [];
  const opener = /\{\s*"/g;
  for (let m = opener.exec(text); m; m = opener.exec(text)) {
    const start = m.index;
    opener.lastIndex = start + 1;
    const end = matchingBrace(text, start);
    if (end < 0) continue;
    let value: unknown;
    try {
      value = JSON.parse(text.slice(start, end + 1));
    } catch {
      continue;
    }
    if (!isPlainObject(value)) continue;
    const key = keyBefore(text, start);
    const what = classify(value, key, v1);
    if (what) found.push({start, end, key, value, what});
  }
  // Keep the outermost finds only (a quarantine entry may hold a preset-like raw value).
  const outer = found.filter(f => !found.some(g => g !== f && g.start <= f.start && g.end >= f.end));
  const out: Salvaged = {presets: [], quarantine: []};
  for (const f of outer) {
    if (f.what === 'quarantine') out.quarantine.push(f.value);
    else if (f.what === 'v1') out.presets.push(presetFromV1(f.key ?? 'recovered', f.value));
    else out.presets.push(f.value);
  }
  return out;
}

/** Index of the `}` closing the object opened at `start`, skipping strings; -1 if none. */
function matchingBrace(text: string, start: number): number {
  let depth = 0;
  let inString = false;
  for (let i = start; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (inString) {
      if (c === 92) i++;
      else if (c === 34) inString = false;
      else if (c === 10) return -1; // a raw newline cannot be inside a JSON string: this start is spoiled
    } else if (c === 34) inString = true;
    else if (c === 123 || c === 91) depth++;
    else if (c === 125 || c === 93) {
      depth--;
      if (depth === 0) return c === 125 ? i : -1;
    }
  }
  return -1;
}

/** The property name just before `start` ("key": {...}), if any. */
function keyBefore(text: string, start: number): string | undefined {
  const m = /"((?:[^"\\\n]|\\.)*)"\s*:\s*$/.exec(text.slice(Math.max(0, start - 300), start));
  if (!m) return undefined;
  try {
    return JSON.parse(`"${m[1]}"`) as string;
  } catch {
    return undefined;
  }
}

function classify(v: Record<string, unknown>, key: string | undefined, v1: boolean): Found['what'] | undefined {
  if ('reason' in v && 'raw' in v) return 'quarantine';
  if (typeof v.name === 'string' && typeof v.kind === 'string') return 'preset';
  if (v1 && key !== undefined && typeof v.thread === 'string' && !('name' in v)) return 'v1';
  return undefined;
}
