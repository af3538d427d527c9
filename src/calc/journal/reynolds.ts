import type { Mesh } from './mesh.js';

/**
 * Steady Reynolds equation for a full 360° plain journal bearing of finite length,
 * dimensionless, solved by finite volumes and projected successive over-relaxation
 * (PSOR), with the Swift–Stieber (Reynolds) film-rupture condition p ≥ 0 imposed by
 * projection.
 *
 * Equation (incompressible, isoviscous, rigid, aligned journal):
 *   ∂/∂θ(h̄³ ∂p̄/∂θ) + (D/L)² ∂/∂ζ(h̄³ ∂p̄/∂ζ) = 6 ∂h̄/∂θ,
 *   h̄ = h/c = 1 + ε·cos θ,  p̄ = p / (μ·ω·(r/c)²),  ζ = z/(L/2).
 * Symbols: h film thickness (m), c radial clearance (m), ε eccentricity ratio (1),
 * θ angle from the maximum film in the direction of rotation (rad), z axial
 * coordinate from mid-length (m), L bearing length (m), D = 2r journal diameter (m),
 * μ dynamic viscosity (Pa·s), ω journal angular speed (rad/s), p film pressure (Pa).
 * Boundary conditions as assumed by Raimondi & Boyd (1958): oil admitted at ambient
 * pressure along the line of maximum film thickness (p = 0 at θ = 0 ≡ 2π) and at the
 * bearing ends (p = 0 at ζ = ±1); symmetry ∂p/∂ζ = 0 at mid-length; p ≥ 0 elsewhere
 * (sub-ambient pressures are set to zero; the film ruptures where the gradient
 * vanishes, which projection reproduces in the limit of a fine mesh).
 *
 * Validity: laminar, isoviscous film, ε < 1; the constant-viscosity solution is what
 * the published tables give, temperature enters through an effective viscosity
 * (operating-point.ts).
 *
 * References:
 *  [1] Reynolds equation, dimensionless form and the Swift–Stieber condition:
 *      Hamrock, B. J., Schmid, S. R. and Jacobson, B. O. (2004), Fundamentals of Fluid
 *      Film Lubrication, 2nd ed., Marcel Dekker (chapters on the Reynolds equation and
 *      finite journal bearings; from memory).
 *  [2] Boundary conditions, Sommerfeld number, friction, flow and side-flow variables:
 *      Raimondi, A. A. and Boyd, J. (1958), ASLE Transactions 1(1), 159–209.
 *  [3] Projected SOR for the cavitation complementarity problem: Christopherson's
 *      method (1941), as described in [1] (from memory).
 */

/** Default convergence tolerance of the PSOR sweeps: stop when max |Δp̄| over a sweep ≤ this · max p̄. */
export const PSOR_TOLERANCE = 1e-8;

export interface SolveOptions {
  /** Over-relaxation factor, 1 ≤ ω < 2. Default chosen per mesh (see defaultOmega). */
  omega?: number;
  /** Stop when max |Δp̄| over a sweep ≤ tol · max p̄. Default PSOR_TOLERANCE. */
  tol?: number;
  /** Sweep limit; exceeding it throws. Default 20000. */
  maxIter?: number;
  /** Starting pressure field (same layout as FilmSolution.p), e.g. the solution at a nearby ε. */
  initial?: Float64Array;
  /**
   * Apply the Swift–Stieber condition p ≥ 0 (default true). false keeps sub-ambient
   * pressures: the full-Sommerfeld film, used only to check the closed-form
   * long-bearing limit.
   */
  cavitation?: boolean;
}

export interface FilmSolution {
  readonly eccentricity: number;
  readonly lengthToDiameter: number;
  readonly mesh: Mesh;
  /** Dimensionless pressure p̄ at node (i, j) stored at index i·(nZeta+1) + j. */
  readonly p: Float64Array;
  readonly iterations: number;
}

/**
 * Dimensionless performance of a full journal bearing, Raimondi–Boyd conventions [2].
 * All figures are for the whole bearing (both halves).
 */
