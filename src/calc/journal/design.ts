import { advisory, makeCheck, type CheckRecord } from '../../core/check.js';
import { operatingPoint, type Fluid, type Geometry, type OperatingResult } from './operating-point.js';
import { tableFor } from './table.js';
import { mayGate, type JournalCriteria } from '../../data/journal-criteria.js';

/**
 * Design of a plain full journal bearing at concept stage: evaluation of one geometry
 * and lubricant over the operating points, the sweep over length, clearance and oil
 * grade, and the design checks.
 *
 * Criteria (values and sources in data/journal-criteria.json; each check carries its source):
 *  - minimum film thickness h0 ≥ h_allow = h_base + k_D·D (Trumpler 1966, from memory),
 *  - maximum film temperature T_in + ΔT ≤ T_allow (Trumpler 1966, from memory),
 *  - start-up unit load W_start/(L·D) ≤ p_start, W_start the radial load at start and stop
 *    (the case's load.atStart, else the largest running load) (Trumpler 1966, from memory),
 *  - film at the design load factor × running load still ≥ h_allow (Trumpler 1966,
 *    from memory; advisory),
 *  - mean unit load within the typical range (from memory; advisory),
 *  - lightly loaded (smallest ε below the light-load limit): whirl-prone (common practice;
 *    advisory),
 *  - oil-bath or ring supply can deliver the flow the film draws in (from memory, low
 *    confidence on the capacity: advisory, see below).
 * Every criterion row carries a confidence (data/journal-criteria.json); a limit whose
 * confidence is `low` informs and never excludes a design (advisory, its confidence in the
 * label and the source).
 * Film margin = (h0 − h_allow)/h_allow, the CheckRecord convention (src/core/check.ts).
 *
 * Sweep (common practice ranges, data/journal-criteria.json): L/D over the listed values
 * capped by the axial room, c/r over the listed values, and the ISO VG grades of
 * data/lubricants.json when the case names none. The chosen design maximises the governing
 * film margin among designs whose temperature and start-up load pass, preferring those not
 * lightly loaded (ε at or above the light-load limit at every point: a thicker film bought
 * by a whirl-prone bearing is not a better design, common practice); if none passes, the
 * one with the largest min(film margin, temperature margin, start-up margin) is shown (and
 * fails).
 */

/** A duty point as the journal check sees it: radial load N, speed rev/s, time share. */
export interface DutyPoint {
  share: number;
  load: number;
  speed: number;
}

export interface Candidate {
  length: number;
  radialClearance: number;
  fluid: Fluid;
  /** "ISO VG 68", "fixed viscosity", "grease base oil ISO VG 100". */
  oil: string;
  grade?: number;
}

export interface PointResult {
  share: number;
  load: number;
  speed: number;
  /** False when the shaft does not turn at this point (no hydrodynamic film). */
  film: boolean;
  result: OperatingResult;
  allowableFilm: number;
  filmMargin: number;
}

export interface DesignEvaluation {
  candidate: Candidate;
  diameter: number;
  points: PointResult[];
  governingIndex: number;
  governing: PointResult;
  filmMargin: number;
  /** Highest maximum-temperature estimate over the points, °C. */
  maxTemperature: number;
  temperatureMargin: number;
  startUnitLoad: number;
  startMargin: number;
  /** Film, temperature and start-up criteria all pass. */
  passesCore: boolean;
}

/**
 * The film criterion in words, from the criteria data (e.g. "5 µm + 0.00004·D"):
 * h_base in µm, k_D as a plain number.
 */
export function allowableFilmText(crit: JournalCriteria): string {
  const base = Number((crit.minFilmBase * 1e6).toPrecision(4));
  const perD = Number(crit.minFilmPerDiameter.toPrecision(4));
  return `${base} µm + ${perD}·D`;
}

/** Allowable minimum film thickness, m: h_allow = h_base + k_D·D (Trumpler 1966, from memory). */
export function allowableFilm(diameter: number, crit: JournalCriteria): number {
  return crit.minFilmBase + crit.minFilmPerDiameter * diameter;
}

