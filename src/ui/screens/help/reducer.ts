/**
 * Help, generated (pure): the keys come from the keymap table, the methods and
 * their sources from the check result, the cautions from core/cautions.ts, and
 * the ranking rule from the repair planner; and its scroll.
 */
import {CAUTION_LINES} from '../../../core/cautions.js';
import {EFFORT_SCALE_TEXT} from '../../../core/repair/rank.js';
import {CONTEXT_TITLES, KEYMAP, keyLabel, type Binding, type Context} from '../../keymap.js';
import type {WorkbenchServices} from '../../services.js';
import {bodyHeight} from '../../layout.js';
import {wrapLines} from '../../components/scroll-view.js';
import {wrap} from '../../theme.js';
import {evaluate, evaluateRepairs} from '../../state/evaluate.js';
import {shownValues, type WorkbenchState} from '../../state/workbench.js';

export const SCREEN_GUIDE: readonly string[] = [
  'Joint: the inputs in six steps on the left (Thread, Parts, Engagement,',
  '  Tightening, Service, Hole state); the results on the right follow at once.',
  'Repairs: the fixes for a weak or stripped hole, best first. c chooses the',
  '  marked repair for the work order: the choice follows the repair (not its',
  '  row) when the list re-ranks, is saved with the preset and named on the',
  '  report, which says when it no longer meets the required margin.',
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

/** Key column width: the longest key text of the table, so every description starts in one column. */
const KEY_COLUMN = 18;

/**
 * The help text. With `width`, a key's description wraps under itself (a hanging
 * indent at the description column), so the key column stays clear for every key.
 */
export function helpLines(opts: {ascii: boolean; sources: readonly string[]; rankingRule?: string; width?: number}): string[] {
  const lines: string[] = ['Screens', ...SCREEN_GUIDE.map(l => `  ${l.replace('SELECT', opts.ascii ? '>' : '▶')}`), ''];
  const table: readonly Binding[] = KEYMAP;
  const contexts = [...new Set(table.map(b => b.context))] as Context[];
  lines.push('Keys');
  for (const ctx of contexts) {
    lines.push(`  ${CONTEXT_TITLES[ctx]}`);
    for (const b of table.filter(x => x.context === ctx)) {
      const keys = b.keys.map(k => keyLabel(k, opts.ascii)).join(' / ');
      const head = `    ${keys.padEnd(KEY_COLUMN)} `;
      const room = opts.width ? opts.width - head.length : Infinity;
      const parts = Number.isFinite(room) && room >= 20 ? wrap(b.description, room, 1000, '') : [b.description];
      parts.forEach((p, i) => lines.push(`${i === 0 ? head : ' '.repeat(head.length)}${p}`));
    }
  }
  lines.push('', 'Methods and their sources');
  if (opts.sources.length === 0) lines.push('  (shown once the joint is computed)');
  for (const s of opts.sources) lines.push(`  - ${s}`);
  lines.push('', 'Ranking of repairs');
  lines.push(`  ${opts.rankingRule ?? 'The repair planner is not available in this workbench; tapwright repair --help describes the ranking.'}`);
  lines.push('', 'Effort grades (the Effort column of the Repairs screen)', ...EFFORT_SCALE_TEXT.split('\n').map(l => `  ${l}`));
  lines.push('', 'Cautions', ...CAUTION_LINES.map(l => `  ${l}`));
  return lines;
}

/** Scroll the help by d lines, within the help as drawn. */
export function scrollHelp(s: WorkbenchState, svc: WorkbenchServices, d: number): WorkbenchState {
  const ev = evaluate(shownValues(s), svc, s.units, s.ascii);
  const rule = evaluateRepairs(shownValues(s), svc, ev, s.units).plan?.rankingRule;
  const lines = wrapLines(helpLines({ascii: s.ascii, sources: ev.result?.sources ?? [], rankingRule: rule, width: s.size.columns}), s.size.columns);
  const rows = bodyHeight(s.size) - 1;
  return {...s, helpScroll: Math.max(0, Math.min(s.helpScroll + d, lines.length - rows))};
}
