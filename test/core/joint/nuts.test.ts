import {describe, expect, it} from 'vitest';
import {checkJoint, JointInputSchema} from '../../../src/core/joint/index.js';
import {defaultNutClass, nutDimensions, nutMatchesBolt} from '../../../src/core/materials/index.js';
import {countersinkThreadLoss, isoNutCountersink} from '../../../src/core/materials/nut-countersink.js';
import {inchNutDimensions} from '../../../src/core/materials/inch-nuts.js';

const IN = 25.4;

describe('nut countersinks (ISO 4032:2001 Table 1 da max; 120 deg countersink from memory)', () => {
  it('ISO 4032 da max: M6 6.75, M10 10.8, M24 25.9 mm; non-preferred M14 takes 1.08 d', () => {
    expect(isoNutCountersink(6)).toBe(6.75);
    expect(isoNutCountersink(10)).toBe(10.8);
    expect(isoNutCountersink(24)).toBe(25.9);
    expect(isoNutCountersink(14)).toBeCloseTo(15.12, 9);
  });
  it('no thread at all over (da - d)/(2 tan 60) per face: M10 (10.8 - 10)/3.4641 = 0.2309 mm', () => {
    expect(countersinkThreadLoss(10.8, 10)).toBeCloseTo(0.23094, 5);
    // truncated (from D1 = 8.376 mm, ISO 68-1): (10.8 - 8.376)/3.4641 = 0.6997 mm
    expect(countersinkThreadLoss(10.8, 10 - 1.082532 * 1.5)).toBeCloseTo(0.6997, 3);
  });
  it('checkJoint M10 8.8 in an ISO 4032 class-8 nut: 8.04 - 2 x 0.2309 = 7.578 mm of full thread', () => {
    const r = checkJoint(JointInputSchema.parse({thread: 'M10x1.5-6H/6g', boltGrade: '8.8', internal: 'nut', nutClass: '8', engagement: 8.04}));
    expect(r.stripping.engagementLoss).toBeCloseTo(0.46188, 4);
    expect(r.stripping.effectiveEngagement).toBeCloseTo(8.04 - 0.46188, 4);
  });
  it('a chamfer given replaces the standard countersink; a tapped hole keeps its chamfer only', () => {
    const r = checkJoint(JointInputSchema.parse({thread: 'M10', boltGrade: '8.8', internal: 'nut', nutClass: '8', engagement: 8.04, chamfer: 1}));
    expect(r.stripping.effectiveEngagement).toBeCloseTo(7.04, 9);
    const t = checkJoint(JointInputSchema.parse({thread: 'M10', boltGrade: '8.8', parent: 'S355', engagement: 15}));
    expect(t.stripping.effectiveEngagement).toBeCloseTo(15, 9);
  });
});

