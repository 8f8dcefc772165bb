/**
 * The settings' zod schema, apart from the conf-backed store, so a command can
 * read one setting without loading conf (readSettingsQuick).
 */
import fs from 'node:fs';
import path from 'node:path';
import {z} from 'zod';
import {FILES} from './paths.js';

export const SettingsSchema = z.object({
  /** Display units; JSON output is always SI. */
  units: z.enum(['si', 'us']).default('si'),
  /** ASCII borders and symbols in the workbench. */
  ascii: z.boolean().default(false),
  /** The preset the workbench had open last. */
  lastPreset: z.string().min(1).max(64).optional(),
  /** Default tightening-method scatter factor alphaA (1 = friction range only). */
  scatterDefault: z.number().min(1).max(4).default(1),
});
export type Settings = z.output<typeof SettingsSchema>;

export const FIELD_RULE: Record<keyof Settings, string> = {
  units: 'si or us',
  ascii: 'true or false',
  lastPreset: 'a preset name of 1 to 64 characters',
  scatterDefault: 'a number from 1 to 4',
};

export const DEFAULT_SETTINGS: Settings = SettingsSchema.parse({});

/**
 * The settings as stored, read without conf: defaults for a missing, damaged or
 * invalid file (the workbench's conf-backed handle reports and repairs those).
 */
export function readSettingsQuick(dir: string): Settings {
  try {
    const r = SettingsSchema.safeParse(JSON.parse(fs.readFileSync(path.join(dir, FILES.settings), 'utf8')));
    return r.success ? r.data : DEFAULT_SETTINGS;
  } catch {
    return DEFAULT_SETTINGS;
  }
}
