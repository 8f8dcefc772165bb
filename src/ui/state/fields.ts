/**
 * The workbench's fields: a projection of the one field table (src/app/*-fields.ts)
 * onto the form, with the steps that group them. Ranges and defaults come from
 * the zod schemas through src/app/field-table.ts; nothing about an input is
 * written here. Values are held in working units (mm, N, N·m, MPa); only the
 * display converts.
 */
import {getPath, setPath} from '../../app/key-path.js';
import type {JointInputDraft} from '../../core/joint/input.js';
import type {RepairInput} from '../../core/repair/input.js';
import type {ScrewInputDraft} from '../../core/screw/input.js';
import {ALL_ROWS, boundsOf, fieldId, rowById} from '../../app/field-table.js';
import type {Bounds, FieldKind, FieldRow, FormValues, PickSource, RepairDraft, StepId} from '../../app/fields-types.js';

export type {Bounds, FieldKind, FormValues, PickSource, RepairDraft, StepId};

/** What the workbench works on: a threaded joint, or a power screw (lead screw and nut). */
export type Mode = 'joint' | 'screw';

export const STEPS: readonly {id: StepId; title: string}[] = [
  {id: 'thread', title: 'Thread'},
  {id: 'parts', title: 'Parts'},
  {id: 'engagement', title: 'Engagement'},
  {id: 'tightening', title: 'Tightening'},
  // The service state (issue 16) after tightening; what was measured, then the hole state for the repair planner last.
  {id: 'service', title: 'Service'},
  {id: 'measured', title: 'Measured'},
  {id: 'hole', title: 'Hole state'},
];

export const SCREW_STEPS: readonly {id: StepId; title: string}[] = [
  {id: 'screw-thread', title: 'Screw'},
  {id: 'screw-nut', title: 'Nut and load'},
  {id: 'screw-friction', title: 'Friction'},
];

export const stepsFor = (mode: Mode) => (mode === 'screw' ? SCREW_STEPS : STEPS);

/** A field of the form: its row of the field table, under its workbench id. */
export interface FieldDef extends Omit<FieldRow, 'step' | 'cli'> {
  /** Key in FormValues.joint, or "hole.<key>" / "screw.<key>". */
  id: string;
  step: StepId;
  /** The row of the field table (option, schema key, ...). */
  row: FieldRow;
}

/** Every input with a workbench step, in the order of the table. */
export const FIELDS: readonly FieldDef[] = ALL_ROWS.flatMap(row => {
  if (!row.step) return [];
  const {cli: _cli, ...rest} = row;
  return [{...rest, id: fieldId(row), step: row.step, row}];
});

/** Fields of a step that apply to the current values (nut fields only for a nut, ...). */
export function visibleFields(step: StepId, v: FormValues): FieldDef[] {
  return FIELDS.filter(f => f.step === step && (f.isVisible ? f.isVisible(v) : true));
}

export function fieldById(id: string): FieldDef {
  const f = FIELDS.find(x => x.id === id);
  if (!f) throw new Error(`no field ${id}`);
  return f;
}

export function getValue(v: FormValues, id: string): unknown {
  if (id.startsWith('hole.')) return getPath(v.hole, id.slice(5));
  if (id.startsWith('screw.')) return getPath(v.screw ?? {}, id.slice(6));
  return getPath(v.joint, id);
}

/** A copy of the values with field `id` set (undefined clears it); a dotted id sets a member of an object ("measured.holeMinorDiameter"). */
export function setValue(v: FormValues, id: string, value: unknown): FormValues {
  if (id.startsWith('screw.')) return {...v, screw: setPath(v.screw ?? {}, id.slice(6), value) as Partial<ScrewInputDraft>};
  if (id.startsWith('hole.')) return {...v, hole: setPath(v.hole, id.slice(5), value) as RepairDraft};
  return {...v, joint: setPath(v.joint, id, value) as Partial<JointInputDraft>};
}

/** Accepted range and default of a field in working units, read from the zod schema (src/app/field-table.ts). */
export function fieldBounds(id: string): Bounds {
  const row = rowById(id);
  return row ? boundsOf(row.group, row.key) : {};
}

export type {RepairInput};
