import {describe, expect, it} from 'vitest';
import {checkJoint, flagsInUnits, JointInputSchema, type JointInputDraft} from '../../src/core/joint/index.js';
import {blindHoleTooShallow, stripsAtPreload, type FlagContext} from '../../src/core/joint/flags.js';
import {formatCheckMarkdown, formatCheckText} from '../../src/report/index.js';
import {headingCase} from '../../src/report/text.js';

// Unit conversions: 1 lbf = 4.4482216152605 N, 1 in = 25.4 mm, exact by definition (NIST SP 811 Appendix B).
const LBF = 4.4482216152605;

// Invented demo joint: a 3/8-16 SAE grade 8 screw in a 6061-T6 tapped hole, 0.5 in engaged, 30 ft-lbf.
const DEMO: JointInputDraft = {
  thread: '3/8-16 UNC-2A',
  boltGrade: 'SAE-8',
  internal: 'tapped',
  parent: '6061-T6',
  engagement: 12.7,
  tightening: 'torque',
  torque: 40.67,
};
const input = JointInputSchema.parse(DEMO);
const result = checkJoint(input);

describe('report headings keep the case of their units', () => {
  it('upper-cases the words, not the bracket with the load (was "OF 32.8 KN")', () => {
    expect(headingCase('First engaged thread (carries 38 % of 32.8 kN)')).toBe('FIRST ENGAGED THREAD (carries 38 % of 32.8 kN)');
    expect(headingCase('Margins')).toBe('MARGINS');
    const us = formatCheckText(result, input, {units: 'us'});
    expect(us).toMatch(/^FIRST ENGAGED THREAD \(carries 38 % of \d+ lbf\)$/m);
    expect(us).not.toMatch(/LBF|KN\b/);
    const si = formatCheckText(result, input, {units: 'si'});
    expect(si).toMatch(/^FIRST ENGAGED THREAD \(carries 38 % of [\d.]+ kN\)$/m);
  });
});

describe('flag messages in the report units; JSON (result.flags) stays SI', () => {
  it('strips-before-break quotes lbf in a US report, kN in the result', () => {
    const weaker = Math.min(result.stripping.external.force, result.stripping.internal.force);
    const si = result.flags.find(f => f.code === 'strips-before-break');
    expect(si?.message).toContain(`${(weaker / 1000).toFixed(1)} kN`);
    const us = flagsInUnits(result, input, 'us').find(f => f.code === 'strips-before-break');
    expect(us?.message).toContain(`${Math.round(weaker / LBF)} lbf`);
    expect(us?.message).not.toMatch(/kN|mm/);
    // Same codes, levels and order in both unit systems.
    expect(flagsInUnits(result, input, 'us').map(f => `${f.level}:${f.code}`)).toEqual(result.flags.map(f => `${f.level}:${f.code}`));
    expect(flagsInUnits(result, input, 'si')).toBe(result.flags);
  });

  it('the text and Markdown reports in US units carry no kN or mm in their flags', () => {
    const text = formatCheckText(result, input, {units: 'us'});
    const flags = text.slice(text.indexOf('\nFLAGS\n'), text.indexOf('\nNOTES\n'));
    expect(flags).toMatch(/lbf/);
    expect(flags).not.toMatch(/ kN| mm\b/);
    const md = formatCheckMarkdown(result, input, {date: new Date('2026-01-01T00:00:00Z'), units: 'us'});
    const mdFlags = md.slice(md.indexOf('## Flags'), md.indexOf('## Limits'));
    expect(mdFlags).toMatch(/lbf/);
    expect(mdFlags).not.toMatch(/ kN| mm\b/);
  });

  it('the rules write forces and lengths in the context units', () => {
    const c: FlagContext = {
      internalKind: 'tapped', maxPreload: 50000, serviceLoad: 0, weaker: 'internal', weakerForce: 40000, boltBreakForce: 46400,
      requiredMargin: 1, engagedThreads: 8, firstShare: 0.38, effectiveEngagement: 12, requiredFedStd: 11, requiredAlexander: 10,
      utilisation: 0.9, utilisationLimit: 0.9, engagement: 12, pitch: 1.5, holeDepth: 10, isStandardPitch: true,
      designation: 'M10x1.5-6H/6g', modelRangeNotes: [], bearingEstimated: false, bearingDiameter: 12.8,
    };
    expect(stripsAtPreload(c)?.message).toMatch(/50\.0 kN preload against 40\.0 kN/);
    // 50 000 N / 4.4482216152605 = 11 240.4 lbf; 40 000 N = 8 992.4 lbf.
    expect(stripsAtPreload({...c, units: 'us'})?.message).toMatch(/11240 lbf preload against 8992 lbf/);
    // 12 mm = 0.472 in, 10 mm = 0.394 in.
    expect(blindHoleTooShallow({...c, units: 'us'})?.message).toMatch(/0\.472 in of bolt goes into a 0\.394 in deep/);
  });
});

