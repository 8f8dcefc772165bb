import {describe, expect, it} from 'vitest';
import {mkdtempSync} from 'node:fs';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {runCli} from '../../src/cli/main.js';
import {memoryIo} from '../../src/cli/io.js';

// The same output options and wording in every command (review finding); no engineering values.

const CONFIG = mkdtempSync(path.join(tmpdir(), 'tw-options-'));
async function run(...args: string[]) {
  const io = memoryIo({env: {TAPWRIGHT_CONFIG_DIR: CONFIG}});
  const code = await runCli(args, io);
  return {code, out: io.stdout(), err: io.stderr()};
}

describe('--format, --json, --ascii and --units across commands', () => {
  it('threads and materials take --format json as --json does (was: unknown option --format)', async () => {
    for (const cmd of [['threads', 'M10'], ['materials', '--kind', 'nut']]) {
      const a = await run(...cmd, '--json');
      const b = await run(...cmd, '--format', 'json');
      expect(b.code).toBe(0);
      expect(b.out).toBe(a.out);
      expect((await run(...cmd, '--format', 'text')).out).toBe((await run(...cmd)).out);
    }
  });

  it('a format a command does not have names the ones it has', async () => {
    const t = await run('threads', 'M10', '--format', 'markdown');
    expect(t.code).toBe(2);
    expect(t.err).toMatch(/--format is "markdown"; accepted: text, json/);
    const m = await run('materials', '--format', 'html');
    expect(m.err).toMatch(/--format is "html"; accepted: text, json/);
  });

  it('--json with another --format is a contradiction in threads, materials and repair (repair took --json silently)', async () => {
    for (const cmd of [['threads', 'M10'], ['materials'], ['repair', '--thread', 'M8', '--parent', 'AlSi7Mg-T6', '--engage', '8']]) {
      const r = await run(...cmd, '--json', '--format', 'text');
      expect(r.code, cmd.join(' ')).toBe(2);
      expect(r.err).toMatch(/--json and --format text contradict each other; give one/);
    }
  });

  it('threads --ascii prints plain ASCII', async () => {
    const r = await run('threads', 'M10x1.1', '--ascii');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/mm\^2/);
    expect(r.out).not.toMatch(/[^\x09\x0a\x0d\x20-\x7e]/);
  });

  it('--units wording is the same everywhere', async () => {
    for (const cmd of [['threads', 'M10'], ['materials'], ['repair', '--thread', 'M8', '--parent', 'AlSi7Mg-T6', '--engage', '8'], ['check', '--thread', 'M8', '--parent', 'AlSi7Mg-T6', '--engage', '8']]) {
      const r = await run(...cmd, '--units', 'metric');
      expect(r.code).toBe(2);
      expect(r.err, cmd[0]).toMatch(/^tapwright: --units is "metric"; accepted: si, us\n$/);
    }
  });
});
