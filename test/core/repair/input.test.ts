import {describe, expect, it} from 'vitest';
import {readFileSync} from 'node:fs';
import {DEMO_SOLID_INSERTS, DEMO_TABLE_WARNING, RepairInputSchema, SolidInsertTableSchema, parseSolidInsertTable} from '../../../src/core/repair/index.js';

describe('RepairInputSchema', () => {
  it('applies the defaults', () => {
    const r = RepairInputSchema.parse({});
    expect(r).toMatchObject({holeState: 'intact', through: false, boltLengthMayChange: true});
    expect(r.margin).toBeUndefined();
  });
  it('rejects a stripped depth on an intact hole, naming the field', () => {
    const r = RepairInputSchema.safeParse({strippedDepth: 4});
    expect(r.success).toBe(false);
    expect(r.error?.issues[0]?.path).toEqual(['strippedDepth']);
  });
  it('rejects a stripped depth deeper than the depth available', () => {
    const r = RepairInputSchema.safeParse({holeState: 'stripped', strippedDepth: 30, depthAvailable: 20});
    expect(r.error?.issues[0]?.message).toMatch(/deeper than the depth available/);
  });
  it('rejects a margin outside 0.5 to 5', () => {
    expect(RepairInputSchema.safeParse({margin: 0.2}).success).toBe(false);
    expect(RepairInputSchema.safeParse({margin: 6}).success).toBe(false);
  });
});

describe('solid key-locked insert table', () => {
  it('the shipped demo table validates and says it is demo data', () => {
    const raw = JSON.parse(readFileSync(new URL('../../../presets/solid-inserts-demo.json', import.meta.url), 'utf8')) as unknown;
    const t = SolidInsertTableSchema.parse(raw);
    expect(t.provenance.kind).toBe('demo');
    expect(t.provenance.source).toContain(DEMO_TABLE_WARNING);
    expect(DEMO_SOLID_INSERTS.entries.length).toBe(t.entries.length);
    for (const type of ['thin-wall', 'heavy-duty']) expect(t.entries.some(e => e.type === type)).toBe(true);
  });
  it('rejects a demo table without the warning, and a bad entry with its path', () => {
    const good = structuredClone(DEMO_SOLID_INSERTS);
    const noWarning = {...good, provenance: {kind: 'demo', source: 'numbers'}};
    expect(parseSolidInsertTable(noWarning)).toMatchObject({ok: false, error: expect.stringMatching(/provenance\.source/)});
    const badLength = structuredClone(good);
    (badLength.entries[0] as {length: number}).length = -1;
    expect(parseSolidInsertTable(badLength)).toMatchObject({ok: false, error: expect.stringMatching(/entries\.0\.length/)});
    expect(parseSolidInsertTable({...good, provenance: {kind: 'maker', source: 'maker catalogue 2026'}}).ok).toBe(true);
  });
});
