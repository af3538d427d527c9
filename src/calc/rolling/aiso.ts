import type { RollingType } from './life.js';

/**
 * Life modification factor a_ISO of ISO 281:2007 (systems approach), and the rated
 * viscosity ν1 that the viscosity ratio κ = ν/ν1 refers to.
 *
 * References
 * [1] ISO 281:2007, cl. 9.3 and its annex formulas for a_ISO of radial ball and radial
 *     roller bearings, and the rated viscosity ν1 (from memory: constants, exponents and
 *     clause numbers recalled, not re-read).
 */

/**
 * Rated viscosity ν1, m²/s [1]. In the standard's units (ν1 in mm²/s, n in r/min,
 * dm in mm):
 *   ν1 = 45000·n^(−0.83)·dm^(−0.5)   for n < 1000 r/min
 *   ν1 = 4500·n^(−0.5)·dm^(−0.5)     for n ≥ 1000 r/min
 * Inputs SI: n rev/s (> 0), dm pitch diameter m (> 0). The two branches do not meet
 * exactly at 1000 r/min (about 2 % apart; the standard's rounded constants).
 * Returns null for n ≤ 0 (no rotation: no film to rate).
 */
export function ratedViscosity(n: number, dm: number): number | null {
  if (!(n > 0) || !(dm > 0)) return null;
  const rpm = n * 60;
  const dmMm = dm * 1000;
  const nu1 =
    rpm < 1000
      ? 45000 * Math.pow(rpm, -0.83) * Math.pow(dmMm, -0.5)
      : 4500 * Math.pow(rpm, -0.5) * Math.pow(dmMm, -0.5);
  return nu1 * 1e-6;
}

/** Constants of the a_ISO formulas [1]: x; and (y, z) for κ in [0.1, 0.4), [0.4, 1), [1, 4]. */
export const AISO_CONSTANTS = {
  ball: {
    x: 2.5671,
    inner: 0.83,
    load: 1 / 3,
    outer: -9.3,
    y: [2.2649, 1.9987, 1.9987],
    z: [0.054381, 0.19087, 0.071739],
  },
  roller: {
    x: 1.5859,
    inner: 1,
    load: 0.4,
    outer: -9.185,
    y: [1.3993, 1.2348, 1.2348],
    z: [0.054381, 0.19087, 0.071739],
  },
} as const;

export const AISO_CAP = 50;
export const KAPPA_MIN = 0.1;
export const KAPPA_MAX = 4;

export interface AIsoResult {
  /** a_ISO, dimensionless, 0.1 ≤ a_ISO ≤ 50 inside the method's range. */
  aISO: number;
  /** κ actually used (κ > 4 taken as 4; κ < 0.1 taken as 0.1 and flagged). */
  kappaUsed: number;
  /** 'inside': 0.1 ≤ κ ≤ 4; 'above': κ > 4 taken as 4 (as the standard says); 'below': κ < 0.1, outside the method. */
  kappaRange: 'below' | 'inside' | 'above';
  /** True when the cap of 50 applied. */
  capped: boolean;
}

/**
 * Life modification factor a_ISO [1]:
 *   radial ball:   a_ISO = 0.1·[1 − (2.5671 − y/κ^z)^0.83·(e_C·Cu/P)^(1/3)]^(−9.3)
 *   radial roller: a_ISO = 0.1·[1 − (1.5859 − y/κ^z)·(e_C·Cu/P)^0.4]^(−9.185)
 * with (y, z) per κ band (AISO_CONSTANTS); a_ISO ≤ 50.
 * κ viscosity ratio ν/ν1 (dimensionless); eCCuP = e_C·Cu/P (dimensionless, ≥ 0):
 * e_C contamination factor, Cu fatigue load limit N, P dynamic equivalent load N.
 * Validity: 0.1 ≤ κ ≤ 4; κ > 4 is taken as 4 (the standard's rule); κ < 0.1 is
 * outside the method: the value at κ = 0.1 is returned and kappaRange = 'below'
 * so the caller warns. At κ = 0.1 the bracket term (x − y/κ^z) is within 10⁻⁴ of
 * zero with the published constants, so a_ISO ≈ 0.1 whatever e_C·Cu/P; a negative
 * rounding residue is held at zero. When the bracket reaches zero or below (large
 * e_C·Cu/P) the formula runs to infinity and the cap of 50 applies. A load ratio that is
 * not a number is read as 0 (a_ISO = 0.1, the conservative end), never as the cap.
 */
export function aIso(type: RollingType, kappa: number, eCCuP: number): AIsoResult {
  const k = AISO_CONSTANTS[type];
  let kappaRange: AIsoResult['kappaRange'] = 'inside';
  let kUsed = kappa;
  if (!(kappa >= KAPPA_MIN)) {
    kappaRange = 'below';
    kUsed = KAPPA_MIN;
  } else if (kappa > KAPPA_MAX) {
    kappaRange = 'above';
    kUsed = KAPPA_MAX;
  }
  const band = kUsed < 0.4 ? 0 : kUsed < 1 ? 1 : 2;
  const y = k.y[band]!;
  const z = k.z[band]!;
  const term = Math.max(0, k.x - y / Math.pow(kUsed, z));
  // A load ratio that is not a number (0/0: no load and no Cu) is read as 0, the floor
  // a_ISO = 0.1, never as the cap; a zero term or a zero load ratio gives the floor even
  // beside an infinite factor (0·∞ would be NaN and read as the cap).
  const load = Number.isNaN(eCCuP) ? 0 : Math.max(0, eCCuP);
  const product = term === 0 || load === 0 ? 0 : Math.pow(term, k.inner) * Math.pow(load, k.load);
  const bracket = 1 - product;
  if (!(bracket > 0)) return { aISO: AISO_CAP, kappaUsed: kUsed, kappaRange, capped: true };
  const raw = 0.1 * Math.pow(bracket, k.outer);
  if (!Number.isFinite(raw) || raw > AISO_CAP) return { aISO: AISO_CAP, kappaUsed: kUsed, kappaRange, capped: true };
  return { aISO: raw, kappaUsed: kUsed, kappaRange, capped: false };
}

/**
 * Fatigue load limit Cu where no supplier value is given, N (ISO 281:2007 Annex B, from
 * memory, the dm ≤ 100 mm ratios and the size exponents alike):
 *   ball:   Cu ≈ C0/22                 for dm ≤ 100 mm, C0/22·(100/dm)^0.5  for dm > 100 mm
 *   roller: Cu ≈ C0/8.2                for dm ≤ 100 mm, C0/8.2·(100/dm)^0.3 for dm > 100 mm
 * C0 basic static load rating, N; dm pitch diameter, m (the formula's dm in mm).
 */
export function estimatedFatigueLimit(type: RollingType, C0: number, dm: number): number {
  const base = type === 'ball' ? C0 / 22 : C0 / 8.2;
  const dmMm = dm * 1000;
  const sizeExponent = type === 'ball' ? 0.5 : 0.3;
  return dmMm > 100 ? base * Math.pow(100 / dmMm, sizeExponent) : base;
}
