/**
 * Loads of the preloaded joint in service: bolt and member loads, separation,
 * the factors of safety, embedding and thermal preload change, slip.
 * Working units: N, mm, N/mm, MPa, 1/K, K.
 */
import {EMBEDDING_TABLE} from '../materials/service-data.js';

/**
 * Bolt load F_b = C P + F_i and member load F_m = (1 - C) P - F_i (negative: compression), N
 * (Marks' Calculations for Machine Design, Eqs. 8.39-8.41; Shigley 9th ed. section 8-7).
 */
export function boltAndMemberLoads(C: number, P: number, Fi: number): {bolt: number; members: number} {
  return {bolt: C * P + Fi, members: (1 - C) * P - Fi};
}

/** Load at which the joint separates, P0 = F_i / (1 - C), N (Marks Eq. 8.47). */
export function separationLoad(Fi: number, C: number): number {
  return Fi / (1 - C);
}

/** Factor against separation n0 = F_i / [P (1 - C)] (Shigley 9th ed. Eq. 8-30; Marks Eq. 8.49); Infinity when P = 0. */
export function separationFactor(Fi: number, P: number, C: number): number {
  return P > 0 ? Fi / (P * (1 - C)) : Infinity;
}

/** Yield (proof) factor n_p = S_p A_t / (C P + F_i) (Shigley 9th ed. Eq. 8-28). S_p MPa, A_t mm², N. */
export function yieldFactor(proofStress: number, stressArea: number, C: number, P: number, Fi: number): number {
  return (proofStress * stressArea) / (C * P + Fi);
}

/** Load factor n_L = (S_p A_t - F_i) / (C P) (Shigley 9th ed. Eq. 8-29; Marks Eq. 8.44); Infinity when P = 0. */
export function loadFactor(proofStress: number, stressArea: number, C: number, P: number, Fi: number): number {
  return P > 0 ? (proofStress * stressArea - Fi) / (C * P) : Infinity;
}

/**
 * Embedding amount f_Z, mm, from the VDI 2230 Part 1 guide values (Table 5, from memory):
 * thread + each head or nut bearing face + each inner interface, by mean roughness Rz (um)
 * and by load (shear values when a transverse load acts).
 */
export function embeddingAmount(o: {roughness: number; bearingFaces: number; interfaces: number; shear: boolean}): number {
  const row = EMBEDDING_TABLE.find(r => o.roughness < r.rzBelow) ?? EMBEDDING_TABLE[EMBEDDING_TABLE.length - 1];
  const [thread, bearing, inner] = (o.shear ? row?.shear : row?.axial) ?? [3, 4, 3];
  return (thread + bearing * o.bearingFaces + inner * o.interfaces) / 1000;
}

/**
 * Preload lost to embedding, N: F_Z = f_Z / (delta_S + delta_P) with delta = 1/k
 * (VDI 2230 Part 1, preload loss by embedding; from memory). f_Z mm, k N/mm.
 */
export function embeddingLoss(fz: number, kb: number, km: number): number {
  return fz / (1 / kb + 1 / km);
}

/**
 * Preload change from temperature, N (+ = gain): dF = (sum alpha_i t_i - alpha_b l) dT / (1/k_b + 1/k_m).
 * Compatibility of bolt and parts with Hooke's law (derived; equals the rigid-joint form of
 * Bickford, An Introduction to the Design and Behavior of Bolted Joints, Eq. 11.13, when 1/k_m -> 0).
 * alpha 1/K, lengths mm (the parts' effective thicknesses in the grip), dT K.
 */
export function thermalChange(o: {parts: readonly {thickness: number; expansion: number}[]; boltExpansion: number; grip: number; deltaT: number; kb: number; km: number}): number {
  const parts = o.parts.reduce((s, p) => s + p.expansion * p.thickness, 0);
  return ((parts - o.boltExpansion * o.grip) * o.deltaT) / (1 / o.kb + 1 / o.km);
}

/**
 * Clamp load needed against slip, N: F_KQerf = F_Q / (q_F mu_T) (VDI 2230 Part 1:2003 R12/2,
 * transverse-force term, as quoted in a published commentary on the standard); q_F = 1 interface.
 */
export function requiredClampForSlip(transverse: number, friction: number, interfaces = 1): number {
  return transverse / (interfaces * friction);
}
