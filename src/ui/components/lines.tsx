/**
 * Many lines as one Ink text node: every line is a list of styled segments.
 * One node instead of one per line keeps Ink's layout pass short on every key.
 */
import React from 'react';
import {Box, Text} from 'ink';

export interface Segment {
  text: string;
  color?: string;
  bold?: boolean;
  inverse?: boolean;
}

export type Line = string | Segment | Segment[];

const segs = (l: Line): Segment[] => (typeof l === 'string' ? [{text: l}] : Array.isArray(l) ? l : [l]);

export function Lines({lines, width, height}: {lines: readonly Line[]; width: number; height?: number}) {
  const shown = height === undefined ? lines : lines.slice(0, height);
  const children: React.ReactNode[] = [];
  shown.forEach((l, i) => {
    segs(l).forEach((s, j) => {
      children.push(
        s.color || s.bold || s.inverse ? (
          <Text key={`${i}.${j}`} color={s.color} bold={s.bold} inverse={s.inverse}>
            {s.text}
          </Text>
        ) : (
          s.text
        ),
      );
    });
    if (i < shown.length - 1) children.push('\n');
  });
  return (
    <Box width={width} height={height} flexDirection="column">
      <Text>{children}</Text>
    </Box>
  );
}
