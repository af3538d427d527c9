import type { CheckRecord, SheetLine } from '../../core/check.js';
import type { AssumedFinding, Finding } from '../../core/finding.js';
import type { SweepRow } from './design.js';
import type { JournalThrust } from './thrust.js';

/**
 * The result of the journal bearing check (checkJournal) and its options. SI units: m, N,
 * rev/s, Pa, Pa·s, W, m³/s; angles in degrees where the key says so; temperatures °C.
 */

export interface PressurePoint {
  /** Angle from the maximum-film line in the direction of rotation, degrees. */
  angleDeg: number;
  /** Film pressure at mid-length, Pa. */
  pressure: number;
}

/** One operating point of the chosen design (SI; the same quantities as the result's, at this point). */
export interface JournalPointSummary {
  /** Share of running time, 0–1. */
  share: number;
  /** Radial load, N, and speed, rev/s. */
  load: number;
  speed: number;
  /** False when no film forms (no rotation or no lubricant). */
  film: boolean;
  sommerfeld: number;
  eccentricityRatio: number;
  /** Minimum and allowable film thickness, m, and the film margin (h0 − h_allow)/h_allow. */
  minFilmThickness: number;
  allowableFilmThickness: number;
  filmMargin: number;
  /** Attitude angle, degrees. */
  attitudeAngle: number;
  frictionCoefficient: number;
  /** Power loss, W. */
  powerLoss: number;
  /** Flow drawn in and side leakage, m³/s. */
  flow: number;
  sideFlow: number;
  /** Peak film pressure, Pa. */
  peakPressure: number;
  /** Viscosity at the effective temperature, Pa·s. */
  viscosity: number;
  /** Effective and maximum film temperature, °C. */
  effectiveTemperature: number;
  maxTemperature: number;
  /** True when ε lies beyond the solved table (order-of-magnitude figures). */
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
   * rolling candidate's `frictionPower` — plus the thrust face's time-mean loss
   * (`thrust.meanPowerLoss`), so that the option's figure covers the whole load it carries.
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
  /** What the check took where the case was silent, as data (worded by src/report/findings/journal.ts). */
  assumed: AssumedFinding[];
  /** Cautions, as data (worded by src/report/findings/journal.ts). */
  warnings: Finding[];
  sheet: SheetLine[];
  /** Pressure around the journal at mid-length, governing point (empty when no film or beyond the table). */
  pressureProfile: PressurePoint[];
  /** Index of the governing operating point in `points`. */
  governingPoint: number;
  points: JournalPointSummary[];
  /**
   * How the axial load is carried (null without one): a hydrodynamic pad thrust bearing or a
   * rubbing face, its figures and its checks (also in `checks`, ids 'thrust-').
   */
  thrust: JournalThrust | null;
}

/** Options of checkJournal. */
export interface JournalOptions {
  /**
   * Solve the mid-length pressure profile of the governing point (default true). A sweep
   * over many points (the selection map) turns it off: it costs one more direct Reynolds
   * solve, and nothing but the report's pressure chart reads it.
   */
  pressureProfile?: boolean;
  /**
   * Build the calculation sheet (default true). A sweep turns it off: `sheet` is then
   * empty; formatting its lines costs more than the design evaluation itself.
   */
  sheet?: boolean;
}
