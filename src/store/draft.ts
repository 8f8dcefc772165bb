/**
 * The workbench's unsaved edits, kept in draft.json so they survive a dropped
 * SSH link or a closed terminal. One draft per config folder; written
 * atomically; a damaged draft is moved aside and reads as "no draft".
 */
import fs from 'node:fs';
import path from 'node:path';
import * as z from 'zod';
import {FILES, fileStamp} from './paths.js';
import {StoreError} from './errors.js';
import {describeFsError, errCode, writeFileAtomic} from './file-ops.js';
import {parseGuarded} from './guard.js';

/** Largest draft kept, bytes. */
export const MAX_DRAFT_BYTES = 256 * 1024;

/** Any JSON object; the workbench decides what is in it (its `Draft`: savedAt, presetName, values). */
export const DraftSchema = z.looseObject({
  savedAt: z.string().optional(),
  presetName: z.string().optional(),
  values: z.unknown(),
});
export type StoredDraft = z.output<typeof DraftSchema>;

const EnvelopeSchema = z.object({draftVersion: z.literal(1), draft: DraftSchema});

const draftFile = (dir: string) => path.join(dir, FILES.draft);

export function saveDraft(dir: string, draft: StoredDraft | object): void {
  const text = `${JSON.stringify({draftVersion: 1, draft})}\n`;
  if (Buffer.byteLength(text) > MAX_DRAFT_BYTES) throw new StoreError(`draft not kept: it is over ${MAX_DRAFT_BYTES / 1024} KiB`);
  try {
    fs.mkdirSync(dir, {recursive: true});
    writeFileAtomic(draftFile(dir), text);
  } catch (e) {
    throw new StoreError(`cannot keep the unsaved draft in ${draftFile(dir)}: ${describeFsError(e)}`);
  }
}

/** The draft, or undefined when there is none (or it was unreadable: then it is moved aside). */
export function loadDraft<T extends object = StoredDraft>(dir: string): T | undefined {
  const file = draftFile(dir);
  let text: string;
  try {
    if (fs.statSync(file).size > MAX_DRAFT_BYTES) return aside(file);
    text = fs.readFileSync(file, 'utf8');
  } catch (e) {
    if (errCode(e) === 'ENOENT') return undefined;
    return undefined;
  }
  const parsed = parseGuarded(text);
  if (!parsed.ok) return aside(file);
  const env = EnvelopeSchema.safeParse(parsed.value);
  if (!env.success) return aside(file);
  return env.data.draft as T;
}

export function clearDraft(dir: string): void {
  try {
    fs.rmSync(draftFile(dir), {force: true});
  } catch {
    /* nothing to clear */
  }
}

function aside(file: string): undefined {
  try {
    fs.renameSync(file, `${file}.corrupt-${fileStamp()}`);
  } catch {
    /* leave it */
  }
  return undefined;
}
