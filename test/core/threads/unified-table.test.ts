import {describe, expect, it} from 'vitest';
import {cls, geom, inches} from './unified-helpers.js';
import {UNIFIED_TABLE} from '../../../src/core/threads/unified-table-data.js';
import {unifiedLimitsInches} from '../../../src/core/threads/unified-limits.js';
import {seriesOf, unifiedRow} from '../../../src/core/threads/unified-series.js';


describe('unified limits read from the ASME B1.1 standard series limits table', () => {
  it.each([
    // ASME B1.1 limits of size, Standard Series table (read in a public copy of the table):
    // [designation, ext major max/min, pitch max/min, int minor min/max, pitch min/max, major min], inches
    ['#0-80 UNF-2A/2B', [0.0595, 0.0563, 0.0514, 0.0496], [0.0465, 0.0514, 0.0519, 0.0542, 0.06]],
    ['#0-80 UNF-3A/3B', [0.06, 0.0568, 0.0519, 0.0506], [0.0465, 0.0514, 0.0519, 0.0536, 0.06]],
    ['#1-64 UNC-2A/2B', [0.0724, 0.0686, 0.0623, 0.0603], [0.0561, 0.0623, 0.0629, 0.0655, 0.073]],
    ['#1-72 UNF-3A/3B', [0.073, 0.0695, 0.064, 0.0626], [0.058, 0.0635, 0.064, 0.0659, 0.073]],
    ['#2-56 UNC-2A/2B', [0.0854, 0.0813, 0.0738, 0.0717], [0.0667, 0.0737, 0.0744, 0.0772, 0.086]],
    ['#2-64 UNF-3A/3B', [0.086, 0.0822, 0.0759, 0.0744], [0.0691, 0.0753, 0.0759, 0.0779, 0.086]],
    ['15/16-20 UNEF-2A/2B', [0.9361, 0.928, 0.9036, 0.8991], [0.883, 0.895, 0.905, 0.9109, 0.9375]],
  ] as const)('%s matches the ASME B1.1 standard series limits table', (t, ext, int) => {
    const g = geom(t);
    expect(inches(g)).toEqual({ext, int});
    expect(g.limitsProvenance).toEqual({source: 'ASME B1.1 standard series limits table', kind: 'standard', method: 'table'});
    expect(g.notes.join(' ')).toMatch(/read from the ASME B1.1 standard series limits table/);
  });

  it('3-48 UNC-2A comes from the ASME B1.1 table, its 2B (not transcribed) from the formulas, and says so', () => {
    // ASME B1.1 limits of size, Standard Series table: 3-48 UNC-2A major 0.0983/0.0938, pitch 0.0848/0.0825 in
    const g = geom('#3-48 UNC-2A/2B');
    expect(inches(g).ext).toEqual([0.0983, 0.0938, 0.0848, 0.0825]);
    expect(g.limitsProvenance.method).toBe('formula');
    expect(g.limitsProvenance.source).toMatch(/table for one side/);
    expect(g.notes.join(' ')).toMatch(/Class 2A limits read from the ASME B1.1 standard series limits table; class 2B computed/);
  });

  it('a size the table data does not hold keeps the labelled formula fallback', () => {
    const g = geom('1/4-20 UNC-2A/2B');
    expect(g.limitsProvenance.method).toBe('formula');
    expect(g.notes.join(' ')).toMatch(/not read from the ASME B1.1 tables/);
  });

  it('every table entry is a UNC, UNF or UNEF series size (ASME B1.1 series table, unified-series.ts)', () => {
    for (const e of UNIFIED_TABLE) {
      const row = unifiedRow(e.D);
      expect(row, e.thread).toBeDefined();
      expect(seriesOf(row!, e.tpi), e.thread).toBe(e.thread.split(' ')[1]);
    }
  });
});

describe('formula fallback measured against the ASME B1.1 standard series limits table', () => {
  it('every transcribed value is within 0.0002 in of the ASME B1.1 formulas', () => {
    // ASME B1.1 limits of size, Standard Series table (unified-table-data.ts) against the
    // ASME B1.1 tolerance formulas of unified-limits.ts, every row and column (UNR minor is reference only).
    let worst = 0;
    let values = 0;
    for (const e of UNIFIED_TABLE) {
      for (const [k, row] of Object.entries(e.external)) {
        const f = unifiedLimitsInches(e.D, e.tpi, cls(k), cls('2B'));
        const got = [f.allowance, f.external.majorMax, f.external.majorMin, f.external.pitchMax, f.external.pitchMin];
        got.forEach((v, i) => {
          values++;
          worst = Math.max(worst, Math.abs(v - row[i]!));
        });
      }
      for (const [k, row] of Object.entries(e.internal)) {
        const f = unifiedLimitsInches(e.D, e.tpi, cls('2A'), cls(k));
        const i = f.internal;
        [i.minorMin, i.minorMax, i.pitchMin, i.pitchMax, i.majorMin].forEach((v, j) => {
          values++;
          worst = Math.max(worst, Math.abs(v - row[j]!));
        });
      }
    }
    expect(values).toBe(120);
    expect(worst).toBeLessThanOrEqual(0.0002 + 1e-9);
  });
});
