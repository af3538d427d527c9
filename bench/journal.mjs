// Journal bearing solver benchmark (run on demand, not part of the test suite).
// Build first: npx tsc -p .   then: node bench/journal.mjs [--quick]
// Prints: grid-convergence table, ω scan, table build time, interpolation error,
// time per load-matched operating point, and a 60×60 load–speed map timing.
import { makeMesh } from '../dist/calc/journal/mesh.js';
import { solveReynolds, performance as perf, defaultOmega } from '../dist/calc/journal/reynolds.js';
import {
  buildTable,
  clearTableCache,
  tableFor,
  pointAtEccentricity,
  eccentricityFromSommerfeld,
  DEFAULT_MESH,
  TABLE_ECCENTRICITIES,
} from '../dist/calc/journal/table.js';
import { operatingPoint } from '../dist/calc/journal/operating-point.js';
import { oilGrade } from '../dist/data/load.js';

const quick = process.argv.includes('--quick');
const now = () => globalThis.performance.now();
const KEYS = ['sommerfeld', 'attitudeDeg', 'frictionVariable', 'flowVariable', 'sideFlowRatio', 'pressureRatio'];
const NAMES = ['S', 'φ', '(r/c)f', 'Q', 'Qs/Q', 'P/pmax'];
const pct = (a, b) => ((a / b - 1) * 100).toFixed(2).padStart(6) + '%';

// 1. Grid convergence.
console.log('\n== Grid convergence (reference 576×64, a = 0.5, tol 1e-10) ==');
const meshes = [
  [48, 6],
  [72, 8],
  [96, 12],
  [144, 16],
  [192, 24],
];
for (const ld of [1, 0.5, 0.25]) {
  for (const eps of quick ? [0.8] : [0.1, 0.8, 0.97]) {
    const ref = perf(solveReynolds(eps, ld, makeMesh(576, 64, 0.5), { tol: 1e-10, maxIter: 100000 }));
    console.log(`L/D ${ld}, ε ${eps}: reference S ${ref.sommerfeld.toPrecision(5)}, φ ${ref.attitudeDeg.toFixed(2)}°`);
    console.log('  mesh        S          φ(deg)   ' + NAMES.map((n) => n.padStart(7)).join(' ') + '   sweeps  time');
    for (const [nt, nz] of meshes) {
      const m = makeMesh(nt, nz, 0.5);
      solveReynolds(eps, ld, m); // warm
      const reps = 5;
      const t0 = now();
      let sol;
      for (let k = 0; k < reps; k++) sol = solveReynolds(eps, ld, m);
      const ms = (now() - t0) / reps;
      const p = perf(sol);
      console.log(
        `  ${(nt + '×' + nz).padEnd(8)} ${p.sommerfeld.toPrecision(5).padStart(9)} ${p.attitudeDeg.toFixed(2).padStart(8)}  ` +
          KEYS.map((k) => pct(p[k], ref[k])).join(' ') +
          `   ${String(sol.iterations).padStart(5)}  ${ms.toFixed(2)} ms`,
      );
    }
  }
}

// 2. ω scan on the default mesh.
console.log('\n== Over-relaxation scan, default mesh ==');
const dm = makeMesh(DEFAULT_MESH.nTheta, DEFAULT_MESH.nZeta, DEFAULT_MESH.stretch);
console.log(`default ω = ${defaultOmega(dm, 1).toFixed(3)}`);
for (const ld of [1, 0.25])
  for (const eps of [0.1, 0.6, 0.97]) {
    const row = [1.6, 1.7, 1.8, 1.85, 1.9, 1.95].map(
      (w) => `${w}:${solveReynolds(eps, ld, dm, { omega: w }).iterations}`,
    );
    console.log(`  L/D ${ld} ε ${eps}: default ${solveReynolds(eps, ld, dm).iterations} sweeps; ` + row.join('  '));
  }

// 3. Table build time (cold cache) and interpolation error against direct solves midway between rows.
console.log(`\n== Table build (${TABLE_ECCENTRICITIES.length} ε rows, default mesh) and interpolation error ==`);
for (const ld of [0.25, 0.5, 0.75, 1, 1.5, 2]) {
  const t = buildTable(ld);
  const worst = KEYS.map(() => [0, 0]);
  let worstEps = 0;
  for (let k = 0; k + 1 < TABLE_ECCENTRICITIES.length; k++) {
    const eps = (TABLE_ECCENTRICITIES[k] + TABLE_ECCENTRICITIES[k + 1]) / 2;
    const d = perf(solveReynolds(eps, ld, dm));
    const p = pointAtEccentricity(t, eps);
    KEYS.forEach((key, i) => {
      const e = Math.abs(p[key] / d[key] - 1);
      if (e > worst[i][0]) worst[i] = [e, eps];
    });
    worstEps = Math.max(worstEps, Math.abs(eccentricityFromSommerfeld(t, d.sommerfeld) - eps));
  }
  console.log(
    `  L/D ${String(ld).padEnd(4)} build ${t.buildMs.toFixed(1).padStart(6)} ms; worst interp. error ` +
      NAMES.map((n, i) => `${n} ${(worst[i][0] * 100).toFixed(3)}% (ε ${worst[i][1].toFixed(3)})`).join(', ') +
      `; |Δε| from S ${worstEps.toExponential(1)}`,
  );
}

