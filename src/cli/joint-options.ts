/**
 * The joint options of `tapwright check` (issue 3) and their mapping to
 * JointInput: shared by `check`, `presets save` and anything else that takes a
 * joint on the command line. Every bad value gets a UsageError naming its option
 * and the accepted range. Numbers may carry units ("40Nm", "12mm", "0.5in").
 */
import {JointInputSchema, type JointInput, type JointInputDraft} from '../core/joint/input.js';
import {quantity, range, str, type OptionSpec, type ParsedOptions} from './args.js';
import {UsageError} from './io.js';

export const JOINT_OPTIONS = {
  thread: {type: 'string'},
  bolt: {type: 'string'},
  'bolt-rm': {type: 'string'},
  'bolt-rp': {type: 'string'},
  parent: {type: 'string'},
  'parent-rm': {type: 'string'},
  'parent-shear': {type: 'string'},
  nut: {type: 'string'},
  'nut-height': {type: 'string'},
  'nut-flats': {type: 'string'},
  engage: {type: 'string'},
  chamfer: {type: 'string'},
  'hole-depth': {type: 'string'},
  torque: {type: 'string'},
  preload: {type: 'string'},
  utilisation: {type: 'string'},
  'mu-thread': {type: 'string'},
  'mu-head': {type: 'string'},
  'nut-factor': {type: 'string'},
  'bearing-diameter': {type: 'string'},
  'service-load': {type: 'string'},
} as const satisfies OptionSpec;

/** JointInput key -> the option that sets it (for messages). */
export const OPTION_OF_FIELD: Record<string, string> = {
  thread: '--thread',
  boltGrade: '--bolt',
  boltRm: '--bolt-rm',
  boltRp: '--bolt-rp',
  internal: '--parent or --nut',
  parent: '--parent',
  parentRm: '--parent-rm',
  parentShear: '--parent-shear',
  nutClass: '--nut',
  nutHeight: '--nut-height',
  nutFlats: '--nut-flats',
  engagement: '--engage',
  chamfer: '--chamfer',
  holeDepth: '--hole-depth',
  tightening: '--torque, --preload or --utilisation',
  torque: '--torque',
  preload: '--preload',
  utilisation: '--utilisation',
  muThread: '--mu-thread',
  muHead: '--mu-head',
  nutFactor: '--nut-factor',
  bearingDiameter: '--bearing-diameter',
  serviceLoad: '--service-load',
  scatter: 'scatter',
  requiredMargin: 'required margin',
};

/** Help lines for the joint options (80 columns). */
export const JOINT_OPTIONS_HELP = [
  '  --thread TEXT          thread and tolerance class: M10x1.5-6H/6g, 3/8-16 UNC',
  '  --bolt ID              bolt grade: 8.8, 10.9, 12.9, A2-70, SAE-5 (default 8.8)',
  '  --bolt-rm, --bolt-rp   custom bolt Rm and Rp0.2, 100 to 2500 / 50 to 2400 MPa',
  '  --parent ID            parent material of a tapped hole (tapwright materials)',
  '  --parent-rm STRESS     custom parent Rm, 20 to 2500 MPa',
  '  --parent-shear STRESS  custom parent shear strength, 10 to 1500 MPa',
  '  --nut CLASS            a nut instead of a tapped hole: 8, 10, SAE-5, ...',
  '  --nut-height LENGTH    nut height, 0.5 to 500 mm (default: regular nut)',
  '  --nut-flats LENGTH     nut width across flats, 1 to 1000 mm',
  '  --engage LENGTH        engaged length, 0.5 to 1000 mm (12mm, 0.5in)',
  '  --chamfer LENGTH       length lost to the countersink, 0 to 100 mm',
  '  --hole-depth LENGTH    tapped depth of a blind hole, 0.5 to 2000 mm',
  '  --torque TORQUE        tighten to a torque, 0.01 to 100000 N·m (40Nm, 30ftlbf)',
  '  --preload FORCE        tighten to a preload, 1 N to 100 MN (20kN)',
  '  --utilisation RATIO    tighten to a share of Rp0.2, 0.1 to 1 (default 0.9)',
  '  --mu-thread MU         thread friction, 0.02 to 0.6, value or min..max',
  '  --mu-head MU           under-head friction, 0.02 to 0.6, value or min..max',
  '  --nut-factor K         T = K F d instead of the friction values, 0.05 to 0.5',
  '  --bearing-diameter LENGTH  bearing diameter under the head, 1 to 2000 mm',
  '  --service-load FORCE   external axial load on the bolt, 0 to 100 MN',
].join('\n');

const has = (values: ParsedOptions['values'], name: string) => str(values, name) !== undefined;

/**
 * Build a JointInput from parsed options, on top of `base` (a saved preset's
 * joint, for "change these values"). Throws UsageError naming the option.
 */
