/** Moving between screens: a screen key (j, r, p, w, ?) and Esc back. */
import type {Screen, WorkbenchState} from '../state/workbench.js';

export function go(s: WorkbenchState, screen: Screen): WorkbenchState {
  if (s.screen === screen) return s;
  return {...s, screen, backTo: s.screen === 'help' ? s.backTo : s.screen, message: undefined};
}

/** Esc on a screen: back to the joint screen (from Help: to the screen before). */
export const back = (s: WorkbenchState): WorkbenchState => ({...s, screen: s.screen === 'help' ? s.backTo : 'joint', message: undefined});
