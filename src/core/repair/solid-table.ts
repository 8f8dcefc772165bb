/**
 * Solid key-locked inserts: the user-editable table of sizes the planner offers.
 * A solid bushing with the nominal internal thread, a larger external thread cut
 * into the parent, and axial keys driven into the parent thread to lock it.
 * The insert makers publish the real sizes; the shipped table
 * (presets/solid-inserts-demo.json) is invented and marked
 * "demo values: use the insert maker's data". The preset store lets users keep
 * their own table; it imports SolidInsertTableSchema from here.
 */
import * as z from 'zod';
import {safeText} from '../text-safety.js';

export const SOLID_INSERT_TYPES = ['thin-wall', 'heavy-duty'] as const;
export type SolidInsertType = (typeof SOLID_INSERT_TYPES)[number];

/** Words every demo table carries, and the UI and reports repeat. */
export const DEMO_TABLE_WARNING = "demo values: use the insert maker's data";

export const SolidInsertEntrySchema = z.object({
  /** Internal (nominal) thread of the insert, as typed: "M10x1.5", "1/4-20 UNC". */
  internal: safeText(z.string().trim().min(1).max(60)),
  type: z.enum(SOLID_INSERT_TYPES),
  /** External thread of the insert, cut into the parent: "M14x1.5". */
  external: safeText(z.string().trim().min(1).max(60)),
  /** Insert length, mm. */
  length: z.number().min(1).max(500),
  /** Tap drill for the external thread, mm; absent: the planner's tap-drill rule. */
  drill: z.number().min(0.5).max(500).optional(),
  /** Number of locking keys. */
  keys: z.number().int().min(0).max(12).default(2),
  /** Insert body tensile strength, MPa. */
  bodyRm: z.number().min(100).max(2500),
  /** Insert body shear strength, MPa. */
  bodyShear: z.number().min(50).max(1500),
  /** Installed depth of the insert's top face below the surface, mm. */
  setDown: z.number().min(0).max(20).default(0.25),
});

export const SolidInsertTableSchema = z.object({
  /** Fixed tag so a table file cannot be mistaken for a preset. */
  kind: z.literal('solid-key-locked-inserts'),
  version: z.literal(1),
  name: safeText(z.string().trim().min(1).max(80)),
  /** Where the numbers come from: 'demo' (invented), 'maker' (an insert maker's data), 'user'. */
  provenance: z.object({
    kind: z.enum(['demo', 'maker', 'user']),
    source: safeText(z.string().trim().min(1).max(300)),
  }),
  entries: z.array(SolidInsertEntrySchema).min(1).max(2000),
}).superRefine((t, ctx) => {
  if (t.provenance.kind === 'demo' && !t.provenance.source.includes(DEMO_TABLE_WARNING)) {
    ctx.addIssue({code: 'custom', path: ['provenance', 'source'], message: `a demo table must say "${DEMO_TABLE_WARNING}"`});
  }
});

export type SolidInsertEntry = z.output<typeof SolidInsertEntrySchema>;
export type SolidInsertTable = z.output<typeof SolidInsertTableSchema>;
export type SolidInsertTableDraft = z.input<typeof SolidInsertTableSchema>;

/** Validate a table read from a file or the store; the message names the first bad field. */
export function parseSolidInsertTable(data: unknown): {ok: true; value: SolidInsertTable} | {ok: false; error: string} {
  const r = SolidInsertTableSchema.safeParse(data);
  if (r.success) return {ok: true, value: r.data};
  const issue = r.error.issues[0];
  const where = issue ? issue.path.join('.') : '';
  return {ok: false, error: `solid insert table: ${where ? `${where}: ` : ''}${issue?.message ?? 'invalid'}`};
}
