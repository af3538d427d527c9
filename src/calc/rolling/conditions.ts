import type { CaseSI } from '../../case/types.js';
import { assumedFinding, finding } from '../../core/finding.js';
import type { RollingFactors } from '../../data/rolling.js';
import { operatingPoints, pointSpeed } from '../duty.js';
import { RELIABILITY_RANGE, reliabilityFactor, type RollingType } from './life.js';
import { staticSafetyGuidance, type StaticSafetyGuidance } from './speed.js';
import type { Notes } from './findings.js';

/**
 * What the case asks of a rolling bearing, read once for every candidate: the operating
 * points, the factors its shock level selects and the factors for life (contamination,
 * reliability). Each is a frozen record the later steps read.
 *
 * References
 * [1] ISO 281:2007: reliability factor a1, contamination factor e_C (from memory).
 * [2] Service factor for shock and static-safety guidance: data/rolling-factors.json, each
 *     row with its source (common practice, from memory).
 */

/** One operating point: Fr, Fa radial and axial load, N (≥ 0); n speed, rev/s (≥ 0); t time share (≥ 0). */
export interface LoadPoint {
  Fr: number;
  Fa: number;
  n: number;
  t: number;
}

export interface DutyPoints {
  points: LoadPoint[];
  /** Time-weighted mean speed Σ ni·ti / Σ ti, rev/s (0 when no time is given). */
  meanSpeed: number;
  /** Highest point speed, rev/s. */
  maxSpeed: number;
}

/** The value when it is a finite number, else the fallback (for a value left out or not a number). */
export function finiteOr(v: number | undefined, fallback: number): number {
  return v !== undefined && Number.isFinite(v) ? v : fallback;
}

/**
 * The operating points as load magnitudes, N, and speeds, rev/s, with the time-weighted mean
 * speed n̄ = Σ ni·ti / Σ ti and the highest speed. A negative or missing load is read as its
 * magnitude (or 0) and said; an oscillating shaft turns at its equivalent speed n = θ·f/π
 * (src/calc/duty.ts, common practice).
 */
export function dutyPoints(c: CaseSI, notes: Notes): DutyPoints {
  const given = operatingPoints(c);
  const points = given.map((q) => ({
    Fr: Number.isFinite(q.radial) ? Math.abs(q.radial) : 0,
    Fa: Number.isFinite(q.axial) ? Math.abs(q.axial) : 0,
    n: Math.max(0, finiteOr(pointSpeed(c, q), 0)),
    t: Math.max(0, finiteOr(q.share, 0)),
  }));
  if (given.some((q) => !(q.radial >= 0) || !(q.axial >= 0))) notes.warn(finding('rolling.load-magnitude'));
  const totalTime = points.reduce((sum, q) => sum + q.t, 0);
  const meanSpeed = totalTime > 0 ? points.reduce((sum, q) => sum + q.n * q.t, 0) / totalTime : 0;
  const maxSpeed = points.reduce((m, q) => Math.max(m, q.n), 0);
  if (c.shaft.oscillation)
    notes.assume(assumedFinding('shaft.oscillation', 'rolling.equivalent-speed', { speed: meanSpeed }));
  if (!(meanSpeed > 0)) notes.warn(finding('rolling.not-turning'));
  return { points, meanSpeed, maxSpeed };
}

export interface ShockFactors {
  /** Service factor f_d on the dynamic equivalent load, 1. */
  serviceFactor: number;
  /** Static-safety guidance for the shock level, per type: the least s0, its label and source. */
  s0Guidance: (type: RollingType) => StaticSafetyGuidance;
}

/**
 * The service factor f_d and the static-safety guidance for the case's shock level [2]. An
 * unknown level takes the first service-factor row.
 */
export function shockFactors(c: CaseSI, f: RollingFactors, notes: Notes): ShockFactors {
  const sf = f.serviceFactors.find((s) => s.shock === c.load.shock) ?? f.serviceFactors[0]!;
  notes.assume(
    assumedFinding('load.shock', 'rolling.service-factor', {
      shock: c.load.shock,
      serviceFactor: sf.serviceFactor,
      source: sf.source,
    }),
  );
  // Looked up once per type: every candidate of the case asks.
  const guidance: Partial<Record<RollingType, StaticSafetyGuidance>> = {};
  return {
    serviceFactor: sf.serviceFactor,
    s0Guidance: (type) => (guidance[type] ??= staticSafetyGuidance(c.load.shock, type)),
  };
}

