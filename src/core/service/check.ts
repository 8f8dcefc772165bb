/**
 * checkService: the service state of a checked joint in one pure call (issue 16).
 * Stiffness (Shigley 9th ed. Table 8-7, Eqs. 8-17, 8-18, 8-23; Marks Eq. 8.20), joint
 * constant, loads and factors (Shigley Eqs. 8-28 to 8-30), embedding (VDI 2230 Part 1,
 * from memory), thermal change (derived; Bickford Eq. 11.13 form), fatigue (Shigley
 * Eqs. 8-35, 8-36, 8-45, 8-51, Table 8-17; VDI 2230 thread endurance, from memory),
 * surface pressure (VDI 2230 limiting pressures) and slip (VDI 2230 R12/2).
 * Working units: mm, N, N/mm, MPa.
 */
import type {CheckResult} from '../joint/result.js';
import type {JointInput} from '../joint/input.js';
import {JointInputError} from '../joint/errors.js';
import {boltGrade, hexHeadBearing} from '../materials/index.js';
import {boltExpansion, EMBEDDING_SOURCE} from '../materials/service-data.js';
import type {UnitSystem} from '../units.js';
import type {ServiceInput} from './input.js';
import type {ServiceResult} from './result.js';
import {resolvePart, type ResolvedPart} from './materials.js';
import {boltStiffness, effectiveGrip, exponentialMemberStiffness, jointConstant, memberStiffness} from './stiffness.js';
import {embeddingAmount, embeddingLoss, loadFactor, requiredClampForSlip, separationFactor, thermalChange, yieldFactor} from './loads.js';
import {enduranceStrength, threadFatigue, vdiThreadEndurance} from './fatigue.js';
import {bearingArea, washerDiameterFor} from './bearing.js';
import {serviceFlags, type ServiceFlagContext} from './flags.js';
import {finiteOnly} from './json.js';

export const SERVICE_SOURCES: readonly string[] = [
  "Shigley's Mechanical Engineering Design, 9th ed. (Budynas and Nisbett): Table 8-7 (grip, thread length), Eq. 8-17 (bolt stiffness), Eq. 8-18 (members in series), Eq. 8-23 with Table 8-8 (exponential member-stiffness fit), Eqs. 8-28 to 8-30 (yield, load and separation factors), Eqs. 8-35, 8-36, 8-45, 8-51 and p. 445 (fatigue), Table 8-17 (endurance strengths)",
  "Marks' Calculations for Machine Design (Brown, 2005), Ch. 8: Eq. 8.20 (conical frustum at 30 deg, washer face 1.5 d), Eqs. 8.35-8.49 (load sharing, separation)",
  'VDI 2230 Part 1: embedding guide values and preload loss (from memory), thread endurance limit 0.85 (150/d + 45) (2003 edition, from memory), limiting surface pressures, clamp load against slip (R12/2)',
  'Bickford, An Introduction to the Design and Behavior of Bolted Joints, Eq. 11.13 (differential thermal expansion); both springs kept (derived)',
];

/** Proof strength when no grade value applies: 0.85 of the yield (Marks' Calculations for Machine Design, sec. 8.2). */
export const PROOF_FROM_YIELD = 0.85;

function loadRange(input: JointInput, s: ServiceInput): {min: number; max: number; cyclic: boolean} {
  const l = s.serviceLoad ?? input.serviceLoad;
  if (typeof l === 'number') return {min: l, max: l, cyclic: false};
  return {min: l.min, max: l.max, cyclic: l.max > l.min};
}

/**
 * The service state of a joint already checked by checkJoint. Without `service.clamp` the
 * service load is taken in full by the bolt (C = 1) and only the yield and load factors are
 * given. Throws JointInputError naming `service.clamp` (or `service.boltLength`) for parts that
 * cannot be resolved.
 */
