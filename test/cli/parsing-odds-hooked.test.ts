/**
 * Parsing odds of issue 15 item 13, through the real commands: a count is written in
 * decimal, a bare fraction in SI is refused with both readings, and nut wear cannot
 * exceed the nut thread. Input hygiene rules: common practice, no source.
 */
import {describe, expect, it} from 'vitest';
import {runCli} from '../../src/cli/main.js';
import {memoryIo} from '../../src/cli/io.js';

const run = async (args: string[]) => {
  const io = memoryIo({env: {TAPWRIGHT_CONFIG_DIR: '/nonexistent-tapwright-test'}});
  const code = await runCli(args, io);
  return {code, out: io.stdout(), err: io.stderr()};
};
const SCREW = ['screw', '--thread', 'Tr24x5', '--load', '4kN', '--nut-length', '30'];

describe('parsing odds, hooked up', () => {
  it('--starts 0x2 and 0b10 are refused; 2 is accepted', async () => {
    for (const s of ['0x2', '0b10']) {
      const r = await run([...SCREW, '--starts', s]);
      expect(r.code).toBe(2);
      expect(r.err).toMatch(/--starts is .*; accepted: a whole number 1 to 8/);
    }
    expect((await run([...SCREW, '--starts', '2'])).code).not.toBe(2);
  });
  it('a bare fraction in SI is refused with both readings; with its unit or in US units it is inches', async () => {
    const base = ['check', '--thread', 'M10', '--parent', 'S355'];
    const r = await run([...base, '--engage', '15/2']);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/--engage 15\/2: a fraction is read as inches; write 7\.5 \(mm\) or 15\/2in/);
    expect((await run([...base, '--engage', '1/2in', '--json'])).code).not.toBe(2);
    const us = await run([...base, '--engage', '1/2', '--units', 'us', '--json']);
    expect(us.code).not.toBe(2);
    expect((JSON.parse(us.out) as {input: {engagement: number}}).input.engagement).toBeCloseTo(12.7, 6);
  });
  it('--nut-wear of the whole nut thread or more is refused, naming the option', async () => {
    const r = await run([...SCREW, '--nut-wear', '4']);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/--nut-wear.*no thread would be left/);
    expect((await run([...SCREW, '--nut-wear', '0.5'])).code).not.toBe(2);
  });
});
