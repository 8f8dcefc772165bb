/**
 * The workbench's unsaved edits, kept so they survive a dropped SSH link or a
 * closed terminal. One draft file per workbench session (draft-<pid>-<token>.json
 * in the config folder), so two sessions on one config folder never overwrite or
 * delete each other's. At start a session is offered the newest draft of a
 * session that is no longer running (or the draft.json of an older tapwright);
 * once it keeps its own draft or clears, the draft it took over is removed.
 * Written atomically, rw------- (0600); a damaged draft is moved aside and reads
 * as "no draft"; a link, FIFO or device in a draft's place is never read.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import * as z from 'zod';
import {FILES, fileStamp} from './paths.js';
import {StoreError} from './errors.js';
import {describeFsError, readPlain, uniqueToken, writeFileAtomic} from './file-ops.js';
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

/** Who wrote a draft: a process of a host; `token` tells sessions with one pid apart. */
export interface DraftSession {
  pid: number;
  host: string;
  token: string;
}

const SessionSchema = z.object({pid: z.number().int().positive(), host: z.string().max(255), token: z.string().max(64)});
const EnvelopeSchema = z.object({draftVersion: z.literal(1), draft: DraftSchema, session: SessionSchema.optional()});

/** This process's session. */
export const THIS_SESSION: DraftSession = {pid: process.pid, host: os.hostname(), token: uniqueToken()};

const DRAFT_NAME = /^draft(-[0-9a-z]+-[0-9a-z]+)?\.json$/;
const ownFile = (dir: string, s: DraftSession) => path.join(dir, `draft-${s.pid}-${s.token.replace(/[^0-9a-z]/g, '')}.json`);
/** The draft a session took over at start, by folder and session. */
const adopted = new Map<string, string>();
const adoptKey = (dir: string, s: DraftSession) => `${path.resolve(dir)}\u0000${s.token}`;

function alive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (e) {
    return (e as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/** Keep this session's draft. Throws StoreError saying why when it cannot be kept. */
export function saveDraft(dir: string, draft: StoredDraft | object, session: DraftSession = THIS_SESSION): void {
  const text = `${JSON.stringify({draftVersion: 1, draft, session})}\n`;
  if (Buffer.byteLength(text) > MAX_DRAFT_BYTES) throw new StoreError(`draft not kept: it is over ${MAX_DRAFT_BYTES / 1024} KiB`);
  const file = ownFile(dir, session);
  try {
    fs.mkdirSync(dir, {recursive: true, mode: 0o700});
    writeFileAtomic(file, text, {mode: 0o600});
  } catch (e) {
    throw new StoreError(`cannot keep the unsaved draft in ${file}: ${describeFsError(e)}`);
  }
  // The draft taken over at start now lives on in this session's own.
  const took = adopted.get(adoptKey(dir, session));
  if (took && took !== file) {
    fs.rmSync(took, {force: true});
    adopted.delete(adoptKey(dir, session));
  }
}

interface Found {
  file: string;
  draft: StoredDraft;
  at: number;
}

/**
 * The newest draft left by a session that is not running (or by an older tapwright's
 * draft.json, or this session's own), or undefined. Drafts of other live sessions on
 * this host are not offered.
 * An unreadable draft is moved aside; nothing here throws for a bad file.
 */
export function loadDraft<T extends object = StoredDraft>(dir: string, session: DraftSession = THIS_SESSION): T | undefined {
  let names: string[];
  try {
    names = fs.readdirSync(dir).filter(n => DRAFT_NAME.test(n) || n === FILES.draft);
  } catch {
    return undefined;
  }
  let best: Found | undefined;
  for (const n of names) {
    const f = readOne(path.join(dir, n));
    if (!f) continue;
    const s = f.session;
    // Another session's draft while that session runs is its own business (this session's is its to take back).
    if (s && s.token !== session.token && s.host === session.host && alive(s.pid)) continue;
    if (!best || f.at > best.at) best = f;
  }
  if (!best) return undefined;
  adopted.set(adoptKey(dir, session), best.file);
  return best.draft as T;
}

function readOne(file: string): (Found & {session?: DraftSession}) | undefined {
  let text: string;
  let at = 0;
  try {
    const r = readPlain(file, MAX_DRAFT_BYTES, {follow: false, what: 'draft'});
    if (r.kind === 'missing') return undefined;
    if (r.kind === 'too-big') return aside(file);
    text = r.text;
    at = fs.statSync(file).mtimeMs;
  } catch {
    return undefined; // a link, FIFO or unreadable file: never read, left alone
  }
  const parsed = parseGuarded(text);
  if (!parsed.ok) return aside(file);
  const env = EnvelopeSchema.safeParse(parsed.value);
  if (!env.success) return aside(file);
  const saved = Date.parse(env.data.draft.savedAt ?? '');
  return {file, draft: env.data.draft, at: Number.isFinite(saved) ? saved : at, ...(env.data.session ? {session: env.data.session} : {})};
}

/** Remove this session's draft and the one it took over at start. */
export function clearDraft(dir: string, session: DraftSession = THIS_SESSION): void {
  const took = adopted.get(adoptKey(dir, session));
  for (const f of [ownFile(dir, session), took]) {
    if (!f) continue;
    try {
      fs.rmSync(f, {force: true});
    } catch {
      /* nothing to clear */
    }
  }
  adopted.delete(adoptKey(dir, session));
}

function aside(file: string): undefined {
  try {
    fs.renameSync(file, `${file}.corrupt-${fileStamp()}`);
  } catch {
    /* leave it */
  }
  return undefined;
}
