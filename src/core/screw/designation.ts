/**
 * Power-thread designations for the screw work: "Tr24x5", "Tr40x14(P7)" (ISO 2904:
 * lead 14, pitch 7, 2 starts), "1-5 ACME-2G" (ASME B1.5) and "square 32x4"
 * (diameter x pitch in mm; no standard designation). Parsing is the shared thread
 * parser's (src/core/threads); this adapter refuses fastener threads, applies a
 * separately given number of starts, and labels the preferred sizes:
 * ISO 2904 / DIN 103 first-choice pitches (from memory) and the preferred Acme
 * pitches of Shigley's Mechanical Engineering Design, 9th ed., Table 8-3.
 */
import type {Parsed, ThreadSpec} from '../types.js';
import {parseThread} from '../threads/index.js';
import {ACME_PREFERRED_TPI, TRAPEZOIDAL_PREFERRED} from './series.js';

const IN_MM = 25.4;
const EPS = 1e-6;

export const THREAD_EXAMPLES = 'Tr24x5, Tr40x14(P7), 1-5 ACME-2G, square 32x4';

function fmt(n: number): string {
  return String(Math.round(n * 1e6) / 1e6);
}

/** The designation text for a spec with `starts` starts, in each family's own form. */
function designationWithStarts(spec: ThreadSpec, starts: number): string {
  const lead = starts * spec.pitch;
  if (spec.family === 'trapezoidal') {
    const cls = spec.toleranceDefaulted ? '' : `-${spec.toleranceInternal}/${spec.toleranceExternal}`;
    return `Tr${fmt(spec.nominal)}x${fmt(lead)}(P${fmt(spec.pitch)})${cls}`;
  }
  if (spec.family === 'acme') {
    // ASME B1.5 writes a multi-start thread with its pitch and lead in inches.
    return `${spec.sizeLabel}-${fmt(spec.pitch / IN_MM)}P-${fmt(lead / IN_MM)}L-ACME-${spec.toleranceExternal}`;
  }
  return `square ${fmt(spec.nominal)}x${fmt(lead)}(P${fmt(spec.pitch)})`;
}

function isPreferred(spec: ThreadSpec): boolean {
  if (spec.family === 'trapezoidal') {
    return TRAPEZOIDAL_PREFERRED.some(r => Math.abs(r.d - spec.nominal) < EPS && Math.abs(r.p - spec.pitch) < EPS);
  }
  if (spec.family === 'acme') {
    return ACME_PREFERRED_TPI.some(r => Math.abs(r.major * IN_MM - spec.nominal) < EPS && Math.abs(r.tpi - (spec.tpi ?? 0)) < EPS);
  }
  return false;
}

/**
 * Parse a power-thread designation; `starts` is the separately given number of
 * starts (a multi-start designation sets it too; both must agree).
 */
export function parsePowerThread(text: string, starts?: number): Parsed<ThreadSpec> {
  const r = parseThread(text);
  if (!r.ok) return r;
  const spec = r.value;
  if (spec.family !== 'trapezoidal' && spec.family !== 'acme' && spec.family !== 'square') {
    return {ok: false, error: `"${text.trim()}" is a fastener thread; a power screw takes ${THREAD_EXAMPLES}`};
  }
  if (spec.pitch > spec.nominal / 2 + EPS) {
    return {ok: false, error: `pitch ${fmt(spec.pitch)} mm is too coarse for a ${fmt(spec.nominal)} mm diameter; accepted: at most half the diameter`};
  }
  let out: ThreadSpec = {...spec, series: isPreferred(spec) ? 'preferred' : spec.series};
  if (starts !== undefined && starts !== spec.starts) {
    if (spec.starts > 1 && starts !== 1) {
      return {ok: false, error: `the designation has ${spec.starts} starts but starts is ${starts}; give one or make them agree`};
    }
    if (spec.starts === 1 && starts > 1) {
      out = {...out, starts, lead: starts * spec.pitch, designation: designationWithStarts(spec, starts)};
    }
  }
  return {ok: true, value: out};
}
