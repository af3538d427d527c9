import type { CaseSI } from '../../case/types.js';
import type { RollingFactors } from '../../data/rolling.js';
import { operatingPoints, pointSpeed } from '../duty.js';
import { RELIABILITY_RANGE, reliabilityFactor } from './life.js';
import { fmt, type Notes } from './findings.js';

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
  if (given.some((q) => !(q.radial >= 0) || !(q.axial >= 0))) {
    notes.warn('a load was negative or not a number: its magnitude (or 0) is used');
  }
  const totalTime = points.reduce((sum, q) => sum + q.t, 0);
  const meanSpeed = totalTime > 0 ? points.reduce((sum, q) => sum + q.n * q.t, 0) / totalTime : 0;
  const maxSpeed = points.reduce((m, q) => Math.max(m, q.n), 0);
  if (c.shaft.oscillation) {
    notes.assume({
      field: 'shaft.oscillation',
      value: `equivalent rotational speed ${fmt(meanSpeed * 60)} r/min`,
      reason:
        'for life, an oscillating shaft is taken as rotating at n = θ·f/π, the speed that turns the same angle per second (common practice)',
    });
  }
  if (!(meanSpeed > 0))
    notes.warn(
      'the shaft does not turn (mean speed 0): rating lives, viscosity ratio and speed checks do not apply; only static safety is checked',
    );
  return { points, meanSpeed, maxSpeed };
}

export interface ShockFactors {
  /** Service factor f_d on the dynamic equivalent load, 1. */
  serviceFactor: number;
  /** Static-safety guidance for the shock level (limits s0 for ball and roller). */
  s0Row: RollingFactors['staticSafety'][number];
}

/**
 * The service factor f_d and the static-safety row for the case's shock level [2]. An unknown
 * level takes the first service-factor row and the "light" static-safety row.
 */
export function shockFactors(c: CaseSI, f: RollingFactors, notes: Notes): ShockFactors {
  const sf = f.serviceFactors.find((s) => s.shock === c.load.shock) ?? f.serviceFactors[0]!;
  notes.assume({
    field: 'load.shock',
    value: `service factor f_d = ${sf.serviceFactor}`,
    reason: `dynamic equivalent load multiplied by f_d for shock level "${c.load.shock}" (${sf.source}); static safety uses the peak operating point without f_d, its limit already graded by shock`,
  });
  const s0Row = f.staticSafety.find((s) => s.shock === c.load.shock) ?? f.staticSafety[1]!;
  return { serviceFactor: sf.serviceFactor, s0Row };
}

export interface LifeFactors {
  /** Contamination row: the ISO 281 level read and its factor e_C, 1. */
  cont: RollingFactors['contamination'][number];
  /** Reliability factor a1, 1 [1]. */
  a1: number;
  /** Reliability a1 is worked for, % (the case's, held to the range of the a1 formula). */
  reliabilityUsed: number;
}

/**
 * The contamination factor e_C (the middle of the ISO 281 range for the case's level) and the
 * reliability factor a1 [1]; a reliability outside the a1 formula's range is held to it and
 * said. A reliability that is not a number is read as the basic rating's own, the lower end of
 * that range (a1 = 1).
 */
export function lifeFactors(c: CaseSI, f: RollingFactors, notes: Notes): LifeFactors {
  const cont = f.contamination.find((x) => x.level === c.environment.contamination) ?? f.contamination[1]!;
  notes.assume({
    field: 'environment.contamination',
    value: `e_C = ${cont.eC}`,
    reason: `"${cont.level}" read as ISO 281 "${cont.isoLevel}" (e_C ${cont.low}–${cont.high} for dm < 100 mm); the middle of the range is taken (${cont.source})`,
  });
  const rel = reliabilityFactor(finiteOr(c.life.reliability, RELIABILITY_RANGE.min));
  if (rel.clamped) {
    notes.warn(
      `reliability ${c.life.reliability} % is outside the a1 formula's range ${RELIABILITY_RANGE.min}–${RELIABILITY_RANGE.max} % (ISO 281:2007): ${rel.reliabilityUsed} % is used`,
    );
  }
  notes.assume({
    field: 'life.criterion',
    value: 'L10mh = a1·a_ISO·L10h ≥ life target',
    reason:
      'a candidate meets the life target on the modified rating life of ISO 281:2007, which counts lubrication and contamination; the required dynamic rating is the basic rating with a1 only (a_ISO = 1)',
  });
  return { cont, a1: rel.a1, reliabilityUsed: rel.reliabilityUsed };
}
