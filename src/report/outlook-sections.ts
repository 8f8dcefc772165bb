/**
 * The tightening outlook (src/app/tightening.ts) as report blocks: the window section of
 * window-text.ts / window-markdown.ts with the inputs behind it (lubricant pick, locking
 * element, least clamp load) as rows, and the ranked sensitivity list. Numbers arrive in
 * working units and are shown in the wrench's units.
 */
import type {TighteningOutlook} from '../app/tightening.js';
import {formatNumber, formatQuantity} from '../core/units.js';
import type {WindowFmt} from './window-sections.js';
import {windowMarkdown} from './window-markdown.js';
import {windowText} from './window-text.js';

const range = (r: {min: number; max: number}) => (r.min === r.max ? formatNumber(r.min, 3) : `${formatNumber(r.min, 3)} to ${formatNumber(r.max, 3)}`);

/** Label/value rows for the inputs behind the window. */
export function outlookInputRows(o: TighteningOutlook, f: WindowFmt): {label: string; value: string}[] {
  const tq = (x: number) => formatQuantity(x, 'torque', f.units, {ascii: f.ascii});
  const fq = (x: number) => formatQuantity(x, 'force', f.units, {ascii: f.ascii});
  const rows: {label: string; value: string}[] = [];
  if (o.lubricant) {
    const p = o.lubricant.pick;
    rows.push({
      label: 'Lubricant',
      value:
        `${p.surface}, ${p.lubricant} (${p.id}): muG ${range(p.thread)}, muK ${range(p.head)}` +
        (o.lubricant.frictionAsPick ? '' : '; the friction typed is used instead') +
        `. Source: ${p.provenance.source}${p.note ? `. ${p.note}` : ''}`,
    });
  }
  if (o.prevailing) {
    rows.push({
      label: o.prevailing.element ? 'Locking element' : 'Prevailing torque',
      value: `${o.prevailing.element ? `${o.prevailing.element}: ` : ''}prevailing torque ${tq(o.prevailing.torque)}, added on the wrench. Source: ${o.prevailing.provenance.source}`,
    });
  }
  if (o.leastClamp) {
    const d = o.leastClamp.detail;
    rows.push({
      label: 'Least clamp load',
      value:
        o.leastClamp.from === 'given'
          ? `${fq(o.leastClamp.value)} as given`
          : `${fq(o.leastClamp.value)} from the service state${d ? ` (slip ${fq(d.slip)} + load share ${fq(d.separation)} + embedding ${fq(d.embedding)} + thermal ${fq(d.thermal)}). Source: ${d.source}` : ''}`,
    });
  }
  return rows;
}

/** The TIGHTENING WINDOW and WHAT MATTERS MOST blocks, as plain text for formatCheckText's extraSections. */
export function outlookText(o: TighteningOutlook, f: WindowFmt): string {
  return windowText(o.window, f, {sensitivity: o.sensitivity, margin: o.margin, inputs: outlookInputRows(o, f)});
}

/** The "Tightening window" and "What matters most" sections, Markdown, for formatCheckMarkdown's extraSections. */
export function outlookMarkdown(o: TighteningOutlook, f: WindowFmt, level = 2): string {
  return windowMarkdown(o.window, f, {sensitivity: o.sensitivity, margin: o.margin, level, inputs: outlookInputRows(o, f)});
}
