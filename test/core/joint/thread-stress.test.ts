import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {vonMises, type StressState} from '../../../src/core/joint/von-mises.js';
import {internalRootVonMises, rootStresses, shankStresses} from '../../../src/core/joint/thread-stress.js';

/** Eigenvalues of a symmetric 3x3 matrix by cyclic Jacobi rotations (test-only). */
function principal(s: StressState): [number, number, number] {
  const a = [
    [s.sx, s.txy, s.tzx],
    [s.txy, s.sy, s.tyz],
    [s.tzx, s.tyz, s.sz],
  ];
  const at = (i: number, j: number): number => a[i]![j]!;
  const set = (i: number, j: number, v: number): void => {
    a[i]![j] = v;
  };
  for (let sweep = 0; sweep < 50; sweep++) {
    const off = at(0, 1) ** 2 + at(0, 2) ** 2 + at(1, 2) ** 2;
    if (off < 1e-24 * (1 + at(0, 0) ** 2 + at(1, 1) ** 2 + at(2, 2) ** 2)) break;
    for (const [p, q] of [[0, 1], [0, 2], [1, 2]] as const) {
      if (at(p, q) === 0) continue;
      const theta = (at(q, q) - at(p, p)) / (2 * at(p, q));
      const t = Math.sign(theta || 1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
      const c = 1 / Math.sqrt(t * t + 1);
      const sn = t * c;
      for (let k = 0; k < 3; k++) {
        const akp = at(k, p);
        const akq = at(k, q);
        set(k, p, c * akp - sn * akq);
        set(k, q, sn * akp + c * akq);
      }
      for (let k = 0; k < 3; k++) {
        const apk = at(p, k);
        const aqk = at(q, k);
        set(p, k, c * apk - sn * aqk);
        set(q, k, sn * apk + c * aqk);
      }
    }
  }
  return [at(0, 0), at(1, 1), at(2, 2)];
}

const stress = fc.double({min: -2000, max: 2000, noNaN: true});
const state = fc.record({sx: stress, sy: stress, sz: stress, txy: stress, tyz: stress, tzx: stress});

describe('von Mises (Shigley 9th ed. Eq. 5-14)', () => {
  it('uniaxial tension gives the stress itself; pure shear gives sqrt(3) tau (Shigley 9th ed. section 5-5)', () => {
    expect(vonMises({sx: 300, sy: 0, sz: 0, txy: 0, tyz: 0, tzx: 0})).toBeCloseTo(300, 12);
    expect(vonMises({sx: 0, sy: 0, sz: 0, txy: 100, tyz: 0, tzx: 0})).toBeCloseTo(100 * Math.sqrt(3), 12);
  });

  it('property: from the components equals from the principal stresses (eigenvalues of the tensor), Shigley Eqs. 5-12 and 5-14', () => {
    fc.assert(
      fc.property(state, s => {
        const [s1, s2, s3] = principal(s);
        const fromPrincipal = Math.sqrt(((s1 - s2) ** 2 + (s2 - s3) ** 2 + (s3 - s1) ** 2) / 2);
        return Math.abs(fromPrincipal - vonMises(s)) <= 1e-7 * (1 + vonMises(s));
      }),
      {numRuns: 500},
    );
  });

  it('property: flipping the sign of any shear stress (left- or right-hand thread) does not change it', () => {
    fc.assert(
      fc.property(state, fc.constantFrom('txy', 'tyz', 'tzx') as fc.Arbitrary<'txy' | 'tyz' | 'tzx'>, (s, key) => {
        const flipped = {...s, [key]: -s[key]};
        return Math.abs(vonMises(flipped) - vonMises(s)) <= 1e-9 * (1 + vonMises(s));
      }),
      {numRuns: 300},
    );
  });
});

describe('first-thread root stresses (Shigley, Mechanical Engineering Design, 9th ed., section 8-2)', () => {
  // Invented demo numbers; each check restates the book's equation.
  const F = 20000; // N
  const T = 30000; // N·mm
  const dr = 8.16;
  const dm = 9.026;
  const p = 1.5;
  const r = rootStresses({force: F, torque: T, dr, dm, pitch: p, share: 0.38, nt: 1});

  it('body axial 4F/(pi dr^2), Eq. 8-8 (tension + for a bolt)', () => {
    expect(r.axial).toBeCloseTo((4 * F) / (Math.PI * dr * dr), 9);
  });
  it('body torsion 16T/(pi dr^3), Eq. 8-7', () => {
    expect(r.torsion).toBeCloseTo((16 * T) / (Math.PI * dr ** 3), 9);
  });
  it('root bending 6F/(pi dr nt p) with 0.38F and nt = 1, Eq. 8-11 and p. 419', () => {
    expect(r.bending).toBeCloseTo((6 * 0.38 * F) / (Math.PI * dr * p), 9);
  });
  it('thread bearing -2F/(pi dm nt p) with 0.38F and nt = 1, Eq. 8-10 (compressive)', () => {
    expect(r.bearing).toBeCloseTo((-2 * 0.38 * F) / (Math.PI * dm * p), 9);
  });
  it('tangential shear from the thread torque 4T/(pi dr^2 nt p) with 0.38T (peak factor 2: common practice, no source)', () => {
    expect(r.shear).toBeCloseTo((4 * 0.38 * T) / (Math.PI * dr * dr * p), 9);
  });
  it('von Mises of the root state sx = bending, sy = axial, tyz = torsion, txy = 0 (Shigley p. 419) plus tzx = tangential shear, at the worse fillet', () => {
    // Both fillets of the tooth root carry the body stresses, the bending with either sign; the worse
    // one (bending opposite to the body tension) is kept (common practice, no source).
    const at = (sx: number) => Math.sqrt(((sx - r.axial) ** 2 + r.axial ** 2 + sx ** 2 + 6 * (r.torsion ** 2 + r.shear ** 2)) / 2);
    expect(r.vonMises).toBeCloseTo(at(-r.bending), 9);
    expect(r.vonMises).toBeGreaterThan(at(r.bending));
    expect(r.state).toEqual({sx: -r.bending, sy: r.axial, sz: 0, txy: 0, tyz: r.torsion, tzx: r.shear});
  });
  it('the textbook value is the same state without the tangential shear (Shigley p. 419)', () => {
    expect(r.vonMisesTextbook).toBeCloseTo(Math.sqrt(((r.bending + r.axial) ** 2 + r.axial ** 2 + r.bending ** 2 + 6 * r.torsion ** 2) / 2), 9);
    expect(r.transverseShear).toBeCloseTo((3 * 0.38 * F) / (Math.PI * dr * p), 9); // Eq. 8-12
  });
  it('nt spreads the thread stresses: nt = 2 halves bending, bearing and tangential shear (Eqs. 8-10, 8-11)', () => {
    const r2 = rootStresses({force: F, torque: T, dr, dm, pitch: p, share: 0.38, nt: 2});
    expect(r2.bending).toBeCloseTo(r.bending / 2, 9);
    expect(r2.bearing).toBeCloseTo(r.bearing / 2, 9);
    expect(r2.shear).toBeCloseTo(r.shear / 2, 9);
    expect(r2.axial).toBeCloseTo(r.axial, 9);
  });
  it('a power screw in compression (negative F, Eq. 8-8 sign): axial only gives von Mises = |axial|', () => {
    const c = rootStresses({force: -F, torque: 0, dr, dm, pitch: p, share: 0, nt: 1});
    expect(c.axial).toBeLessThan(0);
    expect(c.vonMises).toBeCloseTo(Math.abs(c.axial), 9);
  });
  it('a power screw in compression: bearing stays compressive and bending keeps its size; sx = +bending as in Shigley p. 419', () => {
    const c = rootStresses({force: -F, torque: T, dr, dm, pitch: p, share: 0.38, nt: 1});
    expect(c.axial).toBeCloseTo(-r.axial, 9);
    expect(c.bearing).toBeCloseTo(r.bearing, 9);
    expect(c.bending).toBeCloseTo(r.bending, 9);
    expect(c.state.sx).toBeCloseTo(r.bending, 9);
    // reversing the load mirrors the state: same von Mises in tension and in compression
    expect(c.vonMises).toBeCloseTo(r.vonMises, 9);
  });
  it('shank on the stress section: F/As and 16T/(pi d0^3), von Mises sqrt(s^2 + 3 t^2) (Shigley Eq. 5-15)', () => {
    const sh = shankStresses(F, T, 58, 8.593);
    expect(sh.axial).toBeCloseTo(F / 58, 9);
    expect(sh.torsion).toBeCloseTo((16 * T) / (Math.PI * 8.593 ** 3), 9);
    expect(sh.vonMises).toBeCloseTo(Math.hypot(sh.axial, Math.sqrt(3) * sh.torsion), 9);
  });
  it('internal thread root: same tooth formulas at the major diameter (common practice, no source)', () => {
    const v = internalRootVonMises(F, T, 10, p, 0.38);
    const b = (6 * 0.38 * F) / (Math.PI * 10 * p);
    const t = (4 * 0.38 * T) / (Math.PI * 100 * p);
    expect(v).toBeCloseTo(Math.sqrt(b * b + 3 * t * t), 9);
  });
});
