import {describe, expect, it} from 'vitest';
import {
  listBoltGrades,
  listNutClasses,
  listParentMaterials,
  MEMORY_WORDING,
  SHIPPED_ROWS,
  validateMaterialData,
} from '../../../src/core/materials/index.js';

/** A minimal valid data set built from the shipped rows; each test breaks one thing. */
function baseData() {
  return {
    boltGrades: listBoltGrades().map(g => ({...g})),
    nutClasses: listNutClasses().map(n => ({...n})),
    parentMaterials: listParentMaterials().map(m => ({...m})),
    hexHeads: [{d: 10, dwMin: 14.63, clearanceHole: 11, provenance: {source: 'ISO 273', kind: 'standard'}}],
    nutDimensions: [{d: 10, heightMin: 8.04, heightMax: 8.4, flats: 16, provenance: {source: 'ISO 4032', kind: 'standard'}}],
  };
}

describe('material schema', () => {
  it('accepts the shipped library', () => {
    expect(() => validateMaterialData(baseData())).not.toThrow();
  });

  it('rejects a parent material without provenance, naming the entry', () => {
    const data = baseData();
    const {provenance: _drop, ...noProv} = data.parentMaterials[0]!;
    data.parentMaterials[0] = noProv as never;
    expect(() => validateMaterialData(data)).toThrow(/parentMaterials\.0\.provenance/);
  });

  it('rejects a bolt grade without provenance', () => {
    const data = baseData();
    const {provenance: _drop, ...noProv} = data.boltGrades[3]!;
    data.boltGrades[3] = noProv as never;
    expect(() => validateMaterialData(data)).toThrow(/boltGrades\.3\.provenance/);
  });

  it("rejects a 'memory' provenance that does not say 'from memory'", () => {
    const data = baseData();
    data.parentMaterials[0] = {...data.parentMaterials[0]!, provenance: {source: 'typical value', kind: 'memory'}};
    expect(() => validateMaterialData(data)).toThrow(/from memory/);
  });

  it('rejects a yield above the tensile strength', () => {
    const data = baseData();
    data.boltGrades[0] = {...data.boltGrades[0]!, rpMin: 900};
    expect(() => validateMaterialData(data)).toThrow(/rpMin must be below rmMin/);
    const data2 = baseData();
    data2.parentMaterials[0] = {...data2.parentMaterials[0]!, yield: 5000};
    expect(() => validateMaterialData(data2)).toThrow(/parentMaterials\.0/);
  });

  it('rejects a shear strength that disagrees with its ratio', () => {
    const data = baseData();
    data.parentMaterials[1] = {...data.parentMaterials[1]!, shear: 1};
    expect(() => validateMaterialData(data)).toThrow(/shear must equal shearRatio x rm/);
  });

  it('rejects overlapping size rows of one grade', () => {
    const data = baseData();
    const lower = data.boltGrades.find(g => g.id === '8.8' && g.sizeMaxMm === 16)!;
    data.boltGrades.push({...lower, sizeMinMm: 10, sizeMaxMm: 20});
    expect(() => validateMaterialData(data)).toThrow(/rows of "8.8" overlap/);
  });

  it('rejects a duplicate parent id and an out-of-range modulus', () => {
    const data = baseData();
    data.parentMaterials.push({...data.parentMaterials[0]!});
    expect(() => validateMaterialData(data)).toThrow(/appears twice/);
    const data2 = baseData();
    data2.parentMaterials[0] = {...data2.parentMaterials[0]!, elasticModulus: 210};
    expect(() => validateMaterialData(data2)).toThrow(/elasticModulus/);
  });

  it('rejects a hexagon head whose clearance hole is not between d and dw', () => {
    const data = baseData();
    data.hexHeads[0] = {...data.hexHeads[0]!, clearanceHole: 9};
    expect(() => validateMaterialData(data)).toThrow(/clearance hole/);
  });

  it('exports the exact memory wording', () => {
    expect(MEMORY_WORDING).toBe('typical value, from memory: verify against the material certificate');
  });
});

describe('the shipped rows and their schema', () => {
  // The build checks the rows once and the bundle then uses them as written
  // (src/core/materials/index.ts): that is only the same when the schema adds no
  // default and changes no value.
  it('come out of validation exactly as written', () => {
    expect(validateMaterialData(SHIPPED_ROWS)).toStrictEqual(SHIPPED_ROWS);
  });
});