export function checkService(input: JointInput, result: CheckResult, service: ServiceInput, units: UnitSystem = 'si'): ServiceResult {
  const g = result.geometry;
  const d = g.nominal;
  const At = g.stressArea;
  const inch = g.spec.family === 'unified';
  const grade = boltGrade(input.boltGrade, d);
  const custom = result.materials.bolt.id === 'custom' || !grade;
  const sp = !custom && grade?.proofStress !== undefined ? grade.proofStress : PROOF_FROM_YIELD * result.materials.bolt.rp;
  const sut = result.materials.bolt.rm;
  const Eb = grade?.elasticModulus ?? 205_000;
  const load = loadRange(input, service);
  const notes: string[] = [];
  if (custom || grade?.proofStress === undefined) notes.push(`Proof strength taken as 0.85 x yield = ${sp.toFixed(0)} MPa (Marks' Calculations for Machine Design, sec. 8.2).`);

  const tp = result.tightening.preload;
  const preload =
    service.preloadProof !== undefined
      ? (() => {
          const f = service.preloadProof * sp * At;
          return {min: f, nominal: f, max: f, source: `${service.preloadProof} x proof load As x Sp (Marks Eqs. 8.25, 8.26: 0.75 reused, 0.90 permanent joints)`};
        })()
      : {min: tp.min, nominal: tp.nominal, max: tp.max, source: 'tightening range (largest preload for yield, smallest for separation)'};
  const proofLoad = sp * At;

  if (!service.clamp) {
    const boltLoadMax = preload.max + load.max;
    notes.push('Service load taken in full by the bolt: no clamped parts given (--clamp), so the share the parts carry, separation, embedding and fatigue are not computed.');
    return finiteOnly({
      model: 'in-full',
      jointConstant: 1,
      serviceLoad: load,
      preload,
      proofLoad,
      preloadRetained: {min: preload.min, max: preload.max},
      clampUnderLoad: preload.min - 0,
      embeddingLoss: 0,
      embeddingAmount: 0,
      embeddingSource: 'not computed without clamped parts',
      thermalChange: 0,
      boltLoadMax,
      factors: {yield: proofLoad / boltLoadMax, load: loadFactor(sp, At, 1, load.max, preload.max)},
      flags: [],
      notes,
      sources: [SERVICE_SOURCES[0] as string],
    });
  }

  const tapped = input.internal === 'tapped';
  const parts: ResolvedPart[] = service.clamp.map((p, i) => {
    const r = resolvePart(p, input.parentData);
    if (typeof r === 'string') throw new JointInputError('service.clamp', `--clamp: entry ${i + 1}: ${r}`);
    return r;
  });
  if (tapped && parts.length < 2) {
    throw new JointInputError('service.clamp', '--clamp: with a tapped hole list the parts under the head and, last, the part that holds the thread (at least two entries)');
  }
  const grip = effectiveGrip(parts.map(p => ({thickness: p.thickness, modulus: p.modulus})), d, tapped);
  const through = tapped ? grip.grip - (grip.layers[grip.layers.length - 1]?.thickness ?? 0) : grip.grip;
  if (service.boltLength !== undefined && service.boltLength <= through) {
    throw new JointInputError('service.boltLength', `--bolt-length ${service.boltLength.toFixed(1)} mm does not reach ${tapped ? 'the tapped part' : 'past the clamped parts'} (${through.toFixed(1)} mm${tapped ? ' above the tapped part' : ' of parts'}); give the bolt length under the head`);
  }
  const kbOut = boltStiffness({d, stressArea: At, modulus: Eb, grip: grip.grip, inch, ...(service.boltLength !== undefined ? {boltLength: service.boltLength} : {}), ...(service.threadLength !== undefined ? {threadLength: service.threadLength} : {})});
  if (service.boltLength === undefined && service.threadLength !== undefined) notes.push('Thread length given without the bolt length: the bolt is taken as threaded through the grip.');
  const kb = kbOut.stiffness;
  const km = memberStiffness(grip.layers, d).stiffness;
  const oneMaterial = parts.every(p => p.id === parts[0]?.id && p.modulus === parts[0]?.modulus);
  const first = parts[0] as ResolvedPart;
  const kmExp = oneMaterial ? exponentialMemberStiffness(first.modulus, d, grip.grip, first.fit.a, first.fit.b) : undefined;
  const C = jointConstant(kb, km);

  const transverse = service.transverseLoad ?? 0;
  const fz =
    service.embedding === 'auto'
      ? embeddingAmount({roughness: service.roughness, bearingFaces: tapped ? 1 : 2, interfaces: parts.length - 1, shear: transverse > 0})
      : service.embedding;
  const FZ = embeddingLoss(fz, kb, km);
  if (service.embedding === 'auto' && parts.some(p => p.modulus < 150_000)) {
    notes.push('Embedding guide values are for steel parts: softer parts (aluminium, cast iron, copper alloys) settle more, so the loss shown may be low.');
  }
  const embeddingSource = service.embedding === 'auto' ? `${EMBEDDING_SOURCE}; Rz ${service.roughness} um` : fz === 0 ? 'switched off (--embedding 0)' : 'amount given by the user';

  let dF = 0;
  if (service.serviceTemperature !== undefined) {
    const bolt = boltExpansion(input.boltGrade);
    const unknown = parts.filter(p => p.expansion === undefined);
    if (unknown.length > 0) notes.push(`Thermal expansion not known for ${unknown.map(p => p.name).join(', ')}: taken as the bolt's, so those parts add no thermal change.`);
    const inGrip = grip.layers.map((l, i) => ({thickness: l.thickness, expansion: parts[i]?.expansion ?? bolt.value}));
    dF = thermalChange({parts: inGrip, boltExpansion: bolt.value, grip: grip.grip, deltaT: service.serviceTemperature - service.assemblyTemperature, kb, km});
  }

  const retainedMin = Math.max(0, preload.min - FZ + Math.min(0, dF));
  const retainedMax = Math.max(0, preload.max - FZ + Math.max(0, dF));
  const FiHigh = preload.max + Math.max(0, dF);
  const separationLoad = retainedMin / (1 - C);
  const clampUnderLoad = retainedMin - (1 - C) * load.max;
  const boltLoadMax = Math.max(FiHigh + C * load.max, load.max);

  const factors: ServiceResult['factors'] = {
    // Shigley Eq. 8-28 while the joint stays closed; once open the bolt carries the whole load.
    yield: boltLoadMax > FiHigh + C * load.max ? proofLoad / boltLoadMax : yieldFactor(sp, At, C, load.max, FiHigh),
    load: loadFactor(sp, At, C, load.max, FiHigh),
    separation: separationFactor(retainedMin, load.max, C),
  };

  let fatigue: ServiceResult['fatigue'];
  if (load.cyclic) {
    const se = enduranceStrength(input.boltGrade, d);
    const seValue = se?.value ?? vdiThreadEndurance(d);
    const seSource = se?.source ?? {
      source: `no Shigley Table 8-17 value for grade ${input.boltGrade}: the VDI 2230 thread endurance limit (an amplitude limit, from memory) is compared with the alternating stress directly instead of a Goodman line`,
      kind: 'memory' as const,
    };
    const f = threadFatigue({C, pMin: load.min, pMax: load.max, preload: FiHigh, stressArea: At, se: seValue, seSource, sut, sp, d});
    // Without a Table 8-17 value the VDI limit already is the permissible amplitude: its factor replaces Goodman.
    const goodman = se ? f.goodman : f.vdiFactor;
    fatigue = {alternatingStress: f.alternatingStress, meanStress: f.meanStress, enduranceStrength: f.enduranceStrength, enduranceSource: f.enduranceSource.source, goodman, yieldCheck: f.yieldCheck, vdiEndurance: f.vdiEndurance, vdiFactor: f.vdiFactor};
    factors.fatigue = goodman;
    if (clampUnderLoad <= 0) notes.push('The joint opens under the largest load: the fatigue figures assume it stays closed and are not conservative.');
  }

  const head = hexHeadBearing(d, inch ? 'inch' : 'metric');
  const dw = head?.dwMin ?? 1.5 * d;
  const dh = head?.clearanceHole ?? 1.1 * d;
  if (!head) notes.push('Head bearing face taken as 1.5 d on a 1.1 d hole (no hexagon-head table row for this size; common practice, no source).');
  const Ap = bearingArea(dw, dh);
  const pHead = boltLoadMax / Ap;
  const last = parts[parts.length - 1] as ResolvedPart;
  const limit = first.limitingPressure;
  const nutLimit = !tapped ? last.limitingPressure : undefined;
  const worstLimit = Math.min(limit ?? Infinity, nutLimit ?? Infinity);
  const bearingPressure: ServiceResult['bearingPressure'] = {
    head: pHead,
    limit,
    ...(first.limitingPressureSource ? {limitSource: first.limitingPressureSource.source} : {}),
    ...(!tapped ? {nut: pHead, nutLimit} : {}),
    bearingDiameter: dw,
    holeDiameter: dh,
    ...(pHead > worstLimit ? {washerDiameter: washerDiameterFor(boltLoadMax, worstLimit, dh)} : {}),
  };
  if (limit === undefined) notes.push(`Limiting surface pressure not known for ${first.name}: the head pressure is shown without a limit.`);
  notes.push('Surface pressure checked on the first part under the head' + (tapped ? '' : ' and the last part above the nut') + '; how a washer spreads the load onto the part beneath it is not computed.');
  if (!tapped) notes.push('Nut bearing face taken as the head\'s (same width across flats); the nut pressure equals the head pressure.');

  let slip: ServiceResult['slip'];
  if (service.transverseLoad !== undefined) {
    const required = requiredClampForSlip(transverse, service.interfaceFriction);
    const available = Math.max(0, clampUnderLoad);
    slip = {transverseLoad: transverse, friction: service.interfaceFriction, requiredClamp: required, availableClamp: available, factor: required > 0 ? available / required : Infinity};
  }

  const ctx: ServiceFlagContext = {
    units,
    clampUnderLoad,
    separationLoad,
    serviceLoadMax: load.max,
    separationFactor: factors.separation ?? Infinity,
    ...(fatigue ? {fatigue: {goodman: fatigue.goodman, alternatingStress: fatigue.alternatingStress, enduranceStrength: fatigue.enduranceStrength, vdiFactor: fatigue.vdiFactor}} : {}),
    ...(bearingPressure.washerDiameter !== undefined
      ? {bearing: {where: limit !== undefined && pHead > limit ? ('head' as const) : ('nut' as const), pressure: pHead, limit: worstLimit, washer: bearingPressure.washerDiameter}}
      : {}),
    ...(slip ? {slip: {available: slip.availableClamp, required: slip.requiredClamp, factor: slip.factor ?? Infinity}} : {}),
  };

  return finiteOnly({
    model: 'shared',
    grip: grip.grip,
    parts: parts.map((p, i) => ({id: p.id, name: p.name, thickness: p.thickness, inGrip: grip.layers[i]?.thickness ?? 0, modulus: p.modulus, modulusSource: p.modulusSource, expansion: p.expansion})),
    stiffness: {
      bolt: kb,
      members: km,
      ...(kmExp !== undefined ? {membersExponential: kmExp} : {}),
      boltLengths: {unthreaded: kbOut.unthreaded, threaded: kbOut.threaded, ...(kbOut.threadLength !== undefined ? {threadLength: kbOut.threadLength} : {}), rule: kbOut.threadLengthRule},
    },
    jointConstant: C,
    serviceLoad: load,
    preload,
    proofLoad,
    separationLoad,
    preloadRetained: {min: retainedMin, max: retainedMax},
    clampUnderLoad,
    embeddingLoss: FZ,
    embeddingAmount: fz,
    embeddingSource,
    thermalChange: dF,
    boltLoadMax,
    factors,
    ...(fatigue ? {fatigue} : {}),
    bearingPressure,
    ...(slip ? {slip} : {}),
    flags: serviceFlags(ctx),
    notes,
    sources: [...SERVICE_SOURCES],
  });
}
