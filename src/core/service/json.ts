/**
 * The service state holds finite numbers only, so `check --json` (SI, issue 16
 * contract) prints no null or infinite value: a factor with no load to divide by
 * (infinite), a separation load or factor without clamped parts, a limiting pressure
 * or an expansion that is not known are left out. The text and Markdown reports say
 * those in words ("no load", "not known"). Pure.
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

/** The ServiceResult without null, undefined or non-finite values (same keys otherwise). */
export function finiteOnly(s: ServiceResult): ServiceResult {
  return clean(s) as ServiceResult;
}
