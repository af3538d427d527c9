import type { Remark } from '../core/finding.js';
import { type OptionName } from '../core/options.js';
import type { CaseSI } from '../case/types.js';
import { governingMargin, type CheckRecord } from '../core/check.js';
import type { BushingResult } from '../calc/bushing/index.js';
import type { RollingResult } from '../calc/rolling/types.js';
import type { JournalResult } from '../calc/journal/index.js';
import { operatingPoints, pointSpeed } from '../calc/duty.js';

/**
 * The derived duty: plain numbers the rules compare against, computed once from the case.
 * Rules never embed code; what a rule needs to know of the case is put here, named and
 * in the unit its name says.
 */
export interface DutyFacts {
  /** Highest shaft speed over the duty (equivalent speed for oscillation), r/min. */
  speedRpm: number;
  /** Highest surface (sliding) speed of the journal, m/s. */
  surfaceSpeed: number;
  oscillating: boolean;
  /** Total swing angle, degrees (0 for a rotating shaft). */
  swingDeg: number;
  /** Largest radial and axial load, N; axial/radial ratio. */
  radialLoad: number;
  axialLoad: number;
  axialToRadial: number;
  /** Largest radial load over projected area D², Pa (a size-free load intensity). */
  loadIntensity: number;
  shock: CaseSI['load']['shock'];
  lifeHours: number;
  supply: CaseSI['lubrication']['supply'];
  contamination: CaseSI['environment']['contamination'];
  startsPerHour: number;
  /** Axial room over shaft diameter. */
  axialRoom: number;
  /** Radial room: (housing bore − shaft) / (2·shaft diameter), the wall a support may take per unit diameter. */
  radialRoom: number;
  ambient: number;
}

export function dutyFacts(c: CaseSI): DutyFacts {
  const pts = operatingPoints(c);
  const D = c.shaft.diameter;
  const n = Math.max(...pts.map((p) => pointSpeed(c, p)));
  const Fr = Math.max(...pts.map((p) => p.radial));
  const Fa = Math.max(...pts.map((p) => p.axial));
  return {
    speedRpm: n * 60,
    surfaceSpeed: Math.PI * D * n,
    oscillating: c.shaft.oscillation !== undefined,
    swingDeg: c.shaft.oscillation ? (c.shaft.oscillation.angle * 180) / Math.PI : 0,
    radialLoad: Fr,
    axialLoad: Fa,
    axialToRadial: Fa / Fr,
    loadIntensity: Fr / (D * D),
    shock: c.load.shock,
    lifeHours: c.life.hours,
    supply: c.lubrication.supply,
    contamination: c.environment.contamination,
    startsPerHour: c.environment.startsPerHour,
    axialRoom: c.space.maxLength / D,
    radialRoom: (c.space.maxOuterDiameter - D) / (2 * D),
    ambient: c.environment.ambient,
  };
}

/** What each option's check found, in a common shape for rules and the ranking. */
export interface OptionFigures {
  feasible: boolean;
  /** The design found (or the nearest miss when none is feasible). */
  design: Record<string, string | number | null>;
  /** Life in hours at the typical figures (null where no life limit is computed). */
  lifeHours: number | null;
  /** Life over the target (null as above). */
  lifeRatio: number | null;
  /** Time-weighted mean friction power over the duty, W (the same measure for all three). */
  frictionPower: number | null;
  /** Axial length and outside diameter the support takes, m. */
  length: number | null;
  outerDiameter: number | null;
  /** Limit checks that fail for the design shown (advisory checks excluded). */
  failed: CheckRecord[];
  /** Why the check found nothing feasible, in words. */
  why: Remark[];
}

const failing = (checks: CheckRecord[]) => checks.filter((k) => !k.pass && !k.advisory);

export function bushingFigures(r: BushingResult, c: CaseSI): OptionFigures {
  // Best, or the nearest miss (the check's own choice, so sheet, charts and advice show one material).
  const m = r.materials.find((x) => x.id === r.shown);
  if (!m)
    return {
      feasible: false,
      design: {},
      lifeHours: null,
      lifeRatio: null,
      frictionPower: null,
      length: null,
      outerDiameter: null,
      failed: [],
      why: r.warnings,
    };
  return {
    feasible: r.feasible,
    design: { material: m.id, name: m.name, length: m.length, outerDiameter: m.outerDiameter },
    lifeHours: m.lifeHours,
    lifeRatio: m.lifeHours / c.life.hours,
    frictionPower: m.meanFrictionPower,
    length: m.length,
    outerDiameter: m.outerDiameter,
    failed: r.feasible ? [] : failing(m.checks),
    why: r.feasible ? [] : [r.bestReason],
  };
}

export function rollingFigures(r: RollingResult, c: CaseSI): OptionFigures {
  const k =
    r.candidates.find((x) => x.id === r.best) ??
    [...r.candidates].sort((a, b) => governingMargin(b.checks) - governingMargin(a.checks))[0];
  if (!k)
    return {
      feasible: false,
      design: {},
      lifeHours: null,
      lifeRatio: null,
      frictionPower: null,
      length: null,
      outerDiameter: null,
      failed: [],
      why: r.warnings,
    };
  const life = k.L10mh ?? k.L10h;
  return {
    feasible: r.feasible,
    design: {
      bearing: k.id,
      kind: k.kind,
      form: k.form,
      arrangement: k.arrangement,
      contactAngle: k.contactAngle,
      designation: k.designation,
      bore: k.bore,
      outerDiameter: k.outerDiameter,
      width: k.width,
      dynamicRating: k.dynamicRating,
      ratingSource: k.ratingSource,
    },
    lifeHours: life,
    lifeRatio: life === null ? null : life / c.life.hours,
    frictionPower: k.frictionPower,
    length: k.width,
    outerDiameter: k.outerDiameter,
    failed: r.feasible ? [] : failing(k.checks),
    why: r.feasible ? [] : [...k.exclusions, ...failing(k.checks).map((x) => `fails: ${x.label}`)],
  };
}

export function journalFigures(r: JournalResult): OptionFigures {
  return {
    feasible: r.feasible,
    design: { length: r.length, radialClearance: r.radialClearance, lengthToDiameter: r.lengthToDiameter, oil: r.oil },
    // A full film that holds separates the surfaces: no wear or fatigue life is computed.
    lifeHours: null,
    lifeRatio: null,
    frictionPower: r.meanPowerLoss,
    length: r.length,
    outerDiameter: null,
    failed: r.feasible ? [] : failing(r.checks),
    // Why it is out: the failing limits (its warnings are cautions, reported apart).
    why: r.feasible ? [] : failing(r.checks).map((k) => `fails: ${k.label.charAt(0).toLowerCase()}${k.label.slice(1)}`),
  };
}

export type Figures = Record<OptionName, OptionFigures>;
