import { dataDirHref } from '../../data/load.js';
import { shippedPadTables, type ShippedPadTables } from '../../data/thrust-pad-tables.js';
import { pchipSlopes } from '../journal/table.js';
import { PAD_MESH, solvePad, type PadPerformance } from './pad.js';

/**
 * Dimensionless pad performance against the taper K = h_in/h_min − 1 at one pad shape L/B,
 * over PAD_TAPERS, interpolated by monotone cubics (PCHIP, Fritsch & Carlson 1980, as the
 * journal's table.ts) in ln K of: ln W*, ln F*, ln Q*_in, Q*_side/Q*_in and X_cp.
 *
 * The rows at an L/B come from data/thrust-pad-tables.json (solved ahead of time by
 * scripts/thrust-pad-tables.mjs at PAD_MESH over PAD_TAPERS, one table per L/B from 0.25 to 4
 * in steps of 2^(1/8)), interpolated between its L/B by monotone cubics (PCHIP) in ln(L/B) of
 * the same quantities, row by row (test/calc/thrust/pad-table-shipped.test.ts bounds the
 * departure from a direct solve). Outside the file's L/B range, or when the data folder has no
 * such file (or one solved over other rows or another mesh), the rows are solved with pad.ts on
 * first use. Either way a table is kept in memory for the life of the process.
 *
 * Outside the rows: below K_min the near-parallel limit W* ∝ K, F* → 1, flows and X_cp held
 * (the film is then nearly parallel and W* is linear in K to first order, which the
 * infinitely wide slider's series W* = K/2 − … shows); above K_max the last row is held and
 * the point is flagged `extrapolated` (a film this thin against the taper fails in any case).
 */

/** Taper rows: K from 0.05 to 20, closer where W* bends (K ≈ 0.5–3). */
export const PAD_TAPERS: readonly number[] = [
  0.05, 0.1, 0.2, 0.35, 0.5, 0.7, 0.9, 1.1, 1.3, 1.6, 2, 2.5, 3.2, 4.2, 5.6, 7.5, 10, 14, 20,
];

/** One interpolated state of the pad (definitions in pad.ts). */
export interface PadPoint {
  taper: number;
  load: number;
  friction: number;
  inletFlow: number;
  sideFlow: number;
  centreOfPressure: number;
  /** Peak pressure P_max (interpolated linearly in ln K of ln P_max). */
  peakPressure: number;
  /** True when K lies above the last row (figures of the last row). */
  extrapolated: boolean;
}

export interface PadTable {
  widthToLength: number;
  lnK: Float64Array;
  rows: PadPerformance[];
  series: { y: Float64Array; d: Float64Array }[];
}

/** The dimensionless figures a row holds, as the shipped file stores them. */
type RowFigures = Pick<
  PadPerformance,
  'taper' | 'load' | 'friction' | 'inletFlow' | 'outletFlow' | 'sideFlow' | 'centreOfPressure' | 'peakPressure'
>;

const cache = new Map<number, PadTable>();
/** The data folder whose shipped rows the cache was built from. */
let cacheFolder: string | undefined;

/** L/B rounded to 1e-4 so that sizes differing by a last digit share a table. */
const quantise = (widthToLength: number): number => Math.round(widthToLength * 1e4) / 1e4;

/** Empty the table cache: the next tables are read or solved afresh (benchmarks, tests). */
export function clearPadTableCache(): void {
  cache.clear();
  cacheFolder = undefined;
}

/** The rows of pad shape L/B solved directly (pad.ts, default mesh) over PAD_TAPERS. */
export function solvePadRows(widthToLength: number): PadPerformance[] {
  return PAD_TAPERS.map((k) => solvePad(k, widthToLength));
}

/** The table of pad shape L/B (> 0): shipped rows interpolated in L/B, or solved, on first use. */
export function padTable(widthToLength: number): PadTable {
  const folder = dataDirHref();
  if (folder !== cacheFolder) {
    cache.clear();
    cacheFolder = folder;
  }
  const key = quantise(widthToLength);
  const hit = cache.get(key);
  if (hit) return hit;
  const table = padTableFromRows(key, shippedRows(key) ?? solvePadRows(key));
  cache.set(key, table);
  return table;
}

