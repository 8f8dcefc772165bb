/**
 * Text pictures: bars and scales drawn from numbers the core computed. They
 * only place characters; the numbers beside them are the core's.
 */
import {formatNumber} from '../../core/units.js';
import type {Theme} from '../theme.js';

/**
 * The scale end for a picture: the next step of 1, 2, 2.5, 5 x 10^n at or above x, so the
 * scale stays put while a value changes a little (and fewer cells are redrawn).
 */
export function niceEnd(x: number): number {
  if (!Number.isFinite(x) || x <= 0) return 1;
  const p = 10 ** Math.floor(Math.log10(x));
  for (const m of [1, 2, 2.5, 5, 10]) if (m * p >= x - 1e-12) return m * p;
  return 10 * p;
}

/** A bar of `width` cells filled to `fraction` (0..1). */
export function bar(fraction: number, width: number, t: Theme): string {
  const f = Number.isFinite(fraction) ? Math.max(0, Math.min(1, fraction)) : 0;
  const full = Math.round(f * width);
  return t.sym.barFull.repeat(full) + t.sym.barEmpty.repeat(width - full);
}

/**
 * Per-thread load share, first thread (at the loaded face) on top. When there
 * are more threads than lines, the rest are summed on the last line.
 */
export function loadShareLines(shares: readonly number[], width: number, maxLines: number, t: Theme): string[] {
  if (shares.length === 0 || maxLines <= 0) return [];
  // A fixed scale (half or all of the load) keeps the bars still while the shares move a little.
  const top = Math.max(...shares) <= 0.5 ? 0.5 : 1;
  const barWidth = Math.max(4, Math.min(20, width - 10));
  const line = (label: string, share: number) => `${label.padStart(3)} ${bar(share / top, barWidth, t)} ${formatNumber(share * 100, 2).padStart(4)}%`;
  if (shares.length <= maxLines) return shares.map((s, i) => line(String(i + 1), s));
  const shown = shares.slice(0, maxLines - 1).map((s, i) => line(String(i + 1), s));
  const rest = shares.slice(maxLines - 1).reduce((a, b) => a + b, 0);
  const label = `threads ${maxLines}-${shares.length} together`;
  return [...shown, `${label.padStart(3)} ${formatNumber(rest * 100, 2)}%`];
}

/**
 * A gauge from 0 to a scale end with the value filled and the needed value
 * marked: "[#####|###.....]". The scale end is at least twice the need.
 */
export function marginGauge(value: number, need: number, width: number, t: Theme): string {
  const inner = Math.max(6, width - 2);
  const end = niceEnd(Math.max(2 * need, 2, Number.isFinite(value) ? Math.min(value * 1.1, 4 * need) : 0));
  const cells = Array.from(bar(value / end, inner, t));
  const at = Math.min(inner - 1, Math.round((need / end) * inner));
  cells[at] = t.sym.mark;
  return `[${cells.join('')}]`;
}

/**
 * Present and required engagement on one scale: the present length as a filled
 * bar and each method's requirement as a letter at its place.
 */
export function engagementScale(present: number, marks: readonly {letter: string; at: number}[], width: number, t: Theme): {scale: string; end: number} {
  const inner = Math.max(6, width - 2);
  const finite = [present, ...marks.map(m => m.at)].filter(x => Number.isFinite(x) && x > 0);
  const end = niceEnd(Math.max(...finite, 1) * 1.1);
  const cells = Array.from(bar(present / end, inner, t));
  for (const m of marks) {
    if (!Number.isFinite(m.at) || m.at <= 0) continue;
    cells[Math.min(inner - 1, Math.round((m.at / end) * inner))] = m.letter;
  }
  return {scale: `[${cells.join('')}]`, end};
}
