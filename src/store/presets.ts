/**
 * The preset store: presets.json in the config folder, beside conf's settings.
 * Every change runs under an O_EXCL lock on a fresh read of the file and is
 * written atomically, so two sessions saving at once both keep theirs; a
 * damaged file is moved aside and salvaged; an invalid preset is quarantined.
 */
import fs from 'node:fs';
import path from 'node:path';
import {storeFile} from './paths.js';
import {StoreError} from './errors.js';
import {LockLostError, describeFsError, removeOrphanTemps, withLock} from './file-ops.js';
import {keyOf, readState, writeState, type Entry, type State} from './store-file.js';
import {MAX_REVISION, NAME_RULE, PresetNameSchema, SavablePresetSchema, describeZodError, type Preset, type SavablePreset} from './schema.js';
import {shippedPresets} from './shipped.js';
import {exportDocument, importPresets, writeExport, type ImportReport} from './transfer.js';
import {dropInsertTable, putInsertTable, readInsertTables, type SolidInsertTable} from './inserts.js';
import type {PresetStore, PresetSummary, StoreOptions} from './store-types.js';
import {dropUserMaterial, putUserMaterial, readUserMaterials} from './user-materials.js';
import type {UserParentMaterial} from '../core/joint/input.js';

export type {Preset, SavablePreset, QuarantineEntry} from './schema.js';
export type {ImportOptions, ImportReport} from './transfer.js';
export type {PresetStore, PresetSummary, QuarantinedItem, SaveOptions, StoreOptions} from './store-types.js';

function summary(p: Preset, source: PresetSummary['source']): PresetSummary {
  const s: PresetSummary = {
    name: p.name,
    kind: p.kind,
    thread: (p.kind === 'screw' ? p.screw?.thread : p.joint?.thread) ?? '',
    savedAt: p.savedAt,
    revision: p.revision,
    demo: p.demo === true,
    readOnly: source === 'shipped',
    source,
  };
  if (p.notes.asset) s.asset = p.notes.asset;
  if (p.notes.location) s.location = p.notes.location;
  if (p.notes.workOrder) s.workOrder = p.notes.workOrder;
  return s;
}

const byName = (a: {name: string}, b: {name: string}) => a.name.localeCompare(b.name);

