/**
 * Limits of size of unified inch screw threads, inches as printed.
 *
 * Source: ASME B1.1 limits of size, Standard Series table, as reprinted in the
 * public copies named below (read 2026-12-01). Only rows a copy showed complete
 * are here; every other size and class is computed from the formulas in
 * unified-limits.ts and labelled so, one side at a time.
 *
 * 1. "Unified Screw Threads, Standard Series", efunda.com,
 *    DesignStandards/screws/unified.cfm (first range) and
 *    unified.cfm?start=228&finish=301 (15/16 to 1-3/16 range):
 *    0-80 UNF, 1-64 UNC, 1-72 UNF, 2-56 UNC, 2-64 UNF (2A, 2B, 3A, 3B);
 *    3-48 UNC 2A and 2B; 15/16-20 UNEF 2A, 2B, 3A. The copy stops inside the
 *    3-48 UNC 2B row after "0.09" (the minimum major diameter); that value,
 *    0.0990 in, is read in copies 2 and 3. 3-48 UNC 3A/3B lie past the end
 *    of the copy, and 15/16-20 UNEF 3B is cut off inside its pitch
 *    diameter; none of them is transcribed.
 * 2. "Internal Thread Dimensions for Unified UNC Screw Threads" (class 2B
 *    chart), ar.scribd.com/document/395466526: class 2B only, UNC #4-40,
 *    #5-40, #6-32, #8-32, #10-24, #12-24, 1/4-20, 5/16-18, 3/8-16, 7/16-14,
 *    5/8-11, 3/4-10, 7/8-9, 1-8, 1-1/8-7, 1-1/4-7, 1-3/8-6. Left out as
 *    misprints on that page: 1/2-13 (minor diameter "min" 0.4700
 *    above its "max" 0.4340), 9/16-12 (pitch max 0.5125: a 2B pitch
 *    tolerance of 0.0041 in, smaller than that of 7/16-14, where the
 *    tolerance grows with the pitch) and 1-1/2-6 (pitch max 1.4075: a
 *    tolerance of 0.0158 in against 0.0104 in for 1-3/8-6 at the same
 *    pitch). Its #1-64, #2-56 and #3-48 rows are not used (copy 1 has them;
 *    on this page #2 prints 0.667 for 0.0667 and #3 repeats the pitch min
 *    0.0855 as the max, where copy 1 prints 0.0885).
 * 3. "Unified Screw Threads (Class 2A & 2B)", microadvances.com/drillchart.htm:
 *    allowance, 2A major limits and 2B minor limits, no pitch diameters, so
 *    no row is taken from it; it is the second reading of the 2B minor
 *    diameters and minimum major diameters of 3-48 (copy 1) and of #4-40 to
 *    #12-24 (copy 2): all agree, the #10-24 maximum minor diameter of
 *    0.156 in included (the formulas give 0.155 in; the table value is kept).
 *
 * The UNC class 2B rows give no class 2A row (copy 2 has none): for those sizes
 * 2A and every class 1 and 3 come from the formulas.
 *
 * External row: [allowance, major max, major min, pitch max, pitch min, UNR minor max (reference)].
 * Internal row: [minor min, minor max, pitch min, pitch max, major min]
 * (the copies print max before min; the order here is the one the types use).
 */

export type UnifiedTableExternal = readonly [number, number, number, number, number, number];
export type UnifiedTableInternal = readonly [number, number, number, number, number];

export interface UnifiedTableEntry {
  /** Designation as printed: size-tpi series. */
  thread: string;
  /** Basic major diameter, inches. */
  D: number;
  tpi: number;
  external: Partial<Record<'1A' | '2A' | '3A', UnifiedTableExternal>>;
  internal: Partial<Record<'1B' | '2B' | '3B', UnifiedTableInternal>>;
}

