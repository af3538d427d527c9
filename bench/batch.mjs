// Batch benchmark (run on demand, not part of the test suite). Build first: npm run build
// Usage: node bench/batch.mjs [runs] [count]
// Generates `count` (default 200) invented cases into a temporary folder — the
// examples/batch cases with load, speed and life scaled over a grid — then times
// `shaftwise batch` on them against one `shaftwise advise` and bare `node -e 0`, whole process.
import { interleaved } from './lib.mjs';
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { parse, stringify } from 'yaml';

const runs = Number(process.argv[2] ?? 3) || 3;
const count = Number(process.argv[3] ?? 200) || 200;
const root = fileURLToPath(new URL('..', import.meta.url));
const main = join(root, 'dist/bundle/shaftwise.mjs');
const src = join(root, 'examples/batch');
const dir = mkdtempSync(join(tmpdir(), 'shaftwise-batch-'));
const bases = readdirSync(src)
  .filter((f) => f.endsWith('.yaml'))
  .sort()
  .map((f) => parse(readFileSync(join(src, f), 'utf8')));

// Scale a quantity string "9 kN" by k, keeping its unit.
const scale = (q, k) => q.replace(/^([\d.]+)/, (n) => String(+(Number(n) * k).toPrecision(4)));
for (let n = 0; n < count; n++) {
  const b = structuredClone(bases[n % bases.length]);
  const kl = [0.5, 0.8, 1, 1.3, 2][Math.floor(n / bases.length) % 5];
  const kn = [0.5, 1, 2][Math.floor(n / (bases.length * 5)) % 3];
  const kh = [0.5, 1, 1.5][Math.floor(n / (bases.length * 15)) % 3];
  b.title = `${b.title} (bench variant ${n + 1})`;
  b.load.radial = scale(b.load.radial, kl);
  if (b.shaft.speed) b.shaft.speed = scale(b.shaft.speed, kn);
  if (b.duty) b.duty = b.duty.map((p) => ({ ...p, radial: scale(p.radial, kl), speed: p.speed && scale(p.speed, kn) }));
  b.life.hours = scale(b.life.hours, kh);
  writeFileSync(join(dir, `case-${String(n + 1).padStart(3, '0')}.yaml`), stringify(b));
}

const out = join(dir, 'summary.csv');
// batch exits 1 when a case file fails; the generated ones all load, but 1 is still a finished run.
const w = interleaved(
  [
    { name: 'bare', args: ['-e', '0'] },
    { name: 'one', args: [main, 'advise', join(dir, 'case-001.yaml')] },
    { name: 'batch', args: [main, 'batch', dir, '--out', out, '--force'], ok: [0, 1] },
  ],
  runs,
  root,
);
const bare = w.bare.median;
const one = w.one.median;
const batch = w.batch.median;
const rows = readFileSync(out, 'utf8').trim().split('\r\n').length - 1;
console.log(`node -e 0:                       ${bare.toFixed(0)} ms (median of ${runs} interleaved rounds)`);
console.log(`shaftwise advise (one case):     ${one.toFixed(0)} ms (${(one / bare).toFixed(1)}x node)`);
console.log(
  `shaftwise batch (${count} cases):     ${batch.toFixed(0)} ms (${(batch / bare).toFixed(1)}x node, ${(batch / one).toFixed(1)}x one advise; budget 10x), ${rows} rows`,
);
console.log(`per case: ${((batch - one) / (count - 1)).toFixed(1)} ms`);
rmSync(dir, { recursive: true, force: true });
