/**
 * Service-state inputs (issue 16), in working units (mm, N, MPa, degrees C). All
 * optional: without `clamp` the service load is taken in full on the bolt, as the
 * joint check always did. This zod schema is the single source of truth for the
 * service fields of the CLI, the workbench and the preset store.
 */
import * as z from 'zod';

/** One clamped part, from under the head downward (a washer is a part). */
export const ClampPartSchema = z
  .object({
    /** Thickness, mm. */
    thickness: z.number().min(0.05).max(2000),
    /** Material id: a parent material of the library or a stiffness-table id (`steel`, `aluminium`, ...). */
    material: z.string().trim().min(1).max(40).optional(),
    /** Elastic modulus given directly, MPa (instead of a material id). */
    modulus: z.number().min(1000).max(500_000).optional(),
  })
  .refine(p => (p.material === undefined) !== (p.modulus === undefined), {message: 'give either a material id or a modulus'});

export type ClampPart = z.output<typeof ClampPartSchema>;

/** A service load: one value (static) or min..max (the load cycles between the two), N. */
export const ServiceLoadSchema = z.union([
  z.number().min(0).max(1e8),
  z
    .object({min: z.number().min(0).max(1e8), max: z.number().min(0).max(1e8)})
    .refine(r => r.min <= r.max, {message: 'min must not exceed max'}),
]);

export const ServiceInputSchema = z.object({
  /** Clamped parts, head side first; with a tapped hole the last one holds the thread. */
  clamp: z.array(ClampPartSchema).min(1).max(20).optional(),
  /** Bolt length under the head, mm. */
  boltLength: z.number().min(1).max(5000).optional(),
  /** Thread length of the bolt, mm. */
  threadLength: z.number().min(0.5).max(5000).optional(),
  /** External axial service load per bolt, N; absent: the joint input's static serviceLoad. */
  serviceLoad: ServiceLoadSchema.optional(),
  /** Embedding (settling) amount, mm, or 'auto' (VDI 2230 guide values); 0 switches it off. */
  embedding: z.union([z.number().min(0).max(1), z.literal('auto')]).default('auto'),
  /** Mean roughness Rz of the contact faces, micrometres (for embedding 'auto'). */
  roughness: z.number().min(1).max(160).default(16),
  /** Service temperature of bolt and parts, degrees C; absent: no thermal change. */
  serviceTemperature: z.number().min(-200).max(600).optional(),
  /** Assembly temperature, degrees C. */
  assemblyTemperature: z.number().min(-60).max(200).default(20),
  /** Transverse (shear) load per bolt, N. */
  transverseLoad: z.number().min(0).max(1e8).optional(),
  /** Static friction coefficient of the interface that carries the transverse load. */
  interfaceFriction: z.number().min(0.02).max(0.8).default(0.1),
  /** Preload as a fraction of the proof load As x Sp (0.75 reused joints, 0.9 permanent). */
  preloadProof: z.number().min(0.1).max(1).optional(),
});

export type ServiceInput = z.output<typeof ServiceInputSchema>;
export type ServiceInputDraft = z.input<typeof ServiceInputSchema>;
