/**
 * Shared types of the pure core. Every length is in mm, every force in N,
 * every stress in MPa, every torque in N·m unless a name says otherwise.
 * The CLI, the workbench and the tests all go through these shapes.
 */

/** Thread families the parser knows. */
export type ThreadFamily = 'metric' | 'unified' | 'trapezoidal' | 'acme' | 'square';

/** Where a number came from: a standard and table, a book, or a plain admission. */
export interface Provenance {
  /** Short citation, e.g. "ISO 898-1:2013 Table 3" or "typical value, from memory: verify against the material certificate". */
  source: string;
  /** How much to trust it: 'standard' (read from a standard's table), 'book', 'formula' (computed by a published formula), 'memory', 'demo', 'user'. */
  kind: 'standard' | 'book' | 'formula' | 'memory' | 'demo' | 'user';
}

/** A parsed thread designation. */
export interface ThreadSpec {
  family: ThreadFamily;
  /** Canonical text, e.g. "M10x1.5-6H/6g", "1/4-20 UNC-2A/2B", "Tr40x14(P7)". */
  designation: string;
  /** Size label as typed in the trade: "M10", "1/4", "#10", "Tr24". */
  sizeLabel: string;
  /** Basic major diameter d = D, mm. */
  nominal: number;
  /** Pitch P, mm (for unified threads 25.4 / tpi). */
  pitch: number;
  /** Threads per inch, unified and Acme only. */
  tpi?: number;
  /** Series name: 'coarse' | 'fine' for metric; 'UNC' | 'UNF' | 'UNEF' | 'UN' for unified; undefined otherwise. */
  series?: string;
  /** False when the pitch is not in the published series for that size (a special thread). */
  isStandardPitch: boolean;
  /** Number of starts (1 for fastener threads). */
  starts: number;
  /** Lead = starts x pitch, mm. */
  lead: number;
  /** External-thread tolerance class, e.g. "6g", "2A", "7e", "2G". */
  toleranceExternal: string;
  /** Internal-thread tolerance class, e.g. "6H", "2B", "7H", "2G". */
  toleranceInternal: string;
  /** True when the tolerance class was not typed and the default was applied. */
  toleranceDefaulted: boolean;
}

/** Limits of size, mm. */
export interface ExternalLimits {
  majorMax: number;
  majorMin: number;
  pitchMax: number;
  pitchMin: number;
  /** Minor diameter of the external thread (d3), max and min where the standard gives them. */
  minorMax?: number;
  minorMin?: number;
}

export interface InternalLimits {
  minorMin: number;
  minorMax: number;
  pitchMin: number;
  pitchMax: number;
  majorMin: number;
}

/** Where one side's limits of size came from: a table of the standard, or the formulas as a labelled fallback. */
export type LimitsSideProvenance = Provenance & {method: 'table' | 'formula'};

/** Full geometry of a fastener thread pair (external + internal) for its tolerance classes. */
export interface ThreadGeometry {
  spec: ThreadSpec;
  /** d, mm. */
  nominal: number;
  /** P, mm. */
  pitch: number;
  /** Fundamental triangle height H = 0.866025 P, mm. */
  fundamentalHeight: number;
  /** Basic pitch diameter d2 = D2, mm. */
  pitchDiameter: number;
  /** Minor diameter of the external thread d3 (ISO: d - 1.226869P; unified: d - 1.299038P), mm. */
  minorDiameterExternal: number;
  /** Basic minor diameter of the internal thread D1 = d - 1.082532P, mm. */
  minorDiameterInternal: number;
  /** Tensile stress area As (ISO 898-1 / ASME B1.1), mm². */
  stressArea: number;
  /** Area at d3, mm². */
  minorArea: number;
  /** Limits of size; each side also says where its own values came from (`method`, `source`, `kind`). */
  limits: {external: ExternalLimits & LimitsSideProvenance; internal: InternalLimits & LimitsSideProvenance};
  /** Where the limits came from: a shipped table of the standard, or the generating formulas as a fallback. */
  limitsProvenance: Provenance & {method: 'table' | 'formula'};
  /** Plain-language notes (special thread, formula fallback, ...). */
  notes: string[];
}

/** A flag raised by a check: plain shop language, with the number behind it. */
export interface Flag {
  code: string;
  level: 'info' | 'watch' | 'fail';
  message: string;
  /**
   * The same finding in one short line (about 65 characters) keeping its key numbers,
   * for a one-line display such as the workbench at 80 columns; `message` has it all.
   */
  summary?: string;
}

/** A value with a min..max range (friction, etc.). min <= max. */
export interface Range {
  min: number;
  max: number;
}

/** Result of a parse that may fail with a message for the user. */
export type Parsed<T> =
  | {ok: true; value: T}
  | {ok: false; error: string; suggestions?: string[]};
