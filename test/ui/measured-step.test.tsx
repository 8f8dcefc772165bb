/**
 * The workbench's Measured step (issue 17): the measurements of the bolt and the hole as
 * fields, the readout saying how the stripping areas were taken, an impossible value named
 * on its field, and the gauge outcomes cycling. Real core through the real services.
 */
import {mkdtempSync, rmSync} from 'node:fs';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {afterEach, describe, expect, it, onTestFinished} from 'vitest';
import {cleanup} from 'ink-testing-library';
import {realServices} from '../../src/ui/real-services.js';
import {startApp} from '../support/start-app.js';
import {KEY} from '../support/keys.js';

afterEach(() => cleanup());

function services() {
  const dir = mkdtempSync(path.join(tmpdir(), 'tw-measured-step-'));
  onTestFinished(() => rmSync(dir, {recursive: true, force: true}));
  return realServices({configDir: dir, cwd: dir, now: () => new Date('2026-05-06T07:08:09Z')});
}

// Demo scenario (invented): a worn M10 tapped hole in a 6082-T6 gearbox cover.
const COVER = {
  joint: {thread: 'M10x1.5-6H/6g', boltGrade: '8.8', internal: 'tapped' as const, parent: '6082-T6', engagement: 15, tightening: 'utilisation' as const, utilisation: 0.9},
  hole: {holeState: 'intact' as const, through: false, boltLengthMayChange: true},
};

async function atMeasured() {
  const app = startApp({svc: services() as never, state: {values: structuredClone(COVER)}});
  await app.see('> Designation');
  await app.press([KEY.right, KEY.right, KEY.right, KEY.right, KEY.right], '> Bolt pitch dia');
  expect(app.frame()).toContain('least-material limits');
  return app;
}

const typeIn = async (app: Awaited<ReturnType<typeof atMeasured>>, text: string) => {
  for (const ch of text) await app.press(ch);
  await app.press(KEY.enter);
};

describe('workbench: the Measured step', () => {
  it('takes a hole minor diameter and a three-wire reading; the readout says how the stripping was taken', async () => {
    const app = await atMeasured();
    for (const label of ['Bolt over wires M', 'Wire diameter W', 'Bolt major dia', 'Hole minor dia', 'Hole pitch dia', 'Ring GO gauge', 'Ring NO-GO gauge', 'Plug GO gauge', 'Plug NO-GO gauge']) {
      expect(app.frame()).toContain(label);
    }
    await app.press([KEY.down, KEY.down, KEY.down, KEY.down], '> Hole minor dia');
    await typeIn(app, '8.82');
    await app.see(/Hole minor dia\s+8\.820 mm/);
    await app.see('partly measured');
    // The three-wire reading: M alone asks for the wire on its field.
    await app.press([KEY.up, KEY.up, KEY.up], '> Bolt over wires M');
    await typeIn(app, '10.15');
    await app.see('! Wire diameter W');
    await app.press(KEY.down, /! Wire diameter W/);
    await app.see('Diameter of the wires');
    await typeIn(app, '0.866');
    await app.see(/Wire diameter W\s+0\.8660 mm/);
    await app.see(/Bolt over wires M 10\.15 mm/);
    expect(app.frame()).not.toContain('! ');
    // The bolt major and the hole pitch diameter too: both threads as measured.
    await app.press(KEY.down, '> Bolt major dia');
    await typeIn(app, '9.9');
    await app.press([KEY.down, KEY.down], '> Hole pitch dia');
    await typeIn(app, '9.1');
    await app.see(', as measured');
    app.unmount();
  });

  it('names an impossible measurement on its field, and the gauges cycle enters, stops, not gauged', async () => {
    const app = await atMeasured();
    await app.press([KEY.down, KEY.down, KEY.down, KEY.down], '> Hole minor dia');
    await typeIn(app, '10.5');
    await app.see('! Hole minor dia');
    await app.see(/not below the bolt major/);
    await app.press(KEY.down, '> Hole pitch dia');
    await app.press([KEY.down, KEY.down, KEY.down, KEY.down], '> Plug NO-GO gauge');
    await app.press(KEY.enter, /Plug NO-GO gauge\s+enters/);
    await app.press(KEY.enter, /Plug NO-GO gauge\s+stops/);
    await app.press(KEY.enter, /Plug NO-GO gauge\s+not gauged/);
    app.unmount();
  });

  it('power-screw mode: the backlash now and new give the wear and the replace-by value in the readout', async () => {
    const app = startApp({svc: services() as never, state: {values: structuredClone(COVER)}});
    await app.see('> Designation');
    await app.press('m', 'POWER SCREW');
    await app.press(KEY.right, '> Axial load');
    for (const label of ['Backlash now', 'Backlash new']) expect(app.frame()).toContain(label);
    await app.press([KEY.down, KEY.down, KEY.down, KEY.down, KEY.down], '> Backlash now');
    await typeIn(app, '0.6');
    await app.see('! Backlash new');
    await app.press(KEY.down, /! Backlash new/);
    await typeIn(app, '0.1');
    await app.see(/Backlash now\s+0\.6000 mm/);
    await app.see(/Backlash\s+nut wear 0\.500 mm; replace at \d/);
    app.unmount();
  });
});
