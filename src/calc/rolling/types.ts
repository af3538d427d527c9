import type { AssumedFinding, Finding } from '../../core/finding.js';
import type { CheckRecord, SheetLine } from '../../core/check.js';
import type { RollingType } from './life.js';
import type { Arrangement, KindForm, RollingKind } from './kinds.js';

/**
 * Result of the rolling-bearing check (a contract read by the CLI, the rules and the
 * reports). Lives in hours, L10 in million revolutions, ndm in mm·r/min, speeds in
 * rev/s, everything else SI (m, N, W, N·m, m²/s, °C). A figure that does not apply is
 * null, never NaN or Infinity.
 */
export interface RollingCandidate {
  /** Stable id: "supplier" for the case's own bearing, else the ISO 15 row id (e.g. "dgb-02-40"). */
  id: string;
  type: RollingType;
  /** Kind in the trade's name (a contract), e.g. "deep-groove ball", "tapered roller". */
  kind: RollingKind;
  /** Construction within the kind (rib form of a cylindrical roller bearing, needle roller construction), or null. */
  form: KindForm | null;
  /** Single bearing, or a matched pair acting as one support (a contract). */
  arrangement: Arrangement;
  /** Nominal contact angle, degrees (0 for the radial kinds; a contract in degrees). */
  contactAngle: number;
  /** Which directions of axial load the support takes. */
  axialCapacity: 'none' | 'one direction' | 'both directions';
  /** Dimension series ("02", "302", "drawn cup"), or "supplier". */
  series: string;
  /** Generic designation in words. */
  designation: string;
  /** Bore d, m. */
  bore: number;
  /** Outside diameter D, m (null when a supplier bearing gives none and no ISO 15 row of its bore exists). */
  outerDiameter: number | null;
  /** Width B, m (null as above). */
  width: number | null;
  /** Basic dynamic load rating C, N. */
  dynamicRating: number;
  /** Basic static load rating C0, N. */
  staticRating: number;
  /** Fatigue load limit Cu, N (supplier's, or C0/22, C0/8.2). */
  fatigueLimit: number;
  ratingSource: 'supplier' | 'estimated';
  /** Pitch diameter dm, m (estimated as (d+D)/2). */
  pitchDiameter: number;
  /** Estimated rolling-element diameter, m, and count (for the oscillation criterion, and the ratings when estimated). */
  elementDiameter: number;
  elementCount: number;
  /** X and Y of the heaviest operating point, and its limit e of Fa/Fr (null where the kind has none). */
  X: number;
  Y: number;
  e: number | null;
  /** Largest axial load the bearing carries, N: the case's, plus the induced force of an opposed partner for a single-row angular-contact or tapered bearing. */
  axialLoad: number;
  /** Dynamic equivalent load (duty-spectrum mean, times service factor), N. */
  equivalentLoad: number;
  /** Peak static equivalent load P0, N. */
  staticEquivalentLoad: number;
  /** Basic rating life, million revolutions (null with no load). */
  L10: number | null;
  /** Basic rating life, hours (null with no rotation or no load). */
  L10h: number | null;
  /** Life modification factor for reliability. */
  a1: number;
  aISO: number | null;
  /** Viscosity ratio κ = ν/ν1 as computed (before the standard's limits). */
  kappa: number | null;
  /** Modified rating life a1·a_ISO·L10h, hours. */
  L10mh: number | null;
  /** Static safety factor C0/P0 (null with no load). */
  s0: number | null;
  /** True when the shaft turns so slowly that no rating life is claimed: static safety governs. */
  staticOnly: boolean;
  /** Speed factor at the highest point speed, mm·r/min. */
  ndm: number;
  /** Friction torque, N·m: time-weighted mean over the duty's operating points, Σ ti·Mi/Σ ti. */
  frictionTorque: number;
  /**
   * Friction power, W: time-weighted mean over the duty's operating points,
   * Σ ti·(Mi·2π·ni)/Σ ti — the mean heat a running bearing gives off, comparable with the
   * journal's `meanPowerLoss` (not the power at the heaviest point, nor M̄·2π·n̄).
   */
  frictionPower: number;
  /**
   * Basic dynamic rating this candidate needs for the life target with a1 (a_ISO taken as
   * 1), N, from its own P and life exponent p (3 ball, 10/3 roller); null with no rotation
   * or no target.
   */
  requiredDynamicRating: number | null;
  /** Grease relubrication interval (grease life for a sealed bearing), hours; null on oil or with no rotation. */
  relubricationHours: number | null;
  /** Estimated operating temperature, °C. */
  temperature: number;
  /** Kinematic viscosity of the (base) oil at the operating temperature, m²/s. */
  viscosity: number;
  /** Rated viscosity ν1, m²/s (null with no rotation). */
  ratedViscosity: number | null;
  /** Smallest swing angle for full rolling-element overlap, rad (oscillating shafts only). */
  criticalSwingAngle: number | null;
  /** Each operating point as the bearing sees it (for the calculation sheet), in the duty's order. */
  points: CandidatePoint[];
  /** Reasons that rule the bearing out regardless of the checks (worded by src/report/findings). */
  exclusions: Finding[];
  feasible: boolean;
  checks: CheckRecord[];
}

