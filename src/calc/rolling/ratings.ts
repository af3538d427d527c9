import { ratingTables, type KindRatingRow, type RatingTables } from '../../data/rolling-ratings.js';
import { estimateKindGeometry, type BallGeometry, type RollerGeometry } from './geometry.js';

export type { BallGeometry, RollerGeometry };
import { interpolate } from './interpolate.js';
import { isPair, type Arrangement, type KindForm, type RollingKind } from './kinds.js';

/** A factor table against γ: rows sorted by gamma (data/rolling-ratings.json → curves). */
export interface FactorCurve {
  rows: ReadonlyArray<{ gamma: number; f: number }>;
}

/**
 * Basic load ratings from internal geometry: dynamic C by ISO 281:2007, static C0 by
 * ISO 76. The standards' formulas are in N and mm; inputs here are SI (m) and are
 * converted inside.
 *
 * References
 * [1] ISO 281:2007, basic dynamic radial load rating of radial ball bearings
 *     (cl. 6.1): C = b_m·f_c·(i·cosα)^0.7·Z^(2/3)·Dw^1.8 for Dw ≤ 25.4 mm and
 *     C = 3.647·b_m·f_c·(i·cosα)^0.7·Z^(2/3)·Dw^1.4 for Dw > 25.4 mm; b_m = 1.3 for
 *     the radial ball kinds (both forms from memory; they meet at 25.4 mm since
 *     25.4^0.4 = 3.647). Two single-row bearings acting as one unit count as i = 2.
 * [2] ISO 281:2007, radial roller bearings (cl. 7.1):
 *     C = b_m·f_c·(i·Lwe·cosα)^(7/9)·Z^(3/4)·Dwe^(29/27), b_m = 1.1 for cylindrical
 *     roller bearings, 1.1 tapered, 1.15 spherical, 1.1 needle with machined rings,
 *     1.0 drawn cup needle (from memory, lower confidence on the f_c table).
 * [3] ISO 76, basic static radial load rating: radial ball C0 = f0·i·Z·Dw²·cosα;
 *     radial roller C0 = 44·(1 − Dwe·cosα/Dpw)·i·Z·Lwe·Dwe·cosα (from memory).
 */

export interface RatingResult {
  /** Rating, N. */
  value: number;
  /** The factor read from the table (f_c or f0). */
  factor: number;
  /** Dw·cosα/Dpw used. */
  gamma: number;
  /** Whether gamma was inside the factor table (else the end value is used and the caller warns). */
  inTable: boolean;
}

/** f_c or f0 at gamma = Dw·cosα/Dpw by linear interpolation (the standards permit it). */
export function ratingFactor(curve: FactorCurve, gamma: number): { factor: number; inTable: boolean } {
  const r = interpolate(
    curve.rows.map((q) => ({ x: q.gamma, y: q.f })),
    gamma,
  );
  return { factor: r.value, inTable: r.range === 'inside' };
}

const BM_BALL = 1.3;
const BM_ROLLER = 1.1;

/**
 * Basic dynamic radial load rating of a radial ball bearing, N [1]:
 *   C = b_m·f_c·(i·cosα)^0.7·Z^(2/3)·Dw^1.8            (Dw ≤ 25.4 mm)
 *   C = 3.647·b_m·f_c·(i·cosα)^0.7·Z^(2/3)·Dw^1.4      (Dw > 25.4 mm)
 * Dw in mm inside the formula (given in m); f_c from the table at Dw·cosα/Dpw;
 * b_m = 1.3 (radial ball kinds) unless given. Valid for bearings of contemporary quality hardened steel.
 */
export function ballDynamicRating(g: BallGeometry, fc: FactorCurve, bm: number = BM_BALL): RatingResult {
  const DwMm = g.Dw * 1000;
  const gamma = (g.Dw * Math.cos(g.alpha)) / g.Dpw;
  const { factor, inTable } = ratingFactor(fc, gamma);
  const common = bm * factor * Math.pow(g.i * Math.cos(g.alpha), 0.7) * Math.pow(g.Z, 2 / 3);
  const value = DwMm <= 25.4 ? common * Math.pow(DwMm, 1.8) : 3.647 * common * Math.pow(DwMm, 1.4);
  return { value, factor, gamma, inTable };
}

/**
 * Basic static radial load rating of a radial ball bearing, N [3]:
 *   C0 = f0·i·Z·Dw²·cosα, Dw in mm inside (given in m), f0 from the table at Dw·cosα/Dpw.
 * f0 corresponds to a contact stress of 4200 MPa at the most heavily loaded contact (ISO 76, from memory).
 */