export interface DimensionlessPerformance {
  eccentricity: number;
  lengthToDiameter: number;
  /** Sommerfeld number S = (r/c)²·μN/P, N rev/s, P = W/(L·D). */
  sommerfeld: number;
  /** Attitude angle φ between load line and line of centres, degrees. */
  attitudeDeg: number;
  /** Friction variable (r/c)·f: Couette shear over the whole circumference plus the Poiseuille term. */
  frictionVariable: number;
  /** Friction variable with the Couette shear counted only where the film is full (p > 0). */
  frictionVariableFilm: number;
  /** Flow variable Q/(r·c·N·L): the flow entering at the maximum film thickness. */
  flowVariable: number;
  /** Side-flow ratio Qs/Q (both ends). */
  sideFlowRatio: number;
  /** Ratio of mean unit load to peak film pressure, P/pmax. */
  pressureRatio: number;
  /** Angle of peak pressure from the maximum-film line, in the direction of rotation, degrees. */
  peakAngleDeg: number;
  /** Angle at which the mid-plane film ends (ruptures), from the maximum-film line, degrees. */
  filmEndDeg: number;
  /** Dimensionless load components on the whole bearing: along the line of centres and perpendicular. */
  loadRadial: number;
  loadTangential: number;
}

/** Dimensionless film thickness h̄ = 1 + ε cos θ. */
export function filmThickness(eps: number, theta: number): number {
  return 1 + eps * Math.cos(theta);
}

/**
 * Over-relaxation factor used when none is given: the classical optimum form for a
 * Laplace-like operator, ω = 2/(1 + sin(π/n)), with n = nTheta/2.5 fitted to the measured
 * optimum (bench/journal.mjs, ω scanned in steps of 0.05 on 96×12 and 144×16, L/D 0.25–1,
 * ε 0.1–0.97: best 1.8–1.85 on 96×12, 1.85–1.9 on 144×16), capped at 1.95. On the default
 * 96×12 mesh this gives ω = 1.849 and 97–142 sweeps at tolerance 1e-8. Iteration counts
 * double below ω = 1.7 and above 1.95. The projection and the varying h̄³ move the
 * optimum slightly, hence the fit rather than theory. lengthToDiameter is kept for a
 * later per-L/D refinement.
 */
export function defaultOmega(mesh: Mesh, _lengthToDiameter: number): number {
  const n = Math.max(4, mesh.nTheta / 2.5);
  return Math.min(1.95, 2 / (1 + Math.sin(Math.PI / n)));
}

/**
 * Solve the dimensionless Reynolds equation for eccentricity ratio ε and L/D.
 * Throws if the iteration does not converge within maxIter sweeps.
 */
export function solveReynolds(
  eps: number,
  lengthToDiameter: number,
  mesh: Mesh,
  opts: SolveOptions = {},
): FilmSolution {
  if (!(eps > 0 && eps < 1)) throw new Error(`reynolds: eccentricity ratio must be in (0, 1), got ${eps}`);
  if (!(lengthToDiameter > 0 && Number.isFinite(lengthToDiameter)))
    throw new Error(`reynolds: L/D must be positive and finite, got ${lengthToDiameter}`);
  const { nTheta: n, nZeta: m } = mesh;
  const omega = opts.omega ?? defaultOmega(mesh, lengthToDiameter);
  const tol = opts.tol ?? PSOR_TOLERANCE;
  const maxIter = opts.maxIter ?? 20000;
  const floor = opts.cavitation === false ? -Infinity : 0;
  const coeff = stencil(eps, lengthToDiameter, mesh);
  const p = startField(mesh, opts.initial);
  for (let iter = 0; iter < maxIter; iter++) {
    if (sweep(p, coeff, mesh, omega, floor, tol))
      return { eccentricity: eps, lengthToDiameter, mesh, p, iterations: iter + 1 };
  }
  throw new Error(
    `reynolds: PSOR did not converge in ${maxIter} sweeps (ε = ${eps}, L/D = ${lengthToDiameter}, mesh ${n}×${m})`,
  );
}

/** The five-point stencil of row i: east, west and axial weights, 1/(diagonal), and the wedge source 6(h̄f − h̄b). */
interface Stencil {
  aE: Float64Array;
  aW: Float64Array;
  aZ: Float64Array;
  inv: Float64Array;
  b: Float64Array;
}

/**
 * Finite-volume coefficients of the dimensionless Reynolds equation [1]: flux weights
 * h̄³/Δθ at the θ faces and (D/L)²·Δθ·h̄³/Δζ² axially, for eccentricity ratio `eps` and
 * `lengthToDiameter` L/D. They depend on i only (an aligned bearing: h̄ independent of ζ).
 */
