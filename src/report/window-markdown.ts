/**
 * Markdown report section for the tightening window and the sensitivity list, a block for
 * formatCheckMarkdown's `extraSections`. Same content as the text section (window-sections.ts).
 */
import type {TighteningWindow} from '../core/joint/window.js';
import type {DecidingMargin, SensitivityItem} from '../core/joint/sensitivity.js';
import {formatNumber} from '../core/units.js';
import {windowPicture} from '../ui/components/window-picture.js';
import {cell} from './markdown.js';
import {INPUT_WORDS, MARGIN_WORDS, limitLines, sensitivityLines, windowRows, type WindowFmt} from './window-sections.js';

/** The "Tightening window" section (and "What matters most" with a sensitivity list), Markdown, heading level `level`. */
export function windowMarkdown(
  w: TighteningWindow,
  f: WindowFmt,
  extra: {sensitivity?: readonly SensitivityItem[]; margin?: DecidingMargin; level?: number; picture?: boolean; inputs?: readonly {label: string; value: string}[]} = {},
): string {
  const h = '#'.repeat(extra.level ?? 2);
  const out: string[] = [`${h} Tightening window`, ''];
  if (extra.picture !== false) out.push('```', ...windowPicture(w, 76, 10, true, f.units), '```', '');
  out.push('| | |', '|---|---|');
  for (const r of [...windowRows(w, f), ...(extra.inputs ?? [])]) out.push(`| ${cell(r.label)} | ${cell(r.value)} |`);
  out.push('', 'Limits:', '');
  for (const l of limitLines(w, f)) out.push(`- ${l}`);
  if (w.suggestions.length > 0) {
    out.push('', w.empty ? 'To open the window:' : 'To widen the window:', '');
    for (const s of w.suggestions) out.push(`- ${s}`);
  }
  for (const n of w.notes) out.push('', `Note: ${n}`);
  if (extra.sensitivity && extra.margin) {
    const m = extra.margin;
    out.push('', `${h} What matters most`, '', `Deciding margin: the ${MARGIN_WORDS[m.name]}, now ${formatNumber(m.value, 3)} (needs ${formatNumber(m.required, 3)}).`, '');
    out.push('| Input | Low end | High end |', '|---|---|---|');
    for (const i of extra.sensitivity) out.push(`| ${INPUT_WORDS[i.input]} | ${formatNumber(i.low, 3)} | ${formatNumber(i.high, 3)} |`);
    out.push('');
    for (const l of sensitivityLines(extra.sensitivity, f)) out.push(`- ${l}`);
  }
  return `${out.join('\n')}\n`;
}
