import { density, dynamicViscosity, type OilGrade } from '../lubricant.js';
import { petroffFriction } from './closed-forms.js';
import {
  eccentricityFromSommerfeld,
  pointAtEccentricity,
  type DimensionlessPoint,
  type JournalTable,
} from './table.js';

/**
 * Operating point of a plain full journal bearing: load matching (the eccentricity
 * ratio that carries the load) and the adiabatic thermal balance.
 *
 * Load matching (Raimondi & Boyd, 1958): with P = W/(L·D) and S = (r/c)²·μN/P, the
 * table of the bearing's L/D is inverted for ε (table.ts: bisection on a monotone
 * interpolant, robust for any S > 0). Then
 *   h0 = c·(1 − ε)                       minimum film thickness, m
 *   f  = [(r/c)f]·(c/r)                  friction coefficient, 1
 *   T  = f·W·r                           friction torque, N·m
 *   H  = T·ω = T·2πN                     power loss, W
 *   Q  = [Q/(rcNL)]·r·c·N·L              flow drawn in at the maximum film, m³/s
 *   Qs = (Qs/Q)·Q                        side leakage, m³/s
 *   pmax = P/(P/pmax)                    peak film pressure, Pa
 *
 * Thermal balance (adiabatic: all friction heat leaves with the oil). Following the
 * practice of Raimondi & Boyd (1958, Part III; from memory, and common practice since):
 * oil enters at T_in, the side leakage Qs leaves at the mean temperature T_in + ΔT/2 and
 * the remainder Q − Qs at T_in + ΔT, so
 *   H = ρ·cp·ΔT·(Q − Qs/2)   ⇒   ΔT = 4π·P·[(r/c)f] / (ρ·cp·[Q/(rcNL)]·(1 − ½·Qs/Q)),
 * the effective film temperature is T_eff = T_in + k·ΔT with k = 0.5 (the mean of inlet
 * and outlet), and the maximum temperature estimate is T_max = T_in + ΔT (the outlet).
 * μ = μ(T_eff) by the Walther law (lubricant.ts). The fixed point T = T_in + k·ΔT(μ(T))
 * is found by bracketing and the Illinois false-position method; converged when the
 * bracket is narrower than 0.01 K (THERMAL_TOLERANCE_K). Failure to converge throws: no
 * unconverged numbers are returned. No equilibrium below THERMAL_CEILING_C is reported as
 * thermal runaway (flagged, temperatures as lower bounds), not as a number.
 *
 * Symbols: W radial load N; N speed rev/s; μ Pa·s; r, c, L, D m; ρ kg/m³; cp J/(kg·K);
 * temperatures °C (differences K).
 * Validity: isoviscous film at the effective temperature, laminar flow, rigid aligned
 * journal, full 360° bearing fed at the maximum film at ambient pressure.
 */

export const THERMAL_SHARE = 0.5;
export const THERMAL_TOLERANCE_K = 0.01;
/**
 * Ceiling of the effective-temperature search, °C. Mineral oils flash at about
 * 200–250 °C (from memory) and the Walther law is an extrapolation far beyond 100 °C, so
 * no equilibrium is sought above this: when the balance still lacks one at the ceiling,
 * the point is evaluated at the ceiling viscosity and flagged `thermalRunaway` (its
 * temperatures are then lower bounds of a bearing that would not reach equilibrium).
 */
export const THERMAL_CEILING_C = 250;

export interface Geometry {
  /** Journal diameter D, m. */
  diameter: number;
  /** Bearing length L, m. */
  length: number;
  /** Radial clearance c, m. */
  radialClearance: number;
}

/** The lubricant seen by the film: an oil grade (viscosity from temperature) or a fixed viscosity. */
export type Fluid =
  | { kind: 'oil'; oil: OilGrade }
  | {
      kind: 'fixed';
      /** Dynamic viscosity, Pa·s. */
      viscosity: number;
      /** Density, kg/m³, and specific heat, J/(kg·K), used for the temperature-rise estimate. */
      density: number;
      specificHeat: number;
    };

