import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {EFFORT_SCALE, REPAIR_KINDS, REPAIR_RANKING_RULE, rankOptions, type RepairOption} from '../../../src/core/repair/index.js';

const optionArb: fc.Arbitrary<RepairOption> = fc
  .record({
    kind: fc.constantFrom(...REPAIR_KINDS),
    feasible: fc.boolean(),
    meets: fc.boolean(),
    bbf: fc.option(fc.double({min: 0, max: 5, noNaN: true}), {nil: null}),
    change: fc.double({min: 0, max: 60, noNaN: true}),
  })
  .map(({kind, feasible, meets, bbf, change}) => ({
    kind,
    label: kind,
    rank: 0,
    feasible,
    meetsMargin: feasible && meets,
    reason: feasible && meets ? null : 'x',
    margin: {stripping: bbf, boltBreaksFirst: bbf},
    drill: null,
    tapThread: null,
    holeDepth: null,
    tappedDepth: null,
    drilledDepth: null,
    engagement: null,
    requiredEngagement: null,
    boltThread: 'M10x1.5',
    screwLengthChange: 0,
    torque: null,
    preload: null,
    effort: EFFORT_SCALE[kind],
    strength: null,
    insert: null,
    changeSize: change,
    flags: [],
    notes: [],
  }));

const group = (o: RepairOption): number => (!o.feasible ? 2 : o.meetsMargin ? 0 : 1);

describe('ranking rule', () => {
  it('no infeasible option above a feasible one; options meeting the margin first (property)', () => {
    fc.assert(
      fc.property(fc.array(optionArb, {maxLength: 20}), options => {
        const ranked = rankOptions(options);
        expect(ranked.map(o => o.rank)).toEqual(ranked.map((_, i) => i + 1));
        for (let i = 1; i < ranked.length; i++) {
          const a = ranked[i - 1] as RepairOption;
          const b = ranked[i] as RepairOption;
          expect(group(a)).toBeLessThanOrEqual(group(b));
          if (group(a) === 0 && group(b) === 0) expect(a.effort.grade).toBeLessThanOrEqual(b.effort.grade);
          if (group(a) === 1 && group(b) === 1) expect(a.margin.boltBreaksFirst ?? -Infinity).toBeGreaterThanOrEqual(b.margin.boltBreaksFirst ?? -Infinity);
        }
      }),
    );
  });

  it('the effort scale orders re-use before longer engagement before inserts before a new size', () => {
    const g = (k: keyof typeof EFFORT_SCALE) => EFFORT_SCALE[k].grade;
    expect(g('reuse')).toBeLessThan(g('longer-engagement'));
    expect(g('longer-engagement')).toBeLessThan(g('helical-insert'));
    expect(g('helical-insert')).toBeLessThan(g('solid-insert'));
    expect(g('solid-insert')).toBeLessThan(g('oversize'));
  });

  it('is written once, in words, naming the three groups', () => {
    expect(REPAIR_RANKING_RULE).toMatch(/meet the required margin come first/);
    expect(REPAIR_RANKING_RULE).toMatch(/fall short of the margin/);
    expect(REPAIR_RANKING_RULE).toMatch(/cannot be done here, each with the reason/);
  });
});
