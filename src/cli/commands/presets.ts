/**
 * `tapwright presets`: saved joints from the command line. The store itself
 * (locking, atomic writes, recovery) is src/store; this file maps options to it.
 */
import path from 'node:path';
import type {Command} from '../command.js';
import {EXIT, UsageError, type CliIo} from '../io.js';
import {parseOptions, str, type OptionSpec, type ParsedOptions} from '../args.js';
import {JOINT_OPTIONS, JOINT_OPTIONS_HELP, jointFromOptions, jointUsageError} from '../joint-options.js';
import {configDir} from '../../store/paths.js';
import {openPresetStore, type Preset, type PresetStore, type PresetSummary} from '../../store/presets.js';
import {MAX_IMPORT_TEXT} from '../../store/guard.js';
import {NAME_RULE} from '../../store/schema.js';
import {describePreset} from '../../store/describe.js';
import {resolveJoint} from '../../core/joint/resolve.js';
import {JointInputError} from '../../core/joint/errors.js';
import {jsonText, printable} from '../../core/text-safety.js';

const HELP = `tapwright presets - saved joints: list, show, save, rename, delete, import,
export

Usage:
  tapwright presets list [--search TEXT] [--json]
  tapwright presets show NAME [--json]
  tapwright presets save NAME [--from PRESET] [joint options] [notes]
                         [--overwrite]
  tapwright presets rename OLD NEW
  tapwright presets duplicate FROM NEW
  tapwright presets delete NAME --yes
  tapwright presets import FILE [--overwrite] [--json]
  tapwright presets export FILE|- [NAME ...] [--force]

Shipped presets (names starting "demo-") are invented demo scenarios and
read-only: copy one with duplicate, or save NEW --from demo-... with changes.
Names: ${NAME_RULE.replace(', starting', ',\n  starting')}.

save NAME takes the joint options of tapwright check. With --from PRESET it
starts from that preset and changes only the options given. --overwrite
replaces a saved preset of the same name (its revision goes up by one).
Joint options:
${JOINT_OPTIONS_HELP}
Notes:
  --asset TEXT           asset tag of the machine
  --location TEXT        where it is
  --work-order TEXT      work-order number
  --note TEXT            free text

delete never asks a question, in a terminal or in a script: it needs --yes,
so a preset is never removed by a mistyped command. The store as it was
before the last change is kept in presets.json.bak.

import FILE takes an export file, a whole presets.json (any earlier version
is migrated) or one preset object. The file is checked completely first: up
to ${MAX_IMPORT_TEXT}, nesting up to 32 levels, no __proto__, constructor or
prototype keys, every preset valid. On any problem nothing is imported. A
name that is already saved refuses the import unless --overwrite is given.
export FILE writes all saved presets, or the NAMEs given (shipped ones too);
an existing FILE is not replaced without --force. "-" writes to stdout.

Options:
  --json                 machine-readable output (SI units)
  --help, -h             this text

Files: presets.json, settings.json and the drafts in $TAPWRIGHT_CONFIG_DIR,
else $XDG_CONFIG_HOME/tapwright (~/.config/tapwright; macOS
~/Library/Preferences/tapwright; Windows %APPDATA%\\tapwright\\Config).
Exit codes: 0 ok; 2 bad input, unknown preset, or a store problem.
`;

const COMMON: OptionSpec = {json: {type: 'boolean'}};
const NOTES: OptionSpec = {asset: {type: 'string'}, location: {type: 'string'}, 'work-order': {type: 'string'}, note: {type: 'string'}};

function open(io: CliIo): PresetStore {
  const store = openPresetStore(configDir(io.env), {now: () => io.now()});
  for (const w of store.warnings()) io.err(`tapwright: warning: ${printable(w)}\n`);
  return store;
}

function positionals(p: ParsedOptions, count: number, usage: string): string[] {
  if (p.positionals.length < count) throw new UsageError(`missing argument; usage: tapwright presets ${usage}`);
  if (p.positionals.length > count) throw new UsageError(`unexpected argument "${p.positionals[count]}"; usage: tapwright presets ${usage}`);
  return p.positionals;
}

const json = (io: CliIo, v: unknown) => io.out(`${jsonText(v)}\n`);

