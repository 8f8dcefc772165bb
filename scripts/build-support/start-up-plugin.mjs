// esbuild plugin: changes to third-party code that only cost time.
//
// 1. Ink imports its React DevTools bridge (devtools.js, which pulls in the `ws`
//    WebSocket library) only when DEV=true. The bundle never runs with DevTools,
//    so that module is replaced by a stub and `ws` is not bundled at all.
// 2. yoga-layout's Emscripten loader decodes its embedded WebAssembly (a data: URI)
//    with `fetch` whenever a global fetch exists. On Node that loads the whole
//    undici HTTP client (about 40 ms at start on the 2-core test machine) just to
//    decode base64. The loader already has a synchronous decoder for data: URIs;
//    the patch makes it use that decoder for a data: URI. The patch fails the build
//    loudly if the loader's text changes (a yoga-layout upgrade), so it is never
//    silently lost.
// 3. `string-width` (Ink measures every piece of text with it) segments graphemes
//    and tests emoji properties for any text that is not plain ASCII: about 0.1 ms a
//    string, and 40 ms for its first call (compiling the emoji regular expression).
//    A fast path in front of it returns the code-point count for text made only of
//    characters drawn one cell wide on every terminal (src/ui/terminal/narrow.ts,
//    tested against string-width itself); any other text takes the full path.
// 4. Ink's Output (it turns each frame's text into a grid of styled cells and back)
//    allocated about 7 MB a frame at 80x24, which made V8 grow its young generation
//    and the workbench's resident memory by some 30 MB while typing. The patches keep
//    the result the same and the work smaller: the per-line caches live across frames
//    (bounded), the blank cell is one shared frozen object, a line of simple text
//    that fits its clip is not sliced, and ansi-tokenize skips the style diff
//    between two cells of the same style. test/build/patches.test.ts compares
//    patched and unpatched output.
// 5. Intl.Segmenter: string-width, slice-ansi and ansi-tokenize each make one when
//    they load, and the first costs about 20 ms (ICU's break data). They are made
//    on first use instead, and ansi-tokenize (which splits every line Ink draws into
//    graphemes) and string-width split text whose every character is its own
//    grapheme (isSimpleText in src/ui/terminal/narrow.ts) without one, so the
//    workbench's own text needs no ICU (slice-ansi, used only to cut a line at a
//    clip, still makes its segmenter when it first does that).
// 6. conf imports ajv, ajv-formats and semver for its `schema` and `migrations`
//    options, which tapwright never passes (conf-unused-stub.js says why); they are
//    left out, about 180 KB less to load.
import {readFile} from 'node:fs/promises';
import path from 'node:path';
import {fileURLToPath} from 'node:url';

const here = path.dirname(fileURLToPath(import.meta.url));
const DEVTOOLS_STUB = path.join(here, 'devtools-stub.js');
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

