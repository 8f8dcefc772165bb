/**
 * Power-screw flags carry a one-line summary for narrow displays: short enough for a
 * flag line at 80 columns and with the numbers of the message. Generated inputs over
 * the input space of ScrewInputSchema (no engineering source: a form check).
 */
import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {checkScrew, ScrewInputError, ScrewInputSchema} from '../../../src/core/screw/index.js';

/** "WATCH " (6) + summary + " (f)" (4) at 80 columns, two to spare. */
const MAX_SUMMARY = 68;
const numbers = (s: string) => s.match(/\d+(?:\.\d+)?/g) ?? [];

describe('power-screw flag summaries (src/core/screw/flags.ts)', () => {
  it('every flag has a summary that fits a flag line and carries only numbers of its message', () => {
    const seen = new Set<string>();
    fc.assert(
      fc.property(
        fc.record({
          thread: fc.constantFrom('Tr8x1.5', 'Tr24x5', 'Tr40x14(P7)', '1-5 ACME-2G', 'square 32x4', 'Tr24x3'),
          load: fc.oneof(fc.constant(0), fc.double({min: 10, max: 5e6, noNaN: true})),
          muThread: fc.double({min: 0.01, max: 0.4, noNaN: true}),
          muCollar: fc.double({min: 0, max: 0.3, noNaN: true}),
          collarDiameter: fc.constantFrom(0, 40),
          nutLength: fc.double({min: 0.5, max: 200, noNaN: true}),
          nutMaterial: fc.constantFrom('bronze', 'cast-iron', 'steel', 'plastic'),
          length: fc.constantFrom(0, 400, 3000),
          ends: fc.constantFrom('fixed-free', 'pinned-pinned'),
          allowablePressure: fc.option(fc.constantFrom(5, 20), {nil: undefined}),
        }),
        raw => {
          const input = ScrewInputSchema.parse(raw.thread.includes('(P') ? {...raw, starts: 2} : raw);
          let flags;
          try {
            flags = checkScrew(input).flags;
          } catch (e) {
            if (e instanceof ScrewInputError) return;
            throw e;
          }
          for (const f of flags) {
            seen.add(f.code);
            expect(f.summary, f.code).toBeDefined();
            expect(Array.from(f.summary!).length, f.summary).toBeLessThanOrEqual(MAX_SUMMARY);
            const inMessage = new Set(numbers(f.message));
            for (const n of numbers(f.summary!)) expect(inMessage.has(n), `${n} of "${f.summary}" in "${f.message}"`).toBe(true);
          }
        },
      ),
      {numRuns: 1500},
    );
    // the generated inputs reach most rules
    expect(seen.size).toBeGreaterThanOrEqual(8);
  });
});
