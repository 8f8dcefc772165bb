/**
 * Reading and writing presets.json: per-item validation with quarantine,
 * migration of older versions, and recovery of a damaged file.
 * Pure reads here; the caller holds the lock around anything that writes.
 */
import fs from 'node:fs';
import {
  CURRENT_SCHEMA_VERSION,
  PresetSchema,
  QuarantineEntrySchema,
  StoreDocSchema,
  describeZodError,
  type Preset,
  type QuarantineEntry,
} from './schema.js';
import {findForbiddenKey, isPlainObject, jsonDepth} from './guard.js';
import {VersionError, migrate} from './migrate.js';
import {salvage} from './salvage.js';
import {isShippedName} from './shipped.js';
import {readPlain, writeFileAtomic} from './file-ops.js';
import {fileStamp} from './paths.js';
import {StoreError} from './errors.js';

/**
 * The largest store tapwright writes (presets are about 1 kB each): a change that
 * would make the file bigger than this is refused with a message.
 */
export const MAX_STORE_BYTES = 32 * 1024 * 1024;
/**
 * The largest store read: twice the write limit, so a store written by tapwright is
 * always read back. A bigger file (made by hand or another program) is left
 * untouched, not moved aside, and nothing is written over it.
 */
export const MAX_STORE_READ_BYTES = 2 * MAX_STORE_BYTES;
/** Files of the store (presets.json, its .bak, copies kept aside) are the user's only: rw-------. */
export const STORE_FILE_MODE = 0o600;
const STORE_MAX_DEPTH = 64;

export interface Entry {
  preset: Preset;
  /** The item as stored: written back unchanged, so fields from a newer tapwright survive. */
  raw: unknown;
}

export interface State {
  status: 'ok' | 'missing' | 'damaged' | 'migrated' | 'newer' | 'too-big';
  entries: Entry[];
  quarantine: QuarantineEntry[];
  materials: unknown[];
  inserts: unknown[];
  /** The file's text as read (the content of the next .bak). */
  text?: string;
  /** Damaged: what was wrong. Newer, too big: the message for the user. */
  reason?: string;
  fromVersion?: number;
  /** Presets taken from presets.json.bak during a recovery. */
  fromBackup?: number;
}

export const keyOf = (name: string): string => name.trim().toLowerCase();

function emptyState(status: State['status']): State {
  return {status, entries: [], quarantine: [], materials: [], inserts: []};
}

type Checked = {bad?: string; result?: ReturnType<typeof PresetSchema.safeParse>};
/** Validation results by the item's JSON text: each read re-validates only what changed. */
const checkedCache = new Map<string, Checked>();

function check(raw: unknown): Checked {
  const key = JSON.stringify(raw) ?? 'undefined';
  const hit = checkedCache.get(key);
  if (hit) return hit;
  const bad = findForbiddenKey(raw);
  const out: Checked = bad !== undefined ? {bad} : {result: PresetSchema.safeParse(raw)};
  if (checkedCache.size >= 5000) checkedCache.clear();
  checkedCache.set(key, out);
  return out;
}

/**
 * Split raw items into valid entries and quarantine, never dropping anything.
 * A quarantined item that reads as a valid preset again (after an upgrade or a
 * hand fix) and whose name is free comes back as a preset.
 */
function itemize(state: State, items: unknown[], quarantine: unknown[], now: Date): void {
  const at = now.toISOString();
  const seen = new Set<string>();
  const take = (raw: unknown, hold: (reason: string) => void, i: number): void => {
    const checked = check(raw);
    if (checked.bad !== undefined) return hold(`item ${i + 1} has the forbidden key ${checked.bad}`);
    const r = checked.result!;
    if (!r.success) return hold(describeZodError(r.error));
    const key = keyOf(r.data.name);
    if (seen.has(key)) return hold(`a second preset named "${r.data.name}"`);
    if (isShippedName(r.data.name)) return hold(`"${r.data.name}" is the name of a shipped demo preset`);
    seen.add(key);
    state.entries.push({preset: r.data, raw});
  };
  items.forEach((raw, i) => {
    const name = isPlainObject(raw) && typeof raw.name === 'string' ? raw.name : undefined;
    take(raw, reason => state.quarantine.push({...(name !== undefined ? {name} : {}), reason, at, raw}), i);
  });
  quarantine.forEach((q, i) => {
    const r = QuarantineEntrySchema.safeParse(q);
    if (!r.success) return void state.quarantine.push({reason: 'unreadable quarantine entry', at, raw: q});
    take(r.data.raw, () => state.quarantine.push(r.data), i);
  });
}

const mib = (bytes: number) => `${(bytes / 1024 / 1024).toFixed(1)} MiB`;

/**
 * Read and classify the store file (no writes). A damaged file comes back salvaged.
 * Only a plain file is read (never a link, a FIFO or a device: StoreError naming it).
 */
