import { makeAdvisoryCheck, makeCheck, type CheckRecord } from '../../core/check.js';
import { KAPPA_MIN } from './aiso.js';
import type { CandidateSpec } from './candidates.js';
import type { CandidateFigures, EvalContext } from './context.js';
import { speedLimitFrom } from './speed.js';
import { rollingRunning } from '../../data/rolling-running.js';

/**
 * The checks of one candidate, from its figures: life, lubrication, load ratio and static
 * safety (what the bearing carries), then speed, space and grease life (what its surroundings
 * allow). Each is a check record (src/core/check.ts); a check that does not apply (no rotation,
 * no life target, no size known) is left out.
 *
 * References
 * [1] ISO 281:2007: modified rating life (cl. 9), the a_ISO range of κ, P ≤ 0.5·C (from memory).
 * [2] ISO 76 s0 = C0/P0; the s0 guidance and speed limits per kind with their sources
 *     (data/rolling-running.json).
 * [3] Temperature limits of the grease and of standard bearing steel (data/rolling-running.json;
 *     common practice, from memory).
 */

/** P/C above this is beyond the rating-life equation's intent (ISO 281:2007, from memory). */
const LOAD_RATIO_MAX = 0.5;

/**
 * Checks of what the bearing carries [1, 2]: L10mh ≥ target (not for a shaft too slow for a
 * rating life: static safety governs it), κ ≥ 0.1 (advice: below it the method's limiting value
 * is taken; it never rules a bearing out), P/C ≤ 0.5, s0 ≥ the guidance for the shock level.
 */
function loadChecks(spec: CandidateSpec, fig: CandidateFigures, ctx: EvalContext, checks: CheckRecord[]): void {
  if (fig.L10mh !== null && ctx.c.life.hours > 0 && !fig.staticOnly) {
    checks.push(
      makeCheck(
        'rolling-life',
        'modified rating life L10mh',
        fig.L10mh,
        ctx.c.life.hours,
        'h',
        'min',
        'ISO 281:2007, modified rating life L10m = a1·a_ISO·L10, a_ISO per operating point (cl. 9, from memory); target from the case',
      ),
    );
  }
  if (fig.kappa !== null && !fig.staticOnly) {
    checks.push(
      makeAdvisoryCheck(
        'viscosity-ratio',
        'viscosity ratio κ = ν/ν1 within the a_ISO method (below it the method’s limiting value is taken)',
        fig.kappa,
        KAPPA_MIN,
        '1',
        'min',
        'ISO 281:2007, a_ISO valid for 0.1 ≤ κ ≤ 4 (from memory)',
      ),
    );
  }
  if (fig.L10 !== null && fig.P > 0 && !fig.staticOnly) {
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
    const g = ctx.s0Guidance(spec.type);
    checks.push(
      makeCheck(
        'static-safety',
        kept(staticLabels, g.label, 'static safety s0 = C0/P0 (', ')'),
        fig.s0,
        g.min,
        '1',
        'min',
        kept(staticSources, g.source, 'ISO 76 s0 = C0/P0; limit: ', ''),
      ),
    );
  }
}

/**
 * Words built from a table's words, kept per what they are built from (every candidate at every
 * point of a sweep words the same few; a string built each time is garbage the next moment).
 */
function kept(words: Map<string, string>, key: string, prefix: string, suffix: string): string {
  let text = words.get(key);
  if (text === undefined) {
    if (words.size >= 64) words.clear();
    words.set(key, (text = `${prefix}${key}${suffix}`));
  }
  return text;
}
const staticLabels = new Map<string, string>();
const staticSources = new Map<string, string>();
const greaseLabels = new Map<string, string>();
const speedLabels = new Map<string, Map<string, string>>();
function speedLabel(kind: string, supply: string): string {
  let bySupply = speedLabels.get(kind);
  if (!bySupply) speedLabels.set(kind, (bySupply = new Map()));
  let text = bySupply.get(supply);
  if (text === undefined) bySupply.set(supply, (text = `speed factor n·dm (${kind}, ${supply})`));
  return text;
}

