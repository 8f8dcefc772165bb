import type {UserParentMaterial} from '../core/joint/input.js';
/** The preset store's public interface (implemented in presets.ts). */
import type {Preset, SavablePreset} from './schema.js';
import type {ImportOptions, ImportReport} from './transfer.js';
import type {SolidInsertTable, SolidInsertTableDraft} from './inserts.js';

export interface PresetSummary {
  name: string;
  kind: Preset['kind'];
  /** Thread designation of the joint or the power screw. */
  thread: string;
  savedAt: string;
  revision: number;
  demo: boolean;
  /** Shipped presets are read-only; "save as" copies them. */
  readOnly: boolean;
  source: 'saved' | 'shipped';
  asset?: string;
  location?: string;
  workOrder?: string;
}

export interface QuarantinedItem {
  name?: string;
  reason: string;
  /** When it was first quarantined, ISO time. */
  at: string;
  /** The item exactly as it was found. */
  raw: unknown;
}

export interface SaveOptions {
  /** Replace a saved preset of the same name (otherwise that is an error). */
  overwrite?: boolean;
  /** The revision the caller loaded: the save fails if another session saved since. */
  expectedRevision?: number;
}

export interface PresetStore {
  /** The folder and file in use. */
  readonly dir: string;
  readonly file: string;
  list(): PresetSummary[];
  get(name: string): Preset | undefined;
  save(p: SavablePreset, opts?: SaveOptions): Preset;
  rename(from: string, to: string): void;
  duplicate(from: string, to: string): Preset;
  remove(name: string): void;
  importFile(file: string, opts?: ImportOptions): ImportReport;
  exportTo(file: string, names?: string[], opts?: {force?: boolean}): void;
  /** The export document as JSON text (for writing to stdout). */
  exportJson(names?: string[]): string;
  /** Presets, and solid insert tables, that could not be read; kept in the file. */
  quarantined(): QuarantinedItem[];
  /** The user's own solid key-locked insert tables (for the repair planner). */
  insertTables(): SolidInsertTable[];
  saveInsertTable(t: SolidInsertTableDraft, opts?: {overwrite?: boolean}): SolidInsertTable;
  removeInsertTable(name: string): void;
  /** The user's own parent materials (for tapped holes), by id. */
  userMaterials(): UserParentMaterial[];
  saveUserMaterial(m: unknown, opts?: {overwrite?: boolean}): UserParentMaterial;
  /** Several materials in one change: all are stored, or none (the first problem is thrown). */
  saveUserMaterials(list: unknown[], opts?: {overwrite?: boolean}): UserParentMaterial[];
  removeUserMaterial(id: string): void;
  /** One-line messages for the user about what happened to the files. */
  warnings(): string[];
}

export interface StoreOptions {
  now?: () => Date;
  lockTimeoutMs?: number;
  staleLockMs?: number;
}

