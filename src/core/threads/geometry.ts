/**
 * Basic geometry and limits of size of fastener threads (ISO metric, unified).
 *
 * Basic profile, ISO 68-1 / ISO 724 and ASME B1.1 (same 60° profile), mm:
 *   H = 0.866025P, d2 = D2 = d - 0.649519P, D1 = d - 1.082532P,
 *   d3 = d - 1.226869P (ISO, rounded root H/6) or d - 1.299038P (unified, dr used for At).
 * Stress area: ISO 898-1 As = (π/4)((d2 + d3)/2)²;
 *   ASME B1.1 At = 0.7854 (D - 0.9743/n)² (here in mm: 0.7854 (D - 0.9743P)²).
 */
import type {ThreadGeometry, ThreadSpec} from '../types.js';
import {metricLimits} from './metric-limits.js';
import {unifiedLimits} from './unified-limits.js';
import {parseMetricClass, parseUnifiedClass} from './tolerance-class.js';
import {unifiedSideProvenance} from './limits-provenance.js';

const IN = 25.4;

/** Basic profile dimensions, mm. `family` picks the external minor diameter rule. */
export function basicProfile(d: number, P: number, family: 'metric' | 'unified') {
  const H = (Math.sqrt(3) / 2) * P;
  const d2 = d - 0.75 * H;
  const D1 = d - 1.25 * H;
  const d3 = family === 'metric' ? d - (17 / 12) * H : d - 1.5 * H;
  return {H, d2, D1, d3};
}

function must<T>(p: {ok: true; value: T} | {ok: false; error: string}): T {
  if (!p.ok) throw new Error(p.error);
  return p.value;
}

/**
 * Full geometry (mm, mm²) and limits of size of a metric or unified thread pair.
 * Throws an Error with a plain message for power-screw threads, whose geometry
 * belongs to src/core/screw.
 */
export function threadGeometry(spec: ThreadSpec): ThreadGeometry {
  if (spec.family !== 'metric' && spec.family !== 'unified') {
    throw new Error(
      `threadGeometry covers ISO metric and unified fastener threads; ${spec.designation} is a ${spec.family} power-screw thread (see tapwright screw)`,
    );
  }
  const d = spec.nominal;
  const P = spec.pitch;
  const {H, d2, D1, d3} = basicProfile(d, P, spec.family);
  const notes: string[] = [];
  if (!spec.isStandardPitch) {
    notes.push(
      spec.family === 'metric'
        ? `Special thread: pitch ${P} mm is not in the ISO 261 series for M${d}.`
        : `Special thread: ${spec.tpi ?? ''} threads per inch is not in the UNC, UNF or UNEF series for ${spec.sizeLabel} in (ASME B1.1 UN special).`,
    );
  }
  // The basic profile values both families share.
  const basic = (stressArea: number) => ({
    spec,
    nominal: d,
    pitch: P,
    fundamentalHeight: H,
    pitchDiameter: d2,
    minorDiameterExternal: d3,
    minorDiameterInternal: D1,
    stressArea,
    minorArea: (Math.PI / 4) * d3 * d3,
  });
  if (spec.family === 'metric') {
    const stressArea = (Math.PI / 4) * ((d2 + d3) / 2) ** 2;
    const ext = must(parseMetricClass(spec.toleranceExternal, 'external'));
    const int = must(parseMetricClass(spec.toleranceInternal, 'internal'));
    const lim = metricLimits(d, P, ext, int);
    return {...basic(stressArea), limits: {external: lim.external, internal: lim.internal}, limitsProvenance: lim.provenance, notes: [...notes, ...lim.notes]};
  }
  const stressArea = 0.7854 * (d - 0.9743 * P) ** 2;
  const ext = must(parseUnifiedClass(spec.toleranceExternal));
  const int = must(parseUnifiedClass(spec.toleranceInternal));
  const tpi = spec.tpi ?? IN / P;
  const lim = unifiedLimits(d / IN, tpi, ext, int);
  const fromTable = lim.source.external === 'table' && lim.source.internal === 'table';
  const computed = [
    ...(lim.source.external === 'formula' ? [ext] : []),
    ...(lim.source.internal === 'formula' ? [int] : []),
  ];
  if (computed.some(c => c.grade !== 2)) {
    notes.push(
      'Class 1A/3A/1B/3B tolerance factors (1.5, 0.75, 1.95, 0.975 x the 2A pitch-diameter tolerance) and the 3B minor-diameter rule are from memory of ASME B1.1: verify against the standard.',
    );
  }
  if (fromTable) {
    notes.push(`Limits of size ${ext.text}/${int.text} read from the ASME B1.1 standard series limits table.`);
  } else if (computed.length === 2) {
    notes.push(
      'Limits of size computed from the ASME B1.1 tolerance formulas with the tables\' rounding to 0.0001 in (0.001 in for the 2B minor diameter); not read from the ASME B1.1 tables, so a value may differ by a few 0.0001 in (0.0002 in at 2-1/2-4 UNC against the table as reprinted in Machinery\'s Handbook, 27th ed.).',
    );
  } else {
    const t = lim.source.external === 'table' ? ext : int;
    const c = lim.source.external === 'table' ? int : ext;
    notes.push(
      `Class ${t.text} limits read from the ASME B1.1 standard series limits table; class ${c.text} computed from the ASME B1.1 tolerance formulas (not read from the tables, so a value may differ by a few 0.0001 in).`,
    );
  }
  return {
    ...basic(stressArea),
    limits: {
      external: {...lim.external, ...unifiedSideProvenance(ext, lim.source.external)},
      internal: {...lim.internal, ...unifiedSideProvenance(int, lim.source.internal)},
    },
    limitsProvenance: fromTable
      ? {source: 'ASME B1.1 standard series limits table', kind: 'standard', method: 'table'}
      : computed.length === 2
        ? {source: 'ASME B1.1 tolerance formulas (recalled), rounded as in the ASME B1.1 tables', kind: 'formula', method: 'formula'}
        : {
            source: 'ASME B1.1 standard series limits table for one side, ASME B1.1 tolerance formulas (recalled) for the other',
            kind: 'formula',
            method: 'formula',
          },
    notes,
  };
}
