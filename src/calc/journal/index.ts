import { z } from 'zod';
import type { Assumption, CaseSI } from '../../case/types.js';
import { allLimitsPass, makeCheck, type CheckRecord, type SheetLine } from '../../core/check.js';
import { operatingPoints, pointSpeed } from '../duty.js';
import type { OilGrade } from '../lubricant.js';
import { loadTable, lubricants, oilGrade } from '../../data/load.js';
import { makeMesh } from './mesh.js';
import { solveReynolds } from './reynolds.js';
import { DEFAULT_MESH, seedTables } from './table.js';
import { shippedJournalTables } from '../../data/journal-tables.js';
import {
  allowableFilm,
  allowableFilmText,
  designChecks,
  evaluateDesign,
  sweepDesigns,
  type Candidate,
  type DesignEvaluation,
  type DutyPoint,
  type JournalCriteria,
  type SweepRow,
} from './design.js';
import { THERMAL_SHARE, THERMAL_TOLERANCE_K, type Fluid } from './operating-point.js';

export * from './mesh.js';
export * from './reynolds.js';
export * from './table.js';
export * from './closed-forms.js';
export * from './operating-point.js';
export * from './design.js';

/**
 * Hydrodynamic journal bearing check of a case: chooses (or takes) the length, radial
 * clearance and ISO VG grade, evaluates every operating point with the finite-length
 * Reynolds solution (table.ts), the thermal balance (operating-point.ts) and the design
 * criteria (design.ts), and reports the governing point (smallest film margin).
 *
 * Inputs: CaseSI (SI units: m, N, rev/s, Pa·s, °C). Output: JournalResult (SI; angles in
 * degrees where the key says so; temperatures °C). Every number is finite; a failure to
 * converge throws an Error naming what failed.
 *
 * Sources: Raimondi & Boyd (1958) for the film solution and its conventions; Trumpler
 * (1966, from memory) for the criteria; common practice for the design ranges; see each
 * module's header and each check's `source`.
 */

export interface PressurePoint {
  /** Angle from the maximum-film line in the direction of rotation, degrees. */
  angleDeg: number;
  /** Film pressure at mid-length, Pa. */
  pressure: number;
}

export interface JournalPointSummary {
  share: number;
  load: number;
  speed: number;
  film: boolean;
  sommerfeld: number;
  eccentricityRatio: number;
  minFilmThickness: number;
  allowableFilmThickness: number;
  filmMargin: number;
  attitudeAngle: number;
  frictionCoefficient: number;
  powerLoss: number;
  flow: number;
  sideFlow: number;
  peakPressure: number;
  viscosity: number;
  effectiveTemperature: number;
  maxTemperature: number;
  extrapolated: boolean;
}

export interface JournalResult {
  option: 'journal';
  length: number;
  radialClearance: number;
  clearanceRatio: number;
  lengthToDiameter: number;
  sommerfeld: number;
  eccentricityRatio: number;
  minFilmThickness: number;
  allowableFilmThickness: number;
  /** Attitude angle, degrees. */
  attitudeAngle: number;
  frictionCoefficient: number;
  petroffFrictionCoefficient: number;
  frictionTorque: number;
  /** Power loss at the governing point, W. */
  powerLoss: number;
  /**
   * Share-weighted mean power loss over the operating points, W: Σ share·powerLoss/Σ share
   * over `points` (0 at points without a film) — a time mean over the duty, like the
   * rolling candidate's `frictionPower`.
   */
  meanPowerLoss: number;
  /** Flow drawn in at the maximum film thickness, m³/s. */
  flow: number;
  /** Side leakage, m³/s. */
  sideFlow: number;
  peakPressure: number;
  /** Angle of the peak pressure from the maximum-film line, degrees. */
  peakPressureAngle: number;
  unitLoad: number;
  temperatureRise: number;
  effectiveTemperature: number;
  maxTemperature: number;
  viscosity: number;
  oil: string;
  /** ISO VG grade of the design's oil (null with a fixed viscosity). */
  oilGrade: number | null;
  feasible: boolean;
  checks: CheckRecord[];
  sweep: SweepRow[];
  assumed: Assumption[];
  warnings: string[];
  sheet: SheetLine[];
  /** Pressure around the journal at mid-length, governing point (empty when no film or beyond the table). */
  pressureProfile: PressurePoint[];
  /** Index of the governing operating point in `points`. */
  governingPoint: number;
  points: JournalPointSummary[];
}

