/**
 * The workbench root: the size gate, the frame (header, preset line, screen,
 * message, caution, key hints) and the one input handler that turns keys into
 * commands. It renders state and dispatches input; the core computes.
 */
import React, {useEffect, useMemo, useRef, useState} from 'react';
import {Box, Text, useApp, useInput, useStdout} from 'ink';
import {MIN_COLUMNS, MIN_ROWS, bodyHeight, cautionLines} from './layout.js';
import {normaliseKey} from './keys.js';
import {hintLines, type HintCondition} from './keymap.js';
import {contextsOf, currentField, isDirty, shownValues, snapshot, type Screen, type WorkbenchState} from './state/workbench.js';
import {handleKeys} from './run-effects.js';
import {useDerived} from './use-derived.js';
import type {WorkbenchServices} from './services.js';
import {ThemeProvider, fit, pad, useTheme, wrap, type Theme} from './theme.js';
import {Lines} from './components/lines.js';
import {ScreenGuard, TooSmall} from './components/screen-guard.js';
import {SCREENS, screenRow} from './screens/registry.js';
import {withLabels} from './labels.js';
import {NEW_JOINT} from './screens/presets/reducer.js';


/** Terminal size that follows resizes; 0 or missing sizes fall back to 80x24. */
export function useTerminalSize(): {columns: number; rows: number} {
  const {stdout} = useStdout();
  const read = () => ({columns: stdout.columns || MIN_COLUMNS, rows: stdout.rows || MIN_ROWS});
  const [size, setSize] = useState(read);
  useEffect(() => {
    const onResize = () => setSize(read());
    stdout.on('resize', onResize);
    return () => {
      stdout.off('resize', onResize);
    };
  }, [stdout]);
  return size;
}

const TABS: readonly {screen: Screen; key: string; title: string}[] = SCREENS.map(r => ({screen: r.id, key: r.key, title: r.title}));

// The header, preset line and caution change rarely: memoised, so a keystroke re-renders only what it changes.
const Header = React.memo(function Header({screen, unitSystem, width}: {screen: Screen; unitSystem: 'si' | 'us'; width: number}) {
  const t = useTheme();
  // The units key sits beside the units it switches, as the screen keys sit beside their tabs.
  const units = unitSystem === 'si' ? 'u Units SI' : 'u Units US';
  return (
    <Box width={width}>
      <Text bold color={t.tone('accent')}>tapwright </Text>
      {TABS.map(tab => (
        <Text key={tab.screen} inverse={screen === tab.screen} bold={screen === tab.screen}>
          {` ${tab.key} ${tab.title} `}
        </Text>
      ))}
      <Text>{pad('', Math.max(0, width - 10 - 53 - units.length))}</Text>
      <Text>{`  ${units}`}</Text>
    </Box>
  );
});

const PresetLine = React.memo(function PresetLine({presetName, readOnly, dirty, width}: {presetName: string; readOnly: boolean; dirty: boolean; width: number}) {
  const t = useTheme();
  const tag = readOnly ? ' (shipped demo, read-only)' : '';
  const mark = dirty ? '  * unsaved changes' : '  saved';
  const name = fit(presetName, Math.max(8, width - 9 - tag.length - mark.length), t.sym.ellipsis);
  return (
    <Box width={width}>
      <Text>Preset: </Text>
      <Text bold>{name}</Text>
      <Text color={t.tone('dim')}>{tag}</Text>
      <Text color={dirty ? t.tone('watch') : t.tone('dim')} bold={dirty}>
        {mark}
      </Text>
    </Box>
  );
});

const Caution = React.memo(function Caution({columns, screen}: {columns: number; screen: Screen}) {
  const t = useTheme();
  return <Lines lines={cautionLines(columns, screen).map(text => ({text, color: t.tone('watch')}))} width={columns} />;
});

/** A long message wraps over at most this many lines (the screen above gives them up while it shows). */
const MESSAGE_LINES = 4;

