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
import {fileURLToPath} from 'node:url';
// @ts-expect-error plain JS build helper without types
import {startUpPlugin, PATCHES, skippedPatches, patchInkOutput, patchStringWidth, patchYogaLoader} from '../../scripts/build-support/start-up-plugin.mjs';
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
    expect(patched.code).toContain('__twSharedCaches');
    expect(patched.code).toContain('stringWidthExact');
    expect(plain.code).not.toContain('__twSharedCaches');
    expect(patched.out).toBe(plain.out);
    expect(plain.out).toMatch(/frame 24 1/);
  }, 60_000);

  it('each finds the text it replaces in the installed packages', () => {
    expect(() => patchInkOutput(read('ink/build/output.js'))).not.toThrow();
    expect(() => patchStringWidth(read('string-width/index.js'))).not.toThrow();
    expect(() => patchStringWidth(read('wrap-ansi/node_modules/string-width/index.js'))).not.toThrow();
    expect(() => patchYogaLoader(read('yoga-layout/dist/binaries/yoga-wasm-base64-esm.js'))).not.toThrow();
    expect(() => patchInkReconciler(read('ink/build/reconciler.js'))).not.toThrow();
    expect(() => patchYogaIndex(read('yoga-layout/dist/src/index.js'))).not.toThrow();
    expect(() => patchInkOutput('export default class Output {}')).toThrow(/changed/);
  });

  it('TAPWRIGHT_BUILD_SKIP_PATCH takes known patch names only', () => {
    expect([...skippedPatches('')]).toEqual([]);
    expect([...skippedPatches('ink-output, yoga-fetch')]).toEqual(['ink-output', 'yoga-fetch']);
    for (const n of skippedPatches(Object.keys(PATCHES).join(','))) expect(PATCHES).toHaveProperty([n]);
    expect(() => skippedPatches('ink-outptu')).toThrow(/unknown patch "ink-outptu"/);
  });
});
