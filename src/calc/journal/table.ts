import { makeMesh, type Mesh } from './mesh.js';
import { solveReynolds, performance, type DimensionlessPerformance } from './reynolds.js';
import { frictionVariableIdentity } from './closed-forms.js';

/**
 * Dimensionless performance table of a full journal bearing at one L/D, solved once
 * (lazily, cached in memory) over a fixed set of eccentricity ratios, and monotone
 * cubic (PCHIP, Fritsch–Carlson) interpolation between its rows.
 *
 * Interpolated variables, against x = ε:
 *   y = ln(S·ε)  (smooth and finite as ε → 0, where S ∝ 1/ε; monotone decreasing),
 *   φ, Q/(rcNL), Qs/Q, P/pmax, peak angle, film-end angle.
 * The friction variable is not interpolated: it is recomputed from the interpolated S
 * and φ by the Raimondi–Boyd identity (r/c)f = 2π²S/√(1−ε²) + (ε/2)·sin φ, which the
 * finite-difference solution satisfies to its discretisation error (closed-forms.ts).
 *
 * Outside the table: below ε_min the linear (lightly-loaded) regime is used, S ∝ 1/ε
 * with the other variables held at their ε_min values; above ε_max, ln S is extrapolated
 * linearly in ln(1 − ε) from the last two rows, the other variables held at their ε_max
 * values, and the result is flagged `extrapolated` (order-of-magnitude only: callers warn).
 *
 * Default mesh and eccentricity rows: see DEFAULT_MESH and TABLE_ECCENTRICITIES, chosen by
 * the grid-convergence and interpolation studies in bench/journal.mjs.
 *
 * Sources: Raimondi & Boyd (1958) for the variables and their definitions; Fritsch, F. N.
 * and Carlson, R. E. (1980), "Monotone piecewise cubic interpolation", SIAM J. Numer.
 * Anal. 17(2), 238–246, for PCHIP (the three-point harmonic-mean slopes of Fritsch and
 * Butland, 1984, from memory).
 */

/**
 * Default mesh: 96 circumferential × 12 axial (half length) intervals, clustering a = 0.5.
 * Grid-convergence study (bench/journal.mjs; reference 576×64, L/D 1 and 0.25, ε 0.1,
 * 0.8, 0.97): worst deviation of S, φ, (r/c)f, Q, Qs/Q, P/pmax is 0.64 % (S at ε = 0.97,
 * L/D = 1) and 0.71 % (P/pmax, same point); all others ≤ 0.6 %; one solve takes about
 * 2 ms. 144×16 halves these errors at 2.5× the cost; 48×6 errors reach 2.6 %.
 */
export const DEFAULT_MESH = { nTheta: 96, nZeta: 12, stretch: 0.5 } as const;

/**
 * Eccentricity rows: 30 values, spaced 0.05 in the middle and closer towards ε → 1 where
 * ln S bends, and towards 0 where S ∝ 1/ε. ε_max = 0.98 so that ε = 0.97 (the last
 * tabulated row of Raimondi & Boyd) is inside the table.
 */
export const TABLE_ECCENTRICITIES: readonly number[] = [
  0.01, 0.03, 0.06, 0.1, 0.15, 0.2, 0.25, 0.3, 0.35, 0.4, 0.45, 0.5, 0.55, 0.6, 0.65, 0.7, 0.75, 0.8, 0.83, 0.86, 0.88,
  0.9, 0.915, 0.93, 0.94, 0.95, 0.96, 0.967, 0.974, 0.98,
];

/** One interpolated row: the dimensionless state of the bearing at ε. */
export interface DimensionlessPoint {
  eccentricity: number;
  lengthToDiameter: number;
  sommerfeld: number;
  attitudeDeg: number;
  frictionVariable: number;
  flowVariable: number;
  sideFlowRatio: number;
  pressureRatio: number;
  peakAngleDeg: number;
  filmEndDeg: number;
  /** True when ε lies beyond the table's last row (see module comment). */
  extrapolated: boolean;
}

