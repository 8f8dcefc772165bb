/**
 * One report model, two renderings: the text and the Markdown check reports carry the
 * same work-order facts, hole state and sign-off; the repair notes carry the same facts.
 * Layout checks on DEMO DATA (test/report/fixture.ts) and a demo joint; no engineering values.
 */
import {describe, expect, it} from 'vitest';
import {formatCheckMarkdown, formatCheckText, planSectionLines, planText} from '../../src/report/index.js';
import {DEMO_INPUT, demoResult} from './fixture.js';
import {JointInputSchema} from '../../src/core/joint/input.js';
import {planRepairs} from '../../src/core/repair/index.js';
import {CAUTION_LINES} from '../../src/core/cautions.js';

const date = new Date('2026-03-02T10:00:00Z');
const notes = {asset: 'DEMO-PUMP-7', location: 'Demo hall B', workOrder: 'WO-DEMO-42', text: 'Demo: cover re-fitted.'};
const flat = (s: string) => s.replace(/\s+/g, ' ');

describe('check report: text and Markdown carry the same work order', () => {
  const text = formatCheckText(demoResult(), DEMO_INPUT, {units: 'si', date, presetName: 'demo-cover', notes, hole: {state: 'stripped', strippedDepth: 6}});
  const md = formatCheckMarkdown(demoResult(), DEMO_INPUT, {units: 'si', date, presetName: 'demo-cover', notes, hole: {state: 'stripped', strippedDepth: 6}});
  it('both show date, preset, asset, location, work order and the free text', () => {
    for (const s of ['2026-03-02', 'demo-cover', 'DEMO-PUMP-7', 'Demo hall B', 'WO-DEMO-42', 'Demo: cover re-fitted.', 'general duty']) {
      expect(text).toContain(s);
      expect(md).toContain(s);
    }
  });
  it('both show the stripped hole state with the inputs', () => {
    expect(text).toMatch(/Hole state +stripped to 6\.00 mm from the face/);
    expect(md).toMatch(/\| Hole state \| stripped to 6\.00 mm from the face \|/);
  });
  it('both end with the cautions and a sign-off block', () => {
    for (const c of CAUTION_LINES) expect(flat(text)).toContain(c);
    expect(text).toMatch(/SIGN-OFF\n/);
    expect(text).toMatch(/Approved by \(qualified person\) +name _+ +date _+/);
    expect(md).toMatch(/## Sign-off/);
    expect(text.indexOf('SIGN-OFF')).toBeGreaterThan(text.indexOf(CAUTION_LINES[0] ?? 'x'));
  });
  it('a text report without work-order entries leaves lines to fill in by hand', () => {
    const plain = formatCheckText(demoResult(), DEMO_INPUT, {units: 'si'});
    expect(plain).toMatch(/ {2}Asset +_{20}/);
    expect(plain).toMatch(/Date +date not recorded/);
  });
  it('every text line fits 80 columns', () => {
    for (const line of text.split('\n')) expect(line.length).toBeLessThanOrEqual(80);
  });
});

describe('duty: the sign-off becomes mandatory text', () => {
  const lifting = JointInputSchema.parse({...DEMO_INPUT, duty: 'lifting'});
  it('in both renderings', () => {
    const text = formatCheckText(demoResult(), lifting, {units: 'si'});
    const md = formatCheckMarkdown(demoResult(), lifting, {units: 'si', date});
    expect(flat(text)).toMatch(/MANDATORY: Duty: lifting equipment\. This result needs a qualified person's sign-off/);
    expect(md).toMatch(/\*\*MANDATORY: Duty: lifting equipment\./);
    expect(md).toMatch(/\| Duty \| lifting equipment \|/);
  });
});

describe('repair plan: the Markdown notes carry what the text has', () => {
  // Demo joint: an M8 stripped in cast aluminium.
  const joint = JointInputSchema.parse({thread: 'M8', boltGrade: '8.8', parent: 'AlSi7Mg-T6', engagement: 10});
  const plan = planRepairs(joint, {holeState: 'stripped', strippedDepth: 5, depthAvailable: 25});
  const text = flat(planText(plan, 'si', 'REPAIR PLAN'));
  const md = flat(planSectionLines(plan, 'si', {level: 2}).join('\n'));
  it('insert length, screw length and tap depth appear in both', () => {
    const facts = [...text.matchAll(/(Insert [\d.]+ mm long|Screw [\d.]+ mm longer|Tap [\d.]+ mm deep)/g)].map(m => m[1] ?? '');
    expect(facts.length).toBeGreaterThan(0);
    for (const fact of facts) expect(md).toContain(fact);
  });
});
