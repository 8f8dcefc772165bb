import {describe, expect, it} from 'vitest';
import {checkJoint} from '../../../src/core/joint/index.js';
import {JointInputSchema} from '../../../src/core/joint/input.js';
import {formatCheckText} from '../../../src/report/index.js';

// FED-STD-H28/2B Formula 1 (Machinery's Handbook, "length of engagement") sizes the
// engagement with a shear area of twice the tensile stress area, which is more
// demanding than the stripping-force ratio built from shear strengths of about
// 0.6 Rm. When only Formula 1 asks for more thread, the check must still say so.
describe('strips-before-break: Formula 1 asks for more than is engaged', () => {
  const input = JointInputSchema.parse({
    thread: '3/8-16 UNC', boltGrade: 'SAE-5', parent: '6061-T6',
    engagement: 12.7, tightening: 'torque', torque: 33.9,
  });
  const r = checkJoint(input);

  it('raises a watch flag naming Formula 1 and both lengths', () => {
    expect(r.stripping.effectiveEngagement).toBeLessThan(r.stripping.requiredEngagement.fedStd);
    expect(r.margin.boltBreaksFirst).toBeGreaterThanOrEqual(1);
    const f = r.flags.find(x => x.code === 'strips-before-break');
    expect(f?.level).toBe('watch');
    expect(f?.message).toMatch(/Formula 1 calls for [\d.]+ mm of full thread; only 12\.7 mm/);
  });

  it('raises no such flag once the engagement covers both methods', () => {
    const long = checkJoint({...input, engagement: 20});
    expect(long.stripping.effectiveEngagement).toBeGreaterThan(long.stripping.requiredEngagement.fedStd);
    expect(long.flags.find(x => x.code === 'strips-before-break')).toBeUndefined();
  });

  it('names the inch head and hole standards for the default bearing diameter', () => {
    const text = formatCheckText(r, input, {units: 'us'});
    expect(text).toMatch(/hex cap screw head, ASME B18\.2\.1/);
    expect(text).not.toMatch(/ISO 4014\/4017 dw,min with\s+ISO 273/);
  });
});
