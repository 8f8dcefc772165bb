import {describe, expect, it} from 'vitest';
import {readFileSync} from 'node:fs';
import {REPAIR_RANKING_RULE, EFFORT_SCALE_TEXT} from '../../src/core/repair/index.js';
import {CAUTION_LINES} from '../../src/core/cautions.js';
import {COMMANDS} from '../../src/cli/commands/index.js';

const readme = readFileSync(new URL('../../README.md', import.meta.url), 'utf8');

describe('README stays in step with the code', () => {
  it('has the two quick-start commands and the cautions', () => {
    expect(readme).toContain('npm install && npm start');
    expect(readme).toContain('npm install && npm test');
    expect(readme).toMatch(/qualified\s+person's sign-off/);
    expect(CAUTION_LINES.join(' ')).toMatch(/qualified person's sign-off/);
  });
  it('states the repair ranking rule and effort grades word for word', () => {
    expect(readme).toContain(REPAIR_RANKING_RULE);
    for (const line of EFFORT_SCALE_TEXT.split('\n')) expect(readme).toContain(line);
  });
  it('documents every CLI command', () => {
    for (const c of COMMANDS) expect(readme).toContain(`tapwright ${c.name}`);
  });
  it('has no placeholder left', () => {
    expect(readme).not.toMatch(/_PLACEHOLDER/);
  });
});