// 4. Time per load-matched operating point (thermal balance with VG 46), amortised.
console.log('\n== Load-matched operating point (thermal balance, ISO VG 46) ==');
clearTableCache();
const geometry = { diameter: 0.08, length: 0.064, radialClearance: 0.04 * 0.001 };
const oil = oilGrade(46);
const t0 = now();
const table = tableFor(geometry.length / geometry.diameter);
const buildMs = now() - t0;
const n = quick ? 2000 : 20000;
let iters = 0;
const t1 = now();
for (let k = 0; k < n; k++) {
  const r = operatingPoint(table, {
    geometry,
    load: 500 + (k % 200) * 100,
    speed: 5 + (k % 37),
    fluid: { kind: 'oil', oil },
    inletTemperature: 40,
  });
  iters += r.thermalIterations;
}
const perPoint = (now() - t1) / n;
console.log(`  table build (cold, first L/D): ${buildMs.toFixed(1)} ms`);
console.log(
  `  per point: ${(perPoint * 1000).toFixed(1)} µs (mean ${(iters / n).toFixed(1)} viscosity evaluations), n = ${n}`,
);
console.log(`  amortised with the build over ${n} points: ${(((buildMs + perPoint * n) / n) * 1000).toFixed(1)} µs`);
// Direct-solve load matching, for comparison: bisection on ε with one Reynolds solve per step.
{
  const target = perf(solveReynolds(0.6, 0.8, dm)).sommerfeld;
  const tt = now();
  let lo = 0.01,
    hi = 0.98,
    steps = 0;
  while (hi - lo > 1e-4) {
    const mid = 0.5 * (lo + hi);
    if (perf(solveReynolds(mid, 0.8, dm)).sommerfeld > target) lo = mid;
    else hi = mid;
    steps++;
  }
  console.log(
    `  direct solves instead (isothermal, bisection to Δε 1e-4): ${(now() - tt).toFixed(1)} ms, ${steps} solves`,
  );
}

// 5. A 60×60 load–speed map at one geometry (the later selection-map feature).
{
  clearTableCache();
  const tt = now();
  const t = tableFor(0.8);
  let count = 0;
  for (let i = 0; i < 60; i++)
    for (let j = 0; j < 60; j++) {
      const load = 100 * Math.pow(10, (3 * i) / 59); // 100 N .. 100 kN
      const speed = 0.5 * Math.pow(10, (2.5 * j) / 59); // 0.5 .. 158 rev/s
      operatingPoint(t, { geometry, load, speed, fluid: { kind: 'oil', oil }, inletTemperature: 40 });
      count++;
    }
  console.log(`\n== 60×60 load–speed map, one L/D, cold table: ${(now() - tt).toFixed(0)} ms for ${count} points ==`);
}

// 6. checkJournal end to end on an invented case (design sweep: 6 L/D × 6 c/r × 9 grades).
{
  const { checkJournal } = await import('../dist/calc/journal/index.js');
  clearTableCache();
  const c = {
    title: 'Bench: irrigation lift pump line shaft (invented)',
    shaft: { diameter: 0.06, speed: 1450 / 60 },
    load: { radial: 2500, axial: 0, shock: 'light' },
    life: { hours: 40000, wearAllowance: 0.0002, reliability: 90 },
    space: { maxLength: 0.07, maxOuterDiameter: 0.1 },
    lubrication: { supply: 'oil-feed', inletTemperature: 40 },
    environment: { ambient: 30, contamination: 'normal', startsPerHour: 2 },
    priorities: { cost: 3, friction: 3, maintenance: 3, noise: 3, precision: 3 },
  };
  let tt = now();
  const r = checkJournal(c);
  const cold = now() - tt;
  tt = now();
  checkJournal(c);
  console.log(
    `\n== checkJournal, ${r.sweep.length}-design sweep: cold ${cold.toFixed(0)} ms (tables built), warm ${(now() - tt).toFixed(0)} ms ==`,
  );
}
