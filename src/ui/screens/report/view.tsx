/** The report preview: the work-order report as it will be written to a file. */
import React from 'react';
import {Box, Text} from 'ink';
import type {WorkbenchState} from '../state/workbench.js';
import {reportText} from '../state/preset-commands.js';
import type {Evaluation} from '../state/evaluate.js';
import type {WorkbenchServices} from '../services.js';
import {useTheme} from '../theme.js';
import {ScrollView} from './scroll-view.js';

export function ReportScreen({state, ev, svc, width, height}: {state: WorkbenchState; ev: Evaluation; svc: WorkbenchServices; width: number; height: number}) {
  const t = useTheme();
  const r = reportText(state, svc, ev);
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