export const UNIFIED_TABLE: readonly UnifiedTableEntry[] = [
  {
    thread: '0-80 UNF', D: 0.06, tpi: 80,
    external: {'2A': [0.0005, 0.0595, 0.0563, 0.0514, 0.0496, 0.0446], '3A': [0.0, 0.06, 0.0568, 0.0519, 0.0506, 0.0451]},
    internal: {'2B': [0.0465, 0.0514, 0.0519, 0.0542, 0.06], '3B': [0.0465, 0.0514, 0.0519, 0.0536, 0.06]},
  },
  {
    thread: '1-64 UNC', D: 0.073, tpi: 64,
    external: {'2A': [0.0006, 0.0724, 0.0686, 0.0623, 0.0603, 0.0538], '3A': [0.0, 0.073, 0.0692, 0.0629, 0.0614, 0.0544]},
    internal: {'2B': [0.0561, 0.0623, 0.0629, 0.0655, 0.073], '3B': [0.0561, 0.0623, 0.0629, 0.0648, 0.073]},
  },
  {
    thread: '1-72 UNF', D: 0.073, tpi: 72,
    external: {'2A': [0.0006, 0.0724, 0.0689, 0.0634, 0.0615, 0.0559], '3A': [0.0, 0.073, 0.0695, 0.064, 0.0626, 0.0565]},
    internal: {'2B': [0.058, 0.0635, 0.064, 0.0665, 0.073], '3B': [0.058, 0.0635, 0.064, 0.0659, 0.073]},
  },
  {
    thread: '2-56 UNC', D: 0.086, tpi: 56,
    external: {'2A': [0.0006, 0.0854, 0.0813, 0.0738, 0.0717, 0.0642], '3A': [0.0, 0.086, 0.0819, 0.0744, 0.0728, 0.0648]},
    internal: {'2B': [0.0667, 0.0737, 0.0744, 0.0772, 0.086], '3B': [0.0667, 0.0737, 0.0744, 0.0765, 0.086]},
  },
  {
    thread: '2-64 UNF', D: 0.086, tpi: 64,
    external: {'2A': [0.0006, 0.0854, 0.0816, 0.0753, 0.0733, 0.0668], '3A': [0.0, 0.086, 0.0822, 0.0759, 0.0744, 0.0674]},
    internal: {'2B': [0.0691, 0.0753, 0.0759, 0.0786, 0.086], '3B': [0.0691, 0.0753, 0.0759, 0.0779, 0.086]},
  },
  {
    thread: '3-48 UNC', D: 0.099, tpi: 48,
    external: {'2A': [0.0007, 0.0983, 0.0938, 0.0848, 0.0825, 0.0734]},
    internal: {'2B': [0.0764, 0.0845, 0.0855, 0.0885, 0.099]},
  },
  {
    thread: '4-40 UNC', D: 0.112, tpi: 40,
    external: {},
    internal: {'2B': [0.0849, 0.0939, 0.0958, 0.0991, 0.112]},
  },
  {
    thread: '5-40 UNC', D: 0.125, tpi: 40,
    external: {},
    internal: {'2B': [0.0979, 0.1062, 0.1088, 0.1121, 0.125]},
  },
  {
    thread: '6-32 UNC', D: 0.138, tpi: 32,
    external: {},
    internal: {'2B': [0.104, 0.114, 0.1177, 0.1214, 0.138]},
  },
  {
    thread: '8-32 UNC', D: 0.164, tpi: 32,
    external: {},
    internal: {'2B': [0.13, 0.139, 0.1437, 0.1475, 0.164]},
  },
  {
    thread: '10-24 UNC', D: 0.19, tpi: 24,
    external: {},
    internal: {'2B': [0.145, 0.156, 0.1629, 0.1672, 0.19]},
  },
  {
    thread: '12-24 UNC', D: 0.216, tpi: 24,
    external: {},
    internal: {'2B': [0.171, 0.181, 0.1889, 0.1933, 0.216]},
  },
  {
    thread: '1/4-20 UNC', D: 0.25, tpi: 20,
    external: {},
    internal: {'2B': [0.196, 0.207, 0.2175, 0.2224, 0.25]},
  },
  {
    thread: '5/16-18 UNC', D: 0.3125, tpi: 18,
    external: {},
    internal: {'2B': [0.252, 0.265, 0.2764, 0.2817, 0.3125]},
  },
  {
    thread: '3/8-16 UNC', D: 0.375, tpi: 16,
    external: {},
    internal: {'2B': [0.307, 0.321, 0.3344, 0.3401, 0.375]},
  },
  {
    thread: '7/16-14 UNC', D: 0.4375, tpi: 14,
    external: {},
    internal: {'2B': [0.36, 0.376, 0.3911, 0.3972, 0.4375]},
  },
  {
    thread: '5/8-11 UNC', D: 0.625, tpi: 11,
    external: {},
    internal: {'2B': [0.527, 0.546, 0.566, 0.5732, 0.625]},
  },
  {
    thread: '3/4-10 UNC', D: 0.75, tpi: 10,
    external: {},
    internal: {'2B': [0.642, 0.663, 0.685, 0.6927, 0.75]},
  },
  {
    thread: '7/8-9 UNC', D: 0.875, tpi: 9,
    external: {},
    internal: {'2B': [0.755, 0.778, 0.8028, 0.811, 0.875]},
  },
  {
    thread: '1-8 UNC', D: 1, tpi: 8,
    external: {},
    internal: {'2B': [0.865, 0.89, 0.9188, 0.9276, 1]},
  },
  {
    thread: '1-1/8-7 UNC', D: 1.125, tpi: 7,
    external: {},
    internal: {'2B': [0.97, 0.998, 1.0322, 1.0416, 1.125]},
  },
  {
    thread: '1-1/4-7 UNC', D: 1.25, tpi: 7,
    external: {},
    internal: {'2B': [1.095, 1.123, 1.1572, 1.1668, 1.25]},
  },
  {
    thread: '1-3/8-6 UNC', D: 1.375, tpi: 6,
    external: {},
    internal: {'2B': [1.195, 1.225, 1.2667, 1.2771, 1.375]},
  },
  {
    thread: '15/16-20 UNEF', D: 0.9375, tpi: 20,
    external: {'2A': [0.0014, 0.9361, 0.928, 0.9036, 0.8991, 0.8766], '3A': [0.0, 0.9375, 0.9294, 0.905, 0.9016, 0.878]},
    internal: {'2B': [0.883, 0.895, 0.905, 0.9109, 0.9375]},
  },
];

/** The table entry for a basic major diameter (inches, within 0.0005) and tpi, or undefined. */
export function unifiedTableEntry(D: number, tpi: number): UnifiedTableEntry | undefined {
  return UNIFIED_TABLE.find(e => Math.abs(e.D - D) < 5e-4 && Math.abs(e.tpi - tpi) < 1e-9);
}
