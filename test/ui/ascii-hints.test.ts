/** In ASCII mode the key hints of the joint screen keep to one line at 80 columns (issue 14 item 15). */
import {describe, expect, it} from 'vitest';
import {hintLines} from '../../src/ui/keymap.js';

describe('ASCII key hints', () => {
  it('the joint screen hints fit one line at 80 columns, arrows written short', () => {
    const lines = hintLines(['joint', 'screens', 'any'], true, 80);
    expect(lines).toHaveLength(1);
    expect(lines[0]).toContain('Up/Dn field');
    expect(lines[0]).toContain('Lt/Rt step');
    expect(lines[0]).toContain('q quit');
  });
  it('the Repairs hints keep PgUp/PgDn apart', () => {
    expect(hintLines(['repairs', 'screens', 'any'], false, 80).join(' ')).toContain('PgUp/PgDn detail');
  });
});
