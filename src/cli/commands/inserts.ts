/**
 * `tapwright inserts`: the solid key-locked insert tables the repair planner
 * offers. The shipped table is demo data; a user keeps the insert maker's
 * sizes as a table of their own in the preset store.
 */
import {writeFileSync} from 'node:fs';
import path from 'node:path';
import type {Command} from '../command.js';
import {EXIT, UsageError} from '../io.js';
import {parseOptions} from '../args.js';
import {configDir} from '../../store/paths.js';
import {openPresetStore} from '../../store/presets.js';
import {allSolidTables, defaultSolidTable, findSolidTable} from '../../store/solid-tables.js';
import {DEMO_SOLID_INSERTS, DEMO_TABLE_WARNING, type SolidInsertTable} from '../../core/repair/index.js';
import {readSolidTableFile} from '../solid-table-file.js';
import {MAX_IMPORT_TEXT} from '../../store/guard.js';
import {jsonText, printable as p} from '../../core/text-safety.js';

const HELP = `tapwright inserts - solid key-locked insert tables for the repair planner

Usage:
  tapwright inserts list [--json]
  tapwright inserts show NAME [--json]
  tapwright inserts import FILE [--overwrite]
  tapwright inserts export NAME FILE|- [--force]
  tapwright inserts delete NAME --yes

The shipped table "demo solid key-locked inserts" holds invented sizes
(${DEMO_TABLE_WARNING}).
Keep the sizes of the inserts you stock as a table of your own: export
the demo table, edit it with the maker's data, set "provenance" to
{"kind": "maker", "source": "<catalogue and date>"}, give it a new "name"
and import it. The repair planner and the workbench use your first table
by name, else the demo table; tapwright repair --solid-table NAME|FILE
picks another.

A table is JSON: {"kind": "solid-key-locked-inserts", "version": 1, "name",
"provenance": {"kind": "demo"|"maker"|"user", "source"}, "entries": [{
"internal": "M10x1.5", "type": "thin-wall"|"heavy-duty", "external":
"M14x1.5", "length" (mm), "drill" (mm, optional), "keys", "bodyRm" (MPa),
"bodyShear" (MPa), "setDown" (mm)}]}. Import checks the whole file first (up
to ${MAX_IMPORT_TEXT}); on any problem nothing is stored.

Options:
  --json        machine-readable output (SI units)
  --overwrite   import: replace your table of the same name
  --force       export: replace an existing file
  --yes         delete: needed, so a mistyped command never removes a table
  --help        this text
`;

/** The shipped table's name, compared case-insensitively. */
const DEMO_NAME = DEMO_SOLID_INSERTS.name.trim().toLowerCase();

const OPTIONS = {
  json: {type: 'boolean'},
  overwrite: {type: 'boolean'},
  force: {type: 'boolean'},
  yes: {type: 'boolean'},
} as const;

function summary(t: SolidInsertTable, shipped: boolean, isDefault: boolean) {
  return {
    name: t.name,
    shipped,
    default: isDefault,
    provenance: t.provenance,
    entries: t.entries.length,
    sizes: [...new Set(t.entries.map(e => e.internal))],
  };
}


