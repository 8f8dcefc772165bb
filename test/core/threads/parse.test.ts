import {describe, expect, it} from 'vitest';
import {listDesignations, nearestDesignations, parseThread} from '../../../src/core/threads/index.js';
import type {ThreadSpec} from '../../../src/core/types.js';

function ok(text: string): ThreadSpec {
  const p = parseThread(text);
  if (!p.ok) throw new Error(`${text}: ${p.error}`);
  return p.value;
}

function err(text: string): {error: string; suggestions?: string[]} {
  const p = parseThread(text);
  if (p.ok) throw new Error(`${text} parsed as ${p.value.designation}`);
  return p;
}

describe('ISO metric designations', () => {
  it('M10 takes the coarse pitch 1.5 mm (ISO 261/262) and the default 6H/6g', () => {
    const s = ok('M10');
    expect(s).toMatchObject({family: 'metric', nominal: 10, pitch: 1.5, series: 'coarse', isStandardPitch: true});
    expect(s).toMatchObject({toleranceExternal: '6g', toleranceInternal: '6H', toleranceDefaulted: true, starts: 1, lead: 1.5});
    expect(s.designation).toBe('M10x1.5-6H/6g');
    expect(s.sizeLabel).toBe('M10');
  });

  it('coarse pitches of ISO 262 for M3 to M36', () => {
    // ISO 262:1998 Table 1 (selected sizes), coarse pitch column
    const coarse: Array<[string, number]> = [
      ['M3', 0.5], ['M4', 0.7], ['M5', 0.8], ['M6', 1], ['M8', 1.25], ['M10', 1.5], ['M12', 1.75],
      ['M14', 2], ['M16', 2], ['M20', 2.5], ['M24', 3], ['M30', 3.5], ['M36', 4],
    ];
    for (const [t, p] of coarse) expect(ok(t).pitch).toBe(p);
  });

  it('fine pitch M10x1.25 is a standard fine thread (ISO 262)', () => {
    expect(ok('M10x1.25')).toMatchObject({pitch: 1.25, series: 'fine', isStandardPitch: true});
  });

  it('external, internal and paired classes', () => {
    expect(ok('M10x1.5-6g')).toMatchObject({toleranceExternal: '6g', toleranceInternal: '6H', toleranceDefaulted: true});
    expect(ok('M10x1.5-6H')).toMatchObject({toleranceExternal: '6g', toleranceInternal: '6H', toleranceDefaulted: true});
    expect(ok('M10x1.5-6H/6g')).toMatchObject({toleranceExternal: '6g', toleranceInternal: '6H', toleranceDefaulted: false});
    expect(ok('M8-5H/4g6g')).toMatchObject({pitch: 1.25, toleranceExternal: '4g6g', toleranceInternal: '5H'});
    expect(ok('M12x1.5-6e').toleranceExternal).toBe('6e');
    expect(ok('M12x1.5-6G').toleranceInternal).toBe('6G');
    expect(ok('M12x1.5-4h').toleranceExternal).toBe('4h');
  });

  it('case, spaces and × are tolerated; the pair position decides internal/external', () => {
    expect(ok('m10 × 1.5 - 6h/6g').designation).toBe('M10x1.5-6H/6g');
    expect(ok('  M 10 X 1.25 ').designation).toBe('M10x1.25-6H/6g');
    expect(ok('M10X1.5-6H/6G').toleranceExternal).toBe('6g');
    expect(ok('M10x1.5-6g/6H')).toMatchObject({toleranceExternal: '6g', toleranceInternal: '6H'});
    expect(ok('M10x1.5-6e/6G')).toMatchObject({toleranceExternal: '6e', toleranceInternal: '6G'});
    expect(ok('M10x1,5').pitch).toBe(1.5);
    expect(ok('M10 x 1.5 6H / 6g').designation).toBe('M10x1.5-6H/6g');
  });

  it('a pitch outside the series is a special thread', () => {
    const s = ok('M10x1.3');
    expect(s).toMatchObject({isStandardPitch: false, series: 'special', pitch: 1.3});
    const t = ok('M7.5x1');
    expect(t.isStandardPitch).toBe(false);
  });

  it('errors name the field and the accepted values', () => {
    expect(err('M10x1.5-6q').error).toMatch(/position "q".*accepted: e, f, g, h/);
    expect(err('M10x1.5-9g').error).toMatch(/grade 9.*4 to 8/);
    expect(err('M10x1.5-5g').error).toMatch(/grades 4, 6 and 8.*5g6g/);
    expect(err('M10x1.5-5g6h').error).toMatch(/same letter/);
    expect(err('M10x').error).toMatch(/pitch after "x" is missing/);
    expect(err('M7.5').error).toMatch(/no coarse pitch.*give the pitch/);
    expect(err('M0.5').error).toMatch(/diameter 0.5 mm is out of range; accepted: 1 to 355 mm/);
    expect(err('M10x9').error).toMatch(/pitch 9 mm is out of range/);
    const len = err('M10x1.5x30');
    expect(len.error).toMatch(/length is not part of it/);
    expect(len.suggestions).toEqual(['M10x1.5']);
    expect(err('M10x1.5-6H/6g/6e').error).toMatch(/tolerance class missing or malformed/);
    expect(err('M10x1.5-6H/6q').error).toMatch(/external class \(second of the pair\)/);
    expect(err('M10x1.5-6e/6g').error).toMatch(/internal class \(first of the pair\).*accepted: G, H/);
  });

  it('a bad class suggests the designation with valid classes', () => {
    expect(err('M10x1.5-6q').suggestions).toContain('M10x1.5-6H/6g');
  });
});

