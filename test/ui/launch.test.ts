import {mkdtempSync} from 'node:fs';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {describe, expect, it} from 'vitest';
import {memoryIo} from '../../src/cli/io.js';
import {startWorkbench} from '../../src/cli/launch-plain.js';

/** `tapwright` with no command as the bin runs it; the workbench itself must not load in these cases. */
const launch = (args: string[], io: Parameters<typeof startWorkbench>[1]) =>
  startWorkbench(args, io, async () => {
    throw new Error('the workbench must not load here');
  });
import {parseLaunchArgs, wantsAscii, wantsColor, whyNoWorkbench} from '../../src/ui/terminal/env.js';

const tmp = () => mkdtempSync(path.join(tmpdir(), 'tw-ui-'));

describe('launch without a terminal', () => {
  it('never starts Ink: prints the check report of the default preset and points to the commands, exit 2', async () => {
    const io = memoryIo({env: {TAPWRIGHT_CONFIG_DIR: tmp()}, stdinIsTTY: false, stdoutIsTTY: false});
    const code = await launch([], io);
    expect(code).toBe(2);
    expect(io.stderr()).toContain('the interactive workbench needs a terminal (standard input and output are not a terminal)');
    expect(io.stderr()).toContain('tapwright check --preset NAME');
    expect(io.stderr()).toContain('Printed above: the check report of preset "demo-gearbox-cover"');
    expect(io.stdout()).toContain('CAUTION');
    expect(io.stdout()).not.toContain('\u001B[');
  });

  it('prints that report in the units asked for (--units us: lbf, in; was SI whatever was asked)', async () => {
    const io = memoryIo({env: {TAPWRIGHT_CONFIG_DIR: tmp()}, stdinIsTTY: false, stdoutIsTTY: false});
    expect(await launch(['--units', 'us'], io)).toBe(2);
    expect(io.stdout()).toMatch(/Units +US customary/);
    expect(io.stdout()).toMatch(/\d lbf/);
    expect(io.stdout()).not.toMatch(/\d kN\b/);
  });

  it('treats TERM=dumb as no terminal', async () => {
    const io = memoryIo({env: {TAPWRIGHT_CONFIG_DIR: tmp(), TERM: 'dumb'}, stdinIsTTY: true, stdoutIsTTY: true});
    expect(await launch(['--preset', 'demo-gearbox-cover'], io)).toBe(2);
    expect(io.stderr()).toContain('TERM=dumb cannot move the cursor');
  });

  it('names an unknown preset and still exits 2', async () => {
    const io = memoryIo({env: {TAPWRIGHT_CONFIG_DIR: tmp()}, stdinIsTTY: false, stdoutIsTTY: true});
    expect(await launch(['--preset', 'no-such'], io)).toBe(2);
    expect(io.stderr()).toContain('standard input is not a terminal');
    expect(io.stderr()).toContain('--preset "no-such"');
  });

  it('rejects an unknown option naming the accepted ones', async () => {
    const io = memoryIo({stdinIsTTY: true, stdoutIsTTY: true});
    expect(await launch(['--units', 'imperial'], io)).toBe(2);
    expect(io.stderr()).toContain('--units is "imperial"; accepted: si, us');
    expect(() => parseLaunchArgs(['--frobnicate'])).toThrow(/unknown option --frobnicate for the workbench \(accepted: --preset NAME, --ascii/);
    expect(parseLaunchArgs(['--preset=a b', '--ascii', '--units', 'US'])).toEqual({preset: 'a b', ascii: true, units: 'us'});
  });
});

describe('terminal decisions', () => {
  const t = (env: Record<string, string>, tty = true) => ({env, stdinIsTTY: tty, stdoutIsTTY: tty});
  it('colour: flag, then FORCE_COLOR, then NO_COLOR, then TERM=dumb, then the TTY', () => {
    expect(wantsColor(t({}))).toBe(true);
    expect(wantsColor(t({NO_COLOR: '1'}))).toBe(false);
    expect(wantsColor(t({NO_COLOR: ''}))).toBe(true);
    expect(wantsColor(t({NO_COLOR: '1', FORCE_COLOR: '1'}))).toBe(true);
    expect(wantsColor(t({FORCE_COLOR: '0'}))).toBe(false);
    expect(wantsColor(t({TERM: 'dumb'}))).toBe(false);
    expect(wantsColor(t({}, false))).toBe(false);
    expect(wantsColor(t({NO_COLOR: '1'}), true)).toBe(true);
  });
  it('ASCII when asked, or when the locale is not UTF-8', () => {
    expect(wantsAscii(t({LANG: 'en_GB.UTF-8'}), false)).toBe(false);
    expect(wantsAscii(t({LANG: 'en_GB.UTF-8'}), true)).toBe(true);
    expect(wantsAscii(t({LANG: 'C'}), false)).toBe(true);
    expect(wantsAscii(t({}), false)).toBe(true);
    expect(wantsAscii(t({LC_ALL: 'de_DE.ISO-8859-1', LANG: 'de_DE.UTF-8'}), false)).toBe(true);
    expect(wantsAscii(t({LANG: 'C.utf8', TERM: 'linux'}), false)).toBe(true);
    expect(wantsAscii(t({LANG: 'C.utf8', TAPWRIGHT_ASCII: '1'}), false)).toBe(true);
  });
  it('no workbench without both TTYs or with TERM=dumb', () => {
    expect(whyNoWorkbench(t({}))).toBeUndefined();
    expect(whyNoWorkbench({env: {}, stdinIsTTY: true, stdoutIsTTY: false})).toBe('standard output is not a terminal');
  });
});
