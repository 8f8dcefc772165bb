import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {formatCheckMarkdown, formatCheckText} from '../../src/report/index.js';
import {DEMO_INPUT, demoResult} from './fixture.js';

// DEMO fixture with generated text: checks the layout rules only (80 columns, ASCII, no lost flags).

const words = fc.array(fc.oneof(fc.string({minLength: 1, maxLength: 12}), fc.constantFrom('kN', 'N·m', 'mm²', '—', '|', '#')), {maxLength: 40}).map(w => w.join(' '));

describe('report layout with arbitrary text', () => {
  it('keeps every text line within 80 columns and every flag present, in SI, US and ASCII', () => {
    fc.assert(
      fc.property(
        fc.array(fc.record({code: fc.stringMatching(/^[a-z][a-z-]{0,40}$/), level: fc.constantFrom('info', 'watch', 'fail'), message: words}), {maxLength: 6}),
        fc.array(words, {maxLength: 4}),
        words,
        fc.constantFrom('si', 'us'),
        fc.boolean(),
        (flags, notes, materialName, units, ascii) => {
          const r = demoResult({flags: flags as never, notes, sources: [...notes, 'Demo source']});
          r.materials.internal = {...r.materials.internal, name: materialName || 'demo'};
          const text = formatCheckText(r, DEMO_INPUT, {units: units as 'si' | 'us', ascii});
          for (const line of text.split('\n')) expect([...line].length).toBeLessThanOrEqual(80);
          if (ascii) expect(text).toMatch(/^[\x09\x0a\x0d\x20-\x7e]*$/);
          for (const f of flags) expect(text).toContain(f.code);
          const md = formatCheckMarkdown(r, DEMO_INPUT, {date: new Date(0), units: units as 'si' | 'us', notes: {text: materialName}});
          const flagRows = md.split('\n').filter(l => /^\| (FAIL|WATCH|INFO) \|/.test(l));
          expect(flagRows).toHaveLength(flags.length);
        },
      ),
      {numRuns: 100},
    );
  });
});
