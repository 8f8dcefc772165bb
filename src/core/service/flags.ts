/**
 * Flags of the service state: a kebab-case code, a level, a message in shop language
 * with the number behind it, and a summary of at most 68 characters.
 * Thresholds are exported so tests check both sides.
 */
import type {Flag} from '../types.js';
import {toDisplay, type UnitSystem} from '../units.js';

/** Goodman factor below which the thread fails in fatigue (n_f = 1, Shigley 9th ed. Eq. 8-45). */
export const FATIGUE_FAIL = 1;
/** Minimum endurance safety S_D of VDI 2230 Part 1 (1.2, from memory); a Goodman factor below it is a watch. */
export const FATIGUE_WATCH = 1.2;
/** Slip safety of VDI 2230 Part 1 for static transverse loads (1.2, from memory); below 1 it slips. */
export const SLIP_WATCH = 1.2;

export interface ServiceFlagContext {
  units?: UnitSystem;
  /** Retained clamp load under the largest service load, N (<= 0: the joint opens). */
  clampUnderLoad: number;
  separationLoad: number;
  serviceLoadMax: number;
  separationFactor: number;
  fatigue?: {goodman: number; alternatingStress: number; enduranceStrength: number; vdiFactor: number};
  bearing?: {where: 'head' | 'nut'; pressure: number; limit: number; washer: number};
  slip?: {available: number; required: number; factor: number};
}

function force(u: UnitSystem | undefined, n: number): string {
  if (u === 'us') {
    const lbf = toDisplay(n, 'force', 'us');
    return `${Math.abs(lbf) >= 100 ? Math.round(lbf).toString() : lbf.toFixed(1)} lbf`;
  }
  return `${(n / 1000).toFixed(Math.abs(n) >= 100000 ? 0 : Math.abs(n) >= 10000 ? 1 : 2)} kN`;
}
function stress(u: UnitSystem | undefined, s: number): string {
  return u === 'us' ? `${toDisplay(s, 'stress', 'us').toFixed(1)} ksi` : `${Math.round(s)} MPa`;
}
function len(u: UnitSystem | undefined, x: number): string {
  return u === 'us' ? `${toDisplay(x, 'length', 'us').toFixed(2)} in` : `${x.toFixed(0)} mm`;
}

/** `joint-separates` (fail): clamp load left under the largest load <= 0 N, i.e. separation factor <= 1 (Shigley 9th ed. Eq. 8-30). */
export function jointSeparates(c: ServiceFlagContext): Flag | undefined {
  if (c.clampUnderLoad > 0) return undefined;
  return {
    code: 'joint-separates',
    level: 'fail',
    message: `The joint opens: it separates at ${force(c.units, c.separationLoad)} of service load and sees up to ${force(c.units, c.serviceLoadMax)} (separation factor ${c.separationFactor.toFixed(2)}, minimum retained preload). An open joint loosens, leaks and the bolt takes the whole load. Raise the preload or use more or larger bolts.`,
    summary: `Joint opens: separates at ${force(c.units, c.separationLoad)}, load ${force(c.units, c.serviceLoadMax)}`,
  };
}

/** `fatigue-low`: Goodman factor < 1 fails (Shigley 9th ed. Eq. 8-45); Goodman or VDI 2230 endurance factor < 1.2 is a watch (from memory). */
export function fatigueLow(c: ServiceFlagContext): Flag | undefined {
  const f = c.fatigue;
  if (!f || (f.goodman >= FATIGUE_WATCH && f.vdiFactor >= FATIGUE_WATCH)) return undefined;
  const fail = f.goodman < FATIGUE_FAIL;
  return {
    code: 'fatigue-low',
    level: fail ? 'fail' : 'watch',
    message: `${fail ? 'The bolt will crack at the first engaged thread after many load cycles' : 'Little margin against a fatigue crack at the first engaged thread'}: Goodman factor ${f.goodman.toFixed(2)} (alternating stress ${stress(c.units, f.alternatingStress)} against endurance strength ${stress(c.units, f.enduranceStrength)}), VDI 2230 thread endurance factor ${f.vdiFactor.toFixed(2)}; at least ${FATIGUE_WATCH} is wanted. Raise the preload or reduce the load share of the bolt (stiffer parts, a longer bolt).`,
    summary: `${fail ? 'Thread fatigue' : 'Fatigue margin low'}: Goodman ${f.goodman.toFixed(2)}, VDI ${f.vdiFactor.toFixed(2)}`,
  };
}

/** `bearing-pressure-high` (fail): surface pressure (MPa) above the part's limiting pressure p_G (VDI 2230 Part 1). */
export function bearingPressureHigh(c: ServiceFlagContext): Flag | undefined {
  const b = c.bearing;
  if (!b || b.pressure <= b.limit) return undefined;
  return {
    code: 'bearing-pressure-high',
    level: 'fail',
    message: `The ${b.where} presses ${stress(c.units, b.pressure)} into the part, above its limiting surface pressure ${stress(c.units, b.limit)}: the face crushes and the preload drops. Put a hardened washer of at least ${len(c.units, b.washer)} outside diameter under the ${b.where}.`,
    summary: `${b.where === 'head' ? 'Head' : 'Nut'} crushes part: ${stress(c.units, b.pressure)} > ${stress(c.units, b.limit)}; washer ${len(c.units, b.washer)}`,
  };
}

/** `slips`: clamp load left / clamp load needed (F_Q / mu_T, VDI 2230 R12/2) below 1 fails, below 1.2 is a watch (from memory). */
export function slips(c: ServiceFlagContext): Flag | undefined {
  const s = c.slip;
  if (!s || s.factor >= SLIP_WATCH) return undefined;
  const fail = s.factor < 1;
  return {
    code: 'slips',
    level: fail ? 'fail' : 'watch',
    message: `${fail ? 'The parts slip sideways' : 'Little margin against sideways slip'}: the transverse load needs ${force(c.units, s.required)} of clamp load, ${force(c.units, s.available)} is left in service (factor ${s.factor.toFixed(2)}, ${SLIP_WATCH} wanted). A slipping joint works the bolt loose and loads it in shear.`,
    summary: `${fail ? 'Slips' : 'Slip margin low'}: needs ${force(c.units, s.required)} clamp, ${force(c.units, s.available)} left`,
  };
}

/** Every service flag that applies, in order of importance. */
export function serviceFlags(c: ServiceFlagContext): Flag[] {
  return [jointSeparates(c), slips(c), fatigueLow(c), bearingPressureHigh(c)].filter((f): f is Flag => f !== undefined);
}
