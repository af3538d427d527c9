import type { Remark } from '../core/finding.js';
import { OPTIONS, type OptionName } from '../core/options.js';
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
  /**
   * Speed factor of a rolling bearing on this shaft, n·dm in mm·r/min: the highest speed
   * (r/min) times the pitch diameter dm (mm), taken as PITCH_DIAMETER_FACTOR × the shaft
   * diameter (the speed the rolling elements see, whatever the kind chosen).
   */
  ndm: number;
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

/**
 * Pitch diameter dm = (bore + outside diameter)/2 of a rolling bearing over its bore: about
 * 1.25 for dimension series 10 and 1.4 for series 02 (outside diameter about 1.5 and 1.8 ×
 * the bore at 50–100 mm bores, from memory of the ISO 15 boundary-dimension plans); 1.3 is
 * taken between them (common practice for an n·dm estimate before a bearing is chosen).
 */
export const PITCH_DIAMETER_FACTOR = 1.3;

export function dutyFacts(c: CaseSI): DutyFacts {
  const pts = operatingPoints(c);
  const D = c.shaft.diameter;
  const n = Math.max(...pts.map((p) => pointSpeed(c, p)));
  const Fr = Math.max(...pts.map((p) => p.radial));
  const Fa = Math.max(...pts.map((p) => p.axial));
  return {
    speedRpm: n * 60,
    surfaceSpeed: Math.PI * D * n,
    // r/min × mm: n [rev/s]·60 times dm [m]·1000.
    ndm: n * 60 * PITCH_DIAMETER_FACTOR * D * 1000,
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
  /** This option's figures against the other options' (filled by compareFigures). */
  compare?: OptionComparison;
}

/**
 * One option's computed figures set against the options that pass their checks (the
 * "feasible" options), so a rule that claims "its friction is the lowest" or "it is the
 * smallest" can condition on this case's numbers. Ratios are this option's figure over the
 * best figure of the feasible options (the option itself counted when it is feasible);
 * null where this option has no such figure, no feasible option has one, or the best is 0.
 */
export interface OptionComparison {
  /** Options (of three) that pass their checks. */
  feasibleCount: number;
  /** Mean friction power over the lowest of the feasible options' (1 = the lowest). */
  frictionToLowest: number | null;
  /**
   * True when this option is feasible, at least one other feasible option has a computed
   * friction power, and this option's is no higher than any of theirs.
   */
  frictionLowest: boolean;
  /**
   * How far the next-lowest feasible option's friction power is above this option's, W
   * (negative when another feasible option runs cooler); null without a feasible other.
   */
  frictionMargin: number | null;
  /** This option's friction power above the lowest of the feasible options', W (0 for the lowest). */
  frictionAboveLowest: number | null;
  /** Life (h) over the longest life of the feasible options that compute one (1 = the longest). */
  lifeToLongest: number | null;
  /** Axial length over the shortest of the feasible options' (1 = the shortest). */
  lengthToShortest: number | null;
  /** Outside diameter over the smallest of the feasible options' (1 = the smallest). */
  outerDiameterToSmallest: number | null;
}

/** The material's lubrication need, null where the material row does not state one. */
const needsOf = (m: object): string | null => {
  const n = (m as { needs?: unknown }).needs;
  return typeof n === 'string' ? n : null;
};

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
    design: {
      material: m.id,
      name: m.name,
      // What lubrication the material needs ('none' | 'grease' | 'oil'), read by the rules that
      // credit a bushing for running without lubricant.
      needs: needsOf(m),
      length: m.length,
      outerDiameter: m.outerDiameter,
    },
    lifeHours: m.lifeHours,
    lifeRatio: m.lifeHours / c.life.hours,
    frictionPower: m.meanFrictionPower,
    length: m.length,
    outerDiameter: m.outerDiameter,
    failed: r.feasible ? [] : failing(m.checks),
    why: r.feasible ? [] : [r.bestReason],
  };
}

