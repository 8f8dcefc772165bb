import {describe, expect, it} from 'vitest';
import {cantileverRootBending, firstThreadStresses, rootWidthFactor} from '../../src/core/thread-stress.js';
import {checkJoint, JointInputSchema} from '../../src/core/joint/index.js';
import {checkScrew, ScrewInputSchema} from '../../src/core/screw/index.js';

/**
 * Profile-aware thread-root bending. Cantilever sigma_b = 6 F h/(pi Droot nt (w p)^2), load at the
 * pitch line: R. L. Norton, Machine Design: An Integrated Approach, 4th ed. (2011), chapter "Screws
 * and Fasteners" (equation and the wi/wo table from memory). Square thread w = 0.5, h = p/4 gives
 * Shigley, Mechanical Engineering Design, 9th ed., Eq. 8-11, 6F/(pi dr nt p) exactly.
 * Geometry: ISO 68-1 basic profile (d2 = d - 0.649519 P, d3 = d - 1.226869 P).
 */
describe('root width factors', () => {
  it('ISO/Unified 0.80 external, 0.88 internal (Norton, from memory), inside the ISO 68-1 basic-profile bounds', () => {
    expect(rootWidthFactor('metric', 'external')).toBe(0.8);
    expect(rootWidthFactor('unified', 'internal')).toBe(0.88);
    // ISO 68-1 basic profile: external tooth 0.75 P at D1, 0.833 P at d3; internal 0.875 P at D
    expect(rootWidthFactor('metric', 'external')).toBeGreaterThan(0.75);
    expect(rootWidthFactor('metric', 'external')).toBeLessThan(1 - 1 / 6);
    expect(Math.abs(rootWidthFactor('metric', 'internal') - 0.875)).toBeLessThan(0.01);
  });
  it('trapezoidal 0.634 (ISO 2901: 0.5P at the pitch line, 15 deg flanks) and Acme 0.629 (ASME B1.5 basic form, 14.5 deg)', () => {
    // 0.5 + 0.5 tan 15 = 0.5 + 0.133975 = 0.633975; 0.5 + 0.5 tan 14.5 = 0.5 + 0.129309 = 0.629309
    expect(rootWidthFactor('trapezoidal', 'external')).toBeCloseTo(0.633975, 6);
    expect(rootWidthFactor('acme', 'internal')).toBeCloseTo(0.629309, 6);
    expect(rootWidthFactor('square', 'external')).toBe(0.5);
  });
  it('square thread: w = 0.5 and h = p/4 reduce to Shigley Eq. 8-11, 6F/(pi dr p)', () => {
    // 6 x 2432 x 1 / (pi 28 x 1 x (0.5 x 4)^2) = 14 592 / 351.858 = 41.4712 MPa (Shigley 9th ed. Example 8-1 (f))
    expect(cantileverRootBending(2432, 28, 1, 4, 0.5, 1)).toBeCloseTo(41.47123, 4);
  });
});

describe('first-thread bending by profile', () => {
  it('M10x1.5: ISO external tooth gives 6 x 0.4330/(0.8 x 1.5)^2 / (pi dr) per N, 0.45 of the square-thread value', () => {
    // d2 = 9.026279, d3 = 8.159697; h = (d2 - d3)/2 = 0.288675 x 1.5 = 0.433013 mm = H/3
    // C = 6 h/(w^2 p) = 6 x 0.433013/(0.64 x 1.5) = 2.70633 in place of 6
    const d2 = 10 - 0.649519 * 1.5;
    const d3 = 10 - 1.226869 * 1.5;
    const r = firstThreadStresses({force: 30000, torque: 0, dr: d3, dm: d2, pitch: 1.5, share: 0.38, nt: 1, family: 'metric'});
    const square = (6 * 0.38 * 30000) / (Math.PI * d3 * 1.5);
    expect(r.bendingSquareThread).toBeCloseTo(square, 9);
    expect(r.bending).toBeCloseTo((2.70633 * 0.38 * 30000) / (Math.PI * d3 * 1.5), 2);
    expect(r.bending / r.bendingSquareThread).toBeCloseTo(2.70633 / 6, 4);
  });
  it('checkJoint M10 8.8 in a class-8 nut: bending is profile-aware, the square-thread value sits beside it', () => {
    const r = checkJoint(JointInputSchema.parse({thread: 'M10x1.5-6H/6g', boltGrade: '8.8', internal: 'nut', nutClass: '8', engagement: 20}));
    const ft = r.stress.firstThread;
    expect(ft.bendingSquareThread).toBeDefined();
    expect(ft.bending / (ft.bendingSquareThread ?? 1)).toBeCloseTo(2.70633 / 6, 3);
    expect(ft.vonMises).toBeLessThan(ft.vonMisesSquareThread ?? 0);
  });
  it('square power screw (Shigley 9th ed. Example 8-1) keeps 41.47 MPa; an Acme screw uses w = 0.629', () => {
    const sq = checkScrew(ScrewInputSchema.parse({thread: 'square 32x4', starts: 2, load: 6400, muThread: 0.08, muCollar: 0.08, collarDiameter: 40, nutLength: 48, nutMaterial: 'bronze'}));
    expect(sq.stress.firstThread.bending).toBeCloseTo(41.47123, 4);
    expect(sq.stress.firstThread.bendingSquareThread).toBeCloseTo(41.47123, 4);
    const ac = checkScrew(ScrewInputSchema.parse({thread: '1-5 Acme', load: 6400, muThread: 0.15, nutLength: 40, nutMaterial: 'bronze'}));
    const g = ac.geometry;
    const f1 = 0.38 * 6400;
    const expected = (6 * f1 * ((g.meanDiameter - g.rootDiameter) / 2)) / (Math.PI * g.rootDiameter * (0.629309 * g.pitch) ** 2);
    expect(ac.stress.firstThread.bending).toBeCloseTo(expected, 3);
    expect(ac.stress.firstThread.bending).toBeLessThan(ac.stress.firstThread.bendingSquareThread);
  });
});
