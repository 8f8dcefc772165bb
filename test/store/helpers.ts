import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import {afterAll} from 'vitest';
import type {SavablePreset} from '../../src/store/schema.js';

const made: string[] = [];
// Registered in the root suite of each test file that imports this module.
afterAll(() => {
  for (const d of made.splice(0)) fs.rmSync(d, {recursive: true, force: true});
});

/** A fresh config folder per test, removed after the file's tests. */
export function tempDir(label = 'store'): string {
  const d = fs.mkdtempSync(path.join(os.tmpdir(), `tapwright-${label}-`));
  made.push(d);
  return d;
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
