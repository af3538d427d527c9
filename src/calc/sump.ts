/**
 * Oil-bath (sump) heat balance: the one bath temperature of a case whose support runs in an
 * oil bath, from the friction loss of the option that runs in it and the heat its housing
 * gives to the air.
 *
 *   T_bath = T_amb + P_loss(T_bath) / (h·A)
 *
 * T_bath bath temperature, °C; T_amb ambient temperature, °C; P_loss the option's friction
 * loss, W, a function of the bath temperature (the oil's viscosity falls as it warms, and the
 * loss with it); h combined convection and radiation coefficient of the housing surface,
 * W/(m²·K); A its dissipating area, m².
 *
 * Housing (our assumption, stated in data/lubricants.json → sump): a cylinder around the
 * support, of diameter D_h = k_D·D_room and length L_h = k_L·L_room (D_room the case's
 * space.maxOuterDiameter, L_room its space.maxLength, m), of which the share s gives its heat
 * to the air: A = s·(π·D_h·L_h + 2·π·D_h²/4).
 *
 * Source of h: about 15–20 W/(m²·K) for a housing in still air (Neale, The Tribology
 * Handbook, 2nd ed., 1995, section on bearing housings; from memory); the lower end is taken.
 * Validity: a housing in still air with no cooling coil or fan; heat carried away through the
 * shaft and the frame is not counted (the balance errs hot). Moving air may double h.
 *
 * Solution: P_loss(T) falls as T rises, so the excess g(T) = (T − T_amb)·h·A − P_loss(T) rises
 * with T, with slope at least h·A, and has one root T*. Two consequences bound the search:
 * T* ≤ T_amb + P_loss(T_amb)/(h·A) (the loss at ambient is the largest), and at any T,
 * |T − T*| ≤ |g(T)|/(h·A). The root is found inside that bracket by inverse quadratic interpolation
 * through the last three temperatures tried (as in Brent, R. P. (1973), Algorithms for
 * Minimization without Derivatives, Prentice-Hall, ch. 4; from memory), a step that would
 * leave the bracket replaced by the midpoint, and stopped once |g(T)|/(h·A) is within half
 * BATH_TOLERANCE_K: a few evaluations of the loss where bisection took about fifteen. When even ΔT_max does not balance the loss, the bath is reported at that
 * bound with `runaway` set.
 */
import { lubricants } from '../data/load.js';
import { DEFAULTS } from '../case/defaults.js';
import type { CaseSI } from '../case/types.js';

/** The sump model's figures (data/lubricants.json → sump). */
export interface SumpModel {
  /** Housing diameter over the radial room, 1. */
  diameterFactor: number;
  /** Housing length over the axial room, 1. */
  lengthFactor: number;
  /** Share of the housing surface that gives its heat to the air, 1. */
  dissipatingShare: number;
  /** Combined convection and radiation coefficient, W/(m²·K). */
  heatTransfer: number;
  /** Rise of a rolling bearing over its bath, K. */
  bearingRise: number;
  /** Largest rise of the bath over ambient searched, K. */
  maxRise: number;
}

/** The sump model of data/lubricants.json, with the source of its heat transfer coefficient. */
export function sumpModel(): SumpModel & { source: string } {
  const s = lubricants().sump;
  return {
    diameterFactor: s.diameterFactor.value,
    lengthFactor: s.lengthFactor.value,
    dissipatingShare: s.dissipatingShare.value,
    heatTransfer: s.heatTransfer.value,
    bearingRise: s.bearingRise.value,
    maxRise: s.maxRise.value,
    source: s.heatTransfer.source,
  };
}

/**
 * The sump of case `c`: its model, the housing's dissipating area from the case's room (m²) and
 * the ambient the balance starts from (°C): the case's, or the loader's default for a case built
 * without one (src/case/defaults.ts). One place for the journal and the rolling bearing alike.
 */
