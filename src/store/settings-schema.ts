/**
 * The settings' zod schema, apart from the conf-backed store, so a command can
 * read one setting without loading conf (readSettingsQuick).
 */
import path from 'node:path';
import * as z from 'zod';
import {safeText} from '../core/text-safety.js';
import {FILES} from './paths.js';
import {readPlain} from './file-ops.js';

export const SettingsSchema = z.object({
  /** Display units; JSON output is always SI. */
  units: z.enum(['si', 'us']).default('si'),
  /** ASCII borders and symbols in the workbench. */
  ascii: z.boolean().default(false),
  /** The preset the workbench had open last. */
  lastPreset: safeText(z.string().min(1).max(64)).optional(),
  /** The folder of the last report the workbench wrote: the report path prompt starts there. */
  lastReportDir: safeText(z.string().min(1).max(1024)).optional(),
  /** Default tightening-method scatter factor alphaA (1 = friction range only). */
  scatterDefault: z.number().min(1).max(4).default(1),
});
export type Settings = z.output<typeof SettingsSchema>;

export const FIELD_RULE: Record<keyof Settings, string> = {
  units: 'si or us',
  ascii: 'true or false',
  lastPreset: 'a preset name of 1 to 64 characters',
  scatterDefault: 'a number from 1 to 4',
  lastReportDir: 'a folder path of 1 to 1024 characters',
};

export const DEFAULT_SETTINGS: Settings = SettingsSchema.parse({});

/**
 * The settings as stored, read without conf, and whether the file is sound: true
 * when it is absent, or valid JSON whose every known field is accepted. A file
 * that is not sound still gives defaults here; the conf-backed handle
 * (settings.ts) reports it and moves a damaged file aside.
 */
export function readSettingsFile(dir: string): {settings: Settings; sound: boolean} {
  let text: string;
  try {
    // A plain file only, never blocking on a FIFO, never following a link (as openSettings).
    const r = readPlain(path.join(dir, FILES.settings), 1024 * 1024, {follow: false, what: 'settings file'});
    if (r.kind === 'missing') return {settings: DEFAULT_SETTINGS, sound: true};
    if (r.kind === 'too-big') return {settings: DEFAULT_SETTINGS, sound: false};
    text = r.text;
  } catch {
    return {settings: DEFAULT_SETTINGS, sound: false};
  }
  try {
    const r = SettingsSchema.safeParse(JSON.parse(text));
    return r.success ? {settings: r.data, sound: true} : {settings: DEFAULT_SETTINGS, sound: false};
  } catch {
    return {settings: DEFAULT_SETTINGS, sound: false};
  }
}

/** The settings as stored, read without conf: defaults for a missing, damaged or invalid file. */
export function readSettingsQuick(dir: string): Settings {
  return readSettingsFile(dir).settings;
}
