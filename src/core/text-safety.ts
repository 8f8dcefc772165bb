/**
 * Text that reaches a terminal from a file or an argument. A stored name, thread
 * id or note must not carry characters that steer the terminal or reorder what is
 * shown: C0 controls U+0000-U+001F (ESC starts an escape sequence; CR and
 * backspace overwrite a line), DEL U+007F, C1 controls U+0080-U+009F (U+009B is a
 * one-byte escape sequence introducer), and the bidirectional embeddings and
 * overrides U+202A-U+202E and isolates U+2066-U+2069 (Unicode Standard Annex #9).
 * Source: ECMA-48 (5th edition, 1991) section 5 for the control sets; UAX #9 table 4
 * for the bidirectional formatting characters. Pure: no fs, no process.
 */
import * as z from 'zod';

/** The characters refused in stored text and escaped on output. */
export const UNSAFE_TEXT_RE = /[\u0000-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/;
const UNSAFE_GLOBAL = new RegExp(UNSAFE_TEXT_RE.source, 'g');

/** The rule as stated in messages. */
export const SAFE_TEXT_RULE = 'control characters (escape, tab, newline, ...) and text-direction overrides are not accepted';

/** True when `text` holds none of the refused characters. */
export function isSafeText(text: string): boolean {
  return !UNSAFE_TEXT_RE.test(text);
}

/**
 * A zod string schema with the refused characters refused, e.g.
 * `safeText(z.string().trim().min(1).max(60))`; the message names the first one.
 */
export function safeText<T extends z.ZodType<string, string>>(schema: T) {
  return schema.refine(isSafeText, {
    error: issue => {
      const m = typeof issue.input === 'string' ? UNSAFE_TEXT_RE.exec(issue.input) : null;
      return `${m ? `${codePoint(m[0])} at position ${m.index + 1}: ` : ''}${SAFE_TEXT_RULE}`;
    },
  });
}

/** "U+001B" for a character. */
function codePoint(ch: string): string {
  return `U+${ch.codePointAt(0)!.toString(16).toUpperCase().padStart(4, '0')}`;
}

const NAMED: Record<string, string> = {'\n': '\\n', '\r': '\\r', '\t': '\\t', '\u001b': '\\e'};

export interface PrintableOptions {
  /** Keep newlines as they are (multi-line messages); default false. */
  keepNewlines?: boolean;
  /** Cut to this many characters, then "...". */
  max?: number;
}

/**
 * `text` safe to print: every refused character shown as an escape (\e, \n, \x9b,
 * \u202e) instead of being sent to the terminal; cut to `max` characters + "...".
 */
export function printable(text: string, o: PrintableOptions = {}): string {
  let out = UNSAFE_TEXT_RE.test(text)
    ? text.replace(UNSAFE_GLOBAL, ch => {
        if (o.keepNewlines && ch === '\n') return ch;
        const c = ch.charCodeAt(0);
        return NAMED[ch] ?? (c < 0x100 ? `\\x${c.toString(16).padStart(2, '0')}` : `\\u${c.toString(16)}`);
      })
    : text;
  if (o.max !== undefined && out.length > o.max) out = `${out.slice(0, o.max)}...`;
  return out;
}

/**
 * An error message safe to print: refused characters escaped (newlines kept), any
 * quoted piece of input longer than `quoted` characters cut ("...") and the whole
 * cut to `total` characters, so a 120 KB argument does not come back 120 KB long.
 */
export function printableMessage(message: string, quoted = 80, total = 2000): string {
  const cut = message.replace(/"([^"\n]*)"/g, (all, inner: string) => (inner.length > quoted ? `"${inner.slice(0, quoted)}..."` : all));
  const runs = cut.replace(/\S{257,}/g, run => `${run.slice(0, 256)}...`);
  return printable(runs, {keepNewlines: true, max: total});
}

const JSON_UNSAFE = /[\u007f-\u009f\u202a-\u202e\u2066-\u2069]/g;

/**
 * JSON text of `value` (2-space indent) with every refused character written as a
 * \uXXXX escape: JSON.stringify escapes C0 controls but sends DEL, C1 and the
 * bidirectional characters raw. Parses back to the same value.
 */
export function jsonText(value: unknown): string {
  return JSON.stringify(value, null, 2).replace(JSON_UNSAFE, c => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`);
}
