import { density, dynamicViscosity } from '../lubricant.js';
import { THERMAL_CEILING_C, THERMAL_SHARE, THERMAL_TOLERANCE_K, type Fluid } from '../journal/operating-point.js';
import { padAt, padLoadAt, padTable, tiltingTaper, type PadPoint } from './pad-table.js';

/**
 * A hydrodynamic pad thrust bearing: N sector pads on an annulus (inner diameter d1, outer
 * d2, pad angle β each), fixed tapered land or tilting pad, carrying an axial load Fa at shaft
 * speed n. SI in and out: m, N, rev/s, Pa·s, W, m³/s; temperatures °C.
 *
 * Each sector pad is taken as the rectangular pad of its mean dimensions (common practice at
 * concept stage, from memory: the sector's curvature changes W* by a few per cent for
 * r2/r1 ≤ 2):
 *   B = r_m·β (length in the sliding direction), L = r2 − r1 (width), U = 2π·n·r_m,
 *   r_m = (r1 + r2)/2, pad area A = B·L = β·(r2² − r1²)/2, unit load p = Fa/(N·A).
 * Load per pad W = Fa/N. With the dimensionless pad of pad-table.ts at L/B:
 *   W = W*(K)·μ·U·B²·L / h_min²            (load matching, gives h_min)
 *   tilting pad:      K fixed by the pivot (centre of pressure on the pivot): h_min in closed form;
 *   fixed taper δ:    K = δ/h_min, solved for h_min by bisection in ln h_min (W falls as h_min rises);
 *   F = F*(K)·μ·U·B·L / h_min,  H = N·F·U   (power loss, W; f = F/W)
 *   Q_in = Q*_in·U·h_min·L per pad,  Q_s = (Q_s/Q_in)·Q_in
 *   p_max = P_max·μ·U·B / h_min²
 * Thermal balance per pad (adiabatic: all the pad's friction heat leaves with its oil; the
 * side leakage at the mean temperature, the rest at the outlet temperature; fresh oil at T_in
 * at every pad inlet, i.e. no hot-oil carry-over from the groove — the same model as the
 * journal's, Raimondi & Boyd 1958 Part III, from memory):
 *   F·U = ρ·c_p·ΔT·(Q_in − Q_s/2),  T_eff = T_in + k·ΔT (k = THERMAL_SHARE = 0.5),  T_max = T_in + ΔT,
 * μ = μ(T_eff) by the Walther law (lubricant.ts), the fixed point found by Illinois false position to
 * THERMAL_TOLERANCE_K; no equilibrium below THERMAL_CEILING_C is flagged `thermalRunaway`.
 *
 * Validity: laminar, isoviscous film at T_eff, rigid flat pads, runner square to the axis so
 * that every pad carries Fa/N, no churning loss in the grooves (it adds to the power loss at
 * high speed). Sources: pad.ts.
 */

export interface PadRing {
  /** Inner and outer diameter of the pads, m. */
  inner: number;
  outer: number;
  /** Number of pads. */
  pads: number;
  /** Angular extent of one pad, rad. */
  padAngle: number;
}

/** Fixed tapered land of taper depth δ = h_in − h_min (m), or a tilting pad pivoted at `pivot`·B. */
export type PadForm = { kind: 'tapered'; taperDepth: number } | { kind: 'tilting'; pivot: number };

export interface PadBearingInput {
  ring: PadRing;
  /** How the film's taper is set: a form, or a fixed K (used to design the taper depth). */
  form: PadForm | { kind: 'taper-ratio'; taper: number };
  /** Axial load Fa, N (> 0), and speed n, rev/s (> 0). */
  load: number;
  speed: number;
  fluid: Fluid;
  /** Oil temperature at the pad inlet, °C. */
  inletTemperature: number;
}

