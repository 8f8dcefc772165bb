import {describe, expect, it} from 'vitest';
import {bar, engagementScale, loadShareLines, marginGauge, niceEnd} from '../../src/ui/components/pictures.js';
import {makeTheme} from '../../src/ui/theme.js';

const t = makeTheme(false, true);

describe('text pictures', () => {
  it('fills bars to the fraction and clamps outside 0..1', () => {
    expect(bar(0.5, 10, t)).toBe('#####.....');
    expect(bar(2, 4, t)).toBe('####');
    expect(bar(Number.NaN, 4, t)).toBe('....');
  });
  it('rounds scale ends up to 1, 2, 2.5, 5 steps', () => {
    expect([0.7, 1, 1.3, 2.2, 3, 7, 13.1, 26].map(niceEnd)).toEqual([1, 1, 2, 2.5, 5, 10, 20, 50]);
  });
  it('draws the load share from the loaded face, summing the rest on the last line', () => {
    const lines = loadShareLines([0.4, 0.3, 0.2, 0.1], 30, 3, t);
    expect(lines).toHaveLength(3);
    expect(lines[0]).toMatch(/^ {2}1 #{16}\.{4} +40%$/);
    expect(lines[2]).toBe('threads 3-4 together 30%');
  });
  it('marks the needed margin on the gauge and places F and A on the engagement scale', () => {
    expect(marginGauge(1, 1, 12, t)).toBe('[#####|....]');
    const {scale, end} = engagementScale(10, [{letter: 'F', at: 12}, {letter: 'A', at: 15}], 22, t);
    expect(end).toBe(20);
    expect(scale).toBe('[##########..F..A....]');
  });
});
