/** Helpers shared by the unified-thread tests: geometry by designation, limits in inches, classes. */
import {parseThread, threadGeometry} from '../../../src/core/threads/index.js';
import {parseUnifiedClass} from '../../../src/core/threads/tolerance-class.js';
import type {ThreadGeometry} from '../../../src/core/types.js';

/** 1 in = 25.4 mm exactly (NIST SP 811). */
export const IN = 25.4;

export function geom(text: string): ThreadGeometry {
  const p = parseThread(text);
  if (!p.ok) throw new Error(p.error);
  return threadGeometry(p.value);
}

/** Limits in inches, rounded to 4 decimals to undo the mm conversion. */
export function inches(g: ThreadGeometry) {
  const r = (v: number | undefined) => (v === undefined ? undefined : Math.round((v / IN) * 1e4) / 1e4);
  const e = g.limits.external;
  const i = g.limits.internal;
  return {
    ext: [r(e.majorMax), r(e.majorMin), r(e.pitchMax), r(e.pitchMin)],
    int: [r(i.minorMin), r(i.minorMax), r(i.pitchMin), r(i.pitchMax), r(i.majorMin)],
  };
}

export const cls = (t: string) => {
  const c = parseUnifiedClass(t);
  if (!c.ok) throw new Error(c.error);
  return c.value;
};
