import { z } from 'zod';
import { loadTable } from './load.js';
import { FORMS, ROLLING_KINDS } from '../core/rolling-kinds.js';

/**
 * Factors for estimating basic load ratings from internal geometry (data/rolling-ratings.json):
 * the ISO 281:2007 f_c and ISO 76:2006 f0 tables as curves against γ = Dw·cosα/Dpw, and one
 * geometry row per kind (and needle roller form) with its b_m, the rolling-element diameter
 * as a fraction of the section, the effective length rule, the fill angle or pitch and the
 * default contact angle. Each curve and each row carries a `source`. Lengths in the file are
 * in mm where the key says so; the callers convert to SI.
 */

const positive = z.number().positive();
const nonNegative = z.number().nonnegative();
const source = z.string().min(1);

const curveSchema = z.object({
  note: z.string(),
  source,
  rows: z
    .array(z.object({ gamma: nonNegative, f: positive }))
    .min(2)
    .refine((rows) => rows.every((r, i) => i === 0 || r.gamma > rows[i - 1]!.gamma), {
      message: 'rows must be sorted by gamma, without repeats',
    }),
});
/** One factor table of the standards against γ (linear interpolation between rows). */
export type RatingCurve = z.infer<typeof curveSchema>;

export const CURVE_NAMES = [
  'fcBallRadial',
  'fcBallDoubleRow',
  'fcBallSelfAligning',
  'f0BallRadial',
  'f0BallSelfAligning',
  'fcRoller',
] as const;
export type CurveName = (typeof CURVE_NAMES)[number];
const curveName = z.enum(CURVE_NAMES);

const kindRowSchema = z
  .object({
    kind: z.enum(ROLLING_KINDS),
    /** The form the row serves, or null for the row that serves every form of the kind. */
    form: z.enum(FORMS).nullable(),
    /** ISO 281 rating factor for contemporary bearing steel and manufacture. */
    bm: positive,
    /** Rows of rolling elements in one bearing (2 for self-aligning ball and spherical roller). */
    rowsPerBearing: z.number().int().positive(),
    /** Rolling-element diameter as a fraction of the section (D − d)/2 (of (D − Fw)/2 for needles). */
    elementFraction: positive,
    /** Largest element diameter over pitch diameter taken, Dw/dm. */
    gammaMax: positive,
    /** Conrad fill: the arc the balls fill, deg (null: pitch rule). */
    fillAngle_deg: positive.nullable(),
    /** Element pitch on the pitch circle as a multiple of the element diameter (null: fill rule). */
    pitchFactor: positive.nullable(),
    /** Effective roller length as a fraction of the width (null for balls). */
    lengthFraction: positive.nullable(),
    /** Taken off the effective roller length, mm (null for balls). */
    lengthAllowance_mm: nonNegative.nullable(),
    /** Contact angle used when none is given, deg. */
    contactAngle_deg: nonNegative,
    /** Needle rollers: roller set bore Fw = d + fraction·(D − d) when not given (0: the bore is Fw). */
    rollerSetBoreFraction: nonNegative.nullable(),
    fc: curveName,
    /** f_c curve for a pair of the kind acting as one unit. */
    fcPair: curveName,
    f0: curveName.nullable(),
    source,
  })
  .refine((r) => (r.fillAngle_deg === null) !== (r.pitchFactor === null), {
    message: 'give exactly one of fillAngle_deg and pitchFactor',
  })
  .refine((r) => (r.lengthFraction === null) === (r.lengthAllowance_mm === null), {
    message: 'lengthFraction and lengthAllowance_mm go together',
  });
/** The geometry estimate and factors of one kind (and form). */
export type KindRatingRow = z.infer<typeof kindRowSchema>;

export const ratingTablesSchema = z.object({
  description: z.string(),
  units: z.record(z.string(), z.string()),
  curves: z.object(
    Object.fromEntries(CURVE_NAMES.map((n) => [n, curveSchema])) as Record<CurveName, typeof curveSchema>,
  ),
  kinds: z.array(kindRowSchema).min(1),
});
export type RatingTables = z.infer<typeof ratingTablesSchema>;

/** The rating-estimate factors (data/rolling-ratings.json), validated when read from SHAFTWISE_DATA_DIR, cached. */
export function ratingTables(): RatingTables {
  return loadTable('rolling-ratings.json', ratingTablesSchema);
}
