import { PSOR_TOLERANCE } from '../journal/reynolds.js';

/**
 * Steady Reynolds equation for one hydrodynamic thrust pad (plane inclined pad, fixed
 * tapered land or tilting pad), dimensionless, solved by finite volumes and successive
 * over-relaxation in the style of the journal solver (src/calc/journal/reynolds.ts: same
 * Gauss–Seidel sweep, the same stopping rule max |ΔP| per sweep ≤ tol·max P, an error when
 * it does not converge).
 *
 * Equation (incompressible, isoviscous, rigid, laminar; runner sliding at U in +x):
 *   ∂/∂x(h³ ∂p/∂x) + ∂/∂z(h³ ∂p/∂z) = 6 μ U ∂h/∂x,   0 ≤ x ≤ B, −L/2 ≤ z ≤ L/2,
 *   h = h_min·H(X),  H = 1 + K·(1 − X),  K = h_in/h_min − 1,
 * dimensionless with X = x/B, ζ = 2z/L (0 at mid-width, 1 at the side edge),
 * P = p·h_min²/(μ·U·B):
 *   ∂/∂X(H³ ∂P/∂X) + 4·(B/L)²·∂/∂ζ(H³ ∂P/∂ζ) = 6 dH/dX.
 * Symbols: x sliding direction from the leading (inlet, thick-film) edge, m; z across the
 * pad, m; B pad length in the sliding direction, m; L pad width, m; h film thickness, m;
 * h_in inlet and h_min outlet (minimum) film, m; μ dynamic viscosity, Pa·s; U runner
 * speed, m/s; p film pressure, Pa.
 * Boundary conditions: p = 0 on all four edges (a pad surrounded by oil at ambient
 * pressure); ∂p/∂ζ = 0 at mid-width (symmetry, only the half 0 ≤ ζ ≤ 1 is meshed). A
 * converging film (K > 0) keeps p > 0 everywhere, so no cavitation condition is needed;
 * sub-ambient values are nevertheless held at 0 (Swift–Stieber) for safety.
 *
 * Results (whole pad):
 *   W* = W·h_min²/(μ·U·B²·L)    = ∫₀¹∫₀¹ P dX dZ
 *   F* = F·h_min/(μ·U·B·L)       = ∫∫ [1/H + (H/2)·∂P/∂X] dX dZ = ∫∫ [1/H − (P/2)·dH/dX] dX dZ
 *                                   (runner drag; the second form by parts, P = 0 at X = 0, 1)
 *   f  = F/W = (h_min/B)·F* ÷ W*
 *   Q*_in  = Q_in/(U·h_min·L)   = ∫₀¹ [H/2 − (H³/12)·∂P/∂X]_{X=0} dZ   (flow drawn in)
 *   Q*_out = the same at X = 1 (leaves at the trailing edge); Q*_side = Q*_in − Q*_out
 *   X_cp = ∫∫ P·X dX dZ / W*                                          (centre of pressure)
 * Validity: laminar, isoviscous (temperature enters through an effective viscosity),
 * rigid flat pad, aligned runner, no inertia.
 *
 * Sources: Reynolds, O. (1886), Phil. Trans. R. Soc. 177, 157–234 (the equation and the
 * infinitely wide inclined slider); Hamrock, B. J., Schmid, S. R. and Jacobson, B. O.
 * (2004), Fundamentals of Fluid Film Lubrication, 2nd ed., Marcel Dekker, ch. 8 (slider
 * bearings: dimensionless load, friction and flow; from memory).
 */

export interface PadMesh {
  /** Intervals in the sliding direction X (≥ 4). */
  nX: number;
  /** Intervals across the half width ζ (≥ 2). */
  nZ: number;
}

/**
 * Default mesh 48 × 12 (half width), about 180 sweeps and 1 ms a solve. Mesh convergence
 * (test/calc/thrust/pad.test.ts; L/B = 1, K = 1, against 192 × 48): W* 0.37 %, F* 0.02 %,
 * Q*_in 0.11 %, X_cp 0.04 %, Q*_side 0.9 %; 24 × 6 gives W* 1.5 %.
 */
