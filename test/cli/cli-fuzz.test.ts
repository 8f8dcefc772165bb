/**
 * Every command through the CLI entry in a child process with random and hostile
 * arguments, a few runs (npm run fuzz runs thousands): exit 0, 2 or 3, JSON on
 * stdout for --json, no stack trace and no raw control character on stderr.
 */
import {afterAll, beforeAll, describe, expect, it} from 'vitest';
// @ts-expect-error plain .mjs support file without types
import {bundle} from '../../scripts/fuzz-support/bundle-entry.mjs';
// @ts-expect-error plain .mjs support file without types
import {fuzzCli, runOnce} from '../../scripts/fuzz-support/cli-fuzz.mjs';

let entry: {file: string; cleanup: () => void};
beforeAll(async () => {
  entry = await bundle();
}, 120_000);
afterAll(() => entry?.cleanup());

describe('CLI fuzz (small)', () => {
  it('hostile arguments the issue names: escaped, short, our messages', async () => {
    const env = {PATH: process.env.PATH ?? '', TAPWRIGHT_CONFIG_DIR: '/nonexistent-tapwright-fuzz', TAPWRIGHT_CODE_CACHE: 'off'};
    for (const args of [['presets', 'show', `\u001b[31m${'A'.repeat(100_000)}`], ['threads', 'M10', '--json=x'], ['--version', 'extra']]) {
      const r = (await runOnce(entry.file, args, env)) as {code: number; broke?: string};
      expect([args[0], r.code, r.broke]).toEqual([args[0], 2, undefined]);
    }
  }, 120_000);

  it('random commands keep the invariants', async () => {
    const r = (await fuzzCli({entry: entry.file, runs: 8, seed: 15})) as {byCode: Record<string, number>; failures: unknown[]};
    expect(r.failures).toEqual([]);
    console.info(`CLI fuzz (small): by exit code ${JSON.stringify(r.byCode)}`);
  }, 300_000);
});
