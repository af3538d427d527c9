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
 * Solution: P_loss(T) falls as T rises, so (T − T_amb)·h·A − P_loss(T) rises with T and has
 * one root, found by bisection between T_amb and T_amb + ΔT_max; when even ΔT_max does not
 * balance the loss, the bath is reported at that bound with `runaway` set.
 */
import { lubricants } from '../data/load.js';

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

/** Bisection tolerance on the bath temperature, K. */
export const BATH_TOLERANCE_K = 0.05;
const MAX_ITERATIONS = 60;

/**
 * The bath temperature of the balance above (°C), for a loss P_loss(T) (W) that does not rise
 * with the bath temperature T (°C); ambient °C, area m², heat transfer W/(m²·K).
 */
export function bathTemperature(
  ambient: number,
  area: number,
  model: Pick<SumpModel, 'heatTransfer' | 'maxRise'>,
  loss: (tC: number) => number,
): BathTemperature {
  const hA = model.heatTransfer * area;
  if (!(hA > 0) || !Number.isFinite(ambient)) throw new Error(`sump: h·A must be positive, got ${hA} W/K`);
  const excess = (t: number) => (t - ambient) * hA - Math.max(0, loss(t));
  const base = { ambient, area, heatTransfer: model.heatTransfer };
  let lo = ambient;
  let hi = ambient + model.maxRise;
  if (excess(hi) < 0) return { ...base, temperature: hi, loss: loss(hi), runaway: true, iterations: 0 };
  let k = 0;
  while (hi - lo > BATH_TOLERANCE_K && k < MAX_ITERATIONS) {
    const mid = (lo + hi) / 2;
    if (excess(mid) < 0) lo = mid;
    else hi = mid;
    k++;
  }
  const temperature = (lo + hi) / 2;
  return { ...base, temperature, loss: loss(temperature), runaway: false, iterations: k };
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
