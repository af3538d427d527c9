/**
 * A rubbing (boundary-lubricated or dry) thrust face: an annulus carrying the axial load,
 * the flange of a flanged bushing or a separate thrust washer. Pure functions, SI in and out.
 *
 * References
 *  [1] The Tribology Handbook, 2nd ed., M. J. Neale (ed.), Butterworth-Heinemann, 1995,
 *      sections A4–A5 (dry rubbing bearings: P, V, PV limits apply to thrust washers as to
 *      bushes; wear depth rate = K·P·V with factors for motion and environment).
 *  [2] J. F. Archard (1953), "Contact and rubbing of flat surfaces", J. Appl. Phys. 24,
 *      981–988: worn volume ∝ load × sliding distance; in dimensional form h = k·p·s.
 *  [3] Uniform-wear assumption of disc-clutch and collar-bearing theory: a face that has worn
 *      in has p·r constant, so the product p·V is the same at every radius (from memory;
 *      it is the standard textbook treatment of flat collar thrust bearings).
 */
import { makeCheck, type CheckRecord } from '../../core/check.js';
import type { BushingMaterial, BushingMaterialRow } from '../../data/bushing.js';

/** An annular thrust face: inner and outer diameter, m. */
export interface ThrustFace {
  inner: number;
  outer: number;
}

export interface RubbingThrustInput {
  /** Axial load, N. */
  axial: number;
  face: ThrustFace;
  /** Shaft speed, rev/s (rotating shaft). */
  speed?: number;
  /** Oscillating shaft: total swing angle rad, full cycles per second Hz. */
  oscillation?: { angle: number; frequency: number };
  /** Running time the face must last, h. */
  hours: number;
  /** Axial wear the face may lose, m. */
  wearAllowance: number;
  /** Motion and environment multipliers on the wear rate (dimensionless). */
  fMotion: number;
  fEnv: number;
}

export interface RubbingThrustResult {
  face: ThrustFace;
  /** Mean face pressure, Pa. */
  pressure: number;
  /** Mean sliding speed at the mean diameter, m/s. */
  velocity: number;
  /** p·V, Pa·m/s (equal at every radius once the face has worn in [3]). */
  pv: number;
  /** Hours to wear through the allowance at the typical wear factor. */
  lifeHours: number;
  /** Frictional power μ·Fa·V, W. */
  frictionPower: number;
  /** Checks, ids prefixed 'thrust-'. */
  checks: CheckRecord[];
}

/** The limits a thrust face is held against: a material row or an inline material (SI). */
type Material = BushingMaterialRow | BushingMaterial;

/** Face area A = π/4·(d_o² − d_i²), m²; d_o, d_i m. */
export function faceArea(f: ThrustFace): number {
  return (Math.PI / 4) * (f.outer * f.outer - f.inner * f.inner);
}

/** Mean diameter d_m = (d_o + d_i)/2, m. */
export function meanDiameter(f: ThrustFace): number {
  return (f.outer + f.inner) / 2;
}

/**
 * Mean sliding speed of the face at its mean diameter d_m, m/s: rotating V = π·d_m·n
 * (n rev/s); oscillating V = θ·d_m·f (θ total swing rad, f Hz), the same kinematics as the
 * radial bushing's mean sliding speed (src/calc/bushing/formulas.ts) at d_m.
 */
export function faceVelocity(
  f: ThrustFace,
  speed: number | undefined,
  oscillation: { angle: number; frequency: number } | undefined,
): number {
  const dm = meanDiameter(f);
  if (oscillation) return oscillation.angle * dm * oscillation.frequency;
  return Math.PI * dm * (speed ?? 0);
}

/** The figures a face's checks are held against (SI; life h). */
export interface ThrustFigures {
  pressure: number;
  velocity: number;
  pv: number;
  lifeHours: number;
}

/**
 * The checks of a thrust face against the material's limits (the material row's source) and
 * the life target: mean pressure, mean sliding speed, PV and wear life. All are limits.
 */
