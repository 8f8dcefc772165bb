/**
 * Characters every terminal draws exactly one cell wide, by Unicode block.
 *
 * Used where knowing the width cheaply matters: the frame writer's cell diff, and
 * a fast path put in front of the `string-width` package at build time (its full
 * answer segments graphemes and tests emoji properties, about 0.1 ms a string and
 * 40 ms for its first call, while every string the workbench draws is made of
 * these characters).
 *
 * A code point is here only when its East Asian Width is Narrow, Neutral or
 * Ambiguous (Ambiguous counts as narrow, as `string-width` counts it by default),
 * it is not a combining, zero-width, control or format character, and it is not
 * an emoji with emoji presentation by default (Unicode Standard Annex #11, East
 * Asian Width, and Unicode Technical Standard #51, Emoji, emoji-data.txt
 * Emoji_Presentation). Whole blocks that hold any wide or emoji-presentation
 * character (Miscellaneous Technical U+2300, Miscellaneous Symbols U+2600,
 * Dingbats U+2700) are left out, as are U+25FD and U+25FE; such text takes the
 * slow, exact path.
 */
const RANGES: readonly (readonly [number, number])[] = [
  [0x20, 0x7e], // Basic Latin, printable
  [0xa0, 0xac], // Latin-1 Supplement (U+00AD soft hyphen is zero width)
  [0xae, 0x2ff], // Latin-1 Supplement, Latin Extended-A/B, IPA, spacing modifier letters
  [0x370, 0x377], // Greek and Coptic (U+0300-036F are combining marks)
  [0x37a, 0x37f],
  [0x384, 0x38a],
  [0x38c, 0x38c],
  [0x38e, 0x3a1],
  [0x3a3, 0x3ff],
  [0x400, 0x482], // Cyrillic (U+0483-0489 are combining)
  [0x48a, 0x52f],
  [0x2010, 0x2027], // General Punctuation: dashes, quotes, bullet, ellipsis
  [0x2030, 0x205e], // per mille, primes, ...
  [0x2070, 0x2071], // superscripts and subscripts
  [0x2074, 0x208e],
  [0x2090, 0x209c],
  [0x20a0, 0x20c0], // currency symbols
  [0x2100, 0x214f], // letterlike symbols
  [0x2190, 0x22ff], // arrows, mathematical operators
  [0x2500, 0x25fc], // box drawing, block elements, geometric shapes
  [0x25ff, 0x25ff],
];

/** True when the code point is drawn one cell wide on every terminal. */
export function isSurelyNarrow(cp: number): boolean {
  if (cp >= 0x20 && cp <= 0x7e) return true;
  for (const [lo, hi] of RANGES) {
    if (cp < lo) return false;
    if (cp <= hi) return true;
  }
  return false;
}

/**
 * The width in cells of a string made only of surely-narrow characters (its
 * number of code points), or undefined when it holds any other character.
 */
export function narrowWidth(s: string): number | undefined {
  return s.includes('\u001b') ? undefined : visibleNarrowWidth(s);
}

/**
 * Like narrowWidth, but colour and style sequences (ESC [ digits and ; then m)
 * take no cells, as string-width counts them; any other escape sequence gives
 * undefined.
 */
export function visibleNarrowWidth(s: string): number | undefined {
  let n = 0;
  for (let i = 0; i < s.length; i++) {
    const c = s.charCodeAt(i);
    if (c >= 0x20 && c <= 0x7e) {
      n++;
      continue;
    }
    if (c === 0x1b) {
      if (s.charCodeAt(i + 1) !== 0x5b) return undefined;
      let j = i + 2;
      while (j < s.length) {
        const d = s.charCodeAt(j);
        if ((d >= 0x30 && d <= 0x39) || d === 0x3b) j++;
        else break;
      }
      if (s.charCodeAt(j) !== 0x6d) return undefined;
      i = j;
      continue;
    }
    if (!isSurelyNarrow(c)) return undefined;
    n++;
  }
  return n;
}

/**
 * True when every character of `s` is its own grapheme cluster: printable ASCII,
 * ESC, or a surely-narrow character. None of these combines with a neighbour under
 * the grapheme rules of Unicode Standard Annex #29 (no extenders, joiners, spacing
 * marks, prepends, regional indicators, Hangul or CR LF), so splitting such text
 * into graphemes is splitting it into characters.
 */
export function isSimpleText(s: string): boolean {
  for (let i = 0; i < s.length; i++) {
    const c = s.charCodeAt(i);
    if ((c >= 0x20 && c <= 0x7e) || c === 0x1b) continue;
    if (!isSurelyNarrow(c)) return false;
  }
  return true;
}
