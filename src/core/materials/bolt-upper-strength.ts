/**
 * Upper tensile strength of a bolt, for the bolt-breaks-first check. VDI 2230 Part 1 (section 5.5.5,
 * minimum length of engagement) sizes the engagement so that a bolt of the MAXIMUM tensile strength
 * Rm,max still breaks before a thread strips (from memory: the clause was not read). ISO 898-1 does not
 * tabulate Rm,max; it bounds the hardness (ISO 898-1:2013 Table 3, HV min and HV max). Tensile
 * strength of steel is close to proportional to Vickers hardness (ISO 18265 conversion tables, about
 * Rm = 3.2 HV; from memory), so Rm,upper = Rm,min x HV max / HV min. Classes without a hardness row
 * here (stainless, SAE, custom strengths) take 1.2 x Rm,min (from memory, no source).
 * Units: MPa.
 */

/** ISO 898-1:2013 Table 3 Vickers hardness HV min / HV max per property class (d <= 16 mm rows for 8.8 and 9.8). */
export const ISO898_HARDNESS: Readonly<Record<string, {hvMin: number; hvMax: number; hvMinOver16?: number; hvMaxOver16?: number}>> = {
  '4.6': {hvMin: 120, hvMax: 220},
  '4.8': {hvMin: 130, hvMax: 220},
  '5.6': {hvMin: 155, hvMax: 220},
  '5.8': {hvMin: 160, hvMax: 220},
  '6.8': {hvMin: 190, hvMax: 250},
  '8.8': {hvMin: 250, hvMax: 320, hvMinOver16: 255, hvMaxOver16: 335},
  '9.8': {hvMin: 290, hvMax: 360},
  '10.9': {hvMin: 320, hvMax: 380},
  '12.9': {hvMin: 385, hvMax: 435},
};

/** Ratio Rm,upper / Rm,min for bolts without a hardness row (from memory, no source). */
export const UPPER_STRENGTH_FALLBACK_RATIO = 1.2;

export interface UpperStrength {
  /** Upper tensile strength, MPa. */
  rm: number;
  /** How it was found, in words, with its status. */
  source: string;
}

/**
 * Rm,upper of a bolt, MPa: Rm,min x HV max / HV min for the ISO 898-1 classes (Table 3 hardness;
 * proportionality of Rm and HV per ISO 18265, from memory), else 1.2 x Rm,min (from memory).
 * `nominal` (mm) picks the d > 16 mm hardness row of class 8.8.
 */
export function upperTensileStrength(boltId: string, rmMin: number, nominal: number): UpperStrength {
  const h = ISO898_HARDNESS[boltId];
  if (h) {
    const over16 = nominal > 16 && h.hvMinOver16 !== undefined && h.hvMaxOver16 !== undefined;
    const hvMin = over16 ? (h.hvMinOver16 as number) : h.hvMin;
    const hvMax = over16 ? (h.hvMaxOver16 as number) : h.hvMax;
    return {
      rm: (rmMin * hvMax) / hvMin,
      source: `Rm,max estimated as Rm,min x HV max/HV min = ${rmMin} x ${hvMax}/${hvMin} (ISO 898-1:2013 Table 3 hardness; Rm proportional to HV per ISO 18265, from memory), as VDI 2230 Part 1 uses Rm,max for the minimum engagement (from memory)`,
    };
  }
  return {
    rm: rmMin * UPPER_STRENGTH_FALLBACK_RATIO,
    source: `Rm,max taken as ${UPPER_STRENGTH_FALLBACK_RATIO} x Rm,min (no hardness limits on file for this bolt; from memory, no source), as VDI 2230 Part 1 uses Rm,max for the minimum engagement (from memory)`,
  };
}
