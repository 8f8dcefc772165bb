/**
 * The preset the workbench opens on: the one asked for (--preset), else the one
 * open when it was last closed (settings lastPreset), else the shipped default.
 * A last preset that is gone (deleted, renamed) falls back to the default quietly.
 */
import {DEFAULT_PRESET} from '../store/shipped.js';
import type {LoadedPreset, PresetPort} from './services.js';

export function openingPreset(presets: Pick<PresetPort, 'load'>, asked: string | undefined, last: string | undefined, fallback: string = DEFAULT_PRESET): LoadedPreset {
  if (asked !== undefined) return presets.load(asked);
  if (last) {
    try {
      return presets.load(last);
    } catch {
      // Gone since: the default preset.
    }
  }
  return presets.load(fallback);
}
