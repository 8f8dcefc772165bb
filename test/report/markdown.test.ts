import {describe, expect, it} from 'vitest';
import {formatCheckMarkdown, isoDate} from '../../src/report/index.js';
import {CAUTION_LINES} from '../../src/core/cautions.js';
import {DEMO_INPUT, demoResult} from './fixture.js';

// All numbers here come from the DEMO fixture: the tests check the report's structure, not engineering values.

const META = {
  presetName: 'demo: gearbox cover',
  date: new Date('2026-03-04T10:00:00Z'),
  notes: {asset: 'demo asset GB-7', location: 'demo bay 2', workOrder: 'WO-demo-001', text: '# not a heading\nthread chased | re-used bolt'},
  units: 'si' as const,
};

describe('formatCheckMarkdown', () => {
  const md = formatCheckMarkdown(demoResult(), DEMO_INPUT, META);

  it('has every section of the work-order report, in order', () => {
    const heads = md.split('\n').filter(l => l.startsWith('#')).map(l => l.replace(/^#+ /, ''));
    expect(heads[0]).toBe('Threaded joint check: M10x1.5-6H/6g');
    const order = ['Work order', 'Outcome', 'Inputs', 'Results', 'Flags', 'Limits and models used', 'Sources', 'Cautions', 'Sign-off'];
    const idx = order.map(h => heads.indexOf(h));
    for (const i of idx) expect(i).toBeGreaterThan(0);
    expect([...idx].sort((a, b) => a - b)).toEqual(idx);
  });

  it('carries the date, preset name and work-order fields', () => {
    expect(md).toContain('| Date | 2026-03-04 |');
    expect(md).toContain('| Preset | demo: gearbox cover |');
    expect(md).toContain('| Asset | demo asset GB-7 |');
    expect(md).toContain('| Location | demo bay 2 |');
    expect(md).toContain('| Work order | WO-demo-001 |');
    expect(md).toContain('| Units | SI: mm, kN, N·m, MPa |');
  });

  it('keeps user notes from becoming headings and escapes pipes in cells', () => {
    expect(md).toContain('\\# not a heading');
    expect(md).not.toMatch(/^# not a heading/m);
    expect(md).toContain('Demo message at watch level \\| with a pipe character.');
  });

  it('tables the inputs and results with units and sources', () => {
    expect(md).toMatch(/\| Thread \| M10x1\.5-6H\/6g \|/);
    expect(md).toMatch(/\| Bolt \| property class 8\.8, d <= 16 mm: Rm 800 MPa, Rp0\.2 640 MPa \| demo bolt source \|/);
    expect(md).toMatch(/\| Tightening \| to torque 40\.0 N·m \|/);
    expect(md).toMatch(/\| Hole \| blind, 20\.0 mm deep \|/);
    expect(md).toMatch(/\| Thread friction muG \| 0\.10 to 0\.16 \|/);
    expect(md).toMatch(/\| Preload min \/ nominal \/ max \| 18\.0 kN \/ 21\.0 kN \/ 24\.5 kN \|/);
    expect(md).toMatch(/\| Bolt breaks first \| 0\.71 \|/);
  });

  it('lists the flags with level words and repeats the fails in the outcome', () => {
    expect(md).toContain('**FAIL**: at least one check failed (1 fail, 1 watch, 1 info).');
    expect(md).toContain('- **FAIL** Demo message: the tapped thread strips at 33.0 kN');
    expect(md).toMatch(/\| FAIL \| strips-before-break \| Demo message/);
    expect(md).toMatch(/\| WATCH \| engagement-watch-demo \|/);
    expect(md).toMatch(/\| INFO \| demo-info \|/);
  });

  it('says which limits were used, and lists the sources and every caution', () => {
    expect(md).toMatch(/least-material limits of size: internal minor diameter max 8\.676 mm/);
    expect(md).toContain('- Demo method source B');
    for (const c of CAUTION_LINES) expect(md).toContain(`> ${c}`);
  });

  it('ends with a sign-off block for checked by and date', () => {
    const tail = md.slice(md.indexOf('## Sign-off'));
    expect(tail).toContain('| Role | Name | Signature | Date |');
    expect(tail).toContain('| Checked by |  |  |  |');
    expect(tail).toContain('| Approved by (qualified person) |  |  |  |');
  });

  it('works without a preset or notes, and in US units', () => {
    const plain = formatCheckMarkdown(demoResult({flags: []}), DEMO_INPUT, {date: new Date('2026-01-01T00:00:00Z'), units: 'us'});
    expect(plain).toContain('| Preset | (none: entered by hand) |');
    expect(plain).toContain('| Asset |  |');
    expect(plain).toContain('No flags were raised.');
    expect(plain).toContain('**NO FLAGS**');
    expect(plain).toMatch(/\| Tightening torque \| 29\.5 ft·lbf \|/);
  });

  it('prints an invalid date as not recorded', () => {
    expect(isoDate(new Date('nonsense'))).toBe('date not recorded');
  });
});
