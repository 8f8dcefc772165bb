/** The help screen (a thin view): the generated help text, scrolled. */
import React from 'react';
import {ScrollView} from '../../components/scroll-view.js';
import type {ScreenProps} from '../types.js';
import {helpLines} from './reducer.js';

export function HelpView({state, derived, width, height}: ScreenProps) {
  const sources = [...(derived.ev.result?.sources ?? []), ...(derived.sev?.result?.sources ?? [])];
  return (
    <ScrollView
      lines={helpLines({ascii: state.ascii, sources, rankingRule: derived.rep?.plan?.rankingRule, width})}
      scroll={state.helpScroll}
      width={width}
      height={height}
      title="Help: keys, methods, cautions (Esc back)"
    />
  );
}
