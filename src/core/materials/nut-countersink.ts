/**
 * Countersink of standard hexagon nuts and the thread length it takes off, mm.
 * ISO 4032:2001 Table 1 countersink diameter da max (values from a reproduction of the table):
 * M3 3.45, M4 4.6, M5 5.75, M6 6.75, M8 8.75, M10 10.8, M12 13, M16 17.3, M20 21.6, M24 25.9,
 * M30 32.4, M36 38.9. Non-preferred sizes (M14, M18, M22, M27, M33) take 1.08 d, the pattern of
 * the tabulated values from M10 up (common practice, no source).
 * Countersink included angle 120 deg, both faces countersunk (from memory; 90 to 120 deg is the
 * usual range, 120 deg takes off the least thread).
 */
const ISO4032_DA_MAX: Readonly<Record<number, number>> = {3: 3.45, 4: 4.6, 5: 5.75, 6: 6.75, 8: 8.75, 10: 10.8, 12: 13, 16: 17.3, 20: 21.6, 24: 25.9, 30: 32.4, 36: 38.9};

/** Countersink included angle used, degrees (from memory). */
export const NUT_COUNTERSINK_ANGLE = 120;

/** ISO 4032 da max for a metric nut of nominal d (mm), or undefined outside M3 to M36. */
export function isoNutCountersink(d: number): number | undefined {
  const key = Math.round(d * 1000) / 1000;
  if (ISO4032_DA_MAX[key] !== undefined) return ISO4032_DA_MAX[key];
  return key >= 10 && key <= 36 && Number.isInteger(key) ? 1.08 * key : undefined;
}

/**
 * Axial depth of a cone of included angle theta from diameter `from` out to the countersink
 * diameter da, mm: (da - from) / (2 tan(theta/2)) (geometry of a cone).
 * With from = d (the major diameter) it is the depth with no thread at all: the length one
 * countersunk face takes off the engagement here. With from = D1 it is the depth over which the
 * thread is truncated at all; the truncated part still carries load and is counted (the ISO 898-2
 * nut heights were set with the countersinks in place; from memory).
 */
export function countersinkThreadLoss(da: number, from: number, angleDeg = NUT_COUNTERSINK_ANGLE): number {
  return Math.max(0, (da - from) / (2 * Math.tan((angleDeg * Math.PI) / 360)));
}