export interface JournalTable {
  readonly lengthToDiameter: number;
  readonly mesh: Mesh;
  readonly eps: Float64Array;
  /** ln(S·ε) and its PCHIP slopes. */
  readonly lnSe: Series;
  readonly attitude: Series;
  readonly flow: Series;
  readonly sideRatio: Series;
  readonly pressureRatio: Series;
  readonly peakAngle: Series;
  readonly filmEnd: Series;
  /** The raw solved rows. */
  readonly rows: readonly DimensionlessPerformance[];
  /** Wall time to build, ms (for the bench). */
  readonly buildMs: number;
}

interface Series {
  readonly y: Float64Array;
  readonly d: Float64Array;
}

/** The largest eccentricity ratio the table solved, ε_max: beyond it the figures are extrapolated. */
export function lastEccentricity(t: JournalTable): number {
  return t.eps[t.eps.length - 1]!;
}

/** PCHIP slopes (Fritsch–Carlson monotone; three-point formula at the ends). */
export function pchipSlopes(x: ArrayLike<number>, y: ArrayLike<number>): Float64Array {
  const n = x.length;
  const d = new Float64Array(n);
  if (n < 2) return d;
  const h = new Float64Array(n - 1);
  const del = new Float64Array(n - 1);
  for (let k = 0; k < n - 1; k++) {
    h[k] = x[k + 1]! - x[k]!;
    del[k] = (y[k + 1]! - y[k]!) / h[k]!;
  }
  if (n === 2) {
    d[0] = d[1] = del[0]!;
    return d;
  }
  for (let k = 1; k < n - 1; k++) {
    const a = del[k - 1]!;
    const b = del[k]!;
    if (a * b <= 0) d[k] = 0;
    else {
      const w1 = 2 * h[k]! + h[k - 1]!;
      const w2 = h[k]! + 2 * h[k - 1]!;
      d[k] = (w1 + w2) / (w1 / a + w2 / b);
    }
  }
  const end = (h0: number, h1: number, d0: number, d1: number): number => {
    let s = ((2 * h0 + h1) * d0 - h0 * d1) / (h0 + h1);
    if (s * d0 <= 0) s = 0;
    else if (d0 * d1 <= 0 && Math.abs(s) > Math.abs(3 * d0)) s = 3 * d0;
    return s;
  };
  d[0] = end(h[0]!, h[1]!, del[0]!, del[1]!);
  d[n - 1] = end(h[n - 2]!, h[n - 3]!, del[n - 2]!, del[n - 3]!);
  return d;
}

