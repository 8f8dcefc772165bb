/**
 * Power-screw thread designations (ThreadSpec only; geometry is in src/core/screw):
 * ISO trapezoidal "Tr24x5", "Tr40x14(P7)" (ISO 2903/2904), Acme "1-5 ACME-2G",
 * "1.5-0.25P-0.5L-ACME-2G" (ASME B1.5), and "square 32x4" (no standard series).
 */
import type {Parsed, ThreadSpec} from '../types.js';
import {ACME_CLASSES, ACME_SERIES, TRAPEZOIDAL_SERIES, TR_CLASSES_EXTERNAL, TR_CLASSES_INTERNAL} from './power-series.js';
import {trimNumber} from './designations.js';
import {IN, SIZE_RE, fail, inchSize, num} from './parse-common.js';

/** ISO 2904 trapezoidal "Tr<d>x<P>" or "Tr<d>x<lead>(P<P>)", mm; classes per ISO 2903, default 7H/7e. */
export function parseTrapezoidal(raw: string): Parsed<ThreadSpec> {
  const c = raw.replace(/\s+/g, '');
  const m = /^tr(\d+(?:[.,]\d+)?)x(\d+(?:[.,]\d+)?)(?:\(p(\d+(?:[.,]\d+)?)\))?(?:-(.*))?$/i.exec(c);
  if (!m) return fail(`trapezoidal designation "${raw}" is not understood; write Tr<diameter>x<pitch>, or Tr<diameter>x<lead>(P<pitch>) for a multi-start thread, e.g. Tr24x5, Tr40x14(P7)`, raw);
  const d = num(m[1] ?? '');
  const first = num(m[2] ?? '');
  const pitch = m[3] !== undefined ? num(m[3]) : first;
  const lead = first;
  if (!(d >= 8 && d <= 300)) return fail(`trapezoidal diameter ${trimNumber(d)} mm out of range; accepted: 8 to 300 mm`, raw);
  if (!(pitch >= 1.5 && pitch <= 44) || pitch > d / 2) return fail(`trapezoidal pitch ${trimNumber(pitch)} mm out of range; accepted: 1.5 to 44 mm and at most half the diameter`, raw);
  const starts = lead / pitch;
  if (!(Math.abs(starts - Math.round(starts)) < 1e-9) || Math.round(starts) < 1) {
    return fail(`trapezoidal lead ${trimNumber(lead)} mm is not a whole multiple of the pitch ${trimNumber(pitch)} mm; for Tr40x14(P7) the lead is 14 and the pitch 7 (2 starts)`, raw);
  }
  let ext = '7e';
  let int = '7H';
  let defaulted = true;
  if (m[4] !== undefined) {
    const parts = m[4].split('/');
    const help = `accepted: internal ${TR_CLASSES_INTERNAL.join(', ')}; external ${TR_CLASSES_EXTERNAL.join(', ')}; e.g. 7H/7e`;
    if (parts.length > 2) return fail(`trapezoidal class "${m[4]}" is not understood; ${help}`, raw);
    let gotExt = false;
    let gotInt = false;
    for (const p of parts) {
      const hit = (list: readonly string[]) => list.find(x => x.toLowerCase() === p.toLowerCase());
      const isInt = p === p.toUpperCase() || parts.length === 2 && p === parts[0];
      const i = hit(TR_CLASSES_INTERNAL);
      const e = hit(TR_CLASSES_EXTERNAL);
      if (i && (isInt || !e)) {
        int = i;
        gotInt = true;
      } else if (e) {
        ext = e;
        gotExt = true;
      } else return fail(`trapezoidal class "${p}" is not accepted; ${help}`, raw);
    }
    defaulted = !(gotExt && gotInt);
  }
  const row = TRAPEZOIDAL_SERIES.find(r => Math.abs(r.d - d) < 1e-9);
  const n = Math.round(starts);
  const sizeText = n > 1 ? `Tr${trimNumber(d)}x${trimNumber(lead)}(P${trimNumber(pitch)})` : `Tr${trimNumber(d)}x${trimNumber(pitch)}`;
  return {
    ok: true,
    value: {
      family: 'trapezoidal',
      designation: `${sizeText}-${int}/${ext}`,
      sizeLabel: `Tr${trimNumber(d)}`,
      nominal: d,
      pitch,
      isStandardPitch: !!row && row.pitches.some(p => Math.abs(p - pitch) < 1e-9),
      starts: n,
      lead,
      toleranceExternal: ext,
      toleranceInternal: int,
      toleranceDefaulted: defaulted,
    },
  };
}

const ACME_RE = new RegExp(String.raw`^${SIZE_RE}\s*-\s*(\d+(?:\.\d+)?)\s*-?\s*acme\s*(?:-\s*(.*))?$`, 'i');
const ACME_PL_RE = new RegExp(String.raw`^${SIZE_RE}\s*-\s*(\d*\.\d+)\s*p\s*-\s*(\d*\.\d+)\s*l\s*-?\s*acme\s*(?:-\s*(.*))?$`, 'i');

