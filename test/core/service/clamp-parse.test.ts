/**
 * The --clamp parser: good lists in SI and US display units, and every kind of bad
 * entry with a message naming --clamp, the entry and what was expected.
 */
import {describe, expect, it} from 'vitest';
import {parseClamp, MPSI_MPA} from '../../../src/core/service/clamp-parse.js';

describe('parseClamp', () => {
  it('reads thickness and material id or modulus, head side first', () => {
    const r = parseClamp('3 steel, 15 6082-T6, 20 110GPa', {units: 'si'});
    expect(r).toEqual({ok: true, value: [{thickness: 3, material: 'steel'}, {thickness: 15, material: '6082-T6'}, {thickness: 20, modulus: 110_000}]});
  });
  it('bare thickness is in the display unit; units and fractions are accepted; ids are matched without case', () => {
    const r = parseClamp('0.5 STEEL; 3/4 16Mpsi, 12mm aluminum, 2 in 110 GPa', {units: 'us'});
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value[0]).toEqual({thickness: 12.7, material: 'steel'});
    expect(r.value[1]?.thickness).toBeCloseTo(19.05, 9);
    expect(r.value[1]?.modulus).toBeCloseTo(16 * MPSI_MPA, 6);
    expect(r.value[2]).toEqual({thickness: 12, material: 'aluminium'});
    expect(r.value[3]).toEqual({thickness: 50.8, modulus: 110_000});
  });
  it('1 Mpsi is 6894.757 MPa, so 30 Mpsi is the 207 GPa of the stiffness tables (to 0.1 %)', () => {
    expect(MPSI_MPA).toBeCloseTo(6894.757, 3);
    expect(Math.abs((30 * MPSI_MPA) / 207_000 - 1)).toBeLessThan(0.001);
  });
  it('accepts the user material ids passed in', () => {
    expect(parseClamp('10 my-alloy', {units: 'si', extraIds: ['my-alloy']})).toEqual({ok: true, value: [{thickness: 10, material: 'my-alloy'}]});
  });

  const bad: [string, RegExp][] = [
    ['', /--clamp is empty/],
    ['   ', /--clamp is empty/],
    ['12', /--clamp: entry 1 "12": expected a thickness and a material/],
    ['12 steel,', /--clamp: entry 2 "": is empty/],
    ['12 stel', /entry 1 "12 stel": unknown material "stel"; did you mean steel\?; expected a material id/],
    ['abc steel', /entry 1 "abc steel": thickness "abc" is not a number; expected a length/],
    ['12kg steel', /entry 1 "12kg steel": thickness unit "kg" is not a length unit/],
    ['0 steel', /entry 1 "0 steel": thickness 0 is outside 0.05 to 2000 mm/],
    ['-5 steel', /thickness -5 is outside/],
    ['12 110', /entry 1 "12 110": "110" has no unit; write the modulus with its unit/],
    ['12 0.5GPa', /modulus 0.5GPa is outside 1 to 500 GPa/],
    ['12 900GPa', /modulus 900GPa is outside/],
    ['12 steel, 10 steel, 5 zz', /entry 3 "5 zz": unknown material "zz"/],
  ];
  for (const [text, message] of bad) {
    it(`rejects ${JSON.stringify(text)} with a message naming --clamp`, () => {
      const r = parseClamp(text, {units: 'si'});
      expect(r.ok).toBe(false);
      if (r.ok) return;
      expect(r.error).toMatch(/--clamp/);
      expect(r.error).toMatch(message);
    });
  }
  it('rejects more than 20 parts', () => {
    const r = parseClamp(Array.from({length: 21}, () => '1 steel').join(', '), {units: 'si'});
    expect(r.ok).toBe(false);
  });
});
