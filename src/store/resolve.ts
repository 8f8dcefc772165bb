/**
 * `--preset NAME` for check, repair, screw and the workbench: a saved preset
 * from the config folder, or a shipped demo preset.
 */
import {openPresetStore, type Preset} from './presets.js';
import {configDir} from './paths.js';
import {StoreError} from './errors.js';

/**
 * Throws StoreError (exit 2) naming --preset when there is no such preset or it
 * is of another kind. `onWarning` gets the store's one-line messages (a damaged
 * file moved aside, an upgrade): pass `m => io.err(`tapwright: warning: ${m}\n`)`.
 */
export function resolvePreset(
  name: string,
  env: Record<string, string | undefined>,
  kind?: Preset['kind'],
  onWarning?: (message: string) => void,
): Preset {
  const wanted = name.trim();
  if (wanted === '') throw new StoreError('--preset needs a preset name; see tapwright presets list', '--preset');
  const store = openPresetStore(configDir(env));
  if (onWarning) for (const w of store.warnings()) onWarning(w);
  const p = store.get(wanted);
  if (!p) {
    const known = store.list().map(s => s.name);
    throw new StoreError(
      `--preset "${wanted}": no saved or shipped preset of that name (${known.length} known: ${known.slice(0, 8).join(', ')}${known.length > 8 ? ', ...' : ''}); see tapwright presets list`,
      '--preset',
    );
  }
  if (kind && p.kind !== kind) {
    throw new StoreError(`--preset "${p.name}" is a ${p.kind} preset; this command needs a ${kind} preset`, '--preset');
  }
  return p;
}
