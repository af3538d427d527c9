import { assumedFinding, finding, type AssumedFinding, type Finding } from '../../core/finding.js';
import type { BushingMaterial, CaseSI } from '../../case/types.js';
import {
  advisory,
  allLimitsPass,
  governingMargin,
  makeCheck,
  type CheckRecord,
  type SheetLine,
} from '../../core/check.js';
import { num } from '../../core/format.js';
import { operatingPoints } from '../duty.js';
import { bushingFactors, bushingMaterials, type BushingMaterialRow } from '../../data/bushing.js';
import {
  frictionHeat,
  meanPressure,
  oscillatingSlidingSpeed,
  peakPressure,
  rotatingSlidingSpeed,
  temperatureRise,
  wearDepth,
} from './formulas.js';

/** One material class sized and checked for the case. SI units; lives in hours. */
export interface BushingMaterialResult {
  id: string;
  name: string;
  /** Bushing length, m: the case's, or the one chosen (see `lengthChosen`). */
  length: number;
  lengthChosen: 'case' | 'shortest-meeting-limits' | 'space-limited';
  outerDiameter: number;
  lengthToDiameter: number;
  /** Governing (largest over the duty) mean pressure, Pa. */
  pressure: number;
  peakPressure: number;
  /** Governing sliding speed, m/s. */
  velocity: number;
  /** Governing PV, Pa·m/s. */
  pv: number;
  factors: { motion: number; environment: number };
  /** Typical wear factor, m³/(N·m). */
  wearFactor: number;
  /** Radial wear depth after the life target, at the most loaded line (peak pressure), m. */
  wearDepth: number;
  /** The same with the mean pressure, m (for comparison). */
  wearDepthMeanPressure: number;
  wearBasis: 'peak-pressure';
  /** Hours to wear through the allowance at the typical wear factor. */
  lifeHours: number;
  /** Hours to the allowance at the high (short), typical and low (long) wear factor. */
  lifeBand: { short: number; typical: number; long: number };
  /** Wear depth after the life target at high, typical and low wear factor, m. */
  wearDepthBand: { high: number; typical: number; low: number };
  /** Shortest length meeting pressure, PV and wear life, regardless of space, m. */
  minLength: number;
  minLengthBy: { pressure: number; pv: number; wear: number };
  /** Steady running temperature estimate, °C. */
  temperature: number;
  frictionCoefficient: number;
  /** Frictional power at the governing point (largest F·V), W. */
  frictionPower: number;
  /** Time-weighted mean frictional power over the duty, Σ share·f·F·V, W. */
  meanFrictionPower: number;
  feasible: boolean;
  checks: CheckRecord[];
  source: string;
}

export interface BushingResult {
  option: 'bushing';
  materials: BushingMaterialResult[];
  best: string | null;
  /** The material the sheet, charts and advice show: the best, or the nearest miss when none is feasible. */
  shown: string | null;
  /** Why the best was chosen, or why none fits. */
  bestReason: Finding;
  feasible: boolean;
  assumed: AssumedFinding[];
  warnings: Finding[];
  sheet: SheetLine[];
}

interface Point {
  share: number;
  F: number;
  V: number;
}

const HOUR = 3600;
/** Lengths are chosen in whole millimetres, as a drawing would give them. */
const LENGTH_STEP = 1e-3;

/**
 * Size and check every bushing material class (or the one the case names) for the duty.
 * Method: mean pressure, PV and sliding speed against the material's limits; Archard wear at
 * the most loaded line with motion and environment multipliers, summed over the duty points;
 * the shortest length meeting pressure, PV and the wear life; a lumped temperature rise.
 * See ./formulas.ts for each equation and its source. `sheet: false` skips the calculation
 * sheet's text (sweeps evaluate thousands of points).
 */
