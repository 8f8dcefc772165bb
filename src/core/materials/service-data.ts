/**
 * Service-state data of the materials (data only): thermal expansion coefficients,
 * limiting surface pressures under a bolt head or nut, the stiffness-table materials
 * of the member-stiffness fit, and the fully corrected endurance strengths of bolts
 * with rolled threads. One entry per parent material row and per bolt grade id
 * (a test checks that none is missing). Units: 1/K, MPa, mm.
 *
 * Sources:
 * - Member stiffness materials (E, Poisson ratio, fit constants A and B): Budynas and
 *   Nisbett, Shigley's Mechanical Engineering Design, 9th ed., Table 8-8 (after
 *   Wileman, Choudury and Green, Trans. ASME J. Mech. Design 113 (1991) 432-437).
 * - Expansion coefficients: Callister, Fundamentals of Materials Science and Engineering:
 *   An Integrated Approach, 3rd ed., Appendix B, Table B.6 (room-temperature values) where
 *   a row says so; the steels' 11.5e-6 /K is a typical value, from memory.
 * - Limiting surface pressure p_G: VDI 2230 Part 1 (2003), table of limiting surface
 *   pressures, read in a fastener supplier's technical catalogue reproducing it; values the
 *   table marks as not yet checked against recent research are said so in the note.
 * - Endurance strengths: Shigley 9th ed., Table 8-17 (repeatedly applied axial load, fully corrected).
 */
import type {Provenance} from '../types.js';
import {KSI_MPA} from './bolt-grades.js';

const mem = (text: string): Provenance => ({source: `${text}, typical value, from memory`, kind: 'memory'});
const callister = (row: string): Provenance => ({
  source: `Callister, Fundamentals of Materials Science and Engineering, 3rd ed., Table B.6 (${row})`,
  kind: 'book',
});
const TABLE_8_8: Provenance = {source: "Shigley's Mechanical Engineering Design, 9th ed., Table 8-8 (Wileman et al. 1991)", kind: 'book'};

/** Thermal expansion coefficient of steel bolts and steel parts, 1/K (from memory). */
export const STEEL_EXPANSION = 11.5e-6;
const STEEL_ALPHA = mem('alpha = 11.5e-6 /K for carbon and low-alloy steel');

/** A material of the member-stiffness table, usable as a clamped-part material id. */
export interface StiffnessMaterial {
  id: string;
  name: string;
  /** MPa */
  elasticModulus: number;
  poisson: number;
  /** Exponential-fit constants of k_m/(E d) = A exp(B d/l). */
  a: number;
  b: number;
  /** 1/K */
  expansion: number;
  provenance: Provenance;
  expansionProvenance: Provenance;
  /** Limiting surface pressure, MPa: the lowest row of that family in the VDI 2230 table (cautious). */
  limitingPressure?: number;
  limitingPressureProvenance?: Provenance;
}

/** Shigley 9th ed. Table 8-8, "general expression" row: A and B for any metal. */
export const WILEMAN_GENERAL = {a: 0.78952, b: 0.62914, provenance: TABLE_8_8} as const;

const LOWEST = (row: string): Provenance => ({source: `VDI 2230 Part 1, limiting surface pressure, row ${row}`, kind: 'standard'});

export const STIFFNESS_MATERIALS: readonly StiffnessMaterial[] = [
  {id: 'steel', name: 'steel (stiffness table)', elasticModulus: 207_000, poisson: 0.291, a: 0.78715, b: 0.62873, expansion: STEEL_EXPANSION, provenance: TABLE_8_8, expansionProvenance: STEEL_ALPHA, limitingPressure: 490, limitingPressureProvenance: LOWEST('S235 JRG1 (1.0036), the lowest steel row')},
  {id: 'aluminium', name: 'aluminium (stiffness table)', elasticModulus: 71_000, poisson: 0.334, a: 0.7967, b: 0.63816, expansion: 23.6e-6, provenance: TABLE_8_8, expansionProvenance: callister('alloy 6061'), limitingPressure: 220, limitingPressureProvenance: LOWEST('GK-AlSi9Cu3 (3.2163.02), the lowest aluminium row')},
  {id: 'copper', name: 'copper (stiffness table)', elasticModulus: 119_000, poisson: 0.326, a: 0.79568, b: 0.63553, expansion: 17.0e-6, provenance: TABLE_8_8, expansionProvenance: callister('C11000')},
  {id: 'grey-cast-iron', name: 'grey cast iron (stiffness table)', elasticModulus: 100_000, poisson: 0.211, a: 0.77871, b: 0.61616, expansion: 11.4e-6, provenance: TABLE_8_8, expansionProvenance: callister('grey irons'), limitingPressure: 600, limitingPressureProvenance: LOWEST('GG 15 of the 1986 edition, the lowest grey-iron row')},
];

