/**
 * The tightening window (src/core/joint/window.ts). Method: VDI 2230 Part 1 torque-preload
 * relation MA = FM (0.16 P + 0.58 d2 muG + muK DKm/2) with ISO 16047 friction definitions;
 * limits from the check itself (VDI 2230 Part 1 FM,zul; FED-STD-H28/2B stripping forces;
 * ISO 898-1 As x Rm). The properties re-run checkJoint at the window's ends.
 */
import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {checkJoint, JointInputSchema, type JointInput, type JointInputDraft} from '../../../src/core/joint/index.js';
import {tighteningWindow} from '../../../src/core/joint/window.js';

const UPPER_FLAGS = ['preload-over-yield', 'strips-at-preload'];
const parse = (d: JointInputDraft): JointInput => JointInputSchema.parse(d);
const atTorque = (input: JointInput, torque: number) => checkJoint({...input, tightening: 'torque', torque});
const upperFlags = (input: JointInput, torque: number) => atTorque(input, torque).flags.filter(f => UPPER_FLAGS.includes(f.code));

const joint: fc.Arbitrary<{input: JointInput; leastClamp?: number}> = fc
  .record({
    thread: fc.constantFrom('M6', 'M8', 'M10', 'M12', 'M16', 'M20', 'M24', 'M10x1.25', '1/2-13 UNC', '3/8-16 UNC'),
    boltGrade: fc.constantFrom('8.8', '10.9', '12.9', '5.8', 'A2-70'),
    tapped: fc.boolean(),
    parent: fc.constantFrom('S235', 'C45', 'EN-GJL-250', '6061-T6', 'AlSi9Cu3-DC'),
    engageD: fc.double({min: 0.6, max: 2.5, noNaN: true}),
    muLo: fc.double({min: 0.04, max: 0.2, noNaN: true}),
    muSpan: fc.double({min: 0, max: 0.12, noNaN: true}),
    headLo: fc.double({min: 0.04, max: 0.2, noNaN: true}),
    scatter: fc.double({min: 1, max: 2, noNaN: true}),
    serviceFrac: fc.double({min: 0, max: 0.3, noNaN: true}),
    margin: fc.constantFrom(1, 1.2),
    clampFrac: fc.option(fc.double({min: 0.05, max: 0.6, noNaN: true}), {nil: undefined}),
  })
  .map(r => {
    const d = r.thread.startsWith('M') ? Number(r.thread.slice(1).split('x')[0]) : r.thread.startsWith('1/2') ? 12.7 : 9.525;
    const base = parse({
      thread: r.thread,
      boltGrade: r.boltGrade,
      ...(r.tapped ? {internal: 'tapped', parent: r.parent} : {internal: 'nut', nutClass: '8', nutHeight: 0.8 * d, nutFlats: 1.6 * d}),
      engagement: r.engageD * d,
      muThread: {min: r.muLo, max: r.muLo + r.muSpan},
      muHead: {min: r.headLo, max: r.headLo + r.muSpan},
      scatter: r.scatter,
      requiredMargin: r.margin,
    });
    const ref = checkJoint(base);
    const input = {...base, serviceLoad: r.serviceFrac * ref.tightening.permissiblePreload};
    return r.clampFrac === undefined ? {input} : {input, leastClamp: r.clampFrac * ref.tightening.permissiblePreload};
  });

