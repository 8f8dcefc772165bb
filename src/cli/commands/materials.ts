/**
 * `tapwright materials`: the material library with the source of every row.
 * Text fits 80 columns; JSON is always SI (MPa, mm).
 */
import type {Command} from '../command.js';
import {EXIT, UsageError} from '../io.js';
import {formatOption, parseOptions, str, unitsOption} from '../args.js';
import {USER_MATERIALS_HELP} from './user-materials.js';
import {
  listBoltGrades,
  listHexHeads,
  listNutClasses,
  listNutDimensions,
  listParentMaterials,
  type BoltGrade,
  type NutClass,
  type ParentMaterial,
} from '../../core/materials/index.js';
import {formatNumber, toDisplay, type UnitSystem} from '../../core/units.js';
import {CAUTION_SHORT} from '../../core/cautions.js';
import type {Provenance} from '../../core/types.js';
import {wrapText} from '../../report/wrap.js';

const KINDS = ['bolt', 'nut', 'parent'] as const;
type Kind = (typeof KINDS)[number];

const HELP = `tapwright materials - bolt grades, nut classes, parent materials and sources

Usage:
  tapwright materials [--kind bolt|nut|parent] [--units si|us] [--format F]

Options:
  --kind K     show one part of the library: bolt (bolt grades), nut (nut
               classes), parent (materials for tapped holes); default: all
  --units U    si (MPa, GPa) or us (ksi); default si
  --format F   text (default) or json
  --json       the library as JSON, always SI (MPa, mm), with every source;
               short for --format json
  --help       this text

Strengths are minimums where a standard gives them. A row whose source says
"from memory" is a typical value: verify it against the material certificate.
tauB/Rm is the shear-strength ratio used for thread stripping.

${USER_MATERIALS_HELP}
`;

function stress(v: number, units: UnitSystem): string {
  return formatNumber(toDisplay(v, 'stress', units), 3);
}

function modulus(v: number, units: UnitSystem): string {
  return units === 'si' ? formatNumber(v / 1000, 3) : formatNumber(toDisplay(v, 'stress', units) / 1000, 3);
}

function row(cells: string[], widths: number[]): string {
  return cells
    .map((c, i) => (i === 0 ? c.padEnd(widths[i] ?? 0) : c.padStart(widths[i] ?? 0)))
    .join('  ')
    .trimEnd();
}

function rule(widths: number[]): string {
  return widths.map(w => '-'.repeat(w)).join('  ');
}

function starred(p: Provenance): string {
  return p.kind === 'memory' ? '*' : ' ';
}

function sourceLines(p: Provenance, label = 'source'): string[] {
  return wrapText(p.source, `    ${label}: `, '      ');
}

function boltText(rows: BoltGrade[], units: UnitSystem): string[] {
  const su = units === 'si' ? 'MPa' : 'ksi';
  const eu = units === 'si' ? 'GPa' : 'Mpsi';
  const w = [8, 7, 7, 7, 8, 6];
  const out = [`BOLT GRADES (minimum strengths, ${su})`, row(['grade', 'Rm', 'yield', 'proof', 'tauB/Rm', `E ${eu}`], w), rule(w)];
  for (const g of rows) {
    out.push(
      row(
        [g.id, stress(g.rmMin, units), stress(g.rpMin, units), g.proofStress ? stress(g.proofStress, units) : '-',
          `${g.shearRatio.toFixed(2)}${starred(g.shearRatioProvenance)}`, `${modulus(g.elasticModulus, units)}${starred(g.elasticModulusProvenance)}`],
        w,
      ),
    );
    out.push(...wrapText(g.name, '    ', '    '));
    out.push(...sourceLines(g.provenance));
  }
  return out;
}

function nutText(rows: NutClass[], units: UnitSystem): string[] {
  const su = units === 'si' ? 'MPa' : 'ksi';
  const w = [8, 9, 8];
  const out = [`NUT CLASSES (strength used for thread stripping, ${su})`, row(['class', 'strength', 'tauB/Rm'], w), rule(w)];
  for (const n of rows) {
    out.push(row([n.id, stress(n.rm, units), `${n.shearRatio.toFixed(2)}${starred(n.shearRatioProvenance)}`], w));
    out.push(...wrapText(n.name, '    ', '    '));
    out.push(...sourceLines(n.provenance));
  }
  return out;
}