/** A table from rows over PAD_TAPERS (solved, or read from the shipped file). */
export function padTableFromRows(widthToLength: number, rows: readonly RowFigures[]): PadTable {
  const full: PadPerformance[] = rows.map((r) => ({
    ...r,
    widthToLength,
    frictionVariable: r.friction / r.load,
    iterations: 'iterations' in r ? (r as PadPerformance).iterations : 0,
  }));
  const lnK = Float64Array.from(full, (r) => Math.log(r.taper));
  const columns = [
    full.map((r) => Math.log(r.load)),
    full.map((r) => Math.log(r.friction)),
    full.map((r) => Math.log(r.inletFlow)),
    full.map((r) => r.sideFlow / r.inletFlow),
    full.map((r) => r.centreOfPressure),
    full.map((r) => Math.log(r.peakPressure)),
  ].map((c) => Float64Array.from(c));
  return { widthToLength, lnK, rows: full, series: columns.map((y) => ({ y, d: pchipSlopes(lnK, y) })) };
}

/** Per shipped file: ln(L/B) of its tables, or null when it was solved over other rows or another mesh. */
const shapeAxis = new WeakMap<ShippedPadTables, Float64Array | null>();

function axisOf(file: ShippedPadTables): Float64Array | null {
  const hit = shapeAxis.get(file);
  if (hit !== undefined) return hit;
  const fits =
    file.mesh?.nX === PAD_MESH.nX &&
    file.mesh?.nZ === PAD_MESH.nZ &&
    file.tapers.length === PAD_TAPERS.length &&
    file.tapers.every((k, i) => k === PAD_TAPERS[i]) &&
    file.tables.length >= 3;
  const out = fits ? Float64Array.from(file.tables, (t) => Math.log(t.widthToLength)) : null;
  shapeAxis.set(file, out);
  return out;
}

/** The quantities interpolated in ln(L/B): ln W*, ln F*, ln Q*_in, Q*_side/Q*_in, X_cp, ln P_max. */
const SHAPE_QUANTITIES: ((r: RowFigures) => number)[] = [
  (r) => Math.log(r.load),
  (r) => Math.log(r.friction),
  (r) => Math.log(r.inletFlow),
  (r) => r.sideFlow / r.inletFlow,
  (r) => r.centreOfPressure,
  (r) => Math.log(r.peakPressure),
];

/**
 * The rows at L/B interpolated from the shipped tables (PCHIP in ln(L/B)), or null when the data
 * folder has no usable file or L/B lies outside its range. The PCHIP slopes at the two tables
 * either side of L/B depend only on the tables next to them (and, at an end, on the end
 * formula's two intervals), so they are found from a window of at most four tables: the same
 * slopes as over the whole file, without reading the rest.
 */
export function shippedRows(widthToLength: number): RowFigures[] | null {
  const file = shippedPadTables();
  const x = file && axisOf(file);
  if (!file || !x) return null;
  const last = x.length - 1;
  const v = Math.log(widthToLength);
  if (!(v >= x[0]! - 1e-12 && v <= x[last]! + 1e-12)) return null;
  let k = 0;
  while (k < last - 1 && x[k + 1]! <= v) k++;
  const w = Math.min(Math.max(v, x[0]!), x[last]!);
  const from = Math.max(0, k - 1);
  const to = Math.min(last, k + 2);
  const xs = x.subarray(from, to + 1);
  const at = k - from;
  const tables = file.tables.slice(from, to + 1);
  return PAD_TAPERS.map((taper, j) => {
    const rows = tables.map((t) => t.rows[j]!);
    const q = SHAPE_QUANTITIES.map((f) => {
      const y = Float64Array.from(rows, f);
      return hermite(xs, { y, d: pchipSlopes(xs, y) }, at, w);
    });
    const inletFlow = Math.exp(q[2]!);
    const sideFlow = q[3]! * inletFlow;
    return {
      taper,
      load: Math.exp(q[0]!),
      friction: Math.exp(q[1]!),
      inletFlow,
      outletFlow: inletFlow - sideFlow,
      sideFlow,
      centreOfPressure: q[4]!,
      peakPressure: Math.exp(q[5]!),
    };
  });
}

