import { loadFactors } from '../../data/rolling-load-factors.js';

/**
 * The axial load a cylindrical roller bearing carries on its ribs (one module: the constants in
 * data/rolling-load-factors.json → ribAxialLoad, with their sources).
 */

export interface RibAxialLoadInput {
  /** Bore, outside diameter and width of the bearing, m (undefined: the heat limit is not checked). */
  d?: number;
  D?: number;
  B?: number;
  /** Speed, rev/s (undefined or 0: no heat limit). */
  n?: number;
  /** Radial load, N. */
  Fr: number;
  /** How well the bearing's heat is carried away (default 'normal'). */
  cooling?: 'poor' | 'normal' | 'good';
}

/**
 * Permissible axial load of a cylindrical roller bearing carrying axial load on its ribs
 * (Brändlein, Eschmann, Hasbargen, Weigand, Ball and Roller Bearings: Theory, Design and
 * Application, 3rd ed., Wiley 1999, axial load carrying capacity of cylindrical roller
 * bearings; the form and kS from memory):
 *   heat limit  Fa,heat = kS·kB·dM^1.5·n^-0.6   (N, with dM = (d + D)/2 in mm, n in r/min)
 *   guidance    Fa,radial = s·Fr                 (s = 0.4, common practice)
 *   Fa,perm = min(Fa,heat, Fa,radial)
 * kS by the heat dissipation (poor 7.5, normal 15, good 22), kB by the width ratio
 * B/((D − d)/2) standing for the book's factor by bearing series (our own assumption, in
 * data/rolling-load-factors.json). d, D, B in m, n in rev/s, Fr in N. Valid for continuous axial
 * load with oil or grease of adequate viscosity; short shocks may exceed it. Without d, D, B or
 * with n = 0 only the radial guidance limit applies.
 */
export function permissibleRibAxialLoad(x: RibAxialLoadInput): {
  FaPerm: number;
  heatLimit: number;
  radialLimit: number;
  governing: 'heat' | 'radial load';
} {
  const t = loadFactors().ribAxialLoad;
  const radialLimit = t.radialShare * Math.max(0, x.Fr);
  let heatLimit = Infinity;
  const { d, D, B, n } = x;
  if (d !== undefined && D !== undefined && B !== undefined && D > d && n !== undefined && n > 0) {
    const ratio = B / ((D - d) / 2);
    const kB = (t.kB.find((r) => ratio <= r.widthRatioUpTo) ?? t.kB[t.kB.length - 1]!).kB;
    const kS = t.kS[x.cooling ?? 'normal'];
    const dM_mm = ((d + D) / 2) * 1000;
    heatLimit = kS * kB * Math.pow(dM_mm, 1.5) * Math.pow(n * 60, -0.6);
  }
  return heatLimit < radialLimit
    ? { FaPerm: heatLimit, heatLimit, radialLimit, governing: 'heat' }
    : { FaPerm: radialLimit, heatLimit, radialLimit, governing: 'radial load' };
}
