import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {checkScrew, ScrewInputSchema, END_CONDITIONS} from '../../../src/core/screw/index.js';
import {allowablePressure, bearingPressure, stripping} from '../../../src/core/screw/nut.js';
import {buckling} from '../../../src/core/screw/buckling.js';

const PSI = 4.4482216152605 / 25.4 ** 2; // MPa per psi (NIST SP 811)

describe('nut bearing pressure (Shigley 9th ed. Eq. 8-10 with nt = all engaged turns)', () => {
  it('Tr24x5, F = 20 kN, Le = 40 mm: p = 2F / (pi d2 Le) = 40 000 / (pi 21.5 x 40) = 14.805 MPa', () => {
    expect(bearingPressure(20000, 21.5, 40)).toBeCloseTo(14.8049, 3);
    // same as F / (z pi d2 H1) with z = 40 / 5 = 8 turns, H1 = 2.5 mm
    expect(bearingPressure(20000, 21.5, 40)).toBeCloseTo(20000 / (8 * Math.PI * 21.5 * 2.5), 9);
  });
  it('allowable pressure rows, steel screw (Shigley 9th ed. Table 8-4; from memory)', () => {
    expect(allowablePressure('bronze', 0)?.min).toBeCloseTo(2500 * PSI, 6);
    expect(allowablePressure('bronze', 0)?.max).toBeCloseTo(3500 * PSI, 6);
    expect(allowablePressure('bronze', 0.05)?.max).toBeCloseTo(2500 * PSI, 6); // 0.05 m/s = 9.8 ft/min
    expect(allowablePressure('bronze', 0.15)?.min).toBeCloseTo(800 * PSI, 6); // 29.5 ft/min
    expect(allowablePressure('bronze', 0.3)?.max).toBeCloseTo(240 * PSI, 6); // 59 ft/min
    expect(allowablePressure('cast-iron', 0.03)?.min).toBeCloseTo(1800 * PSI, 6); // 5.9 ft/min
    expect(allowablePressure('cast-iron', 0.15)?.max).toBeCloseTo(1000 * PSI, 6);
    expect(allowablePressure('cast-iron', 0.5)).toBeUndefined();
    expect(allowablePressure('none', 0)).toBeUndefined();
    // no speed given: the conservative up-to-10 ft/min row, and it says so
    expect(allowablePressure('bronze', undefined)?.condition).toMatch(/speed not given/);
  });
  it('bearing-pressure-high: watch inside the upper band, fail above it (thresholds: common practice, no source)', () => {
    const mk = (F: number) => checkScrew(ScrewInputSchema.parse({thread: 'Tr24x5', load: F, nutLength: 40, nutMaterial: 'bronze', speed: 0.15, muThread: 0.1}));
    // allowable 800 to 1400 psi = 5.516 to 9.653 MPa; p = 2F/(pi 21.5 x 40) = F x 7.4025e-4
    expect(mk(7000).flags.find(f => f.code === 'bearing-pressure-high')).toBeUndefined(); // 5.18 MPa
    expect(mk(10000).flags.find(f => f.code === 'bearing-pressure-high')?.level).toBe('watch'); // 7.40 MPa
    expect(mk(14000).flags.find(f => f.code === 'bearing-pressure-high')?.level).toBe('fail'); // 10.36 MPa
  });
});

describe('nut stripping (model: basic profile, shear on the cylinders d and D1 over the nut length)', () => {
  it('Tr24x5 in bronze, Le = 40: areas pi d Le w and pi D1 Le w with w = 0.5 + 0.5 tan 15 deg', () => {
    const w = 0.5 + 0.5 * Math.tan(Math.PI / 12);
    const s = stripping({load: 1, major: 24, nutMinor: 19, pitch: 5, nutLength: 40, shearWidthFactor: w, nutShear: 156, screwShear: 372, wear: 0});
    expect(s.nutArea).toBeCloseTo(Math.PI * 24 * 40 * w, 9); // 1911.9 mm²
    expect(s.screwArea).toBeCloseTo(Math.PI * 19 * 40 * w, 9);
    expect(s.nutForce).toBeCloseTo(156 * Math.PI * 24 * 40 * w, 6);
    expect(s.weaker).toBe('nut');
  });
  it('wear takes thickness off the nut thread; stripping force grows with nut length (property)', () => {
    fc.assert(
      fc.property(fc.double({min: 1, max: 200, noNaN: true}), fc.double({min: 0.1, max: 100, noNaN: true}), fc.double({min: 0, max: 2, noNaN: true}), (le, dl, wear) => {
        const args = {load: 1000, major: 24, nutMinor: 19, pitch: 5, shearWidthFactor: 0.634, nutShear: 156, screwShear: 372};
        const a = stripping({...args, nutLength: le, wear});
        const b = stripping({...args, nutLength: le + dl, wear});
        const worn = stripping({...args, nutLength: le, wear: wear + 0.5});
        return b.nutForce > a.nutForce && b.screwForce > a.screwForce && worn.nutForce < a.nutForce;
      }),
      {numRuns: 500},
    );
  });
  it('flags strips (fail) when the load reaches the weaker thread, and short-engagement below 6 threads', () => {
    const r = checkScrew(ScrewInputSchema.parse({thread: 'Tr24x5', load: 100000, nutLength: 10, nutMaterial: 'plastic'}));
    expect(r.flags.find(f => f.code === 'strips')?.level).toBe('fail');
    expect(r.flags.find(f => f.code === 'short-engagement')?.level).toBe('watch');
    // 2 threads engaged: share 1/2 instead of 0.38 (common practice, no source)
    expect(r.stress.firstThread.share).toBeCloseTo(0.5, 12);
  });
});

