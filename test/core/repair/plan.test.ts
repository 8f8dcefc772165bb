import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {JointInputSchema, type JointInputDraft} from '../../../src/core/joint/index.js';
import {defaultDeps, planRepairs, REPAIR_KINDS, RepairInputSchema, type RepairOption} from '../../../src/core/repair/index.js';
import {planContext} from '../../../src/core/repair/plan.js';
import {checkAtReach} from '../../../src/core/repair/same-thread.js';

const joint = (j: JointInputDraft) => JointInputSchema.parse(j);
const byKind = (options: RepairOption[], kind: string) => options.filter(o => o.kind === kind);
const feasibleBeforeInfeasible = (options: RepairOption[]) => {
  const firstInfeasible = options.findIndex(o => !o.feasible);
  return firstInfeasible < 0 || options.slice(firstInfeasible).every(o => !o.feasible);
};

describe('repair plan: sanity checks (common practice, no source)', () => {
  it('in wrought aluminium a 1.5D to 2D helical insert lets an 8.8 bolt break before the threads strip', () => {
    for (const thread of ['M8', 'M10', 'M12']) {
      const plan = planRepairs(joint({thread, boltGrade: '8.8', parent: '6082-T6', engagement: 10}), {});
      for (const label of ['helical insert 1.5D', 'helical insert 2D']) {
        const o = plan.options.find(x => x.label === label);
        expect(o?.feasible).toBe(true);
        expect(o?.margin.boltBreaksFirst ?? 0).toBeGreaterThanOrEqual(1);
      }
    }
  });

  it('an M8 into cast aluminium with 8 mm engagement ranks an insert or longer engagement above re-use', () => {
    const plan = planRepairs(joint({thread: 'M8', boltGrade: '8.8', parent: 'AlSi7Mg-T6', engagement: 8}), {});
    const reuse = byKind(plan.options, 'reuse')[0];
    const better = plan.options.filter(o => ['helical-insert', 'solid-insert', 'longer-engagement'].includes(o.kind) && o.meetsMargin);
    expect(reuse?.meetsMargin).toBe(false);
    expect(better.length).toBeGreaterThan(0);
    expect(Math.min(...better.map(o => o.rank))).toBeLessThan(reuse?.rank ?? 0);
    expect(plan.options[0]?.kind).toMatch(/^(helical-insert|longer-engagement)$/);
  });
});

describe('repair plan: options and reasons', () => {
  const base = joint({thread: 'M10', boltGrade: '8.8', parent: 'AlSi7Mg-T6', engagement: 12});

  it('lists every kind, ranks 1..n, and gives the helical insert both strengths and which governs', () => {
    const plan = planRepairs(base, {through: true, depthAvailable: 40});
    expect(new Set(plan.options.map(o => o.kind))).toEqual(new Set(REPAIR_KINDS));
    expect(plan.options.map(o => o.rank)).toEqual(plan.options.map((_, i) => i + 1));
    const coil = plan.options.find(o => o.label === 'helical insert 2D');
    expect(coil?.strength?.parts.map(p => p.name)).toEqual(['bolt thread in the insert', 'insert wire thread', 'parent at the receiving thread']);
    const weakest = Math.min(...(coil?.strength?.parts.map(p => p.force) ?? []));
    expect(coil?.strength?.parts.find(p => p.name === coil.strength?.governs)?.force).toBe(weakest);
    expect(coil?.tapThread).toBe('M10x1.5 STI');
    expect(coil?.drill).toBeCloseTo(10.4, 6);
  });

  it('longer engagement gives the engagement each method requires and at least the larger of them times the margin', () => {
    const plan = planRepairs(base, {margin: 1.2});
    const le = byKind(plan.options, 'longer-engagement')[0];
    const req = le?.requiredEngagement;
    expect(req?.fedStd).toBeGreaterThan(0);
    expect(req?.alexander).toBeGreaterThan(0);
    expect(le?.engagement ?? 0).toBeGreaterThanOrEqual(Math.max(req?.fedStd ?? 0, req?.alexander ?? 0) * 1.2 - 1e-9);
    expect(le?.meetsMargin).toBe(true);
  });

  it('a stripped hole with no good thread left cannot be re-used', () => {
    const plan = planRepairs(base, {holeState: 'stripped', strippedDepth: 12});
    const reuse = byKind(plan.options, 'reuse')[0];
    expect(reuse?.feasible).toBe(false);
    expect(reuse?.reason).toMatch(/no good thread left/);
  });

  it('a blind hole rules out the through-bolt; a fixed screw length rules out longer engagement', () => {
    const plan = planRepairs(base, {boltLengthMayChange: false});
    expect(byKind(plan.options, 'through-bolt')[0]?.reason).toMatch(/blind/);
    expect(byKind(plan.options, 'longer-engagement')[0]?.reason).toMatch(/screw length is fixed/);
  });

  it('a thin wall rules out options that remove material, naming the wall', () => {
    const plan = planRepairs(base, {wall: 8});
    for (const o of byKind(plan.options, 'helical-insert')) {
      expect(o.feasible).toBe(false);
      expect(o.reason).toMatch(/wall/);
    }
    expect(byKind(plan.options, 'reuse')[0]?.feasible).toBe(true);
  });

  it('a shallow blind hole rules out the long inserts with the depth needed', () => {
    const plan = planRepairs(base, {depthAvailable: 20});
    const long = plan.options.find(o => o.label === 'helical insert 3D');
    expect(long?.feasible).toBe(false);
    expect(long?.reason).toMatch(/needs a hole .* mm deep.*20 mm available/);
  });

  it('a thread missing from the solid insert table gives one infeasible solid option', () => {
    const plan = planRepairs(joint({thread: 'M14', boltGrade: '8.8', parent: 'AlSi7Mg-T6', engagement: 14}), {});
    const solid = byKind(plan.options, 'solid-insert');
    expect(solid).toHaveLength(1);
    expect(solid[0]?.reason).toMatch(/no M14x2 entry/);
  });

  it('oversize candidates are larger series sizes with the same or finer pitch', () => {
    const plan = planRepairs(base, {});
    const over = byKind(plan.options, 'oversize');
    expect(over.length).toBeGreaterThan(0);
    for (const o of over) {
      expect(o.boltThread).toMatch(/^M1[2-9]/);
      expect(o.tapThread).toBe(o.boltThread);
    }
  });

  it('the through-bolt uses a nut matched to the bolt grade', () => {
    const plan = planRepairs(base, {through: true, depthAvailable: 30});
    const tb = byKind(plan.options, 'through-bolt')[0];
    expect(tb?.feasible).toBe(true);
    expect(tb?.notes.join(' ')).toMatch(/nut class 8/);
    expect(tb?.drill).toBe(11);
  });
});

