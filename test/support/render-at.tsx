/**
 * Render an Ink tree into a fake terminal of a chosen size (ink-testing-library
 * fixes the width at 100 and has no rows). Frames are recorded in full.
 */
import {EventEmitter} from 'node:events';
import type React from 'react';
import {render} from 'ink';

export class FakeStdout extends EventEmitter {
  frames: string[] = [];
  isTTY = true;
  constructor(
    public columns = 80,
    public rows = 24,
  ) {
    super();
  }
  write = (frame: string): boolean => {
    this.frames.push(frame);
    return true;
  };
  lastFrame = (): string => this.frames.at(-1) ?? '';
  resize(columns: number, rows: number): void {
    this.columns = columns;
    this.rows = rows;
    this.emit('resize');
  }
}

export class FakeStdin extends EventEmitter {
  isTTY = true;
  private data: string | null = null;
  write(data: string): void {
    this.data = data;
    this.emit('readable');
  }
  read(): string | null {
    const d = this.data;
    this.data = null;
    return d;
  }
  setEncoding(): void {}
  setRawMode(): void {}
  ref(): void {}
  unref(): void {}
  resume(): void {}
  pause(): void {}
}

export function renderAt(tree: React.ReactElement, {columns = 80, rows = 24} = {}) {
  const stdout = new FakeStdout(columns, rows);
  const stdin = new FakeStdin();
  const instance = render(tree, {
    stdout: stdout as unknown as NodeJS.WriteStream,
    stdin: stdin as unknown as NodeJS.ReadStream,
    stderr: new FakeStdout() as unknown as NodeJS.WriteStream,
    debug: true,
    exitOnCtrlC: false,
    patchConsole: false,
  });
  return {...instance, stdout, stdin, lastFrame: stdout.lastFrame};
}
