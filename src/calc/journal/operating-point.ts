import { density, dynamicViscosity, type OilGrade } from '../lubricant.js';
import { petroffFriction } from './closed-forms.js';
import {
  eccentricityFromSommerfeld,
  pointAtEccentricity,
  thermalVariablesAt,
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
  checkViscosity(mu);
  const r = g.diameter / 2;
  const c = g.radialClearance;
  const unitLoad = w / (g.length * g.diameter);
  const s = sommerfeldNumber(r, c, unitLoad, mu, n);
  const eps = eccentricityFromSommerfeld(table, s);
  const pt = pointAtEccentricity(table, eps);
  const f = pt.frictionVariable * (c / r);
  const torque = f * w * r;
  const power = torque * 2 * Math.PI * n;
  const flow = pt.flowVariable * r * c * n * g.length;
  const sideFlow = pt.sideFlowRatio * flow;
  const rise = temperatureRise(unitLoad, pt.frictionVariable, pt.flowVariable, pt.sideFlowRatio, rho, cp);
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

/** S = (r/c)²·μN/P: r, c m; P Pa; μ Pa·s; N rev/s. */
function sommerfeldNumber(r: number, c: number, unitLoad: number, mu: number, n: number): number {
  return (r / c) ** 2 * ((mu * n) / unitLoad);
}

/** ΔT = 4π·P·[(r/c)f] / (ρ·cp·[Q/(rcNL)]·(1 − ½·Qs/Q)), K (module comment): P Pa, ρ kg/m³, cp J/(kg·K). */
function temperatureRise(
  unitLoad: number,
  frictionVariable: number,
  flowVariable: number,
  sideFlowRatio: number,
  rho: number,
  cp: number,
): number {
  return (4 * Math.PI * unitLoad * frictionVariable) / (rho * cp * flowVariable * (1 - 0.5 * sideFlowRatio));
}

function checkViscosity(mu: number): void {
  if (!(mu > 0 && Number.isFinite(mu)))
    throw new Error(`journal: viscosity must be positive and finite, got ${mu} Pa·s`);
}

function positive(name: string, v: number): void {
  if (!(v > 0 && Number.isFinite(v))) throw new Error(`journal: ${name} must be positive and finite, got ${v}`);
}

function validate(input: OperatingInput): void {
  const g = input.geometry;
  positive('diameter', g.diameter);
  positive('length', g.length);
  positive('radial clearance', g.radialClearance);
  positive('load', input.load);
  positive('speed', input.speed);
  if (!Number.isFinite(input.inletTemperature))
    throw new Error(`journal: inlet temperature must be finite, got ${input.inletTemperature}`);
}

/** Where the thermal variables of each step of the balance are written (no point built per step). */
const thermal = new Float64Array(3);

/**
 * The effective film temperature T_in + k·ΔT (°C) of the load matched at the viscosity and density
 * of the oil at t (°C): the effectiveTemperature of matchLoad at that oil state, without its result.
 */
function effectiveTemperatureAt(table: JournalTable, input: OperatingInput, oil: OilGrade, t: number): number {
  const mu = dynamicViscosity(oil, t);
  checkViscosity(mu);
  const g = input.geometry;
  const r = g.diameter / 2;
  const c = g.radialClearance;
  const unitLoad = input.load / (g.length * g.diameter);
  const eps = eccentricityFromSommerfeld(table, sommerfeldNumber(r, c, unitLoad, mu, input.speed));
  thermalVariablesAt(table, eps, thermal);
  const rise = temperatureRise(unitLoad, thermal[0]!, thermal[1]!, thermal[2]!, density(oil, t), oil.specificHeat);
  return input.inletTemperature + THERMAL_SHARE * rise;
}

/** matchLoad at the oil's state at t (°C), with the balance's outcome: runaway and the evaluations counted. */
function thermalResult(
  table: JournalTable,
  input: OperatingInput,
  oil: OilGrade,
  t: number,
  runaway: boolean,
  count: number,
): OperatingResult {
  const res = matchLoad(table, input, dynamicViscosity(oil, t), density(oil, t), oil.specificHeat);
  res.thermalRunaway = runaway;
  res.thermalIterations = count;
  return res;
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
  const oil = fluid.oil;
  // The search follows T_eff(T) alone (effectiveTemperatureAt: no result object per step); the
  // result is built once, at the temperature it settles on (matchLoad there gives the numbers the
  // search saw). g(T) = T_in + k·ΔT(T) − T: positive at T_in (ΔT > 0), decreasing as T rises;
  // ea, eb are T_eff at a, b.
  if (!(tIn < THERMAL_CEILING_C))
    throw new Error(
      `journal: inlet temperature ${tIn} °C is at or above the ${THERMAL_CEILING_C} °C ceiling of the thermal balance`,
    );
  let a = tIn;
  let ea = effectiveTemperatureAt(table, input, oil, a);
  let ga = ea - a;
  let span = Math.max(10, ga * 2);
  let b = Math.min(THERMAL_CEILING_C, a + span);
  let eb = effectiveTemperatureAt(table, input, oil, b);
  let gb = eb - b;
  let count = 2;
  // Expand the bracket until the sign changes, up to the ceiling.
  while (gb > 0) {
    if (b >= THERMAL_CEILING_C) return thermalResult(table, input, oil, b, true, count);
    a = b;
    ea = eb;
    ga = gb;
    span *= 2;
    b = Math.min(THERMAL_CEILING_C, tIn + span);
    eb = effectiveTemperatureAt(table, input, oil, b);
    gb = eb - b;
    count++;
  }
  // ga, gb may be halved by the Illinois rule; the residuals at a, b are recomputed.
  let side = 0;
  for (let it = 0; it < 200; it++) {
    const resA = Math.abs(ea - a);
    const resB = Math.abs(eb - b);
    if (b - a < THERMAL_TOLERANCE_K || Math.min(resA, resB) < THERMAL_TOLERANCE_K / 10)
      return thermalResult(table, input, oil, resA < resB ? a : b, false, count);
    let t = (a * gb - b * ga) / (gb - ga);
    if (!(t > a && t < b)) t = 0.5 * (a + b);
    const et = effectiveTemperatureAt(table, input, oil, t);
    const gt = et - t;
    count++;
    if (gt > 0) {
      a = t;
      ea = et;
      ga = gt;
      if (side === -1) gb /= 2;
      side = -1;
    } else {
      b = t;
      eb = et;
      gb = gt;
      if (side === 1) ga /= 2;
      side = 1;
    }
  }
  throw new Error(
    `journal: thermal balance did not converge to ${THERMAL_TOLERANCE_K} K in 200 steps (bracket ${a.toFixed(3)}–${b.toFixed(3)} °C)`,
  );
}
