/**
 * The tightening window: the band of wrench torques in which the joint gets enough
 * preload at the highest friction and stays below every upper limit at the lowest.
 *
 * Method. For torque-controlled tightening the preload is proportional to the torque
 * (VDI 2230 Part 1, tightening torque MA = FM (0.16 P + 0.58 d2 muG + muK DKm/2); friction
 * coefficients as defined in ISO 16047), so one checked state gives both lines:
 *   FM,max(T) = a T (lowest friction of the range, scatter on top),
 *   FM,min(T) = b T (highest friction of the range, scatter below),
 * with a = FM,max / MA and b = FM,min / MA of the result. The assembly utilisation is
 * proportional to the torque as well (the von Mises stress of VDI's FM,zul closed form).
 * Each limit is a preload; an upper limit is met where a T reaches it, a lower limit where
 * b T reaches it. The window is [max lower / b, min upper / a].
 *
 * Limits (all preloads, N):
 *  upper  yield-utilisation  the largest preload at the utilisation limit nu of Rp0.2
 *                            (VDI 2230 Part 1 permissible assembly preload FM,zul; the same
 *                            test as the preload-over-yield flag)
 *         stripping          weaker thread's stripping force / required margin - service load
 *                            (the strips-at-preload flag; FED-STD-H28/2B shear areas)
 *         bolt-break         As Rm - service load (ISO 898-1 minimum ultimate tensile load)
 *  lower  least-clamp        the least clamp load the service needs at assembly (from the
 *                            service state: separation, slip, embedding, temperature), when given
 *         service-load       otherwise: the external axial service load (no separation even if
 *                            the bolt took none of it; conservative, common practice, no source)
 *         preload-floor      otherwise: a fraction (default 0.4) of the yield-utilisation preload,
 *                            so the band does not start at a useless torque (common practice, no source;
 *                            0.4 lets the preload spread reach 2.5, the largest tightening factor VDI 2230
 *                            Part 1 Table A8 gives for a hand torque wrench, from memory)
 * Units: N, N·m.
 */
import type {JointInput} from './input.js';
import type {CheckResult} from './result.js';

export type WindowLimitName = 'yield-utilisation' | 'stripping' | 'bolt-break' | 'least-clamp' | 'service-load' | 'preload-floor';

export interface WindowLimit {
  name: WindowLimitName;
  kind: 'upper' | 'lower';
  /** The preload of the limit line, N (an upper limit may be <= 0 when the service load alone reaches it). */
  preload: number;
  /** Torque at which the governing preload line meets it, N·m (upper: lowest friction; lower: highest). */
  torque: number;
  /** Where the limit comes from, for the report. */
  source: string;
}

export interface WindowOptions {
  /** Least clamp load the service needs at assembly, N (from the service state). */
  leastClamp?: number;
  /** Without leastClamp: the lowest preload as a fraction of the yield-utilisation preload (default 0.4). */
  floorFraction?: number;
  /** Prevailing torque of a locking element, N·m: added to the band for the wrench setting. */
  prevailingTorque?: number;
}

export interface TighteningWindow {
  /** The band of tightening torques, N·m; absent when the window is empty. */
  torque?: {min: number; max: number; middle: number};
  /** The band on the wrench (tightening torque + prevailing torque), N·m; only with a prevailing torque and a band. */
  wrench?: {min: number; max: number; middle: number; prevailing: number};
  limits: WindowLimit[];
  empty: boolean;
  /** The limits that set the lower and upper ends (for an empty window: the two that cross). */
  lowerLimit: WindowLimitName;
  upperLimit: WindowLimitName;
  /** Preload per N·m of torque: at the lowest friction (max) and the highest (min), N/(N·m). */
  slope: {max: number; min: number};
  /** Preload spread a/b at one torque (the effective tightening factor alphaA), and the spread the limits allow (absent when unlimited). */
  spread: {present: number; allowed?: number};
  /** The torque of the checked result, N·m, and whether it lies in the band. */
  present: {torque: number; inside: boolean};
  /** What opens or widens the window, in shop language. */
  suggestions: string[];
  notes: string[];
}

/**
 * Default lowest preload without a service need: 0.4 of the yield-utilisation preload (common practice,
 * no source). 1/0.4 = 2.5 is the largest tightening factor alphaA that VDI 2230 Part 1 Table A8 lists for a
 * torque wrench with estimated friction (from memory), so a spread that tool can give keeps a band.
 */
export const DEFAULT_FLOOR_FRACTION = 0.4;

/** Relative inset of the band's ends (rounding only: 1e-9 of the torque). */
const EDGE = 1e-9;

const SOURCES: Record<WindowLimitName, string> = {
  'yield-utilisation': 'VDI 2230 Part 1, permissible assembly preload FM,zul at the utilisation limit',
  stripping: 'FED-STD-H28/2B shear areas at the least-material limits; stripping force / required margin, less the service load',
  'bolt-break': 'ISO 898-1 minimum ultimate tensile load As x Rm, less the service load',
  'least-clamp': 'least clamp load of the service state (separation, slip, embedding and temperature losses)',
  'service-load': 'external axial service load: no separation even with no load share to the bolt (common practice, no source)',
  'preload-floor': 'a fraction of the yield-utilisation preload, no service need given (common practice, no source)',
};

/**
 * The tightening window of a checked joint, N·m and N (see the file comment for the method:
 * VDI 2230 Part 1 torque-preload relation, limits from the check). Pure; uses only the
 * result's numbers, so it holds for whatever tightening mode the result was computed in.
 */
