/**
 * Keeps the workbench alive when one screen fails to draw (unexpected data from
 * a module): the screen says so and the keys keep working, instead of the whole
 * program stopping with the terminal in raw mode.
 */
import React from 'react';
import {Box, Text} from 'ink';
import {CAUTION_ONE_LINE, cautionLine} from '../../core/cautions.js';
import {useTheme, wrap} from '../theme.js';

/**
 * The too-small screen: the size needed, and the caution (the full one-line wording
 * wrapped when the rows allow, else the longest one-line wording that fits).
 */
export function TooSmall({columns, rows, minColumns, minRows}: {columns: number; rows: number; minColumns: number; minRows: number}) {
  const t = useTheme();
  const width = Math.max(10, columns - 1);
  const room = Math.max(1, rows - 1);
  const ask = wrap(`Terminal is ${columns}x${rows}; tapwright needs at least ${minColumns}x${minRows}. Enlarge it, or press q to quit.`, width, room, '');
  const full = wrap(CAUTION_ONE_LINE[0] ?? '', width, 1000, '');
  const left = room - ask.length;
  const caution = full.length <= left ? full : left >= 1 ? [cautionLine(width)] : [];
  return (
    <Box flexDirection="column">
      {ask.map((l, i) => (
        <Text key={`a${i}`}>{l}</Text>
      ))}
      {caution.map((l, i) => (
        <Text key={`c${i}`} color={t.tone('watch')}>
          {l}
        </Text>
      ))}
    </Box>
  );
}

interface Props {
  /** Changing the key (screen, mode) tries the screen again. */
  resetKey: string;
  children: React.ReactNode;
}

interface State {
  error?: string;
  key: string;
}

export class ScreenGuard extends React.Component<Props, State> {
  override state: State = {key: this.props.resetKey};

  static getDerivedStateFromError(e: unknown): Partial<State> {
    return {error: e instanceof Error ? e.message : String(e)};
  }

  static getDerivedStateFromProps(props: Props, state: State): Partial<State> | null {
    return props.resetKey !== state.key ? {key: props.resetKey, error: undefined} : null;
  }

  override render() {
    if (this.state.error) {
      return <Text>{`! This screen could not be drawn (${this.state.error}). Change a value, press j for the joint screen, or q to quit; please report it.`}</Text>;
    }
    return this.props.children;
  }
}
