import {describe, expect, it} from 'vitest';
import {mkdtempSync} from 'node:fs';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {runCli} from '../../src/cli/main.js';
import {memoryIo} from '../../src/cli/io.js';
import {ScrewInputSchema} from '../../src/core/screw/index.js';
import {screwBacklash} from '../../src/core/screw/backlash.js';
import {checkScrew} from '../../src/core/screw/index.js';
import {screwMarkdown} from '../../src/report/screw-markdown.js';

// Demo scenario (invented): the Tr24x5 lead screw of a press table in a 40 mm bronze nut, 20 kN;
// 0.1 mm play when new, 0.6 mm measured at the bench.
const CONFIG = mkdtempSync(path.join(tmpdir(), 'tw-screw-backlash-'));
async function run(...args: string[]) {
  const io = memoryIo({env: {TAPWRIGHT_CONFIG_DIR: CONFIG}});
  const code = await runCli(['screw', ...args], io);
  return {code, out: io.stdout(), err: io.stderr()};
}
const PRESS = ['--thread', 'Tr24x5', '--load', '20kN', '--nut-length', '40', '--nut-material', 'bronze'];
const INPUT = ScrewInputSchema.parse({thread: 'Tr24x5', load: 20000, nutLength: 40, nutMaterial: 'bronze'});

describe('screw --backlash --backlash-new', () => {
  it('JSON backlash: the wear fed to the nut, the margin left and the replace-by value (same model as screwBacklash)', async () => {
    const r = await run(...PRESS, '--backlash', '0.6', '--backlash-new', '0.1', '--json');
    expect(r.err).toBe('');
    const j = JSON.parse(r.out);
    const b = screwBacklash(INPUT, 0.6, 0.1, 2);
    expect(j.backlash.measured).toBe(0.6);
    expect(j.backlash.new).toBe(0.1);
    expect(j.backlash.axialWear).toBeCloseTo(0.5, 12);
    expect(j.backlash.flankWear).toBeCloseTo(0.5 * Math.cos((15 * Math.PI) / 180), 12);
    expect(j.backlash.requiredMargin).toBe(2);
    expect(j.backlash.replaceBy).toBeCloseTo(b.replaceBy as number, 9);
    expect(j.backlash.marginLeft).toBeCloseTo(b.margin, 9);
    // The wear takes the place of the nut-wear input: the same nut force as --nut-wear 0.5.
    const direct = JSON.parse((await run(...PRESS, '--nut-wear', '0.5', '--json')).out);
    expect(j.nut.stripping.nutForce).toBeCloseTo(direct.nut.stripping.nutForce, 6);
    expect(j.notes.join(' ')).toMatch(/nut wear 0\.500 mm worked out from the measured backlash/);
  });

  it('at the replace-by backlash the nut keeps exactly the margin asked for (--backlash-margin)', async () => {
    const first = JSON.parse((await run(...PRESS, '--backlash', '0.1', '--backlash-new', '0.1', '--backlash-margin', '3', '--json')).out);
    expect(first.backlash.replaceNow).toBe(false);
    const at = JSON.parse((await run(...PRESS, '--backlash', String(first.backlash.replaceBy), '--backlash-new', '0.1', '--backlash-margin', '3', '--json')).out);
    expect(at.nut.stripping.nutForce / 20000).toBeCloseTo(3, 4);
    expect(at.backlash.replaceNow).toBe(true);
    expect(at.flags.map((f: {code: string}) => f.code)).toContain('nut-replace');
  });

  it('text: a Backlash block with the wear, the margin left and the replace-by value', async () => {
    const r = await run(...PRESS, '--backlash', '0.6', '--backlash-new', '0.1');
    expect(r.out).toMatch(/^Backlash +measured 0\.600 mm, new 0\.100 mm: nut wear 0\.500 mm axial/m);
    expect(r.out.replace(/\s+/g, ' ')).toMatch(/stripping margin left [\d.]+ x load \(to keep: 2\.00\); replace the nut at a backlash of [\d.]+ mm/);
    expect(Math.max(...r.out.split('\n').map(l => l.length))).toBeLessThanOrEqual(80);
  });

  it('Markdown work-order report: the backlash among the inputs and the Backlash rows in the results', () => {
    const input = {...INPUT, backlash: 0.6, backlashNew: 0.1};
    const md = screwMarkdown(checkScrew(input), input, {units: 'si'});
    expect(md).toMatch(/^\| Backlash \(measured, new\) \| 0\.600 mm, 0\.100 mm \|$/m);
    expect(md).toMatch(/^\| Backlash \| measured 0\.600 mm, new 0\.100 mm: nut wear 0\.500 mm axial .*replace the nut at a backlash of [\d.]+ mm \|$/m);
  });

  it('bare numbers follow --units us (inches)', async () => {
    const j = JSON.parse((await run(...PRESS, '--units', 'us', '--backlash', '0.024', '--backlash-new', '0.004', '--json')).out);
    expect(j.backlash.measured).toBeCloseTo(0.024 * 25.4, 9);
    expect(j.backlash.new).toBeCloseTo(0.004 * 25.4, 9);
  });

  it('screw --help lists the options', async () => {
    const h = (await run('--help')).out;
    for (const o of ['--backlash B', '--backlash-new B0', '--backlash-margin M']) expect(h).toContain(o);
  });
});

describe('screw backlash: bad input names the option (exit 2)', () => {
  const bad = async (...a: string[]) => {
    const r = await run(...PRESS, ...a);
    expect(r.code, a.join(' ')).toBe(2);
    expect(r.out).toBe('');
    return r.err;
  };
  it('one of the pair alone', async () => {
    expect(await bad('--backlash', '0.6')).toMatch(/^tapwright: --backlash-new is needed with the measured backlash/);
    expect(await bad('--backlash-new', '0.1')).toMatch(/^tapwright: --backlash is needed with the new-nut backlash/);
  });
  it('with --nut-wear: refused, the wear comes from the backlash', async () => {
    expect(await bad('--backlash', '0.6', '--backlash-new', '0.1', '--nut-wear', '0.3')).toMatch(/^tapwright: --nut-wear: .*leave the nut wear empty/);
  });
  it('below the new-nut play, through the thread, out of range, not a number', async () => {
    expect(await bad('--backlash', '0.05', '--backlash-new', '0.1')).toMatch(/^tapwright: --backlash: backlash 0\.05 mm is below the new-nut play/);
    expect(await bad('--backlash', '4', '--backlash-new', '0.1')).toMatch(/^tapwright: --backlash: .*whole thread thickness/);
    expect(await bad('--backlash', '60', '--backlash-new', '0.1')).toMatch(/--backlash.*accepted: 0 to 50 mm/);
    expect(await bad('--backlash', 'x', '--backlash-new', '0.1')).toMatch(/--backlash/);
    expect(await bad('--backlash', '0.6', '--backlash-new', '0.1', '--backlash-margin', '0.5')).toMatch(/--backlash-margin.*accepted: 1 to 20/);
  });
});
