/**
 * `tapwright screw`: a power screw (lead screw and nut). Text fits 80 columns and
 * carries a unit on every number; JSON is always SI (mm, N, N·m, MPa, degrees).
 * Exit 0 ok, 3 computed with a fail flag, 2 bad input.
 */
import type {Command} from '../command.js';
import {EXIT, UsageError, type CliIo} from '../io.js';
import {parseOptions, quantity, range, str} from '../args.js';
import {
  checkScrew,
  collarFrictionPick,
  COLLAR_FRICTION,
  COLLAR_FRICTION_SOURCE,
  END_CONDITION_IDS,
  ScrewInputError,
  ScrewInputSchema,
  threadFrictionPick,
  THREAD_FRICTION,
  THREAD_FRICTION_SOURCE,
  THREAD_EXAMPLES,
  type ScrewInput,
} from '../../core/screw/index.js';
import type {Range} from '../../core/types.js';
import type {UnitSystem} from '../../core/units.js';
import {CAUTION_LINES} from '../../core/cautions.js';
import {screwText} from '../../report/screw-text.js';
import {wrapText} from '../../report/wrap.js';

const OPTION_FIELD: Record<string, string> = {
  thread: '--thread', starts: '--starts', load: '--load', loadDirection: '--direction', muThread: '--mu-thread',
  muCollar: '--mu-collar', collarDiameter: '--collar-diameter', nutLength: '--nut-length', nutMaterial: '--nut-material',
  nutWear: '--nut-wear', screwMaterial: '--screw-material', screwYield: '--screw-yield', length: '--length', ends: '--ends',
  speed: '--speed', allowablePressure: '--allowable-pressure',
};

const HELP = `tapwright screw - power screw (lead screw and nut): torque, efficiency,
self-locking, stresses, nut pressure and stripping, buckling

Usage:
  tapwright screw --thread T --load F --nut-length L [options]
  tapwright screw --preset NAME [options]   a saved or shipped screw preset;
                                            options given override it
  tapwright screw --picks          friction picks with their source

Options:
  --thread T            ${THREAD_EXAMPLES}
  --starts N            number of starts, 1 to 8 (default 1; Tr40x14(P7) has 2)
  --load F              axial load, 0 to 100 MN (6.4kN, 1500lbf; bare = N)
  --direction D         compression (default) or tension in the loaded screw
  --mu-thread F         thread friction 0.01 to 0.6, a range 0.10..0.16, or a
                        pick such as steel-oil/bronze (default 0.15)
  --mu-collar F         collar friction 0 to 0.6 or a pick such as
                        hard-steel/bronze (running value) or
                        hard-steel/bronze:starting (default 0: rolling bearing)
  --collar-diameter D   mean collar diameter, 0 to 2000 mm (default 0)
  --nut-length L        engaged nut length, 0.5 to 2000 mm
  --nut-material M      bronze (default), cast-iron, steel, brass, plastic, or
                        a material id of tapwright materials
  --nut-wear W          nut-thread thickness lost to wear, 0 to 50 mm
  --screw-material M    steel (default, C45), alloy-steel, or a steel id
  --screw-yield S       screw yield strength, 50 to 2500 MPa (overrides)
  --length L            unsupported screw length in compression, 0 to 20 m
  --ends E              ${END_CONDITION_IDS.join(', ')}
                        (default pinned-pinned)
  --speed V             sliding speed at the thread, 0 to 10 m/s (0 = by hand)
  --allowable-pressure P  safe nut flank pressure, 0.1 to 500 MPa (overrides)
  --units U             si (default) or us for the text output
  --format F            text (default) or json; --json is short for json
  --help                this text

Torques: Shigley, Mechanical Engineering Design, 9th ed., Eqs. 8-1 to 8-6.
With a friction range the raise torque uses the max and lowering and
self-locking the min. Exit codes: 0 ok, 3 a check failed, 2 bad input.
`;

const OPTIONS = {
  thread: {type: 'string'}, starts: {type: 'string'}, load: {type: 'string'}, direction: {type: 'string'},
  'mu-thread': {type: 'string'}, 'mu-collar': {type: 'string'}, 'collar-diameter': {type: 'string'},
  'nut-length': {type: 'string'}, 'nut-material': {type: 'string'}, 'nut-wear': {type: 'string'},
  'screw-material': {type: 'string'}, 'screw-yield': {type: 'string'}, length: {type: 'string'}, ends: {type: 'string'},
  speed: {type: 'string'}, 'allowable-pressure': {type: 'string'}, units: {type: 'string'}, format: {type: 'string'},
  json: {type: 'boolean'}, picks: {type: 'boolean'}, preset: {type: 'string'},
} as const;

