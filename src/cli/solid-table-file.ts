/**
 * Read a solid key-locked insert table from a JSON file for `repair --solid-table`
 * and `inserts import`; every failure is a UsageError naming `what`.
 */
import path from 'node:path';
import {UsageError, type CliIo} from './io.js';
import {parseSolidInsertTable, type SolidInsertTable} from '../core/repair/index.js';
import {MAX_IMPORT_BYTES, MAX_IMPORT_TEXT, parseGuarded} from '../store/guard.js';
import {describeFsError, readPlain} from '../store/file-ops.js';
import {StoreError} from '../store/errors.js';
import {printable} from '../core/text-safety.js';

/**
 * The text of a JSON input file given on the command line (a material list, an
 * insert table): a plain file of at most MAX_IMPORT_BYTES, its size and kind
 * checked before it is read, never blocking on a FIFO. UsageError otherwise.
 */
export function readInputFile(full: string, shown: string, what: string, option: string): string {
  const name = printable(shown, {max: 80});
  let r;
  try {
    r = readPlain(full, MAX_IMPORT_BYTES, {follow: true, what: 'JSON file'});
  } catch (e) {
    const why = e instanceof StoreError ? e.message.replace(full, `"${name}"`) : describeFsError(e);
    throw new UsageError(`${what}: cannot read "${name}": ${why}`, option);
  }
  if (r.kind === 'missing') throw new UsageError(`${what}: cannot read "${name}": no such file`, option);
  if (r.kind === 'too-big') throw new UsageError(`${what}: "${name}" is larger than ${MAX_IMPORT_TEXT} (${MAX_IMPORT_BYTES} bytes); nothing was read`, option);
  return r.text;
}

export async function readSolidTableFile(file: string, io: CliIo, what: string, option: string): Promise<SolidInsertTable> {
  const text = readInputFile(path.resolve(io.cwd, file), file, what, option);
  const parsed = parseGuarded(text);
  if (!parsed.ok) throw new UsageError(`${what}: "${printable(file, {max: 80})}" is not JSON we accept: ${parsed.error}`, option);
  const t = parseSolidInsertTable(parsed.value);
  if (!t.ok) throw new UsageError(`${what}: ${t.error}`, option);
  return t.value;
}
