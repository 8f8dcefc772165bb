/**
 * Unified inch screw threads (ASME B1.1): sizes and threads per inch of the
 * UNC, UNF and UNEF series.
 *
 * Source: ASME B1.1 series table (UNC, UNF, UNEF). UNC and UNF #4 to 1-1/2 in
 * were read in Shigley's Mechanical Engineering Design, 9th ed., Table 8-2
 * (compiled from ANSI B1.1; it omits 1-1/8 and 1-3/8). #0 to #3, 1-1/8, 1-3/8,
 * 1-3/4 and the UNEF series were read in a public copy of the ASME
 * B1.1 series table. The row marked `memory: true` (2 in, 4-1/2 tpi UNC) is
 * from memory: that copy gives 4 tpi, which is not the UNC value.
 * Numbered sizes: D = 0.060 + 0.013 N in (ASME B1.1; Shigley Table 8-2).
 */

export type UnifiedSeries = 'UNC' | 'UNF' | 'UNEF';

export interface UnifiedSeriesRow {
  /** Size label as written in the trade: "#10", "1/4", "1-1/2". */
  label: string;
  /** Basic major diameter D, inches. */
  inches: number;
  UNC?: number;
  UNF?: number;
  UNEF?: number;
  memory?: boolean;
}

const num = (n: number): number => Math.round((0.06 + 0.013 * n) * 1e4) / 1e4;

export const UNIFIED_SERIES: readonly UnifiedSeriesRow[] = [
  {label: '#0', inches: num(0), UNF: 80},
  {label: '#1', inches: num(1), UNC: 64, UNF: 72},
  {label: '#2', inches: num(2), UNC: 56, UNF: 64},
  {label: '#3', inches: num(3), UNC: 48, UNF: 56},
  {label: '#4', inches: num(4), UNC: 40, UNF: 48},
  {label: '#5', inches: num(5), UNC: 40, UNF: 44},
  {label: '#6', inches: num(6), UNC: 32, UNF: 40},
  {label: '#8', inches: num(8), UNC: 32, UNF: 36},
  {label: '#10', inches: num(10), UNC: 24, UNF: 32},
  {label: '#12', inches: num(12), UNC: 24, UNF: 28, UNEF: 32},
  {label: '1/4', inches: 0.25, UNC: 20, UNF: 28, UNEF: 32},
  {label: '5/16', inches: 0.3125, UNC: 18, UNF: 24, UNEF: 32},
  {label: '3/8', inches: 0.375, UNC: 16, UNF: 24, UNEF: 32},
  {label: '7/16', inches: 0.4375, UNC: 14, UNF: 20, UNEF: 28},
  {label: '1/2', inches: 0.5, UNC: 13, UNF: 20, UNEF: 28},
  {label: '9/16', inches: 0.5625, UNC: 12, UNF: 18, UNEF: 24},
  {label: '5/8', inches: 0.625, UNC: 11, UNF: 18, UNEF: 24},
  {label: '11/16', inches: 0.6875, UNEF: 24},
  {label: '3/4', inches: 0.75, UNC: 10, UNF: 16, UNEF: 20},
  {label: '13/16', inches: 0.8125, UNEF: 20},
  {label: '7/8', inches: 0.875, UNC: 9, UNF: 14, UNEF: 20},
  {label: '15/16', inches: 0.9375, UNEF: 20},
  {label: '1', inches: 1, UNC: 8, UNF: 12, UNEF: 20},
  {label: '1-1/16', inches: 1.0625, UNEF: 18},
  {label: '1-1/8', inches: 1.125, UNC: 7, UNF: 12, UNEF: 18},
  {label: '1-3/16', inches: 1.1875, UNEF: 18},
  {label: '1-1/4', inches: 1.25, UNC: 7, UNF: 12, UNEF: 18},
  {label: '1-5/16', inches: 1.3125, UNEF: 18},
  {label: '1-3/8', inches: 1.375, UNC: 6, UNF: 12, UNEF: 18},
  {label: '1-7/16', inches: 1.4375, UNEF: 18},
  {label: '1-1/2', inches: 1.5, UNC: 6, UNF: 12, UNEF: 18},
  {label: '1-9/16', inches: 1.5625, UNEF: 18},
  {label: '1-5/8', inches: 1.625, UNEF: 18},
  {label: '1-11/16', inches: 1.6875, UNEF: 18},
  {label: '1-3/4', inches: 1.75, UNC: 5},
  {label: '2', inches: 2, UNC: 4.5, memory: true},
];

/** The row whose diameter matches (within 0.0005 in), or undefined. */
export function unifiedRow(inches: number): UnifiedSeriesRow | undefined {
  return UNIFIED_SERIES.find(r => Math.abs(r.inches - inches) < 5e-4);
}

/** The series a size/tpi pair belongs to, or undefined when it is in none. */
export function seriesOf(row: UnifiedSeriesRow, tpi: number): UnifiedSeries | undefined {
  for (const s of ['UNC', 'UNF', 'UNEF'] as const) if (row[s] === tpi) return s;
  return undefined;
}