/** The state of a bearing whose shaft does not turn: no film, finite numbers only. */
function noFilm(geometry: Geometry, load: number, inletTemperature: number, mu: number): OperatingResult {
  const unitLoad = load / (geometry.length * geometry.diameter);
  return {
    load,
    speed: 0,
    unitLoad,
    viscosity: mu,
    sommerfeld: 0,
    eccentricityRatio: 1,
    minFilmThickness: 0,
    attitudeDeg: 0,
    frictionCoefficient: 0,
    petroffFrictionCoefficient: 0,
    frictionTorque: 0,
    powerLoss: 0,
    flow: 0,
    sideFlow: 0,
    peakPressure: unitLoad,
    peakAngleDeg: 180,
    filmEndDeg: 180,
    temperatureRise: 0,
    effectiveTemperature: inletTemperature,
    maxTemperature: inletTemperature,
    densityUsed: 0,
    specificHeatUsed: 0,
    extrapolated: false,
    thermalRunaway: false,
    thermalIterations: 0,
    point: {
      eccentricity: 1,
      lengthToDiameter: geometry.length / geometry.diameter,
      sommerfeld: 0,
      attitudeDeg: 0,
      frictionVariable: 0,
      flowVariable: 0,
      sideFlowRatio: 0,
      pressureRatio: 1,
      peakAngleDeg: 180,
      filmEndDeg: 180,
      extrapolated: false,
    },
  };
}

/** Smallest radial load used, N: an unloaded point is evaluated as very lightly loaded (ε → 0, Petroff). */
const MIN_LOAD = 1e-6;

/** Evaluate one candidate over all points; the governing point has the smallest film margin. */
export function evaluateDesign(
  diameter: number,
  candidate: Candidate,
  points: readonly DutyPoint[],
  inletTemperature: number,
  startLoad: number,
  crit: JournalCriteria,
  loadFactor = 1,
): DesignEvaluation {
  if (points.length === 0) throw new Error('journal: no operating points');
  const geometry: Geometry = { diameter, length: candidate.length, radialClearance: candidate.radialClearance };
  const table = tableFor(candidate.length / diameter);
  const hAllow = allowableFilm(diameter, crit);
  const results: PointResult[] = points.map((p) => {
    const load = Math.max(MIN_LOAD, p.load * loadFactor);
    if (!(p.speed > 0)) {
      // No rotation (or no lubricant, oil "none"): no film; report the viscosity only when it is a given one.
      const mu = candidate.fluid.kind === 'fixed' && candidate.oil !== 'none' ? candidate.fluid.viscosity : 0;
      const r = noFilm(geometry, load, inletTemperature, mu);
      return { share: p.share, load, speed: 0, film: false, result: r, allowableFilm: hAllow, filmMargin: -1 };
    }
    const r = operatingPoint(table, { geometry, load, speed: p.speed, fluid: candidate.fluid, inletTemperature });
    return {
      share: p.share,
      load,
      speed: p.speed,
      film: true,
      result: r,
      allowableFilm: hAllow,
      filmMargin: (r.minFilmThickness - hAllow) / hAllow,
    };
  });
  let gi = 0;
  for (let k = 1; k < results.length; k++) if (results[k]!.filmMargin < results[gi]!.filmMargin) gi = k;
  const maxT = Math.max(...results.map((r) => r.result.maxTemperature));
  const startUnitLoad = startLoad / (candidate.length * diameter);
  const filmMargin = results[gi]!.filmMargin;
  // Share of the allowed rise above the inlet left (the check-record convention for temperatures, check.ts).
  const allowedRise = crit.maxTemperature - inletTemperature;
  const temperatureMargin =
    allowedRise > 0
      ? (crit.maxTemperature - maxT) / allowedRise
      : (crit.maxTemperature - maxT) / (crit.maxTemperature + 273.15);
  const startMargin = (crit.maxStartUnitLoad - startUnitLoad) / crit.maxStartUnitLoad;
  return {
    candidate,
    diameter,
    points: results,
    governingIndex: gi,
    governing: results[gi]!,
    filmMargin,
    maxTemperature: maxT,
    temperatureMargin,
    startUnitLoad,
    startMargin,
    passesCore: filmMargin >= 0 && temperatureMargin >= 0 && startMargin >= 0,
  };
}

/** A row of the design sweep, for the report. */
export interface SweepRow {
  length: number;
  lengthToDiameter: number;
  radialClearance: number;
  clearanceRatio: number;
  oil: string;
  eccentricityRatio: number;
  minFilmThickness: number;
  filmMargin: number;
  maxTemperature: number;
  temperatureMargin: number;
  startUnitLoad: number;
  powerLoss: number;
  flow: number;
  /** Film, temperature and start-up criteria pass. */
  passes: boolean;
  chosen: boolean;
}

