/**
 * The material library: bolt grades, nut classes, parent materials and the
 * standard head and nut dimensions used as defaults. Pure data, validated by
 * the zod schema in schema.ts: when this module loads from source, and by the
 * build before it bundles the data (a bad entry throws, before any calculation).
 * Units: MPa for strengths and moduli, mm for sizes.
 *
 * Every number carries a Provenance: a standard and table, a book, or the
 * admission "typical value, from memory: verify against the material certificate".
 */
import type {Provenance} from '../types.js';
import {validateMaterialData, type BoltGrade, type MaterialData, type NutClass, type ParentMaterial} from './schema.js';
import {BOLT_GRADE_ROWS} from './bolt-grades.js';
import {NUT_CLASS_ROWS} from './nut-classes.js';
import {PARENT_MATERIAL_ROWS} from './parent-materials.js';
import {HEX_HEAD_ROWS, NUT_DIMENSION_ROWS} from './hardware.js';
import {INCH_HEX_HEAD_ROWS} from './inch-hex-heads.js';
import {didYouMean} from './suggest.js';
import {inchNutDimensions, type InchNutStyle} from './inch-nuts.js';
import {isoNutCountersink} from './nut-countersink.js';

export type {BoltGrade, NutClass, ParentMaterial, MaterialData} from './schema.js';
export {validateMaterialData, MEMORY_WORDING, MaterialDataSchema, BoltGradeSchema, NutClassSchema, ParentMaterialSchema} from './schema.js';
export {KSI_MPA} from './bolt-grades.js';

/** The shipped rows, as written in the data files. */
export const SHIPPED_ROWS = {
  boltGrades: BOLT_GRADE_ROWS,
  nutClasses: NUT_CLASS_ROWS,
  parentMaterials: PARENT_MATERIAL_ROWS,
  hexHeads: HEX_HEAD_ROWS,
  nutDimensions: NUT_DIMENSION_ROWS,
  inchHexHeads: INCH_HEX_HEAD_ROWS,
};

/**
 * Defined (true) by the build, which checks the shipped rows with the same schema
 * before it bundles them (scripts/build-support/check-shipped-data.ts) and fails on
 * a bad entry; validation leaves every row as written (a test checks that), so the
 * bundle uses the rows as they are and starts about 20 ms sooner. From source
 * (tests, tsc) the rows are checked here, when this module loads.
 */
declare const __TAPWRIGHT_DATA_CHECKED__: boolean | undefined;
const DATA: MaterialData =
  typeof __TAPWRIGHT_DATA_CHECKED__ === 'boolean' && __TAPWRIGHT_DATA_CHECKED__ ? (SHIPPED_ROWS as MaterialData) : validateMaterialData(SHIPPED_ROWS);

/** 1 in = 25.4 mm exactly (NIST SP 811). */
const MM_PER_IN = 25.4;

/** Sizes closer than this are the same size, mm (inch sizes convert to long decimals). */
const SIZE_EPS = 1e-6;

function inRange(row: {sizeMinMm?: number | undefined; sizeMaxMm?: number | undefined}, d: number): boolean {
  const aboveMin = row.sizeMinMm === undefined || d > row.sizeMinMm + SIZE_EPS;
  const belowMax = row.sizeMaxMm === undefined || d <= row.sizeMaxMm + SIZE_EPS;
  return aboveMin && belowMax;
}

function norm(id: string): string {
  return id.trim().toUpperCase();
}

/**
 * The bolt grade `id` for a nominal diameter `nominalMm` (mm), with the size
 * split resolved (ISO 898-1 class 8.8: d <= 16 mm / d > 16 mm; SAE J429 by inch
 * size). Ids are matched case-insensitively ("sae-5", "a2-70").
 * Returns undefined for an unknown id or a size outside the grade's rows
 * (for example 9.8 above M16); `boltGradeRows(id)` tells which sizes exist.
 * Sources: ISO 898-1:2013 Table 3, ISO 3506-1, SAE J429 (see bolt-grades.ts).
 */
export function boltGrade(id: string, nominalMm: number): BoltGrade | undefined {
  const key = norm(id);
  return DATA.boltGrades.find(g => norm(g.id) === key && inRange(g, nominalMm));
}

/** Every row of one bolt grade id (one per size range), smallest sizes first; [] if unknown. */
export function boltGradeRows(id: string): BoltGrade[] {
  const key = norm(id);
  return DATA.boltGrades.filter(g => norm(g.id) === key);
}

/** Every bolt grade row, in display order (a grade with a size split has one row per range). */
export function listBoltGrades(): BoltGrade[] {
  return [...DATA.boltGrades];
}

/** Distinct bolt grade ids, in display order. */
export function boltGradeIds(): string[] {
  return [...new Set(DATA.boltGrades.map(g => g.id))];
}

