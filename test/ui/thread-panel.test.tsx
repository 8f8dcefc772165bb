/**
 * The thread panel of the joint screen (Thread step, left column): where each
 * side's limits of size come from, in the panel's width. Runs the real check so
 * the provenance is the core's: the ASME B1.1 standard series limits table rows
 * of unified-table-data.ts (1/4-20 UNC: class 2B only; 2-56 UNC: 2A and 2B), the
 * ISO 965-1:1998 tables for M10 6H/6g, the formulas for a special pitch.
 */
import {afterEach, describe, expect, it} from 'vitest';
import {cleanup} from 'ink-testing-library';
import {startApp} from '../support/start-app.js';
import {FIXTURE_VALUES, fixtureServices} from '../support/fixture-services.js';
import {checkJoint} from '../../src/core/joint/index.js';
import {wholeItems} from '../../src/ui/screens/joint/view.js';
import {makeTheme} from '../../src/ui/theme.js';
import type {Line} from '../../src/ui/components/lines.js';

afterEach(() => cleanup());

/** The workbench on the real check (a shipped parent material in place of the fixture's). */
async function panelFor(thread: string, size = {columns: 80, rows: 24}) {
  const svc = fixtureServices({check: input => checkJoint({...input, parent: 'EN-GJL-250'})});
  const values = structuredClone(FIXTURE_VALUES);
  values.joint.thread = thread;
  const app = startApp({svc, ...size, state: {values} as never});
  await app.see('stress area');
  const frame = app.frame();
  app.unmount();
  return frame;
}

/** Left column width of the joint screen at this terminal width (joint-screen.tsx). */
const leftWidth = (columns: number) => Math.max(34, Math.floor(columns * 0.42));

describe('thread panel: limits of size per side', () => {
  it('1/4-20 UNC at 80x24: 2B from the table, 2A from the formulas, both visible in the panel width', async () => {
    const frame = await panelFor('1/4-20 UNC');
    const lines = frame.split('\n');
    expect(frame).toContain('2B limits: table, ASME B1.1');
    expect(frame).toContain('2A limits: formulas (fallback),');
    const w = leftWidth(80);
    for (const l of lines) expect(l.length).toBeLessThanOrEqual(80);
    // the panel text stays inside the left column: the column after it is blank on the panel rows
    const first = lines.findIndex(l => l.startsWith('1/4-20 UNC-2A/2B'));
    const last = lines.findIndex(l => l.startsWith('2A limits:'));
    expect(first).toBeGreaterThan(0);
    expect(last).toBeGreaterThan(first);
    for (const l of lines.slice(first, last + 1)) expect(l[w], l).toBe(' ');
  });

  it('both sides from the table (2-56 UNC) and both from the formulas (special pitch M10x1.3)', async () => {
    const both = await panelFor('#2-56 UNC');
    expect(both).toContain('2B limits: table, ASME B1.1');
    expect(both).toContain('2A limits: table, ASME B1.1');
    const special = await panelFor('M10x1.3');
    expect(special).toContain('6H limits: formulas (fallback),');
    expect(special).toContain('6g limits: formulas (fallback),');
  });

  it('metric M10 6H/6g: table on both sides, also on a wider terminal', async () => {
    for (const size of [{columns: 80, rows: 24}, {columns: 120, rows: 40}]) {
      const frame = await panelFor('M10x1.5', size);
      expect(frame).toContain('6H limits: table, ISO 965-1:1998');
      expect(frame).toContain('6g limits: table, ISO 965-1:1998');
      for (const l of frame.split('\n')) expect(l.length).toBeLessThanOrEqual(size.columns);
    }
  });
});

describe('thread panel: whole notes only', () => {
  const t = makeTheme(false, true);
  const text = (l: Line) => (typeof l === 'string' ? l : Array.isArray(l) ? l.map(x => x.text).join('') : l.text);
  const item = (name: string, n: number) => Array.from({length: n}, (_, i) => ({text: `${name} ${i + 1}/${n}`}));

  it('leaves out a note that does not fit whole, and says so when a line is free', () => {
    const items = [item('a', 1), item('b', 2), item('c', 3), item('d', 1)];
    // 5 lines: a and b fit (3 lines); c (3 lines) does not, so it and d are left out
    expect(wholeItems(items, 5, 34, t).map(text)).toEqual(['a 1/1', 'b 1/2', 'b 2/2', '+2 more in the report (w)']);
    // exactly full: no room for the note line, and still nothing cut in half
    expect(wholeItems(items, 3, 34, t).map(text)).toEqual(['a 1/1', 'b 1/2', 'b 2/2']);
    // room for all: all of them, no note line
    expect(wholeItems(items, 7, 34, t)).toHaveLength(7);
  });

  it('a panel too short for the notes ends on a whole line and points to the report', async () => {
    let pointed = 0;
    for (const rows of [24, 25, 26, 27]) {
      const frame = await panelFor('3/8-16 UNC', {columns: 80, rows});
      if (/\+\d+ more in the report \(w\)/.test(frame)) pointed++;
      expect(frame).toContain('2A limits: formulas (fallback),');
      // the note on where the 2B limits come from is never shown cut to its first words
      const lines = frame.split('\n');
      const start = lines.findIndex(l => l.startsWith('Class 2B limits read from'));
      if (start >= 0) expect(lines[start + 1]!.startsWith('  '), frame).toBe(true);
    }
    expect(pointed).toBeGreaterThan(0);
  });
});
