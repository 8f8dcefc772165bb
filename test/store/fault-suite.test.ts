/**
 * The store fault suite at a small size (npm run fuzz runs it at full size):
 * concurrent writers, kill -9 inside the lock and at random moments, a stopped
 * lock holder, and damaged files of every kind through the CLI entry.
 */
import {afterAll, beforeAll, describe, expect, it} from 'vitest';
// @ts-expect-error plain .mjs support file without types
import {bundle} from '../../scripts/fuzz-support/bundle-entry.mjs';
// @ts-expect-error plain .mjs support file without types
import {storeFaults} from '../../scripts/fuzz-support/store-faults.mjs';

type Bundle = {file: string; cleanup: () => void};
let entry: Bundle;
let store: Bundle;
beforeAll(async () => {
  entry = await bundle();
  store = await bundle('src/store/index.ts', 'store');
}, 120_000);
afterAll(() => {
  entry?.cleanup();
  store?.cleanup();
});

describe('store fault suite (small)', () => {
  it('keeps every save, recovers every lock, and never hangs or crashes on a damaged file', async () => {
    const r = (await storeFaults({storeBundle: store.file, entry: entry.file, size: 'small', seed: 15})) as {counts: Record<string, number>; failures: string[]};
    expect(r.failures).toEqual([]);
    expect(r.counts).toMatchObject({saves: 6, lockKills: 1, randomKills: 2, stops: 1, damagedFiles: 12});
    console.info(`store fault suite (small): ${JSON.stringify(r.counts)}`);
  }, 300_000); // real processes on a shared machine; no timing assertion
});
