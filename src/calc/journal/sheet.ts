import type { CaseSI } from '../../case/types.js';
import type { SheetLine } from '../../core/check.js';
import { num } from '../../core/format.js';
import type { JournalCriteria } from '../../data/journal-criteria.js';
import { allowableFilmText, type DesignEvaluation } from './design.js';
import { THERMAL_SHARE, THERMAL_TOLERANCE_K } from './operating-point.js';
import { meanPowerLoss } from './result.js';

/**
 * The calculation sheet of the chosen journal design at its governing point: each figure's
 * formula, the formula with the numbers put in (SI), the value and its source, in the
 * order a reviewer follows them (unit load, viscosity, Sommerfeld number, ε, film, friction,
 * flow, heat balance, peak pressure, the duty's mean power loss). The lines are formula
 * displays; the equations and their sources are those of operating-point.ts and design.ts.
 */

const RAIMONDI_BOYD = 'Raimondi & Boyd (1958), ASLE Trans. 1(1)';

/**
 * Numbers in the substituted expressions: num() (src/core/format.ts), except that the
 * exponent form keeps its trailing zeros ("3.000e-5" where num writes "3e-5"), the way the
 * sheet has always printed them, so that its text is unchanged.
 */
function sheetNum(x: number, digits = 4): string {
  const size = Math.abs(x);
  return x === 0 || !Number.isFinite(x) || (size >= 1e-3 && size < 1e6) ? num(x, digits) : x.toExponential(digits - 1);
}

/** What every line of the sheet reads: the design, its governing point and the case. */
interface SheetInput {
  evaluation: DesignEvaluation;
  diameter: number;
  radius: number;
  length: number;
  clearance: number;
  inletTemperature: number;
}

/** The sheet of design `e` for case `c`; `supply` names a missing supply in the no-film line. */
export function buildSheet(c: CaseSI, e: DesignEvaluation, crit: JournalCriteria, supply: string): SheetLine[] {
  const diameter = c.shaft.diameter;
  const input: SheetInput = {
    evaluation: e,
    diameter,
    radius: diameter / 2,
    length: e.candidate.length,
    clearance: e.candidate.radialClearance,
    inletTemperature: c.lubrication.inletTemperature,
  };
  const g = e.governing;
  const unitLoad: SheetLine = {
    label: 'Mean unit load P',
    formula: 'P = W/(L·D)',
    substituted: `P = ${sheetNum(g.load)} N/(${sheetNum(input.length)} m · ${sheetNum(diameter)} m)`,
    value: g.result.unitLoad,
    unit: 'Pa',
    source: 'definition',
  };
  if (!g.film)
    return [
      unitLoad,
      {
        label: 'Minimum film thickness h0',
        formula: 'no rotation or no lubricant: h0 = 0',
        substituted: `N = ${sheetNum(g.speed)} rev/s${supply === 'none' ? ', supply none' : ''}: h0 = 0`,
        value: 0,
        unit: 'm',
        source: 'common practice',
      },
    ];
  const lines = [unitLoad, ...filmLines(input, crit), ...frictionLines(input), ...heatLines(input)];
  if (e.points.length > 1) lines.push(meanPowerLine(e));
  return lines;
}