function stencil(eps: number, lengthToDiameter: number, mesh: Mesh): Stencil {
  const { nTheta: n, nZeta: m, theta, thetaFace } = mesh;
  const lambda = 1 / (lengthToDiameter * lengthToDiameter); // (D/L)²
  const dz = 1 / m;
  const aE = new Float64Array(n);
  const aW = new Float64Array(n);
  const aZ = new Float64Array(n);
  const inv = new Float64Array(n);
  const b = new Float64Array(n);
  for (let i = 1; i < n; i++) {
    const hf = 1 + eps * Math.cos(thetaFace[i]!);
    const hb = 1 + eps * Math.cos(thetaFace[i - 1]!);
    const hi = 1 + eps * Math.cos(theta[i]!);
    const e = (hf * hf * hf) / (theta[i + 1]! - theta[i]!);
    const w = (hb * hb * hb) / (theta[i]! - theta[i - 1]!);
    const z = (lambda * (thetaFace[i]! - thetaFace[i - 1]!) * hi * hi * hi) / (dz * dz);
    aE[i] = e;
    aW[i] = w;
    aZ[i] = z;
    inv[i] = 1 / (e + w + 2 * z);
    b[i] = 6 * (hf - hb);
  }
  return { aE, aW, aZ, inv, b };
}

/** The starting pressure field p̄ (row-major, (nθ+1)×(nζ+1)): `initial` when it fits the mesh, else zero; boundary rows zero. */
function startField(mesh: Mesh, initial: Float64Array | undefined): Float64Array {
  const { nTheta: n, nZeta: m } = mesh;
  const stride = m + 1;
  const p = new Float64Array((n + 1) * stride);
  if (initial && initial.length === p.length) p.set(initial);
  // Boundary rows stay zero: i = 0, i = n (inlet line), j = m (ends).
  for (let j = 0; j <= m; j++) {
    p[j] = 0;
    p[n * stride + j] = 0;
  }
  for (let i = 0; i <= n; i++) p[i * stride + m] = 0;
  return p;
}

/**
 * One projected SOR sweep over the interior of `p`, in place: Gauss–Seidel value, relaxed by
 * `omega`, held at or above `floor` (0: Swift–Stieber cavitation; −∞: none), a symmetry ghost
 * at mid-length. True when the largest change is within `tol` of the largest pressure.
 */
function sweep(p: Float64Array, coeff: Stencil, mesh: Mesh, omega: number, floor: number, tol: number): boolean {
  const { nTheta: n, nZeta: m } = mesh;
  const { aE, aW, aZ, inv, b } = coeff;
  const stride = m + 1;
  let maxDelta = 0;
  let maxP = 0;
  for (let i = 1; i < n; i++) {
    const e = aE[i]!;
    const w = aW[i]!;
    const z = aZ[i]!;
    const d = inv[i]!;
    const bi = b[i]!;
    const row = i * stride;
    const rowE = row + stride;
    const rowW = row - stride;
    for (let j = 0; j < m; j++) {
      const k = row + j;
      const south = j === 0 ? p[k + 1]! : p[k - 1]!; // symmetry ghost at mid-length
      const gs = (e * p[rowE + j]! + w * p[rowW + j]! + z * (p[k + 1]! + south) - bi) * d;
      const old = p[k]!;
      let v = old + omega * (gs - old);
      if (v < floor) v = floor;
      p[k] = v;
      const dv = v > old ? v - old : old - v;
      if (dv > maxDelta) maxDelta = dv;
      if (v > maxP) maxP = v;
      else if (-v > maxP) maxP = -v;
    }
  }
  return maxP > 0 && maxDelta <= tol * maxP;
}

/**
 * Performance figures from a pressure field, Raimondi–Boyd conventions [2].
 *
 * Derivations (dimensionless, whole bearing, ζ from −1 to 1, integrals doubled from the
 * half mesh):
 *   W̄r = −∫∫ p̄ cos θ dθ dζ,  W̄t = ∫∫ p̄ sin θ dθ dζ,  W̄ = √(W̄r² + W̄t²)
 *   W = μω(r/c)²·r·(L/2)·W̄  ⇒  S = (r/c)²μN/P = 2/(π·W̄),  φ = atan2(W̄t, W̄r)
 *   journal shear τ = (μωr/c)·[1/h̄ + (h̄/2)∂p̄/∂θ]  ⇒  (r/c)f = ∫∫[1/h̄ + (h̄/2)∂p̄/∂θ] dθ dζ / W̄
 *     (Couette term 4π/√(1−ε²) exactly; integrating the second by parts gives the
 *     identity (r/c)f = 2π²S/√(1−ε²) + (ε/2)·sin φ)
 *   inlet flow Q/(rcNL) = π ∫ [h̄/2 − h̄³(∂p̄/∂θ)/12]_{θ=0} dζ
 *   side flow Qs/(rcNL) = −(π/6)(D/L)² ∫ h̄³ (∂p̄/∂ζ)_{ζ=1} dθ  (both ends)
 *   P/pmax = W̄/(4·p̄max)
 * Gradients at the boundaries use one-sided second-order differences; the peak is
 * located by a parabola through the three highest mid-plane nodes.
 */
