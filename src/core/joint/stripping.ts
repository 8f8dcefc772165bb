/**
 * Thread stripping and required length of engagement.
 * Shear areas: FED-STD-H28/2B (also Machinery's Handbook, "length of engagement"), at the
 * least-material limits of the tolerance classes: the external thread sheared on a cylinder at the
 * internal thread's max minor diameter Kn max, the internal thread on a cylinder at the external
 * thread's min major diameter Ds min. Units: mm, mm², N, MPa. The inch formulas are used with
 * n = 1/P in mm (FED-STD-H28/2B; metric use as in Machinery's Handbook).
 */

/** Least-material limits used for the shear areas, mm. */
export interface StrippingLimits {
  /** Kn max: max minor diameter of the internal thread. */
  knMax: number;
  /** Es min: min pitch diameter of the external thread. */
  esMin: number;
  /** Ds min: min major diameter of the external thread. */
  dsMin: number;
  /** En max: max pitch diameter of the internal thread. */
  enMax: number;
  pitch: number;
}

const TAN30 = 0.57735;

/**
 * External-thread shear area per mm of engagement, mm²/mm:
 * ASs / Le = pi Kn max [1/2 + 0.57735 n (Es min - Kn max)], n = 1/P. Source: FED-STD-H28/2B.
 */
export function externalShearAreaPerMm(l: StrippingLimits): number {
  return Math.PI * l.knMax * (0.5 + (TAN30 * (l.esMin - l.knMax)) / l.pitch);
}

/**
 * Internal-thread shear area per mm of engagement, mm²/mm:
 * ASn / Le = pi Ds min [1/2 + 0.57735 n (Ds min - En max)], n = 1/P. Source: FED-STD-H28/2B.
 */
export function internalShearAreaPerMm(l: StrippingLimits): number {
  return Math.PI * l.dsMin * (0.5 + (TAN30 * (l.dsMin - l.enMax)) / l.pitch);
}

/**
 * Formula 1 of FED-STD-H28/2B: Le = 2 At / (pi Kn max [1/2 + 0.57735 n (Es min - Kn max)]), mm,
 * then for dissimilar materials J = (ASs Se)/(ASn Sn) and Q = J Le when J > 1.
 * Se, Sn: tensile strengths of the external and internal thread materials, MPa.
 */
export function fedStdEngagement(l: StrippingLimits, stressArea: number, se: number, sn: number): {le: number; j: number; required: number} {
  const perMmS = externalShearAreaPerMm(l);
  const le = (2 * stressArea) / perMmS;
  const j = (perMmS * se) / (internalShearAreaPerMm(l) * sn);
  return {le, j, required: j > 1 ? j * le : le};
}

/**
 * Nut dilation factor C1 from s/d (width across flats / nominal diameter):
 * C1 = 3.8 (s/d) - (s/d)^2 - 2.61 for 1.4 <= s/d < 1.9, 1 for s/d >= 1.9 and for tapped holes.
 * Source: Alexander (1977), as used in VDI 2230 Part 1 (from memory). Below 1.4 the value at 1.4 is
 * held and `inRange` is false.
 */
export function dilationFactorC1(sOverD: number | undefined): {value: number; inRange: boolean} {
  if (sOverD === undefined || sOverD >= 1.9) return {value: 1, inRange: true};
  const x = Math.max(sOverD, 1.4);
  return {value: 3.8 * x - x * x - 2.61, inRange: sOverD >= 1.4};
}

/**
 * Bolt-thread bending factor C2 (bolt thread strips, RS > 1):
 * 0.897 for RS <= 1; 5.594 - 13.682 RS + 14.107 RS^2 - 6.057 RS^3 + 0.9353 RS^4 for 1 < RS <= 2.2;
 * held at its value at 2.2 above (outside the range: `inRange` false).
 * Source: Alexander (1977) / VDI 2230 Part 1 (from memory).
 */
