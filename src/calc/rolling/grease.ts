import { finding, type Finding } from '../../core/finding.js';
import { rollingRunning, type RollingRunning } from '../../data/rolling-running.js';
import type { KindForm, RollingKind } from './kinds.js';
import { speedFactor, speedLimitFrom } from './speed.js';

/**
 * Grease life of a rolling bearing: how long one fill of grease keeps lubricating, for a
 * sealed bearing greased for life, and the regreasing interval of an open bearing taken from it.
 *
 * References (constants and their sources in data/rolling-running.json → greaseLife)
 * [1] Booser, E. R. (1974), Grease life forecast for ball bearings, Lubrication Engineering
 *     30(11) 536–541: life for 50 % bearing failures (geometric mean), hours, from the bearing
 *     temperature, with half-life subtraction factors for speed and load (nomenclature seen;
 *     the constants below from memory, as restated in Khonsari & Booser, Applied Tribology,
 *     2nd ed., Wiley 2008):
 *       log10 L50 = a + b/T − 0.301·S,   S = S_G + S_N + S_W + S_K
 *     a = −2.60, b = 2450 K, T bearing temperature, K; 0.301 = log10 2, so each unit of S
 *     halves the life.
 * [2] Booser & Khonsari (2010), Grease life in ball bearings: the effect of temperatures,
 *     Tribology & Lubrication Technology, October 2010: four temperature zones, oxidation and
 *     oil loss limiting life when hot, stiff grease when cold (seen). The law is evaluated at
 *     the bearing temperature and held at its 20 °C value below 20 °C, where stiffness rather
 *     than oxidation limits life (the bound our choice, from memory).
 * [3] Common practice, our own choices: the kind's half-lives S_K, the load's S_W, the Weibull
 *     slope 1.5 giving the 10 % life, and the regreasing interval as half the 10 % life.
 */

export interface GreaseLifeInput {
  kind: RollingKind;
  /** The kind's construction (a drawn cup has its own speed limit); null or absent for none. */
  form?: KindForm | null;
  /** Speed, rev/s. */
  n: number;
  /** Bore and outside diameter, m. */
  d: number;
  D: number;
  /** Operating temperature of the bearing, °C. */
  temperature: number;
  /** Equivalent dynamic load P and basic dynamic rating C, N; absent: light load (P/C ≤ 0.1). */
  load?: { P: number; C: number };
}

/** The half-life subtraction factors that went into the life (each unit halves it). */
export interface GreaseHalvings {
  grease: number;
  speed: number;
  load: number;
  kind: number;
}

export interface GreaseLife {
  /** Grease life for 50 % of bearings (geometric mean), h; null when the bearing does not turn. */
  hours: number | null;
  /** Grease life for 10 % of bearings, h: the figure to hold against a required life. */
  l10Hours: number | null;
  halvings: GreaseHalvings;
  /** Temperature the law was evaluated at, °C. */
  temperatureUsed: number;
  /** Speed factor n·dm and the kind's grease limit, mm·r/min. */
  ndm: number;
  ndmLimit: number;
  findings: Finding[];
}

const KELVIN = 273.15;

/**
 * Grease life [1]–[3] of a bearing of the given kind, size, speed, temperature and load:
 *   L50 = 10^(a + b/T − 0.301·(S_G + S_N + S_W + S_K)) h
 *   S_N = 0.864·(n·dm)/(n·dm)_lim      speed, against the kind's grease speed limit
 *   S_W = max(0, P/C − 0.1)/0.1        load (common practice, ours)
 *   L10 = L50·(ln 0.9/ln 0.5)^(1/β), β = 1.5
 * T = max(t, 20 °C) + 273.15 K; dm = (d + D)/2, m; n rev/s (n·dm in mm·r/min inside).
 * Booser states S_N on the shaft diameter, D·N/(D·N)_L; the ratio to a limit stated on the
 * pitch diameter is the same idea (our adaptation). Fitted to deep-groove ball bearings in
 * electric motors with long-life greases: other kinds by S_K, other greases not covered.
 * Findings: rolling.grease-life-cool-held, rolling.grease-hot, rolling.grease-speed-beyond-limit,
 * rolling.grease-heavy-load.
 */
