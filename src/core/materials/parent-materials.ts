/**
 * Internal-thread (parent) materials for tapped holes (data only). MPa.
 *
 * Strength values are conservative minimum-style figures. Unless a row names a
 * standard and table, its strengths are "typical value, from memory: verify
 * against the material certificate" (DEVELOPERS.md wording).
 *
 * Shear ratios tau_B/Rm (from memory):
 * - grey cast iron about 0.9 to 1.1 and nodular iron about 0.9, aluminium alloys about 0.6 to 0.7:
 *   VDI 2230 Part 1, table of shear-strength ratios, from memory; the low end is used;
 * - steels 0.6, copper alloys and magnesium 0.6 / 0.55: common practice for ductile
 *   metals (tau_B about 0.6 Rm), no source, from memory.
 * `shear` is always shearRatio x rm, so the two cannot disagree.
 */
import type {Provenance} from '../types.js';
import {MEMORY_WORDING} from './schema.js';

const MEM: Provenance = {source: MEMORY_WORDING, kind: 'memory'};
const tau = (text: string): Provenance => ({source: `${text}; from memory`, kind: 'memory'});
const TAU_STEEL = tau('tau_B/Rm 0.6, common practice for steels (low end of the VDI 2230 Part 1 steel range 0.6 to 0.8)');
const TAU_GJL = tau('VDI 2230 Part 1, tau_B/Rm about 0.9 to 1.1 for grey cast iron (0.9 used)');
const TAU_GJS = tau('VDI 2230 Part 1, tau_B/Rm about 0.9 for nodular cast iron');
const TAU_AL = tau('VDI 2230 Part 1, tau_B/Rm about 0.6 to 0.7 for aluminium alloys (0.6 used)');
const TAU_CU = tau('tau_B/Rm 0.6, common practice for ductile copper alloys, no source');
const TAU_MG = tau('tau_B/Rm 0.55, common practice for magnesium casting alloys, no source');
const TAU_TI = tau('VDI 2230 Part 1, tau_B/Rm about 0.6 for titanium alloys');
const e = (gpa: number, text: string): Provenance => ({source: `E = ${gpa} GPa, ${text}, typical value, from memory`, kind: 'memory'});

type Group = 'steel' | 'cast-iron' | 'aluminium' | 'copper-alloy' | 'magnesium' | 'other';

function row(
  id: string,
  name: string,
  group: Group,
  rm: number,
  yieldStrength: number,
  shearRatio: number,
  shearRatioProvenance: Provenance,
  elasticModulusGpa: number,
  elasticModulusProvenance: Provenance,
  note: string,
  provenance: Provenance = MEM,
  yieldProvenance?: Provenance,
): Record<string, unknown> {
  return {
    ...(yieldProvenance ? {yieldProvenance} : {}),
    id,
    name,
    group,
    rm,
    yield: yieldStrength,
    shear: Math.round(shearRatio * rm * 10) / 10,
    shearRatio,
    elasticModulus: elasticModulusGpa * 1000,
    provenance,
    shearRatioProvenance,
    elasticModulusProvenance,
    note,
  };
}

/** EN 1561 Table 1: tensile strength of separately cast samples (read in a stored foundry page reproducing it). */
const EN1561: Provenance = {source: 'EN 1561 Table 1, tensile strength Rm min of a separately cast sample', kind: 'standard'};
const GJL_RP: Provenance = {source: '0.1 % proof stress about 0.65 Rm for grey cast iron, typical value, from memory: verify against the material certificate', kind: 'memory'};
/** EN 1563:1997, mechanical properties on test pieces machined from separately cast samples (stored foundry page reproducing the table). */
const EN1563: Provenance = {
  source: 'EN 1563:1997, table of Rm min and Rp0.2 min on test pieces machined from separately cast samples',
  kind: 'standard',
};

const E_STEEL = e(210, 'carbon and low-alloy steel');
const E_AL = e(70, 'aluminium alloys');

