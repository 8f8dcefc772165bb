/**
 * `tapwright threads <designation>`: basic geometry and limits of size of a
 * thread designation. Text fits 80 columns with a unit on every number;
 * JSON is always SI (mm, mm²).
 */
import type {Command} from '../command.js';
import {EXIT, UsageError, type CliIo} from '../io.js';
import {formatOption, parseOptions, str, unitsOption} from '../args.js';
import {parseWireOptions, wireJson, wireLines, type WireMeasurement} from './threads-wires.js';
import {toAscii} from '../../report/text.js';
import {parseThread, threadGeometry, limitsSides, limitsSummary, ACCEPTED_FORMS} from '../../core/threads/index.js';
import {CAUTION_SHORT} from '../../core/cautions.js';
import type {ThreadGeometry, ThreadSpec} from '../../core/types.js';
import type {UnitSystem} from '../../core/units.js';
import {wrapText} from '../../report/wrap.js';

const IN = 25.4;

const HELP = `tapwright threads - geometry and limits of size of a thread

Usage:
  tapwright threads <designation> [--units si|us] [--format text|json] [--ascii]
  tapwright threads <designation> --over-wires M --wire W [--json]

Designations (case and spaces do not matter; "x" or "×"):
  ISO metric   M10  M10x1.25  M10x1.5-6g  M10x1.5-6H  M10x1.5-6H/6g  M8-5g6g
               (no pitch: coarse pitch of ISO 261; no class: 6H/6g)
  Unified      1/4-20 UNC-2A  #10-32 UNF-3B  1/2-13 UNC-2A/2B  5/16-24 UNF
               0.250-28 UNF   (series UNC, UNF, UNEF or UN; no class: 2A/2B)
               1/4 UNC        (no threads per inch: the series pitch)
  Power screw  Tr24x5  Tr40x14(P7)  1-5 ACME-2G  square 32x4
               (basic data only here; see tapwright screw)
A pitch outside the standard series is accepted as a special thread and
marked so; its limits come from the tolerance formulas, labelled as such.

Options:
  --units U    si (mm) or us (inches); default si
  --format F   text (default) or json
  --json       geometry and limits as JSON, always SI (mm, mm²); short for
               --format json
  --ascii      plain ASCII text (mm^2, um)
  --over-wires M  three-wire reading: measurement over the wires (bare
               number in mm, in with --units us; or give the unit: 0.2792in)
  --wire W     diameter of the three wires (same units); must sit on the
               flanks (about 0.51 to 1.01 x pitch for 60-degree threads)
  --help       this text

Shows the basic profile (d, P, H, d2, d3, D1), the tensile stress area and
the minor-diameter area, and the limits of size of the external and internal
thread for the tolerance classes, and for each side (internal, external)
whether its limits are read from a table of the standard or computed from
the formulas as a fallback, with the source.

With --over-wires and --wire: the pitch diameter as measured (three-wire
formula with the lead-angle correction), where it lies between the class
limits (inside, or worn past the limit by how much) and the best wire size.
JSON: measured.pitchDiameter, measured.bestWire (mm), measured.withinLimits.
`;

function len(mm: number | undefined, units: UnitSystem): string {
  if (mm === undefined) return '-';
  return units === 'us' ? `${(mm / IN).toFixed(4)} in` : `${mm.toFixed(3)} mm`;
}

function area(mm2: number, units: UnitSystem): string {
  return units === 'us' ? `${(mm2 / (IN * IN)).toFixed(4)} in²` : `${mm2.toFixed(2)} mm²`;
}

function familyText(spec: ThreadSpec): string {
  switch (spec.family) {
    case 'metric':
      return spec.isStandardPitch
        ? `ISO metric, ${spec.series} pitch (ISO 261)`
        : 'ISO metric, special pitch (not in ISO 261)';
    case 'unified':
      return spec.isStandardPitch ? `unified inch, ${spec.series} series (ASME B1.1)` : 'unified inch, UN special (ASME B1.1)';
    case 'trapezoidal':
      return 'ISO metric trapezoidal (ISO 2904)';
    case 'acme':
      return 'Acme, general purpose or centralizing (ASME B1.5)';
    case 'square':
      return 'square thread (no current standard series)';
  }
}

function line(label: string, value: string, note = ''): string {
  return `  ${label.padEnd(28)}${value.padStart(14)}${note ? `  ${note}` : ''}`;
}