function hermite(x: Float64Array, s: { y: Float64Array; d: Float64Array }, k: number, v: number): number {
  const h = x[k + 1]! - x[k]!;
  const t = (v - x[k]!) / h;
  const t2 = t * t;
  const t3 = t2 * t;
  return (
    (2 * t3 - 3 * t2 + 1) * s.y[k]! +
    (t3 - 2 * t2 + t) * h * s.d[k]! +
    (-2 * t3 + 3 * t2) * s.y[k + 1]! +
    (t3 - t2) * h * s.d[k + 1]!
  );
}

/**
 * W* alone at taper K (> 0), as padAt(t, K).load: the inner loop of load matching reads only this.
 */
export function padLoadAt(t: PadTable, taper: number): number {
  const x = t.lnK;
  const last = x.length - 1;
  const v = Math.log(taper);
  if (v <= x[0]!) return (t.rows[0]!.load * taper) / t.rows[0]!.taper;
  if (v >= x[last]!) return t.rows[last]!.load;
  let k = 0;
  while (k < last - 1 && x[k + 1]! <= v) k++;
  return Math.exp(hermite(x, t.series[0]!, k, v));
}

/** The pad's state at taper K (> 0). */
export function padAt(t: PadTable, taper: number): PadPoint {
  if (!(taper > 0)) throw new Error(`thrust pad: taper K must be positive, got ${taper}`);
  const x = t.lnK;
  const last = x.length - 1;
  const v = Math.log(taper);
  if (v <= x[0]!) {
    const r = t.rows[0]!;
    const scale = taper / r.taper; // W* ∝ K near parallel
    return {
      taper,
      load: r.load * scale,
      friction: 1 + (r.friction - 1) * scale,
      inletFlow: r.inletFlow,
      sideFlow: r.sideFlow / r.inletFlow,
      centreOfPressure: r.centreOfPressure,
      peakPressure: r.peakPressure * scale,
      extrapolated: false,
    };
  }
  if (v >= x[last]!) {
    const r = t.rows[last]!;
    const sideFlow = r.sideFlow / r.inletFlow;
    return { ...r, taper: r.taper, sideFlow, extrapolated: v > x[last]! };
  }
  let k = 0;
  while (k < last - 1 && x[k + 1]! <= v) k++;
  const at = (i: number): number => hermite(x, t.series[i]!, k, v);
  return {
    taper,
    load: Math.exp(at(0)),
    friction: Math.exp(at(1)),
    inletFlow: Math.exp(at(2)),
    sideFlow: at(3),
    centreOfPressure: at(4),
    peakPressure: Math.exp(at(5)),
    extrapolated: false,
  };
}

/**
 * The taper a tilting pad takes with its pivot at `pivot`·B from the leading edge: the K whose
 * centre of pressure X_cp sits on the pivot (the pad tilts until the pressure's moment about the
 * pivot vanishes). X_cp rises with K from 0.5 (parallel film); a pivot outside the table's range
 * of X_cp throws. Bisection in ln K to 1e-9.
 */
export function tiltingTaper(t: PadTable, pivot: number): number {
  const first = t.rows[0]!.centreOfPressure;
  const last = t.rows[t.rows.length - 1]!.centreOfPressure;
  if (!(pivot > first && pivot < last))
    throw new Error(
      `thrust pad: pivot at ${pivot}·B lies outside the centres of pressure ${first.toFixed(3)}–${last.toFixed(3)} the pad can take`,
    );
  let lo = t.lnK[0]!;
  let hi = t.lnK[t.lnK.length - 1]!;
  while (hi - lo > 1e-9) {
    const mid = 0.5 * (lo + hi);
    if (padAt(t, Math.exp(mid)).centreOfPressure < pivot) lo = mid;
    else hi = mid;
  }
  return Math.exp(0.5 * (lo + hi));
}