export function checkBushing(c: CaseSI, opts: { sheet?: boolean } = {}): BushingResult {
  const factors = bushingFactors();
  const assumed: AssumedFinding[] = [];
  const warnings: Finding[] = [];
  const D = c.shaft.diameter;
  const osc = c.shaft.oscillation;
  const points: Point[] = operatingPoints(c).map((p) => ({
    share: p.share,
    F: p.radial,
    V: osc ? oscillatingSlidingSpeed(D, osc.angle, osc.frequency) : rotatingSlidingSpeed(D, p.speed ?? 0),
  }));
  if (points.some((p) => p.V === 0)) warnings.push(finding('bushing.zero-speed'));
  if (c.load.axial > 0 || (c.duty ?? []).some((p) => p.axial > 0)) warnings.push(finding('bushing.axial-not-carried'));

  const motionKey = osc ? 'oscillating' : 'rotating';
  const fm = factors.motion.find((m) => m.key === motionKey)!;
  const fe = factors.environment.find((m) => m.key === c.environment.contamination)!;
  assumed.push(
    assumedFinding('bushing.motionFactor', 'bushing.motion-factor', {
      factor: fm.value,
      note: fm.note,
      source: fm.source,
    }),
    assumedFinding('bushing.environmentFactor', 'bushing.environment-factor', {
      contamination: c.environment.contamination,
      factor: fe.value,
      note: fe.note,
      source: fe.source,
    }),
    assumedFinding('bushing.heat', 'bushing.heat-model', {
      dissipation: factors.heat.dissipation,
      areaFactor: factors.heat.areaFactor,
      note: factors.heat.note,
      source: factors.heat.source,
    }),
  );
  if (c.lubrication.supply !== 'none')
    warnings.push(finding('bushing.boundary-conservative', { supply: c.lubrication.supply }));

  const all = bushingMaterials();
  const named = c.bushing?.material;
  const candidates: (BushingMaterial | BushingMaterialRow)[] =
    named === undefined ? all : typeof named === 'string' ? all.filter((m) => m.id === named) : [named];

  const materials = candidates.map((m) => checkMaterial(c, m, points, fm.value, fe.value, factors));
  const feasible = materials.filter((m) => m.feasible);
  let best: BushingMaterialResult | undefined;
  let bestReason: Finding;
  if (feasible.length) {
    // Most robust: the largest smallest margin over the governing checks; ties keep data order.
    best = feasible.reduce((a, b) => (governingMargin(b.checks) > governingMargin(a.checks) ? b : a));
    bestReason = finding('bushing.best', {
      material: best.name,
      length: best.length,
      margin: governingMargin(best.checks),
      passing: feasible.length,
    });
  } else {
    bestReason = noneFeasible(materials);
    warnings.push(bestReason);
  }
  // The material shown when none is feasible: the nearest miss, by the same largest-smallest-margin rule.
  const shown =
    best ??
    materials.reduce<BushingMaterialResult | undefined>(
      (a, b) => (a === undefined || governingMargin(b.checks) > governingMargin(a.checks) ? b : a),
      undefined,
    );
  return {
    option: 'bushing',
    materials,
    best: best?.id ?? null,
    shown: shown?.id ?? null,
    bestReason,
    feasible: best !== undefined,
    assumed,
    warnings,
    sheet: shown && opts.sheet !== false ? sheetFor(c, shown, points) : [],
  };
}

function checkMaterial(
  c: CaseSI,
  m: BushingMaterial | BushingMaterialRow,
  points: Point[],
  fMotion: number,
  fEnv: number,
  factors: ReturnType<typeof bushingFactors>,
): BushingMaterialResult {
  const D = c.shaft.diameter;
  const T = c.life.hours;
  const allowance = c.life.wearAllowance;
  const kLow = m.wearFactorLow ?? m.wearFactor / 3;
  const kHigh = m.wearFactorHigh ?? m.wearFactor * 3;

  // Each limit scales as 1/L, so the shortest length for each is a closed form.
  const Fmax = Math.max(...points.map((p) => p.F));
  const FVmax = Math.max(...points.map((p) => p.F * p.V));
  const Vmax = Math.max(...points.map((p) => p.V));
  // Wear depth per hour of a bushing of unit length (so ÷ L gives m/h): Σ share·f_m·f_e·k·p_peak(L = 1)·V·3600 s
  const wearRateTimesL = (k: number) =>
    points.reduce((s, p) => s + p.share * wearDepth(k, peakPressure(p.F, D, 1), p.V, HOUR, fMotion, fEnv), 0);
  const minLengthBy = {
    pressure: Fmax / (D * m.maxPressure),
    pv: FVmax / (D * m.maxPV),
    wear: (wearRateTimesL(m.wearFactor) * T) / allowance,
  };
  const minLength = Math.max(minLengthBy.pressure, minLengthBy.pv, minLengthBy.wear);

  const ld = factors.lengthToDiameter;
  let length: number;
  let lengthChosen: BushingMaterialResult['lengthChosen'];
  if (c.bushing?.length !== undefined) {
    length = c.bushing.length;
    lengthChosen = 'case';
  } else {
    const wanted = Math.ceil(Math.max(minLength, ld.min * D) / LENGTH_STEP - 1e-9) * LENGTH_STEP;
    length = Math.min(wanted, c.space.maxLength);
    lengthChosen = wanted > c.space.maxLength ? 'space-limited' : 'shortest-meeting-limits';
  }

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
  const wearSrc = `Archard wear law, The Tribology Handbook 2nd ed. 1995, A5; wear factor: ${src}`;
  const lOverD = length / D;

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
      wearSrc,
    ),
    // Advisory: the one-node heat model is crude; PV is the published thermal criterion.
    advisory(
      makeCheck(
        'temperature',
        'Running temperature (lumped estimate, advisory)',
        temperature,
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
      length,
      c.space.maxLength,
      'm',
      'max',
      'the case (space.maxLength)',
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
        : makeCheck('length-to-diameter', 'Length/diameter (advisory)', lOverD, ld.max, '1', 'max', ld.source),
    ),
  ];
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