function listText(rows: PresetSummary[], store: PresetStore, quarantined: number): string {
  const w = Math.min(34, Math.max(6, ...rows.map(r => r.name.length)));
  const lines = [`${'NAME'.padEnd(w)}  KIND   THREAD              SAVED`];
  for (const row of rows) {
    // Every text from the file is shown escaped: a name or note cannot steer the terminal.
    const r = {...row, name: printable(row.name), thread: printable(row.thread), asset: pr(row.asset), location: pr(row.location), workOrder: pr(row.workOrder)};
    const saved = r.readOnly ? 'shipped demo, read-only' : `${r.savedAt.slice(0, 16).replace('T', ' ')} r${r.revision}${r.demo ? ' demo' : ''}`;
    const name = r.name.length > w ? `${r.name.slice(0, w - 1)}~` : r.name;
    lines.push(`${name.padEnd(w)}  ${r.kind.padEnd(5)}  ${r.thread.slice(0, 18).padEnd(18)}  ${saved}`);
    const where = [r.asset, r.location, r.workOrder].filter(Boolean).join(' | ');
    const room = 78 - w;
    if (where) lines.push(`${''.padEnd(w)}  ${where.length > room ? `${where.slice(0, room - 3)}...` : where}`);
  }
  const saved = rows.filter(r => !r.readOnly).length;
  lines.push('', `${saved} saved, ${rows.length - saved} shipped. Store: ${store.file}`);
  if (quarantined) lines.push(`${quarantined} unreadable item${quarantined === 1 ? '' : 's'} kept in quarantine (see presets list --json); nothing was deleted.`);
  return `${lines.join('\n')}\n`;
}

const pr = (t: string | undefined) => (t === undefined ? undefined : printable(t));

function matches(r: PresetSummary, q: string): boolean {
  const k = q.toLowerCase();
  return [r.name, r.thread, r.asset, r.location, r.workOrder].some(v => v?.toLowerCase().includes(k));
}

function notesFrom(values: ParsedOptions['values'], base: Preset['notes'] = {}): Preset['notes'] {
  const n = {...base};
  const set = (key: keyof Preset['notes'], opt: string) => {
    const v = str(values, opt);
    if (v !== undefined) n[key] = v;
  };
  set('asset', 'asset');
  set('location', 'location');
  set('workOrder', 'work-order');
  set('text', 'note');
  return n;
}

async function save(args: string[], io: CliIo): Promise<number> {
  const p = parseOptions(args, {...COMMON, ...JOINT_OPTIONS, ...NOTES, from: {type: 'string'}, overwrite: {type: 'boolean'}});
  const name = positionals(p, 1, 'save NAME [--from PRESET] [joint options]')[0]!;
  const store = open(io);
  const fromName = str(p.values, 'from');
  const base = fromName !== undefined ? store.get(fromName) : undefined;
  if (fromName !== undefined && !base) throw new UsageError(`--from "${fromName}": no saved or shipped preset of that name; see tapwright presets list`, '--from');
  const jointGiven = Object.keys(JOINT_OPTIONS).some(k => p.values[k] !== undefined);
  let preset: Preset;
  if (base && base.kind === 'screw') {
    if (jointGiven) throw new UsageError(`--from "${base.name}" is a power-screw preset; joint options do not apply to it`, '--from');
    preset = {...base, name, notes: notesFrom(p.values, base.notes)};
  } else {
    // Saved as typed: the settings' scatter is not written into the preset (it applies when the preset is used).
    const {input, units} = await jointFromOptions(p.values, io, base?.joint, {settings: false});
    const {parentData, ...typed} = input;
    const joint = base?.joint?.parentData !== undefined && parentData !== undefined ? {...typed, parentData} : typed;
    try {
      // Unknown thread, grade or material: refused now, not when the preset is used (the user's own materials count).
      resolveJoint(input);
    } catch (e) {
      throw jointUsageError(e, units);
    }
    preset = {...(base ?? {kind: 'joint' as const, savedAt: '', revision: 1}), name, kind: 'joint', joint, notes: notesFrom(p.values, base?.notes)};
  }
  const out = store.save({...preset, savedAt: undefined, revision: undefined}, {overwrite: p.values.overwrite === true});
  if (p.values.json) json(io, out);
  else io.out(`saved "${out.name}" (revision ${out.revision}) in ${store.file}\n`);
  return EXIT.ok;
}

