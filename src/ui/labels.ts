/**
 * Messages in the form's words: an internal input name (strippedDepth,
 * holeState, boltRm) that a core or schema message carries is replaced by the
 * label of its field, so no message on screen shows an internal name.
 */
import {FIELDS} from './state/fields.js';

let names: {re: RegExp; label: Map<string, string>} | undefined;

/** The text with each internal field name (camelCase) replaced by its field's label in lower case (strippedDepth -> stripped to depth). */
export function withLabels(text: string): string {
  if (!names) {
    const label = new Map<string, string>();
    for (const f of FIELDS) {
      const key = f.id.slice(f.id.lastIndexOf('.') + 1);
      // Only names that are not plain words (camelCase) are internal; the first field of a name gives its label.
      if (/[A-Z]/.test(key) && !label.has(key)) label.set(key, f.label.toLowerCase());
    }
    names = {re: new RegExp(`\\b(${[...label.keys()].join('|')})\\b`, 'g'), label};
  }
  const {re, label} = names;
  return text.replace(re, k => label.get(k) ?? k);
}
