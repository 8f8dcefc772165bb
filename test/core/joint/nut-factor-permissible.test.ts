import {describe, expect, it} from 'vitest';
import {permissiblePreload, tighten} from '../../../src/core/joint/tightening.js';
import {isoSection} from './helpers.js';

// M12 8.8 (Rp0.2 640 MPa, ISO 898-1:2013 Table 3), nut factor K = 0.2, thread friction 0.10..0.16.
const s = isoSection(12, 1.75);
const common = {
  section: s,
  rp: 640,
  utilisation: 0.9,
  muThread: {min: 0.1, max: 0.16},
  muHead: {min: 0.1, max: 0.16},
  nutFactor: 0.2,
  bearingDiameter: 15.07,
  scatter: 1,
} as const;

describe('nut-factor form: the permissible preload and torque agree with the utilisation shown', () => {
  it('90 % utilisation gives the permissible preload itself (was: permissible 44.2 kN / 106 N·m beside 40.8 kN / 98 N·m at 90 %)', () => {
    const t = tighten({...common, mode: 'utilisation'});
    // By hand, VDI 2230 Part 1 FM,zul = As nu Rp0.2 / sqrt(1 + 3[(3/2)(d2/d0)(P/(pi d2) + 1.155 muG)]^2)
    // at the highest thread friction 0.16 (the preload does not fall with friction under T = K F d):
    // As 84.27 mm², d2 10.863, d0 10.358 mm -> 48 540 N / 1.1890 = 40.8 kN.
    expect(t.preload.max / 1000).toBeCloseTo(40.8, 1);
    expect(t.permissiblePreload).toBeCloseTo(t.preload.max, 6);
    expect(t.permissiblePreload).toBeCloseTo(permissiblePreload(s, 640, 0.9, 0.16), 6);
    // T = K F d (Shigley 9th ed. Eq. 8-27): 0.2 x 40.8 kN x 12 mm = 98.0 N·m.
    expect(t.permissibleTorque).toBeCloseTo(t.torque, 6);
    expect(t.permissibleTorque).toBeCloseTo(98.0, 0);
    expect(t.utilisation).toBeCloseTo(0.9, 6);
  });

  it('the friction form keeps VDI FM,zul at the lowest thread friction', () => {
    const {nutFactor: _k, ...friction} = common;
    const t = tighten({...friction, mode: 'utilisation'});
    expect(t.permissiblePreload).toBeCloseTo(permissiblePreload(s, 640, 0.9, 0.1), 6);
    expect(t.method).toBe('friction');
  });
});