export function caseSump(c: CaseSI): { model: SumpModel; area: number; ambient: number } {
  const model = sumpModel();
  const area = housingArea(c.space.maxOuterDiameter, c.space.maxLength, model);
  const ambient = Number.isFinite(c.environment.ambient) ? c.environment.ambient : DEFAULTS.ambient.value;
  return { model, area, ambient };
}

/**
 * Dissipating area of the housing, m²: A = s·(π·D_h·L_h + 2·π·D_h²/4), D_h = k_D·roomDiameter,
 * L_h = k_L·roomLength (m).
 */
export function housingArea(roomDiameter: number, roomLength: number, model: SumpModel): number {
  const Dh = model.diameterFactor * roomDiameter;
  const Lh = model.lengthFactor * roomLength;
  return model.dissipatingShare * (Math.PI * Dh * Lh + (2 * Math.PI * Dh * Dh) / 4);
}

export interface BathTemperature {
  /** Bath temperature, °C. */
  temperature: number;
  /** Friction loss at that temperature, W. */
  loss: number;
  /** Ambient temperature, °C; dissipating area, m²; heat transfer coefficient, W/(m²·K). */
  ambient: number;
  area: number;
  heatTransfer: number;
  /** The loss outruns the housing up to ΔT_max: the bath is shown at T_amb + ΔT_max. */
  runaway: boolean;
  iterations: number;
}

/** Tolerance on the bath temperature, K: the temperature returned lies within half of it of the root. */
export const BATH_TOLERANCE_K = 0.05;
const MAX_ITERATIONS = 60;

/**
 * The temperature where g = 0 on the inverse interpolant (T as a polynomial in g) through the
 * points tried, (ta, ga) the oldest, (tc, gc) the last: quadratic through the three when `three`
 * and no two g agree, else linear (the secant) through the last two.
 */
function interpolate(three: boolean, ta: number, ga: number, tb: number, gb: number, tc: number, gc: number): number {
  if (three && ga !== gb && ga !== gc && gb !== gc)
    return (
      (ta * gb * gc) / ((ga - gb) * (ga - gc)) +
      (tb * ga * gc) / ((gb - ga) * (gb - gc)) +
      (tc * ga * gb) / ((gc - ga) * (gc - gb))
    );
  return tc - (gc * (tc - tb)) / (gc - gb);
}

/** The balance's answer (one object shape for every exit). */
function answer(
  ambient: number,
  area: number,
  heatTransfer: number,
  temperature: number,
  loss: number,
  runaway: boolean,
  iterations: number,
): BathTemperature {
  return { ambient, area, heatTransfer, temperature, loss, runaway, iterations };
}

/**
 * The bath temperature of the balance above (°C), for a loss P_loss(T) (W) that does not rise
 * with the bath temperature T (°C); ambient °C, area m², heat transfer W/(m²·K). `start` (°C):
 * where to begin (a neighbouring solution's bath temperature; the default is the ambient), which
 * changes the number of evaluations, not the root. Called once per candidate bearing in a map
 * cell, so the search keeps its points in plain numbers (no object per evaluation).
 */
