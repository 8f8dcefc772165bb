/**
 * The joint's inputs, one row each: the schema key (src/core/joint/input.ts),
 * the CLI option of `check` (and repair, presets save), the workbench label,
 * step and help, and when the input applies. Ranges and defaults come from the
 * schema (src/app/field-table.ts). To add a joint input: add its key to
 * JointInputSchema and one row here, in the order the workbench shows it.
 */
import {DUTY_IDS} from '../core/duty.js';
import type {FieldRow, FormValues, OptionReader} from './fields-types.js';
import {UsageError} from './errors.js';
import {MEASURED_ROWS} from './measured-fields.js';
import {SERVICE_ROWS} from './service-fields.js';
import {LUBRICANT_ROWS, WINDOW_ROWS} from './window-fields.js';

const isNut = (v: FormValues) => v.joint.internal === 'nut';
const isTapped = (v: FormValues) => v.joint.internal !== 'nut';
const tighten = (m: string) => (v: FormValues) => (v.joint.tightening ?? 'utilisation') === m;
const MU_RANGE = '0.02 to 0.6, or min..max';

/** --help section of each joint option (see JOINT_SECTIONS). */
export type JointSection = 'joint' | 'tightening' | 'window' | 'loads' | 'measured' | 'service';

export const JOINT_SECTIONS: readonly {id: JointSection; title: string}[] = [
  {id: 'joint', title: 'The joint'},
  {id: 'tightening', title: 'Tightening (one of; default --utilisation 0.9)'},
  {id: 'window', title: 'Tightening window (lubricant, locking element, wrench)'},
  {id: 'loads', title: 'Loads and margins'},
  {id: 'measured', title: 'As measured (each optional; stripping uses them in place of the class limits)'},
  {id: 'service', title: 'Service state (optional; without --clamp the service load is taken in full)'},
];

/** --service-load F (static: serviceLoad) or MIN..MAX (cycling: service.serviceLoad, and serviceLoad = MAX); see service-fields.ts. */
const serviceLoadRead: OptionReader = (text, c) => {
  const parts = text.split('..');
  if (parts.length > 2) throw new UsageError(`${c.option} takes F or MIN..MAX, got "${text}"`, c.option);
  if (parts.length === 1) return {serviceLoad: c.quantity(text), 'service.serviceLoad': undefined};
  const min = c.quantity(parts[0] ?? '');
  const max = c.quantity(parts[1] ?? '');
  if (min > max) throw new UsageError(`${c.option} ${text}: MIN must not exceed MAX`, c.option);
  return {serviceLoad: max, 'service.serviceLoad': {min, max}};
};

/** A joint row; `section` places its option in `check --help`. Rows of a feature may live in a file of their own and be spread in below. */
export type JointRow = FieldRow & {group: 'joint'; section?: JointSection};

