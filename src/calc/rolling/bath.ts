import type { CaseSI } from '../../case/types.js';
import { bathTemperature, bathValues, housingArea, sumpModel } from '../sump.js';
import { finiteOr } from './conditions.js';
import type { OilSystem } from './lubrication.js';
import type { RollingCandidate } from './types.js';

/**
 * The oil bath of a rolling bearing: the bath temperature of the one sump heat balance
 * (src/calc/sump.ts), T_bath = T_amb + P(T_bath)/(h·A), with P the time-mean friction power of
 * the bearing chosen (W), worked at the bearing temperature T_bath + sump.bearingRise (°C).
 *
 * The bearing chosen and the bath depend on each other (κ, and so the choice, moves with the
 * viscosity): evaluate every candidate at a first bath temperature (ambient + 20 K, the old
 * fixed estimate), solve the bath for the bearing chosen, evaluate again at that bath, and
 * repeat until the same bearing is chosen (at most MAX_ROUNDS rounds).
 */

const MAX_ROUNDS = 4;
/** First bath temperature over ambient, K: where the fixed estimate used to put a bath. */
const FIRST_RISE = 20;

/**
 * The bath of an oil-bath case, or undefined for other supplies or no candidates.
 * `evaluateAt(t, id)` evaluates the candidates (only the one of that id, when given) with the
 * bath at t (°C); `choose` picks the bearing shown (the best, else the first).
 */
export function rollingBath(
  c: CaseSI,
  evaluateAt: (tBath: number, onlyId?: string) => RollingCandidate[],
  choose: (candidates: RollingCandidate[]) => RollingCandidate | null,
): OilSystem['bath'] {
  if (c.lubrication.supply !== 'oil-bath' || c.lubrication.viscosity !== undefined) return undefined;
  const model = sumpModel();
  const area = housingArea(c.space.maxOuterDiameter, c.space.maxLength, model);
  const ambient = finiteOr(c.environment.ambient, 20);
  let lead = choose(evaluateAt(ambient + FIRST_RISE));
  if (!lead) return undefined;
  let bath = balance(lead.id);
  for (let round = 1; round < MAX_ROUNDS; round++) {
    const next = choose(evaluateAt(bath.temperature));
    if (!next || next.id === lead.id) break;
    lead = next;
    bath = balance(lead.id);
  }
  return { temperature: bath.temperature, values: bathValues(bath) };

  function balance(id: string) {
    return bathTemperature(ambient, area, model, (t) => {
      const k = evaluateAt(t, id)[0];
      return k ? k.frictionPower : 0;
    });
  }
}
