/**
 * Plain (boundary-lubricated) bushing formulas. Pure functions, SI in and out.
 *
 * References
 *  [1] The Tribology Handbook, 2nd ed., M. J. Neale (ed.), Butterworth-Heinemann, 1995,
 *      sections A4–A5 (dry rubbing bearings: P, V, PV limits; wear law depth rate = K·P·V
 *      with factors for motion and environment).
 *  [2] R. L. Mott, Machine Elements in Mechanical Design: boundary-lubricated bearings,
 *      P = F/(L·D), V = π·D·n, PV design.
 *  [3] J. F. Archard (1953), "Contact and rubbing of flat surfaces", J. Appl. Phys. 24,
 *      981–988: worn volume ∝ load × sliding distance; in dimensional form h = k·p·s.
 */

/**
 * Mean projected pressure P = F/(D·L), Pa. F radial load N, D bore m, L length m. [2]
 */
export function meanPressure(F: number, D: number, L: number): number {
  return F / (D * L);
}

/**
 * Peak pressure of a parabolic (half-cosine-like) axial-and-circumferential distribution,
 * p_peak = 4F/(π·D·L), Pa: a pressure that varies as cos θ over the loaded half of the
 * bore integrates to F with a peak 4/π times the mean projected pressure. Used for the
 * wear at the most loaded line. Valid for a conforming bore with small clearance. [1]
 */
export function peakPressure(F: number, D: number, L: number): number {
  return (4 * F) / (Math.PI * D * L);
}

/** Sliding speed of a rotating shaft V = π·D·N, m/s; D m, N rev/s. [2] */
export function rotatingSlidingSpeed(D: number, N: number): number {
  return Math.PI * D * N;
}

/**
 * Mean sliding speed of an oscillating shaft V = 2·θ·(D/2)·f = θ·D·f, m/s: in one full
 * cycle the surface travels the swing arc θ·D/2 out and back. θ total swing angle rad,
 * D m, f full cycles per second Hz. (Kinematics; [1] treats oscillation with a motion factor.)
 */
export function oscillatingSlidingSpeed(D: number, theta: number, f: number): number {
  return theta * D * f;
}

/**
 * Archard wear depth h = f_m·f_e·k·p·V·t, m. k dimensional wear factor m³/(N·m) = m²/N,
 * p contact pressure Pa, V sliding speed m/s, t running time s, f_m and f_e the motion and
 * environment multipliers (dimensionless). Valid in the mild-wear regime below the PV limit,
 * after running-in. [1], [3]
 */
export function wearDepth(k: number, p: number, V: number, t: number, fMotion = 1, fEnv = 1): number {
  return fMotion * fEnv * k * p * V * t;
}

/**
 * Frictional heat Q = f·F·V, W; f boundary friction coefficient, F N, V m/s. [1]
 */
export function frictionHeat(f: number, F: number, V: number): number {
  return f * F * V;
}

/**
 * Heat-dissipation resistance of a rubbing bearing in its housing, K·m²/W, taken from the
 * material's own published limits: at its PV limit PV_max (Pa·m/s) with friction μ the rubbing
 * surface reaches its maximum temperature T_max (°C) from a room at T_ref (°C), so
 *   R = (T_max − T_ref) / (μ·PV_max).
 * Valid for a bearing housed like the ones the limits were measured in (a metal housing, still
 * air). Source: the PV limit of a dry or boundary bearing is its thermal limit, The Tribology
 * Handbook, 2nd ed., 1995, A4 (from memory). Never negative.
 */
export function heatResistance(Tmax: number, Tref: number, mu: number, PVmax: number): number {
  return Math.max(0, Tmax - Tref) / (mu * PVmax);
}

/**
 * Steady temperature rise of a dry or boundary-lubricated rubbing surface, K:
 *   ΔT = R·μ·P·V
 * μ friction coefficient, P·V Pa·m/s (μ·P·V is the frictional heat per unit projected area,
 * W/m²), R the heat-dissipation resistance K·m²/W (see heatResistance). Linear in PV: holds up
 * to the PV limit; beyond it the surface is too hot and the figure only says so.
 * Source: The Tribology Handbook, 2nd ed., Neale (ed.), 1995, A4, dry-bearing temperature
 * rise (form from memory).
 */
export function dryTemperatureRise(R: number, mu: number, pv: number): number {
  return R * mu * pv;
}