describe('column buckling (Shigley 9th ed. Eqs. 4-42/4-43 Euler, Eq. 8-9 J. B. Johnson, Table 4-2)', () => {
  it('end-condition constants of Table 4-2 (read in a stored copy of the book page, p. 183)', () => {
    expect(END_CONDITIONS['fixed-free']).toMatchObject({theoretical: 0.25, conservative: 0.25, recommended: 0.25});
    expect(END_CONDITIONS['pinned-pinned']).toMatchObject({theoretical: 1, conservative: 1, recommended: 1});
    expect(END_CONDITIONS['fixed-pinned']).toMatchObject({theoretical: 2, conservative: 1, recommended: 1.2});
    expect(END_CONDITIONS['fixed-fixed']).toMatchObject({theoretical: 4, conservative: 1, recommended: 1.2});
  });
  it('long screw, Euler: dr = 20, l = 2000, pinned: Pcr = pi^2 E A / (l/k)^2 = pi^2 x 210 000 x 314.16 / 400^2 = 4069.6 N', () => {
    const b = buckling(1000, 20, 2000, 'pinned-pinned', 340, 210000);
    expect(b.method).toBe('euler');
    expect(b.slenderness).toBeCloseTo(400, 9);
    expect(b.criticalLoad).toBeCloseTo((Math.PI ** 2 * 210000 * Math.PI * 100) / 160000, 6);
    expect(b.criticalLoad).toBeCloseTo(4069.6, 1);
  });
  it('short screw, Johnson: dr = 20, l = 300, pinned, Sy 340: Pcr = A [Sy - (Sy l/(2 pi k))^2 / (C E)]', () => {
    const b = buckling(1000, 20, 300, 'pinned-pinned', 340, 210000);
    expect(b.method).toBe('johnson');
    // l/k = 60; (340 x 300 / (2 pi 5))^2 / 210 000 = (3246.8)^2 / 210 000 = 50.199 MPa; A = 314.159
    expect(b.criticalLoad).toBeCloseTo(Math.PI * 100 * (340 - (340 * 300 / (2 * Math.PI * 5)) ** 2 / 210000), 6);
    expect(b.criticalLoad).toBeCloseTo(91045, -1);
  });
  it('the two curves meet at (l/k)1 = sqrt(2 pi^2 C E / Sy), both at Sy/2 (Shigley 9th ed. section 4-12)', () => {
    const E = 210000;
    const Sy = 340;
    const lk = Math.sqrt((2 * Math.PI ** 2 * E) / Sy);
    const A = Math.PI * 100;
    const len = lk * 5;
    const j = buckling(1, 20, len * (1 - 1e-9), 'pinned-pinned', Sy, E);
    const e = buckling(1, 20, len * (1 + 1e-9), 'pinned-pinned', Sy, E);
    expect(j.method).toBe('johnson');
    expect(e.method).toBe('euler');
    expect(j.criticalLoad / A).toBeCloseTo(Sy / 2, 4);
    expect(e.criticalLoad / A).toBeCloseTo(Sy / 2, 4);
  });
  it('checkScrew: buckling only in compression with a length, flag fail below the load', () => {
    const mk = (dir: 'compression' | 'tension', length: number) =>
      checkScrew(ScrewInputSchema.parse({thread: 'Tr24x5', load: 5000, nutLength: 40, loadDirection: dir, length, ends: 'fixed-free'}));
    expect(mk('tension', 2000).buckling.criticalLoad).toBeNull();
    expect(mk('compression', 0).buckling.checked).toBe(false);
    const long = mk('compression', 2000);
    expect(long.buckling.checked).toBe(true);
    expect(long.buckling.endConstant).toBe(0.25);
    expect(long.flags.find(f => f.code === 'buckling')?.level).toBe('fail');
  });
});

describe('wear allowance of the nut thread (same stripping model)', () => {
  it('stripping at the load exactly when the remaining allowance is used up', () => {
    const args = {load: 50000, major: 24, nutMinor: 19, pitch: 5, nutLength: 40, shearWidthFactor: 0.634, nutShear: 156, screwShear: 372, wear: 0.3};
    const s = stripping(args);
    // P (w - F / (tau pi d Le)) - wear = 5 (0.634 - 50 000 / (156 pi 24 x 40)) - 0.3 = 5 x 0.52773 - 0.3 = 2.3387 mm
    expect(s.wearToStrip).toBeCloseTo(5 * (0.634 - 50000 / (156 * Math.PI * 24 * 40)) - 0.3, 9);
    const worn = stripping({...args, wear: args.wear + s.wearToStrip});
    expect(worn.nutForce).toBeCloseTo(args.load, 6);
  });
});
