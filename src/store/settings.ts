/**
 * Small settings through conf 15: settings.json in the config folder (conf's
 * cwd, so no "-nodejs" suffix). zod checks every field on read; a broken file
 * never throws: it is moved aside and defaults are used, with a warning.
 * conf's own schema, migrations and clearInvalidConfig are not used (they
 * throw or wipe the file; see the terminal notes). Changes are made under
 * an O_EXCL lock (settings.json.lock), as for the presets.
 */
import fs from 'node:fs';
import path from 'node:path';
import Conf from 'conf';
import * as z from 'zod';
import {StoreError} from './errors.js';
import {FILES, fileStamp} from './paths.js';
import {describeFsError, readPlain, withLock} from './file-ops.js';
import {describeZodError} from './schema.js';

import {SettingsSchema, FIELD_RULE, DEFAULT_SETTINGS, type Settings} from './settings-schema.js';
export {SettingsSchema, DEFAULT_SETTINGS, type Settings} from './settings-schema.js';

export interface SettingsHandle {
  get(): Settings;
  /**
   * Change some settings; throws StoreError naming the field for a bad value.
   * Returns false when the change could not be written (it then holds for this
   * session only, and warnings() says why).
   */
  set(patch: Partial<Settings>): boolean;
  warnings(): string[];
  readonly file: string;
}

type Store = Record<string, unknown>;

export function openSettings(dir: string): SettingsHandle {
  const file = path.join(dir, FILES.settings);
  const notes: string[] = [];
  const warn = (m: string) => {
    if (!notes.includes(m)) notes.push(m);
  };
  let memory: Store | undefined;
  const make = () => new Conf<Store>({cwd: dir, configName: 'settings', projectSuffix: '', projectName: 'tapwright', configFileMode: 0o600});
  let conf: Conf<Store> | undefined;
  /** Why the file is not used at all (a link, a FIFO...): set() then fails with this. */
  let refused: string | undefined;

  const moveAside = (why: string): void => {
    const aside = `${file}.corrupt-${fileStamp()}`;
    try {
      fs.renameSync(file, aside);
      warn(`settings file was ${why}; moved aside to ${aside}; using default settings`);
    } catch (e) {
      warn(`settings file ${file} was ${why} and cannot be moved aside (${describeFsError(e)}); using default settings`);
    }
  };
  try {
    // Only a plain file is read (conf would block on a FIFO and follow a link): checked first,
    // without blocking. The folder is created rwx------ before conf creates it wider.
    readPlain(file, 1024 * 1024, {follow: false, what: 'settings file'});
    fs.mkdirSync(dir, {recursive: true, mode: 0o700});
  } catch (e) {
    refused = e instanceof StoreError ? e.message : `cannot read ${file} (${describeFsError(e)})`;
    warn(`${refused}; using default settings`);
  }
  if (refused === undefined) try {
    conf = make();
  } catch (e) {
    if (e instanceof SyntaxError && fs.existsSync(file)) {
      moveAside('not valid JSON');
      try {
        conf = make();
      } catch (e2) {
        warn(`cannot open settings in ${dir} (${describeFsError(e2)}); using defaults for this session`);
      }
    } else {
      warn(`cannot open settings in ${dir} (${describeFsError(e)}); using defaults for this session`);
    }
  }
  if (!conf) memory = {};

  function raw(): Store {
    if (memory) return memory;
    try {
      const s = conf!.store as unknown;
      if (typeof s !== 'object' || s === null || Array.isArray(s)) {
        moveAside('not an object');
        return {};
      }
      return {...(s as Store)};
    } catch (e) {
      if (e instanceof SyntaxError) moveAside('not valid JSON');
      else warn(`cannot read ${file} (${describeFsError(e)}); using default settings`);
      return {};
    }
  }

  return {
    file,
    get() {
      const r = raw();
      const out: Record<string, unknown> = {...DEFAULT_SETTINGS};
      for (const key of Object.keys(SettingsSchema.shape) as Array<keyof Settings>) {
        if (!(key in r)) continue;
        const field = SettingsSchema.shape[key].safeParse(r[key]);
        if (field.success) out[key] = field.data;
        else warn(`${file}: ${key} ${JSON.stringify(r[key])} is not accepted (${FIELD_RULE[key]}); using ${JSON.stringify(DEFAULT_SETTINGS[key]) ?? 'nothing'}`);
      }
      return out as Settings;
    },
    set(patch) {
      const checked = SettingsSchema.partial().strict().safeParse(patch);
      if (!checked.success) {
        const key = checked.error.issues[0]?.path[0];
        const rule = typeof key === 'string' && key in FIELD_RULE ? ` (accepted: ${FIELD_RULE[key as keyof Settings]})` : '';
        throw new StoreError(`setting not changed: ${describeZodError(checked.error)}${rule}`);
      }
      const keys = Object.keys(patch) as Array<keyof Settings>;
      if (memory || !conf) {
        for (const k of keys) {
          if (patch[k] === undefined) delete memory![k];
          else memory![k] = patch[k];
        }
        warn(`cannot save settings to ${file}${refused ? ` (${refused})` : ''}; the change holds for this session only`);
        return false;
      }
      const c = conf;
      try {
        // conf re-reads the file in set(); the lock closes the gap between that read and its
        // rename, so two sessions changing different settings both keep theirs.
        withLock(`${file}.lock`, () => {
          raw(); // moves a file broken since start-up aside before conf reads it again
          for (const k of keys) {
            if (patch[k] === undefined) c.delete(k);
          }
          const defined = Object.fromEntries(keys.filter(k => patch[k] !== undefined).map(k => [k, patch[k]]));
          if (Object.keys(defined).length) c.set(defined);
        }, {timeoutMs: 3000});
      } catch (e) {
        memory = {...raw(), ...patch};
        warn(`cannot save settings to ${file} (${e instanceof StoreError ? e.message : describeFsError(e)}); the change holds for this session only`);
        return false;
      }
      return true;
    },
    warnings() {
      return [...notes];
    },
  };
}
