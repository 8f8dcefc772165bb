/**
 * Fixture services for UI tests: an in-memory preset store and a stand-in check
 * whose numbers are invented for the tests (not engineering data). They scale
 * with the inputs so a test can see the readout follow a change.
 */
import type {CheckResult} from '../../src/core/joint/result.js';
import type {JointInput} from '../../src/core/joint/input.js';
import type {Draft, LoadedPreset, PresetEntry, WorkbenchServices} from '../../src/ui/services.js';
import type {RepairOption, RepairPlan} from '../../src/core/repair/types.js';
import type {ScrewInput} from '../../src/core/screw/input.js';
import type {ScrewResult} from '../../src/core/screw/result.js';
import type {FormValues} from '../../src/ui/state/fields.js';

export const FIXTURE_VALUES: FormValues = {
  joint: {thread: 'M10x1.5', boltGrade: '8.8', internal: 'tapped', parent: 'fixture-alloy', engagement: 12, tightening: 'utilisation', utilisation: 0.9},
  hole: {holeState: 'intact', through: false, boltLengthMayChange: true},
};

export function fixtureResult(input: JointInput): CheckResult {
  const e = input.engagement - input.chamfer;
  const threads = e / 1.5;
  const ext = 6000 * e;
  const int = 4000 * e;
  const brk = 46400;
  const share = Array.from({length: Math.max(1, Math.round(threads))}, (_, i) => Math.pow(0.7, i));
  const sum = share.reduce((a, b) => a + b, 0);
  return {
    geometry: {
      spec: {family: 'metric', designation: `${input.thread}-6H/6g`, sizeLabel: 'M10', nominal: 10, pitch: 1.5, isStandardPitch: true, starts: 1, lead: 1.5, toleranceExternal: '6g', toleranceInternal: '6H', toleranceDefaulted: true, series: 'coarse'},
      nominal: 10, pitch: 1.5, fundamentalHeight: 1.299, pitchDiameter: 9.026, minorDiameterExternal: 8.16, minorDiameterInternal: 8.376, stressArea: 58, minorArea: 52.3,
      limits: {external: {majorMax: 9.968, majorMin: 9.732, pitchMax: 8.994, pitchMin: 8.862, method: 'table', kind: 'demo', source: 'fixture table, class 6g'}, internal: {minorMin: 8.376, minorMax: 8.676, pitchMin: 9.026, pitchMax: 9.206, majorMin: 10, method: 'table', kind: 'demo', source: 'fixture table, class 6H'}},
      limitsProvenance: {source: 'fixture table', kind: 'demo', method: 'table'},
      notes: [],
    },
    materials: {
      bolt: {id: input.boltGrade, name: 'fixture bolt', rm: 800, rp: 640, shear: 480, provenance: {source: 'fixture', kind: 'demo'}},
      internal: {id: 'fixture-alloy', name: 'fixture alloy', rm: 300, shear: 180, provenance: {source: 'fixture', kind: 'demo'}},
    },
    tightening: {preload: {min: 21100, nominal: 24200, max: 27400}, torque: 48.5, utilisation: input.utilisation, permissiblePreload: 27400, permissibleTorque: 48.5, assemblyVonMises: 576, method: 'friction', bearingDiameter: 15.5, bearingSource: 'standard', threadTorque: 20},
    stress: {firstThread: {axial: 210, bending: 380, shear: 120, torsion: 95, bearing: 300, vonMises: 612}, shank: {axial: 400, torsion: 150, vonMises: 540}},
    loadShare: share.map(s => s / sum),
    firstThreadShare: 0.38,
    loadShareBeta: 1,
    boltLoad: 27400,
    stripping: {
      external: {force: ext, shearArea: ext / 480, shearStrength: 480},
      internal: {force: int, shearArea: int / 180, shearStrength: 180},
      boltBreakForce: brk,
      weaker: 'internal',
      requiredEngagement: {fedStd: 11.6, alexander: 13.1},
      effectiveEngagement: e,
      engagedThreads: threads,
      limitsUsed: {external: 'least-material', internal: 'least-material'},
      limits: {knMax: 8.676, esMin: 9.732, dsMin: 9.732, enMax: 9.206},
      fedStd: {le: 11.6, j: 1.6},
      alexander: {rs: 1.6, c1: 1, c2: 1, c3: 1, externalForce: ext, internalForce: int},
    },
    margin: {stripping: int / 27400, boltBreaksFirst: int / brk, firstThreadYieldBolt: 0.96, firstThreadYieldInternal: 2.04},
    flags: int < brk ? [{code: 'strips-before-break', level: 'fail', message: `the hole thread strips at ${(int / 1000).toFixed(1)} kN, before the bolt breaks at 46.4 kN`}] : [],
    notes: [],
    sources: ['fixture source A (test only)', 'fixture source B (test only)'],
  };
}

