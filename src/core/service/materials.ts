/**
 * Clamped-part materials: a parent material of the library, a stiffness-table id
 * (Shigley 9th ed. Table 8-8: steel, aluminium, copper, grey cast iron), the user's
 * own material, or a modulus given directly. Each resolves to its modulus (MPa),
 * expansion (1/K), limiting surface pressure (MPa, when known) and their sources.
 */
import type {Provenance} from '../types.js';
import {listParentMaterials, parentMaterial} from '../materials/index.js';
import {PARENT_SERVICE_DATA, STIFFNESS_ALIASES, STIFFNESS_MATERIALS, WILEMAN_GENERAL, type StiffnessMaterial} from '../materials/service-data.js';
import type {UserParentMaterial} from '../joint/input.js';
import type {ClampPart} from './input.js';

export interface ResolvedPart {
  /** Thickness, mm (the whole part; the tapped part's effective share is set by the stiffness code). */
  thickness: number;
  /** Material id, or 'modulus' for a modulus given directly. */
  id: string;
  name: string;
  /** MPa */
  modulus: number;
  modulusSource: Provenance;
  /** 1/K, undefined when unknown (a modulus given directly). */
  expansion?: number;
  expansionSource?: Provenance;
  /** Limiting surface pressure p_G, MPa, undefined when unknown. */
  limitingPressure?: number;
  limitingPressureSource?: Provenance;
  /** Fit constants of the exponential member-stiffness fit (Shigley 9th ed. Table 8-8). */
  fit: {a: number; b: number; row: string};
}

/** The stiffness-table row of an id or alias (case-insensitive), or undefined. */
export function stiffnessMaterial(id: string): StiffnessMaterial | undefined {
  const key = id.trim().toLowerCase();
  const target = STIFFNESS_ALIASES[key] ?? key;
  return STIFFNESS_MATERIALS.find(m => m.id === target);
}

/** A clamp material known to the library (stiffness table first, then parent rows), with its canonical id. */
export function findClampMaterial(id: string): {id: string} | undefined {
  const s = stiffnessMaterial(id);
  if (s) return {id: s.id};
  const p = parentMaterial(id);
  return p ? {id: p.id} : undefined;
}

/** Every material id a clamped part may name. */
export function clampMaterialIds(): string[] {
  return [...STIFFNESS_MATERIALS.map(m => m.id), ...listParentMaterials().map(m => m.id)];
}

const GENERAL_FIT = {a: WILEMAN_GENERAL.a, b: WILEMAN_GENERAL.b, row: 'general expression'};

function fitOf(row: string | undefined): ResolvedPart['fit'] {
  const s = row !== undefined ? stiffnessMaterial(row) : undefined;
  return s ? {a: s.a, b: s.b, row: s.id} : GENERAL_FIT;
}

/**
 * Resolve one clamped part. `user` is the user's own material attached to the joint
 * (matched by id). Returns a message naming the entry when the id is unknown.
 */
export function resolvePart(part: ClampPart, user?: UserParentMaterial): ResolvedPart | string {
  if (part.modulus !== undefined) {
    return {
      thickness: part.thickness,
      id: 'modulus',
      name: `part of modulus ${Math.round(part.modulus / 100) / 10} GPa`,
      modulus: part.modulus,
      modulusSource: {source: 'modulus given by the user', kind: 'user'},
      fit: GENERAL_FIT,
    };
  }
  const id = part.material ?? '';
  if (user && user.id.toLowerCase() === id.toLowerCase()) {
    return {
      thickness: part.thickness,
      id: user.id,
      name: user.name,
      modulus: user.elasticModulus,
      modulusSource: {source: `your material "${user.id}": ${user.source}`, kind: 'user'},
      fit: GENERAL_FIT,
    };
  }
  const s = stiffnessMaterial(id);
  if (s) {
    return {
      thickness: part.thickness,
      id: s.id,
      name: s.name,
      modulus: s.elasticModulus,
      modulusSource: s.provenance,
      expansion: s.expansion,
      expansionSource: s.expansionProvenance,
      ...(s.limitingPressure !== undefined && s.limitingPressureProvenance
        ? {limitingPressure: s.limitingPressure, limitingPressureSource: s.limitingPressureProvenance}
        : {}),
      fit: {a: s.a, b: s.b, row: s.id},
    };
  }
  const m = parentMaterial(id);
  if (!m) return `unknown clamp material "${id}"`;
  const d = PARENT_SERVICE_DATA[m.id];
  return {
    thickness: part.thickness,
    id: m.id,
    name: m.name,
    modulus: m.elasticModulus,
    modulusSource: m.elasticModulusProvenance,
    ...(d
      ? {expansion: d.expansion, expansionSource: d.expansionProvenance, limitingPressure: d.limitingPressure, limitingPressureSource: d.limitingPressureProvenance}
      : {}),
    fit: fitOf(d?.fitRow),
  };
}
