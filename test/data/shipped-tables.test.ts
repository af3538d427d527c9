// Every table shipped in data/ passes its zod schema (the program trusts them at run time and
// validates only a folder named by SHAFTWISE_DATA_DIR, so this is where they are checked).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fileURLToPath } from 'node:url';

const shipped = fileURLToPath(new URL('../../data/', import.meta.url));

describe('shipped data tables', () => {
  let before: string | undefined;
  beforeAll(() => {
    before = process.env.SHAFTWISE_DATA_DIR;
    process.env.SHAFTWISE_DATA_DIR = shipped; // same files, but now validated
  });
  afterAll(() => {
    if (before === undefined) delete process.env.SHAFTWISE_DATA_DIR;
    else process.env.SHAFTWISE_DATA_DIR = before;
  });

  it('lubricants.json', async () => {
    const { lubricants } = await import('../../src/data/load.js');
    expect(lubricants().grades.length).toBeGreaterThanOrEqual(9);
  });
  it('bushing-materials.json and bushing-factors.json', async () => {
    const { bushingMaterials, bushingFactors } = await import('../../src/data/bushing.js');
    expect(bushingMaterials().length).toBeGreaterThanOrEqual(10);
    expect(bushingFactors().motion.length).toBeGreaterThanOrEqual(2);
  });
  it('the rolling dimension tables, factors and kind traits', async () => {
    const { boundaryDimensions, taperedDimensions, needleDimensions, rollingFactors, kindTraits } =
      await import('../../src/data/rolling.js');
    expect(boundaryDimensions().rows.length).toBeGreaterThanOrEqual(160); // 5 series × 32 bores
    expect(taperedDimensions().rows.length).toBeGreaterThan(0);
    expect(needleDimensions().rows.length).toBeGreaterThan(0);
    expect(rollingFactors().serviceFactors.map((x) => x.shock)).toEqual(['none', 'light', 'moderate', 'heavy']);
    expect(kindTraits()).toHaveLength(7);
  });
  it('rolling-load-factors.json, rolling-ratings.json and rolling-running.json', async () => {
    const { loadFactors } = await import('../../src/data/rolling-load-factors.js');
    const { ratingTables } = await import('../../src/data/rolling-ratings.js');
    const { rollingRunning } = await import('../../src/data/rolling-running.js');
    expect(loadFactors().radialBall.rows.length).toBeGreaterThanOrEqual(9); // ISO 281 table, nine f0·Fa/C0 rows
    expect(Object.keys(ratingTables().curves).length).toBeGreaterThan(0);
    expect(rollingRunning().staticSafety).toHaveLength(4);
  });
  it('journal-criteria.json and journal-tables.json', async () => {
    const { journalCriteria } = await import('../../src/data/journal-criteria.js');
    const { shippedJournalTables } = await import('../../src/data/journal-tables.js');
    expect(journalCriteria().maxTemperature).toBeGreaterThan(0);
    expect(shippedJournalTables().tables.length).toBeGreaterThan(0);
  });
  it('every row of every table carries a source', async () => {
    const { readdirSync, readFileSync } = await import('node:fs');
    for (const f of readdirSync(shipped).filter((x) => x.endsWith('.json'))) {
      const t = JSON.parse(readFileSync(shipped + f, 'utf8'));
      const lists = Object.values(t).filter(Array.isArray) as unknown[][];
      for (const list of lists)
        for (const row of list)
          if (row && typeof row === 'object' && !Array.isArray(row)) {
            if (f === 'journal-tables.json' || f === 'thrust-pad-tables.json') continue; // computed rows: one source for the file
            expect(row, `${f}`).toHaveProperty('source');
          }
      expect(JSON.stringify(t), f).toMatch(/"source"/);
    }
  });
});