/** Index k with x[k] ≤ v ≤ x[k+1] (clamped to the ends). */
function segment(x: Float64Array, v: number): number {
  let lo = 0;
  let hi = x.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (x[mid]! <= v) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** Cubic Hermite value on segment k at v. */
function hermite(x: Float64Array, s: Series, k: number, v: number): number {
  const x0 = x[k]!;
  const h = x[k + 1]! - x0;
  const t = (v - x0) / h;
  const t2 = t * t;
  const t3 = t2 * t;
  return (
    (2 * t3 - 3 * t2 + 1) * s.y[k]! +
    (t3 - 2 * t2 + t) * h * s.d[k]! +
    (-2 * t3 + 3 * t2) * s.y[k + 1]! +
    (t3 - t2) * h * s.d[k + 1]!
  );
}

function series(x: Float64Array, y: Float64Array): Series {
  return { y, d: pchipSlopes(x, y) };
}

/**
 * Solve the table for one L/D. Each row starts from the previous row's pressure field
 * (continuation in ε), which cuts the sweeps by about a third.
 */
export function buildTable(
  lengthToDiameter: number,
  options: { mesh?: Mesh; eccentricities?: readonly number[] } = {},
): JournalTable {
  const t0 = performance_now();
  const mesh = options.mesh ?? makeMesh(DEFAULT_MESH.nTheta, DEFAULT_MESH.nZeta, DEFAULT_MESH.stretch);
  const list = options.eccentricities ?? TABLE_ECCENTRICITIES;
  const eps = Float64Array.from(list);
  for (let k = 1; k < eps.length; k++)
    if (!(eps[k]! > eps[k - 1]!)) throw new Error('journal table: eccentricities must increase');
  const rows: DimensionlessPerformance[] = [];
  let prev: Float64Array | undefined;
  for (const e of eps) {
    const sol = solveReynolds(e, lengthToDiameter, mesh, prev ? { initial: prev } : {});
    prev = sol.p;
    rows.push(performance(sol));
  }
  return tableFromRows(lengthToDiameter, rows, mesh, performance_now() - t0);
}

/**
 * A table from already-solved rows (rows increasing in ε, as buildTable makes them): the
 * interpolation series are derived here, so a table read back from data/journal-tables.json
 * behaves exactly as the one just solved.
 */
export function tableFromRows(
  lengthToDiameter: number,
  rows: readonly DimensionlessPerformance[],
  mesh: Mesh,
  buildMs = 0,
): JournalTable {
  const eps = Float64Array.from(rows, (r) => r.eccentricity);
  const col = (f: (r: DimensionlessPerformance) => number): Float64Array => Float64Array.from(rows, f);
  const lnSe = col((r) => Math.log(r.sommerfeld * r.eccentricity));
  for (let k = 1; k < rows.length; k++)
    if (!(rows[k]!.sommerfeld < rows[k - 1]!.sommerfeld))
      throw new Error(`journal table: S not decreasing in ε at L/D = ${lengthToDiameter} (row ${k})`);
  return {
    lengthToDiameter,
    mesh,
    eps,
    lnSe: series(eps, lnSe),
    attitude: series(
      eps,
      col((r) => r.attitudeDeg),
    ),
    flow: series(
      eps,
      col((r) => r.flowVariable),
    ),
    sideRatio: series(
      eps,
      col((r) => r.sideFlowRatio),
    ),
    pressureRatio: series(
      eps,
      col((r) => r.pressureRatio),
    ),
    peakAngle: series(
      eps,
      col((r) => r.peakAngleDeg),
    ),
    filmEnd: series(
      eps,
      col((r) => r.filmEndDeg),
    ),
    rows,
    buildMs,
  };
}

function performance_now(): number {
  return globalThis.performance.now();
}

/** Sommerfeld number at ε from the table (with the out-of-table rules of the module comment). */
export function sommerfeldAt(t: JournalTable, eps: number): number {
  const n = t.eps.length;
  const e0 = t.eps[0]!;
  const e1 = t.eps[n - 1]!;
  if (eps < e0) return Math.exp(t.lnSe.y[0]!) / eps;
  if (eps > e1) {
    const ea = t.eps[n - 2]!;
    const sa = Math.exp(t.lnSe.y[n - 2]!) / ea;
    const sb = Math.exp(t.lnSe.y[n - 1]!) / e1;
    const k = Math.log(sb / sa) / Math.log((1 - e1) / (1 - ea));
    return sb * Math.pow((1 - eps) / (1 - e1), k);
  }
  const k = segment(t.eps, eps);
  return Math.exp(hermite(t.eps, t.lnSe, k, eps)) / eps;
}

/** The interpolated dimensionless state at ε (0 < ε < 1). */
export function pointAtEccentricity(t: JournalTable, eps: number): DimensionlessPoint {
  if (!(eps > 0 && eps < 1)) throw new Error(`journal table: eccentricity ratio must be in (0, 1), got ${eps}`);
  const n = t.eps.length;
  const ec = Math.min(Math.max(eps, t.eps[0]!), t.eps[n - 1]!);
  const k = segment(t.eps, ec);
  const at = (s: Series): number => hermite(t.eps, s, k, ec);
  const sommerfeld = sommerfeldAt(t, eps);
  const attitudeDeg = at(t.attitude);
  return {
    eccentricity: eps,
    lengthToDiameter: t.lengthToDiameter,
    sommerfeld,
    attitudeDeg,
    frictionVariable: frictionVariableIdentity(sommerfeld, eps, (attitudeDeg * Math.PI) / 180),
    flowVariable: at(t.flow),
    sideFlowRatio: at(t.sideRatio),
    pressureRatio: at(t.pressureRatio),
    peakAngleDeg: at(t.peakAngle),
    filmEndDeg: at(t.filmEnd),
    extrapolated: eps > t.eps[n - 1]!,
  };
}

/**
 * The three variables of the thermal balance at ε (0 < ε < 1), the same numbers as the fields of
 * pointAtEccentricity, written to `out` without building the point (the balance's iteration
 * evaluates them at every step): out[0] (r/c)f, out[1] Q/(rcNL), out[2] Qs/Q.
 */
export function thermalVariablesAt(t: JournalTable, eps: number, out: Float64Array): void {
  if (!(eps > 0 && eps < 1)) throw new Error(`journal table: eccentricity ratio must be in (0, 1), got ${eps}`);
  const n = t.eps.length;
  const ec = Math.min(Math.max(eps, t.eps[0]!), t.eps[n - 1]!);
  const k = segment(t.eps, ec);
  const sommerfeld = sommerfeldAt(t, eps);
  const attitudeDeg = hermite(t.eps, t.attitude, k, ec);
  out[0] = frictionVariableIdentity(sommerfeld, eps, (attitudeDeg * Math.PI) / 180);
  out[1] = hermite(t.eps, t.flow, k, ec);
  out[2] = hermite(t.eps, t.sideRatio, k, ec);
}

/**
 * Eccentricity ratio for a Sommerfeld number S > 0: the root of S_table(ε) = S on the
 * monotone interpolant, by Newton's method safeguarded by bisection (to double precision).
 * Beyond the table the out-of-table laws are inverted in closed form.
 */
export function eccentricityFromSommerfeld(t: JournalTable, sommerfeld: number): number {
  if (!(sommerfeld > 0 && Number.isFinite(sommerfeld)))
    throw new Error(`journal table: Sommerfeld number must be positive and finite, got ${sommerfeld}`);
  const n = t.eps.length;
  const e0 = t.eps[0]!;
  const e1 = t.eps[n - 1]!;
  const s0 = sommerfeldAt(t, e0);
  const s1 = sommerfeldAt(t, e1);
  if (sommerfeld >= s0) return (s0 * e0) / sommerfeld;
  if (sommerfeld <= s1) {
    const ea = t.eps[n - 2]!;
    const sa = sommerfeldAt(t, ea);
    const k = Math.log(s1 / sa) / Math.log((1 - e1) / (1 - ea));
    const e = 1 - (1 - e1) * Math.pow(sommerfeld / s1, 1 / k);
    // Keep ε < 1 in floating point so that h0 = c(1 − ε) stays positive.
    return Math.min(e, 1 - 1e-12);
  }
  // Table rows bracket the root; then bisect within the segment.
  const target = Math.log(sommerfeld);
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (t.lnSe.y[mid]! - Math.log(t.eps[mid]!) >= target) lo = mid;
    else hi = mid;
  }
  // Newton's method on g(ε) = ln(S·ε)(ε) − ln ε − ln S, kept inside the shrinking bracket
  // [a, b] (g(a) ≥ 0 > g(b)); a step that leaves it is replaced by the midpoint.
  let a = t.eps[lo]!;
  let b = t.eps[hi]!;
  let m = 0.5 * (a + b);
  const hs = slopeScratch;
  for (let it = 0; it < 100 && b - a > 1e-14; it++) {
    hermiteWithSlope(t.eps, t.lnSe, lo, m, hs);
    const h = hs[0]!;
    const dh = hs[1]!;
    const g = h - Math.log(m) - target;
    if (g >= 0) a = m;
    else b = m;
    const step = g / (dh - 1 / m);
    const next = m - step;
    if (!(next > a && next < b)) m = 0.5 * (a + b);
    else if (Math.abs(step) <= 1e-15) return next;
    else m = next;
  }
  return m;
}

