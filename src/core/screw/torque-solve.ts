/**
 * A known raising torque (motor, handwheel) instead of a known load: solve the power screw for the
 * load that torque raises at the given friction, or for the thread friction it implies at the given
 * load. Torque T = Tthread(F, f) + Tcollar(F) (Shigley's Mechanical Engineering Design, 9th ed.,
 * Eqs. 8-1 and 8-6 with the flank-angle secant of section 8-2); both terms are proportional to F,
 * so F = T / (T per N); the thread term rises with f, so f is found by bisection.
 * Units: N, mm, N·m.
 */
import {collarTorque, raiseThreadTorque, raisingLocks} from './mechanics.js';
import {THREAD_FRICTION} from './friction.js';

export interface TorqueSolveGeometry {
  meanDiameter: number;
  lead: number;
  flankAngle: number;
  muCollar: number;
  collarDiameter: number;
}

/** Lowest and highest thread friction of the published pairs (Shigley 9th ed. Table 8-5): 0.04 to 0.25. */
export const PUBLISHED_THREAD_FRICTION = {
  min: Math.min(...THREAD_FRICTION.map(t => t.min)),
  max: Math.max(...THREAD_FRICTION.map(t => t.max)),
} as const;

/** Raising torque per newton of load, N·mm/N: Eq. 8-1 (with sec alpha) + Eq. 8-6 at F = 1. */
export function raiseTorquePerLoad(g: TorqueSolveGeometry, muThread: number): number {
  const one = {load: 1, ...g, muThread};
  return raiseThreadTorque(one) + collarTorque(one);
}

/** Load raised by a torque, N: F = T / (raise torque per N), T in N·m. Undefined when the thread locks (no torque raises any load). */
export function loadForTorque(torqueNm: number, g: TorqueSolveGeometry, muThread: number): number | undefined {
  if (raisingLocks({...g, muThread})) return undefined;
  return (torqueNm * 1000) / raiseTorquePerLoad(g, muThread);
}

/**
 * Thread friction f at which raising `load` (N) takes `torqueNm` (N·m), by bisection on f in
 * [0, the locking friction). Undefined when even f = 0 needs more torque than given (the torque
 * cannot raise the load) or the load is zero.
 */
export function frictionForTorque(torqueNm: number, load: number, g: TorqueSolveGeometry): number | undefined {
  if (!(load > 0)) return undefined;
  const target = (torqueNm * 1000) / load;
  if (raiseTorquePerLoad(g, 0) > target) return undefined;
  let lo = 0;
  // Upper bound: just below locking (pi dm cos a / l), capped at 1.
  let hi = Math.min(1, ((Math.PI * g.meanDiameter) / g.lead) * Math.cos((g.flankAngle * Math.PI) / 180) * 0.999999);
  if (raiseTorquePerLoad(g, hi) < target) return hi;
  for (let i = 0; i < 100 && hi - lo > 1e-12; i++) {
    const mid = (lo + hi) / 2;
    if (raiseTorquePerLoad(g, mid) < target) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}
