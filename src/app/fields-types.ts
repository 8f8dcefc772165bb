/**
 * The shape of one row of the field table (src/app/*-fields.ts): everything the
 * CLI, the workbench and the resolver need to know about one input. An input is
 * added by adding a key to its zod schema and one row here; the CLI options and
 * their --help lines, the workbench fields and the error-to-field mapping follow.
 */
import type {JointInputDraft} from '../core/joint/input.js';
import type {RepairInputDraft} from '../core/repair/input.js';
import type {ScrewInputDraft} from '../core/screw/input.js';
import type {Dimension, UnitSystem} from '../core/units.js';
import type {Notes} from '../store/schema.js';

/** Which input a row belongs to: the joint, the hole state (repair planner) or the power screw. */
export type InputGroup = 'joint' | 'hole' | 'screw';

export type RepairDraft = Partial<RepairInputDraft>;

/** The values a user has typed, by input (the workbench's form; the CLI builds the same). */
export interface FormValues {
  joint: Partial<JointInputDraft>;
  hole: RepairDraft;
  /** Power-screw inputs (the workbench's power-screw mode). */
  screw?: Partial<ScrewInputDraft>;
  /** The preset's work-order notes (asset tag, location, work order, free text); not an input of any check. */
  notes?: Notes;
}

export type StepId = 'thread' | 'parts' | 'engagement' | 'tightening' | 'hole' | 'measured' | 'service' | 'screw-thread' | 'screw-nut' | 'screw-friction';
export type FieldKind = 'quantity' | 'ratio' | 'range' | 'choice' | 'pick' | 'thread' | 'bool' | 'text';
export type PickSource =
  | 'boltGrade' | 'parent' | 'nutClass' | 'screwThreadFriction' | 'screwCollarFriction'
  | 'fastenerLubricant' | 'lockingElement' | 'fastenerThreadFriction' | 'fastenerHeadFriction';

/** What a CLI option's text sets, for options whose text is more than a number or a word. */
export type OptionReader = (
  text: string,
  ctx: {option: string; units: UnitSystem; row: FieldRow; quantity: (text: string) => number; range: (text: string) => {min: number; max: number}; other?: (name: string) => string | undefined},
) => Record<string, unknown>;

export interface CliOption {
  /** The option, e.g. "--engage". */
  name: string;
  /** The placeholder in --help, e.g. "LEN"; absent for a flag without a value. */
  arg?: string;
  /** --help text (wrapped to 80 columns by the generator). */
  help: string;
  /** A flag (no value) sets the field to this value. */
  flag?: unknown;
  /** Own reading of the text (picks, "all", ...); the default reads the row's kind. */
  read?: OptionReader;
  /** Accepted range as printed in messages, when the generated one is not the right words. */
  rangeText?: string;
  /** Words after the generated range in messages (', or "all"'). */
  rangeSuffix?: string;
}

/**
 * The workbench's own reading and showing of a field whose value is not one number or
 * word (a list of parts, MIN..MAX forces, "auto"): `parse` gets the typed text (a bare
 * number in the unit shown beside the field), `format` the stored value in working units.
 */
export interface FieldText {
  parse: (text: string, units: UnitSystem) => {ok: true; value: unknown} | {ok: false; error: string};
  format: (value: unknown, units: UnitSystem, ascii: boolean) => string;
}

export interface FieldRow {
  group: InputGroup;
  /** Key in the group's zod schema (JointInput, RepairInput, ScrewInput). */
  key: string;
  /** CLI option, if the input has one on the command line. */
  cli?: CliOption;
  /** Workbench label; also names the field in messages. */
  label: string;
  /** Workbench step; absent for a CLI-only input. */
  step?: StepId;
  kind: FieldKind;
  dimension?: Dimension;
  /** Unit of a bare number in the CLI, SI and US; default by dimension (mm/in, N/lbf, Nm/ft-lbf, MPa/ksi, m/s / ft/min). */
  bare?: {si: string; us: string};
  choices?: readonly string[];
  pick?: PickSource;
  /** A published table whose rows can be picked for this number field (t on the field). */
  table?: PickSource;
  /** Other inputs this one sets when chosen in the workbench (a lubricant sets both friction ranges); keys of the same group. */
  sets?: (value: unknown) => Record<string, unknown>;
  /** May be left empty (the core then uses its default or leaves it out). */
  optional: boolean;
  /** Whole numbers only (shown without decimals). */
  integer?: boolean;
  /** Significant figures the workbench shows (default 3); a measured diameter shows 4. */
  significant?: number;
  /** What applies when the field is empty, shown in its place ("from grade"); a needed field may have one when the resolver fills it (a nut's engaged length). */
  empty?: string;
  /** The workbench's own text of the field, when the kind's is not right (see FieldText). */
  text?: FieldText;
  /** One line shown under the fields in the workbench when this one is selected. */
  help: string;
  /** An example value for the "is needed" message ("15mm"). */
  example?: string;
  /** Whether the input applies to the values (nut fields only for a nut, ...); absent: always. */
  isVisible?: (v: FormValues) => boolean;
}

/** Accepted range and default of an input in working units, read from its zod schema. */
export interface Bounds {
  min?: number;
  max?: number;
  /** The schema's default, applied when the field is empty. */
  default?: unknown;
}

/** One input at fault, named for every face. */
export interface FieldError {
  group: InputGroup;
  /** Schema key ("engagement"). */
  key: string;
  /** Workbench field id ("engagement", "hole.wall", "screw.load"). */
  field: string;
  /** CLI option ("--engage"), or the nearest words when no single option sets it. */
  option: string;
  label: string;
  /** The problem without the name in front: "is needed", "Too small: ...", "unknown parent material ...". */
  message: string;
  /** Where the message comes from: a missing input, the schema, or the core's check of the values together. */
  source: 'needed' | 'schema' | 'core';
  /** An example value for a missing input ("15mm"). */
  example?: string;
  /** The accepted range in the workbench's words ("0.5 to 1000 mm"). */
  accepted?: string;
  /** The accepted range in the command line's words ("0.5 mm to 1000 mm"). */
  optionAccepted?: string;
}
