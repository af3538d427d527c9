import type { KindRatingRow } from '../../data/rolling-ratings.js';

export interface BallGeometry {
  /** Ball diameter Dw, m. */
  Dw: number;
  /** Pitch diameter of the ball set Dpw, m. */
  Dpw: number;
  /** Number of balls per row. */
  Z: number;
  /** Number of rows (1 here). */
  i: number;
  /** Nominal contact angle α, rad (0 for a deep-groove bearing under radial load). */
  alpha: number;
}

export interface RollerGeometry {
  /** Roller diameter Dwe, m. */
  Dwe: number;
  /** Effective roller length Lwe, m. */
  Lwe: number;
  /** Pitch diameter of the roller set Dpw, m. */
  Dpw: number;
  Z: number;
  i: number;
  alpha: number;
}

/**
 * The first estimate's factors (deep-groove ball and cylindrical roller only), kept for the
 * callers of estimateBallGeometry and estimateRollerGeometry; estimateKindGeometry below and
 * data/rolling-ratings.json replace them.
 */
export interface GeometryEstimateFactors {
  ballDiameterFactor: number;
  ballGammaMax: number;
  ballFillAngle_deg: number;
  rollerDiameterFactor: number;
  rollerLengthFactor: number;
  rollerPitchFactor: number;
}

/**
 * Internal geometry estimated from boundary dimensions, for bearings without a
 * supplier's rating (common practice, from memory). A supplier's rating replaces the
 * estimate; the estimate is meant for concept-stage sizing only.
 *
 * First estimate (estimateBallGeometry, estimateRollerGeometry; superseded by
 * estimateKindGeometry, which is on the safe side of published geometries; these factors
 * are 12–37 % generous on small bores):
 * Deep-groove ball bearing (Conrad assembly):
 *   dm = (d + D)/2
 *   Dw = k_b·(D − d)/2, k_b = 0.6, held to Dw ≤ γ_max·dm (γ_max = 0.30, the end of the
 *        ISO 281 f_c table) so that small bearings with thick rings stay in the table
 *   Z  = floor(φ / (2·asin(Dw/dm))) + 1: balls touching each other fill an arc φ ≈ 190°
 *        when the inner ring is pushed to one side for assembly.
 * Cylindrical roller bearing with cage:
 *   dm = (d + D)/2, Dwe = k_r·(D − d)/2 (k_r = 0.5), Lwe = k_L·B (k_L = 0.6, the rest of
 *   the width being ribs and chamfers), Z = floor(π·dm / (s·Dwe)) with roller pitch
 *   s·Dwe, s = 1.25 (room for cage bars).
 * All lengths in m; contact angle 0; one row.
 */
export function estimateBallGeometry(d: number, D: number, f: GeometryEstimateFactors): BallGeometry {
  const dm = (d + D) / 2;
  const Dw = Math.min((f.ballDiameterFactor * (D - d)) / 2, f.ballGammaMax * dm);
  const gap = 2 * Math.asin(Dw / dm);
  const fill = (f.ballFillAngle_deg * Math.PI) / 180;
  const Z = Math.floor(fill / gap + 1e-9) + 1;
  return { Dw, Dpw: dm, Z, i: 1, alpha: 0 };
}

/** Cylindrical roller geometry estimated from d, D, B (m); see the module comment. */
export function estimateRollerGeometry(d: number, D: number, B: number, f: GeometryEstimateFactors): RollerGeometry {
  const dm = (d + D) / 2;
  const Dwe = (f.rollerDiameterFactor * (D - d)) / 2;
  const Lwe = f.rollerLengthFactor * B;
  const Z = Math.max(3, Math.floor((Math.PI * dm) / (f.rollerPitchFactor * Dwe) + 1e-9));
  return { Dwe, Lwe, Dpw: dm, Z, i: 1, alpha: 0 };
}

/** The estimated internal geometry of one bearing of a kind; lengths in m, angles in rad. */
export interface KindGeometry {
  /** Pitch diameter of the rolling-element set Dpw, m. */
  dm: number;
  /** Ball diameter Dw, or mean roller diameter Dwe, m. */
  Dw: number;
  /** Effective roller length Lwe per row, m; null for balls. */
  Lwe: number | null;
  /** Rolling elements per row. */
  Z: number;
  /** Rows of rolling elements in one bearing. */
  rows: number;
  /** Contact angle α, rad. */
  alpha: number;
  /** Roller set bore Fw of a needle roller bearing, m (null for the other kinds). */
  Fw: number | null;
}

/**
 * Internal geometry of one bearing of a kind from its boundary dimensions (common practice,
 * from memory; the fractions and their reasons are in data/rolling-ratings.json → kinds):
 *   S   = (D − Fw)/2 for needle rollers (Fw = d + f_Fw·(D − d) unless given), else (D − d)/2
 *   dm  = Fw + Dw for needle rollers, else (d + D)/2
 *   Dw  = min(k_e·S, γ_max·dm)      element diameter; γ_max holds small thick-ringed sizes
 *                                    to the element proportions they are actually built with
 *   Z   = floor(φ/(2·asin(Dw/dm))) + 1   Conrad fill over an arc φ (deep-groove ball), or
 *   Z   = floor(π·dm/(s·Dw))             pitch s·Dw (cage bars) for the other kinds; Z ≥ 3
 *   Lwe = max(k_L·B − ΔL, k_L·B/2)        rollers (B = total width T for tapered rollers)
 * d, D, B, Fw in m; contactAngle in rad (the row's default when null). Valid for radial
 * bearings of the common dimension series (ISO 15, ISO 355, ISO 1206); a supplier's
 * geometry or rating replaces it.
 */
export function estimateKindGeometry(
  row: KindRatingRow,
  d: number,
  D: number,
  B: number,
  contactAngle: number | null,
  rollerSetBore: number | null,
): KindGeometry {
  let Fw: number | null = null;
  let inner = d;
  if (row.rollerSetBoreFraction !== null) {
    Fw = rollerSetBore ?? d + row.rollerSetBoreFraction * (D - d);
    inner = Fw;
  }
  const section = (D - inner) / 2;
  const dmGuess = (inner + D) / 2;
  let Dw = row.elementFraction * section;
  // Needles: the rollers run on Fw, so their pitch circle is Fw + Dw, not the middle of the section.
  let dm = Fw !== null ? Fw + Dw : dmGuess;
  if (Dw > row.gammaMax * dm) {
    Dw = Fw !== null ? (row.gammaMax * Fw) / (1 - row.gammaMax) : row.gammaMax * dm;
    if (Fw !== null) dm = Fw + Dw;
  }
  const Z =
    row.fillAngle_deg !== null
      ? Math.floor((row.fillAngle_deg * Math.PI) / 180 / (2 * Math.asin(Dw / dm)) + 1e-9) + 1
      : Math.max(3, Math.floor((Math.PI * dm) / (row.pitchFactor! * Dw) + 1e-9));
  const Lwe =
    row.lengthFraction !== null
      ? Math.max(row.lengthFraction * B - (row.lengthAllowance_mm ?? 0) / 1000, 0.5 * row.lengthFraction * B)
      : null;
  const alpha = contactAngle ?? (row.contactAngle_deg * Math.PI) / 180;
  return { dm, Dw, Lwe, Z: Math.max(3, Z), rows: row.rowsPerBearing, alpha, Fw };
}