export const JOINT_ROWS: readonly JointRow[] = [
  {group: 'joint', key: 'thread', label: 'Designation', step: 'thread', kind: 'thread', optional: false, example: 'M10x1.5-6H/6g', section: 'joint',
    cli: {name: '--thread', arg: 'TEXT', help: 'thread and tolerance class: M10x1.5-6H/6g, M8x1, 1/4-20 UNC-2A'},
    help: 'Thread with tolerance class, e.g. M10x1.5-6H/6g or 1/4-20 UNC-2A; type to see matches.'},
  {group: 'joint', key: 'boltGrade', label: 'Bolt grade', step: 'parts', kind: 'pick', pick: 'boltGrade', optional: false, section: 'joint',
    cli: {name: '--bolt', arg: 'ID', help: 'bolt grade (8.8, 10.9, 12.9, A2-70, SAE-5, ...; default 8.8)'},
    help: 'Property class of the bolt or screw; Enter opens the list with sources.'},
  {group: 'joint', key: 'boltRm', label: 'Bolt Rm', empty: 'from grade', step: 'parts', kind: 'quantity', dimension: 'stress', optional: true, section: 'joint',
    cli: {name: '--bolt-rm', arg: 'S', help: 'custom bolt tensile strength (900MPa, 130ksi)'},
    help: 'Tensile strength from a certificate; leave empty to use the grade.'},
  {group: 'joint', key: 'boltRp', label: 'Bolt Rp0.2', empty: 'from grade', step: 'parts', kind: 'quantity', dimension: 'stress', optional: true, section: 'joint',
    cli: {name: '--bolt-rp', arg: 'S', help: 'custom bolt yield strength Rp0.2 (640MPa, 92ksi)'},
    help: 'Yield strength from a certificate; leave empty to use the grade.'},
  {group: 'joint', key: 'internal', label: 'Internal thread', step: 'parts', kind: 'choice', choices: ['tapped', 'nut'], optional: false,
    help: 'tapped = a tapped hole in the part; nut = a nut. Enter switches.'},
  {group: 'joint', key: 'parent', label: 'Parent material', empty: 'custom values', step: 'parts', kind: 'pick', pick: 'parent', optional: true, isVisible: isTapped, section: 'joint',
    cli: {name: '--parent', arg: 'ID', help: 'tapped hole: parent material (see tapwright materials)'},
    help: 'Material of the part with the tapped hole; Enter opens the list with sources.'},
  {group: 'joint', key: 'parentRm', label: 'Parent Rm', empty: 'from material', step: 'parts', kind: 'quantity', dimension: 'stress', optional: true, isVisible: isTapped, section: 'joint',
    cli: {name: '--parent-rm', arg: 'S', help: 'tapped hole: custom tensile strength of the part'},
    help: 'Tensile strength of the part from a certificate; empty = material value.'},
  {group: 'joint', key: 'parentShear', label: 'Parent shear', empty: 'from material', step: 'parts', kind: 'quantity', dimension: 'stress', optional: true, isVisible: isTapped, section: 'joint',
    cli: {name: '--parent-shear', arg: 'S', help: 'tapped hole: custom shear strength of the part'},
    help: 'Shear strength of the part; empty = derived from the material.'},
  {group: 'joint', key: 'nutClass', label: 'Nut class', empty: 'from bolt grade', step: 'parts', kind: 'pick', pick: 'nutClass', optional: true, isVisible: isNut, section: 'joint',
    cli: {name: '--nut', arg: 'CLASS', help: 'a nut instead of a tapped hole (ISO 898-2 "8", "10"; SAE-5, ...)'},
    help: 'Property class of the nut; Enter opens the list with sources.'},
  {group: 'joint', key: 'nutStyle', label: 'Inch nut style', empty: 'hex', step: 'parts', kind: 'choice', choices: ['hex', 'heavy-hex'], optional: true, isVisible: isNut, section: 'joint',
    cli: {name: '--nut-style', arg: 'S', help: 'inch nut: hex (default) or heavy-hex, for the ASME B18.2.2 height and flats (metric nuts: ISO 4032)'},
    help: 'Inch nut: hex or heavy hex (ASME B18.2.2 dimensions); metric nuts use ISO 4032. Enter switches.'},
  {group: 'joint', key: 'nutHeight', label: 'Nut height m', empty: 'standard nut', step: 'parts', kind: 'quantity', dimension: 'length', optional: true, isVisible: isNut, section: 'joint',
    cli: {name: '--nut-height', arg: 'LEN', help: 'nut height m (default ISO 4032)'},
    help: 'Height of the nut; empty = standard height for the size.'},
  {group: 'joint', key: 'nutFlats', label: 'Nut flats s', empty: 'standard nut', step: 'parts', kind: 'quantity', dimension: 'length', optional: true, isVisible: isNut, section: 'joint',
    cli: {name: '--nut-flats', arg: 'LEN', help: 'nut width across flats s (default ISO 4032)'},
    help: 'Width across flats of the nut; empty = standard for the size.'},
  {group: 'joint', key: 'duty', label: 'Duty', step: 'parts', kind: 'choice', choices: DUTY_IDS, optional: false, section: 'loads',
    cli: {name: '--duty', arg: 'D', help: `${DUTY_IDS.join(', ')} (default general): any but general raises WATCH margins to FAIL and asks for a qualified person's sign-off; set the design factor of the governing standard as --margin`},
    help: 'Stricter flags and sign-off unless general. Enter switches.'},
  {group: 'joint', key: 'engagement', label: 'Engaged length', empty: 'nut: its height', step: 'engagement', kind: 'quantity', dimension: 'length', optional: false, example: '15mm', section: 'joint',
    cli: {name: '--engage', arg: 'LEN', help: 'engaged length from the loaded face (default for a nut: its height)'},
    help: 'From the loaded face, chamfer included; empty for a nut = its height. 12mm, 0.5in.'},
  {group: 'joint', key: 'chamfer', label: 'Chamfer', step: 'engagement', kind: 'quantity', dimension: 'length', optional: true, section: 'joint',
    cli: {name: '--chamfer', arg: 'LEN', help: 'length lost to the countersink or chamfer at the face'},
    help: 'Axial length at the loaded face without full thread.'},
  {group: 'joint', key: 'holeDepth', label: 'Blind hole depth', empty: 'through hole', step: 'engagement', kind: 'quantity', dimension: 'length', optional: true, isVisible: isTapped, section: 'joint',
    cli: {name: '--hole-depth', arg: 'LEN', help: 'tapped depth of a blind hole (the last 4 threads count as incomplete)'},
    help: 'Drilled-and-tapped depth of a blind hole; empty for a through hole.'},
  {group: 'joint', key: 'requiredMargin', label: 'Required margin', step: 'engagement', kind: 'ratio', optional: true, section: 'loads',
    cli: {name: '--margin', arg: 'M', help: 'required stripping margin on bolt break (default 1.0)'},
    help: 'Stripping margin wanted on bolt break; 1.0 = the bolt must break first.'},
  {group: 'joint', key: 'tightening', label: 'Tighten by', step: 'tightening', kind: 'choice', choices: ['utilisation', 'torque', 'preload'], optional: false,
    help: 'What you set: a yield utilisation, a torque, or a target preload. Enter switches.'},
  {group: 'joint', key: 'utilisation', label: 'Utilisation', step: 'tightening', kind: 'ratio', optional: true, isVisible: tighten('utilisation'), section: 'tightening',
    cli: {name: '--utilisation', arg: 'R', help: 'von Mises utilisation of the bolt yield while tightening (0.9 or 90%)'},
    help: 'Von Mises stress during tightening over yield; 0.9 is usual. 90% also accepted.'},
  {group: 'joint', key: 'torque', label: 'Torque', step: 'tightening', kind: 'quantity', dimension: 'torque', optional: false, isVisible: tighten('torque'), section: 'tightening',
    example: '40Nm', cli: {name: '--torque', arg: 'T', help: 'tightening torque (40Nm, 30ft-lbf)'},
    help: 'Tightening torque; 40Nm or 30ft-lbf accepted.'},
  {group: 'joint', key: 'preload', label: 'Target preload', step: 'tightening', kind: 'quantity', dimension: 'force', optional: false, isVisible: tighten('preload'), section: 'tightening',
    example: '25kN', cli: {name: '--preload', arg: 'F', help: 'target preload at mid friction (25kN, 5000lbf)'},
    help: 'Wanted clamp force; 20kN or 4500lbf accepted.'},
  ...LUBRICANT_ROWS,
  {group: 'joint', key: 'muThread', label: 'Thread friction', step: 'tightening', kind: 'range', optional: true, section: 'tightening',
    cli: {name: '--mu-thread', arg: 'MU', help: 'thread friction, a value or min..max (default 0.10..0.16)', rangeText: MU_RANGE},
    table: 'fastenerThreadFriction', help: 'muG as one value or min..max, e.g. 0.10..0.16; t: published table.'},
  {group: 'joint', key: 'muHead', label: 'Head friction', step: 'tightening', kind: 'range', optional: true, section: 'tightening',
    cli: {name: '--mu-head', arg: 'MU', help: 'under-head friction, a value or min..max (default 0.10..0.16)', rangeText: MU_RANGE},
    table: 'fastenerHeadFriction', help: 'muK as one value or min..max, e.g. 0.10..0.16; t: published table.'},
  {group: 'joint', key: 'nutFactor', label: 'Nut factor K', empty: 'use friction', step: 'tightening', kind: 'ratio', optional: true, section: 'tightening',
    cli: {name: '--nut-factor', arg: 'K', help: 'use T = K F d instead of the friction coefficients'},
    help: 'K of T = K F d; when given it replaces the two friction values. Empty = friction.'},
  {group: 'joint', key: 'bearingDiameter', label: 'Head bearing dia', empty: 'standard head', step: 'tightening', kind: 'quantity', dimension: 'length', optional: true, section: 'tightening',
    cli: {name: '--bearing-diameter', arg: 'LEN', help: 'effective bearing diameter under the head (default (dw,min + hole)/2)'},
    help: 'Effective diameter under the head; empty = hexagon head, medium clearance hole.'},
  {group: 'joint', key: 'scatter', label: 'Method scatter', empty: 'from settings', step: 'tightening', kind: 'ratio', optional: true, section: 'tightening',
    cli: {name: '--scatter', arg: 'A', help: 'tightening factor alphaA = FM,max/FM,min in total, friction scatter included (VDI 2230); only the part beyond the friction range\'s own spread is added (default: tapwright settings, else 1)'},
    help: 'alphaA = FM,max/FM,min in total, friction included; only the part beyond the friction range is added.'},
  {group: 'joint', key: 'serviceLoad', label: 'Service load', step: 'service', kind: 'quantity', dimension: 'force', optional: true, section: 'loads',
    cli: {name: '--service-load', arg: 'F|MIN..MAX', help: 'external axial load per bolt; MIN..MAX: it cycles (fatigue). Taken in full without --clamp, shared with it', read: serviceLoadRead},
    help: 'External axial load per bolt in service (static); empty = none.'},
  ...WINDOW_ROWS,
  ...MEASURED_ROWS,
  ...SERVICE_ROWS,
];
