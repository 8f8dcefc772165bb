/**
 * Loads the workbench (Ink, React and the screens) when it is about to start, so
 * commands never load them. This is the form tests and `tsc` see; the build
 * (scripts/build.mjs) puts workbench-loader-cached.ts in its place, which runs
 * the workbench from a separate bundle through a V8 code cache.
 */
import type {CliIo} from './io.js';

export type LaunchWorkbench = (args: string[], io: CliIo) => Promise<number>;

export async function loadWorkbench(_io: CliIo): Promise<LaunchWorkbench> {
  return (await import('../ui/launch.js')).launch;
}
