/**
 * Flags of a power-screw check: {code, level, message, summary} in shop language with the
 * number behind each (the summary: one short line with the numbers). Thresholds: a margin below 1 fails; the watch bands (below 2 on stripping
 * and buckling, below 1.5 on yield) are common practice, no source.
 */
import type {Flag} from '../types.js';
import type {ScrewResult} from './result.js';
import type {ScrewInput} from './input.js';
import {formatNumber, formatQuantity, toDisplay, type UnitSystem} from '../units.js';
import {applyDuty} from '../duty.js';
import {LONG_ENGAGEMENT_THREADS, SCREW_FIRST_THREAD_NOTE} from '../thread-stress.js';
import {PUBLISHED_THREAD_FRICTION} from './torque-solve.js';

export const WATCH_MARGIN = {stripping: 2, buckling: 2, yield: 1.5} as const;
/** Self-locking with f sec(alpha) below this multiple of tan(lambda) is marked marginal (common practice, no source). */
export const SELF_LOCKING_MARGIN = 1.5;
/** Fewer engaged threads than this: the 0.38 first-thread share is not yet reached (Shigley 9th ed. p. 419). */
export const SHARE_THREADS = LONG_ENGAGEMENT_THREADS;

const f0 = (x: number) => x.toFixed(0);
const f1 = (x: number) => x.toFixed(1);
const f2 = (x: number) => x.toFixed(2);
const f3 = (x: number) => x.toFixed(3);
const cap = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

export interface FlagContext {
  r: Omit<ScrewResult, 'flags'>;
  load: number;
  muMin: number;
  flankAngle: number;
  allowableOverride?: number;
  collarIncomplete: boolean;
  /** False when the size/pitch pair is not in the listed series (square threads have none). */
  pitchListed: boolean;
  /** Units of the numbers in the messages (default SI: MPa, kN, N·m; US: ksi, lbf, ft·lbf). */
  units?: UnitSystem;
}

/**
 * The numbers of the flag messages in a unit system: SI keeps the fixed decimals the
 * messages have always had (12.3 MPa, 6.4 kN, 9.77 N·m); US gives ksi, lbf and ft·lbf to
 * three significant figures (conversions of src/core/units.ts, exact by definition).
 */
export function flagNumbers(units: UnitSystem = 'si') {
  const us = units === 'us';
  const q = (x: number, d: 'stress' | 'force' | 'torque') => formatQuantity(x, d, 'us');
  return {
    /** Stress, MPa in: "12.3 MPa" or "1.78 ksi". */
    stress: (x: number) => (us ? q(x, 'stress') : `${f1(x)} MPa`),
    /** Stress without decimals in SI: "312 MPa" or "45.3 ksi". */
    stress0: (x: number) => (us ? q(x, 'stress') : `${f0(x)} MPa`),
    /** A stress range, MPa in: "7.0 to 10.0 MPa" or "1.02 to 1.45 ksi". */
    stressRange: (a: number, b: number) =>
      us ? `${formatNumber(toDisplay(a, 'stress', 'us'), 3)} to ${q(b, 'stress')}` : `${f1(a)} to ${f1(b)} MPa`,
    /** Force, N in: "6.4 kN" or "1440 lbf". */
    force: (x: number) => (us ? q(x, 'force') : `${f1(x / 1000)} kN`),
    /** Torque, N·m in: "9.77 N·m" or "7.21 ft·lbf". */
    torque: (x: number) => (us ? q(x, 'torque') : `${f2(x)} N·m`),
  };
}

