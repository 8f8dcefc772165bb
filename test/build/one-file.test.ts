import {describe, expect, it, beforeAll} from 'vitest';
import {execFileSync, spawnSync} from 'node:child_process';
import {mkdtempSync, copyFileSync, rmSync, readFileSync} from 'node:fs';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {fileURLToPath} from 'node:url';

// The one-file build must run with plain `node` from a folder with no node_modules
// anywhere above it (a plant PC that gets the tool by copying one file).
const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
let workDir = '';
let file = '';

beforeAll(() => {
  const buildDir = mkdtempSync(path.join(tmpdir(), 'tapwright-build-'));
  execFileSync(process.execPath, [path.join(root, 'scripts/build.mjs'), '--out', buildDir], {stdio: 'pipe'});
  workDir = mkdtempSync(path.join(tmpdir(), 'tapwright-plant-pc-'));
  file = path.join(workDir, 'tapwright.mjs');
  copyFileSync(path.join(buildDir, 'tapwright.mjs'), file);
  rmSync(buildDir, {recursive: true, force: true});
}, 60000);

function run(args: string[], env: Record<string, string> = {}) {
  return spawnSync(process.execPath, [file, ...args], {
    cwd: workDir,
    encoding: 'utf8',
    env: {PATH: process.env.PATH ?? '', HOME: workDir, TAPWRIGHT_CONFIG_DIR: path.join(workDir, 'cfg'), ...env},
  });
}

describe('one-file build (dist/tapwright.mjs)', () => {
  it('prints version and help outside the repo', () => {
    const v = run(['--version']);
    expect(v.status).toBe(0);
    expect(v.stdout.trim()).toMatch(/^\d+\.\d+\.\d+$/);
    const h = run(['--help']);
    expect(h.status).toBe(0);
    expect(h.stdout).toMatch(/Commands:/);
  });
  it('runs a command with JSON output', () => {
    const r = run(['threads', 'M10', '--json']);
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    const j = JSON.parse(r.stdout) as {geometry: {nominal: number; pitch: number}};
    expect(j.geometry.nominal).toBe(10);
    // ISO 261/262: M10 coarse pitch 1.5 mm.
    expect(j.geometry.pitch).toBe(1.5);
  });
  it('is ASCII throughout, so V8 keeps the code and the workbench text one byte a character', () => {
    const bytes = readFileSync(file);
    expect(bytes.findIndex(b => b > 0x7f)).toBe(-1);
  });
  it('keeps settings through conf (built without the schema validator conf leaves unused)', () => {
    const set = run(['settings', 'set', 'units', 'us']);
    expect(set.status).toBe(0);
    expect(set.stderr).toMatch(/units set to us/);
    const show = run(['settings']);
    expect(show.status).toBe(0);
    expect(show.stdout).toMatch(/units\s+us/);
  });
  it('does not start the workbench without a terminal', () => {
    const r = run([]);
    expect(r.status).toBe(2);
    expect(r.stdout + r.stderr).toMatch(/tapwright/);
  });
});
