/**
 * checkJoint: the joint mechanics in one pure call. Tightening (VDI 2230 Part 1),
 * first-thread and body stresses (Shigley 9th ed. section 8-2), per-thread load share
 * (spring chain), stripping and required engagement (FED-STD-H28/2B; Alexander 1977 /
 * VDI 2230), margins and flags. Working units: mm, N, N·m, MPa.
 */
import type {JointInput} from './input.js';
import type {CheckResult} from './result.js';
import {JointInputError} from './errors.js';
import {lengthText, resolveJoint, resolveNotes, type ResolvedJoint} from './resolve.js';
import {stressDiameter, tighten, type ThreadSection} from './tightening.js';
import {FIRST_THREAD_SHARE_LONG, LONG_ENGAGEMENT_THREADS, internalRootVonMises, rootStresses, shankStresses} from './thread-stress.js';
import {FIRST_THREAD_VON_MISES_NOTE} from '../thread-stress.js';
import {upperTensileStrength} from '../materials/bolt-upper-strength.js';
import {chainBeta, hexNutArea, longEngagementFirstShare, tappedBodyArea, threadShares} from './load-share.js';
import {alexander, externalShearAreaPerMm, fedStdEngagement, internalShearAreaPerMm, type StrippingLimits} from './stripping.js';
import {measuredStrippingLimits} from './measured.js';
import {WIRE_METHOD_SOURCE} from '../threads/measure-wires.js';
import {BLIND_HOLE_INCOMPLETE_PITCHES, jointFlags, type FlagContext} from './flags.js';
import type {Flag} from '../types.js';
import type {UnitSystem} from '../units.js';
import {applyDuty} from '../duty.js';
import {checkService} from '../service/check.js';
import {ServiceInputSchema} from '../service/input.js';
import type {ServiceResult} from '../service/result.js';

export {JointInputSchema, FrictionRangeSchema, type JointInput, type JointInputDraft} from './input.js';
export type {CheckResult} from './result.js';
export {JointInputError} from './errors.js';
export {resolveJoint} from './resolve.js';
export {FIRST_THREAD_VON_MISES_NOTE, FIRST_THREAD_VON_MISES_SHORT} from '../thread-stress.js';

export const SOURCES: readonly string[] = [
  'VDI 2230 Part 1: tightening torque, thread torque, permissible assembly preload (friction as defined in ISO 16047)',
  'Shigley, Mechanical Engineering Design, 9th ed., section 8-2, Eqs. 8-7 to 8-12 and p. 419 (first thread 0.38 of the load); Eq. 5-14 (von Mises)',
  'Root bending: tooth cantilever 6 F h/(pi dr (w p)^2) with root widths w per profile (R. L. Norton, Machine Design: An Integrated Approach, 4th ed., chapter "Screws and Fasteners"; from memory); the square-thread value 6F/(pi dr p), Shigley Eq. 8-11, beside it',
  'Spring-chain load share of the Sopwith (1948) / Yamamoto (1980) type, calibrated to the 0.38 first-thread share',
  'FED-STD-H28/2B shear areas and Formula 1 with J (also Machinery\'s Handbook, "length of engagement"), least-material limits',
  'Alexander (1977), as used in VDI 2230 Part 1: C1, C2, C3 factors (from memory)',
  'Bolt-breaks-first at the upper bolt strength Rm,max, as VDI 2230 Part 1 section 5.5.5 does (from memory); the margin at Rm,min is shown beside it',
];

/**
 * Thread length lost at the faces, mm: the chamfer given; for a nut without one, the standard
 * countersink on the loaded face, and on the far face too when the bolt passes through the nut
 * (`countersink` per face from resolveJoint: ISO 4032 da max / ASME B18.2.2, 120 deg, from memory).
 */
export function engagementLoss(input: JointInput, nut: {height: number; countersink?: number} | undefined): number {
  if (input.chamfer > 0 || input.internal !== 'nut' || !nut?.countersink) return input.chamfer;
  return nut.countersink * (input.engagement >= nut.height - 1e-9 ? 2 : 1);
}

