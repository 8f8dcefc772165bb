/** The four scroll keys of a scrolled screen (Report, Help), given how that screen scrolls by d lines. */
import type {Handler} from '../state/effects.js';
import type {WorkbenchServices} from '../services.js';
import type {WorkbenchState} from '../state/workbench.js';

export function scrollKeys(by: (s: WorkbenchState, svc: WorkbenchServices, d: number) => WorkbenchState) {
  const page = (s: WorkbenchState) => Math.max(1, s.size.rows - 6);
  return {
    'scroll.up': ((s, _ev, svc) => by(s, svc, -1)) as Handler,
    'scroll.down': ((s, _ev, svc) => by(s, svc, 1)) as Handler,
    'scroll.pageUp': ((s, _ev, svc) => by(s, svc, -page(s))) as Handler,
    'scroll.pageDown': ((s, _ev, svc) => by(s, svc, page(s))) as Handler,
  };
}
