/**
 * The repair plan: its shape is the `repair --json` contract (SI working units:
 * mm, N, N·m, MPa; keys may be added, never removed or renamed).
 */
import type {Flag} from '../types.js';

export const REPAIR_KINDS = ['reuse', 'longer-engagement', 'helical-insert', 'solid-insert', 'oversize', 'through-bolt'] as const;
export type RepairKind = (typeof REPAIR_KINDS)[number];

/** A step on our own ordinal scale of shop work (1 = least change to part and hardware). */
export interface Effort {
  grade: 1 | 2 | 3 | 4 | 5 | 6;
  /** Short name of the step: chase, deepen, coil, bush, through, resize. */
  name: string;
  /** What the step involves, in shop words. */
  text: string;
}

/** One thread or part that can fail in a repair, with its force. */
export interface StrengthPart {
  /** e.g. "bolt thread in the insert", "parent at the receiving thread". */
  name: string;
  /** Stripping force, N. */
  force: number;
}

export interface RepairOption {
  kind: RepairKind;
  /** Short label for the table, e.g. "helical insert 1.5D". */
  label: string;
  /** 1 = best; every option has a rank. */
  rank: number;
  feasible: boolean;
  /** Feasible and both margins at or above the required margin. */
  meetsMargin: boolean;
  /** Why it cannot be done, or why it falls short of the margin; null when it is fine. */
  reason: string | null;
  margin: {
    /** Weakest stripping force / largest load it sees (max preload + service load share); null if not computed. */
    stripping: number | null;
    /** Weakest stripping force / bolt break force; null if not computed. */
    boltBreaksFirst: number | null;
  };
  /** Drill diameter for the new hole, mm; null when no drilling. */
  drill: number | null;
  /** Thread the tap cuts (designation), or null when nothing is tapped. */
  tapThread: string | null;
  /** Depth the hole needs, drill point included, mm; null for re-use or a through hole. */
  holeDepth: number | null;
  /** Full-form tapped depth, mm. */
  tappedDepth: number | null;
  /** Depth to the full drill diameter, mm. */
  drilledDepth: number | null;
  /** Fully formed engaged length the option gives, mm. */
  engagement: number | null;
  /**
   * Full-thread engagement each method requires so the bolt breaks first (margin 1), mm:
   * FED-STD-H28/2B Formula 1 with J, and Alexander / VDI 2230 (from the mechanics core).
   * Set for the options that keep the thread; null otherwise.
   */
  requiredEngagement?: {fedStd: number; alexander: number} | null;
  /** Screw (bolt) after the repair, designation. */
  boltThread: string;
  /** How much longer the screw must be, mm (0: same screw length). */
  screwLengthChange: number | null;
  /** Tightening torque to use afterwards (same utilisation rule as check), N·m. */
  torque: number | null;
  /** Preload range at that torque, N. */
  preload: {min: number; max: number} | null;
  effort: Effort;
  /** For inserts: each thread that can strip, and which governs. */
  strength: {parts: StrengthPart[]; governs: string; boltBreakForce: number} | null;
  /** Insert details (helical or solid), mm. */
  insert: InsertDetails | null;
  /** Sub-order inside one effort grade: how much is changed (insert length, extra depth, new diameter), mm. */
  changeSize: number;
  /** Flags the mechanics core raised for this option. */
  flags: Flag[];
  notes: string[];
}

export interface InsertDetails {
  type: 'helical' | 'thin-wall' | 'heavy-duty';
  nominalLength: number;
  assembledLength?: {min: number; max: number};
  setDown: {min: number; max: number};
  /** Receiving (helical) or external (solid) thread cut in the parent, basic diameters, mm. */
  parentThread: {designation: string; major: number; pitchDiameter?: number; minor?: number; pitch: number};
  keys?: number;
  /** Provenance of table data (solid inserts). */
  dataSource?: string;
}

export interface RepairPlan {
  thread: string;
  requiredMargin: number;
  hole: {
    state: 'intact' | 'stripped';
    strippedDepth: number | null;
    through: boolean;
    depthAvailable: number | null;
    wall: number | null;
  };
  /** Margins of the joint as given, before any repair (null if it could not be computed). */
  asIs: {margin: {stripping: number; boltBreaksFirst: number}; flags: Flag[]} | null;
  /** Ranked: options[0] has rank 1. */
  options: RepairOption[];
  /** The ranking rule in words (README and Help screen show the same text). */
  rankingRule: string;
  /** Notes that apply to every option. */
  notes: string[];
  sources: string[];
  cautions: readonly string[];
}