export function boltThreadFactorC2(rs: number): {value: number; inRange: boolean} {
  if (rs <= 1) return {value: 0.897, inRange: true};
  const x = Math.min(rs, 2.2);
  const v = 5.594 - 13.682 * x + 14.107 * x * x - 6.057 * x ** 3 + 0.9353 * x ** 4;
  return {value: v, inRange: rs <= 2.2};
}

/**
 * Internal-thread bending factor C3 (nut or tapped thread strips, RS < 1):
 * 0.728 + 1.769 RS - 2.896 RS^2 + 1.296 RS^3 for 0.4 < RS < 1; 0.897 for RS >= 1;
 * held at its value at 0.4 for RS <= 0.4 (outside the published range: `inRange` false).
 * Source: Alexander (1977) / VDI 2230 Part 1 (from memory).
 */
export function internalThreadFactorC3(rs: number): {value: number; inRange: boolean} {
  if (rs >= 1) return {value: 0.897, inRange: true};
  const x = Math.max(rs, 0.4);
  const v = 0.728 + 1.769 * x - 2.896 * x * x + 1.296 * x ** 3;
  return {value: v, inRange: rs > 0.4};
}

export interface AlexanderResult {
  /** Strength ratio RS = tauBM ASGM / (tauBS ASGS). */
  rs: number;
  c1: number;
  c2: number;
  c3: number;
  /** Stripping force per mm of effective engagement, N/mm. */
  externalPerMm: number;
  internalPerMm: number;
  /** Required effective engagement, each mode and the larger, mm. */
  requiredExternal: number;
  requiredInternal: number;
  required: number;
  /** Notes when a factor was held at a range limit. */
  outOfRange: string[];
}

/**
 * Alexander (1977) as used in VDI 2230 Part 1 (from memory): FmGS = tauBS ASGS C1 C2 (bolt thread),
 * FmGM = tauBM ASGM C1 C3 (internal thread), FmS = Rm As; meff,min solves FmGS = FmS and FmGM = FmS,
 * the larger governs. ASGS and ASGM per mm are the FED-STD areas above (same geometry).
 * tauBS, tauBM shear strengths, MPa; breakForce = Rm,S As, N; sOverD undefined for a tapped hole.
 */
export function alexander(l: StrippingLimits, tauBS: number, tauBM: number, breakForce: number, sOverD: number | undefined): AlexanderResult {
  const asgs = externalShearAreaPerMm(l);
  const asgm = internalShearAreaPerMm(l);
  const rs = (tauBM * asgm) / (tauBS * asgs);
  const c1 = dilationFactorC1(sOverD);
  const c2 = boltThreadFactorC2(rs);
  const c3 = internalThreadFactorC3(rs);
  const externalPerMm = tauBS * asgs * c1.value * c2.value;
  const internalPerMm = tauBM * asgm * c1.value * c3.value;
  const requiredExternal = breakForce / externalPerMm;
  const requiredInternal = breakForce / internalPerMm;
  const outOfRange: string[] = [];
  if (!c1.inRange) outOfRange.push(`nut s/d ${(sOverD ?? 0).toFixed(2)} is below 1.4, where the nut-dilation factor is published; held at 0.75`);
  if (!c2.inRange) outOfRange.push(`strength ratio RS ${rs.toFixed(2)} is above 2.2, where the bolt-thread factor is published; held at ${c2.value.toFixed(3)}`);
  if (!c3.inRange) outOfRange.push(`strength ratio RS ${rs.toFixed(2)} is at or below 0.4, where the internal-thread factor is published; held at ${c3.value.toFixed(3)}`);
  return {
    rs,
    c1: c1.value,
    c2: c2.value,
    c3: c3.value,
    externalPerMm,
    internalPerMm,
    requiredExternal,
    requiredInternal,
    required: Math.max(requiredExternal, requiredInternal),
    outOfRange,
  };
}
