/**
 * The one field table: the rows of every input (joint, hole state, power
 * screw), their accepted range and default read from the zod schemas through
 * `z.toJSONSchema` (no zod internals), and the texts built from them (ranges,
 * messages naming the field and the option). The CLI options, the workbench
 * fields and the resolver's errors are all generated from here.
 */
import * as z from 'zod';
import {JointInputSchema} from '../core/joint/input.js';
import {RepairInputSchema} from '../core/repair/input.js';
import {ScrewInputSchema} from '../core/screw/input.js';
import {displayUnit, toDisplay, type Dimension, type UnitSystem} from '../core/units.js';
import type {Bounds, FieldError, FieldRow, InputGroup} from './fields-types.js';
import {JOINT_ROWS} from './joint-fields.js';
import {HOLE_ROWS} from './hole-fields.js';
import {SCREW_ROWS} from './screw-fields.js';

/** Every row: the joint, then the hole state, then the power screw. */
export const ALL_ROWS: readonly FieldRow[] = [...JOINT_ROWS, ...HOLE_ROWS, ...SCREW_ROWS];

/** The workbench field id of a row: the joint's key, "hole.<key>" or "screw.<key>". */
export function fieldId(row: Pick<FieldRow, 'group' | 'key'>): string {
  return row.group === 'joint' ? row.key : `${row.group}.${row.key}`;
}

const byId = new Map(ALL_ROWS.map(r => [fieldId(r), r]));

/** The row of a workbench field id ("engagement", "hole.wall", "screw.load"). */
export function rowById(id: string): FieldRow | undefined {
  return byId.get(id);
}

/** The row of a schema key in a group. */
export function rowOf(group: InputGroup, key: string): FieldRow | undefined {
  return byId.get(fieldId({group, key}));
}

export const SCHEMAS = {joint: JointInputSchema, hole: RepairInputSchema, screw: ScrewInputSchema} as const;

interface JsonSchemaNode {
  type?: string;
  maxLength?: number;
  minimum?: number;
  maximum?: number;
  default?: unknown;
  properties?: Record<string, JsonSchemaNode>;
  anyOf?: JsonSchemaNode[];
}

/** min, max and default of one property of a JSON Schema; a friction range reads its `min` member. */
function boundsOfNode(n: JsonSchemaNode | undefined): Bounds {
  if (!n) return {};
  const out: Bounds = {};
  if (n.default !== undefined) out.default = n.default;
  const num = n.type === 'number' || n.type === 'integer' ? n : n.properties?.min ?? n.anyOf?.find(a => a.type === 'number' || a.type === 'integer');
  if (num?.minimum !== undefined) out.min = num.minimum;
  if (num?.maximum !== undefined) out.max = num.maximum;
  return out;
}

let boundsCache: Map<string, Bounds> | undefined;

/** Accepted range and default of an input in working units, from its schema (`z.toJSONSchema`, input side). */
export function boundsOf(group: InputGroup, key: string): Bounds {
  if (!boundsCache) {
    boundsCache = new Map();
    for (const g of Object.keys(SCHEMAS) as InputGroup[]) {
      const js = z.toJSONSchema(SCHEMAS[g], {io: 'input', unrepresentable: 'any'}) as JsonSchemaNode;
      const walk = (props: Record<string, JsonSchemaNode> | undefined, prefix: string): void => {
        for (const [k, node] of Object.entries(props ?? {})) {
          boundsCache?.set(fieldId({group: g, key: `${prefix}${k}`}), boundsOfNode(node));
          // An optional object (measured, service): its members by dotted key.
          const obj = node.type === 'object' ? node : node.anyOf?.find(a => a.type === 'object');
          if (obj?.properties && !obj.properties.min) walk(obj.properties, `${prefix}${k}.`);
        }
      };
      walk(js.properties, '');
    }
  }
  return boundsCache.get(fieldId({group, key})) ?? {};
}

/** Longest text a string property of an object schema accepts (e.g. the work-order notes), from `z.toJSONSchema`. */
export function textLimit(schema: z.ZodType, key: string): number | undefined {
  const js = z.toJSONSchema(schema, {io: 'input', unrepresentable: 'any'}) as JsonSchemaNode;
  return js.properties?.[key]?.maxLength;
}

/** Unit of a bare number on the command line, by dimension (the workbench reads the unit shown beside the field). */
const OPTION_BARE: Record<Exclude<Dimension, 'ratio'>, {si: string; us: string}> = {
  length: {si: 'mm', us: 'in'},
  force: {si: 'N', us: 'lbf'},
  torque: {si: 'Nm', us: 'ft-lbf'},
  stress: {si: 'MPa', us: 'ksi'},
  speed: {si: 'm/s', us: 'ft/min'},
};

