import type { BushingMaterial, CaseSI, Medium, Supply } from '../../case/types.js';
import { advisory, allLimitsPass, makeCheck, type CheckRecord } from '../../core/check.js';
import { finding, type Finding } from '../../core/finding.js';
import type { BushingFactors, BushingMaterialRow, LubricantNeed, MediumRating } from '../../data/bushing.js';
import { rubbingThrust, thrustChecks, thrustWearRate, type ThrustFace } from '../thrust/rubbing.js';
import { dryTemperatureRise, frictionHeat, heatResistance, meanPressure, peakPressure, wearDepth } from './formulas.js';
import type { BushingMaterialResult, BushingThrust, DutyPoint } from './types.js';

/** Seconds in an hour: wear is summed over the life target in hours. */
export const HOUR = 3600;
/** Lengths are chosen in whole millimetres, as a drawing would give them. */
export const LENGTH_STEP = 1e-3;

type Material = BushingMaterial | BushingMaterialRow;

/**
 * Rank of a lubricant need and of a supply on one scale: none 1 < grease 2 < oil 3 (oil bath and
 * oil feed). Water is off this scale: a water-lubricated class is met by the medium, not the supply.
 */
const NEED_RANK: Record<Exclude<LubricantNeed, 'water'>, number> = { none: 1, grease: 2, oil: 3 };
const SUPPLY_RANK: Record<Supply, number> = { none: 1, grease: 2, 'oil-bath': 3, 'oil-feed': 3 };
/** Rank of a medium rating: good 1, fair 2, poor 3; a material must be at least fair (2) in the case's medium. */
const RATING_RANK: Record<MediumRating, number> = { good: 1, fair: 2, poor: 3 };

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
 * F N, V m/s, D m, T the life target h, δ the wear allowance m. Source: ./formulas.ts.
 */