describe('unified designations', () => {
  it('1/4-20 UNC-2A: D 0.25 in, 20 tpi, default internal 2B', () => {
    const s = ok('1/4-20 UNC-2A');
    expect(s).toMatchObject({family: 'unified', sizeLabel: '1/4', tpi: 20, series: 'UNC', toleranceExternal: '2A', toleranceInternal: '2B'});
    expect(s.nominal).toBeCloseTo(6.35, 10);
    expect(s.pitch).toBeCloseTo(1.27, 10);
    expect(s.designation).toBe('1/4-20 UNC-2A/2B');
  });

  it('#10-32 UNF-3B: numbered size D = 0.060 + 0.013N in (ASME B1.1), mate 3A', () => {
    const s = ok('#10-32 UNF-3B');
    expect(s.nominal).toBeCloseTo(0.19 * 25.4, 10);
    expect(s).toMatchObject({series: 'UNF', toleranceInternal: '3B', toleranceExternal: '3A', toleranceDefaulted: true});
  });

  it('pairs, no class, decimal sizes and UNEF', () => {
    expect(ok('1/2-13 UNC-2A/2B')).toMatchObject({toleranceExternal: '2A', toleranceInternal: '2B', toleranceDefaulted: false});
    expect(ok('1/2-13 UNC-2B/2A').toleranceDefaulted).toBe(false);
    expect(ok('5/16-24 UNF')).toMatchObject({series: 'UNF', toleranceExternal: '2A', toleranceInternal: '2B', toleranceDefaulted: true});
    expect(ok('0.250-28 UNF')).toMatchObject({sizeLabel: '1/4', tpi: 28, series: 'UNF'});
    expect(ok('1/4-32 UNEF')).toMatchObject({series: 'UNEF', isStandardPitch: true});
    expect(ok('1-1/2-6 UNC').nominal).toBeCloseTo(38.1, 10);
    expect(ok('1 1/2-6 unc-2a').designation).toBe('1-1/2-6 UNC-2A/2B');
    expect(ok('1-8 UNC').nominal).toBeCloseTo(25.4, 10);
    expect(ok('3/8-16').series).toBe('UNC');
  });

  it('a tpi outside the series is a UN special thread', () => {
    expect(ok('1/4-24 UN')).toMatchObject({series: 'UN', isStandardPitch: false});
    expect(ok('1/4-24')).toMatchObject({series: 'UN', isStandardPitch: false});
    expect(ok('9/32-32 UN').isStandardPitch).toBe(false);
  });

  it('errors name what is wrong and what is accepted', () => {
    const e = err('1/4-28 UNC');
    expect(e.error).toMatch(/1\/4 UNC has 20 threads per inch, not 28 \(1\/4-28 is UNF\)/);
    expect(e.suggestions?.[0]).toBe('1/4-20 UNC');
    expect(new Set(e.suggestions).size).toBe(e.suggestions?.length);
    expect(ok('no. 10-32unf-2b').designation).toBe('#10-32 UNF-2A/2B');
    expect(err('1/4-20 UNC-4A').error).toMatch(/accepted: 1A, 2A, 3A .*1B, 2B, 3B/);
    expect(err('1/4-20 UNC-2A/3A').error).toMatch(/two external classes/);
    expect(err('9/32-32 UNC').error).toMatch(/not a UNC size/);
    expect(err('1/4-200 UNC').error).toMatch(/threads per inch 200 out of range; accepted: 2 to 100/);
  });
});

