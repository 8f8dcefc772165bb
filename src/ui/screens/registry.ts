/**
 * The screens, one row each, in tab order: the key and title of its tab, its
 * key tables (one handler per command of each of its contexts, checked against
 * the keymap) and its view. Adding a screen: a folder with reducer.ts, keys.ts
 * and view.tsx, a row here, and its rows in keymap.ts (its id in SCREEN_IDS,
 * a `go.` key and its bindings).
 */
import type React from 'react';
import type {CommandsOf, Context, Screen} from '../keymap.js';
import type {Handler} from '../state/effects.js';
import type {ScreenProps} from './types.js';
import {JOINT_KEYS} from './joint/keys.js';
import {JointView} from './joint/view.js';
import {REPAIRS_KEYS} from './repairs/keys.js';
import {RepairsView} from './repairs/view.js';
import {PRESETS_KEYS} from './presets/keys.js';
import {PresetsView} from './presets/view.js';
import {REPORT_KEYS} from './report/keys.js';
import {ReportView} from './report/view.js';
import {HELP_KEYS} from './help/keys.js';
import {HelpView} from './help/view.js';

/** Key tables: for each context, a handler for exactly the commands the keymap binds there. */
export type KeyTables<C extends Context> = {[K in C]: Record<CommandsOf<K>, Handler>};

export interface ScreenRow<S extends Screen = Screen> {
  id: S;
  /** The key shown on the tab (its `go.` binding). */
  key: string;
  title: string;
  /** Handlers of the screen's own context, and of the overlays it opens (edit, picker). */
  keys: Partial<KeyTables<Context>> & KeyTables<S>;
  View: (props: ScreenProps) => React.ReactNode;
  /** What entering the screen resets (Help starts at the top). */
  enter?: (s: ScreenProps['state']) => ScreenProps['state'];
}

export const SCREENS = [
  {id: 'joint', key: 'j', title: 'Joint', keys: JOINT_KEYS, View: JointView} satisfies ScreenRow<'joint'>,
  {id: 'repairs', key: 'r', title: 'Repairs', keys: REPAIRS_KEYS, View: RepairsView} satisfies ScreenRow<'repairs'>,
  {id: 'presets', key: 'p', title: 'Presets', keys: PRESETS_KEYS, View: PresetsView} satisfies ScreenRow<'presets'>,
  {id: 'report', key: 'w', title: 'Report', keys: REPORT_KEYS, View: ReportView} satisfies ScreenRow<'report'>,
  {id: 'help', key: '?', title: 'Help', keys: HELP_KEYS, View: HelpView, enter: s => ({...s, helpScroll: 0})} satisfies ScreenRow<'help'>,
] as const;

/** Every screen has its row (a compile error names a screen without one). */
type Missing = Exclude<Screen, (typeof SCREENS)[number]['id']>;
export const EVERY_SCREEN_HAS_A_ROW: [Missing] extends [never] ? true : Missing = true;

/** A screen's row, for its tab, its view and what entering it resets. */
export function screenRow(id: Screen): Omit<ScreenRow, 'keys'> {
  return SCREENS.find(r => r.id === id)! as Omit<ScreenRow, 'keys'>;
}
