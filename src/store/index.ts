/** The store's public API: presets, settings, draft, paths. */
export {configDir, storeFile, FILES} from './paths.js';
export {openPresetStore} from './presets.js';
export type {PresetStore, PresetSummary, QuarantinedItem, SaveOptions, StoreOptions, Preset, SavablePreset, ImportOptions, ImportReport} from './presets.js';
export {PresetSchema, SavablePresetSchema, NotesSchema, PresetNameSchema, NAME_RULE, CURRENT_SCHEMA_VERSION} from './schema.js';
export type {Notes} from './schema.js';
export {DEFAULT_PRESET, shippedPresets} from './shipped.js';
export {openSettings, SettingsSchema, DEFAULT_SETTINGS} from './settings.js';
export type {Settings, SettingsHandle} from './settings.js';
export {saveDraft, loadDraft, clearDraft} from './draft.js';
export {resolvePreset} from './resolve.js';
export {StoreError} from './errors.js';
export {MAX_IMPORT_BYTES, MAX_IMPORT_TEXT, MAX_DEPTH} from './guard.js';
export type {SolidInsertTable, SolidInsertTableDraft} from './inserts.js';
export {describePreset} from './describe.js';
