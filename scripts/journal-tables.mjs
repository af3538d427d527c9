// Solve the journal bearing's dimensionless tables ahead of time and write them to
// data/journal-tables.json, so `advise` and `check journal` start without 40–90 ms of
// solving per L/D. Run after any change to the solver, mesh or table rows:
//   npm run build && node scripts/journal-tables.mjs
// test/calc/journal/shipped-tables.test.ts re-solves rows and fails if the file is stale.
import { writeFileSync } from 'node:fs';
import { buildTable, DEFAULT_MESH, TABLE_ECCENTRICITIES } from '../dist/calc/journal/table.js';

// L/D 0.25–2 in steps of 0.05: the range the solver was checked over and the sweep uses.
const lds = Array.from({ length: 36 }, (_, i) => Math.round((0.25 + 0.05 * i) * 1000) / 1000);
const sig = (x) => (typeof x === 'number' ? Number(x.toPrecision(12)) : x);
const t0 = performance.now();
const tables = lds.map((ld) => {
  const t = buildTable(ld);
  return {
    lengthToDiameter: ld,
    rows: t.rows.map((r) => Object.fromEntries(Object.entries(r).map(([k, v]) => [k, sig(v)]))),
  };
});
const out = {
  description:
    'Dimensionless performance of a full 360-degree plain journal bearing (Reynolds equation, Swift-Stieber film rupture, oil admitted at the maximum film line), one table per L/D over the eccentricity rows. Variables as in Raimondi & Boyd (1958).',
  source:
    'computed: shaftwise finite-difference solver (src/calc/journal/reynolds.ts) at the default mesh, by scripts/journal-tables.mjs',
  mesh: DEFAULT_MESH,
  eccentricities: TABLE_ECCENTRICITIES,
  tables,
};
writeFileSync(new URL('../data/journal-tables.json', import.meta.url), JSON.stringify(out) + '\n');
console.log(`${tables.length} tables in ${((performance.now() - t0) / 1000).toFixed(1)} s`);
