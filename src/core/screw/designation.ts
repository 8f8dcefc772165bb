/**
 * Power-thread designations: "Tr24x5", "Tr40x14(P7)" (ISO 2904: lead 14, pitch 7,
 * 2 starts), "1-5 ACME-2G" (ASME B1.5: 1 in, 5 threads per inch, class 2G) and
 * "square 32x4" (nominal diameter x pitch in mm; there is no standard designation).
 *
 * All parsing of power-thread text goes through `parsePowerThread`, so the shared
 * thread parser can replace the local one in a single place.
 */
import type {Parsed, ThreadSpec} from '../types.js';
import {ACME_PREFERRED_TPI, ACME_ROWS, TRAPEZOIDAL_PITCHES, TRAPEZOIDAL_PREFERRED} from './series.js';

const IN_MM = 25.4;
const EPS = 1e-6;

export const THREAD_EXAMPLES = 'Tr24x5, Tr40x14(P7), 1-5 ACME-2G, square 32x4';

function num(s: string): number {
  return Number(s.replace(',', '.'));
}

/** "1", "1/2", "1-1/4", "0.75" as inches. */
function inchSize(s: string): number | undefined {
  const mixed = /^(\d+)-(\d+)\/(\d+)$/.exec(s);
  if (mixed) return Number(mixed[1]) + Number(mixed[2]) / Number(mixed[3]);
  const frac = /^(\d+)\/(\d+)$/.exec(s);
  if (frac) return Number(frac[1]) / Number(frac[2]);
  if (/^\d*\.?\d+$/.test(s)) return Number(s);
  return undefined;
}

function fmt(n: number): string {
  return String(Number(n.toFixed(4)));
}

function startsFrom(lead: number, pitch: number): number | undefined {
  const n = lead / pitch;
  return Math.abs(n - Math.round(n)) < EPS && Math.round(n) >= 1 ? Math.round(n) : undefined;
}

function withStarts(
  spec: Omit<ThreadSpec, 'starts' | 'lead'>,
  fromText: number | undefined,
  requested: number | undefined,
): Parsed<ThreadSpec> {
  if (fromText !== undefined && requested !== undefined && requested !== 1 && requested !== fromText) {
    return {ok: false, error: `the designation has ${fromText} starts but starts is ${requested}; give one or make them agree`};
  }
  const starts = fromText ?? requested ?? 1;
  return {ok: true, value: {...spec, starts, lead: starts * spec.pitch}};
}

function parseTrapezoidal(m: RegExpExecArray, requested: number | undefined): Parsed<ThreadSpec> {
  const d = num(m[1] ?? '');
  const first = num(m[2] ?? '');
  const pitch = m[3] !== undefined ? num(m[3]) : first;
  const lead = m[3] !== undefined ? first : undefined;
  if (!(d >= 8 && d <= 300)) return {ok: false, error: `Tr nominal diameter ${fmt(d)} mm is outside 8 to 300 mm`};
  if (!(pitch >= 1.5 && pitch <= 44)) return {ok: false, error: `Tr pitch ${fmt(pitch)} mm is outside the ISO 2904 range 1.5 to 44 mm`};
  if (pitch >= d / 2) return {ok: false, error: `Tr pitch ${fmt(pitch)} mm is too coarse for a ${fmt(d)} mm diameter`};
  let fromText: number | undefined;
  if (lead !== undefined) {
    fromText = startsFrom(lead, pitch);
    if (fromText === undefined) return {ok: false, error: `lead ${fmt(lead)} mm is not a whole multiple of pitch ${fmt(pitch)} mm`};
  }
  const listed = TRAPEZOIDAL_PITCHES.some(p => Math.abs(p - pitch) < EPS);
  const preferred = TRAPEZOIDAL_PREFERRED.some(r => Math.abs(r.d - d) < EPS && Math.abs(r.p - pitch) < EPS);
  const tol = (m[4] ?? '').trim();
  const starts = fromText ?? requested ?? 1;
  const designation = starts > 1 ? `Tr${fmt(d)}x${fmt(starts * pitch)}(P${fmt(pitch)})` : `Tr${fmt(d)}x${fmt(pitch)}`;
  return withStarts(
    {
      family: 'trapezoidal',
      designation: tol ? `${designation}-${tol}` : designation,
      sizeLabel: `Tr${fmt(d)}`,
      nominal: d,
      pitch,
      series: preferred ? 'preferred' : undefined,
      isStandardPitch: listed,
      toleranceExternal: tol && /[a-z]$/.test(tol) ? tol : '7e',
      toleranceInternal: tol && /[A-Z]$/.test(tol) ? tol : '7H',
      toleranceDefaulted: tol === '',
    },
    fromText,
    requested,
  );
}

