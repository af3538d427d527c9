import type { DesignEvaluation } from './design.js';
import type { JournalPointSummary } from './types.js';

/**
 * From the chosen design's evaluation to the numbers the result reports: one summary per
 * operating point, the duty's mean power loss, and the guard that no number is NaN or
 * infinite (a result is reported whole and finite, or not at all).
 */

/** The operating points of an evaluation as the result reports them (SI, angles in degrees). */
export function pointSummaries(e: DesignEvaluation): JournalPointSummary[] {
  return e.points.map((p) => ({
    share: p.share,
    load: p.load,
    speed: p.speed,
    film: p.film,
    sommerfeld: p.result.sommerfeld,
    eccentricityRatio: p.result.eccentricityRatio,
    minFilmThickness: p.result.minFilmThickness,
    allowableFilmThickness: p.allowableFilm,
    filmMargin: p.filmMargin,
    attitudeAngle: p.result.attitudeDeg,
    frictionCoefficient: p.result.frictionCoefficient,
    powerLoss: p.result.powerLoss,
    flow: p.result.flow,
    sideFlow: p.result.sideFlow,
    peakPressure: p.result.peakPressure,
    viscosity: p.result.viscosity,
    effectiveTemperature: p.result.effectiveTemperature,
    maxTemperature: p.result.maxTemperature,
    extrapolated: p.result.extrapolated,
  }));
}

/**
 * Share-weighted mean power loss over the points, W: H̄ = Σ wᵢ·Hᵢ / Σ wᵢ with wᵢ the time
 * share (a negative or non-finite share counts as 0), Hᵢ the point's power loss (0 without
 * a film); 0 when no point has a share. A time mean over the duty (definition).
 */
export function meanPowerLoss(points: readonly { share: number; powerLoss: number }[]): number {
  let sumShare = 0;
  let sumPower = 0;
  for (const p of points) {
    const w = Number.isFinite(p.share) ? Math.max(0, p.share) : 0;
    sumShare += w;
    sumPower += w * p.powerLoss;
  }
  return sumShare > 0 ? sumPower / sumShare : 0;
}

/**
 * Throw if any number in the result is NaN or infinite (fail loudly, never report them); the
 * message names the first such number's path ("result.points[2].flow"). The walk allocates
 * nothing: the path is worked out only when a number fails (a map checks thousands of results).
 */
export function assertFinite(v: unknown): void {
  if (!allFinite(v)) throw new Error(`journal: internal error, ${badPath(v, 'result')}`);
}

/** Whether every number in v (own enumerable keys and array items, at any depth) is finite. */
function allFinite(v: unknown): boolean {
  if (typeof v === 'number') return Number.isFinite(v);
  if (Array.isArray(v)) {
    for (let i = 0; i < v.length; i++) if (!allFinite(v[i])) return false;
  } else if (v && typeof v === 'object') {
    for (const k in v) if (Object.hasOwn(v, k) && !allFinite((v as Record<string, unknown>)[k])) return false;
  }
  return true;
}

/** "path is value" for the first number in v that is not finite (v holds one). */
function badPath(v: unknown, path: string): string | undefined {
  if (typeof v === 'number') return Number.isFinite(v) ? undefined : `${path} is ${v}`;
  if (Array.isArray(v)) {
    for (let i = 0; i < v.length; i++) {
      const found = badPath(v[i], `${path}[${i}]`);
      if (found) return found;
    }
  } else if (v && typeof v === 'object') {
    for (const [k, x] of Object.entries(v)) {
      const found = badPath(x, `${path}.${k}`);
      if (found) return found;
    }
  }
  return undefined;
}