/**
 * The candidate with the largest governing margin, the first of equals: what a stable sort on
 * descending margin puts first, found in one pass with each margin computed once. A NaN margin
 * makes that sort's order depend on its comparisons, so then the sort itself is run (on the
 * margins computed once).
 */
function nearestMiss<T extends { checks: CheckRecord[] }>(candidates: readonly T[]): T | undefined {
  const margins = candidates.map((x) => governingMargin(x.checks));
  if (margins.some(Number.isNaN)) {
    const order = margins.map((_, i) => i).sort((a, b) => margins[b]! - margins[a]!);
    return candidates[order[0]!];
  }
  let best = 0;
  for (let i = 1; i < margins.length; i++) if (margins[i]! > margins[best]!) best = i;
  return candidates[best];
}

export function rollingFigures(r: RollingResult, c: CaseSI): OptionFigures {
  const k = r.candidates.find((x) => x.id === r.best) ?? nearestMiss(r.candidates);
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

type Measure = 'frictionPower' | 'lifeHours' | 'length' | 'outerDiameter';

/** The best (lowest, or highest for life) of the feasible options' finite figures of one measure; null when none has one. */
function bestOf(figs: Figures, feasible: readonly OptionName[], key: Measure, best: 'min' | 'max'): number | null {
  const pool = feasible
    .map((o) => figs[o][key])
    .filter((x): x is number => typeof x === 'number' && Number.isFinite(x));
  if (!pool.length) return null;
  return best === 'min' ? Math.min(...pool) : Math.max(...pool);
}

/** This option's figure over the best of the feasible options' (`ref`, from bestOf). */
function ratioToBest(own: number | null, ref: number | null): number | null {
  if (own === null || !Number.isFinite(own) || ref === null) return null;
  // No ratio to a best of 0 (a figure that is 0 W, say): 1 when this is 0 too, else null.
  if (ref === 0) return own === 0 ? 1 : null;
  return own / ref;
}

/**
 * The figures of the three options with each one's comparison with the others filled in
 * (OptionFigures.compare). Pure: returns new objects, the inputs are left as they were.
 */
export function compareFigures(figs: Figures): Figures {
  const feasible = OPTIONS.filter((o) => figs[o].feasible);
  // The best of each measure over the feasible options: the same for every option.
  const lowestFriction = bestOf(figs, feasible, 'frictionPower', 'min');
  const longestLife = bestOf(figs, feasible, 'lifeHours', 'max');
  const shortest = bestOf(figs, feasible, 'length', 'min');
  const smallest = bestOf(figs, feasible, 'outerDiameter', 'min');
  // The lowest friction power of the feasible options that have one (finite or not), for frictionAboveLowest.
  const powers = feasible.map((o) => figs[o].frictionPower).filter((x): x is number => x !== null);
  const lowestPower = powers.length ? Math.min(...powers) : null;
  const out = {} as Figures;
  for (const o of OPTIONS) {
    const f = figs[o];
    const mine = f.frictionPower;
    // The other feasible options' friction powers: how many, their lowest, and whether mine is no higher than any.
    let others = 0;
    let lowestOther = Infinity;
    let noHigher = true;
    for (const x of feasible) {
      const p = figs[x].frictionPower;
      if (x === o || p === null) continue;
      others++;
      lowestOther = Math.min(lowestOther, p);
      noHigher &&= mine !== null && mine <= p;
    }
    out[o] = {
      ...f,
      compare: {
        feasibleCount: feasible.length,
        frictionToLowest: ratioToBest(mine, lowestFriction),
        frictionLowest: f.feasible && mine !== null && others > 0 && noHigher,
        frictionMargin: mine === null || !others ? null : lowestOther - mine,
        frictionAboveLowest: mine === null || lowestPower === null ? null : mine - lowestPower,
        lifeToLongest: ratioToBest(f.lifeHours, longestLife),
        lengthToShortest: ratioToBest(f.length, shortest),
        outerDiameterToSmallest: ratioToBest(f.outerDiameter, smallest),
      },
    };
  }
  return out;
}
