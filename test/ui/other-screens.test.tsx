import {afterEach, describe, expect, it} from 'vitest';
import {cleanup} from 'ink-testing-library';
import {startApp} from '../support/start-app.js';
import {FIXTURE_PLAN, FIXTURE_VALUES, fixtureServices} from '../support/fixture-services.js';
import {KEY} from '../support/keys.js';
import {checkJoint} from '../../src/core/joint/index.js';
import {planRepairs} from '../../src/core/repair/index.js';
import {KEYMAP} from '../../src/ui/keymap.js';
import {handlerFor} from '../../src/ui/state/handle-key.js';
import {helpLines} from '../../src/ui/screens/help/reducer.js';
import {CAUTION_LINES} from '../../src/core/cautions.js';
import {EFFORT_SCALE_TEXT} from '../../src/core/repair/rank.js';

afterEach(() => cleanup());

describe('report screen', () => {
  it('previews, switches format, writes a file and asks before replacing it', async () => {
    const app = startApp();
    await app.press('w', 'Report preview (Markdown); Enter writes it to a file');
    expect(app.frame()).toContain('# Joint check report');
    expect(app.frame()).toMatch(/line 1\nline 2/);
    expect(app.frame()).toContain('Preset: demo-fixture');
    await app.press(KEY.pageDown, /lines \d+-\d+ of 45/);
    await app.press('t', 'JOINT CHECK REPORT');
    await app.press(KEY.enter, 'Write the report to file: tapwright-demo-fixture-2026-03-04.txt_');
    await app.press(KEY.enter, 'Wrote the text report to tapwright-demo-fixture-2026-03-04.txt');
    expect(app.svc.store.files.get('tapwright-demo-fixture-2026-03-04.txt')).toContain('JOINT CHECK REPORT');
    await app.press(KEY.enter);
    await app.press(KEY.enter, 'tapwright-demo-fixture-2026-03-04.txt exists. Replace it? (y/n)');
    await app.press('y', 'Wrote the text report');
    app.unmount();
  });

  it('says why there is no report when the joint cannot be computed', async () => {
    const app = startApp({svc: fixtureServices({report: undefined})});
    await app.press('w', 'The report writer is not available in this workbench.');
    app.unmount();
  });
});

describe('repairs screen', () => {
  it('lists the ranked repairs with state words and the marked one in detail', async () => {
    const app = startApp({svc: fixtureServices({repairs: () => FIXTURE_PLAN})});
    await app.press('r', 'Repairs for: M10x1.5; hole intact');
    expect(app.frame()).toMatch(/>\s*1 Longer engagement\s+OK\s+1\.90\s+1\.20\s+E2/);
    expect(app.frame()).toMatch(/2 Re-use as it is\s+SHORT/);
    expect(app.frame()).toMatch(/3 Through-bolt with a nut\s+NO/);
    expect(app.frame()).toContain('Effort E2 deepen: drill and tap deeper');
    await app.press([KEY.down, KEY.down], 'Through-bolt with a nut: cannot be done here: the hole is blind');
    await app.press(KEY.enter, '> Hole');
    app.unmount();
  });

  it('at 80 columns the tap column is not cut: the insert tap of a 3/8-16 hole shows whole', async () => {
    // The real check and planner on a grey cast-iron part (a shipped material).
    const withIron = <T,>(joint: T) => ({...joint, parent: 'EN-GJL-250'});
    const svc = fixtureServices({check: input => checkJoint(withIron(input)), repairs: (joint, hole, units) => planRepairs(withIron(joint), hole, undefined, units ?? 'si')});
    const values = structuredClone(FIXTURE_VALUES);
    values.joint.thread = '3/8-16 UNC';
    const app = startApp({svc, state: {values} as never});
    await app.press('r', 'Repairs for: 3/8-16 UNC');
    const rows = app.frame().split('\n').filter(l => /^.\s*\d+ /.test(l));
    expect(rows.some(l => l.includes('helical insert'))).toBe(true);
    // The tap for a helical coil insert hole is marked "STI" (screw thread insert), as in
    // ASME B18.29.1 (from memory); the planner's own text, checked here only for not being cut.
    for (const l of rows.filter(r => r.includes('helical insert'))) expect(l.trimEnd()).toMatch(/3\/8-16 UNC STI$/);
    for (const l of rows) expect(l).not.toMatch(/[~]|\.\.\.$/);
    app.unmount();
  });

  it('says so when the planner is not in the build', async () => {
    const app = startApp({svc: fixtureServices({repairs: undefined})});
    await app.press('r', 'The repair planner is not available in this workbench.');
    app.unmount();
  });
});

describe('help screen', () => {
  it('is generated from the keymap, with every binding, the methods, the ranking rule and the full cautions', () => {
    const lines = helpLines({ascii: true, sources: ['source one'], rankingRule: 'rule text'}).join('\n');
    for (const b of KEYMAP) expect(lines).toContain(b.description);
    expect(lines).toContain('  - source one');
    expect(lines).toContain('rule text');
    for (const c of CAUTION_LINES) expect(lines).toContain(c);
    for (const l of EFFORT_SCALE_TEXT.split('\n')) expect(lines).toContain(l);
  });

  it('opens on ?, scrolls, and Esc returns to the screen before', async () => {
    const app = startApp({svc: fixtureServices({repairs: () => FIXTURE_PLAN})});
    await app.press(['p', '?'], 'Help: keys, methods, cautions (Esc back)');
    expect(app.frame()).toContain('Screens');
    await app.press(KEY.pageDown, /lines 1[0-9]-/);
    for (let i = 0; i < 12; i++) await app.press(KEY.pageDown);
    await app.see('Lifting equipment, pressure boundaries');
    expect(app.frame()).toContain('E6 resize:');
    await app.press(KEY.pageUp, 'fixture ranking rule');
    await app.press(KEY.escape, 'Presets: 1');
    app.unmount();
  });
});

describe('every keymap command is handled', () => {
  it('has a handler for each binding, in the key table of its context', () => {
    // (the key tables are also checked by the compiler: `satisfies Record<CommandsOf<C>, Handler>`)
    for (const b of KEYMAP) expect(typeof handlerFor(b.context, b.command), `${b.context} ${b.command}`).toBe('function');
  });
});
