import { DataError } from '../core/errors.js';
import { readFileSync } from 'node:fs';
import { dataDir } from './load.js';

/**
 * data/journal-tables.json: the journal solver's dimensionless tables, solved ahead of time
 * by scripts/journal-tables.mjs (source "computed"). The file holds some 14 000 numbers of
 * our own making, so it is checked by a plain loop (every row has every field, finite)
 * rather than a zod schema, which costs tens of milliseconds at start-up here.
 */
const FIELDS = [
  'eccentricity',
  'lengthToDiameter',
  'sommerfeld',
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
] as const;

/** One solved row: the dimensionless performance at one eccentricity ratio and L/D (the solver's own figures). */
export type JournalTableRow = Record<(typeof FIELDS)[number], number>;

export interface ShippedTables {
  description: string;
  source: string;
  mesh: { nTheta: number; nZeta: number; stretch: number };
  eccentricities: number[];
  tables: { lengthToDiameter: number; rows: JournalTableRow[] }[];
}

const cached = new Map<string, ShippedTables>();

export function shippedJournalTables(): ShippedTables {
  const dir = dataDir();
  const hit = cached.get(dir.href);
  if (hit) return hit;
  const url = new URL('journal-tables.json', dir);
  const file = 'data/journal-tables.json';
  let t: ShippedTables;
  try {
    t = JSON.parse(readFileSync(url, 'utf8')) as ShippedTables;
  } catch (e) {
    throw new DataError(
      `${file}: cannot be read as JSON (${(e as Error).message}); regenerate it with node scripts/journal-tables.mjs`,
    );
  }
  if (!Array.isArray(t?.tables)) throw new DataError(`${file}: field tables: expected a list of tables`);
  t.tables.forEach((tab, i) => {
    if (!(tab.lengthToDiameter > 0) || !Array.isArray(tab.rows) || tab.rows.length < 2) {
      throw new DataError(`${file}: tables[${i}]: expected lengthToDiameter > 0 and at least two rows`);
    }
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
  cached.set(dir.href, t);
  return t;
}
