// esbuild plugin: changes to third-party code that only cost time. Each one is kept
// because `npm run bench -- --patches` showed it saves at least 20 ms of start-up CPU
// or 5 MB (figures in DEVELOPERS.md, "Build patches"); each fails the build when the
// text it replaces is not found exactly once, and test/build/patches.test.ts checks
// that patched and unpatched output agree.
//
// ink-output: Ink's Output (it turns each frame's text into a grid of styled cells
//    and back) allocated about 7 MB a frame at 80x24, which made V8 grow its young
//    generation and the workbench's resident memory while typing. The patch keeps the
//    result the same and the work smaller: the per-line caches live across frames
//    (bounded), the blank cell is one shared frozen object, and a line of simple text
//    that fits its clip is not sliced.
// narrow-width: `string-width` (Ink measures every piece of text with it) segments
//    graphemes and tests emoji properties for any text that is not plain ASCII, and its
//    first call compiles the emoji regular expression. A fast path in front of it
//    returns the code-point count for text made only of characters drawn one cell wide
//    on every terminal (src/ui/terminal/narrow.ts, tested against string-width itself);
//    any other text takes the full path.
// yoga-fetch: yoga-layout's Emscripten loader decodes its embedded WebAssembly (a
//    data: URI) with `fetch` whenever a global fetch exists, which on Node loads the
//    whole undici HTTP client just to decode base64. The loader already has a
//    synchronous decoder for data: URIs; the patch makes it use that one.
// conf-unused: conf imports ajv, ajv-formats and semver for its `schema` and
//    `migrations` options, which tapwright never passes (conf-unused-stub.js says
//    why); they are left out, about 360 KB less in the one-file build.
import {readFile} from 'node:fs/promises';
import path from 'node:path';
import {fileURLToPath} from 'node:url';

const here = path.dirname(fileURLToPath(import.meta.url));
const CONF_UNUSED_STUB = path.join(here, 'conf-unused-stub.js');
const NARROW = path.join(here, '..', '..', 'src', 'ui', 'terminal', 'narrow.ts');

/** The text in yoga's loader and what it becomes. */
export const YOGA_FETCH = {
  from: 'function ya(){return w||"function"!=typeof fetch?',
  to: 'function ya(){return w||ua(H)||"function"!=typeof fetch?',
};

export function patchYogaLoader(source) {
  return replaceOnce(source, YOGA_FETCH.from, YOGA_FETCH.to, "yoga-layout's wasm loader (fetch branch)");
}

const WIDTH_EXPORT = 'export default function stringWidth(';

export function patchStringWidth(source) {
  const n = source.split(WIDTH_EXPORT).length - 1;
  if (n !== 1) throw new Error(`build: string-width changed (its default export was found ${n} times, expected once); update scripts/build-support/start-up-plugin.mjs`);
  return (
    `import {visibleNarrowWidth as __twNarrowWidth} from ${JSON.stringify(NARROW)};\n` +
    source.replace(WIDTH_EXPORT, 'function stringWidthExact(') +
    '\nexport default function stringWidth(input, options) {\n' +
    "  if (typeof input === 'string' && (options === undefined || (options.ambiguousIsNarrow !== false && !options.countAnsiEscapeCodes))) {\n" +
    '    const n = __twNarrowWidth(input);\n' +
    '    if (n !== undefined) return n;\n' +
    '  }\n' +
    '  return stringWidthExact(input, options);\n' +
    '}\n'
  );
}

/** `source` with `from` replaced by `to`; the build fails when `from` is not there exactly once. */
export function replaceOnce(source, from, to, what) {
  const n = source.split(from).length - 1;
  if (n !== 1) throw new Error(`build: ${what} changed (found ${n} times, expected once: ${JSON.stringify(from.slice(0, 60))}); update the patch in scripts/build-support/`);
  return source.replace(from, to);
}

const NARROW_IMPORT = `import {isSimpleText as __twSimpleText} from ${JSON.stringify(NARROW)};\n`;

const SHARED_CACHES = `
const __twBlank = Object.freeze({type: 'char', value: ' ', fullWidth: false, styles: Object.freeze([])});
let __twCaches;
function __twSharedCaches() {
  if (!__twCaches || __twCaches.styledChars.size + __twCaches.widths.size + __twCaches.blockWidths.size > 20000) __twCaches = new OutputCaches();
  return __twCaches;
}
export default class Output {`;

export function patchInkOutput(source) {
  let s = replaceOnce(source, 'export default class Output {', SHARED_CACHES, "Ink's Output (class)");
  s = replaceOnce(s, 'caches = new OutputCaches();', 'caches = __twSharedCaches();', "Ink's Output (caches)");
  s = replaceOnce(
    s,
    `row.push({
                    type: 'char',
                    value: ' ',
                    fullWidth: false,
                    styles: [],
                });`,
    'row.push(__twBlank);',
    "Ink's Output (blank cell)",
  );
  s = replaceOnce(s, 'return sliceAnsi(line, from, to);', 'return from === 0 && to >= width && __twSimpleText(line) ? line : sliceAnsi(line, from, to);', "Ink's Output (clip)");
  return NARROW_IMPORT + s;
}


/**
 * Every patch by name. `TAPWRIGHT_BUILD_SKIP_PATCH=name[,name]` builds without those
 * patches (the rest stay on): `npm run bench -- --patches` builds with each one off in
 * turn to measure what it saves. An unknown name fails the build.
 */
export const PATCHES = {
  'ink-output': "Ink's Output: per-line caches kept across frames, one shared blank cell, no slice of a line that fits its clip",
  'narrow-width': 'string-width: code-point count for text made only of one-cell characters',
  'yoga-fetch': "yoga-layout: its embedded wasm decoded without fetch (undici)",
  'conf-unused': 'conf: ajv, ajv-formats and semver replaced by a stub',
};

/** The set of patch names switched off by TAPWRIGHT_BUILD_SKIP_PATCH. */
export function skippedPatches(value = process.env.TAPWRIGHT_BUILD_SKIP_PATCH ?? '') {
  const names = value.split(',').map(x => x.trim()).filter(Boolean);
  for (const n of names) if (!(n in PATCHES)) throw new Error(`build: TAPWRIGHT_BUILD_SKIP_PATCH names an unknown patch "${n}"; known: ${Object.keys(PATCHES).join(', ')}`);
  return new Set(names);
}

const load = (b, filter, patch) => b.onLoad({filter}, async args => ({contents: patch(await readFile(args.path, 'utf8')), loader: 'js'}));

export const startUpPlugin = {
  name: 'tapwright-start-up',
  setup(b) {
    const skip = skippedPatches();
    const on = name => !skip.has(name);
    if (on('conf-unused')) b.onResolve({filter: /^(?:ajv\/dist\/2020\.js|ajv-formats|semver)$/}, args => (/[\\/]conf[\\/]dist[\\/]/.test(args.importer) ? {path: CONF_UNUSED_STUB} : undefined));
    if (on('yoga-fetch')) load(b, /yoga-layout[\\/]dist[\\/]binaries[\\/]yoga-wasm-base64-esm\.js$/, patchYogaLoader);
    if (on('ink-output')) load(b, /[\\/]ink[\\/]build[\\/]output\.js$/, patchInkOutput);
    if (on('narrow-width')) load(b, /[\\/]string-width[\\/]index\.js$/, patchStringWidth);
  },
};