export function performance(sol: FilmSolution): DimensionlessPerformance {
  const { eccentricity: eps, lengthToDiameter } = sol;
  const { wr, wt, wbar, frictionVariable, frictionVariableFilm } = loadAndFriction(sol);
  const flowVariable = inletFlow(sol);
  const peak = pressurePeak(sol);
  const deg = 180 / Math.PI;
  return {
    eccentricity: eps,
    lengthToDiameter,
    sommerfeld: 2 / (Math.PI * wbar),
    attitudeDeg: (Math.atan2(wt, wr) * 180) / Math.PI,
    frictionVariable,
    frictionVariableFilm,
    flowVariable,
    sideFlowRatio: sideFlow(sol) / flowVariable,
    pressureRatio: wbar / (4 * peak.pMax),
    peakAngleDeg: peak.theta * deg,
    filmEndDeg: filmEnd(sol, peak.node) * deg,
    loadRadial: wr,
    loadTangential: wt,
  };
}

/**
 * Load components W̄r, W̄t, W̄ and the friction variable (r/c)f, over the whole film and
 * over its unruptured part only (frictionVariableFilm), from the integrals of performance().
 */
function loadAndFriction(sol: FilmSolution): {
  wr: number;
  wt: number;
  wbar: number;
  frictionVariable: number;
  frictionVariableFilm: number;
} {
  const { mesh, p, eccentricity: eps } = sol;
  const { nTheta: n, nZeta: m, theta, thetaFace, wTheta, wZeta } = mesh;
  const stride = m + 1;
  let sr = 0;
  let st = 0;
  let poiseuille = 0;
  let couetteFilm = 0;
  for (let i = 0; i <= n; i++) {
    const c = Math.cos(theta[i]!);
    const s = Math.sin(theta[i]!);
    const h = 1 + eps * c;
    let sumP = 0;
    let film = 0;
    for (let j = 0; j <= m; j++) {
      const v = p[i * stride + j]!;
      sumP += wZeta[j]! * v;
      if (v > 0) film += wZeta[j]!;
    }
    sr += wTheta[i]! * sumP * c;
    st += wTheta[i]! * sumP * s;
    couetteFilm += (wTheta[i]! * film) / h;
    if (i < n) {
      const hf = 1 + eps * Math.cos(thetaFace[i]!);
      let dp = 0;
      for (let j = 0; j <= m; j++) dp += wZeta[j]! * (p[(i + 1) * stride + j]! - p[i * stride + j]!);
      poiseuille += (hf / 2) * dp;
    }
  }
  // Full length: double the half-mesh integrals.
  const wr = -2 * sr;
  const wt = 2 * st;
  const wbar = Math.hypot(wr, wt);
  const couette = (4 * Math.PI) / Math.sqrt(1 - eps * eps);
  const frictionVariable = (couette + 2 * poiseuille) / wbar;
  // Film fraction: the pressure mid-plane nodes at the ends are zero by the boundary
  // condition, not by rupture; count the end row as film where its neighbour is full.
  let couetteFilmFix = 0;
  for (let i = 0; i <= n; i++) {
    const h = 1 + eps * Math.cos(theta[i]!);
    if (p[i * stride + m - 1]! > 0) couetteFilmFix += (wTheta[i]! * wZeta[m]!) / h;
  }
  const frictionVariableFilm = (2 * (couetteFilm + couetteFilmFix) + 2 * poiseuille) / wbar;
  return { wr, wt, wbar, frictionVariable, frictionVariableFilm };
}