const threads = ['M6', 'M8', 'M10', 'M12', 'M16', '1/4-20', '3/8-16'];
const parents = ['6082-T6', 'AlSi7Mg-T6', '6061-T6', '7075-T6'];

describe('repair plan: properties', () => {
  it('margins of a longer engagement never fall below those of a shorter one', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...threads), fc.constantFrom(...parents), fc.constantFrom('8.8', '10.9'),
        fc.double({min: 0.5, max: 3, noNaN: true}), fc.double({min: 0.01, max: 2, noNaN: true}),
        (thread, parent, boltGrade, k, dk) => {
          const j = joint({thread, boltGrade, parent, engagement: 10});
          const ctx = planContext(defaultDeps(), j, RepairInputSchema.parse({}));
          const d = ctx.thread.nominal;
          const shorter = checkAtReach(ctx, k * d);
          const longer = checkAtReach(ctx, (k + dk) * d);
          if (!shorter.ok || !longer.ok) throw new Error('not computed');
          expect(longer.result.margin.stripping).toBeGreaterThanOrEqual(shorter.result.margin.stripping - 1e-12);
          expect(longer.result.margin.boltBreaksFirst).toBeGreaterThanOrEqual(shorter.result.margin.boltBreaksFirst - 1e-12);
        },
      ),
      {numRuns: 60},
    );
  });

  it('no infeasible option is ranked above a feasible one, whatever the hole (property)', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...threads), fc.constantFrom(...parents),
        fc.record({
          holeState: fc.constantFrom('intact' as const, 'stripped' as const),
          strippedFraction: fc.double({min: 0, max: 1, noNaN: true}),
          through: fc.boolean(),
          depthAvailable: fc.option(fc.double({min: 5, max: 80, noNaN: true}), {nil: undefined}),
          wall: fc.option(fc.double({min: 3, max: 40, noNaN: true}), {nil: undefined}),
          boltLengthMayChange: fc.boolean(),
          margin: fc.double({min: 0.5, max: 2, noNaN: true}),
        }),
        (thread, parent, h) => {
          const engagement = 12;
          const plan = planRepairs(joint({thread, boltGrade: '8.8', parent, engagement}), {
            holeState: h.holeState,
            strippedDepth: h.holeState === 'stripped' ? h.strippedFraction * engagement : undefined,
            through: h.through,
            depthAvailable: h.depthAvailable === undefined ? undefined : Math.max(h.depthAvailable, engagement),
            wall: h.wall,
            boltLengthMayChange: h.boltLengthMayChange,
            margin: h.margin,
          });
          expect(feasibleBeforeInfeasible(plan.options)).toBe(true);
          for (const o of plan.options) {
            if (o.feasible) {
              expect(Number.isFinite(o.margin.stripping)).toBe(true);
              expect(Number.isFinite(o.margin.boltBreaksFirst)).toBe(true);
              expect(Number.isFinite(o.torque)).toBe(true);
            } else {
              expect(o.reason).toBeTruthy();
            }
            if (o.meetsMargin) expect(o.margin.boltBreaksFirst ?? 0).toBeGreaterThanOrEqual(h.margin - 1e-9);
          }
        },
      ),
      {numRuns: 40},
    );
  });
});