/** Spellings accepted for the stiffness-table ids. */
export const STIFFNESS_ALIASES: Readonly<Record<string, string>> = {aluminum: 'aluminium', 'gray-cast-iron': 'grey-cast-iron', 'cast-iron': 'grey-cast-iron'};

/** Service data of one parent material row. */
export interface ParentServiceData {
  /** 1/K */
  expansion: number;
  expansionProvenance: Provenance;
  /** Limiting surface pressure p_G, MPa. */
  limitingPressure: number;
  limitingPressureProvenance: Provenance;
  /** Which stiffness-table row's fit constants apply (for the one-material fit). */
  fitRow?: 'steel' | 'aluminium' | 'copper' | 'grey-cast-iron';
}

const vdi = (row: string, unchecked: boolean): Provenance => ({
  source: `VDI 2230 Part 1 (2003), limiting surface pressure, row ${row}${unchecked ? ' (marked in the table as not yet checked against recent research)' : ''}`,
  kind: 'standard',
});
const VDI_1986 = (row: string): Provenance => ({source: `VDI 2230 (1986 edition), limiting surface pressure, row ${row} (the 2003 table has no such row)`, kind: 'standard'});
const yieldBound = (name: string): Provenance => ({
  source: `no VDI 2230 row read for ${name}: its yield strength used as a low bound, common practice, no source`,
  kind: 'memory',
});

function p(expansion: number, expansionProvenance: Provenance, limitingPressure: number, limitingPressureProvenance: Provenance, fitRow?: ParentServiceData['fitRow']): ParentServiceData {
  return {expansion, expansionProvenance, limitingPressure, limitingPressureProvenance, ...(fitRow ? {fitRow} : {})};
}

/** Keyed by parent material id (src/core/materials/parent-materials.ts). */
export const PARENT_SERVICE_DATA: Readonly<Record<string, ParentServiceData>> = {
  S235: p(STEEL_EXPANSION, STEEL_ALPHA, 490, vdi('S235 JRG1 (1.0036)', false), 'steel'),
  S355: p(STEEL_EXPANSION, STEEL_ALPHA, 760, vdi('S355 J0 (1.0553)', false), 'steel'),
  C45: p(STEEL_EXPANSION, STEEL_ALPHA, 630, vdi('C45 (1.1192)', true), 'steel'),
  '42CrMo4-QT': p(STEEL_EXPANSION, STEEL_ALPHA, 850, VDI_1986('42 CrMo 4'), 'steel'),
  '11SMn30': p(STEEL_EXPANSION, STEEL_ALPHA, 240, yieldBound('11SMn30'), 'steel'),
  'EN-GJL-200': p(11.4e-6, callister('grey irons'), 600, VDI_1986('GG 15 (a lower grade: conservative for EN-GJL-200)'), 'grey-cast-iron'),
  'EN-GJL-250': p(11.4e-6, callister('grey irons'), 900, vdi('EN-GJL-250 (0.6020)', false), 'grey-cast-iron'),
  'EN-GJL-300': p(11.4e-6, callister('grey irons'), 900, vdi('EN-GJL-250 (0.6020), the nearest lower grade', false), 'grey-cast-iron'),
  'EN-GJS-400-15': p(11.2e-6, callister('ductile iron 60-40-18'), 700, vdi('EN-GJS-400-15 (0.7040)', true)),
  'EN-GJS-500-7': p(10.6e-6, callister('ductile iron 80-55-06'), 900, vdi('EN-GJS-500-7 (0.7050)', true)),
  '6061-T6': p(23.6e-6, callister('alloy 6061'), 230, vdi('AlMgSi 1 F28 (3.2315.61), the nearest alloy', true), 'aluminium'),
  '6082-T6': p(23.6e-6, callister('alloy 6061, the nearest alloy listed'), 260, vdi('AlMgSi 1 F31 (3.2315.62)', true), 'aluminium'),
  '7075-T6': p(23.4e-6, callister('alloy 7075'), 410, vdi('AlZnMgCu 1.5 (3.4365.71)', true), 'aluminium'),
  '5083-O': p(23.8e-6, mem('alpha = 23.8e-6 /K for 5000-series aluminium'), 230, vdi('AlMg4.5Mn F27 (3.3547.08)', true), 'aluminium'),
  'AlSi7Mg-T6': p(21.5e-6, callister('alloy 356.0'), 380, vdi('GK-AlSi7Mg wa (3.2371.62), permanent-mould: a sand casting may be weaker', true), 'aluminium'),
  'AlSi9Cu3-DC': p(21.0e-6, mem('alpha = 21e-6 /K for aluminium-silicon-copper casting alloys'), 290, vdi('GD-AlSi9Cu3 (3.2163.05)', true), 'aluminium'),
  CuZn39Pb3: p(20.5e-6, callister('C36000 free-cutting brass'), 160, yieldBound('CuZn39Pb3'), 'copper'),
  'CuSn12-C': p(18.0e-6, callister('C93200 bearing bronze, the nearest alloy'), 140, yieldBound('CuSn12-C'), 'copper'),
  'CuAl10Fe5Ni5-C': p(16.2e-6, mem('alpha = 16.2e-6 /K for aluminium bronze'), 250, yieldBound('CuAl10Fe5Ni5-C'), 'copper'),
  'AZ91-DC': p(26.0e-6, callister('AZ91D'), 280, vdi('AZ 91 (3.5812)', true)),
  'Ti-6Al-4V': p(8.6e-6, callister('Ti-6Al-4V'), 890, vdi('TiAl6V4 (3.7165.10)', true)),
};