function parseAcme(m: RegExpExecArray, requested: number | undefined): Parsed<ThreadSpec> {
  const major = inchSize(m[1] ?? '');
  const tpi = num(m[2] ?? '');
  if (major === undefined || !(major >= 0.25 && major <= 5)) return {ok: false, error: `Acme size "${m[1]}" is outside 1/4 to 5 in`};
  if (!(tpi >= 1 && tpi <= 16)) return {ok: false, error: `Acme threads per inch ${fmt(tpi)} is outside 1 to 16`};
  const pitch = IN_MM / tpi;
  if (pitch >= (major * IN_MM) / 2) return {ok: false, error: `Acme ${fmt(tpi)} threads per inch is too coarse for ${m[1]} in`};
  const cls = (m[3] ?? '2G').toUpperCase();
  const listed =
    ACME_ROWS.some(r => Math.abs(r.major - major) < EPS && r.tpi === tpi) ||
    ACME_PREFERRED_TPI.some(r => Math.abs(r.major - major) < EPS && r.tpi === tpi);
  return withStarts(
    {
      family: 'acme',
      // ASME B1.5 writes a multi-start thread with its pitch and lead in inches.
      designation:
        requested !== undefined && requested > 1
          ? `${m[1]}-${fmt(1 / tpi)}P-${fmt(requested / tpi)}L ACME-${cls}`
          : `${m[1]}-${fmt(tpi)} ACME-${cls}`,
      sizeLabel: m[1] ?? '',
      nominal: major * IN_MM,
      pitch,
      tpi,
      series: undefined,
      isStandardPitch: listed,
      toleranceExternal: cls,
      toleranceInternal: cls,
      toleranceDefaulted: m[3] === undefined,
    },
    undefined,
    requested,
  );
}

function parseSquare(m: RegExpExecArray, requested: number | undefined): Parsed<ThreadSpec> {
  const d = num(m[1] ?? '');
  const first = num(m[2] ?? '');
  const pitch = m[3] !== undefined ? num(m[3]) : first;
  const lead = m[3] !== undefined ? first : undefined;
  if (!(d >= 4 && d <= 500)) return {ok: false, error: `square-thread diameter ${fmt(d)} mm is outside 4 to 500 mm`};
  if (!(pitch >= 0.5 && pitch < d / 2)) return {ok: false, error: `square-thread pitch ${fmt(pitch)} mm must be 0.5 mm or more and below half the diameter`};
  let fromText: number | undefined;
  if (lead !== undefined) {
    fromText = startsFrom(lead, pitch);
    if (fromText === undefined) return {ok: false, error: `lead ${fmt(lead)} mm is not a whole multiple of pitch ${fmt(pitch)} mm`};
  }
  const starts = fromText ?? requested ?? 1;
  return withStarts(
    {
      family: 'square',
      designation: starts > 1 ? `square ${fmt(d)}x${fmt(starts * pitch)}(P${fmt(pitch)})` : `square ${fmt(d)}x${fmt(pitch)}`,
      sizeLabel: `square ${fmt(d)}`,
      nominal: d,
      pitch,
      series: undefined,
      // There is no standard series of square threads: nothing to compare with.
      isStandardPitch: true,
      toleranceExternal: '',
      toleranceInternal: '',
      toleranceDefaulted: false,
    },
    fromText,
    requested,
  );
}

const NUM = '(\\d+(?:[.,]\\d+)?)';
const TR_RE = new RegExp(`^tr\\s*${NUM}\\s*[x×]\\s*${NUM}(?:\\s*\\(\\s*p\\s*${NUM}\\s*\\))?(?:\\s*-\\s*(\\d[a-zA-Z]))?$`, 'i');
const ACME_RE = /^(\d+-\d+\/\d+|\d+\/\d+|\d*\.?\d+)\s*-\s*(\d+(?:\.\d+)?)\s*acme(?:\s*-\s*(\d[gc]))?$/i;
const SQ_RE = new RegExp(`^(?:square|sq)\\s*${NUM}\\s*[x×]\\s*${NUM}(?:\\s*\\(\\s*p\\s*${NUM}\\s*\\))?$`, 'i');

/**
 * Parse a power-thread designation; `starts` is the separately given number of
 * starts (a multi-start designation sets it too; both must agree).
 */
export function parsePowerThread(text: string, starts?: number): Parsed<ThreadSpec> {
  const t = text.trim().replace(/\s+/g, ' ');
  const tr = TR_RE.exec(t);
  if (tr) {
    // A tolerance is kept as typed, e.g. "7e"; keep the case the user gave.
    return parseTrapezoidal(tr, starts);
  }
  const acme = ACME_RE.exec(t);
  if (acme) return parseAcme(acme, starts);
  const sq = SQ_RE.exec(t);
  if (sq) return parseSquare(sq, starts);
  if (/^m\d/i.test(t) || /un[cfe]?/i.test(t)) {
    return {ok: false, error: `"${text.trim()}" is a fastener thread; a power screw takes ${THREAD_EXAMPLES}`};
  }
  return {ok: false, error: `"${text.trim()}" is not a power-thread designation (examples: ${THREAD_EXAMPLES})`, suggestions: THREAD_EXAMPLES.split(', ')};
}