/** Options of checkJournal. */
export interface JournalOptions {
  /**
   * Solve the mid-length pressure profile of the governing point (default true). A sweep
   * over many points (the selection map) turns it off: it is one direct Reynolds solve,
   * about 2 ms, and nothing but the report's pressure chart reads it.
   */
  pressureProfile?: boolean;
  /**
   * Build the calculation sheet (default true). A sweep turns it off: `sheet` is then
   * empty; formatting its lines costs more than the design evaluation itself.
   */
  sheet?: boolean;
}

const entry = z.object({ value: z.number().positive(), source: z.string().min(1) });
const list = z.object({ values: z.array(z.number().positive()).min(1), source: z.string().min(1) });
const criteriaSchema = z.object({
  description: z.string(),
  criteria: z.object({
    minFilmBase_m: entry,
    minFilmPerDiameter_1: entry,
    maxTemperature_degC: entry,
    maxStartUnitLoad_Pa: entry,
    designLoadFactor_1: entry,
    typicalUnitLoadMax_Pa: entry,
    typicalUnitLoadMin_Pa: entry,
    lightLoadEccentricity_1: entry,
    frequentStartsPerHour_1: entry,
    oilBathFlowCapacity_m3_s: entry,
  }),
  designSpace: z.object({ lengthToDiameter_1: list, clearanceRatio_1: list }),
  fixedViscosityFluid: z.object({ density_kg_m3: entry, specificHeat_J_kgK: entry }),
});

/** The journal criteria of data/journal-criteria.json (validated, cached by loadTable). */
export function journalCriteria(): JournalCriteria {
  const t = loadTable('journal-criteria.json', criteriaSchema);
  const k = t.criteria;
  return {
    minFilmBase: k.minFilmBase_m.value,
    minFilmPerDiameter: k.minFilmPerDiameter_1.value,
    maxTemperature: k.maxTemperature_degC.value,
    maxStartUnitLoad: k.maxStartUnitLoad_Pa.value,
    designLoadFactor: k.designLoadFactor_1.value,
    typicalUnitLoadMax: k.typicalUnitLoadMax_Pa.value,
    typicalUnitLoadMin: k.typicalUnitLoadMin_Pa.value,
    lightLoadEccentricity: k.lightLoadEccentricity_1.value,
    frequentStartsPerHour: k.frequentStartsPerHour_1.value,
    oilBathFlowCapacity: k.oilBathFlowCapacity_m3_s.value,
    lengthToDiameter: t.designSpace.lengthToDiameter_1.values,
    clearanceRatio: t.designSpace.clearanceRatio_1.values,
    fixedDensity: t.fixedViscosityFluid.density_kg_m3.value,
    fixedSpecificHeat: t.fixedViscosityFluid.specificHeat_J_kgK.value,
    sources: {
      minFilmBase: k.minFilmBase_m.source,
      maxTemperature: k.maxTemperature_degC.source,
      maxStartUnitLoad: k.maxStartUnitLoad_Pa.source,
      designLoadFactor: k.designLoadFactor_1.source,
      typicalUnitLoadMax: k.typicalUnitLoadMax_Pa.source,
      lightLoadEccentricity: k.lightLoadEccentricity_1.source,
      frequentStartsPerHour: k.frequentStartsPerHour_1.source,
      oilBathFlowCapacity: k.oilBathFlowCapacity_m3_s.source,
      lengthToDiameter: t.designSpace.lengthToDiameter_1.source,
      clearanceRatio: t.designSpace.clearanceRatio_1.source,
      fixedViscosityFluid: t.fixedViscosityFluid.density_kg_m3.source,
    },
  };
}

const fmt = (v: number, digits = 4): string => {
  if (v === 0) return '0';
  const a = Math.abs(v);
  return a >= 1e-3 && a < 1e6 ? Number(v.toPrecision(digits)).toString() : v.toExponential(digits - 1);
};

/** The hydrodynamic journal bearing check. See the module comment. */
let seeded = false;