/**
 * Pitch diameter at which the ISO 281 contamination guidance changes column, m (ISO 281:2007,
 * from memory): below it the dm < 100 mm ranges, from it on the (higher) dm ≥ 100 mm ranges.
 */
export const EC_GUIDANCE_DM = 0.1;

/** The contamination level a sealed bearing greased for life is read at, whatever its surroundings. */
export const SEALED_LEVEL = 'clean';

/**
 * Contamination factor e_C of one bearing [1]: the middle of the ISO 281 range of its level in
 * the column of its pitch diameter dm (m): eC for dm < 0.1 m, eCLarge from 0.1 m on.
 */
export function contaminationFactor(cont: RollingFactors['contamination'][number], dm: number): number {
  return dm >= EC_GUIDANCE_DM ? cont.eCLarge : cont.eC;
}

export interface LifeFactors {
  /** Contamination row: the ISO 281 level read and its factors e_C (dm < 100 mm) and eCLarge (dm ≥ 100 mm), 1. */
  cont: RollingFactors['contamination'][number];
  /** Reliability factor a1, 1 [1]. */
  a1: number;
  /** Reliability a1 is worked for, % (the case's, held to the range of the a1 formula). */
  reliabilityUsed: number;
}

/**
 * Whether a sealed bearing's seals can be trusted to keep its surroundings out for life: in air
 * (no medium, or dry) and short of ISO 281's "severe contamination", whose typical conditions
 * are ineffective or damaged seals. A bearing running in water, slurry or a chemical, or in
 * severe dirt, takes its surroundings' level (common practice).
 */
function sealsHold(c: CaseSI): boolean {
  const medium = c.environment.medium;
  return (medium === undefined || medium === 'dry') && c.environment.contamination !== 'severe';
}

/**
 * The contamination level and its factor e_C (the middle of the ISO 281 range, per pitch-diameter
 * column) and the reliability factor a1 [1]. An open bearing takes the case's surroundings; a
 * sealed bearing greased for life (no supply in the case) takes ISO 281's "high cleanliness",
 * whose typical conditions are sealed bearings greased for life: the seals keep the
 * surroundings out, so its level is largely independent of them (said), unless it runs in a
 * liquid or in severe dirt (sealsHold). A reliability outside
 * the a1 formula's range is held to it and said; one that is not a number is read as the basic
 * rating's own, the lower end of that range (a1 = 1).
 */
export function lifeFactors(c: CaseSI, f: RollingFactors, notes: Notes): LifeFactors {
  const surroundings = f.contamination.find((x) => x.level === c.environment.contamination) ?? f.contamination[1]!;
  const sealed = c.lubrication.supply === 'none' && sealsHold(c);
  const cont = sealed ? (f.contamination.find((x) => x.level === SEALED_LEVEL) ?? surroundings) : surroundings;
  notes.assume(
    assumedFinding('environment.contamination', sealed ? 'rolling.contamination-sealed' : 'rolling.contamination', {
      level: cont.level,
      isoLevel: cont.isoLevel,
      surroundings: surroundings.level,
      low: cont.low,
      high: cont.high,
      eC: cont.eC,
      lowLarge: cont.lowLarge,
      highLarge: cont.highLarge,
      eCLarge: cont.eCLarge,
      guidanceBelow: EC_GUIDANCE_DM,
      source: cont.source,
    }),
  );
  const rel = reliabilityFactor(finiteOr(c.life.reliability, RELIABILITY_RANGE.min));
  if (rel.clamped) {
    notes.warn(
      finding('rolling.reliability-held', {
        reliability: c.life.reliability,
        used: rel.reliabilityUsed,
        min: RELIABILITY_RANGE.min,
        max: RELIABILITY_RANGE.max,
      }),
    );
  }
  notes.assume(assumedFinding('life.criterion', 'rolling.life-criterion'));
  return { cont, a1: rel.a1, reliabilityUsed: rel.reliabilityUsed };
}
