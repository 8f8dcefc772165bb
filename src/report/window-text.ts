/**
 * Plain-text report section for the tightening window and the sensitivity list, a block for
 * formatCheckText's `extraSections`. Every line fits 80 columns; `ascii` keeps to 7-bit ASCII.
 */
import type {TighteningWindow} from '../core/joint/window.js';
import type {DecidingMargin, SensitivityItem} from '../core/joint/sensitivity.js';
import {formatNumber} from '../core/units.js';
import {windowPicture} from '../ui/components/window-picture.js';
import {TEXT_WIDTH, wrapText} from './wrap.js';
import {INPUT_WORDS, effectBar, limitLines, sensitivityHeading, sensitivityLines, windowRows, type WindowFmt} from './window-sections.js';

const LABEL = 32;

/** The TIGHTENING WINDOW block (and WHAT MATTERS MOST when a sensitivity list is given), as text. */
export function windowText(
  w: TighteningWindow,
  f: WindowFmt,
  extra: {sensitivity?: readonly SensitivityItem[]; margin?: DecidingMargin; picture?: boolean; inputs?: readonly {label: string; value: string}[]} = {},
): string {
  const out: string[] = ['TIGHTENING WINDOW'];
  if (extra.picture !== false) out.push(...windowPicture(w, TEXT_WIDTH - 4, 10, f.ascii, f.units).map(l => `  ${l}`.trimEnd()));
  for (const r of [...windowRows(w, f), ...(extra.inputs ?? [])]) out.push(...wrapText(r.value, `  ${r.label}`.padEnd(LABEL), ' '.repeat(LABEL)));
  out.push('  Limits:');
  for (const l of limitLines(w, f)) out.push(...wrapText(l, '  - ', '    '));
  if (w.suggestions.length > 0) {
    out.push(w.empty ? '  To open the window:' : '  To widen the window:');
    for (const s of w.suggestions) out.push(...wrapText(s, '  - ', '    '));
  }
  for (const n of w.notes) out.push(...wrapText(n, '  Note: ', '        '));
  if (extra.sensitivity && extra.margin) {
    out.push('', ...wrapText(sensitivityHeading(extra.margin).toUpperCase(), '', '  '));
    const largest = Math.max(0, ...extra.sensitivity.map(i => i.effect));
    for (const i of extra.sensitivity) {
      out.push(`  ${INPUT_WORDS[i.input].padEnd(16)} ${effectBar(i.effect, largest, 12, f.ascii)}  ${formatNumber(i.low, 3)} to ${formatNumber(i.high, 3)}`);
    }
    for (const l of sensitivityLines(extra.sensitivity, f)) out.push(...wrapText(l, '  - ', '    '));
  }
  return `${out.join('\n')}\n`;
}
