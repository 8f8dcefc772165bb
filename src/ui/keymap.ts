/**
 * Every key of the workbench, as data: the handler looks commands up here, the
 * hint line shows the bindings of the current context, and the help screen is
 * generated from this table, so the three can never disagree.
 */
import type {KeyEvent, KeyName} from './keys.js';

/** The screens, in tab order: each has a folder in screens/, a registry row, a `go.` key and its own context. */
export const SCREEN_IDS = ['joint', 'repairs', 'presets', 'report', 'help'] as const;
export type Screen = (typeof SCREEN_IDS)[number];

/** Overlays that take the keys while open (a value being typed, a list, a question). */
export type Overlay = 'edit' | 'picker' | 'prompt' | 'confirm' | 'unsaved' | 'draft';

export type Context = 'any' | 'screens' | Screen | Overlay;

/** Conditions the hint line can check (worked out from the state by the app). */
export type HintCondition = 'field-has-table' | 'window-open';

export interface KeySpec {
  name: KeyName;
  char?: string;
  ctrl?: boolean;
  shift?: boolean;
  /** A class of characters instead of one: digits and the decimal point. */
  digits?: boolean;
  /** Any printable character. */
  printable?: boolean;
}

export interface Binding {
  command: string;
  keys: readonly KeySpec[];
  context: Context;
  /** Short word for the hint line; no hint when absent. */
  hint?: string;
  /** Shown on the hint line only when this holds for the field under the cursor. */
  hintWhen?: HintCondition;
  description: string;
}

const c = (char: string, extra: Partial<KeySpec> = {}): KeySpec => ({name: 'char', char, ...extra});
const k = (name: KeyName, extra: Partial<KeySpec> = {}): KeySpec => ({name, ...extra});

export const CONTEXT_TITLES: Record<Context, string> = {
  any: 'Everywhere',
  screens: 'On every screen (not while typing)',
  joint: 'Joint screen',
  edit: 'Typing a value',
  picker: 'Choosing from a list',
  presets: 'Presets screen',
  report: 'Report screen',
  repairs: 'Repairs screen',
  help: 'Help screen',
  prompt: 'Typing a name, file path or note',
  confirm: 'A yes/no question',
  unsaved: 'Loading another preset over unsaved edits',
  draft: 'Start-up: unsaved draft found',
};

