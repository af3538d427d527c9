import type { CaseSI } from '../../case/types.js';
import { assumedFinding } from '../../core/finding.js';
import { bathTemperature, bathValues, caseSump, sumpModel, type BathTemperature } from '../sump.js';
import type { CandidateSpec } from './candidates.js';
import type { EvalContext } from './context.js';
import { evaluate, frictionLoads, frictionLoss } from './evaluate.js';
import type { Notes } from './findings.js';
import { bathLubrication, type Lubrication, type OilSystem } from './lubrication.js';
import type { RollingCandidate } from './types.js';

/**
 * The oil bath of a rolling bearing: each candidate bearing runs at the bath temperature of the
 * one sump heat balance (src/calc/sump.ts) for its own friction loss,
 *
 *   T_bath = T_amb + P(T_bath)/(h·A),
 *
 * P the candidate's time-mean friction power (W) worked at the bearing temperature
 * T_bath + sump.bearingRise (°C), whose viscosity sets the viscous moment, κ and the life.
 * Solved per candidate, so a candidate's figures do not depend on which bearing is chosen.
 */

/** True when the case's bearing runs in an oil bath whose temperature the sump balance sets. */
export function inSumpBath(c: CaseSI): boolean {
  return c.lubrication.supply === 'oil-bath' && c.lubrication.viscosity === undefined;
}

export interface BathCandidate {
  candidate: RollingCandidate;
  /** The context it was evaluated in (its own lubricant temperature and viscosity). */
  ctx: EvalContext;
  bath: BathTemperature;
}

/**
 * The bath temperature last solved in a context: where the next candidate's search starts.
 * Neighbouring candidates run at nearby bath temperatures, so the search takes two or three
 * evaluations instead of five or six; the start changes the root found by less than half
 * BATH_TOLERANCE_K (sump.ts), and the candidates of one check are always taken in one order.
 */
const lastBath = new WeakMap<EvalContext, number>();

/**
 * Evaluate one candidate at its own bath temperature; its cautions go to `notes` (the search
 * notes nothing). `system` the case's oil system (the shared grade, if any).
 */
export function evaluateInBath(spec: CandidateSpec, ctx: EvalContext, system: OilSystem, notes: Notes): BathCandidate {
  const { model, area, ambient, lubricationAt } = bathOf(ctx, system);
  // The search asks only for the friction loss (the loads at each point worked once, the lubricant
  // at each temperature tried); the candidate is evaluated once, at the bath temperature found.
  const loads = frictionLoads(spec, ctx);
  const bath = bathTemperature(
    ambient,
    area,
    model,
    (t) => frictionLoss(spec, ctx, lubricationAt(t), loads),
    lastBath.get(ctx),
  );
  lastBath.set(ctx, bath.temperature);
  const own: EvalContext = { ...ctx, lubrication: lubricationAt(bath.temperature) };
  return { candidate: evaluate(spec, own, notes), ctx: own, bath };
}

/** The case's sump and its oil at any bath temperature, per context and oil system (the same for every candidate). */
interface Bath {
  system: OilSystem;
  model: ReturnType<typeof caseSump>['model'];
  area: number;
  ambient: number;
  lubricationAt: (t: number) => Lubrication;
}
const baths = new WeakMap<EvalContext, Bath>();
function bathOf(ctx: EvalContext, system: OilSystem): Bath {
  let hit = baths.get(ctx);
  if (!hit || hit.system !== system) {
    const { model, area, ambient } = caseSump(ctx.c);
    hit = { system, model, area, ambient, lubricationAt: bathLubrication(ctx.c, system) };
    baths.set(ctx, hit);
  }
  return hit;
}

/** The assumption that states the bath of the bearing shown: the model, its figures, the rise. */
export function bathAssumption(shown: BathCandidate) {
  const rise = sumpModel().bearingRise;
  return assumedFinding('rolling.temperature', 'rolling.bath-temperature', {
    ...bathValues(shown.bath),
    bearingTemperature: shown.bath.temperature + rise,
    rise,
  });
}
