/**
 * The sensitivity list (src/core/joint/sensitivity.ts): each end re-checked with checkJoint
 * (VDI 2230 Part 1 tightening, FED-STD-H28/2B stripping); wrench deviation ISO 6789:2003 Type II
 * class A (+-4 % above 10 N·m, +-6 % at or below); parent spread +-10 % (common practice, no source).
 */
import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {checkJoint, JointInputSchema, type JointInputDraft} from '../../../src/core/joint/index.js';
import {decidingMargin, sensitivity, wrenchDeviation} from '../../../src/core/joint/sensitivity.js';

const parse = (d: JointInputDraft) => JointInputSchema.parse(d);

describe('sensitivity', () => {
  it('is ordered by effect, largest first, with finite values (property)', () => {
    fc.assert(
      fc.property(
        fc.constantFrom('M8', 'M10', 'M12', 'M16'),
        fc.constantFrom('S235', '6061-T6', 'EN-GJL-250'),
        fc.double({min: 0.8, max: 2, noNaN: true}),
        fc.double({min: 0.06, max: 0.14, noNaN: true}),
        fc.double({min: 0, max: 0.1, noNaN: true}),
        (thread, parent, k, mu, span) => {
          const d = Number(thread.slice(1));
          const input = parse({thread, internal: 'tapped', parent, engagement: k * d, muThread: {min: mu, max: mu + span}, muHead: {min: mu, max: mu + span}});
          const items = sensitivity(input, checkJoint(input));
          expect(items.map(i => i.input).sort()).toEqual(['engagement', 'friction', 'parent-strength', 'torque']);
          for (let i = 1; i < items.length; i++) expect(items[i - 1]!.effect).toBeGreaterThanOrEqual(items[i]!.effect);
          for (const i of items) {
            expect(Number.isFinite(i.low) && Number.isFinite(i.high)).toBe(true);
            expect(i.effect).toBeCloseTo(Math.abs(i.high - i.low), 12);
          }
        },
      ),
      {numRuns: 25},
    );
  });

  it('a short thread in aluminium: bolt-breaks-first decides, engagement and parent strength move it, friction and torque do not', () => {
    // Demo: M10 8.8 into 6061-T6 with 8 mm of thread.
    const input = parse({thread: 'M10', internal: 'tapped', parent: '6061-T6', engagement: 8});
    const r = checkJoint(input);
    expect(decidingMargin(input, r).name).toBe('bolt-breaks-first');
    const items = sensitivity(input, r);
    expect(items.slice(0, 2).map(i => i.input).sort()).toEqual(['engagement', 'parent-strength']);
    const eng = items.find(i => i.input === 'engagement')!;
    expect(eng.high).toBeGreaterThan(eng.low);
    expect(items.find(i => i.input === 'friction')!.effect).toBeCloseTo(0, 9);
  });

  it('stripping margin: more friction means less preload and a larger margin; more torque a smaller one', () => {
    const input = parse({thread: 'M10', internal: 'tapped', parent: 'S235', engagement: 15, serviceLoad: 5000, muThread: {min: 0.08, max: 0.2}, muHead: {min: 0.08, max: 0.2}});
    const r = checkJoint(input);
    const items = sensitivity(input, r);
    if (decidingMargin(input, r).name === 'stripping') {
      const f = items.find(i => i.input === 'friction')!;
      expect(f.high).toBeGreaterThan(f.low);
      const t = items.find(i => i.input === 'torque')!;
      expect(t.high).toBeLessThan(t.low);
    } else {
      expect(decidingMargin(input, r).name).toBe('yield-reserve');
      const f = items.find(i => i.input === 'friction')!;
      expect(f.high).toBeGreaterThan(f.low);
    }
  });

  it('ISO 6789:2003 Type II class A: +-6 % at or below 10 N·m, +-4 % above', () => {
    expect(wrenchDeviation(10)).toBe(0.06);
    expect(wrenchDeviation(10.01)).toBe(0.04);
  });

  it('a nut joint has no parent-strength item; a nut factor has no friction item', () => {
    const nut = parse({thread: 'M12', internal: 'nut', nutClass: '8', engagement: 20, nutFactor: 0.2});
    const items = sensitivity(nut, checkJoint(nut));
    expect(items.map(i => i.input).sort()).toEqual(['engagement', 'torque']);
  });
});
