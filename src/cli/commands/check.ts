/**
 * `tapwright check`: compute one joint from options (or a preset) and print the
 * result as text, a Markdown work-order report, or SI JSON.
 * Exit 0 no fail flag, 3 computed with a fail flag, 2 bad input naming the option.
 */
import {defaultScatter} from '../default-scatter.js';
import {withMyMaterial} from '../user-material-input.js';
import type {Command} from '../command.js';
import {EXIT, UsageError, type CliIo} from '../io.js';
import {parseOptions, quantity, range, str, type OptionSpec, type ParsedOptions} from '../args.js';
import type {Dimension, UnitSystem} from '../../core/units.js';
import {displayUnit, toDisplay} from '../../core/units.js';
import {CAUTION_LINES} from '../../core/cautions.js';
import {JointInputSchema, type JointInput, type JointInputDraft} from '../../core/joint/input.js';
import {checkJoint, JointInputError} from '../../core/joint/index.js';
import {resolveGeometry} from '../../core/joint/resolve.js';
import {nutDimensions} from '../../core/materials/index.js';
import {formatCheckMarkdown, formatCheckText, type WorkOrderNotes} from '../../report/index.js';
import {NOTE_OPTION_SPEC, noteOptionsGiven, workOrderNotes} from './check-notes.js';

/** Numeric options: the JointInput field, its dimension and the unit of a bare number (SI / US). */
interface NumericOption {
  field: keyof JointInput;
  dim: Dimension;
  si: string;
  us: string;
}
const N = (field: keyof JointInput, dim: Dimension, si: string, us: string): NumericOption => ({field, dim, si, us});
const NUMERIC: Record<string, NumericOption> = {
  '--bolt-rm': N('boltRm', 'stress', 'MPa', 'ksi'),
  '--bolt-rp': N('boltRp', 'stress', 'MPa', 'ksi'),
  '--parent-rm': N('parentRm', 'stress', 'MPa', 'ksi'),
  '--parent-shear': N('parentShear', 'stress', 'MPa', 'ksi'),
  '--nut-height': N('nutHeight', 'length', 'mm', 'in'),
  '--nut-flats': N('nutFlats', 'length', 'mm', 'in'),
  '--engage': N('engagement', 'length', 'mm', 'in'),
  '--chamfer': N('chamfer', 'length', 'mm', 'in'),
  '--hole-depth': N('holeDepth', 'length', 'mm', 'in'),
  '--torque': N('torque', 'torque', 'Nm', 'ft-lbf'),
  '--preload': N('preload', 'force', 'N', 'lbf'),
  '--utilisation': N('utilisation', 'ratio', '', ''),
  '--nut-factor': N('nutFactor', 'ratio', '', ''),
  '--bearing-diameter': N('bearingDiameter', 'length', 'mm', 'in'),
  '--service-load': N('serviceLoad', 'force', 'N', 'lbf'),
  '--scatter': N('scatter', 'ratio', '', ''),
  '--margin': N('requiredMargin', 'ratio', '', ''),
};
const TEXT: Record<string, keyof JointInput> = {'--thread': 'thread', '--bolt': 'boltGrade', '--parent': 'parent', '--nut': 'nutClass'};
const FRICTION: Record<string, keyof JointInput> = {'--mu-thread': 'muThread', '--mu-head': 'muHead'};

/** The option that sets a JointInput field (for messages from the schema and the core). */
export function optionFor(field: string): string {
  for (const [o, n] of Object.entries(NUMERIC)) if (n.field === field) return o;
  for (const [o, f] of Object.entries({...TEXT, ...FRICTION})) if (f === field) return o;
  if (field === 'internal') return '--parent or --nut';
  if (field === 'tightening') return '--torque, --preload or --utilisation';
  return `--${field}`;
}

/** [min, max] of a numeric JointInput field, read from the schema (the one source of truth). */
export function fieldRange(field: keyof JointInput): {min?: number; max?: number} {
  let s: unknown = JointInputSchema.shape[field];
  for (let i = 0; i < 4 && s && typeof s === 'object' && 'unwrap' in s && typeof (s as {unwrap: unknown}).unwrap === 'function'; i++) {
    s = (s as {unwrap: () => unknown}).unwrap();
  }
  const n = s as {minValue?: number | null; maxValue?: number | null};
  return {...(n.minValue != null ? {min: n.minValue} : {}), ...(n.maxValue != null ? {max: n.maxValue} : {})};
}

