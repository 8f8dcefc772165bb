import {describe, expect, it} from 'vitest';
import {parseQuantity} from '../../src/core/units.js';

// 1 ft·lbf = 1.3558179483314004 N·m and 1 in = 25.4 mm exactly (NIST SP 811 Appendix B).
const FT_LBF_NM = 1.3558179483314004;

describe('torque spellings a shop writes (issue 14 item 15)', () => {
  it('"ft lbs", "ft-lbs", "ft lb", "lbs-ft" and "in lbs" are read as foot- and inch-pounds', () => {
    for (const t of ['30 ft lbs', '30ft-lbs', '30 ft lb', '30 lbs-ft', '30 ftlbs']) {
      const p = parseQuantity(t, 'torque');
      expect(p.ok, t).toBe(true);
      if (p.ok) expect(p.value).toBeCloseTo(30 * FT_LBF_NM, 9);
    }
    const p = parseQuantity('120 in lbs', 'torque');
    expect(p.ok && p.value).toBeCloseTo(120 * FT_LBF_NM / 12, 9);
  });

  it('a fraction is inches where a length is typed: "1/2in", "1/2", "1 1/4"', () => {
    for (const [t, inch] of [['1/2in', 0.5], ['1/2', 0.5], ['1 1/4', 1.25], ['5/16 in', 0.3125]] as const) {
      const p = parseQuantity(t, 'length', 'in');
      expect(p.ok && p.value, t).toBeCloseTo(inch * 25.4, 9);
    }
  });
});
