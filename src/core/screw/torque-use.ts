/**
 * Two inputs of checkScrew that adjust the textbook model: a known raising torque (solved for the
 * load or the friction, torque-solve.ts) and the class 3G shear areas of general-purpose Acme
 * threads (Machinery's Handbook, 27th ed., Table 3, shipped in series.ts) in place of the basic
 * profile for stripping. Units: mm, N, N·m.
 */
import type {ScrewInput} from './input.js';
import type {PowerThreadGeometry} from './geometry.js';
import {ACME_ROWS, ACME_SOURCE} from './series.js';
import {frictionForTorque, loadForTorque, PUBLISHED_THREAD_FRICTION} from './torque-solve.js';
import {THREAD_FRICTION_SOURCE} from './friction.js';

const IN_MM = 25.4;

export type TorqueSolved =
  | {ok: true; torque: number; solves: 'load' | 'friction'; load: number; friction: number; outside: boolean; note: string}
  | {ok: false; field: keyof ScrewInput; message: string};

/**
 * The load raised by `input.torque` at the highest thread friction given (the raise torque uses
 * f max), or the single thread friction that torque implies at `input.load`; undefined without a
 * torque. `outside`: the friction (given or solved) lies outside the published pairs, 0.04 to 0.25
 * (Shigley 9th ed. Table 8-5).
 */
export function solveTorque(input: ScrewInput, g: PowerThreadGeometry, mu: {min: number; max: number}, collarOn: boolean): TorqueSolved | undefined {
  if (input.torque === undefined) return undefined;
  const geo = {meanDiameter: g.meanDiameter, lead: g.lead, flankAngle: g.flankAngle, muCollar: collarOn ? input.muCollar : 0, collarDiameter: collarOn ? input.collarDiameter : 0};
  const range = `${PUBLISHED_THREAD_FRICTION.min} to ${PUBLISHED_THREAD_FRICTION.max} (${THREAD_FRICTION_SOURCE.source})`;
  if (input.torqueSolves === 'load') {
    const load = loadForTorque(input.torque, geo, mu.max);
    if (load === undefined) return {ok: false, field: 'muThread', message: `thread friction ${mu.max} locks this lead: no torque raises a load`};
    const outside = mu.max > PUBLISHED_THREAD_FRICTION.max || mu.min < PUBLISHED_THREAD_FRICTION.min;
    return {ok: true, torque: input.torque, solves: 'load', load, friction: mu.max, outside,
      note: `load ${load.toFixed(0)} N solved from the raising torque ${input.torque} N·m at thread friction ${mu.max} (Shigley 9th ed. Eqs. 8-1 and 8-6)`};
  }
  const f = frictionForTorque(input.torque, input.load, geo);
  if (f === undefined) {
    return {ok: false, field: 'torque', message: `a torque of ${input.torque} N·m cannot raise ${input.load} N even without thread friction; accepted: a larger torque, or a smaller load`};
  }
  const outside = f < PUBLISHED_THREAD_FRICTION.min || f > PUBLISHED_THREAD_FRICTION.max;
  return {ok: true, torque: input.torque, solves: 'friction', load: input.load, friction: f, outside,
    note: `thread friction ${f.toFixed(3)} solved from the raising torque ${input.torque} N·m at ${input.load} N (Shigley 9th ed. Eqs. 8-1 and 8-6); published pairs range ${range}`};
}

/**
 * Factor on the basic-profile stripping areas, with the note saying which areas were used: for a
 * general-purpose Acme size of the table, class 3G shear area / basic screw-thread area
 * (pi D1 w P per pitch; the table's area per inch of engagement), applied to the nut thread as
 * well (common practice, no source); 1 (basic profile) otherwise.
 */
export function classShearAreaFactor(g: PowerThreadGeometry): {factor: number; note: string} {
  const basicNote = 'nut stripping: basic profile, threads sheared on the cylinders d and D1 over the nut length, every turn loaded; no tolerance allowance (a few per cent high)';
  if (g.spec.family !== 'acme') return {factor: 1, note: basicNote};
  const tpi = IN_MM / g.pitch;
  const row = ACME_ROWS.find(r => Math.abs(r.major * IN_MM - g.major) < 1e-3 && Math.abs(r.tpi - tpi) < 1e-6);
  if (!row) return {factor: 1, note: basicNote};
  const basicPerInch = Math.PI * (g.nutMinorDiameter / IN_MM) * g.shearWidthFactor; // in²/in
  const factor = Math.min(1, row.shearArea3G / basicPerInch);
  return {factor, note: `nut stripping: class 3G shear area ${row.shearArea3G} in²/in (${ACME_SOURCE}), ${(factor * 100).toFixed(1)} % of the basic profile, used for the screw thread and, scaled alike, the nut thread (common practice, no source); a class 2G thread has less`};
}
