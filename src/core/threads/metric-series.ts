/**
 * ISO general purpose metric screw threads: diameter/pitch combinations.
 *
 * Source: ISO 261:1998 Table 1 (general plan) and ISO 262:1998 Table 1
 * (selected sizes). The M3 to M36 coarse pitches and the ISO 262 fine pitches
 * of that range were read in a reproduction of ISO 262. The coarse pitches of
 * the other rows (M1 to M2.5, M3.5, M4.5, M7, M39 to M64) agree with the
 * coarse-pitch rows of the ISO 965-2 / DIN 13-20 limit table; their fine
 * pitches, and the ISO 261 fine pitches beyond ISO 262 (e.g. M10x0.75,
 * M12x1, M16x1), are from memory of ISO 261 Table 1. Rows with fine pitches
 * from memory are marked `memory: true`.
 */

export interface MetricSeriesRow {
  /** Nominal diameter d, mm. */
  d: number;
  /** Coarse pitch, mm; undefined where ISO 261 lists fine pitches only. */
  coarse?: number;
  /** Fine pitches, mm, largest first. */
  fine: number[];
  /** Choice of diameter in ISO 261 (1 preferred, 2 second, 3 third). */
  choice: 1 | 2 | 3;
  /** True when (some of) the row's fine pitches are from memory of ISO 261, not read. */
  memory?: boolean;
}

/** ISO 261 Table 1 / ISO 262 Table 1 rows, M1 to M64. */
export const METRIC_SERIES: readonly MetricSeriesRow[] = [
  {d: 1, coarse: 0.25, fine: [0.2], choice: 1, memory: true},
  {d: 1.2, coarse: 0.25, fine: [0.2], choice: 1, memory: true},
  {d: 1.4, coarse: 0.3, fine: [0.2], choice: 2, memory: true},
  {d: 1.6, coarse: 0.35, fine: [0.2], choice: 1, memory: true},
  {d: 1.8, coarse: 0.35, fine: [0.2], choice: 2, memory: true},
  {d: 2, coarse: 0.4, fine: [0.25], choice: 1, memory: true},
  {d: 2.2, coarse: 0.45, fine: [0.25], choice: 2, memory: true},
  {d: 2.5, coarse: 0.45, fine: [0.35], choice: 1, memory: true},
  {d: 3, coarse: 0.5, fine: [0.35], choice: 1},
  {d: 3.5, coarse: 0.6, fine: [0.35], choice: 2, memory: true},
  {d: 4, coarse: 0.7, fine: [0.5], choice: 1},
  {d: 4.5, coarse: 0.75, fine: [0.5], choice: 2, memory: true},
  {d: 5, coarse: 0.8, fine: [0.5], choice: 1},
  {d: 6, coarse: 1, fine: [0.75], choice: 1},
  {d: 7, coarse: 1, fine: [0.75], choice: 2, memory: true},
  {d: 8, coarse: 1.25, fine: [1, 0.75], choice: 1},
  {d: 10, coarse: 1.5, fine: [1.25, 1, 0.75], choice: 1},
  {d: 12, coarse: 1.75, fine: [1.5, 1.25, 1], choice: 1},
  {d: 14, coarse: 2, fine: [1.5, 1.25, 1], choice: 2},
  {d: 16, coarse: 2, fine: [1.5, 1], choice: 1},
  {d: 18, coarse: 2.5, fine: [2, 1.5, 1], choice: 2},
  {d: 20, coarse: 2.5, fine: [2, 1.5, 1], choice: 1},
  {d: 22, coarse: 2.5, fine: [2, 1.5, 1], choice: 2},
  {d: 24, coarse: 3, fine: [2, 1.5, 1], choice: 1},
  {d: 27, coarse: 3, fine: [2, 1.5, 1], choice: 2},
  {d: 30, coarse: 3.5, fine: [3, 2, 1.5, 1], choice: 1},
  {d: 33, coarse: 3.5, fine: [3, 2, 1.5], choice: 2},
  {d: 36, coarse: 4, fine: [3, 2, 1.5], choice: 1},
  {d: 39, coarse: 4, fine: [3, 2, 1.5], choice: 2, memory: true},
  {d: 42, coarse: 4.5, fine: [4, 3, 2, 1.5], choice: 1, memory: true},
  {d: 45, coarse: 4.5, fine: [4, 3, 2, 1.5], choice: 2, memory: true},
  {d: 48, coarse: 5, fine: [4, 3, 2, 1.5], choice: 1, memory: true},
  {d: 52, coarse: 5, fine: [4, 3, 2, 1.5], choice: 2, memory: true},
  {d: 56, coarse: 5.5, fine: [4, 3, 2, 1.5], choice: 1, memory: true},
  {d: 60, coarse: 5.5, fine: [4, 3, 2, 1.5], choice: 2, memory: true},
  {d: 64, coarse: 6, fine: [4, 3, 2, 1.5], choice: 1, memory: true},
];

/** The series row for a nominal diameter, or undefined. */
export function metricRow(d: number): MetricSeriesRow | undefined {
  return METRIC_SERIES.find(r => Math.abs(r.d - d) < 1e-9);
}
