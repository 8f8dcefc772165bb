/** With --json, a failure prints one JSON error document on stdout as well as the message on stderr. */
import {describe, expect, it} from 'vitest';
import {runCli, topHelp, wantsJson} from '../../src/cli/main.js';
import {memoryIo} from '../../src/cli/io.js';
import {CAUTION_LINES} from '../../src/core/cautions.js';

describe('JSON error document', () => {
  it('check --json with a bad option: exit 2, stderr message, stdout JSON naming the option', async () => {
    const io = memoryIo();
    const code = await runCli(['check', '--json', '--thread', 'M10x1.5-6H/6g', '--parent', 'S355', '--engage', '99999'], io);
    expect(code).toBe(2);
    expect(io.stderr()).toMatch(/^tapwright: --engage/);
    const doc = JSON.parse(io.stdout()) as {error: {message: string; option: string; exitCode: number}; cautions: string[]};
    expect(doc.error.option).toBe('--engage');
    expect(doc.error.exitCode).toBe(2);
    expect(doc.error.message).toMatch(/--engage/);
    expect(doc.cautions).toEqual([...CAUTION_LINES]);
  });
  it('--format json counts as JSON; text output keeps stdout empty on error', async () => {
    const io = memoryIo();
    await runCli(['screw', '--format', 'json', '--thread', 'Tr24x5'], io);
    expect(() => JSON.parse(io.stdout())).not.toThrow();
    const text = memoryIo();
    expect(await runCli(['check', '--thread', 'M10x1.5-6H/6g', '--parent', 'S355', '--engage', '99999'], text)).toBe(2);
    expect(text.stdout()).toBe('');
  });
  it('wantsJson reads the usual spellings', () => {
    expect(wantsJson(['--json'])).toBe(true);
    expect(wantsJson(['--format', 'json'])).toBe(true);
    expect(wantsJson(['--format=json'])).toBe(true);
    expect(wantsJson(['--format', 'text'])).toBe(false);
  });
  it('top-level help lists --units, --color and --no-color', () => {
    expect(topHelp()).toMatch(/--units si\|us/);
    expect(topHelp()).toMatch(/--color, --no-color/);
  });
});
