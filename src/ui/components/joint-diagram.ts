/**
 * The joint diagram as text: bolt force and member force against elongation
 * (the force-elongation picture of a preloaded joint, as in Shigley's Mechanical
 * Engineering Design, 9th ed., section 8-7, and VDI 2230 Part 1). Pure: it only
 * places characters; every number comes from the core's ServiceResult.
 *
 * The bolt line rises from the origin with slope k_b; the member line falls from the
 * preload point with slope k_m and reaches zero where the joint opens. The service
 * load is the vertical gap between the two lines at the same elongation: its upper
 * part is what the bolt gains (C P), the lower part what the parts lose. Drawn with
 * the retained (minimum) preload and the largest service load.
 */
import type {ServiceResult} from '../../core/service/result.js';
import {formatQuantity, type UnitSystem} from '../../core/units.js';

interface Glyphs {
  axisV: string;
  axisH: string;
  corner: string;
}
const ASCII: Glyphs = {axisV: '|', axisH: '-', corner: '+'};
const UNICODE: Glyphs = {axisV: '\u2502', axisH: '\u2500', corner: '\u2514'};

function fit(line: string, width: number): string {
  const chars = Array.from(line);
  return (chars.length > width ? chars.slice(0, width).join('') : line + ' '.repeat(width - chars.length));
}

function block(lines: string[], width: number, height: number): string[] {
  const out = lines.slice(0, height).map(l => fit(l, width));
  while (out.length < height) out.push(' '.repeat(width));
  return out;
}

/**
 * The diagram as exactly `height` lines of exactly `width` cells (width <= 76 and
 * height <= 9 are the design sizes; smaller sizes fall back to fewer details, down to
 * one summary line). `ascii` keeps to 7-bit ASCII. Forces shown in `units`.
 */
export function jointDiagram(s: ServiceResult, width: number, height: number, ascii: boolean, units: UnitSystem = 'si'): string[] {
  const W = Math.max(1, Math.floor(width));
  const H = Math.max(1, Math.floor(height));
  const g = ascii ? ASCII : UNICODE;
  const F = (n: number) => formatQuantity(n, 'force', units, {ascii});
  if (s.model !== 'shared' || !s.stiffness) return block(['No clamped parts given: the bolt takes', 'the whole service load (no diagram).'], W, H);
  const kb = s.stiffness.bolt;
  const km = s.stiffness.members;
  const C = s.jointConstant;
  const Fi = s.preloadRetained.min;
  const P = s.serviceLoad.max;
  if (!(Fi > 0)) return block(['No clamp load left after settling:', 'the joint is open (no diagram).'], W, H);
  const P0 = Fi / (1 - C);
  const open = P >= P0;
  const summary = `C ${C.toFixed(2)}: bolt takes ${Math.round(C * 100)} % of the load; opens at ${F(P0)}`;
  if (H < 4 || W < 24) return block([summary], W, H);

  const labelW = W >= 56 ? Math.min(30, W - 30) : 0;
  const pw = W - 1 - (labelW > 0 ? labelW + 1 : 0);
  const ph = H - 1;
  const grid: string[][] = Array.from({length: ph}, () => Array.from({length: pw}, () => ' '));
  const db = Fi / kb;
  const xs = db + Fi / km;
  const xp = open ? P / kb : db + (C * P) / kb;
  const boltAtP = open ? P : Fi + C * P;
  const memberAtP = open ? 0 : Fi - (1 - C) * P;
  const xMax = Math.max(xs, xp) * 1.08;
  const yTop = Math.max(P0, boltAtP) * 1.08;
  const col = (x: number) => Math.max(0, Math.min(pw - 1, Math.round((x / xMax) * (pw - 1))));
  const row = (y: number) => Math.max(0, Math.min(ph - 1, ph - 1 - Math.round((y / yTop) * (ph - 1))));
  const put = (r: number, c: number, ch: string) => {
    const line = grid[r];
    if (line && c >= 0 && c < pw) line[c] = ch;
  };
  /** A line from (x0, y0) to (x1, y1) drawn column by column, filling steep steps. */
  const line = (x0: number, y0: number, x1: number, y1: number, ch: string) => {
    const c0 = col(x0);
    const c1 = col(x1);
    let prev = row(y0);
    for (let c = c0; c <= c1; c++) {
      const x = c1 === c0 ? x0 : x0 + ((x1 - x0) * (c - c0)) / (c1 - c0);
      const y = y0 + ((y1 - y0) * (x - x0)) / (x1 - x0 || 1);
      const r = row(y);
      const [a, b] = r < prev ? [r, prev] : [prev, r];
      for (let k = a; k <= b; k++) if (k === r || (k !== prev || c === c0)) put(k, c, ch);
      prev = r;
    }
  };
  line(0, 0, Math.max(xs, xp), kb * Math.max(xs, xp), '/');
  line(db, Fi, xs, 0, '\\');
  // Service load: the gap between the lines at its elongation.
  const cp = col(xp);
  for (let r = row(boltAtP); r <= row(memberAtP); r++) put(r, cp, ':');
  put(row(boltAtP), cp, '*');
  put(row(Fi), col(db), 'O');
  put(row(P0), col(xs), 'X');

  const labels = [
    '/ bolt   \\ parts',
    `O preload ${F(Fi)}`,
    `* load ${F(P)}: bolt +${F(open ? P - Fi : C * P)}`,
    `X opens at ${F(P0)}${open ? ' (OPEN)' : ''}`,
    `C ${C.toFixed(2)}: bolt takes ${Math.round(C * 100)} %`,
  ];
  const out: string[] = [];
  for (let r = 0; r < ph; r++) {
    const axis = r === 0 ? 'F' : g.axisV;
    const plot = (grid[r] ?? []).join('');
    const label = labelW > 0 ? ` ${fit(labels[r] ?? '', labelW)}` : '';
    out.push(fit(`${axis}${plot}${label}`, W));
  }
  const tail = ' elongation';
  const axisLen = Math.max(0, pw - tail.length);
  out.push(fit(`${g.corner}${g.axisH.repeat(axisLen)}${pw > tail.length ? tail : ''}`, W));
  return out;
}
