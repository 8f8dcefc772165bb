/**
 * Reading a file that may be anything: a plain file of bounded size, or a FIFO,
 * device, folder or link standing where one is expected. Never blocks, never
 * reads past the limit.
 */
import fs from 'node:fs';
import {StoreError} from './errors.js';

const errCode = (e: unknown): string => (e as NodeJS.ErrnoException | undefined)?.code ?? '';

/** What a file is, in words, for a message: "a folder", "a named pipe (FIFO)". */
export function kindOf(st: fs.Stats): string {
  if (st.isDirectory()) return 'a folder';
  if (st.isSymbolicLink()) return 'a symbolic link';
  if (st.isFIFO()) return 'a named pipe (FIFO)';
  if (st.isSocket()) return 'a socket';
  if (st.isCharacterDevice() || st.isBlockDevice()) return 'a device';
  return 'not a plain file';
}

export type PlainRead = {kind: 'missing'} | {kind: 'text'; text: string; size: number} | {kind: 'too-big'; size: number};

/**
 * Read a plain file of at most `maxBytes` without ever blocking: opened with
 * O_NONBLOCK (a FIFO does not wait for a writer), checked with fstat to be a
 * regular file before a byte is read, and read at most one byte past the limit
 * (a file that grows after the check, or /dev/zero, is still refused). With
 * `follow: false` a symbolic link is refused (O_NOFOLLOW, and lstat where that
 * flag does not exist). Throws StoreError naming the file for anything else
 * than a plain file; other errors (EACCES...) are thrown as they are.
 */
export function readPlain(file: string, maxBytes: number, o: {follow?: boolean; what?: string} = {}): PlainRead {
  const what = o.what ?? 'file';
  const c = fs.constants;
  const noFollow = o.follow === false ? (c.O_NOFOLLOW ?? 0) : 0;
  const refuse = (kind: string) =>
    new StoreError(
      kind === 'a symbolic link'
        ? `${file} is a symbolic link; tapwright does not follow links for its own files: put the file itself there (the config folder may be a link)`
        : `${file} is ${kind}, not a plain file; tapwright reads a ${what} only from a plain file: move it away`,
    );
  if (o.follow === false) {
    try {
      const st = fs.lstatSync(file);
      if (st.isSymbolicLink()) throw refuse('a symbolic link');
    } catch (e) {
      if (errCode(e) === 'ENOENT') return {kind: 'missing'};
      throw e;
    }
  }
  let fd: number;
  try {
    fd = fs.openSync(file, c.O_RDONLY | (c.O_NONBLOCK ?? 0) | noFollow);
  } catch (e) {
    if (errCode(e) === 'ENOENT') return {kind: 'missing'};
    if (errCode(e) === 'ELOOP') throw refuse('a symbolic link');
    if (errCode(e) === 'EISDIR') throw refuse('a folder');
    throw e;
  }
  try {
    const st = fs.fstatSync(fd);
    if (!st.isFile()) throw refuse(kindOf(st));
    if (st.size > maxBytes) return {kind: 'too-big', size: st.size};
    // Read in chunks to the end, at most one byte past the limit (the file may grow meanwhile).
    const chunks: Buffer[] = [];
    let n = 0;
    for (;;) {
      const buf = Buffer.allocUnsafe(Math.min(Math.max(st.size - n + 1, 65536), maxBytes + 1 - n, 1 << 24));
      const got = fs.readSync(fd, buf, 0, buf.length, null);
      if (got === 0) break;
      chunks.push(buf.subarray(0, got));
      n += got;
      if (n > maxBytes) return {kind: 'too-big', size: n};
    }
    return {kind: 'text', text: Buffer.concat(chunks, n).toString('utf8'), size: n};
  } finally {
    fs.closeSync(fd);
  }
}

/** readPlain for a small file: its text, undefined when missing; too big is a StoreError naming the limit. */
export function readRegularFile(file: string, maxBytes: number, what = 'file', follow = false): string | undefined {
  const r = readPlain(file, maxBytes, {follow, what});
  if (r.kind === 'missing') return undefined;
  if (r.kind === 'too-big') throw new StoreError(`${file} is ${r.size} bytes; a ${what} is read only up to ${maxBytes} bytes: move it away`);
  return r.text;
}
