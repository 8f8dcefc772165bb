/**
 * The readout says what its numbers are (issue 13 items 3 and 5): the first-thread von Mises
 * is an elastic peak, and the bolt break force is the one bolt-breaks-first uses (Rm,max),
 * with the Rm,min force beside it. Demo joint on the real check (invented values).
 */
import {afterEach, describe, expect, it} from 'vitest';
import {cleanup} from 'ink-testing-library';
import {startApp} from '../support/start-app.js';
import {FIXTURE_VALUES, fixtureServices} from '../support/fixture-services.js';
import {checkJoint} from '../../src/core/joint/index.js';

afterEach(() => cleanup());

describe('readout wording', () => {
  it('names the elastic peak and the bolt strength behind the break force', async () => {
    const svc = fixtureServices({check: input => checkJoint({...input, parent: 'EN-GJL-250'})});
    const values = structuredClone(FIXTURE_VALUES);
    const app = startApp({svc, state: {values} as never});
    await app.see('Preload');
    const frame = app.frame();
    expect(frame).toMatch(/1st thread von Mises \d+ MPa \(elastic peak\)/);
    const r = checkJoint({...(await import('../../src/core/joint/input.js')).JointInputSchema.parse(values.joint), parent: 'EN-GJL-250'});
    const upper = ((r.stripping.boltBreakForceUpper ?? 0) / 1000).toFixed(1);
    expect(frame).toMatch(new RegExp(`Bolt break ${upper.replace('.', '\\.')} kN at Rm,max \\([\\d.]+ at Rm,min\\)`));
    app.unmount();
  });
});
