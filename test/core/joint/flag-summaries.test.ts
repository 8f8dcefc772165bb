/**
 * Each joint flag carries a one-line summary for narrow displays (the workbench at
 * 80 columns): short enough for a flag line, and with the numbers of its message.
 * The contexts are generated over wide ranges (invented values, not a published case).
 */
import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {jointFlags, type FlagContext} from '../../../src/core/joint/flags.js';

/** A flag line at 80 columns: "WATCH " (6) + summary + " (f)" (4), two columns to spare. */
const MAX_SUMMARY = 68;

const context = fc.record({
  internalKind: fc.constantFrom('tapped' as const, 'nut' as const),
  maxPreload: fc.double({min: 50, max: 900_000, noNaN: true}),
  serviceLoad: fc.constantFrom(0, 3000, 45_000),
  weaker: fc.constantFrom('external' as const, 'internal' as const),
  weakerForce: fc.double({min: 100, max: 900_000, noNaN: true}),
  boltBreakForce: fc.double({min: 100, max: 900_000, noNaN: true}),
  requiredMargin: fc.constantFrom(1, 1.2, 2),
  engagedThreads: fc.double({min: 0.1, max: 40, noNaN: true}),
  firstShare: fc.double({min: 0.1, max: 1, noNaN: true}),
  effectiveEngagement: fc.double({min: 0.2, max: 400, noNaN: true}),
  requiredFedStd: fc.double({min: 0.2, max: 400, noNaN: true}),
  requiredAlexander: fc.double({min: 0.2, max: 400, noNaN: true}),
  utilisation: fc.double({min: 0.1, max: 1.6, noNaN: true}),
  utilisationLimit: fc.constantFrom(0.9, 0.75),
  engagement: fc.double({min: 0.5, max: 999, noNaN: true}),
  pitch: fc.constantFrom(0.25, 1.25, 1.5875, 6),
  holeDepth: fc.option(fc.double({min: 1, max: 999, noNaN: true}), {nil: undefined}),
  isStandardPitch: fc.boolean(),
  designation: fc.constantFrom('M10x1.3-6H/6g', '3/8-16 UNC-2A/2B', 'M48x1.5-6H/6g'),
  modelRangeNotes: fc.constantFrom(
    [],
    ['strength ratio RS 0.38 is at or below 0.4, where the internal-thread factor is published; held at 1.055'],
    ['nut s/d 1.20 is below 1.4, where the nut-dilation factor is published; held at 0.75', 'strength ratio RS 2.50 is above 2.2, where the bolt-thread factor is published; held at 0.900'],
  ),
  bearingEstimated: fc.boolean(),
  bearingDiameter: fc.double({min: 2, max: 120, noNaN: true}),
  units: fc.constantFrom('si' as const, 'us' as const),
}) satisfies fc.Arbitrary<FlagContext>;

const numbers = (s: string) => s.match(/\d+(?:\.\d+)?/g) ?? [];

describe('flag summaries (src/core/joint/flags.ts)', () => {
  it('every joint flag has a summary that fits a flag line at 80 columns', () => {
    fc.assert(
      fc.property(context, c => {
        for (const f of jointFlags(c)) {
          expect(f.summary, f.code).toBeDefined();
          expect(Array.from(f.summary!).length, f.summary).toBeLessThanOrEqual(MAX_SUMMARY);
        }
      }),
      {numRuns: 2000},
    );
  });

  it("a summary's numbers are its message's (the stripping-while-tightening load is their sum)", () => {
    fc.assert(
      fc.property(context, c => {
        for (const f of jointFlags(c)) {
          const inMessage = new Set(numbers(f.message));
          for (const n of numbers(f.summary!)) {
            if (f.code === 'strips-at-preload' && f.summary!.includes(`load ${n}`)) continue;
            expect(inMessage.has(n), `${n} of "${f.summary}" in "${f.message}"`).toBe(true);
          }
        }
      }),
      {numRuns: 2000},
    );
  });

  it('names the weaker side and both forces when the thread strips before the bolt breaks', () => {
    const base = {
      internalKind: 'tapped', maxPreload: 12_700, serviceLoad: 0, weaker: 'internal', weakerForce: 22_300, boltBreakForce: 29_300,
      requiredMargin: 1, engagedThreads: 7.4, firstShare: 0.29, effectiveEngagement: 9.2, requiredFedStd: 14.5, requiredAlexander: 11.5,
      utilisation: 0.75, utilisationLimit: 0.9, engagement: 10, pitch: 1.25, isStandardPitch: true, designation: 'M8x1.25-6H/6g',
      modelRangeNotes: [], bearingEstimated: false, bearingDiameter: 13,
    } satisfies FlagContext;
    const f = jointFlags(base).find(x => x.code === 'strips-before-break');
    expect(f?.summary).toBe('Thread strips first: hole 22.3 kN < bolt break 29.3 kN');
    const nut = jointFlags({...base, internalKind: 'nut'}).find(x => x.code === 'strips-before-break');
    expect(nut?.summary).toBe('Thread strips first: nut 22.3 kN < bolt break 29.3 kN');
  });
});