/** Full thread engaged, mm: the engaged length less the chamfer (or a nut's countersinks), cut to the nut height or the blind hole's full thread. */
export function effectiveEngagement(input: JointInput, pitch: number, nutHeight: number | undefined, loss: number = input.chamfer): number {
  let usable = input.engagement;
  if (input.internal === 'nut' && nutHeight !== undefined) usable = Math.min(usable, nutHeight);
  if (input.internal === 'tapped' && input.holeDepth !== undefined) {
    usable = Math.min(usable, input.holeDepth - BLIND_HOLE_INCOMPLETE_PITCHES * pitch);
  }
  return Math.max(0, usable - loss);
}

/** Check a joint. Throws JointInputError (with the field at fault) when it cannot be computed. */
export function checkJoint(input: JointInput): CheckResult {
  return checkResolved(input, resolveJoint(input));
}

/** Check a joint whose thread and materials are already resolved (for the repair planner and tests). */
export function checkResolved(input: JointInput, r: ResolvedJoint): CheckResult {
  const g = r.geometry;
  const P = g.pitch;
  if (input.chamfer >= input.engagement) {
    const text = (u: UnitSystem) => `the chamfer (${lengthText(input.chamfer, u)}) must be shorter than the engaged length (${lengthText(input.engagement, u)})`;
    throw new JointInputError('chamfer', text('si'), text('us'));
  }
  if (input.tightening === 'torque' && input.torque === undefined) throw new JointInputError('torque', 'tightening by torque needs the torque');
  if (input.tightening === 'preload' && input.preload === undefined) throw new JointInputError('preload', 'tightening to a preload needs the preload');

  const section: ThreadSection = {pitch: P, nominal: g.nominal, d2: g.pitchDiameter, d3: g.minorDiameterExternal, stressArea: g.stressArea};
  const t = tighten({
    section,
    rp: r.bolt.rp,
    mode: input.tightening,
    ...(input.torque !== undefined ? {torqueNm: input.torque} : {}),
    ...(input.preload !== undefined ? {preload: input.preload} : {}),
    utilisation: input.utilisation,
    muThread: input.muThread,
    muHead: input.muHead,
    ...(input.nutFactor !== undefined ? {nutFactor: input.nutFactor} : {}),
    bearingDiameter: r.bearingDiameter,
    scatter: input.scatter,
  });

  // Engagement and load share.
  const loss = engagementLoss(input, r.nut);
  const le = effectiveEngagement(input, P, r.nut?.height, loss);
  const engagedThreads = le / P;
  const beta = chainBeta({
    nominal: g.nominal,
    pitch: P,
    boltArea: g.stressArea,
    internalArea: r.nut ? hexNutArea(r.nut.flats, g.nominal) : tappedBodyArea(g.nominal),
    boltModulus: r.bolt.elasticModulus,
    internalModulus: r.internal.elasticModulus,
  });
  const loadShare = threadShares(engagedThreads, beta);
  // Fewer than 6 threads: the chain's rise over its own long-engagement share, applied to the book's 0.38
  // (for the calibration joint, a steel nut, this is the chain share itself). Never below 0.38, never above 1.
  const firstShare =
    engagedThreads >= LONG_ENGAGEMENT_THREADS
      ? FIRST_THREAD_SHARE_LONG
      : Math.min(1, Math.max(FIRST_THREAD_SHARE_LONG, (FIRST_THREAD_SHARE_LONG * (loadShare[0] ?? 1)) / longEngagementFirstShare(beta)));

  // Stresses at the largest bolt load: max preload plus the full service load (conservative).
  const boltLoad = t.preload.max + input.serviceLoad;
  const threadTorqueNmm = t.threadTorque * 1000;
  const root = rootStresses({force: boltLoad, torque: threadTorqueNmm, dr: g.minorDiameterExternal, dm: g.pitchDiameter, pitch: P, share: firstShare, nt: 1, family: g.spec.family});
  const shank = shankStresses(boltLoad, threadTorqueNmm, g.stressArea, stressDiameter(section));
  const internalVm = internalRootVonMises(boltLoad, threadTorqueNmm, g.nominal, P, firstShare, g.spec.family, g.pitchDiameter);

  // Stripping at the measured diameters where given, the least-material limits elsewhere.
  const asMeasured = measuredStrippingLimits(g, input.measured);
  const limits: StrippingLimits = asMeasured.limits;
  const asS = externalShearAreaPerMm(limits) * le;
  const asN = internalShearAreaPerMm(limits) * le;
  const externalForce = r.bolt.shear * asS;
  const internalForce = r.internal.shear * asN;
  const boltBreakForceMin = g.stressArea * r.bolt.rm;
  // VDI 2230 Part 1 minimum engagement: the strongest bolt the grade allows must still break first (Rm,max; from memory).
  const upper = upperTensileStrength(r.bolt.id, r.bolt.rm, g.nominal);
  const boltBreakForce = g.stressArea * upper.rm;
  const weaker = externalForce <= internalForce ? 'external' : 'internal';
  const weakerForce = Math.min(externalForce, internalForce);
  const fed = fedStdEngagement(limits, g.stressArea, r.bolt.rm, r.internal.rm);
  const alex = alexander(limits, r.bolt.shear, r.internal.shear, boltBreakForce, r.nut ? r.nut.flats / g.nominal : undefined);

  const result: CheckResult = {
    geometry: g,
    materials: {
      bolt: {id: r.bolt.id, name: r.bolt.name, rm: r.bolt.rm, rp: r.bolt.rp, shear: r.bolt.shear, provenance: r.bolt.provenance, rmUpper: upper.rm, rmUpperSource: upper.source},
      internal: {id: r.internal.id, name: r.internal.name, rm: r.internal.rm, shear: r.internal.shear, provenance: r.internal.provenance},
    },
    tightening: {
      preload: t.preload,
      torque: t.torque,
      utilisation: t.utilisation,
      permissiblePreload: t.permissiblePreload,
      permissibleTorque: t.permissibleTorque,
      assemblyVonMises: t.assemblyVonMises,
      method: t.method,
      bearingDiameter: r.bearingDiameter,
      bearingSource: r.bearingSource,
      threadTorque: t.threadTorque,
    },
    stress: {
      firstThread: {
        axial: root.axial, bending: root.bending, shear: root.shear, torsion: root.torsion, bearing: root.bearing, vonMises: root.vonMises,
        bendingSquareThread: root.bendingSquareThread, vonMisesSquareThread: rootStresses({force: boltLoad, torque: threadTorqueNmm, dr: g.minorDiameterExternal, dm: g.pitchDiameter, pitch: P, share: firstShare, nt: 1}).vonMises,
      },
      shank,
      firstThreadNote: FIRST_THREAD_VON_MISES_NOTE,
    },
    loadShare,
    firstThreadShare: firstShare,
    loadShareBeta: beta,
    boltLoad,
    stripping: {
      external: {force: externalForce, shearArea: asS, shearStrength: r.bolt.shear},
      internal: {force: internalForce, shearArea: asN, shearStrength: r.internal.shear},
      boltBreakForce: boltBreakForceMin,
      boltBreakForceUpper: boltBreakForce,
      weaker,
      requiredEngagement: {fedStd: fed.required, alexander: alex.required},
      requiredEngagedLength: {fedStd: fed.required + loss, alexander: alex.required + loss},
      engagementLoss: loss,
      effectiveEngagement: le,
      engagedThreads,
      limitsUsed: asMeasured.limitsUsed,
      limits: {knMax: limits.knMax, esMin: limits.esMin, dsMin: limits.dsMin, enMax: limits.enMax},
      ...(input.measured !== undefined
        ? {asMeasured: {items: asMeasured.items, notes: asMeasured.notes, upperBound: asMeasured.upperBound}}
        : {}),
      fedStd: {le: fed.le, j: fed.j},
      alexander: {rs: alex.rs, c1: alex.c1, c2: alex.c2, c3: alex.c3, externalForce: alex.externalPerMm * le, internalForce: alex.internalPerMm * le, outOfRange: alex.outOfRange},
    },
    margin: {
      stripping: weakerForce / boltLoad,
      boltBreaksFirst: weakerForce / boltBreakForce,
      boltBreaksFirstMinStrength: weakerForce / boltBreakForceMin,
      firstThreadYieldBolt: root.vonMises / r.bolt.rp,
      firstThreadYieldInternal: internalVm / r.internal.yield,
    },
    ...(r.nut?.matchesBolt !== undefined ? {nutMatchesBolt: r.nut.matchesBolt} : {}),
    flags: [],
    notes: [...r.notes, ...g.notes],
    sources: input.measured?.overWires !== undefined ? [...SOURCES, WIRE_METHOD_SOURCE] : [...SOURCES],
  };
  const service = serviceOf(input, result, 'si');
  if (service) result.service = service;
  result.flags = applyDuty([...jointFlags(flagContext(result, input, 'si')), ...(service?.flags ?? [])], input.duty);
  return result;
}

