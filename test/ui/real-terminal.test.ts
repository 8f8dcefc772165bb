/**
 * The built one-file app in a real terminal: tmux at 80x24 on a private socket.
 * Types a designation and an engagement, checks the readout changed, resizes,
 * presses Ctrl-C and checks the terminal came back (main screen, cursor shown).
 */
import {execFileSync, spawnSync} from 'node:child_process';
import {mkdtempSync, rmSync, existsSync, readdirSync, readFileSync} from 'node:fs';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {afterAll, beforeAll, describe, expect, it} from 'vitest';

const hasTmux = spawnSync('tmux', ['-V']).status === 0;
const root = path.resolve(import.meta.dirname, '../..');
const work = mkdtempSync(path.join(tmpdir(), 'tw-tmux-'));
const socket = `tw-ui-test-${process.pid}`;
const session = 'wb';

const tmux = (...args: string[]) => execFileSync('tmux', ['-L', socket, ...args], {encoding: 'utf8'});
const screen = () => tmux('capture-pane', '-p', '-t', session);
const show = (fmt: string) => tmux('display-message', '-p', '-t', session, fmt).trim();
const keys = (...k: string[]) => tmux('send-keys', '-t', session, ...k);

async function until(what: string, test: (s: string) => boolean, timeoutMs = 8000): Promise<string> {
  const start = Date.now();
  for (;;) {
    const s = screen();
    if (test(s)) return s;
    if (Date.now() - start > timeoutMs) throw new Error(`timed out waiting for ${what}; screen:\n${s}`);
    await new Promise(r => setTimeout(r, 50));
  }
}
const line = (s: string, start: string) => s.split('\n').find(l => l.includes(start)) ?? '';