/** All flags for a computed result. */
export function screwFlags(c: FlagContext): Flag[] {
  const {r} = c;
  const n = flagNumbers(c.units);
  const out: Flag[] = [];
  if (c.load <= 0) {
    out.push({code: 'no-load', level: 'info', message: 'load is 0: torques and stresses are zero; give --load', summary: 'Load is 0: torques and stresses are zero; give a load'});
    return out;
  }
  const tanL = Math.tan((r.leadAngle * Math.PI) / 180);
  const fsec = c.muMin / Math.cos((c.flankAngle * Math.PI) / 180);
  if (r.torque.lowerThread <= 0) {
    if (r.torque.lower <= 0) {
      out.push({
        code: 'back-drives', level: 'fail',
        message: `the load runs the screw down by itself: lowering torque ${n.torque(r.torque.lower)} with collar; f sec(alpha) ${f3(fsec)} < tan(lead angle) ${f3(tanL)}. Needs a brake or a self-locking thread`,
        summary: `Back-drives: the load runs the screw down (lowering ${n.torque(r.torque.lower)})`,
      });
    } else {
      out.push({
        code: 'back-drives', level: 'watch',
        message: `thread alone back-drives (f sec(alpha) ${f3(fsec)} < tan(lead angle) ${f3(tanL)}); only collar friction holds the load (lowering torque ${n.torque(r.torque.lower)}). Vibration or grease can let it run down`,
        summary: `Thread alone back-drives; collar holds it (lowering ${n.torque(r.torque.lower)})`,
      });
    }
  }
  if (r.torque.lowerThread > 0 && fsec < SELF_LOCKING_MARGIN * tanL) {
    out.push({
      code: 'self-locking-marginal', level: 'info',
      message: `thread is self-locking but only just: f sec(alpha) ${f3(fsec)} against tan(lead angle) ${f3(tanL)}; vibration or better lubrication can let the load creep down`,
      summary: `Self-locking only just: f sec(alpha) ${f3(fsec)} vs tan(lead) ${f3(tanL)}`,
    });
  }
  const p = r.nut.bearingPressure;
  const allow = r.nut.allowablePressure;
  if (c.allowableOverride !== undefined) {
    if (p > c.allowableOverride) out.push({code: 'bearing-pressure-high', level: 'fail', message: `nut flank pressure ${n.stress(p)} is above the given allowable ${n.stress(c.allowableOverride)}: fast wear`, summary: `Nut flank pressure ${n.stress(p)} above the given ${n.stress(c.allowableOverride)}`});
  } else if (allow) {
    if (p > allow.max) {
      out.push({code: 'bearing-pressure-high', level: 'fail', message: `nut flank pressure ${n.stress(p)} is above the safe ${n.stressRange(allow.min, allow.max)} (${allow.condition}): fast wear, galling. Longer nut or larger screw`, summary: `Nut flank pressure ${n.stress(p)} above the safe ${n.stressRange(allow.min, allow.max)}`});
    } else if (p > allow.min) {
      out.push({code: 'bearing-pressure-high', level: 'watch', message: `nut flank pressure ${n.stress(p)} is inside the upper part of the safe ${n.stressRange(allow.min, allow.max)} (${allow.condition})`, summary: `Nut flank pressure ${n.stress(p)}, high in the safe ${n.stressRange(allow.min, allow.max)}`});
    }
  } else {
    out.push({code: 'bearing-allowable-unknown', level: 'info', message: `no tabulated safe flank pressure for a ${r.nut.material} nut at this speed; pressure is ${n.stress(p)}. Give --allowable-pressure from the nut maker`, summary: `Flank pressure ${n.stress(p)}; no tabulated safe value for this nut`});
  }
  const s = r.nut.stripping;
  const weakerForce = Math.min(s.nutForce, s.screwForce);
  if (s.margin < 1) {
    out.push({code: 'strips', level: 'fail', message: `${s.weaker} threads strip at ${n.force(weakerForce)}, below the load ${n.force(c.load)} (margin ${f2(s.margin)})`, summary: `${cap(s.weaker)} threads strip at ${n.force(weakerForce)} < load ${n.force(c.load)}`});
  } else if (s.margin < WATCH_MARGIN.stripping) {
    out.push({code: 'strips', level: 'watch', message: `${s.weaker} threads strip at ${n.force(weakerForce)}, only ${f2(s.margin)} times the load`, summary: `${cap(s.weaker)} threads strip at ${n.force(weakerForce)}, only ${f2(s.margin)} times the load`});
  }
  if (r.nut.engagedThreads < SHARE_THREADS) {
    out.push({
      code: 'short-engagement', level: 'watch',
      message: `${f1(r.nut.engagedThreads)} threads engaged, fewer than ${SHARE_THREADS}: the first thread carries more than 0.38 of the load; first-thread share taken as ${f2(r.stress.firstThread.share)}`,
      summary: `Only ${f1(r.nut.engagedThreads)} threads engaged: first-thread share ${f2(r.stress.firstThread.share)}`,
    });
  }
  const sy = r.screw.yield;
  const vm = r.stress.firstThread.vonMises;
  if (vm >= sy) {
    out.push({code: 'first-thread-over-yield', level: 'fail', message: `von Mises at the first thread root ${n.stress0(vm)} reaches the screw yield ${n.stress0(sy)}. ${SCREW_FIRST_THREAD_NOTE}`, summary: `First thread root ${n.stress0(vm)} reaches the screw yield ${n.stress0(sy)}`});
  } else if (sy / vm < WATCH_MARGIN.yield) {
    out.push({code: 'first-thread-over-yield', level: 'watch', message: `von Mises at the first thread root ${n.stress0(vm)} is ${f2(sy / vm)} times below the screw yield ${n.stress0(sy)}. ${SCREW_FIRST_THREAD_NOTE}`, summary: `First thread root ${n.stress0(vm)}, yield ${n.stress0(sy)} only ${f2(sy / vm)} times it`});
  }
  const b = r.buckling;
  if (b.checked && b.criticalLoad !== null && b.margin !== null) {
    if (b.margin < 1) {
      out.push({code: 'buckling', level: 'fail', message: `screw buckles: critical load ${n.force(b.criticalLoad)} (${b.method === 'euler' ? 'Euler' : 'J. B. Johnson'}, C = ${b.endConstant}) is below the load ${n.force(c.load)}`, summary: `Screw buckles: critical load ${n.force(b.criticalLoad)} < load ${n.force(c.load)}`});
    } else if (b.margin < WATCH_MARGIN.buckling) {
      out.push({code: 'buckling', level: 'watch', message: `critical column load ${n.force(b.criticalLoad)} is only ${f2(b.margin)} times the load; column failure gives no warning`, summary: `Critical column load ${n.force(b.criticalLoad)}, only ${f2(b.margin)} times the load`});
    }
  }
  if (!c.pitchListed) {
    out.push({code: 'nonstandard-pitch', level: 'info', message: `${r.thread.designation}: pitch not in the listed series for this size; check nut and screw match`, summary: `${r.thread.designation}: pitch not in the listed series; check the nut`});
  }
  if (c.collarIncomplete) {
    out.push({code: 'collar-incomplete', level: 'info', message: 'collar friction given without a collar diameter (or the reverse): collar torque taken as 0', summary: 'Collar friction or diameter missing: collar torque taken as 0'});
  }
  const ts = r.torqueSolve;
  if (ts?.outsidePublished) {
    const f = ts.friction.toFixed(3);
    out.push({
      code: 'friction-outside-tables',
      level: 'watch',
      message: `thread friction ${f} ${ts.solves === 'friction' ? 'implied by the torque' : 'used with the torque'} is outside the published pairs, ${PUBLISHED_THREAD_FRICTION.min} to ${PUBLISHED_THREAD_FRICTION.max} (Shigley 9th ed. Table 8-5): check the torque, the load and the lubrication`,
      summary: `Thread friction ${f} outside the published ${PUBLISHED_THREAD_FRICTION.min} to ${PUBLISHED_THREAD_FRICTION.max}`,
    });
  }
  return out;
}

/**
 * The flags of a computed power screw with their numbers in `units` (US: ksi, lbf, ft·lbf),
 * for the text and Markdown reports and the workbench. Same codes, levels and order as
 * result.flags (the duty applied again), which (and so the JSON) stay in SI.
 */
export function screwFlagsInUnits(result: ScrewResult, input: ScrewInput, units: UnitSystem): Flag[] {
  if (units === 'si') return result.flags;
  const {flags: _flags, ...r} = result;
  const flags = screwFlags({
    r, load: result.input.load, muMin: result.friction.thread.min, flankAngle: result.geometry.flankAngle,
    ...(input.allowablePressure !== undefined ? {allowableOverride: input.allowablePressure} : {}),
    collarIncomplete: (input.muCollar > 0) !== (input.collarDiameter > 0),
    pitchListed: result.thread.isStandardPitch || result.thread.family === 'square',
    units,
  });
  return applyDuty(flags, input.duty);
}