describe('tighteningWindow', () => {
  it('at the window ends the joint sits on the named limits (within 0.5 %), inside no upper-limit flag, just outside one is violated', () => {
    let open = 0;
    fc.assert(
      fc.property(joint, ({input, leastClamp}) => {
        const result = checkJoint(input);
        const w = tighteningWindow(input, result, leastClamp !== undefined ? {leastClamp} : {});
        expect(w.empty).toBe(w.torque === undefined);
        if (!w.torque || w.torque.min < 0.02) return;
        open++;
        const hi = w.limits.find(l => l.name === w.upperLimit)!;
        const lo = w.limits.find(l => l.name === w.lowerLimit)!;
        const atMax = atTorque(input, w.torque.max);
        const atMin = atTorque(input, w.torque.min);
        expect(Math.abs(atMax.tightening.preload.max / hi.preload - 1)).toBeLessThan(0.005);
        expect(Math.abs(atMin.tightening.preload.min / lo.preload - 1)).toBeLessThan(0.005);
        if (leastClamp !== undefined) expect(Math.abs(atMin.tightening.preload.min / leastClamp - 1)).toBeLessThan(0.005);
        for (const f of [0.01, 0.5, 0.99]) {
          const T = w.torque.min + f * (w.torque.max - w.torque.min);
          expect(upperFlags(input, T)).toEqual([]);
          const r = atTorque(input, T);
          for (const l of w.limits.filter(x => x.kind === 'lower')) expect(r.tightening.preload.min).toBeGreaterThanOrEqual(l.preload * (1 - 1e-9));
        }
        const above = upperFlags(input, w.torque.max * 1.01);
        if (w.upperLimit !== 'bolt-break') expect(above.length).toBeGreaterThan(0);
        const below = atTorque(input, w.torque.min * 0.99);
        expect(below.tightening.preload.min).toBeLessThan(lo.preload);
      }),
      {numRuns: 60},
    );
    expect(open).toBeGreaterThan(15); // most generated joints have a band: the ends were really checked
  });

  it('an empty window names the crossing limits and has no torque key', () => {
    // Demo: M10 8.8 in a short aluminium thread with a large clamp need.
    const input = parse({thread: 'M10', internal: 'tapped', parent: '6061-T6', engagement: 6, muThread: {min: 0.08, max: 0.2}, muHead: {min: 0.08, max: 0.2}});
    const r = checkJoint(input);
    const w = tighteningWindow(input, r, {leastClamp: 20000});
    expect(w.empty).toBe(true);
    expect(w.torque).toBeUndefined();
    expect(w.lowerLimit).toBe('least-clamp');
    expect(w.upperLimit).toBe('stripping');
    expect(w.suggestions.join(' ')).toMatch(/insert/);
    expect(JSON.parse(JSON.stringify(w))).not.toHaveProperty('torque');
  });

  it('the JSON keys of the contract: window.torque.{min,max}, window.limits[] {name, preload}, window.empty', () => {
    const input = parse({thread: 'M10', internal: 'nut', nutClass: '8', engagement: 20});
    const w = JSON.parse(JSON.stringify(tighteningWindow(input, checkJoint(input))));
    expect(typeof w.torque.min).toBe('number');
    expect(typeof w.torque.max).toBe('number');
    expect(w.empty).toBe(false);
    for (const l of w.limits) {
      expect(typeof l.name).toBe('string');
      expect(typeof l.preload).toBe('number');
    }
  });

  it('without a least clamp load the floor is 0.4 of the yield-utilisation preload (common practice, no source)', () => {
    const input = parse({thread: 'M12', internal: 'nut', nutClass: '8', engagement: 24});
    const w = tighteningWindow(input, checkJoint(input));
    const y = w.limits.find(l => l.name === 'yield-utilisation')!;
    const f = w.limits.find(l => l.name === 'preload-floor')!;
    expect(f.preload).toBeCloseTo(0.4 * y.preload, 6);
    expect(w.notes.join(' ')).toMatch(/common practice, no source/);
  });

  it('VDI 2230 Part 1 Table A1 (from memory): M10 8.8, mu 0.12, nu 0.9: the top of the band is 29.6 kN at about 48 N·m', () => {
    const input = parse({thread: 'M10x1.5-6H/6g', boltGrade: '8.8', internal: 'nut', nutClass: '8', engagement: 20, muThread: {min: 0.12, max: 0.12}, muHead: {min: 0.12, max: 0.12}});
    const w = tighteningWindow(input, checkJoint(input));
    expect(w.upperLimit).toBe('yield-utilisation');
    expect(w.limits.find(l => l.name === 'yield-utilisation')!.preload / 1000).toBeCloseTo(29.6, 1);
    expect(Math.abs(w.torque!.max - 48)).toBeLessThanOrEqual(1);
  });

  it('a prevailing torque adds to the wrench setting, not to the tightening band', () => {
    const input = parse({thread: 'M10', internal: 'nut', nutClass: '8', engagement: 20});
    const w = tighteningWindow(input, checkJoint(input), {prevailingTorque: 10.5});
    expect(w.wrench!.min).toBeCloseTo(w.torque!.min + 10.5, 9);
    expect(w.wrench!.max).toBeCloseTo(w.torque!.max + 10.5, 9);
  });

  it('the window does not depend on the tightening mode the result was computed in', () => {
    const base = parse({thread: 'M16', internal: 'tapped', parent: 'C45', engagement: 20, scatter: 1.4});
    const a = tighteningWindow(base, checkJoint(base));
    const b = tighteningWindow({...base, tightening: 'torque', torque: 50}, checkJoint({...base, tightening: 'torque', torque: 50}));
    expect(b.torque!.min).toBeCloseTo(a.torque!.min, 6);
    expect(b.torque!.max).toBeCloseTo(a.torque!.max, 6);
  });
});

describe('tighteningWindow JSON', () => {
  it('no NaN or Infinity in the JSON, with or without a band (property)', () => {
    fc.assert(
      fc.property(joint, fc.option(fc.double({min: 0, max: 1e6, noNaN: true}), {nil: undefined}), ({input}, leastClamp) => {
        const w = tighteningWindow(input, checkJoint(input), leastClamp !== undefined ? {leastClamp, prevailingTorque: 3} : {});
        const text = JSON.stringify(w);
        expect(text).not.toMatch(/NaN|Infinity|null/);
      }),
      {numRuns: 40},
    );
  });
});
