import {describe, expect, it} from 'vitest';
import {
  blindHoleTooShallow,
  engagementBeyondUseful,
  jointFlags,
  nonstandardPitch,
  outsideModelRange,
  preloadOverYield,
  shortEngagement,
  stripsAtPreload,
  stripsBeforeBreak,
  type FlagContext,
} from '../../../src/core/joint/flags.js';

// Invented demo joint; each rule is tested on both sides of its threshold.
const ok: FlagContext = {
  internalKind: 'tapped',
  maxPreload: 30000,
  serviceLoad: 0,
  weaker: 'internal',
  weakerForce: 60000,
  boltBreakForce: 46400,
  requiredMargin: 1,
  engagedThreads: 8,
  firstShare: 0.38,
  effectiveEngagement: 12,
  requiredFedStd: 11,
  requiredAlexander: 10,
  utilisation: 0.9,
  utilisationLimit: 0.9,
  engagement: 12,
  pitch: 1.5,
  isStandardPitch: true,
  designation: 'M10x1.5-6H/6g',
  modelRangeNotes: [],
  bearingEstimated: false,
  bearingDiameter: 12.8,
};

describe('flags (src/core/joint/flags.ts)', () => {
  it('strips-at-preload: fail when max preload + service load reaches the stripping force / margin', () => {
    expect(stripsAtPreload({...ok, maxPreload: 59999})).toBeUndefined();
    const f = stripsAtPreload({...ok, maxPreload: 50000, serviceLoad: 10000});
    expect(f?.level).toBe('fail');
    expect(f?.message).toMatch(/50\.0 kN.*10\.0 kN.*60\.0 kN/);
    expect(stripsAtPreload({...ok, maxPreload: 31000, requiredMargin: 2})?.code).toBe('strips-at-preload');
    expect(stripsAtPreload({...ok, maxPreload: 29000, requiredMargin: 2})).toBeUndefined();
  });

  it('short-engagement: watch below 6 full threads (Shigley 9th ed. p. 419), with the count', () => {
    expect(shortEngagement({...ok, engagedThreads: 6})).toBeUndefined();
    const f = shortEngagement({...ok, engagedThreads: 5.9, firstShare: 0.41});
    expect(f?.level).toBe('watch');
    expect(f?.message).toMatch(/5\.9 full threads.*41 %/);
  });

  it('strips-before-break: fail when stripping force / break force is below the required margin; engagement-below-required (watch) when only Alexander asks for more', () => {
    expect(stripsBeforeBreak({...ok, weakerForce: 46400})).toBeUndefined();
    expect(stripsBeforeBreak({...ok, weakerForce: 46300})?.level).toBe('fail');
    expect(stripsBeforeBreak({...ok, weakerForce: 46300})?.code).toBe('strips-before-break');
    expect(stripsBeforeBreak({...ok, requiredMargin: 1.3})?.level).toBe('fail');
    expect(stripsBeforeBreak({...ok, requiredAlexander: 12.1})?.level).toBe('watch');
    expect(stripsBeforeBreak({...ok, requiredAlexander: 12.1})?.code).toBe('engagement-below-required');
    expect(stripsBeforeBreak({...ok, requiredFedStd: 12.1})?.code).toBe('engagement-below-required');
    expect(stripsBeforeBreak({...ok, requiredAlexander: 12})).toBeUndefined();
  });

  it('preload-over-yield: watch above the utilisation limit, fail above yield', () => {
    expect(preloadOverYield(ok)).toBeUndefined();
    expect(preloadOverYield({...ok, utilisation: 0.91})?.level).toBe('watch');
    expect(preloadOverYield({...ok, utilisation: 1})?.level).toBe('watch');
    expect(preloadOverYield({...ok, utilisation: 1.01})?.level).toBe('fail');
    expect(preloadOverYield({...ok, utilisation: 1.01})?.message).toMatch(/101 %/);
  });

  it('engagement-beyond-useful: info when both methods need less and more than 6 threads are engaged', () => {
    expect(engagementBeyondUseful(ok)?.level).toBe('info');
    expect(engagementBeyondUseful(ok)?.message).toMatch(/12\.0 mm.*11\.0 mm.*1\.0 mm/);
    expect(engagementBeyondUseful({...ok, requiredFedStd: 12})).toBeUndefined();
    expect(engagementBeyondUseful({...ok, engagedThreads: 6})).toBeUndefined();
  });

  it('blind-hole-too-shallow: watch into the 4 incomplete threads, fail when the bolt bottoms', () => {
    expect(blindHoleTooShallow({...ok, holeDepth: 18})).toBeUndefined(); // 18 - 4 x 1.5 = 12: just fits
    expect(blindHoleTooShallow({...ok, holeDepth: 17.9})?.level).toBe('watch');
    expect(blindHoleTooShallow({...ok, holeDepth: 12})?.level).toBe('watch');
    expect(blindHoleTooShallow({...ok, holeDepth: 11.9})?.level).toBe('fail');
    expect(blindHoleTooShallow({...ok, holeDepth: 11.9, internalKind: 'nut'})).toBeUndefined();
    expect(blindHoleTooShallow(ok)).toBeUndefined();
  });

  it('nonstandard-pitch and outside-model-range', () => {
    expect(nonstandardPitch(ok)).toBeUndefined();
    expect(nonstandardPitch({...ok, isStandardPitch: false, designation: 'M10x1.1'})?.message).toMatch(/M10x1\.1/);
    expect(outsideModelRange(ok)).toEqual([]);
    expect(outsideModelRange({...ok, modelRangeNotes: ['strength ratio RS 0.35 is at or below 0.4']})[0]?.code).toBe('outside-model-range');
  });

  it('codes are kebab-case with levels info|watch|fail; a sound demo joint raises only the info flag', () => {
    const flags = jointFlags({...ok, maxPreload: 100000, utilisation: 1.2, engagedThreads: 3, isStandardPitch: false, holeDepth: 5, modelRangeNotes: ['x'], bearingEstimated: true});
    for (const f of flags) {
      expect(f.code).toMatch(/^[a-z]+(-[a-z]+)*$/);
      expect(['info', 'watch', 'fail']).toContain(f.level);
    }
    expect(jointFlags(ok).map(f => f.code)).toEqual(['engagement-beyond-useful']);
  });
});