/** No material passes: each failing limit check's label and the number of materials it fails for. */
function noneFeasible(ms: BushingMaterialResult[]): Finding {
  const count = new Map<string, number>();
  for (const m of ms)
    for (const k of m.checks) if (!k.pass && !k.advisory) count.set(k.label, (count.get(k.label) ?? 0) + 1);
  return finding('bushing.none-feasible', {
    failing: [...count.keys()],
    failingCount: [...count.values()],
    materials: ms.length,
  });
}

function sheetFor(c: CaseSI, m: BushingMaterialResult, points: Point[]): SheetLine[] {
  const D = c.shaft.diameter;
  const L = m.length;
  const g = points.reduce((a, b) => (b.F * b.V > a.F * a.V ? b : a));
  const Fmax = Math.max(...points.map((p) => p.F));
  const hb = 'The Tribology Handbook 2nd ed. 1995, A4-A5';
  const of = ` (${m.name}, ${num(L * 1000, 3)} mm long)`;
  const lines: SheetLine[] = [
    {
      label: `Mean pressure P${of}`,
      formula: 'P = F/(D·L)',
      substituted: `P = ${num(Fmax)} N / (${num(D)} m · ${num(L)} m)`,
      value: m.pressure,
      unit: 'Pa',
      source: hb,
    },
    {
      label: 'Peak pressure p_peak',
      formula: 'p_peak = 4F/(π·D·L)',
      substituted: `p_peak = 4·${num(Fmax)} N / (π·${num(D)} m · ${num(L)} m)`,
      value: m.peakPressure,
      unit: 'Pa',
      source: hb,
    },
    c.shaft.oscillation
      ? {
          label: 'Mean sliding speed V',
          formula: 'V = θ·D·f',
          substituted: `V = ${num(c.shaft.oscillation.angle)} rad · ${num(D)} m · ${num(c.shaft.oscillation.frequency)} Hz`,
          value: m.velocity,
          unit: 'm/s',
          source: 'kinematics of oscillation',
        }
      : {
          label: 'Sliding speed V',
          formula: 'V = π·D·N',
          substituted: `V = π·${num(D)} m · ${num(m.velocity / (Math.PI * D))} rev/s`,
          value: m.velocity,
          unit: 'm/s',
          source: hb,
        },
    {
      label: 'PV',
      formula: 'PV = F·V/(D·L), largest over the duty',
      substituted: `PV = ${num(g.F)} N · ${num(g.V)} m/s / (${num(D)} m · ${num(L)} m)`,
      value: m.pv,
      unit: 'Pa*m/s',
      source: hb,
    },
    {
      label: 'Wear depth at life target',
      formula: 'h = Σ share·f_m·f_e·k·p_peak·V·t',
      substituted:
        points.length === 1
          ? `h = ${m.factors.motion}·${m.factors.environment}·${num(m.wearFactor)} m^2/N · ${num(m.peakPressure)} Pa · ${num(m.velocity)} m/s · ${num(c.life.hours * HOUR)} s`
          : `h = Σ over ${points.length} duty points, ${m.factors.motion}·${m.factors.environment}·${num(m.wearFactor)} m^2/N · p_peak,i · V_i · share_i · ${num(c.life.hours * HOUR)} s`,
      value: m.wearDepth,
      unit: 'm',
      source: 'Archard 1953; The Tribology Handbook 2nd ed. 1995, A5',
    },
    {
      label: 'Wear life',
      formula: 't = allowance / (h/T)',
      substituted: `t = ${num(c.life.wearAllowance)} m / (${num(m.wearDepth)} m / ${num(c.life.hours)} h)`,
      value: m.lifeHours,
      unit: 'h',
      source: 'Archard 1953',
    },
    {
      label: 'Frictional heat Q',
      formula: 'Q = f·F·V',
      substituted: `Q = ${m.frictionCoefficient} · ${num(g.F)} N · ${num(g.V)} m/s`,
      value: m.frictionPower,
      unit: 'W',
      source: hb,
    },
  ];
  return lines;
}
