import {describe, expect, it} from 'vitest';
import {mkdtempSync, writeFileSync} from 'node:fs';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {runCli} from '../../src/cli/main.js';
import {memoryIo} from '../../src/cli/io.js';
import {DEMO_SOLID_INSERTS, REPAIR_RANKING_RULE} from '../../src/core/repair/index.js';

const CONFIG = mkdtempSync(path.join(tmpdir(), 'tw-repair-config-'));

async function run(...args: string[]) {
  const io = memoryIo({env: {TAPWRIGHT_CONFIG_DIR: CONFIG}});
  const code = await runCli(['repair', ...args], io);
  return {code, out: io.stdout(), err: io.stderr()};
}

const CAST_M8 = ['--thread', 'M8', '--parent', 'AlSi7Mg-T6', '--engage', '8'];

describe('tapwright repair: text', () => {
  it('prints a ranked table within 80 columns, the ranking rule and the cautions', async () => {
    const r = await run(...CAST_M8, '--depth-available', '30', '--wall', '12');
    expect(r.code).toBe(0);
    const lines = r.out.split('\n');
    expect(Math.max(...lines.map(l => l.length))).toBeLessThanOrEqual(80);
    expect(r.out).toMatch(/^ 1 E\d /m);
    expect(r.out).toMatch(/helical insert 1\.5D/);
    expect(r.out).toMatch(/M8x1\.25 STI/);
    expect(r.out.replace(/\s+/g, ' ')).toContain(REPAIR_RANKING_RULE);
    expect(r.out).toMatch(/qualified person/);
    expect(r.out).toMatch(/^Note: solid insert sizes: demo values: use the insert maker's data/m);
  });

  it('shows inches and ft·lbf with --units us', async () => {
    const r = await run('--thread', '1/4-20', '--parent', '6061-T6', '--engage', '0.3in', '--units', 'us');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/engaged 0\.300 in/);
    expect(r.out).toMatch(/ft\*lbf/);
    expect(Math.max(...r.out.split('\n').map(l => l.length))).toBeLessThanOrEqual(80);
  });

  it('writes the Markdown work-order report with the date, the preset name, sources and cautions', async () => {
    const r = await run('--preset', 'demo-pump-casing-stud', '--format', 'markdown');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/^# Thread repair plan: M12x1\.75/);
    expect(r.out).toContain('Date: 2026-01-01');
    expect(r.out).toContain('Preset: demo-pump-casing-stud');
    expect(r.out).toMatch(/^\| 1 \| /m);
    expect(r.out).toContain('## Sources');
    expect(r.out).toMatch(/qualified person/);
  });

  it('--help lists the hole options and exits 0', async () => {
    const r = await run('--help');
    expect(r.code).toBe(0);
    for (const o of ['--stripped-depth', '--through', '--depth-available', '--wall', '--margin', '--json', '--units', '--thread', '--torque']) expect(r.out).toContain(o);
  });

  it('reads the joint and the hole state from a preset, options override it', async () => {
    const r = await run('--preset', 'demo-pump-casing-stud', '--json');
    expect(r.err).toBe('');
    const plan = JSON.parse(r.out) as {hole: {state: string; strippedDepth: number; depthAvailable: number; wall: number}; thread: string};
    expect(plan.thread).toMatch(/^M12/);
    expect(plan.hole).toMatchObject({state: 'stripped', strippedDepth: 7, depthAvailable: 30, wall: 14});
    const changed = JSON.parse((await run('--preset', 'demo-pump-casing-stud', '--wall', '20', '--json')).out) as {hole: {wall: number}};
    expect(changed.hole.wall).toBe(20);
  });

  it('reads bare hole lengths in inches with --units us', async () => {
    const r = await run('--thread', '1/4-20', '--parent', '6061-T6', '--engage', '0.3', '--depth-available', '1', '--units', 'us', '--json');
    const plan = JSON.parse(r.out) as {hole: {depthAvailable: number}};
    expect(plan.hole.depthAvailable).toBeCloseTo(25.4, 9);
  });
});

