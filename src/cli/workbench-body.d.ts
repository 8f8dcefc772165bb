/** The workbench bundle, made by scripts/build.mjs (see workbench-loader-cached.ts). */
declare module 'tapwright:workbench-body' {
  /** CommonJS source of the workbench (entry src/ui/launch.ts): kept as text in the one-file build, read from a file beside the split build's chunk. */
  export function readBody(): string;
  /** The file the body is read from (split build), or undefined when it is kept as text (one-file build). */
  export const BODY_FILE: string | undefined;
  /** sha256 of the body, hex. */
  export const BODY_HASH: string;
}
