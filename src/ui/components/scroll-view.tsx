/** A scrolled window over lines of text, with a position line. */
import React from 'react';
import {Box, Text} from 'ink';
import {useTheme, fit, wrap} from '../theme.js';
import {Lines} from './lines.js';

/** Hard-wrap lines to the width, keeping each line's indent. */
export function wrapLines(lines: readonly string[], width: number): string[] {
  const out: string[] = [];
  for (const raw of lines) {
    if (Array.from(raw).length <= width) {
      out.push(raw);
      continue;
    }
    const indent = /^\s*/.exec(raw)?.[0] ?? '';
    const cont = indent + '  ';
    const parts = wrap(raw, width - cont.length, 1000, '~');
    parts.forEach((p, i) => out.push(i === 0 ? indent + p : cont + p));
  }
  return out;
}

export function clampScroll(scroll: number, total: number, rows: number): number {
  return Math.max(0, Math.min(scroll, Math.max(0, total - rows)));
}

export function ScrollView({lines: raw, scroll, width, height, title}: {lines: string[]; scroll: number; width: number; height: number; title: string}) {
  const t = useTheme();
  const lines = wrapLines(raw, width);
  const rows = Math.max(1, height - 1);
  const top = clampScroll(scroll, lines.length, rows);
  const end = Math.min(lines.length, top + rows);
  const where = lines.length > rows ? `  lines ${top + 1}-${end} of ${lines.length}` : '';
  return (
    <Box flexDirection="column" width={width} height={height}>
      <Text bold>{fit(`${title}${where}`, width, t.sym.ellipsis)}</Text>
      <Lines lines={lines.slice(top, end).map(l => fit(l, width, t.sym.ellipsis))} width={width} height={rows} />
    </Box>
  );
}
