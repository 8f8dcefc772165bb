/**
 * The measured state of the hole and bolt in the repair planner (issue: threads as measured).
 * A new thread (insert, oversize) keeps none of the hole's measurements; the same bolt keeps
 * its own. A tap drill cleans up a worn bore only when it is larger than the bore's measured
 * minor diameter (common practice, no source: a drill that cuts nothing leaves the worn crests).
 * Lengths mm.
 */
import type {MeasuredThread} from '../joint/measured-input.js';
import {lengthIn} from './common.js';
import type {UnitSystem} from '../units.js';

/** The bolt's own measurements (pitch diameter, three wires, major, ring gauges); undefined when none. */
export function boltOnly(m: MeasuredThread | undefined): MeasuredThread | undefined {
  if (m === undefined) return undefined;
  const out: MeasuredThread = {};
  if (m.boltPitchDiameter !== undefined) out.boltPitchDiameter = m.boltPitchDiameter;
  if (m.overWires !== undefined) out.overWires = m.overWires;
  if (m.boltMajorDiameter !== undefined) out.boltMajorDiameter = m.boltMajorDiameter;
  const g = m.gauges;
  if (g && (g.boltGo !== undefined || g.boltNoGo !== undefined)) {
    out.gauges = {...(g.boltGo !== undefined ? {boltGo: g.boltGo} : {}), ...(g.boltNoGo !== undefined ? {boltNoGo: g.boltNoGo} : {})};
  }
  return Object.keys(out).length > 0 ? out : undefined;
}

/** The joint's measurements without the hole's (pitch and minor diameters, plug gauges). */
export function withoutHole(m: MeasuredThread | undefined): MeasuredThread | undefined {
  return boltOnly(m);
}

/**
 * Whether a tap drill of `drill` mm cleans up a bore worn to a measured minor diameter of
 * `wornMinor` mm: a reason why not (the option is not fit), or a note that it does; null
 * when nothing was measured.
 */
export function wornBoreCheck(wornMinor: number | undefined, drill: number, what: string, units?: UnitSystem): {fit: boolean; text: string} | null {
  if (wornMinor === undefined) return null;
  const l = (x: number) => lengthIn(units, x, 2);
  if (wornMinor > drill + 1e-9) {
    return {fit: false, text: `the bore is worn to a minor diameter of ${l(wornMinor)} (measured), beyond the ${l(drill)} tap drill of ${what}: the drill would not clean it up`};
  }
  return {fit: true, text: `the ${l(drill)} tap drill of ${what} removes the worn bore (minor diameter ${l(wornMinor)} measured)`};
}