/** Viscosity, Sommerfeld number, eccentricity ratio, minimum and allowable film, attitude angle. */
function filmLines(input: SheetInput, crit: JournalCriteria): SheetLine[] {
  const { evaluation: e, diameter: D, radius: r, length: L, clearance: cl } = input;
  const res = e.governing.result;
  const N = e.governing.speed;
  const oil = e.candidate.fluid.kind === 'oil';
  const thermal = oil ? `T_eff = T_in + ${THERMAL_SHARE}·ΔT, iterated to ${THERMAL_TOLERANCE_K} K` : 'fixed viscosity';
  return [
    {
      label: 'Viscosity μ',
      formula: oil ? `μ = ν(T_eff)·ρ(T_eff), Walther (ASTM D341); ${thermal}` : 'μ given',
      substituted: oil
        ? `μ(${e.candidate.oil}, T_eff = ${sheetNum(res.effectiveTemperature)} °C)`
        : `μ = ${sheetNum(res.viscosity)} Pa·s`,
      value: res.viscosity,
      unit: 'Pa*s',
      source: oil ? 'ASTM D341 (Walther form, from memory)' : 'case',
    },
    {
      label: 'Sommerfeld number S',
      formula: 'S = (r/c)²·μ·N/P',
      substituted: `S = (${sheetNum(r)} m/${sheetNum(cl)} m)² · ${sheetNum(res.viscosity)} Pa·s · ${sheetNum(N)} rev/s / ${sheetNum(res.unitLoad)} Pa`,
      value: res.sommerfeld,
      unit: '1',
      source: RAIMONDI_BOYD,
    },
    {
      label: 'Eccentricity ratio ε',
      formula: 'ε such that S(ε, L/D) = S, finite-difference Reynolds solution (table, interpolated)',
      substituted: `ε(L/D = ${sheetNum(L / D)}, S = ${sheetNum(res.sommerfeld)})`,
      value: res.eccentricityRatio,
      unit: '1',
      source: RAIMONDI_BOYD,
    },
    {
      label: 'Minimum film thickness h0',
      formula: 'h0 = c·(1 − ε)',
      substituted: `h0 = ${sheetNum(cl)} m · (1 − ${sheetNum(res.eccentricityRatio)})`,
      value: res.minFilmThickness,
      unit: 'm',
      source: RAIMONDI_BOYD,
    },
    {
      label: 'Allowable minimum film h_allow',
      formula: `h_allow = ${allowableFilmText(crit)}`,
      substituted: `h_allow = ${sheetNum(crit.minFilmBase)} m + ${sheetNum(crit.minFilmPerDiameter)} · ${sheetNum(D)} m`,
      value: e.governing.allowableFilm,
      unit: 'm',
      source: crit.sources['minFilmBase'] ?? '',
    },
    {
      label: 'Attitude angle φ',
      formula: 'φ(ε, L/D) from the Reynolds solution (table, interpolated)',
      substituted: `φ(ε = ${sheetNum(res.eccentricityRatio)}, L/D = ${sheetNum(L / D)})`,
      value: res.attitudeDeg,
      unit: 'deg',
      source: RAIMONDI_BOYD,
    },
  ];
}

/** Friction coefficient (film and Petroff), friction torque, power loss, flow drawn in, side leakage. */
function frictionLines(input: SheetInput): SheetLine[] {
  const { evaluation: e, radius: r, length: L, clearance: cl } = input;
  const res = e.governing.result;
  const W = e.governing.load;
  const N = e.governing.speed;
  return [
    {
      label: 'Friction coefficient f',
      formula:
        'f = (c/r)·[(r/c)f], friction variable (r/c)f = 2π²S/√(1−ε²) + (ε/2)·sin φ at the table nodes, interpolated at ε',
      substituted: `f = (${sheetNum(cl)} m/${sheetNum(r)} m) · ${sheetNum(res.point.frictionVariable)}`,
      value: res.frictionCoefficient,
      unit: '1',
      source: RAIMONDI_BOYD,
    },
    {
      label: 'Petroff friction coefficient',
      formula: 'f_P = 2π²·(μN/P)·(r/c)',
      substituted: `f_P = 2π² · (${sheetNum(res.viscosity)} · ${sheetNum(N)}/${sheetNum(res.unitLoad)}) · (${sheetNum(r)}/${sheetNum(cl)})`,
      value: res.petroffFrictionCoefficient,
      unit: '1',
      source: 'Petroff (1883), in Hamrock, Schmid & Jacobson (2004)',
    },
    {
      label: 'Friction torque',
      formula: 'T = f·W·r',
      substituted: `T = ${sheetNum(res.frictionCoefficient)} · ${sheetNum(W)} N · ${sheetNum(r)} m`,
      value: res.frictionTorque,
      unit: 'N*m',
      source: 'definition',
    },
    {
      label: 'Power loss',
      formula: 'H = 2π·N·T',
      substituted: `H = 2π · ${sheetNum(N)} rev/s · ${sheetNum(res.frictionTorque)} N·m`,
      value: res.powerLoss,
      unit: 'W',
      source: 'definition',
    },
    {
      label: 'Oil flow drawn in',
      formula: 'Q = [Q/(rcNL)]·r·c·N·L',
      substituted: `Q = ${sheetNum(res.point.flowVariable)} · ${sheetNum(r)} m · ${sheetNum(cl)} m · ${sheetNum(N)} rev/s · ${sheetNum(L)} m`,
      value: res.flow,
      unit: 'm^3/s',
      source: RAIMONDI_BOYD,
    },
    {
      label: 'Side leakage',
      formula: 'Qs = (Qs/Q)·Q',
      substituted: `Qs = ${sheetNum(res.point.sideFlowRatio)} · ${sheetNum(res.flow)} m³/s`,
      value: res.sideFlow,
      unit: 'm^3/s',
      source: RAIMONDI_BOYD,
    },
  ];
}

