import {describe, expect, it} from 'vitest';
import {checkScrew, ScrewInputSchema, screwFlagsInUnits, flagNumbers} from '../../../src/core/screw/index.js';

// Demo screw: Tr24x5 with a 10 mm bronze nut at 20 kN, so that the flank pressure and the
// stripping margin raise flags with numbers in them.
const input = ScrewInputSchema.parse({thread: 'Tr24x5', load: 20000, nutLength: 10});
const r = checkScrew(input);

describe('screwFlagsInUnits (issue 14 item 13: no MPa in US mode)', () => {
  it('SI: the result\'s own flags, unchanged (the JSON)', () => {
    expect(screwFlagsInUnits(r, input, 'si')).toBe(r.flags);
  });

  it('US: same codes, levels and order; numbers in ksi, lbf, ft·lbf', () => {
    const us = screwFlagsInUnits(r, input, 'us');
    expect(us.map(f => [f.code, f.level])).toEqual(r.flags.map(f => [f.code, f.level]));
    expect(us.length).toBeGreaterThan(0);
    for (const f of us) {
      expect(f.message).not.toMatch(/\d MPa|\d kN|N·m/);
      expect(f.summary ?? '').not.toMatch(/\d MPa|\d kN|N·m/);
    }
    const p = us.find(f => f.code === 'bearing-pressure-high');
    expect(p?.message).toMatch(/[\d.]+ ksi/);
  });

  it('US with a duty: the raised levels and the sign-off flag as in the SI result', () => {
    const lifting = ScrewInputSchema.parse({...input, duty: 'lifting'});
    const rl = checkScrew(lifting);
    expect(screwFlagsInUnits(rl, lifting, 'us').map(f => [f.code, f.level])).toEqual(rl.flags.map(f => [f.code, f.level]));
  });

  it('the formatter converts exactly: 1 ksi = 6.894757 MPa, 1 lbf = 4.4482216 N (exact by the definitions of the inch and the pound-force; NIST SP 811 Appendix B, from memory)', () => {
    const us = flagNumbers('us');
    expect(us.stress(6.894757293168361)).toBe('1.00 ksi');
    expect(us.force(4448.2216152605)).toBe('1000 lbf');
    const si = flagNumbers('si');
    expect(si.stress(12.34)).toBe('12.3 MPa');
    expect(si.force(6400)).toBe('6.4 kN');
    expect(si.torque(9.774)).toBe('9.77 N·m');
  });
});
