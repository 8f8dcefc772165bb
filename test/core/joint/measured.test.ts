import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {checkJoint, JointInputError, JointInputSchema, type JointInputDraft} from '../../../src/core/joint/index.js';
import {externalShearAreaPerMm, internalShearAreaPerMm} from '../../../src/core/joint/stripping.js';
import {limitPosition} from '../../../src/core/joint/measured-items.js';
import {limitsUsedText} from '../../../src/core/joint/measured.js';

const run = (d: JointInputDraft) => checkJoint(JointInputSchema.parse(d));
// M10x1.5-6H/6g limits (ISO 965-2:1998): 6g d 9.968/9.732, d2 8.994/8.862; 6H D1 8.376/8.676, D2 9.026/9.206.
const HOLE: JointInputDraft = {thread: 'M10x1.5-6H/6g', parent: 'S355', engagement: 12};

function fieldOf(f: () => unknown): string | undefined {
  try {
    f();
  } catch (e) {
    if (e instanceof JointInputError) return e.field;
    throw e;
  }
  return undefined;
}

describe('stripping with measured diameters (FED-STD-H28/2B areas at the measured diameters)', () => {
  it('no measurements: least-material limits for both threads, as before', () => {
    const r = run(HOLE);
    expect(r.stripping.limitsUsed).toEqual({external: 'least-material', internal: 'least-material'});
    expect(r.stripping.asMeasured).toBeUndefined();
    expect(limitsUsedText(r.stripping.limitsUsed)).toBe('least-material limits');
  });

  it('measurements equal to the least-material limits give the same forces', () => {
    const a = run(HOLE);
    const b = run({...HOLE, measured: {holeMinorDiameter: 8.676, boltPitchDiameter: 8.862, boltMajorDiameter: 9.732, holePitchDiameter: 9.206}});
    expect(b.stripping.limitsUsed).toEqual({external: 'measured', internal: 'measured'});
    expect(b.stripping.external.force).toBeCloseTo(a.stripping.external.force, 6);
    expect(b.stripping.internal.force).toBeCloseTo(a.stripping.internal.force, 6);
    expect(limitsUsedText(b.stripping.limitsUsed)).toBe('as measured');
  });

  it('per thread: the hole minor alone makes the bolt thread mixed and leaves the internal thread at the limits', () => {
    const r = run({...HOLE, measured: {holeMinorDiameter: 8.8}});
    expect(r.stripping.limitsUsed).toEqual({external: 'mixed', internal: 'least-material'});
    expect(r.stripping.limits.knMax).toBe(8.8);
    expect(r.stripping.limits.esMin).toBe(8.862);
    // The bolt thread sheared on the larger worn minor cylinder: pi Kn [1/2 + 0.57735 (Es - Kn)/P] x Le (FED-STD-H28/2B).
    const perMm = externalShearAreaPerMm({knMax: 8.8, esMin: 8.862, dsMin: 9.732, enMax: 9.206, pitch: 1.5});
    expect(r.stripping.external.shearArea).toBeCloseTo(perMm * r.stripping.effectiveEngagement, 6);
    expect(r.stripping.external.force).toBeLessThan(run(HOLE).stripping.external.force);
  });

  it('a three-wire reading sets the bolt pitch diameter', () => {
    // Best wire 0.866 mm for P 1.5; at the 6g minimum pitch diameter 8.862 mm M = 8.862 + 3 x 0.866 - 1.299 (+ lead term).
    const r = run({...HOLE, measured: {overWires: {measurement: 9.9, wire: 0.866}}});
    const e = 9.9 - 3 * 0.866 + 0.866025 * 1.5;
    expect(Math.abs(r.stripping.limits.esMin - e)).toBeLessThan(0.003);
    expect(r.stripping.asMeasured?.items[0]).toMatchObject({key: 'overWires', instrument: 'three wires and micrometer', reading: {measurement: 9.9, wire: 0.866}});
    expect(r.stripping.asMeasured?.items[0]?.position?.within).toBe(false);
    expect(r.stripping.asMeasured?.items[0]?.position?.worn).toBe(true);
  });

  it('property: a larger measured hole minor diameter never raises the internal (nor the bolt-thread) stripping force (fast-check)', () => {
    fc.assert(
      fc.property(fc.double({min: 8.3, max: 9.5, noNaN: true}), fc.double({min: 0, max: 0.4, noNaN: true}), (kn, dk) => {
        const a = run({...HOLE, measured: {holeMinorDiameter: kn}});
        const b = run({...HOLE, measured: {holeMinorDiameter: Math.min(kn + dk, 9.7)}});
        return b.stripping.internal.force <= a.stripping.internal.force + 1e-9 && b.stripping.external.force <= a.stripping.external.force + 1e-9;
      }),
      {numRuns: 60},
    );
  });

  it('a larger measured hole pitch diameter never raises the internal stripping force (FED-STD-H28/2B internal area)', () => {
    const base = {knMax: 8.676, esMin: 8.862, dsMin: 9.732, enMax: 9.206, pitch: 1.5};
    expect(internalShearAreaPerMm({...base, enMax: 9.4})).toBeLessThan(internalShearAreaPerMm(base));
  });
});

