/**
 * Inputs of a power-screw check (working units: mm, N, m/s, MPa).
 * Owned by the power-screw work; the preset store embeds this schema.
 */
import * as z from 'zod';
import {DUTY_IDS} from '../duty.js';
import {safeText} from '../text-safety.js';

/** Thread friction: one value, or a min..max range (raise torque at max, lowering and self-locking at min). */
export const ScrewFrictionSchema = z.union([
  z.number().min(0.01).max(0.6),
  z
    .object({min: z.number().min(0.01).max(0.6), max: z.number().min(0.01).max(0.6)})
    .refine(r => r.min <= r.max, {message: 'min must not exceed max'}),
]);

export const END_CONDITION_IDS = ['fixed-free', 'pinned-pinned', 'fixed-pinned', 'fixed-fixed'] as const;

export const ScrewInputSchema = z.object({
  /** "square 32x4", "Tr24x5", "Tr40x14(P7)", "1-5 ACME-2G". */
  thread: safeText(z.string().trim().min(1).max(60)),
  /** Number of starts; a multi-start designation sets it too. */
  starts: z.number().int().min(1).max(8).default(1),
  /** Axial load, N. */
  load: z.number().min(0).max(1e8),
  /** Whether the loaded length of the screw is in compression or tension. */
  loadDirection: z.enum(['compression', 'tension']).default('compression'),
  /** Thread friction coefficient f (value or min..max range). */
  muThread: ScrewFrictionSchema.default(0.15),
  /** Thrust-collar friction coefficient fc (0 with a rolling thrust bearing). */
  muCollar: z.number().min(0).max(0.6).default(0),
  /** Mean collar diameter dc, mm (0 = no collar friction). */
  collarDiameter: z.number().min(0).max(2000).default(0),
  /** Engaged nut length, mm. */
  nutLength: z.number().min(0.5).max(2000),
  /** Nut material id (bronze, cast-iron, steel, brass, plastic, or a material-library id). */
  nutMaterial: safeText(z.string().min(1).max(40)).default('bronze'),
  /** Loss of nut-thread thickness by wear, mm (0 for a new nut). */
  nutWear: z.number().min(0).max(50).default(0),
  /** Screw material id (steel, alloy-steel, or a steel id of the material library). */
  screwMaterial: safeText(z.string().min(1).max(40)).optional(),
  /** Custom screw yield strength, MPa; overrides the material's value. */
  screwYield: z.number().min(50).max(2500).optional(),
  /** Unsupported length of the screw in compression, mm (0 = no column check). */
  length: z.number().min(0).max(20000).default(0),
  /** End conditions for buckling. */
  ends: z.enum(END_CONDITION_IDS).default('pinned-pinned'),
  /** Sliding speed at the thread mean diameter, m/s, for the allowable bearing pressure (0 = hand-operated, slow). */
  speed: z.number().min(0).max(10).optional(),
  /**
   * Known raising torque at the screw (thread + collar), N·m, e.g. a motor or handwheel torque.
   * With it, `torqueSolves` says what is found: the load it raises ('load', replacing `load`) or
   * the thread friction it implies at `load` ('friction', replacing `muThread`).
   */
  torque: z.number().min(0.001).max(1e6).optional(),
  /** What a given `torque` solves for (default: the load). */
  torqueSolves: z.enum(['load', 'friction']).default('load'),
  /** Allowable nut bearing pressure, MPa; overrides the table. */
  allowablePressure: z.number().min(0.1).max(500).optional(),
  /**
   * Measured axial backlash (play) between screw and nut, mm. With `backlashNew` it gives the nut
   * wear (src/core/screw/backlash.ts), which then takes the place of `nutWear`.
   */
  backlash: z.number().min(0).max(50).optional(),
  /** Axial backlash of the nut when new (or from the class allowance), mm. */
  backlashNew: z.number().min(0).max(50).optional(),
  /** Stripping margin the worn nut must keep, for the replace-by backlash (default 2: the watch band of the flags). */
  backlashMargin: z.number().min(1).max(20).optional(),
  /** What the screw is for: general, or lifting / pressure / safety-critical (stricter flags, sign-off required). */
  duty: z.enum(DUTY_IDS).default('general'),
});

export type ScrewInput = z.output<typeof ScrewInputSchema>;
/** What a caller may pass before defaults are applied. */
export type ScrewInputDraft = z.input<typeof ScrewInputSchema>;
