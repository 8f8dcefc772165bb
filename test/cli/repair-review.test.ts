import {describe, expect, it} from 'vitest';
import {mkdtempSync} from 'node:fs';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {runCli} from '../../src/cli/main.js';
import {memoryIo} from '../../src/cli/io.js';

// Findings of a CLI review of tapwright repair; wording and layout only, no engineering values.

const CONFIG = mkdtempSync(path.join(tmpdir(), 'tw-repair-review-'));

async function run(...args: string[]) {
  const io = memoryIo({env: {TAPWRIGHT_CONFIG_DIR: CONFIG}});
  const code = await runCli(['repair', ...args], io);
  return {code, out: io.stdout(), err: io.stderr()};
}

const CAST_M8 = ['--thread', 'M8', '--parent', 'AlSi7Mg-T6', '--engage', '8'];

describe('tapwright repair: review findings', () => {
  it('an unknown --through-nut class is bad input (exit 2) naming the option and the classes (was: a through-bolt "not computed")', async () => {
    const r = await run(...CAST_M8, '--through', '--through-nut', '99');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/^tapwright: --through-nut: unknown nut class "99"; accepted: .*\b8\b.*SAE-5/);
  });

  it('the heading of a nut joint names the nut (was "in parent Rm - MPa")', async () => {
    const r = await run('--thread', 'M10', '--nut', '8', '--engage', '8', '--stripped-depth', 'all');
    expect(r.out.split('\n')[0]).toMatch(/bolt 8\.8 with a class 8 nut/);
    expect(r.out).not.toMatch(/Rm - MPa/);
  });

  it('a custom parent and bolt are named in the display units (US: ksi, not MPa)', async () => {
    const r = await run('--thread', '3/8-16 UNC', '--parent-rm', '40ksi', '--bolt-rm', '150ksi', '--bolt-rp', '130ksi', '--engage', '0.5', '--units', 'us');
    const heading = r.out.split('\n').slice(0, 2).join(' ').replace(/\s+/g, ' ');
    expect(heading).toMatch(/bolt Rm 150 ksi, Rp0\.2 130 ksi given in parent Rm 40\.0 ksi/);
    expect(heading).not.toMatch(/MPa/);
  });

  it('--stripped-depth beyond the engagement is reported in the --units system', async () => {
    const r = await run('--thread', '3/8-16 UNC', '--parent', '6061-T6', '--engage', '0.5', '--stripped-depth', '0.6', '--units', 'us');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/--stripped-depth 0\.600 in is beyond the engaged length \(--engage 0\.500 in\)/);
  });

  it('depths read as depths, drills keep a decimal (was "Tap 9.0, drill 13.0 mm full diameter" and a drill "9")', async () => {
    const r = await run(...CAST_M8, '--stripped-depth', 'all');
    const flat = r.out.replace(/\n\s+/g, ' ');
    expect(flat).toMatch(/Tap [\d.]+ mm deep \(full thread\), drill [\d.]+ mm deep at full diameter\./);
    expect(flat).not.toMatch(/Tap [\d.]+, drill/);
    // The table's drill column: 9.0 for the M10x1 oversize tap drill and the 9 mm clearance hole.
    const drills = r.out.split('\n').filter(l => /^\s*\d+ E\d /.test(l)).map(l => l.slice(46, 51).trim());
    for (const d of drills) expect(d).toMatch(/^(-|\d+\.\d{1,2})$/);
    expect(r.out).toMatch(/Required margin 1\.00\./);
  });
});

describe('tapwright repair --units us: reasons and notes in inches, JSON in mm', () => {
  const job = ['--thread', '3/8-16 UNC', '--parent', '6061-T6', '--bolt', 'SAE-8', '--engage', '0.4in', '--stripped-depth', '0.2in', '--wall', '0.4in', '--depth-available', '0.8in', '--units', 'us'];
  it('text carries no mm figure', async () => {
    const r = await run(...job);
    expect(r.out).toMatch(/Note: stripped from the surface to 0\.200 in/);
    expect(r.out).not.toMatch(/\d mm\b/);
  });
  it('JSON keeps SI', async () => {
    const r = await run(...job, '--json');
    expect(r.out).toMatch(/stripped from the surface to 5\.08 mm/);
  });
});

describe('tapwright repair --format markdown: inputs in the report units', () => {
  it('custom strengths in ksi with --units us; a nut joint names its class', async () => {
    const r = await run('--thread', '3/8-16 UNC', '--parent-rm', '40ksi', '--bolt-rm', '150ksi', '--engage', '0.5', '--units', 'us', '--format', 'markdown');
    expect(r.out).toMatch(/\| Bolt \| custom: Rm 150 ksi given \(otherwise as grade 8\.8\) \|/);
    expect(r.out).toMatch(/\| Parent material \| custom, Rm 40\.0 ksi \|/);
    expect(r.out).toMatch(/\| Required margin \| 1\.00 \|/);
    const nut = await run('--thread', 'M10', '--nut', '8', '--engage', '8', '--format', 'markdown');
    expect(nut.out).toMatch(/\| Nut class \| 8 \|/);
    expect(nut.out).toMatch(/\| Bolt \| grade 8\.8 \|/);
  });
});

describe('tapwright repair --units us: core input errors in inches', () => {
  it('a chamfer longer than the engagement', async () => {
    const r = await run('--thread', '3/8-16 UNC', '--parent', '6061-T6', '--engage', '0.5', '--chamfer', '0.6', '--units', 'us');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/--chamfer: the chamfer \(0\.600 in\) must be shorter than the engaged length \(0\.500 in\)/);
  });
});

describe('tapwright repair: engagement and depth available', () => {
  it('an engagement deeper than the depth available is bad input naming both options (was planned as given)', async () => {
    const r = await run('--thread', 'M8', '--parent', 'AlSi7Mg-T6', '--engage', '30', '--depth-available', '25', '--through');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/^tapwright: --engage 30\.0 mm is more than --depth-available 25\.0 mm \(the part thickness\)/);
    expect((await run('--thread', 'M8', '--parent', 'AlSi7Mg-T6', '--engage', '8', '--depth-available', '25')).code).not.toBe(2);
  });
});