export interface PadBearingResult {
  /** Equivalent rectangular pad: length B, width L, m, and L/B. */
  padLength: number;
  padWidth: number;
  widthToLength: number;
  /** Mean sliding speed U at r_m, m/s. */
  velocity: number;
  /** Unit load Fa/(N·A), Pa. */
  unitLoad: number;
  viscosity: number;
  /** K = h_in/h_min − 1, and the films h_min, h_in, m. */
  taper: number;
  minFilmThickness: number;
  inletFilmThickness: number;
  frictionCoefficient: number;
  /** Power loss of all pads, W. */
  powerLoss: number;
  /** Oil drawn in and side leakage over all pads, m³/s. */
  flow: number;
  sideFlow: number;
  peakPressure: number;
  temperatureRise: number;
  effectiveTemperature: number;
  maxTemperature: number;
  extrapolated: boolean;
  thermalRunaway: boolean;
}

/** Mean-dimension rectangle of a sector pad: B, L, r_m, m. */
export function padRectangle(ring: PadRing): { length: number; width: number; meanRadius: number } {
  const r1 = ring.inner / 2;
  const r2 = ring.outer / 2;
  const meanRadius = (r1 + r2) / 2;
  return { length: meanRadius * ring.padAngle, width: r2 - r1, meanRadius };
}

/** The film at viscosity μ: K and h_min, with the pad's dimensionless state. */
function film(
  input: PadBearingInput,
  mu: number,
  U: number,
  B: number,
  L: number,
  tableLB: number,
): { h: number; pt: PadPoint } {
  const t = padTable(tableLB);
  const w = input.load / input.ring.pads;
  const scale = (mu * U * B * B * L) / w; // h² = W*·scale
  const form = input.form;
  if (form.kind !== 'tapered') {
    const taper = form.kind === 'tilting' ? tiltingTaper(t, form.pivot) : form.taper;
    const pt = padAt(t, taper);
    return { h: Math.sqrt(pt.load * scale), pt };
  }
  const delta = form.taperDepth;
  // g(ln h) = W*(δ/h)·scale − h², decreasing in h; bracket over the table's K range.
  const residual = (h: number): number => padLoadAt(t, delta / h) * scale - h * h;
  const kMax = t.rows[t.rows.length - 1]!.taper;
  const kMin = t.rows[0]!.taper;
  let lo = Math.log(delta / kMax);
  if (residual(Math.exp(lo)) < 0) {
    const h = Math.exp(lo);
    return { h, pt: { ...padAt(t, kMax), extrapolated: true } };
  }
  let hi = Math.log(delta / kMin);
  // Beyond K_min, W* ∝ K: W·h² ∝ δ/h, so h grows as the cube root; widen until bracketed.
  // A vanishing load (a rounding residue) never brackets: stop at a film 2^60 times the table's
  // thickest and call it extrapolated rather than letting K underflow to zero.
  for (let doublings = 0; residual(Math.exp(hi)) > 0; doublings++) {
    if (doublings >= 60) return { h: Math.exp(hi), pt: { ...padAt(t, delta / Math.exp(hi)), extrapolated: true } };
    hi += Math.log(2);
  }
  while (hi - lo > 1e-7) {
    const mid = 0.5 * (lo + hi);
    if (residual(Math.exp(mid)) > 0) lo = mid;
    else hi = mid;
  }
  const h = Math.exp(0.5 * (lo + hi));
  return { h, pt: padAt(t, delta / h) };
}

function validate(input: PadBearingInput): void {
  const { ring, load, speed } = input;
  const positive: [string, number][] = [
    ['inner diameter', ring.inner],
    ['pad angle', ring.padAngle],
    ['load', load],
    ['speed', speed],
  ];
  for (const [name, v] of positive)
    if (!(v > 0 && Number.isFinite(v))) throw new Error(`thrust pad: ${name} must be positive and finite, got ${v}`);
  if (!(ring.outer > ring.inner))
    throw new Error(`thrust pad: outer diameter ${ring.outer} m must exceed inner ${ring.inner} m`);
  if (!(Number.isInteger(ring.pads) && ring.pads >= 1))
    throw new Error(`thrust pad: pads must be a whole number ≥ 1, got ${ring.pads}`);
  if (ring.pads * ring.padAngle > 2 * Math.PI + 1e-9)
    throw new Error(`thrust pad: ${ring.pads} pads of ${ring.padAngle} rad exceed the full circle`);
}

