import type { XYTable } from '../../data/rolling.js';
import { interpolate } from './interpolate.js';
import type { RollingType } from './life.js';

/**
 * Equivalent loads of radial rolling bearings: dynamic (ISO 281:2007), static (ISO 76),
 * and the equivalent mean load and speed of a duty spectrum (ISO 281:2007).
 *
 * References
 * [1] ISO 281:2007, dynamic equivalent radial load P = X·Fr + Y·Fa (seen) and the X, Y
 *     table for radial ball bearings, Table 3 (cl. 6.2; the table's values and the table
 *     and clause numbers from memory).
 * [2] ISO 76, static equivalent radial load of radial ball bearings
 *     P0 = 0.6·Fr + 0.5·Fa, P0 ≥ Fr (from memory); radial cylindrical roller bearings
 *     P0 = Fr.
 * [3] ISO 281:2007, variable load and speed: P = (Σ Pi^p·ni·ti / Σ ni·ti)^(1/p)
 *     (from memory).
 */

export interface DynamicLoadResult {
  /** Dynamic equivalent load P, N (finite; for an excluded case the value is indicative only). */
  P: number;
  X: number;
  Y: number;
  /** Limit e of Fa/Fr from the table (deep-groove ball), or null (roller). */
  e: number | null;
  /** Relative axial load Fa/C0, or null (roller). */
  faC0: number | null;
  /** 'inside' the X/Y table, 'below' its first row (first row used), 'above' its last row (excluded). */
  range: 'below' | 'inside' | 'above';
  /** Set when the bearing cannot carry the load by this method; the reason in words. */
  exclusion: string | null;
}

/**
 * Dynamic equivalent load of a single-row deep-groove ball bearing [1]:
 *   P = X·Fr + Y·Fa, with X = 1, Y = 0 when Fa/Fr ≤ e; otherwise X = 0.56 and
 *   e, Y interpolated linearly in Fa/C0 from the table.
 * Fr radial load, N (≥ 0); Fa axial load, N (≥ 0); C0 basic static rating, N (> 0).
 * Validity: 0.014 ≤ Fa/C0 ≤ 0.56 (the table). Below the first row, e and Y of the first
 * row are used (range 'below', caller warns: Y would be larger there). Above the last
 * row the bearing is excluded: nothing is extrapolated.
 */
export function deepGrooveBallLoad(Fr: number, Fa: number, C0: number, table: XYTable): DynamicLoadResult {
  if (!(Fa > 0))
    return { P: Fr, X: table.xBelowE, Y: table.yBelowE, e: null, faC0: 0, range: 'inside', exclusion: null };
  const faC0 = Fa / C0;
  const eI = interpolate(
    table.rows.map((r) => ({ x: r.faC0, y: r.e })),
    faC0,
  );
  const yI = interpolate(
    table.rows.map((r) => ({ x: r.faC0, y: r.Y })),
    faC0,
  );
  const e = eI.value;
  const range = eI.range;
  const exclusion =
    range === 'above'
      ? `relative axial load Fa/C0 = ${faC0.toFixed(3)} is beyond the ISO 281 X/Y table (last row ${table.rows[table.rows.length - 1]!.faC0}); a deep-groove ball bearing is not rated this way for such thrust: consider an angular-contact or thrust arrangement`
      : null;
  if (Fr > 0 && Fa / Fr <= e) return { P: Fr, X: table.xBelowE, Y: table.yBelowE, e, faC0, range, exclusion };
  const X = table.xAboveE;
  const Y = yI.value;
  return { P: X * Fr + Y * Fa, X, Y, e, faC0, range, exclusion };
}

/**
 * Dynamic equivalent load of a radial cylindrical roller bearing with ribs on one
 * ring only: P = Fr (X = 1, Y = 0) [1]; it takes no axial load, so Fa > 0 excludes it.
 * Fr, Fa in N.
 */
export function cylindricalRollerLoad(Fr: number, Fa: number): DynamicLoadResult {
  const exclusion =
    Fa > 0
      ? `axial load ${Fa.toFixed(0)} N: a radial cylindrical roller bearing (ribs on one ring) takes no axial load`
      : null;
  return { P: Fr, X: 1, Y: 0, e: null, faC0: null, range: 'inside', exclusion };
}

/** Dynamic equivalent load by bearing type (see the two kernels above). */
export function dynamicEquivalentLoad(
  type: RollingType,
  Fr: number,
  Fa: number,
  C0: number,
  table: XYTable,
): DynamicLoadResult {
  return type === 'ball' ? deepGrooveBallLoad(Fr, Fa, C0, table) : cylindricalRollerLoad(Fr, Fa);
}

/**
 * Static equivalent load P0, N [2]:
 *   radial ball: P0 = max(0.6·Fr + 0.5·Fa, Fr); radial cylindrical roller: P0 = Fr.
 * Fr, Fa in N.
 */
export function staticEquivalentLoad(type: RollingType, Fr: number, Fa: number): number {
  return type === 'ball' ? Math.max(0.6 * Fr + 0.5 * Fa, Fr) : Fr;
}

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
 * speed by time. When no point turns (Σ ni·ti = 0) the loads are weighted by time
 * instead and `byRevolutions` is false (lives are then not defined anyway).
 */
export function spectrumMean(
  points: ReadonlyArray<SpectrumPoint>,
  p: number,
): { P: number; n: number; byRevolutions: boolean } {
  let sumT = 0;
  let sumNT = 0;
  let sumPNT = 0;
  let sumPT = 0;
  for (const q of points) {
    const t = Math.max(0, q.t);
    const n = Math.max(0, q.n);
    sumT += t;
    sumNT += n * t;
    sumPNT += Math.pow(q.P, p) * n * t;
    sumPT += Math.pow(q.P, p) * t;
  }
  if (!(sumT > 0)) return { P: 0, n: 0, byRevolutions: false };
  const n = sumNT / sumT;
  if (sumNT > 0) return { P: Math.pow(sumPNT / sumNT, 1 / p), n, byRevolutions: true };
  return { P: Math.pow(sumPT / sumT, 1 / p), n, byRevolutions: false };
}
