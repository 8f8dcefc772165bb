/**
 * DEMO DATA for the report tests: a hand-built CheckResult whose numbers are
 * invented to exercise the layout. It is not a computed result and none of its
 * numbers is a check value of any method.
 */
import type {CheckResult} from '../../src/core/joint/result.js';
import {JointInputSchema, type JointInput} from '../../src/core/joint/input.js';

export const DEMO_INPUT: JointInput = JointInputSchema.parse({
  thread: 'M10x1.5-6H/6g',
  boltGrade: '8.8',
  internal: 'tapped',
  parent: 'EN-GJL-250',
  engagement: 12,
  chamfer: 1,
  holeDepth: 20,
  tightening: 'torque',
  torque: 40,
  muThread: {min: 0.1, max: 0.16},
  muHead: {min: 0.1, max: 0.16},
  serviceLoad: 2000,
});

export function demoResult(overrides: Partial<CheckResult> = {}): CheckResult {
  return {
    geometry: {
      spec: {
        family: 'metric',
        designation: 'M10x1.5-6H/6g',
        sizeLabel: 'M10',
        nominal: 10,
        pitch: 1.5,
        series: 'coarse',
        isStandardPitch: true,
        starts: 1,
        lead: 1.5,
        toleranceExternal: '6g',
        toleranceInternal: '6H',
        toleranceDefaulted: false,
      },
      nominal: 10,
      pitch: 1.5,
      fundamentalHeight: 1.3,
      pitchDiameter: 9.03,
      minorDiameterExternal: 8.16,
      minorDiameterInternal: 8.38,
      stressArea: 58,
      minorArea: 52.3,
      limits: {
        external: {majorMax: 9.97, majorMin: 9.73, pitchMax: 8.99, pitchMin: 8.86, method: 'table', kind: 'demo', source: 'demo limits table, class 6g'},
        internal: {minorMin: 8.38, minorMax: 8.68, pitchMin: 9.03, pitchMax: 9.21, majorMin: 10, method: 'table', kind: 'demo', source: 'demo limits table, class 6H'},
      },
      limitsProvenance: {source: 'demo limits table', kind: 'demo', method: 'table'},
      notes: [],
    },
    materials: {
      bolt: {id: '8.8', name: 'property class 8.8, d <= 16 mm', rm: 800, rp: 640, shear: 520, provenance: {source: 'demo bolt source', kind: 'demo'}},
      internal: {id: 'EN-GJL-250', name: 'grey cast iron EN-GJL-250', rm: 250, shear: 225, provenance: {source: 'demo parent source', kind: 'demo'}},
    },
    tightening: {
      preload: {min: 18_000, nominal: 21_000, max: 24_500},
      torque: 40,
      utilisation: 0.74,
      permissiblePreload: 29_000,
      permissibleTorque: 47,
      assemblyVonMises: 470,
      method: 'friction',
      bearingDiameter: 12.8,
      bearingSource: 'standard',
      threadTorque: 17,
    },
    stress: {
      firstThread: {axial: 180, bending: 410, shear: 60, torsion: 95, bearing: -150, vonMises: 520},
      shank: {axial: 420, torsion: 150, vonMises: 495},
    },
    loadShare: [0.38, 0.25, 0.17, 0.11, 0.06, 0.03],
    firstThreadShare: 0.38,
    loadShareBeta: 0.4,
    boltLoad: 26_500,
    stripping: {
      external: {force: 60_000, shearArea: 115, shearStrength: 520},
      internal: {force: 33_000, shearArea: 147, shearStrength: 225},
      boltBreakForce: 46_400,
      weaker: 'internal',
      requiredEngagement: {fedStd: 14.2, alexander: 15.1},
      effectiveEngagement: 11,
      engagedThreads: 7.33,
      limitsUsed: {external: 'least-material', internal: 'least-material'},
      limits: {knMax: 8.676, esMin: 8.862, dsMin: 9.732, enMax: 9.206},
      fedStd: {le: 7.45, j: 1.9},
      alexander: {rs: 0.62, c1: 1, c2: 0.897, c3: 1.02, externalForce: 58_000, internalForce: 31_000},
    },
    margin: {stripping: 1.25, boltBreaksFirst: 0.71, firstThreadYieldBolt: 0.81, firstThreadYieldInternal: 1.1},
    flags: [
      {code: 'strips-before-break', level: 'fail', message: 'Demo message: the tapped thread strips at 33.0 kN, before the bolt breaks at 46.4 kN.'},
      {code: 'engagement-watch-demo', level: 'watch', message: 'Demo message at watch level | with a pipe character.'},
      {code: 'demo-info', level: 'info', message: 'Demo message at info level.'},
    ],
    notes: ['Demo note: bearing diameter from the standard head.'],
    sources: ['Demo method source A', 'Demo method source B'],
    ...overrides,
  };
}