describe('load share row', () => {
  it('a long engagement lists 12 threads and sums the rest (was hundreds of "0.000000 %")', async () => {
    const {shareList, SHARE_LIST_MAX} = await import('../../src/report/sections.js');
    const shares = Array.from({length: 40}, (_, i) => 0.5 ** (i + 1));
    const text = shareList(shares);
    expect(SHARE_LIST_MAX).toBe(12);
    expect(text.split(', ').length).toBe(14); // 12 shares, then "and 28 more threads", "x % together"
    expect(text).toMatch(/^50 %, 25 %, 13 %, /);
    expect(text).toMatch(/, and 28 more threads, 0\.024 % together$/);
    expect(shareList([0.38, 0.25])).toBe('38 %, 25 %');
  });

  it('the text report never breaks a line between a number and its "%"', () => {
    const long = checkJoint(JointInputSchema.parse({...DEMO, thread: 'M8', boltGrade: '8.8', parent: 'AlSi7Mg-T6', engagement: 300}));
    const text = formatCheckText(long, JointInputSchema.parse({...DEMO, thread: 'M8', boltGrade: '8.8', parent: 'AlSi7Mg-T6', engagement: 300}), {units: 'si'});
    expect(text).not.toMatch(/\n +%/);
    expect(text).not.toMatch(/0\.000000 %/);
    expect(text).toMatch(/more threads, [\d.]+ % together/);
    for (const line of text.split('\n')) expect([...line].length, line).toBeLessThanOrEqual(80);
  });
});

describe('hole row', () => {
  it('a tapped hole without a depth is not called "through" (repair reads the same joint as blind)', () => {
    const text = formatCheckText(result, input, {units: 'si'});
    expect(text).toMatch(/^ {2}Hole +depth not given: no blind-hole check$/m);
    expect(text).not.toMatch(/^ {2}Hole +through/m);
    const blind = JointInputSchema.parse({...DEMO, holeDepth: 25});
    expect(formatCheckText(checkJoint(blind), blind, {units: 'us'})).toMatch(/^ {2}Hole +blind, 0\.984 in deep$/m);
  });
});

describe('notes in the report units', () => {
  it('US: the hardware-table notes in inches (was "Bearing diameter 15.07 mm = ..."); JSON notes stay SI', async () => {
    const {notesInUnits} = await import('../../src/core/joint/index.js');
    const m12 = JointInputSchema.parse({thread: 'M12', boltGrade: '8.8', internal: 'nut', nutClass: '8', engagement: 10.37});
    const r = checkJoint(m12);
    // ISO 4014/4017 dw,min 16.63 mm, ISO 273 medium hole 13.5 mm: DKm = 15.07 mm = 0.593 in; ISO 4032 M12 m min 10.37 mm = 0.408 in.
    expect(r.notes.join('\n')).toMatch(/Bearing diameter 15\.07 mm = \(dw,min 16\.63 \+ hole 13\.5\)\/2/);
    const us = notesInUnits(r, m12, 'us').join('\n');
    expect(us).toMatch(/Bearing diameter 0\.593 in = \(dw,min 0\.655 \+ hole 0\.531\)\/2/);
    expect(us).toMatch(/Nut height 0\.408 in \(m min/);
    expect(notesInUnits(r, m12, 'si')).toBe(r.notes);
    const text = formatCheckText(r, m12, {units: 'us'});
    const notes = text.slice(text.indexOf('\nNOTES\n'), text.indexOf('\nLIMITS USED\n'));
    expect(notes).not.toMatch(/\d mm\b/);
  });
});

describe('nut-factor inputs', () => {
  it('the thread friction used for the thread torque is still shown (it was hidden behind K)', () => {
    const k = JointInputSchema.parse({thread: 'M12', boltGrade: '8.8', internal: 'nut', nutClass: '8', engagement: 10.37, nutFactor: 0.2, muThread: {min: 0.12, max: 0.14}});
    const text = formatCheckText(checkJoint(k), k, {units: 'si'});
    expect(text).toMatch(/^ {2}Nut factor K +0\.20\n +\(T = K F d\)$/m);
    expect(text).toMatch(/^ {2}Thread friction muG +0\.12 to 0\.14\n +\(thread torque in the stresses\)$/m);
    expect(text).not.toMatch(/Under-head friction/);
  });
});

describe('custom bolt in the headings', () => {
  it('"custom bolt", not "bolt custom" or the grade', () => {
    const c = JointInputSchema.parse({...DEMO, boltRm: 1000, boltRp: 900});
    const r = checkJoint(c);
    expect(formatCheckText(r, c, {units: 'si'})).toMatch(/^Joint check: 3\/8-16 UNC-2A\/2B, custom bolt, tapped hole/);
    expect(formatCheckMarkdown(r, c, {date: new Date('2026-01-01T00:00:00Z'), units: 'si'})).toMatch(/^Custom bolt in a tapped hole/m);
    expect(formatCheckMarkdown(result, input, {date: new Date('2026-01-01T00:00:00Z'), units: 'si'})).toMatch(/^Bolt SAE-8 in a tapped hole/m);
  });
});
