/** Esc on a screen: back to the joint screen (from Help: to the screen before). */
import type {WorkbenchState} from '../state/workbench.js';

export const back = (s: WorkbenchState): WorkbenchState => ({...s, screen: s.screen === 'help' ? s.backTo : 'joint', message: undefined});
