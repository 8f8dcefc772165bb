import {readFileSync} from 'node:fs';
import {describe, expect, it} from 'vitest';
import {KEYMAP} from '../../src/ui/keymap.js';

describe('README workbench keys', () => {
  it('lists every key binding with its description, as the Help screen does', () => {
    const readme = readFileSync(new URL('../../README.md', import.meta.url), 'utf8');
    for (const b of KEYMAP) expect(readme, b.command).toContain(`| ${b.description} |`);
  });
});
