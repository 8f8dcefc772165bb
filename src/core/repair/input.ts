/**
 * Inputs of the repair planner beyond the joint itself (working units: mm).
 * Owned by the repair planner; the preset store embeds this schema.
 */
import {z} from 'zod';

export const RepairInputSchema = z.object({
  /** State of the tapped hole. */
  holeState: z.enum(['intact', 'stripped']).default('intact'),
  /** Stripped thread from the surface down to this depth; good thread remains below it, mm. */
  strippedDepth: z.number().min(0).max(2000).optional(),
  /** True when the hole goes through the part (a nut can be put on the far side). */
  through: z.boolean().default(false),
  /** Depth available to the bottom of a blind hole, or the through-thickness, mm. */
  depthAvailable: z.number().min(0.5).max(5000).optional(),
  /** Wall thickness or edge distance around the hole centre line, mm (limits oversize options). */
  wall: z.number().min(0.1).max(5000).optional(),
  /** Whether a longer screw may be used. */
  boltLengthMayChange: z.boolean().default(true),
  /** Required stripping margin on bolt break. */
  margin: z.number().min(0.5).max(5).default(1),
});

export type RepairInput = z.output<typeof RepairInputSchema>;
