/**
 * What the planner needs from the rest of the core, passed in so the planner can
 * be tested on its own and the workbench can call it cheaply. index.ts wires the
 * real mechanics, threads and materials modules.
 */
import type {JointInput} from '../joint/input.js';
import type {CheckResult} from '../joint/result.js';
import type {ThreadSpec} from '../types.js';
import type {SolidInsertTable} from './solid-table.js';

/** A thread size of the ISO 261/262 or unified series. */
export interface SeriesThread {
  /** Designation the thread parser accepts, e.g. "M12x1.5", "5/16-18 UNC". */
  designation: string;
  /** Basic major diameter, mm. */
  nominal: number;
  /** Pitch, mm. */
  pitch: number;
}

export interface RepairDeps {
  /** The mechanics core: `checkJoint` of src/core/joint. May throw on input it rejects. */
  check: (input: JointInput) => CheckResult;
  /**
   * Check `input` (resolved with its own thread, so its materials and bearing
   * diameter stay those of that size) but with the thread geometry of
   * `designation`: used for the parent side of an insert, whose receiving or
   * external thread is larger than any bolt the grade tables cover. Absent:
   * `check` with the thread replaced.
   */
  checkWithThread?: (input: JointInput, designation: string) => CheckResult;
  /** Series sizes of the same family larger than the given thread (ISO 261/262 or unified); absent: no oversize candidates. */
  seriesAbove?: (spec: ThreadSpec) => SeriesThread[];
  /** Regular nut height m and width across flats s for nominal diameter d (mm); undefined when unknown. */
  nutDimensions?: (spec: ThreadSpec) => {m: number; s: number} | undefined;
  /** Nut property class matched to a bolt grade for diameter d (e.g. "8" for 8.8); undefined when unknown. */
  nutClassFor?: (boltGrade: string, spec: ThreadSpec) => string | undefined;
  /** The solid key-locked insert table (the shipped demo table unless the user has their own). */
  solidTable: SolidInsertTable;
}
