/**
 * Inch hexagon nuts (data only), ASME B18.2.2: hex nuts and heavy hex nuts, 1/4 to 1-1/2 in.
 * F = width across flats (basic = max), H = thickness (min and max), inches. Values as printed in
 * reproductions of the ASME B18.2.2 tables (hex: the hex / hex slotted nut table; heavy hex: the
 * heavy hex nut table), read in stored copies; not read in the standard itself.
 * Countersink: the tapped hole is countersunk on the bearing face to a diameter of d + 0.030 in for
 * 3/8 in and smaller, 1.08 d above (ASME B18.2.2, rule as printed for hex flange nuts; that it holds
 * for plain and heavy hex nuts, and on both faces, is from memory).
 */
import {CONVERSION} from '../units.js';
import type {Provenance} from '../types.js';

const IN = CONVERSION.IN_MM;

export type InchNutStyle = 'hex' | 'heavy-hex';

/** [size in, F max in, H min in, H max in] */
type Row = readonly [number, number, number, number];

const HEX: readonly Row[] = [
  [0.25, 0.438, 0.212, 0.226], [0.3125, 0.5, 0.258, 0.273], [0.375, 0.562, 0.32, 0.337], [0.4375, 0.688, 0.365, 0.385],
  [0.5, 0.75, 0.427, 0.448], [0.5625, 0.875, 0.473, 0.496], [0.625, 0.938, 0.535, 0.559], [0.75, 1.125, 0.617, 0.665],
  [0.875, 1.312, 0.724, 0.776], [1, 1.5, 0.831, 0.887], [1.125, 1.688, 0.939, 0.999], [1.25, 1.875, 1.03, 1.094],
  [1.375, 2.062, 1.138, 1.206], [1.5, 2.25, 1.245, 1.317],
];

const HEAVY: readonly Row[] = [
  [0.25, 0.5, 0.218, 0.25], [0.3125, 0.562, 0.28, 0.314], [0.375, 0.688, 0.341, 0.377], [0.4375, 0.75, 0.403, 0.441],
  [0.5, 0.875, 0.464, 0.504], [0.5625, 0.938, 0.526, 0.568], [0.625, 1.062, 0.587, 0.631], [0.75, 1.25, 0.71, 0.758],
  [0.875, 1.438, 0.833, 0.885], [1, 1.625, 0.956, 1.012], [1.125, 1.812, 1.079, 1.139], [1.25, 2, 1.187, 1.251],
  [1.375, 2.188, 1.31, 1.378], [1.5, 2.375, 1.433, 1.505],
];

const SOURCE: Record<InchNutStyle, Provenance> = {
  'hex': {source: 'ASME B18.2.2 hex nuts, H min and F (values from a reproduction of the standard table)', kind: 'standard'},
  'heavy-hex': {source: 'ASME B18.2.2 heavy hex nuts, H min and F (values from a reproduction of the standard table)', kind: 'standard'},
};

export interface InchNutDimensions {
  /** Height H min and max, mm. */
  heightMin: number;
  heightMax: number;
  /** Width across flats F (basic), mm. */
  flats: number;
  /** Countersink diameter max, mm. */
  countersinkMax: number;
  provenance: Provenance;
}

/** Countersink diameter max of an inch hex nut, mm: d + 0.030 in up to 3/8 in, 1.08 d above (ASME B18.2.2; see the file header). */
export function inchNutCountersink(nominalMm: number): number {
  return nominalMm <= 0.375 * IN + 1e-6 ? nominalMm + 0.03 * IN : 1.08 * nominalMm;
}

/** Dimensions of an ASME B18.2.2 hex or heavy hex nut of nominal size `nominalMm` (mm), or undefined off the table. */
export function inchNutDimensions(nominalMm: number, style: InchNutStyle = 'hex'): InchNutDimensions | undefined {
  const row = (style === 'hex' ? HEX : HEAVY).find(r => Math.abs(r[0] * IN - nominalMm) < 1e-3);
  if (!row) return undefined;
  return {heightMin: row[2] * IN, heightMax: row[3] * IN, flats: row[1] * IN, countersinkMax: inchNutCountersink(nominalMm), provenance: SOURCE[style]};
}
