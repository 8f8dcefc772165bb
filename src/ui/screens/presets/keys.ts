/** The presets screen's keys: one handler per command of its context. */
import type {CommandsOf} from '../../keymap.js';
import type {Handler} from '../../state/effects.js';
import {filteredPresets} from '../../state/workbench.js';
import {saveOpen} from '../../state/save-commands.js';
import {back} from '../navigation.js';
import {loadMarked, newJoint, onMarked} from './reducer.js';

const move = (d: number): Handler => (s, _ev, svc) => {
  const n = filteredPresets(s, svc).length;
  return {...s, presetList: {...s.presetList, index: Math.max(0, Math.min(n - 1, s.presetList.index + d))}};
};

const presets = {
  'list.up': move(-1),
  'list.down': move(1),
  'preset.load': (s, _ev, svc) => loadMarked(s, svc),
  // The list narrows as you type; Esc puts the search before back (kept in the prompt's target).
  'preset.search': s => ({...s, prompt: {kind: 'search', title: 'Search presets', buffer: s.presetList.query, target: s.presetList.query}}),
  'preset.new': s => newJoint(s),
  'preset.save': s => saveOpen(s),
  'preset.saveAs': s => ({...s, prompt: {kind: 'saveAs', title: 'Save the joint as', buffer: ''}}),
  'preset.rename': (s, _ev, svc) => onMarked(s, svc, 'preset.rename'),
  'preset.duplicate': (s, _ev, svc) => onMarked(s, svc, 'preset.duplicate'),
  'preset.delete': (s, _ev, svc) => onMarked(s, svc, 'preset.delete'),
  'preset.export': (s, _ev, svc) => onMarked(s, svc, 'preset.export'),
  'preset.exportAll': s => ({...s, prompt: {kind: 'export', title: 'Export all saved presets to file', buffer: 'tapwright-presets.json'}}),
  'preset.import': s => ({...s, prompt: {kind: 'import', title: 'Import presets from file', buffer: ''}}),
  'screen.back': back,
} satisfies Record<CommandsOf<'presets'>, Handler>;

export const PRESETS_KEYS = {presets};
