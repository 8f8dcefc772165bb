/**
 * Tightening: torque, preload and the assembly stress of the threaded section.
 * Method: VDI 2230 Part 1 (2003/2015), friction coefficients as defined in ISO 16047.
 * Units: lengths mm, forces N, torques N·mm inside this file (N·m only at the edges
 * where a name ends in Nm), stresses MPa.
 */
import {vonMisesAxialShear} from './von-mises.js';

/** Section data of the threaded part, mm and mm². */
export interface ThreadSection {
  /** Pitch P, mm. */
  pitch: number;
  /** Nominal diameter d, mm (for the nut-factor form T = K F d). */
  nominal: number;
  /** Pitch diameter d2, mm. */
  d2: number;
  /** Minor diameter of the external thread d3, mm. */
  d3: number;
  /** Tensile stress area As, mm². */
  stressArea: number;
}

/** d0 = (d2 + d3)/2, mm: the diameter of the stress section (VDI 2230 Part 1, threaded section). */
export function stressDiameter(s: ThreadSection): number {
  return (s.d2 + s.d3) / 2;
}

/**
 * Torque per unit preload, mm (MA = FM x this): 0.16 P + 0.58 d2 muG + muK DKm / 2.
 * Source: VDI 2230 Part 1, tightening torque MA; ISO 16047 friction definitions.
 */
export function torquePerPreload(s: ThreadSection, muG: number, muK: number, bearingDiameter: number): number {
  return 0.16 * s.pitch + 0.58 * s.d2 * muG + (muK * bearingDiameter) / 2;
}

/** Nut-factor form: torque per unit preload K d, mm (T = K F d; Shigley 9th ed. Eq. 8-27). */
export function torquePerPreloadNutFactor(s: ThreadSection, nutFactor: number): number {
  return nutFactor * s.nominal;
}

/**
 * Thread torque per unit preload, mm: MG/FM = (d2/2)(P/(pi d2) + 1.155 muG), with 1.155 = 1/cos 30 deg.
 * Source: VDI 2230 Part 1, thread torque MG.
 */
export function threadTorquePerPreload(s: ThreadSection, muG: number): number {
  return (s.d2 / 2) * (s.pitch / (Math.PI * s.d2) + 1.155 * muG);
}

/**
 * Assembly von Mises stress in the threaded section per unit preload, MPa/N:
 * sqrt(sigma^2 + 3 tau^2) with sigma = FM/As and tau = MG / (pi d0^3 / 12).
 * The torsion modulus pi d0^3/12 (fully plastic round section) is the one implied by the
 * VDI 2230 Part 1 closed form for FM,zul (its factor 3/2 = 2 x 3/4); using it keeps
 * "utilisation at FM,zul = nu" exact. (Our reading of the closed form, checked by the VDI
 * table values in the tests.)
 */
export function assemblyStressPerPreload(s: ThreadSection, muG: number): number {
  const d0 = stressDiameter(s);
  const wpPlastic = (Math.PI * d0 ** 3) / 12;
  return vonMisesAxialShear(1 / s.stressArea, threadTorquePerPreload(s, muG) / wpPlastic);
}

/**
 * Permissible assembly preload FM,zul, N, for a utilisation nu of the minimum yield Rp0.2:
 * FM,zul = A0 nu Rp0.2 / sqrt(1 + 3 [ (3/2)(d2/d0)(P/(pi d2) + 1.155 muGmin) ]^2), A0 = As.
 * Source: VDI 2230 Part 1, permissible assembly preload (the tabulated values use nu = 0.9).
 */
export function permissiblePreload(s: ThreadSection, rp: number, nu: number, muGmin: number): number {
  const d0 = stressDiameter(s);
  const k = 1.5 * (s.d2 / d0) * (s.pitch / (Math.PI * s.d2) + 1.155 * muGmin);
  return (s.stressArea * nu * rp) / Math.sqrt(1 + 3 * k * k);
}

/** Friction coefficients as a range (min <= max). */
export interface FrictionRange {
  min: number;
  max: number;
}

export interface TighteningInput {
  section: ThreadSection;
  /** Bolt minimum yield Rp0.2, MPa. */
  rp: number;
  mode: 'torque' | 'preload' | 'utilisation';
  /** Given torque, N·m (mode torque). */
  torqueNm?: number;
  /** Given target preload (nominal, at the middle of the friction range), N (mode preload). */
  preload?: number;
  /** Utilisation limit nu of Rp0.2 (target in mode utilisation, limit otherwise). */
  utilisation: number;
  muThread: FrictionRange;
  muHead: FrictionRange;
  /** Nut factor K; when set, T = K F d replaces the friction form for torque/preload. */
  nutFactor?: number;
  /** Effective bearing diameter DKm, mm. */
  bearingDiameter: number;
  /** Tightening scatter alphaA beyond the friction range, >= 1. */
  scatter: number;
}

