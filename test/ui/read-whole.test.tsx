/**
 * Every list and message can be read whole (issue 14 item 10), one name per
 * thing (item 14) and US units on the Repairs screen (item 13). The flags,
 * notes and numbers here are invented for the tests, not engineering data.
 */
import {afterEach, describe, expect, it} from 'vitest';
import {cleanup} from 'ink-testing-library';
import {startApp} from '../support/start-app.js';
import {FIXTURE_PLAN, fixtureResult, fixtureServices} from '../support/fixture-services.js';
import {KEY} from '../support/keys.js';
import type {Flag} from '../../src/core/types.js';
import type {RepairPlan} from '../../src/core/repair/types.js';

afterEach(() => cleanup());

const words = 'the fixture flag text goes on long enough to need several lines of the panel at any width';
const FLAGS: Flag[] = [
  {code: 'fixture-a', level: 'fail', message: `first: ${words}`},
  {code: 'fixture-b', level: 'watch', message: `second: ${words}`},
  {code: 'fixture-c', level: 'watch', message: `third: ${words}`},
  {code: 'fixture-d', level: 'info', message: `fourth: ${words}`},
  {code: 'fixture-e', level: 'info', message: `fifth: ${words}`},
  {code: 'fixture-f', level: 'info', message: `sixth: ${words}; the end of the last flag is here`},
];
const manyFlags = () => fixtureServices({check: input => ({...fixtureResult(input), flags: FLAGS})});
const flat = (s: string) => s.replace(/\s+/g, ' ');

describe('the full flag view (f)', () => {
  for (const [columns, rows] of [[80, 24], [100, 30]] as const) {
    it(`at ${columns}x${rows} pages through every flag to the end of the last one`, async () => {
      const app = startApp({svc: manyFlags(), columns, rows});
      await app.see('Preload');
      await app.press('f', 'All flags (6)');
      expect(app.frame()).toContain('PgDn more');
      expect(app.frame()).not.toContain('the end of the last flag is here');
      let seen = flat(app.frame());
      for (let i = 0; i < 12 && !seen.includes('the end of the last flag is here'); i++) {
        await app.press(KEY.pageDown);
        seen += flat(app.frame());
      }
      expect(seen).toContain('the end of the last flag is here');
      for (const f of FLAGS) expect(seen).toContain(f.code);
      expect(app.frame().split('\n').length).toBeLessThanOrEqual(rows - 1);
      await app.press(KEY.pageUp);
      await app.press(['f', 'f'], 'All flags (6)');
      expect(app.frame()).toContain('fixture-a');
      app.unmount();
    });
  }

  it('names the info level INFO on the joint screen, as on Repairs and in JSON', async () => {
    const app = startApp({svc: manyFlags(), rows: 40});
    await app.see('Preload');
    expect(app.frame()).toMatch(/INFO\s+fourth/);
    expect(app.frame()).not.toMatch(/NOTE\s/);
    await app.press('f', 'All flags (6)');
    expect(app.frame()).toContain('INFO fixture-d');
    app.unmount();
  });
});

const longNotes = Array.from({length: 8}, (_, i) => `fixture note ${i + 1}: ${words}`);
const PLAN: RepairPlan = {
  ...FIXTURE_PLAN,
  options: [{...FIXTURE_PLAN.options[0]!, drill: 27 / 64 * 25.4, notes: [...longNotes, 'finish with a bottoming tap']}, ...FIXTURE_PLAN.options.slice(1)],
};

describe('the Repairs detail', () => {
  it('shows every line of the marked repair, paged with PgDn: "finish with a bottoming tap" is reachable', async () => {
    const app = startApp({svc: fixtureServices({repairs: () => PLAN})});
    await app.press('r', 'Repairs for:');
    expect(app.frame()).toContain('PgDn more');
    let seen = flat(app.frame());
    for (let i = 0; i < 15 && !seen.includes('finish with a bottoming tap'); i++) {
      await app.press(KEY.pageDown);
      seen += flat(app.frame());
    }
    expect(seen).toContain('finish with a bottoming tap');
    for (let i = 1; i <= longNotes.length; i++) expect(seen).toContain(`fixture note ${i}:`);
    expect(seen.match(/.{0,60}(\.\.\.|…).{0,20}/g)).toBeNull();
    expect(app.frame().split('\n').length).toBeLessThanOrEqual(23);
    app.unmount();
  });

  it('calls the column Effort and gives the effort codes their words', async () => {
    const app = startApp({svc: fixtureServices({repairs: () => PLAN})});
    await app.press('r', 'Repairs for:');
    expect(app.frame()).toMatch(/Bolt-1st +Effort +Drill/);
    expect(app.frame()).not.toMatch(/ Work /);
    expect(app.frame()).toContain('Effort: E1 chase, E2 deepen, E3 coil, E4 bush, E5 through, E6 resize');
    expect(app.frame()).toContain('Effort E2 deepen: drill and tap deeper');
    app.unmount();
  });

  it('in US units gives the drill a US shop has, with the decimal beside', async () => {
    const app = startApp({svc: fixtureServices({repairs: () => PLAN}), state: {units: 'us'}});
    await app.press('r', 'Repairs for:');
    expect(app.frame()).toMatch(/E2 +27\/64 /);
    expect(app.frame()).toContain('drill 27/64 (0.4219 in)');
    expect(app.frame()).not.toMatch(/\d mm\b/);
    app.unmount();
  });
});

describe('a long message', () => {
  it('an import error wraps over lines instead of ending in "..."', async () => {
    const svc = fixtureServices();
    const long = 'cannot import /some/long/folder/name/presets-export.json: the file is a preset export of a later version of tapwright with keys this version does not know, so nothing was imported; the end of the message';
    svc.presets.importFile = () => {
      throw new Error(long);
    };
    const app = startApp({svc});
    await app.press(['p', 'i'], 'Import');
    await app.press(['x', KEY.enter], 'the end of the message');
    expect(flat(app.frame())).toContain(flat(long));
    expect(app.frame().split('\n').length).toBeLessThanOrEqual(23);
    app.unmount();
  });
});
