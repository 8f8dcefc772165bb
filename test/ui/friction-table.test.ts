/**
 * Power-screw mode: the thread and collar friction fields offer the rows of
 * Shigley, Mechanical Engineering Design, 9th ed., Table 8-5 (thread friction
 * by screw and nut material) and Table 8-6 (thrust-collar friction) as picks,
 * each with its source; the pick sets the number field.
 */
import {mkdtempSync, rmSync} from 'node:fs';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {describe, expect, it, onTestFinished} from 'vitest';
import {realServices} from '../../src/ui/real-services.js';
import {handleKeys} from '../../src/ui/run-effects.js';
import {initialState, pickerItems, type WorkbenchState} from '../../src/ui/state/workbench.js';
import {currentFields} from '../../src/ui/state/workbench.js';
import {getValue} from '../../src/ui/state/fields.js';

function screwState() {
  const dir = mkdtempSync(path.join(tmpdir(), 'tw-friction-'));
  onTestFinished(() => rmSync(dir, {recursive: true, force: true}));
  const svc = realServices({configDir: dir, cwd: dir, now: () => new Date()});
  const p = svc.presets.load('demo-lifting-table-screw');
  const s: WorkbenchState = {...initialState({name: p.name, readOnly: p.readOnly, values: p.values, units: 'si', ascii: true, mode: 'screw'}), step: 2, field: 0};
  return {svc, s};
}

describe('friction tables as picks in the power-screw mode', () => {
  it('t on thread friction lists Table 8-5 with its source; Enter sets the range', () => {
    const {svc, s} = screwState();
    expect(currentFields(s)[0]?.id).toBe('screw.muThread');
    const open = handleKeys(s, [{name: 'char', char: 't'}], svc);
    const items = pickerItems(open, svc);
    // Shigley 9th ed. Table 8-5: steel screw, machine oil, bronze nut: f 0.10 to 0.16.
    const oilBronze = items.findIndex(i => i.value === 'steel-oil/bronze');
    expect(oilBronze).toBeGreaterThanOrEqual(0);
    expect(items[oilBronze]?.item?.provenance.source).toMatch(/Table 8-5/);
    expect(items[oilBronze]?.label).toMatch(/f 0\.10 to 0\.16/);
    const moved = {...open, picker: {...open.picker!, index: oilBronze}};
    const taken = handleKeys(moved, [{name: 'enter'}], svc);
    expect(taken.picker).toBeUndefined();
    expect(getValue(taken.values, 'screw.muThread')).toEqual({min: 0.1, max: 0.16});
  });

  it('t on collar friction lists Table 8-6, running and starting values', () => {
    const {svc, s} = screwState();
    const onCollar = {...s, field: 1};
    expect(currentFields(onCollar)[1]?.id).toBe('screw.muCollar');
    const open = handleKeys(onCollar, [{name: 'char', char: 't'}], svc);
    const items = pickerItems(open, svc);
    // Shigley 9th ed. Table 8-6: hard steel on bronze, running 0.06, starting 0.08.
    const starting = items.findIndex(i => i.value === 'hard-steel/bronze:starting');
    expect(items[starting]?.item?.provenance.source).toMatch(/Table 8-6/);
    const taken = handleKeys({...open, picker: {...open.picker!, index: starting}}, [{name: 'enter'}], svc);
    expect(getValue(taken.values, 'screw.muCollar')).toBe(0.08);
  });

  it('t on a field without a table says so and changes nothing', () => {
    const {svc, s} = screwState();
    const onDia = {...s, field: 2};
    const r = handleKeys(onDia, [{name: 'char', char: 't'}], svc);
    expect(r.picker).toBeUndefined();
    expect(r.message?.text).toMatch(/no published table/);
  });
});