/** A stand-in power-screw result (invented numbers for tests); torque follows the load. */
export function fixtureScrew(input: ScrewInput): ScrewResult {
  const raise = input.load * 0.002;
  return {
    lead: 5, leadAngle: 4.2,
    torque: {raise, lower: raise / 4, collar: 0, raiseThread: raise, lowerThread: raise / 4},
    efficiency: 0.37, threadEfficiency: 0.37, selfLocking: input.load < 50000, selfLockingFriction: 0.074,
    stress: {body: {axial: -22, torsion: 10, vonMises: 28}, firstThread: {bearing: -13, bending: 47, shear: 3.6, transverseShear: 20, axial: -22, torsion: 10, vonMises: 64, maxShear: 33, principal: [1, 2, 3], vonMisesTextbook: 60, maxShearTextbook: 30, principalTextbook: [1, 2, 3], share: 0.38}},
    nut: {material: 'bronze', materialName: 'fixture bronze', materialSource: 'fixture', engagedThreads: 7.2, bearingPressure: 4.9, allowablePressure: null,
      stripping: {nutForce: 268000, screwForce: 507000, nutArea: 1, screwArea: 1, weaker: 'nut', margin: 268000 / Math.max(1, input.load), wearToStrip: 1}},
    buckling: {checked: false, criticalLoad: null, method: null, slenderness: null, transitionSlenderness: null, ends: 'pinned-pinned', endConstant: 1, margin: null, source: 'fixture'},
    flags: input.load >= 50000 ? [{code: 'back-drives', level: 'fail', message: 'fixture: the load can back-drive'}] : [],
    input: {loadDirection: input.loadDirection, load: input.load, nutLength: input.nutLength},
    sources: ['fixture screw source (test only)'],
    notes: [],
  } as unknown as ScrewResult;
}

export interface FixtureStore {
  saved: Map<string, {values: FormValues; savedAt: string}>;
  kinds: Map<string, string>;
  files: Map<string, string>;
  draft?: Draft;
}