/** The message line's text and tone: a prompt, a question, an error or a note. */
function messageOf(state: WorkbenchState, ev: {errors: Record<string, string>; error?: string}, width: number, t: Theme): {lines: string[]; isError: boolean} {
  let text = '';
  let isError = false;
  if (state.prompt) {
    // A long text shows its end, where the cursor is; the title stays.
    // The text wraps whole over up to MESSAGE_LINES lines (a full path can be read);
    // longer, the last line shows its end, where the cursor is.
    const all = Array.from(`${state.prompt.title}: ${state.prompt.buffer}${t.sym.cursor}`);
    const lines: string[] = [];
    for (let i = 0; i < all.length; i += width) lines.push(all.slice(i, i + width).join(''));
    if (lines.length <= MESSAGE_LINES) return {lines, isError: false};
    const head = `${state.prompt.title}: `;
    const room = Math.max(8, width - Array.from(head).length);
    const tail = Array.from(`${state.prompt.buffer}${t.sym.cursor}`);
    const cut = Array.from(t.sym.ellipsis).length;
    return {lines: [`${head}${t.sym.ellipsis}${tail.slice(tail.length - room + cut).join('')}`], isError: false};
  } else if (state.confirm) {
    text = `${state.confirm.question} (y/n)`;
  } else if (state.unsaved) {
    // The open preset's name is on the line above, with its "unsaved changes" mark.
    const then = state.unsaved.target === NEW_JOINT ? 'a new blank joint opens' : `"${fit(state.unsaved.target, 28, t.sym.ellipsis)}" loads`;
    text = `Unsaved edits: s save, d discard, Esc cancel; then ${then}`;
  } else if (state.draftOffer) {
    text = `Restore the unsaved edits from ${state.draftOffer.savedAt.slice(0, 16).replace('T', ' ')}? y/n (preset ${state.draftOffer.presetName})`;
  } else if (state.edit?.error) {
    text = state.edit.error;
    isError = true;
  } else if (state.message) {
    text = state.message.text;
    isError = state.message.level === 'error';
  } else if (state.screen === 'joint') {
    const errors = Object.entries(ev.errors);
    if (errors.length > 0) {
      text = errors[0]![1];
      isError = true;
    } else if (ev.error) {
      text = ev.error;
      isError = true;
    }
  }
  const full = `${isError ? '! ' : ''}${withLabels(text)}`;
  // A message wraps whole (up to MESSAGE_LINES lines), never cut at the first line.
  const lines = wrap(full, width, MESSAGE_LINES, t.sym.ellipsis);
  return {lines: lines.length ? lines : [' '], isError};
}

/** The error about an open prompt or question, on the lines above it, wrapped whole. */
function promptErrorLines(state: WorkbenchState, width: number, t: Theme): string[] {
  const text = (state.prompt || state.confirm) && state.message?.level === 'error' ? state.message.text : undefined;
  return text === undefined ? [] : wrap(`! ${withLabels(text)}`, width, MESSAGE_LINES, t.sym.ellipsis);
}

function MessageLine({state, message, width}: {state: WorkbenchState; message: {lines: string[]; isError: boolean}; width: number}) {
  const t = useTheme();
  // A prompt or question keeps its line; an error about it goes on the line above.
  const promptError = (state.prompt || state.confirm) && state.message?.level === 'error' ? state.message.text : undefined;
  const line = (
    <Box flexDirection="column">
      {message.lines.map((l, i) => (
        <Text key={i} color={message.isError ? t.tone('fail') : state.prompt || state.confirm || state.unsaved || state.draftOffer ? t.tone('info') : undefined} bold={Boolean(state.confirm || state.unsaved || state.draftOffer)}>
          {l || ' '}
        </Text>
      ))}
    </Box>
  );
  if (!promptError) return line;
  return (
    <Box flexDirection="column">
      {promptErrorLines(state, width, t).map((l, i) => (
        <Text key={`e${i}`} color={t.tone('fail')}>
          {l}
        </Text>
      ))}
      {line}
    </Box>
  );
}

