/**
 * Basic and modified rating life of rolling bearings, ISO 281:2007.
 *
 * References
 * [1] ISO 281:2007, Rolling bearings — Dynamic load ratings and rating life:
 *     basic rating life (cl. 6.3 ball, 7.3 roller), life modification factor for
 *     reliability a1 (cl. 9.2), modified rating life (cl. 9). Clause numbers from memory;
 *     L10 = (C/P)^p and L10h seen, the a1 formula from memory.
 */

export type RollingType = 'ball' | 'roller';

/** Life exponent p of ISO 281: 3 for ball bearings, 10/3 for roller bearings [1]. */
export function lifeExponent(type: RollingType): number {
  return type === 'ball' ? 3 : 10 / 3;
}

/**
 * Basic rating life L10 = (C/P)^p, million revolutions [1].
 * C basic dynamic load rating, N; P dynamic equivalent load, N (> 0); p life exponent.
 * Valid for P well below C (ISO 281 warns that P > 0.5·C is outside the usual
 * experience); returns null when P ≤ 0 (no load: life not defined).
 */
export function basicRatingLife(C: number, P: number, p: number): number | null {
  if (!(P > 0) || !(C > 0)) return null;
  return Math.pow(C / P, p);
}

/**
 * Basic rating life in hours: L10h = 10⁶·L10/(60·n) with n in r/min [1];
 * here n is taken in rev/s (SI), so L10h = 10⁶·L10/(3600·n).
 * L10 million revolutions; n rev/s (> 0). Returns null when n ≤ 0 (no rotation:
 * life in hours not defined).
 */
export function lifeHours(L10: number, n: number): number | null {
  if (!(n > 0)) return null;
  return (1e6 * L10) / (3600 * n);
}

/**
 * Basic dynamic load rating needed for a life target, N:
 *   C_req = P·(L_req/a)^(1/p), L_req = 3600·n·h/10⁶ million revolutions.
 * P equivalent load, N; n rev/s; h target life, hours; p life exponent; a the life
 * factors relied on (a1 for reliability; a_ISO taken as 1 unless given). From L10 = (C/P)^p [1].
 * Returns null when n ≤ 0 or h ≤ 0 (no revolutions to carry).
 */
export function requiredDynamicRating(P: number, n: number, hours: number, p: number, a = 1): number | null {
  if (!(n > 0) || !(hours > 0) || !(P >= 0) || !(a > 0)) return null;
  const Lreq = (3600 * n * hours) / 1e6;
  return P * Math.pow(Lreq / a, 1 / p);
}

/** Reliability range covered by the a1 formula of ISO 281:2007, percent. */
export const RELIABILITY_RANGE = { min: 90, max: 99.95 } as const;

/**
 * Life modification factor for reliability [1]:
 *   a1 = 0.95·[ln(100/R)/ln(100/90)]^(2/3) + 0.05
 * R reliability, percent, 90 ≤ R ≤ 99.95 (a1 = 1 at 90; 0.64 at 95; about 0.25 at 99).
 * Outside that range R is held to the nearest end (90 is the conservative end below)
 * and `clamped` is set so the caller warns.
 */
export function reliabilityFactor(R: number): { a1: number; reliabilityUsed: number; clamped: boolean } {
  const used = Math.min(RELIABILITY_RANGE.max, Math.max(RELIABILITY_RANGE.min, R));
  const a1 = 0.95 * Math.pow(Math.log(100 / used) / Math.log(100 / 90), 2 / 3) + 0.05;
  return { a1, reliabilityUsed: used, clamped: used !== R };
}
