/**
 * Nut property classes (data only). MPa; sizes in mm.
 *
 * ISO 898-2 defines regular (style 1) and high (style 2) nuts of classes 5, 6,
 * 8, 9, 10, 12, and thin nuts (style 0) of classes 04 and 05. A class-N nut is
 * meant for bolts up to class N.8 (from memory). The numeric proof-load
 * stresses of ISO 898-2 were not read, so the strength used for stripping is
 * taken as N x 100 MPa, the nominal tensile strength of the matching bolt
 * class; ISO 898-2 proof stresses for the regular nuts are at or above this
 * (from memory). Thin nuts 04 and 05 take 400 and 500 MPa likewise.
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

function iso(id: string, rm: number, style: string): Record<string, unknown> {
  return {
    id,
    name: `nut property class ${id} (${style})`,
    standard: 'ISO 898-2',
    rm,
    shearRatio: 0.6,
    sizeMinMm: ISO_MIN,
    sizeMaxMm: ISO_MAX,
    provenance: ISO_NUT,
    shearRatioProvenance: TAU_NUT,
    note: 'size range M5 to M39 per the scope of ISO 898-2, from memory',
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
  iso('04', 400, 'thin nut, style 0'),
  iso('05', 500, 'thin nut, style 0'),
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