/** Smallest eccentricity ratio over the points that have a film (1 when none has). */
function minEccentricity(e: DesignEvaluation): number {
  const f = e.points.filter((p) => p.film);
  return f.length ? Math.min(...f.map((p) => p.result.eccentricityRatio)) : 1;
}

function score(e: DesignEvaluation, crit: JournalCriteria): [number, number] {
  // Tier 3: temperature and start-up pass and the bearing is not lightly loaded; tier 2:
  // temperature and start-up pass; within both, by film margin. Tier 1 (nothing passes):
  // by the worst of the three margins. The second key breaks ties by lower power loss.
  const okOthers = e.temperatureMargin >= 0 && e.startMargin >= 0;
  const notLight = minEccentricity(e) >= crit.lightLoadEccentricity;
  const primary = okOthers
    ? (notLight ? 2e6 : 1e6) + e.filmMargin
    : Math.min(e.filmMargin, e.temperatureMargin, e.startMargin);
  return [primary, -e.governing.result.powerLoss];
}

/**
 * Evaluate every candidate and pick the best (see module comment). Returns the chosen
 * evaluation and one sweep row per candidate.
 */
export function sweepDesigns(
  diameter: number,
  candidates: readonly Candidate[],
  points: readonly DutyPoint[],
  inletTemperature: number,
  startLoad: number,
  crit: JournalCriteria,
): { chosen: DesignEvaluation; rows: SweepRow[] } {
  if (candidates.length === 0) throw new Error('journal: no design candidates');
  const evals = candidates.map((c) => evaluateDesign(diameter, c, points, inletTemperature, startLoad, crit));
  let best = 0;
  for (let k = 1; k < evals.length; k++) {
    const a = score(evals[k]!, crit);
    const b = score(evals[best]!, crit);
    if (a[0] > b[0] || (a[0] === b[0] && a[1] > b[1])) best = k;
  }
  const r = diameter / 2;
  const rows = evals.map((e, k) => ({
    length: e.candidate.length,
    lengthToDiameter: e.candidate.length / diameter,
    radialClearance: e.candidate.radialClearance,
    clearanceRatio: e.candidate.radialClearance / r,
    oil: e.candidate.oil,
    eccentricityRatio: e.governing.result.eccentricityRatio,
    minFilmThickness: e.governing.result.minFilmThickness,
    filmMargin: e.filmMargin,
    maxTemperature: e.maxTemperature,
    temperatureMargin: e.temperatureMargin,
    startUnitLoad: e.startUnitLoad,
    powerLoss: e.governing.result.powerLoss,
    flow: e.governing.result.flow,
    passes: e.passesCore,
    chosen: k === best,
  }));
  return { chosen: evals[best]!, rows };
}

/** Check ids that inform but do not decide feasibility: designChecks marks them with the advisory flag. */
export const ADVISORY_CHECKS: readonly string[] = ['unit-load', 'light-load', 'film-design-load'];

/**
 * The design checks of a chosen evaluation, in report order: the limits (film, temperature,
 * start-up), the advice (unit load, light load, film at the design load) and, with an oil
 * bath, the supply flow. `designLoad` is the same design evaluated at the design load factor
 * (for the advisory film check); `supply` the case's supply; `inletTemperature` (°C) the
 * reference of the temperature margin (the share of the allowed rise above the inlet left;
 * from absolute zero when not given, see check.ts). Limits and sources: data/journal-criteria.json.
 */
export function designChecks(
  e: DesignEvaluation,
  designLoad: DesignEvaluation | undefined,
  supply: 'none' | 'grease' | 'oil-bath' | 'oil-feed',
  crit: JournalCriteria,
  inletTemperature?: number,
): CheckRecord[] {
  const checks = [...limitChecks(e, crit, inletTemperature), ...adviceChecks(e, designLoad, crit)];
  if (supply === 'oil-bath') checks.push(supplyFlowCheck(e, crit));
  return checks.map((k) => (ADVISORY_CHECKS.includes(k.id) ? advisory(k) : k));
}

/**
 * The limits that decide feasibility: h0 ≥ h_allow = h_base + k_D·D at the governing point,
 * T_max = T_in + ΔT ≤ T_allow over the points, start-up unit load W_start/(L·D) ≤ p_start
 * (Trumpler 1966, from memory; values in data/journal-criteria.json).
 */
