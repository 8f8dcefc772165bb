/**
 * ISO 965-1 generating formulas for fundamental deviations and tolerances of
 * metric threads. Used ONLY as the labelled fallback for special threads
 * (pitch or diameter not in the shipped ISO 965-1 tables): the standard's
 * tables are rounded in ways these formulas do not reproduce exactly.
 *
 * Formulas from memory of ISO 965-1 clause 9 (µm, P and d in mm):
 *   es(e) = -(50 + 11P), es(f) = -(30 + 11P), es(g) = -(15 + 11P), es(h) = 0
 *   EI(G) = +(15 + 11P), EI(H) = 0
 *   Td(6)  = 180 P^(2/3) - 3.15 / sqrt(P)
 *   TD1(6) = 433P - 190 P^1.22 (P <= 0.8), 230 P^0.7 (P >= 1)
 *   Td2(6) = 90 P^0.4 d^0.1, d = geometric mean of the diameter range
 *   TD2(G) = 1.32 Td2(G) for the same grade
 * Grade factors relative to grade 6: 3 0.5, 4 0.63, 5 0.8, 7 1.25, 8 1.6, 9 2.0.
 * Results are rounded to the whole micrometre (the standard rounds to its own series).
 */

const FACTOR: Record<number, number> = {3: 0.5, 4: 0.63, 5: 0.8, 6: 1, 7: 1.25, 8: 1.6, 9: 2};

/** ISO 965-1 diameter range limits, mm ("over ... up to and including"). */
export const DIAMETER_RANGES = [0.99, 1.4, 2.8, 5.6, 11.2, 22.4, 45, 90, 180, 355] as const;

/** Index i of the range (DIAMETER_RANGES[i], DIAMETER_RANGES[i+1]] holding d, or -1. */
export function rangeIndex(d: number): number {
  for (let i = 0; i + 1 < DIAMETER_RANGES.length; i++) {
    const lo = DIAMETER_RANGES[i] ?? 0;
    const hi = DIAMETER_RANGES[i + 1] ?? 0;
    if (d > lo && d <= hi) return i;
  }
  return -1;
}

const um = (x: number): number => Math.round(x);

/** Fundamental deviation, µm: es for e, f, g, h (negative or 0), EI for G, H (positive or 0). */
export function formulaDeviation(position: string, P: number): number {
  switch (position) {
    case 'e':
      return -um(50 + 11 * P);
    case 'f':
      return -um(30 + 11 * P);
    case 'g':
      return -um(15 + 11 * P);
    case 'G':
      return um(15 + 11 * P);
    default:
      return 0;
  }
}

/** Td, tolerance of the external major diameter, µm (grades 4, 6, 8). */
export function formulaTd(P: number, grade: number): number {
  return um((180 * P ** (2 / 3) - 3.15 / Math.sqrt(P)) * (FACTOR[grade] ?? NaN));
}

/** TD1, tolerance of the internal minor diameter, µm (grades 4 to 8). */
export function formulaTD1(P: number, grade: number): number {
  const six = P < 1 ? 433 * P - 190 * P ** 1.22 : 230 * P ** 0.7;
  return um(six * (FACTOR[grade] ?? NaN));
}

function meanDiameter(d: number): number {
  const i = rangeIndex(d);
  const lo = DIAMETER_RANGES[Math.max(0, i)] ?? 1;
  const hi = DIAMETER_RANGES[Math.max(0, i) + 1] ?? 1.4;
  return Math.sqrt(lo * hi);
}

/** Td2, tolerance of the external pitch diameter, µm (grades 3 to 9). */
export function formulaTd2(d: number, P: number, grade: number): number {
  return um(90 * P ** 0.4 * meanDiameter(d) ** 0.1 * (FACTOR[grade] ?? NaN));
}

/** TD2, tolerance of the internal pitch diameter, µm (grades 4 to 8). */
export function formulaTD2(d: number, P: number, grade: number): number {
  return um(1.32 * 90 * P ** 0.4 * meanDiameter(d) ** 0.1 * (FACTOR[grade] ?? NaN));
}