export function checkJournal(c: CaseSI, opts: JournalOptions = {}): JournalResult {
  if (!seeded) {
    seedTables(shippedJournalTables().tables);
    seeded = true;
  }
  const crit = journalCriteria();
  const D = c.shaft.diameter;
  const solverNote: Assumption = {
    field: 'journal.solver',
    value: `mesh ${DEFAULT_MESH.nTheta}×${DEFAULT_MESH.nZeta} (half length), PSOR converged when max |Δp| per sweep ≤ 1e-8·max p; thermal balance to ${THERMAL_TOLERANCE_K} K`,
    reason:
      'convergence criteria of the finite-difference Reynolds solution and the temperature iteration; a solve or balance that does not converge stops the run with an error instead of reporting unconverged numbers',
  };
  const r = D / 2;
  if (!(D > 0 && Number.isFinite(D))) throw new Error(`journal: shaft diameter must be positive, got ${D} m`);
  const assumed: Assumption[] = [solverNote];
  const warnings: string[] = [];
  const extraChecks: CheckRecord[] = [];
  const supply = c.lubrication.supply;
  const tIn = c.lubrication.inletTemperature;

  // Operating points: radial load only; speed of an oscillating shaft = equivalent rotational speed.
  const ops = operatingPoints(c);
  let points: DutyPoint[] = ops.map((p) => ({ share: p.share, load: p.radial, speed: pointSpeed(c, p) }));
  if (ops.some((p) => p.axial > 0))
    assumed.push({
      field: 'load.axial',
      value: 'not carried',
      reason:
        'a plain journal bearing carries radial load only; the axial load needs a thrust face or bearing (common practice)',
    });
  if (c.shaft.oscillation && !c.shaft.speed) {
    warnings.push(
      'Oscillating shaft: evaluated at the equivalent rotational speed θ·f/π, but the sliding speed passes through zero at every reversal, so a hydrodynamic film cannot be sustained; the figures are an upper bound on the film.',
    );
    extraChecks.push(
      makeCheck(
        'motion',
        'Continuous rotation in one direction (needed to sustain a hydrodynamic film); 0 = oscillating',
        0,
        1,
        '1',
        'min',
        'common practice: a hydrodynamic journal bearing needs continuous unidirectional sliding; reversal passes through zero speed',
      ),
    );
  }
  if (points.some((p) => !(p.speed > 0)))
    warnings.push(
      'At least one operating point has zero speed: no hydrodynamic film forms there (film thickness taken as zero).',
    );
  const startLoad = Math.max(c.load.radial, ...points.map((p) => p.load));

  // Lubricant options.
  const fixedFluid = (mu: number): Fluid => ({
    kind: 'fixed',
    viscosity: mu,
    density: crit.fixedDensity,
    specificHeat: crit.fixedSpecificHeat,
  });
  const gradeFluid = (g: number, label?: string): Candidate['fluid'] & { label: string; grade: number } => {
    const oil: OilGrade | undefined = oilGrade(g);
    if (!oil)
      throw new Error(
        `journal: lubrication.oilGrade ISO VG ${g} is not in data/lubricants.json (grades: ${lubricants()
          .grades.map((x) => x.grade)
          .join(', ')})`,
      );
    return { kind: 'oil', oil, label: label ?? `ISO VG ${g}`, grade: g };
  };
  type FluidOption = { fluid: Fluid; label: string; grade?: number };
  let fluids: FluidOption[] = [];
  let noLubricant = false;
  const mu = c.lubrication.viscosity;
  if (mu !== undefined && !(mu > 0 && Number.isFinite(mu)))
    throw new Error(`journal: lubrication.viscosity must be positive, got ${mu} Pa·s`);
  if (mu !== undefined) {
    fluids = [{ fluid: fixedFluid(mu), label: 'fixed viscosity' }];
    assumed.push({
      field: 'lubrication.viscosity',
      value: `${fmt(mu)} Pa·s, fixed`,
      reason: `no thermal iteration; the temperature rise uses ρ = ${crit.fixedDensity} kg/m³, cp = ${crit.fixedSpecificHeat} J/(kg·K) (${crit.sources['fixedViscosityFluid']})`,
    });
  } else if (supply === 'none') {
    noLubricant = true;
    fluids = [{ fluid: fixedFluid(1), label: 'none' }];
  } else if (supply === 'grease') {
    const g = lubricants().greaseBaseOil;
    const f = gradeFluid(g.grade, `grease base oil ISO VG ${g.grade}`);
    fluids = [{ fluid: f, label: f.label, grade: g.grade }];
    assumed.push({ field: 'lubrication.oilGrade', value: `ISO VG ${g.grade} (grease base oil)`, reason: g.source });
  } else if (c.lubrication.oilGrade !== undefined) {
    const f = gradeFluid(c.lubrication.oilGrade);
    fluids = [{ fluid: f, label: f.label, grade: f.grade }];
  } else {
    fluids = lubricants().grades.map((g) => {
      const f = gradeFluid(g.grade);
      return { fluid: f, label: f.label, grade: g.grade };
    });
  }

  if (supply === 'none')
    extraChecks.push(
      makeCheck(
        'supply',
        'Lubricant supply able to keep a full hydrodynamic film (1 = oil bath or oil feed; 0 = none)',
        0,
        1,
        '1',
        'min',
        'common practice: a hydrodynamic journal bearing needs a continuous oil supply',
      ),
    );
  if (supply === 'grease') {
    extraChecks.push(
      makeCheck(
        'supply',
        'Lubricant supply able to keep a full hydrodynamic film (1 = oil bath or oil feed; 0 = grease)',
        0,
        1,
        '1',
        'min',
        'common practice: grease does not feed a full hydrodynamic film; its base oil bleeds slowly and the bearing runs in mixed lubrication',
      ),
    );
    warnings.push(
      'Grease supply: the film figures use the base oil viscosity as if a full film were fed; grease does not sustain one, so they are an upper bound.',
    );
  }
  if (noLubricant) warnings.push('No lubricant supply: no film; hydrodynamic figures are zero.');

  // Lengths.
  const maxL = c.space.maxLength;
  let lengths: number[];
  if (c.journal?.length !== undefined) {
    lengths = [c.journal.length];
    if (c.journal.length > maxL)
      warnings.push(`journal.length ${fmt(c.journal.length)} m exceeds space.maxLength ${fmt(maxL)} m.`);
  } else {
    lengths = crit.lengthToDiameter.map((k) => k * D).filter((L) => L <= maxL * (1 + 1e-9));
    const ldMax = Math.max(...crit.lengthToDiameter);
    const ldMin = Math.min(...crit.lengthToDiameter);
    if (maxL < ldMax * D && maxL >= ldMin * D && !lengths.some((L) => Math.abs(L - maxL) < 1e-9 * D))
      lengths.push(maxL);
    if (lengths.length === 0) {
      lengths = [maxL];
      warnings.push(
        `Axial room ${fmt(maxL)} m gives L/D = ${fmt(maxL / D, 3)}, below the usual ${ldMin}: a short bearing with large side leakage.`,
      );
    }
    assumed.push({
      field: 'journal.length',
      value: 'chosen from the sweep',
      reason: `L/D over ${crit.lengthToDiameter.join(', ')} within space.maxLength (${crit.sources['lengthToDiameter']})`,
    });
  }
  // Clearances.
  let clearances: number[];
  if (c.journal?.radialClearance !== undefined) clearances = [c.journal.radialClearance];
  else if (c.journal?.clearanceRatio !== undefined) clearances = [c.journal.clearanceRatio * r];
  else {
    clearances = crit.clearanceRatio.map((k) => k * r);
    assumed.push({
      field: 'journal.radialClearance',
      value: 'chosen from the sweep',
      reason: `c/r over ${crit.clearanceRatio.join(', ')} (${crit.sources['clearanceRatio']})`,
    });
  }
  if (fluids.length > 1)
    assumed.push({
      field: 'lubrication.oilGrade',
      value: 'chosen from the sweep',
      reason:
        'ISO VG grades of data/lubricants.json, the one giving the largest film margin within the temperature limit',
    });

  // No oil supply: no design can hold a film, so none is optimised; one representative
  // geometry (the longest allowed, c/r = 0.001, common practice) shows the numbers.
  if ((supply === 'none' || supply === 'grease') && (lengths.length > 1 || clearances.length > 1)) {
    lengths = [Math.max(...lengths)];
    if (c.journal?.radialClearance === undefined && c.journal?.clearanceRatio === undefined) clearances = [0.001 * r];
    // The sweep's own assumptions no longer apply; the one below replaces them.
    for (let k = assumed.length - 1; k >= 0; k--)
      if (assumed[k]!.value === 'chosen from the sweep') assumed.splice(k, 1);
    assumed.push({
      field: 'journal.design',
      value: `L = ${fmt(lengths[0]!)} m, c = ${fmt(clearances[0]!)} m`,
      reason: `with ${supply === 'none' ? 'no lubricant supply' : 'grease'} no design keeps a full film, so the design is not optimised: the longest allowed length and the common-practice clearance ratio 0.001 show the numbers`,
    });
  }
  const candidates: Candidate[] = [];
  for (const L of lengths)
    for (const cl of clearances)
      for (const f of fluids) {
        const cand: Candidate = { length: L, radialClearance: cl, fluid: f.fluid, oil: f.label };
        if (f.grade !== undefined) cand.grade = f.grade;
        candidates.push(cand);
      }
  if (noLubricant) points = points.map((p) => ({ ...p, speed: 0 }));

  const { chosen, rows } = sweepDesigns(D, candidates, points, tIn, startLoad, crit);
  const designLoad: DesignEvaluation | undefined = noLubricant
    ? undefined
    : evaluateDesign(D, chosen.candidate, points, tIn, startLoad, crit, crit.designLoadFactor);
  const checks = [...designChecks(chosen, designLoad, supply, crit, tIn), ...extraChecks];
  const feasible = allLimitsPass(checks);

  const g = chosen.governing;
  const res = g.result;
  const L = chosen.candidate.length;
  const cl = chosen.candidate.radialClearance;

  // Warnings from the figures.
  const light = checks.find((k) => k.id === 'light-load');
  if (light && !light.pass)
    warnings.push(
      `Lightly loaded: eccentricity ratio ${fmt(light.value, 3)} below ${light.limit}; a plain full bearing is prone to oil whirl (consider a lobed or tilting-pad bearing, or a smaller length).`,
    );
  if (g.film && res.unitLoad < crit.typicalUnitLoadMin)
    warnings.push(
      `Mean unit load ${fmt(res.unitLoad / 1e6, 3)} MPa is below the typical ${fmt(crit.typicalUnitLoadMin / 1e6, 2)}–${fmt(crit.typicalUnitLoadMax / 1e6, 2)} MPa: the bearing could be shorter (${crit.sources['typicalUnitLoadMax']}).`,
    );
  if (c.environment.startsPerHour > crit.frequentStartsPerHour)
    warnings.push(
      `Frequent starts (${c.environment.startsPerHour} per hour, above ${crit.frequentStartsPerHour}): each start runs in boundary lubrication; start-up unit load and lining wear govern (${crit.sources['frequentStartsPerHour']}).`,
    );
  if (chosen.points.some((p) => p.result.extrapolated))
    warnings.push(
      'Eccentricity ratio beyond 0.98 (the end of the solved table): ε and h0 are extrapolated and order-of-magnitude only; the film is far too thin in any case.',
    );
  if (chosen.points.some((p) => p.result.thermalRunaway))
    warnings.push(
      'No thermal equilibrium below 250 °C: the film would overheat (thermal runaway); the temperatures shown are lower bounds.',
    );
  if (supply === 'oil-feed')
    warnings.push(
      `Oil feed: the pump must deliver at least ${fmt(Math.max(...chosen.points.map((p) => p.result.flow)) * 6e4, 3)} L/min per bearing at the inlet temperature (common practice: size the supply above the film's inflow).`,
    );
  if (supply === 'oil-bath')
    assumed.push({
      field: 'lubrication.inletTemperature',
      value: `${fmt(tIn)} °C`,
      reason: 'taken as the sump temperature of the bath; the housing heat balance of the sump is not computed',
    });
  const ld = L / D;
  if (ld < 0.25 || ld > 2)
    warnings.push(`L/D = ${fmt(ld, 3)} is outside 0.25–2, the range the solver was checked against published tables.`);

  // Pressure profile at mid-length, governing point: one direct solve (about 2 ms).
  const pressureProfile: PressurePoint[] = [];
  if (opts.pressureProfile !== false && g.film && res.eccentricityRatio > 0 && res.eccentricityRatio <= 0.98) {
    const mesh = makeMesh(DEFAULT_MESH.nTheta, DEFAULT_MESH.nZeta, DEFAULT_MESH.stretch);
    const sol = solveReynolds(res.eccentricityRatio, ld, mesh);
    const scale = res.viscosity * 2 * Math.PI * res.speed * (r / cl) ** 2;
    const stride = mesh.nZeta + 1;
    for (let i = 0; i <= mesh.nTheta; i++)
      pressureProfile.push({ angleDeg: (mesh.theta[i]! * 180) / Math.PI, pressure: sol.p[i * stride]! * scale });
  }

  const sheet = opts.sheet === false ? [] : buildSheet(c, chosen, crit, supply);
  const pointsOut: JournalPointSummary[] = chosen.points.map((p) => ({
    share: p.share,
    load: p.load,
    speed: p.speed,
    film: p.film,
    sommerfeld: p.result.sommerfeld,
    eccentricityRatio: p.result.eccentricityRatio,
    minFilmThickness: p.result.minFilmThickness,
    allowableFilmThickness: p.allowableFilm,
    filmMargin: p.filmMargin,
    attitudeAngle: p.result.attitudeDeg,
    frictionCoefficient: p.result.frictionCoefficient,
    powerLoss: p.result.powerLoss,
    flow: p.result.flow,
    sideFlow: p.result.sideFlow,
    peakPressure: p.result.peakPressure,
    viscosity: p.result.viscosity,
    effectiveTemperature: p.result.effectiveTemperature,
    maxTemperature: p.result.maxTemperature,
    extrapolated: p.result.extrapolated,
  }));

  const out: JournalResult = {
    option: 'journal',
    length: L,
    radialClearance: cl,
    clearanceRatio: cl / r,
    lengthToDiameter: ld,
    sommerfeld: res.sommerfeld,
    eccentricityRatio: res.eccentricityRatio,
    minFilmThickness: res.minFilmThickness,
    allowableFilmThickness: allowableFilm(D, crit),
    attitudeAngle: res.attitudeDeg,
    frictionCoefficient: res.frictionCoefficient,
    petroffFrictionCoefficient: res.petroffFrictionCoefficient,
    frictionTorque: res.frictionTorque,
    powerLoss: res.powerLoss,
    meanPowerLoss: meanPowerLoss(pointsOut),
    flow: res.flow,
    sideFlow: res.sideFlow,
    peakPressure: res.peakPressure,
    peakPressureAngle: res.peakAngleDeg,
    unitLoad: res.unitLoad,
    temperatureRise: res.temperatureRise,
    effectiveTemperature: res.effectiveTemperature,
    maxTemperature: chosen.maxTemperature,
    viscosity: res.viscosity,
    oil: chosen.candidate.oil,
    oilGrade: chosen.candidate.grade ?? null,
    feasible,
    checks,
    sweep: rows,
    assumed,
    warnings,
    sheet,
    pressureProfile,
    governingPoint: chosen.governingIndex,
    points: pointsOut,
  };
  assertFinite(out);
  return out;
}