export const KEYMAP = [
  {command: 'app.interrupt', keys: [c('c', {ctrl: true})], context: 'any', description: 'Quit at once; unsaved edits are kept as a draft'},
  {command: 'app.quit', keys: [c('q')], context: 'screens', hint: 'quit', description: 'Quit; unsaved edits are kept as a draft for the next start'},
  {command: 'go.joint', keys: [c('j')], context: 'screens', description: 'Joint screen: inputs and live results'},
  {command: 'go.repairs', keys: [c('r')], context: 'screens', description: 'Repairs screen: ranked fixes for this hole'},
  {command: 'go.presets', keys: [c('p')], context: 'screens', description: 'Presets screen: load, save, rename, import, export'},
  {command: 'go.report', keys: [c('w')], context: 'screens', description: 'Report screen: preview and write the work-order report'},
  {command: 'go.help', keys: [c('?'), c('h')], context: 'screens', description: 'This help'},
  {command: 'units.toggle', keys: [c('u')], context: 'screens', description: 'Switch units between SI and US customary (the key is shown in the header, beside the units)'},

  {command: 'field.prev', keys: [k('up')], context: 'joint', hint: 'field', description: 'Previous field'},
  {command: 'field.next', keys: [k('down')], context: 'joint', description: 'Next field'},
  {command: 'step.prev', keys: [k('left'), k('tab', {shift: true})], context: 'joint', hint: 'step', description: 'Previous step'},
  {command: 'step.next', keys: [k('right'), k('tab')], context: 'joint', description: 'Next step (Thread, Parts, Engagement, Tightening, Service, Hole state)'},
  {command: 'field.edit', keys: [k('enter')], context: 'joint', hint: 'edit', description: 'Edit the field; on a choice, switch to the next choice'},
  {command: 'field.type', keys: [{name: 'char', digits: true}], context: 'joint', description: 'On a number field: start typing a new value at once'},
  {command: 'field.clear', keys: [k('backspace')], context: 'joint', description: 'Empty an optional field (its default applies)'},
  {command: 'field.table', keys: [c('t')], context: 'joint', hint: 'table', hintWhen: 'field-has-table', description: 'On a friction field (joint or power screw): pick a row of the published friction table'},
  {command: 'window.middle', keys: [c('b')], context: 'joint', hint: 'band middle', hintWhen: 'window-open', description: "On the Tightening step: set the torque to the middle of the tightening window's band (tightening switches to torque)"},
  {command: 'mode.toggle', keys: [c('m')], context: 'joint', hint: 'joint/screw', description: 'Switch between a threaded joint and a power screw (lead screw and nut)'},
  {command: 'panel.flags', keys: [c('f')], context: 'joint', hint: 'flags', description: 'Show all flags in full / back to the results'},
  {command: 'flags.pageUp', keys: [k('pageup')], context: 'joint', description: 'In the full flag view (f): scroll the flags up a page'},
  {command: 'flags.pageDown', keys: [k('pagedown'), c(' ')], context: 'joint', description: 'In the full flag view (f): scroll the flags down a page (every flag can be read whole)'},
  {command: 'preset.new', keys: [c('N')], context: 'joint', description: 'Start a new blank joint (asks first about unsaved edits, as loading a preset does)'},
  {command: 'preset.save', keys: [c('s')], context: 'joint', hint: 'save', description: 'Save into the current preset (a shipped demo asks for a new name)'},

  {command: 'edit.commit', keys: [k('enter')], context: 'edit', hint: 'keep', description: 'Keep the typed value'},
  {command: 'edit.cancel', keys: [k('escape')], context: 'edit', hint: 'undo', description: 'Put the old value back'},
  {command: 'edit.erase', keys: [k('backspace')], context: 'edit', hint: 'erase', description: 'Erase the last character'},
  {command: 'edit.clear', keys: [c('u', {ctrl: true})], context: 'edit', description: 'Erase the whole value'},
  {command: 'edit.commitPrev', keys: [k('up')], context: 'edit', description: 'Keep the value and go to the previous field'},
  {command: 'edit.commitNext', keys: [k('down'), k('tab')], context: 'edit', description: 'Keep the value and go to the next field'},
  {command: 'edit.insert', keys: [{name: 'char', printable: true}], context: 'edit', description: 'Type; a unit may follow the number (12mm, 0.5in, 40Nm)'},

  {command: 'pick.up', keys: [k('up')], context: 'picker', hint: 'choose', description: 'Previous entry'},
  {command: 'pick.down', keys: [k('down')], context: 'picker', description: 'Next entry'},
  {command: 'pick.take', keys: [k('enter')], context: 'picker', hint: 'take', description: 'Take the marked entry (or, for a thread, the text as typed)'},
  {command: 'pick.cancel', keys: [k('escape')], context: 'picker', hint: 'undo', description: 'Close the list, keep the old value'},
  {command: 'pick.erase', keys: [k('backspace')], context: 'picker', description: 'Erase the last character of the filter'},
  {command: 'pick.clear', keys: [c('u', {ctrl: true})], context: 'picker', description: 'Erase the whole filter or designation'},
  {command: 'pick.type', keys: [{name: 'char', printable: true}], context: 'picker', description: 'Type to narrow the list'},

  {command: 'list.up', keys: [k('up')], context: 'presets', hint: 'choose', description: 'Previous preset'},
  {command: 'list.down', keys: [k('down')], context: 'presets', description: 'Next preset'},
  {command: 'preset.load', keys: [k('enter')], context: 'presets', hint: 'load', description: 'Load the marked preset into the joint screen'},
  {command: 'preset.search', keys: [c('/')], context: 'presets', hint: 'search', description: 'Search presets by name or notes'},
  {command: 'preset.new', keys: [c('N')], context: 'presets', hint: 'new', description: 'Start a new blank joint (asks first about unsaved edits, as loading a preset does)'},
  {command: 'preset.save', keys: [c('s')], context: 'presets', hint: 'save', description: 'Save the joint into the current preset'},
  {command: 'preset.saveAs', keys: [c('a')], context: 'presets', hint: 'save as', description: 'Save the joint under a new name'},
  {command: 'preset.rename', keys: [c('n')], context: 'presets', hint: 'rename', description: 'Rename the marked preset'},
  {command: 'preset.duplicate', keys: [c('d')], context: 'presets', hint: 'copy', description: 'Duplicate the marked preset under a new name'},
  {command: 'preset.delete', keys: [c('x')], context: 'presets', hint: 'delete', description: 'Delete the marked preset (asks first)'},
  {command: 'preset.import', keys: [c('i')], context: 'presets', hint: 'import', description: 'Import presets from a JSON file'},
  {command: 'preset.export', keys: [c('e')], context: 'presets', hint: 'export', description: 'Export the marked preset to a JSON file'},
  {command: 'preset.exportAll', keys: [c('E')], context: 'presets', hint: 'export all', description: 'Export every saved preset to one JSON file'},
  {command: 'screen.back', keys: [k('escape')], context: 'presets', description: 'Back to the joint screen'},

  {command: 'scroll.up', keys: [k('up')], context: 'report', hint: 'scroll', description: 'Scroll up a line'},
  {command: 'scroll.down', keys: [k('down')], context: 'report', description: 'Scroll down a line'},
  {command: 'scroll.pageUp', keys: [k('pageup')], context: 'report', description: 'Scroll up a page'},
  {command: 'scroll.pageDown', keys: [k('pagedown'), c(' ')], context: 'report', description: 'Scroll down a page'},
  {command: 'report.format', keys: [c('t')], context: 'report', hint: 'text/Markdown', description: 'Switch the report between plain text and Markdown'},
  {command: 'report.write', keys: [k('enter')], context: 'report', hint: 'write file', description: 'Write the report to a file (asks for the path)'},
  {command: 'report.notes', keys: [c('n')], context: 'report', hint: 'notes', description: 'Edit the work-order notes of the preset: asset tag, location, work-order number, then free text (Enter keeps each, Esc puts all back)'},
  {command: 'screen.back', keys: [k('escape')], context: 'report', description: 'Back to the joint screen'},

  {command: 'list.up', keys: [k('up')], context: 'repairs', hint: 'mark', description: 'Previous repair'},
  {command: 'list.down', keys: [k('down')], context: 'repairs', description: 'Next repair'},
  {command: 'repair.choose', keys: [c('c')], context: 'repairs', hint: 'choose', description: 'Choose the marked repair for the work order (kept with the preset and named on the report); c on the chosen one clears the choice'},
  {command: 'detail.pageUp', keys: [k('pageup')], context: 'repairs', hint: 'detail', description: 'Scroll the detail of the marked repair up a page'},
  {command: 'detail.pageDown', keys: [k('pagedown'), c(' ')], context: 'repairs', description: 'Scroll the detail of the marked repair down a page (every line of it can be read)'},
  {command: 'repair.hole', keys: [k('enter')], context: 'repairs', hint: 'hole state', description: 'Edit the hole state (joint screen, Hole state step)'},
  {command: 'screen.back', keys: [k('escape')], context: 'repairs', description: 'Back to the joint screen'},

  {command: 'scroll.up', keys: [k('up')], context: 'help', hint: 'scroll', description: 'Scroll up a line'},
  {command: 'scroll.down', keys: [k('down')], context: 'help', description: 'Scroll down a line'},
  {command: 'scroll.pageUp', keys: [k('pageup')], context: 'help', description: 'Scroll up a page'},
  {command: 'scroll.pageDown', keys: [k('pagedown'), c(' ')], context: 'help', description: 'Scroll down a page'},
  {command: 'screen.back', keys: [k('escape')], context: 'help', hint: 'back', description: 'Back to the screen before'},

  {command: 'prompt.ok', keys: [k('enter')], context: 'prompt', hint: 'ok', description: 'Accept'},
  {command: 'prompt.cancel', keys: [k('escape')], context: 'prompt', hint: 'cancel', description: 'Cancel'},
  {command: 'prompt.erase', keys: [k('backspace')], context: 'prompt', description: 'Erase the last character'},
  {command: 'prompt.clear', keys: [c('u', {ctrl: true})], context: 'prompt', description: 'Erase the whole text'},
  {command: 'prompt.type', keys: [{name: 'char', printable: true}], context: 'prompt', description: 'Type'},

  {command: 'confirm.yes', keys: [c('y')], context: 'confirm', hint: 'yes', description: 'Yes, do it'},
  {command: 'confirm.no', keys: [c('n'), k('escape')], context: 'confirm', hint: 'no', description: 'No, leave it'},

  {command: 'unsaved.save', keys: [c('s')], context: 'unsaved', hint: 'save', description: 'Save the edits first (a shipped demo asks for a name), then load the other preset'},
  {command: 'unsaved.discard', keys: [c('d')], context: 'unsaved', hint: 'discard', description: 'Throw the edits away and load the other preset'},
  {command: 'unsaved.cancel', keys: [k('escape'), c('n')], context: 'unsaved', hint: 'cancel', description: 'Stay on the edited preset; nothing is loaded'},

  {command: 'draft.restore', keys: [c('y'), k('enter')], context: 'draft', hint: 'restore draft', description: 'Restore the unsaved edits of the last session'},
  {command: 'draft.discard', keys: [c('n')], context: 'draft', hint: 'discard it', description: 'Throw the draft away and start from the preset'},
] as const satisfies readonly Binding[];