export const command: Command = {
  name: 'presets',
  summary: 'saved joints: list, show, save, rename, delete, import, export',
  help: HELP,
  async run(args, io) {
    const [sub, ...rest] = args;
    switch (sub) {
      case 'list': {
        const p = parseOptions(rest, {...COMMON, search: {type: 'string'}}, false);
        const store = open(io);
        const q = str(p.values, 'search');
        const rows = store.list().filter(r => q === undefined || matches(r, q));
        const quarantine = store.quarantined();
        if (p.values.json) {
          json(io, {store: store.file, presets: rows, quarantined: quarantine, warnings: store.warnings()});
        } else io.out(listText(rows, store, quarantine.length));
        return EXIT.ok;
      }
      case 'show': {
        const p = parseOptions(rest, COMMON);
        const [name] = positionals(p, 1, 'show NAME');
        const store = open(io);
        const preset = store.get(name!);
        if (!preset) throw new UsageError(`no saved or shipped preset named "${name}"; see tapwright presets list`);
        const readOnly = store.list().some(r => r.readOnly && r.name === preset.name);
        if (p.values.json) json(io, preset);
        else io.out(describePreset(preset, readOnly));
        return EXIT.ok;
      }
      case 'save':
        return save(rest, io);
      case 'rename':
      case 'duplicate': {
        const p = parseOptions(rest, COMMON);
        const [from, to] = positionals(p, 2, `${sub} ${sub === 'rename' ? 'OLD' : 'FROM'} NEW`);
        const store = open(io);
        if (sub === 'rename') store.rename(from!, to!);
        else store.duplicate(from!, to!);
        if (p.values.json) json(io, store.get(to!));
        else io.out(`${sub === 'rename' ? 'renamed' : 'copied'} "${from}" to "${to}"\n`);
        return EXIT.ok;
      }
      case 'delete': {
        const p = parseOptions(rest, {...COMMON, yes: {type: 'boolean'}});
        const [name] = positionals(p, 1, 'delete NAME --yes');
        const store = open(io);
        const found = store.get(name!);
        if (found && p.values.yes !== true && !store.list().some(r => r.readOnly && r.name === found.name)) {
          throw new UsageError(`delete "${found.name}" needs --yes (tapwright presets delete ${JSON.stringify(found.name)} --yes)`, '--yes');
        }
        store.remove(name!);
        if (p.values.json) json(io, {deleted: found?.name ?? name});
        else io.out(`deleted "${found?.name ?? name}"\n`);
        return EXIT.ok;
      }
      case 'import': {
        const p = parseOptions(rest, {...COMMON, overwrite: {type: 'boolean'}});
        const [file] = positionals(p, 1, 'import FILE [--overwrite]');
        const store = open(io);
        const r = store.importFile(path.resolve(io.cwd, file!), {overwrite: p.values.overwrite === true});
        if (p.values.json) json(io, r);
        else {
          const lines = [`imported ${r.added.length + r.replaced.length} preset(s) from ${r.file}${r.fromVersion < 2 ? ` (schema ${r.fromVersion}, migrated)` : ''}`];
          if (r.added.length) lines.push(`  added: ${printable(r.added.join(', '))}`);
          if (r.replaced.length) lines.push(`  replaced: ${printable(r.replaced.join(', '))}`);
          for (const s of r.skipped) lines.push(`  skipped ${printable(s.name)}: ${printable(s.reason)}`);
          io.out(`${lines.join('\n')}\n`);
        }
        return EXIT.ok;
      }
      case 'export': {
        const p = parseOptions(rest, {...COMMON, force: {type: 'boolean'}});
        const [file, ...names] = p.positionals;
        if (file === undefined) throw new UsageError('missing argument; usage: tapwright presets export FILE|- [NAME ...] [--force]');
        const store = open(io);
        if (file === '-') {
          io.out(store.exportJson(names));
          return EXIT.ok;
        }
        store.exportTo(path.resolve(io.cwd, file), names, {force: p.values.force === true});
        const count = names.length || store.list().filter(r => !r.readOnly).length;
        if (p.values.json) json(io, {file, presets: count});
        else io.out(`exported ${count} preset(s) to ${file}\n`);
        return EXIT.ok;
      }
      case undefined:
        throw new UsageError('say what to do: tapwright presets list|show|save|rename|duplicate|delete|import|export (see --help)');
      default:
        throw new UsageError(`unknown presets action "${sub}"; accepted: list, show, save, rename, duplicate, delete, import, export`);
    }
  },
};
