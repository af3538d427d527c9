import type { BushingMaterial, CaseSI } from '../../case/types.js';
import { advisory, allLimitsPass, makeCheck, type CheckRecord } from '../../core/check.js';
import type { BushingFactors, BushingMaterialRow } from '../../data/bushing.js';
import { frictionHeat, meanPressure, peakPressure, temperatureRise, wearDepth } from './formulas.js';
import type { BushingMaterialResult, DutyPoint } from './types.js';

/** Seconds in an hour: wear is summed over the life target in hours. */
export const HOUR = 3600;
/** Lengths are chosen in whole millimetres, as a drawing would give them. */
export const LENGTH_STEP = 1e-3;

/** The shortest length for each limit, the governing one, and the length taken. */
interface Sizing {
  minLengthBy: { pressure: number; pv: number; wear: number };
  minLength: number;
  length: number;
  lengthChosen: BushingMaterialResult['lengthChosen'];
}

/**
 * Size a bushing: each limit scales as 1/L, so the shortest length for each is a closed form.
 *   L_p = F_max/(D·p_max),  L_PV = (F·V)_max/(D·PV_max),  L_w = (Σ share·f_m·f_e·k·p_peak(L=1)·V·3600)·T/δ
 * F N, V m/s, D m, T the life target h, δ the wear allowance m. The length taken is the case's,
 * or the shortest meeting all three (and L/D_min) rounded up to whole millimetres, capped by the
 * axial space. Source: the formulas in ./formulas.ts; whole millimetres common practice.
 */
function sizeLength(
  c: CaseSI,
  m: BushingMaterial | BushingMaterialRow,
  points: DutyPoint[],
  wearRateTimesL: (k: number) => number,
  lengthToDiameterMin: number,
): Sizing {
  const D = c.shaft.diameter;
  const Fmax = Math.max(...points.map((p) => p.F));
  const FVmax = Math.max(...points.map((p) => p.F * p.V));
  const minLengthBy = {
    pressure: Fmax / (D * m.maxPressure),
    pv: FVmax / (D * m.maxPV),
    wear: (wearRateTimesL(m.wearFactor) * c.life.hours) / c.life.wearAllowance,
  };
  const minLength = Math.max(minLengthBy.pressure, minLengthBy.pv, minLengthBy.wear);
  if (c.bushing?.length !== undefined)
    return { minLengthBy, minLength, length: c.bushing.length, lengthChosen: 'case' };
  const wanted = Math.ceil(Math.max(minLength, lengthToDiameterMin * D) / LENGTH_STEP - 1e-9) * LENGTH_STEP;
  return {
    minLengthBy,
    minLength,
    length: Math.min(wanted, c.space.maxLength),
    lengthChosen: wanted > c.space.maxLength ? 'space-limited' : 'shortest-meeting-limits',
  };
}

/** The figures a material's checks are held against, at the length taken. */
interface Figures {
  length: number;
  pressure: number;
  Vmax: number;
  pv: number;
  lifeHours: number;
  temperature: number;
  outerDiameter: number;
  lOverD: number;
}

/**
 * The checks of one material at its length: pressure, speed, PV and wear life against the
 * material's limits (the material row's source); temperature and L/D as advice; axial and
 * radial space against the case.
 */
function materialChecks(
  c: CaseSI,
  m: BushingMaterial | BushingMaterialRow,
  f: Figures,
  factors: BushingFactors,
): CheckRecord[] {
  const src = m.source;
  const ld = factors.lengthToDiameter;
  const wearSrc = `Archard wear law, The Tribology Handbook 2nd ed. 1995, A5; wear factor: ${src}`;
  return [
    makeCheck('pressure', 'Mean pressure P = F/(D·L)', f.pressure, m.maxPressure, 'Pa', 'max', src),
    makeCheck('velocity', 'Sliding speed V', f.Vmax, m.maxVelocity, 'm/s', 'max', src),
    makeCheck('pv', 'PV', f.pv, m.maxPV, 'Pa*m/s', 'max', src),
    makeCheck(
      'wear-life',
      'Hours to wear through the allowance (typical wear factor)',
      f.lifeHours,
      c.life.hours,
      'h',
      'min',
      wearSrc,
    ),
    // Advisory: the one-node heat model is crude; PV is the published thermal criterion.
    advisory(
      makeCheck(
        'temperature',
        'Running temperature (lumped estimate, advisory)',
        f.temperature,
        m.maxTemperature,
        'degC',
        'max',
        `${src}; heat model: ${factors.heat.source}; margin: share of the allowed rise above ambient`,
        c.environment.ambient,
      ),
    ),
    makeCheck(
      'axial-space',
      'Length within the axial space',
      f.length,
      c.space.maxLength,
      'm',
      'max',
      'the case (space.maxLength)',
    ),
    makeCheck(
      'radial-space',
      'Outer diameter within the housing bore',
      f.outerDiameter,
      c.space.maxOuterDiameter,
      'm',
      'max',
      'the case (space.maxOuterDiameter); wall thickness common practice',
    ),
    // Length/diameter is advice (edge loading, misalignment), not a limit.
    advisory(
      f.lOverD < 1
        ? makeCheck('length-to-diameter', 'Length/diameter (advisory)', f.lOverD, ld.min, '1', 'min', ld.source)
        : makeCheck('length-to-diameter', 'Length/diameter (advisory)', f.lOverD, ld.max, '1', 'max', ld.source),
    ),
  ];
}

