/**
 * What the technician measured on the bolt and the tapped hole or nut (the `measured` key of
 * the joint input). Every value optional; lengths in mm. Where a diameter is given it replaces
 * the least-material limit of size in the stripping areas (src/core/joint/measured.ts).
 */
import * as z from 'zod';

/** A GO or NO-GO gauge outcome: the gauge entered (screwed on or in) or stopped. */
export const GaugeOutcomeSchema = z.enum(['enters', 'stops']);
export type GaugeOutcome = z.output<typeof GaugeOutcomeSchema>;

export const MeasuredThreadSchema = z
  .object({
    /** Bolt pitch diameter measured directly (thread micrometer with pitch-diameter anvils), mm. */
    boltPitchDiameter: z.number().min(0.5).max(2000).optional(),
    /** Bolt three-wire reading: measurement over the wires M and wire diameter W, mm. */
    overWires: z
      .object({
        measurement: z.number().min(0.5).max(2000),
        wire: z.number().min(0.02).max(100),
      })
      .optional(),
    /** Bolt major diameter by micrometer, mm. */
    boltMajorDiameter: z.number().min(0.5).max(2000).optional(),
    /** Hole (or nut) minor diameter by pin gauge or bore gauge, mm. */
    holeMinorDiameter: z.number().min(0.5).max(2000).optional(),
    /** Hole (or nut) pitch diameter by an internal thread-measuring instrument, mm. */
    holePitchDiameter: z.number().min(0.5).max(2000).optional(),
    /** Thread gauge outcomes: GO and NO-GO ring gauge on the bolt, GO and NO-GO plug gauge in the hole. */
    gauges: z
      .object({
        boltGo: GaugeOutcomeSchema.optional(),
        boltNoGo: GaugeOutcomeSchema.optional(),
        holeGo: GaugeOutcomeSchema.optional(),
        holeNoGo: GaugeOutcomeSchema.optional(),
      })
      .optional(),
  })
  .refine(m => !(m.boltPitchDiameter !== undefined && m.overWires !== undefined), {
    message: 'give the bolt pitch diameter or the three-wire reading, not both',
    path: ['overWires'],
  });

export type MeasuredThread = z.output<typeof MeasuredThreadSchema>;
