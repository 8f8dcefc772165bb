import {describe, expect, it} from 'vitest';
import {checkJoint, JointInputSchema} from '../../src/core/joint/index.js';
import {measurementsMarkdown, measurementsText} from '../../src/report/measurements.js';

// Demo scenario (invented): a worn M10 tapped hole in a 6082-T6 gearbox cover, bolt measured over wires.
const result = checkJoint(
  JointInputSchema.parse({
    thread: 'M10x1.5-6H/6g',
    parent: '6082-T6',
    engagement: 15,
    measured: {overWires: {measurement: 10.15, wire: 0.866}, holeMinorDiameter: 8.82, gauges: {holeNoGo: 'enters'}},
  }),
);

describe('measurement list renderer (text and Markdown)', () => {
  it('text: each measurement with its instrument and where it lies, per-thread limits used, gauge notes; 80 columns', () => {
    const lines = measurementsText(result.stripping, {units: 'si'});
    const text = lines.join('\n');
    expect(lines[0]).toBe('As measured');
    expect(text).toMatch(/bolt pitch diameter: 8\.849 mm \(M 10\.150 mm over 0\.866 mm wires\), three wires\s+and micrometer/);
    expect(text).toMatch(/worn past the 6g minimum 8\.862 mm by 0\.01\d mm/);
    expect(text).toMatch(/hole minor diameter: 8\.820 mm, pin gauge or bore gauge/);
    expect(text).toMatch(/worn past the 6H maximum 8\.676 mm by 0\.144 mm/);
    expect(text).toMatch(/hole, NO-GO 6H: enters, NO-GO thread plug gauge/);
    expect(text).toMatch(/Bolt-thread stripping area: as measured\./);
    expect(text).toMatch(/Internal-thread stripping area: least-material limits; NO-GO gauge entered:\s+the force is an upper bound\./);
    for (const l of lines) expect(l.length).toBeLessThanOrEqual(80);
  });

  it('US units and ASCII', () => {
    const text = measurementsText(result.stripping, {units: 'us'}).join('\n');
    expect(text).toMatch(/hole minor diameter: 0\.3472 in/);
    expect(/^[\x20-\x7e\n]*$/.test(text)).toBe(true);
  });

  it('Markdown: a table with one row per measurement', () => {
    const md = measurementsMarkdown(result.stripping, {units: 'si'});
    expect(md[0]).toBe('## As measured');
    expect(md.filter(l => l.startsWith('| ') && !l.startsWith('| Measurement')).length).toBe(3);
    expect(md.join('\n')).toMatch(/\| hole minor diameter \| 8\.820 mm \| pin gauge or bore gauge \| worn past the 6H maximum 8\.676 mm by 0\.144 mm \|/);
  });

  it('nothing measured: no block', () => {
    const plain = checkJoint(JointInputSchema.parse({thread: 'M10', parent: '6082-T6', engagement: 15}));
    expect(measurementsText(plain.stripping, {units: 'si'})).toEqual([]);
    expect(measurementsMarkdown(plain.stripping, {units: 'si'})).toEqual([]);
  });
});
