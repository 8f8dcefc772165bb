/**
 * checkService never crashes on valid input: any stack of parts, load range, temperature
 * and transverse load gives finite contract numbers or a JointInputError naming the field.
 */
import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {checkJoint, JointInputSchema} from '../../../src/core/joint/index.js';
import {JointInputError} from '../../../src/core/joint/errors.js';
import {checkService, clampMaterialIds, ServiceInputSchema} from '../../../src/core/service/index.js';

const nut = JointInputSchema.parse({thread: 'M12x1.75', boltGrade: '10.9', internal: 'nut', nutClass: '10', engagement: 10});
const tapped = JointInputSchema.parse({thread: 'M10', boltGrade: '8.8', internal: 'tapped', parent: '6082-T6', engagement: 20});
const results = {nut: checkJoint(nut), tapped: checkJoint(tapped)};
const part = fc.record({thickness: fc.double({min: 0.05, max: 300, noNaN: true}), material: fc.constantFrom(...clampMaterialIds())});

describe('checkService robustness', () => {
  it('finite numbers or a named error', () => {
    fc.assert(
      fc.property(fc.boolean(), fc.array(part, {minLength: 1, maxLength: 6}), fc.double({min: 0, max: 200_000, noNaN: true}), fc.double({min: 0, max: 1, noNaN: true}), fc.option(fc.double({min: -60, max: 300, noNaN: true}), {nil: undefined}), fc.option(fc.double({min: 0, max: 50_000, noNaN: true}), {nil: undefined}), (isNut, clamp, pMax, ratio, temp, transverse) => {
        const input = isNut ? nut : tapped;
        const service = ServiceInputSchema.parse({clamp, serviceLoad: {min: pMax * ratio, max: pMax}, ...(temp !== undefined ? {serviceTemperature: temp} : {}), ...(transverse !== undefined ? {transverseLoad: transverse} : {})});
        try {
          const s = checkService(input, isNut ? results.nut : results.tapped, service);
          for (const v of [s.stiffness?.bolt, s.stiffness?.members, s.jointConstant, s.separationLoad, s.preloadRetained.min, s.preloadRetained.max, s.embeddingLoss, s.thermalChange, s.factors.yield, s.bearingPressure?.head]) {
            expect(Number.isFinite(v), JSON.stringify({clamp, v})).toBe(true);
          }
          expect(s.jointConstant).toBeGreaterThan(0);
          expect(s.jointConstant).toBeLessThan(1);
        } catch (e) {
          expect(e).toBeInstanceOf(JointInputError);
        }
      }),
      {numRuns: 300},
    );
  });
});
