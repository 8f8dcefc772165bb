/**
 * zod schemas for the material library. The data files are parsed through
 * these at module load, so an entry without provenance, with a yield above its
 * tensile strength, or with an out-of-range number stops the program at start
 * instead of reaching a calculation. Units: MPa for strengths and moduli, mm
 * for sizes.
 */
import * as z from 'zod';

/** The one wording for a recalled material value (DEVELOPERS.md, "How to add things"). */
export const MEMORY_WORDING = 'typical value, from memory: verify against the material certificate';

export const ProvenanceSchema = z
  .object({
    source: z.string().trim().min(3),
    kind: z.enum(['standard', 'book', 'formula', 'memory', 'demo', 'user']),
  })
  .refine(p => p.kind !== 'memory' || p.source.includes('from memory'), {
    message: "a provenance of kind 'memory' must say 'from memory' in its source",
  });

const id = z.string().regex(/^[A-Za-z0-9][A-Za-z0-9.\-]*$/, 'ids use letters, digits, "." and "-"');
const stress = z.number().finite().positive().max(3000);
const modulus = z.number().finite().min(20_000).max(250_000);
const ratio = z.number().finite().min(0.4).max(1.2);
const size = z.number().finite().positive().max(200);

function sizeOrder(e: {sizeMinMm?: number | undefined; sizeMaxMm?: number | undefined}): boolean {
  return e.sizeMinMm === undefined || e.sizeMaxMm === undefined || e.sizeMinMm < e.sizeMaxMm;
}

export const BoltGradeSchema = z
  .object({
    id,
    name: z.string().min(3),
    standard: z.string().min(3),
    rmMin: stress,
    rpMin: stress,
    proofStress: stress.optional(),
    shearRatio: ratio,
    elasticModulus: modulus,
    sizeMinMm: size.optional(),
    sizeMaxMm: size.optional(),
    provenance: ProvenanceSchema,
    shearRatioProvenance: ProvenanceSchema,
    elasticModulusProvenance: ProvenanceSchema,
    note: z.string().optional(),
  })
  .strict()
  .refine(g => g.rpMin < g.rmMin, {message: 'rpMin must be below rmMin'})
  .refine(g => g.proofStress === undefined || g.proofStress <= g.rpMin, {message: 'proofStress must not exceed rpMin'})
  .refine(sizeOrder, {message: 'sizeMinMm must be below sizeMaxMm'});

export const ParentMaterialSchema = z
  .object({
    id,
    name: z.string().min(3),
    group: z.enum(['steel', 'cast-iron', 'aluminium', 'copper-alloy', 'magnesium', 'other']),
    rm: stress,
    yield: stress,
    shear: stress,
    shearRatio: ratio,
    elasticModulus: modulus,
    /** Provenance of rm (and of yield unless yieldProvenance is given). */
    provenance: ProvenanceSchema,
    /** Provenance of the yield value where it differs from that of rm. */
    yieldProvenance: ProvenanceSchema.optional(),
    shearRatioProvenance: ProvenanceSchema,
    elasticModulusProvenance: ProvenanceSchema,
    note: z.string().optional(),
  })
  .strict()
  .refine(m => m.yield <= m.rm, {message: 'yield must not exceed rm'})
  .refine(m => Math.abs(m.shear - m.shearRatio * m.rm) <= 0.5, {message: 'shear must equal shearRatio x rm (to 0.5 MPa)'});

export const NutClassSchema = z
  .object({
    id,
    name: z.string().min(3),
    standard: z.string().min(3),
    rm: stress,
    shearRatio: ratio,
    sizeMinMm: size.optional(),
    sizeMaxMm: size.optional(),
    provenance: ProvenanceSchema,
    shearRatioProvenance: ProvenanceSchema,
    note: z.string().optional(),
  })
  .strict()
  .refine(sizeOrder, {message: 'sizeMinMm must be below sizeMaxMm'});

export const HexHeadRowSchema = z
  .object({
    /** Nominal diameter, mm. */
    d: size,
    /** Minimum bearing-face diameter dw,min of the hexagon head, mm. */
    dwMin: size,
    /** Clearance hole, medium series, mm. */
    clearanceHole: size,
    provenance: ProvenanceSchema,
  })
  .strict()
  .refine(r => r.clearanceHole > r.d && r.dwMin > r.clearanceHole, {message: 'need d < clearance hole < dw,min'});

