/**
 * Inputs of the repair planner beyond the joint itself (working units: mm).
 * Owned by the repair planner; the preset store embeds this schema, so field
 * names are kept stable (adding is fine).
 *
 * The solid key-locked insert table is not part of this input (presets stay
 * small): pass the user's table to planRepairs, or the demo table is used.
 *
 * Depths are measured from the surface of the part that carries the thread (the
 * face the clamped part sits on), along the hole axis.
 */
import * as z from 'zod';
import {safeText} from '../text-safety.js';

export const HOLE_STATES = ['intact', 'stripped'] as const;

export const RepairInputSchema = z
  .object({
    /** State of the tapped hole. */
    holeState: z.enum(HOLE_STATES).default('intact'),
    /**
     * Stripped thread from the surface down to this depth, mm; good thread remains
     * below it. Absent with holeState 'stripped' means the whole engaged length is gone.
     */
    strippedDepth: z.number().min(0).max(2000).optional(),
    /** True when the hole goes through the part (a nut can be put on the far side). */
    through: z.boolean().default(false),
    /** Depth available to the bottom of a blind hole, or the through-thickness, mm. */
    depthAvailable: z.number().min(0.5).max(5000).optional(),
    /**
     * Edge distance: from the hole's centre line to the nearest free surface,
     * neighbouring hole or cavity, mm. Options that would leave too thin a ligament
     * are infeasible.
     */
    wall: z.number().min(0.1).max(5000).optional(),
    /** Whether a longer screw may be used. */
    boltLengthMayChange: z.boolean().default(true),
    /**
     * Required margin on bolt break (weaker thread's stripping force / bolt break
     * force) and on stripping at the largest preload. Absent: the joint's requiredMargin.
     */
    margin: z.number().min(0.5).max(5).optional(),
    /** Nut property class for the through-bolt option (ISO 898-2 or SAE J995); absent: matched to the bolt grade. */
    nutClass: safeText(z.string().min(1).max(20)).optional(),
    /** Nut height for the through-bolt option, mm; absent: the regular nut of the size. */
    nutHeight: z.number().min(0.5).max(500).optional(),
    /** Nut width across flats for the through-bolt option, mm. */
    nutFlats: z.number().min(1).max(1000).optional(),
  })
  .superRefine((r, ctx) => {
    if (r.holeState === 'intact' && r.strippedDepth !== undefined && r.strippedDepth > 0) {
      ctx.addIssue({
        code: 'custom',
        path: ['strippedDepth'],
        message: 'a stripped depth was given but holeState is "intact"; set holeState to "stripped"',
      });
    }
    if (r.strippedDepth !== undefined && r.depthAvailable !== undefined && r.strippedDepth > r.depthAvailable) {
      ctx.addIssue({
        code: 'custom',
        path: ['strippedDepth'],
        message: `stripped depth ${r.strippedDepth} mm is deeper than the depth available (${r.depthAvailable} mm)`,
      });
    }
  });

export type RepairInput = z.output<typeof RepairInputSchema>;
export type RepairInputDraft = z.input<typeof RepairInputSchema>;
