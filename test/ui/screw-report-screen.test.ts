/**
 * The workbench's Report screen in power-screw mode: the same work-order report
 * as `tapwright screw` (text and Markdown), with the notes, the date and the
 * sign-off, and the flags in the display units.
 */
import {mkdtempSync, rmSync} from 'node:fs';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {describe, expect, it, onTestFinished} from 'vitest';
import {realServices} from '../../src/ui/real-services.js';
import {reportText} from '../../src/ui/screens/report/reducer.js';
import {evaluate} from '../../src/ui/state/evaluate.js';
import {initialState, type WorkbenchState} from '../../src/ui/state/workbench.js';
import {runCli} from '../../src/cli/main.js';
import {memoryIo} from '../../src/cli/io.js';

function services() {
  const dir = mkdtempSync(path.join(tmpdir(), 'tw-screw-report-'));
  onTestFinished(() => rmSync(dir, {recursive: true, force: true}));
  return {dir, svc: realServices({configDir: dir, cwd: dir, now: () => new Date('2026-01-01T00:00:00Z')})};
}

function screwState(svc: ReturnType<typeof services>['svc'], units: 'si' | 'us', format: 'text' | 'markdown', over?: Record<string, unknown>): WorkbenchState {
  const p = svc.presets.load('demo-lifting-table-screw');
  const values = over ? {...p.values, screw: {...p.values.screw, ...over}} : p.values;
  const s = initialState({name: p.name, readOnly: p.readOnly, values: values as never, units, ascii: true, mode: 'screw'});
  return {...s, screen: 'report', report: {...s.report, format}};
}

describe('Report screen in power-screw mode', () => {
  it('Markdown: the screw report with date, preset, notes, flags, cautions and sign-off, as screw --format markdown prints it', async () => {
    const {dir, svc} = services();
    const s = screwState(svc, 'si', 'markdown');
    const md = reportText(s, svc, evaluate(s.values, svc, 'si', true)).text ?? '';
    expect(md).toMatch(/^# Power screw check: /);
    expect(md).toContain('| Date | 2026-01-01 |');
    expect(md).toContain('| Preset | demo-lifting-table-screw |');
    expect(md).toContain('## Cautions');
    expect(md).toContain('## Sign-off');
    const io = memoryIo({env: {TAPWRIGHT_CONFIG_DIR: dir}});
    await runCli(['screw', '--preset', 'demo-lifting-table-screw', '--format', 'markdown'], io);
    expect(md).toBe(io.stdout());
  });

  it('text: the work-order header and the mandatory sign-off with a lifting duty', () => {
    const {svc} = services();
    const s = screwState(svc, 'si', 'text', {duty: 'lifting'});
    const text = reportText(s, svc, evaluate(s.values, svc, 'si', true)).text ?? '';
    expect(text).toMatch(/WORK ORDER\n\s+Date\s+2026-01-01/);
    expect(text).toMatch(/Duty\s+lifting equipment/);
    expect(text).toMatch(/MANDATORY: Duty: lifting equipment/);
  });

  it('US units: the flag numbers follow the display units', () => {
    const {svc} = services();
    // A short nut (10 mm): the flank pressure and stripping flags carry numbers.
    const s = screwState(svc, 'us', 'text', {nutLength: 10});
    const text = reportText(s, svc, evaluate(s.values, svc, 'us', true)).text ?? '';
    const flags = text.slice(text.indexOf('\nFlags'), text.indexOf('\nSources'));
    expect(flags).toMatch(/\d ksi|\d lbf/);
    expect(flags).not.toMatch(/\d MPa|\d(\.\d+)? kN\b|N·m/);
  });

  it('the work-order notes typed in the workbench are in the report', () => {
    const {svc} = services();
    const s0 = screwState(svc, 'si', 'markdown');
    const s = {...s0, values: {...s0.values, notes: {asset: 'LT-9 demo', workOrder: 'WO-42'}}};
    const md = reportText(s, svc, evaluate(s.values, svc, 'si', true)).text ?? '';
    expect(md).toContain('| Asset | LT-9 demo |');
    expect(md).toContain('| Work order | WO-42 |');
  });
});
