import {describe, expect, it} from 'vitest';
import {engagementBeyondUseful, preloadOverYield, type FlagContext} from '../../../src/core/joint/flags.js';
import {checkJoint, JointInputSchema} from '../../../src/core/joint/index.js';

// Invented demo joint, as in flags.test.ts; each change tested on both sides.
const ok: FlagContext = {
  internalKind: 'tapped', maxPreload: 30000, serviceLoad: 0, weaker: 'internal', weakerForce: 60000, boltBreakForce: 46400,
  requiredMargin: 1, engagedThreads: 8, firstShare: 0.38, effectiveEngagement: 12, requiredFedStd: 11, requiredAlexander: 10,
  utilisation: 0.9, utilisationLimit: 0.9, engagement: 12, pitch: 1.5, isStandardPitch: true, designation: 'M10x1.5-6H/6g',
  modelRangeNotes: [], bearingEstimated: false, bearingDiameter: 12.8,
};

describe('preload-over-yield says the preloads above yield are not reached', () => {
  it('names the yield preload when the computed max preload is above it', () => {
    const f = preloadOverYield({...ok, utilisation: 1.69, maxPreload: 57000, yieldPreload: 33700});
    expect(f?.level).toBe('fail');
    expect(f?.message).toMatch(/It yields at about 33\.7 kN: the higher preloads shown are not reached/);
    expect(preloadOverYield({...ok, utilisation: 1.69, maxPreload: 57000})?.message).not.toMatch(/yields at about/);
  });

  it('M10 8.8 at 80 N·m, mu 0.10..0.16: yield at FM,zul / 0.9 = 33.7 kN (VDI 2230 Part 1 closed form: 30.35 kN at 90 %, muG 0.10)', () => {
    const input = JointInputSchema.parse({thread: 'M10', boltGrade: '8.8', internal: 'tapped', parent: 'S355', engagement: 15, tightening: 'torque', torque: 80});
    const r = checkJoint(input);
    const f = r.flags.find(x => x.code === 'preload-over-yield');
    expect(f?.level).toBe('fail');
    expect(f?.message).toMatch(/yields at about 33\.7 kN/);
  });
});

describe('engagement-beyond-useful is not shown for a bolt that bottoms out', () => {
  it('blind hole shallower than the bolt reach: no reassuring info; deep enough: the info stays', () => {
    const long = {...ok, effectiveEngagement: 14, engagedThreads: 9.3};
    expect(engagementBeyondUseful({...long, engagement: 20, holeDepth: 16})).toBeUndefined();
    expect(engagementBeyondUseful({...long, engagement: 15, holeDepth: 20})?.code).toBe('engagement-beyond-useful');
    expect(engagementBeyondUseful(long)?.code).toBe('engagement-beyond-useful');
  });
});