export interface OperatingInput {
  geometry: Geometry;
  /** Radial load W, N (> 0). */
  load: number;
  /** Shaft speed N, rev/s (> 0). */
  speed: number;
  fluid: Fluid;
  /** Oil inlet temperature, °C. */
  inletTemperature: number;
}

export interface OperatingResult {
  load: number;
  speed: number;
  /** Mean unit load P = W/(L·D), Pa. */
  unitLoad: number;
  viscosity: number;
  sommerfeld: number;
  eccentricityRatio: number;
  minFilmThickness: number;
  attitudeDeg: number;
  frictionCoefficient: number;
  petroffFrictionCoefficient: number;
  frictionTorque: number;
  powerLoss: number;
  flow: number;
  sideFlow: number;
  peakPressure: number;
  /** Angle of the peak pressure from the maximum-film line, in the direction of rotation, deg. */
  peakAngleDeg: number;
  filmEndDeg: number;
  temperatureRise: number;
  effectiveTemperature: number;
  maxTemperature: number;
  densityUsed: number;
  specificHeatUsed: number;
  /** True when ε fell beyond the table (order-of-magnitude figures). */
  extrapolated: boolean;
  /** True when no thermal equilibrium exists below THERMAL_CEILING_C (temperatures are lower bounds). */
  thermalRunaway: boolean;
  thermalIterations: number;
  point: DimensionlessPoint;
}

function viscosityAt(fluid: Fluid, tC: number): number {
  return fluid.kind === 'fixed' ? fluid.viscosity : dynamicViscosity(fluid.oil, tC);
}

/**
 * Isothermal load matching at viscosity μ: the state of the bearing carrying W at N.
 * The temperature fields are filled from the heat balance at that μ (ΔT, T_in + k·ΔT,
 * T_in + ΔT) but μ is not updated.
 */
export function matchLoad(
  table: JournalTable,
  input: OperatingInput,
  mu: number,
  rho: number,
  cp: number,
): OperatingResult {
  const { geometry: g, load: w, speed: n } = input;
  validate(input);
  if (!(mu > 0 && Number.isFinite(mu)))
    throw new Error(`journal: viscosity must be positive and finite, got ${mu} Pa·s`);
  const r = g.diameter / 2;
  const c = g.radialClearance;
  const unitLoad = w / (g.length * g.diameter);
  const s = (r / c) ** 2 * ((mu * n) / unitLoad);
  const eps = eccentricityFromSommerfeld(table, s);
  const pt = pointAtEccentricity(table, eps);
  const f = pt.frictionVariable * (c / r);
  const torque = f * w * r;
  const power = torque * 2 * Math.PI * n;
  const flow = pt.flowVariable * r * c * n * g.length;
  const sideFlow = pt.sideFlowRatio * flow;
  const rise =
    (4 * Math.PI * unitLoad * pt.frictionVariable) / (rho * cp * pt.flowVariable * (1 - 0.5 * pt.sideFlowRatio));
  return {
    load: w,
    speed: n,
    unitLoad,
    viscosity: mu,
    sommerfeld: s,
    eccentricityRatio: eps,
    minFilmThickness: c * (1 - eps),
    attitudeDeg: pt.attitudeDeg,
    frictionCoefficient: f,
    petroffFrictionCoefficient: petroffFriction(mu, n, unitLoad, r, c),
    frictionTorque: torque,
    powerLoss: power,
    flow,
    sideFlow,
    peakPressure: unitLoad / pt.pressureRatio,
    peakAngleDeg: pt.peakAngleDeg,
    filmEndDeg: pt.filmEndDeg,
    temperatureRise: rise,
    effectiveTemperature: input.inletTemperature + THERMAL_SHARE * rise,
    maxTemperature: input.inletTemperature + rise,
    densityUsed: rho,
    specificHeatUsed: cp,
    extrapolated: pt.extrapolated,
    thermalRunaway: false,
    thermalIterations: 0,
    point: pt,
  };
}

