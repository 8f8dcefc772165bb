import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {ScrewInputSchema, checkScrew} from '../../../src/core/screw/index.js';
import {BacklashInputError, nutWearFromBacklash, playFromAllowance, screwBacklash} from '../../../src/core/screw/backlash.js';

// Demo scenario (invented): a Tr24x5 lead screw of a press table in a 40 mm bronze nut, 20 kN.
const INPUT = ScrewInputSchema.parse({thread: 'Tr24x5', load: 20000, nutLength: 40, nutMaterial: 'bronze'});

describe('nut wear from axial backlash (profile geometry)', () => {
  it('axial wear is the growth of the play; the flank-normal layer is that times cos a', () => {
    const w = nutWearFromBacklash(0.6, 0.1, 15);
    expect(w.axialWear).toBeCloseTo(0.5, 12);
    expect(w.flankWear).toBeCloseTo(0.5 * Math.cos((15 * Math.PI) / 180), 12);
    expect(nutWearFromBacklash(0.3, 0.1, 0).flankWear).toBeCloseTo(0.2, 12);
  });

  it('new-nut play from an Acme pitch-diameter allowance: 0.259 x allowance (Machinery\'s Handbook 31st ed., p. 2135, thickness at the basic pitch line)', () => {
    expect(playFromAllowance(1, 14.5)).toBeCloseTo(0.259, 3);
  });
});

describe('screwBacklash: margin left and the replace-by backlash', () => {
  it('feeds the wear to the nut-wear input of checkScrew', () => {
    const b = screwBacklash(INPUT, 0.6, 0.1, 2);
    const direct = checkScrew({...INPUT, nutWear: 0.5});
    expect(b.result.nut.stripping.nutForce).toBeCloseTo(direct.nut.stripping.nutForce, 6);
    expect(b.axialWear).toBeCloseTo(0.5, 12);
  });

  it('at the replace-by backlash the nut is exactly at the required margin (same nut model)', () => {
    const b = screwBacklash(INPUT, 0.1, 0.1, 3);
    expect(b.replaceBy).not.toBeNull();
    const at = screwBacklash(INPUT, b.replaceBy as number, 0.1, 3);
    expect(at.result.nut.stripping.nutForce / INPUT.load).toBeCloseTo(3, 6);
    expect(at.replaceNow).toBe(true);
    expect(b.replaceNow).toBe(false);
  });

  it('property: more backlash never raises the margin left (fast-check)', () => {
    fc.assert(
      fc.property(fc.double({min: 0, max: 1.5, noNaN: true}), fc.double({min: 0, max: 1, noNaN: true}), (b, db) => {
        const a = screwBacklash(INPUT, 0.1 + b, 0.1, 2).margin;
        const c = screwBacklash(INPUT, 0.1 + Math.min(b + db, 1.6), 0.1, 2).margin;
        return c <= a + 1e-9;
      }),
      {numRuns: 40},
    );
  });

  it('a backlash below the new-nut play, or one that wears the thread through, names the backlash', () => {
    expect(() => screwBacklash(INPUT, 0.05, 0.1)).toThrow(BacklashInputError);
    expect(() => screwBacklash(INPUT, 4, 0.1)).toThrow(/whole thread thickness.*accepted: below/);
  });
});