function limitChecks(e: DesignEvaluation, crit: JournalCriteria, inletTemperature?: number): CheckRecord[] {
  const s = crit.sources;
  // An inlet at or above the limit leaves no rise to share out: the margin then falls back to absolute zero.
  const tRef =
    inletTemperature !== undefined && Number.isFinite(inletTemperature) && inletTemperature < crit.maxTemperature
      ? inletTemperature
      : undefined;
  return [
    makeCheck(
      'min-film',
      `Minimum film thickness h0 at the governing point against the allowable h0 = ${allowableFilmText(crit)}`,
      e.governing.result.minFilmThickness,
      e.governing.allowableFilm,
      'm',
      'min',
      s['minFilmBase'] ?? '',
    ),
    makeCheck(
      'max-temperature',
      'Maximum film temperature estimate T_in + ΔT (highest over the operating points)',
      e.maxTemperature,
      crit.maxTemperature,
      'degC',
      'max',
      tRef !== undefined
        ? `${s['maxTemperature'] ?? ''}; margin: share of the allowed rise above the inlet temperature (${Number(tRef.toPrecision(4))} °C)`
        : `${s['maxTemperature'] ?? ''}; margin measured from absolute zero (the inlet temperature is not below the limit)`,
      tRef,
    ),
    makeCheck(
      'start-unit-load',
      'Start-up unit load W_start/(L·D) (radial load when the shaft starts and stops: load.atStart, else the largest running load)',
      e.startUnitLoad,
      crit.maxStartUnitLoad,
      'Pa',
      'max',
      s['maxStartUnitLoad'] ?? '',
    ),
  ];
}

/**
 * The advice (ADVISORY_CHECKS): mean unit load P = W/(L·D) against the top of the typical
 * range; smallest ε over the points with a film against the light-load limit (whirl, common
 * practice); h0 at the design load factor × running load against h_allow (Trumpler 1966,
 * from memory). The light-load check needs a film, the design-load one its evaluation.
 */
function adviceChecks(
  e: DesignEvaluation,
  designLoad: DesignEvaluation | undefined,
  crit: JournalCriteria,
): CheckRecord[] {
  const s = crit.sources;
  const checks: CheckRecord[] = [
    makeCheck(
      'unit-load',
      'Mean unit load P = W/(L·D) at the governing point, against the upper end of the typical range',
      e.governing.result.unitLoad,
      crit.typicalUnitLoadMax,
      'Pa',
      'max',
      s['typicalUnitLoadMax'] ?? '',
    ),
  ];
  const filmPoints = e.points.filter((p) => p.film);
  if (filmPoints.length > 0) {
    const minEps = Math.min(...filmPoints.map((p) => p.result.eccentricityRatio));
    checks.push(
      makeCheck(
        'light-load',
        'Smallest eccentricity ratio over the operating points (below the limit the bearing is lightly loaded and whirl-prone)',
        minEps,
        crit.lightLoadEccentricity,
        '1',
        'min',
        s['lightLoadEccentricity'] ?? '',
      ),
    );
  }
  if (designLoad) {
    checks.push(
      makeCheck(
        'film-design-load',
        `Minimum film thickness at ${crit.designLoadFactor} × running load, against the same allowable`,
        designLoad.governing.result.minFilmThickness,
        designLoad.governing.allowableFilm,
        'm',
        'min',
        s['designLoadFactor'] ?? '',
      ),
    );
  }
  return checks;
}

/**
 * Oil-bath supply: the largest flow the film draws in over the points, Q (m³/s), against
 * what an oil ring or bath delivers (from memory, low confidence; data/journal-criteria.json).
 * Held with the confidence of its row: advisory unless that confidence may gate.
 */
function supplyFlowCheck(e: DesignEvaluation, crit: JournalCriteria): CheckRecord {
  const confidence = crit.confidence['oilBathFlowCapacity'];
  const k = makeCheck(
    'supply-flow',
    `Oil flow the film draws in at the maximum film thickness, against what an oil ring or bath can deliver (confidence: ${confidence ?? 'not stated'})`,
    Math.max(...e.points.map((p) => p.result.flow)),
    crit.oilBathFlowCapacity,
    'm^3/s',
    'max',
    `${crit.sources['oilBathFlowCapacity'] ?? ''} [confidence: ${confidence ?? 'not stated'}]`,
  );
  return mayGate(confidence) ? k : advisory(k);
}
