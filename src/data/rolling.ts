import { z } from 'zod';
import { loadTable } from './load.js';
import { FORMS, ROLLING_KINDS } from '../core/rolling-kinds.js';

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

/** ISO 15 radial bearings: one row per dimension series and bore (all kinds of that series share it). */
export const boundaryRowSchema = z
  .object({
    series: z.string().min(1),
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

/** ISO 355 metric single-row tapered roller bearings: total width T (width_mm), ring widths B and C, nominal α. */
export const taperedRowSchema = z
  .object({
    series: z.string().min(1),
    bore_mm: positive,
    outerDiameter_mm: positive,
    width_mm: positive,
    innerRingWidth_mm: positive,
    outerRingWidth_mm: positive,
    contactAngle_deg: positive,
    source,
  })
  .refine((r) => r.outerDiameter_mm > r.bore_mm, { message: 'outerDiameter_mm must exceed bore_mm' });
export type TaperedRow = z.infer<typeof taperedRowSchema>;

/** Needle roller bearings: drawn cups (no inner ring, bore_mm null) and machined ones (inner ring bore d). */
export const needleRowSchema = z
  .object({
    series: z.string().min(1),
    form: z.enum(['drawn cup', 'machined']),
    rollerSetBore_mm: positive,
    bore_mm: positive.nullable(),
    outerDiameter_mm: positive,
    width_mm: positive,
    source,
  })
  .refine((r) => r.outerDiameter_mm > r.rollerSetBore_mm, { message: 'outerDiameter_mm must exceed rollerSetBore_mm' });
export type NeedleRow = z.infer<typeof needleRowSchema>;

const rowsOf = <T extends z.ZodType>(row: T) =>
  z.object({ description: z.string(), units: z.record(z.string(), z.string()), rows: z.array(row).min(1) });
// Built once: the loaders below are called thousands of times in a sweep.
const taperedTableSchema = rowsOf(taperedRowSchema);
const needleTableSchema = rowsOf(needleRowSchema);

const factorsSchema = z.object({
  description: z.string(),
  units: z.record(z.string(), z.string()),
  serviceFactors: z.array(z.object({ shock, serviceFactor: positive, source })).length(4),
  contamination: z
    .array(
      z.object({
        level: z.enum(['clean', 'normal', 'dirty', 'severe']),
        isoLevel: z.string(),
        low: nonNegative,
        high: positive,
        eC: nonNegative,
        /** The same guidance for a pitch diameter dm ≥ 100 mm. */
        lowLarge: nonNegative,
        highLarge: positive,
        eCLarge: nonNegative,
        source,
      }),
    )
    .length(4),
});
export type RollingFactors = z.infer<typeof factorsSchema>;

/** ISO 15 boundary dimensions (data/rolling-boundary-dimensions.json), validated and cached. */
export function boundaryDimensions(): BoundaryTable {
  return loadTable('rolling-boundary-dimensions.json', boundaryTableSchema);
}

/** ISO 355 tapered roller rows (data/rolling-tapered-dimensions.json), validated and cached. */
export function taperedDimensions(): { rows: TaperedRow[] } {
  return loadTable('rolling-tapered-dimensions.json', taperedTableSchema);
}

/** Needle roller rows (data/rolling-needle-dimensions.json), validated and cached. */
export function needleDimensions(): { rows: NeedleRow[] } {
  return loadTable('rolling-needle-dimensions.json', needleTableSchema);
}

/** Rolling-bearing factors (data/rolling-factors.json), validated and cached. */
export function rollingFactors(): RollingFactors {
  return loadTable('rolling-factors.json', factorsSchema);
}

const kindTraitSchema = z.object({
  kind: z.enum(ROLLING_KINDS),
  misalignment_arcmin: positive,
  costClass: z.number().int().min(1).max(4),
  speedClass: z.number().int().min(1).max(3),
  costClassByForm: z.partialRecord(z.enum(FORMS), z.number().int().min(1).max(4)).optional(),
  preference: z.number().int().min(1).max(ROLLING_KINDS.length),
  source,
});
export type KindTraits = z.infer<typeof kindTraitSchema>;
const kindTraitsSchema = z.object({
  description: z.string(),
  units: z.record(z.string(), z.string()),
  kinds: z.array(kindTraitSchema).length(ROLLING_KINDS.length),
});

/** What decides between kinds (data/rolling-kinds.json): misalignment, cost and speed class, common practice. */
export function kindTraits(): KindTraits[] {
  return loadTable('rolling-kinds.json', kindTraitsSchema).kinds;
}