function parentText(rows: ParentMaterial[], units: UnitSystem): string[] {
  const su = units === 'si' ? 'MPa' : 'ksi';
  const eu = units === 'si' ? 'GPa' : 'Mpsi';
  const w = [14, 6, 6, 6, 8, 6];
  const out = [`PARENT MATERIALS for tapped holes (${su})`, row(['material', 'Rm', 'yield', 'shear', 'tauB/Rm', `E ${eu}`], w), rule(w)];
  for (const m of rows) {
    out.push(
      row(
        [m.id, stress(m.rm, units), stress(m.yield, units), stress(m.shear, units),
          `${m.shearRatio.toFixed(2)}${starred(m.shearRatioProvenance)}`, `${modulus(m.elasticModulus, units)}${starred(m.elasticModulusProvenance)}`],
        w,
      ),
    );
    out.push(...wrapText(`${m.name} [${m.group}]`, '    ', '    '));
    out.push(...sourceLines(m.provenance));
    if (m.yieldProvenance) out.push(...sourceLines(m.yieldProvenance, 'yield'));
  }
  return out;
}

/** The text listing, every line at most 80 columns. */
export function materialsText(kinds: readonly Kind[], units: UnitSystem): string {
  const blocks: string[][] = [];
  if (kinds.includes('bolt')) blocks.push(boltText(listBoltGrades(), units));
  if (kinds.includes('nut')) blocks.push(nutText(listNutClasses(), units));
  if (kinds.includes('parent')) blocks.push(parentText(listParentMaterials(), units));
  const foot = [
    ...wrapText('* recalled value (from memory); tauB/Rm per VDI 2230 Part 1 as recalled, or common practice. `tapwright materials --json` gives the source of each value.', '', '  '),
    ...wrapText(`${CAUTION_SHORT} Check material strengths against the certificates.`, '', ''),
  ];
  return `${[...blocks.map(b => b.join('\n')), foot.join('\n')].join('\n\n')}\n`;
}

/** The JSON document: SI throughout (MPa, mm). */
export function materialsJson(kinds: readonly Kind[]): Record<string, unknown> {
  const doc: Record<string, unknown> = {units: {stress: 'MPa', length: 'mm', elasticModulus: 'MPa'}};
  if (kinds.includes('bolt')) {
    doc.boltGrades = listBoltGrades();
    doc.hexHeads = listHexHeads();
  }
  if (kinds.includes('nut')) {
    doc.nutClasses = listNutClasses();
    doc.nutDimensions = listNutDimensions();
  }
  if (kinds.includes('parent')) doc.parentMaterials = listParentMaterials();
  return doc;
}

export const command: Command = {
  name: 'materials',
  summary: 'bolt grades, nut classes and parent materials with their sources',
  help: HELP,
  async run(args, io) {
    const {values, positionals} = parseOptions(
      args,
      {json: {type: 'boolean'}, format: {type: 'string'}, units: {type: 'string'}, kind: {type: 'string'}, overwrite: {type: 'boolean'}, yes: {type: 'boolean'}},
      true,
    );
    const unitsText = unitsOption(values);
    if (positionals.length > 0) {
      const [action, ...rest] = positionals;
      const {userMaterialsAction} = await import('./user-materials.js');
      return userMaterialsAction(action ?? '', rest, {json: values.json === true, overwrite: values.overwrite === true, yes: values.yes === true, units: unitsText}, io);
    }
    const format = formatOption(values, ['text', 'json'] as const, 'text');
    const kindText = str(values, 'kind')?.trim().toLowerCase();
    if (kindText !== undefined && !(KINDS as readonly string[]).includes(kindText)) {
      throw new UsageError(`--kind is "${kindText}"; accepted: ${KINDS.join(', ')}`, '--kind');
    }
    const kinds: readonly Kind[] = kindText ? [kindText as Kind] : KINDS;
    if (format === 'json') io.out(`${JSON.stringify(materialsJson(kinds), null, 2)}\n`);
    else io.out(materialsText(kinds, unitsText));
    return EXIT.ok;
  },
};
