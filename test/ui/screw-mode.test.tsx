import {afterEach, describe, expect, it} from 'vitest';
import {cleanup} from 'ink-testing-library';
import {startApp} from '../support/start-app.js';
import {fixtureServices} from '../support/fixture-services.js';
import {KEY} from '../support/keys.js';

afterEach(() => cleanup());

describe('power-screw mode', () => {
  it('switches with m, shows its own steps and readout, and follows the load', async () => {
    const app = startApp();
    await app.press('m', 'Power-screw mode: lead screw and nut (m: back to the joint)');
    expect(app.frame()).toContain('1 Screw  2 Nut and load  3 Friction');
    expect(app.frame()).toContain('POWER SCREW (m: joint)');
    expect(app.frame()).toMatch(/Designation\s+Tr24x5/);
    expect(app.frame()).toContain('raise 20.0 N*m, lower 5.00 N*m');
    await app.press(KEY.right, '> Axial load');
    await app.press(['2', '0', 'k', 'N', KEY.enter], /Axial load\s+20\.0 kN/);
    expect(app.frame()).toContain('raise 40.0 N*m');
    expect(app.frame()).toContain('OK  no flags raised for this power screw');
    await app.press(['6', '0', KEY.enter], 'FAIL  fixture: the load can back-drive');
    expect(app.frame()).toContain('Self-lock  NO, back-drives (needs f > 0.0740)');
    await app.press('m', 'Joint mode');
    expect(app.frame()).toMatch(/1 Thread +2 Parts/);
    app.unmount();
  });

  it('shows "t table" on the hint line only on a field that has a published table', async () => {
    const app = startApp();
    // the joint's designation field has no table to pick from
    expect(app.frame()).toContain('q quit');
    expect(app.frame()).not.toContain('t table');
    await app.press(['m', KEY.right, KEY.right], '> Thread friction');
    expect(app.frame()).toContain('t table');
    await app.press(KEY.down, '> Collar friction');
    expect(app.frame()).toContain('t table');
    await app.press(KEY.left, '> Axial load');
    expect(app.frame()).not.toContain('t table');
    app.unmount();
  });

  it('says what the buckling check and the allowable pressure need, each line whole at 80 columns', async () => {
    const app = startApp({rows: 30});
    await app.press('m', 'POWER SCREW');
    // no free length and no sliding speed given (the fixture's screw)
    expect(app.frame()).toMatch(/Buckling {3}not checked: give the free length$/m);
    expect(app.frame()).toMatch(/ {46}allowed: give a sliding speed$/m);
    app.unmount();
  });

  it('names the field and range on bad input', async () => {
    const app = startApp();
    await app.press(['m', KEY.right, KEY.down, KEY.down], '> Nut length');
    await app.press(['0', '.', '1'], '! Nut length: 0.1 is out of range; accepted 0.5 to 2000 mm');
    app.unmount();
  });

  it('loads a power-screw preset into power-screw mode and saves it as a screw preset', async () => {
    const app = startApp({svc: fixtureServices({}, true)});
    await app.press('p', 'demo-screw');
    await app.press([KEY.down, KEY.enter], 'Loaded preset "demo-screw"');
    expect(app.frame()).toContain('POWER SCREW (m: joint)');
    await app.press('s', 'save as');
    await app.press([KEY.ctrlU, 'j', 'a', 'c', 'k', KEY.enter], 'Saved preset "jack".');
    expect(app.svc.store.kinds.get('jack')).toBe('screw');
    // The fixture services have no power-screw report writer (the real one: test/ui/screw-report-screen.test.ts).
    await app.press('w', 'The power-screw report is not available in this workbench.');
    app.unmount();
  });
});
