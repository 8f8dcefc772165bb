import {describe, expect, it} from 'vitest';
import {checkJoint, JointInputSchema, type JointInputDraft} from '../../src/core/joint/index.js';
import {formatCheckMarkdown, formatCheckText} from '../../src/report/index.js';
import {DEMO_INPUT, demoResult} from './fixture.js';

// Invented demo joint: a 1/4-20 UNC screw, property class 8.8, in a grey-iron tapped hole, 10 mm engaged.
// Its limits: class 2B from the ASME B1.1 standard series limits table (unified-table-data.ts),
// class 2A from the ASME B1.1 tolerance formulas (no 2A row held).
const DEMO: JointInputDraft = {
  thread: '1/4-20 UNC',
  boltGrade: '8.8',
  internal: 'tapped',
  parent: 'EN-GJL-250',
  engagement: 10,
  tightening: 'torque',
  torque: 8,
};
const input = JointInputSchema.parse(DEMO);
const result = checkJoint(input);
const flat = (t: string) => t.replace(/\n {2,}/g, ' ');

describe('work-order reports say per side where the limits of size come from', () => {
  it('text: the 2B side from the table, the 2A side from the formulas, within 80 columns', () => {
    const text = formatCheckText(result, input, {units: 'us'});
    expect(flat(text)).toContain('- Limits of size: 2B from the table, 2A from formulas (fallback).');
    expect(flat(text)).toContain('- Thread limits, internal 2B: ASME B1.1 standard series limits table, class 2B');
    expect(flat(text)).toMatch(/- Thread limits, external 2A: ASME B1\.1 tolerance formulas \(from memory\) for class 2A: .*labelled fallback, not table values/);
    for (const l of text.split('\n')) expect([...l].length, l).toBeLessThanOrEqual(80);
  });

  it('Markdown: the same words, one side a line', () => {
    const md = formatCheckMarkdown(result, input, {units: 'si', date: new Date('2026-12-01T08:00:00Z'), presetName: 'demo'});
    expect(md).toContain('- Limits of size: 2B from the table, 2A from formulas (fallback).');
    expect(md).toContain('- Thread limits, internal 2B: ASME B1.1 standard series limits table, class 2B');
    expect(md).toMatch(/^- Thread limits, external 2A: ASME B1\.1 tolerance formulas/m);
  });

  it('the demo fixture (both sides from its demo table) reads so', () => {
    const text = formatCheckText(demoResult(), DEMO_INPUT, {units: 'si'});
    expect(flat(text)).toContain('- Limits of size: 6H and 6g from the table.');
    expect(flat(text)).toContain('- Thread limits, internal 6H: demo limits table, class 6H');
    expect(flat(text)).toContain('- Thread limits, external 6g: demo limits table, class 6g');
  });
});
