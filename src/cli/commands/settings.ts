/**
 * `tapwright settings`: the small settings kept through conf in settings.json
 * of the config folder: display units, ASCII drawing, and the default
 * tightening-method scatter factor alphaA for joints that do not state one.
 */
import type {Command} from '../command.js';
import {EXIT, UsageError} from '../io.js';
import {parseOptions} from '../args.js';
import {configDir} from '../../store/paths.js';

const HELP = `tapwright settings - display units, ASCII drawing, default scatter factor

Usage:
  tapwright settings [--json]            show them and the file they live in
  tapwright settings set units si|us     units of the workbench at start
  tapwright settings set ascii on|off    ASCII borders and symbols
  tapwright settings set scatter A       default tightening-method scatter
                                         factor alphaA, 1 to 4 (1 = the
                                         friction range only)

The default scatter applies to check and repair when neither --scatter nor
--preset gives one (VDI 2230 Part 1 lists typical alphaA by tightening
method; torque wrench with estimated friction is about 1.6 to 2.0).
`;

const KEYS: Record<string, string> = {units: 'units', ascii: 'ascii', scatter: 'scatterDefault'};

export const command: Command = {
  name: 'settings',
  summary: 'display units, ASCII drawing, default scatter factor',
  help: HELP,
  async run(args, io) {
    const {values, positionals} = parseOptions(args, {json: {type: 'boolean'}});
    const {openSettings} = await import('../../store/settings.js');
    const settings = openSettings(configDir(io.env));
    for (const w of settings.warnings()) io.err(`tapwright: ${w}\n`);
    const [action, key, value, ...extra] = positionals;
    if (action === undefined || action === 'show') {
      const s = settings.get();
      if (values.json === true) io.out(`${JSON.stringify({...s, file: settings.file}, null, 2)}\n`);
      else {
        io.out(`units    ${s.units}\nascii    ${s.ascii ? 'on' : 'off'}\nscatter  ${s.scatterDefault}\n`);
        if (s.lastPreset) io.out(`last preset  ${s.lastPreset}\n`);
        io.out(`file: ${settings.file}\n`);
      }
      return EXIT.ok;
    }
    if (action !== 'set') throw new UsageError(`settings: unknown action "${action}" (accepted: show, set)`);
    if (key === undefined || value === undefined || extra.length > 0) throw new UsageError('settings set needs KEY VALUE (keys: units, ascii, scatter)');
    const field = KEYS[key];
    if (!field) throw new UsageError(`settings set: unknown key "${key}" (accepted: units, ascii, scatter)`, key);
    let patch: Record<string, unknown>;
    if (field === 'ascii') {
      if (!/^(on|off|true|false|yes|no)$/i.test(value)) throw new UsageError(`settings set ascii: "${value}"; accepted: on or off`, 'ascii');
      patch = {ascii: /^(on|true|yes)$/i.test(value)};
    } else if (field === 'scatterDefault') {
      const n = Number(value);
      if (!Number.isFinite(n) || n < 1 || n > 4) throw new UsageError(`settings set scatter: "${value}"; accepted: a number from 1 to 4`, 'scatter');
      patch = {scatterDefault: n};
    } else patch = {units: value.toLowerCase()};
    if (!settings.set(patch)) {
      const why = settings.warnings().filter(w => w.startsWith('cannot save settings')).pop() ?? `cannot save settings to ${settings.file}`;
      io.err(`tapwright: ${key} NOT set: ${why.replace(/; the change holds for this session only$/, '')}; nothing was saved\n`);
      return EXIT.usage;
    }
    io.err(`tapwright: ${key} set to ${value} in ${settings.file}\n`);
    return EXIT.ok;
  },
};
