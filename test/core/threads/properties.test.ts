import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {METRIC_SERIES, UNIFIED_SERIES, parseThread, threadGeometry} from '../../../src/core/threads/index.js';
import type {ThreadGeometry} from '../../../src/core/types.js';

// Properties of any thread pair (ISO 68-1 / ASME B1.1 geometry and the meaning of limits of
// size): common practice, no source beyond the definitions.

function geom(text: string): ThreadGeometry {
  const p = parseThread(text);
  if (!p.ok) throw new Error(`${text}: ${p.error}`);
  return threadGeometry(p.value);
}

function checkOrdered(g: ThreadGeometry): void {
  const e = g.limits.external;
  const i = g.limits.internal;
  // basic profile: d3 < D1 < d2 < d
  expect(g.minorDiameterExternal).toBeLessThan(g.minorDiameterInternal);
  expect(g.minorDiameterInternal).toBeLessThan(g.pitchDiameter);
  expect(g.pitchDiameter).toBeLessThan(g.nominal);
  expect(g.minorArea).toBeLessThan(g.stressArea);
  // limits: min < max, external within its basic size, internal at or above it
  expect(e.majorMin).toBeLessThan(e.majorMax);
  expect(e.pitchMin).toBeLessThan(e.pitchMax);
  expect(i.minorMin).toBeLessThan(i.minorMax);
  expect(i.pitchMin).toBeLessThan(i.pitchMax);
  expect(e.majorMax).toBeLessThanOrEqual(g.nominal + 1e-9);
  // limits are rounded: 0.0005 mm (ISO 965-2) or 0.00005 in = 0.00127 mm (ASME B1.1)
  const half = g.spec.family === 'unified' ? 0.00127 : 0.0005;
  expect(e.pitchMax).toBeLessThanOrEqual(g.pitchDiameter + half + 1e-9);
  expect(i.pitchMin).toBeGreaterThanOrEqual(g.pitchDiameter - half - 1e-9);
  expect(i.majorMin).toBeGreaterThanOrEqual(g.nominal - 1e-9);
  // the external thread always fits in the internal one (clearance or zero allowance)
  expect(e.pitchMax).toBeLessThanOrEqual(i.pitchMin + 1e-9);
  expect(e.majorMax).toBeLessThanOrEqual(i.majorMin + 1e-9);
  if (e.minorMin !== undefined) expect(e.minorMin).toBeLessThan(i.minorMin);
}

const metricStandard = fc
  .constantFrom(...METRIC_SERIES.filter(r => r.d >= 1.6))
  .chain(r => fc.constantFrom(...[r.coarse, ...r.fine].filter((p): p is number => p !== undefined)).map(p => ({d: r.d, p})));
const extClass = fc.tuple(fc.constantFrom(4, 5, 6, 7, 8), fc.constantFrom(4, 6, 8), fc.constantFrom('e', 'f', 'g', 'h'));
const intClass = fc.tuple(fc.constantFrom(4, 5, 6, 7, 8), fc.constantFrom('G', 'H'));

describe('thread properties', () => {
  it('metric standard sizes, any class: limits ordered and the pair fits', () => {
    fc.assert(
      fc.property(metricStandard, extClass, intClass, ({d, p}, [g2, gc, pos], [gi, posI]) => {
        const ext = g2 === gc ? `${g2}${pos}` : `${g2}${pos}${gc}${pos}`;
        checkOrdered(geom(`M${d}x${p}-${gi}${posI}/${ext}`));
      }),
      {numRuns: 200},
    );
  });

  it('metric special threads (formula fallback): limits ordered and labelled', () => {
    fc.assert(
      fc.property(fc.integer({min: 30, max: 600}), fc.integer({min: 20, max: 400}), (d10, p100) => {
        const d = d10 / 10;
        const p = p100 / 100;
        fc.pre(p <= 0.25 * d);
        const g = geom(`M${d}x${p}`);
        checkOrdered(g);
        if (!g.spec.isStandardPitch) expect(g.notes.join(' ')).toMatch(/Special thread/);
        if (g.limitsProvenance.method === 'formula') expect(g.notes.join(' ')).toMatch(/generating formulas/);
      }),
      {numRuns: 200},
    );
  });

  it('unified series sizes, any class pair: limits ordered and the pair fits', () => {
    const pairs = UNIFIED_SERIES.flatMap(r =>
      (['UNC', 'UNF', 'UNEF'] as const).filter(s => r[s] !== undefined).map(s => `${r.label}-${r[s]} ${s}`),
    );
    fc.assert(
      fc.property(fc.constantFrom(...pairs), fc.constantFrom(1, 2, 3), fc.constantFrom(1, 2, 3), (t, a, b) => {
        checkOrdered(geom(`${t}-${a}A/${b}B`));
      }),
      {numRuns: 200},
    );
  });

  it('the canonical designation parses back to the same thread', () => {
    fc.assert(
      fc.property(metricStandard, extClass, ({d, p}, [g2, gc, pos]) => {
        const ext = g2 === gc ? `${g2}${pos}` : `${g2}${pos}${gc}${pos}`;
        const a = parseThread(`m ${d} x ${p} - ${ext}`);
        expect(a.ok).toBe(true);
        if (!a.ok) return;
        const b = parseThread(a.value.designation);
        expect(b.ok && b.value).toEqual({...a.value, toleranceDefaulted: false});
      }),
      {numRuns: 100},
    );
  });

  it('parseThread never throws on arbitrary text', () => {
    fc.assert(
      fc.property(fc.string({maxLength: 30}), s => {
        const r = parseThread(s);
        if (!r.ok) expect(r.error.length).toBeGreaterThan(0);
      }),
      {numRuns: 300},
    );
  });
});