describe('power-screw designations (ThreadSpec only)', () => {
  it('Tr24x5: single start, pitch 5 mm', () => {
    expect(ok('Tr24x5')).toMatchObject({family: 'trapezoidal', nominal: 24, pitch: 5, lead: 5, starts: 1, isStandardPitch: true});
  });

  it('Tr40x14(P7): lead 14, pitch 7, 2 starts', () => {
    const s = ok('tr 40 × 14 (p7)');
    expect(s).toMatchObject({family: 'trapezoidal', nominal: 40, pitch: 7, lead: 14, starts: 2});
    expect(s.designation).toBe('Tr40x14(P7)-7H/7e');
  });

  it('1-5 ACME-2G: 1 in, 5 tpi, class 2G', () => {
    const s = ok('1-5 ACME-2G');
    expect(s).toMatchObject({family: 'acme', tpi: 5, starts: 1, toleranceExternal: '2G', toleranceInternal: '2G'});
    expect(s.nominal).toBeCloseTo(25.4, 10);
    expect(s.pitch).toBeCloseTo(5.08, 10);
    expect(ok('1-5 acme').toleranceDefaulted).toBe(true);
    expect(ok('1.5-0.25P-0.5L-ACME-2G')).toMatchObject({starts: 2});
  });

  it('square 32x4', () => {
    expect(ok('square 32x4')).toMatchObject({family: 'square', nominal: 32, pitch: 4, starts: 1});
    expect(ok('Sq 32 x 8 (P4)')).toMatchObject({lead: 8, pitch: 4, starts: 2});
  });

  it('power-screw errors', () => {
    expect(err('Tr40x15(P7)').error).toMatch(/not a whole multiple of the pitch/);
    expect(err('Tr24x5-7q').error).toMatch(/class "7q" is not accepted/);
    expect(err('1-5 ACME-9Z').error).toMatch(/accepted: 2G/);
    expect(err('square 32').error).toMatch(/square <diameter>x<pitch>/);
  });
});

describe('unrecognised text, lists and suggestions', () => {
  it('empty and unknown text name the accepted forms', () => {
    expect(err('').error).toMatch(/empty; accepted forms: M10/);
    expect(err('bolt').error).toMatch(/not recognised; accepted forms/);
  });

  it('listDesignations gives standard designations per family', () => {
    const m = listDesignations('metric');
    expect(m).toContain('M10');
    expect(m).toContain('M10x1.25');
    const u = listDesignations('unified');
    expect(u).toContain('1/4-20 UNC');
    expect(u).toContain('#10-32 UNF');
    expect(listDesignations('trapezoidal')).toContain('Tr24x5');
    expect(listDesignations('acme')).toContain('1-5 ACME');
    expect(listDesignations().length).toBe(m.length + u.length + listDesignations('trapezoidal').length + listDesignations('acme').length);
    // every listed designation parses as a standard one
    for (const d of listDesignations()) expect(ok(d).isStandardPitch).toBe(true);
  });

  it('nearestDesignations suggests close valid designations', () => {
    expect(nearestDesignations('M10x1.6', 3)).toContain('M10x1.5');
    expect(nearestDesignations('1/4-21 UNC', 2)).toContain('1/4-20 UNC');
    expect(nearestDesignations('Tr24x6', 3)).toContain('Tr24x5');
    expect(nearestDesignations('', 3)).toEqual([]);
    expect(err('M10x1.5x').suggestions?.length).toBeGreaterThan(0);
  });
});
