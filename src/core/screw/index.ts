/**
 * Power screws: `checkScrew(input)` computes lead, torques, efficiency, self-locking,
 * body and first-thread stresses, nut bearing pressure and stripping, column buckling
 * and the flags. Pure and fast (no allocation beyond the result): the workbench calls it
 * on every keystroke. Units: mm, N, N·m, MPa, degrees. Methods and sources are named in
 * the modules it calls (Shigley 9th ed. section 8-2; ISO 2904; ASME B1.5).
 */
import type {Parsed} from '../types.js';
import type {ScrewInput} from './input.js';
import type {ScrewResult} from './result.js';
import {wornScrew} from './backlash.js';
import {parsePowerThread} from './designation.js';
import {powerThreadGeometry} from './geometry.js';
import {collarTorque, efficiency, isSelfLocking, leadAngle, lowerThreadTorque, raiseThreadTorque, raisingLocks, selfLockingFriction} from './mechanics.js';
import {bodyStresses, threadRootStresses} from './stresses.js';
import {FIRST_THREAD_SHARE_LONG} from '../thread-stress.js';
import {allowablePressure, bearingPressure, stripping} from './nut.js';
import {buckling, END_CONDITION_SOURCE} from './buckling.js';
import {nutMaterial, nutMaterialIds, screwMaterial, screwMaterialIds} from './materials.js';
import {screwFlags, SHARE_THREADS} from './flags.js';
import {applyDuty} from '../duty.js';
import {classShearAreaFactor, solveTorque} from './torque-use.js';

export type {ScrewInput, ScrewInputDraft} from './input.js';
export {ScrewInputSchema, ScrewFrictionSchema, END_CONDITION_IDS} from './input.js';
export type {ScrewResult} from './result.js';
export {THREAD_FRICTION, COLLAR_FRICTION, THREAD_FRICTION_SOURCE, COLLAR_FRICTION_SOURCE, threadFrictionPick, collarFrictionPick} from './friction.js';
export {END_CONDITIONS, END_CONDITION_SOURCE} from './buckling.js';
export {nutMaterialIds, screwMaterialIds} from './materials.js';
export {parsePowerThread, THREAD_EXAMPLES} from './designation.js';
export {powerThreadGeometry} from './geometry.js';
export {screwFlagsInUnits, flagNumbers} from './flags.js';

/** First-thread share of the load (Shigley 9th ed., p. 419); the joint's constant. */
export const FIRST_THREAD_SHARE = FIRST_THREAD_SHARE_LONG;

/** A bad input found while computing; `field` is the ScrewInput key at fault. */
export class ScrewInputError extends Error {
  constructor(readonly field: keyof ScrewInput, message: string) {
    super(message);
    this.name = 'ScrewInputError';
  }
}

/**
 * Compute a power screw. Throws ScrewInputError for an input that cannot be computed. With a
 * measured backlash (`backlash`, `backlashNew`) the nut wear comes from it and the result
 * carries `backlash` (src/core/screw/backlash.ts, wornScrew).
 */
export function checkScrew(input: ScrewInput): ScrewResult {
  if (input.backlash !== undefined || input.backlashNew !== undefined) return wornScrew(input);
  return checkScrewAsGiven(input);
}

