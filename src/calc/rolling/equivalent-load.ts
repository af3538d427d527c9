/**
 * The equivalent mean load and speed of a duty spectrum (ISO 281:2007). The X, Y, e and X0, Y0
 * of each kind are in load-factors.ts.
 *
 * References
 * [1] ISO 281:2007, variable load and speed: P = (Σ Pi^p·ni·ti / Σ ni·ti)^(1/p)
 *     (from memory).
 */

export interface SpectrumPoint {
  /** Dynamic equivalent load of the point, N. */
  P: number;
  /** Speed, rev/s (≥ 0). */
  n: number;
  /** Share of time (weights; need not add to 1). */
  t: number;
}

/**
 * Equivalent mean load and mean speed of a duty spectrum [3]:
 *   P_m = (Σ Pi^p·ni·ti / Σ ni·ti)^(1/p),   n_m = Σ ni·ti / Σ ti
 * Pi N, ni rev/s, ti time shares, p life exponent. Loads are weighted by revolutions,
 * speed by time [1]. When no point turns (Σ ni·ti = 0) the loads are weighted by time
 * instead and `byRevolutions` is false (lives are then not defined anyway). `include`, when
 * given, names the points that count (the others are left out as if absent).
 */
export function spectrumMean<T extends SpectrumPoint>(
  points: ReadonlyArray<T>,
  p: number,
  include?: (q: T) => boolean,
): { P: number; n: number; byRevolutions: boolean } {
  let sumT = 0;
  let sumNT = 0;
  let sumPNT = 0;
  let sumPT = 0;
  for (const q of points) {
    if (include !== undefined && !include(q)) continue;
    const t = Math.max(0, q.t);
    const n = Math.max(0, q.n);
    sumT += t;
    sumNT += n * t;
    const Pp = Math.pow(q.P, p);
    sumPNT += Pp * n * t;
    sumPT += Pp * t;
  }
  if (!(sumT > 0)) return { P: 0, n: 0, byRevolutions: false };
  const n = sumNT / sumT;
  if (sumNT > 0) return { P: Math.pow(sumPNT / sumNT, 1 / p), n, byRevolutions: true };
  return { P: Math.pow(sumPT / sumT, 1 / p), n, byRevolutions: false };
}
