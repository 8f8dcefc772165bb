/**
 * Least clamp load at assembly from a service state (src/core/joint/window-clamp.ts):
 * FM,min = FK,erf + (1 - C) FA,max + FZ + thermal loss (Shigley's Mechanical Engineering
 * Design 9th ed. Eqs. 8-24, 8-29; VDI 2230 Part 1 R1, R12/2, equation numbers from memory).
 * The ServiceResult is built by hand (invented numbers, demo).
 */
import {describe, expect, it} from 'vitest';
import {leastClampAtAssembly} from '../../../src/core/joint/window-clamp.js';
import type {ServiceResult} from '../../../src/core/service/result.js';

const base: ServiceResult = {
  model: 'shared',
  jointConstant: 0.2,
  serviceLoad: {min: 0, max: 10_000, cyclic: true},
  preload: {min: 20_000, nominal: 25_000, max: 30_000, source: 'demo'},
  proofLoad: 35_000,
  separationLoad: 20_000,
  preloadRetained: {min: 18_000, max: 28_500},
  clampUnderLoad: 10_000,
  embeddingLoss: 1_500,
  embeddingAmount: 0.01,
  embeddingSource: 'demo',
  thermalChange: -500,
  boltLoadMax: 32_000,
  factors: {yield: 1.1, load: 2, separation: 2.25},
  slip: {transverseLoad: 600, friction: 0.2, requiredClamp: 3_000, availableClamp: 10_000, factor: 3.33},
  flags: [],
  notes: [],
  sources: [],
};

describe('leastClampAtAssembly', () => {
  it('adds the slip need, the load share off the parts, embedding and a thermal loss', () => {
    const r = leastClampAtAssembly(base)!;
    expect(r.slip).toBe(3_000);
    expect(r.separation).toBeCloseTo(8_000, 9); // (1 - 0.2) x 10 kN
    expect(r.embedding).toBe(1_500);
    expect(r.thermal).toBe(500);
    expect(r.value).toBeCloseTo(13_000, 9);
  });

  it('a thermal gain adds nothing; no transverse load: separation only', () => {
    const {slip: _slip, ...noSlip} = base;
    const r = leastClampAtAssembly({...noSlip, thermalChange: 800})!;
    expect(r.thermal).toBe(0);
    expect(r.value).toBeCloseTo(9_500, 9);
  });

  it('at that preload the clamp left under load just covers the slip need (same sum as the service state)', () => {
    const r = leastClampAtAssembly(base)!;
    const retainedMin = r.value - base.embeddingLoss + Math.min(0, base.thermalChange);
    const clampUnderLoad = retainedMin - (1 - base.jointConstant) * base.serviceLoad.max;
    expect(clampUnderLoad).toBeCloseTo(base.slip!.requiredClamp, 9);
  });

  it('the bolt taking the load in full (no clamped parts) gives no least clamp load', () => {
    const {slip: _slip, ...noSlip} = base;
    expect(leastClampAtAssembly({...noSlip, model: 'in-full', jointConstant: 1, embeddingLoss: 0, thermalChange: 0})).toBeUndefined();
  });
});