function rangeText(o: NumericOption, units: UnitSystem): string {
  const r = fieldRange(o.field);
  const f = (v: number): string => (o.dim === 'ratio' ? String(v) : `${Number(toDisplay(v, o.dim, units).toPrecision(4))} ${displayUnit(o.dim, units)}`);
  return `${r.min !== undefined ? f(r.min) : '?'} to ${r.max !== undefined ? f(r.max) : '?'}`;
}

const OPTIONS: OptionSpec = {
  ...Object.fromEntries([...Object.keys(NUMERIC), ...Object.keys(TEXT), ...Object.keys(FRICTION)].map(k => [k.slice(2), {type: 'string'}])),
  units: {type: 'string'},
  format: {type: 'string'},
  json: {type: 'boolean'},
  ascii: {type: 'boolean'},
  preset: {type: 'string'},
  ...NOTE_OPTION_SPEC,
};

const HELP = `tapwright check - one threaded joint: preload, stresses, load share,
stripping, margins, flags

Usage:
  tapwright check --thread M10x1.5-6H/6g --bolt 8.8 --parent S355 --engage 15
  tapwright check --preset NAME [options that change the preset]

The joint
  --thread TEXT        thread and tolerance class: M10x1.5-6H/6g, M8x1,
                       1/4-20 UNC-2A
  --bolt ID            bolt grade (8.8, 10.9, 12.9, A2-70, SAE-5, ...;
                       default 8.8)
  --bolt-rm, --bolt-rp custom bolt tensile strength / yield (900MPa, 130ksi)
  --parent ID          tapped hole: parent material (see tapwright materials)
  --parent-rm, --parent-shear  tapped hole: custom tensile / shear strength
  --nut CLASS          a nut instead of a tapped hole (ISO 898-2 "8", "10";
                       SAE-5, ...)
  --nut-height, --nut-flats    nut height m and width across flats s
                       (default ISO 4032)
  --engage LEN         engaged length from the loaded face (default for a nut:
                       its height)
  --chamfer LEN        length lost to the countersink or chamfer at the face
  --hole-depth LEN     tapped depth of a blind hole (the last 4 threads count
                       as incomplete)
Tightening (one of; default --utilisation 0.9)
  --torque T           tightening torque (40Nm, 30ft-lbf)
  --preload F          target preload at mid friction (25kN, 5000lbf)
  --utilisation R      von Mises utilisation of the bolt yield while
                       tightening (0.9 or 90%)
  --mu-thread MU       thread friction, a value or min..max (default 0.10..0.16)
  --mu-head MU         under-head friction, a value or min..max
                       (default 0.10..0.16)
  --nut-factor K       use T = K F d instead of the friction coefficients
  --bearing-diameter LEN  effective bearing diameter under the head
                       (default (dw,min + hole)/2)
  --scatter A          tightening scatter alphaA beyond the friction range
                       (default 1)
Loads and margins
  --service-load F     external axial load on the bolt, taken in full
  --margin M           required stripping margin on bolt break (default 1.0)
Output
  --units si|us        display units; a bare number is read in these units
                       (mm, N, N·m, MPa or in, lbf, ft·lbf, ksi); JSON is SI
  --format text|markdown|json   (--json is short for --format json)
  --ascii              plain ASCII text
Work order, for --format markdown (default: the notes of the --preset)
  --asset TEXT         asset tag of the machine
  --location TEXT      where it is
  --work-order TEXT    work-order number
  --note TEXT          free text under the work-order fields
                       each replaces the preset's entry; empty clears it

Exit codes: 0 no failed check; 3 computed, but a check failed; 2 bad input
or usage.
Methods: VDI 2230 Part 1 tightening; Shigley, Mechanical Engineering Design
9th ed. section 8-2 thread stresses; spring-chain load share; FED-STD-H28/2B
stripping at the least-material limits; Alexander (1977) / VDI 2230
engagement.

${CAUTION_LINES.join('\n')}
`;

