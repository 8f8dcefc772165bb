/**
 * Service state of a preloaded joint (issue 16): inputs, the --clamp parser,
 * stiffness, loads, fatigue, surface pressure, slip and their flags. Pure.
 */
export {ServiceInputSchema, ClampPartSchema, ServiceLoadSchema, type ServiceInput, type ServiceInputDraft, type ClampPart} from './input.js';
export {parseClamp, MPSI_MPA, type ClampParseOptions} from './clamp-parse.js';
export {checkService, SERVICE_SOURCES} from './check.js';
export type {ServiceResult, ServicePartOut} from './result.js';
export {clampMaterialIds, findClampMaterial, resolvePart, stiffnessMaterial} from './materials.js';
export {serviceFlags, FATIGUE_FAIL, FATIGUE_WATCH, SLIP_WATCH} from './flags.js';
export {parseServiceLoad, parseEmbedding} from './text-parse.js';
export {finiteOnly} from './json.js';