export interface TighteningResult {
  preload: {min: number; nominal: number; max: number};
  /** N·m */
  torque: number;
  /** Largest assembly von Mises stress / Rp0.2 over the friction range. */
  utilisation: number;
  /** MPa, at the governing (largest-stress) corner. */
  assemblyVonMises: number;
  permissiblePreload: number;
  /** N·m */
  permissibleTorque: number;
  /** Thread torque at the max-preload state, N·m. */
  threadTorque: number;
  /** Thread friction at the governing corner. */
  governingMuThread: number;
  method: 'friction' | 'nut-factor';
}

/** Thread friction values sampled across the range for the worst-case stress (the ends and three inner points). */
function muSamples(r: FrictionRange): number[] {
  const out: number[] = [];
  for (let i = 0; i <= 4; i++) out.push(r.min + ((r.max - r.min) * i) / 4);
  return out;
}

/**
 * The part of the tightening factor alphaA not already covered by the friction range, >= 1:
 * max(1, alphaA / Rf), Rf = FM,max / FM,min from the friction range alone at one torque. alphaA is
 * VDI 2230 Part 1's FM,max / FM,min (Table A8; its values include the friction scatter of a
 * friction class, from memory), so alphaA and the friction range combine to a total spread of
 * max(alphaA, Rf), never alphaA x Rf.
 */
export function scatterBeyondFriction(alphaA: number, frictionSpread: number): number {
  return Math.max(1, alphaA / Math.max(1, frictionSpread));
}

/**
 * Preload range, torque and utilisation for one tightening specification.
 * Torque mode: the largest preload comes with the lowest friction, the smallest with the highest
 * (FM = MA / (0.16P + 0.58 d2 muG + muK DKm/2), VDI 2230 Part 1). The scatter factor alphaA is the
 * TOTAL spread FM,max / FM,min, as VDI 2230 Part 1 defines it (Table A8 values include the friction
 * scatter; from memory). So it is not applied on top of the friction range: when alphaA exceeds the
 * friction spread Rf = K(muG,max, muK,max) / K(muG,min, muK,min) at one torque, only the rest,
 * alphaA / Rf, widens the range symmetrically (max x sqrt, min / sqrt), so FM,max / FM,min = alphaA;
 * when alphaA <= Rf the friction range already covers it and nothing is added (scatterBeyondFriction).
 * Utilisation mode: the torque is set so that the largest assembly stress in the friction range
 * reaches nu Rp0.2; with one friction value and alphaA = 1 this is VDI's MA for FM,zul.
 * Preload mode: the target is the nominal preload at the middle of the friction range.
 */
export function tighten(t: TighteningInput): TighteningResult {
  const s = t.section;
  const useK = t.nutFactor !== undefined;
  const kOf = (muG: number, muK: number): number =>
    useK ? torquePerPreloadNutFactor(s, t.nutFactor as number) : torquePerPreload(s, muG, muK, t.bearingDiameter);
  const root = Math.sqrt(scatterBeyondFriction(t.scatter, kOf(t.muThread.max, t.muHead.max) / kOf(t.muThread.min, t.muHead.min)));
  const muGmid = (t.muThread.min + t.muThread.max) / 2;
  const muKmid = (t.muHead.min + t.muHead.max) / 2;
  const kMid = kOf(muGmid, muKmid);

  // Largest assembly stress per N·mm of torque over the max-preload side (muK at its minimum).
  let worstPerTorque = 0;
  let governingMu = t.muThread.min;
  for (const muG of muSamples(t.muThread)) {
    const v = (assemblyStressPerPreload(s, muG) * root) / kOf(muG, t.muHead.min);
    if (v > worstPerTorque) {
      worstPerTorque = v;
      governingMu = muG;
    }
  }

  let torqueNmm: number;
  if (t.mode === 'torque') torqueNmm = (t.torqueNm ?? 0) * 1000;
  else if (t.mode === 'preload') torqueNmm = (t.preload ?? 0) * kMid;
  else torqueNmm = (t.utilisation * t.rp) / worstPerTorque;

  const maxPreload = (torqueNmm / kOf(t.muThread.min, t.muHead.min)) * root;
  const minPreload = torqueNmm / kOf(t.muThread.max, t.muHead.max) / root;
  const nominal = t.mode === 'preload' ? (t.preload ?? 0) : torqueNmm / kMid;
  const assemblyVonMises = torqueNmm * worstPerTorque;
  // Friction form: the permissible preload is VDI's FM,zul at the lowest thread friction (the
  // highest-preload corner). Nut-factor form: the preload does not depend on friction, so the
  // highest stress comes with the governing (highest) thread friction; FM,zul and the thread torque
  // use it, so the permissible preload and torque agree with the utilisation shown.
  const muPermissible = useK ? governingMu : t.muThread.min;
  const fmZul = permissiblePreload(s, t.rp, t.utilisation, muPermissible);
  return {
    preload: {min: minPreload, nominal, max: maxPreload},
    torque: torqueNmm / 1000,
    utilisation: assemblyVonMises / t.rp,
    assemblyVonMises,
    permissiblePreload: fmZul,
    permissibleTorque: (fmZul * kOf(t.muThread.min, t.muHead.min)) / 1000,
    threadTorque: (maxPreload * threadTorquePerPreload(s, muPermissible)) / 1000,
    governingMuThread: governingMu,
    method: useK ? 'nut-factor' : 'friction',
  };
}
