import {describe, expect, it} from 'vitest';
import {checkJoint} from '../../../src/core/joint/index.js';
import {JointInputSchema} from '../../../src/core/joint/input.js';
import {formatCheckText} from '../../../src/report/index.js';

// FED-STD-H28/2B Formula 1 (Machinery's Handbook, "length of engagement") sizes the
// engagement with a shear area of twice the tensile stress area, which is more
// demanding than the stripping-force ratio built from shear strengths of about
// 0.6 Rm. When only Formula 1 asks for more thread, the check must still say so.
describe('engagement-below-required: Formula 1 asks for more than is engaged', () => {
  const input = JointInputSchema.parse({
    thread: '3/8-16 UNC', boltGrade: 'SAE-5', parent: '6061-T6',
    engagement: 12.7, tightening: 'torque', torque: 33.9,
  });
  const r = checkJoint(input);

  // Bolt-breaks-first is taken at the upper bolt strength Rm,max (VDI 2230 Part 1, from memory),
  // which is stricter than Formula 1 (built on minimum strengths) for this inch joint: at 12.7 mm
  // it now fails on the force ratio. A 12.9 bolt in S355 at 13.5 mm still shows the Formula-1 case.
  it('raises a watch flag naming Formula 1 and both lengths', () => {
    const i129 = JointInputSchema.parse({thread: 'M10', boltGrade: '12.9', parent: 'S355', engagement: 13.5});
    const r129 = checkJoint(i129);
    expect(r129.stripping.effectiveEngagement).toBeLessThan(r129.stripping.requiredEngagement.fedStd);
    expect(r129.margin.boltBreaksFirst).toBeGreaterThanOrEqual(1);
    // The forces still put the bolt first: its own code, not strips-before-break (issue 14 item 14).
    expect(r129.flags.find(x => x.code === 'strips-before-break')).toBeUndefined();
    const f = r129.flags.find(x => x.code === 'engagement-below-required');
    expect(f?.level).toBe('watch');
    expect(f?.message).toMatch(/Formula 1 calls for [\d.]+ mm of full thread; only 13\.5 mm/);
  });

  it('the 3/8-16 SAE-5 joint in 6061-T6 at 12.7 mm: bolt first at Rm,min, thread first at Rm,max: fail', () => {
    expect(r.margin.boltBreaksFirstMinStrength).toBeGreaterThanOrEqual(0.99);
    expect(r.margin.boltBreaksFirst).toBeLessThan(1);
    expect(r.flags.find(x => x.code === 'strips-before-break')?.level).toBe('fail');
  });

  it('raises no such flag once the engagement covers both methods', () => {
    const long = checkJoint({...input, engagement: 20});
    expect(long.stripping.effectiveEngagement).toBeGreaterThan(long.stripping.requiredEngagement.fedStd);
    expect(long.flags.find(x => x.code === 'strips-before-break')).toBeUndefined();
    expect(long.flags.find(x => x.code === 'engagement-below-required')).toBeUndefined();
  });

  it('on a lifting duty the engagement shortfall is raised to FAIL (src/core/duty.ts RAISED_ON_DUTY)', () => {
    const lifting = checkJoint(JointInputSchema.parse({thread: 'M10', boltGrade: '12.9', parent: 'S355', engagement: 13.5, duty: 'lifting'}));
    const f = lifting.flags.find(x => x.code === 'engagement-below-required');
    expect(f?.level).toBe('fail');
    expect(f?.message).toMatch(/raised to FAIL/);
  });

  it('names the inch head and hole standards for the default bearing diameter', () => {
    const text = formatCheckText(r, input, {units: 'us'});
    expect(text).toMatch(/hex cap screw head, ASME B18\.2\.1/);
    expect(text).not.toMatch(/ISO 4014\/4017 dw,min with\s+ISO 273/);
  });
});
