/** The presets screen: the list with search, and the marked preset's details. */
import React from 'react';
import {Box, Text} from 'ink';
import {filteredPresets, type WorkbenchState} from '../state/workbench.js';
import type {WorkbenchServices} from '../services.js';
import {useTheme, fit, pad} from '../theme.js';

interface Props {
  state: WorkbenchState;
  svc: WorkbenchServices;
  width: number;
  height: number;
}

export function PresetsScreen({state, svc, width, height}: Props) {
  const t = useTheme();
  const list = filteredPresets(state, svc);
  const rows = Math.max(1, height - 3);
  const idx = Math.min(state.presetList.index, Math.max(0, list.length - 1));
  const start = Math.max(0, Math.min(idx - Math.floor(rows / 2), list.length - rows));
  const q = state.presetList.query;
  return (
    <Box flexDirection="column" width={width} height={height}>
      <Text bold>{fit(`Presets: ${list.length}${q ? ` matching "${q}"` : ''}   Enter loads the marked one into the joint screen`, width, t.sym.ellipsis)}</Text>
      <Text color={t.tone('dim')}>{pad(`  ${pad('Name', 34)} ${pad('Thread', 18)} Saved`, width)}</Text>
      {list.length === 0 ? <Text>{q ? `Nothing matches "${q}"; / to search again.` : 'No presets yet: s or a saves the joint.'}</Text> : null}
      {list.slice(start, start + rows).map((p, i) => {
        const marked = start + i === idx;
        const current = p.name === state.preset.name;
        const tag = p.readOnly ? ' [demo, read-only]' : current ? ' [open]' : '';
        const name = pad(`${p.name}${tag}`, 34, t.sym.ellipsis);
        const saved = p.savedAt ? p.savedAt.slice(0, 16).replace('T', ' ') : '';
        return (
          <Text key={p.name} inverse={marked} bold={current}>
            {pad(`${marked ? t.sym.select : ' '} ${name} ${pad(p.thread ?? '', 18)} ${saved}`, width)}
          </Text>
        );
      })}
    </Box>
  );
}
