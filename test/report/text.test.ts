import {describe, expect, it} from 'vitest';
import {formatCheckText, toAscii, wrapText} from '../../src/report/index.js';
import {CAUTION_LINES} from '../../src/core/cautions.js';
import {DEMO_INPUT, demoResult} from './fixture.js';

// All numbers here come from the DEMO fixture: the tests check layout and units, not engineering values.

describe('formatCheckText', () => {
  const si = formatCheckText(demoResult(), DEMO_INPUT, {units: 'si'});
  const us = formatCheckText(demoResult(), DEMO_INPUT, {units: 'us'});
  /** The report with wrapped lines joined, for matching text that may wrap. */
  const flat = (t: string) => t.replace(/\n {2,}/g, ' ');

  it('fits 80 columns in both unit systems and in ASCII', () => {
    const ascii = formatCheckText(demoResult(), DEMO_INPUT, {units: 'si', ascii: true});
    for (const text of [si, us, ascii]) {
      for (const line of text.split('\n')) expect([...line].length, line).toBeLessThanOrEqual(80);
    }
  });

  it('states the verdict with a level word', () => {
    expect(si).toMatch(/^RESULT FAIL: at least one check failed \(1 fail, 1 watch, 1 info\)/m);
    const clean = formatCheckText(demoResult({flags: []}), DEMO_INPUT, {units: 'si'});
    expect(clean).toMatch(/RESULT NO FLAGS/);
    expect(clean).toMatch(/FLAGS\n {2}none/);
  });

  it('gives every flag its level word, code and message', () => {
    expect(si).toMatch(/FAIL {3}strips-before-break\n {9}Demo message: the tapped thread strips/);
    expect(si).toMatch(/WATCH {2}engagement-watch-demo/);
    expect(si).toMatch(/INFO {3}demo-info/);
  });

  it('shows results with their SI units', () => {
    expect(si).toMatch(/Preload min \/ nominal \/ max +18\.0 kN \/ 21\.0 kN \/ 24\.5 kN/);
    expect(si).toMatch(/Tightening torque +40\.0 N·m/);
    expect(si).toMatch(/von Mises equivalent +520 MPa/);
    expect(si).toMatch(/Required engagement, FED-STD-H28 +14\.2 mm/);
    expect(si).toMatch(/shear area 147 mm² x 225 MPa/);
    expect(si).toMatch(/Load share per thread +38 %, 25 %, 17 %, 11 %, 6\.0 %, 3\.0 %/);
    expect(si).toMatch(/Utilisation of Rp0\.2 +74 %/);
  });

  it('converts to US units: 24.5 kN = 5508 lbf, 40 N·m = 29.5 ft·lbf, 520 MPa = 75.4 ksi, 147 mm² = 0.228 in² (exact factors, NIST SP 811)', () => {
    expect(us).toMatch(/\/ 5508 lbf/);
    expect(us).toMatch(/Tightening torque +29\.5 ft·lbf/);
    expect(us).toMatch(/von Mises equivalent +75\.4 ksi/);
    expect(us).toMatch(/shear area 0\.228 in²/);
    expect(us).toMatch(/Engaged length +0\.472 in/);
  });

  it('names the limits of size used and the sources', () => {
    expect(flat(si)).toMatch(/least-material limits of size: internal minor diameter max 8\.676 mm/);
    expect(si).toMatch(/Demo method source A/);
    expect(si).toMatch(/Internal thread EN-GJL-250: demo parent source/);
    expect(si).toMatch(/Demo note: bearing diameter/);
  });

  it('ends with every caution line', () => {
    for (const c of CAUTION_LINES) expect(flat(si)).toContain(c);
  });

  it('keeps to 7-bit ASCII when asked', () => {
    const ascii = formatCheckText(demoResult(), DEMO_INPUT, {units: 'si', ascii: true});
    expect(ascii).toMatch(/^[\x09\x0a\x0d\x20-\x7e]*$/);
    expect(ascii).toMatch(/40\.0 N\*m/);
    expect(ascii).toMatch(/147 mm\^2/);
  });

  it('shows the nut inputs for a nut joint', () => {
    const input = {...DEMO_INPUT, internal: 'nut' as const, nutClass: '8', nutHeight: 8.4, nutFlats: 16, holeDepth: undefined};
    const r = demoResult();
    r.materials.internal = {id: '8', name: 'nut property class 8', rm: 800, shear: 480, provenance: {source: 'demo nut source', kind: 'demo'}};
    const text = formatCheckText(r, input, {units: 'si'});
    expect(text).toMatch(/Nut height +8\.40 mm/);
    expect(text).toMatch(/Nut width across flats +16\.0 mm/);
    expect(text).toMatch(/bolt 8\.8, nut property class 8\n/);
    expect(text).not.toMatch(/^ {2}Hole /m);
  });
});

describe('text helpers', () => {
  it('wraps on words and splits a word longer than the line', () => {
    expect(wrapText('aaa bbb ccc', '', '', 7)).toEqual(['aaa bbb', 'ccc']);
    const long = wrapText('x'.repeat(25), '> ', '  ', 10);
    for (const l of long) expect(l.length).toBeLessThanOrEqual(10);
    expect(long.join('').replace(/[> ]/g, '')).toBe('x'.repeat(25));
  });

  it('maps symbols to ASCII', () => {
    expect(toAscii('N·m mm² ≥ 0.5 µm — Ø')).toBe('N*m mm^2 >= 0.5 um - ?');
  });
});
