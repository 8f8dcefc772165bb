import {describe, expect, it} from 'vitest';
import {geom, inches} from './unified-helpers.js';
import {limitsSides, limitsSummary, methodWords} from '../../../src/core/threads/index.js';

// Which side of a thread pair comes from a table of the standard and which from the formulas.
// The tables: ASME B1.1 standard series limits table (rows in unified-table-data.ts, copies named in
// its header); ISO 965-1:1998 tables of fundamental deviations and tolerances (iso965-data.ts), whose
// grade-6 values agree with the ISO 965-2 limits of size.

const methods = (t: string) => {
  const g = geom(t);
  return {internal: g.limits.internal.method, external: g.limits.external.method, overall: g.limitsProvenance.method};
};

describe('limits of size: provenance per side', () => {
  it('unified: each side is labelled by the rows unified-table-data.ts holds', () => {
    // 2-56 UNC: 2A and 2B rows; 1/4-20 UNC: a 2B row only; 5/16-24 UNF and 1/4-24 UN (special): none
    expect(methods('#2-56 UNC-2A/2B')).toEqual({internal: 'table', external: 'table', overall: 'table'});
    expect(methods('1/4-20 UNC-2A/2B')).toEqual({internal: 'table', external: 'formula', overall: 'formula'});
    expect(methods('5/16-24 UNF-2A/2B')).toEqual({internal: 'formula', external: 'formula', overall: 'formula'});
    expect(methods('1/4-24 UN-2A/2B')).toEqual({internal: 'formula', external: 'formula', overall: 'formula'});
    // 15/16-20 UNEF: 3A row, no 3B row (cut off in the copy); the 3A values are the table's
    const g = geom('15/16-20 UNEF-3A/3B');
    expect(methods('15/16-20 UNEF-3A/3B')).toEqual({internal: 'formula', external: 'table', overall: 'formula'});
    expect(inches(g).ext).toEqual([0.9375, 0.9294, 0.905, 0.9016]);
    expect(g.limits.external).toMatchObject({method: 'table', kind: 'standard', source: 'ASME B1.1 standard series limits table, class 3A'});
    expect(g.limits.internal.kind).toBe('formula');
    expect(g.limits.internal.source).toMatch(/^ASME B1\.1 tolerance formulas \(from memory\) for class 3B: pitch-diameter tolerance \(0\.975 x that of 2A\) and minor-diameter tolerance, .*labelled fallback, not table values$/);
    expect(limitsSummary(g)).toBe('3B from formulas (fallback), 3A from the table');
  });

  it('unified 2B table / 2A formula: the tapped-hole side reads as table values', () => {
    // ASME B1.1 limits, 1/4-20 UNC-2B (UNC 2B chart, ar.scribd.com/document/395466526): D1 0.196/0.207 in,
    // D2 0.2175/0.2224 in, D min 0.2500 in
    const g = geom('1/4-20 UNC');
    expect(inches(g).int).toEqual([0.196, 0.207, 0.2175, 0.2224, 0.25]);
    expect(g.limits.internal).toMatchObject({method: 'table', kind: 'standard', source: 'ASME B1.1 standard series limits table, class 2B'});
    expect(g.limits.external).toMatchObject({method: 'formula', kind: 'formula'});
    expect(g.limits.external.source).toMatch(/class 2A: pitch-diameter tolerance, allowance and major-diameter tolerance/);
    expect(limitsSummary(g)).toBe('2B from the table, 2A from formulas (fallback)');
    expect(limitsSides(g).map(s => `${s.side} ${s.cls} ${methodWords(s)}`)).toEqual(['internal 2B table', 'external 2A formulas (fallback)']);
  });

  it('metric: a side is table when its deviation and both tolerances come from the ISO 965-1 tables', () => {
    expect(methods('M10x1.5-6H/6g')).toEqual({internal: 'table', external: 'table', overall: 'table'});
    const m10 = geom('M10x1.5-6H/6g');
    expect(m10.limits.internal).toMatchObject({method: 'table', kind: 'standard'});
    expect(limitsSummary(m10)).toBe('6H and 6g from the table');
    // grade 7 values are from memory of the ISO 965-1 tables (iso965-tables.ts): table, kind memory, per side
    const m7 = geom('M10x1.5-7H/6g');
    expect(m7.limits.internal).toMatchObject({method: 'table', kind: 'memory'});
    expect(m7.limits.internal.source).toMatch(/class 7H; grades other than 6 .* from memory/);
    expect(m7.limits.external).toMatchObject({method: 'table', kind: 'standard'});
    expect(methodWords(m7.limits.internal)).toBe('table (from memory)');
    expect(limitsSummary(m7)).toBe('7H from the table (from memory), 6g from the table');
    // TD1 and TD2 grade 8 for P 0.35 mm are not in the shipped tables: 8H from the formulas, 6g from the tables
    expect(methods('M1.6-8H/6g')).toEqual({internal: 'formula', external: 'table', overall: 'formula'});
    expect(geom('M1.6-8H/6g').limits.internal.source).toMatch(/for TD1 and TD2 of class 8H; EI from the ISO 965-1:1998 tables; labelled fallback/);
  });

  it('special threads: formulas on both sides', () => {
    const g = geom('M10x1.3');
    expect(methods('M10x1.3')).toEqual({internal: 'formula', external: 'formula', overall: 'formula'});
    expect(g.limits.external.source).toMatch(/^ISO 965-1 generating formulas \(from memory of ISO 965-1\), rounded to 1 µm, for es, Td and Td2 of class 6g; labelled fallback/);
    expect(limitsSummary(g)).toBe('6H and 6g from formulas (fallback)');
  });
});
