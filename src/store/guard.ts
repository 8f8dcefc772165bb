/**
 * Defensive JSON reading for files that come from outside (imports) or may be
 * damaged (the store itself): size limit, nesting limit, forbidden keys.
 */

/** Largest preset file accepted by import, and largest store file read. */
export const MAX_IMPORT_BYTES = 1024 * 1024;
export const MAX_IMPORT_TEXT = '1 MiB';
/** Deepest nesting of objects and arrays accepted (a preset needs about 5). */
export const MAX_DEPTH = 32;
/** Keys that could reach an object's prototype if a later step merged the data. */
export const FORBIDDEN_KEYS = ['__proto__', 'constructor', 'prototype'] as const;

export function isPlainObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** Deepest object/array nesting in JSON text, counted without parsing (strings are skipped). */
export function jsonDepth(text: string): number {
  let depth = 0;
  let max = 0;
  let inString = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (inString) {
      if (c === 92 /* \ */) i++;
      else if (c === 34 /* " */) inString = false;
    } else if (c === 34) inString = true;
    else if (c === 123 || c === 91) {
      depth++;
      if (depth > max) max = depth;
    } else if (c === 125 || c === 93) depth--;
  }
  return max;
}

/** Path of the first forbidden key, e.g. "presets[0].joint.__proto__", or undefined. */
export function findForbiddenKey(value: unknown, path = ''): string | undefined {
  const stack: Array<{v: unknown; p: string}> = [{v: value, p: path}];
  while (stack.length) {
    const {v, p} = stack.pop()!;
    if (Array.isArray(v)) v.forEach((x, i) => stack.push({v: x, p: `${p}[${i}]`}));
    else if (isPlainObject(v)) {
      for (const k of Object.keys(v)) {
        const at = p ? `${p}.${k}` : k;
        if ((FORBIDDEN_KEYS as readonly string[]).includes(k)) return at;
        stack.push({v: v[k], p: at});
      }
    }
  }
  return undefined;
}

export type GuardedJson = {ok: true; value: unknown} | {ok: false; error: string};

/** Parse JSON text with the depth and key checks; never throws. */
export function parseGuarded(text: string, maxDepth = MAX_DEPTH): GuardedJson {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  if (body.trim() === '') return {ok: false, error: 'the file is empty'};
  const depth = jsonDepth(body);
  if (depth > maxDepth) return {ok: false, error: `nesting is ${depth} levels deep; the limit is ${maxDepth}`};
  let value: unknown;
  try {
    value = JSON.parse(body);
  } catch (e) {
    return {ok: false, error: `not valid JSON (${e instanceof Error ? e.message : String(e)})`};
  }
  const bad = findForbiddenKey(value);
  if (bad !== undefined) return {ok: false, error: `forbidden key at ${bad} (keys ${FORBIDDEN_KEYS.join(', ')} are not accepted)`};
  return {ok: true, value};
}
