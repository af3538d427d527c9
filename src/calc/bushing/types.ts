import type { CheckRecord, SheetLine } from '../../core/check.js';
import type { AssumedFinding, Finding } from '../../core/finding.js';

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

/** One operating point as the bushing sees it: share of time, radial load F (N), sliding speed V (m/s). */
export interface DutyPoint {
  share: number;
  F: number;
  V: number;
}
