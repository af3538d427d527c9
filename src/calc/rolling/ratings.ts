import type { FactorCurve } from '../../data/rolling.js';
import { interpolate } from './interpolate.js';

/**
 * Basic load ratings from internal geometry: dynamic C by ISO 281:2007, static C0 by
 * ISO 76. The standards' formulas are in N and mm; inputs here are SI (m) and are
 * converted inside.
 *
 * References
 * [1] ISO 281:2007, basic dynamic radial load rating of radial ball bearings
 *     (cl. 6.1): C = b_m·f_c·(i·cosα)^0.7·Z^(2/3)·Dw^1.8 for Dw ≤ 25.4 mm and
 *     C = 3.647·b_m·f_c·(i·cosα)^0.7·Z^(2/3)·Dw^1.4 for Dw > 25.4 mm; b_m = 1.3 for
 *     deep-groove ball bearings (both forms from memory; they meet at 25.4 mm since
 *     25.4^0.4 = 3.647).
 * [2] ISO 281:2007, radial roller bearings (cl. 7.1):
 *     C = b_m·f_c·(i·Lwe·cosα)^(7/9)·Z^(3/4)·Dwe^(29/27), b_m = 1.1 for cylindrical
 *     roller bearings (from memory, lower confidence on the f_c table).
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

const BM_BALL = 1.3;
const BM_ROLLER = 1.1;

/**
 * Basic dynamic radial load rating of a radial ball bearing, N [1]:
 *   C = b_m·f_c·(i·cosα)^0.7·Z^(2/3)·Dw^1.8            (Dw ≤ 25.4 mm)
 *   C = 3.647·b_m·f_c·(i·cosα)^0.7·Z^(2/3)·Dw^1.4      (Dw > 25.4 mm)
 * Dw in mm inside the formula (given in m); f_c from the table at Dw·cosα/Dpw;
 * b_m = 1.3 (deep-groove). Valid for bearings of contemporary quality hardened steel.
 */
export function ballDynamicRating(g: BallGeometry, fc: FactorCurve): RatingResult {
  const DwMm = g.Dw * 1000;
  const gamma = (g.Dw * Math.cos(g.alpha)) / g.Dpw;
  const { factor, inTable } = ratingFactor(fc, gamma);
  const common = BM_BALL * factor * Math.pow(g.i * Math.cos(g.alpha), 0.7) * Math.pow(g.Z, 2 / 3);
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
 *   (given in m), b_m = 1.1 (cylindrical roller), f_c from the table at Dwe·cosα/Dpw.
 */
export function rollerDynamicRating(g: RollerGeometry, fc: FactorCurve): RatingResult {
  const DweMm = g.Dwe * 1000;
  const LweMm = g.Lwe * 1000;
  const gamma = (g.Dwe * Math.cos(g.alpha)) / g.Dpw;
  const { factor, inTable } = ratingFactor(fc, gamma);
  const value =
    BM_ROLLER *
    factor *
    Math.pow(g.i * LweMm * Math.cos(g.alpha), 7 / 9) *
    Math.pow(g.Z, 3 / 4) *
    Math.pow(DweMm, 29 / 27);
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
