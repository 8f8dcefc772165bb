/**
 * Work-order fields of `tapwright check --format markdown`: the preset's notes (with --preset),
 * overridden field by field by --asset, --location, --work-order and --note (the names and
 * meanings of `tapwright presets save`). Validated by the store's NotesSchema, the one source
 * of the accepted lengths.
 */
import {textLimit} from '../../app/field-table.js';
import {UsageError} from '../io.js';
import {str, type OptionSpec, type ParsedOptions} from '../args.js';
import type {WorkOrderNotes} from '../../report/index.js';

/** The options and the notes field each one sets. */
export const NOTE_OPTIONS: Record<string, keyof WorkOrderNotes> = {
  '--asset': 'asset',
  '--location': 'location',
  '--work-order': 'workOrder',
  '--note': 'text',
};

/** --help lines of the work-order options, the same for check and screw. */
export const NOTE_OPTIONS_HELP = `Work order, for text and markdown (default: the notes of the --preset)
  --asset TEXT         asset tag of the machine
  --location TEXT      where it is
  --work-order TEXT    work-order number
  --note TEXT          free text under the work-order fields
                       each replaces the preset's entry; empty clears it`;

export const NOTE_OPTION_SPEC: OptionSpec = Object.fromEntries(Object.keys(NOTE_OPTIONS).map(o => [o.slice(2), {type: 'string'}]));

/** The note options given on the command line, e.g. ['--asset']. */
export function noteOptionsGiven(values: ParsedOptions['values']): string[] {
  return Object.keys(NOTE_OPTIONS).filter(o => str(values, o.slice(2)) !== undefined);
}

/**
 * The work-order notes for the report: `base` (the preset's notes) with each given option
 * replacing its field; an empty value clears the field. A value over the accepted length is
 * a UsageError naming the option.
 */
export async function workOrderNotes(values: ParsedOptions['values'], base: WorkOrderNotes | undefined): Promise<WorkOrderNotes> {
  const notes: WorkOrderNotes = {...(base ?? {})};
  const given = noteOptionsGiven(values);
  if (given.length === 0) return notes;
  for (const o of given) {
    const v = (str(values, o.slice(2)) ?? '').trim();
    const field = NOTE_OPTIONS[o] as keyof WorkOrderNotes;
    if (v === '') delete notes[field];
    else notes[field] = v;
  }
  const {NotesSchema} = await import('../../store/schema.js');
  for (const o of given) {
    const field = NOTE_OPTIONS[o] as keyof WorkOrderNotes;
    const r = NotesSchema.shape[field].safeParse(notes[field]);
    if (!r.success) {
      const max = textLimit(NotesSchema, field);
      throw new UsageError(`${o} is ${notes[field]?.length ?? 0} characters long; accepted: at most ${max ?? '?'} characters`, o);
    }
  }
  return notes;
}