export function greaseLife(x: GreaseLifeInput): GreaseLife {
  return greaseLifeFrom(rollingRunning(), x);
}

/** greaseLife with the running table given (a sweep reads it once per case). */
export function greaseLifeFrom(t: RollingRunning, x: GreaseLifeInput): GreaseLife {
  const g = t.greaseLife;
  const findings: Finding[] = [];
  const dm = (x.d + x.D) / 2;
  const ndm = speedFactor(x.n, dm);
  const ndmLimit = speedLimitFrom(t, x.kind, 'grease', x.form ?? null).ndm;
  const temperatureUsed = Math.max(x.temperature, g.coolTemperature);
  if (x.temperature < g.coolTemperature)
    findings.push(finding('rolling.grease-life-cool-held', { temperature: x.temperature, used: temperatureUsed }));
  if (x.temperature > g.hotTemperature)
    findings.push(finding('rolling.grease-hot', { temperature: x.temperature, limit: g.hotTemperature }));
  if (ndm > ndmLimit) findings.push(finding('rolling.grease-speed-beyond-limit', { ndm, limit: ndmLimit }));

  const ratio = x.load && x.load.C > 0 ? Math.max(0, x.load.P) / x.load.C : 0;
  const loadHalvings = Math.max(0, ratio - g.loadThreshold) / g.loadStep;
  if (loadHalvings > 0) findings.push(finding('rolling.grease-heavy-load', { ratio, threshold: g.loadThreshold }));
  const kindRow = t.greaseKinds.find((k) => k.kind === x.kind);
  if (!kindRow) throw new Error(`no grease-life row for ${x.kind}`);
  const halvings: GreaseHalvings = {
    grease: g.greaseHalvings,
    speed: (g.speedCoefficient * ndm) / ndmLimit,
    load: loadHalvings,
    kind: kindRow.halvings,
  };
  if (!(x.n > 0) || !(dm > 0))
    return { hours: null, l10Hours: null, halvings, temperatureUsed, ndm, ndmLimit, findings };
  const S = halvings.grease + halvings.speed + halvings.load + halvings.kind;
  const log10L = g.intercept + g.temperatureCoefficient / (temperatureUsed + KELVIN) - g.halvingStep * S;
  const hours = Math.pow(10, log10L);
  return {
    hours,
    l10Hours: hours * tenPercentShare(g.weibullSlope),
    halvings,
    temperatureUsed,
    ndm,
    ndmLimit,
    findings,
  };
}

/** L10/L50 of a two-parameter Weibull life with slope β: (ln 0.9 / ln 0.5)^(1/β). */
export function tenPercentShare(beta: number): number {
  return Math.pow(Math.log(0.9) / Math.log(0.5), 1 / beta);
}

export interface RegreasingInterval {
  /** Hours between regreasings of an open bearing; null when it does not turn. */
  hours: number | null;
  /** The grease life it is taken from. */
  life: GreaseLife;
  /** The interval's share of the 10 % grease life. */
  fraction: number;
}

/**
 * Regreasing interval of an open (relubricable) bearing, h [3]:
 *   t_r = f·L10,  f = 0.5
 * with L10 the bearing's 10 % grease life (greaseLife). Half: a fill replaces only part of
 * the aged grease in the bearing and its housing, and the interval must end before the first
 * bearings of the lot would run dry (common practice, our own choice). A sealed bearing greased
 * for life has no interval: hold greaseLife(x).l10Hours against its required life.
 */
export function regreasingInterval(x: GreaseLifeInput): RegreasingInterval {
  return regreasingIntervalFrom(rollingRunning(), x);
}

/** regreasingInterval with the running table given (a sweep reads it once per case). */
export function regreasingIntervalFrom(t: RollingRunning, x: GreaseLifeInput): RegreasingInterval {
  const life = greaseLifeFrom(t, x);
  const fraction = t.greaseLife.regreaseFraction;
  return { hours: life.l10Hours === null ? null : fraction * life.l10Hours, life, fraction };
}
