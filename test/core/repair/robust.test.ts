import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {checkJoint, JointInputSchema} from '../../../src/core/joint/index.js';
import {planRepairs} from '../../../src/core/repair/index.js';

const jointArb = fc.record({
  thread: fc.constantFrom('M5', 'M6', 'M8x1', 'M10', 'M12x1.25', 'M16', 'M20', 'M24', 'M36', '#10-24', '1/4-20', '5/16-24 UNF', '1/2-13', '1-8 UNC'),
  boltGrade: fc.constantFrom('8.8', '10.9', '12.9', 'A2-70'),
  parent: fc.constantFrom('6082-T6', 'AlSi7Mg-T6', 'AlSi9Cu3-DC', '7075-T6', '5083-O'),
  k: fc.double({min: 0.3, max: 3, noNaN: true}),
  chamferFraction: fc.double({min: 0, max: 0.3, noNaN: true}),
  tightening: fc.constantFrom('utilisation' as const, 'torque' as const),
  torque: fc.double({min: 1, max: 400, noNaN: true}),
  serviceLoad: fc.double({min: 0, max: 20000, noNaN: true}),
  internal: fc.constantFrom('tapped' as const, 'tapped' as const, 'nut' as const),
});

const repairArb = fc.record({
  holeState: fc.constantFrom('intact' as const, 'stripped' as const),
  f: fc.double({min: 0, max: 1, noNaN: true}),
  through: fc.boolean(),
  depthAvailable: fc.option(fc.double({min: 0.5, max: 200, noNaN: true}), {nil: undefined}),
  wall: fc.option(fc.double({min: 0.1, max: 80, noNaN: true}), {nil: undefined}),
  boltLengthMayChange: fc.boolean(),
  margin: fc.option(fc.double({min: 0.5, max: 5, noNaN: true}), {nil: undefined}),
});

describe('repair plan over generated joints (property)', () => {
  it('never throws for a joint check accepts; no NaN or Infinity in the JSON; every rejection has a reason', () => {
    let planned = 0;
    fc.assert(
      fc.property(jointArb, repairArb, (j, h) => {
        const probe = JointInputSchema.parse({thread: j.thread, engagement: 10, parent: j.parent});
        const d = checkJoint(probe).geometry.nominal;
        const engagement = Math.max(0.5, j.k * d);
        const joint = JointInputSchema.parse({
          thread: j.thread, boltGrade: j.boltGrade, parent: j.parent, engagement,
          chamfer: j.chamferFraction * engagement, serviceLoad: j.serviceLoad, internal: j.internal,
          ...(j.internal === 'nut' ? {nutClass: '8'} : {}),
          ...(j.tightening === 'torque' ? {tightening: 'torque', torque: j.torque} : {}),
        });
        let accepted = true;
        try {
          checkJoint(joint);
        } catch {
          accepted = false;
        }
        if (!accepted) return;
        const depth = h.depthAvailable;
        const plan = planRepairs(joint, {
          holeState: h.holeState,
          strippedDepth: h.holeState === 'stripped' ? Math.min(h.f * engagement, depth ?? Infinity) : undefined,
          through: h.through, depthAvailable: depth, wall: h.wall, boltLengthMayChange: h.boltLengthMayChange, margin: h.margin,
        });
        planned++;
        const json = JSON.stringify(plan, (_k, v: unknown) => {
          if (typeof v === 'number' && !Number.isFinite(v)) throw new Error(`non-finite number ${v}`);
          return v;
        });
        expect(json).not.toMatch(/NaN/);
        for (const o of plan.options) {
          if (!o.feasible || !o.meetsMargin) expect(o.reason).toBeTruthy();
        }
      }),
      {numRuns: 150},
    );
    expect(planned).toBeGreaterThan(50);
  });
});
