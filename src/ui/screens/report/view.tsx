/** The report preview (a thin view): the work-order report as it will be written to a file. */
import React from 'react';
import {Box, Text} from 'ink';
import {useTheme} from '../../theme.js';
import {ScrollView} from '../../components/scroll-view.js';
import type {ScreenProps} from '../types.js';

export function ReportView({state, derived, width, height}: ScreenProps) {
  const t = useTheme();
  const r = derived.report ?? {why: 'No report yet.'};
  const fmt = state.report.format === 'markdown' ? 'Markdown' : 'plain text';
  if (!r.text) {
    return (
      <Box flexDirection="column" width={width} height={height}>
        <Text bold>Report preview ({fmt})</Text>
        <Text color={t.tone('fail')}>! {r.why}</Text>
      </Box>
    );
  }
  return <ScrollView lines={r.text.split('\n')} scroll={state.report.scroll} width={width} height={height} title={`Report preview (${fmt}); Enter writes it to a file`} />;
}