/** Expansion of a bolt grade id, 1/K: austenitic stainless (A2, A4) or carbon/alloy steel. */
export function boltExpansion(gradeId: string): {value: number; provenance: Provenance} {
  const id = gradeId.toUpperCase();
  if (id.startsWith('A2')) return {value: 17.3e-6, provenance: mem('alpha = 17.3e-6 /K for austenitic stainless steel 304 (A2)')};
  if (id.startsWith('A4')) return {value: 16.0e-6, provenance: mem('alpha = 16.0e-6 /K for austenitic stainless steel 316 (A4)')};
  return {value: STEEL_EXPANSION, provenance: STEEL_ALPHA};
}

/** One row of Shigley 9th ed. Table 8-17; sizes mm, a row applies from sizeMin to sizeMax inclusive. */
export interface EnduranceRow {
  grade: string;
  sizeMin: number;
  sizeMax: number;
  /** Fully corrected endurance strength S_e, MPa. */
  se: number;
}

const IN = 25.4;
export const ENDURANCE_TABLE_SOURCE: Provenance = {
  source: "Shigley's Mechanical Engineering Design, 9th ed., Table 8-17 (rolled threads, repeatedly applied axial load, fully corrected)",
  kind: 'book',
};
export const ENDURANCE_ROWS: readonly EnduranceRow[] = [
  {grade: 'SAE-5', sizeMin: 0.25 * IN, sizeMax: 1 * IN, se: 18.6 * KSI_MPA},
  {grade: 'SAE-5', sizeMin: 1.125 * IN, sizeMax: 1.5 * IN, se: 16.3 * KSI_MPA},
  {grade: 'SAE-8', sizeMin: 0.25 * IN, sizeMax: 1.5 * IN, se: 23.2 * KSI_MPA},
  {grade: '8.8', sizeMin: 16, sizeMax: 36, se: 129},
  {grade: '9.8', sizeMin: 1.6, sizeMax: 16, se: 140},
  {grade: '10.9', sizeMin: 5, sizeMax: 36, se: 162},
  {grade: '12.9', sizeMin: 1.6, sizeMax: 36, se: 190},
];

/**
 * VDI 2230 Part 1 embedding amounts (Table 5, steel parts), micrometres, by mean
 * roughness class and load; from memory (the table was not read in a published copy).
 */
export const EMBEDDING_TABLE: readonly {rzBelow: number; axial: [number, number, number]; shear: [number, number, number]}[] = [
  {rzBelow: 10, axial: [3, 2.5, 1.5], shear: [3, 3, 2]},
  {rzBelow: 40, axial: [3, 3, 2], shear: [3, 4.5, 2.5]},
  {rzBelow: 160, axial: [3, 4, 3], shear: [3, 6.5, 3.5]},
];
export const EMBEDDING_SOURCE = 'VDI 2230 Part 1 (2003), Table 5, guide values for amounts of embedding (thread, per head or nut bearing, per inner interface), from memory';
