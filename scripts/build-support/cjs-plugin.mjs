// esbuild plugin for the CommonJS workbench bundle (dist/.../workbench body, run
// through a V8 code cache by src/cli/code-cache.ts). CommonJS has no module-level
// `await`; two packages use one:
// - Ink's reconciler awaits its DevTools module and its own package.json, both only
//   when DEV=true. Neither is needed in the bundle (DEV is false; with the import
//   gone, neither devtools.js nor react-devtools-core and ws are bundled).
// - yoga-layout awaits the instantiation of its WebAssembly. The patched module
//   starts that work when it loads, fills in its export when it is done, and
//   leaves the promise under Symbol.for('tapwright.yoga-ready'); the launcher
//   awaits it before the first render (src/ui/terminal/yoga-ready.ts).
// Each patch fails the build when the text it replaces is not found exactly once.
import {readFile} from 'node:fs/promises';
import {replaceOnce} from './start-up-plugin.mjs';

export function patchInkReconciler(source) {
  let s = replaceOnce(source, "await import('./devtools.js');", 'void 0;', "Ink's reconciler (DevTools import)");
  s = replaceOnce(s, '? await loadPackageJson()', '? {}', "Ink's reconciler (package.json read)");
  return s;
}

export function patchYogaIndex(source) {
  return replaceOnce(
    source,
    'const Yoga = wrapAssembly(await loadYoga());',
    "const Yoga = {};\nglobalThis[Symbol.for('tapwright.yoga-ready')] = loadYoga().then(lib => { Object.assign(Yoga, wrapAssembly(lib)); });",
    "yoga-layout's entry",
  );
}

export const cjsPlugin = {
  name: 'tapwright-cjs',
  setup(b) {
    b.onLoad({filter: /[\\/]ink[\\/]build[\\/]reconciler\.js$/}, async args => ({contents: patchInkReconciler(await readFile(args.path, 'utf8')), loader: 'js'}));
    b.onLoad({filter: /[\\/]yoga-layout[\\/]dist[\\/]src[\\/]index\.js$/}, async args => ({contents: patchYogaIndex(await readFile(args.path, 'utf8')), loader: 'js'}));
  },
};
