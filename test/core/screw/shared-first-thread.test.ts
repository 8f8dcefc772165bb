import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {checkScrew, ScrewInputSchema} from '../../../src/core/screw/index.js';
import {threadRootStresses} from '../../../src/core/screw/stresses.js';
import {checkJoint, JointInputSchema} from '../../../src/core/joint/index.js';
import {rootStresses} from '../../../src/core/joint/thread-stress.js';

/**
 * The power screw and the fastener joint report the first-thread stresses of one implementation
 * (src/core/thread-stress.ts): Shigley, Mechanical Engineering Design, 9th ed., section 8-2,
 * Eqs. 8-7, 8-8, 8-10, 8-11 and the p. 419 state (0.38 F and 0.38 T on one thread), Eq. 5-14, plus
 * the tangential shear from the thread torque 4T1/(pi dr^2 nt p) (common practice, no source).
 * The only difference is the sign of the body axial stress: compression for a screw that pushes.
 */
const KEYS = ['axial', 'bending', 'shear', 'torsion', 'bearing', 'vonMises'] as const;

const pos = (min: number, max: number) => fc.double({min, max, noNaN: true, noDefaultInfinity: true});

describe('first-thread stresses: screw and joint give identical components for the same F, T and geometry', () => {
  it('property: the screw adapter equals the joint function, tension and compression (Shigley 9th ed. Eqs. 8-7 to 8-11)', () => {
    fc.assert(
      fc.property(
        pos(0, 2e5), pos(0, 2e6), pos(3, 80), pos(0.2, 8), pos(0.05, 1), fc.boolean(),
        (F, T, dr, p, share, compression) => {
          const dm = dr + p / 2;
          const s = threadRootStresses({load: F, torque: T, rootDiameter: dr, meanDiameter: dm, pitch: p, share, threads: 1, compression});
          const j = rootStresses({force: compression ? -F : F, torque: T, dr, dm, pitch: p, share, nt: 1});
          return KEYS.every(k => s[k] === j[k]) && s.vonMisesTextbook === j.vonMisesTextbook && s.transverseShear === j.transverseShear;
        },
      ),
      {numRuns: 500},
    );
  });

  it('checkScrew (Shigley 9th ed. Example 8-1 data, compression) reports what the joint function gives for F = -6.4 kN, T = TR', () => {
    const r = checkScrew(ScrewInputSchema.parse({
      thread: 'square 32x4', starts: 2, load: 6400, muThread: 0.08, muCollar: 0.08, collarDiameter: 40, nutLength: 48, nutMaterial: 'bronze',
    }));
    // body torque TR with the collar; the thread flanks pass only the thread torque (collar excluded)
    const j = rootStresses({force: -6400, torque: r.torque.raise * 1000, threadTorque: r.torque.raiseThread * 1000, dr: r.geometry.rootDiameter, dm: r.geometry.meanDiameter, pitch: r.geometry.pitch, share: 0.38, nt: 1, family: 'square'});
    for (const k of KEYS) expect(r.stress.firstThread[k], k).toBe(j[k]);
    expect(r.stress.body.axial).toBe(j.axial);
    expect(r.stress.body.torsion).toBe(j.torsion);
    expect(r.stress.firstThread.axial).toBeLessThan(0); // compression, Eq. 8-8
    expect(r.stress.firstThread.bearing).toBeLessThan(0); // Eq. 8-10, compressive on the flank
  });

  it('a screw in tension mirrors the compression case: axial changes sign, thread components and von Mises do not', () => {
    const base = {thread: 'Tr24x5', load: 20000, muThread: 0.1, nutLength: 40, nutMaterial: 'bronze'};
    const c = checkScrew(ScrewInputSchema.parse({...base, loadDirection: 'compression'}));
    const t = checkScrew(ScrewInputSchema.parse({...base, loadDirection: 'tension'}));
    expect(t.stress.firstThread.axial).toBeCloseTo(-c.stress.firstThread.axial, 12);
    for (const k of ['bending', 'shear', 'torsion', 'bearing', 'vonMises', 'vonMisesTextbook'] as const) {
      expect(t.stress.firstThread[k], k).toBeCloseTo(c.stress.firstThread[k], 12);
    }
  });

  it('checkJoint (M10 8.8 in a class 8 nut, 6+ threads) reports what the screw function gives for its F, T and geometry', () => {
    const r = checkJoint(JointInputSchema.parse({
      thread: 'M10x1.5-6H/6g', boltGrade: '8.8', internal: 'nut', nutClass: '8', engagement: 20, muThread: {min: 0.12, max: 0.12}, muHead: {min: 0.12, max: 0.12},
    }));
    const s = threadRootStresses({
      load: r.boltLoad, torque: r.tightening.threadTorque * 1000, rootDiameter: r.geometry.minorDiameterExternal,
      meanDiameter: r.geometry.pitchDiameter, pitch: r.geometry.pitch, share: r.firstThreadShare, threads: 1, compression: false, family: 'metric',
    });
    for (const k of KEYS) expect(r.stress.firstThread[k], k).toBe(s[k]);
  });
});
