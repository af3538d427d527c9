import type { GeometryEstimateFactors } from '../../data/rolling.js';
import type { BallGeometry, RollerGeometry } from './ratings.js';

/**
 * Internal geometry estimated from boundary dimensions, for bearings without a
 * supplier's rating (common practice, from memory; the factors live in
 * data/rolling-factors.json → geometryEstimate). A supplier's rating replaces the
 * estimate; the estimate is meant for concept-stage sizing only.
 *
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
