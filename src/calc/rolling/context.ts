import type { CaseSI } from '../../case/types.js';
import { kindTraits, type KindTraits, type RollingFactors } from '../../data/rolling.js';
import { loadFactors, type LoadFactors } from '../../data/rolling-load-factors.js';
import { rollingRunning, type RollingRunning } from '../../data/rolling-running.js';
import type { LoadPoint, ShockFactors } from './conditions.js';
import type { Lubrication } from './lubrication.js';

/*
 * The data passed between the rolling kernel's steps: the case's context every candidate is
 * evaluated in (evaluate.ts), the tables it reads, and the figures its checks read (checks.ts).
 * Not public.
 */

/**
 * The tables a candidate's evaluation reads, read once per check (a sweep evaluates every
 * candidate at every point; the loaders read SHAFTWISE_DATA_DIR at each call).
 */
export interface RollingTables {
  load: LoadFactors;
  running: RollingRunning;
  kinds: KindTraits[];
}

/** The tables in use, as one object for as long as none of them is read anew (what is worked per candidate is kept against it). */
export function rollingTables(): RollingTables {
  const load = loadFactors();
  const running = rollingRunning();
  const kinds = kindTraits();
  if (!tablesInUse || tablesInUse.load !== load || tablesInUse.running !== running || tablesInUse.kinds !== kinds)
    tablesInUse = { load, running, kinds };
  return tablesInUse;
}
let tablesInUse: RollingTables | undefined;

/** What every candidate of one case is evaluated in: the case, its factors, points and lubricant. */
export interface EvalContext {
  c: CaseSI;
  f: RollingFactors;
  tables: RollingTables;
  points: LoadPoint[];
  /** Highest point speed, rev/s. */
  maxSpeed: number;
  /** Service factor f_d, 1. */
  serviceFactor: number;
  /** Static-safety guidance for the case's shock level: the smallest s0 per type, its label and source. */
  s0Guidance: ShockFactors['s0Guidance'];
  cont: RollingFactors['contamination'][number];
  /** Reliability factor a1, 1, and the reliability it is worked for, %. */
  a1: number;
  reliabilityUsed: number;
  lubrication: Lubrication;
}

/** The figures the checks read, SI (lives h, L10 10⁶ rev, ndm mm·r/min). */
export interface CandidateFigures {
  /** Duty-mean dynamic equivalent load with f_d, N. */
  P: number;
  L10: number | null;
  /** Lowest viscosity ratio over the turning points, 1. */
  kappa: number | null;
  L10mh: number | null;
  s0: number | null;
  ndm: number;
  /** Grease life (sealed) or relubrication interval (open), h; null on oil or when not turning. */
  greaseHours: number | null;
  /** No point turns fast enough for a rating life: static safety governs. */
  staticOnly: boolean;
}
