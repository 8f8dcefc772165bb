/**
 * The joint screen (a thin view): the steps of inputs on the left, the live
 * results (or the full flags) on the right, the most important flags
 * underneath. It renders what use-derived.ts computed; it decides nothing.
 */
import React from 'react';
import {Box, Text} from 'ink';
import type {Flag} from '../../../core/types.js';
import {CONVERSION, formatQuantity} from '../../../core/units.js';
import {limitsSides, methodWords} from '../../../core/threads/limits-provenance.js';
import {STEPS, getValue, stepsFor, type FieldDef} from '../../state/fields.js';
import {fieldUnit, formatField} from '../../state/field-text.js';
import {currentField, currentFields, pickerItems, shownValues, type WorkbenchState} from '../../state/workbench.js';
import type {Evaluation, ScrewEvaluation} from '../../state/evaluate.js';
import {ScrewReadout} from './screw-readout.js';
import type {WorkbenchServices} from '../../services.js';
import {useTheme, fit, pad, wrap, type Theme} from '../../theme.js';
import {loadShareLines} from '../../components/pictures.js';
import {Lines, type Line} from '../../components/lines.js';
import type {ScreenProps} from '../types.js';
import {Readout} from './readout.js';
import {ServicePanel} from '../../components/service-panel.js';
import {WindowPanel} from '../../components/window-panel.js';
import {FlagsPanel, sortedFlags} from '../../components/flags-panel.js';
import {levelWord} from '../../../report/sections.js';

interface Props {
  state: WorkbenchState;
  ev: Evaluation;
  /** The power screw, in power-screw mode. */
  sev?: ScrewEvaluation;
  svc: WorkbenchServices;
  width: number;
  height: number;
}

/** Square inches per square millimetre, from the core's inch. */
const IN2_PER_MM2 = 1 / (CONVERSION.IN_MM * CONVERSION.IN_MM);

const LEVEL_WORD: Record<Flag['level'], string> = {fail: levelWord('fail'), watch: levelWord('watch'), info: levelWord('info')};
export {sortedFlags};

/** The "<- -> steps" hint when it fits whole beside the tabs (and the power-screw label). */
function stepHint(state: WorkbenchState, width: number, t: Theme): string {
  const hint = `  ${t.ascii ? '<- ->' : '← →'} steps`;
  const tabs = stepsFor(state.mode).reduce((n, s, i) => n + ` ${i + 1} ${s.title} `.length, 0);
  const free = width - tabs - (state.mode === 'screw' ? 24 : 0) - 1;
  return hint.length <= free ? hint : '';
}

function StepTabs({state, width}: {state: WorkbenchState; width: number}) {
  const t = useTheme();
  return (
    <Box width={width}>
      {stepsFor(state.mode).map((s, i) => (
        <Text key={s.id} inverse={i === state.step} bold={i === state.step}>
          {` ${i + 1} ${s.title} `}
        </Text>
      ))}
      <Text color={t.tone('dim')}>{stepHint(state, width, t)}</Text>
      {state.mode === 'screw' ? <Text bold>{'  POWER SCREW (m: joint)'}</Text> : null}
    </Box>
  );
}

function fieldValueText(state: WorkbenchState, f: FieldDef, t: Theme): string {
  if (state.edit?.fieldId === f.id) return `${state.edit.buffer}${t.sym.cursor}`;
  if (state.picker?.fieldId === f.id && f.kind === 'thread') return `${state.picker.filter}${t.sym.cursor}`;
  const v = getValue(shownValues(state), f.id);
  return formatField(f, v, state.units, t.ascii);
}

