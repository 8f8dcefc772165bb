import {afterEach, describe, expect, it} from 'vitest';
import {cleanup} from 'ink-testing-library';
import {startApp} from '../support/start-app.js';
import {FIXTURE_VALUES, fixtureServices} from '../support/fixture-services.js';
import {KEY} from '../support/keys.js';

afterEach(() => cleanup());

/** Go to the Engagement step (third) on the fixture. */
async function atEngagement() {
  const app = startApp();
  await app.see('Designation');
  await app.press([KEY.right, KEY.right], '> Engaged length');
  return app;
}

describe('joint screen: steps and editing', () => {
  it('moves between steps with arrows and Tab, and between fields with up/down', async () => {
    const app = startApp();
    await app.see('> Designation');
    await app.press(KEY.tab, '> Bolt grade');
    await app.press(KEY.down, '> Bolt Rm');
    await app.press(KEY.up, '> Bolt grade');
    await app.press(KEY.shiftTab, '> Designation');
    await app.press(KEY.left, '> Hole');
    app.unmount();
  });

  it('recomputes on every digit typed and keeps the value on Enter', async () => {
    const app = await atEngagement();
    expect(app.frame()).toContain('hole 48.0 kN');
    await app.press('2', 'hole 8.00 kN');
    await app.press('0', 'hole 80.0 kN');
    expect(app.frame()).toContain('20_ mm');
    await app.press(KEY.enter, /Engaged length\s+20\.0 mm/);
    expect(app.frame()).toContain('* unsaved changes');
    app.unmount();
  });

  it('erases with Backspace (Ink 6 delete) and puts the old value back on Esc', async () => {
    const app = await atEngagement();
    await app.press(KEY.enter, '12_ mm');
    await app.press(KEY.backspace, '1_ mm');
    expect(app.frame()).toContain('hole 4.00 kN');
    await app.press(KEY.escape, 'Kept the old value');
    expect(app.frame()).toMatch(/Engaged length\s+12\.0 mm/);
    expect(app.frame()).toContain('  saved');
    app.unmount();
  });

  it('converts a typed unit and names the field and range on bad input', async () => {
    const app = await atEngagement();
    for (const ch of '0.5in') await app.press(ch);
    await app.see('hole 50.8 kN');
    await app.press(KEY.enter, /Engaged length\s+12\.7 mm/);
    for (const ch of '2000') await app.press(ch);
    await app.see('! Engaged length: 2000 is out of range; accepted 0.5 to 1000 mm');
    await app.press(KEY.enter, '! Engaged length: 2000 is out of range');
    expect(app.frame()).toContain('2000_ mm');
    await app.press(KEY.escape, /Engaged length\s+12\.7 mm/);
    for (const ch of '12kg') await app.press(ch);
    await app.see('! Engaged length unit "kg" is not a length unit');
    app.unmount();
  });

  it('takes a pasted value with its Enter as one event', async () => {
    const app = await atEngagement();
    await app.press('15\r', /Engaged length\s+15\.0 mm/);
    expect(app.frame()).toContain('hole 60.0 kN');
    app.unmount();
  });

  it('treats Esc followed quickly by a key (Alt+key) as Esc, then the key', async () => {
    const app = await atEngagement();
    await app.press(KEY.enter, '12_ mm');
    await app.press('9', '129_ mm');
    await app.press('\u001Bu', 'Units: US customary');
    expect(app.frame()).toMatch(/Engaged length\s+0\.472 in/);
    app.unmount();
  });

  it('switches a choice with Enter and shows the fields that belong to it', async () => {
    const app = startApp();
    await app.press([KEY.right, KEY.down, KEY.down, KEY.down], '> Internal thread');
    expect(app.frame()).toContain('Parent material');
    await app.press(KEY.enter, 'Internal thread: nut');
    expect(app.frame()).toContain('Nut class');
    expect(app.frame()).not.toContain('Parent material');
    app.unmount();
  });

  it('shows the schema default of an unset hole-state field and switches from it', async () => {
    const app = startApp({state: {values: {joint: structuredClone(FIXTURE_VALUES.joint), hole: {}}}});
    await app.press(KEY.left, /Hole\s+intact \(def\.\)/);
    expect(app.frame()).toMatch(/Longer bolt OK\s+yes \(default\)/);
    await app.press([KEY.down, KEY.down, KEY.down, KEY.down], '> Longer bolt OK');
    await app.press(KEY.enter, /Longer bolt OK\s+no/);
    await app.press([KEY.up, KEY.up, KEY.up, KEY.up, KEY.enter], /Hole\s+stripped/);
    expect(app.frame()).toContain('Stripped to depth');
    app.unmount();
  });

  it('switches SI and US with u; bare numbers are in the shown unit', async () => {
    const app = await atEngagement();
    await app.press('u', 'Units US');
    expect(app.frame()).toMatch(/Engaged length\s+0\.472 in/);
    expect(app.frame()).toContain('lbf');
    await app.press(['1', KEY.enter], /Engaged length\s+1\.00 in/);
    await app.press('u', /Engaged length\s+25\.4 mm/);
    app.unmount();
  });

  it('empties an optional field with Backspace and says what applies', async () => {
    const app = await atEngagement();
    await app.press([KEY.down, '2', KEY.enter], /Chamfer\s+2\.00 mm/);
    await app.press(KEY.backspace, /Chamfer\s+0 mm \(default\)/);
    await app.press(KEY.up);
    await app.press(KEY.backspace, 'Engaged length cannot be empty');
    app.unmount();
  });

  it('shows every flag in full on f and back', async () => {
    const app = await atEngagement();
    await app.press('10\r', 'FAIL  the hole thread strips at 40.0 kN');
    await app.press('f', 'All flags (1); f back to results');
    expect(app.frame()).toContain('FAIL strips-before-break: the hole thread');
    expect(app.frame()).toContain('  strips at 40.0 kN, before the bolt breaks');
    await app.press('f', 'Preload');
    app.unmount();
  });
});

