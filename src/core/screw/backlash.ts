/**
 * Nut wear of a power screw from its measured axial backlash, and the backlash at which the
 * nut reaches a required stripping margin (a replace-by value). Lengths mm, forces N.
 *
 * Geometry (the profile, flank half-angle a: 0 square, 14.5 deg Acme, 15 deg trapezoidal):
 * - the growth of the axial play is the axial thickness lost by the threads; it is charged
 *   wholly to the nut (the softer part wears; the screw's own wear would lower the nut loss,
 *   so this is the conservative reading): axial wear = B - B0;
 * - a layer worn off a flank, measured normal to it, moves the flank axially by t / cos a:
 *   flank wear = (B - B0) cos a (profile geometry);
 * - a pitch-diameter allowance A between nut and screw gives a new-nut axial play of
 *   A tan a (Machinery's Handbook 31st ed., p. 2135: Acme thickness at the basic pitch line
 *   0.5P - 0.259 x allowance, 0.259 = tan 14.5 deg).
 * Stripping follows the nut model of nut.ts: the nut force falls linearly with the axial wear,
 * F_nut(w) = F_nut(0) (1 - w / (w_f P)), w_f = 0.5 + 0.5 tan a, so the wear allowed for a
 * required margin m at load F is w_max = w_f P (1 - m F / F_nut(0)), and the replace-by
 * backlash is B0 + w_max.
 */
import type {ScrewInput} from './input.js';
import type {ScrewResult} from './result.js';
import {checkScrew, ScrewInputError} from './index.js';
import {WATCH_MARGIN} from './flags.js';
import {applyDuty} from '../duty.js';
import type {Flag} from '../types.js';

/** A backlash that cannot be right; `field` is `backlash` or `backlashNew` (the CLI names its option). */
export class BacklashInputError extends Error {
  constructor(
    readonly field: 'backlash' | 'backlashNew',
    message: string,
  ) {
    super(message);
    this.name = 'BacklashInputError';
  }
}

const DEG = Math.PI / 180;

/** Axial and flank-normal nut wear from the measured and the new-nut backlash, mm (file header). */
export function nutWearFromBacklash(backlash: number, backlashNew: number, halfAngle: number): {axialWear: number; flankWear: number} {
  const axialWear = Math.max(0, backlash - backlashNew);
  return {axialWear, flankWear: axialWear * Math.cos(halfAngle * DEG)};
}

/** New-nut axial play from a pitch-diameter allowance, mm: A tan a (Machinery's Handbook 31st ed., p. 2135). */
export function playFromAllowance(allowance: number, halfAngle: number): number {
  return allowance * Math.tan(halfAngle * DEG);
}

export interface BacklashResult {
  /** Measured and new-nut axial backlash, mm. */
  backlash: number;
  backlashNew: number;
  /** Axial thickness the nut thread has lost (the screw's nutWear input), mm. */
  axialWear: number;
  /** The same as a layer normal to the flank, mm. */
  flankWear: number;
  /** The screw checked with that nut wear. */
  result: ScrewResult;
  /** Stripping margin left now: weaker of nut and screw threads / load. */
  margin: number;
  requiredMargin: number;
  /** Backlash at which the nut reaches the required margin, mm; null when the nut never met it or the screw thread governs below it. */
  replaceBy: number | null;
  /** True when the measured backlash is at or past the replace-by value (or no replace-by exists). */
  replaceNow: boolean;
  /** Plain words for a null replace-by. */
  reason?: string;
}

/**
 * The screw as worn: checkScrew with nutWear = B - B0, the margin left and the replace-by
 * backlash for `requiredMargin` (model in the file header). Throws BacklashInputError naming
 * `backlash` when the backlash is below the new-nut play or wears the nut thread through.
 */
