/**
 * The tightening-window picture: size, ASCII mode, and that it marks what the core computed
 * (window from VDI 2230 Part 1 torque-preload relation, src/core/joint/window.ts).
 */
import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {checkJoint, JointInputSchema, type JointInputDraft} from '../../src/core/joint/index.js';
import {tighteningWindow} from '../../src/core/joint/window.js';
import {windowPicture} from '../../src/ui/components/window-picture.js';

const win = (d: JointInputDraft, leastClamp?: number) => {
  const input = JointInputSchema.parse(d);
  return tighteningWindow(input, checkJoint(input), leastClamp !== undefined ? {leastClamp} : {});
};
// Demo joints.
const NUT: JointInputDraft = {thread: 'M10', internal: 'nut', nutClass: '8', engagement: 20, tightening: 'torque', torque: 40};
const WEAK: JointInputDraft = {thread: 'M10', internal: 'tapped', parent: '6061-T6', engagement: 6, muThread: {min: 0.08, max: 0.2}, muHead: {min: 0.08, max: 0.2}};

describe('windowPicture', () => {
  it('fits 76 x 10 exactly, ASCII only in ASCII mode, with the band, the marker and both lines', () => {
    const lines = windowPicture(win(NUT), 76, 10, true);
    expect(lines).toHaveLength(10);
    for (const l of lines) {
      expect(l.length).toBeLessThanOrEqual(76);
      expect(/^[\x20-\x7e]*$/.test(l)).toBe(true);
    }
    const text = lines.join('\n');
    expect(lines[7]).toMatch(/=+/);
    expect(lines[7]).toContain('^');
    expect(text).toContain('/');
    expect(text).toContain('.');
    expect(lines[8]).toMatch(/band 2\d\.\d N\*m to \d\d\.\d N\*m/);
    expect(lines.slice(0, 7).some(l => l.endsWith('Y'))).toBe(true);
  });

  it('an empty window says which limits cross', () => {
    const lines = windowPicture(win(WEAK, 20000), 76, 10, true);
    expect(lines.join('\n')).toMatch(/no band: clamp C is above strip S/);
    expect(lines[7]).not.toContain('=');
  });

  it('unicode mode uses the box-drawing axis and the same layout', () => {
    const lines = windowPicture(win(NUT), 76, 10, false);
    expect(lines).toHaveLength(10);
    expect(lines[7]!.startsWith('└')).toBe(true);
    expect(lines[7]).toContain('▲');
  });

  it('any size from 20 x 5 to 120 x 24 keeps to its box (property)', () => {
    const ws = [win(NUT), win(WEAK, 20000), win(WEAK), win({...NUT, thread: 'M24', engagement: 40, serviceLoad: 30000, torque: 5})];
    fc.assert(
      fc.property(fc.integer({min: 0, max: ws.length - 1}), fc.integer({min: 20, max: 120}), fc.integer({min: 5, max: 24}), fc.boolean(), fc.constantFrom('si', 'us'), (i, w, h, ascii, units) => {
        const lines = windowPicture(ws[i]!, w, h, ascii, units as 'si' | 'us');
        expect(lines).toHaveLength(h);
        for (const l of lines) expect(Array.from(l).length).toBeLessThanOrEqual(w);
        if (ascii) for (const l of lines) expect(/^[\x20-\x7e]*$/.test(l)).toBe(true);
      }),
      {numRuns: 100},
    );
  });

  it('US units show the band in ft*lbf', () => {
    expect(windowPicture(win(NUT), 76, 10, true, 'us').join('\n')).toMatch(/ft\*lbf/);
  });
});
