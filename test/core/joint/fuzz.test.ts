import {describe, expect, it} from 'vitest';
import {fuzzCheck} from './fuzz-space.js';

describe('fuzz: tapwright check over the whole option space (fast-check)', () => {
  it('1,000 generated joints: no crash, no NaN or Infinity, every rejection names its option', async () => {
    const r = await fuzzCheck(1000);
    const total = Object.values(r.byCode).reduce((a, b) => a + b, 0);
    console.info(`fuzz: ${total} generated joints; by exit code ${JSON.stringify(r.byCode)}`);
    expect(total).toBe(1000);
    // The generator must reach both computed results and rejections.
    expect((r.byCode[0] ?? 0) + (r.byCode[3] ?? 0)).toBeGreaterThan(100);
    expect(r.byCode[2] ?? 0).toBeGreaterThan(100);
  }, 60000);
});
