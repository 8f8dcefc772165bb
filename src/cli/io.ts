/**
 * The CLI's view of the outside world. Commands never touch `process` directly,
 * so tests can run them in-process with captured output.
 */
export interface CliIo {
  /** Write to standard output (results, JSON). */
  out(text: string): void;
  /** Write to standard error (messages, warnings). */
  err(text: string): void;
  env: Record<string, string | undefined>;
  cwd: string;
  stdinIsTTY: boolean;
  stdoutIsTTY: boolean;
  /** Current time; injected so reports are reproducible in tests. */
  now(): Date;
}

/** Exit codes, documented in `tapwright --help`. */
export const EXIT = {
  ok: 0,
  internal: 1,
  usage: 2,
  /** Computed, but at least one check is at level `fail`. */
  fail: 3,
} as const;

/** Bad input or usage: the message names the option and the accepted range. */
export class UsageError extends Error {
  constructor(
    message: string,
    /** The option or argument at fault, e.g. "--engage". */
    readonly option?: string,
  ) {
    super(message);
    this.name = 'UsageError';
  }
}

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
