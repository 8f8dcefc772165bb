/**
 * Tolerance-class tokens of fastener threads.
 *
 * ISO 965-1: a class is the pitch-diameter grade and position followed, when
 * different, by the crest-diameter grade and position ("5g6g"); one token
 * ("6g") means both. Lower-case positions (e, f, g, h) are external threads,
 * upper-case (G, H) internal. A pair is written internal/external ("6H/6g").
 * ASME B1.1: classes 1A, 2A, 3A (external) and 1B, 2B, 3B (internal).
 */
import type {Parsed} from '../types.js';

export const METRIC_EXTERNAL_POSITIONS = ['e', 'f', 'g', 'h'] as const;
export const METRIC_INTERNAL_POSITIONS = ['G', 'H'] as const;
/** Grades this tool accepts (ISO 965-1 defines 3 to 9 for d2; 4 to 8 covers the fastener classes). */
export const METRIC_GRADES = [4, 5, 6, 7, 8] as const;
/** ISO 965-1: the major diameter d of an external thread has grades 4, 6 and 8 only. */
export const METRIC_EXTERNAL_CREST_GRADES = [4, 6, 8] as const;

export interface MetricClass {
  side: 'external' | 'internal';
  /** Position letter, case as in ISO 965-1 (e.g. "g", "H"). */
  position: string;
  pitchGrade: number;
  crestGrade: number;
  /** Canonical text: "6g", "5g6g", "6H", "5H6H". */
  text: string;
}

export const METRIC_CLASS_HELP =
  'grade 4 to 8 and position e, f, g, h (external) or G, H (internal), e.g. 6g, 6H, 5g6g, 6H/6g';

/**
 * Parse one metric class token. `side` forces the side when known from its place
 * in an internal/external pair, so "6h" in the first place of a pair reads as 6H.
 */
export function parseMetricClass(token: string, side?: 'external' | 'internal'): Parsed<MetricClass> {
  const m = /^(\d)([a-z])(?:(\d)([a-z]))?$/i.exec(token.trim());
  if (!m) return {ok: false, error: `tolerance class "${token}" is not a metric class; accepted: ${METRIC_CLASS_HELP}`};
  const g1 = Number(m[1]);
  const l1 = m[2] ?? '';
  const g2 = m[3] === undefined ? g1 : Number(m[3]);
  const l2 = m[4] ?? l1;
  if (l1.toLowerCase() !== l2.toLowerCase()) {
    return {ok: false, error: `tolerance class "${token}": the pitch and crest positions must be the same letter (e.g. 5g6g)`};
  }
  const lower = l1.toLowerCase();
  let resolved: 'external' | 'internal';
  if (side) resolved = side;
  else if (lower === 'e' || lower === 'f') resolved = 'external';
  else resolved = l1 === l1.toUpperCase() ? 'internal' : 'external';
  const position = resolved === 'internal' ? lower.toUpperCase() : lower;
  const allowed: readonly string[] = resolved === 'internal' ? METRIC_INTERNAL_POSITIONS : METRIC_EXTERNAL_POSITIONS;
  if (!allowed.includes(position)) {
    return {
      ok: false,
      error: `tolerance position "${l1}" is not accepted for an ${resolved} thread; accepted: ${allowed.join(', ')} (${METRIC_CLASS_HELP})`,
    };
  }
  for (const g of [g1, g2]) {
    if (!(METRIC_GRADES as readonly number[]).includes(g)) {
      return {ok: false, error: `tolerance grade ${g} in "${token}" is not accepted; accepted grades: 4 to 8 (${METRIC_CLASS_HELP})`};
    }
  }
  if (resolved === 'external' && !(METRIC_EXTERNAL_CREST_GRADES as readonly number[]).includes(g2)) {
    return {
      ok: false,
      error: `tolerance class "${token}": ISO 965-1 has major-diameter grades 4, 6 and 8 only; write the crest grade, e.g. ${g1}${position}6${position}`,
    };
  }
  const text = g1 === g2 ? `${g1}${position}` : `${g1}${position}${g2}${position}`;
  return {ok: true, value: {side: resolved, position, pitchGrade: g1, crestGrade: g2, text}};
}

export interface UnifiedClass {
  side: 'external' | 'internal';
  /** 1, 2 or 3. */
  grade: 1 | 2 | 3;
  /** "2A", "3B". */
  text: string;
}

export const UNIFIED_CLASS_HELP = '1A, 2A, 3A (external) or 1B, 2B, 3B (internal), e.g. 2A, 2B, 2A/2B';

/** Parse one unified class token (ASME B1.1 classes 1A-3A, 1B-3B); case-insensitive. */
export function parseUnifiedClass(token: string): Parsed<UnifiedClass> {
  const m = /^([123])\s*([ab])$/i.exec(token.trim());
  if (!m) return {ok: false, error: `class "${token}" is not a unified thread class; accepted: ${UNIFIED_CLASS_HELP}`};
  const grade = Number(m[1]) as 1 | 2 | 3;
  const letter = (m[2] ?? '').toUpperCase();
  return {ok: true, value: {side: letter === 'A' ? 'external' : 'internal', grade, text: `${grade}${letter}`}};
}
