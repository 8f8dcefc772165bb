/**
 * One joint, one answer: the command line (`check`) and the workbench
 * (evaluate on FormValues) resolve the same draft to the same input and the
 * same result, for every shipped preset and a few hundred generated joints
 * (the option space of test/core/joint/fuzz-space.ts), with and without
 * settings (a default scatter) and in both unit systems.
 */
import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {mkdtempSync, rmSync, writeFileSync} from 'node:fs';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {runCli} from '../../src/cli/main.js';
import {memoryIo} from '../../src/cli/io.js';
import {parseOptions} from '../../src/cli/args.js';
import {command as check} from '../../src/cli/commands/check.js';
import {JOINT_OPTIONS, jointDraftFromOptions} from '../../src/cli/joint-options.js';
import {JOINT_ROWS} from '../../src/app/joint-fields.js';
import {outlookJson, tighteningOutlook} from '../../src/app/tightening.js';
import {evaluate, evaluateScrew} from '../../src/ui/state/evaluate.js';
import {presetValues, realServices} from '../../src/ui/real-services.js';
import {shippedPresets} from '../../src/store/shipped.js';
import type {JointInputDraft} from '../../src/core/joint/input.js';
import type {RepairInputDraft} from '../../src/core/repair/input.js';
import {holeStateFlags} from '../../src/core/joint/hole-flags.js';
import type {UnitSystem} from '../../src/core/units.js';
import {checkArgs} from '../core/joint/fuzz-space.js';

interface Setup {
  name: string;
  units: UnitSystem;
  scatter?: number;
}
const SETUPS: Setup[] = [
  {name: 'no settings, SI', units: 'si'},
  {name: 'settings scatter 1.5, US', units: 'us', scatter: 1.5},
];

function store(s: Setup): string {
  const dir = mkdtempSync(path.join(tmpdir(), 'tw-parity-'));
  if (s.scatter !== undefined) writeFileSync(path.join(dir, 'settings.json'), JSON.stringify({units: s.units, scatterDefault: s.scatter}));
  return dir;
}

const SI_UNIT = {length: 'mm', force: 'N', torque: 'Nm', stress: 'MPa', speed: 'm/s', ratio: ''} as const;

/** The options of check for a draft, every number with its SI unit (so --units changes nothing). */
function argsFromDraft(d: Partial<JointInputDraft>): string[] {
  const args: string[] = [];
  const tightening = d.tightening ?? 'utilisation';
  for (const row of JOINT_ROWS) {
    const v = (d as Record<string, unknown>)[row.key];
    if (!row.cli || v === undefined) continue;
    if (['torque', 'preload', 'utilisation'].includes(row.key) && row.key !== tightening) continue;
    let text: string;
    if (row.kind === 'range') text = typeof v === 'number' ? String(v) : `${(v as {min: number}).min}..${(v as {max: number}).max}`;
    else if (row.kind === 'quantity') text = `${v}${SI_UNIT[row.dimension ?? 'ratio']}`;
    else text = String(v);
    args.push(row.cli.name, text);
  }
  if (d.internal === 'nut' && d.nutClass === undefined) args.push('--nut', '8');
  return args;
}

async function cliCheck(dir: string, args: string[]) {
  const io = memoryIo({env: {TAPWRIGHT_CONFIG_DIR: dir}});
  const code = await runCli(['check', ...args, '--json'], io);
  return {code, json: code === 2 ? undefined : (JSON.parse(io.stdout()) as Record<string, unknown>), err: io.stderr()};
}

const services = (dir: string) => realServices({configDir: dir, cwd: dir, now: () => new Date('2026-01-01T00:00:00Z')});

