/**
 * The service-state inputs of the joint (issue 16), one row each, spread into
 * JOINT_ROWS after the service load: the clamped parts, the bolt and thread
 * length, a cycling load, embedding, temperatures, a transverse load and the
 * preload as a fraction of the proof load. All optional: without them the
 * service load is taken in full by the bolt, as `check` always did. Keys are
 * dotted: members of JointInput.service (src/core/service/input.ts), which
 * gives their ranges and defaults.
 *
 * The service load itself is the joint's row `serviceLoad` (--service-load,
 * src/app/joint-fields.ts): a single value is a static load (`serviceLoad`);
 * MIN..MAX sets the cycling load `service.serviceLoad` {min, max} and
 * `serviceLoad` = MAX, so the tightening and thread checks keep the largest
 * load in full. The resolver keeps `serviceLoad` at least the cycling MAX.
 */
import {MPSI_MPA, parseClamp} from '../core/service/clamp-parse.js';
import type {ClampPart} from '../core/service/input.js';
import {parseEmbedding, parseServiceLoad} from '../core/service/text-parse.js';
import {parentMaterial} from '../core/materials/index.js';
import {findClampMaterial} from '../core/service/materials.js';
import {formatNumber, formatQuantity, parseQuantity, toDisplay, type UnitSystem} from '../core/units.js';
import {UsageError} from './errors.js';
import type {FieldText, FormValues, OptionReader} from './fields-types.js';
import type {JointRow} from './joint-fields.js';

/** A number without trailing zeros, to 5 significant figures (field-table.ts's plain; not imported: that module imports these rows). */
const plain = (x: number) => String(Number(x.toPrecision(5)));

const service = (v: FormValues) => (v.joint.service ?? {}) as Record<string, unknown>;
const has = (key: string) => (v: FormValues) => service(v)[key] !== undefined;

/** Drop the option in front of a core parser's message for the workbench ("--clamp: entry 2 ..." -> "entry 2 ..."). */
const bare = (error: string) => error.replace(/^--[a-z-]+:?\s*/, '');

/** A clamped part as typed back: "12 steel", "0.5 110GPa" (thickness in the display unit). */
function partText(p: ClampPart, units: UnitSystem): string {
  const t = plain(toDisplay(p.thickness, 'length', units));
  if (p.material !== undefined) return `${t} ${p.material}`;
  const m = p.modulus ?? 0;
  return units === 'us' ? `${t} ${plain(m / MPSI_MPA)}Mpsi` : `${t} ${plain(m / 1000)}GPa`;
}

const CLAMP_TEXT: FieldText = {
  parse: (text, units) => {
    const r = parseClamp(text, {units});
    return r.ok ? r : {ok: false, error: bare(r.error)};
  },
  format: (value, units) => (Array.isArray(value) ? (value as ClampPart[]).map(p => partText(p, units)).join(', ') : String(value)),
};

/** A force or MIN..MAX as shown: "5 kN", "2..9 kN". */
function loadText(value: unknown, units: UnitSystem, ascii: boolean): string {
  const q = (n: number) => formatQuantity(n, 'force', units, {ascii, significant: 3});
  if (typeof value === 'number') return q(value);
  const r = value as {min: number; max: number};
  return `${formatNumber(toDisplay(r.min, 'force', units), 3)}..${q(r.max)}`;
}

const CYCLING_TEXT: FieldText = {
  parse: (text, units) => {
    const r = parseServiceLoad(text, units);
    return r.ok ? r : {ok: false, error: bare(r.error)};
  },
  format: loadText,
};

const EMBEDDING_TEXT: FieldText = {
  parse: (text, units) => {
    const r = parseEmbedding(text, units);
    return r.ok ? r : {ok: false, error: bare(r.error)};
  },
  format: (value, units, ascii) => (typeof value === 'number' ? formatQuantity(value, 'length', units, {ascii, significant: 2}) : String(value)),
};

/**
 * Degrees C as typed, "80", "80C", "80 degC": the number without its unit, or a message
 * for Fahrenheit (with the conversion). The range is checked by the row's bounds (schema).
 */
function celsiusText(text: string): {ok: true; value: string} | {ok: false; error: string} {
  const t = text.trim();
  if (/^[+-]?[\d.]+(e[+-]?\d+)?\s*(\u00b0\s*)?f$/i.test(t)) return {ok: false, error: `"${t}" is in Fahrenheit; give degrees C: (F - 32) / 1.8`};
  return {ok: true, value: t.replace(/\s*(\u00b0\s*c|degc|c)$/i, '')};
}

const TEMPERATURE_TEXT: FieldText = {
  parse: text => {
    const c = celsiusText(text);
    if (!c.ok) return c;
    const p = parseQuantity(c.value, 'ratio');
    return p.ok ? p : {ok: false, error: `${p.error}; give degrees C`};
  },
  format: (value, _u, ascii) => `${formatNumber(Number(value), 3)} ${ascii ? 'deg C' : '\u00b0C'}`,
};

const temperatureRead =
  (key: string): OptionReader =>
  (text, c) => {
    const r = celsiusText(text);
    if (!r.ok) throw new UsageError(`${c.option}: ${r.error}`, c.option);
    return {[key]: c.quantity(r.value)};
  };

