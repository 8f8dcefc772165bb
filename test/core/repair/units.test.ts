import {describe, expect, it} from 'vitest';
import {JointInputSchema} from '../../../src/core/joint/index.js';
import {planRepairs} from '../../../src/core/repair/index.js';
import {lengthIn} from '../../../src/core/repair/common.js';
import {wallProblem} from '../../../src/core/repair/holes.js';

// Invented demo job: a 3/8-16 UNC SAE grade 8 screw in 6061-T6, 0.4 in engaged, stripped to 0.2 in,
// 0.4 in edge distance, 0.8 in deep. 1 in = 25.4 mm exactly (NIST SP 811 Appendix B).
const joint = JointInputSchema.parse({thread: '3/8-16 UNC', boltGrade: 'SAE-8', parent: '6061-T6', engagement: 0.4 * 25.4});
const repair = {holeState: 'stripped' as const, strippedDepth: 0.2 * 25.4, wall: 0.4 * 25.4, depthAvailable: 0.8 * 25.4};

const words = (plan: ReturnType<typeof planRepairs>) => [...plan.notes, ...plan.options.flatMap(o => [o.reason ?? '', ...o.notes])].join('\n');

describe('repair reasons and notes in the display units', () => {
  it('US: inches in every reason and note (was mm in a US report); the numbers stay mm', () => {
    const si = planRepairs(joint, repair);
    const us = planRepairs(joint, repair, undefined, 'us');
    expect(words(si)).toMatch(/\d mm\b/);
    expect(words(us)).not.toMatch(/\d mm\b/);
    expect(words(us)).toMatch(/stripped from the surface to 0\.200 in; good thread assumed below 0\.263 in/);
    // Same options, same numbers: only the words change.
    expect(us.options.map(o => [o.kind, o.label, o.rank, o.drill, o.holeDepth, o.torque])).toEqual(si.options.map(o => [o.kind, o.label, o.rank, o.drill, o.holeDepth, o.torque]));
  });

  it('SI wording is as before', () => {
    expect(words(planRepairs(joint, repair))).toMatch(/stripped from the surface to 5\.08 mm; good thread assumed below 6\.7 mm/);
    expect(lengthIn('si', 12.345)).toBe('12.35 mm');
    expect(lengthIn('si', 12.345, 1)).toBe('12.3 mm');
    expect(lengthIn('us', 12.7)).toBe('0.500 in');
  });

  it('the wall rule speaks the units too', () => {
    expect(wallProblem(8, 14, 'the insert thread')).toBe('the insert thread (14.00 mm) leaves 1.00 mm of wall to the edge; needs 3.50 mm (edge distance 8 mm)');
    expect(wallProblem(8, 14, 'the insert thread', 'us')).toBe('the insert thread (0.551 in) leaves 0.039 in of wall to the edge; needs 0.138 in (edge distance 0.315 in)');
  });
});
