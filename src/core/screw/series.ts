/**
 * Power-thread series data (working unit mm; inch rows kept in inches as tabulated).
 *
 * ISO 2904 metric trapezoidal threads (basic dimensions; ISO 2901 profile, 30 deg):
 *   crest clearance ac by pitch: 0.15 mm (P 1.5), 0.25 mm (P 2 to 5), 0.5 mm (P 6 to 12),
 *   1 mm (P 14 to 44). Which pitch is the "preferred" one for each diameter (ISO 2904 /
 *   DIN 103 first choice) is from memory. Whether a pitch is listed at all is the shared
 *   thread tables' answer (src/core/threads).
 *
 * ASME B1.5 general-purpose Acme (29 deg): basic rows from Machinery's Handbook, 27th ed.,
 *   Table 3 "General Purpose Acme Single-Start Screw Thread Data" (ASME/ANSI B1.5-1988).
 *   Preferred pitches: Shigley's Mechanical Engineering Design, 9th ed., Table 8-3.
 */

/**
 * Crest clearance ac of ISO 2904 for a pitch, mm; undefined outside 1.5..44 mm.
 */
export function trapezoidalCrestClearance(pitch: number): number | undefined {
  if (pitch < 1.5 - 1e-9 || pitch > 44 + 1e-9) return undefined;
  if (pitch <= 1.5 + 1e-9) return 0.15;
  if (pitch <= 5 + 1e-9) return 0.25;
  if (pitch <= 12 + 1e-9) return 0.5;
  return 1;
}

/**
 * Preferred (first-choice) diameter/pitch pairs of ISO 2904 / DIN 103, mm.
 * From memory: which pitch is preferred was not read in the standard.
 */
export const TRAPEZOIDAL_PREFERRED: readonly {d: number; p: number}[] = [
  {d: 8, p: 1.5}, {d: 10, p: 2}, {d: 12, p: 3}, {d: 14, p: 3}, {d: 16, p: 4}, {d: 18, p: 4},
  {d: 20, p: 4}, {d: 22, p: 5}, {d: 24, p: 5}, {d: 26, p: 5}, {d: 28, p: 5}, {d: 30, p: 6},
  {d: 32, p: 6}, {d: 36, p: 6}, {d: 40, p: 7}, {d: 44, p: 7}, {d: 48, p: 8}, {d: 50, p: 8},
  {d: 52, p: 8}, {d: 60, p: 9}, {d: 70, p: 10}, {d: 80, p: 10}, {d: 90, p: 12}, {d: 100, p: 12},
];

export const TRAPEZOIDAL_PREFERRED_SOURCE = 'ISO 2904 / DIN 103 preferred pitch, from memory';

/** One row of Machinery's Handbook 27th ed. Table 3 (ASME/ANSI B1.5-1988), inches. */
export interface AcmeRow {
  size: string;
  /** Basic major diameter D, in. */
  major: number;
  tpi: number;
  /** Basic pitch diameter D2, in (as tabulated, 4 decimals). */
  pitchDiameter: number;
  /** Basic minor diameter D1, in (as tabulated). */
  minorDiameter: number;
  /** Lead angle at the basic pitch diameter, degrees and minutes as tabulated. */
  leadAngle: {deg: number; min: number};
  /** Class 3G shear area per inch of engagement, in²/in, as tabulated. */
  shearArea3G: number;
}

export const ACME_SOURCE = "Machinery's Handbook, 27th ed., Table 3 (ASME/ANSI B1.5-1988 general-purpose Acme)";

export const ACME_ROWS: readonly AcmeRow[] = [
  {size: '1/4', major: 0.25, tpi: 16, pitchDiameter: 0.2188, minorDiameter: 0.1875, leadAngle: {deg: 5, min: 12}, shearArea3G: 0.35},
  {size: '5/16', major: 0.3125, tpi: 14, pitchDiameter: 0.2768, minorDiameter: 0.2411, leadAngle: {deg: 4, min: 42}, shearArea3G: 0.451},
  {size: '3/8', major: 0.375, tpi: 12, pitchDiameter: 0.3333, minorDiameter: 0.2917, leadAngle: {deg: 4, min: 33}, shearArea3G: 0.545},
  {size: '7/16', major: 0.4375, tpi: 12, pitchDiameter: 0.3958, minorDiameter: 0.3542, leadAngle: {deg: 3, min: 50}, shearArea3G: 0.66},
  {size: '1/2', major: 0.5, tpi: 10, pitchDiameter: 0.45, minorDiameter: 0.4, leadAngle: {deg: 4, min: 3}, shearArea3G: 0.749},
  {size: '5/8', major: 0.625, tpi: 8, pitchDiameter: 0.5625, minorDiameter: 0.5, leadAngle: {deg: 4, min: 3}, shearArea3G: 0.941},
  {size: '3/4', major: 0.75, tpi: 6, pitchDiameter: 0.6667, minorDiameter: 0.5833, leadAngle: {deg: 4, min: 33}, shearArea3G: 1.108},
  {size: '7/8', major: 0.875, tpi: 6, pitchDiameter: 0.7917, minorDiameter: 0.7083, leadAngle: {deg: 3, min: 50}, shearArea3G: 1.339},
  {size: '1', major: 1, tpi: 5, pitchDiameter: 0.9, minorDiameter: 0.8, leadAngle: {deg: 4, min: 3}, shearArea3G: 1.519},
];

/** Preferred Acme pitches (Shigley 9th ed. Table 8-3): major diameter in -> threads per inch. */
export const ACME_PREFERRED_TPI: readonly {major: number; tpi: number}[] = [
  {major: 0.25, tpi: 16}, {major: 0.3125, tpi: 14}, {major: 0.375, tpi: 12}, {major: 0.5, tpi: 10},
  {major: 0.625, tpi: 8}, {major: 0.75, tpi: 6}, {major: 0.875, tpi: 6}, {major: 1, tpi: 5},
  {major: 1.25, tpi: 5}, {major: 1.5, tpi: 4}, {major: 1.75, tpi: 4}, {major: 2, tpi: 4},
  {major: 2.5, tpi: 3}, {major: 3, tpi: 2},
];

export const ACME_PREFERRED_SOURCE = "Shigley's Mechanical Engineering Design, 9th ed., Table 8-3";
