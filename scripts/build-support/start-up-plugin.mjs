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
import {readFile} from 'node:fs/promises';
import path from 'node:path';
import {fileURLToPath} from 'node:url';

const here = path.dirname(fileURLToPath(import.meta.url));
const DEVTOOLS_STUB = path.join(here, 'devtools-stub.js');
const NARROW = path.join(here, '..', '..', 'src', 'ui', 'terminal', 'narrow.ts');

/** The text in yoga's loader and what it becomes. */
export const YOGA_FETCH = {
  from: 'function ya(){return w||"function"!=typeof fetch?',
  to: 'function ya(){return w||ua(H)||"function"!=typeof fetch?',
};

export function patchYogaLoader(source) {
  const n = source.split(YOGA_FETCH.from).length - 1;
  if (n !== 1) {
    throw new Error(`build: yoga-layout's wasm loader changed (the fetch branch was found ${n} times, expected once); update scripts/build-support/start-up-plugin.mjs`);
  }
  return source.replace(YOGA_FETCH.from, YOGA_FETCH.to);
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

export const startUpPlugin = {
  name: 'tapwright-start-up',
  setup(b) {
    b.onResolve({filter: /^\.\/devtools\.js$/}, args => (/[\\/]ink[\\/]build$/.test(args.resolveDir) ? {path: DEVTOOLS_STUB} : undefined));
    b.onLoad({filter: /yoga-layout[\\/]dist[\\/]binaries[\\/]yoga-wasm-base64-esm\.js$/}, async args => ({
      contents: patchYogaLoader(await readFile(args.path, 'utf8')),
      loader: 'js',
    }));
    b.onLoad({filter: /[\\/]string-width[\\/]index\.js$/}, async args => ({
      contents: patchStringWidth(await readFile(args.path, 'utf8')),
      loader: 'js',
    }));
  },
};
