/** The repairs screen: the planner's ranked fixes and the marked one in detail. */
import React from 'react';
import {Box, Text} from 'ink';
import {formatNumber, formatQuantity, type UnitSystem} from '../../core/units.js';
import type {RepairEvaluation} from '../state/evaluate.js';
import type {RepairOption} from '../../core/repair/types.js';
import {useTheme, fit, pad, wrap} from '../theme.js';

interface Props {
  rep: RepairEvaluation;
  index: number;
  units: UnitSystem;
  holeSummary: string;
  width: number;
  height: number;
}

export function RepairsScreen({rep, index, units, holeSummary, width, height}: Props) {
  const t = useTheme();
  if (!rep.available || !rep.plan) {
    const why = rep.available ? rep.error : 'The repair planner is not available in this workbench. The hole state is kept with the preset.';
    return (
      <Box flexDirection="column" width={width} height={height}>
        <Text bold>{fit(`Repairs for: ${holeSummary}`, width, t.sym.ellipsis)}</Text>
        <Text color={rep.available ? t.tone('fail') : undefined}>{fit(`${rep.available ? '! ' : ''}${why ?? ''}`, width, t.sym.ellipsis)}</Text>
        <Text>{fit('Enter edits the hole state (joint screen, step 5).', width, t.sym.ellipsis)}</Text>
      </Box>
    );
  }
  const rows = rep.plan.options;
  const idx = Math.min(index, Math.max(0, rows.length - 1));
  const L = (v?: number | null) => (v === undefined || v === null ? '-' : formatQuantity(v, 'length', units, {ascii: t.ascii, significant: 3}));
  const m = (v?: number | null) => (v === undefined || v === null ? '-' : formatNumber(v, 3));
  const status = (r: RepairOption) => (!r.feasible ? 'NO' : r.meetsMargin ? 'OK' : 'SHORT');
  const listRows = Math.min(rows.length, Math.max(3, height - 8));
  const start = Math.max(0, Math.min(idx - Math.floor(listRows / 2), rows.length - listRows));
  const marked = rows[idx];
  // The repair column is as wide as its longest name (at most 24), so the tap column keeps its room.
  const nameW = Math.min(24, Math.max(6, ...rows.map(r => Array.from(r.label).length)));
  const e = t.sym.ellipsis;
  const detail = marked
    ? [
        `${marked.label}: ${!marked.feasible ? 'cannot be done here' : marked.meetsMargin ? 'meets the required margin' : 'can be done, short of the margin'}${marked.reason ? `: ${marked.reason}` : ''}`,
        `drill ${L(marked.drill)}  tap ${marked.tapThread ?? '-'}  hole depth ${L(marked.holeDepth)}  torque ${marked.torque === null ? '-' : formatQuantity(marked.torque, 'torque', units, {ascii: t.ascii})}`,
        `work E${marked.effort.grade} ${marked.effort.name}: ${marked.effort.text}`,
        ...(marked.strength ? [`strength: ${marked.strength.parts.map(p => `${p.name} ${formatQuantity(p.force, 'force', units, {ascii: t.ascii})}`).join(', ')}; governs: ${marked.strength.governs}`] : []),
        ...marked.flags.map(f => `${f.level.toUpperCase()} ${f.message}`),
        ...marked.notes,
      ]
    : [];
  const detailLines = detail.flatMap(d => wrap(d, width, 3, t.sym.ellipsis)).slice(0, Math.max(0, height - listRows - 3));
  return (
    <Box flexDirection="column" width={width} height={height}>
      <Text bold>{fit(`Repairs for: ${holeSummary}`, width, t.sym.ellipsis)}</Text>
      <Text color={t.tone('dim')}>{pad(`  # ${pad('Repair', nameW)} ${pad('State', 6)} ${pad('Strip', 6)} ${pad('Bolt-1st', 8)} ${pad('Work', 4)} ${pad('Drill', 9)} Tap`, width, e)}</Text>
      {rows.slice(start, start + listRows).map((r, j) => {
        const i = start + j;
        const tone = !r.feasible ? t.tone('dim') : r.meetsMargin ? t.tone('ok') : t.tone('watch');
        return (
          <Text key={`${r.kind}${i}`} inverse={i === idx} color={tone}>
            {pad(`${i === idx ? t.sym.select : ' '}${String(r.rank).padStart(2)} ${pad(r.label, nameW, e)} ${pad(status(r), 6)} ${pad(m(r.margin.stripping), 6)} ${pad(m(r.margin.boltBreaksFirst), 8)} ${pad(`E${r.effort.grade}`, 4)} ${pad(L(r.drill), 9)} ${r.tapThread ?? '-'}`, width, e)}
          </Text>
        );
      })}
      <Text> </Text>
      {detailLines.map((l, i) => (
        <Text key={`d${i}`}>{l}</Text>
      ))}
    </Box>
  );
}
