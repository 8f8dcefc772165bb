import {describe, expect, it} from 'vitest';
import {upperTensileStrength} from '../../../src/core/materials/bolt-upper-strength.js';
import {checkJoint, JointInputSchema} from '../../../src/core/joint/index.js';

// ISO 898-1:2013 Table 3: Rm,min and HV min/max per property class (8.8 d <= 16: 800 MPa, 250..320 HV;
// 10.9: 1040 MPa, 320..380 HV; 12.9: 1220 MPa, 385..435 HV). Rm proportional to HV (ISO 18265
// conversion, from memory). VDI 2230 Part 1 section 5.5.5 uses Rm,max for the minimum engagement (from memory).
describe('upper bolt tensile strength for bolt-breaks-first', () => {
  it('ISO 898-1 classes: Rm,min x HV max / HV min', () => {
    expect(upperTensileStrength('8.8', 800, 10).rm).toBeCloseTo(1024, 6); // 800 x 320/250
    expect(upperTensileStrength('8.8', 830, 20).rm).toBeCloseTo(1090.39, 2); // 830 x 335/255
    expect(upperTensileStrength('10.9', 1040, 10).rm).toBeCloseTo(1235, 6); // 1040 x 380/320
    expect(upperTensileStrength('12.9', 1220, 10).rm).toBeCloseTo(1378.44, 2); // 1220 x 435/385
    expect(upperTensileStrength('8.8', 800, 10).source).toMatch(/from memory/);
  });
  it('other bolts: 1.2 x Rm,min, labelled from memory', () => {
    const u = upperTensileStrength('SAE-5', 827.4, 12.7);
    expect(u.rm).toBeCloseTo(992.9, 1);
    expect(u.source).toMatch(/from memory/);
  });
  it('checkJoint M10 8.8 in a class-8 nut: both margins, the upper one deciding', () => {
    const r = checkJoint(JointInputSchema.parse({thread: 'M10x1.5-6H/6g', boltGrade: '8.8', internal: 'nut', nutClass: '8', engagement: 8.04}));
    const weaker = Math.min(r.stripping.external.force, r.stripping.internal.force);
    const as = r.geometry.stressArea;
    expect(as).toBeCloseTo(58.0, 1); // As 58.0 mm², ISO 898-1
    expect(r.stripping.boltBreakForce).toBeCloseTo(as * 800, 6);
    expect(r.stripping.boltBreakForceUpper).toBeCloseTo(as * 1024, 6);
    expect(r.margin.boltBreaksFirst).toBeCloseTo(weaker / (as * 1024), 9);
    expect(r.margin.boltBreaksFirstMinStrength).toBeCloseTo(weaker / (as * 800), 9);
  });
});