/** ASME B1.5 Acme "<size>-<tpi> ACME-<class>" or "<size>-<P>P-<L>L-ACME-<class>" (inches in, mm out); default 2G. */
export function parseAcme(raw: string): Parsed<ThreadSpec> {
  let sizeText: string;
  let pitchIn: number;
  let leadIn: number;
  let cls: string | undefined;
  const pl = ACME_PL_RE.exec(raw);
  const simple = pl ? null : ACME_RE.exec(raw);
  if (pl) {
    sizeText = pl[1] ?? '';
    pitchIn = Number(pl[2]);
    leadIn = Number(pl[3]);
    cls = pl[4];
  } else if (simple) {
    sizeText = simple[1] ?? '';
    const tpi = Number(simple[2]);
    if (!(tpi >= 1 && tpi <= 16)) return fail(`Acme threads per inch ${simple[2]} out of range; accepted: 1 to 16`, raw);
    pitchIn = 1 / tpi;
    leadIn = pitchIn;
    cls = simple[3];
  } else {
    return fail(`Acme designation "${raw}" is not understood; write <size>-<threads per inch> ACME-<class>, e.g. 1-5 ACME-2G, or 1.5-0.25P-0.5L-ACME-2G for multi-start`, raw);
  }
  const size = inchSize(sizeText);
  if (!size || !(size.inches >= 0.25 && size.inches <= 6)) return fail(`Acme size "${sizeText}" out of range; accepted: 1/4 to 6 in`, raw);
  const starts = leadIn / pitchIn;
  if (!(Math.abs(starts - Math.round(starts)) < 1e-6) || Math.round(starts) < 1) {
    return fail(`Acme lead ${leadIn} in is not a whole multiple of the pitch ${pitchIn} in`, raw);
  }
  let klass = '2G';
  if (cls !== undefined && cls.trim() !== '') {
    const hit = ACME_CLASSES.find(c => c.toLowerCase() === cls.trim().toLowerCase());
    if (!hit) return fail(`Acme class "${cls.trim()}" is not accepted; accepted: ${ACME_CLASSES.join(', ')}`, raw);
    klass = hit;
  }
  const row = ACME_SERIES.find(r => Math.abs(r.inches - size.inches) < 5e-4);
  const label = row?.label ?? size.label;
  const tpi = 1 / pitchIn;
  const n = Math.round(starts);
  const designation = n > 1
    ? `${label}-${trimNumber(pitchIn)}P-${trimNumber(leadIn)}L-ACME-${klass}`
    : `${label}-${trimNumber(tpi)} ACME-${klass}`;
  return {
    ok: true,
    value: {
      family: 'acme',
      designation,
      sizeLabel: label,
      nominal: size.inches * IN,
      pitch: pitchIn * IN,
      tpi,
      isStandardPitch: !!row && Math.abs(row.tpi - tpi) < 1e-6,
      starts: n,
      lead: leadIn * IN,
      toleranceExternal: klass,
      toleranceInternal: klass,
      toleranceDefaulted: cls === undefined || cls.trim() === '',
    },
  };
}

/** Square thread "square <d>x<P>" or "square <d>x<lead>(P<P>)", mm; no standard series, no class. */
export function parseSquare(raw: string): Parsed<ThreadSpec> {
  const m = /^(?:square|sq)\s*(\d+(?:[.,]\d+)?)\s*x\s*(\d+(?:[.,]\d+)?)\s*(?:\(\s*p\s*(\d+(?:[.,]\d+)?)\s*\))?$/i.exec(raw);
  if (!m) return fail(`square-thread designation "${raw}" is not understood; write square <diameter>x<pitch> in mm, e.g. square 32x4, or square 32x8(P4) for 2 starts`, raw, []);
  const d = num(m[1] ?? '');
  const first = num(m[2] ?? '');
  const pitch = m[3] !== undefined ? num(m[3]) : first;
  if (!(d >= 5 && d <= 300)) return fail(`square-thread diameter ${trimNumber(d)} mm out of range; accepted: 5 to 300 mm`, raw, []);
  if (!(pitch >= 1 && pitch <= d / 2)) return fail(`square-thread pitch ${trimNumber(pitch)} mm out of range; accepted: 1 mm to half the diameter`, raw, []);
  const starts = first / pitch;
  if (!(Math.abs(starts - Math.round(starts)) < 1e-9) || Math.round(starts) < 1) {
    return fail(`square-thread lead ${trimNumber(first)} mm is not a whole multiple of the pitch ${trimNumber(pitch)} mm`, raw, []);
  }
  const n = Math.round(starts);
  return {
    ok: true,
    value: {
      family: 'square',
      designation: n > 1 ? `square ${trimNumber(d)}x${trimNumber(first)}(P${trimNumber(pitch)})` : `square ${trimNumber(d)}x${trimNumber(pitch)}`,
      sizeLabel: `square ${trimNumber(d)}`,
      nominal: d,
      pitch,
      // No current published series for square threads: every pitch is a special one.
      isStandardPitch: false,
      starts: n,
      lead: first,
      toleranceExternal: '',
      toleranceInternal: '',
      toleranceDefaulted: true,
    },
  };
}
