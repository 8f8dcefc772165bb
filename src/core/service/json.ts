/**
 * The service state as `check --json` prints it (issue 16 contract, SI): the
 * ServiceResult with every value that has no finite number left out: a factor
 * with no load to divide by (infinite), a separation load or factor without
 * clamped parts, a limiting pressure or expansion that is not known (null). The
 * text and Markdown reports say those in words ("no load", "not known"). Pure.
 */
import type {ServiceResult} from './result.js';

function clean(v: unknown): unknown {
  if (Array.isArray(v)) return v.map(clean);
  if (v === null || typeof v !== 'object') return v;
  const out: Record<string, unknown> = {};
  for (const [k, x] of Object.entries(v as Record<string, unknown>)) {
    if (x === null || x === undefined || (typeof x === 'number' && !Number.isFinite(x))) continue;
    out[k] = clean(x);
  }
  return out;
}

/** The ServiceResult for JSON: the same keys and SI numbers, without null or non-finite values. */
export function serviceJson(s: ServiceResult): Record<string, unknown> {
  return clean(s) as Record<string, unknown>;
}
