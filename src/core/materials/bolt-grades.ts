/**
 * Bolt, screw and stud grades (data only). MPa throughout; sizes in mm.
 *
 * Size rows: a row applies from sizeMinMm (exclusive) to sizeMaxMm (inclusive);
 * where a standard says "1/4 to 3/4 in" the first row's sizeMinMm is set just
 * below 1/4 in so 1/4 in itself is included.
 *
 * Sources:
 * - ISO 898-1:2013 Table 3: Rm,min, ReL/Rp0.2/Rpf min and Sp,nom per property class,
 *   including the d <= 16 mm / d > 16 mm split of class 8.8 and the d <= 16 mm limit of 9.8.
 * - ISO 3506-1 (austenitic grades A2, A4): Rm,min and Rp0.2,min for classes 50, 70, 80,
 *   from the mechanical-property table for austenitic steel grades.
 * - SAE J429 grades 2, 5, 8: proof, yield and tensile minimums in ksi as tabulated in
 *   Shigley & Mischke, Mechanical Engineering Design, 5th ed., p. 341; converted exactly
 *   (1 ksi = 6.894757293168361 MPa, from 1 lbf = 4.4482216152605 N and 1 in = 25.4 mm, NIST SP 811).
 * - Shear ratios tau_B/Rm: VDI 2230 Part 1, table of shear-strength ratios (8.8: 0.65,
 *   10.9: 0.62, 12.9: 0.60), from memory; classes below 8.8 use 0.65, the lower
 *   value of the steel range, as a conservative choice (from memory).
 */
import {CONVERSION} from '../units.js';
import type {Provenance} from '../types.js';

/** 1 ksi in MPa, exact from the definitions of lbf and in. */
export const KSI_MPA = CONVERSION.PSI_MPA * 1000;
const IN = CONVERSION.IN_MM;

const ISO898: Provenance = {source: 'ISO 898-1:2013 Table 3 (minimum values)', kind: 'standard'};
const ISO3506: Provenance = {
  source: 'ISO 3506-1, mechanical properties of austenitic steel grades (Rm min, Rp0.2 min)',
  kind: 'standard',
};
const J429: Provenance = {
  source: 'SAE J429, as tabulated in Shigley & Mischke, Mechanical Engineering Design, 5th ed., p. 341 (ksi, converted exactly)',
  kind: 'book',
};
const tauVdi = (value: string): Provenance => ({
  source: `VDI 2230 Part 1, shear-strength ratio tau_B/Rm ${value}; from memory`,
  kind: 'memory',
});
const TAU_STEEL_LOW: Provenance = {
  source: 'tau_B/Rm 0.65 for carbon-steel classes below 8.8, the low end of the VDI 2230 Part 1 steel range (0.6 to 0.8); from memory',
  kind: 'memory',
};
const TAU_SAE_2: Provenance = {
  source: 'tau_B/Rm 0.65 taken as for carbon steel of VDI 2230 Part 1; from memory',
  kind: 'memory',
};
const TAU_A2: Provenance = {
  source: 'VDI 2230 Part 1, tau_B/Rm about 0.8 solution annealed (class 50), about 0.7 to 0.8 cold worked (70, 80; 0.7 used); from memory',
  kind: 'memory',
};
const E_STEEL: Provenance = {source: 'E = 205 GPa for steel bolts, typical value, from memory', kind: 'memory'};
const E_AUST: Provenance = {source: 'E = 193 GPa for austenitic stainless steel, typical value, from memory', kind: 'memory'};

/** Smallest and largest sizes the ISO 898-1 rows are offered for: coarse thread M1.6 to M39 (ISO 898-1:2013 clause 1, scope, read in a stored secondary copy). */
const ISO_MIN = 1.5;
const ISO_MAX = 39;
const ISO_SCOPE_NOTE = 'size range M1.6 to M39 (scope of ISO 898-1:2013)';

function iso(
  cls: string,
  rmMin: number,
  rpMin: number,
  proofStress: number,
  yieldName: string,
  shearRatio: number,
  tau: Provenance,
  sizeMinMm = ISO_MIN,
  sizeMaxMm = ISO_MAX,
): Record<string, unknown> {
  const range = sizeMinMm > ISO_MIN ? ', d > 16 mm' : sizeMaxMm < ISO_MAX ? ', d <= 16 mm' : '';
  return {
    id: cls,
    name: `property class ${cls}${range}`,
    standard: 'ISO 898-1',
    rmMin,
    rpMin,
    proofStress,
    shearRatio,
    elasticModulus: 205_000,
    sizeMinMm,
    sizeMaxMm,
    provenance: ISO898,
    shearRatioProvenance: tau,
    elasticModulusProvenance: E_STEEL,
    note: `yield is ${yieldName}; ${ISO_SCOPE_NOTE}`,
  };
}

