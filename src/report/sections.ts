/**
 * The content of a check report, independent of its layout: input rows,
 * result groups, flags, the limits used and the sources. The text and the
 * Markdown reports both render these, so the two cannot say different things.
 * Values arrive in working units (mm, N, N·m, MPa) and are formatted here.
 */
import {limitsUsedText} from '../core/joint/measured.js';
import type {CheckResult} from '../core/joint/result.js';
import type {JointInput} from '../core/joint/input.js';
import type {Flag, Range} from '../core/types.js';
import {FIRST_THREAD_VON_MISES_NOTE, FIRST_THREAD_VON_MISES_SHORT, flagsInUnits, notesInUnits} from '../core/joint/index.js';
import {CONVERSION, formatNumber, formatQuantity, type Dimension, type UnitSystem} from '../core/units.js';
import {limitsSides, limitsSummary} from '../core/threads/limits-provenance.js';

export interface Row {
  label: string;
  value: string;
  /** Where the value came from, or a remark. */
  note?: string;
}

export interface Group {
  title: string;
  rows: Row[];
}

export interface Fmt {
  units: UnitSystem;
  ascii: boolean;
}

export function q(value: number, dim: Dimension, f: Fmt, significant = 3): string {
  return formatQuantity(value, dim, f.units, {ascii: f.ascii, significant});
}

/** An area in mm² shown as mm² (SI) or in² (US). */
export function area(value: number, f: Fmt): string {
  const sq = f.ascii ? '^2' : '²';
  return f.units === 'si' ? `${formatNumber(value, 3)} mm${sq}` : `${formatNumber(value / (CONVERSION.IN_MM * CONVERSION.IN_MM), 3)} in${sq}`;
}

function ratio(x: number, digits = 2): string {
  return Number.isFinite(x) ? x.toFixed(digits) : 'n/a';
}

function pct(x: number): string {
  return `${formatNumber(x * 100, 2)} %`;
}

/** Threads listed one by one in the load-share row; the rest are summed (a long engagement has hundreds). */
export const SHARE_LIST_MAX = 12;

/** "38 %, 25 %, ..." for the first SHARE_LIST_MAX threads, then "and N more threads, x % together". */
export function shareList(shares: readonly number[]): string {
  const shown = shares.slice(0, SHARE_LIST_MAX).map(x => pct(x));
  const rest = shares.slice(SHARE_LIST_MAX);
  if (rest.length === 0) return shown.join(', ');
  const together = rest.reduce((a, b) => a + b, 0);
  return `${shown.join(', ')}, and ${rest.length} more threads, ${pct(together)} together`;
}

function friction(r: Range): string {
  return r.min === r.max ? ratio(r.min) : `${ratio(r.min)} to ${ratio(r.max)}`;
}

/** The bolt in a few words: "bolt 8.8", or "custom bolt" when its strengths were given. */
export function boltWords(result: CheckResult): string {
  return result.materials.bolt.id === 'custom' ? 'custom bolt' : `bolt ${result.materials.bolt.id}`;
}

/** The internal thread in a few words: "tapped hole in EN-GJL-250" or "nut, class 8". */
export function internalWords(result: CheckResult, input: JointInput): string {
  const m = result.materials.internal;
  if (input.internal === 'nut') return /\bnut\b/i.test(m.name) ? m.name : `nut, ${m.name}`;
  return `tapped hole in ${m.name}`;
}

const BEARING_WORDS: Record<string, string> = {
  input: 'as given',
  standard: 'hexagon head, ISO 4014/4017 dw,min with ISO 273 medium hole',
  estimate: 'estimated from the size: no standard head data for it',
};

/** The hole as recorded for the repair planner; shown with the inputs of a check report. */
export interface HoleFacts {
  state: 'intact' | 'stripped';
  /** mm; null or absent when not given. */
  strippedDepth?: number | null;
}

