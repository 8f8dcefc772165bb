/**
 * Word wrapping for the plain-text outputs (check, repair and screw reports): every
 * line fits 80 columns. Kept apart from the reports so a command loads only this.
 */

export const TEXT_WIDTH = 80;

/** Wrap words to `width`; the first line starts with `first`, the others with `rest`. Long words are split. */
export function wrapText(text: string, first: string, rest: string, width = TEXT_WIDTH): string[] {
  const lines: string[] = [];
  let line = first;
  let fresh = true;
  // "38 %" stays on one line: the space before a per-cent sign does not break (NBSP while wrapping).
  const words = text.replace(/ %/g, '\u00a0%').split(/[ \t\n\r]+/).filter(Boolean);
  for (let word of words) {
    while (word.length > width - rest.length) {
      if (!fresh) {
        lines.push(line);
        line = rest;
      }
      const room = width - line.length;
      lines.push(line + word.slice(0, room));
      word = word.slice(room);
      line = rest;
      fresh = true;
    }
    if (word === '') continue;
    if (!fresh && line.length + 1 + word.length > width) {
      lines.push(line);
      line = rest;
      fresh = true;
    }
    line += (fresh ? '' : ' ') + word;
    fresh = false;
  }
  if (!fresh || lines.length === 0) lines.push(line);
  return lines.map(l => l.replace(/\u00a0/g, ' ').trimEnd());
}
