import { z } from 'zod';
import { loadTable } from './load.js';

/**
 * Tables for the rolling-bearing check: ISO 15 boundary dimensions
 * (data/rolling-boundary-dimensions.json) and the factors of ISO 281 / ISO 76 and of
 * common practice (data/rolling-factors.json). Each row carries a `source`.
 * Dimensions are kept in mm in the files (the unit is in the key) and converted to
 * SI by the callers.
 */

const positive = z.number().positive();
const nonNegative = z.number().nonnegative();
const source = z.string().min(1);
const shock = z.enum(['none', 'light', 'moderate', 'heavy']);
const bearingType = z.enum(['ball', 'roller']);

export const boundaryRowSchema = z
  .object({
    id: z.string().min(1),
    type: bearingType,
    kind: z.string().min(1),
    series: z.string().min(1),
    designation: z.string().min(1),
    bore_mm: positive,
    outerDiameter_mm: positive,
    width_mm: positive,
    source,
  })
  .refine((r) => r.outerDiameter_mm > r.bore_mm, { message: 'outerDiameter_mm must exceed bore_mm' });
export type BoundaryRow = z.infer<typeof boundaryRowSchema>;

const boundaryTableSchema = z.object({
  description: z.string(),
  units: z.record(z.string(), z.string()),
  rows: z.array(boundaryRowSchema).min(1),
});
export type BoundaryTable = z.infer<typeof boundaryTableSchema>;

const curveSchema = z.object({
  note: z.string(),
  source,
  rows: z.array(z.object({ gamma: positive, f: positive })).min(2),
});
export type FactorCurve = z.infer<typeof curveSchema>;

const xyRowSchema = z.object({ faC0: positive, e: positive, Y: positive });
export type XYRow = z.infer<typeof xyRowSchema>;

const xyTableSchema = z.object({
  note: z.string(),
  xBelowE: positive,
  yBelowE: nonNegative,
  xAboveE: positive,
  source,
  rows: z.array(xyRowSchema).min(2),
});
export type XYTable = z.infer<typeof xyTableSchema>;

const factorsSchema = z.object({
  description: z.string(),
  units: z.record(z.string(), z.string()),
  xyDeepGrooveBall: xyTableSchema,
  serviceFactors: z.array(z.object({ shock, serviceFactor: positive, source })).length(4),
  staticSafety: z.array(z.object({ shock, guidance: z.string(), ball: positive, roller: positive, source })).length(4),
  contamination: z
    .array(
      z.object({
        level: z.enum(['clean', 'normal', 'dirty', 'severe']),
        isoLevel: z.string(),
        low: nonNegative,
        high: positive,
        eC: nonNegative,
        source,
      }),
    )
    .length(4),
  speedLimits: z.array(
    z.object({ type: bearingType, supply: z.enum(['grease', 'oil-bath', 'oil-feed']), ndm: positive, source }),
  ),
  friction: z.array(z.object({ type: bearingType, mu: positive, source })),
  relubrication: z.array(z.object({ type: bearingType, kf: positive, source })),
  ratingFactors: z.object({ fcBall: curveSchema, f0Ball: curveSchema, fcRoller: curveSchema }),
  geometryEstimate: z.object({
    ballDiameterFactor: positive,
    ballGammaMax: positive,
    ballFillAngle_deg: positive,
    rollerDiameterFactor: positive,
    rollerLengthFactor: positive,
    rollerPitchFactor: positive,
    source,
  }),
});
export type RollingFactors = z.infer<typeof factorsSchema>;
export type GeometryEstimateFactors = RollingFactors['geometryEstimate'];

/** ISO 15 boundary dimensions (data/rolling-boundary-dimensions.json), validated and cached. */
export function boundaryDimensions(): BoundaryTable {
  return loadTable('rolling-boundary-dimensions.json', boundaryTableSchema);
}

/** Rolling-bearing factors (data/rolling-factors.json), validated and cached. */
export function rollingFactors(): RollingFactors {
  return loadTable('rolling-factors.json', factorsSchema);
}