function validate(input: OperatingInput): void {
  const { geometry: g, load, speed } = input;
  const positive: [string, number][] = [
    ['diameter', g.diameter],
    ['length', g.length],
    ['radial clearance', g.radialClearance],
    ['load', load],
    ['speed', speed],
  ];
  for (const [name, v] of positive)
    if (!(v > 0 && Number.isFinite(v))) throw new Error(`journal: ${name} must be positive and finite, got ${v}`);
  if (!Number.isFinite(input.inletTemperature))
    throw new Error(`journal: inlet temperature must be finite, got ${input.inletTemperature}`);
}

/**
 * Operating point with the thermal balance (oil grade) or at the fixed viscosity.
 * Throws when the temperature iteration cannot be bracketed or does not converge.
 */
export function operatingPoint(table: JournalTable, input: OperatingInput): OperatingResult {
  validate(input);
  const fluid = input.fluid;
  if (fluid.kind === 'fixed') return matchLoad(table, input, fluid.viscosity, fluid.density, fluid.specificHeat);

  const tIn = input.inletTemperature;
  const evalAt = (t: number): OperatingResult =>
    matchLoad(table, input, viscosityAt(fluid, t), density(fluid.oil, t), fluid.oil.specificHeat);
  // g(T) = T_in + k·ΔT(T) − T: positive at T_in (ΔT > 0), decreasing as T rises.
  const gOf = (res: OperatingResult, t: number): number => res.effectiveTemperature - t;

  if (!(tIn < THERMAL_CEILING_C))
    throw new Error(
      `journal: inlet temperature ${tIn} °C is at or above the ${THERMAL_CEILING_C} °C ceiling of the thermal balance`,
    );
  let a = tIn;
  let ra = evalAt(a);
  let ga = gOf(ra, a);
  let span = Math.max(10, ga * 2);
  let b = Math.min(THERMAL_CEILING_C, a + span);
  let rb = evalAt(b);
  let gb = gOf(rb, b);
  let count = 2;
  // Expand the bracket until the sign changes, up to the ceiling.
  while (gb > 0) {
    if (b >= THERMAL_CEILING_C) return { ...rb, thermalRunaway: true, thermalIterations: count };
    a = b;
    ra = rb;
    ga = gb;
    span *= 2;
    b = Math.min(THERMAL_CEILING_C, tIn + span);
    rb = evalAt(b);
    gb = gOf(rb, b);
    count++;
  }
  // ga, gb may be halved by the Illinois rule; the residuals of ra, rb are recomputed.
  let side = 0;
  for (let it = 0; it < 200; it++) {
    const resA = Math.abs(gOf(ra, a));
    const resB = Math.abs(gOf(rb, b));
    if (b - a < THERMAL_TOLERANCE_K || Math.min(resA, resB) < THERMAL_TOLERANCE_K / 10) {
      const res = resA < resB ? ra : rb;
      return { ...res, thermalIterations: count };
    }
    let t = (a * gb - b * ga) / (gb - ga);
    if (!(t > a && t < b)) t = 0.5 * (a + b);
    const rt = evalAt(t);
    const gt = gOf(rt, t);
    count++;
    if (gt > 0) {
      a = t;
      ra = rt;
      ga = gt;
      if (side === -1) gb /= 2;
      side = -1;
    } else {
      b = t;
      rb = rt;
      gb = gt;
      if (side === 1) ga /= 2;
      side = 1;
    }
  }
  throw new Error(
    `journal: thermal balance did not converge to ${THERMAL_TOLERANCE_K} K in 200 steps (bracket ${a.toFixed(3)}–${b.toFixed(3)} °C)`,
  );
}