export function bathTemperature(
  ambient: number,
  area: number,
  model: Pick<SumpModel, 'heatTransfer' | 'maxRise'>,
  loss: (tC: number) => number,
  start?: number,
): BathTemperature {
  const h = model.heatTransfer;
  const hA = h * area;
  if (!(hA > 0) || !Number.isFinite(ambient)) throw new Error(`sump: h·A must be positive, got ${hA} W/K`);
  // g(T) = (T − T_amb)·h·A − P(T), |T − T*| ≤ |g(T)|/(h·A) (module comment).
  const close = 0.5 * BATH_TOLERANCE_K * hA;
  const top = ambient + model.maxRise;
  // Each evaluation at T bounds the root from the other side: T* lies between T and its image
  // T_amb + P(T)/(h·A) (module comment). From ambient, that image is the upper bound.
  const t0 = Math.min(Math.max(start ?? ambient, ambient), top);
  const p0 = loss(t0);
  const g0 = (t0 - ambient) * hA - Math.max(0, p0);
  let evaluations = 1;
  if (Math.abs(g0) <= close) return answer(ambient, area, h, t0, p0, false, evaluations);
  const image = ambient + Math.max(0, p0) / hA;
  // The bracket [lo, hi]: g(lo) < 0 ≤ g(hi), each end its temperature, loss and excess.
  let tLo = t0;
  let pLo = p0;
  let gLo = g0;
  let tHi = t0;
  let pHi = p0;
  let gHi = g0;
  if (g0 < 0) {
    tHi = Math.min(image, top);
    pHi = loss(tHi);
    gHi = (tHi - ambient) * hA - Math.max(0, pHi);
    evaluations++;
    // A loss that rises a little with T (a last-digit effect of its own solver) may leave g < 0 below the top.
    if (gHi < 0 && tHi < top) {
      tHi = top;
      pHi = loss(tHi);
      gHi = (tHi - ambient) * hA - Math.max(0, pHi);
      evaluations++;
    }
    if (gHi < 0) return answer(ambient, area, h, tHi, pHi, true, evaluations);
  } else {
    tLo = Math.max(image, ambient);
    pLo = loss(tLo);
    gLo = (tLo - ambient) * hA - Math.max(0, pLo);
    evaluations++;
    if (gLo >= 0 && tLo > ambient) {
      tLo = ambient;
      pLo = loss(tLo);
      gLo = (tLo - ambient) * hA - Math.max(0, pLo);
      evaluations++;
    }
  }
  if (Math.abs(gHi) <= close) return answer(ambient, area, h, tHi, pHi, false, evaluations);
  if (Math.abs(gLo) <= close) return answer(ambient, area, h, tLo, pLo, false, evaluations);
  // Inverse quadratic interpolation through the last three temperatures tried (a secant step
  // through the last two while there are only two), kept inside the bracket [lo, hi]: the
  // midpoint when a step would leave it. The bracket narrows with each evaluation.
  // The points tried, oldest first: (ta, ga) (none yet while `three` is false), (tb, gb), (tc, gc).
  let three = false;
  let ta = 0;
  let ga = 0;
  let tb = t0;
  let gb = g0;
  let tc = g0 < 0 ? tHi : tLo;
  let gc = g0 < 0 ? gHi : gLo;
  for (let k = 0; k < MAX_ITERATIONS && tHi - tLo > BATH_TOLERANCE_K; k++) {
    const step = interpolate(three, ta, ga, tb, gb, tc, gc);
    const inset = 1e-3 * (tHi - tLo);
    const t = step > tLo + inset && step < tHi - inset ? step : (tLo + tHi) / 2;
    const p = loss(t);
    const g = (t - ambient) * hA - Math.max(0, p);
    evaluations++;
    if (Math.abs(g) <= close) return answer(ambient, area, h, t, p, false, evaluations);
    if (g < 0) {
      tLo = t;
      gLo = g;
    } else {
      tHi = t;
      gHi = g;
    }
    three = true;
    ta = tb;
    ga = gb;
    tb = tc;
    gb = gc;
    tc = t;
    gc = g;
  }
  const t = (tLo + tHi) / 2;
  const p = loss(t);
  return answer(ambient, area, h, t, p, false, evaluations + 1);
}

/**
 * The values a finding about a bath carries (SI; temperatures °C): the bath and ambient
 * temperatures, the loss, the area and coefficient, the housing proportions and the source of h.
 */
export function bathValues(bath: BathTemperature): Record<string, number | string | boolean> {
  const model = sumpModel();
  return {
    temperature: bath.temperature,
    ambient: bath.ambient,
    loss: bath.loss,
    area: bath.area,
    heatTransfer: bath.heatTransfer,
    diameterFactor: model.diameterFactor,
    lengthFactor: model.lengthFactor,
    dissipatingShare: model.dissipatingShare,
    runaway: bath.runaway,
    source: model.source,
  };
}
