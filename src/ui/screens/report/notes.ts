/**
 * The preset's work-order notes (asset tag, location, work order, free text):
 * edited one after another in the text prompt from the Report screen. The
 * accepted lengths are read from the store's notes schema, the single source
 * of truth; the values live in FormValues.notes, so they mark the preset as
 * changed, go into the draft and are saved with the preset.
 */
import {textLimit} from '../../../app/field-table.js';
import {NotesSchema, type Notes} from '../../../store/schema.js';
import type {FormValues} from '../../state/fields.js';
import {fail, info, type WorkbenchState} from '../../state/workbench.js';

export type NoteKey = keyof Notes;

export interface NoteField {
  key: NoteKey;
  label: string;
  /** Longest accepted text, characters (from NotesSchema). */
  max: number;
}

function maxOf(key: NoteKey): number {
  return textLimit(NotesSchema, key) ?? 200;
}

export const NOTE_FIELDS: readonly NoteField[] = [
  {key: 'asset', label: 'Asset tag', max: maxOf('asset')},
  {key: 'location', label: 'Location', max: maxOf('location')},
  {key: 'workOrder', label: 'Work-order number', max: maxOf('workOrder')},
  {key: 'text', label: 'Notes text', max: maxOf('text')},
];

/** Characters a note prompt takes beyond its limit, so an overlong paste is seen and refused, not cut silently. */
export const NOTE_OVERRUN = 20;

const fieldOf = (key: NoteKey): NoteField => NOTE_FIELDS.find(f => f.key === key)!;

/** The notes trimmed, empty entries left out, in the schema's key order. */
export function canonicalNotes(n: Notes | undefined): Notes {
  const out: Notes = {};
  for (const f of NOTE_FIELDS) {
    const v = n?.[f.key]?.trim();
    if (v) out[f.key] = v;
  }
  return out;
}

/** Values with new notes; the same object when nothing really changed (so the preset stays unchanged). */
export function withNotes(values: FormValues, notes: Notes | undefined): FormValues {
  const next = canonicalNotes(notes);
  if (JSON.stringify(canonicalNotes(values.notes)) === JSON.stringify(next)) return values;
  return {...values, notes: next};
}

/** The notes as the report shows them now: with the text being typed in a note prompt applied (undefined: none in the values). */
export function shownNotes(s: WorkbenchState): Notes | undefined {
  const p = s.prompt;
  if (p?.kind !== 'note' || !p.note) return s.values.notes && canonicalNotes(s.values.notes);
  return canonicalNotes({...s.values.notes, [p.note]: p.buffer});
}

function promptFor(s: WorkbenchState, key: NoteKey, before: Notes | undefined): WorkbenchState {
  const i = NOTE_FIELDS.findIndex(f => f.key === key);
  const f = NOTE_FIELDS[i]!;
  return {
    ...s,
    prompt: {
      kind: 'note',
      note: key,
      notesBefore: before,
      title: `${f.label} (${i + 1}/${NOTE_FIELDS.length}, up to ${f.max} chars)`,
      buffer: s.values.notes?.[key] ?? '',
    },
  };
}

/**
 * Open the first note prompt. The preview turns to Markdown (the report that
 * carries the notes) and scrolls to its work-order section, found by
 * `scrollTo` in the report text as drawn.
 */
export function startNotes(s: WorkbenchState, scrollTo: (s: WorkbenchState) => number): WorkbenchState {
  const md: WorkbenchState = {...s, report: {format: 'markdown', scroll: 0}};
  return {...promptFor(md, 'asset', s.values.notes), report: {format: 'markdown', scroll: scrollTo(md)}, message: undefined};
}

/** The message for a note longer than the store accepts, or undefined when it fits. */
export function noteLengthError(key: NoteKey, text: string): string | undefined {
  const f = fieldOf(key);
  const ok = NotesSchema.shape[key].safeParse(text.trim());
  if (ok.success) return undefined;
  return `${f.label}: ${text.trim().length} characters is too long; accepted: 0 to ${f.max} characters`;
}

/** Enter in a note prompt: keep the value and go on to the next note, or refuse it with the limit. */
export function acceptNote(s: WorkbenchState): WorkbenchState {
  const p = s.prompt!;
  const key = p.note!;
  const error = noteLengthError(key, p.buffer);
  if (error) return {...s, message: fail(error)};
  const values = withNotes(s.values, {...s.values.notes, [key]: p.buffer});
  const next = {...s, values, message: undefined};
  const i = NOTE_FIELDS.findIndex(f => f.key === key);
  const following = NOTE_FIELDS[i + 1];
  if (following) return promptFor(next, following.key, p.notesBefore);
  const changed = JSON.stringify(canonicalNotes(p.notesBefore)) !== JSON.stringify(canonicalNotes(values.notes));
  return {
    ...next,
    prompt: undefined,
    message: info(changed ? 'Work-order notes kept; s saves them with the preset (a on Presets: save as)' : 'Work-order notes unchanged'),
  };
}

/** Esc in a note prompt: every note back as it was before n. */
export function cancelNotes(s: WorkbenchState): WorkbenchState {
  const before = s.prompt?.notesBefore;
  const values = JSON.stringify(s.values.notes) === JSON.stringify(before) ? s.values : {...s.values, notes: before};
  return {...s, values, prompt: undefined, message: info('Work-order notes left as they were')};
}

/** The note prompt's text changed (typed, erased): past the limit the text is still taken, up to a margin, and the limit is shown. */
export function setNoteBuffer(s: WorkbenchState, buffer: string): WorkbenchState {
  const p = s.prompt!;
  const f = fieldOf(p.note!);
  if (buffer.length > f.max + NOTE_OVERRUN) return {...s, message: fail(`${f.label}: accepted: 0 to ${f.max} characters; Backspace to shorten it`)};
  const error = noteLengthError(f.key, buffer);
  return {...s, prompt: {...p, buffer}, message: error ? fail(error) : undefined};
}
