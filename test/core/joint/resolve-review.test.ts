import {describe, expect, it} from 'vitest';
import {checkJoint, JointInputError, JointInputSchema, type JointInputDraft} from '../../../src/core/joint/index.js';

// Findings of a CLI review, checked in the core. Invented demo joint: M10 in S355, 15 mm engaged.
const BASE: JointInputDraft = {thread: 'M10', boltGrade: '8.8', internal: 'tapped', parent: 'S355', engagement: 15};
const run = (d: Partial<JointInputDraft>) => checkJoint(JointInputSchema.parse({...BASE, ...d}));

function inputError(f: () => unknown): JointInputError {
  try {
    f();
  } catch (e) {
    if (e instanceof JointInputError) return e;
    throw e;
  }
  throw new Error('no JointInputError');
}

describe('custom bolt strengths are not shown as the grade', () => {
  it('--bolt-rm/--bolt-rp: id "custom", the name says what was given (was "property class 8.8" with Rm 900)', () => {
    const r = run({boltRm: 900, boltRp: 700});
    expect(r.materials.bolt.id).toBe('custom');
    expect(r.materials.bolt.name).toBe('custom bolt (Rm and Rp0.2 given; otherwise as grade 8.8)');
    expect(r.materials.bolt.rm).toBe(900);
    // Bolt break force As x Rm = 58.0 mm² x 900 MPa (ISO 898-1 stress area of M10, 58.0 mm²).
    expect(Math.abs(r.stripping.boltBreakForce - 58.0 * 900)).toBeLessThan(60);
    expect(run({boltRm: 900}).materials.bolt.name).toBe('custom bolt (Rm given; otherwise as grade 8.8)');
    expect(run({}).materials.bolt.id).toBe('8.8');
  });

  it('Rp0.2 above Rm: the message rounds the converted numbers (was 896.3184481118869 MPa)', () => {
    const e = inputError(() => run({boltRm: 827.3708751802033, boltRp: 896.3184481118869}));
    expect(e.field).toBe('boltRp');
    expect(e.message).toMatch(/Rp0\.2 896\.3 MPa must be below the tensile strength Rm 827\.4 MPa/);
  });
});

describe('other input checks', () => {
  it('a bearing diameter at or below the thread diameter is rejected (DKm = mean of head face and clearance hole, VDI 2230 Part 1)', () => {
    const e = inputError(() => run({bearingDiameter: 5}));
    expect(e.field).toBe('bearingDiameter');
    expect(e.message).toMatch(/bearing diameter 5 mm must be larger than the thread diameter 10 mm/);
    expect(run({bearingDiameter: 15}).tightening.bearingSource).toBe('input');
  });

  it('the chamfer message has no float noise (was 15.239999999999998 mm)', () => {
    const e = inputError(() => run({engagement: 12.7, chamfer: 0.6 * 25.4}));
    expect(e.message).toBe('the chamfer (15.24 mm) must be shorter than the engaged length (12.7 mm)');
  });
});

describe('input errors in US units', () => {
  it('messageIn("us") gives in and ksi; the SI message is unchanged', () => {
    // 0.6 in = 15.24 mm, 0.5 in = 12.7 mm (1 in = 25.4 mm exactly, NIST SP 811).
    const c = inputError(() => run({engagement: 12.7, chamfer: 15.24}));
    expect(c.messageIn('si')).toBe('the chamfer (15.24 mm) must be shorter than the engaged length (12.7 mm)');
    expect(c.messageIn('us')).toBe('the chamfer (0.600 in) must be shorter than the engaged length (0.500 in)');
    // 120 ksi = 827.4 MPa, 130 ksi = 896.3 MPa (1 ksi = 6.894757 MPa).
    const r = inputError(() => run({boltRm: 827.3708751802033, boltRp: 896.3184481118869}));
    expect(r.messageIn('us')).toMatch(/Rp0\.2 130 ksi must be below the tensile strength Rm 120 ksi/);
    const b = inputError(() => run({bearingDiameter: 5}));
    expect(b.messageIn('us')).toMatch(/bearing diameter 0\.197 in must be larger than the thread diameter 0\.394 in/);
  });
});

describe('sizes in messages', () => {
  // The inch nut tables (ASME B18.2.2 hex and heavy hex) cover 1/4 to 1-1/2 in: 1/2 in now has its
  // hex nut; a #12 size still has none and the message says which tables there are.
  it('an inch size with no nut table says why (was "no tabulated width across flats for 1/2")', () => {
    const e = inputError(() => run({thread: '#12-24 UNC', internal: 'nut', nutClass: '8', parent: undefined, nutHeight: 4, engagement: 4}));
    expect(e.field).toBe('nutFlats');
    expect(e.message).toBe("no tabulated width across flats for #12 (the inch nut tables, ASME B18.2.2, cover 1/4 to 1-1/2 in); give the nut's width across flats");
    const half = run({thread: '1/2-13 UNC', internal: 'nut', nutClass: 'SAE-5', parent: undefined, nutHeight: 11.1, engagement: 11.1});
    expect(half.notes.join(' ')).toMatch(/ASME B18\.2\.2/);
  });
});

describe('engagement longer than the nut', () => {
  it('is cut to the nut height and says so (was silent); ISO 4032 M10 m min 8.04 mm', () => {
    const r = run({internal: 'nut', nutClass: '8', parent: undefined, engagement: 20});
    // less the two countersinks: ISO 4032 da max 10.8 mm, 120 deg: (10.8 - 10)/(2 tan 60) = 0.2309 mm per face
    expect(r.stripping.effectiveEngagement).toBeCloseTo(8.04 - 2 * 0.23094, 4);
    expect(r.notes).toContain('Engaged length 20 mm is longer than the nut (8.04 mm): only the nut height is counted.');
    expect(run({internal: 'nut', nutClass: '8', parent: undefined, engagement: 8.04}).notes.join(' ')).not.toMatch(/longer than the nut/);
  });
});
