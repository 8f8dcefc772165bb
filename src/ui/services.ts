/**
 * What the workbench needs from the rest of tapwright, as one injected object.
 * launch.ts wires the real core, store and report modules; tests pass fixtures.
 * The workbench computes nothing itself: every number comes through here.
 */
import type {CheckResult} from '../core/joint/result.js';
import type {JointInput, UserParentMaterial} from '../core/joint/input.js';
import type {RepairInput} from '../core/repair/input.js';
import type {RepairPlan} from '../core/repair/types.js';
import type {Provenance} from '../core/types.js';
import type {ScrewInput} from '../core/screw/input.js';
import type {ScrewResult} from '../core/screw/result.js';
import type {FormValues, PickSource} from './state/fields.js';
import type {Notes} from '../store/schema.js';

/** One entry of a picker (grade, material, nut class) with where its numbers come from. */
export interface PickItem {
  id: string;
  name: string;
  /** The key numbers in working units, already formatted, e.g. "Rm 800 MPa, Rp0.2 640 MPa". */
  detail: string;
  provenance: Provenance;
  /** The field value this entry sets, when it is not the id (a friction range from a table). */
  value?: unknown;
}

export interface PresetEntry {
  name: string;
  /** Shipped demo presets are read-only: "save as" copies them. */
  readOnly: boolean;
  savedAt?: string;
  /** Thread designation of the joint, for the list. */
  thread?: string;
  /** Asset, location and work order, for search. */
  notes?: string;
  kind?: 'joint' | 'screw';
}

export interface LoadedPreset {
  name: string;
  readOnly: boolean;
  kind?: 'joint' | 'screw';
  values: FormValues;
  notes?: string;
}

export interface Draft {
  savedAt: string;
  presetName: string;
  values: FormValues;
  mode?: 'joint' | 'screw';
}

export interface ReportMeta {
  presetName: string;
  date: Date;
  units: 'si' | 'us';
  /** The work-order notes as they stand in the workbench (edited, maybe not saved yet). */
  notes?: Notes;
  /** The ranked repairs and the one chosen on the Repairs screen (its rank now), when the report should carry them; chosenNote says when the choice no longer serves. */
  repairs?: {plan: RepairPlan; chosen?: number; chosenNote?: string};
}

export interface PresetPort {
  list(): PresetEntry[];
  load(name: string): LoadedPreset;
  /** Save under a name; throws when it exists and overwrite is false, or is read-only. */
  save(name: string, values: FormValues, options: {overwrite: boolean; kind?: 'joint' | 'screw'}): void;
  rename(from: string, to: string): void;
  duplicate(from: string, to: string): void;
  remove(name: string): void;
  /** Import presets from a JSON file: the names imported, and each one skipped with the reason. */
  importFile(path: string): {imported: string[]; skipped: string[]};
  /** Export one preset (or all when name is undefined) to a JSON file. */
  exportFile(path: string, name: string | undefined, overwrite: boolean): void;
}

export interface DraftPort {
  load(): Draft | undefined;
  save(draft: Draft): void;
  clear(): void;
}

export interface WorkbenchServices {
  /** The joint check; throws on input it cannot compute (unknown thread, ...). */
  check(input: JointInput): CheckResult;
  /** Designations for the type-ahead, best match first. */
  designations(query: string, limit: number): string[];
  /** Picker entries, their numbers formatted in the display units. */
  picks(source: PickSource, units: 'si' | 'us'): PickItem[];
  /** The power-screw check; throws on input it cannot compute. Undefined: no power-screw mode in this build. */
  checkScrew?: (input: ScrewInput) => ScrewResult;
  /** The ranked repair list; undefined while the repair planner is not in this build. */
  repairs?: (joint: JointInput, hole: RepairInput, units?: 'si' | 'us') => RepairPlan;
  presets: PresetPort;
  draft: DraftPort;
  /** The work-order report as text or Markdown; undefined while the report module is not in this build. */
  report?: (format: 'text' | 'markdown', result: CheckResult, input: JointInput, meta: ReportMeta) => string;
  /** The power-screw work-order report as text or Markdown (flags in the display units); undefined: not in this build. */
  screwReport?: (format: 'text' | 'markdown', result: ScrewResult, input: ScrewInput, meta: ReportMeta) => string;
  /**
   * Write a file; throws when it cannot. The error's `code` says why: 'EEXIST' (it
   * exists and overwrite is false), 'ENOENT' (its folder does not exist), 'EACCES'.
   */
  writeFile(path: string, text: string, overwrite: boolean): void;
  /** A typed path as a full path: `~` and `~/` expanded, relative to the current folder. Absent: as typed. */
  resolvePath?: (path: string) => string;
  /** The current folder (the report prompt's default folder when no report was written yet). */
  cwd?: string;
  /** The user's settings the joint depends on (the default scatter); absent: none. */
  settings?: () => {scatterDefault?: number};
  /** The user's own parent materials, attached to a joint whose parent names one. */
  userMaterials?: () => readonly UserParentMaterial[];
  /** Where the preset name comes from at start: the shipped default preset. */
  defaultPreset: string;
  now(): Date;
}

export type {RepairPlan};
