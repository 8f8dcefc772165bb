/**
 * Read a solid key-locked insert table from a JSON file for `repair --solid-table`
 * and `inserts import`; every failure is a UsageError naming `what`.
 */
import {readFile} from 'node:fs/promises';
import path from 'node:path';
import {UsageError, type CliIo} from './io.js';
import {parseSolidInsertTable, type SolidInsertTable} from '../core/repair/index.js';
import {MAX_IMPORT_BYTES, MAX_IMPORT_TEXT} from '../store/guard.js';

export async function readSolidTableFile(file: string, io: CliIo, what: string, option: string): Promise<SolidInsertTable> {
  let text: string;
  try {
    text = await readFile(path.resolve(io.cwd, file), 'utf8');
  } catch {
    throw new UsageError(`${what}: cannot read "${file}"`, option);
  }
  if (Buffer.byteLength(text) > MAX_IMPORT_BYTES) throw new UsageError(`${what}: "${file}" is larger than ${MAX_IMPORT_TEXT}`, option);
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch {
    throw new UsageError(`${what}: "${file}" is not JSON`, option);
  }
  const t = parseSolidInsertTable(data);
  if (!t.ok) throw new UsageError(`${what}: ${t.error}`, option);
  return t.value;
}