export function screwBacklash(input: ScrewInput, backlash: number, backlashNew: number, requiredMargin = 1): BacklashResult {
  if (backlash < backlashNew) {
    throw new BacklashInputError('backlash', `backlash ${backlash} mm is below the new-nut play ${backlashNew} mm; measure again or give the new-nut play (--backlash-new)`);
  }
  const fresh = checkScrew({...input, nutWear: 0});
  const P = fresh.geometry.pitch;
  const wf = 0.5 + 0.5 * Math.tan(fresh.geometry.flankAngle * DEG);
  const {axialWear, flankWear} = nutWearFromBacklash(backlash, backlashNew, fresh.geometry.flankAngle);
  if (axialWear >= wf * P) {
    throw new BacklashInputError('backlash', `backlash ${backlash} mm means ${axialWear.toFixed(3)} mm of nut thread worn away, the whole thread thickness (${(wf * P).toFixed(3)} mm): the nut has no thread left; accepted: below ${(backlashNew + wf * P).toFixed(3)} mm`);
  }
  const result = checkScrew({...input, nutWear: axialWear});
  // The load as computed (a given torque may have solved for it).
  const F = result.input.load;
  const strip = result.nut.stripping;
  const margin = F > 0 ? Math.min(strip.nutForce, strip.screwForce) / F : Infinity;
  const nut0 = fresh.nut.stripping.nutForce;
  let replaceBy: number | null = null;
  let reason: string | undefined;
  if (F <= 0) reason = 'no load given: every backlash keeps the margin';
  else if (fresh.nut.stripping.screwForce < requiredMargin * F) reason = 'the screw thread is below the required margin even with a new nut: the nut wear does not decide';
  else if (nut0 < requiredMargin * F) reason = 'a new nut is already below the required margin';
  else replaceBy = backlashNew + wf * P * (1 - (requiredMargin * F) / nut0);
  return {
    backlash,
    backlashNew,
    axialWear,
    flankWear,
    result,
    margin,
    requiredMargin,
    replaceBy,
    replaceNow: replaceBy === null ? F > 0 : backlash >= replaceBy - 1e-12,
    ...(reason !== undefined ? {reason} : {}),
  };
}

/**
 * The screw as measured: checkScrew with the nut wear from `backlash` and `backlashNew`
 * (screwBacklash, model in the file header), the result carrying `backlash`, a note that the
 * wear came from the backlash, and a flag when the replace-by value is reached. The required
 * margin defaults to 2, the stripping watch band of the flags (common practice, no source).
 * Throws ScrewInputError naming `backlash`, `backlashNew` or `nutWear` for inputs that do not go together.
 */
export function wornScrew(input: ScrewInput): ScrewResult {
  const {backlash, backlashNew, backlashMargin, ...plain} = input;
  if (backlash === undefined) throw new ScrewInputError('backlash', 'is needed with the new-nut backlash: give the measured axial backlash too');
  if (backlashNew === undefined) {
    throw new ScrewInputError('backlashNew', 'is needed with the measured backlash: the axial backlash of a new nut (0 if not known: then all the play counts as wear, the safe reading)');
  }
  if (input.nutWear > 0) {
    throw new ScrewInputError('nutWear', `nut wear ${input.nutWear} mm and a measured backlash both given: the wear is worked out from the backlash; leave the nut wear empty`);
  }
  const required = backlashMargin ?? WATCH_MARGIN.stripping;
  const b = screwBacklash(plain, backlash, backlashNew, required);
  const r = b.result;
  const mm = (x: number) => `${x.toFixed(3)} mm`;
  const extra: Flag[] = [];
  if (b.replaceNow && b.replaceBy !== null) {
    extra.push({code: 'nut-replace', level: 'watch', message: `backlash ${mm(backlash)} is at or past the replace-by backlash ${mm(b.replaceBy)}: the nut keeps less than ${required} times the load against stripping; replace the nut`, summary: `Backlash ${mm(backlash)} past replace-by ${mm(b.replaceBy)}: replace the nut`});
  }
  return {
    ...r,
    backlash: {
      measured: backlash, new: backlashNew, axialWear: b.axialWear, flankWear: b.flankWear,
      marginLeft: b.margin, requiredMargin: required, replaceBy: b.replaceBy, replaceNow: b.replaceNow,
      ...(b.reason !== undefined ? {reason: b.reason} : {}),
    },
    flags: [...r.flags, ...applyDuty(extra, input.duty)],
    notes: [
      ...r.notes,
      `nut wear ${mm(b.axialWear)} worked out from the measured backlash ${mm(backlash)} less the new-nut backlash ${mm(backlashNew)} (all charged to the nut: the conservative reading); replace-by backlash for a stripping margin of ${required}${backlashMargin === undefined ? ' (default: the watch band of the flags, common practice, no source)' : ''}`,
    ],
  };
}
