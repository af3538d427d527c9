import type { CheckRecord, SheetLine } from '../../core/check.js';
import type { AssumedFinding, Finding } from '../../core/finding.js';
import type { LubricantNeed, MediumRating } from '../../data/bushing.js';
import type { ThrustFace } from '../thrust/rubbing.js';

/**
 * The flange or thrust washer that carries a bushing's axial load, checked with the bushing's
 * material (src/calc/thrust/rubbing.ts). SI: m, Pa, m/s, Pa·m/s, W; life h.
 */
export interface BushingThrust {
  face: ThrustFace;
  /** Axial thickness of the washer or flange, counted in the axial space, m. */
  thickness: number;
  /** Largest mean face pressure over the duty, Pa. */
  pressure: number;
  /** Largest mean sliding speed at the mean diameter, m/s. */
  velocity: number;
  /** Largest face PV, Pa·m/s. */
  pv: number;
  /** Hours to wear the face through the allowance (share-weighted over the duty). */
  lifeHours: number;
  /** Friction power at the point of largest Fa·V, W. */
  frictionPower: number;
}

/** One material class sized and checked for the case. SI units; lives in hours. */
export interface BushingMaterialResult {
  id: string;
  name: string;
  /**
   * Bushing length, m: the case's, or the common length every material is checked at (the
   * longest, so the best wear life, within the axial space less any thrust washer and L/D ≤ 2).
   */
  length: number;
  lengthChosen: 'case' | 'common';
  /** The lubricant the material must be given to reach its limits (a contract key). */
  needs: LubricantNeed;
  /** Resistance in water or slurry and in chemical service (inline materials: fair unless given). */
  water: MediumRating;
  chemical: MediumRating;
  /** The flange or thrust washer carrying the axial load; null when the case has none. */
  thrust: BushingThrust | null;
  /** Why the material is unsuited apart from its limit checks (lubricant need, service medium). */
  reasons: Finding[];
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
  /** Shortest length meeting pressure, PV and wear life of the bore, regardless of space, m. */
  minLength: number;
  minLengthBy: { pressure: number; pv: number; wear: number };
  /** Steady rubbing-surface temperature estimate, °C (heat balance ΔT = R·μ·P·V, advisory). */
  temperature: number;
  frictionCoefficient: number;
  /** Frictional power at the governing point (largest F·V) of the bore, plus the thrust face's at its largest Fa·V, W. */
  frictionPower: number;
  /** Time-weighted mean frictional power over the duty, Σ share·f·F·V of the bore plus the thrust face's, W. */
  meanFrictionPower: number;
  feasible: boolean;
  checks: CheckRecord[];
  source: string;
}

export interface BushingResult {
  option: 'bushing';
  materials: BushingMaterialResult[];
  /** The common length the materials were checked at (or the case's length), m. */
  length: number;
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

/**
 * One operating point as the bushing sees it: share of time, radial load F (N), sliding speed
 * V (m/s) of the bore, axial load Fa (N) and shaft speed n (rev/s; absent when oscillating).
 */
export interface DutyPoint {
  share: number;
  F: number;
  V: number;
  Fa: number;
  n?: number;
}
