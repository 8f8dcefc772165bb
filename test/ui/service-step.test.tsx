/**
 * The workbench's Service step (issue 16): its fields from the field table, the
 * clamped parts and a cycling load typed in, the joint diagram and the deciding
 * numbers beside them, whole at 80x24 in ASCII and Unicode, and bad input on its
 * field. The joint is the real check on an invented demo joint (M10 8.8 into a
 * 6082-T6 aluminium part).
 */
import {afterEach, describe, expect, it} from 'vitest';
import {cleanup} from 'ink-testing-library';
import {startApp} from '../support/start-app.js';
import {FIXTURE_VALUES, fixtureServices} from '../support/fixture-services.js';
import {KEY} from '../support/keys.js';
import {checkJoint} from '../../src/core/joint/index.js';

afterEach(() => cleanup());

/** The demo joint on the real check, at the Service step (fifth). */
async function atService(ascii: boolean) {
  const svc = fixtureServices({check: input => checkJoint({...input, parent: '6082-T6'})});
  const values = structuredClone(FIXTURE_VALUES);
  Object.assign(values.joint, {engagement: 20});
  const app = startApp({svc, ascii, state: {values} as never});
  await app.see('Designation');
  await app.press([KEY.right, KEY.right, KEY.right, KEY.right], /Service load/);
  return app;
}

function whole(frame: string, ascii: boolean): void {
  const lines = frame.split('\n');
  expect(lines.length).toBeLessThanOrEqual(23);
  for (const l of lines) expect(Array.from(l).length, l).toBeLessThanOrEqual(80);
  if (ascii) expect(frame).toMatch(/^[\x20-\x7e\n]*$/);
}

describe('workbench: Service step', () => {
  for (const ascii of [true, false]) {
    it(`clamped parts and a cycling load give the joint diagram and the deciding numbers, whole at 80x24 (${ascii ? 'ASCII' : 'Unicode'})`, async () => {
      const app = await atService(ascii);
      expect(app.frame()).toContain('No service load and no clamped parts yet');
      await app.press([KEY.enter, '6', KEY.enter], /Service load\s+6\.00 kN/);
      expect(app.frame()).toContain('taken in full by the');
      await app.press([KEY.down, KEY.enter, ...'1..6', KEY.enter], /Load cycles\s+1\.00\.\.6\.00 kN/);
      await app.press([KEY.down, KEY.enter, ...'12 6082-T6, 30 6082-T6', KEY.enter], /Clamped parts\s+12 6082-T6/);
      await app.see(/C 0\.\d\d: the bolt takes \d+ % of the load/);
      const f = app.frame();
      expect(f).toMatch(/Opens at \d+(\.\d+)? kN: separation factor \d/);
      expect(f).toMatch(/Fatigue \d/);
      expect(f).toContain('/ bolt  \\ parts  O preload  * load  X opens');
      expect(f).toContain('elongation');
      whole(f, ascii);
      app.unmount();
    });
  }

  it('a bad clamp list stays on its field with the entry named; the readout shows the service line on another step', async () => {
    const app = await atService(true);
    await app.press([KEY.down, KEY.down, KEY.enter, ...'12 stel', KEY.enter]);
    await app.see(/unknown material "stel"/);
    await app.press([KEY.ctrlU, ...'12 steel, 30 6082-T6', KEY.enter], /Clamped parts\s+12 steel/);
    await app.press([KEY.up, KEY.up, KEY.enter, '5', KEY.enter], /Service load\s+5\.00 kN/);
    await app.press([KEY.left, KEY.left], '> Engaged length'); // the Tightening step shows the window panel (issue 18) in place of the readout
    await app.see(/Service {4}C 0\.\d\d kept \d/);
    whole(app.frame(), true);
    app.unmount();
  });
});
