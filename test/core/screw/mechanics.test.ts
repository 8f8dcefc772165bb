import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {checkScrew, ScrewInputSchema} from '../../../src/core/screw/index.js';
import {efficiency, isSelfLocking, lowerThreadTorque, raiseThreadTorque, selfLockingFriction} from '../../../src/core/screw/mechanics.js';

const base = {load: 10000, meanDiameter: 21.5, lead: 5, muCollar: 0, collarDiameter: 0};

describe('self-locking boundary (Shigley 9th ed. Eq. 8-3: f > tan lambda; f sec a > tan lambda for flanked threads)', () => {
  it('square thread: locks just above f = tan(lambda), back-drives just below', () => {
    const tanL = base.lead / (Math.PI * base.meanDiameter);
    expect(selfLockingFriction(base.lead, base.meanDiameter, 0)).toBeCloseTo(tanL, 12);
    const above = {...base, flankAngle: 0, muThread: tanL * 1.001};
    const below = {...base, flankAngle: 0, muThread: tanL * 0.999};
    expect(isSelfLocking(above)).toBe(true);
    expect(lowerThreadTorque(above)).toBeGreaterThan(0);
    expect(isSelfLocking(below)).toBe(false);
    expect(lowerThreadTorque(below)).toBeLessThan(0);
    // at the boundary the lowering torque of Eq. 8-2 is zero
    expect(lowerThreadTorque({...base, flankAngle: 0, muThread: tanL})).toBeCloseTo(0, 9);
  });
  it('Acme (alpha = 14.5 deg): boundary at f = tan(lambda) cos(alpha)', () => {
    const tanL = base.lead / (Math.PI * base.meanDiameter);
    const fb = tanL * Math.cos((14.5 * Math.PI) / 180);
    expect(selfLockingFriction(base.lead, base.meanDiameter, 14.5)).toBeCloseTo(fb, 12);
    expect(isSelfLocking({...base, flankAngle: 14.5, muThread: fb * 1.001})).toBe(true);
    expect(isSelfLocking({...base, flankAngle: 14.5, muThread: fb * 0.999})).toBe(false);
    expect(lowerThreadTorque({...base, flankAngle: 14.5, muThread: fb})).toBeCloseTo(0, 9);
  });
  it('flanked thread = square thread with f / cos(alpha) (Shigley 9th ed. p. 417, Eq. 8-5: frictional terms divided by cos alpha)', () => {
    const f = 0.12;
    const a = 15;
    const flanked = raiseThreadTorque({...base, flankAngle: a, muThread: f});
    const equiv = raiseThreadTorque({...base, flankAngle: 0, muThread: f / Math.cos((a * Math.PI) / 180)});
    expect(flanked).toBeCloseTo(equiv, 9);
  });
  it('without friction the raising torque is F l / (2 pi) and e = 1 (Shigley 9th ed. Eq. 8-4, T0)', () => {
    const t0 = raiseThreadTorque({...base, flankAngle: 15, muThread: 0});
    expect(t0).toBeCloseTo((base.load * base.lead) / (2 * Math.PI), 9);
    expect(efficiency(base.load, base.lead, t0)).toBeCloseTo(1, 12);
  });
});

describe('self-locking through checkScrew, with the back-drive flag', () => {
  // Tr24x5: d2 = 21.5 mm, tan(lambda) = 5 / (pi 21.5) = 0.07403; boundary f = 0.07403 cos 15 = 0.07151
  const mk = (mu: number, collar = 0) =>
    checkScrew(ScrewInputSchema.parse({thread: 'Tr24x5', load: 10000, muThread: mu, muCollar: collar, collarDiameter: collar ? 40 : 0, nutLength: 40}));
  it('f = 0.072 locks, f = 0.071 back-drives and fails without a collar', () => {
    expect(mk(0.072).selfLocking).toBe(true);
    expect(mk(0.072).flags.some(f => f.code === 'back-drives')).toBe(false);
    const r = mk(0.071);
    expect(r.selfLocking).toBe(false);
    expect(r.flags.find(f => f.code === 'back-drives')?.level).toBe('fail');
  });
  it('a friction range takes raising at the max and lowering at the min friction', () => {
    const r = checkScrew(ScrewInputSchema.parse({thread: 'Tr24x5', load: 10000, muThread: {min: 0.06, max: 0.16}, nutLength: 40}));
    expect(r.torque.raise).toBeCloseTo(mk(0.16).torque.raise, 12);
    expect(r.torque.lower).toBeCloseTo(mk(0.06).torque.lower, 12);
    expect(r.selfLocking).toBe(false);
  });
});