describe('joint screen: pickers', () => {
  it('offers designations as you type and takes the marked one', async () => {
    const app = startApp();
    await app.press(KEY.enter, 'M10x1.5_');
    await app.press(KEY.ctrlU, 'Type a designation');
    await app.press('M', '  M10x1.25');
    await app.press('1', '  M12x1.5');
    await app.press(KEY.down, '> M10');
    await app.press(KEY.down, '> M10x1.25');
    await app.press(KEY.enter, /Designation\s+M10x1\.25/);
    app.unmount();
  });

  it('shows the check error on the thread field when the core rejects the thread', async () => {
    const app = startApp();
    await app.press(KEY.enter);
    for (let i = 0; i < 7; i++) await app.press(KEY.backspace);
    for (const ch of 'nope') await app.press(ch);
    await app.see('Designation: unknown thread "nope"; try M10 or 1/4-20 UNC');
    await app.press(KEY.enter, /! Designation\s+nope\s/);
    expect(app.frame()).toContain('The results come back as soon as the inputs');
    expect(app.frame()).toContain('* unsaved changes');
    app.unmount();
  });

  it('lists bolt grades with where their numbers come from; the readout follows the marked one', async () => {
    const app = startApp();
    await app.press([KEY.right, KEY.enter], 'Filter: (type to narrow)  2 found');
    expect(app.frame()).toContain('Rm 800 MPa, Rp0.2 640 MPa. Source:');
    expect(app.frame()).toContain('fixture grade table');
    await app.press(KEY.down, 'Rm 1040 MPa, Rp0.2 940 MPa');
    await app.press(KEY.enter, /Bolt grade\s+10\.9/);
    await app.press(KEY.enter, 'found');
    await app.press(['8'], '1 found');
    await app.press(KEY.escape, /Bolt grade\s+10\.9/);
    app.unmount();
  });

  it('does not crash when the check itself throws an unexpected error', async () => {
    const svc = fixtureServices({
      check: () => {
        throw new Error('something odd');
      },
    });
    const app = startApp({svc});
    await app.see('Cannot compute this joint: something odd');
    app.unmount();
  });
});