export const PAD_MESH: PadMesh = { nX: 48, nZ: 12 };

export interface PadSolveOptions {
  mesh?: PadMesh;
  /** Over-relaxation factor, 1 ≤ ω < 2 (default from the mesh, as in the journal solver). */
  omega?: number;
  tol?: number;
  maxIter?: number;
}

/** Dimensionless performance of one pad (definitions in the module comment). */
export interface PadPerformance {
  /** K = h_in/h_min − 1. */
  taper: number;
  /** Pad width over length in the sliding direction, L/B (Infinity: the infinitely wide slider). */
  widthToLength: number;
  load: number;
  friction: number;
  /** Friction coefficient over h_min/B: (f·B/h_min) = F* ÷ W*. */
  frictionVariable: number;
  inletFlow: number;
  outletFlow: number;
  sideFlow: number;
  /** Centre of pressure from the leading edge, X_cp = x_cp/B. */
  centreOfPressure: number;
  /** Peak pressure P_max = p_max·h_min²/(μ·U·B). */
  peakPressure: number;
  iterations: number;
}

/** Film shape H(X) = 1 + K·(1 − X). */
export function padFilm(taper: number, x: number): number {
  return 1 + taper * (1 - x);
}

/**
 * Solve the pad for taper K (> 0) and width-to-length L/B (> 0; Infinity gives the one-dimensional,
 * infinitely wide slider). Throws if SOR does not converge within maxIter sweeps.
 */
export function solvePad(taper: number, widthToLength: number, opts: PadSolveOptions = {}): PadPerformance {
  if (!(taper > 0 && Number.isFinite(taper))) throw new Error(`thrust pad: taper K must be positive, got ${taper}`);
  if (!(widthToLength > 0)) throw new Error(`thrust pad: L/B must be positive, got ${widthToLength}`);
  const mesh = opts.mesh ?? PAD_MESH;
  const wide = widthToLength === Infinity;
  const n = mesh.nX;
  const m = wide ? 1 : mesh.nZ;
  if (!Number.isInteger(n) || n < 4) throw new Error(`thrust pad: nX must be an integer ≥ 4, got ${n}`);
  if (!wide && (!Number.isInteger(m) || m < 2)) throw new Error(`thrust pad: nZ must be an integer ≥ 2, got ${m}`);
  const dx = 1 / n;
  const dz = 1 / m;
  const lambda = wide ? 0 : 4 / (widthToLength * widthToLength);
  const omega = opts.omega ?? Math.min(1.95, 2 / (1 + Math.sin(Math.PI / Math.max(4, n / 1.5))));
  const tol = opts.tol ?? PSOR_TOLERANCE;
  const maxIter = opts.maxIter ?? 20000;
  // Stencil per column i (H depends on X only).
  const aE = new Float64Array(n);
  const aW = new Float64Array(n);
  const aZ = new Float64Array(n);
  const inv = new Float64Array(n);
  const b = new Float64Array(n);
  for (let i = 1; i < n; i++) {
    const hE = padFilm(taper, (i + 0.5) * dx);
    const hW = padFilm(taper, (i - 0.5) * dx);
    const hi = padFilm(taper, i * dx);
    aE[i] = (hE * hE * hE) / (dx * dx);
    aW[i] = (hW * hW * hW) / (dx * dx);
    aZ[i] = (lambda * hi * hi * hi) / (dz * dz);
    inv[i] = 1 / (aE[i]! + aW[i]! + 2 * aZ[i]!);
    b[i] = (6 * (hE - hW)) / dx;
  }
  const stride = m + 1;
  const p = new Float64Array((n + 1) * stride);
  const rows = wide ? 1 : m; // rows j = 0..m−1 are unknown; j = m is the side edge (p = 0)
  for (let iter = 0; iter < maxIter; iter++) {
    let maxDelta = 0;
    let maxP = 0;
    for (let i = 1; i < n; i++) {
      const row = i * stride;
      for (let j = 0; j < rows; j++) {
        const k = row + j;
        const south = j === 0 ? p[k + 1]! : p[k - 1]!; // symmetry ghost at mid-width
        const gs = (aE[i]! * p[k + stride]! + aW[i]! * p[k - stride]! + aZ[i]! * (p[k + 1]! + south) - b[i]!) * inv[i]!;
        const old = p[k]!;
        let v = old + omega * (gs - old);
        if (v < 0) v = 0;
        p[k] = v;
        const dv = Math.abs(v - old);
        if (dv > maxDelta) maxDelta = dv;
        if (v > maxP) maxP = v;
      }
    }
    if (maxP > 0 && maxDelta <= tol * maxP) return reduce(p, taper, widthToLength, n, m, wide, iter + 1);
  }
  throw new Error(`thrust pad: SOR did not converge in ${maxIter} sweeps (K = ${taper}, L/B = ${widthToLength})`);
}

