import {describe, expect, it} from 'vitest';
import {parseQuantity, formatQuantity, toDisplay, CONVERSION} from '../../src/core/units.js';

// Conversion factors: NIST SP 811 (2008), Appendix B.8: 1 in = 25.4 mm exactly,
// 1 lbf = 4.448222 N, 1 ft·lbf = 1.355818 N·m, 1 psi = 6.894757 kPa.
describe('units', () => {
  it('parses lengths with and without units', () => {
    expect(parseQuantity('12', 'length', 'mm')).toEqual({ok: true, value: 12});
    expect(parseQuantity('12mm', 'length')).toEqual({ok: true, value: 12});
    expect(parseQuantity('0.5in', 'length')).toEqual({ok: true, value: 12.7});
    expect(parseQuantity('1/2', 'length')).toEqual({ok: true, value: 12.7});
    const mixed = parseQuantity('1-1/2 in', 'length');
    expect(mixed.ok && mixed.value).toBeCloseTo(38.1, 9);
  });
  // ISO 80000-1:2009 clause 7.3.2 and NIST SP 811 (2008) section 10.5.3 (from memory): digits are
  // grouped with a space, never a comma, and the decimal sign may be a point or a comma. So a comma
  // is ambiguous, and "5,000lbf" read either way is off a thousandfold: never read, always rejected.
  it('rejects a comma in a number, naming the field and both readings', () => {
    const r = parseQuantity('5,000lbf', 'force', undefined, 'service load');
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error).toMatch(/^service load: 5,000 /);
      expect(r.error).toContain('write 5000 or 5.0');
    }
    const p = parseQuantity('23,780lbf', 'force', undefined, '--preload');
    expect(!p.ok && p.error).toContain('--preload: 23,780');
    expect(!p.ok && p.error).toContain('write 23780 or 23.78');
    const d = parseQuantity('1,5', 'length', 'mm');
    expect(!d.ok && d.error).toContain('write 15 or 1.5');
    expect(parseQuantity('12,5 mm', 'length').ok).toBe(false);
    expect(parseQuantity('0,10', 'ratio').ok).toBe(false);
    const many = parseQuantity('1,234,567 N', 'force');
    expect(!many.ok && many.error).toContain('write 1234567');
  });
  it('parses torques in N·m and ft-lbf (NIST SP 811: 1 ft·lbf = 1.355818 N·m)', () => {
    expect(parseQuantity('40Nm', 'torque')).toEqual({ok: true, value: 40});
    const r = parseQuantity('30ft-lbf', 'torque');
    expect(r.ok && r.value).toBeCloseTo(30 * 1.355818, 4);
    const r2 = parseQuantity('100 in-lb', 'torque');
    expect(r2.ok && r2.value).toBeCloseTo(11.29848, 4);
  });
  it('parses forces and stresses (NIST SP 811: 1 lbf = 4.448222 N, 1 psi = 6.894757 kPa)', () => {
    const f = parseQuantity('1000lbf', 'force');
    expect(f.ok && f.value).toBeCloseTo(4448.222, 2);
    expect(parseQuantity('12kN', 'force')).toEqual({ok: true, value: 12000});
    const s = parseQuantity('120ksi', 'stress');
    expect(s.ok && s.value).toBeCloseTo(827.37, 1);
    expect(CONVERSION.PSI_MPA * 1000).toBeCloseTo(6.894757, 5);
  });
  it('rejects junk and wrong units with a message naming the accepted units', () => {
    const r = parseQuantity('12 parsecs', 'length');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error).toMatch(/accepted: mm/);
    expect(parseQuantity('', 'length').ok).toBe(false);
    expect(parseQuantity('abc', 'force').ok).toBe(false);
    expect(parseQuantity('12Nm', 'length').ok).toBe(false);
  });
  it('formats for SI and US display', () => {
    expect(formatQuantity(29600, 'force', 'si')).toBe('29.6 kN');
    expect(formatQuantity(25.4, 'length', 'us')).toBe('1.00 in');
    expect(toDisplay(1.3558179483314004, 'torque', 'us')).toBeCloseTo(1, 9);
  });
});

describe('unit names in messages', () => {
  it('writes force, torque and stress units as the trade writes them, not as lower-case look-alikes', async () => {
    const {acceptedUnits} = await import('../../src/core/units.js');
    expect(acceptedUnits('force')).toBe('N, kN, MN, lbf, kip');
    expect(acceptedUnits('torque')).toMatch(/^Nm, Nmm, kNm, ft-lbf, in-lbf$/);
    expect(acceptedUnits('stress')).toMatch(/^MPa, GPa, kPa, psi, ksi$/);
  });
});
