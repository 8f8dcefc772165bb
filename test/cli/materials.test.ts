import {describe, expect, it} from 'vitest';
import {runCli} from '../../src/cli/main.js';
import {memoryIo} from '../../src/cli/io.js';
import {listBoltGrades, listNutClasses, listParentMaterials} from '../../src/core/materials/index.js';

async function run(...args: string[]) {
  const io = memoryIo();
  const code = await runCli(['materials', ...args], io);
  return {code, out: io.stdout(), err: io.stderr()};
}

describe('tapwright materials', () => {
  it('lists all three parts within 80 columns, with a source under every row', async () => {
    const r = await run();
    expect(r.code).toBe(0);
    expect(r.err).toBe('');
    for (const line of r.out.split('\n')) expect(line.length, line).toBeLessThanOrEqual(80);
    expect(r.out).toMatch(/BOLT GRADES/);
    expect(r.out).toMatch(/NUT CLASSES/);
    expect(r.out).toMatch(/PARENT MATERIALS/);
    const rows = listBoltGrades().length + listNutClasses().length + listParentMaterials().length;
    expect(r.out.match(/^ {4}source: /gm)?.length).toBe(rows);
    expect(r.out).toMatch(/Estimates only/);
  });

  it('shows the ISO 898-1 8.8 split as two rows: 800/640 and 830/660 MPa (ISO 898-1:2013 Table 3)', async () => {
    const r = await run('--kind', 'bolt');
    expect(r.out).toMatch(/^8\.8 +800 +640 +580/m);
    expect(r.out).toMatch(/^8\.8 +830 +660 +600/m);
    expect(r.out).not.toMatch(/PARENT MATERIALS/);
  });

  it('shows US units in ksi: SAE grade 5 up to 1 in, 120 ksi tensile (SAE J429 per Shigley & Mischke 5th ed. p. 341)', async () => {
    const r = await run('--kind', 'bolt', '--units', 'us');
    expect(r.out).toMatch(/ksi/);
    expect(r.out).toMatch(/^SAE-5 +120 +92\.0 +85\.0/m);
  });

  it('gives JSON in SI whatever --units says, with provenance on every entry', async () => {
    const r = await run('--json', '--units', 'us');
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.out) as {
      units: {stress: string};
      boltGrades: {id: string; rmMin: number; provenance: {source: string}}[];
      parentMaterials: {provenance: {source: string}}[];
      nutClasses: unknown[];
      hexHeads: unknown[];
      nutDimensions: unknown[];
    };
    expect(doc.units.stress).toBe('MPa');
    expect(doc.boltGrades.find(g => g.id === '10.9')?.rmMin).toBe(1040);
    for (const e of [...doc.boltGrades, ...doc.parentMaterials]) expect(e.provenance.source.length).toBeGreaterThan(3);
    expect(doc.nutClasses.length).toBeGreaterThan(0);
    expect(doc.hexHeads.length).toBeGreaterThan(0);
    expect(doc.nutDimensions.length).toBeGreaterThan(0);
  });

  it('filters JSON by --kind', async () => {
    const doc = JSON.parse((await run('--json', '--kind', 'parent')).out) as Record<string, unknown>;
    expect(Object.keys(doc).sort()).toEqual(['parentMaterials', 'units']);
  });

  it('rejects a bad --units or --kind with exit 2, naming the option and the accepted values', async () => {
    const u = await run('--units', 'imperial');
    expect(u.code).toBe(2);
    expect(u.err).toMatch(/--units is "imperial"; accepted: si, us/);
    const k = await run('--kind', 'washer');
    expect(k.code).toBe(2);
    expect(k.err).toMatch(/--kind is "washer"; accepted: bolt, nut, parent/);
    const x = await run('--colour');
    expect(x.code).toBe(2);
    expect(x.err).toMatch(/unknown option --colour/);
    const p = await run('8.8');
    expect(p.code).toBe(2);
    expect(p.out).toBe('');
  });

  it('prints its help', async () => {
    const r = await run('--help');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/--kind bolt\|nut\|parent/);
    for (const line of r.out.split('\n')) expect(line.length).toBeLessThanOrEqual(80);
  });
});
