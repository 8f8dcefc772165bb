/**
 * Store-file versions and the migrations between them. Every earlier version
 * migrates to the current one; a newer version is refused, never rewritten.
 *
 * Version 1 (tapwright 0.0.x, flat layout), detected by `"version": 1` and no
 * `schemaVersion`:
 *   {"version": 1, "items": {"<name>": {
 *      "thread": "M10", "grade": "8.8", "material": "<parent id>", "nut": "8",
 *      "engage": 15, "chamfer": 1, "depth": 25, "torque": 40, "preload": 20000,
 *      "mu": 0.12, "load": 5000,
 *      "asset": "...", "loc": "...", "wo": "...", "note": "...",
 *      "saved": 1764000000000, "demo": true}}}
 *   Every item was a joint; numbers in mm, N, N·m; `saved` in epoch milliseconds;
 *   `nut` (a nut property class) meant the internal thread was a nut.
 * Version 2: see schema.ts.
 */
import {CURRENT_SCHEMA_VERSION, emptyDoc, type StoreDoc} from './schema.js';
import {isPlainObject} from './guard.js';

export const OLDEST_SCHEMA_VERSION = 1;

export class VersionError extends Error {}

/** The schema version of a parsed store or export document; undefined when it is not one. */
export function detectVersion(raw: unknown): number | undefined {
  if (!isPlainObject(raw)) return undefined;
  if ('schemaVersion' in raw) return typeof raw.schemaVersion === 'number' ? raw.schemaVersion : Number.NaN;
  if (raw.version === 1 && isPlainObject(raw.items)) return 1;
  return undefined;
}

const num = (v: unknown): number | undefined => (typeof v === 'number' && Number.isFinite(v) ? v : undefined);
const text = (v: unknown): string | undefined => (typeof v === 'string' && v.trim() !== '' ? v : undefined);

/** Map one version-1 item to a version-2 preset object (not yet validated). */
export function presetFromV1(name: string, item: Record<string, unknown>): Record<string, unknown> {
  const joint: Record<string, unknown> = {thread: item.thread, engagement: item.engage};
  if (text(item.grade)) joint.boltGrade = item.grade;
  if (text(item.material)) joint.parent = item.material;
  if (text(item.nut)) {
    joint.internal = 'nut';
    joint.nutClass = item.nut;
  }
  if (num(item.chamfer) !== undefined) joint.chamfer = item.chamfer;
  if (num(item.depth) !== undefined) joint.holeDepth = item.depth;
  if (num(item.torque) !== undefined) {
    joint.tightening = 'torque';
    joint.torque = item.torque;
  } else if (num(item.preload) !== undefined) {
    joint.tightening = 'preload';
    joint.preload = item.preload;
  }
  const mu = num(item.mu);
  if (mu !== undefined) {
    joint.muThread = {min: mu, max: mu};
    joint.muHead = {min: mu, max: mu};
  }
  if (num(item.load) !== undefined) joint.serviceLoad = item.load;
  const notes: Record<string, unknown> = {};
  if (text(item.asset)) notes.asset = item.asset;
  if (text(item.loc)) notes.location = item.loc;
  if (text(item.wo)) notes.workOrder = item.wo;
  if (text(item.note)) notes.text = item.note;
  const saved = num(item.saved);
  const savedAt = saved !== undefined && Math.abs(saved) < 8.64e15 ? new Date(saved).toISOString() : new Date(0).toISOString();
  const out: Record<string, unknown> = {name, kind: 'joint', joint, notes, savedAt, revision: 1};
  if (item.demo === true) out.demo = true;
  return out;
}

function v1to2(raw: Record<string, unknown>): StoreDoc {
  const doc = emptyDoc();
  const items = raw.items as Record<string, unknown>;
  for (const name of Object.keys(items)) {
    const item = items[name];
    if (isPlainObject(item)) doc.presets.push(presetFromV1(name, item));
    else doc.quarantine.push({name, reason: 'version-1 item is not an object', at: new Date().toISOString(), raw: item});
  }
  return doc;
}

const STEPS: Record<number, (raw: Record<string, unknown>) => Record<string, unknown>> = {
  1: raw => v1to2(raw) as unknown as Record<string, unknown>,
};

/**
 * Bring a parsed document to the current version. Returns the migrated object
 * (items still unvalidated) and the version it started from.
 * Throws VersionError for an unknown or newer version.
 */
export function migrate(raw: unknown): {doc: Record<string, unknown>; from: number} {
  const from = detectVersion(raw);
  if (from === undefined) throw new VersionError('not a tapwright preset file (no schemaVersion)');
  if (!Number.isInteger(from) || from < OLDEST_SCHEMA_VERSION || from > CURRENT_SCHEMA_VERSION) {
    const shown = isPlainObject(raw) ? JSON.stringify(raw.schemaVersion) : '?';
    throw new VersionError(
      `schemaVersion ${shown} is not one this tapwright reads (versions ${OLDEST_SCHEMA_VERSION} to ${CURRENT_SCHEMA_VERSION})${
        typeof from === 'number' && from > CURRENT_SCHEMA_VERSION ? '; it was written by a newer tapwright' : ''
      }`,
    );
  }
  let doc = raw as Record<string, unknown>;
  for (let v = from; v < CURRENT_SCHEMA_VERSION; v++) {
    const step = STEPS[v];
    if (!step) throw new VersionError(`no migration from schemaVersion ${v}`);
    doc = step(doc);
  }
  return {doc, from};
}
