/**
 * Power-screw torque, efficiency and self-locking (Shigley's Mechanical Engineering
 * Design, 9th ed., section 8-2, pp. 415-417). Inputs in N and mm; torques in N·mm.
 *
 *   raise, thread:  TR = (F dm / 2) (l + pi f dm sec a) / (pi dm - f l sec a)   (Eq. 8-1; 8-5 with sec a)
 *   lower, thread:  TL = (F dm / 2) (pi f dm sec a - l) / (pi dm + f l sec a)   (Eq. 8-2 with f sec a)
 *   collar:         Tc = F fc dc / 2                                            (Eq. 8-6)
 *   efficiency:     e  = F l / (2 pi TR)                                        (Eq. 8-4)
 *   self-locking:   pi f dm sec a > l, i.e. f sec a > tan(lambda)                (Eq. 8-3)
 * With a = 0 (square thread) sec a = 1. As the book says, the lead angle's effect on
 * the flank normal is neglected (an approximation for the flanked threads).
 */

export interface TorqueInput {
  /** Axial load F, N (magnitude). */
  load: number;
  /** Mean thread diameter dm, mm. */
  meanDiameter: number;
  /** Lead l, mm. */
  lead: number;
  /** Flank half-angle alpha, degrees. */
  flankAngle: number;
  /** Thread friction f. */
  muThread: number;
  /** Collar friction fc. */
  muCollar: number;
  /** Mean collar diameter dc, mm. */
  collarDiameter: number;
}

/** Lead angle lambda = atan(l / (pi dm)), radians (Shigley 9th ed., Fig. 8-6). */
export function leadAngle(lead: number, meanDiameter: number): number {
  return Math.atan(lead / (Math.PI * meanDiameter));
}

function secant(deg: number): number {
  return 1 / Math.cos((deg * Math.PI) / 180);
}

/**
 * True when the lead is so steep for the friction that no torque can raise the load
 * (pi dm <= f l sec a makes Eq. 8-1's denominator vanish).
 */
export function raisingLocks(i: Pick<TorqueInput, 'meanDiameter' | 'lead' | 'flankAngle' | 'muThread'>): boolean {
  return Math.PI * i.meanDiameter - i.muThread * i.lead * secant(i.flankAngle) <= 0;
}

/** Thread torque to raise the load, N·mm (Shigley 9th ed. Eq. 8-1, Eq. 8-5 for flanked threads). */
export function raiseThreadTorque(i: TorqueInput): number {
  const fs = i.muThread * secant(i.flankAngle);
  const dm = i.meanDiameter;
  return ((i.load * dm) / 2) * ((i.lead + Math.PI * fs * dm) / (Math.PI * dm - fs * i.lead));
}

/** Thread torque to lower the load, N·mm; negative when the load drives the screw (Eq. 8-2). */
export function lowerThreadTorque(i: TorqueInput): number {
  const fs = i.muThread * secant(i.flankAngle);
  const dm = i.meanDiameter;
  return ((i.load * dm) / 2) * ((Math.PI * fs * dm - i.lead) / (Math.PI * dm + fs * i.lead));
}

/** Collar (thrust-bearing) friction torque, N·mm (Shigley 9th ed. Eq. 8-6). */
export function collarTorque(i: Pick<TorqueInput, 'load' | 'muCollar' | 'collarDiameter'>): number {
  return (i.load * i.muCollar * i.collarDiameter) / 2;
}

/** Efficiency e = F l / (2 pi T) for a raising torque T in N·mm (Shigley 9th ed. Eq. 8-4). */
export function efficiency(load: number, lead: number, raiseTorque: number): number {
  if (raiseTorque <= 0) return 0;
  return (load * lead) / (2 * Math.PI * raiseTorque);
}

/** Self-locking of the thread alone: f sec a > tan(lambda) (Shigley 9th ed. Eq. 8-3, with sec a). */
export function isSelfLocking(i: Pick<TorqueInput, 'meanDiameter' | 'lead' | 'flankAngle' | 'muThread'>): boolean {
  return Math.PI * i.muThread * secant(i.flankAngle) * i.meanDiameter > i.lead;
}

/** The thread friction at which the thread alone is just self-locking: f = tan(lambda) cos a. */
export function selfLockingFriction(lead: number, meanDiameter: number, flankAngle: number): number {
  return (lead / (Math.PI * meanDiameter)) / secant(flankAngle);
}