describe('inch nuts (ASME B18.2.2 hex and heavy hex nut tables, values from a reproduction)', () => {
  it('1/2 in hex nut: F 3/4 in, H min 0.427 in; heavy hex F 7/8 in, H min 0.464 in', () => {
    const h = inchNutDimensions(0.5 * IN)!;
    expect(h.flats).toBeCloseTo(0.75 * IN, 9);
    expect(h.heightMin).toBeCloseTo(0.427 * IN, 9);
    const hh = inchNutDimensions(0.5 * IN, 'heavy-hex')!;
    expect(hh.flats).toBeCloseTo(0.875 * IN, 9);
    expect(hh.heightMin).toBeCloseTo(0.464 * IN, 9);
    // countersink max 1.08 d above 3/8 in, d + 0.030 in up to 3/8 in (ASME B18.2.2)
    expect(h.countersinkMax).toBeCloseTo(1.08 * 0.5 * IN, 9);
    expect(inchNutDimensions(0.25 * IN)!.countersinkMax).toBeCloseTo(0.28 * IN, 9);
    expect(nutDimensions(0.5 * IN)?.heightMin).toBeCloseTo(0.427 * IN, 9);
    expect(inchNutDimensions(2 * IN)).toBeUndefined();
  });
  it('default nut class: grade matching the bolt; an inch thread gets an inch nut (common practice, no source)', () => {
    expect(defaultNutClass('SAE-5', 12.7, true)).toBe('SAE-5');
    expect(defaultNutClass('SAE-8', 12.7, true)).toBe('SAE-8');
    expect(defaultNutClass('8.8', 12.7, true)).toBe('SAE-5');
    expect(defaultNutClass('10.9', 12.7, true)).toBe('SAE-8');
    expect(defaultNutClass('8.8', 10, false)).toBe('8');
    expect(defaultNutClass('10.9', 10, false)).toBe('10');
  });
  it('checkJoint 1/2-13 UNC, SAE-5 bolt, nut class from the bolt grade: the hex nut height and flats are used', () => {
    const r = checkJoint(JointInputSchema.parse({thread: '1/2-13 UNC', boltGrade: 'SAE-5', internal: 'nut', engagement: 0.427 * IN}));
    expect(r.materials.internal.id).toBe('SAE-5');
    expect(r.notes.join(' ')).toMatch(/ASME B18\.2\.2 hex nuts/);
    expect(r.notes.join(' ')).toMatch(/Nut class SAE-5 taken from the bolt grade/);
  });
});

// ISO 898-2 design basis (Alexander 1977, as used for the ISO nut heights; from memory): a nut of
// the matching class at standard height makes the bolt break first. The flags say so at info level.
describe('matching nuts: info, not a warning', () => {
  it('matching classes (ISO 898-2: class N for bolts up to N.8; SAE J995 for J429)', () => {
    expect(nutMatchesBolt('8', '8.8')).toBe(true);
    expect(nutMatchesBolt('8', '10.9')).toBe(false);
    expect(nutMatchesBolt('04', '4.6')).toBe(false);
    expect(nutMatchesBolt('SAE-5', 'SAE-5')).toBe(true);
    expect(nutMatchesBolt('SAE-5', 'SAE-8')).toBe(false);
    expect(nutMatchesBolt('SAE-5', '8.8')).toBe(true); // the inch default for an ISO 8.8 bolt
    expect(nutMatchesBolt('SAE-5', '10.9')).toBe(false);
  });
  it('M10 8.8 in an ISO 4032 class-8 nut: short-engagement at info, saying the bolt is designed to break first', () => {
    const r = checkJoint(JointInputSchema.parse({thread: 'M10', boltGrade: '8.8', internal: 'nut', nutClass: '8', engagement: 8.04}));
    expect(r.nutMatchesBolt).toBe(true);
    const f = r.flags.find(x => x.code === 'short-engagement');
    expect(f?.level).toBe('info');
    expect(f?.message).toMatch(/designed so the bolt breaks first/);
    expect(r.flags.some(x => x.level === 'fail')).toBe(false);
  });
  it('a thin nut (given height below m min) and a weaker class keep the warning', () => {
    const thin = checkJoint(JointInputSchema.parse({thread: 'M10', boltGrade: '8.8', internal: 'nut', nutClass: '8', nutHeight: 5, engagement: 5}));
    expect(thin.flags.find(x => x.code === 'short-engagement')?.level).toBe('watch');
    const weak = checkJoint(JointInputSchema.parse({thread: 'M10', boltGrade: '10.9', internal: 'nut', nutClass: '8', engagement: 8.04}));
    expect(weak.nutMatchesBolt).toBe(false);
    expect(weak.flags.find(x => x.code === 'short-engagement')?.level).toBe('watch');
  });
  it('a tapped hole with 5 threads keeps the watch flag', () => {
    const r = checkJoint(JointInputSchema.parse({thread: 'M10', boltGrade: '8.8', parent: 'S355', engagement: 7.5}));
    expect(r.flags.find(x => x.code === 'short-engagement')?.level).toBe('watch');
  });
});