/** Trapezoid weights on [0, 1] with `n` intervals. */
function weights(n: number): Float64Array {
  const w = new Float64Array(n + 1).fill(1 / n);
  w[0] = w[n] = 1 / (2 * n);
  return w;
}

/** The integrals of the module comment from the converged field `p` (row-major, (nX+1)×(nZ+1)). */
function reduce(
  p: Float64Array,
  taper: number,
  widthToLength: number,
  n: number,
  m: number,
  wide: boolean,
  iterations: number,
): PadPerformance {
  const stride = m + 1;
  const wx = weights(n);
  // The wide slider has one row (mid-width) standing for the whole width.
  const wz = wide ? Float64Array.of(1, 0) : weights(m);
  const dx = 1 / n;
  const slope = -taper; // dH/dX
  let load = 0;
  let moment = 0;
  let peak = 0;
  for (let i = 0; i <= n; i++) {
    let col = 0;
    for (let j = 0; j <= m; j++) {
      const v = p[i * stride + j]!;
      col += wz[j]! * v;
      if (v > peak) peak = v;
    }
    load += wx[i]! * col;
    moment += wx[i]! * col * i * dx;
  }
  const couette = Math.log(1 + taper) / taper; // ∫₀¹ dX/H exactly
  const friction = couette - (slope / 2) * load;
  // ∂P/∂X at X = 0 (forward) and X = 1 (backward), second-order one-sided, P = 0 on the edge.
  const h0 = padFilm(taper, 0);
  const h1 = padFilm(taper, 1);
  let qIn = 0;
  let qOut = 0;
  for (let j = 0; j <= m; j++) {
    const g0 = (4 * p[stride + j]! - p[2 * stride + j]!) / (2 * dx);
    const g1 = (-4 * p[(n - 1) * stride + j]! + p[(n - 2) * stride + j]!) / (2 * dx);
    qIn += wz[j]! * (h0 / 2 - (h0 * h0 * h0 * g0) / 12);
    qOut += wz[j]! * (h1 / 2 - (h1 * h1 * h1 * g1) / 12);
  }
  return {
    taper,
    widthToLength,
    load,
    friction,
    frictionVariable: friction / load,
    inletFlow: qIn,
    outletFlow: qOut,
    sideFlow: wide ? 0 : qIn - qOut,
    centreOfPressure: moment / load,
    peakPressure: peak,
    iterations,
  };
}

/**
 * Closed form of the infinitely wide inclined slider (Reynolds 1886; Hamrock, Schmid &
 * Jacobson 2004, ch. 8):
 *   W* = W·h_min²/(μ·U·B²·L) = (6/K²)·[ln(1 + K) − 2K/(2 + K)],
 *   F* = F·h_min/(μ·U·B·L) = (4/K)·ln(1 + K) − 6/(2 + K),
 * K = h_in/h_min − 1 (> 0). Used to check solvePad.
 */
export function wideSlider(taper: number): { load: number; friction: number } {
  const k = taper;
  return {
    load: (6 / (k * k)) * (Math.log(1 + k) - (2 * k) / (2 + k)),
    friction: (4 / k) * Math.log(1 + k) - 6 / (2 + k),
  };
}