/** Compute a power screw with the nut wear as given (no backlash). */
function checkScrewAsGiven(input: ScrewInput): ScrewResult {
  const parsed = parsePowerThread(input.thread, input.starts);
  if (!parsed.ok) throw new ScrewInputError('thread', parsed.error);
  const g = powerThreadGeometry(parsed.value);
  const nut = nutMaterial(input.nutMaterial);
  if (!nut) throw new ScrewInputError('nutMaterial', `unknown nut material "${input.nutMaterial}"; accepted: ${nutMaterialIds().join(', ')}`);
  const scr = screwMaterial(input.screwMaterial ?? 'steel');
  if (!scr) throw new ScrewInputError('screwMaterial', `unknown screw material "${input.screwMaterial}"; accepted: ${screwMaterialIds().join(', ')}`);
  const screwYield = input.screwYield ?? scr.yield;

  let mu = typeof input.muThread === 'number' ? {min: input.muThread, max: input.muThread} : input.muThread;
  const collarOn = input.muCollar > 0 && input.collarDiameter > 0;
  const solvedOrError = solveTorque(input, g, mu, collarOn);
  if (solvedOrError && !solvedOrError.ok) throw new ScrewInputError(solvedOrError.field, solvedOrError.message);
  const solved = solvedOrError;
  const F = solved?.load ?? input.load;
  if (solved) mu = {min: solved.friction, max: solved.friction};
  const base = {load: F, meanDiameter: g.meanDiameter, lead: g.lead, flankAngle: g.flankAngle, muCollar: collarOn ? input.muCollar : 0, collarDiameter: collarOn ? input.collarDiameter : 0};
  if (raisingLocks({...base, muThread: mu.max})) {
    throw new ScrewInputError('muThread', `thread friction ${mu.max} is too high for a lead angle this steep: no torque raises the load; accepted: below ${(Math.PI * g.meanDiameter / g.lead * Math.cos((g.flankAngle * Math.PI) / 180)).toFixed(2)}`);
  }
  const raiseThread = raiseThreadTorque({...base, muThread: mu.max});
  const lowerThread = lowerThreadTorque({...base, muThread: mu.min});
  const tc = collarTorque(base);
  const raise = raiseThread + tc;
  const lower = lowerThread + tc;

  const compression = input.loadDirection === 'compression';
  const body = bodyStresses(F, raise, g.rootDiameter, compression);
  const engaged = input.nutLength / g.pitch;
  const share = engaged >= SHARE_THREADS ? FIRST_THREAD_SHARE : Math.min(1, Math.max(FIRST_THREAD_SHARE, 1 / engaged));
  // Body torsion carries the full raising torque (conservative); only the thread torque passes the flanks.
  const root = threadRootStresses({load: F, torque: raise, threadTorque: raiseThread, rootDiameter: g.rootDiameter, meanDiameter: g.meanDiameter, pitch: g.pitch, share, threads: 1, compression, family: g.spec.family});

  // Wear can take at most the whole nut-thread thickness at the screw's major diameter (w P).
  const threadThickness = g.shearWidthFactor * g.pitch;
  if (input.nutWear >= threadThickness) {
    throw new ScrewInputError('nutWear', `nut wear ${input.nutWear} mm is not less than the nut thread's thickness at the screw's major diameter (${threadThickness.toFixed(3)} mm): no thread would be left`);
  }
  const tolerance = classShearAreaFactor(g);
  const strip = stripping({
    load: F, major: g.major, nutMinor: g.nutMinorDiameter, pitch: g.pitch, nutLength: input.nutLength,
    shearWidthFactor: g.shearWidthFactor, nutShear: nut.shear, screwShear: scr.shear, wear: input.nutWear,
    areaFactor: tolerance.factor,
  });
  const allow = allowablePressure(nut.bearingClass, input.speed);
  const column = compression && input.length > 0 ? buckling(F, g.rootDiameter, input.length, input.ends, screwYield, scr.elasticModulus) : undefined;

  const partial: Omit<ScrewResult, 'flags'> = {
    thread: g.spec,
    geometry: {
      major: g.major, pitch: g.pitch, starts: g.starts, meanDiameter: g.meanDiameter, rootDiameter: g.rootDiameter,
      nutMinorDiameter: g.nutMinorDiameter, nutMajorDiameter: g.nutMajorDiameter, flankAngle: g.flankAngle,
      engagementDepth: g.engagementDepth, source: g.source,
    },
    lead: g.lead,
    leadAngle: (leadAngle(g.lead, g.meanDiameter) * 180) / Math.PI,
    friction: {thread: mu, collar: base.muCollar, collarDiameter: base.collarDiameter},
    torque: {raise: raise / 1000, lower: lower / 1000, collar: tc / 1000, raiseThread: raiseThread / 1000, lowerThread: lowerThread / 1000},
    efficiency: efficiency(F, g.lead, raise),
    threadEfficiency: efficiency(F, g.lead, raiseThread),
    selfLocking: isSelfLocking({...base, muThread: mu.min}),
    selfLockingFriction: selfLockingFriction(g.lead, g.meanDiameter, g.flankAngle),
    stress: {
      body: {axial: body.axial, torsion: body.torsion, vonMises: body.vonMises},
      firstThread: {
        bearing: root.bearing, bending: root.bending, bendingSquareThread: root.bendingSquareThread, shear: root.shear, transverseShear: root.transverseShear,
        axial: root.axial, torsion: root.torsion, vonMises: root.vonMises, maxShear: root.maxShear, principal: root.principal,
        vonMisesTextbook: root.vonMisesTextbook, maxShearTextbook: root.maxShearTextbook, principalTextbook: root.principalTextbook, share,
      },
    },
    nut: {
      material: nut.id, materialName: nut.name, materialSource: nut.source, engagedThreads: engaged,
      bearingPressure: bearingPressure(F, g.meanDiameter, input.nutLength),
      allowablePressure: input.allowablePressure !== undefined
        ? {min: input.allowablePressure, max: input.allowablePressure, condition: 'given', source: 'user'}
        : allow ?? null,
      stripping: {nutForce: strip.nutForce, screwForce: strip.screwForce, nutArea: strip.nutArea, screwArea: strip.screwArea, weaker: strip.weaker, margin: strip.margin, wearToStrip: strip.wearToStrip},
    },
    screw: {material: scr.id, materialSource: input.screwYield !== undefined ? `yield given: ${screwYield} MPa; ${scr.source}` : scr.source, yield: screwYield, rm: scr.rm, elasticModulus: scr.elasticModulus},
    buckling: {
      checked: column !== undefined,
      criticalLoad: column?.criticalLoad ?? null,
      method: column?.method ?? null,
      slenderness: column?.slenderness ?? null,
      transitionSlenderness: column?.transitionSlenderness ?? null,
      ends: input.ends,
      endConstant: column?.endConstant ?? 0,
      margin: column && F > 0 ? column.margin : null,
      source: END_CONDITION_SOURCE,
    },
    input: {loadDirection: input.loadDirection, load: F, nutLength: input.nutLength},
    ...(solved ? {torqueSolve: {torque: solved.torque, solves: solved.solves, load: F, friction: solved.friction, outsidePublished: solved.outside}} : {}),
    sources: [
      g.source,
      "Shigley's Mechanical Engineering Design, 9th ed.: Eqs. 8-1 to 8-6 (torque, efficiency, self-locking), Eqs. 8-7 to 8-12 and p. 419 (stresses, 0.38 first-thread share; first-thread stresses shared with tapwright check, plus the tangential shear from the thread torque: common practice, no source), Eq. 5-14 (von Mises), Eqs. 4-42/4-43 and 8-9 with Table 4-2 (columns)",
      allow?.source ?? '',
    ].filter(s => s !== ''),
    notes: [
      ...g.notes,
      tolerance.note,
      `body torsion uses the full raising torque with collar (conservative); the first thread's tangential shear only the thread torque (the collar torque does not pass the flanks)`,
      ...(solved ? [solved.note] : []),
      `first thread: von Mises with the tangential shear from the thread torque (as tapwright check); the textbook value without it (Shigley p. 419 state) is vonMisesTextbook`,
      ...(column ? [] : [compression ? 'no column check: give --length' : 'screw in tension: no column check']),
    ],
  };
  const flags = screwFlags({
    r: partial, load: F, muMin: mu.min, flankAngle: g.flankAngle,
    allowableOverride: input.allowablePressure,
    collarIncomplete: (input.muCollar > 0) !== (input.collarDiameter > 0),
    pitchListed: g.spec.isStandardPitch || g.spec.family === 'square',
  });
  return {...partial, flags: applyDuty(flags, input.duty)};
}

/** checkScrew that returns a message instead of throwing, for the workbench. */
export function tryCheckScrew(input: ScrewInput): Parsed<ScrewResult> & {field?: keyof ScrewInput} {
  try {
    return {ok: true, value: checkScrew(input)};
  } catch (e) {
    if (e instanceof ScrewInputError) return {ok: false, error: e.message, field: e.field};
    throw e;
  }
}
