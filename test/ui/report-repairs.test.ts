/**
 * The workbench's work-order report carries the ranked repairs, and the repair
 * marked on the Repairs screen as the repair chosen, when the hole is stripped
 * or the check failed; a clean joint's report does not.
 */
import {mkdtempSync, rmSync} from 'node:fs';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {describe, expect, it, onTestFinished} from 'vitest';
import {realServices} from '../../src/ui/real-services.js';
import {reportText} from '../../src/ui/screens/report/reducer.js';
import {evaluate, evaluateRepairs} from '../../src/ui/state/evaluate.js';
import {initialState, type WorkbenchState} from '../../src/ui/state/workbench.js';

function services() {
  const dir = mkdtempSync(path.join(tmpdir(), 'tw-report-repairs-'));
  onTestFinished(() => rmSync(dir, {recursive: true, force: true}));
  return realServices({configDir: dir, cwd: dir, now: () => new Date('2026-05-06T07:08:09Z')});
}

describe('report with the repair plan', () => {
  it('the shipped demo (check fails) carries the ranked repairs and the chosen one as chosen', () => {
    const svc = services();
    const demo = svc.presets.load(svc.defaultPreset);
    const ev0 = evaluate(demo.values, svc, 'si', true);
    const second = evaluateRepairs(demo.values, svc, ev0).plan!.options[1]!;
    // The repair is chosen on the Repairs screen (c), kept by identity in the values.
    const values = {...demo.values, chosenRepair: {kind: second.kind, label: second.label}};
    const s: WorkbenchState = {...initialState({name: demo.name, readOnly: demo.readOnly, values, units: 'si', ascii: true}), screen: 'report', repairIndex: 1};
    const ev = evaluate(s.values, svc, 'si', true);
    expect(ev.result?.flags.some(f => f.level === 'fail')).toBe(true);
    const md = reportText(s, svc, ev).text ?? '';
    expect(md).toContain('## Repair plan');
    expect(md).toContain(`**Repair chosen:** ${second.rank} ${second.label}`);
    expect(md).toContain('### Ranked options');
    // The repair plan stands before the cautions and the sign-off.
    expect(md.indexOf('## Repair plan')).toBeLessThan(md.indexOf('## Cautions'));
    expect(md.indexOf('## Cautions')).toBeLessThan(md.indexOf('## Sign-off'));
    const text = reportText({...s, report: {format: 'text', scroll: 0}}, svc, ev).text ?? '';
    expect(text).toContain('REPAIR PLAN (ranked)');
    expect(text).toContain(`Repair chosen: ${second.rank} ${second.label}`);
    // One set of cautions at the end, not one per part.
    expect(text.match(/qualified person's sign-off/g)?.length).toBe(1);
    for (const line of text.split('\n')) expect(line.length).toBeLessThanOrEqual(80);
  });

  it('a joint that passes with an intact hole carries no repair plan', () => {
    const svc = services();
    const demo = svc.presets.load(svc.defaultPreset);
    const values = structuredClone(demo.values);
    // Longer engagement in a deeper hole: the bolt breaks first.
    (values.joint as Record<string, unknown>).engagement = 30;
    (values.joint as Record<string, unknown>).holeDepth = 40;
    const s: WorkbenchState = {...initialState({name: demo.name, readOnly: demo.readOnly, values, units: 'si', ascii: true}), screen: 'report'};
    const ev = evaluate(s.values, svc, 'si', true);
    expect(ev.result, JSON.stringify(ev.errors)).toBeDefined();
    expect(ev.result!.flags.some(f => f.level === 'fail')).toBe(false);
    expect(reportText(s, svc, ev).text).not.toContain('Repair plan');
  });
});

describe('the workbench in US units', () => {
  it('writes flag messages and repair reasons in inch units, like the CLI reports', () => {
    const svc = services();
    const demo = svc.presets.load(svc.defaultPreset);
    const us = evaluate(demo.values, svc, 'us', true);
    const si = evaluate(demo.values, svc, 'si', true);
    const strip = (e: typeof us) => e.result!.flags.find(f => f.code === 'strips-before-break')!.message;
    expect(strip(si)).toMatch(/kN/);
    expect(strip(us)).toMatch(/lbf/);
    expect(strip(us)).not.toMatch(/kN/);
    const notes = (p: ReturnType<typeof evaluateRepairs>) => p.plan!.options.flatMap(o => [o.reason ?? '', ...o.notes]).join(' ');
    expect(notes(evaluateRepairs(demo.values, svc, si, 'si'))).toMatch(/\d mm/);
    expect(notes(evaluateRepairs(demo.values, svc, us, 'us'))).not.toMatch(/\d mm\b/);
  });
});

describe('the repair chosen in the preset store', () => {
  it('is saved with the preset (chosenRepair) and comes back on load; a note on the report says when it no longer serves', () => {
    const svc = services();
    const demo = svc.presets.load(svc.defaultPreset);
    const ev = evaluate(demo.values, svc, 'si', true);
    const plan = evaluateRepairs(demo.values, svc, ev).plan!;
    const pick = plan.options.find(o => o.feasible)!;
    const values = {...demo.values, chosenRepair: {kind: pick.kind, label: pick.label}};
    svc.presets.save('pump 9 demo', values, {overwrite: false, kind: 'joint'});
    expect(svc.presets.load('pump 9 demo').values).toMatchObject({chosenRepair: {kind: pick.kind, label: pick.label}});
    // A choice the planner no longer offers is named as such on both reports.
    const gone = {...demo.values, chosenRepair: {kind: 'solid-insert' as const, label: 'no such repair (demo)'}};
    const s: WorkbenchState = {...initialState({name: 'pump 9 demo', readOnly: false, values: gone, units: 'si', ascii: true}), screen: 'report'};
    const md = reportText(s, svc, evaluate(gone, svc, 'si', true)).text ?? '';
    expect(md).toContain('Repair chosen: no such repair (demo) is not offered for the joint as it stands now');
    const text = reportText({...s, report: {format: 'text', scroll: 0}}, svc, evaluate(gone, svc, 'si', true)).text ?? '';
    expect(text).toContain('no such repair (demo) is not offered');
    for (const line of text.split('\n')) expect(line.length).toBeLessThanOrEqual(80);
  });
});

describe('the hole-state flag on the workbench report', () => {
  it('a preset whose hole is recorded as stripped carries the hole-stripped WATCH in both reports, as the joint screen does', () => {
    const svc = services();
    const demo = svc.presets.load('demo-pump-casing-stud');
    expect(demo.values.hole.holeState).toBe('stripped');
    const s: WorkbenchState = {...initialState({name: demo.name, readOnly: true, values: demo.values, units: 'si', ascii: true}), screen: 'report'};
    const ev = evaluate(s.values, svc, 'si', true);
    expect(reportText(s, svc, ev).text).toContain('hole-stripped');
    // No repair chosen: the report says so rather than naming the top row.
    expect(reportText(s, svc, ev).text).toContain('No repair chosen yet');
    expect(reportText(s, svc, ev).text).not.toContain('Repair chosen:');
    expect(reportText({...s, report: {format: 'text', scroll: 0}}, svc, ev).text).toContain('The hole is recorded as stripped to 7.00 mm');
  });
});

describe('report of a stripped hole (demo preset)', () => {
  it('the hole state stands among the inputs of both renderings, as check --preset reports it', () => {
    const svc = services();
    const demo = svc.presets.load(svc.defaultPreset);
    const values = {...demo.values, hole: {...demo.values.hole, holeState: 'stripped' as const, strippedDepth: 5}};
    const s: WorkbenchState = {...initialState({name: demo.name, readOnly: demo.readOnly, values, units: 'si', ascii: true}), screen: 'report'};
    const ev = evaluate(s.values, svc, 'si', true);
    expect(reportText(s, svc, ev).text ?? '').toMatch(/\| Hole state \| stripped to 5\.00 mm from the face \|/);
    expect(reportText({...s, report: {format: 'text', scroll: 0}}, svc, ev).text ?? '').toMatch(/Hole state +stripped to 5\.00 mm from the face/);
  });
});
