/**
 * The CLI's view of the outside world. CliIo and UsageError live in src/app
 * (the store and the no-terminal report use them too); re-exported here.
 */
import type {CliIo} from '../app/io.js';

export type {CliIo} from '../app/io.js';
export {UsageError} from '../app/errors.js';

/** Exit codes, documented in `tapwright --help`. */
export const EXIT = {
  ok: 0,
  internal: 1,
  usage: 2,
  /** Computed, but at least one check is at level `fail`. */
  fail: 3,
} as const;

/** An in-memory CliIo for tests and for embedding. */
export function memoryIo(overrides: Partial<CliIo> = {}): CliIo & {stdout: () => string; stderr: () => string} {
  let out = '';
  let err = '';
  return {
    out: (t: string) => {
      out += t;
    },
    err: (t: string) => {
      err += t;
    },
    env: {},
    cwd: process.cwd(),
    stdinIsTTY: false,
    stdoutIsTTY: false,
    now: () => new Date('2026-01-01T00:00:00Z'),
    ...overrides,
    stdout: () => out,
    stderr: () => err,
  };
}
