/** Start the workbench on fixture services in an 80x24 fake terminal. */
import React from 'react';
import {App} from '../../src/ui/app.js';
import {initialState, type WorkbenchState} from '../../src/ui/state/workbench.js';
import {makeTheme} from '../../src/ui/theme.js';
import type {Draft} from '../../src/ui/services.js';
import {renderAt} from './render-at.js';
import {FIXTURE_VALUES, fixtureServices} from './fixture-services.js';
import {waitFor} from './wait-for.js';

export interface StartOptions {
  svc?: ReturnType<typeof fixtureServices>;
  columns?: number;
  rows?: number;
  ascii?: boolean;
  draft?: Draft;
  state?: Partial<WorkbenchState>;
}

export function startApp(opts: StartOptions = {}) {
  const svc = opts.svc ?? fixtureServices();
  const columns = opts.columns ?? 80;
  const rows = opts.rows ?? 24;
  const quits: WorkbenchState[] = [];
  const states: WorkbenchState[] = [];
  const initial = {
    ...initialState({name: 'demo-fixture', readOnly: true, values: structuredClone(FIXTURE_VALUES), units: 'si', ascii: opts.ascii ?? true, draft: opts.draft, size: {columns, rows}}),
    ...opts.state,
  };
  const r = renderAt(<App initial={initial} svc={svc} theme={makeTheme(false, opts.ascii ?? true)} onQuit={s => quits.push(s)} onState={s => states.push(s)} />, {columns, rows});
  /** Write keys one write per element and wait until the frame shows `expected`. */
  const press = async (keys: string | string[], expected?: string | RegExp) => {
    for (const k of Array.isArray(keys) ? keys : [keys]) {
      const before = r.stdout.frames.length;
      r.stdin.write(k);
      // Wait for a new frame, unless the key changes nothing on screen.
      await waitFor(() => {
        if (r.stdout.frames.length === before && expected === undefined) throw new Error('no frame yet');
      }, 300).catch(() => undefined);
    }
    if (expected !== undefined) await see(expected);
  };
  const see = async (expected: string | RegExp) =>
    waitFor(() => {
      const f = r.lastFrame();
      if (typeof expected === 'string' ? !f.includes(expected) : !expected.test(f)) throw new Error(`frame lacks ${String(expected)}:\n${f}`);
    });
  return {...r, svc, quits, states, press, see, frame: () => r.lastFrame()};
}
