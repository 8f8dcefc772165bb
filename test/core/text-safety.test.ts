/** Refused characters (ECMA-48 section 5 control sets; UAX #9 table 4 bidi formatting characters). */
import {describe, expect, it} from 'vitest';
import * as z from 'zod';
import {isSafeText, printable, printableMessage, safeText} from '../../src/core/text-safety.js';

const BAD = ['\u0000', '\u0007', '\b', '\t', '\n', '\r', '\u001b', '\u007f', '\u0080', '\u009b', '\u202a', '\u202e', '\u2066', '\u2069'];

describe('text safety', () => {
  it('refuses every C0, DEL, C1 and bidi formatting character; accepts ordinary text of any script', () => {
    for (const c of BAD) expect([JSON.stringify(c), isSafeText(`M10${c}x`)]).toEqual([JSON.stringify(c), false]);
    for (const ok of ['M10x1.5-6H/6g', '1/4-20 UNC-2A', 'Pumpe Halle 3 (demo)', 'N\u00b7m', '\u00c9tage 2', '\u6cf5', '\u200d']) expect(isSafeText(ok)).toBe(true);
  });

  it('safeText names the character and its position', () => {
    const r = safeText(z.string()).safeParse('M10\u001b[31m');
    expect(r.success).toBe(false);
    expect(r.error!.issues[0]!.message).toBe('U+001B at position 4: control characters (escape, tab, newline, ...) and text-direction overrides are not accepted');
  });

  it('printable shows them as escapes and cuts to a length', () => {
    expect(printable('a\u001b[31mb\nc\u009bd\u202ee')).toBe('a\\e[31mb\\nc\\x9bd\\u202ee');
    expect(printable('x'.repeat(100), {max: 80})).toBe(`${'x'.repeat(80)}...`);
    expect(printable('line\nnext', {keepNewlines: true})).toBe('line\nnext');
    for (const c of BAD) expect(isSafeText(printable(c))).toBe(true);
  });

  it('printableMessage cuts echoed input: a 120 KB argument comes back short', () => {
    const m = printableMessage(`no preset named "${'A'.repeat(120_000)}"; see tapwright presets list`);
    expect(m.length).toBeLessThan(200);
    expect(m).toBe(`no preset named "${'A'.repeat(80)}..."; see tapwright presets list`);
    expect(printableMessage(`--engage is ${'9'.repeat(5000)}, out of range`).length).toBeLessThan(300);
  });
});

describe('jsonText', () => {
  it('escapes DEL, C1 and bidi characters that JSON.stringify sends raw, and parses back to the same value', async () => {
    const {jsonText} = await import('../../src/core/text-safety.js');
    const v = {quarantined: [{raw: {name: 'a\u202eb\u009b\u007fc\u001b'}}]};
    const t = jsonText(v);
    expect(t).not.toMatch(/[\u0000-\u0009\u000b-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/);
    expect(t).toContain('\\u202e');
    expect(JSON.parse(t)).toEqual(v);
  });
});
