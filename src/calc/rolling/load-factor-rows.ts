import type { LoadFactors } from '../../data/rolling-load-factors.js';
import { interpolatedValue } from './interpolate.js';

/**
 * The load-factor table (data/rolling-load-factors.json) as load-factors.ts interpolates in it:
 * each column as rows (x, y), the contact angles as entries with their key-dependent columns or
 * fixed factors, built once per table read, and the tabulated angles either side of each
 * contact angle met (a sweep asks for the factors of every candidate at every point).
 * ISO 281:2007 Table 3 and ISO 76 allow linear interpolation between their entries (from memory).
 */

/** e and the factors either side of it. */
export interface Factors {
  e: number;
  belowX: number;
  belowY: number;
  aboveX: number;
  aboveY: number;
}

/** The factors with X = 1 below e (every kind). */
export const factors = (e: number, belowY: number, aboveX: number, aboveY: number): Factors => ({
  e,
  belowX: 1,
  belowY,
  aboveX,
  aboveY,
});
/** Rows (x, y) of a column ys over keys xs, as interpolate takes them. */
const rowsOf = (xs: readonly number[], ys: readonly number[]) => xs.map((k, i) => ({ x: k, y: ys[i]! }));

type Rows = { x: number; y: number }[];
/** A tabulated contact angle as the interpolation reads it: its key-dependent columns, or its fixed factors. */
interface AngleEntry {
  angle: number;
  keyed: {
    single: { e: Rows; Y: Rows; xAboveE: number };
    double: { e: Rows; yBelowE: Rows; xAboveE: number; yAboveE: Rows };
  } | null;
  fixed: { single: Factors; double: Factors } | null;
}
/** The two tabulated angles either side of a contact angle, and the share s of the way from lo to hi. */
interface Bracket {
  lo: AngleEntry;
  hi: AngleEntry;
  s: number;
  keyed: boolean;
}
/**
 * The table's columns as rows for interpolation, built once per table read (a sweep asks for
 * the factors of every candidate at every point), and the brackets of the contact angles met.
 */
export interface PreparedTable {
  radialBallE: Rows;
  radialBallY: Rows;
  acKeys: Rows;
  entries: AngleEntry[];
  brackets: Map<number, Bracket | null>;
  staticSingleY0: Rows;
  staticDoubleY0: Rows;
}
const preparedTables = new WeakMap<LoadFactors, PreparedTable>();

/** The table as rows for interpolation (built at its first use, then kept for the table read). */
export function prepared(t: LoadFactors): PreparedTable {
  const hit = preparedTables.get(t);
  if (hit) return hit;
  const keys = t.angularContactKeyed.keys;
  const ballKeys = t.radialBall.rows.map((r) => r.key);
  const p: PreparedTable = {
    radialBallE: rowsOf(
      ballKeys,
      t.radialBall.rows.map((r) => r.e),
    ),
    radialBallY: rowsOf(
      ballKeys,
      t.radialBall.rows.map((r) => r.Y),
    ),
    acKeys: rowsOf(keys, keys),
    entries: [
      ...t.angularContactKeyed.angles.map((a): AngleEntry => ({
        angle: a.angle,
        keyed: {
          single: { e: rowsOf(keys, a.single.e), Y: rowsOf(keys, a.single.Y), xAboveE: a.single.xAboveE },
          double: {
            e: rowsOf(keys, a.double.e),
            yBelowE: rowsOf(keys, a.double.yBelowE),
            xAboveE: a.double.xAboveE,
            yAboveE: rowsOf(keys, a.double.yAboveE),
          },
        },
        fixed: null,
      })),
      ...t.angularContactFixed.rows.map((r): AngleEntry => ({
        angle: r.angle,
        keyed: null,
        fixed: {
          single: factors(r.e, 0, r.singleX, r.singleY),
          double: factors(r.e, r.doubleYBelowE, r.doubleX, r.doubleY),
        },
      })),
    ],
    brackets: new Map(),
    staticSingleY0: t.static.angularContact.map((r) => ({ x: r.angle, y: r.singleY0 })),
    staticDoubleY0: t.static.angularContact.map((r) => ({ x: r.angle, y: r.doubleY0 })),
  };
  preparedTables.set(t, p);
  return p;
}

/** The factors of one tabulated angle at the key. */
export function entryFactors(x: AngleEntry, key: number, double: boolean): Factors {
  if (x.fixed) return double ? x.fixed.double : x.fixed.single;
  const k = x.keyed!;
  if (double) {
    const d = k.double;
    return factors(
      interpolatedValue(d.e, key),
      interpolatedValue(d.yBelowE, key),
      d.xAboveE,
      interpolatedValue(d.yAboveE, key),
    );
  }
  return factors(interpolatedValue(k.single.e, key), 0, k.single.xAboveE, interpolatedValue(k.single.Y, key));
}

/** The tabulated angles either side of α (null outside the table), worked once per angle. */
export function bracketOf(p: PreparedTable, alpha: number): Bracket | null {
  const hit = p.brackets.get(alpha);
  if (hit !== undefined) return hit;
  const entries = p.entries;
  const first = entries[0]!;
  const last = entries[entries.length - 1]!;
  let bracket: Bracket | null = null;
  if (alpha >= first.angle - 1e-9 && alpha <= last.angle + 1e-9) {
    const j = Math.max(
      1,
      entries.findIndex((x) => x.angle >= alpha - 1e-9),
    );
    const lo = entries[j - 1]!;
    const hi = entries[j]!;
    const s = Math.min(1, Math.max(0, (alpha - lo.angle) / (hi.angle - lo.angle)));
    bracket = { lo, hi, s, keyed: (s < 1 && lo.keyed !== null) || (s > 0 && hi.keyed !== null) };
  }
  if (p.brackets.size < 64) p.brackets.set(alpha, bracket);
  return bracket;
}
