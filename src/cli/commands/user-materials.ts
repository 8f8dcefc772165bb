/**
 * `tapwright materials add|remove|mine`: parent materials of the user's own
 * (from a material certificate, say), kept in the preset store and usable by
 * id wherever a parent material is asked for.
 */
import path from 'node:path';
import {EXIT, UsageError, type CliIo} from '../io.js';
import {configDir} from '../../store/paths.js';
import {openPresetStore} from '../../store/presets.js';
import {parseGuarded} from '../../store/guard.js';
import {readInputFile} from '../solid-table-file.js';
import type {UserParentMaterial} from '../../core/joint/input.js';
import {formatQuantity, type UnitSystem} from '../../core/units.js';
import {jsonText, printable} from '../../core/text-safety.js';

export const USER_MATERIALS_HELP = `Your own parent materials (for tapped holes), kept in the preset store:
  tapwright materials add FILE [--overwrite]   a JSON object, or a list of them:
      {"id": "GJS-600-cert-4711", "name": "ductile iron GJS-600, heat 4711",
       "group": "cast-iron", "rm": 620, "yield": 390, "shear": 560,
       "elasticModulus": 174000, "source": "material certificate 3.1 no. 4711"}
      (MPa; group: steel, cast-iron, aluminium, copper-alloy, magnesium, other)
  tapwright materials mine [--json]            list them
  tapwright materials remove ID --yes          delete one
  Then use the id: tapwright check --parent GJS-600-cert-4711 ...`;

function line(m: UserParentMaterial, units: UnitSystem): string {
  const s = (v: number) => formatQuantity(v, 'stress', units, {significant: 3});
  return `${printable(m.id)}  ${printable(m.name)}\n    Rm ${s(m.rm)}, yield ${s(m.yield)}, shear ${s(m.shear)}; source: ${printable(m.source)}\n`;
}

export async function userMaterialsAction(action: string, rest: string[], flags: {json: boolean; overwrite: boolean; yes: boolean; units: UnitSystem}, io: CliIo): Promise<number> {
  const store = openPresetStore(configDir(io.env));
  for (const w of store.warnings()) io.err(`tapwright: ${printable(w)}\n`);
  switch (action) {
    case 'mine': {
      const list = store.userMaterials();
      if (flags.json) io.out(`${jsonText({userMaterials: list})}\n`);
      else if (list.length === 0) io.out('You have no materials of your own yet; see tapwright materials --help (add FILE).\n');
      else for (const m of list) io.out(line(m, flags.units));
      return EXIT.ok;
    }
    case 'add': {
      const file = rest[0];
      if (!file) throw new UsageError('materials add needs a FILE (JSON); see tapwright materials --help', 'FILE');
      // Size and kind are checked before a byte is read (a FIFO or /dev/zero is refused at once).
      const text = readInputFile(path.resolve(io.cwd, file), file, 'materials add', 'FILE');
      const parsed = parseGuarded(text);
      if (!parsed.ok) throw new UsageError(`materials add: "${file}" is not JSON we accept: ${parsed.error}`, 'FILE');
      const data = parsed.value;
      const items = Array.isArray(data) ? data : [data];
      if (items.length === 0 || items.length > 500) throw new UsageError('materials add: the file holds no material (or more than 500)', 'FILE');
      const saved = store.saveUserMaterials(items, {overwrite: flags.overwrite});
      io.err(`tapwright: stored ${saved.map(m => `"${printable(m.id)}"`).join(', ')}\n`);
      return EXIT.ok;
    }
    case 'remove': {
      const id = rest[0]?.trim();
      if (!id) throw new UsageError('materials remove needs a material ID', 'ID');
      if (!flags.yes) throw new UsageError(`materials remove ${id}: add --yes to delete it`, '--yes');
      store.removeUserMaterial(id);
      io.err(`tapwright: deleted material "${id}"\n`);
      return EXIT.ok;
    }
    default:
      throw new UsageError(`materials: unknown action "${action}" (accepted: add, mine, remove, or none to list the library)`);
  }
}
