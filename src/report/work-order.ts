/**
 * The work-order part of every report (joint check, repair plan, power screw), in
 * one model that the text and the Markdown renderings both use, so the two always
 * carry the same facts: report facts (date, preset, units, program), the
 * work-order fields, the duty, the cautions and the sign-off block.
 */
import {CAUTION_LINES} from '../core/cautions.js';
import {DUTY_NOTES, DUTY_WORDS, signOffSentence, type Duty} from '../core/duty.js';
import type {UnitSystem} from '../core/units.js';
import {VERSION} from '../version.js';
import type {Row} from './sections.js';

export interface WorkOrderNotes {
  asset?: string;
  location?: string;
  workOrder?: string;
  text?: string;
}

/** What a report says about where and when it was made; every field optional but the units. */
export interface WorkOrderMeta {
  units: UnitSystem;
  date?: Date;
  presetName?: string;
  notes?: WorkOrderNotes;
  duty?: Duty;
}

const UNIT_WORDS: Record<UnitSystem, string> = {
  si: 'SI: mm, kN, N·m, MPa',
  us: 'US customary: in, lbf, ft·lbf, ksi',
};

/** ISO date (UTC) of a Date, e.g. 2026-01-01. */
export function isoDate(d: Date | undefined): string {
  return d === undefined || Number.isNaN(d.getTime()) ? 'date not recorded' : d.toISOString().slice(0, 10);
}

/** Date, preset, units, program and duty. */
export function reportFacts(meta: WorkOrderMeta): Row[] {
  return [
    {label: 'Date', value: isoDate(meta.date)},
    {label: 'Preset', value: meta.presetName ?? '(none: entered by hand)'},
    {label: 'Units', value: UNIT_WORDS[meta.units]},
    {label: 'Computed by', value: `tapwright ${VERSION}`},
    {label: 'Duty', value: DUTY_WORDS[meta.duty ?? 'general']},
  ];
}

/** Asset, location and work order (empty when not given, to be filled in by hand). */
export function workOrderFields(notes: WorkOrderNotes | undefined): Row[] {
  const n = notes ?? {};
  return [
    {label: 'Asset', value: n.asset ?? ''},
    {label: 'Location', value: n.location ?? ''},
    {label: 'Work order', value: n.workOrder ?? ''},
  ];
}

export interface SignOff {
  /** True when the duty makes the sign-off a condition of returning to service. */
  mandatory: boolean;
  /** The sentence above the signature lines. */
  lead: string;
  /** What the duty asks of the user (design factor), empty for general duty. */
  dutyNote: string;
  roles: string[];
}

/** The sign-off block: advisory for general duty, mandatory text for any other. */
export function signOff(duty: Duty | undefined): SignOff {
  const d = duty ?? 'general';
  if (d === 'general') {
    return {
      mandatory: false,
      lead: 'A qualified person signs here before the joint returns to service where the cautions above apply.',
      dutyNote: '',
      roles: ['Checked by', 'Approved by (qualified person)'],
    };
  }
  return {
    mandatory: true,
    lead: `MANDATORY: ${signOffSentence(d)} Without both signatures this report does not release the joint.`,
    dutyNote: DUTY_NOTES[d],
    roles: ['Checked by', 'Approved by (qualified person)'],
  };
}

export {CAUTION_LINES};

/** Text lines: the work-order header (facts and fields) for an 80-column report. */
export function workOrderTextLines(meta: WorkOrderMeta, wrap: (text: string, first: string, rest: string) => string[], label = 36): string[] {
  const out: string[] = ['WORK ORDER'];
  for (const r of [...reportFacts(meta), ...workOrderFields(meta.notes)]) {
    const first = `  ${r.label}`.padEnd(label);
    out.push(...(r.value === '' ? [`${first}${'_'.repeat(20)}`] : wrap(r.value, first, ' '.repeat(label))));
  }
  const text = meta.notes?.text?.trim();
  if (text) for (const line of text.split(/\r?\n/)) out.push(...wrap(line, '  ', '  '));
  return out;
}

/** Text lines: the sign-off block. */
export function signOffTextLines(duty: Duty | undefined, wrap: (text: string, first: string, rest: string) => string[]): string[] {
  const s = signOff(duty);
  const out: string[] = ['SIGN-OFF', ...wrap(s.lead, '  ', '  ')];
  if (s.dutyNote) out.push(...wrap(s.dutyNote, '  ', '  '));
  out.push('');
  for (const role of s.roles) out.push(`  ${role.padEnd(32)} name __________  date ________`);
  return out;
}
