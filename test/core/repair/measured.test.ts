import {describe, expect, it} from 'vitest';
import {JointInputError, JointInputSchema} from '../../../src/core/joint/index.js';
import {planRepairs} from '../../../src/core/repair/index.js';
import {boltOnly, wornBoreCheck} from '../../../src/core/repair/measured-fit.js';

// Demo scenario (invented): an M10 screw in a worn 6082-T6 bracket.
const joint = (measured: object) => JointInputSchema.parse({thread: 'M10', boltGrade: '8.8', parent: '6082-T6', engagement: 15, measured});

describe('repairs use the measured state of the hole', () => {
  it('a worn but threaded hole: the as-is margins are as measured; the insert and oversize drills clean up the bore', () => {
    const plan = planRepairs(joint({holeMinorDiameter: 9.1, holePitchDiameter: 9.35}), {});
    const reuse = plan.options.find(o => o.kind === 'reuse');
    const lm = planRepairs(JointInputSchema.parse({thread: 'M10', boltGrade: '8.8', parent: '6082-T6', engagement: 15}), {});
    expect(plan.asIs?.margin.boltBreaksFirst).toBeLessThan(lm.asIs?.margin.boltBreaksFirst ?? 0);
    expect(reuse?.margin?.boltBreaksFirst).toBeCloseTo(plan.asIs?.margin.boltBreaksFirst ?? 0, 9);
    const helical = plan.options.find(o => o.kind === 'helical-insert');
    expect(helical?.notes.join(' ')).toMatch(/removes the worn bore/);
  });

  it('a stripped hole: an option whose tap drill is below the measured bore is not fit, one whose drill is above it stays fit (drills: M10 STI 10.4 mm, M12x1.5 10.5 mm, M12x1.25 10.8 mm)', () => {
    const at = (minor: number) => planRepairs(joint({holeMinorDiameter: minor}), {holeState: 'stripped', strippedDepth: 15});
    const wornReason = /worn to a minor diameter of .* \(measured\), beyond the .* tap drill/;
    const a = at(10.45);
    for (const h of a.options.filter(o => o.kind === 'helical-insert')) expect(h.reason ?? '').toMatch(wornReason);
    expect(a.options.find(o => o.label.includes('M12x1.5'))?.notes.join(' ')).toMatch(/removes the worn bore/);
    const b = at(10.6);
    const m12 = b.options.find(o => o.label.includes('M12x1.5'));
    expect(m12?.feasible).toBe(false);
    expect(m12?.reason).toMatch(/worn to a minor diameter of 10\.60 mm \(measured\), beyond the 10\.50 mm tap drill of the M12x1\.5/);
    expect(b.options.find(o => o.label.includes('M12x1.25'))?.reason ?? '').not.toMatch(wornReason);
    expect(b.notes.join(' ')).toMatch(/leave no thread in the stripped zone/);
  });

  it('a hole minor past the bolt major on a hole called intact is refused naming the field', () => {
    expect(() => planRepairs(joint({holeMinorDiameter: 10.3}), {})).toThrow(JointInputError);
  });

  it('the bolt keeps its own measurements in a new insert; the hole\'s are dropped', () => {
    expect(boltOnly({holeMinorDiameter: 9, boltMajorDiameter: 9.8, gauges: {holeNoGo: 'enters', boltGo: 'enters'}})).toEqual({boltMajorDiameter: 9.8, gauges: {boltGo: 'enters'}});
    expect(boltOnly({holeMinorDiameter: 9})).toBeUndefined();
    expect(wornBoreCheck(undefined, 10.2, 'x')).toBeNull();
    expect(wornBoreCheck(10.2, 10.2, 'x')?.fit).toBe(true);
  });
});
