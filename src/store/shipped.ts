/**
 * The shipped demo presets (presets/*.json): invented scenarios, marked demo,
 * read-only. Imported as JSON modules so the one-file build embeds them.
 */
import gearboxCover from '../../presets/demo-gearbox-cover.json' with {type: 'json'};
import pumpCasingStud from '../../presets/demo-pump-casing-stud.json' with {type: 'json'};
import fixtureClampNut from '../../presets/demo-fixture-clamp-nut.json' with {type: 'json'};
import guardBracketUnc from '../../presets/demo-guard-bracket-unc.json' with {type: 'json'};
import liftingTableScrew from '../../presets/demo-lifting-table-screw.json' with {type: 'json'};
import {PresetSchema, describeZodError, type Preset} from './schema.js';

/** The preset the workbench opens on when nothing else is asked for. */
export const DEFAULT_PRESET = 'demo-gearbox-cover';

const RAW: unknown[] = [gearboxCover, pumpCasingStud, fixtureClampNut, guardBracketUnc, liftingTableScrew];

let cache: {presets: Preset[]; problems: string[]} | undefined;

function load(): {presets: Preset[]; problems: string[]} {
  if (cache) return cache;
  const presets: Preset[] = [];
  const problems: string[] = [];
  RAW.forEach((raw, i) => {
    const r = PresetSchema.safeParse(raw);
    if (r.success) presets.push({...r.data, demo: true});
    else problems.push(`shipped preset #${i + 1}: ${describeZodError(r.error)}`);
  });
  cache = {presets, problems};
  return cache;
}

/** Every shipped demo preset that parses against the current schemas (copies; safe to modify). */
export function shippedPresets(): Preset[] {
  return load().presets.map(p => structuredClone(p));
}

/** Shipped presets that no longer parse (the schemas moved on); empty in a good build. */
export function shippedProblems(): string[] {
  return [...load().problems];
}

export function isShippedName(name: string): boolean {
  const key = name.trim().toLowerCase();
  return load().presets.some(p => p.name.toLowerCase() === key);
}