function oneOf<T extends string>(option: string, text: string | undefined, allowed: readonly T[], fallback: T): T {
  if (text === undefined) return fallback;
  const v = text.trim().toLowerCase();
  const hit = allowed.find(a => a === v);
  if (!hit) throw new UsageError(`${option} is "${text}"; accepted: ${allowed.join(', ')}`, option);
  return hit;
}

function threadFriction(text: string): number | Range {
  const pick = threadFrictionPick(text);
  if (pick) return {min: pick.min, max: pick.max};
  if (/^[a-z]/i.test(text.trim())) {
    throw new UsageError(`--mu-thread "${text}" is not a number or a pick; accepted: 0.01 to 0.6, min..max, or ${THREAD_FRICTION.map(p => p.id).join(', ')}`, '--mu-thread');
  }
  const r = range('--mu-thread', text, {min: 0.01, max: 0.6, rangeText: '0.01 to 0.6'});
  return r.min === r.max ? r.min : r;
}

function collarFriction(text: string): number {
  const [id = '', which = 'running'] = text.trim().split(':');
  const pick = collarFrictionPick(id);
  if (pick) {
    if (which !== 'running' && which !== 'starting') throw new UsageError(`--mu-collar "${text}": after ":" write running or starting`, '--mu-collar');
    return which === 'starting' ? pick.starting : pick.running;
  }
  if (/^[a-z]/i.test(text.trim())) {
    throw new UsageError(`--mu-collar "${text}" is not a number or a pick; accepted: 0 to 0.6 or ${COLLAR_FRICTION.map(p => p.id).join(', ')}`, '--mu-collar');
  }
  return quantity('--mu-collar', text, 'ratio', {min: 0, max: 0.6, rangeText: '0 to 0.6'});
}

function required(values: Record<string, unknown>, name: string, what: string, base: Record<string, unknown> | undefined): string | undefined {
  const v = str(values as never, name);
  if (v === undefined && base === undefined) throw new UsageError(`--${name} is required (${what}); see tapwright screw --help`, `--${name}`);
  return v;
}

export interface ScrewArgs {
  input: ScrewInput;
  units: UnitSystem;
  json: boolean;
  picks: boolean;
  /** Name of the preset the inputs started from, if any. */
  preset?: string;
}

/**
 * Build the ScrewInput from the options, on top of a preset's screw inputs when
 * `base` is given; every rejection names its option.
 */
export function screwInputFromArgs(args: string[], base?: Record<string, unknown>): ScrewArgs {
  const {values} = parseOptions(args, OPTIONS, false);
  const units = oneOf('--units', str(values, 'units'), ['si', 'us'] as const, 'si');
  const format = oneOf('--format', str(values, 'format'), ['text', 'json'] as const, 'text');
  const json = values.json === true || format === 'json';
  if (values.picks === true) return {input: undefined as never, units, json, picks: true};
  const opt = (name: string) => str(values, name);
  const len = (name: string, min: number, max: number, rangeText: string, exclusiveMin = false) => {
    const t = opt(name);
    return t === undefined ? undefined : quantity(`--${name}`, t, 'length', {min, max, rangeText, defaultUnit: 'mm', exclusiveMin});
  };
  const startsText = opt('starts');
  let starts: number | undefined;
  if (startsText !== undefined) {
    starts = Number(startsText.trim());
    if (!Number.isInteger(starts) || starts < 1 || starts > 8) throw new UsageError(`--starts is ${startsText}; accepted: a whole number 1 to 8`, '--starts');
  }
  const speedText = opt('speed');
  const allowText = opt('allowable-pressure');
  const yieldText = opt('screw-yield');
  const wearText = opt('nut-wear');
  const thread = required(values, 'thread', THREAD_EXAMPLES, base);
  const loadText = required(values, 'load', 'axial load, e.g. 6.4kN', base);
  const nutLengthText = required(values, 'nut-length', 'engaged nut length, e.g. 40mm', base);
  const draft = {
    thread,
    starts,
    load: loadText === undefined ? undefined : quantity('--load', loadText, 'force', {min: 0, max: 1e8, rangeText: '0 to 100 MN', defaultUnit: 'n'}),
    loadDirection: opt('direction') === undefined ? undefined : oneOf('--direction', opt('direction'), ['compression', 'tension'] as const, 'compression'),
    muThread: opt('mu-thread') === undefined ? undefined : threadFriction(opt('mu-thread') ?? ''),
    muCollar: opt('mu-collar') === undefined ? undefined : collarFriction(opt('mu-collar') ?? ''),
    collarDiameter: len('collar-diameter', 0, 2000, '0 to 2000 mm'),
    nutLength: nutLengthText === undefined ? undefined : quantity('--nut-length', nutLengthText, 'length', {min: 0.5, max: 2000, rangeText: '0.5 to 2000 mm', defaultUnit: 'mm'}),
    nutMaterial: opt('nut-material'),
    nutWear: wearText === undefined ? undefined : quantity('--nut-wear', wearText, 'length', {min: 0, max: 50, rangeText: '0 to 50 mm', defaultUnit: 'mm'}),
    screwMaterial: opt('screw-material'),
    screwYield: yieldText === undefined ? undefined : quantity('--screw-yield', yieldText, 'stress', {min: 50, max: 2500, rangeText: '50 to 2500 MPa', defaultUnit: 'mpa'}),
    length: len('length', 0, 20000, '0 to 20 000 mm'),
    ends: opt('ends') === undefined ? undefined : oneOf('--ends', opt('ends'), END_CONDITION_IDS, 'pinned-pinned'),
    speed: speedText === undefined ? undefined : quantity('--speed', speedText, 'speed', {min: 0, max: 10, rangeText: '0 to 10 m/s', defaultUnit: 'm/s'}),
    allowablePressure: allowText === undefined ? undefined : quantity('--allowable-pressure', allowText, 'stress', {min: 0.1, max: 500, rangeText: '0.1 to 500 MPa', defaultUnit: 'mpa'}),
  };
  const given = Object.fromEntries(Object.entries(draft).filter(([, v]) => v !== undefined));
  // A multi-start thread typed over a preset brings its own starts.
  const merged = base && given.thread !== undefined && given.starts === undefined ? {...base, starts: undefined, ...given} : {...base, ...given};
  const parsed = ScrewInputSchema.safeParse(merged);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const field = String(issue?.path[0] ?? '');
    throw new UsageError(`${OPTION_FIELD[field] ?? field}: ${issue?.message ?? 'invalid'}`, OPTION_FIELD[field]);
  }
  return {input: parsed.data, units, json, picks: false};
}

