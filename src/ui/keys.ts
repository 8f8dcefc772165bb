/**
 * One normalised key event, built from what Ink 6.8 reports. Ink quirks handled
 * here, once: Backspace (0x7F) arrives as `delete`; Enter is '\r' but a '\n'
 * (Ctrl-J, some pastes) is not flagged; a pasted or coalesced chunk arrives as
 * one event (split into characters, an embedded CR/LF becomes Enter); Esc
 * followed quickly by a key arrives as Alt+key (split into Esc, then the key);
 * a control key inside a burst (Ctrl-U then "25") stays a control key, in order.
 */
import type {Key} from 'ink';

export type KeyName =
  | 'char'
  | 'enter'
  | 'escape'
  | 'backspace'
  | 'up'
  | 'down'
  | 'left'
  | 'right'
  | 'tab'
  | 'pageup'
  | 'pagedown'
  | 'home'
  | 'end';

export interface KeyEvent {
  name: KeyName;
  /** The character for name 'char' (one code point). */
  char?: string;
  ctrl?: boolean;
  shift?: boolean;
}

/** Split a pasted chunk into key events. */
function splitChunk(text: string): KeyEvent[] {
  const out: KeyEvent[] = [];
  for (const ch of Array.from(text)) {
    if (ch === '\r' || ch === '\n') out.push({name: 'enter'});
    else if (ch === '\t') out.push({name: 'tab'});
    else if (ch === '\x7f' || ch === '\b') out.push({name: 'backspace'});
    else if (ch === '\x1b') out.push({name: 'escape'});
    // A control key inside a burst (Ctrl-U then "25" in one read) is that key, in its place.
    else if (ch < ' ') out.push({name: 'char', char: String.fromCharCode(ch.charCodeAt(0) + 96), ctrl: true});
    else out.push({name: 'char', char: ch});
  }
  return out;
}

/** Turn one Ink input callback into zero or more key events. */
export function normaliseKey(input: string, key: Key): KeyEvent[] {
  if (key.upArrow) return [{name: 'up'}];
  if (key.downArrow) return [{name: 'down'}];
  if (key.leftArrow) return [{name: 'left'}];
  if (key.rightArrow) return [{name: 'right'}];
  if (key.pageUp) return [{name: 'pageup'}];
  if (key.pageDown) return [{name: 'pagedown'}];
  if (key.home) return [{name: 'home'}];
  if (key.end) return [{name: 'end'}];
  if (key.return) return [{name: 'enter'}];
  if (key.tab) return [{name: 'tab', shift: key.shift}];
  // Ink 6: the Backspace key (0x7F) and forward Delete both arrive as `delete`.
  if (key.backspace || key.delete) return [{name: 'backspace'}];
  // Check escape before meta: a lone Esc also sets meta in Ink 6.
  if (key.escape) return [{name: 'escape'}];
  if (key.ctrl && input.length === 1) return [{name: 'char', char: input.toLowerCase(), ctrl: true}];
  if (key.meta && input !== '') return [{name: 'escape'}, ...splitChunk(input)];
  return splitChunk(input);
}

/** Named byte sequences a terminal sends; shared with the tests and the bench. */
export const KEY_BYTES = {
  enter: '\r',
  escape: '\u001B',
  backspace: '\u007F',
  up: '\u001B[A',
  down: '\u001B[B',
  right: '\u001B[C',
  left: '\u001B[D',
  tab: '\t',
  shiftTab: '\u001B[Z',
  pageUp: '\u001B[5~',
  pageDown: '\u001B[6~',
  ctrlC: '\u0003',
  ctrlU: '\u0015',
} as const;
