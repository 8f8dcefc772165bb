/**
 * Keys of the field table may be dotted ("measured.holeMinorDiameter",
 * "service.clamp"): an input inside an optional object of the group's schema.
 * These read and write such a key in a draft without changing the draft given.
 */

/** The value at a dotted key, or undefined. */
export function getPath(o: unknown, key: string): unknown {
  let cur: unknown = o;
  for (const part of key.split('.')) {
    if (cur === null || typeof cur !== 'object') return undefined;
    cur = (cur as Record<string, unknown>)[part];
  }
  return cur;
}

/**
 * A copy of `o` with the dotted key set to `value` (undefined removes it); an
 * object left empty by a removal is removed too, so an optional group stays absent.
 */
export function setPath<T extends object>(o: T, key: string, value: unknown): T {
  const [head, ...rest] = key.split('.') as [string, ...string[]];
  const copy = {...(o as Record<string, unknown>)};
  if (rest.length === 0) {
    if (value === undefined) delete copy[head];
    else copy[head] = value;
    return copy as T;
  }
  const inner = copy[head];
  const next = setPath(inner !== null && typeof inner === 'object' ? (inner as object) : {}, rest.join('.'), value);
  if (Object.keys(next).length === 0) delete copy[head];
  else copy[head] = next;
  return copy as T;
}
