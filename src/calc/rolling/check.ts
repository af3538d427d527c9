import type { CaseSI } from '../../case/types.js';
import { finding } from '../../core/finding.js';
import { rollingFactors } from '../../data/rolling.js';
import { loadFactors } from '../../data/rolling-load-factors.js';
import { candidateSpecs } from './candidates.js';
import { dutyPoints, lifeFactors, shockFactors } from './conditions.js';
import { rollingTables, type EvalContext } from './context.js';
import { evaluate } from './evaluate.js';
import { newNotes, type Notes } from './findings.js';
import { lifeExponent, requiredDynamicRating, type RollingType } from './life.js';
import { bathAssumption, evaluateInBath, inSumpBath } from './bath.js';
import { bearingLubrication, type OilSystem } from './lubrication.js';
import { bestCandidate, choiceFinding, equivalentLoadBound, kindFacts, leadOfEachKind } from './select.js';
import { rollingSheet } from './sheet.js';
import type { RollingResult } from './types.js';

/**
 * What every candidate of the case is evaluated in (operating points, shock and life factors,
 * lubricant), its steps' assumptions and cautions added to `notes` in the order they run; and
 * the duty's time-mean speed, rev/s.
 */
export function evalContext(c: CaseSI, notes: Notes, system: OilSystem = {}): { ctx: EvalContext; meanSpeed: number } {
  const f = rollingFactors();
  const duty = dutyPoints(c, notes);
  const shock = shockFactors(c, f, notes);
  const lubrication = bearingLubrication(c, notes, system);
  const life = lifeFactors(c, f, notes);
  const ctx: EvalContext = {
    c,
    f,
    tables: rollingTables(),
    points: duty.points,
    maxSpeed: duty.maxSpeed,
    serviceFactor: shock.serviceFactor,
    s0Guidance: shock.s0Guidance,
    cont: life.cont,
    a1: life.a1,
    reliabilityUsed: life.reliabilityUsed,
    lubrication,
  };
  return { ctx, meanSpeed: duty.meanSpeed };
}

/**
 * Rolling-element bearing check of a duty case (pure: reads the data tables, no other I/O).
 * `opts.sheet: false` skips the calculation sheet's text (sweeps evaluate thousands of points).
 *
 * For each candidate bearing — the case's own bearing when a supplier's C and C0 are
 * given, and every ISO 15 row (data/rolling-boundary-dimensions.json) whose bore is
 * the shaft diameter and that fits the space — it works:
 *   P   = f_d·(X·Fr + Y·Fa) per operating point, duty mean P = (Σ Pi^p·ni·ti/Σ ni·ti)^(1/p)
 *   L10 = (C/P)^p (10⁶ rev), L10h = 10⁶·L10/(3600·n) (n rev/s), L10mh = a1·a_ISO·L10h
 *   κ = ν/ν1, a_ISO(κ, e_C·Cu/P), s0 = C0/P0 at the peak point, n·dm, M = μ·P·d/2,
 *   grease interval t_f.
 * Symbols: Fr, Fa radial and axial load (N); f_d service factor for the shock level;
 * n speed (rev/s); ν, ν1 kinematic and rated viscosity (m²/s); e_C contamination
 * factor; Cu fatigue load limit (N); dm pitch diameter (m); d bore (m).
 * The best candidate is the smallest (outside diameter, then width) that meets the
 * modified life L10mh ≥ target, static safety, speed factor, κ ≥ 0.1 and space, and
 * is not excluded (roller under axial load, ball beyond the X/Y table).
 * Validity: radial loads on single-row deep-groove ball and cylindrical roller
 * bearings; concept-stage estimates where ratings are estimated from boundary
 * dimensions. Sources: ISO 281:2007, ISO 76, ISO 15 (see each module), common
 * practice where said.
 *
 * The steps, one module each: conditions.ts (operating points, shock and life factors),
 * lubrication.ts, candidates.ts, evaluate.ts with point-loads.ts and checks.ts, select.ts,
 * sheet.ts; findings.ts collects what each step assumed and cautions, in the order the steps run.
 */
export function checkRolling(
  c: CaseSI,
  opts: { sheet?: boolean; sharedGrade?: OilSystem['sharedGrade'] } = {},
): RollingResult {
  const notes = newNotes();
  // One oil system: the journal's grade where it chose one; each bearing in a bath at its own sump balance (bath.ts).
  const bathCase = inSumpBath(c);
  const system: OilSystem = {
    ...(opts.sharedGrade ? { sharedGrade: opts.sharedGrade } : {}),
    bathPerBearing: bathCase,
  };
  const { ctx: ctx0, meanSpeed } = evalContext(c, notes, system);
  const specs = candidateSpecs(c, notes);
  const inBath = bathCase ? specs.map((s) => evaluateInBath(s, ctx0, system, notes)) : [];
  const candidates = bathCase ? inBath.map((b) => b.candidate) : specs.map((s) => evaluate(s, ctx0, notes));
  // The kinds' traits as read once for this check (ctx0.tables), for every step of the choice.
  const kinds = ctx0.tables.kinds;
  const leads = leadOfEachKind(candidates, kinds);
  const best = bestCandidate(candidates, notes, kinds, leads);
  const shown = inBath.find((b) => b.candidate === (best ?? candidates[0]));
  if (shown) notes.assume(bathAssumption(shown));
  const ctx = shown ? shown.ctx : ctx0;

  // The figures of the result: the best candidate's, else the first's, else a bound for a ball bearing.
  const lead = best ?? candidates[0] ?? null;
  const leadType: RollingType = lead ? lead.type : 'ball';
  const equivalentLoad = lead
    ? lead.equivalentLoad
    : equivalentLoadBound(ctx.points, ctx.serviceFactor, loadFactors().radialBall, notes);
  const requiredC = requiredDynamicRating(equivalentLoad, meanSpeed, c.life.hours, lifeExponent(leadType), ctx.a1);
  if (!(c.life.hours > 0)) notes.warn(finding('rolling.no-life-target'));

  return {
    option: 'rolling',
    equivalentLoad,
    equivalentSpeed: meanSpeed,
    requiredDynamicRating: requiredC,
    requiredDynamicRatingFor: requiredC !== null ? { type: leadType, p: lifeExponent(leadType) } : null,
    candidates,
    best: best ? best.id : null,
    kinds: leads.map((k) => kindFacts(k, kinds)),
    chosen: best ? kindFacts(best, kinds) : null,
    choice: choiceFinding(best, candidates, leads, kinds),
    feasible: best !== null,
    assumed: notes.assumed,
    warnings: notes.warnings,
    sheet: lead && opts.sheet !== false ? rollingSheet(lead, ctx, meanSpeed) : [],
  };
}