/** Share-weighted mean of the points' power loss, W (0 when no point has a share). */
function meanPowerLoss(points: readonly { share: number; powerLoss: number }[]): number {
  let sumShare = 0;
  let sumPower = 0;
  for (const p of points) {
    const w = Number.isFinite(p.share) ? Math.max(0, p.share) : 0;
    sumShare += w;
    sumPower += w * p.powerLoss;
  }
  return sumShare > 0 ? sumPower / sumShare : 0;
}

/** Throw if any number in the result is NaN or infinite (fail loudly, never report them). */
function assertFinite(v: unknown, path: () => string = () => 'result'): void {
  // The path is built only when a number fails: building it for every number cost more
  // than the check itself (a sweep calls this thousands of times).
  if (typeof v === 'number') {
    if (!Number.isFinite(v)) throw new Error(`journal: internal error, ${path()} is ${v}`);
  } else if (Array.isArray(v)) v.forEach((x, k) => assertFinite(x, () => `${path()}[${k}]`));
  else if (v && typeof v === 'object') for (const [k, x] of Object.entries(v)) assertFinite(x, () => `${path()}.${k}`);
}

function buildSheet(c: CaseSI, e: DesignEvaluation, crit: JournalCriteria, supply: string): SheetLine[] {
  const D = c.shaft.diameter;
  const r = D / 2;
  const L = e.candidate.length;
  const cl = e.candidate.radialClearance;
  const g = e.governing;
  const res = g.result;
  const W = g.load;
  const N = g.speed;
  const RB = 'Raimondi & Boyd (1958), ASLE Trans. 1(1)';
  const lines: SheetLine[] = [
    {
      label: 'Mean unit load P',
      formula: 'P = W/(L·D)',
      substituted: `P = ${fmt(W)} N/(${fmt(L)} m · ${fmt(D)} m)`,
      value: res.unitLoad,
      unit: 'Pa',
      source: 'definition',
    },
  ];
  if (!g.film) {
    lines.push({
      label: 'Minimum film thickness h0',
      formula: 'no rotation or no lubricant: h0 = 0',
      substituted: `N = ${fmt(N)} rev/s${supply === 'none' ? ', supply none' : ''}: h0 = 0`,
      value: 0,
      unit: 'm',
      source: 'common practice',
    });
    return lines;
  }
  const thermal =
    e.candidate.fluid.kind === 'oil'
      ? `T_eff = T_in + ${THERMAL_SHARE}·ΔT, iterated to ${THERMAL_TOLERANCE_K} K`
      : 'fixed viscosity';
  lines.push(
    {
      label: 'Viscosity μ',
      formula: e.candidate.fluid.kind === 'oil' ? `μ = ν(T_eff)·ρ(T_eff), Walther (ASTM D341); ${thermal}` : 'μ given',
      substituted:
        e.candidate.fluid.kind === 'oil'
          ? `μ(${e.candidate.oil}, T_eff = ${fmt(res.effectiveTemperature)} °C)`
          : `μ = ${fmt(res.viscosity)} Pa·s`,
      value: res.viscosity,
      unit: 'Pa*s',
      source: e.candidate.fluid.kind === 'oil' ? 'ASTM D341 (Walther form, from memory)' : 'case',
    },
    {
      label: 'Sommerfeld number S',
      formula: 'S = (r/c)²·μ·N/P',
      substituted: `S = (${fmt(r)} m/${fmt(cl)} m)² · ${fmt(res.viscosity)} Pa·s · ${fmt(N)} rev/s / ${fmt(res.unitLoad)} Pa`,
      value: res.sommerfeld,
      unit: '1',
      source: RB,
    },
    {
      label: 'Eccentricity ratio ε',
      formula: 'ε such that S(ε, L/D) = S, finite-difference Reynolds solution (table, interpolated)',
      substituted: `ε(L/D = ${fmt(L / D)}, S = ${fmt(res.sommerfeld)})`,
      value: res.eccentricityRatio,
      unit: '1',
      source: RB,
    },
    {
      label: 'Minimum film thickness h0',
      formula: 'h0 = c·(1 − ε)',
      substituted: `h0 = ${fmt(cl)} m · (1 − ${fmt(res.eccentricityRatio)})`,
      value: res.minFilmThickness,
      unit: 'm',
      source: RB,
    },
    {
      label: 'Allowable minimum film h_allow',
      formula: `h_allow = ${allowableFilmText(crit)}`,
      substituted: `h_allow = ${fmt(crit.minFilmBase)} m + ${fmt(crit.minFilmPerDiameter)} · ${fmt(D)} m`,
      value: g.allowableFilm,
      unit: 'm',
      source: crit.sources['minFilmBase'] ?? '',
    },
    {
      label: 'Attitude angle φ',
      formula: 'φ(ε, L/D) from the Reynolds solution (table, interpolated)',
      substituted: `φ(ε = ${fmt(res.eccentricityRatio)}, L/D = ${fmt(L / D)})`,
      value: res.attitudeDeg,
      unit: 'deg',
      source: RB,
    },
    {
      label: 'Friction coefficient f',
      formula:
        'f = (c/r)·[(r/c)f], friction variable (r/c)f = 2π²S/√(1−ε²) + (ε/2)·sin φ at the table nodes, interpolated at ε',
      substituted: `f = (${fmt(cl)} m/${fmt(r)} m) · ${fmt(res.point.frictionVariable)}`,
      value: res.frictionCoefficient,
      unit: '1',
      source: RB,
    },
    {
      label: 'Petroff friction coefficient',
      formula: 'f_P = 2π²·(μN/P)·(r/c)',
      substituted: `f_P = 2π² · (${fmt(res.viscosity)} · ${fmt(N)}/${fmt(res.unitLoad)}) · (${fmt(r)}/${fmt(cl)})`,
      value: res.petroffFrictionCoefficient,
      unit: '1',
      source: 'Petroff (1883), in Hamrock, Schmid & Jacobson (2004)',
    },
    {
      label: 'Friction torque',
      formula: 'T = f·W·r',
      substituted: `T = ${fmt(res.frictionCoefficient)} · ${fmt(W)} N · ${fmt(r)} m`,
      value: res.frictionTorque,
      unit: 'N*m',
      source: 'definition',
    },
    {
      label: 'Power loss',
      formula: 'H = 2π·N·T',
      substituted: `H = 2π · ${fmt(N)} rev/s · ${fmt(res.frictionTorque)} N·m`,
      value: res.powerLoss,
      unit: 'W',
      source: 'definition',
    },
    {
      label: 'Oil flow drawn in',
      formula: 'Q = [Q/(rcNL)]·r·c·N·L',
      substituted: `Q = ${fmt(res.point.flowVariable)} · ${fmt(r)} m · ${fmt(cl)} m · ${fmt(N)} rev/s · ${fmt(L)} m`,
      value: res.flow,
      unit: 'm^3/s',
      source: RB,
    },
    {
      label: 'Side leakage',
      formula: 'Qs = (Qs/Q)·Q',
      substituted: `Qs = ${fmt(res.point.sideFlowRatio)} · ${fmt(res.flow)} m³/s`,
      value: res.sideFlow,
      unit: 'm^3/s',
      source: RB,
    },
    {
      label: 'Temperature rise ΔT',
      formula: 'ΔT = 4π·P·[(r/c)f] / (ρ·cp·[Q/(rcNL)]·(1 − ½·Qs/Q))',
      substituted: `ΔT = 4π · ${fmt(res.unitLoad)} Pa · ${fmt(res.point.frictionVariable)} / (${fmt(res.densityUsed)} kg/m³ · ${fmt(res.specificHeatUsed)} J/(kg·K) · ${fmt(res.point.flowVariable)} · (1 − ½·${fmt(res.point.sideFlowRatio)}))`,
      value: res.temperatureRise,
      unit: 'K',
      source: `${RB}, Part III heat balance (from memory; common practice)`,
    },
    {
      label: 'Effective film temperature',
      formula: `T_eff = T_in + ${THERMAL_SHARE}·ΔT`,
      substituted: `T_eff = ${fmt(c.lubrication.inletTemperature)} °C + ${THERMAL_SHARE} · ${fmt(res.temperatureRise)} K`,
      value: res.effectiveTemperature,
      unit: 'degC',
      source: 'common practice (mean of inlet and outlet)',
    },
    {
      label: 'Maximum temperature estimate',
      formula: 'T_max = T_in + ΔT',
      substituted: `T_max = ${fmt(c.lubrication.inletTemperature)} °C + ${fmt(res.temperatureRise)} K`,
      value: res.maxTemperature,
      unit: 'degC',
      source: 'common practice (outlet temperature)',
    },
    {
      label: 'Peak film pressure',
      formula: 'pmax = P/(P/pmax)',
      substituted: `pmax = ${fmt(res.unitLoad)} Pa / ${fmt(res.point.pressureRatio)}`,
      value: res.peakPressure,
      unit: 'Pa',
      source: RB,
    },
  );
  if (e.points.length > 1) {
    const terms =
      e.points.length <= 4
        ? `H̄ = (${e.points.map((p) => `${fmt(p.share)} · ${fmt(p.result.powerLoss)} W`).join(' + ')})/(${e.points.map((p) => fmt(p.share)).join(' + ')})`
        : `H̄ = (Σ over ${e.points.length} points of share·H)/(Σ share)`;
    lines.push({
      label: 'Mean power loss over the duty',
      formula: 'H̄ = Σ share·H/Σ share over the operating points (H = 0 without a film)',
      substituted: terms,
      value: meanPowerLoss(e.points.map((p) => ({ share: p.share, powerLoss: p.result.powerLoss }))),
      unit: 'W',
      source: 'definition (time mean)',
    });
  }
  return lines;
}
