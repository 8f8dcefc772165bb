/**
 * Power-screw thread series, used only to say whether a size/pitch pair is a
 * listed one. Geometry and mechanics of power screws live in src/core/screw.
 *
 * ISO metric trapezoidal (Tr): diameter/pitch combinations of ISO 2904 Table 1,
 * preferred pitch first; from memory of that table (not read in a copy).
 * Acme (ASME B1.5): the commonly listed size/tpi combinations of ASME B1.5
 * Table 1 for general-purpose Acme; from memory.
 */

/** Tr diameter (mm) to its pitches (mm), preferred first. From memory of ISO 2904 Table 1. */
export const TRAPEZOIDAL_SERIES: ReadonlyArray<{d: number; pitches: number[]}> = [
  {d: 8, pitches: [1.5]},
  {d: 9, pitches: [2, 1.5]},
  {d: 10, pitches: [2, 1.5]},
  {d: 11, pitches: [2, 3]},
  {d: 12, pitches: [3, 2]},
  {d: 14, pitches: [3, 2]},
  {d: 16, pitches: [4, 2]},
  {d: 18, pitches: [4, 2]},
  {d: 20, pitches: [4, 2]},
  {d: 22, pitches: [5, 3, 8]},
  {d: 24, pitches: [5, 3, 8]},
  {d: 26, pitches: [5, 3, 8]},
  {d: 28, pitches: [5, 3, 8]},
  {d: 30, pitches: [6, 3, 10]},
  {d: 32, pitches: [6, 3, 10]},
  {d: 34, pitches: [6, 3, 10]},
  {d: 36, pitches: [6, 3, 10]},
  {d: 38, pitches: [7, 3, 10]},
  {d: 40, pitches: [7, 3, 10]},
  {d: 42, pitches: [7, 3, 10]},
  {d: 44, pitches: [7, 3, 12]},
  {d: 46, pitches: [8, 3, 12]},
  {d: 48, pitches: [8, 3, 12]},
  {d: 50, pitches: [8, 3, 12]},
  {d: 52, pitches: [8, 3, 12]},
  {d: 55, pitches: [9, 3, 14]},
  {d: 60, pitches: [9, 3, 14]},
  {d: 65, pitches: [10, 4, 16]},
  {d: 70, pitches: [10, 4, 16]},
  {d: 75, pitches: [10, 4, 16]},
  {d: 80, pitches: [10, 4, 16]},
];

/** General-purpose Acme: size label, diameter (in), tpi. From memory of ASME B1.5 Table 1. */
export const ACME_SERIES: ReadonlyArray<{label: string; inches: number; tpi: number}> = [
  {label: '1/4', inches: 0.25, tpi: 16},
  {label: '5/16', inches: 0.3125, tpi: 14},
  {label: '3/8', inches: 0.375, tpi: 12},
  {label: '7/16', inches: 0.4375, tpi: 12},
  {label: '1/2', inches: 0.5, tpi: 10},
  {label: '5/8', inches: 0.625, tpi: 8},
  {label: '3/4', inches: 0.75, tpi: 6},
  {label: '7/8', inches: 0.875, tpi: 6},
  {label: '1', inches: 1, tpi: 5},
  {label: '1-1/8', inches: 1.125, tpi: 5},
  {label: '1-1/4', inches: 1.25, tpi: 5},
  {label: '1-3/8', inches: 1.375, tpi: 4},
  {label: '1-1/2', inches: 1.5, tpi: 4},
  {label: '1-3/4', inches: 1.75, tpi: 4},
  {label: '2', inches: 2, tpi: 4},
  {label: '2-1/4', inches: 2.25, tpi: 3},
  {label: '2-1/2', inches: 2.5, tpi: 3},
  {label: '2-3/4', inches: 2.75, tpi: 3},
  {label: '3', inches: 3, tpi: 2},
  {label: '3-1/2', inches: 3.5, tpi: 2},
  {label: '4', inches: 4, tpi: 2},
  {label: '4-1/2', inches: 4.5, tpi: 2},
  {label: '5', inches: 5, tpi: 2},
];

/** Classes accepted for Acme threads (ASME B1.5): general purpose G, centralizing C. */
export const ACME_CLASSES = ['2G', '3G', '4G', '5G', '2C', '3C', '4C', '5C', '6C'] as const;
/** Tolerance classes accepted for Tr threads (ISO 2903): external and internal. */
export const TR_CLASSES_EXTERNAL = ['7e', '8e', '7c', '8c', '9c'] as const;
export const TR_CLASSES_INTERNAL = ['7H', '8H', '9H'] as const;