/** Raw rows; validated by the schema in index.ts. */
export const PARENT_MATERIAL_ROWS: unknown[] = [
  // Steels
  row('S235', 'structural steel S235 (EN 10025-2)', 'steel', 360, 235, 0.6, TAU_STEEL, 210, E_STEEL,
    'Rm lower bound of 360 to 510, ReH for thickness up to 16 mm'),
  row('S355', 'structural steel S355 (EN 10025-2)', 'steel', 470, 355, 0.6, TAU_STEEL, 210, E_STEEL,
    'Rm lower bound of 470 to 630, ReH for thickness up to 16 mm'),
  row('C45', 'carbon steel C45, normalised (EN 10083-2)', 'steel', 620, 340, 0.6, TAU_STEEL, 210, E_STEEL,
    'normalised condition, up to 16 mm; quenched and tempered C45 is stronger'),
  row('42CrMo4-QT', 'alloy steel 42CrMo4, quenched and tempered (EN 10083-3)', 'steel', 900, 650, 0.6, TAU_STEEL, 210, E_STEEL,
    'section 40 to 100 mm; smaller sections are stronger'),
  row('11SMn30', 'free-cutting steel 11SMn30 (EN 10087)', 'steel', 380, 240, 0.6, TAU_STEEL, 210, E_STEEL,
    'hot-rolled bar; cold-drawn bar is stronger; sulphide inclusions lower the thread strength across the grain'),
  // Cast irons
  row('EN-GJL-200', 'grey cast iron EN-GJL-200 (EN 1561)', 'cast-iron', 200, 130, 0.9, TAU_GJL, 88, e(88, 'grey cast iron, low end'),
    'separately cast test bar; EN 1561 expects less in walls thicker than about 10 mm; yield given as the 0.1 % proof stress', EN1561, GJL_RP),
  row('EN-GJL-250', 'grey cast iron EN-GJL-250 (EN 1561)', 'cast-iron', 250, 165, 0.9, TAU_GJL, 103, e(103, 'grey cast iron, low end'),
    'separately cast test bar; EN 1561 expects less in walls thicker than about 10 mm; yield given as the 0.1 % proof stress', EN1561, GJL_RP),
  row('EN-GJL-300', 'grey cast iron EN-GJL-300 (EN 1561)', 'cast-iron', 300, 195, 0.9, TAU_GJL, 108, e(108, 'grey cast iron, low end'),
    'separately cast test bar; EN 1561 expects less in walls thicker than about 10 mm; yield given as the 0.1 % proof stress', EN1561, GJL_RP),
  row('EN-GJS-400-15', 'ductile (nodular) iron EN-GJS-400-15 (EN 1563)', 'cast-iron', 400, 250, 0.9, TAU_GJS, 169, e(169, 'nodular cast iron'),
    'separately cast test piece; castings with thick walls are weaker', EN1563),
  row('EN-GJS-500-7', 'ductile (nodular) iron EN-GJS-500-7 (EN 1563)', 'cast-iron', 500, 320, 0.9, TAU_GJS, 169, e(169, 'nodular cast iron'),
    'separately cast test piece; castings with thick walls are weaker', EN1563),
  // Wrought aluminium
  row('6061-T6', 'wrought aluminium 6061-T6', 'aluminium', 260, 240, 0.6, TAU_AL, 69, E_AL,
    'extruded or drawn product minimum'),
  row('6082-T6', 'wrought aluminium EN AW-6082 T6 (extruded bar)', 'aluminium', 295, 250, 0.6, TAU_AL, 70, E_AL,
    'small-diameter extruded bar; larger sections differ'),
  row('7075-T6', 'wrought aluminium 7075-T6 / T651', 'aluminium', 530, 460, 0.6, TAU_AL, 72, e(72, 'aluminium-zinc alloys'),
    'thick plate and large bar are weaker'),
  row('5083-O', 'wrought aluminium EN AW-5083 O/H111 (plate)', 'aluminium', 270, 110, 0.6, TAU_AL, 70, E_AL,
    'soft condition; strain-hardened tempers are stronger'),
  // Cast aluminium
  row('AlSi7Mg-T6', 'cast aluminium AlSi7Mg0.3 T6 / A356-T6, sand cast', 'aluminium', 230, 165, 0.6, TAU_AL, 72, e(72, 'cast aluminium-silicon alloys'),
    'sand-cast test bar; permanent-mould castings are stronger; porosity lowers the value in the part'),
  row('AlSi9Cu3-DC', 'die-cast aluminium AlSi9Cu3(Fe)', 'aluminium', 240, 140, 0.6, TAU_AL, 72, e(72, 'cast aluminium-silicon alloys'),
    'as-cast; die castings are porous below the skin, where tapped holes are cut'),
  // Copper alloys
  row('CuZn39Pb3', 'free-cutting brass CuZn39Pb3', 'copper-alloy', 360, 160, 0.6, TAU_CU, 96, e(96, 'brass'),
    'drawn rod, lower strength grade'),
  row('CuSn12-C', 'cast tin bronze CuSn12-C, sand cast', 'copper-alloy', 260, 140, 0.6, TAU_CU, 90, e(90, 'tin bronze'),
    'sand-cast; centrifugal or continuous castings are stronger'),
  row('CuAl10Fe5Ni5-C', 'cast aluminium bronze CuAl10Fe5Ni5-C, sand cast', 'copper-alloy', 600, 250, 0.6, TAU_CU, 115, e(115, 'aluminium bronze'),
    'sand-cast'),
  // Magnesium
  row('AZ91-DC', 'die-cast magnesium AZ91', 'magnesium', 200, 140, 0.55, TAU_MG, 45, e(45, 'magnesium alloys'),
    'as-cast; prone to galvanic corrosion against steel bolts'),
  // Other
  row('Ti-6Al-4V', 'titanium alloy Ti-6Al-4V, annealed', 'other', 895, 825, 0.6, TAU_TI, 114, e(114, 'titanium alloys'),
    'annealed bar; titanium threads gall easily'),
];
