import { DataError } from '../core/errors.js';
import { readFileSync } from 'node:fs';
import { pathToFileURL } from 'node:url';
import { z } from 'zod';

/**
 * Loaders for the tables in data/. Each table is validated by a zod schema when read;
 * a row that fails names the file, the row and the field. Tables are read once and cached.
 */

/**
 * The folder of data tables: data/ beside the program, or the folder named by
 * SHAFTWISE_DATA_DIR (a copy of data/ with a supplier's rows added, say). Read on each
 * call so a test or a script can point it elsewhere.
 */
export function dataDir(): URL {
  return resolvedDir().url;
}
/** dataDir()'s href, kept with it (a URL's href getter is costly in a sweep's inner loop). */
export function dataDirHref(): string {
  return resolvedDir().href;
}
/** A resolved folder: its URL, its href and the tables read from it, by file name. */
interface ResolvedDir {
  env: string | undefined;
  url: URL;
  href: string;
  tables: Map<string, unknown>;
}
/** The folder and its href, resolved once per value of SHAFTWISE_DATA_DIR. */
function resolvedDir(): ResolvedDir {
  const dir = process.env.SHAFTWISE_DATA_DIR;
  if (resolved && resolved.env === dir) return resolved;
  const url = dir ? pathToFileURL(dir.endsWith('/') ? dir : `${dir}/`) : new URL('../../data/', import.meta.url);
  let tables = cache.get(url.href);
  if (!tables) {
    tables = new Map();
    cache.set(url.href, tables);
  }
  resolved = { env: dir, url, href: url.href, tables };
  return resolved;
}
// Sweeps call the loaders thousands of times: the folder (and its href, a costly getter) is
// resolved once per setting, and its tables are kept by file name (no key to build per call).
let resolved: ResolvedDir | undefined;
/** The tables read, per folder href (a folder set again later finds its tables still read). */
const cache = new Map<string, Map<string, unknown>>();

/** A table's name in messages: data/<file>, or the full path when SHAFTWISE_DATA_DIR points elsewhere. */
function shownPath(file: string): string {
  return process.env.SHAFTWISE_DATA_DIR
    ? `${process.env.SHAFTWISE_DATA_DIR.replace(/\/$/, '')}/${file} (SHAFTWISE_DATA_DIR)`
    : `data/${file}`;
}

/**
 * Read data/<file> and validate it with schema; cached per file. The tables shipped in data/
 * are validated by the test suite (test/data/shipped-tables.test.ts) and trusted at run time,
 * which saves tens of milliseconds of start-up; a folder named by SHAFTWISE_DATA_DIR holds
 * someone's own rows and is validated on every read.
 */
export function loadTable<T>(file: string, schema: z.ZodType<T>): T {
  const dir = resolvedDir();
  const hit = dir.tables.get(file);
  if (hit !== undefined) return hit as T;
  const url = new URL(file, dir.url);
  let raw: unknown;
  try {
    raw = JSON.parse(readFileSync(url, 'utf8'));
  } catch (e) {
    throw new DataError(`${shownPath(file)}: cannot be read as JSON (${(e as Error).message})`);
  }
  if (!process.env.SHAFTWISE_DATA_DIR) {
    dir.tables.set(file, raw);
    return raw as T;
  }
  const parsed = schema.safeParse(raw);
  if (!parsed.success) {
    const issue = parsed.error.issues[0]!;
    throw new DataError(`${shownPath(file)}: field ${issue.path.join('.') || '(root)'}: ${issue.message}`);
  }
  dir.tables.set(file, parsed.data);
  return parsed.data;
}

const positive = z.number().positive();
const oilGradeSchema = z.object({
  /** ISO VG number: nominal kinematic viscosity at 40 °C, mm²/s (ISO 3448). */
  grade: positive,
  /** Kinematic viscosity at 40 °C, mm²/s. */
  nu40: positive,
  /** Kinematic viscosity at 100 °C, mm²/s. */
  nu100: positive,
  /** Density at 15 °C, kg/m³. */
  density15: positive,
  /** Specific heat, J/(kg·K). */
  specificHeat: positive,
  source: z.string().min(1),
});
/** An oil grade row as written in data/lubricants.json. */
export type OilGradeRow = z.infer<typeof oilGradeSchema>;
/**
 * An oil grade as the kernels take it (the one definition of an oil grade): its row of
 * data/lubricants.json and the table's volumetric coefficient of density with temperature, 1/K.
 */
export type OilGrade = OilGradeRow & { densityCoefficient: number };
const lubricantsSchema = z.object({
  description: z.string(),
  units: z.record(z.string(), z.string()),
  densityTemperatureCoefficient: z.object({ value: positive, unit: z.string(), source: z.string() }),
  /** The grade taken where a case supplies oil but names none (one place for it). */
  defaultGrade: z.object({ grade: positive, source: z.string().min(1) }),
  greaseBaseOil: z.object({ grade: positive, source: z.string() }),
  /** The viscosity index every grade's ν100 stands for (ASTM D2270 / ISO 2909), and why. */
  viscosityIndex: z.object({ value: z.number(), source: z.string().min(1) }),
  /** The grades the journal design sweep tries when a case names none (a subset of `grades`). */
  sweepGrades: z.object({ grades: z.array(positive).min(1), source: z.string().min(1) }),
  /** The oil-bath heat balance (src/calc/sump.ts): housing proportions and heat transfer. */
  sump: z.object({
    diameterFactor: z.object({ value: positive, source: z.string().min(1) }),
    lengthFactor: z.object({ value: positive, source: z.string().min(1) }),
    dissipatingShare: z.object({ value: positive.max(1), source: z.string().min(1) }),
    heatTransfer: z.object({ value: positive, unit: z.string(), source: z.string().min(1) }),
    bearingRise: z.object({ value: z.number().nonnegative(), unit: z.string(), source: z.string().min(1) }),
    maxRise: z.object({ value: positive, unit: z.string(), source: z.string().min(1) }),
  }),
  grades: z.array(oilGradeSchema).min(1),
});
export type LubricantTable = z.infer<typeof lubricantsSchema>;

export function lubricants(): LubricantTable {
  return loadTable('lubricants.json', lubricantsSchema);
}

/** The oil grade for an ISO VG number, with the table's density coefficient, or undefined. */
export function oilGrade(grade: number): OilGrade | undefined {
  const table = lubricants();
  const row = table.grades.find((g) => g.grade === grade);
  return row && { ...row, densityCoefficient: table.densityTemperatureCoefficient.value };
}