/** Where hermiteWithSlope writes (one for the module: the Newton steps build no pair each). */
const slopeScratch = new Float64Array(2);

/** Cubic Hermite value and slope on segment k at v, written to out[0] and out[1]. */
function hermiteWithSlope(x: Float64Array, s: Series, k: number, v: number, out: Float64Array): void {
  const x0 = x[k]!;
  const h = x[k + 1]! - x0;
  const t = (v - x0) / h;
  const t2 = t * t;
  const y0 = s.y[k]!;
  const y1 = s.y[k + 1]!;
  const d0 = s.d[k]!;
  const d1 = s.d[k + 1]!;
  const value =
    (2 * t2 * t - 3 * t2 + 1) * y0 +
    (t2 * t - 2 * t2 + t) * h * d0 +
    (-2 * t2 * t + 3 * t2) * y1 +
    (t2 * t - t2) * h * d1;
  const slope = ((6 * t2 - 6 * t) * (y0 - y1)) / h + (3 * t2 - 4 * t + 1) * d0 + (3 * t2 - 2 * t) * d1;
  out[0] = value;
  out[1] = slope;
}

/** The interpolated dimensionless state for a Sommerfeld number. */
export function pointAtSommerfeld(t: JournalTable, sommerfeld: number): DimensionlessPoint {
  return pointAtEccentricity(t, eccentricityFromSommerfeld(t, sommerfeld));
}

