/**
 * Import and export of presets. An export file has the store's own layout:
 *   {"schemaVersion": 2, "exportedAt": "<ISO time>", "presets": [Preset...]}
 * Import also takes a whole presets.json (any version back to 1) or one bare
 * preset object. Hostile files are refused with a message and nothing imported.
 */
import fs from 'node:fs';
import {StoreError} from './errors.js';
import {MAX_DEPTH, MAX_IMPORT_BYTES, MAX_IMPORT_TEXT, isPlainObject, parseGuarded} from './guard.js';
import {VersionError, migrate} from './migrate.js';
import {CURRENT_SCHEMA_VERSION, MAX_REVISION, PresetSchema, describeZodError, type Preset} from './schema.js';
import {keyOf, type State} from './store-file.js';
import {describeFsError, errCode, writeFileAtomic} from './file-ops.js';
import {resolveHoleInput, resolveJointInput, resolveScrewInput} from '../app/resolve.js';
import {labelMessage} from '../app/field-table.js';
import {printable} from '../core/text-safety.js';

export interface ImportOptions {
  /** Replace saved presets of the same names (otherwise a clash refuses the whole import). */
  overwrite?: boolean;
}

export interface ImportReport {
  file: string;
  /** Schema version of the file before migration. */
  fromVersion: number;
  added: string[];
  replaced: string[];
  skipped: Array<{name: string; reason: string}>;
}

interface Incoming {
  fromVersion: number;
  presets: Preset[];
  apply(s: State, o: ImportOptions & {isShipped: (name: string) => boolean; now: Date}): ImportReport;
}

/** Read and validate an import file completely before anything is changed. */
export function importPresets(file: string): Incoming {
  const fail = (why: string) => new StoreError(`cannot import ${file}: ${why}; nothing was imported`);
  let text: string;
  try {
    const st = fs.statSync(file);
    if (st.isDirectory()) throw fail('it is a folder, not a file');
    if (st.size > MAX_IMPORT_BYTES) throw fail(`it is ${st.size} bytes; the limit is ${MAX_IMPORT_TEXT} (${MAX_IMPORT_BYTES} bytes)`);
    const fd = fs.openSync(file, 'r');
    try {
      // Read at most one byte past the limit: a file that grows after the stat is still refused.
      const buf = Buffer.alloc(MAX_IMPORT_BYTES + 1);
      const n = fs.readSync(fd, buf, 0, buf.length, 0);
      if (n > MAX_IMPORT_BYTES) throw fail(`it is over the limit of ${MAX_IMPORT_TEXT}`);
      text = buf.subarray(0, n).toString('utf8');
    } finally {
      fs.closeSync(fd);
    }
  } catch (e) {
    if (e instanceof StoreError) throw e;
    throw fail(describeFsError(e));
  }
  const parsed = parseGuarded(text, MAX_DEPTH);
  if (!parsed.ok) throw fail(parsed.error);
  let items: unknown[];
  let fromVersion = CURRENT_SCHEMA_VERSION;
  const v = parsed.value;
  if (isPlainObject(v) && !('schemaVersion' in v) && !('version' in v) && 'name' in v && 'kind' in v) {
    items = [v];
  } else {
    try {
      const m = migrate(v);
      fromVersion = m.from;
      if (!Array.isArray(m.doc.presets)) throw fail('"presets" must be a list of presets');
      items = m.doc.presets;
    } catch (e) {
      if (e instanceof VersionError) {
        throw fail(
          isPlainObject(v) || Array.isArray(v)
            ? `${e.message}. Expected an export of tapwright presets: {"schemaVersion": ${CURRENT_SCHEMA_VERSION}, "presets": [...]}`
            : `expected an object with "schemaVersion" and "presets", got ${v === null ? 'null' : typeof v}`,
        );
      }
      throw e;
    }
  }
  if (items.length === 0) throw fail('it holds no presets');
  const problems: string[] = [];
  const presets: Preset[] = [];
  const seen = new Set<string>();
  items.forEach((raw, i) => {
    const label = `presets[${i}]${isPlainObject(raw) && typeof raw.name === 'string' ? ` ("${printable(raw.name, {max: 64})}")` : ''}`;
    const r = PresetSchema.safeParse(raw);
    if (!r.success) return void problems.push(`${label}: ${describeZodError(r.error)}`);
    // The inputs as every face reads them (src/app/resolve.ts): a preset that could not be computed is refused now.
    const resolved = [r.data.joint && resolveJointInput(r.data.joint), r.data.repair && resolveHoleInput(r.data.repair), r.data.screw && resolveScrewInput(r.data.screw)];
    const bad = resolved.flatMap(x => x?.errors ?? []);
    if (bad.length) return void problems.push(`${label}: ${bad.map(e => `${e.group === 'hole' ? 'repair' : e.group}.${e.key}: ${labelMessage(e)}`).join('; ')}`);
    if (r.data.revision > MAX_REVISION) return void problems.push(`${label}: revision ${r.data.revision} is above the highest kept (${MAX_REVISION})`);
    if (seen.has(keyOf(r.data.name))) return void problems.push(`${label}: the name appears twice in the file`);
    seen.add(keyOf(r.data.name));
    presets.push(r.data);
  });
  if (problems.length) {
    throw fail(`${problems.slice(0, 3).join('; ')}${problems.length > 3 ? `; and ${problems.length - 3} more` : ''}`);
  }
  return {
    fromVersion,
    presets,
    apply(s, o) {
      const out: ImportReport = {file, fromVersion, added: [], replaced: [], skipped: []};
      const clashes: string[] = [];
      for (const p of presets) {
        if (o.isShipped(p.name)) {
          out.skipped.push({name: p.name, reason: 'a shipped demo preset has this name (read-only)'});
          continue;
        }
        const existing = s.entries.find(e => keyOf(e.preset.name) === keyOf(p.name));
        if (existing && !o.overwrite) {
          clashes.push(existing.preset.name);
          continue;
        }
        if (existing) {
          const next = {...p, revision: Math.min(Math.max(existing.preset.revision, p.revision) + 1, MAX_REVISION)};
          s.entries[s.entries.indexOf(existing)] = {preset: next, raw: next};
          out.replaced.push(p.name);
        } else {
          s.entries.push({preset: p, raw: p});
          out.added.push(p.name);
        }
      }
      if (clashes.length) {
        throw new StoreError(
          `cannot import ${file}: already saved: ${clashes.map(n => `"${n}"`).join(', ')}; nothing was imported. Add --overwrite to replace them, or rename them first`,
        );
      }
      return out;
    },
  };
}

/** The export document as JSON text. */
export function exportDocument(presets: Preset[], now: Date): string {
  return `${JSON.stringify({schemaVersion: CURRENT_SCHEMA_VERSION, exportedAt: now.toISOString(), presets}, null, 2)}\n`;
}

/** Write an export file; an existing file is replaced only with `force`. */
export function writeExport(file: string, text: string, force: boolean): void {
  try {
    if (fs.existsSync(file) && fs.statSync(file).isDirectory()) throw new StoreError(`cannot export to ${file}: it is a folder; give a file name`);
    writeFileAtomic(file, text, {exclusive: !force});
  } catch (e) {
    if (e instanceof StoreError) throw e;
    if (errCode(e) === 'EEXIST') throw new StoreError(`${file} already exists; add --force to overwrite it`);
    throw new StoreError(`cannot export to ${file}: ${describeFsError(e)}`);
  }
}