function unitsOf(values: ParsedOptions['values']): UnitSystem {
  const u = str(values, 'units') ?? 'si';
  if (u !== 'si' && u !== 'us') throw new UsageError(`--units is "${u}"; accepted: si, us`, '--units');
  return u;
}

function formatOf(values: ParsedOptions['values']): 'text' | 'markdown' | 'json' {
  const f = str(values, 'format');
  if (f !== undefined && f !== 'text' && f !== 'markdown' && f !== 'json') throw new UsageError(`--format is "${f}"; accepted: text, markdown, json`, '--format');
  if (values.json === true) {
    if (f !== undefined && f !== 'json') throw new UsageError(`--json and --format ${f} contradict each other; give one`, '--json');
    return 'json';
  }
  return f ?? 'text';
}

/** Build the JointInput draft from the options over an optional preset. */
export function buildDraft(values: ParsedOptions['values'], units: UnitSystem, base: JointInputDraft | undefined): JointInputDraft {
  const d: Record<string, unknown> = {...(base ?? {})};
  const has = (o: string): boolean => str(values, o.slice(2)) !== undefined;
  for (const [o, field] of Object.entries(TEXT)) {
    const v = str(values, o.slice(2));
    if (v === undefined) continue;
    if (v.trim() === '') throw new UsageError(`${o} needs a value`, o);
    d[field] = v.trim();
  }
  for (const [o, n] of Object.entries(NUMERIC)) {
    const v = str(values, o.slice(2));
    if (v === undefined) continue;
    const r = fieldRange(n.field);
    d[n.field] = quantity(o, v, n.dim, {...r, defaultUnit: units === 'us' ? n.us : n.si, rangeText: rangeText(n, units)});
  }
  for (const [o, field] of Object.entries(FRICTION)) {
    const v = str(values, o.slice(2));
    if (v !== undefined) d[field] = range(o, v, {min: 0.02, max: 0.6, rangeText: '0.02 to 0.6, or min..max'});
  }
  const tight = ['--torque', '--preload', '--utilisation'].filter(has);
  if (tight.length > 1) throw new UsageError(`${tight.join(' and ')} contradict each other; give one way of tightening`, tight[1]);
  if (has('--torque')) d.tightening = 'torque';
  if (has('--preload')) d.tightening = 'preload';
  if (has('--utilisation')) d.tightening = 'utilisation';

  const tappedOpts = ['--parent', '--parent-rm', '--parent-shear', '--hole-depth'].filter(has);
  const nutOpts = ['--nut', '--nut-height', '--nut-flats'].filter(has);
  if (tappedOpts.length && nutOpts.length) {
    throw new UsageError(`${nutOpts[0]} is for a nut and ${tappedOpts[0]} for a tapped hole; give one kind of internal thread`, nutOpts[0]);
  }
  if (nutOpts.length) {
    if (!has('--nut') && d.internal !== 'nut') throw new UsageError(`${nutOpts[0]} applies to a nut; give --nut CLASS too`, nutOpts[0]);
    d.internal = 'nut';
    delete d.parent;
    delete d.parentRm;
    delete d.parentShear;
    delete d.holeDepth;
  } else if (tappedOpts.length) {
    d.internal = 'tapped';
    delete d.nutClass;
    delete d.nutHeight;
    delete d.nutFlats;
  }
  return d as JointInputDraft;
}

/** A nut without --engage engages over its height (given, or ISO 4032 m min). */
export function defaultEngagement(d: JointInputDraft): void {
  if (d.engagement !== undefined) return;
  if (d.internal !== 'nut') throw new UsageError('--engage is needed: the length of thread engaged in the tapped hole (e.g. 15mm)', '--engage');
  if (d.nutHeight !== undefined) {
    d.engagement = d.nutHeight;
    return;
  }
  if (typeof d.thread !== 'string') return;
  const g = resolveGeometry(d.thread);
  const dims = nutDimensions(g.nominal);
  if (!dims) throw new UsageError(`--nut-height or --engage is needed: no tabulated nut height for ${g.spec.sizeLabel}`, '--nut-height');
  d.engagement = dims.heightMin;
}

