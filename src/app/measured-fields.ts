/**
 * What the technician measured on the bolt and the tapped hole or nut: one row per
 * member of the joint's `measured` object (MeasuredThreadSchema, src/core/joint/measured-input.ts),
 * by dotted key. The options of `check` and `repair`, their --help lines and the workbench
 * fields (step "Measured") follow from these rows; ranges come from the schema. The
 * stripping areas use each measured diameter in place of the least-material limit of the
 * class (src/core/joint/measured.ts); a measurement that is not physically possible is
 * refused by the core naming its `measured.*` key, which these rows turn into the option.
 */
import type {JointRow} from './joint-fields.js';

const GAUGE = ['enters', 'stops'] as const;

/** A length measured on the thread, mm (bare numbers follow --units). */
function length(key: string, label: string, option: string, arg: string, cliHelp: string, help: string): JointRow {
  return {group: 'joint', key: `measured.${key}`, label, empty: 'class limit', step: 'measured', kind: 'quantity', dimension: 'length', significant: 4, optional: true, section: 'measured',
    cli: {name: option, arg, help: cliHelp}, help};
}

/** A GO or NO-GO gauge outcome: enters or stops (empty: not gauged). */
function gauge(key: string, label: string, option: string, cliHelp: string, help: string): JointRow {
  return {group: 'joint', key: `measured.gauges.${key}`, label, empty: 'not gauged', step: 'measured', kind: 'choice', choices: GAUGE, optional: true, section: 'measured',
    cli: {name: option, arg: 'enters|stops', help: cliHelp}, help: `${help} Enter switches: enters, stops, not gauged.`};
}

export const MEASURED_ROWS: readonly JointRow[] = [
  length('boltPitchDiameter', 'Bolt pitch dia', '--bolt-pitch-diameter', 'LEN',
    'bolt pitch diameter measured (thread micrometer); not with --over-wires',
    'Bolt pitch diameter by thread micrometer; or use the three-wire reading below, not both.'),
  {...length('overWires.measurement', 'Bolt over wires M', '--over-wires', 'M',
    'bolt: measurement over three wires; needs --wire (the pitch diameter is worked out for the thread\'s flank angle)',
    'Three-wire reading M over the wires on the bolt; give the wire diameter W too.'), empty: 'not measured', example: '10.15mm'},
  {...length('overWires.wire', 'Wire diameter W', '--wire', 'W',
    'diameter of the three wires used for --over-wires (tapwright threads DESIG --over-wires M --wire W shows the best wire)',
    'Diameter of the wires used for the three-wire reading (best wire: tapwright threads).'), empty: 'not measured', example: '0.866mm'},
  length('boltMajorDiameter', 'Bolt major dia', '--bolt-major-diameter', 'LEN',
    'bolt major (outside) diameter measured with a micrometer',
    'Bolt major diameter by micrometer over the crests.'),
  length('holeMinorDiameter', 'Hole minor dia', '--hole-minor-diameter', 'LEN',
    'minor diameter of the tapped hole or nut measured with a pin or bore gauge',
    'Minor diameter of the tapped hole (or nut) by pin gauge or bore gauge.'),
  length('holePitchDiameter', 'Hole pitch dia', '--hole-pitch-diameter', 'LEN',
    'pitch diameter of the tapped hole or nut measured with an internal thread-measuring instrument',
    'Pitch diameter of the hole (or nut) by an internal thread-measuring instrument.'),
  gauge('boltGo', 'Ring GO gauge', '--ring-go', 'GO thread ring gauge on the bolt: enters or stops',
    'GO thread ring gauge on the bolt.'),
  gauge('boltNoGo', 'Ring NO-GO gauge', '--ring-nogo', 'NO-GO thread ring gauge on the bolt: enters (pitch diameter below its limit) or stops',
    'NO-GO ring gauge on the bolt; enters = worn past the limit.'),
  gauge('holeGo', 'Plug GO gauge', '--plug-go', 'GO thread plug gauge in the hole or nut: enters or stops',
    'GO thread plug gauge in the hole (or nut).'),
  gauge('holeNoGo', 'Plug NO-GO gauge', '--plug-nogo', 'NO-GO thread plug gauge in the hole or nut: enters (pitch diameter above its limit) or stops',
    'NO-GO plug gauge in the hole; enters = worn past the limit.'),
];
