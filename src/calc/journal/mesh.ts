/**
 * Finite-volume mesh for the dimensionless Reynolds equation of a full 360° plain
 * journal bearing (see reynolds.ts for the equation).
 *
 * Coordinates (dimensionless):
 *   θ  circumferential angle, rad, measured from the line of centres at the position
 *      of maximum film thickness, in the direction of journal rotation; 0 ≤ θ ≤ 2π.
 *   ζ  axial coordinate z/(L/2), 0 at mid-length, 1 at the bearing end; only the half
 *      0 ≤ ζ ≤ 1 is meshed, the other half follows by symmetry (aligned journal).
 *
 * Circumferential nodes are clustered towards the minimum film (θ = π), where the
 * pressure peak sharpens as ε → 1, by the smooth map
 *   θ(s) = s + a·sin s,  s uniform on [0, 2π],  0 ≤ a < 1,
 * which keeps θ(0) = 0, θ(π) = π, θ(2π) = 2π; the local spacing is (1 + a·cos s)·Δs,
 * so the spacing at θ = π is (1 − a)/(1 + a) times that at θ = 0. a = 0 gives a
 * uniform mesh. Axial nodes are uniform.
 *
 * Nodes: θ_i, i = 0..nTheta (θ_0 = 0 and θ_nTheta = 2π are the same line, the oil
 * inlet, p = 0); ζ_j, j = 0..nZeta (ζ_0 = 0 mid-length, ζ_nZeta = 1 the end, p = 0).
 *
 * Source: the node-centred finite-volume (conservative) discretisation is standard
 * practice for the Reynolds equation, e.g. Hamrock, Schmid & Jacobson (2004),
 * Fundamentals of Fluid Film Lubrication, 2nd ed., chapter on numerical methods
 * (from memory); the clustering map is our own choice, measured in bench/journal.mjs.
 */
export interface Mesh {
  readonly nTheta: number;
  readonly nZeta: number;
  /** Clustering parameter a of θ(s) = s + a·sin s. */
  readonly stretch: number;
  /** Node angles, rad, length nTheta + 1. */
  readonly theta: Float64Array;
  /** Angles of the control-volume faces θ_{i+1/2} (mapped midpoint of s), length nTheta. */
  readonly thetaFace: Float64Array;
  /** Axial node positions ζ, length nZeta + 1. */
  readonly zeta: Float64Array;
  /** Trapezoidal weights in θ (sum 2π), length nTheta + 1. */
  readonly wTheta: Float64Array;
  /** Trapezoidal weights in ζ over the half length (sum 1), length nZeta + 1. */
  readonly wZeta: Float64Array;
}

/**
 * Build a mesh.
 * @param nTheta circumferential intervals (≥ 8)
 * @param nZeta axial intervals over the half length (≥ 2)
 * @param stretch clustering a, 0 ≤ a < 1
 */
export function makeMesh(nTheta: number, nZeta: number, stretch = 0): Mesh {
  if (!Number.isInteger(nTheta) || nTheta < 8) throw new Error(`mesh: nTheta must be an integer ≥ 8, got ${nTheta}`);
  if (!Number.isInteger(nZeta) || nZeta < 2) throw new Error(`mesh: nZeta must be an integer ≥ 2, got ${nZeta}`);
  if (!(stretch >= 0 && stretch < 1)) throw new Error(`mesh: stretch must be in [0, 1), got ${stretch}`);
  const map = (s: number): number => s + stretch * Math.sin(s);
  const ds = (2 * Math.PI) / nTheta;
  const theta = new Float64Array(nTheta + 1);
  const thetaFace = new Float64Array(nTheta);
  for (let i = 0; i <= nTheta; i++) theta[i] = map(i * ds);
  theta[nTheta] = 2 * Math.PI;
  for (let i = 0; i < nTheta; i++) thetaFace[i] = map((i + 0.5) * ds);
  const wTheta = new Float64Array(nTheta + 1);
  for (let i = 0; i < nTheta; i++) {
    const d = theta[i + 1]! - theta[i]!;
    wTheta[i] = wTheta[i]! + d / 2;
    wTheta[i + 1] = wTheta[i + 1]! + d / 2;
  }
  const zeta = new Float64Array(nZeta + 1);
  const wZeta = new Float64Array(nZeta + 1);
  const dz = 1 / nZeta;
  for (let j = 0; j <= nZeta; j++) {
    zeta[j] = j * dz;
    wZeta[j] = j === 0 || j === nZeta ? dz / 2 : dz;
  }
  return { nTheta, nZeta, stretch, theta, thetaFace, zeta, wTheta, wZeta };
}
