import type { BushingMaterial, CaseSI, Medium } from '../../case/types.js';
import { allLimitsPass, makeAdvisoryCheck, makeCheck, type CheckRecord } from '../../core/check.js';
import type { BushingFactors, BushingMaterialRow } from '../../data/bushing.js';
import {
  rubbingThrust,
  thrustChecks,
  thrustWearRate,
  type RubbingThrustInput,
  type RubbingThrustResult,
  type ThrustFace,
} from '../thrust/rubbing.js';
import { dryTemperatureRise, frictionHeat, heatResistance, meanPressure, peakPressure, wearDepth } from './formulas.js';
import { suitability } from './suitability.js';
import type { BushingMaterialResult, BushingThrust, DutyPoint } from './types.js';

/** Seconds in an hour: wear is summed over the life target in hours. */
export const HOUR = 3600;
/** Lengths are chosen in whole millimetres, as a drawing would give them. */
export const LENGTH_STEP = 1e-3;

type Material = BushingMaterial | BushingMaterialRow;

/** The length every material is checked at, and the thrust face when the case has axial load. */
export interface Setting {
  length: number;
  lengthChosen: BushingMaterialResult['lengthChosen'];
  /** Thrust face and washer thickness (m), or null without axial load. */
  thrust: { face: ThrustFace; thickness: number } | null;
  medium: Medium;
}

/**
 * Shortest length for each limit of the bore (each scales as 1/L, so each is a closed form):
 *   L_p = F_max/(D·p_max),  L_PV = (F·V)_max/(D·PV_max),  L_w = (Σ share·f_m·f_e·k·p_peak(L=1)·V·3600)·T/δ
 * F N, V m/s, D m, T the life target h, δ the wear allowance m; `Fmax` the largest F and `FVmax`
 * the largest F·V over the duty, `wearRateTimesL` the sum in L_w. Source: ./formulas.ts.
 */
function shortestLengths(c: CaseSI, m: Material, Fmax: number, FVmax: number, wearRateTimesL: number) {
  const D = c.shaft.diameter;
  const by = {
    pressure: Fmax / (D * m.maxPressure),
    pv: FVmax / (D * m.maxPV),
    wear: (wearRateTimesL * c.life.hours) / c.life.wearAllowance,
  };
  return { minLengthBy: by, minLength: Math.max(by.pressure, by.pv, by.wear) };
}

/**
 * The sources of a material's checks that add words to its row's source, built once per
 * material row and heat model (a map checks every material at every cell).
 */
interface Sources {
  heat: BushingFactors['heat'];
  /** The row's source and the heat model's source and reference ambient the texts were made from. */
  from: [string, string, number];
  wear: string;
  temperature: string;
  edge: string;
  ambient: string;
}
const sourcesOf = new WeakMap<Material, Sources>();
function sources(m: Material, heat: BushingFactors['heat']): Sources {
  const hit = sourcesOf.get(m);
  // Checked against the values, not only the objects: a case's own material row may be changed in place.
  const src = m.source;
  if (
    hit &&
    hit.heat === heat &&
    hit.from[0] === src &&
    hit.from[1] === heat.source &&
    hit.from[2] === heat.referenceAmbient
  )
    return hit;
  const made: Sources = {
    heat,
    from: [src, heat.source, heat.referenceAmbient],
    wear: `Archard wear law, The Tribology Handbook 2nd ed. 1995, A5; wear factor: ${src}`,
    temperature: `${src}; heat balance: ${heat.source}; margin: share of the allowed rise above ambient`,
    edge: `${src}; model: the tilted shaft bears only where its gap θ·x is within the wear allowance (common practice, our own estimate)`,
    ambient: `${src}; margin: share of the rise from ${heat.referenceAmbient} degC`,
  };
  sourcesOf.set(m, made);
  return made;
}

