import {describe, expect, it} from 'vitest';
import {JointInputSchema} from '../../../src/core/joint/index.js';
import {planRepairs} from '../../../src/core/repair/index.js';
import {RepairInputSchema} from '../../../src/core/repair/input.js';

// Invented demo job: an M8 cap screw in die-cast aluminium, 10 mm engaged, stripped to 6 mm.
// 1 in = 25.4 mm exactly (NIST SP 811 Appendix B).
const joint = JointInputSchema.parse({
  thread: 'M8', boltGrade: '8.8', internal: 'tapped', parent: 'AlSi9Cu3-DC', engagement: 10, chamfer: 0.8,
  tightening: 'torque', torque: 18, muThread: {min: 0.1, max: 0.16}, muHead: {min: 0.1, max: 0.16},
});
const repair = RepairInputSchema.parse({holeState: 'stripped', strippedDepth: 6});
const flagText = (plan: ReturnType<typeof planRepairs>) => plan.options.flatMap(o => o.flags.map(f => f.message)).join('\n');

describe("an option's flags in the plan's units", () => {
  it('US: the flags the Repairs screen shows carry no mm (the longer engagement said "16.3 mm of full thread")', () => {
    const si = planRepairs(joint, repair);
    const us = planRepairs(joint, repair, undefined, 'us');
    expect(flagText(si)).toMatch(/\d mm\b/);
    expect(flagText(us)).not.toMatch(/\d mm\b/);
    expect(flagText(us)).toMatch(/\d in\b/);
    // Same codes and levels: only the words change.
    expect(us.options.map(o => o.flags.map(f => [f.code, f.level]))).toEqual(si.options.map(o => o.flags.map(f => [f.code, f.level])));
  });
});
