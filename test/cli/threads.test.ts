import {describe, expect, it} from 'vitest';
import {runCli} from '../../src/cli/main.js';
import {memoryIo} from '../../src/cli/io.js';

async function run(...args: string[]) {
  const io = memoryIo();
  const code = await runCli(['threads', ...args], io);
  return {code, out: io.stdout(), err: io.stderr()};
}

describe('tapwright threads', () => {
  it('JSON carries the contract keys, in SI, for a metric thread', async () => {
    const r = await run('M10x1.5-6H/6g', '--json', '--units', 'us');
    expect(r.code).toBe(0);
    expect(r.err).toBe('');
    const j = JSON.parse(r.out);
    const g = j.geometry;
    expect(g.nominal).toBe(10);
    expect(g.pitch).toBe(1.5);
    expect(g.pitchDiameter).toBeCloseTo(9.026, 3);
    expect(g.minorDiameterExternal).toBeCloseTo(8.160, 3);
    expect(g.minorDiameterInternal).toBeCloseTo(8.376, 3);
    // ISO 898-1:2013 ultimate-load table, As,nom for M10: 58.0 mm²
    expect(g.stressArea).toBeCloseTo(58.0, 1);
    // ISO 965-2:1998 6g/6H limits (DIN 13-20), M10: 6g d 9.968/9.732, d2 8.994/8.862;
    // 6H D1 8.376/8.676, D2 9.026/9.206, D min 10
    expect(g.limits.external).toMatchObject({majorMax: 9.968, majorMin: 9.732, pitchMax: 8.994, pitchMin: 8.862});
    expect(g.limits.internal).toMatchObject({minorMin: 8.376, minorMax: 8.676, pitchMin: 9.026, pitchMax: 9.206, majorMin: 10});
    expect(g.limitsProvenance.method).toBe('table');
  });

  it('unified JSON uses the same keys in mm', async () => {
    const r = await run('1/4-20 UNC-2A', '--json');
    expect(r.code).toBe(0);
    const g = JSON.parse(r.out).geometry;
    expect(g.nominal).toBeCloseTo(6.35, 10);
    // ASME B1.1 limits, 1/4-20 UNC-2B (published UNC 2B table): D2 0.2175/0.2224 in, D1 0.196/0.207 in
    expect(g.limits.internal.pitchMax).toBeCloseTo(0.2224 * 25.4, 6);
    expect(g.limits.internal.minorMin).toBeCloseTo(0.196 * 25.4, 6);
    for (const k of ['majorMax', 'majorMin', 'pitchMax', 'pitchMin']) expect(typeof g.limits.external[k]).toBe('number');
    for (const k of ['minorMin', 'minorMax', 'pitchMin', 'pitchMax', 'majorMin']) expect(typeof g.limits.internal[k]).toBe('number');
    // Shigley 9th ed. Table 8-2: 1/4-20 UNC At = 0.0318 in²
    expect(g.stressArea / 645.16).toBeCloseTo(0.0318, 4);
  });

  it('text fits 80 columns and puts a unit on every number (SI)', async () => {
    const r = await run('M12');
    expect(r.code).toBe(0);
    const lines = r.out.split('\n');
    for (const l of lines) expect(l.length).toBeLessThanOrEqual(80);
    expect(r.out).toMatch(/M12x1\.75-6H\/6g/);
    expect(r.out).toMatch(/11\.966 mm\s+11\.701 mm/);
    expect(r.out).toMatch(/84\.27 mm²/);
    expect(r.out).toMatch(/Estimates only/);
    // every decimal number in the geometry and limits lines carries a unit
    for (const l of lines.filter(x => /^\s+(nominal|pitch|minor|major|external|internal|fundamental|tensile)/.test(x))) {
      for (const m of l.matchAll(/\d+\.\d+(\S*\s*\S*)/g)) expect(m[1]).toMatch(/^\s?(mm|mm²|in|in²)\b|^ (mm|in)/);
    }
  });

  it('--units us shows inches', async () => {
    const r = await run('1/4-20', 'UNC-2A', '--units', 'us');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/0\.2489 in\s+0\.2408 in/);
    expect(r.out).toMatch(/0\.2224 in\s+0\.2175 in/);
    expect(r.out).toMatch(/in²/);
    expect(r.out).not.toMatch(/ mm/);
    for (const l of r.out.split('\n')) expect(l.length).toBeLessThanOrEqual(80);
  });

  it('--json labels unified limits table or formula by what the table data holds', async () => {
    // ASME B1.1 standard series limits table rows (src/core/threads/unified-table-data.ts):
    // 3-48 UNC has 2A and 2B rows, 1/4-20 UNC a 2B row only, 5/16-24 UNF none
    const full = JSON.parse((await run('#3-48 UNC', '--json')).out).geometry;
    expect(full.limitsProvenance).toMatchObject({method: 'table', source: 'ASME B1.1 standard series limits table'});
    expect(full.limits.internal.pitchMax).toBeCloseTo(0.0885 * 25.4, 6);
    const half = JSON.parse((await run('1/4-20 UNC-2A/2B', '--json')).out).geometry;
    expect(half.limitsProvenance.method).toBe('formula');
    expect(half.limitsProvenance.source).toMatch(/table for one side/);
    expect(half.notes.join(' ')).toMatch(/Class 2B limits read from the ASME B1\.1 standard series limits table; class 2A computed/);
    const none = JSON.parse((await run('5/16-24 UNF', '--json')).out).geometry;
    expect(none.limitsProvenance.method).toBe('formula');
    expect(none.limitsProvenance.source).not.toMatch(/limits table/);
    expect(none.notes.join(' ')).toMatch(/not read from the ASME B1\.1 tables/);
  });

  it('--json says per side where the limits come from, keeping the overall method and source', async () => {
    const geometryOf = async (t: string) => JSON.parse((await run(t, '--json')).out).geometry;
    const sides = (g: {limits: Record<'external' | 'internal', {method: string; source: string}>}) => ({
      external: g.limits.external.method,
      internal: g.limits.internal.method,
    });
    // Metric: ISO 965-1:1998 tables for 6H and 6g (the values agree with the ISO 965-2 limits, M10 above)
    const m = await geometryOf('M10x1.5-6H/6g');
    expect(sides(m)).toEqual({external: 'table', internal: 'table'});
    expect(m.limits.external.source).toMatch(/^ISO 965-1:1998 tables .*class 6g.*ISO 965-2/);
    expect(m.limits.internal.source).toMatch(/^ISO 965-1:1998 tables .*class 6H.*ISO 965-2/);
    expect(m.limits.external.majorMax).toBe(9.968);
    expect(m.limitsProvenance.method).toBe('table');
    // Unified, both sides in the ASME B1.1 standard series limits table (unified-table-data.ts:
    // 2-56 UNC and 3-48 UNC 2A and 2B rows)
    for (const t of ['#2-56 UNC', '#3-48 UNC-2A/2B']) {
      const u = await geometryOf(t);
      expect(sides(u), t).toEqual({external: 'table', internal: 'table'});
      expect(u.limits.external.source, t).toBe('ASME B1.1 standard series limits table, class 2A');
      expect(u.limits.internal.source, t).toBe('ASME B1.1 standard series limits table, class 2B');
      expect(u.limitsProvenance.method, t).toBe('table');
    }
    // 1/4-20 UNC: class 2B row in the table (D2 max 0.2224 in), class 2A from the formulas
    const half = await geometryOf('1/4-20 UNC');
    expect(sides(half)).toEqual({external: 'formula', internal: 'table'});
    expect(half.limits.internal.source).toBe('ASME B1.1 standard series limits table, class 2B');
    expect(half.limits.external.source).toMatch(/^ASME B1\.1 tolerance formulas \(from memory\) for class 2A: .*labelled fallback/);
    expect(half.limits.internal.pitchMax).toBeCloseTo(0.2224 * 25.4, 6);
    // the overall method keeps its meaning: 'table' only when both sides are
    expect(half.limitsProvenance.method).toBe('formula');
    expect(half.limitsProvenance.source).toMatch(/table for one side/);
    // Special threads: formulas on both sides
    const special = await geometryOf('M10x1.3');
    expect(sides(special)).toEqual({external: 'formula', internal: 'formula'});
    expect(special.limits.external.source).toMatch(/^ISO 965-1 generating formulas .*labelled fallback/);
    expect(special.limits.internal.source).toMatch(/^ISO 965-1 generating formulas .*labelled fallback/);
    const unJson = JSON.parse((await run('1/4-24 UN', '--json')).out);
    expect(unJson.spec.isStandardPitch).toBe(false);
    const un = unJson.geometry;
    expect(sides(un)).toEqual({external: 'formula', internal: 'formula'});
    expect(un.limits.internal.source).toMatch(/^ASME B1\.1 tolerance formulas \(from memory\) for class 2B: .*labelled fallback/);
    // the contract keys are all still numbers
    for (const g of [m, half, special, un]) {
      for (const k of ['majorMax', 'majorMin', 'pitchMax', 'pitchMin']) expect(typeof g.limits.external[k]).toBe('number');
      for (const k of ['minorMin', 'minorMax', 'pitchMin', 'pitchMax', 'majorMin']) expect(typeof g.limits.internal[k]).toBe('number');
    }
  });

  it('text says per side which limits are table values and which come from the formulas', async () => {
    const r = await run('1/4-20 UNC', '--units', 'us');
    expect(r.code).toBe(0);
    expect(r.out).toContain('Limits of size: 2B from the table, 2A from formulas (fallback).');
    expect(r.out).toContain('  internal 2B [table]: ASME B1.1 standard series limits table, class 2B');
    expect(r.out).toMatch(/^ {2}external 2A \[formula\]: ASME B1\.1 tolerance formulas/m);
    for (const l of r.out.split('\n')) expect(l.length).toBeLessThanOrEqual(80);
    const m = await run('M10x1.5-7H/6g');
    expect(m.out).toContain('Limits of size: 7H from the table (from memory), 6g from the table.');
    const both = await run('#2-56 UNC');
    expect(both.out).toContain('Limits of size: 2B and 2A from the table.');
  });

  it('a special thread says so and labels the formula limits', async () => {
    const r = await run('M10x1.3');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/special/i);
    expect(r.out).toMatch(/\[formula\]/);
  });

  it('power-screw designations print their basic data and point to tapwright screw', async () => {
    const r = await run('Tr40x14(P7)');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/14\.000 mm\s+2 starts/);
    expect(r.out).toMatch(/tapwright screw/);
    const j = JSON.parse((await run('1-5 ACME-2G', '--json')).out);
    expect(j.spec.family).toBe('acme');
    expect(j.geometry).toBeNull();
  });

  it('bad input: message on stderr naming what is wrong, exit 2, no stack trace', async () => {
    const bad = await run('M10x1.5-6q');
    expect(bad.code).toBe(2);
    expect(bad.out).toBe('');
    expect(bad.err).toMatch(/position "q".*accepted/);
    expect(bad.err).toMatch(/nearest valid designations: M10x1\.5-6H\/6g/);
    expect(bad.err).not.toMatch(/\bat .*\.ts:\d+/);

    const none = await run();
    expect(none.code).toBe(2);
    expect(none.err).toMatch(/needs a designation/);

    const units = await run('M10', '--units', 'imperial');
    expect(units.code).toBe(2);
    expect(units.err).toMatch(/--units.*accepted: si, us/);

    const opt = await run('M10', '--metric');
    expect(opt.code).toBe(2);
    expect(opt.err).toMatch(/unknown option --metric/);

    const wrong = await run('1/4-28 UNC');
    expect(wrong.code).toBe(2);
    expect(wrong.err).toMatch(/20 threads per inch.*1\/4-20 UNC/s);
  });

  it('--help describes the designations and options', async () => {
    const io = memoryIo();
    expect(await runCli(['threads', '--help'], io)).toBe(0);
    expect(io.stdout()).toMatch(/--units/);
    expect(io.stdout()).toMatch(/Tr40x14\(P7\)/);
    for (const l of io.stdout().split('\n')) expect(l.length).toBeLessThanOrEqual(80);
  });
});
