/**
 * The joint: every input of `check` (and of the workbench's joint screen), in
 * working units (mm, N, N·m, MPa). This zod schema is the single source of truth
 * for the CLI options, the workbench fields and the preset store.
 */
import * as z from 'zod';
import {DUTY_IDS} from '../duty.js';
import {MeasuredThreadSchema} from './measured-input.js';
import {safeText} from '../text-safety.js';
import {ServiceInputSchema} from '../service/input.js';
import {WindowInputSchema} from './window-options.js';

/** A friction coefficient given as one value (min = max) or a min..max range. */
export const FrictionRangeSchema = z
  .object({
    min: z.number().min(0.02).max(0.6),
    max: z.number().min(0.02).max(0.6),
  })
  .refine(r => r.min <= r.max, {message: 'min must not exceed max'});

/**
 * A parent material of the user's own (kept in the preset store), attached to the
 * input by the CLI or the workbench when `parent` names it. Strengths in MPa.
 */
export const UserParentMaterialSchema = z
  .object({
    id: z.string().trim().min(1).max(40).regex(/^[A-Za-z0-9][A-Za-z0-9._+-]*$/, 'letters, digits and . _ + - only'),
    name: safeText(z.string().trim().min(1).max(80)),
    group: z.enum(['steel', 'cast-iron', 'aluminium', 'copper-alloy', 'magnesium', 'other']).default('other'),
    rm: z.number().min(20).max(2500),
    yield: z.number().min(10).max(2500),
    shear: z.number().min(10).max(1500),
    elasticModulus: z.number().min(1000).max(500000),
    /** Where the numbers come from, e.g. "material certificate 3.1 no. 12345". */
    source: safeText(z.string().trim().min(1).max(300)),
  })
  .refine(m => m.yield <= m.rm, {message: 'yield must not exceed rm', path: ['yield']});

export type UserParentMaterial = z.output<typeof UserParentMaterialSchema>;

export const JointInputSchema = z.object({
  /** Thread designation as typed, e.g. "M10x1.5-6H/6g", "1/4-20 UNC-2A". */
  thread: safeText(z.string().trim().min(1).max(60)),
  /** Bolt grade id from the material library (e.g. "8.8", "10.9", "A2-70", "SAE-5"). */
  boltGrade: safeText(z.string().min(1).max(40)).default('8.8'),
  /** Custom bolt tensile strength Rm, MPa; overrides the grade's value. */
  boltRm: z.number().min(100).max(2500).optional(),
  /** Custom bolt yield (Rp0.2), MPa; overrides the grade's value. */
  boltRp: z.number().min(50).max(2400).optional(),
  /** What carries the internal thread. */
  internal: z.enum(['tapped', 'nut']).default('tapped'),
  /** Parent material id for a tapped hole. */
  parent: safeText(z.string().min(1).max(40)).optional(),
  /** The user's own material named by `parent`, attached from the store (not a CLI option). */
  parentData: UserParentMaterialSchema.optional(),
  /** Custom parent tensile strength, MPa. */
  parentRm: z.number().min(20).max(2500).optional(),
  /** Custom parent shear strength, MPa. */
  parentShear: z.number().min(10).max(1500).optional(),
  /** Nut property class (ISO 898-2, e.g. "8", "10"; or a SAE J995 grade). */
  nutClass: safeText(z.string().min(1).max(20)).optional(),
  /** Inch nut style for the standard dimensions (ASME B18.2.2): hex (default) or heavy hex. Metric nuts are ISO 4032. */
  nutStyle: z.enum(['hex', 'heavy-hex']).optional(),
  /** Nut height m, mm. */
  nutHeight: z.number().min(0.5).max(500).optional(),
  /** Nut width across flats s, mm. */
  nutFlats: z.number().min(1).max(1000).optional(),
  /** Engaged length from the loaded face, mm (includes the countersink or chamfer). */
  engagement: z.number().min(0.5).max(1000),
  /** Axial length lost to the countersink or chamfer at the loaded face, mm. */
  chamfer: z.number().min(0).max(100).default(0),
  /** Drilled-and-tapped depth of a blind hole, mm; absent for a through hole or a nut. */
  holeDepth: z.number().min(0.5).max(2000).optional(),
  /** How the joint is tightened. */
  tightening: z.enum(['torque', 'preload', 'utilisation']).default('utilisation'),
  /** Tightening torque, N·m (tightening = torque). */
  torque: z.number().min(0.01).max(100000).optional(),
  /** Target preload, N (tightening = preload). */
  preload: z.number().min(1).max(1e8).optional(),
  /** Target von Mises utilisation of Rp0.2 during tightening (tightening = utilisation). */
  utilisation: z.number().min(0.1).max(1).default(0.9),
  /** Thread friction coefficient muG (ISO 16047 / VDI 2230). */
  muThread: FrictionRangeSchema.default({min: 0.1, max: 0.16}),
  /** Under-head friction coefficient muK. */
  muHead: FrictionRangeSchema.default({min: 0.1, max: 0.16}),
  /** Nut factor K of T = K F d, used instead of the friction coefficients when given. */
  nutFactor: z.number().min(0.05).max(0.5).optional(),
  /** Effective bearing diameter under the head DKm, mm; default from ISO 4014/4017 dw,min and ISO 273 medium hole. */
  bearingDiameter: z.number().min(1).max(2000).optional(),
  /** External axial service load on the bolt, N. */
  serviceLoad: z.number().min(0).max(1e8).default(0),
  /**
   * Tightening factor alphaA = FM,max / FM,min in total (VDI 2230 Part 1; it includes the friction
   * scatter): only the part beyond the friction range's own spread is added (1 = friction range only).
   */
  scatter: z.number().min(1).max(4).default(1),
  /** Required stripping margin on bolt break (1.0 = the bolt must break first). */
  requiredMargin: z.number().min(0.5).max(5).default(1),
  /** What the joint is for: general, or lifting / pressure / safety-critical (stricter flags, sign-off required). */
  duty: z.enum(DUTY_IDS).default('general'),
  /** What was measured on the bolt and the hole (mm); stripping uses these where given (src/core/joint/measured.ts). */
  measured: MeasuredThreadSchema.optional(),
  /** The joint in service (src/core/service): clamped parts, a cycling load, embedding, temperature, slip. */
  service: ServiceInputSchema.optional(),
  /** Tightening-window inputs: lubricant pick, locking element, prevailing torque, least clamp load, wrench accuracy (src/core/joint/window-options.ts). */
  window: WindowInputSchema.optional(),
});

export type JointInput = z.output<typeof JointInputSchema>;
export type JointInputDraft = z.input<typeof JointInputSchema>;