/** Inlet flow variable Q/(rcNL): ∂p̄/∂θ at θ = 0+ from the quadratic through (0,0), (θ1,p1), (θ2,p2). */
function inletFlow(sol: FilmSolution): number {
  const { mesh, p, eccentricity: eps } = sol;
  const { nZeta: m, theta, wZeta } = mesh;
  const stride = m + 1;
  const t1 = theta[1]!;
  const t2 = theta[2]!;
  const h0 = 1 + eps;
  let inflow = 0;
  for (let j = 0; j <= m; j++) {
    const p1 = p[stride + j]!;
    const p2 = p[2 * stride + j]!;
    const g = (p1 * t2 * t2 - p2 * t1 * t1) / (t1 * t2 * (t2 - t1));
    inflow += wZeta[j]! * (h0 / 2 - (h0 * h0 * h0 * g) / 12);
  }
  return 2 * Math.PI * inflow; // π ∫_{-1}^{1} = 2π ∫_0^1
}

/** Side flow variable Qs/(rcNL) through both ends: ∂p̄/∂ζ at ζ = 1 by the backward second-order difference. */
function sideFlow(sol: FilmSolution): number {
  const { mesh, p, eccentricity: eps, lengthToDiameter } = sol;
  const { nTheta: n, nZeta: m, theta, wTheta } = mesh;
  const stride = m + 1;
  const dz = 1 / m;
  let side = 0;
  for (let i = 0; i <= n; i++) {
    const h = 1 + eps * Math.cos(theta[i]!);
    const a = p[i * stride + m - 1]!;
    const bb = m >= 2 ? p[i * stride + m - 2]! : 0;
    const g = (-4 * a + bb) / (2 * dz);
    side += wTheta[i]! * h * h * h * g;
  }
  return (-Math.PI / 6) * (1 / (lengthToDiameter * lengthToDiameter)) * side;
}

/**
 * Peak pressure p̄max at mid-plane (j = 0) and its angle θ, rad, refined by a parabola through
 * the highest node and its neighbours; `node` is the highest node's index i.
 */
function pressurePeak(sol: FilmSolution): { pMax: number; theta: number; node: number } {
  const { mesh, p } = sol;
  const { nTheta: n, nZeta: m, theta } = mesh;
  const stride = m + 1;
  let iMax = 1;
  for (let i = 1; i < n; i++) if (p[i * stride]! > p[iMax * stride]!) iMax = i;
  let pMax = p[iMax * stride]!;
  let peakTheta = theta[iMax]!;
  if (iMax > 0 && iMax < n) {
    const x0 = theta[iMax - 1]!;
    const x1 = theta[iMax]!;
    const x2 = theta[iMax + 1]!;
    const y0 = p[(iMax - 1) * stride]!;
    const y1 = p[iMax * stride]!;
    const y2 = p[(iMax + 1) * stride]!;
    // Divided differences of the interpolating parabola.
    const d01 = (y1 - y0) / (x1 - x0);
    const d12 = (y2 - y1) / (x2 - x1);
    const a2 = (d12 - d01) / (x2 - x0);
    if (a2 < 0) {
      const a1 = d01 - a2 * (x0 + x1);
      const xs = -a1 / (2 * a2);
      if (xs > x0 && xs < x2) {
        peakTheta = xs;
        pMax = y0 + d01 * (xs - x0) + a2 * (xs - x0) * (xs - x1);
      }
    }
  }
  return { pMax, theta: peakTheta, node: iMax };
}

/**
 * Film end at mid-plane, rad: the first zero after the peak node `peakNode`. The pressure
 * leaves zero with zero slope (Swift–Stieber): the end is placed one half interval past the
 * last full node, a first-order estimate; 2π when the film never ruptures.
 */
function filmEnd(sol: FilmSolution, peakNode: number): number {
  const { mesh, p } = sol;
  const { nTheta: n, nZeta: m, theta } = mesh;
  const stride = m + 1;
  for (let i = peakNode + 1; i <= n; i++) {
    if (p[i * stride]! <= 0) return (theta[i - 1]! + theta[i]!) / 2;
  }
  return 2 * Math.PI;
}

/** Solve and reduce in one call. */
export function solvePerformance(
  eps: number,
  lengthToDiameter: number,
  mesh: Mesh,
  opts: SolveOptions = {},
): DimensionlessPerformance & { iterations: number } {
  const sol = solveReynolds(eps, lengthToDiameter, mesh, opts);
  return { ...performance(sol), iterations: sol.iterations };
}