/**
 * The bearing's size against the case's room: outside diameter and width, where both are known.
 * They read neither load nor speed, so one frozen pair of records is kept per candidate and
 * given to every point of a sweep with the same room (shared records are never changed).
 */
function spaceChecks(spec: CandidateSpec, c: EvalContext['c'], checks: CheckRecord[]): void {
  const { maxOuterDiameter, maxLength } = c.space;
  let k = keptSpace.get(spec);
  if (!k || !Object.is(k.maxOuterDiameter, maxOuterDiameter) || !Object.is(k.maxLength, maxLength)) {
    k = { maxOuterDiameter, maxLength, outer: null, width: null };
    const source =
      'case space; bearing dimensions ISO 15, ISO 355 and the needle roller standards (from memory) or supplier';
    if (spec.outerDiameter !== null && maxOuterDiameter > 0)
      k.outer = Object.freeze(
        makeCheck(
          'space-outer-diameter',
          'bearing outside diameter against the housing room',
          spec.outerDiameter,
          maxOuterDiameter,
          'm',
          'max',
          source,
        ),
      );
    if (spec.width !== null && maxLength > 0)
      k.width = Object.freeze(
        makeCheck(
          'space-width',
          spec.arrangement === 'single'
            ? 'bearing width against the axial room'
            : 'width of the pair against the axial room',
          spec.width,
          maxLength,
          'm',
          'max',
          source,
        ),
      );
    keptSpace.set(spec, k);
  }
  if (k.outer) checks.push(k.outer);
  if (k.width) checks.push(k.width);
}
interface KeptSpace {
  maxOuterDiameter: number;
  maxLength: number;
  outer: CheckRecord | null;
  width: CheckRecord | null;
}
const keptSpace = new WeakMap<CandidateSpec, KeptSpace>();

/** Checks of what the surroundings allow [2, 3]: n·dm for the kind and supply, outside diameter and width, grease life of a sealed bearing, temperatures. */
function fitChecks(spec: CandidateSpec, fig: CandidateFigures, ctx: EvalContext, checks: CheckRecord[]): void {
  const { c, lubrication } = ctx;
  const lim = speedLimitFrom(ctx.tables.running, spec.kind, lubrication.supply, spec.form);
  if (fig.ndm > 0) {
    checks.push(
      makeCheck(
        'speed-factor',
        speedLabel(spec.kind, lubrication.supply),
        fig.ndm,
        lim.ndm,
        'mm*r/min',
        'max',
        lim.source,
      ),
    );
  }
  spaceChecks(spec, c, checks);
  if (lubrication.sealed && fig.greaseHours !== null && c.life.hours > 0 && !fig.staticOnly) {
    checks.push(
      makeCheck(
        'grease-life',
        'grease life L10 of the sealed bearing',
        fig.greaseHours,
        c.life.hours,
        'h',
        'min',
        ctx.tables.running.greaseLife.source,
      ),
    );
  }
  const plan = c.lubrication.regreaseInterval;
  if (!lubrication.sealed && lubrication.supply === 'grease' && fig.greaseHours !== null && plan !== undefined)
    checks.push(regreaseCheck(fig.greaseHours, plan));
  misalignmentChecks(spec, ctx, checks);
  temperatureChecks(ctx, checks);
}

/**
 * An open bearing on grease against the maintenance plan [3]: t_r ≥ t_plan, with t_r the
 * regreasing interval the bearing needs (half its 10 % grease life, grease.ts), h, and t_plan
 * the longest interval the plan regreases at (case lubrication.regreaseInterval), h. A plan
 * that regreases less often than the bearing needs lets it run dry.
 */
export function regreaseCheck(neededHours: number, planHours: number): CheckRecord {
  return makeCheck(
    'regrease-interval',
    'regreasing interval the bearing needs against the maintenance plan’s',
    neededHours,
    planHours,
    'h',
    'min',
    `${rollingRunning().greaseLife.source}; plan interval from the case`,
  );
}

