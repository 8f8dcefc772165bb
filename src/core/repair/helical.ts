/**
 * Helical wire thread inserts (generic, stainless wire): the oversize receiving
 * thread ("STI", screw thread insert thread) the insert is wound into, its tap
 * drill, the nominal lengths, the assembled length, the set-down and the
 * minimum tapped and drilled depths. Working units: mm.
 *
 * Standards: ASME B18.29.1 (inch series) and ASME B18.29.2M (metric series)
 * define the inserts and the receiving thread; DIN 8140-2 has the metric
 * receiving thread too. What is used here and how sure it is:
 *  - receiving-thread basic diameters: the nominal basic profile moved outward
 *    by 0.649519P per side (from memory, not read in the standards; it
 *    reproduces recalled STI tap sizes, e.g. 11.949 mm for M10x1.5 and
 *    0.3150 in for 1/4-20);
 *  - nominal lengths 1D to 3D, assembled length, set-down, minimum tapped and
 *    drilled depths: ASME B18.29.2M (read in a secondary copy quoting it);
 *  - tap drill: our rule, see stiTapDrill (common practice, no source).
 */

/** Nominal insert lengths as multiples of the nominal diameter, ASME B18.29.1 / B18.29.2M. */
export const HELICAL_LENGTH_FACTORS = [1, 1.5, 2, 2.5, 3] as const;

/** Where the numbers of this module come from, for the report's source list. */
export const HELICAL_SOURCES = {
  receiving:
    'receiving (STI) thread: nominal basic profile moved outward by 0.649519P per side, D_STI = D + 1.299038P (from memory; ASME B18.29.1 inch, ASME B18.29.2M metric define it)',
  lengths:
    'insert nominal length 1D..3D, assembled length L - 0.5P..0.75P, set-down 0.75P..1.5P, min tapped depth L + 1P, min drilled depth by tap type: ASME B18.29.2M',
  drill:
    'STI tap drill: basic receiving-thread minor diameter rounded up to the next 0.1 mm (next 1/64 in for inch threads): common practice, no source; follow the insert maker for the parent material',
  wire:
    'insert wire: cold-drawn austenitic stainless, Rm 1400 MPa, shear 800 MPa (typical value, from memory)',
} as const;

/** Insert wire strength used for the insert's own thread (typical value, from memory). */
export const INSERT_WIRE = {rm: 1400, rp: 1100, shear: 800} as const;

export interface ThreadBasics {
  family: string;
  /** Basic major diameter D, mm. */
  nominal: number;
  /** Pitch P, mm. */
  pitch: number;
  /** Threads per inch (unified). */
  tpi?: number;
  sizeLabel: string;
  series?: string;
}

export interface ReceivingThread {
  /** Basic major diameter of the receiving thread, mm. */
  major: number;
  /** Basic pitch diameter, mm. */
  pitchDiameter: number;
  /** Basic minor diameter, mm. */
  minor: number;
  pitch: number;
  /** Tap designation as marked on the tap, e.g. "M10x1.5 STI". */
  tap: string;
  /** Tap drill, mm (see stiTapDrill). */
  drill: number;
}

const INCH = 25.4;

function trimNumber(x: number, decimals: number): string {
  return Number(x.toFixed(decimals)).toString();
}

/** Designation of the nominal thread without tolerance: "M10x1.5", "1/4-20 UNC". */
export function plainDesignation(t: ThreadBasics): string {
  if (t.family === 'unified' && t.tpi !== undefined) return `${t.sizeLabel}-${trimNumber(t.tpi, 3)} ${t.series ?? 'UN'}`;
  return `M${trimNumber(t.nominal, 3)}x${trimNumber(t.pitch, 3)}`;
}

/**
 * Receiving-thread basic diameters, mm: D_STI = D + 1.299038P, D2_STI = D + 0.649519P,
 * D1_STI = D + 0.216506P (the basic profile moved out by 0.649519P per side; from
 * memory, see the module comment).
 */
export function receivingThread(t: ThreadBasics): ReceivingThread {
  const p = t.pitch;
  const major = t.nominal + 1.299038 * p;
  const pitchDiameter = t.nominal + 0.649519 * p;
  const minor = t.nominal + 0.216506 * p;
  return {major, pitchDiameter, minor, pitch: p, tap: `${plainDesignation(t)} STI`, drill: stiTapDrill(minor, t.family === 'unified')};
}

/**
 * Tap drill for the receiving thread, mm: the basic minor diameter rounded up to
 * the next 0.1 mm, or to the next 1/64 in for inch threads (common practice, no
 * source; published recommendations vary with the parent material).
 */
export function stiTapDrill(minor: number, inch: boolean): number {
  if (inch) {
    const steps = Math.ceil((minor / INCH) * 64 - 1e-6);
    return (steps / 64) * INCH;
  }
  return Math.ceil(minor * 10 - 1e-6) / 10;
}

export type TapKind = 'plug' | 'bottoming';

export interface InsertDepths {
  /** Nominal length L = k·D, mm. */
  nominalLength: number;
  /** Assembled length in a basic hole, L - 0.75P .. L - 0.5P, mm. */
  assembled: {min: number; max: number};
  /** Installed set-down below the surface, 0.75P .. 1.5P, mm. */
  setDown: {min: number; max: number};
  /** Minimum tapped (full-form) depth T = L + 1P, mm. */
  tappedDepth: number;
  /** Minimum drilled depth to the full drill diameter, mm. */
  drilledDepth: number;
  /** Drilled depth plus the 118° drill point, mm (the depth the hole needs). */
  holeDepth: number;
  tap: TapKind;
}

/** Length of the cone of a 118° drill point: (D/2)/tan 59° = 0.300 D (geometry of the point). */
export function drillPointLength(drill: number): number {
  return drill / 2 / Math.tan((59 * Math.PI) / 180);
}

/**
 * Insert lengths and hole depths for nominal length factor k, ASME B18.29.2M:
 * T = L + 1P; drilled depth, plug tap: L + 0.5D + 4P + 1P + 1P for D <= 8 mm,
 * L + 4P + 1P + 1P above; bottoming tap: L + 2P + 1P + 1P (tap chamfer, end
 * clearance, countersink and set-down allowance). The hole depth adds the
 * 118° drill point.
 */
export function insertDepths(t: ThreadBasics, factor: number, drill: number, tap: TapKind = 'plug'): InsertDepths {
  const p = t.pitch;
  const d = t.nominal;
  const L = factor * d;
  const drilledDepth =
    tap === 'bottoming' ? L + 2 * p + p + p : d <= 8 + 1e-9 ? L + 0.5 * d + 4 * p + p + p : L + 4 * p + p + p;
  return {
    nominalLength: L,
    assembled: {min: L - 0.75 * p, max: L - 0.5 * p},
    setDown: {min: 0.75 * p, max: 1.5 * p},
    tappedDepth: L + p,
    drilledDepth,
    holeDepth: drilledDepth + drillPointLength(drill),
    tap,
  };
}