/** The input table: what was typed or defaulted, with the source of each material value. */
export function inputRows(result: CheckResult, input: JointInput, f: Fmt, hole?: HoleFacts): Row[] {
  const g = result.geometry;
  const bolt = result.materials.bolt;
  const internal = result.materials.internal;
  const rows: Row[] = [];
  const threadNotes = [
    g.spec.toleranceDefaulted ? 'tolerance class defaulted' : '',
    g.spec.isStandardPitch ? '' : 'special pitch, not in the standard series',
  ].filter(Boolean);
  rows.push({label: 'Thread', value: g.spec.designation, ...(threadNotes.length ? {note: threadNotes.join('; ')} : {})});
  const custom = input.boltRm !== undefined || input.boltRp !== undefined;
  rows.push({
    label: 'Bolt',
    value: `${bolt.name}: Rm ${q(bolt.rm, 'stress', f)}, Rp0.2 ${q(bolt.rp, 'stress', f)}`,
    note: custom ? 'strength given by the user' : bolt.provenance.source,
  });
  rows.push({
    label: 'Internal thread',
    value: `${internalWords(result, input)}: Rm ${q(internal.rm, 'stress', f)}, shear ${q(internal.shear, 'stress', f)}`,
    note: internal.provenance.source,
  });
  if (input.internal === 'nut') {
    if (input.nutHeight !== undefined) rows.push({label: 'Nut height', value: q(input.nutHeight, 'length', f)});
    if (input.nutFlats !== undefined) rows.push({label: 'Nut width across flats', value: q(input.nutFlats, 'length', f)});
  }
  rows.push({label: 'Engaged length', value: q(input.engagement, 'length', f), note: 'from the loaded face, including the chamfer'});
  rows.push(
    result.stripping.engagementLoss !== undefined && result.stripping.engagementLoss !== input.chamfer
      ? {label: 'Countersink or chamfer', value: q(result.stripping.engagementLoss, 'length', f), note: 'the standard nut countersinks (see the notes)'}
      : {label: 'Countersink or chamfer', value: q(input.chamfer, 'length', f)},
  );
  if (input.internal === 'tapped') {
    // Without --hole-depth nothing says the hole is through: say what was assumed (tapwright repair reads the same joint as blind).
    rows.push(
      input.holeDepth !== undefined
        ? {label: 'Hole', value: `blind, ${q(input.holeDepth, 'length', f)} deep`}
        : {label: 'Hole', value: 'depth not given: no blind-hole check'},
    );
  }
  if (hole && input.internal === 'tapped') {
    rows.push(
      hole.state === 'stripped'
        ? {
            label: 'Hole state',
            value: hole.strippedDepth !== undefined && hole.strippedDepth !== null ? `stripped to ${q(hole.strippedDepth, 'length', f)} from the face` : 'stripped (depth not given)',
            note: 'the results above are for a sound thread; see the repair plan',
          }
        : {label: 'Hole state', value: 'intact'},
    );
  }
  rows.push(tighteningRow(input, f));
  if (result.tightening.method === 'nut-factor' && input.nutFactor !== undefined) {
    rows.push({label: 'Nut factor K', value: ratio(input.nutFactor), note: 'T = K F d'});
    // K sets torque and preload; the thread friction still sets the thread torque in the stresses.
    rows.push({label: 'Thread friction muG', value: friction(input.muThread), note: 'thread torque in the stresses'});
  } else {
    rows.push({label: 'Thread friction muG', value: friction(input.muThread)});
    rows.push({label: 'Under-head friction muK', value: friction(input.muHead)});
  }
  rows.push({
    label: 'Bearing diameter DKm',
    value: q(result.tightening.bearingDiameter, 'length', f),
    note:
      result.tightening.bearingSource === 'standard' && g.spec.family === 'unified'
        ? 'hex cap screw head, ASME B18.2.1, with ASME B18.2.8 normal-fit hole'
        : (BEARING_WORDS[result.tightening.bearingSource] ?? result.tightening.bearingSource),
  });
  rows.push({label: 'Service load', value: input.serviceLoad > 0 ? q(input.serviceLoad, 'force', f) : 'none'});
  const spread = result.tightening.preload.min > 0 ? result.tightening.preload.max / result.tightening.preload.min : 1;
  rows.push({
    label: 'Scatter factor alphaA',
    value: ratio(input.scatter),
    note: input.scatter === 1
      ? 'friction range only'
      : `total FM,max / FM,min (VDI 2230 Part 1; it includes the friction scatter, so only the part beyond the friction range is added); preload spread shown ${ratio(spread)}`,
  });
  rows.push({label: 'Required stripping margin', value: ratio(input.requiredMargin), note: 'on bolt break'});
  return rows;
}

function tighteningRow(input: JointInput, f: Fmt): Row {
  if (input.tightening === 'torque' && input.torque !== undefined) return {label: 'Tightening', value: `to torque ${q(input.torque, 'torque', f)}`};
  if (input.tightening === 'preload' && input.preload !== undefined) return {label: 'Tightening', value: `to preload ${q(input.preload, 'force', f)}`};
  return {label: 'Tightening', value: `to ${pct(input.utilisation)} of Rp0.2 (von Mises)`};
}

/** Which method gave the first-thread share: Shigley's fixed 0.38 from 6 threads, else the chain's rise over it. */
export function firstShareMethod(result: CheckResult): string {
  return result.stripping.engagedThreads >= 6
    ? 'Shigley 0.38 for 6 or more threads'
    : 'Shigley 0.38 raised by the spring chain for fewer than 6 threads';
}