/**
 * Size and check one material class for the duty (see sizeLength and materialChecks): wear
 * depth and life at the typical wear factor and at the ends of its scatter, friction heat and
 * the lumped temperature rise. SI units; lives in hours.
 */
export function checkMaterial(
  c: CaseSI,
  m: BushingMaterial | BushingMaterialRow,
  points: DutyPoint[],
  fMotion: number,
  fEnv: number,
  factors: BushingFactors,
): BushingMaterialResult {
  const D = c.shaft.diameter;
  const T = c.life.hours;
  const allowance = c.life.wearAllowance;
  const kLow = m.wearFactorLow ?? m.wearFactor / 3;
  const kHigh = m.wearFactorHigh ?? m.wearFactor * 3;

  // Wear depth per hour of a bushing of unit length (so ÷ L gives m/h): Σ share·f_m·f_e·k·p_peak(L = 1)·V·3600 s
  const wearRateTimesL = (k: number) =>
    points.reduce((s, p) => s + p.share * wearDepth(k, peakPressure(p.F, D, 1), p.V, HOUR, fMotion, fEnv), 0);
  const { minLengthBy, minLength, length, lengthChosen } = sizeLength(
    c,
    m,
    points,
    wearRateTimesL,
    factors.lengthToDiameter.min,
  );
  const Fmax = Math.max(...points.map((p) => p.F));
  const FVmax = Math.max(...points.map((p) => p.F * p.V));
  const Vmax = Math.max(...points.map((p) => p.V));

  // An inline material (a case's own row) carries no wall sizing: 1.5 mm and 10 % of the bore (common practice).
  const wall = Math.max('minWall' in m ? m.minWall : 1.5e-3, ('wallFraction' in m ? m.wallFraction : 0.1) * D);
  const outerDiameter = D + 2 * wall;
  const pressure = meanPressure(Fmax, D, length);
  const pPeak = peakPressure(Fmax, D, length);
  const pv = FVmax / (D * length);
  const rate = (k: number) => wearRateTimesL(k) / length; // m/h
  const life = (k: number) => allowance / rate(k);
  const wearDepthTyp = rate(m.wearFactor) * T;
  const governing = points.reduce((a, b) => (b.F * b.V > a.F * a.V ? b : a));
  const Q = frictionHeat(m.friction, governing.F, governing.V);
  const temperature =
    c.environment.ambient + temperatureRise(Q, factors.heat.dissipation, factors.heat.areaFactor, D, length);
  const src = m.source;
  const lOverD = length / D;
  const lifeHours = life(m.wearFactor);
  const figures = { length, pressure, Vmax, pv, lifeHours, temperature, outerDiameter, lOverD };
  const checks = materialChecks(c, m, figures, factors);
  const feasible = allLimitsPass(checks);

  return {
    id: m.id,
    name: m.name,
    length,
    lengthChosen,
    outerDiameter,
    lengthToDiameter: lOverD,
    pressure,
    peakPressure: pPeak,
    velocity: Vmax,
    pv,
    factors: { motion: fMotion, environment: fEnv },
    wearFactor: m.wearFactor,
    wearDepth: wearDepthTyp,
    wearDepthMeanPressure: (wearDepthTyp * Math.PI) / 4,
    wearBasis: 'peak-pressure',
    lifeHours: life(m.wearFactor),
    lifeBand: { short: life(kHigh), typical: life(m.wearFactor), long: life(kLow) },
    wearDepthBand: { high: rate(kHigh) * T, typical: wearDepthTyp, low: rate(kLow) * T },
    minLength,
    minLengthBy,
    temperature,
    frictionCoefficient: m.friction,
    frictionPower: Q,
    meanFrictionPower: points.reduce((sum, p) => sum + p.share * frictionHeat(m.friction, p.F, p.V), 0),
    feasible,
    checks,
    source: src,
  };
}
