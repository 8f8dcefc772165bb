import {describe, expect, it} from 'vitest';
import {drillPointLength, insertDepths, receivingThread, stiTapDrill, HELICAL_LENGTH_FACTORS} from '../../../src/core/repair/index.js';
import type {ThreadBasics} from '../../../src/core/repair/helical.js';

const IN = 25.4;
const m = (d: number, p: number): ThreadBasics => ({family: 'metric', nominal: d, pitch: p, sizeLabel: `M${d}`, series: 'coarse'});
const u = (label: string, inches: number, tpi: number): ThreadBasics => ({family: 'unified', nominal: inches * IN, pitch: IN / tpi, tpi, sizeLabel: label, series: 'UNC'});

describe('receiving (STI) thread of a helical wire insert', () => {
  // Receiving-thread major diameters of the insert standards (ASME B18.29.2M metric,
  // ASME B18.29.1 inch): from memory (recalled STI tap sizes), not read in the standards.
  it.each([
    ['M6x1', m(6, 1), 7.299],
    ['M8x1.25', m(8, 1.25), 9.624],
    ['M10x1.5', m(10, 1.5), 11.949],
    ['M12x1.75', m(12, 1.75), 14.273],
  ])('%s major diameter %f mm (ASME B18.29.2M receiving thread, from memory)', (_n, t, major) => {
    expect(receivingThread(t).major).toBeCloseTo(major, 3);
  });

  it.each([
    ['1/4-20', u('1/4', 0.25, 20), 0.315],
    ['3/8-16', u('3/8', 0.375, 16), 0.4562],
    ['1/2-13', u('1/2', 0.5, 13), 0.5999],
  ])('%s major diameter %f in (ASME B18.29.1 receiving thread, from memory)', (_n, t, inches) => {
    expect(receivingThread(t).major / IN).toBeCloseTo(inches, 4);
  });

  it('keeps the ISO 68-1 basic profile: D - D2 = 0.649519P and D - D1 = 1.082532P (ISO 68-1 / ISO 724)', () => {
    for (const t of [m(6, 1), m(10, 1.5), m(16, 2), u('1/4', 0.25, 20)]) {
      const r = receivingThread(t);
      expect(r.major - r.pitchDiameter).toBeCloseTo(0.649519 * t.pitch, 6);
      expect(r.major - r.minor).toBeCloseTo(1.082532 * t.pitch, 6);
      // The receiving thread's minor diameter lies outside the old thread: the torn thread is cut away.
      expect(r.minor).toBeGreaterThan(t.nominal);
    }
  });

  it('M10x1.5 receiving thread: pitch diameter 10.974 mm, minor 10.325 mm (from memory, same relation)', () => {
    const r = receivingThread(m(10, 1.5));
    expect(r.pitchDiameter).toBeCloseTo(10.974, 3);
    expect(r.minor).toBeCloseTo(10.325, 3);
    expect(r.tap).toBe('M10x1.5 STI');
  });

  // Typical published STI tap-drill recommendations, from memory (they vary with material):
  // M6 6.3, M8 8.3-8.4, M10 10.4-10.5, M12 12.4-12.5, M16 16.5 mm; 1/4-20 17/64 in.
  it.each([
    ['M6x1', m(6, 1), 6.3], ['M8x1.25', m(8, 1.25), 8.3], ['M10x1.5', m(10, 1.5), 10.4], ['M12x1.75', m(12, 1.75), 12.4], ['M16x2', m(16, 2), 16.5],
  ])('STI tap drill for %s: %f mm, the typical recommendation (from memory)', (_n, t, drill) => {
    expect(receivingThread(t).drill).toBeCloseTo(drill, 6);
  });

  it('1/4-20 STI tap drill 17/64 in (from memory)', () => {
    expect(receivingThread(u('1/4', 0.25, 20)).drill).toBeCloseTo((17 / 64) * IN, 6);
  });

  it('the drill rule rounds the basic minor diameter up (common practice, no source)', () => {
    expect(stiTapDrill(10.3, false)).toBeCloseTo(10.3, 9);
    expect(stiTapDrill(10.301, false)).toBeCloseTo(10.4, 9);
  });
});

describe('insert lengths and hole depths (ASME B18.29.2M, read in a secondary copy quoting it)', () => {
  it('offers nominal lengths 1D, 1.5D, 2D, 2.5D and 3D (ASME B18.29.2M)', () => {
    expect([...HELICAL_LENGTH_FACTORS]).toEqual([1, 1.5, 2, 2.5, 3]);
  });

  it('M10x1.5, 1.5D: L 15, assembled 13.875..14.25, set-down 1.125..2.25, tapped 16.5, drilled 24 (plug) mm', () => {
    const t = m(10, 1.5);
    const d = insertDepths(t, 1.5, 10.4, 'plug');
    expect(d.nominalLength).toBe(15);
    expect(d.assembled.min).toBeCloseTo(13.875, 9);
    expect(d.assembled.max).toBeCloseTo(14.25, 9);
    expect(d.setDown.min).toBeCloseTo(1.125, 9);
    expect(d.setDown.max).toBeCloseTo(2.25, 9);
    expect(d.tappedDepth).toBeCloseTo(16.5, 9); // T = L + 1P
    expect(d.drilledDepth).toBeCloseTo(24, 9); // plug tap over 8 mm: L + 4P + 1P + 1P
    expect(d.holeDepth).toBeCloseTo(24 + drillPointLength(10.4), 9);
  });

  it('bottoming tap: L + 2P + 1P + 1P; plug tap up to 8 mm: L + 0.5D + 4P + 1P + 1P (ASME B18.29.2M)', () => {
    expect(insertDepths(m(10, 1.5), 1.5, 10.4, 'bottoming').drilledDepth).toBeCloseTo(21, 9);
    expect(insertDepths(m(6, 1), 2, 6.3, 'plug').drilledDepth).toBeCloseTo(12 + 3 + 4 + 1 + 1, 9);
  });

  it('a 118 deg drill point adds (D/2)/tan 59 deg = 0.300 D (geometry of the point)', () => {
    expect(drillPointLength(10)).toBeCloseTo(3.004, 3);
  });
});