describe('tapwright repair: JSON contract (SI)', () => {
  it('has options[] with every contract key, ranks 1..n, SI whatever --units says', async () => {
    const r = await run(...CAST_M8, '--stripped-depth', '3', '--through', '--depth-available', '25', '--json', '--units', 'us');
    expect(r.code).toBe(0);
    const plan = JSON.parse(r.out) as {options: Array<Record<string, unknown> & {margin: Record<string, unknown>}>};
    expect(plan.options.length).toBeGreaterThan(5);
    plan.options.forEach((o, i) => {
      for (const k of ['kind', 'feasible', 'reason', 'drill', 'tapThread', 'holeDepth', 'torque', 'rank']) expect(o).toHaveProperty(k);
      expect(o.margin).toHaveProperty('stripping');
      expect(o.margin).toHaveProperty('boltBreaksFirst');
      expect(o.rank).toBe(i + 1);
      expect(['reuse', 'longer-engagement', 'helical-insert', 'solid-insert', 'oversize', 'through-bolt']).toContain(o.kind);
    });
    const coil = plan.options.find(o => o.kind === 'helical-insert' && o.feasible);
    expect(coil?.drill).toBeCloseTo(8.3, 6); // mm, not inches
    expect(coil?.tapThread).toBe('M8x1.25 STI');
    expect(r.out).not.toMatch(/NaN|Infinity/);
  });

  it('takes a user table with --solid-table', async () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'tw-repair-'));
    const table = {...structuredClone(DEMO_SOLID_INSERTS), name: 'shop table', provenance: {kind: 'user', source: 'measured in the shop'}};
    table.entries = table.entries.filter(e => e.internal === 'M8x1.25' && e.type === 'heavy-duty');
    writeFileSync(path.join(dir, 't.json'), JSON.stringify(table));
    const io = memoryIo({cwd: dir, env: {TAPWRIGHT_CONFIG_DIR: CONFIG}});
    const code = await runCli(['repair', ...CAST_M8, '--solid-table', 't.json', '--json'], io);
    expect(code).toBe(0);
    const plan = JSON.parse(io.stdout()) as {options: Array<{kind: string; label: string}>};
    expect(plan.options.filter(o => o.kind === 'solid-insert').map(o => o.label)).toEqual(['solid heavy-duty']);
  });
});

describe('tapwright repair: exit codes and bad input', () => {
  it('exits 3 when no option meets the margin', async () => {
    const r = await run(...CAST_M8, '--margin', '5', '--depth-available', '14', '--wall', '7');
    expect(r.code).toBe(3);
  });

  it.each([
    [['--wall', '-3'], /--wall .*accepted: 0\.1 to 5000 mm/],
    [['--margin', '9'], /--margin .*accepted: 0\.5 to 5/],
    [['--through-nut-height', '0'], /--through-nut-height .*accepted: 0\.5 to 500 mm/],
    [['--depth-available', '12 apples'], /--depth-available/],
    [['--stripped-depth', '20'], /--stripped-depth .*beyond the engaged length/],
    [['--units', 'furlong'], /--units .*accepted: si, us/],
    [['--solid-table', 'no-such-file.json'], /--solid-table: cannot read/],
    [['--parent', 'cheese'], /--parent: unknown parent material "cheese"; accepted:/],
    [['--torque', '40', '--preload', '10kN'], /--torque and --preload contradict each other/],
  ])('rejects %j naming the option', async (extra, message) => {
    const args = [...CAST_M8];
    const i = args.indexOf(extra[0] as string);
    if (i >= 0) args.splice(i, 2);
    const r = await run(...args, ...extra);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(message);
    expect(r.err).not.toMatch(/\n\s+at /);
  });

  it('needs --thread and --engage', async () => {
    expect((await run('--engage', '8', '--parent', 'AlSi7Mg-T6')).err).toMatch(/--thread is needed/);
    expect((await run('--thread', 'M8', '--parent', 'AlSi7Mg-T6')).err).toMatch(/--engage is needed/);
  });
});