/** Validate with the schema; the first issue becomes a UsageError naming its option. */
export function validate(d: JointInputDraft, units: UnitSystem): JointInput {
  const r = JointInputSchema.safeParse(d);
  if (r.success) return r.data;
  const issue = r.error.issues[0];
  const field = String(issue?.path[0] ?? '');
  const option = field === '' ? '--thread' : optionFor(field);
  const n = Object.values(NUMERIC).find(x => x.field === field);
  if (field === 'thread' && d.thread === undefined) throw new UsageError('--thread is needed, e.g. --thread M10x1.5-6H/6g', '--thread');
  if (field === 'engagement' && d.engagement === undefined) throw new UsageError('--engage is needed: the engaged length (e.g. 15mm)', '--engage');
  const accepted = n ? `; accepted: ${rangeText(n, units)}` : field === 'muThread' || field === 'muHead' ? '; accepted: 0.02 to 0.6, or min..max' : '';
  throw new UsageError(`${option}: ${issue?.message ?? 'invalid'}${accepted}`, option);
}

/** "--chamfer -1" reaches the range check (and its message) instead of a parse error: join it as "--chamfer=-1". */
function joinNegativeValues(args: string[]): string[] {
  const out: string[] = [];
  for (let i = 0; i < args.length; i++) {
    const a = args[i] as string;
    const next = args[i + 1];
    const takesValue = a.startsWith('--') && !a.includes('=') && OPTIONS[a.slice(2)]?.type === 'string';
    if (takesValue && next !== undefined && /^-[\d.]/.test(next)) {
      out.push(`${a}=${next}`);
      i++;
    } else out.push(a);
  }
  return out;
}

async function loadPreset(name: string, io: CliIo): Promise<{joint: JointInputDraft; notes: WorkOrderNotes}> {
  const {resolvePreset} = await import('../../store/resolve.js');
  const p = resolvePreset(name, io.env, 'joint', m => io.err(`tapwright: ${m}\n`));
  if (!p.joint) throw new UsageError(`--preset "${name}" holds no joint inputs`, '--preset');
  return {joint: p.joint, notes: p.notes};
}

export const command: Command = {
  name: 'check',
  summary: 'compute a joint: preload, stresses, stripping, margins, flags',
  help: HELP,
  async run(args, io) {
    const {values} = parseOptions(joinNegativeValues(args), OPTIONS, false);
    const units = unitsOf(values);
    const format = formatOf(values);
    const noteOptions = noteOptionsGiven(values);
    if (noteOptions.length > 0 && format !== 'markdown') {
      throw new UsageError(`${noteOptions[0]} fills the work-order report; give --format markdown with it`, noteOptions[0]);
    }
    const presetName = str(values, 'preset');
    const preset = presetName !== undefined ? await loadPreset(presetName, io) : undefined;
    const notes = format === 'markdown' ? await workOrderNotes(values, preset?.notes) : {};
    const draft = buildDraft(values, units, preset?.joint);
    // The settings' default scatter applies when neither --scatter nor a preset gives one.
    if (draft.scatter === undefined && preset === undefined) {
      const d = defaultScatter(io);
      if (d !== 1) draft.scatter = d;
    }
    let input: JointInput;
    let result;
    try {
      if (draft.thread === undefined) throw new UsageError('--thread is needed, e.g. --thread M10x1.5-6H/6g (or --preset NAME)', '--thread');
      defaultEngagement(draft);
      input = await withMyMaterial(validate(draft, units), io);
      result = checkJoint(input);
    } catch (e) {
      if (e instanceof JointInputError) throw new UsageError(`${optionFor(e.field)}: ${e.messageIn(units)}`, optionFor(e.field));
      throw e;
    }
    if (format === 'json') {
      io.out(`${JSON.stringify({...result, input, units: 'si'}, null, 2)}\n`);
    } else if (format === 'markdown') {
      io.out(formatCheckMarkdown(result, input, {date: io.now(), units, notes, ...(presetName !== undefined ? {presetName} : {})}));
    } else {
      io.out(formatCheckText(result, input, {units, ascii: values.ascii === true}));
    }
    return result.flags.some(f => f.level === 'fail') ? EXIT.fail : EXIT.ok;
  },
};
