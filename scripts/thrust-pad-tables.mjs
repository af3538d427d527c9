// Solve the thrust pad's dimensionless tables ahead of time and write them to
// data/thrust-pad-tables.json, so `advise` and `check journal` with an axial load start without
// 40–60 ms of solving per pad shape. Run after any change to the pad solver, its mesh or its
// taper rows:
//   npm run build && node scripts/thrust-pad-tables.mjs
// test/calc/thrust/pad-table-shipped.test.ts re-solves rows and fails if the file is stale.
import { writeFileSync } from 'node:fs';
import { PAD_MESH } from '../dist/calc/thrust/pad.js';
import { PAD_TAPERS, solvePadRows } from '../dist/calc/thrust/pad-table.js';

// L/B 0.25–4 in steps of 2^(1/8) (33 shapes): the pad ring of the journal's thrust face gives
// L/B up to about 1.06, and below 1 as the radial room narrows; wider pads for other users.
const shapes = Array.from({ length: 33 }, (_, i) => Number((0.25 * 2 ** (i / 8)).toPrecision(6)));
const FIELDS = ['taper', 'load', 'friction', 'inletFlow', 'outletFlow', 'sideFlow', 'centreOfPressure', 'peakPressure'];
const sig = (x) => Number(x.toPrecision(12));
const t0 = performance.now();
const tables = shapes.map((lb) => ({
  widthToLength: lb,
  rows: solvePadRows(lb).map((r) => Object.fromEntries(FIELDS.map((f) => [f, sig(r[f])]))),
}));
const out = {
  description:
    'Dimensionless performance of a plane inclined thrust pad (Reynolds equation, ambient pressure on all four edges), one table per pad width over length L/B over the taper rows K = h_in/h_min - 1. Variables as defined in src/calc/thrust/pad.ts.',
  source:
    'computed: shaftwise finite-difference pad solver (src/calc/thrust/pad.ts) at the default mesh, by scripts/thrust-pad-tables.mjs',
  mesh: PAD_MESH,
  tapers: PAD_TAPERS,
  tables,
};
writeFileSync(new URL('../data/thrust-pad-tables.json', import.meta.url), JSON.stringify(out) + '\n');
console.log(`${tables.length} tables in ${((performance.now() - t0) / 1000).toFixed(1)} s`);