/**
 * Edge loading of a bushing whose shaft is tilted in it, where the case states a misalignment
 * (shaft.misalignment; absent: aligned, no check). Our own model, advisory:
 *   L_eff = min(L, δ/θ),   p_edge = F_max/(D·L_eff) ≤ p_max
 * θ the slope of the shaft against the bore, rad; the tilt opens a gap θ·x at a distance x from
 * the loaded edge, so the liner bears (and bedding in wears it to the shaft's line) only where
 * that gap is within the wear allowance δ, m; L the length, D the bore, m; F_max the largest
 * radial load, N; p_max the material's pressure limit, Pa. Elastic conformity of the liner and
 * the running clearance are neglected (conservative). Advisory: the model is a first estimate.
 */
function edgeLoadCheck(c: CaseSI, Fmax: number, L: number, pMax: number, source: string): CheckRecord | null {
  const theta = c.shaft.misalignment;
  if (theta === undefined) return null;
  const Leff = theta > 0 ? Math.min(L, c.life.wearAllowance / theta) : L;
  return makeAdvisoryCheck(
    'edge-pressure',
    'Pressure on the bedded-in length min(L, δ/θ) with the shaft tilted (advisory)',
    meanPressure(Fmax, c.shaft.diameter, Leff),
    pMax,
    'Pa',
    'max',
    source,
  );
}

/**
 * The thrust face over the duty: each point with axial load through rubbingThrust, then the
 * largest pressure, speed and PV, the wear life by summing the points' wear rates by share
 * (linear accumulation of Archard wear), and the friction power at the largest Fa·V (the
 * first point of the largest face PV). One pass over the points, no list built.
 */
function thrustOverDuty(
  c: CaseSI,
  m: Material,
  points: DutyPoint[],
  t: { face: ThrustFace; thickness: number },
  fMotion: number,
  fEnv: number,
): { thrust: BushingThrust; checks: CheckRecord[]; meanPower: number } {
  // One input, its load and speed set for each point (rubbingThrust keeps only its face).
  const inp: RubbingThrustInput = {
    axial: 0,
    face: t.face,
    speed: undefined,
    oscillation: c.shaft.oscillation,
    hours: c.life.hours,
    wearAllowance: c.life.wearAllowance,
    fMotion,
    fEnv,
  };
  let rate = 0;
  let meanPower = 0;
  let pressure = -Infinity;
  let velocity = -Infinity;
  let pv = -Infinity;
  let top: RubbingThrustResult | undefined;
  for (const p of points) {
    if (!(p.Fa > 0)) continue;
    inp.axial = p.Fa;
    inp.speed = p.n;
    const r = rubbingThrust(inp, m);
    rate += p.share * thrustWearRate(m.wearFactor, r.pressure, r.velocity, fMotion, fEnv);
    meanPower += p.share * r.frictionPower;
    pressure = Math.max(pressure, r.pressure);
    velocity = Math.max(velocity, r.velocity);
    pv = Math.max(pv, r.pv);
    if (top === undefined || r.pv > top.pv) top = r;
  }
  const thrust: BushingThrust = {
    face: t.face,
    thickness: t.thickness,
    pressure,
    velocity,
    pv,
    lifeHours: rate > 0 ? c.life.wearAllowance / rate : Infinity,
    frictionPower: top!.frictionPower,
  };
  return { thrust, checks: thrustChecks(thrust, m, c.life.hours), meanPower };
}

/**
 * Check one material class at the setting's length: mean pressure, sliding speed, PV and wear
 * life of the bore against the material's limits; the thrust face (when there is axial load)
 * with the same material; the lubricant need and the service medium; the outer diameter in the
 * radial space; the axial space when the case fixes the length or nothing fits (the common
 * length fits by construction, so its check would only add a margin of zero); temperature (heat balance ΔT = R·μ·P·V) and L/D as advice. Wear depth and life
 * at the typical wear factor and at the ends of its scatter. SI units; lives in hours.
 */
