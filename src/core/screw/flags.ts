/**
 * Flags of a power-screw check: {code, level, message, summary} in shop language with the
 * number behind each (the summary: one short line with the numbers). Thresholds: a margin below 1 fails; the watch bands (below 2 on stripping
 * and buckling, below 1.5 on yield) are common practice, no source.
 */
import type {Flag} from '../types.js';
import type {ScrewResult} from './result.js';
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
}

/** All flags for a computed result. */
export function screwFlags(c: FlagContext): Flag[] {
  const {r} = c;
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
        message: `the load runs the screw down by itself: lowering torque ${f2(r.torque.lower)} N·m with collar; f sec(alpha) ${f3(fsec)} < tan(lead angle) ${f3(tanL)}. Needs a brake or a self-locking thread`,
        summary: `Back-drives: the load runs the screw down (lowering ${f2(r.torque.lower)} N·m)`,
      });
    } else {
      out.push({
        code: 'back-drives', level: 'watch',
        message: `thread alone back-drives (f sec(alpha) ${f3(fsec)} < tan(lead angle) ${f3(tanL)}); only collar friction holds the load (lowering torque ${f2(r.torque.lower)} N·m). Vibration or grease can let it run down`,
        summary: `Thread alone back-drives; collar holds it (lowering ${f2(r.torque.lower)} N·m)`,
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
    if (p > c.allowableOverride) out.push({code: 'bearing-pressure-high', level: 'fail', message: `nut flank pressure ${f1(p)} MPa is above the given allowable ${f1(c.allowableOverride)} MPa: fast wear`, summary: `Nut flank pressure ${f1(p)} MPa above the given ${f1(c.allowableOverride)} MPa`});
  } else if (allow) {
    if (p > allow.max) {
      out.push({code: 'bearing-pressure-high', level: 'fail', message: `nut flank pressure ${f1(p)} MPa is above the safe ${f1(allow.min)} to ${f1(allow.max)} MPa (${allow.condition}): fast wear, galling. Longer nut or larger screw`, summary: `Nut flank pressure ${f1(p)} MPa above the safe ${f1(allow.min)} to ${f1(allow.max)} MPa`});
    } else if (p > allow.min) {
      out.push({code: 'bearing-pressure-high', level: 'watch', message: `nut flank pressure ${f1(p)} MPa is inside the upper part of the safe ${f1(allow.min)} to ${f1(allow.max)} MPa (${allow.condition})`, summary: `Nut flank pressure ${f1(p)} MPa, high in the safe ${f1(allow.min)} to ${f1(allow.max)} MPa`});
    }
  } else {
    out.push({code: 'bearing-allowable-unknown', level: 'info', message: `no tabulated safe flank pressure for a ${r.nut.material} nut at this speed; pressure is ${f1(p)} MPa. Give --allowable-pressure from the nut maker`, summary: `Flank pressure ${f1(p)} MPa; no tabulated safe value for this nut`});
  }
  const s = r.nut.stripping;
  const weakerForce = Math.min(s.nutForce, s.screwForce);
  if (s.margin < 1) {
    out.push({code: 'strips', level: 'fail', message: `${s.weaker} threads strip at ${f1(weakerForce / 1000)} kN, below the load ${f1(c.load / 1000)} kN (margin ${f2(s.margin)})`, summary: `${cap(s.weaker)} threads strip at ${f1(weakerForce / 1000)} kN < load ${f1(c.load / 1000)} kN`});
  } else if (s.margin < WATCH_MARGIN.stripping) {
    out.push({code: 'strips', level: 'watch', message: `${s.weaker} threads strip at ${f1(weakerForce / 1000)} kN, only ${f2(s.margin)} times the load`, summary: `${cap(s.weaker)} threads strip at ${f1(weakerForce / 1000)} kN, only ${f2(s.margin)} times the load`});
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
    out.push({code: 'first-thread-over-yield', level: 'fail', message: `von Mises at the first thread root ${f0(vm)} MPa reaches the screw yield ${f0(sy)} MPa. ${SCREW_FIRST_THREAD_NOTE}`, summary: `First thread root ${f0(vm)} MPa reaches the screw yield ${f0(sy)} MPa`});
  } else if (sy / vm < WATCH_MARGIN.yield) {
    out.push({code: 'first-thread-over-yield', level: 'watch', message: `von Mises at the first thread root ${f0(vm)} MPa is ${f2(sy / vm)} times below the screw yield ${f0(sy)} MPa. ${SCREW_FIRST_THREAD_NOTE}`, summary: `First thread root ${f0(vm)} MPa, yield ${f0(sy)} MPa only ${f2(sy / vm)} times it`});
  }
  const b = r.buckling;
  if (b.checked && b.criticalLoad !== null && b.margin !== null) {
    if (b.margin < 1) {
      out.push({code: 'buckling', level: 'fail', message: `screw buckles: critical load ${f1(b.criticalLoad / 1000)} kN (${b.method === 'euler' ? 'Euler' : 'J. B. Johnson'}, C = ${b.endConstant}) is below the load ${f1(c.load / 1000)} kN`, summary: `Screw buckles: critical load ${f1(b.criticalLoad / 1000)} kN < load ${f1(c.load / 1000)} kN`});
    } else if (b.margin < WATCH_MARGIN.buckling) {
      out.push({code: 'buckling', level: 'watch', message: `critical column load ${f1(b.criticalLoad / 1000)} kN is only ${f2(b.margin)} times the load; column failure gives no warning`, summary: `Critical column load ${f1(b.criticalLoad / 1000)} kN, only ${f2(b.margin)} times the load`});
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
