/**
 * The repair planner: ranked fixes for a weak or stripped thread.
 * `planRepairs(joint, repair)` wires the real mechanics core (checkJoint), the
 * thread series (ISO 261/262, ASME B1.1) and the nut data, and returns the
 * ranked plan (mm, N, N·m). See plan.ts for the option list and rank.ts for the
 * ranking rule.
 */
import {checkJoint, checkResolved, resolveJoint} from '../joint/index.js';
import {resolveGeometry} from '../joint/resolve.js';
import type {JointInput} from '../joint/input.js';
import type {CheckResult} from '../joint/result.js';
import {listDesignations, parseThread} from '../threads/index.js';
import {nutClass, nutDimensions} from '../materials/index.js';
import type {ThreadFamily, ThreadGeometry, ThreadSpec} from '../types.js';
import type {UnitSystem} from '../units.js';
import demoTable from '../../../presets/solid-inserts-demo.json' with {type: 'json'};
import type {RepairDeps, SeriesThread} from './context.js';
import {RepairInputSchema, type RepairInput, type RepairInputDraft} from './input.js';
import {planRepairsWith} from './plan.js';
import {SolidInsertTableSchema, type SolidInsertTable} from './solid-table.js';
import type {RepairPlan} from './types.js';

export {RepairInputSchema, type RepairInput, type RepairInputDraft} from './input.js';
export {SolidInsertTableSchema, SolidInsertEntrySchema, parseSolidInsertTable, DEMO_TABLE_WARNING, SOLID_INSERT_TYPES} from './solid-table.js';
export type {SolidInsertTable, SolidInsertEntry, SolidInsertTableDraft} from './solid-table.js';
export {REPAIR_RANKING_RULE, EFFORT_SCALE, EFFORT_SCALE_TEXT, rankOptions, compareOptions} from './rank.js';
export {REPAIR_KINDS} from './types.js';
export type {RepairPlan, RepairOption, RepairKind, Effort, InsertDetails, StrengthPart} from './types.js';
export type {RepairDeps, SeriesThread} from './context.js';
export {planRepairsWith} from './plan.js';
export {receivingThread, insertDepths, stiTapDrill, drillPointLength, HELICAL_LENGTH_FACTORS, INSERT_WIRE, HELICAL_SOURCES} from './helical.js';
export {tapDrill, clearanceHole, blindHoleDepths, minimumLigament, HOLE_SOURCES} from './holes.js';
export {oversizeCandidates} from './resize.js';

/** The shipped demo table of solid key-locked inserts ("demo values: use the insert maker's data"). */
export const DEMO_SOLID_INSERTS: SolidInsertTable = SolidInsertTableSchema.parse(demoTable);

const SERIES_CACHE = new Map<ThreadFamily, SeriesThread[]>();

function seriesOf(family: ThreadFamily): SeriesThread[] {
  const hit = SERIES_CACHE.get(family);
  if (hit) return hit;
  const list: SeriesThread[] = [];
  for (const designation of listDesignations(family)) {
    const p = parseThread(designation);
    if (p.ok) list.push({designation, nominal: p.value.nominal, pitch: p.value.pitch});
  }
  SERIES_CACHE.set(family, list);
  return list;
}

/** ISO 898-2 regular-nut classes, lowest first. */
const ISO_NUT_CLASSES = [5, 6, 8, 9, 10, 12];

/**
 * Nut class for a bolt grade: ISO 898-1 class N.M takes the lowest ISO 898-2 nut
 * class of at least N (a class-N nut serves bolts up to N.8; from memory); SAE
 * J429 grade 5 or 8 takes the SAE J995 nut of the same grade. Undefined otherwise.
 */
function nutClassFor(boltGrade: string, spec: ThreadSpec): string | undefined {
  const g = boltGrade.trim().toUpperCase();
  const iso = /^(\d{1,2})\.\d$/.exec(g);
  let id: string | undefined;
  if (iso) {
    const n = Number(iso[1]);
    const c = ISO_NUT_CLASSES.find(k => k >= n);
    id = c === undefined ? undefined : String(c);
  } else if (/^SAE-(5|8)$/.test(g)) {
    id = g;
  }
  return id !== undefined && nutClass(id, spec.nominal) ? id : undefined;
}

const GEOMETRY_CACHE = new Map<string, ThreadGeometry>();

/** Geometry of a designation, remembered (the receiving threads repeat on every keystroke). */
function geometryOf(designation: string): ThreadGeometry {
  let g = GEOMETRY_CACHE.get(designation);
  if (!g) {
    g = resolveGeometry(designation);
    if (GEOMETRY_CACHE.size > 500) GEOMETRY_CACHE.clear();
    GEOMETRY_CACHE.set(designation, g);
  }
  return g;
}

/** checkJoint with the materials resolved for the input's own thread and the geometry of `designation`. */
function checkWithThread(input: JointInput, designation: string): CheckResult {
  const resolved = resolveJoint(input);
  const geometry = geometryOf(designation);
  return checkResolved({...input, thread: designation}, {...resolved, geometry});
}

/** The real dependencies; `solidTable` defaults to the shipped demo table. */
export function defaultDeps(solidTable: SolidInsertTable = DEMO_SOLID_INSERTS): RepairDeps {
  return {
    check: checkJoint,
    checkWithThread,
    seriesAbove: spec => seriesOf(spec.family).filter(s => s.nominal > spec.nominal + 1e-9),
    nutDimensions: spec => {
      const n = nutDimensions(spec.nominal);
      return n ? {m: n.heightMin, s: n.flats} : undefined;
    },
    nutClassFor,
    solidTable,
  };
}

/**
 * Ranked repair options for a joint and the state of its hole (mm, N, N·m).
 * `repair` may be a draft (defaults applied); `solidTable` is the user's solid
 * key-locked insert table (default: the shipped demo table); `units` is the
 * unit system of the reasons and notes only (numbers stay mm, N, N·m; JSON
 * output keeps 'si'). Throws the
 * mechanics core's JointInputError when the joint itself cannot be computed.
 */
export function planRepairs(
  joint: JointInput,
  repair: RepairInput | RepairInputDraft = {},
  solidTable: SolidInsertTable = DEMO_SOLID_INSERTS,
  units: UnitSystem = 'si',
): RepairPlan {
  const r = RepairInputSchema.parse(repair);
  return planRepairsWith(defaultDeps(solidTable), joint, r, units);
}
