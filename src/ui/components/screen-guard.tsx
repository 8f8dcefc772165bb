/**
 * Keeps the workbench alive when one screen fails to draw (unexpected data from
 * a module): the screen says so and the keys keep working, instead of the whole
 * program stopping with the terminal in raw mode.
 */
import React from 'react';
import {Text} from 'ink';

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
