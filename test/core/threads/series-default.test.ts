import {describe, expect, it} from 'vitest';
import {parseThread} from '../../../src/core/threads/index.js';

// "1/4 UNC" takes the series pitch, as "M10" takes the ISO 261 coarse pitch.
// Threads per inch: ASME B1.1 Table 1 (standard series), from memory: 1/4 UNC 20, UNF 28, UNEF 32;
// #10 UNF 32; 1/2 UNC 13.
describe('unified designation without the threads per inch', () => {
  it.each([
    ['1/4 UNC', '1/4-20 UNC-2A/2B'],
    ['1/4unf', '1/4-28 UNF-2A/2B'],
    ['1/4 UNEF', '1/4-32 UNEF-2A/2B'],
    ['#10 UNF-3B', '#10-32 UNF-3A/3B'],
    ['1/2 UNC 2A', '1/2-13 UNC-2A/2B'],
    ['1/4-UNC', '1/4-20 UNC-2A/2B'],
  ])('%s -> %s', (typed, designation) => {
    const p = parseThread(typed);
    expect(p.ok && p.value.designation).toBe(designation);
    expect(p.ok && p.value.isStandardPitch).toBe(true);
  });

  it('a size with no pitch in that series says so and asks for the threads per inch', () => {
    const p = parseThread('6 UNC');
    expect(p.ok).toBe(false);
    if (!p.ok) expect(p.error).toMatch(/6 in has no UNC pitch in ASME B1\.1; give the threads per inch/);
  });

  it('the full form is unchanged', () => {
    const p = parseThread('1/4-20 UNC-2A');
    expect(p.ok && p.value.designation).toBe('1/4-20 UNC-2A/2B');
  });
});
