// Selection-map benchmark (run on demand, not part of the test suite). Build first: npm run build
// Usage: node bench/map.mjs [runs] [case] [--quick]
// Prints: whole-process time of a 60×60 map (SVG out) against bare `node -e 0`, run as users run
// it (bin/shaftwise: the start-up snapshot where usable) and through the normal bundle; the map's
// peak resident memory through bin/shaftwise (median over the runs, each run once more alone); per-point
// costs of each part in-process, and the agreement of the map's winners with full advise()
// (journal design sweep at every point) on a 12×12 sub-grid. --quick: a 30×30 map, per-point
// costs over 10×10 points instead of 20×20, agreement on a 6×6 sub-grid.
import { interleaved, peakRss } from './lib.mjs';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { loadCaseFile } from '../dist/case/load.js';
import { advise } from '../dist/advise/engine.js';
import { loadRules } from '../dist/advise/load-rules.js';
import { checkBushing } from '../dist/calc/bushing/index.js';
import { checkRolling } from '../dist/calc/rolling/index.js';
import { checkJournal } from '../dist/calc/journal/index.js';
import { computeMap } from '../dist/explore/map.js';
import { ruleRunner } from '../dist/explore/rule-runner.js';
import { checkDesign, designOf } from '../dist/explore/journal-design.js';
import { scaleCase } from '../dist/explore/scale.js';

const quick = process.argv.includes('--quick');
const [runsArg, fileArg] = process.argv.slice(2).filter((a) => !a.startsWith('--'));
const runs = Number(runsArg ?? 5) || 5;
const file = fileArg ?? 'examples/irrigation-pump-lineshaft.yaml';
const grid = quick ? 30 : 60; // the map
const side = quick ? 10 : 20; // per-point grid
const sub = quick ? 6 : 12; // agreement sub-grid
const root = fileURLToPath(new URL('..', import.meta.url));
const main = join(root, 'dist/bundle/shaftwise.mjs');
const out = mkdtempSync(join(tmpdir(), 'shaftwise-bench-'));

const launcher = join(root, 'bin/shaftwise');
const mapArgs = ['map', file, '--grid', String(grid), '--out', join(out, 'm.svg'), '--force'];
const w = interleaved(
  [
    { name: 'bare', args: ['-e', '0'] },
    { name: 'map', cmd: launcher, args: mapArgs },
    { name: 'mapBundle', args: [main, ...mapArgs] },
    { name: 'advise', cmd: launcher, args: ['advise', file] },
  ],
  runs,
  root,
);
const bare = w.bare.median;
const ratio = (ms) => `${ms.toFixed(0)} ms  (${(ms / bare).toFixed(1)}x)`;
console.log(`== whole process, median of ${runs} interleaved rounds ==`);
console.log(`node -e 0:                 ${bare.toFixed(0)} ms`);
console.log(`shaftwise advise:          ${ratio(w.advise.median)}`);
console.log(`shaftwise map --grid ${grid}:   ${ratio(w.map.median)} map (bin/shaftwise)`);
console.log(`  the same, normal bundle: ${ratio(w.mapBundle.median)} bundle (node dist/bundle/shaftwise.mjs)`);

// Peak resident memory of the map's process (bin/shaftwise), read from /proc while it runs.
const peaks = [];
for (let i = 0; i < runs; i++) peaks.push(await peakRss(launcher, mapArgs, { cwd: root }));
if (peaks.every((p) => p !== null)) {
  const peakSorted = [...peaks].sort((x, y) => x - y);
  console.log(
    `map peak RSS:              ${peakSorted[Math.floor(runs / 2)].toFixed(0)} MB median of ${runs} (${peakSorted[0].toFixed(0)}–${peakSorted[runs - 1].toFixed(0)} MB)`,
  );
} else console.log('map peak RSS:              not measured (no /proc here)');

// Per-point costs, in-process, warm.
const l = loadCaseFile(join(root, file));
const c = l.case;
const rules = loadRules();
const now = () => performance.now();
const pts = [];
for (let i = 0; i < side; i++)
  for (let j = 0; j < side; j++) pts.push(scaleCase(c, 0.1 * 100 ** (i / (side - 1)), 0.1 * 100 ** (j / (side - 1))));
const per = (label, f) => {
  for (const p of pts.slice(0, 50)) f(p);
  const t = now();
  for (const p of pts) f(p);
  console.log(`${label.padEnd(44)} ${(((now() - t) / pts.length) * 1000).toFixed(0).padStart(6)} µs/point`);
};
const perAsync = async (label, f) => {
  for (const p of pts.slice(0, 20)) await f(p);
  const t = now();
  for (const p of pts) await f(p);
  console.log(`${label.padEnd(44)} ${(((now() - t) / pts.length) * 1000).toFixed(0).padStart(6)} µs/point`);
};
console.log(`\n== per-point costs over ${pts.length} points (0.1x..10x load and speed) ==`);
const d = designOf(checkJournal(c), c);
per('checkBushing', (p) => checkBushing(p));
per('checkRolling', (p) => checkRolling(p));
per('checkJournal, full design sweep', (p) => checkJournal(p, { pressureProfile: false, sheet: false }));
per('checkJournal, one fixed design', (p) => checkDesign(p, d));
const bs = pts.map((p) => ({ bushing: checkBushing(p), rolling: checkRolling(p), journal: checkDesign(p, d) }));
let k = 0;
await perAsync('advise, fresh Engine (checks given)', (p) => advise(p, [], rules, { checks: bs[k++ % bs.length] }));
const plain = ruleRunner(rules);
k = 0;
await perAsync('advise, one Engine reused (checks given)', (p) =>
  advise(p, [], rules, { checks: bs[k++ % bs.length], runRules: plain.run }),
);
const memo = ruleRunner(rules, { memo: true });
k = 0;
await perAsync('advise, reused Engine + memo (checks given)', (p) =>
  advise(p, [], rules, { checks: bs[k++ % bs.length], runRules: memo.run }),
);
console.log(`memo: ${memo.stats.runs} engine runs, ${memo.stats.hits} hits`);
await perAsync('advise, full (what a naive map would do)', (p) => advise(p, [], rules));

// In-process map and agreement with full advise on a 12x12 (quick: 6x6) sub-grid.
let t = now();
const m = await computeMap(c, l.assumed, { grid });
console.log(
  `\n== computeMap ${grid}x${grid} in-process (warm tables): ${(now() - t).toFixed(0)} ms, ${m.journal.designs.length} journal designs ==`,
);
t = now();
const msub = await computeMap(c, l.assumed, { grid: sub });
let same = 0;
const differ = [];
for (let i = 0; i < sub; i++)
  for (let j = 0; j < sub; j++) {
    const a = await advise(
      scaleCase(c, msub.loads[i] / msub.reference.load, msub.speeds[j] / msub.reference.speed),
      [],
      rules,
    );
    if (a.recommendation === msub.cells[i][j].winner) same++;
    else
      differ.push(
        `${Math.round(msub.loads[i])} N ${Math.round(msub.speeds[j] * 60)} r/min: map ${msub.cells[i][j].winner}, full ${a.recommendation}`,
      );
  }
console.log(`agreement with full advise() on ${sub}x${sub}: ${same}/${sub * sub} cells (${(now() - t).toFixed(0)} ms)`);
for (const x of differ) console.log(`  differs: ${x}`);
rmSync(out, { recursive: true, force: true });
