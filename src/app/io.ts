/**
 * The outside world as the commands (and the code they share with the store
 * and the no-terminal report) see it. Commands never touch `process` directly,
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
