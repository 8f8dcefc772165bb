/**
 * The build patches a few packages for speed (scripts/build-support/start-up-plugin.mjs)
 * and for the CommonJS workbench bundle (cjs-plugin.mjs). A patch must not change
 * any result: the same harness, bundled with and without the patches, prints the
 * same text widths, styled strings and Ink frames. And every patch must still find
 * the text it replaces in the installed packages.
 */
import {describe, expect, it} from 'vitest';
import {build} from 'esbuild';
import {execFileSync} from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import {fileURLToPath, pathToFileURL} from 'node:url';
// @ts-expect-error plain JS build helper without types
import {startUpPlugin, patchInkOutput, patchStyledChars, patchStringWidth, patchYogaLoader, patchSegmenter, patchTerminalSize, patchSignalExit, patchConf} from '../../scripts/build-support/start-up-plugin.mjs';
// @ts-expect-error plain JS build helper without types
import {patchInkReconciler, patchYogaIndex} from '../../scripts/build-support/cjs-plugin.mjs';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
const harness = path.join(root, 'test/build/fixtures/patch-harness.mjs');
const read = (p: string) => fs.readFileSync(path.join(root, 'node_modules', p), 'utf8');

async function runBundled(plugins: unknown[]): Promise<{out: string; code: string}> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'tw-patch-'));
  const outfile = path.join(dir, 'h.mjs');
  await build({entryPoints: [harness], bundle: true, platform: 'node', format: 'esm', outfile, plugins: plugins as never, logLevel: 'silent'});
  const out = execFileSync(process.execPath, [outfile], {encoding: 'utf8'});
  const code = fs.readFileSync(outfile, 'utf8');
  fs.rmSync(dir, {recursive: true, force: true});
  return {out, code};
}

describe('build patches to packages', () => {
  it('change no result: text widths, styled strings and Ink frames are the same', async () => {
    const plain = await runBundled([]);
    const patched = await runBundled([startUpPlugin]);
    expect(patched.code).toContain('__twSameStyles');
    expect(patched.code).toContain('__twSharedCaches');
    expect(patched.code).toContain('stringWidthExact');
    expect(patched.code).toContain('GRAPHEME_SEGMENTERReal');
    expect(plain.code).not.toContain('__twSameStyles');
    expect(patched.out).toBe(plain.out);
    expect(plain.out).toMatch(/frame 24 1/);
  }, 60_000);

  it('each finds the text it replaces in the installed packages', () => {
    expect(() => patchInkOutput(read('ink/build/output.js'))).not.toThrow();
    expect(() => patchStyledChars(read('@alcalzone/ansi-tokenize/build/styledChars.js'))).not.toThrow();
    expect(() => patchStringWidth(read('string-width/index.js'))).not.toThrow();
    expect(() => patchStringWidth(read('wrap-ansi/node_modules/string-width/index.js'))).not.toThrow();
    expect(() => patchYogaLoader(read('yoga-layout/dist/binaries/yoga-wasm-base64-esm.js'))).not.toThrow();
    expect(() => patchSegmenter(read('slice-ansi/tokenize-ansi.js'), "const GRAPHEME_SEGMENTER = new Intl.Segmenter(undefined, {granularity: 'grapheme'});", 'GRAPHEME_SEGMENTER', '', 'slice-ansi')).not.toThrow();
    expect(() => patchSegmenter(read('@alcalzone/ansi-tokenize/build/tokenize.js'), 'const segmenter = new Intl.Segmenter(undefined, { granularity: "grapheme" });', 'segmenter', '', 'ansi-tokenize')).not.toThrow();
    expect(() => patchInkReconciler(read('ink/build/reconciler.js'))).not.toThrow();
    expect(() => patchYogaIndex(read('yoga-layout/dist/src/index.js'))).not.toThrow();
    expect(() => patchTerminalSize(read('terminal-size/index.js'))).not.toThrow();
    expect(() => patchSignalExit(read('signal-exit/index.js'))).not.toThrow();
    expect(() => patchConf(read('conf/dist/source/index.js'))).not.toThrow();
    expect(() => patchInkOutput('export default class Output {}')).toThrow(/changed/);
  });

  it('the load-time patches keep behaviour: signal-exit still checks its callback, terminal-size still answers', () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'tw-patch-'));
    try {
      // signal-exit 3, patched, as CommonJS beside its own package.json
      const se = path.join(dir, 'signal-exit.cjs');
      const signals = `require(${JSON.stringify(path.join(root, 'node_modules/signal-exit/signals.js'))})`;
      fs.writeFileSync(se, patchSignalExit(read('signal-exit/index.js')).replace("require('./signals.js')", signals));
      const out = execFileSync(process.execPath, ['-e', `
        const onExit = require(${JSON.stringify(se)});
        let msg = '';
        try { onExit(); } catch (e) { msg = e.message; }
        const remove = onExit(() => {});
        console.log(JSON.stringify({msg, remove: typeof remove, assert: process.moduleLoadList.includes('NativeModule assert')}));
      `], {encoding: 'utf8'});
      expect(JSON.parse(out)).toEqual({msg: 'a callback must be provided for exit handler', remove: 'function', assert: false});
      // terminal-size, patched: loads without child_process and still gives a size
      const ts = path.join(dir, 'terminal-size.mjs');
      fs.writeFileSync(ts, patchTerminalSize(read('terminal-size/index.js')));
      const size = execFileSync(process.execPath, ['--input-type=module', '-e', `
        const {default: terminalSize} = await import(${JSON.stringify(pathToFileURL(ts).href)});
        const before = process.moduleLoadList.includes('NativeModule child_process');
        const s = terminalSize();
        console.log(JSON.stringify({before, columns: Number.isInteger(s.columns), rows: Number.isInteger(s.rows)}));
      `], {encoding: 'utf8', env: {...process.env, COLUMNS: '', LINES: ''}});
      expect(JSON.parse(size)).toEqual({before: false, columns: true, rows: true});
      // conf: no eager import of either module is left
      const conf = patchConf(read('conf/dist/source/index.js'));
      expect(conf).not.toMatch(/^import .* from 'node:(crypto|assert)';$/m);
      expect(conf).toContain("const crypto = __twLazy('node:crypto');");
    } finally {
      fs.rmSync(dir, {recursive: true, force: true});
    }
  });
});