/** Every command of the workbench: a typo in a command name is a compile error. */
export type Command = (typeof KEYMAP)[number]['command'];
/** The commands bound in one context: each screen's key table must handle exactly these. */
export type CommandsOf<C extends Context> = Extract<(typeof KEYMAP)[number], {context: C}>['command'];

function matches(spec: KeySpec, ev: KeyEvent): boolean {
  if (spec.name !== ev.name) return false;
  if (Boolean(spec.ctrl) !== Boolean(ev.ctrl)) return false;
  if (spec.name === 'tab' && Boolean(spec.shift) !== Boolean(ev.shift)) return false;
  if (spec.name !== 'char') return true;
  const ch = ev.char ?? '';
  if (spec.digits) return /^[0-9.,]$/.test(ch);
  if (spec.printable) return ch >= ' ' && !ev.ctrl;
  return spec.char === ch;
}

/** The command a key means in a list of contexts, searched in order, with the context that bound it. */
export function lookup(ev: KeyEvent, contexts: readonly Context[]): {command: Command; context: Context} | undefined {
  for (const ctx of contexts) {
    const b = (KEYMAP as readonly Binding[]).find(x => x.context === ctx && x.keys.some(s => matches(s, ev)));
    if (b) return {command: b.command as Command, context: ctx};
  }
  return undefined;
}

