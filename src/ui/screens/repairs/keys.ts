/** The repairs screen's keys: one handler per command of its context. */
import type {CommandsOf} from '../../keymap.js';
import type {Handler} from '../../state/effects.js';
import {STEPS} from '../../state/fields.js';
import {back} from '../navigation.js';
import {chooseRepair, moveRepair, scrollRepairDetail} from './reducer.js';

const repairs = {
  'list.up': (s, _ev, svc) => moveRepair(s, svc, -1),
  'list.down': (s, _ev, svc) => moveRepair(s, svc, 1),
  'detail.pageUp': (s, _ev, svc) => scrollRepairDetail(s, svc, -1),
  'detail.pageDown': (s, _ev, svc) => scrollRepairDetail(s, svc, 1),
  'repair.choose': (s, _ev, svc) => chooseRepair(s, svc),
  'repair.hole': s => ({...s, screen: 'joint', mode: 'joint', step: STEPS.findIndex(x => x.id === 'hole'), field: 0}),
  'screen.back': back,
} satisfies Record<CommandsOf<'repairs'>, Handler>;

export const REPAIRS_KEYS = {repairs};