/** The result groups, each value with its unit. */
export function resultGroups(result: CheckResult, input: JointInput, f: Fmt): Group[] {
  const t = result.tightening;
  const s = result.stress.firstThread;
  const st = result.stripping;
  const m = result.margin;
  const p = t.preload;
  const internalSide = input.internal === 'nut' ? 'nut thread' : 'tapped thread';
  return [
    {
      title: `Tightening (${t.method === 'nut-factor' ? 'nut factor' : 'friction'} method)`,
      rows: [
        {label: 'Preload min / nominal / max', value: `${q(p.min, 'force', f)} / ${q(p.nominal, 'force', f)} / ${q(p.max, 'force', f)}`},
        {label: 'Tightening torque', value: q(t.torque, 'torque', f)},
        {label: 'Thread torque at max preload', value: q(t.threadTorque, 'torque', f)},
        {label: 'Assembly von Mises at max preload', value: q(t.assemblyVonMises, 'stress', f)},
        {label: 'Utilisation of Rp0.2', value: pct(t.utilisation), note: `limit ${pct(input.utilisation)}`},
        {label: `Permissible preload at ${pct(input.utilisation)}`, value: q(t.permissiblePreload, 'force', f)},
        {label: `Permissible torque at ${pct(input.utilisation)}`, value: q(t.permissibleTorque, 'torque', f)},
      ],
    },
    {
      title: `First engaged thread (carries ${pct(result.firstThreadShare)} of ${q(result.boltLoad, 'force', f)})`,
      rows: [
        {label: 'First-thread share', value: pct(result.firstThreadShare), note: firstShareMethod(result)},
        {label: 'Axial normal stress', value: q(s.axial, 'stress', f)},
        {
          label: 'Root bending stress',
          value: q(s.bending, 'stress', f),
          note: `tooth cantilever, ${result.geometry.spec.family === 'unified' || result.geometry.spec.family === 'metric' ? '60 deg' : result.geometry.spec.family} profile (root width from memory)` +
            (s.bendingSquareThread !== undefined ? `; the square-thread formula 6F/(pi dr p) gives ${q(s.bendingSquareThread, 'stress', f)}` : ''),
        },
        {label: 'Tangential shear stress', value: q(s.shear, 'stress', f)},
        {label: 'Body torsion stress', value: q(s.torsion, 'stress', f)},
        {label: 'Thread bearing stress', value: q(s.bearing, 'stress', f)},
        {label: 'von Mises equivalent', value: q(s.vonMises, 'stress', f), note: FIRST_THREAD_VON_MISES_SHORT},
        {label: 'Shank von Mises', value: q(result.stress.shank.vonMises, 'stress', f)},
        {
          label: 'Load share per thread',
          value: shareList(result.loadShare),
          note: 'loaded face first; elastic spring chain for this joint, calibrated only to the 38 % first-thread share of a steel bolt in a steel nut (it gives 38/24/15 % there, the book 38/25/18 %); the stresses above use the first-thread share in the heading',
        },
      ],
    },
    {
      title: `Stripping (${limitsUsedText(st.limitsUsed) === 'least-material limits' ? 'least-material limits of size' : limitsUsedText(st.limitsUsed)})`,
      rows: [
        {label: 'Full thread engaged', value: `${q(st.effectiveEngagement, 'length', f)} (${formatNumber(st.engagedThreads, 2)} threads)`},
        {label: 'Bolt thread strips at', value: q(st.external.force, 'force', f), note: `shear area ${area(st.external.shearArea, f)} x ${q(st.external.shearStrength, 'stress', f)}`},
        {label: `The ${internalSide} strips at`, value: q(st.internal.force, 'force', f), note: `shear area ${area(st.internal.shearArea, f)} x ${q(st.internal.shearStrength, 'stress', f)}`},
        st.boltBreakForceUpper !== undefined
          ? {
              label: 'Bolt breaks at',
              value: `${q(st.boltBreakForce, 'force', f)} to ${q(st.boltBreakForceUpper, 'force', f)}`,
              note: `stress area x Rm,min to x Rm,max; ${result.materials.bolt.rmUpperSource ?? ''}`,
            }
          : {label: 'Bolt breaks at', value: q(st.boltBreakForce, 'force', f), note: 'stress area x Rm'},
        {label: 'Weaker thread', value: st.weaker === 'external' ? 'bolt thread' : internalSide},
        {label: 'Required engagement, FED-STD-H28', value: q(st.requiredEngagement.fedStd, 'length', f), note: `Formula 1 with J = ${ratio(st.fedStd.j)}`},
        {label: 'Required engagement, Alexander', value: q(st.requiredEngagement.alexander, 'length', f), note: `as in VDI 2230, RS = ${ratio(st.alexander.rs)}`},
      ],
    },
    {
      title: 'Margins',
      rows: [
        {label: 'Stripping margin', value: ratio(m.stripping), note: `weaker strip force / largest load; required ${ratio(input.requiredMargin)}`},
        m.boltBreaksFirstMinStrength !== undefined
          ? {
              label: 'Bolt breaks first',
              value: `${ratio(m.boltBreaksFirst)} at Rm,max (${ratio(m.boltBreaksFirstMinStrength)} at Rm,min)`,
              note: 'weaker strip force / bolt break force; 1.00 or more at Rm,max: even the strongest bolt of the grade breaks first (VDI 2230 Part 1 uses Rm,max, from memory)',
            }
          : {label: 'Bolt breaks first', value: ratio(m.boltBreaksFirst), note: 'weaker strip force / bolt break force; 1.00 or more: the bolt breaks first'},
        {
          label: 'First-thread von Mises / yield',
          value: `bolt ${ratio(m.firstThreadYieldBolt)}, ${internalSide} ${ratio(m.firstThreadYieldInternal)}`,
          note: `above 1.00: local yield at the thread root. ${result.stress.firstThreadNote ?? FIRST_THREAD_VON_MISES_NOTE}`,
        },
      ],
    },
  ];
}