/** The parent material `id` (case-insensitive), or undefined. */
export function parentMaterial(id: string): ParentMaterial | undefined {
  const key = norm(id);
  return DATA.parentMaterials.find(m => norm(m.id) === key);
}

/** Every parent (tapped-hole) material, in display order; strengths and moduli in MPa. */
export function listParentMaterials(): ParentMaterial[] {
  return [...DATA.parentMaterials];
}

/**
 * The nut class `id` (ISO 898-2 "8", "10", ...; SAE J995 "SAE-5", "SAE-8") for a
 * nominal diameter in mm, or undefined for an unknown id or a size outside its rows.
 */
export function nutClass(id: string, nominalMm: number): NutClass | undefined {
  const key = norm(id);
  return DATA.nutClasses.find(n => norm(n.id) === key && inRange(n, nominalMm));
}

/** Every row of one nut class id; [] if unknown. */
export function nutClassRows(id: string): NutClass[] {
  const key = norm(id);
  return DATA.nutClasses.filter(n => norm(n.id) === key);
}

/** Every nut class row (one per size range), in display order; strengths in MPa. */
export function listNutClasses(): NutClass[] {
  return [...DATA.nutClasses];
}

/**
 * Hexagon-head bearing data for a nominal diameter (mm), both results in mm; the VDI 2230
 * default bearing diameter is DKm = (dwMin + clearanceHole) / 2.
 * - metric: dw,min of ISO 4014/4017 and the ISO 273 medium clearance hole;
 * - inch (1/4 to 1 in): ASME B18.2.1 hex cap screw, bearing face taken as the minimum width
 *   across flats (from memory, see inch-hex-heads.ts), and the ASME B18.2.8 normal-fit hole.
 * Undefined for sizes not tabulated.
 */
export function hexHeadBearing(
  nominalMm: number,
  system: 'metric' | 'inch' = 'metric',
): {dwMin: number; clearanceHole: number; provenance: Provenance} | undefined {
  if (system === 'inch') {
    const h = inchHexHead(nominalMm);
    return h ? {dwMin: h.flatsMin, clearanceHole: h.clearanceHole, provenance: h.provenance} : undefined;
  }
  const r = DATA.hexHeads.find(h => Math.abs(h.d - nominalMm) < 1e-3);
  return r ? {dwMin: r.dwMin, clearanceHole: r.clearanceHole, provenance: r.provenance} : undefined;
}

/**
 * ASME B18.2.1 hex cap screw width across flats (max, min) and the ASME B18.2.8 normal-fit
 * clearance hole for an inch nominal diameter given in mm (1/4 to 1 in); all results in mm.
 * Undefined for sizes not tabulated.
 */
export function inchHexHead(nominalMm: number): {size: string; flatsMax: number; flatsMin: number; clearanceHole: number; provenance: Provenance} | undefined {
  const r = DATA.inchHexHeads.find(h => Math.abs(h.dIn * MM_PER_IN - nominalMm) < 1e-3);
  if (!r) return undefined;
  return {size: r.size, flatsMax: r.flatsMaxIn * MM_PER_IN, flatsMin: r.flatsMinIn * MM_PER_IN, clearanceHole: r.clearanceHoleIn * MM_PER_IN, provenance: r.provenance};
}

/**
 * Standard hexagon nut for a nominal diameter (mm): height m min/max, width across flats s and the
 * countersink diameter max, mm. Metric sizes: ISO 4032 style 1 (countersink: ISO 4032 da max, see
 * nut-countersink.ts). Inch sizes (no metric size coincides with one): ASME B18.2.2 hex nut, or the
 * heavy hex nut with style 'heavy-hex' (inch-nuts.ts). Undefined for sizes not tabulated.
 */
export function nutDimensions(
  nominalMm: number,
  style: InchNutStyle = 'hex',
): {heightMin: number; heightMax: number; flats: number; countersinkMax?: number; provenance: Provenance} | undefined {
  const r = DATA.nutDimensions.find(n => Math.abs(n.d - nominalMm) < 1e-3);
  if (r) {
    const da = isoNutCountersink(r.d);
    return {heightMin: r.heightMin, heightMax: r.heightMax, flats: r.flats, ...(da !== undefined ? {countersinkMax: da} : {}), provenance: r.provenance};
  }
  return inchNutDimensions(nominalMm, style);
}

/**
 * Default nut class for a bolt grade (ISO 898-2 design basis: a class-N nut serves bolts up to N.8,
 * from memory): an ISO 898-1 class N.M takes the lowest ISO 898-2 regular-nut class of at least N;
 * a SAE J429 bolt takes the SAE J995 nut of its grade (grade 2: the grade 5 nut, the lowest on
 * file). On an inch thread an ISO bolt class takes an inch nut too: up to 8.8 the SAE J995 grade 5
 * nut (120 ksi, about 830 MPa), above it grade 8 (150 ksi, about 1030 MPa) (common practice, no
 * source). Undefined when none fits.
 */
