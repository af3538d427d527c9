/**
 * Closed-form results for plain journal bearings, used as limits and checks of the
 * finite-difference solution and, for Petroff, as the lightly-loaded comparison.
 *
 * Symbols (SI): μ dynamic viscosity Pa·s; N shaft speed rev/s; r journal radius m;
 * c radial clearance m; L bearing length m; D = 2r m; W radial load N;
 * P = W/(L·D) mean unit load Pa; ε eccentricity ratio (1); S = (r/c)²·μN/P (1).
 *
 * References:
 *  [1] Petroff, N. P. (1883), friction of a concentric journal; in the form used here
 *      in Hamrock, B. J., Schmid, S. R. and Jacobson, B. O. (2004), Fundamentals of
 *      Fluid Film Lubrication, 2nd ed., Marcel Dekker.
 *  [2] Infinitely long bearing, full-Sommerfeld solution; short bearing (Ocvirk, 1952),
 *      half-Sommerfeld: Hamrock, Schmid & Jacobson (2004), ch. 9, journal bearings,
 *      analytical solutions (the formulas and the chapter number from memory).
 *  [3] Friction identity under the Raimondi–Boyd convention: follows from integrating
 *      the Poiseuille shear by parts (see reynolds.ts); Raimondi & Boyd (1958).
 */

/**
 * Petroff friction torque of a concentric journal, N·m:
 *   T = 4π²·μ·N·r³·L / c.
 * Valid for a lightly loaded (ε → 0), full film; it omits the load-carrying
 * pressure field, so it underestimates friction at higher eccentricity. Source [1].
 */
export function petroffTorque(mu: number, n: number, r: number, length: number, c: number): number {
  return (4 * Math.PI * Math.PI * mu * n * r * r * r * length) / c;
}

/**
 * Petroff friction coefficient, dimensionless:
 *   f = 2π²·(μN/P)·(r/c),  equivalently (r/c)·f = 2π²·S.
 * Source [1]; validity as petroffTorque.
 */
export function petroffFriction(mu: number, n: number, unitLoad: number, r: number, c: number): number {
  return 2 * Math.PI * Math.PI * ((mu * n) / unitLoad) * (r / c);
}

/**
 * Friction variable from S, ε and φ under the Raimondi–Boyd convention (Couette
 * shear over the whole circumference plus the Poiseuille term):
 *   (r/c)·f = 2π²·S/√(1−ε²) + (ε/2)·sin φ,  φ in radians here.
 * Exact for the isoviscous Reynolds solution with p = 0 at the film boundaries. Source [3].
 */
export function frictionVariableIdentity(sommerfeld: number, eps: number, attitudeRad: number): number {
  return (2 * Math.PI * Math.PI * sommerfeld) / Math.sqrt(1 - eps * eps) + (eps / 2) * Math.sin(attitudeRad);
}

/**
 * Infinitely long bearing, full-Sommerfeld (sub-ambient pressures kept):
 *   S = (2 + ε²)·√(1 − ε²) / (12·π²·ε),  φ = 90°.
 * Valid as L/D → ∞ (long-bearing theory is a fair approximation above L/D ≈ 1.5–2,
 * common practice). Source [2].
 */
export function longBearingSommerfeld(eps: number): number {
  return ((2 + eps * eps) * Math.sqrt(1 - eps * eps)) / (12 * Math.PI * Math.PI * eps);
}

/**
 * Short bearing (Ocvirk), half-Sommerfeld:
 *   S·(L/D)² = (1 − ε²)² / [π·ε·√(16ε² + π²(1 − ε²))].
 * Valid as L/D → 0 (fair up to L/D ≈ 0.25, common practice). Source [2].
 */
export function shortBearingSommerfeld(eps: number, lengthToDiameter: number): number {
  const e2 = eps * eps;
  return (
    ((1 - e2) * (1 - e2)) /
    (Math.PI * eps * Math.sqrt(16 * e2 + Math.PI * Math.PI * (1 - e2))) /
    (lengthToDiameter * lengthToDiameter)
  );
}

/** Short bearing attitude angle, degrees: tan φ = π·√(1 − ε²)/(4ε). Source [2]. */
export function shortBearingAttitudeDeg(eps: number): number {
  return (Math.atan2(Math.PI * Math.sqrt(1 - eps * eps), 4 * eps) * 180) / Math.PI;
}

/**
 * Short bearing side leakage variable Qs/(r·c·N·L) = 2π·ε (the difference between the
 * Couette inflow at θ = 0 and outflow at θ = π). Source [2].
 */
export function shortBearingSideFlowVariable(eps: number): number {
  return 2 * Math.PI * eps;
}
