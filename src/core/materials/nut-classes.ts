/**
 * Nut property classes (data only). MPa; sizes in mm.
 *
 * ISO 898-2 defines regular (style 1) and high (style 2) nuts of classes 5, 6,
 * 8, 9, 10, 12, and thin nuts (style 0) of classes 04 and 05. A class-N nut is
 * meant for bolts up to class N.8 (from memory). The numeric proof-load
 * stresses of ISO 898-2 were not read, so the strength used for stripping is
 * taken as N x 100 MPa, the nominal tensile strength of the matching bolt
 * class; ISO 898-2 proof stresses for the regular nuts are at or above this
 * (from memory). Thin nuts take their proof stresses, 380 MPa (class 04) and
 * 500 MPa (class 05), from memory, consistent with a stored secondary page.
 * Not for nuts tapped oversize to go with hot-dip galvanized bolts: ISO 10684
 * gives them lower proof stresses (M10 class 8: 728 MPa, read in a stored
 * secondary page).
 * SAE J995 grade 5 and 8 nuts take the matching SAE J429 bolt's tensile
 * strength (120 ksi up to 1 in, 105 ksi above; 150 ksi), from memory.
 */
import type {Provenance} from '../types.js';
import {CONVERSION} from '../units.js';

const KSI = CONVERSION.PSI_MPA * 1000;
const IN = CONVERSION.IN_MM;

const ISO_NUT: Provenance = {
  source: 'ISO 898-2 class N: strength taken as N x 100 MPa (the matching bolt class Rm,nom); typical value, from memory: verify against the material certificate',
  kind: 'memory',
};
const ISO_THIN: Provenance = {
  source: 'ISO 898-2 thin nut: strength taken as its proof stress; typical value, from memory: verify against the material certificate',
  kind: 'memory',
};
const J995: Provenance = {
  source: 'SAE J995: strength taken as the matching SAE J429 bolt tensile strength; typical value, from memory: verify against the material certificate',
  kind: 'memory',
};
const TAU_NUT: Provenance = {
  source: 'tau_B/Rm 0.6 for nut steel, low end of the VDI 2230 Part 1 steel range (0.6 to 0.8); from memory',
  kind: 'memory',
};

/** ISO 898-2:2012 scope M5 to M39 (from memory). */
const ISO_MIN = 4.99;
const ISO_MAX = 39;

const OVERSIZE_NOTE = 'not for nuts tapped oversize for hot-dip galvanized bolts (ISO 10684 gives lower proof stresses)';

function iso(id: string, rm: number, style: string, provenance: Provenance = ISO_NUT): Record<string, unknown> {
  return {
    id,
    name: `nut property class ${id} (${style})`,
    standard: 'ISO 898-2',
    rm,
    shearRatio: 0.6,
    sizeMinMm: ISO_MIN,
    sizeMaxMm: ISO_MAX,
    provenance,
    shearRatioProvenance: TAU_NUT,
    note: `size range M5 to M39 per the scope of ISO 898-2, from memory; ${OVERSIZE_NOTE}`,
  };
}

function sae(grade: 5 | 8, fromIn: number, toIn: number, ksi: number, first: boolean, sizeText: string): Record<string, unknown> {
  return {
    id: `SAE-${grade}`,
    name: `SAE J995 grade ${grade} nut, ${sizeText}`,
    standard: 'SAE J995',
    rm: ksi * KSI,
    shearRatio: 0.6,
    sizeMinMm: first ? fromIn * IN - 0.01 : fromIn * IN,
    sizeMaxMm: toIn * IN,
    provenance: J995,
    shearRatioProvenance: TAU_NUT,
    note: `${ksi} ksi`,
  };
}

/** Raw rows; validated by the schema in index.ts. */
export const NUT_CLASS_ROWS: unknown[] = [
  iso('04', 380, 'thin nut, style 0', ISO_THIN),
  iso('05', 500, 'thin nut, style 0', ISO_THIN),
  iso('5', 500, 'regular or high nut'),
  iso('6', 600, 'regular or high nut'),
  iso('8', 800, 'regular or high nut'),
  iso('9', 900, 'regular or high nut'),
  iso('10', 1000, 'regular or high nut'),
  iso('12', 1200, 'regular or high nut'),
  sae(5, 0.25, 1, 120, true, '1/4 to 1 in'),
  sae(5, 1, 1.5, 105, false, 'over 1 to 1-1/2 in'),
  sae(8, 0.25, 1.5, 150, true, '1/4 to 1-1/2 in'),
];