describe('physically impossible measurements are refused, naming the field', () => {
  it('a hole minor diameter at or above the bolt major', () => {
    expect(fieldOf(() => run({...HOLE, measured: {holeMinorDiameter: 9.8, boltMajorDiameter: 9.7}}))).toBe('measured.holeMinorDiameter');
    expect(fieldOf(() => run({...HOLE, measured: {holeMinorDiameter: 10.1}}))).toBe('measured.holeMinorDiameter');
  });
  it('a bolt major not above its pitch diameter, or above the sharp-V crest', () => {
    expect(fieldOf(() => run({...HOLE, measured: {boltPitchDiameter: 8.9, boltMajorDiameter: 8.8}}))).toBe('measured.boltMajorDiameter');
    // sharp-V crest: pitch diameter + H = 8.9 + 1.299 = 10.199 mm (ISO 68-1, H = 0.866025P)
    expect(fieldOf(() => run({...HOLE, measured: {boltPitchDiameter: 8.9, boltMajorDiameter: 10.25}}))).toBe('measured.boltMajorDiameter');
  });
  it('a hole pitch diameter not above the hole minor, or below the bolt pitch diameter', () => {
    expect(fieldOf(() => run({...HOLE, measured: {holeMinorDiameter: 8.7, holePitchDiameter: 8.6}}))).toBe('measured.holePitchDiameter');
    expect(fieldOf(() => run({...HOLE, measured: {boltPitchDiameter: 9.1, holePitchDiameter: 9.05}}))).toBe('measured.holePitchDiameter');
  });
  it('a bolt pitch diameter below the root or a wire that does not sit on the flanks', () => {
    expect(fieldOf(() => run({...HOLE, measured: {boltPitchDiameter: 8.0}}))).toBe('measured.boltPitchDiameter');
    expect(fieldOf(() => run({...HOLE, measured: {overWires: {measurement: 10, wire: 0.5}}}))).toBe('measured.overWires.wire');
  });
  it('the bolt pitch diameter and a three-wire reading together are refused by the schema', () => {
    const p = JointInputSchema.safeParse({...HOLE, measured: {boltPitchDiameter: 8.9, overWires: {measurement: 10.2, wire: 0.866}}});
    expect(p.success).toBe(false);
  });
});

describe('gauges', () => {
  it('a NO-GO plug that enters takes the limit as the bound, says so and asks for a measurement', () => {
    const r = run({...HOLE, measured: {gauges: {holeNoGo: 'enters', holeGo: 'enters'}}});
    expect(r.stripping.asMeasured?.upperBound).toEqual({external: false, internal: true});
    expect(r.stripping.limits.enMax).toBe(9.206);
    expect(r.stripping.asMeasured?.notes.join(' ')).toMatch(/at most the figure shown.*Measure the pitch diameter/);
    expect(r.stripping.asMeasured?.items.map(i => i.instrument)).toEqual(['GO thread plug gauge', 'NO-GO thread plug gauge']);
  });
  it('a NO-GO ring that enters on the bolt; a GO that stops asks for cleaning', () => {
    const r = run({...HOLE, measured: {gauges: {boltNoGo: 'enters', boltGo: 'stops'}}});
    expect(r.stripping.asMeasured?.upperBound.external).toBe(true);
    expect(r.stripping.asMeasured?.notes.join(' ')).toMatch(/GO ring gauge does not enter/);
  });
});

describe('limitPosition', () => {
  it('inside, worn past the limit, oversize', () => {
    expect(limitPosition(8.9, 8.862, 8.994, 'bolt')).toMatchObject({within: true, by: 0});
    const worn = limitPosition(8.8, 8.862, 8.994, 'bolt');
    expect(worn).toMatchObject({within: false, side: 'below-min', worn: true});
    expect(worn.by).toBeCloseTo(0.062, 9);
    expect(limitPosition(8.8, 8.376, 8.676, 'hole')).toMatchObject({side: 'above-max', worn: true});
    expect(limitPosition(9.0, 8.862, 8.994, 'bolt')).toMatchObject({side: 'above-max', worn: false});
  });
});

describe('the measured key of the joint schema: bad input names the path', () => {
  const bad: Array<[object, string]> = [
    [{holeMinorDiameter: -1}, 'measured.holeMinorDiameter'],
    [{boltMajorDiameter: 0}, 'measured.boltMajorDiameter'],
    [{boltPitchDiameter: 3000}, 'measured.boltPitchDiameter'],
    [{holePitchDiameter: Number.NaN}, 'measured.holePitchDiameter'],
    [{overWires: {measurement: 10, wire: 0}}, 'measured.overWires.wire'],
    [{overWires: {wire: 0.866}}, 'measured.overWires.measurement'],
    [{gauges: {holeNoGo: 'maybe'}}, 'measured.gauges.holeNoGo'],
  ];
  for (const [m, path] of bad) {
    it(`${JSON.stringify(m)} -> ${path}`, () => {
      const p = JointInputSchema.safeParse({...HOLE, measured: m});
      expect(p.success).toBe(false);
      if (!p.success) expect(p.error.issues.map(i => i.path.join('.'))).toContain(path);
    });
  }
});