function fieldLines(state: WorkbenchState, ev: {errors: Record<string, string>}, width: number, t: Theme): Line[] {
  const sel = currentField(state);
  const labelW = 18;
  return currentFields(state).map(f => {
    const isSel = f === sel;
    const err = ev.errors[f.id] ?? (state.edit?.fieldId === f.id ? state.edit.error : undefined);
    const unit = f.kind === 'quantity' && state.edit?.fieldId === f.id && !/[a-z"']/i.test(state.edit.buffer) ? ` ${fieldUnit(f, state.units, t.ascii)}` : '';
    const mark = err ? '!' : isSel ? t.sym.select : ' ';
    const value = fit(fieldValueText(state, f, t) + unit, width - labelW - 2, t.sym.ellipsis);
    return [
      {text: `${mark} `, color: err ? t.tone('fail') : undefined, bold: isSel},
      {text: `${pad(f.label, labelW - 1)} `, bold: isSel},
      {text: value, inverse: isSel && !state.edit && !state.picker, color: err ? t.tone('fail') : undefined},
    ];
  });
}

function pickerLines(state: WorkbenchState, svc: WorkbenchServices, width: number, height: number, t: Theme): Line[] {
  const p = state.picker!;
  const items = pickerItems(state, svc);
  const isThread = p.fieldId === 'thread';
  const marked = p.index >= 0 ? items[p.index] : undefined;
  const sourceLines = marked?.item ? wrap(`${marked.item.detail}. Source: ${marked.item.provenance.source}`, width, 3, t.sym.ellipsis) : [];
  const listRows = Math.max(1, height - 1 - sourceLines.length);
  const start = Math.max(0, Math.min(p.index - Math.floor(listRows / 2), items.length - listRows));
  const header = isThread
    ? p.filter === ''
      ? 'Type a designation; matches show here'
      : items.length === 0
        ? `No match for "${p.filter}": Enter takes it as typed`
        : `Matches: ${t.ascii ? 'Up/Down' : '↑↓'} mark, Enter takes`
    : `Filter: ${p.filter || '(type to narrow)'}  ${items.length} found`;
  return [
    {text: fit(header, width, t.sym.ellipsis), color: t.tone('dim')},
    ...items.slice(start, start + listRows).map((it, i): Line => {
      const isMarked = start + i === p.index;
      return {text: pad(`${isMarked ? t.sym.select : ' '} ${it.label}`, width), inverse: isMarked};
    }),
    ...sourceLines.map((text): Line => ({text, color: t.tone('info')})),
  ];
}

function threadInfoLines(ev: Evaluation, state: WorkbenchState, width: number, height: number, t: Theme): Line[] {
  const g = ev.result?.geometry;
  if (!g || height <= 0) return [];
  const L = (v: number) => formatQuantity(v, 'length', state.units, {ascii: t.ascii, significant: 4});
  const a = (v: number) => (state.units === 'si' ? `${v.toFixed(1)} mm²` : `${(v * IN2_PER_MM2).toFixed(4)} in²`).replace('²', t.ascii ? '^2' : '²');
  const lines = [
    `${g.spec.designation} (${g.spec.family}${g.spec.series ? ` ${g.spec.series}` : ''})`,
    `pitch ${L(g.pitch)}${g.spec.tpi ? ` (${g.spec.tpi} tpi)` : ''}${g.spec.isStandardPitch ? '' : ' special pitch'}`,
    `d2 ${L(g.pitchDiameter)}  d3 ${L(g.minorDiameterExternal)}`,
    `stress area As ${a(g.stressArea)}`,
    `classes ${g.spec.toleranceInternal}/${g.spec.toleranceExternal}${g.spec.toleranceDefaulted ? ' (default)' : ''}`,
  ];
  // Where the limits come from, one side at a time (a pair may mix a table side and a
  // formula side); two lines a side when three would push the second side off the panel.
  const sides = limitsSides(g).map(side => `${side.cls} limits: ${methodWords(side)}, ${side.source}`);
  const sideLines = height >= lines.length + 6 ? 3 : 2;
  const wrapped = (l: string, i: number, max: number) =>
    wrap(l, width - 2, max, t.sym.ellipsis).map((w, j): Line => ({text: j ? `  ${w}` : w, color: i === 0 ? undefined : t.tone('dim')}));
  return wholeItems([...lines.map((l, i) => wrapped(l, i, 3)), ...sides.map(l => wrapped(l, 1, sideLines)), ...g.notes.map(l => wrapped(l, 1, 3))], height, width, t);
}

/**
 * As many whole items (each one or more lines) as fit in `height` lines, never the
 * first lines of one cut off mid-sentence; when some are left out and a line is
 * free, it says how many and that the report has them all.
 */
export function wholeItems(items: readonly Line[][], height: number, width: number, t: Theme): Line[] {
  const out: Line[] = [];
  let shown = 0;
  for (const it of items) {
    if (out.length + it.length > height) break;
    out.push(...it);
    shown++;
  }
  const left = items.length - shown;
  if (left > 0 && out.length < height) out.push({text: fit(`+${left} more in the report (w)`, width, t.sym.ellipsis), color: t.tone('dim')});
  return out;
}

function LeftColumn({state, ev, sev, svc, width, height}: Props) {
  const t = useTheme();
  const fields = fieldLines(state, state.mode === 'screw' && sev ? sev : ev, width, t);
  const sel = currentField(state);
  const rest = height - fields.length;
  if (state.picker) {
    // A long step (Tightening) leaves the list too few lines for its entries and their source: show only the field being picked.
    const shown = rest >= 6 ? fields : fields.filter((_, i) => currentFields(state)[i] === sel);
    return <Lines lines={[...shown, ...pickerLines(state, svc, width, height - shown.length, t)]} width={width} height={height} />;
  }
  const helpLines: Line[] = (sel ? wrap(sel.help, width, rest >= 7 ? 3 : 2, t.sym.ellipsis) : []).map(text => ({text, color: t.tone('dim')}));
  const below = rest - helpLines.length - 1;
  const shares = state.mode === 'joint' ? (ev.result?.loadShare ?? []) : [];
  let extra: Line[] = [];
  if (state.mode === 'joint' && STEPS[state.step]?.id === 'thread') extra = threadInfoLines(ev, state, width, below + 1, t);
  else if (below >= 2 && shares.length > 0) {
    extra = ['', {text: fit('Load share/thread, 1 = loaded face', width, t.sym.ellipsis), bold: true}, ...loadShareLines(shares, width, below - 1, t)];
  }
  return <Lines lines={[...fields, ...helpLines, ...extra]} width={width} height={height} />;
}

const levelTone = (t: Theme, level: Flag['level']) => (level === 'fail' ? t.tone('fail') : level === 'watch' ? t.tone('watch') : undefined);

function FlagSummary({ev, width, lines: rows, what}: {ev: {result?: {flags: Flag[]}}; width: number; lines: number; what: string}) {
  const t = useTheme();
  const flags = sortedFlags(ev.result?.flags ?? []);
  if (!ev.result) return <Box height={rows} />;
  if (flags.length === 0) return <Lines lines={[{text: fit(`OK  no flags raised for this ${what}`, width, t.sym.ellipsis), color: t.tone('ok')}]} width={width} height={rows} />;
  // With room to spare (a taller terminal), every flag in full.
  const full = flags.flatMap(f => wrap(f.message, width - 6, 6, t.sym.ellipsis).map((l, i): Line => ({text: `${i ? '' : LEVEL_WORD[f.level]}`.padEnd(6) + l, color: levelTone(t, f.level), bold: f.level === 'fail'})));
  if (full.length <= rows) return <Lines lines={full} width={width} height={rows} />;
  const shown = flags.slice(0, rows);
  const more = flags.length - shown.length;
  const lines = shown.map((f, i): Line => {
    const word = LEVEL_WORD[f.level].padEnd(5);
    const full = `${word} ${f.message}`;
    const last = i === shown.length - 1;
    const cut = Array.from(full).length > width;
    const suffix = last && more > 0 ? ` (+${more}, f: all)` : cut ? ' (f)' : '';
    // A message too long for its line gives way to its summary, which keeps the numbers.
    const text = cut && f.summary ? `${word} ${f.summary}` : full;
    return {text: fit(text, width - suffix.length, t.sym.ellipsis) + suffix, color: levelTone(t, f.level), bold: f.level === 'fail'};
  });
  return <Lines lines={lines} width={width} height={rows} />;
}

export function JointView({state, derived, svc, width, height}: ScreenProps) {
  const props: Props = {state, ev: derived.ev, ...(derived.sev ? {sev: derived.sev} : {}), svc, width, height};
  const checked = state.mode === 'screw' && props.sev ? props.sev : props.ev;
  const ev = checked.result ? {...checked, result: {...checked.result, flags: derived.flags}} : checked;
  // The readout needs 14 lines; a taller terminal gives the rest to the flags.
  const flagLines = Math.max(2, height - 1 - 14);
  const bodyH = height - 1 - flagLines;
  const leftW = Math.max(34, Math.floor(width * 0.42));
  const rightW = width - leftW - 1;
  const problem = ev.error ?? Object.values(ev.errors)[0];
  return (
    <Box flexDirection="column" width={width} height={height}>
      <StepTabs state={state} width={width} />
      <Box height={bodyH}>
        <LeftColumn {...props} width={leftW} height={bodyH} />
        <Box width={1} />
        {state.showFlags ? (
          <FlagsPanel flags={ev.result?.flags ?? []} width={rightW} height={bodyH} scroll={state.flagScroll ?? 0} />
        ) : state.mode === 'screw' ? (
          <ScrewReadout result={props.sev?.result} units={state.units} width={rightW} height={bodyH} problem={problem} />
        ) : STEPS[state.step]?.id === 'service' ? (
          <ServicePanel result={props.ev.result} units={state.units} width={rightW} height={bodyH} problem={problem} />
        ) : derived.outlook ? (
          <WindowPanel ev={derived.outlook} units={state.units} width={rightW} height={bodyH} {...(problem !== undefined ? {problem} : {})} />
        ) : (
          <Readout result={props.ev.result} input={props.ev.input} units={state.units} width={rightW} height={bodyH} problem={problem} />
        )}
      </Box>
      <FlagSummary ev={ev} width={width} lines={flagLines} what={state.mode === 'screw' ? 'power screw' : 'joint'} />
    </Box>
  );
}
