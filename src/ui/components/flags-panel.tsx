/**
 * The full flag view of the joint screen (f): every flag whole, wrapped to the
 * panel, and scrolled a page at a time with PgDn/PgUp (Space too) when they do
 * not all fit, with a line that says where it is.
 */
import React from 'react';
import type {Flag} from '../../core/types.js';
import {levelWord} from '../../report/sections.js';
import {useTheme, fit, wrap, type Theme} from '../theme.js';
import {Lines, type Line} from './lines.js';

const LEVEL_ORDER: Record<Flag['level'], number> = {fail: 0, watch: 1, info: 2};

/** Fail first, then watch, then info; the core's order inside a level. */
export function sortedFlags(flags: readonly Flag[]): Flag[] {
  return [...flags].sort((a, b) => LEVEL_ORDER[a.level] - LEVEL_ORDER[b.level]);
}

const levelTone = (t: Theme, level: Flag['level']) => (level === 'fail' ? t.tone('fail') : level === 'watch' ? t.tone('watch') : undefined);

/** Every line of every flag, whole (no ellipsis), wrapped to `width`. */
export function flagPanelLines(flags: readonly Flag[], width: number, t: Theme): Line[] {
  const lines: Line[] = [];
  if (flags.length === 0) lines.push('No flags: nothing to watch in this joint.');
  for (const f of sortedFlags(flags)) {
    wrap(`${levelWord(f.level)} ${f.code}: ${f.message}`, width - 2, 1000, '').forEach((l, i) => lines.push({text: i ? `  ${l}` : l, color: levelTone(t, f.level)}));
  }
  return lines;
}

/** The top line of the flag view: within the lines, so the last page is full. */
export function clampFlagScroll(scroll: number, total: number, rows: number): number {
  return Math.max(0, Math.min(scroll, total - rows));
}

/** Lines of flags the panel shows at once: its height less the title line. */
export const flagPanelRows = (height: number): number => Math.max(1, height - 1);

export function FlagsPanel({flags, width, height, scroll}: {flags: Flag[]; width: number; height: number; scroll: number}) {
  const t = useTheme();
  const body = flagPanelLines(flags, width, t);
  const rows = flagPanelRows(height);
  const top = clampFlagScroll(scroll, body.length, rows);
  const end = Math.min(body.length, top + rows);
  const title: Line = {
    text: fit(body.length > rows ? `All flags (${flags.length}): ${top + 1}-${end} of ${body.length} lines, ${end < body.length ? 'PgDn more' : 'PgUp back'}` : `All flags (${flags.length}); f back to results`, width, t.sym.ellipsis),
    bold: true,
  };
  return <Lines lines={[title, ...body.slice(top, end)]} width={width} height={height} />;
}
