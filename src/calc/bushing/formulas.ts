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
 * Lumped steady temperature rise ΔT = Q/(h·A), K, with A = a·π·D·L the surface that sheds
 * the heat (housing and shaft near the bushing) as a multiple a of the bore area, and h a
 * combined convection-and-radiation coefficient W/(m²·K). A one-node estimate: valid for
 * a bushing in a compact housing in still air, steady running; common practice.
 */
export function temperatureRise(Q: number, h: number, areaFactor: number, D: number, L: number): number {
  return Q / (h * areaFactor * Math.PI * D * L);
}
