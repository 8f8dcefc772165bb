import {describe, expect, it} from 'vitest';
import {JointInputSchema} from '../../../src/core/joint/index.js';
import {nutDimensions} from '../../../src/core/materials/index.js';
import {defaultDeps, oversizeCandidates, planRepairs} from '../../../src/core/repair/index.js';
import {parseThread} from '../../../src/core/threads/index.js';

function spec(t: string) {
  const p = parseThread(t);
  if (!p.ok) throw new Error(p.error);
  return p.value;
}

describe('oversize candidates (ISO 261/262 and ASME B1.1 series)', () => {
  const deps = defaultDeps();
  const next = (t: string) => {
    const s = spec(t);
    return oversizeCandidates({family: s.family, nominal: s.nominal, pitch: s.pitch, sizeLabel: s.sizeLabel}, deps.seriesAbove?.(s) ?? []).map(c => c.designation);
  };

  // The coarse pitch of the next size is the usual choice and is offered first whenever its minor
  // diameter clears the old thread (ISO 261 coarse series; ISO 2306 / common tap-drill tables).
  it('M10x1.5 -> M12 (coarse 1.75), M12x1.5, M12x1.25: the next ISO 261/262 size, coarse first', () => {
    expect(next('M10')).toEqual(['M12', 'M12x1.5', 'M12x1.25']);
  });

  it('M8x1.25 -> M10 (coarse 1.5), M10x1.25, M10x1', () => {
    expect(next('M8')).toEqual(['M10', 'M10x1.25', 'M10x1']);
  });

  it('a stripped M8 hole: M10x1.5 offered with its tap drill 8.5 mm (ISO 2306 / common tap-drill tables), and what is left out says why', () => {
    const plan = planRepairs(JointInputSchema.parse({thread: 'M8', boltGrade: '8.8', parent: '6082-T6', engagement: 12}), {holeState: 'stripped', strippedDepth: 12});
    const over = plan.options.filter(o => o.kind === 'oversize');
    expect(over[0]?.tapThread).toBe('M10');
    expect(over[0]?.drill).toBeCloseTo(8.5, 9);
    expect(over[0]?.notes.join(' ')).toMatch(/left out: M10x0\.75 \(only the nearest 3 sizes are offered\)/);
  });

  it('1/4-20 UNC -> 5/16-18 UNC (coarse), 5/16-24 UNF, 5/16-32 UNEF', () => {
    expect(next('1/4-20')).toEqual(['5/16-18 UNC', '5/16-24 UNF', '5/16-32 UNEF']);
  });

  it('every candidate clears the old thread: basic D1 = D - 1.082532P (ISO 68-1) at least the old major diameter', () => {
    for (const t of ['M6', 'M8', 'M10', 'M12', 'M16', '3/8-16']) {
      const s = spec(t);
      for (const c of oversizeCandidates({family: s.family, nominal: s.nominal, pitch: s.pitch, sizeLabel: s.sizeLabel}, deps.seriesAbove?.(s) ?? [])) {
        expect(c.nominal - 1.082532 * c.pitch).toBeGreaterThanOrEqual(s.nominal - 1e-9);
      }
    }
  });
});

describe('through-bolt nut', () => {
  it('uses the ISO 4032 regular nut of the material library (m min) and class 8 for an 8.8 bolt (ISO 898-2 matching)', () => {
    const plan = planRepairs(JointInputSchema.parse({thread: 'M10', boltGrade: '8.8', parent: '6082-T6', engagement: 12}), {through: true, depthAvailable: 20});
    const tb = plan.options.find(o => o.kind === 'through-bolt');
    const m = nutDimensions(10);
    expect(m).toBeDefined();
    expect(tb?.notes.join(' ')).toContain(`nut class 8, height ${Number(m?.heightMin.toFixed(2))} mm, ${m?.flats} mm across flats`);
    // Bolt through 20 mm of part and the nut with 2 pitches showing: 20 - 12 + m + 3 mm longer.
    expect(tb?.screwLengthChange).toBeCloseTo(20 - 12 + (m?.heightMin ?? 0) + 3, 9);
  });
});
