import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {checkJoint, JointInputError, JointInputSchema, type JointInputDraft} from '../../../src/core/joint/index.js';

const run = (d: JointInputDraft) => checkJoint(JointInputSchema.parse(d));
const M10_NUT: JointInputDraft = {thread: 'M10x1.5-6H/6g', boltGrade: '8.8', internal: 'nut', nutClass: '8', engagement: 20, muThread: {min: 0.12, max: 0.12}, muHead: {min: 0.12, max: 0.12}};

describe('checkJoint', () => {
  it('M10 8.8 at 90 % with mu 0.12: 29.6 kN and 48.5 N·m (VDI 2230 Part 1 Table A1: 29.6 kN / 48 N·m, from memory)', () => {
    const r = run(M10_NUT);
    expect(r.tightening.preload.max / 1000).toBeCloseTo(29.6, 1);
    expect(Math.abs(r.tightening.torque - 48)).toBeLessThanOrEqual(1); // from memory: 48 N·m
    expect(r.tightening.utilisation).toBeCloseTo(0.9, 6);
    expect(r.tightening.bearingSource).toBe('standard');
    // Bolt break force As Rm = 58.0 x 800 = 46 400 N (ISO 898-1 minimum ultimate tensile load, M10 8.8).
    expect(Math.abs(r.stripping.boltBreakForce - 46400)).toBeLessThan(50);
  });

  it('default bearing diameter reproduces the VDI 2230 Part 1 fine-thread table: M8x1 8.8 20.2 kN / 26.1 N·m, M10x1.25 10.9 46.4 kN / 75 N·m (mu 0.12, 90 %)', () => {
    const a = run({...M10_NUT, thread: 'M8x1'});
    expect(Math.abs(a.tightening.preload.max / 1000 - 20.2)).toBeLessThanOrEqual(0.1);
    expect(Math.abs(a.tightening.torque - 26.1)).toBeLessThanOrEqual(0.5);
    const b = run({...M10_NUT, thread: 'M10x1.25', boltGrade: '10.9', nutClass: '10'});
    expect(Math.abs(b.tightening.preload.max / 1000 - 46.4)).toBeLessThanOrEqual(0.1);
    expect(Math.abs(b.tightening.torque - 75)).toBeLessThanOrEqual(0.5);
  });

  it('uses the least-material limits of the classes and says so (FED-STD-H28/2B)', () => {
    const r = run(M10_NUT);
    expect(r.stripping.limitsUsed).toEqual({external: 'least-material', internal: 'least-material'});
    expect(r.stripping.limits.knMax).toBe(r.geometry.limits.internal.minorMax);
    expect(r.stripping.limits.dsMin).toBe(r.geometry.limits.external.majorMin);
  });

  it('nut: the engagement is cut to the nut height (ISO 4032 m min by default)', () => {
    const r = run(M10_NUT);
    expect(r.stripping.effectiveEngagement).toBeLessThanOrEqual(8.4);
    expect(r.stripping.engagedThreads).toBeCloseTo(r.stripping.effectiveEngagement / 1.5, 12);
  });

  it('first-thread share: 0.38 from 6 engaged threads (Shigley 9th ed. p. 419), else the chain share', () => {
    const long = run({thread: 'M10', parent: 'S355', engagement: 15});
    expect(long.firstThreadShare).toBe(0.38);
    const short = run({thread: 'M10', parent: 'S355', engagement: 6});
    expect(short.firstThreadShare).toBeGreaterThan(0.38);
    // Steel bolt in a steel nut (the calibration joint): the chain share itself, within 0.01.
    const nut = run({...M10_NUT, nutHeight: 6});
    expect(Math.abs(nut.firstThreadShare - nut.loadShare[0]!)).toBeLessThan(0.01);
    expect(short.flags.map(f => f.code)).toContain('short-engagement');
    const sum = long.loadShare.reduce((a, b) => a + b, 0);
    expect(sum).toBeCloseTo(1, 12);
  });

  it('property: the first-thread share never falls below 0.38 and does not rise as engagement grows', () => {
    fc.assert(
      fc.property(fc.double({min: 0.6, max: 30, noNaN: true}), fc.double({min: 0.1, max: 10, noNaN: true}), fc.constantFrom('S355', '6061-T6', 'EN-GJL-250'), (le, extra, parent) => {
        const a = run({thread: 'M10', parent, engagement: le});
        const b = run({thread: 'M10', parent, engagement: le + extra});
        return a.firstThreadShare >= 0.38 && a.firstThreadShare <= 1 && b.firstThreadShare <= a.firstThreadShare + 1e-12;
      }),
      {numRuns: 100},
    );
  });

  it('property: stripping forces grow with engagement (FED-STD-H28/2B areas are proportional to Le)', () => {
    fc.assert(
      fc.property(fc.double({min: 2, max: 60, noNaN: true}), fc.double({min: 0.1, max: 20, noNaN: true}), (le, extra) => {
        const a = run({thread: 'M12', parent: 'S355', engagement: le});
        const b = run({thread: 'M12', parent: 'S355', engagement: le + extra});
        return b.stripping.external.force > a.stripping.external.force && b.stripping.internal.force > a.stripping.internal.force;
      }),
      {numRuns: 100},
    );
  });

  it('unknown thread, grade, parent or nut class: JointInputError naming the field', () => {
    const field = (d: JointInputDraft): string => {
      try {
        run(d);
      } catch (e) {
        if (e instanceof JointInputError) return e.field;
        throw e;
      }
      return 'none';
    };
    expect(field({thread: 'M10x7', parent: 'S355', engagement: 10})).toBe('thread');
    expect(field({thread: 'Tr20x4', parent: 'S355', engagement: 10})).toBe('thread');
    expect(field({thread: 'M10', boltGrade: '99.9', parent: 'S355', engagement: 10})).toBe('boltGrade');
    expect(field({thread: 'M10', parent: 'unobtainium', engagement: 10})).toBe('parent');
    expect(field({thread: 'M10', engagement: 10})).toBe('parent');
    // a nut without a class takes the class matching the bolt grade (8.8: class 8); a stainless bolt has no default
    expect(field({thread: 'M10', internal: 'nut', engagement: 10})).toBe('none');
    expect(field({thread: 'M10', boltGrade: 'A2-70', internal: 'nut', engagement: 10})).toBe('nutClass');
    expect(field({thread: 'M10', internal: 'nut', nutClass: 'zz', engagement: 10})).toBe('nutClass');
    expect(field({thread: 'M10', parent: 'S355', engagement: 10, chamfer: 10})).toBe('chamfer');
    expect(field({thread: 'M10', parent: 'S355', engagement: 10, tightening: 'torque'})).toBe('torque');
    expect(field({thread: 'M10', parent: 'S355', engagement: 10, tightening: 'preload'})).toBe('preload');
    expect(field({thread: 'M10', parent: 'S355', engagement: 10, boltRp: 900})).toBe('boltRp');
  });

  it('blind hole: the last 4 pitches are incomplete thread and do not count (plug-tap chamfer, common practice)', () => {
    const r = run({thread: 'M10', parent: 'S355', engagement: 15, holeDepth: 18});
    expect(r.stripping.effectiveEngagement).toBeCloseTo(18 - 4 * 1.5, 12);
    expect(r.flags.find(f => f.code === 'blind-hole-too-shallow')?.level).toBe('watch');
    const through = run({thread: 'M10', parent: 'S355', engagement: 15, chamfer: 1});
    expect(through.stripping.effectiveEngagement).toBeCloseTo(14, 12);
    expect(through.stripping.requiredEngagedLength?.fedStd).toBeCloseTo(through.stripping.requiredEngagement.fedStd + 1, 12);
  });

  it('custom parent strength: shear taken as 0.6 Rm (textbook assumption, from memory) and labelled', () => {
    const r = run({thread: 'M10', parentRm: 300, engagement: 15});
    expect(r.materials.internal.shear).toBeCloseTo(180, 9);
    expect(r.materials.internal.provenance.source).toMatch(/from memory/);
  });

  it('weak parent, strong bolt: RS <= 0.4 is flagged outside the published range of C3 (Alexander / VDI 2230)', () => {
    const r = run({thread: 'M10', boltGrade: '12.9', parent: 'AZ91-DC', engagement: 20});
    expect(r.stripping.alexander.rs).toBeLessThanOrEqual(0.4);
    expect(r.flags.map(f => f.code)).toContain('outside-model-range');
  });

  it('a nut: C1 from s/d (ISO 4032 s = 16 mm for M10: s/d 1.6, C1 0.91, from memory)', () => {
    const r = run(M10_NUT);
    expect(r.stripping.alexander.c1).toBeCloseTo(0.91, 3);
  });

  it('special pitch is flagged; an inch size without a head table gets an estimated bearing diameter and says so', () => {
    const special = run({thread: 'M10x1.1', parent: 'S355', engagement: 15});
    expect(special.flags.map(f => f.code)).toContain('nonstandard-pitch');
    const inch = run({thread: '1-1/4-7 UNC', boltGrade: 'SAE-5', parent: 'S355', engagement: 40});
    expect(inch.tightening.bearingSource).toBe('estimate');
    expect(inch.flags.map(f => f.code)).toContain('bearing-diameter-estimated');
  });

  it('1/2-13 UNC: bearing diameter from the inch hex cap screw table, (F min + normal hole)/2 (ASME B18.2.1, ASME B18.2.8; bearing face from memory)', () => {
    const r = run({thread: '1/2-13 UNC', boltGrade: 'SAE-5', parent: 'S355', engagement: 12});
    // (0.736 + 0.562) / 2 = 0.649 in = 16.4846 mm
    expect(r.tightening.bearingSource).toBe('standard');
    expect(r.tightening.bearingDiameter).toBeCloseTo(16.4846, 4);
    expect(r.flags.map(f => f.code)).not.toContain('bearing-diameter-estimated');
    expect(r.notes.join(' ')).toMatch(/from memory/);
  });

  it('service load adds to the largest bolt load in full (conservative: no joint stiffness factor)', () => {
    const a = run({thread: 'M10', parent: 'S355', engagement: 15});
    const b = run({thread: 'M10', parent: 'S355', engagement: 15, serviceLoad: 5000});
    expect(b.boltLoad - a.boltLoad).toBeCloseTo(5000, 9);
    expect(b.margin.stripping).toBeLessThan(a.margin.stripping);
  });
});