/** Minutes of arc in a radian. */
const ARCMIN = Math.PI / (180 * 60);

/**
 * Misalignment, where the case states one (shaft.misalignment; absent: aligned, no check):
 *   θ ≤ θ_perm
 * θ the slope of the shaft against the bearing seat, rad; θ_perm the angle between the ring
 * axes the kind tolerates without a noticeable loss of life, rad (data/rolling-kinds.json,
 * common practice, from memory). Model: the shaft's slope at the support is the ring tilt (a
 * rigid, aligned housing). A pair mounted as one support is held to its kind's single-row
 * figure, an upper bound (a pair tolerates less).
 */
function misalignmentChecks(spec: CandidateSpec, ctx: EvalContext, checks: CheckRecord[]): void {
  const theta = ctx.c.shaft.misalignment;
  if (theta === undefined) return;
  const t = ctx.tables.kinds.find((k) => k.kind === spec.kind)!;
  checks.push(
    makeCheck(
      'misalignment',
      `slope of the shaft at the bearing against the misalignment a ${spec.kind} bearing tolerates`,
      theta,
      t.misalignment_arcmin * ARCMIN,
      'rad',
      'max',
      `${t.source}; model: the shaft's slope at the support tilts the inner ring against an aligned housing`,
    ),
  );
}

/**
 * Temperature limits of what the bearing is made of and runs on [3], at any speed (a slow or
 * still bearing cooks its grease and grows its rings as surely as a fast one):
 *   T ≤ T_grease   the assumed grease's upper operating temperature (grease supply, sealed or open)
 *   T ≤ T_steel    dimensional stability of rings of standard heat treatment (every supply)
 * T the bearing's operating temperature, °C (lubrication.ts); limits in
 * data/rolling-running.json → temperatureLimits (common practice, from memory).
 */
function temperatureChecks(ctx: EvalContext, checks: CheckRecord[]): void {
  const lim = ctx.tables.running.temperatureLimits;
  const T = ctx.lubrication.temperature;
  const ambient = ctx.c.environment.ambient;
  const grease = ctx.lubrication.supply === 'grease';
  // Every candidate at one temperature gets the same records: kept (frozen) for the last figures asked.
  const k = keptTemperature;
  if (k && k.lim === lim && Object.is(k.T, T) && Object.is(k.ambient, ambient) && k.grease === grease) {
    for (const r of k.records) checks.push(r);
    return;
  }
  const records: CheckRecord[] = [];
  // Margins as the share of the allowed rise above the surroundings (from absolute zero where they are not below the limit).
  const ref = (limit: number) => (Number.isFinite(ambient) && ambient < limit ? ambient : undefined);
  if (grease)
    records.push(
      makeCheck(
        'grease-temperature',
        kept(greaseLabels, lim.greaseAssumed, "operating temperature against the grease's upper limit (", ')'),
        T,
        lim.grease,
        'degC',
        'max',
        lim.source,
        ref(lim.grease),
      ),
    );
  records.push(
    makeCheck(
      'steel-temperature',
      'operating temperature against the dimensional stability of standard bearing steel',
      T,
      lim.steel,
      'degC',
      'max',
      lim.source,
      ref(lim.steel),
    ),
  );
  for (const r of records) checks.push(Object.freeze(r));
  keptTemperature = { lim, T, ambient, grease, records };
}
let keptTemperature:
  | {
      lim: EvalContext['tables']['running']['temperatureLimits'];
      T: number;
      ambient: number;
      grease: boolean;
      records: CheckRecord[];
    }
  | undefined;

/** Every check of one candidate, in a fixed order: what it carries, then what its surroundings allow. */
export function candidateChecks(spec: CandidateSpec, fig: CandidateFigures, ctx: EvalContext): CheckRecord[] {
  const checks: CheckRecord[] = [];
  loadChecks(spec, fig, ctx, checks);
  fitChecks(spec, fig, ctx, checks);
  return checks;
}
