import {describe, expect, it} from 'vitest';
import {chainBeta, hexNutArea, tappedBodyArea, threadShares} from '../../../src/core/joint/load-share.js';
import {checkJoint, JointInputSchema} from '../../../src/core/joint/index.js';
import {formatCheckText} from '../../../src/report/index.js';

// Shigley, Mechanical Engineering Design, 9th ed., section 8-2, p. 419: the first engaged thread
// carries 0.38 of the load, the second 0.25, the third 0.18. The chain is calibrated to the first
// share only; this test states what it gives for the second and third so the claim stays honest.
const steelM10 = {nominal: 10, pitch: 1.5, boltArea: 58.0, internalArea: hexNutArea(16, 10), boltModulus: 205000, internalModulus: 205000};

describe('load share: what the chain is calibrated to, and what each report number uses', () => {
  it('steel in steel, 10 threads: 38 % first (calibrated); second and third below the book (about 23.6 and 14.6 %)', () => {
    const s = threadShares(10, chainBeta(steelM10));
    expect(s[0]!).toBeCloseTo(0.38, 2);
    expect(s[1]!).toBeCloseTo(0.236, 2);
    expect(s[2]!).toBeCloseTo(0.146, 2);
    expect(s[1]!).toBeLessThan(0.25);
    expect(s[2]!).toBeLessThan(0.18);
  });
  it('a tapped hole, 6+ threads: the stresses use Shigley 0.38, the per-thread row the chain, and the report says which', () => {
    const input = JointInputSchema.parse({thread: 'M10x1.5-6H/6g', boltGrade: '8.8', internal: 'tapped', parent: 'S355', engagement: 15});
    const r = checkJoint(input);
    expect(r.firstThreadShare).toBe(0.38);
    expect(r.loadShare[0]!).toBeLessThan(0.38); // stiffer body: the chain spreads the load more
    expect(threadShares(10, chainBeta({...steelM10, internalArea: tappedBodyArea(10)}))[0]!).toBeLessThan(0.38);
    const text = formatCheckText(r, input, {units: 'si'}).replace(/\s+/g, ' ');
    expect(text).toContain('Shigley 0.38 for 6 or more threads');
    expect(text).toContain('elastic spring chain for this joint, calibrated only to the 38 % first-thread share');
  });
});
