/**
 * Report sections for the tightening window and the sensitivity list: the band in the wrench's
 * units with the limit at each end, 80 columns, ASCII mode. Numbers from src/core/joint/window.ts
 * (VDI 2230 Part 1 torque-preload relation) and sensitivity.ts.
 */
import {describe, expect, it} from 'vitest';
import {checkJoint, JointInputSchema, type JointInputDraft} from '../../src/core/joint/index.js';
import {tighteningWindow} from '../../src/core/joint/window.js';
import {decidingMargin, sensitivity} from '../../src/core/joint/sensitivity.js';
import {windowText} from '../../src/report/window-text.js';
import {windowMarkdown} from '../../src/report/window-markdown.js';
import {formatCheckText} from '../../src/report/text.js';

// Demo joints.
const TAPPED: JointInputDraft = {thread: 'M10', internal: 'tapped', parent: '6061-T6', engagement: 12, serviceLoad: 5000};
const setup = (d: JointInputDraft, opts: {leastClamp?: number; prevailingTorque?: number} = {}) => {
  const input = JointInputSchema.parse(d);
  const result = checkJoint(input);
  return {input, result, w: tighteningWindow(input, result, opts), sens: sensitivity(input, result), margin: decidingMargin(input, result)};
};

describe('window report sections', () => {
  it('text: band in N·m with the limit at each end, the ranked list, within 80 columns', () => {
    const {w, sens, margin} = setup(TAPPED, {leastClamp: 12000, prevailingTorque: 10.5});
    const text = windowText(w, {units: 'si', ascii: false}, {sensitivity: sens, margin});
    for (const l of text.split('\n')) expect(Array.from(l).length).toBeLessThanOrEqual(80);
    expect(text).toMatch(/Tightening torque band\s+\d+\.\d N·m to \d+\.\d N·m/);
    expect(text).toMatch(/Bottom set by\s+least clamp load of the service: 12\.0 kN/);
    expect(text).toMatch(/Top set by\s+yield utilisation limit/);
    expect(text.replace(/\s+/g, ' ')).toMatch(/Set on the wrench .*10\.5 N·m prevailing torque/);
    expect(text).toContain('WHAT MATTERS MOST');
    const order = sens.map(i => text.indexOf(`  ${i.input === 'parent-strength' ? 'parent strength' : i.input} `));
    expect([...order].sort((a, b) => a - b)).toEqual(order);
  });

  it('US units: the band in ft·lbf; ASCII mode: 7-bit only', () => {
    const {w, sens, margin} = setup(TAPPED, {leastClamp: 12000});
    const us = windowText(w, {units: 'us', ascii: false}, {sensitivity: sens, margin});
    expect(us).toMatch(/Tightening torque band\s+[\d.]+ ft·lbf to [\d.]+ ft·lbf/);
    const ascii = windowText(w, {units: 'us', ascii: true}, {sensitivity: sens, margin});
    expect(/^[\x0a\x20-\x7e]*$/.test(ascii)).toBe(true);
    expect(ascii).toMatch(/ft\*lbf/);
  });

  it('an empty window names both limits and what opens it', () => {
    const {w} = setup({thread: 'M10', internal: 'tapped', parent: '6061-T6', engagement: 6, muThread: {min: 0.08, max: 0.2}, muHead: {min: 0.08, max: 0.2}}, {leastClamp: 20000});
    const text = windowText(w, {units: 'si', ascii: true});
    expect(text.replace(/\s+/g, ' ')).toMatch(/none: the least clamp load of the service \(20\.0 kN\)/);
    expect(text).toMatch(/thread stripping/);
    expect(text).toContain('To open the window:');
  });

  it('Markdown carries the same band and a table of the ranked list', () => {
    const {w, sens, margin} = setup(TAPPED, {leastClamp: 12000});
    const md = windowMarkdown(w, {units: 'si', ascii: false}, {sensitivity: sens, margin});
    expect(md).toMatch(/^## Tightening window/);
    expect(md).toMatch(/\| Tightening torque band \| \d+\.\d N·m to \d+\.\d N·m/);
    expect(md).toContain('## What matters most');
    expect(md).toContain('| Input | Low end | High end |');
  });

  it('plugs into the check report as an extra section, before the cautions', () => {
    const {input, result, w} = setup(TAPPED);
    const report = formatCheckText(result, input, {units: 'si', extraSections: [windowText(w, {units: 'si', ascii: false})]});
    expect(report.indexOf('TIGHTENING WINDOW')).toBeGreaterThan(report.indexOf('SOURCES'));
    for (const l of report.split('\n')) expect(Array.from(l).length).toBeLessThanOrEqual(80);
  });
});
