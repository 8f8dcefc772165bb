/** Settings through conf: defaults, validation, and broken files that never throw. */
import {describe, expect, it} from 'vitest';
import fs from 'node:fs';
import path from 'node:path';
import {openSettings, DEFAULT_SETTINGS} from '../../src/store/settings.js';
import {configDir} from '../../src/store/paths.js';
import {readSettingsFile} from '../../src/store/settings-schema.js';
import {tempDir} from './helpers.js';

const file = (dir: string) => path.join(dir, 'settings.json');

describe('settings', () => {
  it('starts from the defaults and keeps changes in <dir>/settings.json', () => {
    const dir = tempDir('settings');
    const s = openSettings(dir);
    expect(s.get()).toEqual({units: 'si', ascii: false, scatterDefault: 1});
    s.set({units: 'us', lastPreset: 'demo-gearbox-cover', scatterDefault: 1.6});
    expect(openSettings(dir).get()).toEqual({units: 'us', ascii: false, lastPreset: 'demo-gearbox-cover', scatterDefault: 1.6});
    expect(JSON.parse(fs.readFileSync(file(dir), 'utf8'))).toMatchObject({units: 'us'});
    expect(fs.readdirSync(dir)).toEqual(['settings.json']);
    s.set({lastPreset: undefined});
    expect(openSettings(dir).get().lastPreset).toBeUndefined();
    expect(s.warnings()).toEqual([]);
  });

  it('refuses a bad value with a message naming the field and the accepted range', () => {
    const s = openSettings(tempDir('settings'));
    expect(() => s.set({scatterDefault: 9})).toThrow(/setting not changed: scatterDefault: .*4.*\(accepted: a number from 1 to 4\)/);
    expect(() => s.set({units: 'metric' as 'si'})).toThrow(/units.*\(accepted: si or us\)/);
    expect(() => s.set({colour: 'red'} as never)).toThrow(/setting not changed/);
    expect(s.get()).toEqual(DEFAULT_SETTINGS);
  });

  for (const [label, content] of [
    ['truncated JSON', '{"units": "us", "asc'],
    ['an empty file', ''],
  ] as const) {
    it(`${label}: moved aside, defaults used, one warning, next change saved`, () => {
      const dir = tempDir('settings');
      fs.writeFileSync(file(dir), content);
      const s = openSettings(dir);
      expect(s.get()).toEqual(DEFAULT_SETTINGS);
      expect(s.warnings()).toHaveLength(1);
      expect(s.warnings()[0]).toMatch(/^settings file was not valid JSON; moved aside to .*settings\.json\.corrupt-.*; using default settings$/);
      const aside = fs.readdirSync(dir).find(n => n.startsWith('settings.json.corrupt-'))!;
      expect(fs.readFileSync(path.join(dir, aside), 'utf8')).toBe(content);
      s.set({ascii: true});
      expect(openSettings(dir).get().ascii).toBe(true);
    });
  }

  it('a broken file appearing after start-up still never throws', () => {
    const dir = tempDir('settings');
    const s = openSettings(dir);
    s.set({units: 'us'});
    fs.writeFileSync(file(dir), '{nope');
    expect(s.get()).toEqual(DEFAULT_SETTINGS);
    expect(s.warnings().join('\n')).toMatch(/moved aside/);
    s.set({units: 'us'});
    expect(openSettings(dir).get().units).toBe('us');
  });

  it('a wrong value in the file falls back for that field only, with a warning', () => {
    const dir = tempDir('settings');
    fs.writeFileSync(file(dir), JSON.stringify({units: 'metric', ascii: true, scatterDefault: 'lots', other: 1}));
    const s = openSettings(dir);
    expect(s.get()).toEqual({units: 'si', ascii: true, scatterDefault: 1});
    expect(s.warnings()).toEqual([
      expect.stringMatching(/units "metric" is not accepted \(si or us\); using "si"/),
      expect.stringMatching(/scatterDefault "lots" is not accepted \(a number from 1 to 4\); using 1/),
    ]);
  });

  it('an unusable folder gives defaults and a warning; changes hold for the session', () => {
    const base = tempDir('settings');
    fs.writeFileSync(path.join(base, 'file'), 'x');
    const s = openSettings(path.join(base, 'file', 'tapwright'));
    s.set({units: 'us'});
    expect(s.get().units).toBe('us');
    expect(s.warnings().length).toBeGreaterThanOrEqual(1);
    expect(s.warnings().join('\n')).toMatch(/E(NOTDIR|EXIST)/);
  });
});

describe('configDir', () => {
  it('uses TAPWRIGHT_CONFIG_DIR, then the platform config folder without a -nodejs suffix', () => {
    expect(configDir({TAPWRIGHT_CONFIG_DIR: '/srv/plant/tapwright', HOME: '/home/a'})).toBe('/srv/plant/tapwright');
    expect(configDir({XDG_CONFIG_HOME: '/x/cfg', HOME: '/home/a'}, 'linux')).toBe('/x/cfg/tapwright');
    expect(configDir({HOME: '/home/a'}, 'linux')).toBe('/home/a/.config/tapwright');
    expect(configDir({XDG_CONFIG_HOME: 'relative', HOME: '/home/a'}, 'linux')).toBe('/home/a/.config/tapwright');
    expect(configDir({HOME: '/Users/a'}, 'darwin')).toBe('/Users/a/Library/Preferences/tapwright');
    expect(configDir({APPDATA: 'C:\\Users\\a\\AppData\\Roaming', HOME: '/x'}, 'win32')).toMatch(/tapwright.Config$/);
    expect(configDir({TAPWRIGHT_CONFIG_DIR: '  '}, 'linux')).not.toMatch(/nodejs/);
  });

  it('the quick read (no conf) says when the file needs the repairing handle', () => {
    const dir = tempDir('settings-quick');
    expect(readSettingsFile(dir)).toEqual({settings: DEFAULT_SETTINGS, sound: true});
    openSettings(dir).set({units: 'us', scatterDefault: 1.4});
    expect(readSettingsFile(dir)).toEqual({settings: {...DEFAULT_SETTINGS, units: 'us', scatterDefault: 1.4}, sound: true});
    for (const broken of ['{', '[]', '{"units":"metric"}', '']) {
      fs.writeFileSync(file(dir), broken);
      expect(readSettingsFile(dir), broken).toEqual({settings: DEFAULT_SETTINGS, sound: false});
    }
    fs.writeFileSync(file(dir), '{"units":"us","later":1}');
    expect(readSettingsFile(dir).sound).toBe(true);
  });
});
