import { makeCheck, type CheckRecord } from '../../core/check.js';
import { KAPPA_MIN } from './aiso.js';
import type { CandidateSpec } from './candidates.js';
import type { CandidateFigures, EvalContext } from './context.js';

/**
 * The checks of one candidate, from its figures: life, lubrication, load ratio, static safety
 * and the X/Y table (what the bearing carries), then speed, space and grease life (what its
 * surroundings allow). Each is a check record (src/core/check.ts); a check that does not apply
 * (no rotation, no life target, no size known) is left out.
 *
 * References
 * [1] ISO 281:2007: modified rating life (cl. 9), the a_ISO range of κ, P ≤ 0.5·C, the X/Y
 *     table (from memory; data/rolling-factors.json).
 * [2] ISO 76 s0 = C0/P0; the s0 limits, speed limits and grease-interval rule with their
 *     sources in data/rolling-factors.json.
 */

/** P/C above this is beyond the rating-life equation's intent (ISO 281:2007, from memory). */
const LOAD_RATIO_MAX = 0.5;

/** Checks of what the bearing carries [1, 2]: L10mh ≥ target, κ ≥ 0.1, P/C ≤ 0.5, s0, Fa/C0 in the X/Y table. */
function loadChecks(spec: CandidateSpec, fig: CandidateFigures, ctx: EvalContext): CheckRecord[] {
  const checks: CheckRecord[] = [];
  if (fig.L10mh !== null && ctx.c.life.hours > 0) {
    checks.push(
      makeCheck(
        'rolling-life',
        'modified rating life L10mh',
        fig.L10mh,
        ctx.c.life.hours,
        'h',
        'min',
        'ISO 281:2007, modified rating life L10m = a1·a_ISO·L10 (cl. 9, from memory); target from the case',
      ),
    );
  }
  if (fig.kappa !== null) {
    checks.push(
      makeCheck(
        'viscosity-ratio',
        'viscosity ratio κ = ν/ν1 within the a_ISO method',
        fig.kappa,
        KAPPA_MIN,
        '1',
        'min',
        'ISO 281:2007, a_ISO valid for 0.1 ≤ κ ≤ 4 (from memory)',
      ),
    );
  }
  if (fig.L10 !== null && fig.P > 0) {
    checks.push(
      makeCheck(
        'load-ratio',
        'dynamic equivalent load P/C',
        fig.P / spec.C,
        LOAD_RATIO_MAX,
        '1',
        'max',
        'ISO 281:2007 (from memory): the rating-life equation is not meant for P > 0.5·C',
      ),
    );
  }
  if (fig.s0 !== null) {
    checks.push(
      makeCheck(
        'static-safety',
        `static safety s0 = C0/P0 (${ctx.s0Row.guidance})`,
        fig.s0,
        spec.type === 'ball' ? ctx.s0Row.ball : ctx.s0Row.roller,
        '1',
        'min',
        `ISO 76 s0 = C0/P0; limit: ${ctx.s0Row.source}`,
      ),
    );
  }
  const table = ctx.f.xyDeepGrooveBall;
  const faC0 = spec.type === 'ball' ? ctx.points.reduce((m, q) => Math.max(m, q.Fa / spec.C0), 0) : 0;
  if (faC0 > 0) {
    checks.push(
      makeCheck(
        'axial-load-table',
        'relative axial load Fa/C0 within the X/Y table',
        faC0,
        table.rows[table.rows.length - 1]!.faC0,
        '1',
        'max',
        table.source,
      ),
    );
  }
  return checks;
}

/** Checks of what the surroundings allow [2]: n·dm for the supply, outside diameter and width, grease life of a sealed bearing. */
function fitChecks(spec: CandidateSpec, fig: CandidateFigures, ctx: EvalContext): CheckRecord[] {
  const checks: CheckRecord[] = [];
  const { c, f, lubrication } = ctx;
  const lim = f.speedLimits.find((l) => l.type === spec.type && l.supply === lubrication.supply);
  if (fig.ndm > 0 && lim) {
    checks.push(
      makeCheck(
        'speed-factor',
        `speed factor n·dm (${lubrication.supply})`,
        fig.ndm,
        lim.ndm,
        'mm*r/min',
        'max',
        lim.source,
      ),
    );
  }
  const spaceSource = 'case space; bearing dimensions ISO 15 (from memory) or supplier';
  if (spec.outerDiameter !== null && c.space.maxOuterDiameter > 0) {
    checks.push(
      makeCheck(
        'space-outer-diameter',
        'bearing outside diameter against the housing room',
        spec.outerDiameter,
        c.space.maxOuterDiameter,
        'm',
        'max',
        spaceSource,
      ),
    );
  }
  if (spec.width !== null && c.space.maxLength > 0) {
    checks.push(
      makeCheck(
        'space-width',
        'bearing width against the axial room',
        spec.width,
        c.space.maxLength,
        'm',
        'max',
        spaceSource,
      ),
    );
  }
  if (lubrication.sealed && fig.relubricationHours !== null && c.life.hours > 0) {
    checks.push(
      makeCheck(
        'grease-life',
        'grease life of the sealed bearing (relubrication-interval formula)',
        fig.relubricationHours,
        c.life.hours,
        'h',
        'min',
        f.relubrication.find((q) => q.type === spec.type)!.source,
      ),
    );
  }
  return checks;
}

/** Every check of one candidate, in a fixed order: what it carries, then what its surroundings allow. */
export function candidateChecks(spec: CandidateSpec, fig: CandidateFigures, ctx: EvalContext): CheckRecord[] {
  return [...loadChecks(spec, fig, ctx), ...fitChecks(spec, fig, ctx)];
}
