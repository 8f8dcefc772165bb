/**
 * The nut of a power screw: bearing pressure on the flanks and stripping of the threads.
 * Forces in N, lengths in mm, pressures and stresses in MPa.
 *
 * Bearing pressure, all engaged turns sharing the load evenly (wear criterion):
 *   p = F / (pi dm H1 z), z = Le / P turns, H1 = P/2  ->  p = 2 F / (pi dm Le)
 *   (Shigley 9th ed. Eq. 8-10 with nt = z, in magnitude).
 *
 * Stripping model (stated here because no standard covers power-screw nuts):
 *   every engaged turn carries its share; the nut threads shear off on the cylinder of
 *   the screw major diameter d, the screw threads on the cylinder of the nut minor
 *   diameter D1, over the engaged length Le; the thread thickness on those cylinders is
 *   w P with w = 0.5 + 0.5 tan(alpha) for the basic profile (0.5 for a square thread):
 *     A_nut = pi d Le (w - wear / P),   A_screw = pi D1 Le w,   F_strip = tau_u A.
 *   Basic dimensions, no tolerance allowance, unless `areaFactor` scales both areas: for the
 *   general-purpose Acme sizes checkScrew passes class 3G shear area / basic area (Machinery's
 *   Handbook 27th ed. Table 3; the basic screw-thread area is 4 to 6 % above it); `wear`
 *   (loss of nut-thread thickness, mm, e.g. measured as extra axial backlash) lowers it.
 */

/** Margins are capped here: beyond a million times the load the number means nothing. */
export const MARGIN_CAP = 1e6;

export interface StrippingResult {
  /** Shear area of the nut threads, mm². */
  nutArea: number;
  /** Shear area of the screw threads, mm². */
  screwArea: number;
  /** Force that strips the nut threads, N. */
  nutForce: number;
  /** Force that strips the screw threads, N. */
  screwForce: number;
  weaker: 'nut' | 'screw';
  /**
   * Further loss of nut-thread thickness, mm, at which the nut threads strip at this load:
   * P (w - F / (tau pi d Le)) - wear, not below 0 (same model).
   */
  wearToStrip: number;
  /** Weaker stripping force / load. */
  margin: number;
}

export interface StrippingInput {
  load: number;
  major: number;
  nutMinor: number;
  pitch: number;
  nutLength: number;
  shearWidthFactor: number;
  nutShear: number;
  screwShear: number;
  /** Nut-thread thickness lost to wear, mm. */
  wear: number;
  /** Factor on both shear areas for the tolerance class (class 3G / basic; 1 = basic profile). */
  areaFactor?: number;
}

/** Stripping forces of the nut and screw threads (model in the file header). */
export function stripping(i: StrippingInput): StrippingResult {
  const k = i.areaFactor ?? 1;
  const wNut = Math.max(0, i.shearWidthFactor - i.wear / i.pitch);
  const nutArea = Math.PI * i.major * i.nutLength * wNut * k;
  const screwArea = Math.PI * i.nutMinor * i.nutLength * i.shearWidthFactor * k;
  const nutForce = nutArea * i.nutShear;
  const screwForce = screwArea * i.screwShear;
  const weaker = nutForce <= screwForce ? 'nut' : 'screw';
  const weakest = Math.min(nutForce, screwForce);
  const wearLimit = i.pitch * (i.shearWidthFactor - i.load / (i.nutShear * Math.PI * i.major * i.nutLength * k));
  const wearToStrip = Math.max(0, wearLimit - i.wear);
  return {nutArea, screwArea, nutForce, screwForce, weaker, wearToStrip, margin: i.load > 0 ? Math.min(MARGIN_CAP, weakest / i.load) : Infinity};
}

/** Mean flank pressure of the nut, MPa: 2F / (pi dm Le) (Shigley 9th ed. Eq. 8-10, all turns). */
export function bearingPressure(load: number, meanDiameter: number, nutLength: number): number {
  return (2 * load) / (Math.PI * meanDiameter * nutLength);
}

const PSI_MPA = 4.4482216152605 / (25.4 * 25.4);
const FPM_MS = 0.3048 / 60;

export interface AllowablePressure {
  /** Safe bearing pressure range, MPa. */
  min: number;
  max: number;
  /** The table row used, in words. */
  condition: string;
  source: string;
}

export const BEARING_TABLE_SOURCE =
  "Shigley's Mechanical Engineering Design, 9th ed., Table 8-4 (after Rothbart), steel screw; from memory";

function row(minPsi: number, maxPsi: number, condition: string): AllowablePressure {
  return {min: minPsi * PSI_MPA, max: maxPsi * PSI_MPA, condition, source: BEARING_TABLE_SOURCE};
}

/**
 * Safe bearing pressure for a steel screw in a bronze or cast-iron nut at a sliding
 * speed (m/s at the thread mean diameter); undefined where the table has no row.
 * Speed 0 means hand-operated and slow (the table's "low speed" row); no speed given
 * takes the up-to-10 ft/min row for bronze. Between rows the slower-speed row's
 * upper band is not used: the next faster row applies (common practice, no source).
 */
export function allowablePressure(nut: 'bronze' | 'cast-iron' | 'none', speed: number | undefined): AllowablePressure | undefined {
  const fpm = speed === undefined ? undefined : speed / FPM_MS;
  if (nut === 'bronze') {
    if (fpm === 0) return row(2500, 3500, 'bronze nut, low speed');
    if (fpm === undefined) return row(1600, 2500, 'bronze nut, up to 10 ft/min (speed not given)');
    if (fpm <= 10) return row(1600, 2500, 'bronze nut, up to 10 ft/min');
    if (fpm <= 40) return row(800, 1400, 'bronze nut, 20 to 40 ft/min');
    return row(150, 240, 'bronze nut, 50 ft/min and over');
  }
  if (nut === 'cast-iron') {
    if (fpm === undefined) return row(1800, 2500, 'cast-iron nut, up to 8 ft/min (speed not given)');
    if (fpm <= 8) return row(1800, 2500, 'cast-iron nut, up to 8 ft/min');
    if (fpm <= 40) return row(600, 1000, 'cast-iron nut, 20 to 40 ft/min');
    return undefined;
  }
  return undefined;
}
