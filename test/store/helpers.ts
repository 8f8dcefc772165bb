import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type {SavablePreset} from '../../src/store/schema.js';

/** A fresh config folder per test. */
export function tempDir(label = 'store'): string {
  return fs.mkdtempSync(path.join(os.tmpdir(), `tapwright-${label}-`));
}

/** A small valid joint preset (invented test data). */
export function jointPreset(name: string, over: Partial<SavablePreset> = {}): SavablePreset {
  return {
    name,
    kind: 'joint',
    joint: {thread: 'M10', boltGrade: '8.8', parent: 'S355', engagement: 12},
    notes: {asset: 'TEST-1', text: 'test data'},
    ...over,
  };
}

export const fixture = (name: string) => path.join(path.dirname(new URL(import.meta.url).pathname), '..', 'fixtures', 'store', name);
