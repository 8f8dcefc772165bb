import {describe, expect, it} from 'vitest';
import {checkScrew, ScrewInputSchema} from '../../../src/core/screw/index.js';
import {PUBLISHED_THREAD_FRICTION} from '../../../src/core/screw/torque-solve.js';

// Shigley's Mechanical Engineering Design, 9th ed., Example 8-1 (square 32x4, double thread,
// f = fc = 0.08, dc = 40 mm, F = 6.4 kN): TR = 15.937 + 10.240 = 26.177 N·m (Eqs. 8-1, 8-6).
const ex = {thread: 'square 32x4', starts: 2, muThread: 0.08, muCollar: 0.08, collarDiameter: 40, nutLength: 48, nutMaterial: 'bronze'};

describe('a known raising torque (Shigley 9th ed. Eqs. 8-1 and 8-6 solved the other way)', () => {
  it('solves the load: 26.17695 N·m at f = 0.08 raises 6400 N', () => {
    const r = checkScrew(ScrewInputSchema.parse({...ex, load: 1, torque: 26.17695}));
    expect(r.input.load).toBeCloseTo(6400, 2);
    expect(r.torque.raise).toBeCloseTo(26.17695, 6);
    expect(r.torqueSolve?.solves).toBe('load');
  });
  it('solves the friction: 26.17695 N·m raising 6400 N implies f = 0.08', () => {
    const r = checkScrew(ScrewInputSchema.parse({...ex, load: 6400, muThread: 0.2, torque: 26.17695, torqueSolves: 'friction'}));
    expect(r.torqueSolve?.friction).toBeCloseTo(0.08, 5);
    expect(r.friction.thread.max).toBeCloseTo(0.08, 5);
    expect(r.flags.find(f => f.code === 'friction-outside-tables')).toBeUndefined();
  });
  it('a friction outside the published pairs (Table 8-5: 0.04 to 0.25) raises a watch flag', () => {
    expect(PUBLISHED_THREAD_FRICTION).toEqual({min: 0.04, max: 0.25});
    const r = checkScrew(ScrewInputSchema.parse({...ex, load: 6400, torque: 60, torqueSolves: 'friction'}));
    expect(r.torqueSolve?.friction).toBeGreaterThan(0.25);
    expect(r.flags.find(f => f.code === 'friction-outside-tables')?.level).toBe('watch');
  });
  it('a torque too small to raise the load even without friction is refused, naming the field', () => {
    expect(() => checkScrew(ScrewInputSchema.parse({...ex, load: 6400, torque: 1, torqueSolves: 'friction'}))).toThrow(/torque of 1 N·m cannot raise 6400 N/);
  });
});

describe('collar torque does not pass the thread flanks', () => {
  it('first-thread tangential shear from the thread torque only: 4 x 0.38 x 15 936.95/(pi 28^2 x 4) = 2.4588 MPa', () => {
    const r = checkScrew(ScrewInputSchema.parse({...ex, load: 6400}));
    expect(r.stress.firstThread.shear).toBeCloseTo(2.4588, 4);
    expect(r.stress.body.torsion).toBeCloseTo(6.07317, 4); // body keeps TR with the collar (Eq. 8-7)
  });
});

describe("Acme stripping on the class 3G shear area (Machinery's Handbook 27th ed. Table 3)", () => {
  it('1-5 Acme: screw-thread area 1.519 in²/in x engagement; nut area scaled alike', () => {
    const r = checkScrew(ScrewInputSchema.parse({thread: '1-5 ACME-3G', load: 20000, muThread: 0.15, nutLength: 50.8, nutMaterial: 'bronze'}));
    // 1.519 in²/in x 2 in = 3.038 in² = 1960.0 mm²
    expect(r.nut.stripping.screwArea).toBeCloseTo(1.519 * 2 * 25.4 * 25.4, 1);
    const basic = Math.PI * r.geometry.nutMinorDiameter * 50.8 * (0.5 + 0.5 * Math.tan((14.5 * Math.PI) / 180));
    expect(r.nut.stripping.screwArea / basic).toBeLessThan(0.97);
    expect(r.nut.stripping.screwArea / basic).toBeGreaterThan(0.93);
  });
  it('a trapezoidal thread keeps the basic profile and says so', () => {
    const r = checkScrew(ScrewInputSchema.parse({thread: 'Tr24x5', load: 20000, muThread: 0.15, nutLength: 40, nutMaterial: 'bronze'}));
    expect(r.notes.join(' ')).toMatch(/basic profile/);
  });
});