export function fixtureServices(overrides: Partial<WorkbenchServices> = {}, withScrewPreset = false): WorkbenchServices & {store: FixtureStore} {
  const store: FixtureStore = {saved: new Map(), files: new Map(), kinds: new Map()};
  const shipped: Record<string, FormValues> = {'demo-fixture': FIXTURE_VALUES};
  const entry = (name: string): PresetEntry =>
    shipped[name]
      ? {name, readOnly: true, thread: String(shipped[name]!.joint.thread)}
      : {name, readOnly: false, thread: String(store.saved.get(name)?.values.joint.thread ?? ''), savedAt: store.saved.get(name)?.savedAt};
  const svc: WorkbenchServices & {store: FixtureStore} = {
    store,
    check(input) {
      if (/^nope/i.test(input.thread)) throw Object.assign(new Error(`unknown thread "${input.thread}"; try M10 or 1/4-20 UNC`), {field: 'thread'});
      return fixtureResult(input);
    },
    checkScrew: fixtureScrew,
    designations: (q, limit) => ['M10', 'M10x1.25', 'M10x1', 'M12', 'M12x1.5', 'M8', '1/4-20 UNC', '3/8-16 UNC'].filter(d => d.toLowerCase().startsWith(q.toLowerCase())).slice(0, limit),
    picks: source =>
      source === 'boltGrade'
        ? [
            {id: '8.8', name: 'property class 8.8', detail: 'Rm 800 MPa, Rp0.2 640 MPa', provenance: {source: 'fixture grade table', kind: 'demo'}},
            {id: '10.9', name: 'property class 10.9', detail: 'Rm 1040 MPa, Rp0.2 940 MPa', provenance: {source: 'fixture grade table', kind: 'demo'}},
          ]
        : source === 'parent'
          ? [{id: 'fixture-alloy', name: 'fixture alloy', detail: 'Rm 300 MPa, shear 180 MPa', provenance: {source: 'typical value, from memory: fixture', kind: 'memory'}}]
          : [{id: '8', name: 'nut class 8', detail: 'Rm 800 MPa', provenance: {source: 'fixture nut table', kind: 'demo'}}],
    presets: {
      list: () => [...[...Object.keys(shipped), ...store.saved.keys()].sort().map(entry), ...(withScrewPreset ? [{name: 'demo-screw', readOnly: true, kind: 'screw' as const, thread: 'Tr24x5'}] : [])],
      load(name): LoadedPreset {
        if (name === 'demo-screw') return {name, readOnly: true, kind: 'screw', values: {...structuredClone(FIXTURE_VALUES), screw: {thread: 'Tr24x5', load: 6000, nutLength: 36}}};
        if (shipped[name]) return {name, readOnly: true, values: structuredClone(shipped[name]!)};
        const p = store.saved.get(name);
        if (!p) throw new Error(`no preset named "${name}"`);
        return {name, readOnly: false, values: structuredClone(p.values)};
      },
      save(name, values, {overwrite, kind}) {
        store.kinds.set(name, kind ?? 'joint');
        if (/\//.test(name)) throw new Error('preset name must be 1 to 64 characters: letters, digits, space and . _ - + ( ) #');
        if (shipped[name]) throw new Error(`"${name}" is a shipped demo preset (read-only)`);
        if (store.saved.has(name) && !overwrite) throw new Error(`preset "${name}" exists`);
        store.saved.set(name, {values: structuredClone(values), savedAt: '2026-01-01T10:00:00.000Z'});
      },
      rename(from, to) {
        const p = store.saved.get(from);
        if (!p) throw new Error(`no saved preset named "${from}"`);
        store.saved.delete(from);
        store.saved.set(to, p);
      },
      duplicate(from, to) {
        const values = shipped[from] ?? store.saved.get(from)?.values;
        if (!values) throw new Error(`no preset named "${from}"`);
        store.saved.set(to, {values: structuredClone(values), savedAt: '2026-01-01T10:00:00.000Z'});
      },
      remove(name) {
        if (!store.saved.delete(name)) throw new Error(`no saved preset named "${name}"`);
      },
      importFile(path) {
        if (!store.files.has(path)) throw new Error(`cannot read ${path}: no such file`);
        store.saved.set('imported-one', {values: structuredClone(FIXTURE_VALUES), savedAt: '2026-01-01T10:00:00.000Z'});
        return {imported: ['imported-one'], skipped: []};
      },
      exportFile(path, name, overwrite) {
        if (store.files.has(path) && !overwrite) throw new Error(`${path} exists; not overwritten`);
        store.files.set(path, JSON.stringify({name}));
      },
    },
    draft: {
      load: () => store.draft,
      save: d => {
        store.draft = d;
      },
      clear: () => {
        store.draft = undefined;
      },
    },
    report: (format, result, input, meta) =>
      [format === 'markdown' ? '# Joint check report' : 'JOINT CHECK REPORT', `Preset: ${meta.presetName}`, `Thread: ${input.thread}`, `Bolt break force: ${result.stripping.boltBreakForce} N`, '', ...Array.from({length: 40}, (_, i) => `line ${i + 1}`)].join('\n'),
    writeFile(path, text, overwrite) {
      if (store.files.has(path) && !overwrite) throw Object.assign(new Error(`${path} exists`), {code: 'EEXIST'});
      store.files.set(path, text);
    },
    defaultPreset: 'demo-fixture',
    now: () => new Date('2026-03-04T05:06:07Z'),
    ...overrides,
  };
  return svc;
}

function option(o: Partial<RepairOption> & Pick<RepairOption, 'kind' | 'label' | 'rank' | 'feasible' | 'meetsMargin'>): RepairOption {
  return {
    reason: null, margin: {stripping: null, boltBreaksFirst: null}, drill: null, tapThread: null, holeDepth: null, tappedDepth: null,
    drilledDepth: null, engagement: null, requiredEngagement: null, boltThread: 'M10x1.5', screwLengthChange: null, torque: null, preload: null,
    effort: {grade: 1, name: 'chase', text: 'fixture effort'}, strength: null, insert: null, changeSize: 0, flags: [], notes: [], ...o,
  };
}

export const FIXTURE_PLAN: RepairPlan = {
  thread: 'M10x1.5', requiredMargin: 1,
  hole: {state: 'intact', strippedDepth: null, through: false, depthAvailable: null, wall: null},
  asIs: null,
  rankingRule: 'fixture ranking rule',
  notes: [], sources: [], cautions: [],
  options: [
    option({kind: 'longer-engagement', label: 'Longer engagement', rank: 1, feasible: true, meetsMargin: true, margin: {stripping: 1.9, boltBreaksFirst: 1.2}, drill: 8.5, tapThread: 'M10x1.5-6H', holeDepth: 22, torque: 48.5, effort: {grade: 2, name: 'deepen', text: 'drill and tap deeper'}}),
    option({kind: 'reuse', label: 'Re-use as it is', rank: 2, feasible: true, meetsMargin: false, margin: {stripping: 1.1, boltBreaksFirst: 0.8}, reason: 'short of the margin'}),
    option({kind: 'through-bolt', label: 'Through-bolt with a nut', rank: 3, feasible: false, meetsMargin: false, reason: 'the hole is blind', effort: {grade: 5, name: 'through', text: 'fixture'}}),
  ],
};
