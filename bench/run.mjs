// Every benchmark in bench/, one after another (npm run bench builds first).
// Usage: node bench/run.mjs [--quick] [--runs N] [--dry-run]
// Each benchmark runs once with its output shown (that run also warms the caches), then its
// whole process is timed against bare `node -e 0` over interleaved rounds (bench/lib.mjs), so
// the ratio, not the milliseconds, is the figure to compare between commits on one machine.
// With --quick the run shown is itself the first timed round (bare `node -e 0` right after it).
// The figures about shaftwise itself (start-up ratios, per-point costs) are in each
// benchmark's own output above the table.
// --quick: smaller arguments and one timed round each, for CI and checks (well under a minute).
// --dry-run: print the plan and check that it names every benchmark in bench/, run nothing.
// Exits 1 when a benchmark fails to run (or, with --dry-run, when one is left out).
import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { interleaved, median, once } from './lib.mjs';

const argv = process.argv.slice(2);
const quick = argv.includes('--quick');
const dryRun = argv.includes('--dry-run');
const runsAt = argv.indexOf('--runs');
const runs = runsAt >= 0 ? Number(argv[runsAt + 1]) : quick ? 1 : 3;
if (!Number.isInteger(runs) || runs < 1) {
  console.error(`bench/run.mjs: --runs: got "${argv[runsAt + 1]}"; expected a whole number of rounds, 1 or more`);
  process.exit(2);
}
const here = fileURLToPath(new URL('.', import.meta.url));
const root = fileURLToPath(new URL('..', import.meta.url));
const DEMO = 'examples/sawmill-infeed-roller.yaml';

/** Each benchmark with its arguments, full and quick (see each file's header for their meaning). */
const BENCHMARKS = [
  {
    name: 'startup check',
    file: 'startup.mjs',
    full: ['15', '--', 'check', 'bushing', DEMO],
    quick: ['3', '--', 'check', 'bushing', DEMO],
  },
  {
    name: 'startup advise',
    file: 'startup.mjs',
    full: ['21', '--', 'advise', DEMO],
    quick: ['3', '--', 'advise', DEMO],
  },
  { name: 'batch', file: 'batch.mjs', full: ['3', '200'], quick: ['1', '20'] },
  { name: 'journal', file: 'journal.mjs', full: [], quick: ['--quick'] },
  { name: 'map', file: 'map.mjs', full: ['5'], quick: ['1', '--quick'] },
];
const NOT_BENCHMARKS = new Set(['lib.mjs', 'run.mjs']);

const plan = BENCHMARKS.map((b) => ({ ...b, args: [join('bench', b.file), ...(quick ? b.quick : b.full)] }));
const missing = readdirSync(here)
  .filter((f) => f.endsWith('.mjs') && !NOT_BENCHMARKS.has(f))
  .filter((f) => !BENCHMARKS.some((b) => b.file === f));
const absent = BENCHMARKS.filter((b) => !existsSync(join(here, b.file))).map((b) => b.file);

if (dryRun) {
  for (const p of plan) console.log(`${p.name}: node ${p.args.join(' ')} (${runs} timed round${runs > 1 ? 's' : ''})`);
  for (const f of missing) console.error(`bench/run.mjs: bench/${f} is not in the plan`);
  for (const f of absent) console.error(`bench/run.mjs: bench/${f} is in the plan but not in bench/`);
  process.exit(missing.length || absent.length ? 1 : 0);
}
if (missing.length) console.error(`bench/run.mjs: not in the plan, not run: ${missing.join(', ')}`);

const t0 = Date.now();
const rows = [];
for (const p of plan) {
  console.log(`\n### ${p.name}: node ${p.args.join(' ')}`);
  const start = process.hrtime.bigint();
  const shown = spawnSync(process.execPath, p.args, { cwd: root, stdio: ['ignore', 'inherit', 'inherit'] });
  const shownMs = Number(process.hrtime.bigint() - start) / 1e6;
  if (shown.status !== 0) {
    const how = shown.error ? shown.error.message : `exit ${shown.status ?? shown.signal}`;
    console.error(`bench/run.mjs: ${p.name} failed (${how})`);
    rows.push({ name: p.name, failed: how });
    continue;
  }
  try {
    const times = quick ? { bench: [shownMs], bare: [once(['-e', '0'], { cwd: root })] } : { bench: [], bare: [] };
    const more = runs - times.bench.length;
    if (more > 0) {
      const t = interleaved(
        [
          { name: 'bare', args: ['-e', '0'] },
          { name: 'bench', args: p.args },
        ],
        more,
        root,
        { warmup: false },
      );
      times.bench.push(...t.bench.all);
      times.bare.push(...t.bare.all);
    }
    rows.push({
      name: p.name,
      median: median(times.bench) / median(times.bare),
      fastest: Math.min(...times.bench) / Math.min(...times.bare),
      bare: median(times.bare),
    });
  } catch (e) {
    console.error(`bench/run.mjs: ${p.name} failed while timed (${e.message})`);
    rows.push({ name: p.name, failed: e.message });
  }
}

const w = Math.max(...rows.map((r) => r.name.length), 'benchmark'.length);
console.log(`\n== whole process against node -e 0, ${runs} interleaved round${runs > 1 ? 's' : ''} each ==`);
console.log(`${'benchmark'.padEnd(w)}  runs  ratio (medians)  ratio (fastest)  node -e 0`);
for (const r of rows) {
  const cells = r.failed
    ? [`FAILED: ${r.failed}`]
    : [
        `${r.median.toFixed(1)}x`.padStart(15),
        `${r.fastest.toFixed(1)}x`.padStart(15),
        `${r.bare.toFixed(0)} ms`.padStart(9),
      ];
  console.log(`${r.name.padEnd(w)}  ${String(runs).padStart(4)}  ${cells.join('  ')}`);
}
const failed = rows.filter((r) => r.failed).length;
console.log(`total ${((Date.now() - t0) / 1000).toFixed(1)} s${failed ? `; ${failed} failed` : ''}`);
process.exit(failed || missing.length ? 1 : 0);