/**
 * L/D quantisation of the cache: tables are keyed (and solved) at L/D rounded to 0.001.
 * The change of S with L/D is at most about 2·Δ(L/D)/(L/D) (short-bearing law
 * S ∝ (L/D)⁻²), so the rounding moves S by ≤ 0.4 % at L/D = 0.25 and ≤ 0.1 % at L/D ≥ 1.
 */
export const LD_QUANTUM = 0.001;
const MAX_CACHED = 64;
const cache = new Map<number, JournalTable>();

/** Round L/D to the cache quantum. */
export function quantiseLengthToDiameter(ld: number): number {
  return Math.max(LD_QUANTUM, Math.round(ld / LD_QUANTUM) * LD_QUANTUM);
}

/** The cached table for L/D (built on first use; least recently built dropped beyond 64). */
export function tableFor(lengthToDiameter: number): JournalTable {
  if (!(lengthToDiameter > 0 && Number.isFinite(lengthToDiameter)))
    throw new Error(`journal table: L/D must be positive and finite, got ${lengthToDiameter}`);
  const key = Number(quantiseLengthToDiameter(lengthToDiameter).toFixed(6));
  const hit = cache.get(key);
  if (hit) return hit;
  const seeded = seeds.get(key) ?? rowsBetweenSeeds(key);
  const t = seeded ? tableFromRows(key, seeded, defaultMesh()) : buildTable(key);
  if (cache.size >= MAX_CACHED) {
    const first = cache.keys().next();
    if (!first.done) cache.delete(first.value);
  }
  cache.set(key, t);
  return t;
}

/**
 * Seed the cache with tables solved ahead of time (data/journal-tables.json, written by
 * scripts/journal-tables.mjs with this solver at the default mesh), so a run does not pay
 * 40–90 ms per L/D to solve them again. Seeded tables never replace one already cached.
 */
export function seedTables(
  tables: readonly { lengthToDiameter: number; rows: readonly DimensionlessPerformance[] }[],
): void {
  // Only the rows are kept; a table is made from them when first asked for (most runs use one or a few L/D).
  for (const t of tables) seeds.set(Number(quantiseLengthToDiameter(t.lengthToDiameter).toFixed(6)), t.rows);
  generation++;
}

