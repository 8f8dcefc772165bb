import {describe, expect, it} from 'vitest';
import {editDistance, nearestIds} from '../../../src/core/materials/suggest.js';
import {boltGradeIds, boltGradeProblem, listParentMaterials, nutClassProblem, parentMaterialProblem} from '../../../src/core/materials/index.js';

// Spelling help for library ids; no engineering values.

describe('nearestIds', () => {
  const grades = boltGradeIds();
  const parents = listParentMaterials().map(p => p.id);

  it('edit distance', () => {
    expect(editDistance('s335', 's355')).toBe(1);
    expect(editDistance('', 'abc')).toBe(3);
    expect(editDistance('kitten', 'sitting')).toBe(3);
  });

  it('the same id with other case or punctuation is the one answer', () => {
    expect(nearestIds('8,8', grades)).toEqual(['8.8']);
    expect(nearestIds('sae5', grades)).toEqual(['SAE-5']);
    expect(nearestIds('en gjl 250', parents)).toEqual(['EN-GJL-250']);
  });

  it('a truncated or misspelt id gets the near ones; junk gets none', () => {
    expect(nearestIds('alsi7mg', parents)).toEqual(['AlSi7Mg-T6']);
    expect(nearestIds('gjl250', parents)).toEqual(['EN-GJL-250']);
    expect(nearestIds('S335', parents)).toEqual(expect.arrayContaining(['S355', 'S235']));
    expect(nearestIds('xyz', grades)).toEqual([]);
    expect(nearestIds('', grades)).toEqual([]);
  });
});

describe('unknown-id messages suggest and list the accepted ids', () => {
  it('bolt grade, nut class and parent material', () => {
    expect(boltGradeProblem('8,8', 10)).toMatch(/^unknown bolt grade "8,8"; accepted: 4\.6, .*SAE-8; did you mean 8\.8\?$/);
    expect(nutClassProblem('sae-8x', 10)).toMatch(/^unknown nut class "sae-8x"; accepted: 04, .*; did you mean SAE-8.*\?$/);
    expect(parentMaterialProblem('S335')).toMatch(/^unknown parent material "S335"; accepted: S235, S355, .*; did you mean S235 or S355\?$/);
    expect(parentMaterialProblem('cheese')).toMatch(/^unknown parent material "cheese"; accepted: S235.*Ti-6Al-4V$/);
    expect(parentMaterialProblem('S355')).toBeUndefined();
  });
});