/** Temperature rise of the heat balance, effective and maximum film temperature, peak film pressure. */
function heatLines(input: SheetInput): SheetLine[] {
  const res = input.evaluation.governing.result;
  const tIn = input.inletTemperature;
  return [
    {
      label: 'Temperature rise ΔT',
      formula: 'ΔT = 4π·P·[(r/c)f] / (ρ·cp·[Q/(rcNL)]·(1 − ½·Qs/Q))',
      substituted: `ΔT = 4π · ${sheetNum(res.unitLoad)} Pa · ${sheetNum(res.point.frictionVariable)} / (${sheetNum(res.densityUsed)} kg/m³ · ${sheetNum(res.specificHeatUsed)} J/(kg·K) · ${sheetNum(res.point.flowVariable)} · (1 − ½·${sheetNum(res.point.sideFlowRatio)}))`,
      value: res.temperatureRise,
      unit: 'K',
      source: `${RAIMONDI_BOYD}, Part III heat balance (from memory; common practice)`,
    },
    {
      label: 'Effective film temperature',
      formula: `T_eff = T_in + ${THERMAL_SHARE}·ΔT`,
      substituted: `T_eff = ${sheetNum(tIn)} °C + ${THERMAL_SHARE} · ${sheetNum(res.temperatureRise)} K`,
      value: res.effectiveTemperature,
      unit: 'degC',
      source: 'common practice (mean of inlet and outlet)',
    },
    {
      label: 'Maximum temperature estimate',
      formula: 'T_max = T_in + ΔT',
      substituted: `T_max = ${sheetNum(tIn)} °C + ${sheetNum(res.temperatureRise)} K`,
      value: res.maxTemperature,
      unit: 'degC',
      source: 'common practice (outlet temperature)',
    },
    {
      label: 'Peak film pressure',
      formula: 'pmax = P/(P/pmax)',
      substituted: `pmax = ${sheetNum(res.unitLoad)} Pa / ${sheetNum(res.point.pressureRatio)}`,
      value: res.peakPressure,
      unit: 'Pa',
      source: RAIMONDI_BOYD,
    },
  ];
}

/** Points written out term by term up to this many; beyond, the sum is named instead (a line stays readable). */
const MAX_TERMS_WRITTEN = 4;

/** The share-weighted mean power loss over the duty's points (shown when the duty has more than one). */
function meanPowerLine(e: DesignEvaluation): SheetLine {
  const points = e.points;
  const terms =
    points.length <= MAX_TERMS_WRITTEN
      ? `H̄ = (${points.map((p) => `${sheetNum(p.share)} · ${sheetNum(p.result.powerLoss)} W`).join(' + ')})/(${points.map((p) => sheetNum(p.share)).join(' + ')})`
      : `H̄ = (Σ over ${points.length} points of share·H)/(Σ share)`;
  return {
    label: 'Mean power loss over the duty',
    formula: 'H̄ = Σ share·H/Σ share over the operating points (H = 0 without a film)',
    substituted: terms,
    value: meanPowerLoss(points.map((p) => ({ share: p.share, powerLoss: p.result.powerLoss }))),
    unit: 'W',
    source: 'definition (time mean)',
  };
}