export function defaultNutClass(boltGrade: string, nominalMm: number, inch: boolean): string | undefined {
  const g = boltGrade.trim().toUpperCase();
  const iso = /^(\d{1,2})\.\d$/.exec(g);
  let id: string | undefined;
  if (/^SAE-(5|8)$/.test(g)) id = g;
  else if (g === 'SAE-2') id = 'SAE-5';
  else if (iso && inch) id = Number(iso[1]) <= 8 ? 'SAE-5' : 'SAE-8';
  else if (iso) id = [5, 6, 8, 9, 10, 12].map(String).find(k => Number(k) >= Number(iso[1]));
  return id !== undefined && nutClass(id, nominalMm) ? id : undefined;
}

/**
 * Whether a nut of class `nutId` is the matching class for bolt grade `boltGrade`: the bolt is
 * then designed to break before the threads strip (ISO 898-2 design basis, Alexander 1977; from
 * memory). ISO: nut class N >= the bolt's first number (thin nuts 04, 05 never); SAE J995 grade 5
 * for J429 grades 2 and 5, grade 8 for all three; an ISO bolt in an SAE nut as defaultNutClass
 * pairs them (grade 5 nut up to class 8.8, grade 8 up to 10.9; common practice, no source).
 */
export function nutMatchesBolt(nutId: string, boltGrade: string): boolean {
  const n = nutId.trim().toUpperCase();
  const b = boltGrade.trim().toUpperCase();
  const iso = /^(\d{1,2})\.\d$/.exec(b);
  if (/^\d{1,2}$/.test(n) && !n.startsWith('0') && iso) return Number(n) >= Number(iso[1]);
  if (n === 'SAE-8') return /^SAE-(2|5|8)$/.test(b) || (iso !== null && Number(iso[1]) <= 10);
  if (n === 'SAE-5') return /^SAE-(2|5)$/.test(b) || (iso !== null && Number(iso[1]) <= 8);
  return false;
}

/** An unknown parent material, with the nearest ids and the accepted list. */
export function parentMaterialProblem(id: string): string | undefined {
  if (parentMaterial(id)) return undefined;
  const ids = listParentMaterials().map(p => p.id);
  return `unknown parent material "${id}"; accepted: ${ids.join(', ')}${didYouMean(id, ids)}`;
}

/** A plain-language reason why a bolt grade lookup failed, naming the accepted ids or sizes. */
export function boltGradeProblem(id: string, nominalMm: number): string | undefined {
  if (boltGrade(id, nominalMm)) return undefined;
  const rows = boltGradeRows(id);
  if (rows.length === 0) return `unknown bolt grade "${id}"; accepted: ${boltGradeIds().join(', ')}${didYouMean(id, boltGradeIds())}`;
  return `bolt grade ${rows[0]?.id} is not defined for ${fmtMm(nominalMm)} mm; it covers ${describeRange(rows)}`;
}

/** A plain-language reason why a nut class lookup failed. */
export function nutClassProblem(id: string, nominalMm: number): string | undefined {
  if (nutClass(id, nominalMm)) return undefined;
  const rows = nutClassRows(id);
  const ids = [...new Set(DATA.nutClasses.map(n => n.id))];
  if (rows.length === 0) return `unknown nut class "${id}"; accepted: ${ids.join(', ')}${didYouMean(id, ids)}`;
  return `nut class ${rows[0]?.id} is not defined for ${fmtMm(nominalMm)} mm; it covers ${describeRange(rows)}`;
}

function fmtMm(x: number): string {
  return String(Math.round(x * 1000) / 1000);
}

function describeRange(rows: {sizeMinMm?: number | undefined; sizeMaxMm?: number | undefined}[]): string {
  const lo = Math.min(...rows.map(r => r.sizeMinMm ?? 0));
  const hi = Math.max(...rows.map(r => r.sizeMaxMm ?? Infinity));
  return `${fmtMm(lo)} to ${fmtMm(hi)} mm nominal diameter`;
}

/** Every tabulated hexagon head row (metric, mm), smallest first. */
export function listHexHeads(): {d: number; dwMin: number; clearanceHole: number; provenance: Provenance}[] {
  return DATA.hexHeads.map(h => ({...h}));
}

/** Every tabulated ISO 4032 nut row (mm), smallest first. */
export function listNutDimensions(): {d: number; heightMin: number; heightMax: number; flats: number; provenance: Provenance}[] {
  return DATA.nutDimensions.map(n => ({...n}));
}