/** Unit of a bare number for a row's option in a unit system ("mm", "in", "N", "lbf"). */
export function bareUnit(row: FieldRow, units: UnitSystem): string | undefined {
  if (row.bare) return row.bare[units];
  if (!row.dimension || row.dimension === 'ratio') return undefined;
  return OPTION_BARE[row.dimension][units];
}

/** A number without trailing zeros, to 5 significant figures ("12", "0.472"). */
export function plain(x: number): string {
  return String(Number(x.toPrecision(5)));
}

/** The accepted range in display units, e.g. "0.5 to 1000 mm" (the workbench's and most commands' wording). */
export function rangeText(row: FieldRow, units: UnitSystem, ascii = false): string {
  const b = boundsOf(row.group, row.key);
  if (b.min === undefined && b.max === undefined) return '';
  const dim: Dimension | undefined = row.dimension;
  const show = (x: number) => plain(dim ? toDisplay(x, dim, units) : x);
  const unit = dim && dim !== 'ratio' ? displayUnit(dim, units, ascii) : '';
  const lo = b.min !== undefined ? show(b.min) : undefined;
  const hi = b.max !== undefined ? show(b.max) : undefined;
  const span = lo !== undefined && hi !== undefined ? `${lo} to ${hi}` : lo !== undefined ? `at least ${lo}` : `at most ${hi}`;
  return unit ? `${span} ${unit}` : span;
}

/**
 * The accepted range as the command line prints it: the row's own words when it
 * has them (in SI), else generated. The joint's options name the unit on both
 * ends ("0.5 mm to 1000 mm"), as `check` always has.
 */
export function optionRangeText(row: FieldRow, units: UnitSystem): string {
  const suffix = row.cli?.rangeSuffix ?? '';
  if (row.cli?.rangeText && (units === 'si' || !row.dimension || row.dimension === 'ratio')) return row.cli.rangeText + suffix;
  if (row.group !== 'joint' || !row.dimension || row.dimension === 'ratio') return rangeText(row, units, true) + suffix;
  const b = boundsOf(row.group, row.key);
  const f = (v: number) => `${Number(toDisplay(v, row.dimension!, units).toPrecision(4))} ${displayUnit(row.dimension!, units)}`;
  return `${b.min !== undefined ? f(b.min) : '?'} to ${b.max !== undefined ? f(b.max) : '?'}${suffix}`;
}

/** Keys that no single option sets. */
const OTHER_OPTIONS: Record<string, string> = {internal: '--parent or --nut', tightening: '--torque, --preload or --utilisation', parentData: '--parent'};

/** A FieldError for a key of a group, with the accepted range of its row in `units`. */
export function fieldError(group: InputGroup, key: string, message: string, source: FieldError['source'], units: UnitSystem = 'si', ascii = true): FieldError {
  const row = rowOf(group, key);
  const out: FieldError = {group, key, field: fieldId({group, key}), option: row?.cli?.name ?? OTHER_OPTIONS[key] ?? `--${key}`, label: row?.label ?? key, message, source};
  if (row && source !== 'core') {
    const accepted = rangeText(row, units, ascii);
    if (accepted) out.accepted = accepted;
    const optionAccepted = row.cli ? optionRangeText(row, units) : rangeText(row, units, true);
    if (optionAccepted) out.optionAccepted = optionAccepted;
    if (source === 'needed' && row.example) out.example = row.example;
  }
  return out;
}

/** "X is needed", "X needs ..."; otherwise "X: message". */
function labelled(name: string, message: string): string {
  return /^(is|are|needs|must|or) /.test(message) ? `${name} ${message}` : `${name}: ${message}`;
}

/** Whether a core message already starts with its option ("--clamp: entry 1 ...", "--bolt-length 20 mm ..."). */
const namesOption = (e: FieldError) => e.message.startsWith(`${e.option}:`) || e.message.startsWith(`${e.option} `);

/** The message for the command line: "--engage is needed, e.g. --engage 15mm; accepted: 0.5 mm to 1000 mm". */
export function optionMessage(e: FieldError): string {
  const example = e.example ? `, e.g. ${e.option} ${e.example}` : '';
  const accepted = e.optionAccepted && e.source !== 'core' ? `; accepted: ${e.optionAccepted}` : '';
  return namesOption(e) ? `${e.message}${example}${accepted}` : labelled(e.option, `${e.message}${example}${accepted}`);
}

/** The message for the workbench: "Engaged length is needed; accepted 0.5 to 1000 mm". */
export function labelMessage(e: FieldError): string {
  if (e.source === 'core' && namesOption(e)) return `${e.label}: ${e.message.slice(e.option.length).replace(/^:?\s*/, '')}`;
  if (e.source === 'core') return e.message.toLowerCase().startsWith(e.label.toLowerCase()) ? e.message : `${e.label}: ${e.message}`;
  const msg = e.source === 'schema' ? e.message.toLowerCase() : e.message;
  return labelled(e.label, `${msg}${e.accepted ? `; accepted ${e.accepted}` : ''}`);
}
