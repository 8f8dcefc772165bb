/**
 * The joint diagram stays whole: exactly the lines and columns asked for (at most
 * 76 x 9, the design size inside the 80 x 24 workbench), ASCII-only in ASCII mode, and
 * the preload, service load and separation marks are on it.
 */
import {describe, expect, it} from 'vitest';
import {checkJoint, JointInputSchema} from '../../src/core/joint/index.js';
import {checkService, ServiceInputSchema, type ServiceInputDraft} from '../../src/core/service/index.js';
import {jointDiagram} from '../../src/ui/components/joint-diagram.js';

function service(s: ServiceInputDraft) {
  const input = JointInputSchema.parse({thread: 'M12x1.75', boltGrade: '8.8', internal: 'nut', nutClass: '8', engagement: 10});
  return checkService(input, checkJoint(input), ServiceInputSchema.parse(s));
}

const CASES = {
  closed: service({clamp: [{thickness: 10, material: 'steel'}, {thickness: 20, material: '6082-T6'}], serviceLoad: {min: 0, max: 12_000}}),
  open: service({clamp: [{thickness: 30, material: 'steel'}], serviceLoad: 80_000}),
  noLoad: service({clamp: [{thickness: 30, material: 'steel'}]}),
  inFull: service({}),
};

describe('jointDiagram', () => {
  for (const [name, s] of Object.entries(CASES)) {
    for (const ascii of [false, true]) {
      for (const [w, h] of [[76, 9], [60, 9], [50, 7], [40, 6], [30, 5], [24, 4], [20, 3], [10, 1], [76, 1]] as const) {
        it(`${name}, ${w}x${h}, ${ascii ? 'ASCII' : 'Unicode'}: whole`, () => {
          const lines = jointDiagram(s, w, h, ascii);
          expect(lines).toHaveLength(h);
          for (const l of lines) expect(Array.from(l).length, l).toBe(w);
          if (ascii) for (const l of lines) expect(/^[\x20-\x7e]*$/.test(l), l).toBe(true);
        });
      }
    }
  }
  it('at 76 x 9 shows the preload, the service load, the separation point and their values', () => {
    const text = jointDiagram(CASES.closed, 76, 9, true).join('\n');
    for (const mark of ['O', '*', 'X', '/', '\\', 'preload', 'opens at', 'bolt takes', 'elongation']) expect(text, mark).toContain(mark);
    expect(text).toContain(`${(CASES.closed.preloadRetained.min / 1000).toFixed(1)} kN`);
  });
  it('says so when the load opens the joint', () => {
    expect(jointDiagram(CASES.open, 76, 9, true).join('\n')).toContain('(OPEN)');
  });
});
