import type { CaseSI } from '../../case/types.js';
import { assumedFinding } from '../../core/finding.js';
import { bathTemperature, bathValues, caseSump, sumpModel, type BathTemperature } from '../sump.js';
import type { CandidateSpec } from './candidates.js';
import type { EvalContext } from './context.js';
import { evaluate } from './evaluate.js';
import { newNotes, type Notes } from './findings.js';
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
 * Evaluate one candidate at its own bath temperature; its cautions go to `notes`, those of the
 * search to a scratch collector. `system` the case's oil system (the shared grade, if any).
 */
export function evaluateInBath(spec: CandidateSpec, ctx: EvalContext, system: OilSystem, notes: Notes): BathCandidate {
  const { model, area, ambient, lubricationAt } = bathOf(ctx, system);
  const at = (t: number): EvalContext => ({ ...ctx, lubrication: lubricationAt(t) });
  // Each evaluation of the search keeps what it noted; the one at the bath temperature found is
  // the candidate's own, its notes passed on in order (no evaluation is repeated).
  const tried = new Map<number, { candidate: RollingCandidate; ctx: EvalContext; replay: (to: Notes) => void }>();
  const loss = (t: number) => {
    const own = at(t);
    const log = recorder();
    const candidate = evaluate(spec, own, log.notes);
    tried.set(t, { candidate, ctx: own, replay: log.replay });
    return candidate.frictionPower;
  };
  const bath = bathTemperature(ambient, area, model, loss, lastBath.get(ctx));
  lastBath.set(ctx, bath.temperature);
  const hit = tried.get(bath.temperature);
  if (hit) {
    hit.replay(notes);
    return { candidate: hit.candidate, ctx: hit.ctx, bath };
  }
  const own = at(bath.temperature);
  return { candidate: evaluate(spec, own, notes), ctx: own, bath };
}

/** The case's sump and its oil at any bath temperature, per context and oil system (the same for every candidate). */
const baths = new WeakMap<
  EvalContext,
  { system: OilSystem; sump: ReturnType<typeof caseSump>; lubricationAt: (t: number) => Lubrication }
>();
function bathOf(ctx: EvalContext, system: OilSystem) {
  let hit = baths.get(ctx);
  if (!hit || hit.system !== system) {
    hit = { system, sump: caseSump(ctx.c), lubricationAt: bathLubrication(ctx.c, system) };
    baths.set(ctx, hit);
  }
  return { ...hit.sump, lubricationAt: hit.lubricationAt };
}

/** A collector that records what is noted, to be passed on to another collector later in the same order. */
function recorder(): { notes: Notes; replay: (to: Notes) => void } {
  const calls: ((to: Notes) => void)[] = [];
  const scratch = newNotes();
  const notes: Notes = {
    assumed: scratch.assumed,
    warnings: scratch.warnings,
    assume: (a) => {
      scratch.assume(a);
      calls.push((to) => to.assume(a));
    },
    warn: (w, sameAs) => {
      scratch.warn(w, sameAs);
      calls.push((to) => to.warn(w, sameAs));
    },
  };
  return { notes, replay: (to) => calls.forEach((call) => call(to)) };
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