/** How a key is written on screen. */
export function keyLabel(spec: KeySpec, ascii: boolean): string {
  const arrows: Partial<Record<KeyName, [string, string]>> = {
    up: ['↑', 'Up'], down: ['↓', 'Down'], left: ['←', 'Left'], right: ['→', 'Right'],
  };
  const arrow = arrows[spec.name];
  if (arrow) return ascii ? arrow[1] : arrow[0];
  if (spec.digits) return '0-9 .';
  if (spec.printable) return 'letters';
  const named: Partial<Record<KeyName, string>> = {
    enter: 'Enter', escape: 'Esc', backspace: 'Backspace', tab: 'Tab', pageup: 'PgUp', pagedown: 'PgDn', home: 'Home', end: 'End',
  };
  if (spec.name === 'tab' && spec.shift) return 'Shift-Tab';
  if (spec.name !== 'char') return named[spec.name] ?? spec.name;
  if (spec.char === ' ') return 'Space';
  return spec.ctrl ? `Ctrl-${(spec.char ?? '').toUpperCase()}` : (spec.char ?? '');
}

/**
 * The hint lines (one, or two when the keys do not fit): the keys that work now, most
 * specific context first. A key with a condition is shown only when `holds` has it.
 */
export function hintLines(contexts: readonly Context[], ascii: boolean, width: number, holds: ReadonlySet<HintCondition> = new Set()): string[] {
  const parts: string[] = [];
  const seen = new Set<string>();
  const table: readonly Binding[] = KEYMAP;
  for (const ctx of contexts) {
    for (const b of table) {
      if (b.context !== ctx || !b.hint || seen.has(b.command) || (b.hintWhen && !holds.has(b.hintWhen))) continue;
      seen.add(b.command);
      const same = table.filter(x => x.context === ctx && x.hint === undefined && pairOf(b.command) === x.command);
      const keys = [b.keys[0], ...same.map(x => x.keys[0])].filter((x): x is KeySpec => x !== undefined);
      // In ASCII the arrow pairs are written short (Up/Dn, Lt/Rt) so the hints keep to one line at 80 columns.
      const short: Partial<Record<KeyName, string>> = {down: 'Dn', left: 'Lt', right: 'Rt'};
      const labels = keys.map(s => (ascii && keys.length > 1 && short[s.name] ? short[s.name]! : keyLabel(s, ascii)));
      // Arrows sit together (↑↓); named keys are kept apart (PgUp/PgDn).
      parts.push(`${labels.join(ascii || labels.some(l => Array.from(l).length > 1) ? '/' : '')} ${b.hint}`);
    }
  }
  const lines: string[] = [''];
  for (const p of parts) {
    const cur = lines[lines.length - 1]!;
    const next = cur === '' ? p : `${cur}  ${p}`;
    if (next.length <= width) lines[lines.length - 1] = next;
    else if (lines.length < 2) lines.push(p);
    else break;
  }
  return lines;
}

/** Commands whose key is shown together with another's on the hint line (↑↓ field). */
function pairOf(command: string): string | undefined {
  const pairs: Record<string, string> = {
    'field.prev': 'field.next', 'step.prev': 'step.next', 'pick.up': 'pick.down', 'list.up': 'list.down', 'scroll.up': 'scroll.down', 'detail.pageUp': 'detail.pageDown', 'flags.pageUp': 'flags.pageDown',
  };
  return pairs[command];
}
