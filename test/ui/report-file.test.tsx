/**
 * The report file prompt (issue 14 item 12): `~` expanded, a missing folder said
 * plainly (decided by the error's code, not its words), and a default folder.
 */
import {mkdtempSync, readFileSync} from 'node:fs';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {afterEach, describe, expect, it} from 'vitest';
import {cleanup} from 'ink-testing-library';
import {startApp} from '../support/start-app.js';
import {fixtureServices} from '../support/fixture-services.js';
import {KEY} from '../support/keys.js';
import {expandPath, realServices} from '../../src/ui/real-services.js';

afterEach(() => cleanup());

describe('report paths', () => {
  it('expands ~ and ~/ from the home folder; a relative path from the current folder', () => {
    expect(expandPath('~', '/work', '/home/tech')).toBe('/home/tech');
    expect(expandPath('~/reports/r.md', '/work', '/home/tech')).toBe('/home/tech/reports/r.md');
    expect(expandPath('r.md', '/work', '/home/tech')).toBe('/work/r.md');
    expect(expandPath('/abs/r.md', '/work', '/home/tech')).toBe('/abs/r.md');
  });

  it('the real writeFile gives a missing folder its own code and words', () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'tw-rep-'));
    const svc = realServices({configDir: dir, cwd: dir, now: () => new Date('2026-03-04T05:06:07Z')});
    let err: {code?: string; message?: string} = {};
    try {
      svc.writeFile('no-such-folder/r.md', 'x', false);
    } catch (e) {
      err = e as typeof err;
    }
    expect(err.code).toBe('ENOENT');
    expect(err.message).toBe(`folder ${path.join(dir, 'no-such-folder')} does not exist`);
    svc.writeFile('r.md', 'first', false);
    try {
      svc.writeFile('r.md', 'second', false);
    } catch (e) {
      err = e as typeof err;
    }
    expect(err.code).toBe('EEXIST');
    expect(readFileSync(path.join(dir, 'r.md'), 'utf8')).toBe('first');
  });
});

describe('the report file prompt', () => {
  it('says plainly that the folder is missing, never "exists. Replace it?", and keeps the path to correct', async () => {
    const svc = fixtureServices({
      writeFile: p => {
        throw Object.assign(new Error(`folder ${path.dirname(p)} does not exist`), {code: 'ENOENT'});
      },
    });
    const app = startApp({svc});
    await app.press('w', 'Report preview');
    await app.press(KEY.enter, 'Write the report to file:');
    await app.press([KEY.ctrlU, ...'/nope/r.md', KEY.enter], 'folder /nope does not exist');
    expect(app.frame()).not.toContain('Replace it?');
    expect(app.frame()).toContain('Write the report to file: /nope/r.md');
    app.unmount();
  });

  it('offers the folder of the last report written in full, else the current folder, and expands ~/', async () => {
    const svc = fixtureServices({cwd: '/shop/current', resolvePath: p => expandPath(p, '/shop/current', '/home/tech')});
    const app = startApp({svc});
    await app.press('w', 'Report preview');
    await app.press(KEY.enter, 'Write the report to file: /shop/current/tapwright-demo-fixture-2026-03-04.md');
    await app.press([KEY.ctrlU, ...'~/reports/pump.md', KEY.enter], 'Wrote the Markdown report to /home/tech/reports/pump.md');
    expect(svc.store.files.has('/home/tech/reports/pump.md')).toBe(true);
    await app.press(KEY.enter, 'Write the report to file: /home/tech/reports/');
    // The full path, wrapped over the lines it needs.
    expect(app.frame().replace(/\n/g, '')).toContain('Write the report to file: /home/tech/reports/tapwright-demo-fixture-2026-03-04.md');
    expect(app.states.at(-1)!.reportDir).toBe('/home/tech/reports');
    app.unmount();
  });

  it('a report folder kept from the last session is the one offered', async () => {
    const app = startApp({svc: fixtureServices({cwd: '/shop/current'}), state: {reportDir: '/srv/work-orders'}});
    await app.press('w', 'Report preview');
    await app.press(KEY.enter, 'Write the report to file: /srv/work-orders/tapwright-demo-fixture-2026-03-04.md');
    app.unmount();
  });
});