function shortestLengths(c: CaseSI, m: Material, points: DutyPoint[], wearRateTimesL: number) {
  const D = c.shaft.diameter;
  const by = {
    pressure: Math.max(...points.map((p) => p.F)) / (D * m.maxPressure),
    pv: Math.max(...points.map((p) => p.F * p.V)) / (D * m.maxPV),
    wear: (wearRateTimesL * c.life.hours) / c.life.wearAllowance,
  };
  return { minLengthBy: by, minLength: Math.max(by.pressure, by.pv, by.wear) };
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
function edgeLoadCheck(c: CaseSI, Fmax: number, L: number, pMax: number, src: string): CheckRecord | null {
  const theta = c.shaft.misalignment;
  if (theta === undefined) return null;
  const Leff = theta > 0 ? Math.min(L, c.life.wearAllowance / theta) : L;
  return advisory(
    makeCheck(
      'edge-pressure',
      'Pressure on the bedded-in length min(L, δ/θ) with the shaft tilted (advisory)',
      meanPressure(Fmax, c.shaft.diameter, Leff),
      pMax,
      'Pa',
      'max',
      `${src}; model: the tilted shaft bears only where its gap θ·x is within the wear allowance (common practice, our own estimate)`,
    ),
  );
}

/**
 * The thrust face over the duty: each point with axial load through rubbingThrust, then the
 * largest pressure, speed and PV, the wear life by summing the points' wear rates by share
 * (linear accumulation of Archard wear), and the friction power at the largest Fa·V.
 */
function thrustOverDuty(
  c: CaseSI,
  m: Material,
  points: DutyPoint[],
  t: { face: ThrustFace; thickness: number },
  fMotion: number,
  fEnv: number,
): { thrust: BushingThrust; checks: CheckRecord[]; meanPower: number } {
  const loaded = points.filter((p) => p.Fa > 0);
  const each = loaded.map((p) => ({
    share: p.share,
    r: rubbingThrust(
      {
        axial: p.Fa,
        face: t.face,
        ...(p.n !== undefined ? { speed: p.n } : {}),
        ...(c.shaft.oscillation ? { oscillation: c.shaft.oscillation } : {}),
        hours: c.life.hours,
        wearAllowance: c.life.wearAllowance,
        fMotion,
        fEnv,
      },
      m,
    ),
  }));
  const rate = each.reduce(
    (s, e) => s + e.share * thrustWearRate(m.wearFactor, e.r.pressure, e.r.velocity, fMotion, fEnv),
    0,
  );
  const top = each.reduce((a, b) => (b.r.pv > a.r.pv ? b : a));
  const thrust: BushingThrust = {
    face: t.face,
    thickness: t.thickness,
    pressure: Math.max(...each.map((e) => e.r.pressure)),
    velocity: Math.max(...each.map((e) => e.r.velocity)),
    pv: Math.max(...each.map((e) => e.r.pv)),
    lifeHours: rate > 0 ? c.life.wearAllowance / rate : Infinity,
    frictionPower: top.r.frictionPower,
  };
  const meanPower = each.reduce((s, e) => s + e.share * e.r.frictionPower, 0);
  return { thrust, checks: thrustChecks(thrust, m, c.life.hours), meanPower };
}

/**
 * Whether the case can give the material what it needs, whether it stands the service medium,
 * and whether the shaft moves as the material's limits assume (a pin class: oscillating only). Each unmet condition is a failing limit check (value and limit on the rank scales
 * above: lubricant none 1, grease 2, oil 3; medium rating good 1, fair 2, poor 3) and a finding;
 * met conditions add no check, so they never decide a margin.
 */
function suitability(c: CaseSI, m: Material, medium: Medium): { checks: CheckRecord[]; reasons: Finding[] } {
  const checks: CheckRecord[] = [];
  const reasons: Finding[] = [];
  const needs = m.needs ?? 'none';
  const supply = c.lubrication.supply;
  if (needs === 'water') {
    // A water-lubricated class: the medium is its lubricant and coolant (wet 1, dry or chemical 2).
    if (medium !== 'water' && medium !== 'slurry') {
      checks.push(
        makeCheck(
          'lubricant-need',
          'Runs in the water it needs (in water or slurry 1, otherwise 2)',
          2,
          1,
          '1',
          'max',
          m.needsSource ?? m.source,
        ),
      );
      reasons.push(finding('bushing.needs-water', { material: m.name, medium }));
    }
  } else if (NEED_RANK[needs] > SUPPLY_RANK[supply]) {
    checks.push(
      makeCheck(
        'lubricant-need',
        'Lubricant the material needs, within the supply (none 1, grease 2, oil 3)',
        NEED_RANK[needs],
        SUPPLY_RANK[supply],
        '1',
        'max',
        m.needsSource ?? m.source,
      ),
    );
    reasons.push(finding('bushing.needs-lubricant', { material: m.name, needs, supply }));
  }
  const slurry = 'slurry' in m ? m.slurry : undefined;
  const rating =
    medium === 'slurry'
      ? (slurry ?? m.water)
      : medium === 'water'
        ? m.water
        : medium === 'chemical'
          ? m.chemical
          : undefined;
  if (rating !== undefined && RATING_RANK[rating] > RATING_RANK.fair) {
    checks.push(
      makeCheck(
        'medium',
        `Resistance in ${medium} (good 1, fair 2, poor 3)`,
        RATING_RANK[rating],
        RATING_RANK.fair,
        '1',
        'max',
        m.mediaSource ?? m.source,
      ),
    );
    reasons.push(finding('bushing.medium-unsuited', { material: m.name, medium, rating }));
  }
  if (m.motion === 'oscillating' && !c.shaft.oscillation) {
    checks.push(
      makeCheck(
        'motion',
        'Motion the limits hold for (oscillating only 1, any 2)',
        2,
        1,
        '1',
        'max',
        m.motionSource ?? m.source,
      ),
    );
    reasons.push(finding('bushing.motion-unsuited', { material: m.name }));
  }
  return { checks, reasons };
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
  // A class whose grit passes (flutes flush it, an elastomer face yields to it) is not held to the
  // contamination factor: its wear factor is measured in the wet, gritty service it is built for.
  const fEnv = 'gritPasses' in m && m.gritPasses ? 1 : fEnvCase;
  const kLow = m.wearFactorLow ?? m.wearFactor / 3;
  const kHigh = m.wearFactorHigh ?? m.wearFactor * 3;
  // Wear depth per hour of a bushing of unit length (÷ L gives m/h): Σ share·f_m·f_e·k·p_peak(L = 1)·V·3600 s
  // Linear in k (Archard), so the sum over the duty is taken once, at k = 1.
  const perUnitK = points.reduce(
    (s, p) => s + p.share * wearDepth(1, peakPressure(p.F, D, 1), p.V, HOUR, fMotion, fEnv),
    0,
  );
  const wearRateTimesL = (k: number) => k * perUnitK;
  const { minLengthBy, minLength } = shortestLengths(c, m, points, wearRateTimesL(m.wearFactor));

  const Fmax = Math.max(...points.map((p) => p.F));
  const Vmax = Math.max(...points.map((p) => p.V));
  const governing = points.reduce((a, b) => (b.F * b.V > a.F * a.V ? b : a));
  // An inline material (a case's own row) carries no wall sizing: 1.5 mm and 10 % of the bore (common practice).
  const wall = Math.max('minWall' in m ? m.minWall : 1.5e-3, ('wallFraction' in m ? m.wallFraction : 0.1) * D);
  const outerDiameter = D + 2 * wall;
  const pressure = meanPressure(Fmax, D, L);
  const pv = (governing.F * governing.V) / (D * L);
  const rate = (k: number) => wearRateTimesL(k) / L; // m/h
  const life = (k: number) => c.life.wearAllowance / rate(k);
  const wearDepthTyp = rate(m.wearFactor) * T;
  const Q = frictionHeat(m.friction, governing.F, governing.V);
  const R = heatResistance(m.maxTemperature, factors.heat.referenceAmbient, m.friction, m.maxPV);
  const temperature = c.environment.ambient + dryTemperatureRise(R, m.friction, pv);
  const lOverD = L / D;

  const src = m.source;
  const ld = factors.lengthToDiameter;
  const thickness = setting.thrust?.thickness ?? 0;
  const checks: CheckRecord[] = [
    makeCheck('pressure', 'Mean pressure P = F/(D·L)', pressure, m.maxPressure, 'Pa', 'max', src),
    makeCheck('velocity', 'Sliding speed V', Vmax, m.maxVelocity, 'm/s', 'max', src),
    makeCheck('pv', 'PV', pv, m.maxPV, 'Pa*m/s', 'max', src),
    makeCheck(
      'wear-life',
      'Hours to wear through the allowance (typical wear factor)',
      life(m.wearFactor),
      T,
      'h',
      'min',
      `Archard wear law, The Tribology Handbook 2nd ed. 1995, A5; wear factor: ${src}`,
    ),
    // Advisory: the heat balance takes its resistance from the PV limit, which is the published criterion.
    advisory(
      makeCheck(
        'temperature',
        'Rubbing-surface temperature (heat balance, advisory)',
        temperature,
        m.maxTemperature,
        'degC',
        'max',
        `${src}; heat balance: ${factors.heat.source}; margin: share of the allowed rise above ambient`,
        c.environment.ambient,
      ),
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
    advisory(
      lOverD < 1
        ? makeCheck('length-to-diameter', 'Length/diameter (advisory)', lOverD, ld.min, '1', 'min', ld.source)
        : 'maxLengthToDiameter' in m && m.maxLengthToDiameter !== undefined
          ? makeCheck(
              'length-to-diameter',
              'Length/diameter (advisory)',
              lOverD,
              m.maxLengthToDiameter,
              '1',
              'max',
              m.wetSource ?? src,
            )
          : makeCheck('length-to-diameter', 'Length/diameter (advisory)', lOverD, ld.max, '1', 'max', ld.source),
    ),
  ];
  const edge = edgeLoadCheck(c, Fmax, L, m.maxPressure, src);
  if (edge) checks.push(edge);
  // A water-lubricated class forms its film only above a sliding speed: below it, advice (a maker's figure).
  if ('minVelocity' in m && m.minVelocity !== undefined) {
    const Vmin = Math.min(...points.map((p) => p.V));
    checks.push(
      advisory(
        makeCheck(
          'min-velocity',
          'Sliding speed for the water film (advisory)',
          Vmin,
          m.minVelocity,
          'm/s',
          'min',
          m.wetSource ?? src,
        ),
      ),
    );
  }
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
        `${src}; margin: share of the rise from ${factors.heat.referenceAmbient} degC`,
        factors.heat.referenceAmbient,
      ),
    );
  const thrust = setting.thrust ? thrustOverDuty(c, m, points, setting.thrust, fMotion, fEnv) : null;
  if (thrust) checks.push(...thrust.checks);
  const fit = suitability(c, m, setting.medium);
  checks.push(...fit.checks);

  return {
    id: m.id,
    name: m.name,
    length: L,
    lengthChosen: setting.lengthChosen,
    needs: m.needs ?? 'none',
    water: m.water ?? 'fair',
    chemical: m.chemical ?? 'fair',
    thrust: thrust?.thrust ?? null,
    reasons: fit.reasons,
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
    lifeHours: life(m.wearFactor),
    lifeBand: { short: life(kHigh), typical: life(m.wearFactor), long: life(kLow) },
    wearDepthBand: { high: rate(kHigh) * T, typical: wearDepthTyp, low: rate(kLow) * T },
    minLength,
    minLengthBy,
    temperature,
    frictionCoefficient: m.friction,
    frictionPower: Q + (thrust?.thrust.frictionPower ?? 0),
    meanFrictionPower:
      points.reduce((sum, p) => sum + p.share * frictionHeat(m.friction, p.F, p.V), 0) + (thrust?.meanPower ?? 0),
    feasible: allLimitsPass(checks),
    checks,
    source: src,
  };
}
