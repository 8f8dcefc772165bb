/** The report screen's keys: one handler per command of its context. */
import type {CommandsOf} from '../../keymap.js';
import type {Handler} from '../../state/effects.js';
import {back} from '../navigation.js';
import {scrollKeys} from '../scroll-keys.js';
import {defaultReportPath, openNotes, scrollReport} from './reducer.js';

const report = {
  ...scrollKeys(scrollReport),
  'report.format': s => ({...s, report: {format: s.report.format === 'markdown' ? 'text' : 'markdown', scroll: 0}}),
  'report.write': (s, _ev, svc) => ({...s, prompt: {kind: 'reportPath', title: 'Write the report to file', buffer: defaultReportPath(s, svc)}}),
  'report.notes': (s, _ev, svc) => openNotes(s, svc),
  'screen.back': back,
} satisfies Record<CommandsOf<'report'>, Handler>;

export const REPORT_KEYS = {report};