/** Inch hex cap screw head and clearance hole, in inches as the tables print them. */
export const InchHexHeadRowSchema = z
  .object({
    /** Size as written in the trade, e.g. "1/2". */
    size: z.string().min(1),
    /** Nominal diameter, in. */
    dIn: size,
    /** Width across flats F, max and min, in. */
    flatsMaxIn: size,
    flatsMinIn: size,
    /** Clearance hole, normal fit, in. */
    clearanceHoleIn: size,
    provenance: ProvenanceSchema,
  })
  .strict()
  .refine(r => r.clearanceHoleIn > r.dIn && r.flatsMinIn > r.clearanceHoleIn && r.flatsMinIn < r.flatsMaxIn, {
    message: 'need d < clearance hole < flats min < flats max',
  });

export const NutDimensionRowSchema = z
  .object({
    d: size,
    heightMin: size,
    heightMax: size,
    flats: size,
    provenance: ProvenanceSchema,
  })
  .strict()
  .refine(r => r.heightMin < r.heightMax && r.flats > r.d, {message: 'need heightMin < heightMax and flats > d'});

export type BoltGrade = z.output<typeof BoltGradeSchema>;
export type ParentMaterial = z.output<typeof ParentMaterialSchema>;
export type NutClass = z.output<typeof NutClassSchema>;
export type HexHeadRow = z.output<typeof HexHeadRowSchema>;
export type NutDimensionRow = z.output<typeof NutDimensionRowSchema>;
export type InchHexHeadRow = z.output<typeof InchHexHeadRowSchema>;

/** Rows of one id must not overlap in size; a row's range is sizeMinMm (exclusive) to sizeMaxMm (inclusive). */
function noOverlap<T extends {id: string; sizeMinMm?: number | undefined; sizeMaxMm?: number | undefined}>(rows: T[], ctx: z.RefinementCtx): void {
  const byId = new Map<string, T[]>();
  for (const r of rows) byId.set(r.id, [...(byId.get(r.id) ?? []), r]);
  for (const [key, list] of byId) {
    const sorted = [...list].sort((a, b) => (a.sizeMinMm ?? 0) - (b.sizeMinMm ?? 0));
    for (let i = 1; i < sorted.length; i++) {
      const prevMax = sorted[i - 1]?.sizeMaxMm;
      const min = sorted[i]?.sizeMinMm;
      if (prevMax === undefined || min === undefined || min < prevMax - 1e-9) {
        ctx.addIssue({code: 'custom', message: `rows of "${key}" overlap in size`});
      }
    }
  }
}

function uniqueIds<T extends {id: string}>(rows: T[], ctx: z.RefinementCtx, what: string): void {
  const seen = new Set<string>();
  for (const r of rows) {
    if (seen.has(r.id)) ctx.addIssue({code: 'custom', message: `${what} id "${r.id}" appears twice`});
    seen.add(r.id);
  }
}

function uniqueSizes<T extends {d: number}>(rows: T[], ctx: z.RefinementCtx): void {
  const seen = new Set<number>();
  for (const r of rows) {
    if (seen.has(r.d)) ctx.addIssue({code: 'custom', message: `size ${r.d} mm appears twice`});
    seen.add(r.d);
  }
}

/** The whole library. */
export const MaterialDataSchema = z.object({
  boltGrades: z.array(BoltGradeSchema).min(1).superRefine(noOverlap),
  nutClasses: z.array(NutClassSchema).min(1).superRefine(noOverlap),
  parentMaterials: z
    .array(ParentMaterialSchema)
    .min(1)
    .superRefine((rows, ctx) => uniqueIds(rows, ctx, 'parent material')),
  hexHeads: z.array(HexHeadRowSchema).superRefine(uniqueSizes),
  nutDimensions: z.array(NutDimensionRowSchema).superRefine(uniqueSizes),
  inchHexHeads: z
    .array(InchHexHeadRowSchema)
    .default([])
    .superRefine((rows, ctx) => uniqueSizes(rows.map(r => ({d: r.dIn})), ctx)),
});

export type MaterialData = z.output<typeof MaterialDataSchema>;

/**
 * Validate a material data set; throws an Error listing every problem with its path.
 * Used at module load on the shipped data, and by tests on bad entries.
 */
export function validateMaterialData(data: unknown): MaterialData {
  const r = MaterialDataSchema.safeParse(data);
  if (r.success) return r.data;
  const lines = r.error.issues.map(i => `${i.path.join('.') || '(root)'}: ${i.message}`);
  throw new Error(`material library is invalid:\n${lines.join('\n')}`);
}