export function patchStringWidth(source, {narrow = true, segmenter = true} = {}) {
  const n = source.split(WIDTH_EXPORT).length - 1;
  if (n !== 1) throw new Error(`build: string-width changed (its default export was found ${n} times, expected once); update scripts/build-support/start-up-plugin.mjs`);
  const lazy = segmenter ? patchSegmenter(source, 'const segmenter = new Intl.Segmenter();', 'segmenter', '', 'string-width (segmenter)', true) : source;
  if (!narrow) return lazy;
  return (
    `import {visibleNarrowWidth as __twNarrowWidth} from ${JSON.stringify(NARROW)};\n` +
    lazy.replace(WIDTH_EXPORT, 'function stringWidthExact(') +
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

export function patchStyledChars(source) {
  let s = replaceOnce(
    source,
    'ret += ansiCodesToString(diffAnsiCodes(chars[i - 1].styles, char.styles));',
    'if (!__twSameStyles(chars[i - 1].styles, char.styles)) ret += ansiCodesToString(diffAnsiCodes(chars[i - 1].styles, char.styles));',
    'ansi-tokenize styledCharsToString',
  );
  s += `
function __twSameStyles(a, b) {
  if (a === b) return true;
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i].code !== b[i].code || a[i].endCode !== b[i].endCode) return false;
  return true;
}
`;
  return s;
}

const LAZY_SEGMENTER = (name, args, fast) =>
  `let ${name}Real;\n` +
  (fast ? `function* ${name}Chars(s) { for (let i = 0; i < s.length; i++) yield {segment: s[i], index: i, input: s}; }\n` : '') +
  `const ${name} = {segment: s => (${fast ? `__twSimpleText(s) ? ${name}Chars(s) : ` : ''}(${name}Real ??= new Intl.Segmenter(${args})).segment(s))};`;
const NARROW_IMPORT = `import {isSimpleText as __twSimpleText} from ${JSON.stringify(NARROW)};\n`;

/**
 * Replace `const NAME = new Intl.Segmenter(ARGS);` with a segmenter made on first use;
 * with `fast`, text whose characters are each a grapheme is split without one (only
 * for code that just iterates the segments: the fast path has no .containing()).
 */
export function patchSegmenter(source, declaration, name, args, what, fast = false) {
  return NARROW_IMPORT + replaceOnce(source, declaration, LAZY_SEGMENTER(name, args, fast), what);
}

/**
 * terminal-size imports child_process at the top for a fallback (asking tput or
 * resize) that a terminal with a size never reaches; loading child_process costs
 * every start about 4 ms. The patch loads it when the fallback runs.
 */
export function patchTerminalSize(source) {
  return replaceOnce(
    source,
    "import {execFileSync} from 'node:child_process';",
    "import {createRequire as __twCreateRequire} from 'node:module';\nconst execFileSync = (...args) => __twCreateRequire(import.meta.url)('node:child_process').execFileSync(...args);",
    'terminal-size (child_process import)',
  );
}

/**
 * signal-exit 3 loads node:assert (about 3 ms at start) for one check that a
 * callback was given; the patch makes the same check without it (same message).
 */
export function patchSignalExit(source) {
  return replaceOnce(
    source,
    "var assert = require('assert')",
    "var assert = {equal: function (actual, expected, message) { if (actual != expected) throw new Error(message) }}",
    'signal-exit (assert)',
  );
}

/**
 * conf imports node:crypto (for its encryption option, unused here) and node:assert
 * at the top. In the one-file build's outer module those imports are eager, so every
 * start paid for loading both (about 8 ms); the patch loads each on first use.
 */
export function patchConf(source) {
  let s = replaceOnce(source, "import crypto from 'node:crypto';", "import {createRequire as __twConfRequire} from 'node:module';\nconst __twLazy = name => new Proxy({}, {get: (_, key) => __twConfRequire(import.meta.url)(name)[key]});\nconst crypto = __twLazy('node:crypto');", 'conf (crypto import)');
  s = replaceOnce(s, "import assert from 'node:assert';", "const assert = __twLazy('node:assert');", 'conf (assert import)');
  return s;
}

/**
 * Every patch by name. `TAPWRIGHT_BUILD_SKIP_PATCH=name[,name]` builds without those
 * patches (the rest stay on): `npm run bench -- --patches` builds with each one off in
 * turn to measure what it saves. An unknown name fails the build.
 */
export const PATCHES = {
  'ink-output': "Ink's Output: per-line caches kept across frames, one shared blank cell, no slice of a line that fits its clip",
  'style-diff': "ansi-tokenize: no style diff between two cells of the same style",
  'narrow-width': 'string-width: code-point count for text made only of one-cell characters',
  'lazy-segmenter': 'string-width, slice-ansi, ansi-tokenize: Intl.Segmenter made on first use; simple text split without one',
  'yoga-fetch': "yoga-layout: its embedded wasm decoded without fetch (undici)",
  'devtools-stub': "Ink's DevTools module (and ws) replaced by a stub",
  'conf-unused': 'conf: ajv, ajv-formats and semver replaced by a stub',
  'conf-lazy-builtins': 'conf: node:crypto and node:assert loaded on first use',
  'terminal-size-lazy': 'terminal-size: node:child_process loaded on first use',
  'signal-exit-assert': 'signal-exit: its one callback check made without node:assert',
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
    if (on('devtools-stub')) b.onResolve({filter: /^\.\/devtools\.js$/}, args => (/[\\/]ink[\\/]build$/.test(args.resolveDir) ? {path: DEVTOOLS_STUB} : undefined));
    if (on('yoga-fetch')) load(b, /yoga-layout[\\/]dist[\\/]binaries[\\/]yoga-wasm-base64-esm\.js$/, patchYogaLoader);
    if (on('ink-output')) load(b, /[\\/]ink[\\/]build[\\/]output\.js$/, patchInkOutput);
    if (on('style-diff')) load(b, /[\\/]@alcalzone[\\/]ansi-tokenize[\\/]build[\\/]styledChars\.js$/, patchStyledChars);
    if (on('lazy-segmenter')) {
      load(b, /[\\/]slice-ansi[\\/]tokenize-ansi\.js$/, s => patchSegmenter(s, "const GRAPHEME_SEGMENTER = new Intl.Segmenter(undefined, {granularity: 'grapheme'});", 'GRAPHEME_SEGMENTER', "undefined, {granularity: 'grapheme'}", 'slice-ansi (segmenter)'));
      load(b, /[\\/]@alcalzone[\\/]ansi-tokenize[\\/]build[\\/]tokenize\.js$/, s => patchSegmenter(s, 'const segmenter = new Intl.Segmenter(undefined, { granularity: "grapheme" });', 'segmenter', 'undefined, { granularity: "grapheme" }', 'ansi-tokenize (segmenter)', true));
    }
    if (on('narrow-width') || on('lazy-segmenter')) load(b, /[\\/]string-width[\\/]index\.js$/, s => patchStringWidth(s, {narrow: on('narrow-width'), segmenter: on('lazy-segmenter')}));
    if (on('terminal-size-lazy')) load(b, /[\\/]terminal-size[\\/]index\.js$/, patchTerminalSize);
    if (on('conf-lazy-builtins')) load(b, /[\\/]conf[\\/]dist[\\/]source[\\/]index\.js$/, patchConf);
    if (on('signal-exit-assert')) load(b, /[\\/]signal-exit[\\/]index\.js$/, patchSignalExit);
  },
};