function picksText(): string {
  const out = ['THREAD FRICTION f (--mu-thread pick: min..max)'];
  for (const p of THREAD_FRICTION) out.push(`  ${p.id.padEnd(22)} ${p.min.toFixed(2)}..${p.max.toFixed(2)}  ${p.screw} screw, ${p.nut} nut`);
  out.push(...wrapText(THREAD_FRICTION_SOURCE.source, '  source: ', '    '), '', 'COLLAR FRICTION fc (--mu-collar pick; add :starting for the starting value)');
  for (const p of COLLAR_FRICTION) out.push(`  ${p.id.padEnd(22)} running ${p.running.toFixed(2)}, starting ${p.starting.toFixed(2)}`);
  out.push(...wrapText(COLLAR_FRICTION_SOURCE.source, '  source: ', '    '), '');
  return out.join('\n');
}

export const command: Command = {
  name: 'screw',
  summary: 'power screws (lead screws and nuts): torque, efficiency, stresses, buckling',
  help: HELP,
  async run(args: string[], io: CliIo) {
    const presetName = str(parseOptions(args, OPTIONS, false).values, 'preset');
    let base: Record<string, unknown> | undefined;
    if (presetName !== undefined) {
      const {resolvePreset} = await import('../../store/resolve.js');
      const p = resolvePreset(presetName, io.env, 'screw', m => io.err(`tapwright: ${m}\n`));
      if (!p.screw) throw new UsageError(`--preset "${presetName}" has no power-screw inputs`, '--preset');
      base = {...p.screw};
    }
    const {input, units, json, picks} = screwInputFromArgs(args, base);
    if (picks) {
      io.out(json ? `${JSON.stringify({threadFriction: THREAD_FRICTION, threadFrictionSource: THREAD_FRICTION_SOURCE, collarFriction: COLLAR_FRICTION, collarFrictionSource: COLLAR_FRICTION_SOURCE}, null, 2)}\n` : `${picksText()}\n`);
      return EXIT.ok;
    }
    let result;
    try {
      result = checkScrew(input);
    } catch (e) {
      if (e instanceof ScrewInputError) throw new UsageError(`${OPTION_FIELD[e.field] ?? e.field}: ${e.message}`, OPTION_FIELD[e.field]);
      throw e;
    }
    if (json) io.out(`${JSON.stringify({...result, input: {...input, ...result.input}, preset: presetName ?? null, cautions: CAUTION_LINES}, null, 2)}\n`);
    else io.out(screwText(result, units, presetName));
    return result.flags.some(f => f.level === 'fail') ? EXIT.fail : EXIT.ok;
  },
};
