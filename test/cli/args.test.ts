import {describe, expect, it} from 'vitest';
import {joinNegativeValues, parseOptions, quantity} from '../../src/cli/args.js';
import {UsageError} from '../../src/cli/io.js';
import {runCli} from '../../src/cli/main.js';
import {memoryIo} from '../../src/cli/io.js';

// Option parsing only: no engineering values here.

function usage(f: () => unknown): UsageError {
  try {
    f();
  } catch (e) {
    if (e instanceof UsageError) return e;
    throw e;
  }
  throw new Error('no UsageError');
}

describe('parseOptions', () => {
  const spec = {load: {type: 'string' as const}, json: {type: 'boolean' as const}};

  it('reads "--load -5" as the value -5, so the range check names the option (was the parser\'s "argument is ambiguous")', () => {
    expect(joinNegativeValues(['--load', '-5', '--json'], spec)).toEqual(['--load=-5', '--json']);
    expect(joinNegativeValues(['--json', '-5'], spec)).toEqual(['--json', '-5']);
    expect(parseOptions(['--load', '-5'], spec, false).values.load).toBe('-5');
  });

  it('a missing value names the option', () => {
    const e = usage(() => parseOptions(['--load'], spec, false));
    expect(e.message).toBe('--load needs a value');
    expect(e.option).toBe('--load');
  });

  it('tapwright screw --load -5: a one-line message with the accepted range, exit 2', async () => {
    const io = memoryIo();
    const code = await runCli(['screw', '--thread', 'Tr24x5', '--load', '-5', '--nut-length', '30'], io);
    expect(code).toBe(2);
    expect(io.stderr()).toMatch(/^tapwright: --load is -5, out of range; accepted: /);
    expect(io.stderr()).not.toMatch(/ambiguous|XYZ/);
  });
});

describe('quantity', () => {
  it('a wrong unit lists the units once and the range once', () => {
    const e = usage(() => quantity('--engage', '5kg', 'length', {min: 0.5, max: 1000, defaultUnit: 'mm', rangeText: '0.5 mm to 1000 mm'}));
    expect(e.message).toMatch(/^--engage unit "kg" is not a length unit \(units: mm, .*\); accepted: 0\.5 mm to 1000 mm$/);
    expect(e.message.match(/accepted/g)).toHaveLength(1);
    expect(e.message.match(/units:/g)).toHaveLength(1);
  });

  it('junk gets the range and the units', () => {
    const e = usage(() => quantity('--engage', 'abc', 'length', {min: 0.5, max: 1000, defaultUnit: 'mm', rangeText: '0.5 mm to 1000 mm'}));
    expect(e.message).toMatch(/^--engage "abc" is not a number; accepted: 0\.5 mm to 1000 mm \(units: mm, /);
  });
});
