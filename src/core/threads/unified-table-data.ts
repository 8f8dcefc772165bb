/**
 * Limits of size of unified inch screw threads, inches as printed.
 *
 * Source: ASME B1.1 limits of size, Standard Series tables (read in a public copy
 * of the table). Only the rows that copy showed complete are here; every other
 * size and class is computed from the formulas in unified-limits.ts and labelled so.
 * Read: 0-80 UNF, 1-64 UNC, 1-72 UNF, 2-56 UNC, 2-64 UNF (2A, 2B, 3A, 3B);
 * 3-48 UNC 2A; 15/16-20 UNEF 2A, 2B, 3A. (3-48 UNC 2B/3A/3B and 15/16-20 UNEF 3B
 * were cut off in the copy and are not transcribed.)
 *
 * External row: [allowance, major max, major min, pitch max, pitch min, UNR minor max (reference)].
 * Internal row: [minor min, minor max, pitch min, pitch max, major min]
 * (the copy prints max before min; the order here is the one the types use).
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
    internal: {},
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
