/**
 * The power-screw report has the same paperwork as the joint report: date, inputs,
 * results, flags, cautions and sign-off, in text and Markdown, with the same facts.
 * Demo inputs (a lifting-table lead screw of our own); layout checks only.
 */
import {describe, expect, it} from 'vitest';
import {checkScrew} from '../../src/core/screw/index.js';
import {ScrewInputSchema} from '../../src/core/screw/input.js';
import {screwMarkdown, screwText} from '../../src/report/index.js';
import {CAUTION_LINES} from '../../src/core/cautions.js';

const input = ScrewInputSchema.parse({thread: 'Tr24x5', load: 4500, nutLength: 30, length: 800, ends: 'fixed-free', nutMaterial: 'bronze', duty: 'lifting'});
const result = checkScrew(input);
const meta = {units: 'si' as const, date: new Date('2026-05-06T08:00:00Z'), presetName: 'demo-lift-table', notes: {asset: 'DEMO-LT-3', location: 'Demo bay', workOrder: 'WO-DEMO-9'}, duty: input.duty};
const text = screwText(result, 'si', 'demo-lift-table', meta);
const md = screwMarkdown(result, input, meta);
const flat = (s: string) => s.replace(/\s+/g, ' ');

describe('power-screw report', () => {
  it('both renderings carry date, preset, work-order fields and duty', () => {
    for (const s of ['2026-05-06', 'demo-lift-table', 'DEMO-LT-3', 'Demo bay', 'WO-DEMO-9', 'lifting equipment']) {
      expect(text).toContain(s);
      expect(md).toContain(s);
    }
  });
  it('both carry every flag code, the cautions and the mandatory sign-off', () => {
    for (const f of result.flags) {
      expect(text).toContain(f.code);
      expect(md).toContain(f.code);
    }
    for (const c of CAUTION_LINES) {
      expect(flat(text)).toContain(c);
      expect(md).toContain(c);
    }
    expect(flat(text)).toMatch(/MANDATORY: Duty: lifting equipment/);
    expect(md).toMatch(/## Sign-off\n\n\*\*MANDATORY/);
  });
  it('the Markdown has the inputs and the result rows of the text', () => {
    expect(md).toMatch(/\| Thread \| Tr24x5 \|/);
    expect(md).toMatch(/\| Axial load \| 4\.50 kN, screw in compression \|/);
    for (const label of ['Torque', 'Efficiency', 'Self-locking', 'Body', 'First thread', 'Nut', 'Column']) {
      expect(text).toMatch(new RegExp(`^${label} `, 'm'));
      expect(md).toContain(`| ${label} |`);
    }
  });
  it('text lines fit 80 columns', () => {
    for (const line of text.split('\n')) expect(line.length).toBeLessThanOrEqual(80);
  });
});
