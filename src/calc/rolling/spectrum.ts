import { KAPPA_MAX, KAPPA_MIN, aIso, ratedViscosity, type AIsoResult } from './aiso.js';
import { spectrumMean } from './equivalent-load.js';
import { basicRatingLife, lifeExponent, lifeHours, type RollingType } from './life.js';

/**
 * Rating life of a rolling bearing over a duty spectrum, with the life modification factor
 * a_ISO worked at each operating point and the point lives combined by the linear damage rule.
 *
 * References
 * [1] ISO 281:2007, Rolling bearings — Dynamic load ratings and rating life: L10 = (C/P)^p,
 *     L10h, the modified rating life L10m = a1·a_ISO·L10 (cl. 9), a_ISO from κ = ν/ν1 and
 *     e_C·Cu/P (cl. 9.3), the κ range 0.1 ≤ κ ≤ 4 of the a_ISO method (from memory). The
 *     form Lnm = a1·aISO·L10 is also stated in the scope of ISO/TR 1281-2:2008 (seen).
 * [2] Palmgren, A. (1924), Die Lebensdauer von Kugellagern, Zeitschrift des VDI 68,
 *     pp. 339–341; Miner, M. A. (1945), Cumulative damage in fatigue, Journal of Applied
 *     Mechanics 12, pp. A159–A164: failure when Σ (cycles at level i / life at level i) = 1
 *     (from memory).
 * [3] A bearing that turns slower than about 10 r/min is sized by its static load rating
 *     (ISO 76 s0 = C0/P0), not by a rating life: common practice.
 */

/**
 * Speed below which an operating point is treated as static, rev/s: 10 r/min [3]
 * (common practice; ISO 281 rates fatigue over revolutions and says nothing of n → 0).
 * A point with n < STATIC_SPEED_LIMIT is governed by static safety s0 and consumes no
 * rating life; a point at exactly this speed is still rated.
 */
export const STATIC_SPEED_LIMIT = 10 / 60;

/** One operating point of the duty. */
export interface SpectrumPointIn {
  /** Dynamic equivalent load with the service factor, N (≥ 0). */
  P: number;
  /** Speed, rev/s (≥ 0). */
  n: number;
  /** Time share, any unit common to all points (≥ 0; only ratios matter). */
  t: number;
  /** Kinematic viscosity of the lubricant at the point's temperature, m²/s. */
  nu: number;
}

/** What one point contributes. */
export interface SpectrumPointLife {
  /** Viscosity ratio κ = ν/ν1, 1; null with no rotation (ν1 undefined). */
  kappa: number | null;
  /** a_ISO at the point, 1; null when the point is static or unloaded. */
  aISO: number | null;
  /** The point's own modified life a1·a_ISO·(C/P)^p in hours at its speed; null when static or unloaded. */
  L10mh: number | null;
  /** Where κ lies against the a_ISO method's range 0.1 ≤ κ ≤ 4 ('below' also for no rotation). */
  kappaRange: AIsoResult['kappaRange'];
  /** True when a_ISO was held at its cap of 50. */
  capped: boolean;
  /** True when the point turns slower than STATIC_SPEED_LIMIT: no rating life, s0 governs. */
  static: boolean;
}

export interface SpectrumLife {
  /** Basic rating life from the combined load P, 10⁶ rev (definition unchanged); null when static only. */
  L10: number | null;
  /** Basic rating life at the mean speed n, h; null when static only or nothing turns. */
  L10h: number | null;
  /** Modified rating life combined over the points, h (service hours, static time included). */
  L10mh: number | null;
  /** L10mh/(a1·L10h): the spectrum's effective a_ISO, 1. */
  aISOEquivalent: number | null;
  /** Combined dynamic equivalent load P = (Σ Pi^p·ni·ti / Σ ni·ti)^(1/p), N. */
  P: number;
  /** Time-weighted mean speed n = Σ ni·ti / Σ ti, rev/s. */
  n: number;
  /** One entry per input point, in order. */
  points: SpectrumPointLife[];
  /** Every point with a time share turns slower than STATIC_SPEED_LIMIT. */
  staticOnly: boolean;
}

/** The bearing's figures the spectrum life needs. */
export interface SpectrumBearing {
  type: RollingType;
  /** Basic dynamic load rating, N. */
  C: number;
  /** Fatigue load limit, N. */
  Cu: number;
  /** Pitch diameter, m. */
  dm: number;
  /** Contamination factor e_C, 1. */
  eC: number;
  /** Life modification factor for reliability a1, 1. */
  a1: number;
}

/** A point with a positive, finite time share counts in the duty. */
function counts(q: SpectrumPointIn): boolean {
  return Number.isFinite(q.t) && q.t > 0;
}