export {MIN_COLUMNS, MIN_ROWS};

export interface AppProps {
  initial: WorkbenchState;
  svc: WorkbenchServices;
  theme: Theme;
  /** Called with every new state (the launcher keeps it for the draft on a signal). */
  onState?: (s: WorkbenchState) => void;
  /** Called once when the user quits; the app then exits. */
  onQuit?: (s: WorkbenchState) => void;
}

function Frame({state, svc, columns, rows}: {state: WorkbenchState; svc: WorkbenchServices; columns: number; rows: number}) {
  const t = useTheme();
  const derived = useDerived(state, svc);
  const height = rows - 1;
  // The hint area keeps the height of the screen's own hints while a field is edited or a
  // picker or question is open, so the screen below does not move by a line (and repaint).
  const holds = new Set<HintCondition>(state.screen === 'joint' && currentField(state)?.table ? ['field-has-table'] : []);
  if (derived.outlook?.outlook?.window.torque) holds.add('window-open');
  const hints = hintLines(contextsOf(state), t.ascii, columns, holds);
  // (counted with every conditional key shown, so moving between fields does not change it)
  const hintRows = Math.max(hints.length, hintLines([state.screen, 'screens', 'any'], t.ascii, columns, new Set<HintCondition>(['field-has-table', 'window-open'])).length);
  while (hints.length < hintRows) hints.push('');
  const promptError = promptErrorLines(state, columns, t).length;
  const message = messageOf(state, state.screen === 'joint' && derived.sev ? derived.sev : derived.ev, columns, t);
  const bodyH = bodyHeight({columns, rows}, state.screen) - (hintRows - 1) - promptError - (message.lines.length - 1);
  const {View} = screenRow(state.screen);
  const body = <View state={state} derived={derived} svc={svc} width={columns} height={bodyH} />;
  return (
    <Box flexDirection="column" width={columns} height={height} overflow="hidden">
      <Header screen={state.screen} unitSystem={state.units} width={columns} />
      <PresetLine presetName={state.preset.name} readOnly={state.preset.readOnly} dirty={isDirty(state)} width={columns} />
      <Box height={bodyH} width={columns} overflow="hidden">
        <ScreenGuard resetKey={`${state.screen}.${state.mode}.${state.units}.${snapshot(shownValues(state))}`}>{body}</ScreenGuard>
      </Box>
      <MessageLine state={state} message={message} width={columns} />
      <Caution columns={columns} screen={state.screen} />
      <Lines lines={hints.map(text => ({text, color: t.tone('dim')}))} width={columns} />
    </Box>
  );
}

export function App({initial, svc, theme, onState, onQuit}: AppProps) {
  const [state, setState] = useState(initial);
  const stateRef = useRef(state);
  const {exit} = useApp();
  const {columns, rows} = useTerminalSize();
  const sized = useMemo(() => ({columns, rows}), [columns, rows]);

  useEffect(() => {
    stateRef.current = {...stateRef.current, size: sized};
    setState(s => ({...s, size: sized}));
  }, [sized]);

  useInput((input, key) => {
    const before = stateRef.current;
    const next = handleKeys(before, normaliseKey(input, key), svc);
    if (next === before) return;
    stateRef.current = next;
    if (next.quit) {
      onQuit?.(next);
      exit();
      return;
    }
    setState(next);
    onState?.(next);
  });

  const small = columns < MIN_COLUMNS || rows < MIN_ROWS;
  return (
    <ThemeProvider theme={theme}>
      {small ? (
        <TooSmall columns={columns} rows={rows} minColumns={MIN_COLUMNS} minRows={MIN_ROWS} />
      ) : (
        <Frame state={state} svc={svc} columns={columns} rows={rows} />
      )}
    </ThemeProvider>
  );
}