/** Service inputs with every default: a joint that gives a service load but no `service` object. */
const NO_SERVICE_INPUT = ServiceInputSchema.parse({});

/**
 * The service state (src/core/service, checkService) of a checked joint, when the input
 * describes it (`service`) or carries a service load; undefined otherwise. Without clamped
 * parts it says the service load is taken in full by the bolt. Flags written in `units`.
 */
function serviceOf(input: JointInput, result: CheckResult, units: UnitSystem): ServiceResult | undefined {
  if (input.service === undefined && !(input.serviceLoad > 0)) return undefined;
  return checkService(input, result, input.service ?? NO_SERVICE_INPUT, units);
}

/** The inputs of the flag rules, read from a result and its input (forces N, lengths mm). */
function flagContext(result: CheckResult, input: JointInput, units: UnitSystem): FlagContext {
  const st = result.stripping;
  const t = result.tightening;
  const g = result.geometry;
  return {
    internalKind: input.internal,
    maxPreload: t.preload.max,
    serviceLoad: input.serviceLoad,
    weaker: st.weaker,
    weakerForce: Math.min(st.external.force, st.internal.force),
    boltBreakForce: st.boltBreakForceUpper ?? st.boltBreakForce,
    boltBreakForceMin: st.boltBreakForce,
    ...(result.nutMatchesBolt ? {matchingNut: true} : {}),
    requiredMargin: input.requiredMargin,
    engagedThreads: st.engagedThreads,
    firstShare: result.firstThreadShare,
    effectiveEngagement: st.effectiveEngagement,
    requiredFedStd: st.requiredEngagement.fedStd,
    requiredAlexander: st.requiredEngagement.alexander,
    utilisation: t.utilisation,
    utilisationLimit: input.utilisation,
    engagement: input.engagement,
    pitch: g.pitch,
    ...(input.internal === 'tapped' && input.holeDepth !== undefined ? {holeDepth: input.holeDepth} : {}),
    isStandardPitch: g.spec.isStandardPitch,
    designation: g.spec.designation,
    modelRangeNotes: st.alexander.outOfRange ?? [],
    bearingEstimated: t.bearingSource === 'estimate' && t.method === 'friction',
    bearingDiameter: t.bearingDiameter,
    // FM,zul is proportional to the utilisation (VDI 2230 Part 1 closed form), so the yield preload is FM,zul / nu.
    ...(input.utilisation > 0 ? {yieldPreload: t.permissiblePreload / input.utilisation} : {}),
    units,
  };
}

/**
 * The result's notes with their lengths in `units` (US: in), for the reports; result.notes
 * (and so the JSON) stay in SI. The hardware-table notes are rebuilt for the result's thread;
 * the thread's own notes (metric pitches, tolerance sources) are the same in both systems.
 */
export function notesInUnits(result: CheckResult, input: JointInput, units: UnitSystem): string[] {
  if (units === 'si') return result.notes;
  return [...resolveNotes(input, result.geometry, units), ...result.geometry.notes];
}

/**
 * The result's flags with their messages written in `units` (US: lbf, in), for the
 * text and Markdown reports (the service flags of result.service included, recomputed in `units`). Same codes, levels and order as result.flags, which
 * (and so the JSON) stay in SI. A result without the model-range notes (built
 * outside checkResolved) keeps its flags as they are.
 */
export function flagsInUnits(result: CheckResult, input: JointInput, units: UnitSystem): Flag[] {
  if (units === 'si' || result.stripping.alexander.outOfRange === undefined) return result.flags;
  const service = result.service ? serviceOf(input, result, units) : undefined;
  return applyDuty([...jointFlags(flagContext(result, input, units)), ...(service?.flags ?? [])], input.duty);
}