function stainless(steel: 'A2' | 'A4', cls: 50 | 70 | 80, rmMin: number, rpMin: number): Record<string, unknown> {
  return {
    id: `${steel}-${cls}`,
    name: `stainless ${steel}-${cls} (austenitic${steel === 'A4' ? ', Mo-alloyed' : ''})`,
    standard: 'ISO 3506-1',
    rmMin,
    rpMin,
    shearRatio: cls === 50 ? 0.8 : 0.7,
    elasticModulus: 193_000,
    sizeMinMm: ISO_MIN,
    sizeMaxMm: ISO_MAX,
    provenance: ISO3506,
    shearRatioProvenance: TAU_A2,
    elasticModulusProvenance: E_AUST,
    note:
      cls === 50
        ? 'size range to M39 (ISO 3506-1, from memory)'
        : 'older editions of ISO 3506-1 limit classes 70 and 80 to about M20/M24; the 2020 edition extends them to M39 (from memory)',
  };
}

function sae(grade: 2 | 5 | 8, fromIn: number, toIn: number, proofKsi: number, yieldKsi: number, tensileKsi: number, first: boolean): Record<string, unknown> {
  const sizeText = first ? `${fmtIn(fromIn)} to ${fmtIn(toIn)} in` : `over ${fmtIn(fromIn)} to ${fmtIn(toIn)} in`;
  return {
    id: `SAE-${grade}`,
    name: `SAE J429 grade ${grade}, ${sizeText}`,
    standard: 'SAE J429',
    rmMin: tensileKsi * KSI_MPA,
    rpMin: yieldKsi * KSI_MPA,
    proofStress: proofKsi * KSI_MPA,
    shearRatio: grade === 2 ? 0.65 : grade === 5 ? 0.65 : 0.62,
    elasticModulus: 205_000,
    // Inclusive lower bound: start a hair below the first size of the first row.
    sizeMinMm: first ? fromIn * IN - 0.01 : fromIn * IN,
    sizeMaxMm: toIn * IN,
    provenance: J429,
    shearRatioProvenance: grade === 2 ? TAU_SAE_2 : grade === 5 ? tauVdi('0.65 (as for class 8.8, similar strength)') : tauVdi('0.62 (as for class 10.9, similar strength)'),
    elasticModulusProvenance: E_STEEL,
    note:
      grade === 2 && first
        ? 'grade 2 values for 1/4 to 3/4 in apply to bolts up to 6 in long; longer ones take the over-3/4 in values (grade 1)'
        : `ksi values ${proofKsi}/${yieldKsi}/${tensileKsi} (proof/yield/tensile)`,
  };
}

function fmtIn(x: number): string {
  const table: Record<string, string> = {'0.25': '1/4', '0.75': '3/4', '1': '1', '1.5': '1-1/2'};
  return table[String(x)] ?? String(x);
}

/** Raw rows; validated by the schema in index.ts. Order matters only for display. */
export const BOLT_GRADE_ROWS: unknown[] = [
  iso('4.6', 400, 240, 225, 'ReL', 0.65, TAU_STEEL_LOW),
  iso('4.8', 420, 340, 310, 'Rpf', 0.65, TAU_STEEL_LOW),
  iso('5.6', 500, 300, 280, 'ReL', 0.65, TAU_STEEL_LOW),
  iso('5.8', 520, 420, 380, 'Rpf', 0.65, TAU_STEEL_LOW),
  iso('6.8', 600, 480, 440, 'Rpf', 0.65, TAU_STEEL_LOW),
  iso('8.8', 800, 640, 580, 'Rp0.2', 0.65, tauVdi('0.65 for class 8.8'), ISO_MIN, 16),
  iso('8.8', 830, 660, 600, 'Rp0.2', 0.65, tauVdi('0.65 for class 8.8'), 16, ISO_MAX),
  iso('9.8', 900, 720, 650, 'Rp0.2', 0.65, TAU_STEEL_LOW, ISO_MIN, 16),
  iso('10.9', 1040, 940, 830, 'Rp0.2', 0.62, tauVdi('0.62 for class 10.9')),
  iso('12.9', 1220, 1100, 970, 'Rp0.2', 0.6, tauVdi('0.60 for class 12.9')),
  stainless('A2', 50, 500, 210),
  stainless('A2', 70, 700, 450),
  stainless('A2', 80, 800, 600),
  stainless('A4', 50, 500, 210),
  stainless('A4', 70, 700, 450),
  stainless('A4', 80, 800, 600),
  sae(2, 0.25, 0.75, 55, 57, 74, true),
  sae(2, 0.75, 1.5, 33, 36, 60, false),
  sae(5, 0.25, 1, 85, 92, 120, true),
  sae(5, 1, 1.5, 74, 81, 105, false),
  sae(8, 0.25, 1.5, 120, 130, 150, true),
];