export function tighteningWindow(input: JointInput, result: CheckResult, opts: WindowOptions = {}): TighteningWindow {
  const t = result.tightening;
  const T0 = t.torque;
  const a = T0 > 0 ? t.preload.max / T0 : NaN;
  const b = T0 > 0 ? t.preload.min / T0 : NaN;
  const u = T0 > 0 ? t.utilisation / T0 : NaN;
  const notes: string[] = [];
  const st = result.stripping;
  const weakerForce = Math.min(st.external.force, st.internal.force);
  const yieldTorque = u > 0 ? input.utilisation / u : Infinity;
  const yieldPreload = a * yieldTorque;

  // JSON carries no NaN or Infinity: a torque that cannot be reached is shown as 0 (and the window is empty).
  const finite = (x: number): number => (Number.isFinite(x) ? Math.max(0, x) : 0);
  // Each end is pulled into the band by one part in 10^9 (EDGE), so a check run at the printed end
  // torque, with its own last-digit rounding, lands inside the limit and raises no flag.
  const upper = (name: WindowLimitName, preload: number): WindowLimit => ({name, kind: 'upper', preload, torque: finite((preload / a) * (1 - EDGE)), source: SOURCES[name]});
  const lower = (name: WindowLimitName, preload: number): WindowLimit => ({name, kind: 'lower', preload, torque: finite((preload / b) * (1 + EDGE)), source: SOURCES[name]});

  const limits: WindowLimit[] = [
    {...upper('yield-utilisation', Number.isFinite(yieldPreload) ? yieldPreload : 0), torque: finite(yieldTorque * (1 - EDGE))},
    upper('stripping', weakerForce / input.requiredMargin - input.serviceLoad),
    upper('bolt-break', st.boltBreakForce - input.serviceLoad),
  ];
  if (opts.leastClamp !== undefined) {
    limits.push(lower('least-clamp', opts.leastClamp));
  } else {
    const fraction = opts.floorFraction ?? DEFAULT_FLOOR_FRACTION;
    limits.push(lower('preload-floor', fraction * yieldPreload));
    if (input.serviceLoad > 0) limits.push(lower('service-load', input.serviceLoad));
    notes.push(
      `No least clamp load from the service state: the band starts where the lowest preload reaches ${Math.round(fraction * 100)} % of the yield-utilisation preload` +
        (input.serviceLoad > 0 ? ' or the service load, whichever is higher' : '') +
        ' (common practice, no source).',
    );
  }

  const uppers = limits.filter(l => l.kind === 'upper');
  const lowers = limits.filter(l => l.kind === 'lower');
  const hi = uppers.reduce((m, l) => (l.torque < m.torque ? l : m));
  const lo = lowers.reduce((m, l) => (l.torque > m.torque ? l : m));
  const valid = Number.isFinite(a) && Number.isFinite(b) && a > 0 && b > 0;
  const empty = !valid || !(hi.torque > lo.torque) || hi.preload <= 0;
  const presentTorque = T0;
  const spreadPresent = valid ? a / b : 0;
  const spreadAllowed = lo.preload > 0 ? hi.preload / lo.preload : Infinity;

  const out: TighteningWindow = {
    limits,
    empty,
    lowerLimit: lo.name,
    upperLimit: hi.name,
    slope: {max: a, min: b},
    spread: {present: spreadPresent, ...(Number.isFinite(spreadAllowed) ? {allowed: spreadAllowed} : {})},
    present: {torque: presentTorque, inside: !empty && presentTorque >= lo.torque && presentTorque <= hi.torque},
    suggestions: suggestions(hi.name, lo.name, empty, spreadPresent, spreadAllowed, input),
    notes,
  };
  if (!empty) {
    out.torque = {min: lo.torque, max: hi.torque, middle: (lo.torque + hi.torque) / 2};
    if (opts.prevailingTorque !== undefined && opts.prevailingTorque > 0) {
      const p = opts.prevailingTorque;
      out.wrench = {min: lo.torque + p, max: hi.torque + p, middle: (lo.torque + hi.torque) / 2 + p, prevailing: p};
    }
  }
  if (!valid) notes.push('The checked state has no torque-preload relation (zero torque or preload): no window.');
  return out;
}

/** What changes the end set by each limit, in shop language (our wording; the repairs are those of the repair planner). */
function suggestions(upper: WindowLimitName, lowerName: WindowLimitName, empty: boolean, spread: number, allowed: number, input: JointInput): string[] {
  const out: string[] = [];
  if (upper === 'stripping') {
    out.push(
      input.internal === 'nut'
        ? 'Raise the top of the band: a taller or stronger nut, or a longer engagement.'
        : 'Raise the top of the band: engage more thread, fit a helical wire insert or a solid insert, or through-bolt with a nut (see repair).',
    );
  } else {
    out.push('Raise the top of the band: a stronger bolt grade or the next size up.');
  }
  if (lowerName === 'least-clamp' || lowerName === 'service-load') {
    out.push('Lower the bottom of the band: less clamp load needed (more bolts, a stiffer joint, less embedding), or a bigger bolt.');
  }
  if (Number.isFinite(spread) && Number.isFinite(allowed)) {
    out.push(
      `Narrow the spread: highest/lowest preload at one torque is ${spread.toFixed(2)}${empty ? `, the limits allow ${allowed.toFixed(2)}` : ''}: ` +
        'a lubricant with a narrower friction range (measured to ISO 16047), or a tightening method with less scatter (VDI 2230 Part 1 tightening factor).',
    );
  }
  return out;
}