export function readState(file: string, now: Date): State {
  const read = readPlain(file, MAX_STORE_READ_BYTES, {follow: false, what: 'preset store'});
  if (read.kind === 'missing') return emptyState('missing');
  if (read.kind === 'too-big') {
    const s = emptyState('too-big');
    s.reason = `it is ${mib(read.size)}, more than the ${mib(MAX_STORE_READ_BYTES)} tapwright reads; it is left untouched and nothing is saved over it. Move it away (keep it), then export the presets you need from a copy with a JSON tool in files of up to 1 MiB and import them`;
    return s;
  }
  const text = read.text;
  const damaged = (reason: string): State => recover(file, text, reason, now);
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  if (body.trim() === '') return damaged('empty');
  if (jsonDepth(body) > STORE_MAX_DEPTH) return damaged('nested too deep');
  let parsed: unknown;
  try {
    parsed = JSON.parse(body);
  } catch {
    return damaged('not valid JSON (truncated or corrupt)');
  }
  let migrated: {doc: Record<string, unknown>; from: number};
  try {
    migrated = migrate(parsed);
  } catch (e) {
    if (e instanceof VersionError && isPlainObject(parsed) && typeof parsed.schemaVersion === 'number' && parsed.schemaVersion > CURRENT_SCHEMA_VERSION) {
      const s = emptyState('newer');
      s.reason = e.message;
      s.text = text;
      return s;
    }
    return damaged(e instanceof Error ? e.message : String(e));
  }
  const doc = StoreDocSchema.safeParse(migrated.doc);
  if (!doc.success) return damaged(`wrong layout (${describeZodError(doc.error)})`);
  const s = emptyState(migrated.from < CURRENT_SCHEMA_VERSION ? 'migrated' : 'ok');
  s.fromVersion = migrated.from;
  s.text = text;
  s.materials = doc.data.materials;
  s.inserts = doc.data.inserts;
  itemize(s, doc.data.presets, doc.data.quarantine, now);
  return s;
}

/** Salvage a damaged file, topped up from presets.json.bak. */
function recover(file: string, text: string | undefined, reason: string, now: Date): State {
  const s = emptyState('damaged');
  s.reason = reason;
  if (text !== undefined) {
    s.text = text;
    const found = salvage(text);
    itemize(s, found.presets, found.quarantine, now);
  }
  const bak = `${file}.bak`;
  if (fs.existsSync(bak) && fs.lstatSync(bak).isFile()) {
    let fromBak = 0;
    try {
      const b = readState(bak, now);
      if (b.status === 'ok' || b.status === 'migrated') {
        const have = new Set(s.entries.map(e => keyOf(e.preset.name)));
        for (const e of b.entries) {
          if (!have.has(keyOf(e.preset.name))) {
            s.entries.push(e);
            fromBak++;
          }
        }
      }
    } catch {
      /* an unreadable backup adds nothing */
    }
    s.fromBackup = fromBak;
  }
  return s;
}

export function serialize(s: State): string {
  const doc = {
    schemaVersion: CURRENT_SCHEMA_VERSION,
    presets: s.entries.map(e => e.raw),
    quarantine: s.quarantine,
    materials: s.materials,
    inserts: s.inserts,
  };
  return `${JSON.stringify(doc, null, 2)}\n`;
}

/**
 * Write the state (caller holds the lock). A good previous file becomes
 * presets.json.bak; a damaged one is kept as presets.json.corrupt-<time>; a
 * file of an older version is kept as presets.json.schema<N>-<time>.
 * Returns the path of the file kept aside, if any.
 */
export function writeState(file: string, s: State, now: Date, beforeRename?: () => void): string | undefined {
  const out = serialize(s);
  const bytes = Buffer.byteLength(out);
  // What is written must be readable again: refuse to grow past the write limit (shrinking is always allowed).
  if (bytes > MAX_STORE_BYTES && bytes > Buffer.byteLength(s.text ?? '')) {
    throw new StoreError(
      `not saved: the preset store would be ${mib(bytes)}, more than the ${mib(MAX_STORE_BYTES)} tapwright keeps in ${file}; nothing was changed. Export the presets you no longer use (presets export FILE NAME ...), then delete them`,
    );
  }
  let aside: string | undefined;
  const mode = STORE_FILE_MODE;
  if (s.status === 'damaged') {
    aside = `${file}.corrupt-${fileStamp(now)}`;
    if (s.text !== undefined) writeFileAtomic(aside, s.text, {mode});
    else fs.renameSync(file, aside);
  } else if (s.status === 'migrated' && s.text !== undefined) {
    aside = `${file}.schema${s.fromVersion}-${fileStamp(now)}`;
    writeFileAtomic(aside, s.text, {mode});
  } else if (s.status === 'ok' && s.text !== undefined) {
    writeFileAtomic(`${file}.bak`, s.text, {mode});
  }
  writeFileAtomic(file, out, {mode, beforeRename});
  s.status = 'ok';
  s.text = out;
  delete s.reason;
  return aside;
}
