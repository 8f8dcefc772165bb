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

/** Scan text for balanced {...} spans, skipping strings; returns candidates with the key before them. */
export function salvage(text: string): Salvaged {
  const v1 = !text.includes('"schemaVersion"') && /"version"\s*:\s*1\b/.test(text);
  const stack: Array<{start: number; key: string | undefined}> = [];
  const found: Found[] = [];
  let inString = false;
  let strStart = -1;
  let lastString: string | undefined;
  let lastStringEnd = -1;
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if (inString) {
      if (c === '\\') i++;
      else if (c === '"') {
        inString = false;
        try {
          lastString = JSON.parse(text.slice(strStart, i + 1)) as string;
        } catch {
          lastString = undefined;
        }
        lastStringEnd = i;
      }
      continue;
    }
    if (c === '"') {
      inString = true;
      strStart = i;
    } else if (c === '{') {
      // The key of this object when the text before it is `"key" :`.
      const between = lastStringEnd >= 0 ? text.slice(lastStringEnd + 1, i) : '';
      stack.push({start: i, key: /^\s*:\s*$/.test(between) ? lastString : undefined});
    } else if (c === '}') {
      const open = stack.pop();
      if (!open) continue;
      let value: unknown;
      try {
        value = JSON.parse(text.slice(open.start, i + 1));
      } catch {
        continue;
      }
      if (!isPlainObject(value)) continue;
      const what = classify(value, open.key, v1);
      if (what) found.push({start: open.start, end: i, key: open.key, value, what});
    }
  }
  // Keep the outermost finds only (a quarantine entry may hold a preset-like raw value).
  const outer = found.filter(f => !found.some(g => g !== f && g.start < f.start && g.end > f.end));
  const out: Salvaged = {presets: [], quarantine: []};
  for (const f of outer.sort((a, b) => a.start - b.start)) {
    if (f.what === 'quarantine') out.quarantine.push(f.value);
    else if (f.what === 'v1') out.presets.push(presetFromV1(f.key ?? 'recovered', f.value));
    else out.presets.push(f.value);
  }
  return out;
}

function classify(v: Record<string, unknown>, key: string | undefined, v1: boolean): Found['what'] | undefined {
  if ('reason' in v && 'raw' in v) return 'quarantine';
  if (typeof v.name === 'string' && typeof v.kind === 'string') return 'preset';
  if (v1 && key !== undefined && typeof v.thread === 'string' && !('name' in v)) return 'v1';
  return undefined;
}