export function checkMaterial(
  c: CaseSI,
  m: Material,
  points: DutyPoint[],
  fMotion: number,
  fEnvCase: number,
  factors: BushingFactors,
  setting: Setting,
): BushingMaterialResult {
  const D = c.shaft.diameter;
  const T = c.life.hours;
  const L = setting.length;
  const allowance = c.life.wearAllowance;
  // A class whose grit passes (flutes flush it, an elastomer face yields to it) is not held to the
  // contamination factor: its wear factor is measured in the wet, gritty service it is built for.
  const fEnv = 'gritPasses' in m && m.gritPasses ? 1 : fEnvCase;
  const kLow = m.wearFactorLow ?? m.wearFactor / 3;
  const kHigh = m.wearFactorHigh ?? m.wearFactor * 3;
  // One pass over the duty: the largest F, V and F·V (the governing point, the first of equals),
  // the smallest V, the time-mean friction power of the bore, and the wear depth per hour of a
  // bushing of unit length (÷ L gives m/h): Σ share·f_m·f_e·k·p_peak(L = 1)·V·3600 s, linear in k
  // (Archard), so the sum over the duty is taken once, at k = 1.
  let perUnitK = 0;
  let meanFriction = 0;
  let Fmax = -Infinity;
  let Vmax = -Infinity;
  let Vmin = Infinity;
  let FVmax = -Infinity;
  let governing = points[0]!;
  for (let i = 0; i < points.length; i++) {
    const p = points[i]!;
    perUnitK += p.share * wearDepth(1, peakPressure(p.F, D, 1), p.V, HOUR, fMotion, fEnv);
    meanFriction += p.share * frictionHeat(m.friction, p.F, p.V);
    Fmax = Math.max(Fmax, p.F);
    Vmax = Math.max(Vmax, p.V);
    Vmin = Math.min(Vmin, p.V);
    FVmax = Math.max(FVmax, p.F * p.V);
    if (p.F * p.V > governing.F * governing.V) governing = p;
  }
  // Wear rate (m/h) and hours to the allowance at wear factor k: rate = k·perUnitK/L, life = δ/rate.
  const rateTyp = (m.wearFactor * perUnitK) / L;
  const rateHigh = (kHigh * perUnitK) / L;
  const rateLow = (kLow * perUnitK) / L;
  const lifeTyp = allowance / rateTyp;
  const { minLengthBy, minLength } = shortestLengths(c, m, Fmax, FVmax, m.wearFactor * perUnitK);

  // An inline material (a case's own row) carries no wall sizing: 1.5 mm and 10 % of the bore (common practice).
  const wall = Math.max('minWall' in m ? m.minWall : 1.5e-3, ('wallFraction' in m ? m.wallFraction : 0.1) * D);
  const outerDiameter = D + 2 * wall;
  const pressure = meanPressure(Fmax, D, L);
  const pv = (governing.F * governing.V) / (D * L);
  const wearDepthTyp = rateTyp * T;
  const Q = frictionHeat(m.friction, governing.F, governing.V);
  const R = heatResistance(m.maxTemperature, factors.heat.referenceAmbient, m.friction, m.maxPV);
  const temperature = c.environment.ambient + dryTemperatureRise(R, m.friction, pv);
  const lOverD = L / D;

  const src = m.source;
  const words = sources(m, factors.heat);
  const ld = factors.lengthToDiameter;
  const thickness = setting.thrust?.thickness ?? 0;
  const checks: CheckRecord[] = [
    makeCheck('pressure', 'Mean pressure P = F/(D·L)', pressure, m.maxPressure, 'Pa', 'max', src),
    makeCheck('velocity', 'Sliding speed V', Vmax, m.maxVelocity, 'm/s', 'max', src),
    makeCheck('pv', 'PV', pv, m.maxPV, 'Pa*m/s', 'max', src),
    makeCheck(
      'wear-life',
      'Hours to wear through the allowance (typical wear factor)',
      lifeTyp,
      T,
      'h',
      'min',
      words.wear,
    ),
    // Advisory: the heat balance takes its resistance from the PV limit, which is the published criterion.
    makeAdvisoryCheck(
      'temperature',
      'Rubbing-surface temperature (heat balance, advisory)',
      temperature,
      m.maxTemperature,
      'degC',
      'max',
      words.temperature,
      c.environment.ambient,
    ),
    makeCheck(
      'radial-space',
      'Outer diameter within the housing bore',
      outerDiameter,
      c.space.maxOuterDiameter,
      'm',
      'max',
      'the case (space.maxOuterDiameter); wall thickness common practice',
    ),
    // Length/diameter is advice (edge loading, misalignment), not a limit.
    lOverD < 1
      ? makeAdvisoryCheck('length-to-diameter', 'Length/diameter (advisory)', lOverD, ld.min, '1', 'min', ld.source)
      : 'maxLengthToDiameter' in m && m.maxLengthToDiameter !== undefined
        ? makeAdvisoryCheck(
            'length-to-diameter',
            'Length/diameter (advisory)',
            lOverD,
            m.maxLengthToDiameter,
            '1',
            'max',
            m.wetSource ?? src,
          )
        : makeAdvisoryCheck('length-to-diameter', 'Length/diameter (advisory)', lOverD, ld.max, '1', 'max', ld.source),
  ];
  const edge = edgeLoadCheck(c, Fmax, L, m.maxPressure, words.edge);
  if (edge) checks.push(edge);
  // A water-lubricated class forms its film only above a sliding speed: below it, advice (a maker's figure).
  if ('minVelocity' in m && m.minVelocity !== undefined)
    checks.push(
      makeAdvisoryCheck(
        'min-velocity',
        'Sliding speed for the water film (advisory)',
        Vmin,
        m.minVelocity,
        'm/s',
        'min',
        m.wetSource ?? src,
      ),
    );
  // Whole millimetres plus a washer add up with a floating-point residue (57 mm + 3 mm comes to
  // 60.000000000000005 mm): the sum is taken to the nanometre, far below any drawing's precision.
  const axialTaken = Math.round((L + thickness) * 1e9) / 1e9;
  if (setting.lengthChosen === 'case' || axialTaken > c.space.maxLength)
    checks.push(
      makeCheck(
        'axial-space',
        setting.thrust ? 'Length plus thrust washer within the axial space' : 'Length within the axial space',
        axialTaken,
        c.space.maxLength,
        'm',
        'max',
        'the case (space.maxLength); washer thickness common practice',
      ),
    );
  // The room alone above the material's limit is a fact of the case, not an estimate: a limit. Only a
  // failing one is added (the headroom of a passing one is the PV check's business, not a choice margin).
  if (c.environment.ambient > m.maxTemperature)
    checks.push(
      makeCheck(
        'ambient-temperature',
        'Ambient within the material temperature limit',
        c.environment.ambient,
        m.maxTemperature,
        'degC',
        'max',
        words.ambient,
        factors.heat.referenceAmbient,
      ),
    );
  const thrust = setting.thrust ? thrustOverDuty(c, m, points, setting.thrust, fMotion, fEnv) : null;
  if (thrust) for (const k of thrust.checks) checks.push(k);
  const reasons = suitability(c, m, setting.medium, checks);

  return {
    id: m.id,
    name: m.name,
    length: L,
    lengthChosen: setting.lengthChosen,
    needs: m.needs ?? 'none',
    water: m.water ?? 'fair',
    chemical: m.chemical ?? 'fair',
    thrust: thrust?.thrust ?? null,
    reasons,
    outerDiameter,
    lengthToDiameter: lOverD,
    pressure,
    peakPressure: peakPressure(Fmax, D, L),
    velocity: Vmax,
    pv,
    factors: { motion: fMotion, environment: fEnv },
    wearFactor: m.wearFactor,
    wearDepth: wearDepthTyp,
    wearDepthMeanPressure: (wearDepthTyp * Math.PI) / 4,
    wearBasis: 'peak-pressure',
    lifeHours: lifeTyp,
    lifeBand: { short: allowance / rateHigh, typical: lifeTyp, long: allowance / rateLow },
    wearDepthBand: { high: rateHigh * T, typical: wearDepthTyp, low: rateLow * T },
    minLength,
    minLengthBy,
    temperature,
    frictionCoefficient: m.friction,
    frictionPower: Q + (thrust?.thrust.frictionPower ?? 0),
    meanFrictionPower: meanFriction + (thrust?.meanPower ?? 0),
    feasible: allLimitsPass(checks),
    checks,
    source: src,
  };
}