const seeds = new Map<number, readonly DimensionlessPerformance[]>();

/** Variables interpolated across L/D: ln S, and each of these as it is. */
const ACROSS: readonly (keyof DimensionlessPerformance)[] = [
  'attitudeDeg',
  'frictionVariable',
  'frictionVariableFilm',
  'flowVariable',
  'sideFlowRatio',
  'pressureRatio',
  'peakAngleDeg',
  'filmEndDeg',
  'loadRadial',
  'loadTangential',
];

/** Largest step between seeded L/D values across which rows are interpolated rather than solved. */
const SEED_STEP_MAX = 0.05 + 1e-9;

/**
 * The rows at an L/D between seeded tables, or null (outside the seeded span, seeds more than
 * SEED_STEP_MAX apart, or not on the same ε rows): at each ε row, cubic Lagrange interpolation
 * in x = ln(L/D) through the four nearest seeded L/D (two each side where there are), of ln S
 * (S ∝ (L/D)⁻² in the short-bearing limit, so ln S is nearly linear in x) and of each other
 * variable. Against direct solves at the default mesh at eight L/D between 0.25 and 2
 * (test/calc/journal/table-between.test.ts): S within 0.034 %, φ, (r/c)f, Q, Qs/Q, P/pmax and
 * the peak angle within 0.057 %, a quarter of the table's own error between ε rows (0.22 %);
 * the film end, which a solve places on a mesh node, within one node interval (3.75°). It
 * saves the 40–90 ms of a solve per L/D.
 */
function rowsBetweenSeeds(ld: number): DimensionlessPerformance[] | null {
  const keys = [...seeds.keys()].sort((p, q) => p - q);
  if (keys.length < 4 || !(ld > keys[0]! && ld < keys[keys.length - 1]!)) return null;
  let k = 0;
  while (keys[k + 1]! < ld) k++;
  const first = Math.min(Math.max(k - 1, 0), keys.length - 4);
  const near = keys.slice(first, first + 4);
  for (let i = 1; i < 4; i++) if (near[i]! - near[i - 1]! > SEED_STEP_MAX) return null;
  const tables = near.map((key) => seeds.get(key)!);
  const n = tables[0]!.length;
  if (tables.some((rows) => rows.length !== n || rows.some((r, i) => r.eccentricity !== tables[0]![i]!.eccentricity)))
    return null;
  // Lagrange weights in ln(L/D).
  const xs = near.map(Math.log);
  const x = Math.log(ld);
  const w = xs.map((xi, i) => xs.reduce((acc, xj, j) => (j === i ? acc : (acc * (x - xj)) / (xi - xj)), 1));
  const mix = (f: (r: DimensionlessPerformance) => number, i: number) =>
    tables.reduce((acc, rows, j) => acc + w[j]! * f(rows[i]!), 0);
  const rows: DimensionlessPerformance[] = [];
  for (let i = 0; i < n; i++) {
    const row = { ...tables[0]![i]!, lengthToDiameter: ld };
    row.sommerfeld = Math.exp(mix((r) => Math.log(r.sommerfeld), i));
    for (const key of ACROSS) row[key] = mix((r) => r[key], i);
    rows.push(row);
  }
  return rows;
}

let mesh0: Mesh | undefined;
const defaultMesh = (): Mesh => (mesh0 ??= makeMesh(DEFAULT_MESH.nTheta, DEFAULT_MESH.nZeta, DEFAULT_MESH.stretch));

/**
 * Empty the table cache and the seeds: the next tables are solved afresh (benchmarks), or
 * seeded again from another data folder (check.ts).
 */
export function clearTableCache(): void {
  cache.clear();
  seeds.clear();
  generation++;
}

let generation = 0;

/** A count that changes whenever the tables may change (cleared or seeded): results kept from them carry it. */
export function tableGeneration(): number {
  return generation;
}
