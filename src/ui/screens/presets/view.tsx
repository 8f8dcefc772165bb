/** The presets screen (a thin view): the list with search, and the marked preset's details. */
import React from 'react';
import {Box, Text} from 'ink';
import {filteredPresets} from '../../state/workbench.js';
import {useTheme, fit, pad} from '../../theme.js';
import type {ScreenProps} from '../types.js';

export function PresetsView({state, svc, width, height}: ScreenProps) {
  const t = useTheme();
  const list = filteredPresets(state, svc);
  const rows = Math.max(1, height - 3);
  const idx = Math.min(state.presetList.index, Math.max(0, list.length - 1));
  const start = Math.max(0, Math.min(idx - Math.floor(rows / 2), list.length - rows));
  const q = state.presetList.query;
  return (
    <Box flexDirection="column" width={width} height={height}>
      <Text bold>{fit(`Presets: ${list.length}${q ? ` matching "${q}"` : ''}   Enter loads the marked one; demos are read-only`, width, t.sym.ellipsis)}</Text>
      <Text color={t.tone('dim')}>{pad(`  ${pad('Name', 31)} ${pad('Kind', 12)} ${pad('Thread', 16)} Saved`, width)}</Text>
      {list.length === 0 ? <Text>{q ? `Nothing matches "${q}"; / to search again.` : 'No presets yet: s or a saves the joint.'}</Text> : null}
      {list.slice(start, start + rows).map((p, i) => {
        const marked = start + i === idx;
        const current = p.name === state.preset.name;
        const kind = `${p.kind === 'screw' ? 'screw' : 'joint'}${p.readOnly ? ', demo' : ''}`;
        const name = pad(`${p.name}${current ? ' (open)' : ''}`, 31, t.sym.ellipsis);
        const saved = p.savedAt ? p.savedAt.slice(0, 16).replace('T', ' ') : p.readOnly ? 'shipped' : '';
        return (
          <Text key={p.name} inverse={marked} bold={current}>
            {pad(`${marked ? t.sym.select : ' '} ${name} ${pad(kind, 12)} ${pad(p.thread ?? '', 16, t.sym.ellipsis)} ${saved}`, width)}
          </Text>
        );
      })}
    </Box>
  );
}
