/**
 * Dimensions of standard hexagon heads and nuts used as defaults (data only), mm.
 *
 * Hexagon head bearing face and clearance hole:
 * - M8 to M24: dw,min of ISO 4014/4017 product grade A and the ISO 273 medium-series
 *   clearance hole, read from the standards' dimension tables as reproduced in a
 *   distributor catalogue; with DKm = (dw,min + dh)/2 these reproduce the VDI 2230
 *   Part 1 tightening tables (see test/core/materials).
 * - M3 to M6: ISO 273 medium clearance hole read from a stored page reproducing the
 *   ISO 273 table; dw,min from memory.
 * - M27 to M36 (M27 up: product grade B): from memory.
 * Unified (inch) hex cap screw heads, 1/4 to 1 in: inch-hex-heads.ts.
 *
 * ISO 4032 regular (style 1) hexagon nuts: the preferred sizes (M3 to M12, M16, M20,
 * M24, M30, M36) read from a stored copy of BS EN ISO 4032:2001 Table 1 (m max, m min,
 * s); the non-preferred sizes (M14, M18, M22, M27, M33, ISO 4032 Table 2) from memory.
 */
import type {Provenance} from '../types.js';

const HEAD_STD: Provenance = {
  source: 'ISO 4014/4017 dimension table, dw,min (product grade A); ISO 273 clearance holes, medium series',
  kind: 'standard',
};
const HEAD_273: Provenance = {
  source: 'ISO 273 clearance hole, medium series, from the standard\'s table; ISO 4014/4017 dw,min from memory: verify against the standard',
  kind: 'memory',
};
const HEAD_MEM: Provenance = {
  source: 'ISO 4014/4017 dw,min and ISO 273 medium clearance hole, typical value, from memory: verify against the standards',
  kind: 'memory',
};
const NUT_MEM: Provenance = {
  source: 'ISO 4032 style 1 hexagon nut, height m min/max and width across flats s, from memory: verify against the standard',
  kind: 'memory',
};
const NUT_STD: Provenance = {
  source: 'ISO 4032:2001 Table 1 (preferred sizes), m min/max and s',
  kind: 'standard',
};

const head = (d: number, dwMin: number, clearanceHole: number, provenance: Provenance) => ({d, dwMin, clearanceHole, provenance});
const nut = (d: number, heightMin: number, heightMax: number, flats: number, provenance: Provenance) => ({
  d,
  heightMin,
  heightMax,
  flats,
  provenance,
});

/** Raw rows; validated by the schema in index.ts. */
export const HEX_HEAD_ROWS: unknown[] = [
  head(3, 4.57, 3.4, HEAD_273),
  head(4, 5.88, 4.5, HEAD_273),
  head(5, 6.88, 5.5, HEAD_273),
  head(6, 8.88, 6.6, HEAD_273),
  head(8, 11.63, 9, HEAD_STD),
  head(10, 14.63, 11, HEAD_STD),
  head(12, 16.63, 13.5, HEAD_STD),
  head(14, 19.64, 15.5, HEAD_STD),
  head(16, 22.49, 17.5, HEAD_STD),
  head(18, 25.34, 20, HEAD_STD),
  head(20, 28.19, 22, HEAD_STD),
  head(22, 31.71, 24, HEAD_STD),
  head(24, 33.61, 26, HEAD_STD),
  head(27, 38, 30, HEAD_MEM),
  head(30, 42.75, 33, HEAD_MEM),
  head(33, 46.55, 36, HEAD_MEM),
  head(36, 51.11, 39, HEAD_MEM),
];

export const NUT_DIMENSION_ROWS: unknown[] = [
  nut(3, 2.15, 2.4, 5.5, NUT_STD),
  nut(4, 2.9, 3.2, 7, NUT_STD),
  nut(5, 4.4, 4.7, 8, NUT_STD),
  nut(6, 4.9, 5.2, 10, NUT_STD),
  nut(8, 6.44, 6.8, 13, NUT_STD),
  nut(10, 8.04, 8.4, 16, NUT_STD),
  nut(12, 10.37, 10.8, 18, NUT_STD),
  nut(14, 12.1, 12.8, 21, NUT_MEM),
  nut(16, 14.1, 14.8, 24, NUT_STD),
  nut(18, 15.1, 15.8, 27, NUT_MEM),
  nut(20, 16.9, 18, 30, NUT_STD),
  nut(22, 18.1, 19.4, 34, NUT_MEM),
  nut(24, 20.2, 21.5, 36, NUT_STD),
  nut(27, 22.5, 23.8, 41, NUT_MEM),
  nut(30, 24.3, 25.6, 46, NUT_STD),
  nut(33, 27.4, 28.7, 50, NUT_MEM),
  nut(36, 29.4, 31, 55, NUT_STD),
];
