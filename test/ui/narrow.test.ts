// The narrow-character set behind the frame writer and the build's string-width fast
// path is checked against string-width itself (the package Ink measures text with),
// code point by code point, and against the Unicode data it encodes.
import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import stringWidth from 'string-width';
import {isSimpleText, isSurelyNarrow, narrowWidth, visibleNarrowWidth} from '../../src/ui/terminal/narrow.js';

const ALL_BMP = Array.from({length: 0x3000}, (_, i) => i);

describe('surely-narrow characters', () => {
  it('every one is one cell wide by string-width', () => {
    const wrong = ALL_BMP.filter(cp => isSurelyNarrow(cp) && stringWidth(String.fromCodePoint(cp)) !== 1);
    expect(wrong.map(cp => cp.toString(16))).toEqual([]);
  });

  it('leaves out wide, zero-width, combining and emoji-presentation characters', () => {
    // Unicode Standard Annex #11 (East Asian Width W): U+231A watch, U+25FD, U+2614, U+2705.
    // Unicode Technical Standard #51 emoji-data.txt: the same are Emoji_Presentation.
    // U+00AD soft hyphen and U+200B are zero width; U+0301 and U+20D7 are combining marks.
    for (const cp of [0x231a, 0x25fd, 0x25fe, 0x2614, 0x2705, 0x00ad, 0x200b, 0x200d, 0x0301, 0x20d7, 0x4e2d, 0xfe0f]) {
      expect(isSurelyNarrow(cp), cp.toString(16)).toBe(false);
    }
  });

  it('covers every symbol the workbench draws', () => {
    for (const ch of '°²³µ·×μπ–—‘’“”…←↑→↓≤≥─│═█▏▲▶') expect(isSurelyNarrow(ch.codePointAt(0)!), ch).toBe(true);
  });

  it('a string of them measures as string-width measures it; any other string gives undefined', () => {
    const narrow = ALL_BMP.filter(isSurelyNarrow).map(cp => String.fromCodePoint(cp));
    const other = ['\u4e2d', '\u0301', '\u{1F600}', '\u200d', '\t', '\u001b', '\u25fd'];
    fc.assert(
      fc.property(fc.array(fc.constantFrom(...narrow), {maxLength: 40}), fc.array(fc.constantFrom(...other), {maxLength: 2}), (a, b) => {
        const s = a.join('');
        expect(narrowWidth(s)).toBe(stringWidth(s));
        if (b.length) expect(narrowWidth(s + b.join(''))).toBeUndefined();
      }),
    );
  });

  it('colour sequences take no cells; other escapes give undefined', () => {
    const s = '\u001b[1m\u001b[31mFAIL\u001b[39m\u001b[22m  N·m ▶';
    expect(visibleNarrowWidth(s)).toBe(stringWidth(s));
    expect(visibleNarrowWidth('\u001b[38;5;208mx\u001b[0m')).toBe(1);
    expect(visibleNarrowWidth('\u001b]8;;http://x\u0007link')).toBeUndefined();
    expect(visibleNarrowWidth('\u001b[2Kx')).toBeUndefined();
  });

  it('simple text splits into graphemes exactly as into characters (Intl.Segmenter, UAX #29)', () => {
    const simple = [...ALL_BMP.filter(isSurelyNarrow).map(cp => String.fromCodePoint(cp)), '\u001b'];
    const seg = new Intl.Segmenter(undefined, {granularity: 'grapheme'});
    fc.assert(
      fc.property(fc.array(fc.constantFrom(...simple), {maxLength: 40}), a => {
        const s = a.join('');
        expect(isSimpleText(s)).toBe(true);
        expect([...seg.segment(s)].map(x => x.segment)).toEqual([...s]);
      }),
      {numRuns: 300},
    );
    for (const s of ['a\r\nb', 'e\u0301', '\u{1F600}', '\u1100\u1161', 'a\u200db', 'x\tx']) expect(isSimpleText(s), JSON.stringify(s)).toBe(false);
  });
});
