/** Dotted keys of the field table: inputs inside an optional object of a schema (measured, service). */
import {describe, expect, it} from 'vitest';
import {getPath, setPath} from '../../src/app/key-path.js';
import {boundsOf} from '../../src/app/field-table.js';
import {overDraft} from '../../src/cli/field-options.js';

describe('key paths', () => {
  it('reads and writes a member without changing the draft given', () => {
    const d = {thread: 'M10', measured: {holeMinorDiameter: 8.7}};
    const e = setPath(d, 'measured.boltPitchDiameter', 9.0);
    expect(e).toEqual({thread: 'M10', measured: {holeMinorDiameter: 8.7, boltPitchDiameter: 9.0}});
    expect(d).toEqual({thread: 'M10', measured: {holeMinorDiameter: 8.7}});
    expect(getPath(e, 'measured.boltPitchDiameter')).toBe(9.0);
    expect(getPath(e, 'service.clamp')).toBeUndefined();
  });
  it('removes an object left empty, so an optional group stays absent', () => {
    expect(setPath({thread: 'M10', measured: {holeMinorDiameter: 8.7}}, 'measured.holeMinorDiameter', undefined)).toEqual({thread: 'M10'});
  });
  it('options over a base draft merge into the member object', () => {
    expect(overDraft({measured: {holeMinorDiameter: 8.7}}, {'measured.boltPitchDiameter': 9})).toEqual({measured: {holeMinorDiameter: 8.7, boltPitchDiameter: 9}});
  });
  it('the table reads the range of a member from the schema', () => {
    const b = boundsOf('joint', 'measured.holeMinorDiameter');
    expect(b.min).toBeGreaterThan(0);
    expect(b.max).toBeGreaterThan(b.min ?? 0);
  });
});
