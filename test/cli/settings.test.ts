import {describe, expect, it} from 'vitest';
import {cliInTempStore} from '../support/cli-in-temp-store.js';
import {writeFileSync} from 'node:fs';
import path from 'node:path';

const setup = () => cliInTempStore('tw-settings');

const JOINT = ['check', '--thread', 'M10', '--parent', 'S355', '--engage', '15', '--torque', '40Nm', '--json'];
const preload = (out: string) => (JSON.parse(out) as {tightening: {preload: {min: number; max: number}}}).tightening.preload;

describe('tapwright settings', () => {
  it('shows the defaults and sets units, ascii and the default scatter', async () => {
    const {run} = setup();
    const shown = JSON.parse((await run('settings', '--json')).out) as {units: string; ascii: boolean; scatterDefault: number};
    expect(shown).toMatchObject({units: 'si', ascii: false, scatterDefault: 1});
    expect((await run('settings', 'set', 'units', 'us')).code).toBe(0);
    expect((await run('settings', 'set', 'ascii', 'on')).code).toBe(0);
    expect((await run('settings', 'set', 'scatter', '1.6')).code).toBe(0);
    expect(JSON.parse((await run('settings', '--json')).out)).toMatchObject({units: 'us', ascii: true, scatterDefault: 1.6});
  });

  it('refuses bad keys and values, naming the accepted ones', async () => {
    const {run} = setup();
    expect((await run('settings', 'set', 'scatter', '9')).err).toMatch(/accepted: a number from 1 to 4/);
    expect((await run('settings', 'set', 'units', 'imperial')).err).toMatch(/accepted: si or us/);
    expect((await run('settings', 'set', 'colour', 'red')).err).toMatch(/accepted: units, ascii, scatter/);
    expect((await run('settings', 'set', 'ascii', 'maybe')).err).toMatch(/on or off/);
  });

  it('the default scatter widens the preload range of check when --scatter is not given', async () => {
    const {run} = setup();
    const plain = preload((await run(...JOINT)).out);
    await run('settings', 'set', 'scatter', '1.6');
    const wide = preload((await run(...JOINT)).out);
    expect(wide.max / wide.min).toBeGreaterThan(plain.max / plain.min);
    // --scatter given on the command line wins over the setting.
    const given = preload((await run(...JOINT, '--scatter', '1')).out);
    expect(given.min).toBeCloseTo(plain.min, 6);
  });

  it('a damaged settings file does not stop check; it falls back to the defaults', async () => {
    const {dir, run} = setup();
    writeFileSync(path.join(dir, 'settings.json'), '{"scatterDefault": ');
    const r = await run(...JOINT);
    expect(r.code).not.toBe(2);
    expect(r.code).not.toBe(1);
  });
});
