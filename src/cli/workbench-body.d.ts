/** The workbench bundle, as text, made by scripts/build.mjs (see workbench-loader-cached.ts). */
declare module 'tapwright:workbench-body' {
  /** CommonJS source of the workbench (entry src/ui/launch.ts). */
  export const BODY: string;
  /** sha256 of BODY, hex. */
  export const BODY_HASH: string;
}
