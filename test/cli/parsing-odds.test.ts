/** Parsing odds of issue 15: options given twice or with a value they do not take, --version extra, odd numbers. */
import {describe, expect, it} from 'vitest';
import {runCli} from '../../src/cli/main.js';
import {memoryIo} from '../../src/cli/io.js';
import {bareFractionInSi, parseDecimal} from '../../src/core/number-text.js';
import {parseThread} from '../../src/core/threads/index.js';

async function run(...args: string[]) {
  const io = memoryIo();
  const code = await runCli(args, io);
  return {code, out: io.stdout(), err: io.stderr()};
}

describe('option shapes', () => {
  it('a repeated option is refused, naming it', async () => {
    const r = await run('check', '--thread', 'M10', '--parent', 'S355', '--engage', '15', '--engage', '20');
    expect(r.code).toBe(2);
    expect(r.err).toBe('tapwright: --engage is given more than once; give it once\n');
  });

  it('--json=x gives our message, not the parser\'s', async () => {
    const r = await run('threads', 'M10', '--json=x');
    expect(r.code).toBe(2);
    expect(r.err).toBe('tapwright: --json takes no value; write --json alone (got "--json=x")\n');
  });

  it('--version takes nothing after it', async () => {
    const r = await run('--version', 'extra');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/--version takes nothing after it; got "extra"/);
    expect((await run('--version')).code).toBe(0);
  });
});

describe('numbers', () => {
  it('threads "1/4-1e308 UNC" is refused, never read as 1 thread per inch', () => {
    const r = parseThread('1/4-1e308 UNC');
    expect(r.ok).toBe(false);
    expect(JSON.stringify(r)).not.toMatch(/threads per inch 1 /);
    expect(parseThread('1/4-20 UNC').ok).toBe(true);
    expect(parseThread('1/4-20UNC-2A').ok).toBe(true);
  });

  it('a count must be decimal: 0x2, 0b10, 0o7, Infinity and empty are not numbers', () => {
    for (const t of ['0x2', '0b10', '0o7', 'Infinity', '', ' ', '1e999', '2 3']) expect([t, parseDecimal(t)]).toEqual([t, undefined]);
    expect([parseDecimal('2'), parseDecimal(' -0.5 '), parseDecimal('1.5e1'), parseDecimal('.5')]).toEqual([2, -0.5, 15, 0.5]);
  });

  it('a bare fraction in SI is refused with what to write; with a unit, or in US units, it is not', () => {
    expect(bareFractionInSi('15/2', 'si')).toBe('15/2: a fraction is read as inches; write 7.5 (mm) or 15/2in');
    expect(bareFractionInSi('1 1/2', 'si')).toMatch(/^1 1\/2: a fraction is read as inches; write 1\.5 \(mm\) or 1 1\/2in$/);
    expect(bareFractionInSi('15/2in', 'si')).toBeUndefined();
    expect(bareFractionInSi('15/2', 'us')).toBeUndefined();
    expect(bareFractionInSi('7.5', 'si')).toBeUndefined();
  });
});
