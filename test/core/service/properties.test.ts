/**
 * Properties of the service-state model (fast-check): 0 < C < 1; stiffer parts lower C;
 * more embedding lowers the retained preload; the separation factor falls as the load rises.
 * Model: Shigley's Mechanical Engineering Design, 9th ed., Eqs. 8-17, 8-18, 8-30; VDI 2230 Part 1 embedding loss (from memory).
 */
import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {boltStiffness, jointConstant, memberStiffness, type Layer} from '../../../src/core/service/stiffness.js';
import {embeddingLoss, separationFactor} from '../../../src/core/service/loads.js';

const layer = fc.record({thickness: fc.double({min: 0.5, max: 200, noNaN: true}), modulus: fc.double({min: 20_000, max: 250_000, noNaN: true})});
const stack = fc.array(layer, {minLength: 1, maxLength: 6});
const d = fc.double({min: 3, max: 48, noNaN: true});

function constant(layers: Layer[], dd: number): number {
  const grip = layers.reduce((s, l) => s + l.thickness, 0);
  const kb = boltStiffness({d: dd, stressArea: 0.7 * (Math.PI / 4) * dd * dd, modulus: 205_000, grip, inch: false}).stiffness;
  return jointConstant(kb, memberStiffness(layers, dd).stiffness);
}

describe('service model properties', () => {
  it('0 < C < 1 for any stack', () => {
    fc.assert(fc.property(stack, d, (layers, dd) => {
      const C = constant(layers, dd);
      return C > 0 && C < 1;
    }));
  });
  it('stiffer parts lower C', () => {
    fc.assert(fc.property(stack, d, fc.double({min: 1.01, max: 3, noNaN: true}), (layers, dd, f) => {
      const stiffer = layers.map(l => ({thickness: l.thickness, modulus: l.modulus * f}));
      return constant(stiffer, dd) < constant(layers, dd);
    }));
  });
  it('more embedding lowers the retained preload', () => {
    fc.assert(fc.property(fc.double({min: 1e4, max: 1e7, noNaN: true}), fc.double({min: 1e4, max: 1e7, noNaN: true}), fc.double({min: 0, max: 0.05, noNaN: true}), fc.double({min: 1e-5, max: 0.05, noNaN: true}), (kb, km, fz, more) => {
      const Fi = 50_000;
      return Fi - embeddingLoss(fz + more, kb, km) < Fi - embeddingLoss(fz, kb, km);
    }));
  });
  it('the separation factor falls as the load rises', () => {
    fc.assert(fc.property(fc.double({min: 1, max: 1e6, noNaN: true}), fc.double({min: 0.01, max: 0.99, noNaN: true}), fc.double({min: 1, max: 1e6, noNaN: true}), fc.double({min: 1, max: 1e6, noNaN: true}), (Fi, C, P, dP) => {
      return separationFactor(Fi, P + dP, C) < separationFactor(Fi, P, C);
    }));
  });
});
