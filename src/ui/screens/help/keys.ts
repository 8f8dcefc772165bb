/** The help screen's keys: one handler per command of its context. */
import type {CommandsOf} from '../../keymap.js';
import type {Handler} from '../../state/effects.js';
import {back} from '../navigation.js';
import {scrollKeys} from '../scroll-keys.js';
import {scrollHelp} from './reducer.js';

const help = {
  ...scrollKeys(scrollHelp),
  'screen.back': back,
} satisfies Record<CommandsOf<'help'>, Handler>;

export const HELP_KEYS = {help};