export function ballStaticRating(g: BallGeometry, f0: FactorCurve): RatingResult {
  const DwMm = g.Dw * 1000;
  const gamma = (g.Dw * Math.cos(g.alpha)) / g.Dpw;
  const { factor, inTable } = ratingFactor(f0, gamma);
  return { value: factor * g.i * g.Z * DwMm * DwMm * Math.cos(g.alpha), factor, gamma, inTable };
}

/**
 * Basic dynamic radial load rating of a radial roller bearing, N [2]:
 *   C = b_m·f_c·(i·Lwe·cosα)^(7/9)·Z^(3/4)·Dwe^(29/27), Lwe and Dwe in mm inside
 *   (given in m), b_m = 1.1 (cylindrical roller) unless given, f_c from the table at Dwe·cosα/Dpw.
 */
export function rollerDynamicRating(g: RollerGeometry, fc: FactorCurve, bm: number = BM_ROLLER): RatingResult {
  const DweMm = g.Dwe * 1000;
  const LweMm = g.Lwe * 1000;
  const gamma = (g.Dwe * Math.cos(g.alpha)) / g.Dpw;
  const { factor, inTable } = ratingFactor(fc, gamma);
  const value =
    bm * factor * Math.pow(g.i * LweMm * Math.cos(g.alpha), 7 / 9) * Math.pow(g.Z, 3 / 4) * Math.pow(DweMm, 29 / 27);
  return { value, factor, gamma, inTable };
}

/**
 * Basic static radial load rating of a radial roller bearing, N [3]:
 *   C0 = 44·(1 − Dwe·cosα/Dpw)·i·Z·Lwe·Dwe·cosα, lengths in mm inside (given in m).
 * Corresponds to 4000 MPa at the most heavily loaded contact (ISO 76, from memory).
 */
export function rollerStaticRating(g: RollerGeometry): RatingResult {
  const gamma = (g.Dwe * Math.cos(g.alpha)) / g.Dpw;
  const value = 44 * (1 - gamma) * g.i * g.Z * g.Lwe * 1000 * g.Dwe * 1000 * Math.cos(g.alpha);
  return { value, factor: 44, gamma, inTable: true };
}

/** What estimateRatings needs: the kind, its form and arrangement, and the boundary dimensions (SI). */
export interface RatingInput {
  kind: RollingKind;
  form: KindForm | null;
  arrangement: Arrangement;
  /** Nominal contact angle α, degrees (0 for the radial kinds; 0 or absent takes the kind's default where it has one). */
  contactAngle: number;
  /** Bore d, outside diameter D, width B, m (tapered roller: B = total width T). */
  d: number;
  D: number;
  B: number;
  /** Needle roller bearings: roller set bore Fw (inner raceway diameter), m. */
  rollerSetBore?: number;
}

/** Estimated ratings of the whole support and the geometry they rest on (for the calculation sheet). */
export interface EstimatedRatings {
  /** Basic dynamic radial load rating of the support, N (a pair counts as i = 2 rows). */
  C: number;
  /** Basic static radial load rating of the support, N (a pair: 2·C0 of one bearing). */
  C0: number;
  /** ISO 76 factor f0 of the ball kinds (for f0·Fa/C0 in the X/Y table); null for rollers. */
  f0: number | null;
  /** Pitch diameter Dpw, m. */
  dm: number;
  /** Ball diameter Dw or roller diameter Dwe, m. */
  Dw: number;
  /** Rolling elements per row. */
  Z: number;
  /** Effective roller length per row Lwe, m; null for balls. */
  Lwe: number | null;
  /** Rows i in the rating formulas (rows per bearing × bearings in the support). */
  rows: number;
  /** Contact angle α used, rad. */
  alpha: number;
  /** f_c read at γ. */
  fc: number;
  /** γ = Dw·cosα/Dpw. */
  gamma: number;
  /** Whether γ was inside every factor table used (else the end value was used: warn). */
  inTable: boolean;
  /** Values taken because the input did not give them: the contact angle (rad), the roller set bore Fw (m), the needle form. */
  assumed: { contactAngle?: number; rollerSetBore?: number; form?: KindForm };
}

/** Kinds whose default contact angle is used when the input gives 0. */
const ANGLED: ReadonlySet<RollingKind> = new Set([
  'angular-contact ball',
  'self-aligning ball',
  'tapered roller',
  'spherical roller',
]);

