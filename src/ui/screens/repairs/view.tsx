/** The repairs screen (a thin view): the planner's ranked fixes, the marked one in detail, and the repair chosen. */
import React from 'react';
import {Box, Text} from 'ink';
import {formatNumber} from '../../../core/units.js';
import type {RepairOption} from '../../../core/repair/types.js';
import {formatField} from '../../state/field-text.js';
import {fieldById} from '../../state/fields.js';
import {shownValues, type WorkbenchState} from '../../state/workbench.js';
import {useTheme, fit, pad, wrap, type Theme} from '../../theme.js';
import type {ScreenProps} from '../types.js';
import {withLabels} from '../../labels.js';
import {chosenStatus, sameRepair} from './reducer.js';
import {EFFORT_LEGEND, detailLines, detailWindow, drillCell, repairsLayout} from './detail.js';

/** The thread and hole the repairs are for, in one line. */
/** The title: the hole summary, and where to edit it when that fits too. */
function title(state: WorkbenchState, t: Theme, width: number): string {
  const base = `Repairs for: ${holeSummary(state, t)}`;
  const full = `${base} (step 5 of the joint screen)`;
  return fit(Array.from(full).length <= width ? full : base, width, t.sym.ellipsis);
}

function holeSummary(state: WorkbenchState, t: Theme): string {
  const h = shownValues(state).hole;
  const len = (id: string) => formatField(fieldById(id), (h as Record<string, unknown>)[id.slice(5)], state.units, t.ascii);
  const parts = [
    h.holeState !== 'stripped' ? 'hole intact' : h.strippedDepth !== undefined ? `stripped to ${len('hole.strippedDepth')}` : 'stripped along the whole engagement',
    h.through ? 'through' : 'blind',
    h.depthAvailable !== undefined ? `depth ${len('hole.depthAvailable')}` : 'depth not given',
    h.wall !== undefined ? `wall ${len('hole.wall')}` : 'wall not given',
  ];
  return `${shownValues(state).joint.thread ?? '?'}; ${parts.join(', ')}`;
}

export function RepairsView({state, derived, width, height}: ScreenProps) {
  const t = useTheme();
  const units = state.units;
  const index = state.repairIndex;
  if (state.mode !== 'joint') {
    return (
      <Box flexDirection="column" width={width} height={height}>
        <Text bold>{fit('Repairs', width, t.sym.ellipsis)}</Text>
        {wrap('Repairs are for threaded joints (a bolt or screw in a tapped hole or a nut); this is a power screw. m switches back to the joint.', width, 3, t.sym.ellipsis).map((l, i) => (
          <Text key={i}>{l}</Text>
        ))}
      </Box>
    );
  }
  const rep = derived.rep ?? {available: false};
  if (!rep.available || !rep.plan) {
    const why = rep.available ? withLabels(rep.error ?? '') : 'The repair planner is not available in this workbench. The hole state is kept with the preset.';
    return (
      <Box flexDirection="column" width={width} height={height}>
        <Text bold>{title(state, t, width)}</Text>
        <Text color={rep.available ? t.tone('fail') : undefined}>{fit(`${rep.available ? '! ' : ''}${why ?? ''}`, width, t.sym.ellipsis)}</Text>
        <Text>{fit('Enter edits the hole state (joint screen, step 5).', width, t.sym.ellipsis)}</Text>
      </Box>
    );
  }
  const rows = rep.plan.options;
  const idx = Math.min(index, Math.max(0, rows.length - 1));
  const m = (v?: number | null) => (v === undefined || v === null ? '-' : formatNumber(v, 3));
  const stateWord = (r: RepairOption) => (!r.feasible ? 'NO' : r.meetsMargin ? 'OK' : 'SHORT');
  const {listRows, room} = repairsLayout(height, rows.length);
  const start = Math.max(0, Math.min(idx - Math.floor(listRows / 2), rows.length - listRows));
  const marked = rows[idx];
  // The repair column is as wide as its longest name (at most 24), so the tap column keeps its room.
  const nameW = Math.min(24, Math.max(6, ...rows.map(r => Array.from(r.label).length)));
  const e = t.sym.ellipsis;
  const detail = marked ? detailWindow(detailLines(marked, units, width, t.ascii), state.repairDetailScroll ?? 0, room, t.ascii).lines : [];
  const choice = state.values.chosenRepair;
  const status = chosenStatus(rep.plan, choice);
  const chosenLine = status ? `${status.ok ? '' : '! '}${status.text}` : 'No repair chosen: c chooses the marked one for the work order.';
  return (
    <Box flexDirection="column" width={width} height={height}>
      <Text bold>{title(state, t, width)}</Text>
      <Text color={t.tone('dim')}>{pad(`  # ${pad('Repair', nameW)} ${pad('State', 6)} ${pad('Strip', 6)} ${pad('Bolt-1st', 8)} ${pad('Effort', 6)} ${pad('Drill', 9)} Tap`, width, e)}</Text>
      {rows.slice(start, start + listRows).map((r, j) => {
        const i = start + j;
        const tone = !r.feasible ? t.tone('dim') : r.meetsMargin ? t.tone('ok') : t.tone('watch');
        return (
          <Text key={`${r.kind}${i}`} inverse={i === idx} color={tone}>
            {pad(`${i === idx ? t.sym.select : sameRepair(r, choice) ? '*' : ' '}${String(r.rank).padStart(2)} ${pad(r.label, nameW, e)} ${pad(stateWord(r), 6)} ${pad(m(r.margin.stripping), 6)} ${pad(m(r.margin.boltBreaksFirst), 8)} ${pad(`E${r.effort.grade}`, 6)} ${pad(drillCell(r.drill, units, t.ascii), 9)} ${r.tapThread ?? '-'}`, width, e)}
          </Text>
        );
      })}
      <Text color={t.tone('dim')}>{fit(EFFORT_LEGEND, width, e)}</Text>
      <Text color={!status ? t.tone('dim') : status.ok ? t.tone('ok') : t.tone('fail')} bold={Boolean(status && !status.ok)}>
        {fit(chosenLine, width, t.sym.ellipsis)}
      </Text>
      {detail.map((l, i) => (
        <Text key={`d${i}`}>{l}</Text>
      ))}
    </Box>
  );
}
