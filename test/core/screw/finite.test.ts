import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {checkScrew, ScrewInputError, ScrewInputSchema} from '../../../src/core/screw/index.js';

/** Every number in the result, with its path. */
function numbers(v: unknown, path = ''): [string, number][] {
  if (typeof v === 'number') return [[path, v]];
  if (Array.isArray(v)) return v.flatMap((x, i) => numbers(x, `${path}[${i}]`));
  if (v && typeof v === 'object') return Object.entries(v).flatMap(([k, x]) => numbers(x, `${path}.${k}`));
  return [];
}

// No engineering source: a robustness check over the input space of ScrewInputSchema.
describe('checkScrew over the whole input space', () => {
  it('never crashes; every number is finite except a margin at zero load; rejections name a field', () => {
    const threads = ['Tr8x1.5', 'Tr24x5', 'Tr40x14(P7)', 'Tr100x12', 'Tr20x10', '1/4-16 ACME', '1-5 ACME-2G', '3-2 ACME', 'square 32x4', 'square 10x5', 'square 300x20'];
    fc.assert(
      fc.property(
        fc.record({
          thread: fc.constantFrom(...threads),
          starts: fc.integer({min: 1, max: 8}),
          load: fc.double({min: 0, max: 1e8, noNaN: true}),
          loadDirection: fc.constantFrom('compression', 'tension'),
          muThread: fc.double({min: 0.01, max: 0.6, noNaN: true}),
          muCollar: fc.double({min: 0, max: 0.6, noNaN: true}),
          collarDiameter: fc.double({min: 0, max: 2000, noNaN: true}),
          nutLength: fc.double({min: 0.5, max: 2000, noNaN: true}),
          nutMaterial: fc.constantFrom('bronze', 'cast-iron', 'steel', 'brass', 'plastic', 'EN-GJS-400-15'),
          nutWear: fc.double({min: 0, max: 50, noNaN: true}),
          length: fc.double({min: 0, max: 20000, noNaN: true}),
          ends: fc.constantFrom('fixed-free', 'pinned-pinned', 'fixed-pinned', 'fixed-fixed'),
          speed: fc.option(fc.double({min: 0, max: 10, noNaN: true}), {nil: undefined}),
        }),
        raw => {
          const input = ScrewInputSchema.parse(raw.thread.includes('(P') ? {...raw, starts: 2} : raw);
          try {
            const r = checkScrew(input);
            for (const [path, n] of numbers(r)) {
              if (!Number.isFinite(n) && !(input.load === 0 && /margin/.test(path))) throw new Error(`${path} = ${n}`);
            }
          } catch (e) {
            if (!(e instanceof ScrewInputError)) throw e;
            expect(e.field.length).toBeGreaterThan(0);
          }
        },
      ),
      {numRuns: 1000},
    );
  });
});