describe.skipIf(!hasTmux)('real terminal (tmux 80x24)', () => {
  beforeAll(() => {
    execFileSync(process.execPath, [path.join(root, 'scripts/build.mjs'), '--out', path.join(work, 'dist')], {stdio: 'ignore'});
  }, 120_000);
  afterAll(() => {
    spawnSync('tmux', ['-L', socket, 'kill-server']);
    rmSync(work, {recursive: true, force: true});
  });

  it('the split build keeps Ink and React out of every command: the workbench is a text chunk reached by a dynamic import', () => {
    // dist/lib bundles its packages into split chunks. The workbench (Ink, React,
    // the screens) is bundled once more as CommonJS into a file that one chunk
    // reads, and only the workbench loader imports that chunk, dynamically, to run
    // the body through the V8 code cache. No module holds Ink or React code.
    const lib = path.join(work, 'dist', 'lib');
    const read = (f: string) => readFileSync(path.join(lib, f), 'utf8');
    const imports = (f: string, re: RegExp) => [...read(f).matchAll(re)].map(m => path.posix.normalize(path.posix.join(path.posix.dirname(f), m[1]!)));
    const staticClosure = (start: string): string[] => {
      const seen = new Set<string>();
      const todo = [start];
      while (todo.length > 0) {
        const f = todo.pop()!;
        if (seen.has(f)) continue;
        seen.add(f);
        todo.push(...imports(f, /(?:from|import)\s*"(\.\.?\/[^"]+\.js)"/g));
      }
      return [...seen];
    };
    // Marker strings: Ink's raw-mode error text and React's element tag.
    const hasUi = (f: string) => /Raw mode is not supported|react\.transitional\.element/.test(read(f));
    const chunks = readdirSync(path.join(lib, 'chunks')).filter(f => f.endsWith('.js')).map(f => `chunks/${f}`);
    // The body itself is a file beside the chunk that reads it (not a module).
    expect(hasUi('chunks/workbench-body.cjs')).toBe(true);
    expect(chunks.filter(hasUi)).toEqual([]);
    expect(hasUi('entry.js')).toBe(false);
    const body = chunks.filter(f => read(f).includes('workbench-body.cjs'));
    expect(body).toHaveLength(1);
    const dynamic = (f: string) => imports(f, /import\("(\.\.?\/[^"]+\.js)"\)/g);
    const reachable = new Set(staticClosure('entry.js'));
    for (const f of [...reachable]) for (const d of dynamic(f)) for (const g of staticClosure(d)) reachable.add(g);
    // The reader is reachable from the entry, but only through dynamic imports.
    expect(reachable.has(body[0]!)).toBe(true);
    expect(staticClosure('entry.js')).not.toContain(body[0]);
    for (const f of chunks.filter(c => c !== body[0])) expect(staticClosure(f), f).not.toContain(body[0]);
  });

  it('edits, follows a resize, and restores the terminal on Ctrl-C', async () => {
    const app = path.join(work, 'dist', 'tapwright.mjs');
    expect(existsSync(app)).toBe(true);
    const cache = path.join(work, 'code-cache');
    const cmd = `env TAPWRIGHT_CONFIG_DIR=${path.join(work, 'cfg')} TAPWRIGHT_CACHE_DIR=${cache} LANG=C.UTF-8 TERM=xterm-256color node ${app}; echo "EXITED $?"; sleep 30`;
    tmux('new-session', '-d', '-s', session, '-x', '80', '-y', '24', cmd);
    let s = await until('the first frame', x => x.includes('Preload') && x.includes('Estimates only'));
    expect(show('#{alternate_on}')).toBe('1');
    expect(s.split('\n').filter(l => l.trim() !== '').length).toBeLessThanOrEqual(23);

    // Designation: open the type-ahead, erase, type, take it as typed.
    keys('Enter');
    await until('the picker', x => x.includes('Matches') || x.includes('No match'));
    for (let i = 0; i < 16; i++) keys('BSpace');
    keys('-l', 'M12');
    await until('matches for M12', x => /M12x1\.5/.test(x));
    keys('Enter');
    s = await until('M12 in the readout', x => /Designation\s+M12\s/.test(x) && x.includes('* unsaved changes'));

    // Engagement: step 3, type a new length; the readout follows.
    const before = line(s, 'Engaged    ');
    keys('Right', 'Right');
    await until('the engagement step', x => /(>|▶) Engaged length/.test(x));
    keys('-l', '24');
    keys('Enter');
    s = await until('the new engagement', x => /Engaged length\s+24\.0 mm/.test(x));
    const after = line(s, 'Engaged    ');
    expect(after).not.toBe(before);

    // Resize: larger, then below the minimum, then back.
    tmux('resize-window', '-t', session, '-x', '100', '-y', '30');
    s = await until('the wider frame', x => x.split('\n').some(l => l.trimEnd().length > 80) && x.includes('Preload'));
    tmux('resize-window', '-t', session, '-x', '70', '-y', '20');
    await until('the size notice', x => x.includes('Terminal is 70x20'));
    tmux('resize-window', '-t', session, '-x', '80', '-y', '24');
    await until('the frame again', x => /Engaged length\s+24\.0 mm/.test(x));

    // Ctrl-C: the shell's screen comes back, the cursor is shown, the draft is kept.
    keys('C-c');
    s = await until('the exit', x => x.includes('EXITED'));
    expect(s).toContain('EXITED 130');
    expect(s).toContain('unsaved edits were kept as a draft');
    expect(s).not.toContain('Preload');
    expect(show('#{alternate_on}')).toBe('0');
    expect(show('#{cursor_flag}')).toBe('1');
    // The first session wrote the workbench's V8 code cache for the next start.
    expect(readdirSync(cache).filter(f => /^workbench-[0-9a-f]{16}-v\d+\.\d+\.\d+-\w+\.v8cache$/.test(f))).toHaveLength(1);
  }, 60_000);

  it('keeps unsaved edits as a draft on SIGTERM and SIGHUP, and offers it at the next start', async () => {
    const app = path.join(work, 'dist', 'tapwright.mjs');
    const cfg = path.join(work, 'cfg-signals');
    const start = (name: string) =>
      tmux('new-session', '-d', '-s', name, '-x', '80', '-y', '24', `env TAPWRIGHT_CONFIG_DIR=${cfg} TAPWRIGHT_CACHE_DIR=${path.join(work, "code-cache")} LANG=C.UTF-8 TERM=xterm-256color node ${app}; echo "EXITED $?"; sleep 30`);
    const nodePid = (name: string) => execFileSync('pgrep', ['-P', tmux('display-message', '-p', '-t', name, '#{pane_pid}').trim(), 'node'], {encoding: 'utf8'}).trim();
    const shot = (name: string) => tmux('capture-pane', '-p', '-t', name);
    const wait = async (name: string, what: string, test: (x: string) => boolean) => {
      const t0 = Date.now();
      while (!test(shot(name))) {
        if (Date.now() - t0 > 8000) throw new Error(`timed out waiting for ${what}:\n${shot(name)}`);
        await new Promise(r => setTimeout(r, 50));
      }
    };
    for (const [signal, code] of [['TERM', 143], ['HUP', 129]] as const) {
      const name = `sig${signal}`;
      start(name);
      await wait(name, 'the first frame', x => x.includes('Preload'));
      if (shot(name).includes('Restore the unsaved edits')) {
        tmux('send-keys', '-t', name, 'n');
        await wait(name, 'the draft discarded', x => x.includes('Draft discarded'));
      }
      tmux('send-keys', '-t', name, 'Right', 'Right');
      tmux('send-keys', '-t', name, '-l', '31');
      tmux('send-keys', '-t', name, 'Enter');
      await wait(name, 'the edit', x => /Engaged length\s+31\.0 mm/.test(x));
      execFileSync('kill', [`-${signal}`, nodePid(name)]);
      await wait(name, 'the exit', x => x.includes('EXITED'));
      expect(shot(name)).toContain(`EXITED ${code}`);
      expect(tmux('display-message', '-p', '-t', name, '#{alternate_on}').trim()).toBe('0');
      expect(readdirSync(cfg).some(n => /^draft-\d+-\w+\.json$/.test(n))).toBe(true); // one draft file per session (issue 15)
    }
    start('again');
    await wait('again', 'the draft offer', x => x.includes('Restore the unsaved edits from'));
    tmux('send-keys', '-t', 'again', 'y');
    tmux('send-keys', '-t', 'again', 'Right', 'Right');
    await wait('again', 'the restored value', x => /Engaged length\s+31\.0 mm/.test(x) && x.includes('* unsaved changes'));
    tmux('send-keys', '-t', 'again', 'q');
    await wait('again', 'the exit', x => x.includes('EXITED 0'));
  }, 60_000);
});
