/**
 * The workbench in a real pseudo-terminal: SIGQUIT is handled like SIGTERM (the
 * alternate screen is left, a draft is kept), and a draft that cannot be written
 * is reported instead of being lost in silence.
 */
import {afterAll, beforeAll, describe, expect, it} from 'vitest';
import {spawnSync} from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import {fileURLToPath} from 'node:url';
// @ts-expect-error plain .mjs support file without types
import {bundle} from '../../scripts/fuzz-support/bundle-entry.mjs';
import {tempDir} from './helpers.js';

const DRIVER = path.join(path.dirname(fileURLToPath(import.meta.url)), '..', 'fixtures', 'store', 'pty-signal.py');
const LEAVE_ALT = '\u001b[?1049l';
let entry: {file: string; cleanup: () => void};
beforeAll(async () => {
  entry = await bundle();
}, 120_000);
afterAll(() => entry?.cleanup());

/** Start the workbench, change the thread (Enter, "2", Enter), then send `signal`. */
function drive(configDir: string, signal: string): {status: number; after: string} {
  const cfg = {argv: [process.execPath, entry.file], env: {TAPWRIGHT_CONFIG_DIR: configDir, TAPWRIGHT_CODE_CACHE: 'off', TERM: 'xterm-256color'}, ready: 'M10', keys: ['\r', '2', '\r'], signal};
  const r = spawnSync('python3', [DRIVER, JSON.stringify(cfg)], {encoding: 'utf8', timeout: 120_000});
  return JSON.parse(r.stdout) as {status: number; after: string};
}

const hasPython = spawnSync('python3', ['-c', 'import pty']).status === 0;

describe.runIf(hasPython && process.platform !== 'win32')('workbench signals and drafts', () => {
  it('SIGQUIT: leaves the alternate screen and keeps a draft', () => {
    const dir = tempDir('sigquit');
    const r = drive(dir, 'SIGQUIT');
    expect(r.after).toContain(LEAVE_ALT);
    expect(r.after).toContain('unsaved edits were kept as a draft');
    expect(fs.readdirSync(dir).filter(n => /^draft-.*\.json$/.test(n))).toHaveLength(1);
    // 131, or the signal itself when Ink's exit hook re-raises it once the workbench is done.
    expect([131, -3]).toContain(r.status);
  }, 150_000);

  it('a draft that cannot be written is reported after the workbench closes', () => {
    const parent = tempDir('nodraft');
    const blocker = path.join(parent, 'not-a-folder');
    fs.writeFileSync(blocker, 'x');
    const r = drive(path.join(blocker, 'cfg'), 'SIGTERM');
    expect([143, -15]).toContain(r.status);
    expect(r.after).toMatch(/unsaved edits were NOT kept: cannot keep the unsaved draft in .*draft-\d+-\w+\.json: (ENOTDIR|EEXIST)/);
  }, 150_000);
});