/** One operating point of one candidate, SI (N, rev/s, N·m); null where it does not apply. */
export interface CandidatePoint {
  Fr: number;
  /** Axial load the bearing carries (the case's, plus an opposed partner's induced force), N. */
  Fa: number;
  n: number;
  t: number;
  X: number;
  Y: number;
  e: number | null;
  /** What the kind's X/Y table is entered with (f0·Fa/C0 for a deep-groove ball bearing), or null. */
  key: number | null;
  /** Dynamic equivalent load without the service factor, N. */
  P: number;
  kappa: number | null;
  aISO: number | null;
  /** The point's own modified life, h (null when static or unloaded). */
  L10mh: number | null;
  /** True when the point turns too slowly for a rating life. */
  static: boolean;
  /** Friction moment, N·m: viscous and load terms. */
  frictionViscous: number;
  frictionLoad: number;
}

/** What the rules and the advice see of one kind: its lead candidate and the traits that decide between kinds. */
export interface KindFacts {
  kind: RollingKind;
  /** The kind's lead candidate (leadOfEachKind). */
  id: string;
  feasible: boolean;
  axialCapacity: RollingCandidate['axialCapacity'];
  /** Misalignment the kind tolerates, minutes of arc (common practice, data/rolling-kinds.json). */
  misalignment_arcmin: number;
  /** Radial section height (D − d)/2, m (null when D is unknown). */
  sectionHeight: number | null;
  costClass: number;
  speedClass: number;
}

export interface RollingResult {
  option: 'rolling';
  /** Dynamic equivalent load of the best (else first) candidate, N; null when there is none and no bound can be formed. */
  equivalentLoad: number | null;
  /** Time-weighted mean speed, rev/s (the equivalent rotational speed for an oscillating shaft). */
  equivalentSpeed: number;
  /** Basic dynamic rating needed for the life target with a1 (a_ISO taken as 1), N; null with no rotation or no target. */
  requiredDynamicRating: number | null;
  /**
   * Bearing type and life exponent p that `requiredDynamicRating` was worked for: the best
   * candidate's (else the first candidate's; a deep-groove ball bearing when there is no
   * candidate); null when `requiredDynamicRating` is null. Each candidate carries its own.
   */
  requiredDynamicRatingFor: { type: RollingType; p: number } | null;
  candidates: RollingCandidate[];
  best: string | null;
  /** One lead candidate per kind offered (the feasible choice of that kind, else its nearest miss), with the traits that decide between kinds. */
  kinds: KindFacts[];
  /** The best candidate's kind facts (null when nothing is feasible). */
  chosen: KindFacts | null;
  /** Why the best kind was picked over the less costly ones (worded by the report); null when nothing is feasible. */
  choice: Finding | null;
  feasible: boolean;
  /** What the check assumed, and its cautions, as data (worded by src/report/findings/rolling.ts). */
  assumed: AssumedFinding[];
  warnings: Finding[];
  sheet: SheetLine[];
}
