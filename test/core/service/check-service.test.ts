/**
 * checkService end to end on checkJoint results: the JSON contract keys, the
 * no-clamp behaviour, and a published worked example run through the whole chain.
 */
import {describe, expect, it} from 'vitest';
import {checkJoint, JointInputSchema, type JointInputDraft} from '../../../src/core/joint/index.js';
import {checkService, ServiceInputSchema, type ServiceInputDraft} from '../../../src/core/service/index.js';
import {JointInputError} from '../../../src/core/joint/errors.js';

function run(joint: JointInputDraft, service: ServiceInputDraft) {
  const input = JointInputSchema.parse(joint);
  return checkService(input, checkJoint(input), ServiceInputSchema.parse(service));
}

const M12_NUT: JointInputDraft = {thread: 'M12x1.75', boltGrade: '8.8', internal: 'nut', nutClass: '8', engagement: 10, muThread: {min: 0.12, max: 0.12}, muHead: {min: 0.12, max: 0.12}};

describe('checkService', () => {
  it("Marks' Calculations for Machine Design, Ch. 8, Example 4 end to end: separation factor 4.5 (printed), load factor 4.79 (recomputed)", () => {
    // Example 1-4 SI inputs: M12 (A_T 84.3 mm²), steel 20 mm over cast iron 25 mm (110 GPa), L 60, L_threaded 30,
    // S_proof 600 MPa (given here as a custom bolt: Rp 600/0.85, so the 0.85 rule gives 600), preload 0.75 F_proof, P 11,000 N.
    // Our bolt modulus is the grade's 205 GPa (the book: 207), so C and the factors agree to about 1 %.
    const s = run({...M12_NUT, boltRm: 830, boltRp: 600 / 0.85}, {clamp: [{thickness: 20, modulus: 207_000}, {thickness: 25, modulus: 110_000}], boltLength: 60, threadLength: 30, serviceLoad: 11_000, embedding: 0, preloadProof: 0.75});
    expect(s.model).toBe('shared');
    expect(s.jointConstant).toBeCloseTo(0.24, 2);
    expect(Math.abs(s.preload.max / (0.75 * 600 * 84.3) - 1)).toBeLessThan(0.001); // As of M12 84.27 mm² (book 84.3)
    expect(Math.abs((s.factors.separation ?? 0) / 4.54 - 1)).toBeLessThan(0.01);
    expect(Math.abs((s.factors.load ?? 0) / 4.79 - 1)).toBeLessThan(0.01);
    expect(s.stiffness?.members).toBeCloseTo(1.472e6, -4);
  });

  it('gives every key of the JSON contract when clamped parts are given', () => {
    const s = run({...M12_NUT}, {clamp: [{thickness: 3, material: 'steel'}, {thickness: 15, material: '6082-T6'}, {thickness: 15, material: 'S235'}], serviceLoad: {min: 2000, max: 9000}, serviceTemperature: 80, transverseLoad: 1000});
    for (const v of [s.stiffness?.bolt, s.stiffness?.members, s.jointConstant, s.separationLoad, s.preloadRetained.min, s.preloadRetained.max, s.embeddingLoss, s.thermalChange, s.factors.yield, s.factors.load, s.factors.separation, s.factors.fatigue, s.fatigue?.alternatingStress, s.fatigue?.meanStress, s.fatigue?.enduranceStrength, s.bearingPressure?.head, s.bearingPressure?.limit]) {
      expect(typeof v).toBe('number');
      expect(Number.isFinite(v)).toBe(true);
    }
    expect(s.slip?.requiredClamp).toBeCloseTo(1000 / 0.1, 6);
    expect(s.embeddingLoss).toBeGreaterThan(0);
    // Aluminium between steel heats up more than the steel bolt: preload gained.
    expect(s.thermalChange).toBeGreaterThan(0);
    expect(JSON.parse(JSON.stringify(s)).jointConstant).toBe(s.jointConstant);
  });

  it('without clamped parts the load is taken in full and says so', () => {
    const s = run({...M12_NUT, serviceLoad: 5000}, {});
    expect(s.model).toBe('in-full');
    expect(s.jointConstant).toBe(1);
    // No clamped parts: no separation load (absent, so the JSON has no null).
    expect(s.separationLoad).toBeUndefined();
    expect('separationLoad' in s).toBe(false);
    expect(s.notes.join(' ')).toMatch(/taken in full/);
  });

  it('flags joint-separates with its number when the load exceeds the separation load', () => {
    const s = run({...M12_NUT, tightening: 'preload', preload: 10_000}, {clamp: [{thickness: 30, material: 'steel'}], serviceLoad: 30_000, embedding: 0});
    const f = s.flags.find(x => x.code === 'joint-separates');
    expect(f?.level).toBe('fail');
    expect(f?.message).toMatch(/separates at \d+\.\d+ kN/);
  });

  it('flags bearing-pressure-high under a head on soft aluminium with a washer suggestion', () => {
    const s = run({...M12_NUT, boltGrade: '12.9', nutClass: '12'}, {clamp: [{thickness: 20, material: 'AlSi9Cu3-DC'}, {thickness: 20, material: 'S355'}]});
    const f = s.flags.find(x => x.code === 'bearing-pressure-high');
    expect(f, JSON.stringify(s.bearingPressure)).toBeDefined();
    expect(s.bearingPressure?.washerDiameter).toBeGreaterThan(s.bearingPressure?.bearingDiameter ?? 0);
  });

  it('a tapped hole needs the thread-holding part listed last, and an unknown id names --clamp', () => {
    const tapped: JointInputDraft = {thread: 'M10', boltGrade: '8.8', internal: 'tapped', parent: 'EN-GJL-250', engagement: 15};
    expect(() => run(tapped, {clamp: [{thickness: 10, material: 'steel'}]})).toThrow(JointInputError);
    expect(() => run(tapped, {clamp: [{thickness: 10, material: 'stel'}, {thickness: 30, material: 'EN-GJL-250'}]})).toThrow(/--clamp: entry 1/);
    const s = run(tapped, {clamp: [{thickness: 10, material: 'steel'}, {thickness: 30, material: 'EN-GJL-250'}]});
    expect(s.grip).toBe(15); // h + d/2 (Shigley 9th ed. Table 8-7)
  });
});

describe('checkService on any reasonable input', () => {
  it('a bolt length that does not reach past the parts is named', () => {
    expect(() => run({...M12_NUT}, {clamp: [{thickness: 30, material: 'steel'}], boltLength: 25})).toThrow(/--bolt-length/);
  });
});

describe('fatigue without a Shigley Table 8-17 row', () => {
  it('A2-70 compares the VDI 2230 thread endurance limit with the alternating stress (from memory)', () => {
    const s = run({thread: 'M12x1.75', boltGrade: 'A2-70', internal: 'nut', nutClass: '8', engagement: 10}, {clamp: [{thickness: 30, material: 'steel'}], serviceLoad: {min: 0, max: 8000}});
    expect(s.fatigue?.enduranceStrength).toBeCloseTo(0.85 * (150 / 12 + 45), 6);
    expect(s.factors.fatigue).toBeCloseTo(s.fatigue!.vdiFactor, 9);
    expect(s.fatigue?.enduranceSource).toMatch(/no Shigley Table 8-17 value/);
  });
});
