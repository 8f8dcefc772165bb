/**
 * Inputs of a power-screw check (working units: mm, N, m/s).
 * Owned by the power-screw work; the preset store embeds this schema.
 */
import {z} from 'zod';

export const ScrewInputSchema = z.object({
  /** "square 32x4", "Tr24x5", "Tr40x14(P7)", "1-5 ACME-2G". */
  thread: z.string().trim().min(1).max(60),
  /** Number of starts; a multi-start designation sets it too. */
  starts: z.number().int().min(1).max(8).default(1),
  /** Axial load, N. */
  load: z.number().min(0).max(1e8),
  /** Whether the loaded length of the screw is in compression or tension. */
  loadDirection: z.enum(['compression', 'tension']).default('compression'),
  /** Thread friction coefficient f. */
  muThread: z.number().min(0.01).max(0.6).default(0.15),
  /** Thrust-collar friction coefficient fc (0 with a rolling thrust bearing). */
  muCollar: z.number().min(0).max(0.6).default(0),
  /** Mean collar diameter dc, mm (0 = no collar friction). */
  collarDiameter: z.number().min(0).max(2000).default(0),
  /** Engaged nut length, mm. */
  nutLength: z.number().min(0.5).max(2000),
  /** Nut material id. */
  nutMaterial: z.string().min(1).max(40).default('bronze'),
  /** Screw material id (bolt grade or steel). */
  screwMaterial: z.string().min(1).max(40).optional(),
  /** Unsupported length of the screw in compression, mm (0 = no column check). */
  length: z.number().min(0).max(20000).default(0),
  /** End conditions for buckling. */
  ends: z.enum(['fixed-free', 'pinned-pinned', 'fixed-pinned', 'fixed-fixed']).default('pinned-pinned'),
  /** Sliding speed at the thread, m/s, for the allowable bearing pressure. */
  speed: z.number().min(0).max(10).optional(),
});

export type ScrewInput = z.output<typeof ScrewInputSchema>;
