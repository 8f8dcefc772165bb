/** The Help screen's key column (issue 14 item 15): every description starts in one column, for every key. */
import {describe, expect, it} from 'vitest';
import {helpLines} from '../../src/ui/screens/help/reducer.js';
import {wrapLines} from '../../src/ui/components/scroll-view.js';

describe('help key column', () => {
  for (const width of [80, 100]) {
    it(`at ${width} columns every description and its continuation lines start in the description column`, () => {
      const lines = wrapLines(helpLines({ascii: true, sources: [], width}), width);
      const keys = lines.slice(lines.indexOf('Keys') + 1, lines.indexOf('Methods and their sources') - 1);
      const col = 4 + 18 + 1;
      for (const l of keys) {
        if (/^ {2}\S/.test(l)) continue; // a context title
        expect(l.length, l).toBeLessThanOrEqual(width);
        expect(l.slice(col - 1, col), l).toBe(' ');
        expect(l.charAt(col), l).not.toBe(' ');
        if (!/^ {4}\S/.test(l)) expect(l.slice(0, col), l).toBe(' '.repeat(col));
      }
      for (const k of ['u', 't', 'm', 's', 'n']) expect(keys.some(l => l.startsWith(`    ${k} `))).toBe(true);
    });
  }
});
