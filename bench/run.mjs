// Every benchmark in bench/, one after another (npm run bench builds first).
// Usage: node bench/run.mjs [--quick] [--dry-run]
// Each benchmark times shaftwise's whole process against bare `node -e 0` itself, over
// interleaved rounds (bench/lib.mjs), and prints the ratio: the ratio, not the milliseconds, is
// the figure to compare between commits on one machine. This runner shows each benchmark's
// output as it runs, then gathers the ratios they printed into one table.
// --quick: smaller arguments and fewer rounds, for CI and checks (under a minute).
// --dry-run: print the plan and check that it names every benchmark in bench/, run nothing.
// Exits 1 when a benchmark fails to run or prints no ratio (or, with --dry-run, when one is left out).
import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
const argv = process.argv.slice(2);
const quick = argv.includes('--quick');
const dryRun = argv.includes('--dry-run');
const unknown = argv.filter((a) => a !== '--quick' && a !== '--dry-run');
if (unknown.length) {
  console.error(`bench/run.mjs: got ${unknown.join(' ')}; expected --quick and/or --dry-run`);
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
  {
    name: 'startup help',
    file: 'startup.mjs',
    full: ['15', '--', '--help'],
    quick: ['3', '--', '--help'],
  },
  { name: 'batch', file: 'batch.mjs', full: ['3', '200'], quick: ['1', '20'] },
  // In process (solver cost per point, no start-up): its figures are times, not ratios.
  {
    name: 'journal',
    file: 'journal.mjs',
    full: [],
    quick: ['--quick'],
    figures: /^\s*per point:|^== checkJournal, .*sweep/,
  },
  { name: 'map', file: 'map.mjs', full: ['5'], quick: ['1', '--quick'] },
];
const NOT_BENCHMARKS = new Set(['lib.mjs', 'run.mjs']);

const plan = BENCHMARKS.map((b) => ({ ...b, args: [join('bench', b.file), ...(quick ? b.quick : b.full)] }));
const missing = readdirSync(here)
  .filter((f) => f.endsWith('.mjs') && !NOT_BENCHMARKS.has(f))
  .filter((f) => !BENCHMARKS.some((b) => b.file === f));
const absent = BENCHMARKS.filter((b) => !existsSync(join(here, b.file))).map((b) => b.file);

if (dryRun) {
  for (const p of plan) console.log(`${p.name}: node ${p.args.join(' ')}`);
  for (const f of missing) console.error(`bench/run.mjs: bench/${f} is not in the plan`);
  for (const f of absent) console.error(`bench/run.mjs: bench/${f} is in the plan but not in bench/`);
  process.exit(missing.length || absent.length ? 1 : 0);
}
if (missing.length) console.error(`bench/run.mjs: not in the plan, not run: ${missing.join(', ')}`);

/** A ratio as printed, "2.9x", "1.65x (medians)" or "2.5x one advise", not a range such as "0.1x..10x". */
const RATIO = /(\d+\.\d+)x(?![.\d])(?: \(([a-z]+)\)|((?: [a-z]+)+))?/g;

/**
 * The figures a benchmark printed: each line with a ratio, as "what: 3.9x medians, 4.1x
 * fastest"; for an in-process benchmark (no ratio), the lines its plan names in `figures`; and any peak-memory line.
 */
function figuresIn(output, figures) {
  const lines = output.split('\n');
  if (figures) return lines.filter((line) => figures.test(line)).map((line) => line.trim().replace(/\s+/g, ' '));
  // A peak memory line ("map peak RSS: 99 MB median of 3 (…)") is a figure of its own.
  const memory = lines.filter((line) => /peak RSS:/.test(line)).map((line) => line.trim().replace(/\s+/g, ' '));
  const ratios = lines
    .filter((line) => new RegExp(RATIO.source).test(line))
    .map((line) => {
      const what = line.split(/[:(]/)[0].trim().replace(/\s+/g, ' ');
      const found = [...line.matchAll(RATIO)].map((m) => `${m[1]}x${m[2] ? ` ${m[2]}` : (m[3] ?? '')}`);
      return `${what}: ${found.join(', ')}`;
    });
  return [...ratios, ...memory];
}

const t0 = Date.now();
const rows = [];
for (const p of plan) {
  console.log(`\n### ${p.name}: node ${p.args.join(' ')}`);
  const start = Date.now();
  const r = spawnSync(process.execPath, p.args, { cwd: root, stdio: ['ignore', 'pipe', 'inherit'], encoding: 'utf8' });
  process.stdout.write(r.stdout ?? '');
  const seconds = (Date.now() - start) / 1000;
  const ratios = figuresIn(r.stdout ?? '', p.figures);
  if (r.status !== 0 || ratios.length === 0) {
    const how = r.error
      ? r.error.message
      : r.status !== 0
        ? `exit ${r.status ?? r.signal}`
        : 'printed none of its figures';
    console.error(`bench/run.mjs: ${p.name} failed (${how})`);
    rows.push({ name: p.name, seconds, failed: how });
  } else rows.push({ name: p.name, seconds, ratios });
}

const w = Math.max(...rows.map((r) => r.name.length), 'benchmark'.length);
console.log(`\n== shaftwise against node -e 0 (whole process, ratio of interleaved runs; journal in process) ==`);
console.log(`${'benchmark'.padEnd(w)}  time    figures`);
for (const r of rows) {
  const cells = r.failed ? [`FAILED: ${r.failed}`] : r.ratios;
  const time = `${r.seconds.toFixed(1)} s`.padStart(6);
  cells.forEach((cell, i) => console.log(`${(i ? '' : r.name).padEnd(w)}  ${i ? ' '.repeat(6) : time}  ${cell}`));
}
const failed = rows.filter((r) => r.failed).length;
console.log(`total ${((Date.now() - t0) / 1000).toFixed(1)} s${failed ? `; ${failed} failed` : ''}`);
process.exit(failed || missing.length ? 1 : 0);
