import { DataError } from '../core/errors.js';
import { readFileSync } from 'node:fs';
import { dataDir } from './load.js';

/**
 * data/thrust-pad-tables.json: the thrust pad solver's dimensionless tables, solved ahead of
 * time by scripts/thrust-pad-tables.mjs (source "computed"), one table per pad shape L/B over
 * the taper rows. Numbers of our own making, checked by a plain loop (every row has every
 * field, finite) rather than a zod schema; the shipped file is checked by the tests and trusted at
 * run time, a folder named by SHAFTWISE_DATA_DIR is checked on every read. A data folder
 * without the file (SHAFTWISE_DATA_DIR naming an older copy of data/) is no error: the pad
 * tables are then solved on first use.
 */
const FIELDS = [
  'taper',
  'load',
  'friction',
  'inletFlow',
  'outletFlow',
  'sideFlow',
  'centreOfPressure',
  'peakPressure',
] as const;

/** One solved row: the dimensionless pad at one taper K and L/B (definitions in src/calc/thrust/pad.ts). */
export type PadTableRow = Record<(typeof FIELDS)[number], number>;

export interface ShippedPadTables {
  description: string;
  source: string;
  mesh: { nX: number; nZ: number };
  tapers: number[];
  /** One table per L/B, in rising L/B. */
  tables: { widthToLength: number; rows: PadTableRow[] }[];
}

const cached = new Map<string, ShippedPadTables | null>();

/** The shipped pad tables of the data folder in use, or null when the folder has no such file. */
export function shippedPadTables(): ShippedPadTables | null {
  const dir = dataDir();
  const hit = cached.get(dir.href);
  if (hit !== undefined) return hit;
  const url = new URL('thrust-pad-tables.json', dir);
  const env = process.env.SHAFTWISE_DATA_DIR;
  const file = env
    ? `${env.replace(/\/$/, '')}/thrust-pad-tables.json (SHAFTWISE_DATA_DIR)`
    : 'data/thrust-pad-tables.json';
  let text: string;
  try {
    text = readFileSync(url, 'utf8');
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code === 'ENOENT') {
      cached.set(dir.href, null);
      return null;
    }
    throw new DataError(`${file}: cannot be read (${(e as Error).message})`);
  }
  let t: ShippedPadTables;
  try {
    t = JSON.parse(text) as ShippedPadTables;
  } catch (e) {
    throw new DataError(
      `${file}: cannot be read as JSON (${(e as Error).message}); regenerate it with node scripts/thrust-pad-tables.mjs`,
    );
  }
  // The shipped file is checked by the tests and trusted here (as loadTable does); another folder's on every read.
  if (env) checkPadTables(t, file);
  cached.set(dir.href, t);
  return t;
}

/** Throw a DataError naming the first table, row and field of `t` that is not as the loader expects. */
export function checkPadTables(t: ShippedPadTables, file = 'data/thrust-pad-tables.json'): void {
  if (!Array.isArray(t?.tapers) || !Array.isArray(t.tables))
    throw new DataError(`${file}: fields tapers and tables: expected lists`);
  let previous = 0;
  t.tables.forEach((tab, i) => {
    if (!(tab.widthToLength > previous) || !Array.isArray(tab.rows) || tab.rows.length !== t.tapers.length) {
      throw new DataError(
        `${file}: tables[${i}]: expected widthToLength rising above ${previous} and one row per taper (${t.tapers.length})`,
      );
    }
    previous = tab.widthToLength;
    tab.rows.forEach((r, k) => {
      for (const f of FIELDS) {
        if (typeof r[f] !== 'number' || !Number.isFinite(r[f])) {
          throw new DataError(
            `${file}: tables[${i}].rows[${k}].${f}: got ${JSON.stringify(r[f])}; expected a finite number`,
          );
        }
      }
    });
  });
}