/** The flags with their messages in the report's units (US: lbf, in); the JSON keeps SI. */
export function displayFlags(result: CheckResult, input: JointInput, f: Fmt): Flag[] {
  const shown = flagsInUnits(result, input, f.units);
  if (shown === result.flags) return shown;
  // Flags added to the result by the caller (the hole state) are not rebuilt by the core: keep them, first.
  const codes = new Set(shown.map(x => x.code));
  return [...result.flags.filter(x => !codes.has(x.code)), ...shown];
}

/** The notes with their lengths in the report's units; the JSON keeps SI. */
export function displayNotes(result: CheckResult, input: JointInput, f: Fmt): string[] {
  return notesInUnits(result, input, f.units);
}

/** Upper-case level word, so a flag never depends on colour. */
export function levelWord(level: Flag['level']): string {
  return level === 'fail' ? 'FAIL' : level === 'watch' ? 'WATCH' : 'INFO';
}

/** One line of verdict: the worst level and the counts. */
export function verdict(flags: Flag[]): {word: string; text: string} {
  const n = (l: Flag['level']) => flags.filter(x => x.level === l).length;
  const counts = `${n('fail')} fail, ${n('watch')} watch, ${n('info')} info`;
  if (n('fail') > 0) return {word: 'FAIL', text: `at least one check failed (${counts})`};
  if (n('watch') > 0) return {word: 'WATCH', text: `no check failed; look at the watch flags (${counts})`};
  return {word: 'NO FLAGS', text: `no check at fail or watch level (${counts}); the cautions still apply`};
}

/** Which limits of size and which data the numbers rest on. */
export function limitsLines(result: CheckResult, f: Fmt): string[] {
  const st = result.stripping;
  const l = st.limits;
  const g = result.geometry;
  return [
    limitsUsedText(st.limitsUsed) === 'least-material limits'
      ? `Shear areas at the least-material limits of size: internal minor diameter max ${q(l.knMax, 'length', f, 4)}, external pitch diameter min ${q(l.esMin, 'length', f, 4)}, external major diameter min ${q(l.dsMin, 'length', f, 4)}, internal pitch diameter max ${q(l.enMax, 'length', f, 4)}.`
      : `Shear areas at the measured diameters where given, else the least-material limits (bolt thread: ${st.limitsUsed.external}; internal thread: ${st.limitsUsed.internal}): internal minor diameter ${q(l.knMax, 'length', f, 4)}, external pitch diameter ${q(l.esMin, 'length', f, 4)}, external major diameter ${q(l.dsMin, 'length', f, 4)}, internal pitch diameter ${q(l.enMax, 'length', f, 4)}.`,
    // One side at a time: a pair may mix a table side and a formula side (each side's source under the sources).
    `Limits of size: ${limitsSummary(g)}.`,
    'Tightening limit: von Mises utilisation of the bolt minimum Rp0.2 during tightening (VDI 2230 Part 1).',
  ];
}

/** Method sources and data sources, de-duplicated, in order. */
export function sourceLines(result: CheckResult): string[] {
  const all = [
    ...result.sources,
    `Bolt ${result.materials.bolt.id}: ${result.materials.bolt.provenance.source}`,
    `Internal thread ${result.materials.internal.id}: ${result.materials.internal.provenance.source}`,
    ...limitsSides(result.geometry).map(s => `Thread limits, ${s.side} ${s.cls}: ${s.source}`),
  ];
  return [...new Set(all)];
}
