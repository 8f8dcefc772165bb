import {describe, expect, it} from 'vitest';
import {formatCheckMarkdown, formatCheckText} from '../../src/report/index.js';
import {checkJoint, JointInputSchema, FIRST_THREAD_VON_MISES_NOTE} from '../../src/core/joint/index.js';
import {checkScrew, ScrewInputSchema} from '../../src/core/screw/index.js';

/**
 * The first-thread von Mises is the nominal elastic stress state of Shigley, Mechanical Engineering
 * Design, 9th ed., p. 419; a tightened bolt is judged by VDI 2230 Part 1 on its assembly utilisation
 * (R5) and by the stripping / bolt-breaks-first checks (section 5.5.5, Alexander 1977), not by the
 * thread-root peak. The reports say so beside the number.
 */
const input = JointInputSchema.parse({thread: 'M10x1.5-6H/6g', boltGrade: '8.8', internal: 'nut', nutClass: '8', engagement: 8.04});
const result = checkJoint(input);
const flat = (s: string) => s.replace(/\s+/g, ' ');

describe('first-thread von Mises explained', () => {
  it('core gives the note with the result (for the JSON and the workbench readout)', () => {
    expect(result.stress.firstThreadNote).toBe(FIRST_THREAD_VON_MISES_NOTE);
    expect(FIRST_THREAD_VON_MISES_NOTE).toMatch(/elastic peak estimate/i);
    expect(FIRST_THREAD_VON_MISES_NOTE).toMatch(/not the failure criterion/);
    expect(FIRST_THREAD_VON_MISES_NOTE).toMatch(/stripping, bolt-breaks-first and the tightening utilisation/);
  });
  it('text and Markdown reports carry it beside the ratio', () => {
    const text = flat(formatCheckText(result, input, {units: 'si'}));
    expect(text).toContain('Local yielding there is normal in a tightened bolt');
    expect(text).toContain('elastic peak: local yield here is normal, not failure');
    const md = flat(formatCheckMarkdown(result, input, {date: new Date(Date.UTC(2026, 0, 2)), units: 'si'}));
    expect(md).toContain('not the failure criterion');
  });
  it('power screw: the first-thread flag stays and carries the same reading', () => {
    const r = checkScrew(ScrewInputSchema.parse({thread: 'Tr24x5', load: 60000, muThread: 0.1, nutLength: 40, nutMaterial: 'bronze'}));
    const f = r.flags.find(x => x.code === 'first-thread-over-yield');
    expect(f).toBeDefined();
    expect(f?.message).toMatch(/elastic peak estimate/);
    expect(f?.message).toMatch(/not the failure criterion/);
  });
});
