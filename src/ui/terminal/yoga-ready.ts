/**
 * yoga-layout (Ink's layout engine) instantiates its WebAssembly with a
 * module-level `await`. The build's CommonJS workbench bundle cannot wait at
 * module level, so the build patches yoga to start that work at load and leave
 * the promise under this symbol (scripts/build-support/cjs-plugin.mjs); the
 * launcher waits for it before the first render. From source (tests, tsc),
 * there is nothing to wait for.
 */
export const YOGA_READY = Symbol.for('tapwright.yoga-ready');

export async function yogaReady(): Promise<void> {
  await (globalThis as Record<symbol, unknown>)[YOGA_READY];
}
