/** The hole-state flag: a rule of the core (not of a view), so check and the report can raise it too. */
import {describe, expect, it} from 'vitest';
import {holeStateFlags} from '../../../src/core/joint/hole-flags.js';

describe('holeStateFlags', () => {
  it('raises one WATCH for a hole recorded as stripped, with its depth in the units asked', () => {
    const [si] = holeStateFlags({holeState: 'stripped', strippedDepth: 7});
    expect(si).toMatchObject({code: 'hole-stripped', level: 'watch'});
    expect(si!.message).toBe('The hole is recorded as stripped to 7.00 mm: the results are for a sound thread. The Repairs screen (r) ranks the fixes.');
    expect(holeStateFlags({holeState: 'stripped', strippedDepth: 25.4}, 'us')[0]!.summary).toBe('Hole stripped to 1.00 in: results assume a sound thread; r: repairs');
    expect(holeStateFlags({holeState: 'stripped'})[0]!.summary).toBe('Hole stripped: results assume a sound thread; r: repairs');
  });

  it('raises nothing for an intact or unrecorded hole, even with a depth left over', () => {
    expect(holeStateFlags({holeState: 'intact', strippedDepth: 3})).toEqual([]);
    expect(holeStateFlags(undefined)).toEqual([]);
    expect(holeStateFlags({})).toEqual([]);
  });
});
