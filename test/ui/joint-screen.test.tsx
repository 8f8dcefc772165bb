import {afterEach, describe, expect, it} from 'vitest';
import {cleanup} from 'ink-testing-library';
import {startApp} from '../support/start-app.js';
import {KEY} from '../support/keys.js';
import {FIXTURE_VALUES, fixtureServices} from '../support/fixture-services.js';
import {checkJoint} from '../../src/core/joint/index.js';
import {strippedHoleFlag} from '../../src/ui/screens/joint/reducer.js';
import {initialState} from '../../src/ui/state/workbench.js';
import {cautionLine} from '../../src/core/cautions.js';
import {makeTheme} from '../../src/ui/theme.js';

afterEach(() => cleanup());

describe('joint screen', () => {
  it('draws at most rows-1 lines at 80x24 with the caution and the hint line', async () => {
    const app = startApp();
    await app.see('Preload');
    const lines = app.frame().split('\n');
    expect(lines.length).toBeLessThanOrEqual(23);
    expect(lines.every(l => l.length <= 80)).toBe(true);
    expect(app.frame()).toContain(cautionLine(80));
    expect(app.frame()).toContain('q quit');
    expect(app.frame()).toContain('Preset: demo-fixture (shipped demo, read-only)  saved');
    app.unmount();
  });
});

/**
 * The workbench on the real check, with a grey cast-iron part (a shipped material) in
 * place of the fixture's; `joint` changes the fixture joint (invented demo values).
 */
function realCheckApp(joint: Partial<typeof FIXTURE_VALUES.joint> = {}, state: Record<string, unknown> = {}) {
  const svc = fixtureServices({check: input => checkJoint({...input, parent: 'EN-GJL-250'})});
  const values = structuredClone(FIXTURE_VALUES);
  Object.assign(values.joint, joint);
  return startApp({svc, state: {values, ...state} as never});
}

describe('flag lines at 80 columns', () => {
  it('a message too long for its line shows as its summary, numbers kept, with (f) for the whole', async () => {
    // A short engagement on the real check.
    const app = realCheckApp({engagement: 4});
    await app.see('Thread strips first:');
    const line = app.frame().split('\n').find(l => l.startsWith('FAIL  Thread strips first:'))!;
    expect(line).toMatch(/^FAIL {2}Thread strips first: hole \d+(\.\d+)? kN < bolt break \d+(\.\d+)? kN \((f|\+\d+, f: all)\)$/);
    // f shows the whole message
    await app.press('f', 'All flags');
    expect(app.frame()).toContain('FAIL strips-before-break: Thread strips');
    expect(app.frame()).toContain('strips at 19.3 kN, the bolt breaks at 59.4'); // As x Rm,max (bolt-breaks-first at the upper strength)
    app.unmount();
  });
});

describe('readout at 80 columns', () => {
  it('a very short engagement: the margins line shows both margins whole', async () => {
    const app = realCheckApp({engagement: 1, chamfer: 0.8});
    await app.see('Margins');
    const line = app.frame().split('\n').find(l => l.includes('Margins'))!;
    // margins far below 1 with two figures, e.g. "stripping 0.041, bolt-first 0.017"
    expect(line).toMatch(/Margins {4}stripping 0\.0\d\d, bolt-first 0\.0\d\d$/);
    app.unmount();
  });
});

describe('readout in US units at 80 columns', () => {
  it('the first-thread stress parts keep their unit on the line (two figures when three do not fit)', async () => {
    const app = realCheckApp({}, {units: 'us'});
    await app.see('ksi');
    const line = app.frame().split('\n').find(l => /\bax -?\d/.test(l))!;
    expect(line).toMatch(/ax -?[\d.]+ bnd -?[\d.]+ sh -?[\d.]+ tor -?[\d.]+ brg -?[\d.]+ ksi$/);
    app.unmount();
  });
});

describe('a hole recorded as stripped', () => {
  it('the joint screen says the results are for a sound thread and points to the repairs', async () => {
    const values = structuredClone(FIXTURE_VALUES);
    values.hole = {...values.hole, holeState: 'stripped', strippedDepth: 7};
    const app = startApp({state: {values} as never});
    await app.see('WATCH The hole is recorded as stripped to 7.00 mm: the results are for a sound');
    await app.press('f', 'All flags');
    expect(app.frame()).toContain('WATCH hole-stripped: The hole is recorded');
    app.unmount();
    // beside other flags it shows as its summary, which fits a flag line (68 characters, as the core's)
    for (const units of ['si', 'us'] as const)
      for (const strippedDepth of [undefined, 7, 123.4]) {
        const f = strippedHoleFlag({...initialState({name: 'x', readOnly: false, values: {...values, hole: {...values.hole, strippedDepth}}, units, ascii: false})}, makeTheme(false, false));
        expect(f?.summary).toMatch(/^Hole stripped( to [\d.]+ (mm|in))?: results assume a sound thread; r: repairs$/);
        expect(Array.from(f!.summary!).length).toBeLessThanOrEqual(68);
      }
    // an intact hole: no such line
    const intact = startApp();
    await intact.see('Preload');
    expect(intact.frame()).not.toContain('Hole stripped');
    intact.unmount();
  });
});
