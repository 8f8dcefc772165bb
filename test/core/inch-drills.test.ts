/**
 * Drill sizes for a US shop and size ranges in words.
 * Decimal sizes of number and letter drills: the drill-size tables of Machinery's Handbook
 * and ASME B94.11M (from memory; #7 = 0.201 in and the A..Z span 0.234 to 0.413 in confirmed
 * against published drill charts).
 */
import {describe, expect, it} from 'vitest';
import {INCH_DRILLS, inchDrillLabel, inchFraction, nearestInchDrill, sizeRangeWords} from '../../src/core/inch-drills.js';

const mm = (inches: number) => inches * 25.4;

describe('inch drills', () => {
  it('names the fractional, letter and number drill that matches', () => {
    expect(nearestInchDrill(mm(27 / 64))).toMatchObject({name: '27/64', exact: true});
    expect(nearestInchDrill(mm(0.332))).toMatchObject({name: 'Q', exact: true});
    expect(nearestInchDrill(mm(0.201))).toMatchObject({name: '#7', exact: true});
    expect(nearestInchDrill(mm(0.413))).toMatchObject({name: 'Z', exact: true});
    expect(nearestInchDrill(mm(0.234))).toMatchObject({name: 'A', exact: true});
    expect(nearestInchDrill(mm(0.228))).toMatchObject({name: '#1', exact: true});
    expect(nearestInchDrill(mm(0.5))).toMatchObject({name: '1/2', exact: true});
  });
  it('gives the decimal beside the name, and the nearest drill when none matches', () => {
    expect(inchDrillLabel(mm(27 / 64))).toBe('27/64 (0.4219 in)');
    expect(inchDrillLabel(mm(0.332))).toBe('Q (0.3320 in)');
    expect(inchDrillLabel(10.6)).toBe('0.4173 in (nearest Z 0.413)');
    expect(inchDrillLabel(10.5)).toBe('Z (0.4134 in)'); // within half a thousandth
  });
  it('the series are in order and 64 fractional sizes are present', () => {
    for (let i = 1; i < INCH_DRILLS.length; i++) expect(INCH_DRILLS[i]!.inches).toBeGreaterThanOrEqual(INCH_DRILLS[i - 1]!.inches);
    expect(INCH_DRILLS.filter(d => /^\d+\/\d+$|^1$/.test(d.name))).toHaveLength(64);
  });
});

describe('inch fractions and size ranges', () => {
  it('writes 64ths as reduced fractions', () => {
    expect(inchFraction(0.75)).toBe('3/4');
    expect(inchFraction(1.5)).toBe('1 1/2');
    expect(inchFraction(0.3)).toBeUndefined();
  });
  it('writes an inch size range without float noise (was "d > 6.34 <= 19.049999999999997 mm")', () => {
    expect(sizeRangeWords({sizeMinMm: 6.35 - 0.01, sizeMaxMm: 19.049999999999997}, 'us')).toBe('1/4 in < d <= 3/4 in');
    expect(sizeRangeWords({sizeMinMm: 6.34, sizeMaxMm: 19.049999999999997}, 'si')).toBe('6.34 mm < d <= 19.05 mm');
    expect(sizeRangeWords({sizeMaxMm: 16}, 'si')).toBe('d <= 16 mm');
    expect(sizeRangeWords({}, 'si')).toBe('');
  });
});

import {JointInputSchema} from '../../src/core/joint/input.js';
import {planRepairs} from '../../src/core/repair/index.js';
import {planSectionLines, planText} from '../../src/report/index.js';

describe('repair plans in US units name the drill a US shop has', () => {
  // Demo joint: a 1/2-13 grade 5 cap screw stripped in grey iron.
  const joint = JointInputSchema.parse({thread: '1/2-13 UNC', boltGrade: 'SAE-5', parent: 'EN-GJL-250', engagement: 19});
  const plan = planRepairs(joint, {holeState: 'stripped', strippedDepth: 8, depthAvailable: 40}, undefined, 'us');
  it('text detail and Markdown give the drill with its decimal inch size, no millimetres', () => {
    const text = planText(plan, 'us', 'REPAIR PLAN');
    const md = planSectionLines(plan, 'us', {level: 2}).join('\n');
    const drilled = plan.options.filter(o => o.feasible && o.drill !== null);
    expect(drilled.length).toBeGreaterThan(0);
    for (const o of drilled) {
      expect(text).toContain(`Drill ${inchDrillLabel(o.drill as number)}.`);
      expect(md).toContain(inchDrillLabel(o.drill as number));
    }
    expect(text).not.toMatch(/\d mm\b/);
  });
});
