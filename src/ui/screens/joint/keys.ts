/** The joint screen's keys: one handler per command of its contexts (joint, edit, picker). */
import type {CommandsOf} from '../../keymap.js';
import type {Handler} from '../../state/effects.js';
import {fieldById, setValue} from '../../state/fields.js';
import {currentField, fail, info, pickerItems} from '../../state/workbench.js';
import {saveOpen} from '../../state/save-commands.js';
import {setChosen} from '../../state/chosen.js';
import {bandMiddle} from '../../state/band-middle.js';
import {scrollFlags} from './flag-scroll.js';
import {newJoint} from '../presets/reducer.js';
import {clearField, commitEdit, moveField, moveStep, startEdit, startTablePick, toggleMode, withEditPreview, withPickerPreview} from './reducer.js';

const joint = {
  'field.prev': s => moveField(s, -1),
  'field.next': s => moveField(s, 1),
  'step.prev': s => moveStep(s, -1),
  'step.next': s => moveStep(s, 1),
  'field.edit': (s, _ev, svc) => {
    const f = currentField(s);
    return f ? startEdit(s, f, svc) : s;
  },
  'field.type': (s, ev, svc) => {
    const f = currentField(s);
    return f && (f.kind === 'quantity' || f.kind === 'ratio' || f.kind === 'range') ? startEdit(s, f, svc, ev.char) : s;
  },
  'field.clear': s => clearField(s, currentField(s)),
  'field.table': (s, _ev, svc) => {
    const f = currentField(s);
    return f ? startTablePick(s, f, svc) : s;
  },
  'window.middle': (s, _ev, svc) => bandMiddle(s, svc),
  'mode.toggle': (s, _ev, svc) => toggleMode(s, svc),
  'panel.flags': s => ({...s, showFlags: !s.showFlags, flagScroll: 0}),
  'flags.pageUp': (s, _ev, svc) => scrollFlags(s, svc, -1),
  'flags.pageDown': (s, _ev, svc) => scrollFlags(s, svc, 1),
  'preset.save': s => saveOpen(s),
  'preset.new': s => newJoint(s),
} satisfies Record<CommandsOf<'joint'>, Handler>;

const typed = (s: Parameters<Handler>[0], buffer: string) => withEditPreview({...s, edit: {...s.edit!, buffer}});
const commitAndMove = (delta: number): Handler => s => {
  const c = commitEdit(s);
  return c.edit ? c : moveField(c, delta);
};

const edit = {
  'edit.commit': s => commitEdit(s),
  'edit.cancel': s => ({...s, edit: undefined, preview: undefined, message: info('Kept the old value')}),
  'edit.erase': s => typed(s, Array.from(s.edit!.buffer).slice(0, -1).join('')),
  'edit.clear': s => typed(s, ''),
  'edit.commitPrev': commitAndMove(-1),
  'edit.commitNext': commitAndMove(1),
  'edit.insert': (s, ev) => (s.edit!.buffer.length >= 60 ? s : typed(s, s.edit!.buffer + (ev.char ?? ''))),
} satisfies Record<CommandsOf<'edit'>, Handler>;

const movePick = (d: number): Handler => (s, _ev, svc) => {
  const n = pickerItems(s, svc).length;
  const lo = fieldById(s.picker!.fieldId).kind === 'thread' ? -1 : 0;
  const index = Math.max(lo, Math.min(n - 1, s.picker!.index + d));
  return withPickerPreview({...s, picker: {...s.picker!, index}}, svc);
};
const filterPick = (change: (filter: string, char: string) => string): Handler => (s, ev, svc) => {
  const p = s.picker!;
  const isThread = fieldById(p.fieldId).kind === 'thread';
  return withPickerPreview({...s, picker: {...p, filter: change(p.filter, ev.char ?? '').slice(0, 60), index: isThread ? -1 : 0}}, svc);
};

const picker = {
  'pick.up': movePick(-1),
  'pick.down': movePick(1),
  'pick.type': filterPick((f, ch) => f + ch),
  'pick.erase': filterPick(f => Array.from(f).slice(0, -1).join('')),
  'pick.clear': filterPick(() => ''),
  'pick.take': (s, _ev, svc) => {
    const p = s.picker!;
    const field = fieldById(p.fieldId);
    const items = pickerItems(s, svc);
    const marked = p.index >= 0 ? items[p.index] : undefined;
    const value = marked ? (marked.item?.value ?? marked.value) : p.filter.trim();
    if (value === undefined || value === '') return {...s, message: fail(`${field.label}: nothing matches "${p.filter}"; Backspace to widen, Esc to keep the old value`)};
    return {...s, values: setChosen(s.values, field.id, value), picker: undefined, preview: undefined, message: undefined};
  },
  'pick.cancel': s => ({...s, picker: undefined, preview: undefined, message: info('Kept the old value')}),
} satisfies Record<CommandsOf<'picker'>, Handler>;

export const JOINT_KEYS = {joint, edit, picker};
