/**
 * Speed, friction and grease-life figures of a rolling bearing.
 *
 * References
 * [1] Speed factor n·dm against limits per lubrication (common practice; limits in
 *     data/rolling-factors.json).
 * [2] Friction torque with a constant coefficient referred to the bore,
 *     M = μ·P·d/2 (common practice, from memory; coefficients in data/rolling-factors.json).
 * [3] Grease relubrication interval t_f = k_f·[14·10⁶/(n·√d) − 4·d] h, n r/min, d bore mm,
 *     halved for each 15 °C above 70 °C (a rolling-bearing maker's general technical guide
 *     on grease relubrication, seen; not named here).
 * [4] Small-swing criterion for oscillating bearings: the angle a ring must swing for
 *     each rolling element to roll onto the track of its neighbour (kinematics of the
 *     cage; criterion common practice).
 */

/**
 * Speed factor n·dm, mm·r/min [1]. n rev/s, dm pitch diameter m; the product is
 * returned in the trade's unit (dm in mm times n in r/min).
 */
export function speedFactor(n: number, dm: number): number {
  return Math.max(0, n) * 60 * dm * 1000;
}

/**
 * Friction torque, N·m [2]: M = μ·P·d/2. μ friction coefficient referred to the bore
 * (dimensionless), P load, N, d bore, m. Valid for moderate loads (P ≈ 0.1·C) and
 * normal lubrication; it ignores the load-independent (viscous) share, which dominates
 * at light load and high speed.
 */
export function frictionTorque(mu: number, P: number, d: number): number {
  return (mu * Math.max(0, P) * d) / 2;
}

/** Friction power, W: N_R = M·ω = M·2π·n, M in N·m, n rev/s. */
export function frictionPower(M: number, n: number): number {
  return M * 2 * Math.PI * Math.max(0, n);
}

/**
 * Grease relubrication interval, hours [3]:
 *   t_f = k_f·[14·10⁶/(n·√d) − 4·d] · 0.5^(max(0, T − 70)/15)
 * n r/min inside (given in rev/s), d bore mm inside (given in m), k_f type factor,
 * T operating temperature, °C. Returns null when n ≤ 0 (not defined) and 0 when the
 * bracket is not positive (speed too high for grease by this rule: the caller warns).
 */
export function relubricationInterval(n: number, d: number, kf: number, tC: number): number | null {
  if (!(n > 0) || !(d > 0)) return null;
  const rpm = n * 60;
  const dMm = d * 1000;
  const base = kf * (14e6 / (rpm * Math.sqrt(dMm)) - 4 * dMm);
  if (!(base > 0)) return 0;
  return base * Math.pow(0.5, Math.max(0, tC - 70) / 15);
}

/**
 * Smallest swing angle, rad, for every rolling element of an oscillating bearing to
 * roll onto the track of its neighbour on both rings [4]. With the inner ring swinging
 * through θ and the outer ring still, the cage turns θ·(1 − γ)/2 relative to the outer
 * ring and θ·(1 + γ)/2 relative to the inner ring, γ = Dw/dm. An element's contact
 * sweeps one element pitch 2π/Z on the outer ring when
 *   θ_crit = 2·(2π/Z) / (1 − γ)
 * (the inner ring needs the smaller 2·(2π/Z)/(1 + γ)). Z elements, Dw element
 * diameter m, dm pitch diameter m. Below θ_crit the same patches of track are loaded
 * every cycle: false brinelling and fretting are the risk and the equivalent-speed
 * life estimate is not reliable.
 */
export function criticalSwingAngle(Z: number, Dw: number, dm: number): number {
  const gamma = Dw / dm;
  return (2 * ((2 * Math.PI) / Z)) / (1 - gamma);
}