export const command: Command = {
  name: 'inserts',
  summary: 'solid key-locked insert tables for the repair planner',
  help: HELP,
  async run(args, io) {
    const {values, positionals} = parseOptions(args, OPTIONS);
    const [action, ...rest] = positionals;
    const store = openPresetStore(configDir(io.env));
    for (const w of store.warnings()) io.err(`tapwright: ${p(w)}\n`);
    const json = values.json === true;
    const needName = (what: string) => {
      const name = rest[0]?.trim();
      if (!name) throw new UsageError(`inserts ${what} needs a table name; see tapwright inserts list`, 'NAME');
      const t = findSolidTable(store, name);
      if (!t) {
        const known = allSolidTables(store).map(x => `"${p(x.table.name)}"`).join(', ');
        throw new UsageError(`inserts ${what}: no table "${name}" (known: ${known})`, 'NAME');
      }
      return t;
    };
    switch (action) {
      case 'list':
      case undefined: {
        const def = defaultSolidTable(store).name;
        const rows = allSolidTables(store).map(x => summary(x.table, x.shipped, x.table.name === def));
        if (json) {
          io.out(`${jsonText({tables: rows})}\n`);
          return EXIT.ok;
        }
        for (const r of rows) {
          io.out(`${r.default ? '* ' : '  '}${p(r.name)}  (${r.shipped ? 'shipped, read-only' : 'yours'}; ${r.entries} entries; ${r.provenance.kind})\n`);
          io.out(`    sizes: ${p(r.sizes.join(', '))}\n`);
          io.out(`    source: ${p(r.provenance.source)}\n`);
        }
        io.out('* = used by the repair planner when no --solid-table is given\n');
        return EXIT.ok;
      }
      case 'show': {
        const t = needName('show');
        if (json) {
          io.out(`${jsonText(t)}\n`);
          return EXIT.ok;
        }
        io.out(`${p(t.name)}\nsource (${t.provenance.kind}): ${p(t.provenance.source)}\n\n`);
        io.out('internal thread  type        external thread  length  keys  body Rm / shear\n');
        for (const e of t.entries) {
          io.out(
            `${p(e.internal).padEnd(16)} ${e.type.padEnd(11)} ${p(e.external).padEnd(16)} ${`${e.length} mm`.padEnd(7)} ${String(e.keys).padEnd(5)} ${e.bodyRm} / ${e.bodyShear} MPa\n`,
          );
        }
        return EXIT.ok;
      }
      case 'import': {
        const file = rest[0];
        if (!file) throw new UsageError('inserts import needs a FILE', 'FILE');
        const t = await readSolidTableFile(file, io, 'inserts import', 'FILE');
        if (t.name.trim().toLowerCase() === DEMO_NAME) {
          throw new UsageError(`inserts import: "${t.name}" is the shipped table's name; give your table a name of its own`, 'FILE');
        }
        const saved = store.saveInsertTable(t, {overwrite: values.overwrite === true});
        io.err(`tapwright: stored insert table "${saved.name}" (${saved.entries.length} entries)\n`);
        return EXIT.ok;
      }
      case 'export': {
        const t = needName('export');
        const target = rest[1];
        if (!target) throw new UsageError('inserts export needs NAME and FILE (or - for standard output)', 'FILE');
        const text = `${JSON.stringify(t, null, 2)}\n`;
        if (target === '-') {
          io.out(text);
          return EXIT.ok;
        }
        const full = path.resolve(io.cwd, target);
        try {
          writeFileSync(full, text, {flag: values.force === true ? 'w' : 'wx'});
        } catch (e) {
          const code = (e as NodeJS.ErrnoException).code;
          if (code === 'EEXIST') throw new UsageError(`inserts export: ${full} exists; add --force to replace it`, '--force');
          throw new UsageError(`inserts export: cannot write ${full} (${code ?? String(e)})`, 'FILE');
        }
        io.err(`tapwright: wrote insert table "${t.name}" to ${full}\n`);
        return EXIT.ok;
      }
      case 'delete': {
        const name = rest[0]?.trim();
        if (!name) throw new UsageError('inserts delete needs a table name', 'NAME');
        if (name.toLowerCase() === DEMO_NAME) throw new UsageError('inserts delete: the shipped demo table is read-only', 'NAME');
        if (values.yes !== true) throw new UsageError(`inserts delete ${name}: add --yes to delete it`, '--yes');
        if (!store.insertTables().some(t => t.name.trim().toLowerCase() === name.toLowerCase())) {
          throw new UsageError(`inserts delete: you have no table "${name}"; see tapwright inserts list`, 'NAME');
        }
        store.removeInsertTable(name);
        io.err(`tapwright: deleted insert table "${name}"\n`);
        return EXIT.ok;
      }
      default:
        throw new UsageError(`inserts: unknown action "${String(action)}" (accepted: list, show, import, export, delete)`);
    }
  },
};