/** The same draft through both faces: the same input and the same result, or both refuse it. */
async function same(dir: string, s: Setup, draft: Partial<JointInputDraft>, args: string[], hole: Partial<RepairInputDraft> = {}): Promise<void> {
  const cli = await cliCheck(dir, [...args, '--units', s.units]);
  const svc = services(dir);
  const ev = evaluate({joint: draft, hole: {}}, svc, 'si', true);
  const evUnits = evaluate({joint: draft, hole: {}}, svc, s.units, true);
  if (cli.code === 2) {
    expect(ev.result, `CLI refused (${cli.err.trim()}), the workbench computed: ${JSON.stringify(draft)}`).toBeUndefined();
    return;
  }
  expect(ev.errors, `${JSON.stringify(args)} -> ${JSON.stringify(ev)}`).toEqual({});
  const {input, units: _u, cautions: _c, window, sensitivity, decidingMargin, ...result} = cli.json!;
  expect(JSON.parse(JSON.stringify(ev.input))).toEqual(input);
  // The workbench shows the hole-state flags (the core's holeStateFlags) before the check's, as check --preset reports them.
  const shown = ev.result ? {...ev.result, flags: [...holeStateFlags(hole), ...ev.result.flags]} : ev.result;
  expect(JSON.parse(JSON.stringify(shown))).toEqual(result);
  // The tightening window and the sensitivity list (issue 18) from the workbench's joint.
  expect(JSON.parse(JSON.stringify(outlookJson(tighteningOutlook(ev.input!, ev.result!))))).toEqual({window, sensitivity, decidingMargin});
  expect(evUnits.input).toEqual(ev.input);
}

describe.each(SETUPS)('parity of check and the workbench ($name)', s => {
  it('every shipped joint preset: check --preset, check with its options, and the workbench agree', async () => {
    const dir = store(s);
    try {
      const joints = shippedPresets().filter(p => p.kind === 'joint' && p.joint);
      expect(joints.length).toBeGreaterThanOrEqual(4);
      for (const p of joints) {
        const draft = presetValues(p).joint;
        await same(dir, s, draft, ['--preset', p.name], presetValues(p).hole);
        await same(dir, s, draft, argsFromDraft(draft));
      }
    } finally {
      rmSync(dir, {recursive: true, force: true});
    }
  });

  it('the shipped power-screw preset: screw --preset and the workbench agree', async () => {
    const dir = store(s);
    try {
      for (const p of shippedPresets().filter(x => x.kind === 'screw')) {
        const io = memoryIo({env: {TAPWRIGHT_CONFIG_DIR: dir}});
        expect(await runCli(['screw', '--preset', p.name, '--json', '--units', s.units], io)).not.toBe(2);
        const j = JSON.parse(io.stdout()) as {input: Record<string, unknown>; torque: unknown};
        const ev = evaluateScrew(presetValues(p), services(dir), s.units, true);
        expect(ev.errors).toEqual({});
        expect(j.input).toMatchObject(JSON.parse(JSON.stringify(ev.input)));
        expect(j.torque).toEqual(JSON.parse(JSON.stringify(ev.result?.torque)));
      }
    } finally {
      rmSync(dir, {recursive: true, force: true});
    }
  });

  it('generated joints: the draft check reads from the options resolves the same in the workbench', async () => {
    const dir = store(s);
    let computed = 0;
    try {
      await fc.assert(
        fc.asyncProperty(checkArgs, async generated => {
          // The joint options only (output options are check's own); the setup's --units.
          const args: string[] = [];
          for (let i = 0; i < generated.length; i++) {
            const a = generated[i]!;
            if (['--format', '--units'].includes(a)) i++;
            else if (!['--json', '--ascii'].includes(a)) args.push(a, ...(generated[i + 1] !== undefined && !generated[i + 1]!.startsWith('--') ? [generated[++i]!] : []));
          }
          let draft: Partial<JointInputDraft>;
          try {
            const {values} = parseOptions([...args, '--units', s.units], {...JOINT_OPTIONS}, false);
            draft = jointDraftFromOptions(values, s.units, undefined);
          } catch {
            return; // refused while reading the options: nothing for the workbench to compare
          }
          await same(dir, s, draft, args);
          computed++;
        }),
        {numRuns: 250, seed: 20260101},
      );
    } finally {
      rmSync(dir, {recursive: true, force: true});
    }
    expect(computed).toBeGreaterThan(50);
  }, 120_000);
});

it('check --help is generated from the table and lists every joint option', () => {
  for (const r of JOINT_ROWS) if (r.cli) expect(check.help).toContain(r.cli.name);
});
