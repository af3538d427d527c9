/**
 * checkJournal reads its tables and criteria from the data folder in use at each call
 * (SHAFTWISE_DATA_DIR, else data/): a property of the program, not a published value. A
 * second folder holds the shipped files with two changes whose effect is known exactly:
 * every Sommerfeld number of the dimensionless tables doubled, and h_base of the film
 * criterion raised to 8 µm.
 */
import { cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { checkJournal } from '../../../src/calc/journal/index.js';
import type { CaseSI } from '../../../src/case/types.js';
import { lineShaftCase } from '../../helpers/case.js';

const SHIPPED = fileURLToPath(new URL('../../../data/', import.meta.url));
const RAISED_FILM_BASE = 8e-6;

/** A copy of data/ with the tables' S doubled and h_base raised. */
function changedFolder(): string {
  const dir = mkdtempSync(join(tmpdir(), 'shaftwise-journal-data-'));
  cpSync(SHIPPED, dir, { recursive: true });
  const tablesFile = join(dir, 'journal-tables.json');
  const tables = JSON.parse(readFileSync(tablesFile, 'utf8'));
  for (const table of tables.tables) for (const row of table.rows) row.sommerfeld *= 2;
  writeFileSync(tablesFile, JSON.stringify(tables));
  const criteriaFile = join(dir, 'journal-criteria.json');
  const criteria = JSON.parse(readFileSync(criteriaFile, 'utf8'));
  criteria.criteria.minFilmBase_m.value = RAISED_FILM_BASE;
  writeFileSync(criteriaFile, JSON.stringify(criteria));
  return dir;
}

/**
 * A fixed design (L/D = 1, a shipped table) at a fixed viscosity, so the case's Sommerfeld
 * number S = (r/c)²·μN/P is the same in both folders and no thermal iteration moves it.
 */
function fixedDesign(viscosity: number): CaseSI {
  return lineShaftCase({
    lubrication: { supply: 'oil-feed', inletTemperature: 40, viscosity },
    journal: { length: 0.06, radialClearance: 6e-5 },
  });
}

/** Run `fn` with SHAFTWISE_DATA_DIR set to `dir` (or unset), restoring it afterwards. */
function inFolder<T>(dir: string | undefined, fn: () => T): T {
  const before = process.env.SHAFTWISE_DATA_DIR;
  if (dir === undefined) delete process.env.SHAFTWISE_DATA_DIR;
  else process.env.SHAFTWISE_DATA_DIR = dir;
  try {
    return fn();
  } finally {
    if (before === undefined) delete process.env.SHAFTWISE_DATA_DIR;
    else process.env.SHAFTWISE_DATA_DIR = before;
  }
}

describe('journal tables and criteria follow the data folder between calls', () => {
  const dir = changedFolder();
  afterAll(() => rmSync(dir, { recursive: true, force: true }));
  const mu = 0.02;
  const shipped = inFolder(undefined, () => checkJournal(fixedDesign(mu)));
  const changed = inFolder(dir, () => checkJournal(fixedDesign(mu)));
  const shippedAgain = inFolder(undefined, () => checkJournal(fixedDesign(mu)));

  it("the second call uses the second folder's tables: ε as the shipped table gives it at S/2", () => {
    // S_changed(ε) = 2·S_shipped(ε), so S_changed(ε) = S exactly where S_shipped(ε) = S/2,
    // and S/2 is what the shipped tables see at half the viscosity (S ∝ μ).
    const half = inFolder(undefined, () => checkJournal(fixedDesign(mu / 2)));
    expect(changed.eccentricityRatio).not.toBeCloseTo(shipped.eccentricityRatio, 3);
    expect(changed.eccentricityRatio).toBeCloseTo(half.eccentricityRatio, 9);
  });
  it("the second call uses the second folder's criteria: h_allow = h_base + k_D·D moves by the change of h_base", () => {
    const shippedBase = JSON.parse(readFileSync(join(SHIPPED, 'journal-criteria.json'), 'utf8')).criteria.minFilmBase_m
      .value as number;
    expect(changed.allowableFilmThickness - shipped.allowableFilmThickness).toBeCloseTo(
      RAISED_FILM_BASE - shippedBase,
      15,
    );
    expect(changed.checks.find((k) => k.id === 'min-film')!.limit).toBe(changed.allowableFilmThickness);
  });
  it('switching back gives the shipped result again, number for number', () => {
    expect(shippedAgain).toEqual(shipped);
  });
});
