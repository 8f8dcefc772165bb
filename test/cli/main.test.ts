import {describe, expect, it} from 'vitest';
import {readFileSync} from 'node:fs';
import {runCli} from '../../src/cli/main.js';
import {memoryIo} from '../../src/cli/io.js';
import {VERSION} from '../../src/version.js';

describe('cli entry', () => {
  it('prints the version kept in step with package.json', async () => {
    const pkg = JSON.parse(readFileSync(new URL('../../package.json', import.meta.url), 'utf8')) as {version: string};
    expect(VERSION).toBe(pkg.version);
    const io = memoryIo();
    expect(await runCli(['--version'], io)).toBe(0);
    expect(io.stdout().trim()).toBe(pkg.version);
  });
  it('prints help with the commands, exit codes and cautions', async () => {
    const io = memoryIo();
    expect(await runCli(['--help'], io)).toBe(0);
    expect(io.stdout()).toMatch(/check/);
    expect(io.stdout()).toMatch(/Exit codes/);
    expect(io.stdout()).toMatch(/qualified person/);
  });
  it('ends every command help with the cautions', async () => {
    const {COMMANDS} = await import('../../src/cli/commands/index.js');
    for (const c of COMMANDS) {
      const io = memoryIo();
      expect(await runCli([c.name, '--help'], io)).toBe(0);
      expect(io.stdout(), c.name).toMatch(/qualified person's sign-off/);
      for (const line of io.stdout().split('\n')) expect(line.length, `${c.name}: ${line}`).toBeLessThanOrEqual(80);
    }
    const top = memoryIo();
    await runCli(['--help'], top);
    for (const line of top.stdout().split('\n')) expect(line.length, line).toBeLessThanOrEqual(80);
  });
  it('rejects an unknown command with exit 2 and a hint', async () => {
    const io = memoryIo();
    expect(await runCli(['chek'], io)).toBe(2);
    expect(io.stderr()).toMatch(/unknown command "chek".*check/);
  });
});
