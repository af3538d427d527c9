import { makeMesh } from './mesh.js';
import { solveReynolds } from './reynolds.js';
import { DEFAULT_MESH, lastEccentricity, tableFor } from './table.js';
import type { PointResult } from './design.js';
import type { PressurePoint } from './types.js';

/**
 * Film pressure around the journal at mid-length, at one operating point: one direct
 * solution of the dimensionless Reynolds equation (reynolds.ts) at the point's ε and L/D on
 * the default mesh, scaled back to pascals by
 *   p = p̄ · μ·ω·(r/c)²,  ω = 2π·N,
 * with μ the viscosity at the effective temperature (Pa·s), N the speed (rev/s), r the
 * journal radius and c the radial clearance (m). Angles are from the line of maximum film
 * in the direction of rotation, degrees.
 *
 * Validity: a point with a film and 0 < ε ≤ ε_max of the solved table (beyond it the load
 * matching is extrapolated and a solution at that ε would pretend to a precision the
 * figures lack): otherwise the profile is empty.
 * Source: Raimondi & Boyd (1958) for the dimensionless pressure and its boundary conditions.
 */
export function pressureProfile(
  point: PointResult,
  lengthToDiameter: number,
  radius: number,
  radialClearance: number,
): PressurePoint[] {
  const res = point.result;
  const eps = res.eccentricityRatio;
  if (!point.film || !(eps > 0) || eps > lastEccentricity(tableFor(lengthToDiameter))) return [];
  const mesh = makeMesh(DEFAULT_MESH.nTheta, DEFAULT_MESH.nZeta, DEFAULT_MESH.stretch);
  const solution = solveReynolds(eps, lengthToDiameter, mesh);
  const scale = res.viscosity * 2 * Math.PI * res.speed * (radius / radialClearance) ** 2;
  // Mid-length is axial node j = 0: node (i, 0) sits at index i·(nZeta + 1).
  const stride = mesh.nZeta + 1;
  const profile: PressurePoint[] = [];
  for (let i = 0; i <= mesh.nTheta; i++)
    profile.push({ angleDeg: (mesh.theta[i]! * 180) / Math.PI, pressure: solution.p[i * stride]! * scale });
  return profile;
}
