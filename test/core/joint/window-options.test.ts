/**
 * The window's options: accepted values and bad input naming the option and its range.
 * Friction picks VDI 2230 Part 1 friction classes; prevailing torques ISO 2320:2008.
 */
import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {WindowInputSchema, lockingProblem, lubricantProblem, numberProblem, resolveWindowInput} from '../../../src/core/joint/window-options.js';

describe('window options', () => {
  it('a lubricant pick sets both friction ranges (VDI 2230 Part 1 class A for MoS2 paste)', () => {
    const r = resolveWindowInput(WindowInputSchema.parse({lubricant: 'mos2-paste'}), 10);
    expect(r.ok && r.value.friction?.muThread).toEqual({min: 0.04, max: 0.1});
  });

  it('a locking element takes the ISO 2320:2008 first-installation maximum for the size; a given torque wins', () => {
    const a = resolveWindowInput(WindowInputSchema.parse({locking: 'all-metal-nut'}), 12);
    expect(a.ok && a.value.prevailing?.torque).toBe(15.5);
    const b = resolveWindowInput(WindowInputSchema.parse({locking: 'all-metal-nut', prevailingTorque: 9}), 12);
    expect(b.ok && b.value.prevailing).toEqual({torque: 9, provenance: {source: 'prevailing torque given by the user', kind: 'user'}});
  });

  it('a locking element on an inch size asks for --prevailing-torque', () => {
    const r = resolveWindowInput(WindowInputSchema.parse({locking: 'polymer-insert-nut'}), 12.7);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.problem.option).toBe('--prevailing-torque');
      expect(r.problem.message).toMatch(/give --prevailing-torque/);
    }
  });

  it('bad ids name the option and list what it accepts', () => {
    expect(lubricantProblem('copper grease')).toEqual({option: '--lubricant', message: expect.stringMatching(/accepted: black-oxide-dry, .*thread-locking-adhesive/)});
    expect(lockingProblem('spring washer')!.message).toMatch(/accepted: all-metal-nut, polymer-insert-nut, patch-screw/);
    expect(lubricantProblem('MoS2 paste')).toBeUndefined();
  });

  it('out-of-range or non-finite numbers are rejected with the option and range (property)', () => {
    fc.assert(
      fc.property(fc.oneof(fc.double({max: -1e-9}), fc.double({min: 5000.001}), fc.constant(Number.NaN), fc.constant(Number.POSITIVE_INFINITY)), v => {
        const p = numberProblem('--prevailing-torque', v, 0, 5000, 'N·m');
        expect(p?.message).toBe('--prevailing-torque must be a number from 0 to 5000 N·m');
        expect(WindowInputSchema.safeParse({prevailingTorque: v}).success).toBe(false);
      }),
    );
    expect(numberProblem('--least-clamp', 100, 0, 1e8, 'N')).toBeUndefined();
    expect(WindowInputSchema.safeParse({wrenchAccuracy: 0.9}).success).toBe(false);
    expect(WindowInputSchema.safeParse({lubricant: 'grease'}).success).toBe(false);
  });
});
