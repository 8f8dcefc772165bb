import {describe, expect, it} from 'vitest';
import {openPresetStore} from '../../src/store/presets.js';
import {tempDir, jointPreset} from './helpers.js';

describe('smoke', () => {
  it('saves and lists', () => {
    const dir = tempDir();
    const s = openPresetStore(dir);
    s.save(jointPreset('a'));
    expect(s.get('a')?.revision).toBe(1);
    expect(s.list().map(p => p.name)).toContain('a');
    expect(s.list().filter(p => p.readOnly).length).toBe(5);
    expect(s.warnings()).toEqual([]);
  });
});