describe('properties (fast-check)', () => {
  const arb = fc.record({
    d: fc.double({min: 8, max: 200, noNaN: true}),
    pRatio: fc.double({min: 0.05, max: 0.45, noNaN: true}),
    starts: fc.integer({min: 1, max: 8}),
    f: fc.double({min: 0.01, max: 0.6, noNaN: true}),
    alpha: fc.constantFrom(0, 14.5, 15),
    F: fc.double({min: 1, max: 1e7, noNaN: true}),
  });
  it('raise torque is above lower torque; 0 < efficiency < 1 (Shigley 9th ed. Eqs. 8-1, 8-2, 8-4)', () => {
    fc.assert(
      fc.property(arb, ({d, pRatio, starts, f, alpha, F}) => {
        const P = pRatio * d;
        const dm = d - P / 2;
        const lead = starts * P;
        const sec = 1 / Math.cos((alpha * Math.PI) / 180);
        fc.pre(Math.PI * dm - f * lead * sec > 1e-6 * dm); // the raising torque exists
        const i = {load: F, meanDiameter: dm, lead, flankAngle: alpha, muThread: f, muCollar: 0, collarDiameter: 0};
        const tr = raiseThreadTorque(i);
        const tl = lowerThreadTorque(i);
        const e = efficiency(F, lead, tr);
        return tr > tl && e > 0 && e < 1;
      }),
      {numRuns: 2000},
    );
  });
  it('through checkScrew with collar: raise > lower, 0 < efficiency < 1', () => {
    const threads = ['Tr24x5', 'Tr40x14(P7)', '1-5 ACME-2G', 'square 32x4', 'Tr100x12', '1/2-10 ACME-2G'];
    fc.assert(
      fc.property(
        fc.constantFrom(...threads),
        fc.double({min: 0.02, max: 0.4, noNaN: true}),
        fc.double({min: 0, max: 0.3, noNaN: true}),
        fc.double({min: 10, max: 1e6, noNaN: true}),
        (thread, f, fcol, F) => {
          const r = checkScrew(ScrewInputSchema.parse({thread, load: F, muThread: f, muCollar: fcol, collarDiameter: 50, nutLength: 60}));
          return r.torque.raise > r.torque.lower && r.efficiency > 0 && r.efficiency < 1;
        },
      ),
      {numRuns: 500},
    );
  });
});

describe('two-start trapezoidal screw by hand (Shigley 9th ed. Eq. 8-5 and Eq. 8-2 with f sec a; ISO 2904 d2)', () => {
  it('Tr40x14(P7), F = 20 kN, f = 0.10, no collar', () => {
    // d2 = 40 - 7/2 = 36.5 mm, l = 14 mm, f sec 15 deg = 0.10 / 0.965926 = 0.1035276
    // TR = (20 000 x 36.5 / 2) (14 + pi 0.1035276 x 36.5) / (pi 36.5 - 0.1035276 x 14)
    //    = 365 000 x (14 + 11.871319) / (114.668132 - 1.449387) = 365 000 x 0.2285074 = 83 405.2 N·mm
    // TL = 365 000 x (11.871319 - 14) / (114.668132 + 1.449387) = -6 691.2 N·mm: back-drives
    // e = 20 000 x 14 / (2 pi 83 405.2) = 0.53430; lead angle atan(14 / (pi 36.5)) = 6.9609 deg
    const r = checkScrew(ScrewInputSchema.parse({thread: 'Tr40x14(P7)', load: 20000, muThread: 0.1, nutLength: 70}));
    expect(r.torque.raise).toBeCloseTo(83.4052, 3);
    expect(r.torque.lower).toBeCloseTo(-6.6912, 3);
    expect(r.efficiency).toBeCloseTo(0.53430, 4);
    expect(r.leadAngle).toBeCloseTo(6.9609, 3);
    expect(r.selfLocking).toBe(false);
    expect(r.flags.find(f => f.code === 'back-drives')?.level).toBe('fail');
  });
});

describe('self-locking-marginal (info; threshold 1.5 x tan lambda is common practice, no source)', () => {
  // Tr24x5: tan(lambda) = 0.0740256, f sec a at the boundary x 1.5: f = 1.5 x 0.0740256 x cos 15 deg = 0.107254
  const mk = (mu: number) => checkScrew(ScrewInputSchema.parse({thread: 'Tr24x5', load: 10000, muThread: mu, nutLength: 40}));
  it('is raised just below 1.5 x and not just above', () => {
    expect(mk(0.107).flags.find(f => f.code === 'self-locking-marginal')?.level).toBe('info');
    expect(mk(0.1075).flags.find(f => f.code === 'self-locking-marginal')).toBeUndefined();
    expect(mk(0.07).flags.find(f => f.code === 'self-locking-marginal')).toBeUndefined(); // back-drives instead
  });
});
