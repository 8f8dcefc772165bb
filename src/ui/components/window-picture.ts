/**
 * The tightening window as a text picture: preload (up) against torque (across). Two sloped
 * lines from the origin, the largest preload (lowest friction, "/") and the smallest (highest
 * friction, "."); the limits as horizontal lines with a letter at the right; the band's ends as
 * ":" columns and "=" on the axis; the present torque as a marker on the axis. It only places
 * characters: every number comes from the core's TighteningWindow.
 */
import type {TighteningWindow, WindowLimitName} from '../../core/joint/window.js';
import {formatQuantity, type UnitSystem} from '../../core/units.js';
import {niceEnd} from './pictures.js';

/** One letter per limit, on the picture and in its legend. */
export const LIMIT_LETTER: Record<WindowLimitName, string> = {
  'yield-utilisation': 'Y',
  stripping: 'S',
  'bolt-break': 'B',
  'least-clamp': 'C',
  'service-load': 'L',
  'preload-floor': 'F',
};

const LIMIT_WORD: Record<WindowLimitName, string> = {
  'yield-utilisation': 'yield',
  stripping: 'strip',
  'bolt-break': 'break',
  'least-clamp': 'clamp',
  'service-load': 'load',
  'preload-floor': 'floor',
};

interface Symbols {
  upper: string;
  lower: string;
  axis: string;
  corner: string;
  vert: string;
  band: string;
  marker: string;
}

const ASCII: Symbols = {upper: '-', lower: '~', axis: '-', corner: '+', vert: '|', band: '=', marker: '^'};
const UNICODE: Symbols = {upper: '─', lower: '╌', axis: '─', corner: '└', vert: '│', band: '═', marker: '▲'};

/**
 * Render the window in `width` x `height` cells (at least 20 x 5). Returns exactly `height` lines,
 * none longer than `width`; only ASCII characters when `ascii`. Torques in the wrench's units.
 */
export function windowPicture(w: TighteningWindow, width: number, height: number, ascii: boolean, units: UnitSystem = 'si'): string[] {
  const W = Math.max(20, Math.floor(width));
  const H = Math.max(5, Math.floor(height));
  const s = ascii ? ASCII : UNICODE;
  const legendRows = H >= 9 && W < 60 ? 3 : H >= 8 ? 2 : 1;
  const plotH = H - 1 - legendRows;
  const plotW = W - 3; // y axis on the left, a space and the limit letter on the right
  const byName = (n: WindowLimitName) => w.limits.find(l => l.name === n);
  const hi = byName(w.upperLimit);
  const lo = byName(w.lowerLimit);

  const torqueRef = Math.max(w.present.torque, hi?.torque ?? 0, lo?.torque ?? 0, 1e-6);
  const xEnd = niceEnd(1.15 * torqueRef);
  const yEnd = niceEnd(1.15 * Math.max(hi?.preload ?? 0, lo?.preload ?? 0, w.slope.min * xEnd * 0.5, 1e-6));
  const col = (t: number) => Math.min(plotW - 1, Math.max(0, Math.floor((t / xEnd) * plotW)));
  const row = (v: number) => plotH - 1 - Math.floor((v / yEnd) * plotH);

  const grid: string[][] = Array.from({length: plotH}, () => Array.from({length: plotW}, () => ' '));
  const letters: string[] = Array.from({length: plotH}, () => ' ');
  const put = (r: number, c: number, ch: string) => {
    if (r >= 0 && r < plotH && c >= 0 && c < plotW) grid[r]![c] = ch;
  };

  // Band edges.
  if (w.torque) {
    for (const t of [w.torque.min, w.torque.max]) for (let r = 0; r < plotH; r++) put(r, col(t), ':');
  }
  // Limit lines (those inside the scale), lower ones drawn last so a tie shows the need.
  const shown = w.limits.filter(l => l.preload > 0 && l.preload < yEnd).sort((a, b) => (a.kind === b.kind ? 0 : a.kind === 'upper' ? -1 : 1));
  for (const l of shown) {
    const r = row(l.preload);
    for (let c = 0; c < plotW; c++) if (grid[r]![c] === ' ' || grid[r]![c] === ':') put(r, c, l.kind === 'upper' ? s.upper : s.lower);
    if (r >= 0 && r < plotH) letters[r] = letters[r] === ' ' ? LIMIT_LETTER[l.name] : '*';
  }
  // Sloped lines: each column filled from the previous column's row, so a steep line stays joined.
  for (const [slope, ch] of [
    [w.slope.min, '.'],
    [w.slope.max, '/'],
  ] as const) {
    if (!(slope > 0)) continue;
    let prev = row(0);
    for (let c = 0; c < plotW; c++) {
      const r = row(slope * ((c + 1) / plotW) * xEnd);
      for (let k = Math.min(prev, r); k <= Math.max(prev, r); k++) put(k, c, ch);
      prev = r;
      if (r < 0) break;
    }
  }

  const out = grid.map((cells, r) => `${s.vert}${cells.join('')} ${letters[r]}`);
  const axis = Array.from({length: plotW}, () => s.axis);
  if (w.torque) for (let c = col(w.torque.min); c <= col(w.torque.max); c++) axis[c] = s.band;
  axis[col(w.present.torque)] = s.marker;
  out.push(`${s.corner}${axis.join('')}`);

  const tq = (x: number) => formatQuantity(x, 'torque', units, {ascii});
  const fq = (x: number) => formatQuantity(x, 'force', units, {ascii});
  const band = w.torque
    ? `${s.band} band ${tq(w.torque.min)} to ${tq(w.torque.max)} (${LIMIT_LETTER[w.lowerLimit]} to ${LIMIT_LETTER[w.upperLimit]})`
    : `no band: ${LIMIT_WORD[w.lowerLimit]} ${LIMIT_LETTER[w.lowerLimit]} is above ${LIMIT_WORD[w.upperLimit]} ${LIMIT_LETTER[w.upperLimit]}`;
  const line1 = [band, `${s.marker} now ${tq(w.present.torque)}`, `to ${tq(xEnd)}, ${fq(yEnd)}`];
  const names = [...new Set(shown.map(l => l.name))].map(n => `${LIMIT_LETTER[n]} ${LIMIT_WORD[n]}`);
  const key = ['/ low friction', '. high friction'];
  const line2 = [...(legendRows === 3 ? [] : key), ...names, ...(letters.includes('*') ? [legendRows === 3 ? '* 2 limits' : '* two limits'] : [])];
  if (legendRows === 3) {
    // Three rows (a narrow panel): the limits on their own row, the friction key and the marker below.
    out.push(joinFit([band, `to ${tq(xEnd)}, ${fq(yEnd)}`], W), joinFit(line2, W), joinFit(['/ low . high friction', `${s.marker} now ${tq(w.present.torque)}`], W));
  } else if (legendRows === 2) {
    out.push(joinFit(line1, W), joinFit(line2, W));
  } else {
    out.push(joinFit(line1, W));
  }
  return out.map(l => cut(l, W));
}

/** Join the parts with two spaces, dropping whole parts from the end that do not fit. */
function joinFit(parts: string[], width: number): string {
  let text = '';
  for (const p of parts) {
    const next = text === '' ? p : `${text}  ${p}`;
    if (next.length > width) return text === '' ? cut(p, width) : text;
    text = next;
  }
  return text;
}

function cut(text: string, width: number): string {
  return text.length <= width ? text : text.slice(0, width);
}
