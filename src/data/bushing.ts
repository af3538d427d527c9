import { DataError } from '../core/errors.js';
import { z } from 'zod';
import { loadTable } from './load.js';

/**
 * data/bushing-materials.json and data/bushing-factors.json. Rows are written in
 * the units named in each file's `units` header (MPa, m/s, MPa·m/s, mm³/(N·m), °C, mm)
 * and converted to SI here, so a reader of the file sees the figures as handbooks print them.
 */
const pos = z.number().positive();
/**
 * What a material must be given to reach its limits: none < grease < oil on one scale; water
 * (a water-lubricated class) is met only where the bearing runs in water or slurry.
 */
export const NEEDS = ['none', 'grease', 'oil', 'water'] as const;
export type LubricantNeed = (typeof NEEDS)[number];
/** Resistance of a material in a service medium, from best to worst. */
export const RATINGS = ['good', 'fair', 'poor'] as const;
export type MediumRating = (typeof RATINGS)[number];
const rowSchema = z.strictObject({
  id: z.string().regex(/^[a-z0-9-]+$/),
  /** Generic class name, never a trade name. */
  name: z.string().min(1),
  /** Maximum mean projected pressure (file MPa; SI Pa). */
  maxPressure: pos,
  /** Maximum sliding speed, m/s. */
  maxVelocity: pos,
  /** Maximum PV (file MPa·m/s; SI Pa·m/s). */
  maxPV: pos,
  /** Typical dimensional wear factor k (file mm³/(N·m); SI m³/(N·m) = m²/N). */
  wearFactor: pos,
  /** Low and high ends of the published scatter of k, same unit. */
  wearFactorLow: pos,
  wearFactorHigh: pos,
  /** Typical friction coefficient, boundary regime, dimensionless. */
  friction: pos.max(1),
  /** Maximum continuous temperature of the material, °C. */
  maxTemperature: z.number(),
  /** Wall thickness as a fraction of bore (common practice). */
  wallFraction: pos.max(0.5),
  /** Minimum wall (file mm; SI m). */
  minWall: pos,
  source: z.string().min(1),
  /** The lubricant the material must be given to reach its limits (a contract key). */
  needs: z.enum(NEEDS),
  /** Why it needs that (or nothing): the source. */
  needsSource: z.string().min(1),
  /** Resistance in water or slurry, and in chemical service. */
  water: z.enum(RATINGS),
  chemical: z.enum(RATINGS),
  mediaSource: z.string().min(1),
  /** The motion the limits hold for: any, or oscillating only (pins and pivots). */
  motion: z.enum(['any', 'oscillating']),
  /** Why a class is for oscillation only. */
  motionSource: z.string().min(1).optional(),
  /** Lowest sliding speed at which the published limits hold (a water-lubricated class forms its film), m/s; advisory. */
  minVelocity: pos.optional(),
  /** Longest length/diameter the class is built to (replaces the general L/D cap), with its source. */
  maxLengthToDiameter: pos.optional(),
  /** Grit in the medium passes through the class (flutes and an elastomer face): no contamination factor on its wear. */
  gritPasses: z.boolean().optional(),
  /** Resistance in abrasive slurry where it differs from water (a hard face that grit scores). */
  slurry: z.enum(RATINGS).optional(),
  /** Source of minVelocity, maxLengthToDiameter, gritPasses and slurry. */
  wetSource: z.string().min(1).optional(),
});
const fileSchema = z.strictObject({
  description: z.string(),
  units: z.record(z.string(), z.string()),
  materials: z.array(rowSchema).min(1),
});

/** A row of data/bushing-materials.json converted to SI (the same fields as the file's schema). */
export type BushingMaterialRow = z.infer<typeof rowSchema>;

/** Row fields an inline material may leave out. */
type InlineOptional =
  | 'wearFactorLow'
  | 'wearFactorHigh'
  | 'needs'
  | 'needsSource'
  | 'water'
  | 'chemical'
  | 'mediaSource'
  | 'motion'
  | 'motionSource'
  | 'minVelocity'
  | 'maxLengthToDiameter'
  | 'gritPasses'
  | 'slurry'
  | 'wetSource';
/**
 * A bushing material as a case may give it inline (a supplier's datasheet): the row's fields in
 * SI without the wall sizing, the wear scatter optional (default typical/3 and typical×3), the
 * lubricant need and the media ratings optional (taken as none and fair, stated by the check).
 */
export type BushingMaterial = Omit<BushingMaterialRow, 'wallFraction' | 'minWall' | InlineOptional> &
  Partial<Pick<BushingMaterialRow, InlineOptional>>;

const converted = new WeakMap<object, BushingMaterialRow[]>();

export function bushingMaterials(): BushingMaterialRow[] {
  const t = loadTable('bushing-materials.json', fileSchema);
  const hit = converted.get(t);
  if (hit) return hit;
  const rows = t.materials.map((m) => {
    if (!(m.wearFactorLow <= m.wearFactor && m.wearFactor <= m.wearFactorHigh)) {
      throw new DataError(
        `data/bushing-materials.json: material ${m.id}: wearFactorLow ≤ wearFactor ≤ wearFactorHigh does not hold; expected them in that order`,
      );
    }
    return {
      ...m,
      maxPressure: m.maxPressure * 1e6,
      maxPV: m.maxPV * 1e6,
      wearFactor: m.wearFactor * 1e-9,
      wearFactorLow: m.wearFactorLow * 1e-9,
      wearFactorHigh: m.wearFactorHigh * 1e-9,
      minWall: m.minWall * 1e-3,
    };
  });
  converted.set(t, rows);
  return rows;
}

const factorRow = z.strictObject({ key: z.string(), value: pos, note: z.string(), source: z.string().min(1) });
const factorsSchema = z.strictObject({
  description: z.string(),
  motion: z.array(factorRow).min(1),
  environment: z.array(factorRow).min(1),
  heat: z.strictObject({
    /** Room temperature the published PV and temperature limits are taken to hold in, °C. */
    referenceAmbient: z.number(),
    note: z.string(),
    source: z.string().min(1),
  }),
  lengthToDiameter: z.strictObject({ min: pos, max: pos, source: z.string() }),
});
export type BushingFactors = z.infer<typeof factorsSchema>;

export function bushingFactors(): BushingFactors {
  return loadTable('bushing-factors.json', factorsSchema);
}
