import type { CaseSI } from '../../case/types.js';
import type { JournalCriteria } from '../../data/journal-criteria.js';
import { THERMAL_CEILING_C } from './operating-point.js';
import { journalThrust } from './thrust.js';
import { tableGeneration } from './table.js';
import { bathTemperature, caseSump, type BathTemperature } from '../sump.js';
import {
  evaluateDesign,
  sweepDesigns,
  type Candidate,
  type DesignEvaluation,
  type DutyPoint,
  type SweepRow,
} from './design.js';

/**
 * The journal's inlet temperature and design sweep. With oil feed the inlet is the case's (or
 * the default); with an oil bath the inlet is the bath temperature of the one sump heat balance
 * (src/calc/sump.ts) for the chosen design's own friction loss and its thrust face's:
 *
 *   T_in = T_bath,  T_bath = T_amb + P̄(T_bath)/(h·A),  P̄ = Σ share_i·P_i + P̄_thrust (W): the
 *   time mean of the film's power loss over the operating points with the inlet at T_bath,
 *   plus the time mean loss of the thrust pads (or rubbing face) on the same oil at T_bath
 *   (thrust.ts; 0 without axial load). Both run in the one sump, so both heat it.
 *
 * The design and the bath depend on each other: sweep at a first bath temperature (the larger
 * of the ambient and the case's inlet temperature), solve the bath for the design chosen,
 * sweep again at that bath, and repeat until the same design is chosen
 * (at most MAX_ROUNDS rounds; the last design is then shown at its own bath temperature).
 * Each design is so shown at a self-consistent bath temperature of its own loss.
 */

/** Rounds of sweep and bath balance before the last design is taken as it stands. */
const MAX_ROUNDS = 4;

export interface JournalSweep {
  chosen: DesignEvaluation;
  rows: SweepRow[];
  /** Inlet temperature the chosen design was evaluated with, °C. */
  inletTemperature: number;
  /** The bath balance (oil bath only), else null. Its loss is the journal's and the thrust face's. */
  bath: BathTemperature | null;
  /** Of the bath's loss, the thrust face's time-mean share at the bath temperature, W (0 without a bath). */
  thrustLoss: number;
}

/**
 * The first sweep of a bath case, at the ambient (or inlet) temperature, remembered for the
 * last few inputs: a search over a case input that leaves the journal's candidates, duty and
 * first temperature alone (the housing's size, a life target) repeats it exactly. Only its
 * chosen design is used (module comment), so nothing returned is shared between callers.
 */
const firstSweeps = new Map<string, DesignEvaluation>();
const FIRST_SWEEPS_KEPT = 8;

function firstSweep(
  diameter: number,
  candidates: readonly Candidate[],
  points: readonly DutyPoint[],
  t: number,
  startLoad: number,
  crit: JournalCriteria,
): DesignEvaluation {
  const key = JSON.stringify([tableGeneration(), diameter, candidates, points, t, startLoad, crit]);
  const hit = firstSweeps.get(key);
  if (hit) return hit;
  const { chosen } = sweepDesigns(diameter, candidates, points, t, startLoad, crit);
  if (firstSweeps.size >= FIRST_SWEEPS_KEPT) firstSweeps.delete(firstSweeps.keys().next().value!);
  firstSweeps.set(key, chosen);
  return chosen;
}

/** Time-mean power loss of a design over its points, W. */
function meanLoss(e: DesignEvaluation): number {
  const total = e.points.reduce((s, p) => s + p.share, 0);
  const sum = e.points.reduce((s, p) => s + p.share * (p.film ? p.result.powerLoss : 0), 0);
  return total > 0 ? sum / total : 0;
}

/** Same geometry and oil (the sweep's identity of a candidate). */
function sameCandidate(a: Candidate, b: Candidate): boolean {
  return a.length === b.length && a.radialClearance === b.radialClearance && a.oil === b.oil;
}

/**
 * The sweep of `candidates` over `points` at the case's inlet temperature, or, with an oil bath
 * and a film, at the bath temperature of the chosen design (see the module comment). SI: m, N,
 * rev/s; temperatures °C.
 */
export function sweepWithInlet(
  c: CaseSI,
  diameter: number,
  candidates: readonly Candidate[],
  points: readonly DutyPoint[],
  startLoad: number,
  crit: JournalCriteria,
  film: boolean,
): JournalSweep {
  const tCase = c.lubrication.inletTemperature;
  if (c.lubrication.supply !== 'oil-bath' || !film) {
    const { chosen, rows } = sweepDesigns(diameter, candidates, points, tCase, startLoad, crit);
    return { chosen, rows, inletTemperature: tCase, bath: null, thrustLoss: 0 };
  }
  const { model, area, ambient } = caseSump(c);
  // The search stays below the ceiling of the film's thermal balance (operating-point.ts).
  const search = {
    heatTransfer: model.heatTransfer,
    maxRise: Math.min(model.maxRise, THERMAL_CEILING_C - 1 - ambient),
  };
  // The thrust face on the same oil at the bath temperature (its room check does not matter here).
  const thrustLoss = (cand: Candidate, t: number) =>
    journalThrust(c, crit, cand.fluid, t, cand.length)?.meanPowerLoss ?? 0;
  // What the last balance evaluated, by temperature: its root is one of them, so the chosen
  // design and its thrust loss there are not evaluated again.
  let tried = new Map<number, { cand: Candidate; design: DesignEvaluation; thrust: number }>();
  // The balance of a design a sweep chose starts at that sweep's temperature, where the sweep
  // has already evaluated the design (the start changes the evaluations, not the root).
  const balance = (swept: DesignEvaluation, start: number) => {
    const cand = swept.candidate;
    tried = new Map();
    return bathTemperature(
      ambient,
      area,
      search,
      (t) => {
        const design = t === start ? swept : evaluateDesign(diameter, cand, points, t, startLoad, crit);
        const thrust = thrustLoss(cand, t);
        tried.set(t, { cand, design, thrust });
        return meanLoss(design) + thrust;
      },
      start,
    );
  };
  let tBath = Math.max(ambient, tCase);
  let previous = firstSweep(diameter, candidates, points, tBath, startLoad, crit);
  let bath = balance(previous, tBath);
  let sweep: { chosen: DesignEvaluation; rows: SweepRow[] } | undefined;
  for (let round = 1; round < MAX_ROUNDS; round++) {
    tBath = bath.temperature;
    sweep = sweepDesigns(diameter, candidates, points, tBath, startLoad, crit);
    if (sameCandidate(sweep.chosen.candidate, previous.candidate)) break;
    previous = sweep.chosen;
    bath = balance(sweep.chosen, tBath);
  }
  if (!sweep) throw new Error('journal: no sweep at the bath temperature');
  // The chosen design at its own bath temperature (equal to the sweep's when the rounds settled).
  const hit = tried.get(bath.temperature);
  const known = hit && sameCandidate(hit.cand, sweep.chosen.candidate) ? hit : undefined;
  const chosen =
    bath.temperature === tBath
      ? sweep.chosen
      : (known?.design ?? evaluateDesign(diameter, sweep.chosen.candidate, points, bath.temperature, startLoad, crit));
  return {
    chosen,
    rows: sweep.rows,
    inletTemperature: bath.temperature,
    bath,
    thrustLoss: known ? known.thrust : thrustLoss(chosen.candidate, bath.temperature),
  };
}
