/**
 * Help, generated: the keys come from the keymap table, the methods and their
 * sources from the check result, the cautions from core/cautions.ts, and the
 * ranking rule from the repair planner.
 */
import React from 'react';
import {CAUTION_LINES} from '../../core/cautions.js';
import {EFFORT_SCALE_TEXT} from '../../core/repair/rank.js';
import {CONTEXT_TITLES, KEYMAP, keyLabel, type Context} from '../keymap.js';
import {ScrollView} from './scroll-view.js';

export const SCREEN_GUIDE: readonly string[] = [
  'Joint: the inputs in five steps on the left (Thread, Parts, Engagement,',
  '  Tightening, Hole state); the results on the right change as you type.',
  'Repairs: the fixes for a weak or stripped hole, best first. When the hole is',
  '  stripped or the check fails, the report carries the ranked repairs and the',
  '  one marked here as the repair chosen.',
  'Presets: saved joints; shipped demos are read-only, "save as" copies them.',
  'Report: the work-order report, written to a Markdown or text file; n edits the',
  '  preset\'s work-order notes (asset tag, location, work order, free text).',
  'Field marks: SELECT selected, ! a problem (the message line says what and the',
  '  accepted range). * beside the preset name = unsaved changes.',
  'Numbers may carry a unit: 12mm, 0.5in, 40Nm, 30ft-lbf, 20kN, 4500lbf.',
  'Results: 1st thread = the first engaged thread at the loaded face; ax axial,',
  '  bnd root bending, sh shear from the thread torque, tor body torsion,',
  '  brg thread bearing. Margins: stripping = weaker thread strip force / largest',
  '  load; bolt-first = weaker strip force / bolt break force (1 = even).',
  '  The gauge shows bolt-first against the needed margin (the mark).',
  '  Engagement scale: the bar is the full thread present; F and A mark the',
  '  length each method needs (FED-STD-H28, Alexander).',
];

export function helpLines(opts: {ascii: boolean; sources: readonly string[]; rankingRule?: string}): string[] {
  const lines: string[] = ['Screens', ...SCREEN_GUIDE.map(l => `  ${l.replace('SELECT', opts.ascii ? '>' : '▶')}`), ''];
  const contexts = [...new Set(KEYMAP.map(b => b.context))] as Context[];
  lines.push('Keys');
  for (const ctx of contexts) {
    lines.push(`  ${CONTEXT_TITLES[ctx]}`);
    for (const b of KEYMAP.filter(x => x.context === ctx)) {
      const keys = b.keys.map(k => keyLabel(k, opts.ascii)).join(' / ');
      lines.push(`    ${keys.padEnd(16)} ${b.description}`);
    }
  }
  lines.push('', 'Methods and their sources');
  if (opts.sources.length === 0) lines.push('  (shown once the joint is computed)');
  for (const s of opts.sources) lines.push(`  - ${s}`);
  lines.push('', 'Ranking of repairs');
  lines.push(`  ${opts.rankingRule ?? 'The repair planner is not available in this workbench; tapwright repair --help describes the ranking.'}`);
  lines.push('', 'Work grades (the Work column of the Repairs screen)', ...EFFORT_SCALE_TEXT.split('\n').map(l => `  ${l}`));
  lines.push('', 'Cautions', ...CAUTION_LINES.map(l => `  ${l}`));
  return lines;
}

export function HelpScreen(props: {ascii: boolean; sources: readonly string[]; rankingRule?: string; scroll: number; width: number; height: number}) {
  return (
    <ScrollView
      lines={helpLines(props)}
      scroll={props.scroll}
      width={props.width}
      height={props.height}
      title="Help: keys, methods, cautions (Esc back)"
    />
  );
}