export function jointFromOptions(values: ParsedOptions['values'], base: Partial<JointInputDraft> = {}): JointInput {
  const d: Partial<JointInputDraft> = {...base};
  const s = (name: string) => str(values, name);
  const len = (name: string, min: number, max: number) =>
    quantity(`--${name}`, s(name)!, 'length', {min, max, defaultUnit: 'mm', rangeText: `${min} to ${max} mm`});
  const stress = (name: string, min: number, max: number) =>
    quantity(`--${name}`, s(name)!, 'stress', {min, max, defaultUnit: 'MPa', rangeText: `${min} to ${max} MPa`});

  if (has(values, 'thread')) d.thread = s('thread')!.trim();
  if (has(values, 'bolt')) d.boltGrade = s('bolt')!.trim();
  if (has(values, 'bolt-rm')) d.boltRm = stress('bolt-rm', 100, 2500);
  if (has(values, 'bolt-rp')) d.boltRp = stress('bolt-rp', 50, 2400);

  const tapped = has(values, 'parent') || has(values, 'parent-rm') || has(values, 'parent-shear');
  const nut = has(values, 'nut') || has(values, 'nut-height') || has(values, 'nut-flats');
  if (tapped && nut) throw new UsageError('give either a tapped hole (--parent, --parent-rm, --parent-shear) or a nut (--nut, --nut-height, --nut-flats), not both', '--nut');
  if (tapped) d.internal = 'tapped';
  if (nut) d.internal = 'nut';
  if (has(values, 'parent')) d.parent = s('parent')!.trim();
  if (has(values, 'parent-rm')) d.parentRm = stress('parent-rm', 20, 2500);
  if (has(values, 'parent-shear')) d.parentShear = stress('parent-shear', 10, 1500);
  if (has(values, 'nut')) d.nutClass = s('nut')!.trim();
  if (has(values, 'nut-height')) d.nutHeight = len('nut-height', 0.5, 500);
  if (has(values, 'nut-flats')) d.nutFlats = len('nut-flats', 1, 1000);

  if (has(values, 'engage')) d.engagement = len('engage', 0.5, 1000);
  if (has(values, 'chamfer')) d.chamfer = len('chamfer', 0, 100);
  if (has(values, 'hole-depth')) d.holeDepth = len('hole-depth', 0.5, 2000);

  const modes = (['torque', 'preload', 'utilisation'] as const).filter(m => has(values, m));
  if (modes.length > 1) throw new UsageError(`give one of --torque, --preload or --utilisation, not ${modes.map(m => `--${m}`).join(' and ')}`, `--${modes[1]}`);
  if (has(values, 'torque')) {
    d.tightening = 'torque';
    d.torque = quantity('--torque', s('torque')!, 'torque', {min: 0.01, max: 100000, exclusiveMin: false, defaultUnit: 'Nm', rangeText: '0.01 to 100000 N·m'});
  }
  if (has(values, 'preload')) {
    d.tightening = 'preload';
    d.preload = quantity('--preload', s('preload')!, 'force', {min: 1, max: 1e8, defaultUnit: 'N', rangeText: '1 N to 100 MN'});
  }
  if (has(values, 'utilisation')) {
    d.tightening = 'utilisation';
    d.utilisation = quantity('--utilisation', s('utilisation')!, 'ratio', {min: 0.1, max: 1, rangeText: '0.1 to 1 (or 10% to 100%)'});
  }
  const mu = {min: 0.02, max: 0.6, rangeText: '0.02 to 0.6, a value or min..max'};
  if (has(values, 'mu-thread')) d.muThread = range('--mu-thread', s('mu-thread')!, mu);
  if (has(values, 'mu-head')) d.muHead = range('--mu-head', s('mu-head')!, mu);
  if (has(values, 'nut-factor')) d.nutFactor = quantity('--nut-factor', s('nut-factor')!, 'ratio', {min: 0.05, max: 0.5, rangeText: '0.05 to 0.5'});
  if (has(values, 'bearing-diameter')) d.bearingDiameter = len('bearing-diameter', 1, 2000);
  if (has(values, 'service-load')) {
    d.serviceLoad = quantity('--service-load', s('service-load')!, 'force', {min: 0, max: 1e8, defaultUnit: 'N', rangeText: '0 to 100 MN'});
  }

  if (d.thread === undefined) throw new UsageError('--thread is required: a thread designation such as M10 or 3/8-16 UNC', '--thread');
  if (d.engagement === undefined) throw new UsageError('--engage is required: the engaged length, 0.5 to 1000 mm', '--engage');
  const r = JointInputSchema.safeParse(d);
  if (!r.success) {
    const issue = r.error.issues[0]!;
    const field = String(issue.path[0] ?? '');
    const option = OPTION_OF_FIELD[field] ?? field;
    throw new UsageError(`${option}: ${issue.message}`, option);
  }
  return r.data;
}