/** The bearing at viscosity μ (density ρ, specific heat c_p): every figure but the converged temperature. */
function stateAt(input: PadBearingInput, mu: number, rho: number, cp: number): PadBearingResult {
  const { length: B, width: L, meanRadius } = padRectangle(input.ring);
  const U = 2 * Math.PI * input.speed * meanRadius;
  const n = input.ring.pads;
  const { h, pt } = film(input, mu, U, B, L, L / B);
  const w = input.load / n;
  const friction = (pt.friction * mu * U * B * L) / h;
  const qIn = pt.inletFlow * U * h * L;
  const qSide = pt.sideFlow * qIn;
  const rise = (friction * U) / (rho * cp * (qIn - qSide / 2));
  return {
    padLength: B,
    padWidth: L,
    widthToLength: L / B,
    velocity: U,
    unitLoad: w / (B * L),
    viscosity: mu,
    taper: pt.taper,
    minFilmThickness: h,
    inletFilmThickness: h * (1 + pt.taper),
    frictionCoefficient: friction / w,
    powerLoss: n * friction * U,
    flow: n * qIn,
    sideFlow: n * qSide,
    peakPressure: (pt.peakPressure * mu * U * B) / (h * h),
    temperatureRise: rise,
    effectiveTemperature: input.inletTemperature + THERMAL_SHARE * rise,
    maxTemperature: input.inletTemperature + rise,
    extrapolated: pt.extrapolated,
    thermalRunaway: false,
  };
}

/**
 * The pad thrust bearing at its thermal equilibrium (oil grade) or at the fixed viscosity.
 * Throws on input it cannot evaluate (naming the quantity).
 */
export function padBearing(input: PadBearingInput): PadBearingResult {
  validate(input);
  const fluid = input.fluid;
  if (fluid.kind === 'fixed') return stateAt(input, fluid.viscosity, fluid.density, fluid.specificHeat);
  const tIn = input.inletTemperature;
  const at = (t: number): PadBearingResult =>
    stateAt(input, dynamicViscosity(fluid.oil, t), density(fluid.oil, t), fluid.oil.specificHeat);
  // g(T) = T_eff(μ(T)) − T falls as T rises (a hotter oil is thinner and heats less): bracket
  // [T_in, ceiling], then the Illinois false-position method as the journal's operating point.
  const g = (r: PadBearingResult, t: number): number => r.effectiveTemperature - t;
  let a = tIn;
  let ra = at(a);
  let ga = g(ra, a);
  let b = THERMAL_CEILING_C;
  let rb = at(b);
  let gb = g(rb, b);
  if (gb > 0) return { ...rb, thermalRunaway: true };
  let side = 0;
  for (let it = 0; it < 200; it++) {
    if (b - a < THERMAL_TOLERANCE_K || Math.min(Math.abs(ga), Math.abs(gb)) < THERMAL_TOLERANCE_K / 10)
      return Math.abs(ga) < Math.abs(gb) ? ra : rb;
    let t = (a * gb - b * ga) / (gb - ga);
    if (!(t > a && t < b)) t = 0.5 * (a + b);
    const rt = at(t);
    const gt = g(rt, t);
    if (gt > 0) {
      [a, ra, ga] = [t, rt, gt];
      if (side === -1) gb /= 2;
      side = -1;
    } else {
      [b, rb, gb] = [t, rt, gt];
      if (side === 1) ga /= 2;
      side = 1;
    }
  }
  throw new Error(`thrust pad: thermal balance did not converge to ${THERMAL_TOLERANCE_K} K in 200 steps`);
}
