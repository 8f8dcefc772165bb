/**
 * Preset and store-file shapes (zod is the single source of truth).
 * Store file layout, schemaVersion 2:
 *   {"schemaVersion": 2, "presets": [Preset...], "quarantine": [QuarantineEntry...],
 *    "materials": [...], "inserts": [...]}
 * Version 1 (the earlier flat layout) is described in migrate.ts.
 */
import * as z from 'zod';
import {safeText} from '../core/text-safety.js';
import {JointInputSchema} from '../core/joint/input.js';
import {RepairInputSchema} from '../core/repair/input.js';
import {REPAIR_KINDS} from '../core/repair/types.js';
import {ScrewInputSchema} from '../core/screw/input.js';

export const CURRENT_SCHEMA_VERSION = 2;

/**
 * The highest revision a save, rename or import gives a preset (2^31 - 1: a save a
 * second for 68 years). An import file with a higher revision is refused, and a
 * preset already at it cannot be changed in place (save it under another name), so
 * a revision never reaches the limit of exact whole numbers in JSON (2^53).
 * A stored preset with a higher revision (from an older tapwright) is still read.
 */
export const MAX_REVISION = 2 ** 31 - 1;

/** Accepted preset names, stated in messages. */
export const NAME_RULE = '1 to 64 characters: letters, digits, space and . _ - + ( ) #, starting with a letter or digit';
const NAME_RE = /^[\p{L}\p{N}][\p{L}\p{N} ._+()#-]{0,63}$/u;

export const PresetNameSchema = z
  .string()
  .trim()
  .refine(s => NAME_RE.test(s), {message: `preset name must be ${NAME_RULE}`});

export const NotesSchema = z.object({
  /** Asset tag of the machine, e.g. "P-101 (demo)". */
  asset: safeText(z.string().max(80)).optional(),
  location: safeText(z.string().max(120)).optional(),
  workOrder: safeText(z.string().max(60)).optional(),
  /** Free text (one line; control characters are refused in every stored text). */
  text: safeText(z.string().max(4000)).optional(),
});

const PresetFields = {
  name: PresetNameSchema,
  kind: z.enum(['joint', 'screw']),
  joint: JointInputSchema.optional(),
  repair: RepairInputSchema.optional(),
  screw: ScrewInputSchema.optional(),
  notes: NotesSchema.default({}),
  /** When it was last saved, ISO 8601 UTC. */
  savedAt: z.iso.datetime({offset: true}),
  /** True for invented demo scenarios (the shipped presets and copies of them). */
  demo: z.boolean().optional(),
  /** The repair chosen for the work order (workbench Repairs screen), by identity: kind and label, e.g. "helical insert 1.5D". */
  chosenRepair: z.object({kind: z.enum(REPAIR_KINDS), label: z.string().min(1).max(80)}).optional(),
  /** Increases by one on every save; used to spot a save made by another session. */
  revision: z.number().int().min(1).max(Number.MAX_SAFE_INTEGER),
};

function kindHasItsInputs(p: {kind: 'joint' | 'screw'; joint?: unknown; screw?: unknown}, ctx: z.RefinementCtx): void {
  if (p.kind === 'joint' && p.joint === undefined) ctx.addIssue({code: 'custom', path: ['joint'], message: 'a joint preset needs its joint inputs'});
  if (p.kind === 'screw' && p.screw === undefined) ctx.addIssue({code: 'custom', path: ['screw'], message: 'a screw preset needs its power-screw inputs'});
}

export const PresetSchema = z.object(PresetFields).superRefine(kindHasItsInputs);

/** What callers hand to save(): savedAt and revision are set by the store. */
export const SavablePresetSchema = z
  .object({...PresetFields, savedAt: PresetFields.savedAt.optional(), revision: PresetFields.revision.optional()})
  .superRefine(kindHasItsInputs);

export type Preset = z.output<typeof PresetSchema>;
export type PresetInput = z.input<typeof PresetSchema>;
export type SavablePreset = z.input<typeof SavablePresetSchema>;
export type Notes = z.output<typeof NotesSchema>;

/** An item that could not be read as a preset; kept verbatim, shown to the user. */
export const QuarantineEntrySchema = z.object({
  name: z.string().optional(),
  reason: z.string(),
  at: z.string(),
  raw: z.unknown(),
});
export type QuarantineEntry = z.output<typeof QuarantineEntrySchema>;

/**
 * The store document as kept on disk: items are validated one by one when read,
 * so one bad preset never blocks or wipes the rest.
 */
export const StoreDocSchema = z.object({
  schemaVersion: z.literal(CURRENT_SCHEMA_VERSION),
  presets: z.array(z.unknown()).default([]),
  quarantine: z.array(z.unknown()).default([]),
  /** User-defined materials and solid-insert tables; kept verbatim for the material library. */
  materials: z.array(z.unknown()).default([]),
  inserts: z.array(z.unknown()).default([]),
});
export type StoreDoc = z.output<typeof StoreDocSchema>;

export function emptyDoc(): StoreDoc {
  return {schemaVersion: CURRENT_SCHEMA_VERSION, presets: [], quarantine: [], materials: [], inserts: []};
}

/** "joint.engagement: Too small: expected number to be >=0.5; name: ..." */
export function describeZodError(error: z.ZodError, prefix = ''): string {
  return error.issues
    .slice(0, 4)
    .map(i => {
      const where = [prefix, ...i.path.map(p => (typeof p === 'number' ? `[${p}]` : String(p)))].filter(Boolean).join('.').replace(/\.\[/g, '[');
      return where ? `${where}: ${i.message}` : i.message;
    })
    .join('; ')
    .concat(error.issues.length > 4 ? `; and ${error.issues.length - 4} more` : '');
}
