/**
 * Nut and screw materials for power screws. The strengths come from the shared
 * material library (src/core/materials); the short trade names map onto its entries.
 * One extra entry, an acetal plastic nut, is kept here: typical value, from memory.
 * MPa.
 */
import {listParentMaterials, parentMaterial, type ParentMaterial} from '../materials/index.js';

/** Which row group of the allowable bearing-pressure table applies to a nut material. */
export type BearingClass = 'bronze' | 'cast-iron' | 'none';

export interface ScrewPartMaterial {
  id: string;
  name: string;
  /** Tensile strength Rm, MPa. */
  rm: number;
  /** Yield (or 0.2 % proof) strength, MPa. */
  yield: number;
  /** Ultimate shear strength used for thread stripping, MPa. */
  shear: number;
  /** Young's modulus, MPa. */
  elasticModulus: number;
  /** Provenance of the strengths, in words. */
  source: string;
  bearingClass: BearingClass;
}

/** Short trade names offered for the nut, and the library entry behind each. */
export const NUT_MATERIAL_ALIASES: Readonly<Record<string, string>> = {
  bronze: 'CuSn12-C',
  'cast-iron': 'EN-GJL-200',
  steel: 'S355',
  brass: 'CuZn39Pb3',
};

/** Short trade names offered for the screw. */
export const SCREW_MATERIAL_ALIASES: Readonly<Record<string, string>> = {
  steel: 'C45',
  'alloy-steel': '42CrMo4-QT',
};

const PLASTIC: ScrewPartMaterial = {
  id: 'plastic',
  name: 'acetal (POM) plastic nut',
  rm: 60,
  yield: 60,
  shear: 36,
  elasticModulus: 2800,
  source: 'acetal Rm about 60 MPa, shear 0.6 Rm, E about 2.8 GPa: typical value, from memory: verify against the maker\'s data',
  bearingClass: 'none',
};

function bearingClassOf(m: ParentMaterial): BearingClass {
  if (m.group === 'cast-iron') return 'cast-iron';
  if (/^CuSn|^CuAl|bronze/i.test(`${m.id} ${m.name}`)) return 'bronze';
  return 'none';
}

function fromLibrary(m: ParentMaterial): ScrewPartMaterial {
  return {
    id: m.id,
    name: m.name,
    rm: m.rm,
    yield: m.yield,
    shear: m.shear,
    elasticModulus: m.elasticModulus,
    source: `${m.provenance.source}; shear: ${m.shearRatioProvenance.source}`,
    bearingClass: bearingClassOf(m),
  };
}

function key(id: string): string {
  return id.trim().toLowerCase().replace(/[\s_]+/g, '-');
}

/** A nut material by trade name (bronze, cast-iron, steel, brass, plastic) or library id. */
export function nutMaterial(id: string): ScrewPartMaterial | undefined {
  const k = key(id);
  if (k === 'plastic' || k === 'acetal' || k === 'pom') return PLASTIC;
  const libId = NUT_MATERIAL_ALIASES[k] ?? id;
  const m = parentMaterial(libId);
  return m ? fromLibrary(m) : undefined;
}

/** A screw material by trade name (steel, alloy-steel) or a steel id of the library. */
export function screwMaterial(id: string): ScrewPartMaterial | undefined {
  const libId = SCREW_MATERIAL_ALIASES[key(id)] ?? id;
  const m = parentMaterial(libId);
  return m && m.group === 'steel' ? fromLibrary(m) : undefined;
}

/** Ids accepted for the nut, for messages and pickers. */
export function nutMaterialIds(): string[] {
  return [...Object.keys(NUT_MATERIAL_ALIASES), 'plastic', ...listParentMaterials().map(m => m.id)];
}

/** Ids accepted for the screw. */
export function screwMaterialIds(): string[] {
  return [...Object.keys(SCREW_MATERIAL_ALIASES), ...listParentMaterials().filter(m => m.group === 'steel').map(m => m.id)];
}
