/**
 * The joint options of `check`, parsed for `repair`. Stand-in until the check
 * command exports its own parser; the proposed shared signature is
 *   JOINT_OPTIONS: OptionSpec
 *   jointFromOptions(values): JointInput   (throws UsageError naming the option and range)
 * so `repair` can switch to it by changing one import.
 */
import {JointInputSchema, type JointInput, type JointInputDraft} from '../../core/joint/index.js';
import {quantity, range, str, type OptionSpec, type ParsedOptions} from '../args.js';
import {UsageError} from '../io.js';

export const JOINT_OPTIONS: OptionSpec = {
  thread: {type: 'string'},
  bolt: {type: 'string'},
  'bolt-rm': {type: 'string'},
  'bolt-rp': {type: 'string'},
  parent: {type: 'string'},
  'parent-rm': {type: 'string'},
  'parent-shear': {type: 'string'},
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
  scatter: {type: 'string'},
};

/** JointInput field -> CLI option, for messages from the schema and the mechanics core. */
export const FIELD_OPTION: Record<string, string> = {
  thread: '--thread', boltGrade: '--bolt', boltRm: '--bolt-rm', boltRp: '--bolt-rp', parent: '--parent',
  parentRm: '--parent-rm', parentShear: '--parent-shear', engagement: '--engage', chamfer: '--chamfer',
  holeDepth: '--hole-depth', torque: '--torque', preload: '--preload', utilisation: '--utilisation',
  muThread: '--mu-thread', muHead: '--mu-head', nutFactor: '--nut-factor', bearingDiameter: '--bearing-diameter',
  serviceLoad: '--service-load', scatter: '--scatter', requiredMargin: '--margin', nutClass: '--nut',
  nutHeight: '--nut-height', nutFlats: '--nut-flats', internal: '--nut',
};

type Values = ParsedOptions['values'];

function num(values: Values, option: string, dim: 'length' | 'force' | 'torque' | 'stress' | 'ratio', unit: string, min: number, max: number, rangeText: string): number | undefined {
  const text = str(values, option);
  return text === undefined ? undefined : quantity(`--${option}`, text, dim, {min, max, defaultUnit: unit, rangeText});
}

/** Build the JointInput from the check options; throws UsageError naming the option and the accepted range. */
export function jointFromOptions(values: Values): JointInput {
  const thread = str(values, 'thread');
  if (thread === undefined) throw new UsageError('--thread is required, e.g. --thread M10 or --thread "1/4-20 UNC"', '--thread');
  const engagement = num(values, 'engage', 'length', 'mm', 0.5, 1000, '0.5 to 1000 mm');
  if (engagement === undefined) throw new UsageError('--engage is required: the engaged length from the loaded face (0.5 to 1000 mm)', '--engage');
  const draft: JointInputDraft = {thread, engagement, internal: 'tapped'};
  const bolt = str(values, 'bolt');
  if (bolt !== undefined) draft.boltGrade = bolt;
  const set = <K extends keyof JointInputDraft>(k: K, v: JointInputDraft[K] | undefined) => {
    if (v !== undefined) draft[k] = v;
  };
  set('boltRm', num(values, 'bolt-rm', 'stress', 'MPa', 100, 2500, '100 to 2500 MPa'));
  set('boltRp', num(values, 'bolt-rp', 'stress', 'MPa', 50, 2400, '50 to 2400 MPa'));
  set('parent', str(values, 'parent'));
  set('parentRm', num(values, 'parent-rm', 'stress', 'MPa', 20, 2500, '20 to 2500 MPa'));
  set('parentShear', num(values, 'parent-shear', 'stress', 'MPa', 10, 1500, '10 to 1500 MPa'));
  set('chamfer', num(values, 'chamfer', 'length', 'mm', 0, 100, '0 to 100 mm'));
  set('holeDepth', num(values, 'hole-depth', 'length', 'mm', 0.5, 2000, '0.5 to 2000 mm'));
  const torque = num(values, 'torque', 'torque', 'Nm', 0.01, 100000, '0.01 to 100000 N·m');
  const preload = num(values, 'preload', 'force', 'N', 1, 1e8, '1 N to 100 MN');
  const utilisation = num(values, 'utilisation', 'ratio', '', 0.1, 1, '0.1 to 1 (or 10% to 100%)');
  const modes = [torque !== undefined && '--torque', preload !== undefined && '--preload', utilisation !== undefined && '--utilisation'].filter(Boolean);
  if (modes.length > 1) throw new UsageError(`give one of --torque, --preload or --utilisation, not ${modes.join(' and ')}`, String(modes[1]));
  if (torque !== undefined) Object.assign(draft, {tightening: 'torque', torque});
  if (preload !== undefined) Object.assign(draft, {tightening: 'preload', preload});
  if (utilisation !== undefined) Object.assign(draft, {tightening: 'utilisation', utilisation});
  const mu = (option: string) => {
    const text = str(values, option);
    return text === undefined ? undefined : range(`--${option}`, text, {min: 0.02, max: 0.6, rangeText: '0.02 to 0.6, or min..max'});
  };
  set('muThread', mu('mu-thread'));
  set('muHead', mu('mu-head'));
  set('nutFactor', num(values, 'nut-factor', 'ratio', '', 0.05, 0.5, '0.05 to 0.5'));
  set('bearingDiameter', num(values, 'bearing-diameter', 'length', 'mm', 1, 2000, '1 to 2000 mm'));
  set('serviceLoad', num(values, 'service-load', 'force', 'N', 0, 1e8, '0 N to 100 MN'));
  set('scatter', num(values, 'scatter', 'ratio', '', 1, 4, '1 to 4'));
  const parsed = JointInputSchema.safeParse(draft);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const field = String(issue?.path[0] ?? '');
    const option = FIELD_OPTION[field] ?? field;
    throw new UsageError(`${option}: ${issue?.message ?? 'invalid'}`, option);
  }
  return parsed.data;
}