export function thrustChecks(fig: ThrustFigures, m: Material, hours: number): CheckRecord[] {
  const src = m.source;
  return [
    makeCheck('thrust-pressure', 'Thrust face mean pressure p = Fa/A', fig.pressure, m.maxPressure, 'Pa', 'max', src),
    makeCheck('thrust-velocity', 'Thrust face sliding speed at d_m', fig.velocity, m.maxVelocity, 'm/s', 'max', src),
    makeCheck('thrust-pv', 'Thrust face PV', fig.pv, m.maxPV, 'Pa*m/s', 'max', src),
    makeCheck(
      'thrust-wear-life',
      'Hours to wear the thrust face through the allowance (typical wear factor)',
      fig.lifeHours,
      hours,
      'h',
      'min',
      `Archard wear law, The Tribology Handbook 2nd ed. 1995, A5; wear factor: ${src}`,
    ),
  ];
}

/**
 * Axial wear depth per hour of the face, m/h: ḣ = f_m·f_e·k·p·V·3600, k m²/N, p Pa, V m/s at
 * d_m. After running-in p·V is uniform over the face [3], so p_mean·V(d_m) is the local rate
 * everywhere: the face wears flat. Valid in mild wear below the PV limit. [1], [2]
 */
export function thrustWearRate(k: number, p: number, V: number, fMotion: number, fEnv: number): number {
  return fMotion * fEnv * k * p * V * 3600;
}

/**
 * Check a rubbing thrust face.
 *   p = Fa / (π/4·(d_o² − d_i²))      mean face pressure, Pa
 *   V = π·d_m·n  (or θ·d_m·f)         mean sliding speed at d_m = (d_o + d_i)/2, m/s
 *   PV = p·V                           Pa·m/s
 *   t_life = δ / (f_m·f_e·k·p·V)       hours to wear through the allowance δ (m), k m²/N
 *   P_f = μ·Fa·V                       friction power, W (μ the material's boundary friction)
 * Fa N, n rev/s, θ rad, f Hz. Valid for a flat face fully supported by a square shoulder, in the
 * mild-wear regime (below the PV limit), steady or slowly varying axial load. Sources [1]–[3].
 * A face with no width (d_o ≤ d_i) has infinite pressure and fails; zero speed wears nothing.
 */
export function rubbingThrust(inp: RubbingThrustInput, m: Material): RubbingThrustResult {
  const area = faceArea(inp.face);
  const pressure = area > 0 ? inp.axial / area : inp.axial > 0 ? Infinity : 0;
  const velocity = faceVelocity(inp.face, inp.speed, inp.oscillation);
  const pv = pressure === 0 || velocity === 0 ? 0 : pressure * velocity;
  const rate = pv === 0 ? 0 : thrustWearRate(m.wearFactor, pressure, velocity, inp.fMotion, inp.fEnv);
  const lifeHours = rate === 0 ? Infinity : inp.wearAllowance / rate;
  const fig = { pressure, velocity, pv, lifeHours };
  return {
    face: inp.face,
    pressure,
    velocity,
    pv,
    lifeHours,
    frictionPower: m.friction * inp.axial * velocity,
    checks: thrustChecks(fig, m, inp.hours),
  };
}

/** Running clearance of a thrust washer's bore over the shaft, m: the larger of 0.5 mm and 1 % of d (common practice). */
export function washerBoreClearance(shaftDiameter: number): number {
  return Math.max(0.5e-3, 0.01 * shaftDiameter);
}

/**
 * Size a thrust face in the radial space. Inner diameter = shaft diameter + a running
 * clearance (washerBoreClearance, common practice), so the face rubs on its flat only; outer
 * diameter = the largest the radial space allows, `maxOuterDiameter` (the housing bore or
 * shoulder the face bears on), so the pressure is as low as the space permits. The same rule
 * serves the flange of a flanged bushing and a separate thrust washer; a caller that knows a
 * smaller shoulder passes it as `maxOuterDiameter`. Lengths m. Common practice.
 */
export function sizeThrustFace(
  shaftDiameter: number,
  maxOuterDiameter: number,
  clearance: number = washerBoreClearance(shaftDiameter),
): ThrustFace {
  return { inner: shaftDiameter + clearance, outer: maxOuterDiameter };
}

/**
 * Axial thickness of a thrust washer or bushing flange, m: the larger of 1.5 mm and 5 % of
 * the shaft diameter, in whole tenths of a millimetre (common practice for rubbing washers;
 * it counts in the axial space beside the bushing).
 */
export function washerThickness(shaftDiameter: number): number {
  return Math.ceil(Math.max(1.5e-3, 0.05 * shaftDiameter) * 1e4 - 1e-9) / 1e4;
}