/** The data row of a kind and form: the form's own row, else the kind's form-less row, else its first. */
export function kindRow(tables: RatingTables, kind: RollingKind, form: KindForm | null): KindRatingRow {
  const rows = tables.kinds.filter((r) => r.kind === kind);
  const row = rows.find((r) => r.form === form) ?? rows.find((r) => r.form === null) ?? rows[0];
  if (!row) throw new Error(`no rating factors for kind "${kind}" in data/rolling-ratings.json`);
  return row;
}

/** The nominal contact angle a kind is taken with when none is given, degrees (data/rolling-ratings.json, with its source). */
export function usualContactAngle(kind: RollingKind): number {
  return kindRow(ratingTables(), kind, null).contactAngle_deg;
}

/**
 * Basic load ratings C and C0 (N) of a rolling-bearing support estimated from its boundary
 * dimensions: the internal geometry by estimateKindGeometry (common practice, on the safe
 * side of published geometries, see data/rolling-ratings.json), then
 *   ball:   C = b_m·f_c·(i·cosα)^0.7·Z^(2/3)·Dw^1.8 (Dw ≤ 25.4 mm; 3.647·…·Dw^1.4 above) [1]
 *           C0 = f0·i·Z·Dw²·cosα [3]
 *   roller: C = b_m·f_c·(i·Lwe·cosα)^(7/9)·Z^(3/4)·Dwe^(29/27) [2]
 *           C0 = 44·(1 − Dwe·cosα/Dpw)·i·Z·Lwe·Dwe·cosα [3]
 * with lengths in mm inside the formulas, f_c and f0 from the kind's columns at γ = Dw·cosα/Dpw,
 * and i = rows per bearing × 2 for a pair (ISO 281: two bearings acting as one unit; this
 * gives C_pair = 2^0.7·C for balls, 2^(7/9)·C for rollers and C0_pair = 2·C0). Two deep-groove
 * ball bearings paired count as one double-row bearing and take its f_c column. Inputs SI
 * (m, degrees for the contact angle as given); outputs N, m, rad. Concept-stage sizing only:
 * a supplier's rating replaces it.
 */
export function estimateRatings(x: RatingInput, tables: RatingTables = ratingTables()): EstimatedRatings {
  const assumed: EstimatedRatings['assumed'] = {};
  let form = x.form;
  if (x.kind === 'needle roller' && form === null) {
    form = 'drawn cup'; // the lowest b_m and the thinnest section: the safe side
    assumed.form = form;
  }
  const row = kindRow(tables, x.kind, form);
  let alpha: number | null = x.contactAngle > 0 ? (x.contactAngle * Math.PI) / 180 : null;
  if (alpha === null && ANGLED.has(x.kind)) {
    alpha = (row.contactAngle_deg * Math.PI) / 180;
    assumed.contactAngle = alpha;
  }
  const g = estimateKindGeometry(row, x.d, x.D, x.B, alpha ?? 0, x.rollerSetBore ?? null);
  if (g.Fw !== null && x.rollerSetBore === undefined && row.rollerSetBoreFraction! > 0) assumed.rollerSetBore = g.Fw;
  const i = g.rows * (isPair(x.arrangement) ? 2 : 1);
  const fcCurve = tables.curves[isPair(x.arrangement) ? row.fcPair : row.fc];
  const common = { dm: g.dm, Dw: g.Dw, Z: g.Z, Lwe: g.Lwe, rows: i, alpha: g.alpha, assumed };
  if (g.Lwe === null) {
    const ball: BallGeometry = { Dw: g.Dw, Dpw: g.dm, Z: g.Z, i, alpha: g.alpha };
    const C = ballDynamicRating(ball, fcCurve, row.bm);
    const C0 = row.f0 ? ballStaticRating(ball, tables.curves[row.f0]) : null;
    if (!C0) throw new Error(`data/rolling-ratings.json: ball kind "${x.kind}" has no f0 curve`);
    return {
      ...common,
      C: C.value,
      C0: C0.value,
      f0: C0.factor,
      fc: C.factor,
      gamma: C.gamma,
      inTable: C.inTable && C0.inTable,
    };
  }
  const roller: RollerGeometry = { Dwe: g.Dw, Lwe: g.Lwe, Dpw: g.dm, Z: g.Z, i, alpha: g.alpha };
  const C = rollerDynamicRating(roller, fcCurve, row.bm);
  const C0 = rollerStaticRating(roller);
  return { ...common, C: C.value, C0: C0.value, f0: null, fc: C.factor, gamma: C.gamma, inTable: C.inTable };
}