function geometryText(g: ThreadGeometry, units: UnitSystem): string[] {
  const s = g.spec;
  const out: string[] = [];
  out.push(`${s.designation}  ${familyText(s)}`);
  out.push('');
  out.push(line('nominal diameter d = D', len(g.nominal, units)));
  const tpi = s.tpi !== undefined ? `${+s.tpi.toFixed(3)} threads per inch` : '';
  out.push(line('pitch P', len(g.pitch, units), tpi));
  out.push(line('fundamental triangle H', len(g.fundamentalHeight, units)));
  out.push(line('pitch diameter d2 = D2', len(g.pitchDiameter, units), 'basic'));
  out.push(line('minor diameter d3', len(g.minorDiameterExternal, units), 'external, basic'));
  out.push(line('minor diameter D1', len(g.minorDiameterInternal, units), 'internal, basic'));
  out.push(line('tensile stress area', area(g.stressArea, units), s.family === 'metric' ? 'As, ISO 898-1' : 'At, ASME B1.1'));
  out.push(line('minor-diameter area', area(g.minorArea, units), 'at d3'));
  out.push('');
  const e = g.limits.external;
  const i = g.limits.internal;
  const row = (a: string, b: string, max: string, min: string) =>
    `  ${a.padEnd(14)}${b.padEnd(14)}${max.padStart(14)}${min.padStart(14)}`;
  out.push(row('Limits of size', '', 'max', 'min'));
  out.push(row(`external ${s.toleranceExternal}`, 'major d', len(e.majorMax, units), len(e.majorMin, units)));
  out.push(row('', 'pitch d2', len(e.pitchMax, units), len(e.pitchMin, units)));
  if (e.minorMin !== undefined || e.minorMax !== undefined) {
    out.push(row('', 'minor d3', len(e.minorMax, units), len(e.minorMin, units)));
  }
  out.push(row(`internal ${s.toleranceInternal}`, 'minor D1', len(i.minorMax, units), len(i.minorMin, units)));
  out.push(row('', 'pitch D2', len(i.pitchMax, units), len(i.pitchMin, units)));
  out.push(row('', 'major D', '-', len(i.majorMin, units)));
  if (s.toleranceDefaulted) out.push('  (class not fully given: default applied)');
  out.push('');
  // Where the limits come from, one side at a time (a pair may mix a table side and a formula side).
  out.push(...wrapText(`${limitsSummary(g)}.`, 'Limits of size: ', '  '));
  for (const side of limitsSides(g)) out.push(...wrapText(side.source, `  ${side.side} ${side.cls} [${side.method}]: `, '    '));
  for (const n of g.notes) out.push(...wrapText(n, '  - ', '    '));
  return out;
}

function powerText(s: ThreadSpec, units: UnitSystem): string[] {
  const out: string[] = [];
  out.push(`${s.designation}  ${familyText(s)}`);
  out.push('');
  out.push(line('nominal diameter d', len(s.nominal, units)));
  out.push(line('pitch P', len(s.pitch, units), s.tpi !== undefined ? `${+s.tpi.toFixed(3)} threads per inch` : ''));
  out.push(line('lead', len(s.lead, units), `${s.starts} start${s.starts > 1 ? 's' : ''}`));
  if (s.toleranceExternal || s.toleranceInternal) {
    const cls = s.toleranceExternal === s.toleranceInternal ? s.toleranceExternal : `${s.toleranceInternal}/${s.toleranceExternal}`;
    out.push(line('class', cls, s.toleranceDefaulted ? 'default' : ''));
  }
  if (!s.isStandardPitch) out.push('  - pitch not in the shipped standard series for this size');
  out.push('');
  out.push(...wrapText('Power-screw geometry, torque, efficiency and stresses: see tapwright screw --help.', '', ''));
  return out;
}

function jsonOf(spec: ThreadSpec, g: ThreadGeometry | undefined, wires: WireMeasurement | undefined): unknown {
  const measured = wires ? {measured: wireJson(wires)} : {};
  if (!g) {
    return {
      designation: spec.designation,
      spec,
      geometry: null,
      note: 'power-screw thread: geometry and mechanics come from tapwright screw',
      ...measured,
      units: {length: 'mm'},
      caution: CAUTION_SHORT,
    };
  }
  const {spec: _s, ...geometry} = g;
  return {designation: spec.designation, spec, geometry, ...measured, units: {length: 'mm', area: 'mm²'}, caution: CAUTION_SHORT};
}

export const command: Command = {
  name: 'threads',
  summary: 'geometry and limits of size of a thread designation',
  help: HELP,
  async run(args: string[], io: CliIo): Promise<number> {
    const {values, positionals} = parseOptions(args, {
      json: {type: 'boolean'},
      format: {type: 'string'},
      ascii: {type: 'boolean'},
      units: {type: 'string'},
      'over-wires': {type: 'string'},
      wire: {type: 'string'},
    });
    const units: UnitSystem = unitsOption(values);
    const format = formatOption(values, ['text', 'json'] as const, 'text');
    const text = positionals.join(' ').trim();
    if (text === '') {
      throw new UsageError(`threads needs a designation, e.g. tapwright threads M10x1.5-6H/6g (accepted forms: ${ACCEPTED_FORMS})`);
    }
    const parsed = parseThread(text);
    if (!parsed.ok) {
      const near = parsed.suggestions?.length ? `\n  nearest valid designations: ${parsed.suggestions.join(', ')}` : '';
      throw new UsageError(`threads: ${parsed.error}${near}`, 'designation');
    }
    const spec = parsed.value;
    const g = spec.family === 'metric' || spec.family === 'unified' ? threadGeometry(spec) : undefined;
    const wires = parseWireOptions(str(values, 'over-wires'), str(values, 'wire'), spec, g, units);
    if (format === 'json') {
      io.out(`${JSON.stringify(jsonOf(spec, g, wires), null, 2)}\n`);
      return EXIT.ok;
    }
    const lines = g ? geometryText(g, units) : powerText(spec, units);
    if (wires) lines.push(...wireLines(wires, units));
    lines.push('', ...wrapText(CAUTION_SHORT, '', ''));
    const report = `${lines.join('\n')}\n`;
    io.out(values.ascii === true ? toAscii(report) : report);
    return EXIT.ok;
  },
};
