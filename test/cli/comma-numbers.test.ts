import {describe, expect, it} from 'vitest';
import {runCli} from '../../src/cli/main.js';
import {memoryIo} from '../../src/cli/io.js';

async function check(args: string[]) {
  const io = memoryIo({env: {}});
  const code = await runCli(['check', '--thread', 'M10', '--parent', 'S355', '--engage', '15', ...args], io);
  return {code, out: io.stdout(), err: io.stderr()};
}

// ISO 80000-1:2009 clause 7.3.2 and NIST SP 811 (2008) section 10.5.3 (from memory): digits are
// grouped with a space, never a comma; the decimal sign may be a comma. "5,000lbf" is therefore
// ambiguous (5000 or 5.0 lbf): the command refuses it, naming the option and both readings.
describe('check: a comma in a number is refused, never read', () => {
  it('--service-load 5,000lbf: exit 2 naming the option and both readings', async () => {
    const r = await check(['--service-load', '5,000lbf']);
    expect(r.code).toBe(2);
    expect(r.out).toBe('');
    expect(r.err).toContain('--service-load');
    expect(r.err).toContain('write 5000 or 5.0');
  });
  it('--preload 23,780lbf: exit 2 naming the option and both readings', async () => {
    const r = await check(['--preload', '23,780lbf']);
    expect(r.code).toBe(2);
    expect(r.err).toContain('--preload');
    expect(r.err).toContain('write 23780 or 23.78');
  });
  it('a comma in a friction range is refused as well', async () => {
    const r = await check(['--mu-thread', '0,10..0,16']);
    expect(r.code).toBe(2);
    expect(r.err).toContain('--mu-thread');
  });
  it('the same numbers without commas are read as written', async () => {
    const r = await check(['--service-load', '5000lbf', '--json']);
    expect(r.code === 0 || r.code === 3).toBe(true);
    expect(r.err).toBe('');
  });
});
