/**
 * Fastener friction picks against the VDI 2230 Part 1 friction classes and the ISO 2320:2008
 * prevailing-torque table.
 */
import {describe, expect, it} from 'vitest';
import {FASTENER_FRICTION, FRICTION_CLASSES, fastenerFrictionPick, frictionFromPick} from '../../../src/core/joint/friction-picks.js';
import {ISO_2320_PREVAILING, lockingElement, prevailingTorque, wrenchTorque} from '../../../src/core/joint/locking.js';
import {FrictionRangeSchema, JointInputSchema, checkJoint} from '../../../src/core/joint/index.js';
import {ProvenanceSchema} from '../../../src/core/materials/schema.js';

describe('fastener friction picks', () => {
  it('VDI 2230 Part 1 friction classes: A 0.04-0.10, B 0.08-0.16, C 0.14-0.24, D 0.20-0.35 (muG and muK alike)', () => {
    expect(FRICTION_CLASSES).toEqual({A: {min: 0.04, max: 0.1}, B: {min: 0.08, max: 0.16}, C: {min: 0.14, max: 0.24}, D: {min: 0.2, max: 0.35}});
  });

  it('each pick against its VDI class (VDI 2230 Part 1 friction-class table)', () => {
    const expected: Record<string, [number, number]> = {
      'black-oxide-oiled': [0.08, 0.16], // class B: black oxide, oils
      'zinc-plated-dry': [0.14, 0.35], // classes C and D: electroplated Zn, no lubricant
      'phosphate-oiled': [0.08, 0.16], // class B: phosphated, oils
      'mos2-paste': [0.04, 0.1], // class A: MoS2 in pastes
      'anti-seize-paste': [0.04, 0.16], // classes A and B: solid lubricants in pastes
      'thread-locking-adhesive': [0.14, 0.24], // class C: adhesive
      'black-oxide-dry': [0.14, 0.35], // from memory
    };
    for (const p of FASTENER_FRICTION) {
      const e = expected[p.id];
      expect(e, p.id).toBeDefined();
      expect([p.thread.min, p.thread.max]).toEqual(e);
      expect(p.head).toEqual(p.thread);
      expect(ProvenanceSchema.safeParse(p.provenance).success).toBe(true);
      expect(FrictionRangeSchema.safeParse(p.thread).success).toBe(true);
    }
    expect(fastenerFrictionPick('black-oxide-dry')!.provenance.source).toMatch(/from memory/);
  });

  it('generic names only, ids findable, and a pick feeds a check', () => {
    expect(fastenerFrictionPick(' MoS2-Paste ')?.id).toBe('mos2-paste');
    expect(fastenerFrictionPick('nothing')).toBeUndefined();
    const r = checkJoint(JointInputSchema.parse({thread: 'M10', internal: 'nut', nutClass: '8', engagement: 20, ...frictionFromPick(fastenerFrictionPick('mos2-paste')!)}));
    expect(r.tightening.torque).toBeGreaterThan(0);
  });
});

describe('ISO 2320 prevailing torques', () => {
  it('ISO 2320:2008 table, first installation max / first removal min / fifth removal min, N·m', () => {
    const row = (d: number) => ISO_2320_PREVAILING.find(r => r.d === d);
    expect(row(6)).toEqual({d: 6, firstOnMax: 3, firstOffMin: 0.45, fifthOffMin: 0.3});
    expect(row(10)).toEqual({d: 10, firstOnMax: 10.5, firstOffMin: 1.5, fifthOffMin: 1});
    expect(row(12)).toEqual({d: 12, firstOnMax: 15.5, firstOffMin: 2.3, fifthOffMin: 1.6});
    expect(row(24)).toEqual({d: 24, firstOnMax: 80, firstOffMin: 11.5, fifthOffMin: 8});
    expect(row(39)).toEqual({d: 39, firstOnMax: 150, firstOffMin: 23, fifthOffMin: 18});
    expect(ISO_2320_PREVAILING).toHaveLength(19);
  });

  it('rows rise with size, and removal minima stay below the installation maximum', () => {
    for (let i = 1; i < ISO_2320_PREVAILING.length; i++) {
      const [a, b] = [ISO_2320_PREVAILING[i - 1]!, ISO_2320_PREVAILING[i]!];
      expect(b.d).toBeGreaterThan(a.d);
      expect(b.firstOnMax).toBeGreaterThan(a.firstOnMax);
    }
    for (const r of ISO_2320_PREVAILING) expect(r.fifthOffMin).toBeLessThan(r.firstOffMin);
  });

  it('the wrench torque is the tightening torque plus the prevailing torque', () => {
    const p = prevailingTorque('polymer-insert-nut', 10)!;
    expect(p.torque).toBe(10.5);
    expect(wrenchTorque(40, p.torque)).toBe(50.5);
    expect(prevailingTorque('all-metal-nut', 12.7)).toBeUndefined(); // inch: give the torque
    expect(prevailingTorque('patch-screw', 8)!.provenance.source).toMatch(/common practice, no source/);
    for (const e of ['all-metal-nut', 'polymer-insert-nut', 'patch-screw'] as const) expect(ProvenanceSchema.safeParse(prevailingTorque(e, 10)!.provenance).success).toBe(true);
    expect(lockingElement('Polymer insert nut')).toBe('polymer-insert-nut');
    expect(lockingElement('spring washer')).toBeUndefined();
  });
});