/** Point i [1]: ν1(ni, dm), κi = νi/ν1, a_ISO,i(κi, e_C·Cu/Pi), L10mh,i = a1·a_ISO,i·(C/Pi)^p·10⁶/(3600·ni). */
function pointLife(q: SpectrumPointIn, b: SpectrumBearing): SpectrumPointLife {
  const nu1 = ratedViscosity(q.n, b.dm);
  const kappa = nu1 !== null && Number.isFinite(q.nu / nu1) ? q.nu / nu1 : null;
  const isStatic = !(q.n >= STATIC_SPEED_LIMIT);
  const range: AIsoResult['kappaRange'] =
    kappa === null || kappa < KAPPA_MIN ? 'below' : kappa > KAPPA_MAX ? 'above' : 'inside';
  if (isStatic || !(q.P > 0) || kappa === null)
    return { kappa, aISO: null, L10mh: null, kappaRange: range, capped: false, static: isStatic };
  const a = aIso(b.type, kappa, (b.eC * b.Cu) / q.P);
  const L10 = basicRatingLife(b.C, q.P, lifeExponent(b.type));
  const hours = L10 !== null ? lifeHours(b.a1 * a.aISO * L10, q.n) : null;
  return { kappa, aISO: a.aISO, L10mh: hours, kappaRange: a.kappaRange, capped: a.capped, static: false };
}

/**
 * Rating lives over a duty spectrum [1, 2]. Each point i has its own ν1(ni), κi = νi/ν1,
 * a_ISO,i and modified life L10m,i = a1·a_ISO,i·(C/Pi)^p (10⁶ rev); the lives combine by the
 * linear damage rule over the revolutions [2]:
 *   L10m = Σ ni·ti / Σ (ni·ti / L10m,i)                       (10⁶ rev)
 * which in service hours, with L10mh,i = 10⁶·L10m,i/(3600·ni), reads
 *   L10mh = Σ ti / Σ (ti / L10mh,i)                           (h)
 * the time-weighted harmonic mean of the point lives in hours. The basic life keeps its
 * definition: P = (Σ Pi^p·ni·ti / Σ ni·ti)^(1/p), L10 = (C/P)^p, L10h at n = Σ ni·ti/Σ ti;
 * with a_ISO = 1 at every point and no static point L10mh = a1·L10h exactly, so then
 * aISOEquivalent = L10mh/(a1·L10h) is the mean of the a_ISO,i weighted harmonically by each
 * point's share of Pi^p·ni·ti (a static point's share is left out of L10mh only, raising it).
 *
 * Symbols: Pi dynamic equivalent load with service factor, N; ni speed, rev/s; ti time
 * share; νi viscosity at the point, m²/s; C, Cu N; dm m; e_C, a1 dimensionless; p = 3 ball,
 * 10/3 roller.
 *
 * Validity and edges:
 * - κ < 0.1 is outside the a_ISO method, not a fault of the bearing: a_ISO is taken at
 *   κ = 0.1 (about 0.1, the method's floor) and the point says kappaRange 'below' so the
 *   caller warns. Life in revolutions is then flat as speed falls and life in hours rises:
 *   there is no step at κ = 0.1. κ > 4 is taken as 4 [1].
 * - A point slower than STATIC_SPEED_LIMIT [3] is static: no a_ISO and no life of its own,
 *   no damage in the sum, but its time stays in Σ ti (the hours pass in service). Why: the
 *   rating life does not apply there and static safety s0 = C0/P0 over all points governs
 *   it; its revolutions (under 10 r/min) are few beside the turning points'. A spectrum may
 *   therefore gain life when a slow point drops below the limit, never lose it.
 * - Every point with a time share static → staticOnly, and L10, L10h, L10mh and
 *   aISOEquivalent are null: no rating life is claimed.
 * - An unloaded point (Pi = 0) consumes no life. L10mh is null when no point consumes
 *   life (no load, no time), or when C ≤ 0.
 */
export function spectrumLife(points: readonly SpectrumPointIn[], b: SpectrumBearing): SpectrumLife {
  // Sized up front: a list grown by push from empty reserves room for 17.
  const per = new Array<SpectrumPointLife>(points.length);
  // How many points have a time share (spectrumMean reads only theirs, in order).
  let counted = 0;
  let allStatic = true;
  for (let i = 0; i < points.length; i++) {
    const q = points[i]!;
    const life = pointLife(q, b);
    per[i] = life;
    if (!counts(q)) continue;
    counted++;
    if (!life.static) allStatic = false;
  }
  const staticOnly = counted > 0 && allStatic;
  const mean = spectrumMean(points, lifeExponent(b.type), counts);
  if (staticOnly || counted === 0 || !(b.C > 0))
    return { L10: null, L10h: null, L10mh: null, aISOEquivalent: null, P: mean.P, n: mean.n, points: per, staticOnly };
  const L10 = basicRatingLife(b.C, mean.P, lifeExponent(b.type));
  const L10h = L10 !== null ? lifeHours(L10, mean.n) : null;
  let time = 0;
  let damage = 0;
  for (let i = 0; i < points.length; i++) {
    const q = points[i]!;
    if (!counts(q)) continue;
    const life = per[i]!;
    time += q.t;
    if (life.L10mh !== null && life.L10mh > 0) damage += q.t / life.L10mh;
  }
  const L10mh = damage > 0 && Number.isFinite(time / damage) ? time / damage : null;
  const aISOEquivalent = L10mh !== null && L10h !== null && L10h > 0 && b.a1 > 0 ? L10mh / (b.a1 * L10h) : null;
  return { L10, L10h, L10mh, aISOEquivalent, P: mean.P, n: mean.n, points: per, staticOnly };
}
