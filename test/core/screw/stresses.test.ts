import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {principalStresses, vonMises3D, bodyStresses} from '../../../src/core/screw/stresses.js';

const comp = fc.double({min: -1000, max: 1000, noNaN: true});

describe('3D von Mises (Shigley 9th ed. Eq. 5-14, p. 419 stress state) and principal stresses (characteristic cubic, Shigley 9th ed. section 3-7; equation number from memory)', () => {
  it('equals the principal-stress form sqrt(((s1-s2)^2 + (s2-s3)^2 + (s3-s1)^2)/2) (the principal-stress form of section 5-5; equation number not checked)', () => {
    fc.assert(
      fc.property(comp, comp, comp, comp, comp, comp, (sx, sy, sz, txy, tyz, tzx) => {
        const t = {sx, sy, sz, txy, tyz, tzx};
        const [a, b, c] = principalStresses(t);
        const vmP = Math.sqrt(((a - b) ** 2 + (b - c) ** 2 + (c - a) ** 2) / 2);
        const vm = vonMises3D(t);
        return Math.abs(vm - vmP) <= 1e-7 * Math.max(1, vm) && a >= b - 1e-9 && b >= c - 1e-9;
      }),
      {numRuns: 3000},
    );
  });
  it('principal stresses keep the trace (first invariant) and are unchanged by the sign of a shear stress (left- or right-hand thread)', () => {
    fc.assert(
      fc.property(comp, comp, comp, comp, comp, comp, (sx, sy, sz, txy, tyz, tzx) => {
        const t = {sx, sy, sz, txy, tyz, tzx};
        const [a, b, c] = principalStresses(t);
        const flipped = vonMises3D({...t, tyz: -tyz});
        return Math.abs(a + b + c - (sx + sy + sz)) <= 1e-7 * Math.max(1, Math.abs(sx) + Math.abs(sy) + Math.abs(sz)) &&
          Math.abs(flipped - vonMises3D(t)) <= 1e-9 * Math.max(1, flipped);
      }),
      {numRuns: 2000},
    );
  });
  it('uniaxial stress: von Mises is the stress; pure shear: sqrt(3) tau (Shigley 9th ed. section 5-5)', () => {
    expect(vonMises3D({sx: 100, sy: 0, sz: 0, txy: 0, tyz: 0, tzx: 0})).toBeCloseTo(100, 12);
    expect(vonMises3D({sx: 0, sy: 0, sz: 0, txy: 0, tyz: 50, tzx: 0})).toBeCloseTo(50 * Math.sqrt(3), 12);
  });
  it('body stresses: sign of the axial stress follows the load direction (Eq. 8-8)', () => {
    expect(bodyStresses(1000, 0, 10, true).axial).toBeCloseTo(-4000 / (Math.PI * 100), 12);
    expect(bodyStresses(1000, 0, 10, false).axial).toBeCloseTo(4000 / (Math.PI * 100), 12);
    expect(bodyStresses(0, 1000, 10, true).torsion).toBeCloseTo(16000 / (Math.PI * 1000), 12);
  });
});