export function openPresetStore(dir: string, opts: StoreOptions = {}): PresetStore {
  const file = storeFile(dir);
  const lock = `${file}.lock`;
  const now = opts.now ?? (() => new Date());
  const notes: string[] = [];
  const warn = (m: string) => {
    if (!notes.includes(m)) notes.push(m);
  };
  const shipped = shippedPresets();
  const shippedByKey = new Map(shipped.map(p => [keyOf(p.name), p]));

  function report(s: State, aside: string | undefined): void {
    if (aside && s.reason !== undefined) {
      const bak = s.fromBackup ? ` (${s.fromBackup} of them from presets.json.bak)` : '';
      warn(`preset store was ${s.reason}; moved aside to ${aside}; recovered ${s.entries.length} preset${s.entries.length === 1 ? '' : 's'}${bak}`);
    } else if (aside) {
      warn(`preset store upgraded from schema ${s.fromVersion}; the old file is kept as ${aside}`);
    }
  }

  /** Read for display; a damaged or old file is repaired under the lock when possible. */
  function current(): State {
    let s: State;
    try {
      s = readState(file, now());
    } catch (e) {
      warn(`cannot read ${file}: ${describeFsError(e)}; showing the shipped presets only`);
      return {status: 'missing', entries: [], quarantine: [], materials: [], inserts: []};
    }
    if (s.status === 'newer') warn(`${file}: ${s.reason}; it is left untouched and not read`);
    if (s.status === 'too-big') warn(`${file}: ${s.reason}`);
    if (s.status === 'damaged' || s.status === 'migrated') {
      try {
        s = mutate(() => undefined);
      } catch (e) {
        warn(`preset store ${file} needs repair (${s.reason ?? `schema ${s.fromVersion}`}) but cannot be written: ${e instanceof StoreError ? e.message : describeFsError(e)}`);
      }
    }
    return s;
  }

  /** Lock, re-read, apply `fn`, write. Returns the state written. */
  function mutate(fn: (s: State) => void): State {
    try {
      fs.mkdirSync(dir, {recursive: true, mode: 0o700});
    } catch (e) {
      throw new StoreError(`cannot create the config folder ${dir}: ${describeFsError(e)}; set TAPWRIGHT_CONFIG_DIR to a writable folder`);
    }
    // A writer paused long enough for its lock to be broken (by hand, or by a process on
    // another host) finds that out before its rename, and starts again on a fresh read.
    for (let attempt = 1; ; attempt++) {
      try {
        return withLock(
          lock,
          stillHeld => {
            removeOrphanTemps(file);
            const seen = identity(file);
            const s = readState(file, now());
            if (s.status === 'newer') throw new StoreError(`${file}: ${s.reason}; not changing it. Use that newer tapwright, or move the file away.`);
            if (s.status === 'too-big') throw new StoreError(`${file}: ${s.reason}`);
            const found = {...s, entries: [...s.entries]};
            fn(s);
            // presets.json.bak: the store as it was before this change.
            const aside = writeState(file, s, now(), () => {
              stillHeld();
              if (identity(file) !== seen) throw new LockLostError(lock);
            });
            report(found, aside);
            return s;
          },
          {timeoutMs: opts.lockTimeoutMs, staleMs: opts.staleLockMs},
        );
      } catch (e) {
        if (e instanceof LockLostError) {
          if (attempt < 3) continue;
          throw new StoreError(`not saved: ${file} was changed by another process while this one held its lock (${attempt} tries); nothing of this change was written. Try again.`);
        }
        if (e instanceof StoreError) throw e;
        throw new StoreError(`cannot write the preset store ${file}: ${describeFsError(e)}`);
      }
    }
  }

  const findSaved = (s: State, name: string): Entry | undefined => {
    const key = keyOf(name);
    return s.entries.find(e => e.preset.name === name) ?? s.entries.find(e => keyOf(e.preset.name) === key);
  };
  const names = (s: State) => [...s.entries.map(e => e.preset.name), ...shipped.map(p => p.name)];
  const missing = (name: string, s: State, what = 'saved or shipped preset') =>
    new StoreError(`no ${what} named "${name}"${hint(name, names(s))}; see tapwright presets list`);
  const readOnly = (name: string) =>
    new StoreError(`"${name}" is a shipped demo preset and read-only; copy it with duplicate (or save under another name)`);
  const assertFree = (s: State, name: string, except?: Entry) => {
    if (shippedByKey.has(keyOf(name))) throw new StoreError(`"${name}" is the name of a shipped demo preset; choose another name`);
    const other = findSaved(s, name);
    if (other && other !== except) throw new StoreError(`a saved preset named "${other.preset.name}" already exists; choose another name${except ? '' : ' or overwrite it'}`);
  };

  function validate(p: SavablePreset): Preset {
    const r = SavablePresetSchema.safeParse(p);
    if (!r.success) {
      const name = typeof (p as {name?: unknown})?.name === 'string' ? ` "${(p as {name: string}).name}"` : '';
      throw new StoreError(`preset${name} not saved: ${describeZodError(r.error)}`);
    }
    return {...r.data, savedAt: now().toISOString(), revision: r.data.revision ?? 1};
  }

  const store: PresetStore = {
    dir,
    file,
    list() {
      const s = current();
      return [...s.entries.map(e => summary(e.preset, 'saved')).sort(byName), ...shipped.map(p => summary(p, 'shipped'))];
    },
    get(name) {
      const s = current();
      const saved = findSaved(s, name);
      if (saved) return structuredClone(saved.preset);
      const sh = shipped.find(p => p.name === name) ?? shippedByKey.get(keyOf(name));
      return sh ? structuredClone(sh) : undefined;
    },
    save(p, o = {}) {
      const fresh = validate(p);
      if (shippedByKey.has(keyOf(fresh.name))) throw readOnly(fresh.name);
      let out = fresh;
      mutate(s => {
        const existing = findSaved(s, fresh.name);
        if (existing && !o.overwrite) {
          throw new StoreError(`a preset named "${existing.preset.name}" already exists (saved ${existing.preset.savedAt}); overwrite it (--overwrite) or choose another name`);
        }
        if (o.expectedRevision !== undefined && existing && existing.preset.revision !== o.expectedRevision) {
          throw new StoreError(
            `"${existing.preset.name}" was changed by another session since you loaded it (revision ${o.expectedRevision}, now ${existing.preset.revision}); reload it or save under another name`,
          );
        }
        out = {...fresh, revision: existing ? nextRevision(existing.preset) : 1};
        const entry = {preset: out, raw: out};
        if (existing) s.entries[s.entries.indexOf(existing)] = entry;
        else s.entries.push(entry);
      });
      return structuredClone(out);
    },
    rename(from, to) {
      const checked = PresetNameSchema.safeParse(to);
      if (!checked.success) throw new StoreError(`new name "${to}" not accepted: preset name must be ${NAME_RULE}`);
      const target = checked.data;
      mutate(s => {
        const e = findSaved(s, from);
        if (!e) throw shippedByKey.has(keyOf(from)) ? readOnly(from) : missing(from, s, 'saved preset');
        assertFree(s, target, e);
        const p = {...e.preset, name: target, revision: nextRevision(e.preset)};
        const raw = typeof e.raw === 'object' && e.raw !== null ? {...(e.raw as object), name: target, revision: p.revision} : p;
        s.entries[s.entries.indexOf(e)] = {preset: p, raw};
      });
    },
    duplicate(from, to) {
      let out: Preset | undefined;
      mutate(s => {
        const src = findSaved(s, from)?.preset ?? shipped.find(p => keyOf(p.name) === keyOf(from));
        if (!src) throw missing(from, s);
        const copy = validate({...structuredClone(src), name: to, savedAt: undefined, revision: undefined});
        assertFree(s, copy.name);
        out = copy;
        s.entries.push({preset: copy, raw: copy});
      });
      return structuredClone(out!);
    },
    remove(name) {
      mutate(s => {
        const e = findSaved(s, name);
        if (!e) throw shippedByKey.has(keyOf(name)) ? readOnly(name) : missing(name, s, 'saved preset');
        s.entries.splice(s.entries.indexOf(e), 1);
      });
    },
    importFile(f, o = {}) {
      const incoming = importPresets(f);
      let result: ImportReport | undefined;
      mutate(s => {
        result = incoming.apply(s, {...o, isShipped: n => shippedByKey.has(keyOf(n)), now: now()});
      });
      return result!;
    },
    exportTo(f, list, o = {}) {
      writeExport(path.resolve(f), store.exportJson(list), o.force === true);
    },
    exportJson(list) {
      const s = current();
      let chosen: Preset[];
      if (list && list.length) {
        chosen = list.map(n => {
          const p = findSaved(s, n)?.preset ?? shippedByKey.get(keyOf(n));
          if (!p) throw missing(n, s);
          return p;
        });
        chosen = chosen.filter((p, i) => chosen.indexOf(p) === i); // a name given twice is exported once
      } else {
        chosen = s.entries.map(e => e.preset);
        if (chosen.length === 0) throw new StoreError(`there are no saved presets to export; name shipped ones to export them (${shipped.map(p => p.name).join(', ')})`);
      }
      return exportDocument(chosen, now());
    },
    quarantined() {
      const s = current();
      const tables = readInsertTables(s).invalid.map(t => ({...t, at: ''}));
      return [...s.quarantine, ...tables].map(q => structuredClone(q));
    },
    insertTables() {
      return readInsertTables(current()).valid.map(v => structuredClone(v.table));
    },
    saveInsertTable(t, o = {}) {
      let out: SolidInsertTable | undefined;
      mutate(s => {
        out = putInsertTable(s, t, o.overwrite === true);
      });
      return structuredClone(out!);
    },
    removeInsertTable(name) {
      mutate(s => dropInsertTable(s, name));
    },
    userMaterials() {
      return readUserMaterials(current()).map(m => structuredClone(m));
    },
    saveUserMaterial(m, o = {}) {
      let out: UserParentMaterial | undefined;
      mutate(s => {
        out = putUserMaterial(s, m, o.overwrite === true);
      });
      return structuredClone(out!);
    },
    saveUserMaterials(list, o = {}) {
      let out: UserParentMaterial[] = [];
      mutate(s => {
        // Under one lock on one read: a problem with any item throws before anything is written.
        out = list.map((m, i) => {
          try {
            return putUserMaterial(s, m, o.overwrite === true);
          } catch (e) {
            if (e instanceof StoreError && list.length > 1) throw new StoreError(`item ${i + 1} of ${list.length}: ${e.message}; nothing was stored`);
            throw e;
          }
        });
      });
      return structuredClone(out);
    },
    removeUserMaterial(id) {
      mutate(s => dropUserMaterial(s, id));
    },
    warnings() {
      return [...notes];
    },
  };
  current();
  return store;
}

/** The revision after `p`'s; a StoreError at the limit (MAX_REVISION). */
export function nextRevision(p: {name: string; revision: number}): number {
  if (p.revision >= MAX_REVISION) {
    throw new StoreError(`"${p.name}" is at revision ${p.revision}, the highest kept (${MAX_REVISION}); it cannot be changed in place: save it under another name (presets duplicate)`);
  }
  return p.revision + 1;
}

/** Which file is at `file` now: inode, size and change time ("" when there is none). */
function identity(file: string): string {
  try {
    const st = fs.lstatSync(file);
    return `${st.dev}:${st.ino}:${st.size}:${st.mtimeMs}:${st.ctimeMs}`;
  } catch {
    return '';
  }
}

function hint(name: string, all: string[]): string {
  const k = keyOf(name);
  const near = all.filter(n => keyOf(n).includes(k.slice(0, 4)) || k.includes(keyOf(n).slice(0, 4))).slice(0, 4);
  return near.length ? `; did you mean ${near.map(n => `"${n}"`).join(' or ')}?` : '';
}
