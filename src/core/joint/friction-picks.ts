/**
 * Friction picks for fasteners by surface and lubricant, as data for the workbench table
 * and the CLI (`--lubricant ID`). Thread friction muG and under-head friction muK as defined
 * in ISO 16047 (the torque/clamp-force test). The ranges are the friction classes of
 * VDI 2230 Part 1 (friction-class table, room temperature; the same range is given for muG
 * and muK), read in secondary reproductions of the table; the table number in the 2003
 * edition (A5 or near it) is from memory. Where VDI lists a surface under two classes the
 * pick spans both. Dimensionless coefficients. Generic names only.
 */
import type {Provenance} from '../types.js';

/** The VDI 2230 Part 1 friction classes, muG and muK (class E is open-ended: ">= 0.30"). */
export const FRICTION_CLASSES = {
  A: {min: 0.04, max: 0.1},
  B: {min: 0.08, max: 0.16},
  C: {min: 0.14, max: 0.24},
  D: {min: 0.2, max: 0.35},
} as const;

export type FrictionClass = keyof typeof FRICTION_CLASSES;

export interface FastenerFrictionPick {
  /** Pick id for the CLI and presets, kebab-case. */
  id: string;
  /** Surface or coating of the fastener, generic words. */
  surface: string;
  /** Lubricant or condition at assembly. */
  lubricant: string;
  /** VDI 2230 Part 1 friction class(es) the range comes from. */
  classes: FrictionClass[];
  /** Thread friction muG range. */
  thread: {min: number; max: number};
  /** Under-head (bearing face) friction muK range. */
  head: {min: number; max: number};
  provenance: Provenance;
  note?: string;
}

const VDI = (rows: string): Provenance => ({
  source: `VDI 2230 Part 1, friction-class table (classes ${rows}; table number from memory), friction as defined in ISO 16047`,
  kind: 'standard',
});

function span(classes: FrictionClass[]): {min: number; max: number} {
  return {min: Math.min(...classes.map(c => FRICTION_CLASSES[c].min)), max: Math.max(...classes.map(c => FRICTION_CLASSES[c].max))};
}

function pick(id: string, surface: string, lubricant: string, classes: FrictionClass[], provenance: Provenance, note?: string): FastenerFrictionPick {
  const r = span(classes);
  return {id, surface, lubricant, classes, thread: {...r}, head: {...r}, provenance, ...(note !== undefined ? {note} : {})};
}

/** The fastener friction picks, in the order the workbench table lists them. */
export const FASTENER_FRICTION: readonly FastenerFrictionPick[] = [
  pick(
    'black-oxide-dry',
    'black oxide',
    'dry (degreased)',
    ['C', 'D'],
    {source: 'from memory: VDI 2230 Part 1 lists black oxide only with a lubricant; the dry range is taken as classes C-D', kind: 'memory'},
    'Not a row of the VDI table: from memory. Measure it (ISO 16047) where the joint matters.',
  ),
  pick('black-oxide-oiled', 'black oxide', 'oiled', ['B'], VDI('B: black oxide with oils')),
  pick('zinc-plated-dry', 'electroplated zinc', 'none (dry)', ['C', 'D'], VDI('C and D: electroplated Zn without lubricant')),
  pick('phosphate-oiled', 'phosphated', 'oiled', ['B'], VDI('B: phosphated with oils')),
  pick('mos2-paste', 'any steel surface', 'MoS2 paste', ['A'], VDI('A: solid lubricants (MoS2) in pastes'), 'On hot-dip galvanized or austenitic steel VDI puts solid lubricants in class B (0.08-0.16).'),
  pick('anti-seize-paste', 'any steel surface', 'anti-seize paste (solid-lubricant paste)', ['A', 'B'], VDI('A and B: solid lubricants in pastes, greases')),
  pick('thread-locking-adhesive', 'bright, phosphated or zinc', 'thread-locking adhesive (wet)', ['C'], VDI('C: adhesive')),
];

/** The pick with this id ("zinc-plated-dry"), or undefined. Dimensionless. */
export function fastenerFrictionPick(id: string): FastenerFrictionPick | undefined {
  const key = id.trim().toLowerCase().replace(/[\s_]+/g, '-');
  return FASTENER_FRICTION.find(p => p.id === key);
}

/** The accepted ids, for a bad-input message naming the option and what it takes. */
export function fastenerFrictionIds(): string[] {
  return FASTENER_FRICTION.map(p => p.id);
}

/**
 * The friction inputs of a pick, ready for JointInput (muThread, muHead). Dimensionless;
 * source VDI 2230 Part 1 friction classes (see the pick's provenance).
 */
export function frictionFromPick(p: FastenerFrictionPick): {muThread: {min: number; max: number}; muHead: {min: number; max: number}} {
  return {muThread: {...p.thread}, muHead: {...p.head}};
}
