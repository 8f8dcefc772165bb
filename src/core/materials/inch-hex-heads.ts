/**
 * Inch hex cap screw heads and their clearance holes, 1/4 to 1 in (data only), in inches
 * as the tables print them; index.ts converts to mm.
 *
 * - Width across flats F, max and min: ASME B18.2.1 hex cap screw dimension table, read as
 *   reproduced by several distributor pages (the same figures on each).
 * - Clearance hole, normal fit: ASME B18.2.8-1999 inch clearance holes. Read in a distributor
 *   table that cites B18.2.8; the 1/4 to 7/16 drills (9/32, 11/32, 13/32, 15/32) and the loose-fit
 *   column also read in Machinery's Handbook 31st ed., p. 1741, Table 1a, and the 1/2, 5/8 and 3/4
 *   values agree with the metric drills of its Table 3a (14.25, 17.5, 20.5 mm), p. 1743.
 * - Bearing-face diameter: the B18.2.1 washer-face minimum was not read. The outer diameter of
 *   the bearing face is taken as the minimum width across flats (the washer face spans about the
 *   flats: from memory, verify against ASME B18.2.1), so every row's bearing data is labelled
 *   'memory'.
 */
import type {Provenance} from '../types.js';

export const INCH_FLATS_SOURCE = 'ASME B18.2.1 hex cap screws, width across flats F max/min (dimension table as reproduced by distributors)';
export const INCH_HOLE_SOURCE =
  "ASME B18.2.8-1999 clearance hole, normal fit (distributor table citing the standard; Machinery's Handbook 31st ed. Tables 1a and 3a)";

const BEARING_MEMORY: Provenance = {
  source:
    `bearing-face diameter taken as the minimum width across flats of ${INCH_FLATS_SOURCE}: typical value, from memory (the washer-face minimum was not read): verify against ASME B18.2.1; ${INCH_HOLE_SOURCE}`,
  kind: 'memory',
};

const row = (size: string, dIn: number, flatsMaxIn: number, flatsMinIn: number, clearanceHoleIn: number) => ({
  size,
  dIn,
  flatsMaxIn,
  flatsMinIn,
  clearanceHoleIn,
  provenance: BEARING_MEMORY,
});

/** Raw rows; validated by the schema in index.ts. */
export const INCH_HEX_HEAD_ROWS: unknown[] = [
  row('1/4', 0.25, 0.438, 0.428, 0.281),
  row('5/16', 0.3125, 0.5, 0.489, 0.344),
  row('3/8', 0.375, 0.562, 0.551, 0.406),
  row('7/16', 0.4375, 0.625, 0.612, 0.469),
  row('1/2', 0.5, 0.75, 0.736, 0.562),
  row('5/8', 0.625, 0.938, 0.922, 0.688),
  row('3/4', 0.75, 1.125, 1.1, 0.812),
  row('7/8', 0.875, 1.312, 1.285, 0.938),
  row('1', 1, 1.5, 1.469, 1.094),
];
