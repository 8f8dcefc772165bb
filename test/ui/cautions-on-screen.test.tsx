/**
 * The caution on screen (issue 14 item 9): one line that names lifting equipment,
 * pressure boundaries and the qualified person's sign-off when it fits; the full
 * caution lines on the Report screen; a caution on the too-small screen.
 */
import {afterEach, describe, expect, it} from 'vitest';
import {cleanup} from 'ink-testing-library';
import {startApp} from '../support/start-app.js';
import {CAUTION_LINES, cautionLine} from '../../src/core/cautions.js';

afterEach(() => cleanup());

const oneLine = (frame: string) => frame.split('\n').map(l => l.trimEnd());

describe('the caution line', () => {
  it('at 80x24 is one line naming lifting, pressure and the qualified sign-off', async () => {
    const app = startApp();
    await app.see('Preload');
    const line = cautionLine(80);
    expect(line).toMatch(/Lifting, pressure/);
    expect(line).toMatch(/qualified sign-off/);
    expect(oneLine(app.frame())).toContain(line);
    expect(app.frame()).not.toContain('Estimates only. Follow the equipment maker, local codes and licensed');
    app.unmount();
  });

  it('at 200 columns carries the whole sentence on one line', async () => {
    const app = startApp({columns: 200, rows: 30});
    await app.see('Preload');
    expect(oneLine(app.frame())).toContain(cautionLine(200));
    expect(cautionLine(200)).toContain("Lifting equipment, pressure boundaries and safety-critical joints need a qualified person's sign-off.");
    app.unmount();
  });

  it('on the Report screen shows the full caution lines, within rows-1', async () => {
    const app = startApp();
    await app.press('w', 'Report preview');
    const frame = app.frame();
    const flat = frame.replace(/\s+/g, ' ');
    for (const c of CAUTION_LINES) expect(flat).toContain(c);
    expect(frame.split('\n').length).toBeLessThanOrEqual(23);
    app.unmount();
  });

  it('the too-small screen shows a caution too', async () => {
    const app = startApp({columns: 60, rows: 15});
    await app.see('Terminal is 60x15');
    const flat = app.frame().replace(/\s+/g, ' ');
    expect(flat).toContain("Lifting equipment, pressure boundaries and safety-critical joints need a qualified person's sign-off.");
    app.unmount();
    const tiny = startApp({columns: 40, rows: 6});
    await tiny.see('Terminal is 40x6');
    expect(tiny.frame()).toContain('Estimates only');
    tiny.unmount();
  });
});