/** --clamp: parseClamp with the display unit; the user's own material is accepted when it is also the --parent. */
const clampRead: OptionReader = (text, c) => {
  const parent = c.other?.('parent');
  const extraIds = parent !== undefined && !parentMaterial(parent) && !findClampMaterial(parent) ? [parent] : [];
  const r = parseClamp(text, {units: c.units, extraIds});
  if (!r.ok) throw new UsageError(r.error, c.option);
  return {'service.clamp': r.value};
};

/** --embedding LEN|auto. */
const embeddingRead: OptionReader = (text, c) => {
  const r = parseEmbedding(text, c.units);
  if (!r.ok) throw new UsageError(r.error, c.option);
  return {'service.embedding': r.value};
};

const S = 'service' as const;

export const SERVICE_ROWS: readonly JointRow[] = [
  {group: 'joint', key: 'service.serviceLoad', label: 'Load cycles', empty: 'static load', step: S, kind: 'quantity', dimension: 'force', optional: true, text: CYCLING_TEXT,
    help: 'Cycling load MIN..MAX per bolt (2..9 kN); empty = the static load above. Fatigue is checked.'},
  {group: 'joint', key: 'service.clamp', label: 'Clamped parts', empty: 'none (in full)', step: S, kind: 'text', optional: true, text: CLAMP_TEXT, section: 'service', example: '"12 6082-T6, 20 S355"',
    cli: {name: '--clamp', arg: '"T1 M1, ..."', help: 'clamped parts from under the head down: thickness and material id (tapwright materials) or modulus (110GPa); tapped hole: last = the part with the thread', read: clampRead},
    help: 'Head side first: "3 steel, 12 6082-T6, 20 S355"; tapped hole: the last part holds the thread.'},
  {group: 'joint', key: 'service.boltLength', label: 'Bolt length', empty: 'thread in grip', step: S, kind: 'quantity', dimension: 'length', optional: true, section: 'service',
    cli: {name: '--bolt-length', arg: 'LEN', help: 'bolt length under the head (default: threaded through the grip)'},
    help: 'Length under the head; with it the shank and thread in the grip follow Shigley Table 8-7.'},
  {group: 'joint', key: 'service.threadLength', label: 'Thread length', empty: 'standard rule', step: S, kind: 'quantity', dimension: 'length', optional: true, section: 'service', isVisible: has('boltLength'),
    cli: {name: '--thread-length', arg: 'LEN', help: 'thread length of the bolt (default 2d + 6 mm, ... by Shigley Table 8-7)'},
    help: 'Thread length of the bolt; empty = the standard rule (2d + 6 mm up to 125 mm, ...).'},
  {group: 'joint', key: 'service.embedding', label: 'Embedding', step: S, kind: 'text', optional: true, text: EMBEDDING_TEXT, section: 'service',
    cli: {name: '--embedding', arg: 'LEN|auto', help: 'settling of the faces (8um, 0.008mm); auto: VDI 2230 guide values; 0 off (default auto)', read: embeddingRead, rangeText: 'auto or 0 to 1 mm'},
    help: 'Settling: auto (VDI 2230 guide values, from memory), a length (8um), or 0 for none.'},
  {group: 'joint', key: 'service.serviceTemperature', label: 'Service temp.', empty: 'no change', step: S, kind: 'ratio', optional: true, text: TEMPERATURE_TEXT, section: 'service',
    cli: {name: '--service-temperature', arg: 'T', help: 'temperature of bolt and parts in service, deg C only ("80" or "80C")', read: temperatureRead('service.serviceTemperature'), rangeSuffix: ' deg C'},
    help: 'Degrees C of bolt and parts in service (80 or 80C); empty = no thermal change.'},
  {group: 'joint', key: 'service.assemblyTemperature', label: 'Assembly temp.', step: S, kind: 'ratio', optional: true, text: TEMPERATURE_TEXT, section: 'service', isVisible: has('serviceTemperature'),
    cli: {name: '--assembly-temperature', arg: 'T', help: 'temperature at assembly, deg C only (default 20)', read: temperatureRead('service.assemblyTemperature'), rangeSuffix: ' deg C'},
    help: 'Degrees C when the joint was tightened; default 20.'},
  {group: 'joint', key: 'service.transverseLoad', label: 'Transverse load', empty: 'none', step: S, kind: 'quantity', dimension: 'force', optional: true, section: 'service',
    cli: {name: '--transverse-load', arg: 'F', help: 'sideways (shear) load per bolt carried by friction of the interface'},
    help: 'Sideways load per bolt that the clamped interface must carry by friction.'},
  {group: 'joint', key: 'service.interfaceFriction', label: 'Interface friction', step: S, kind: 'ratio', optional: true, section: 'service', isVisible: has('transverseLoad'),
    cli: {name: '--interface-friction', arg: 'MU', help: 'static friction of the interface under the transverse load (default 0.10)'},
    help: 'Static friction of the interface that carries the transverse load; default 0.10.'},
  {group: 'joint', key: 'service.preloadProof', label: 'Preload / proof', empty: 'tightening', step: S, kind: 'ratio', optional: true, section: 'service',
    cli: {name: '--preload-proof', arg: 'X', help: 'service preload as a fraction of the proof load As x Sp (0.75 reused, 0.90 permanent joints)'},
    help: 'Preload as a fraction of the proof load: 0.75 reused, 0.90 permanent (Marks Eqs. 8.25-8.26).'},
];
