import {describe, expect, it} from 'vitest';
import {mkdtempSync, readFileSync, writeFileSync} from 'node:fs';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {runCli} from '../../src/cli/main.js';
import {memoryIo} from '../../src/cli/io.js';

// Demo scenario (invented): a worn M10 tapped hole in a 6082-T6 conveyor gearbox cover.
describe('a preset carrying measurements (the joint input key `measured`)', () => {
  it('imports, checks as measured per thread, and the report lists each measurement with its instrument', async () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'tw-measured-'));
    const run = async (...a: string[]) => {
      const io = memoryIo({env: {TAPWRIGHT_CONFIG_DIR: dir}});
      const code = await runCli(a, io);
      return {code, out: io.stdout(), err: io.stderr()};
    };
    expect((await run('presets', 'save', 'cover-worn', '--thread', 'M10x1.5-6H/6g', '--parent', '6082-T6', '--engage', '15', '--torque', '35Nm')).code).toBe(0);
    const file = path.join(dir, 'x.json');
    expect((await run('presets', 'export', file, 'cover-worn')).code).toBe(0);
    const j = JSON.parse(readFileSync(file, 'utf8'));
    j.presets[0].joint.measured = {overWires: {measurement: 10.15, wire: 0.866}, holeMinorDiameter: 8.82, holePitchDiameter: 9.31};
    writeFileSync(file, JSON.stringify(j));
    expect((await run('presets', 'import', file, '--overwrite')).code).toBe(0);
    const before = JSON.parse((await run('check', '--thread', 'M10x1.5-6H/6g', '--parent', '6082-T6', '--engage', '15', '--torque', '35Nm', '--json')).out);
    const r = await run('check', '--preset', 'cover-worn', '--json');
    const after = JSON.parse(r.out);
    expect(after.stripping.limitsUsed).toEqual({external: 'measured', internal: 'mixed'});
    expect(before.stripping.limitsUsed).toEqual({external: 'least-material', internal: 'least-material'});
    expect(after.margin.boltBreaksFirst).toBeLessThan(before.margin.boltBreaksFirst);
    const text = (await run('check', '--preset', 'cover-worn')).out;
    expect(text).toMatch(/AS MEASURED\n {2}bolt pitch diameter: 8\.849 mm/);
    expect(text).toMatch(/hole minor diameter: 8\.820 mm, pin gauge or bore gauge/);
  });
});
