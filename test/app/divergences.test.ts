/**
 * The command line and the workbench used to read the same joint differently;
 * each case here failed before the one field table and resolver (src/app).
 */
import {describe, expect, it} from 'vitest';
import {readFileSync, readdirSync, statSync} from 'node:fs';
import path from 'node:path';
import {cliInTempStore} from '../support/cli-in-temp-store.js';
import {evaluate, evaluateScrew} from '../../src/ui/state/evaluate.js';
import {realServices} from '../../src/ui/real-services.js';
import {nutDimensions} from '../../src/core/materials/index.js';
import {CONVERSION} from '../../src/core/units.js';
import type {FormValues} from '../../src/ui/state/fields.js';

const NUT_M10: FormValues = {joint: {thread: 'M10', internal: 'nut', nutClass: '8'}, hole: {}};

function workbench(dir: string) {
  return realServices({configDir: dir, cwd: dir, now: () => new Date('2026-01-01T00:00:00Z')});
}

describe('one joint, one answer', () => {
  it('the settings scatter reaches check and the workbench alike', async () => {
    const {dir, run} = cliInTempStore('tw-div-scatter');
    expect((await run('settings', 'set', 'scatter', '1.5')).code).toBe(0);
    const cli = JSON.parse((await run('check', '--thread', 'M10', '--parent', 'S355', '--engage', '15', '--json')).out);
    expect(cli.input.scatter).toBe(1.5);
    const ev = evaluate({joint: {thread: 'M10', parent: 'S355', engagement: 15}, hole: {}}, workbench(dir), 'si', true);
    expect(ev.errors).toEqual({});
    expect(ev.input?.scatter).toBe(1.5);
  });

  it('a nut without an engaged length engages over its height, in check and in the workbench', async () => {
    const {dir, run} = cliInTempStore('tw-div-nut');
    const height = nutDimensions(10)!.heightMin;
    const cli = JSON.parse((await run('check', '--thread', 'M10', '--nut', '8', '--json')).out);
    expect(cli.input.engagement).toBeCloseTo(height, 9);
    const ev = evaluate(NUT_M10, workbench(dir), 'si', true);
    expect(ev.errors).toEqual({});
    expect(ev.input?.engagement).toBeCloseTo(height, 9);
    expect(ev.result?.tightening.preload.nominal).toBeCloseTo(cli.tightening.preload.nominal, 6);
  });

  it('--units takes si or us in any case, in every command', async () => {
    const {run} = cliInTempStore('tw-div-units');
    for (const args of [
      ['check', '--thread', 'M10', '--parent', 'S355', '--engage', '15'],
      ['repair', '--thread', 'M8', '--parent', 'AlSi7Mg-T6', '--engage', '8'],
      ['screw', '--thread', 'Tr24x5', '--load', '1000', '--nut-length', '1.5'],
      ['threads', 'M10'],
    ]) {
      const r = await run(...args, '--units', 'US');
      expect(r.err, args[0]).toBe('');
      expect([0, 3], args[0]).toContain(r.code);
    }
  });

  it('screw --units us reads bare numbers in lbf and in (as every command)', async () => {
    const {run} = cliInTempStore('tw-div-screw');
    const r = await run('screw', '--units', 'us', '--thread', 'Tr24x5', '--load', '2000', '--nut-length', '1.5', '--json');
    expect(r.err).toBe('');
    const j = JSON.parse(r.out);
    expect(j.input.load).toBeCloseTo(2000 * CONVERSION.LBF_N, 6);
    expect(j.input.nutLength).toBeCloseTo(1.5 * CONVERSION.IN_MM, 9);
  });

  it('the workbench screw and screw agree on the same inputs', async () => {
    const {dir, run} = cliInTempStore('tw-div-screw2');
    const j = JSON.parse((await run('screw', '--thread', 'Tr24x5', '--load', '2000', '--nut-length', '40', '--json')).out);
    const ev = evaluateScrew({joint: {}, hole: {}, screw: {thread: 'Tr24x5', load: 2000, nutLength: 40}}, workbench(dir), 'si', true);
    expect(ev.input).toMatchObject({load: 2000, nutLength: 40});
    expect(ev.result?.torque.raise).toBeCloseTo(j.torque.raise, 9);
  });
});

const SRC = path.resolve(__dirname, '../../src');
function sources(dir: string): string[] {
  return readdirSync(dir).flatMap(f => {
    const p = path.join(dir, f);
    return statSync(p).isDirectory() ? sources(p) : /\.tsx?$/.test(f) ? [p] : [];
  });
}

describe('one of each', () => {
  const files = sources(SRC).map(f => ({f: path.relative(SRC, f), text: readFileSync(f, 'utf8')}));

  it('one joinNegativeValues, run once by parseOptions (no command calls it again)', () => {
    expect(files.filter(x => /function joinNegativeValues/.test(x.text)).map(x => x.f)).toEqual(['cli/args.ts']);
    expect(files.filter(x => x.f !== 'cli/args.ts' && /joinNegativeValues\(/.test(x.text)).map(x => x.f)).toEqual([]);
  });

  it('one --units parser', () => {
    const parsers = files.filter(x => /!== 'si' && \w+ !== 'us'/.test(x.text)).map(x => x.f);
    expect(parsers).toEqual(['app/units-option.ts']);
  });

  it('ranges are read from the schemas in one place, through z.toJSONSchema, never from zod internals', () => {
    expect(files.filter(x => /minValue|maxValue|\.unwrap\(|\.def\b/.test(x.text)).map(x => x.f)).toEqual([]);
    expect(files.filter(x => /toJSONSchema\(/.test(x.text)).map(x => x.f)).toEqual(['app/field-table.ts']);
  });

  it('no guess from a message back to a field', () => {
    expect(files.filter(x => /fieldOfError/.test(x.text)).map(x => x.f)).toEqual([]);
  });

  it('the store and the workbench do not import from the command line', () => {
    const bad = files.filter(x => /^(store|ui)\//.test(x.f) && /from '(\.\.\/)+cli\//.test(x.text)).map(x => x.f);
    expect(bad).toEqual([]);
  });
});
