/** --service-load F | MIN..MAX and --embedding LEN|auto: good and bad input, messages naming the option. */
import {describe, expect, it} from 'vitest';
import {parseEmbedding, parseServiceLoad} from '../../../src/core/service/text-parse.js';

describe('parseServiceLoad', () => {
  it('reads a static load and a cycling range; bare numbers in kN (SI) or lbf (US)', () => {
    expect(parseServiceLoad('12', 'si')).toEqual({ok: true, value: 12_000});
    expect(parseServiceLoad('2..11kN', 'si')).toEqual({ok: true, value: {min: 2000, max: 11_000}});
    const us = parseServiceLoad('0..2500', 'us');
    expect(us.ok && typeof us.value === 'object' && us.value.max).toBeCloseTo(2500 * 4.4482216152605, 6);
  });
  for (const [text, re] of [['abc', /--service-load: "abc" is not a number/], ['5..2', /MIN 5 is above MAX 2/], ['1..2..3', /more than one/], ['-3', /outside 0 to 100 MN/], ['..4', /--service-load: is empty/], ['3kg', /not a force unit/]] as const) {
    it(`rejects ${text}`, () => {
      const r = parseServiceLoad(text, 'si');
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.error).toMatch(re);
    });
  }
});

describe('parseEmbedding', () => {
  it('reads auto, 0 and lengths', () => {
    expect(parseEmbedding('auto', 'si')).toEqual({ok: true, value: 'auto'});
    expect(parseEmbedding('0', 'si')).toEqual({ok: true, value: 0});
    const r = parseEmbedding('8um', 'si');
    expect(r.ok && r.value).toBeCloseTo(0.008, 9);
  });
  for (const [text, re] of [['x', /--embedding: "x" is not a number; expected auto/], ['2', /outside 0 to 1 mm/], ['-0.01', /outside/]] as const) {
    it(`rejects ${text}`, () => {
      const r = parseEmbedding(text, 'si');
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.error).toMatch(re);
    });
  }
});
