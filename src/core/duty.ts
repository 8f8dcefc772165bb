/**
 * The duty of a joint: general, or one whose failure can hurt someone (lifting
 * equipment, a pressure boundary, another safety-critical joint). A duty other
 * than general does two things to a check's flags:
 *  - margins that are only WATCH for general duty become FAIL, with the reason;
 *  - a `qualified-sign-off` flag says that a qualified person must sign the result.
 *
 * tapwright does not know the design factor the governing standard of the
 * equipment asks for (it differs by standard, equipment class and load case):
 * that factor is the user's to set as the required margin (`--margin`). The
 * factors named in DUTY_NOTES are pointers, from memory, not applied.
 */
import type {Flag} from './types.js';

export const DUTY_IDS = ['general', 'lifting', 'pressure', 'critical'] as const;
export type Duty = (typeof DUTY_IDS)[number];

/** The duty in a few words, for screens and reports. */
export const DUTY_WORDS: Record<Duty, string> = {
  general: 'general duty',
  lifting: 'lifting equipment',
  pressure: 'pressure boundary',
  critical: 'safety-critical joint',
};

/**
 * What the user must settle for a duty: the design factor comes from the standard
 * that governs the equipment. Values named here are from memory, for orientation only.
 */
export const DUTY_NOTES: Record<Duty, string> = {
  general: '',
  lifting:
    'Lifting equipment: the design factor comes from the standard for the device (for below-the-hook lifting devices ASME BTH-1 design categories, from memory: 2.0 and 3.0 on static strength); set it as the required margin.',
  pressure:
    'Pressure boundary: bolt loads, stresses and gasket seating follow the pressure-equipment code in force (for example ASME BPVC Section VIII or EN 1591-1); this check does not replace it. Set the code\'s factor as the required margin.',
  critical: 'Safety-critical joint: the design factor is the one your engineering standard sets for this joint; set it as the required margin.',
};

/**
 * Flags that are WATCH for general duty and FAIL for any other duty: each is a
 * margin or a limit that is met only just. Codes of the joint check and of the power screw.
 */
export const RAISED_ON_DUTY: ReadonlySet<string> = new Set([
  // threaded joint
  'strips-before-break',
  'engagement-below-required',
  'preload-over-yield',
  'blind-hole-too-shallow',
  'outside-model-range',
  // power screw
  'strips',
  'buckling',
  'back-drives',
  'bearing-pressure-high',
]);

/** Info flags that become FAIL on lifting duty: a lifting screw that only just holds its load. */
const RAISED_ON_LIFTING: ReadonlySet<string> = new Set(['self-locking-marginal']);

/** The sign-off sentence for a duty, the same on every screen and report. */
export function signOffSentence(duty: Duty): string {
  return `Duty: ${DUTY_WORDS[duty]}. This result needs a qualified person's sign-off before the joint returns to service.`;
}

/** Raise the flags a duty makes stricter and add the sign-off flag. General duty: the flags unchanged. */
export function applyDuty(flags: readonly Flag[], duty: Duty): Flag[] {
  if (duty === 'general') return [...flags];
  const out: Flag[] = flags.map(f => {
    const raise = (f.level === 'watch' && RAISED_ON_DUTY.has(f.code)) || (duty === 'lifting' && f.level !== 'fail' && RAISED_ON_LIFTING.has(f.code));
    if (!raise) return f;
    const reason = `raised to FAIL: a ${f.level.toUpperCase()} margin is not accepted for ${DUTY_WORDS[duty]}`;
    return {...f, level: 'fail' as const, message: `${f.message} (${reason})`, ...(f.summary ? {summary: f.summary} : {})};
  });
  out.unshift({
    code: 'qualified-sign-off',
    level: 'watch',
    message: `${signOffSentence(duty)} ${DUTY_NOTES[duty]}`,
    summary: `${cap(DUTY_WORDS[duty])}: needs a qualified person's sign-off`,
  });
  return out;
}

function cap(s: string): string {
  return `${s.charAt(0).toUpperCase()}${s.slice(1)}`;
}
